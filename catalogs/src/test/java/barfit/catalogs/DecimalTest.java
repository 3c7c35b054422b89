package barfit.catalogs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeout;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import org.junit.jupiter.api.Test;

/** Plain decimal numbers, recognised in one pass however long the digit run. */
class DecimalTest {

    @Test
    void plainDecimalsAndNothingElse() {
        for (String ok : new String[] {"0", "12", "-0.5", "+3", ".25", "7.", "3e4", "2.5E-3", "1e+2"}) {
            assertTrue(Decimal.isPlain(ok), ok);
        }
        for (String bad : new String[] {
            "",
            "-",
            ".",
            "e5",
            "1e",
            "1e+",
            "1.2.3",
            "0x1p3",
            "6.0f",
            "1d",
            "Infinity",
            "NaN",
            " 1",
            "1 ",
            "1,5",
            "1_000",
            "--1"
        }) {
            assertFalse(Decimal.isPlain(bad), bad);
        }
        assertEquals(-0.0025, Decimal.parse("-2.5e-3"), 0);
        assertTrue(Double.isNaN(Decimal.parse("6.0f")), "Java's own suffixes are not plain decimals");
        assertTrue(Double.isInfinite(Decimal.parse("1e999")), "the caller's range check says it is too large");
    }

    @Test
    void aMillionDigitsTakeNoLongerThanReadingThem() {
        // the regular expression it replaces, [-+]?(\d+\.?\d*|\.\d+)..., backtracked quadratically over
        // such a run when a stray character followed it (100 kB: over 20 s)
        String digits = "7".repeat(1_000_000);
        assertTimeout(Duration.ofSeconds(2), () -> {
            assertFalse(Decimal.isPlain(digits + "x"));
            assertFalse(Decimal.isPlain(digits + "." + digits + "e"));
            assertTrue(Decimal.isPlain(digits));
            assertTrue(Double.isInfinite(Decimal.parse(digits)));
            assertEquals(0.7777777, Decimal.parse("0." + digits), 1e-6);
        });
    }

    @Test
    void longTextIsQuotedCut() {
        assertEquals("short", Echo.cut("short"));
        String sixty = "a".repeat(Echo.MAX);
        assertEquals(sixty, Echo.cut(sixty));
        assertEquals(sixty + "… (200000 characters)", Echo.cut("a".repeat(200_000)));
    }
}
