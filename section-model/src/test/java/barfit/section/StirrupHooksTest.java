package barfit.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import barfit.catalogs.BarCatalog;
import barfit.catalogs.BarCatalogs;
import barfit.catalogs.BarSize;
import org.junit.jupiter.api.Test;

/**
 * Stirrup bends and hooks against ACI 318-19 Table 25.3.2 (and Table 25.3.1 for larger bars); the table
 * values are quoted from memory of the code's tables.
 */
class StirrupHooksTest {
    private static final BarCatalog SI_BARS = BarCatalogs.builtIn("astm-a615m").orElseThrow();
    private static final BarCatalog US_BARS = BarCatalogs.builtIn("astm-a615").orElseThrow();
    private static final double IN = 25.4;

    private static BarSize si(String s) {
        return SI_BARS.find(s).orElseThrow();
    }

    private static BarSize us(String s) {
        return US_BARS.find(s).orElseThrow();
    }

    @Test
    void hook135ExtendsSixDiametersButAtLeast75mmOr3in() {
        // Table 25.3.2 (ACI 318M-19): 135-degree hook, No. 10 to No. 25: 6 db >= 75 mm
        assertEquals(75.0, StirrupHooks.extension135(si("10"), CodeEquations.SI), 1e-9); // 6 x 9.5 = 57 mm < 75
        assertEquals(6 * 12.7, StirrupHooks.extension135(si("13"), CodeEquations.SI), 1e-9); // 76.2 mm > 75
        assertEquals(6 * 15.9, StirrupHooks.extension135(si("16"), CodeEquations.SI), 1e-9);
        // Table 25.3.2 (inch-pound): 6 db >= 3 in
        assertEquals(3.0, StirrupHooks.extension135(us("3"), CodeEquations.INCH_POUND) / IN, 1e-12); // 2.25 in < 3
        assertEquals(3.0, StirrupHooks.extension135(us("4"), CodeEquations.INCH_POUND) / IN, 1e-12); // 6 x 0.5 in
        assertEquals(3.75, StirrupHooks.extension135(us("5"), CodeEquations.INCH_POUND) / IN, 1e-12);
    }

    @Test
    void insideBendDiameterFollowsTables25_3_2And25_3_1() {
        // Table 25.3.2: No. 10 to No. 16 (#3 to #5) 4 db; No. 19 to No. 25 (#6 to #8) 6 db
        assertEquals(4 * 9.5, StirrupHooks.insideBendDiameter(si("10")), 1e-9);
        assertEquals(4 * 15.9, StirrupHooks.insideBendDiameter(si("16")), 1e-9);
        assertEquals(4 * 0.625, StirrupHooks.insideBendDiameter(us("5")) / IN, 1e-12);
        assertEquals(6 * 19.1, StirrupHooks.insideBendDiameter(si("19")), 1e-9);
        assertEquals(6 * 25.4, StirrupHooks.insideBendDiameter(si("25")), 1e-9);
        assertEquals(6 * 1.0, StirrupHooks.insideBendDiameter(us("8")) / IN, 1e-12);
        // Table 25.3.1 beyond Table 25.3.2: No. 29 to No. 36 (#9 to #11) 8 db; No. 43 and No. 57 10 db
        assertEquals(8 * 28.7, StirrupHooks.insideBendDiameter(si("29")), 1e-9);
        assertEquals(8 * 1.128, StirrupHooks.insideBendDiameter(us("9")) / IN, 1e-12);
        assertEquals(10 * 43.0, StirrupHooks.insideBendDiameter(si("43")), 1e-9);
    }

    @Test
    void hook90ExtendsSixOrTwelveDiameters() {
        // Table 25.3.2: 90-degree hook, No. 10 to No. 16: 6 db; No. 19 to No. 25: 12 db
        assertEquals(6 * 9.5, StirrupHooks.extension90(si("10")), 1e-9);
        assertEquals(6 * 0.625, StirrupHooks.extension90(us("5")) / IN, 1e-12);
        assertEquals(12 * 19.1, StirrupHooks.extension90(si("19")), 1e-9);
        assertEquals(12 * 1.0, StirrupHooks.extension90(us("8")) / IN, 1e-12);
        assertThrows(IllegalArgumentException.class, () -> StirrupHooks.extension90(si("29")));
    }
}
