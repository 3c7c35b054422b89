package barfit.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** FixedDecimals against the Formatter it stands in for, on awkward and on many random numbers. */
class FixedDecimalsTest {
    static void same(double v, int n) {
        assertEquals(String.format(Locale.ROOT, "%." + n + "f", v), FixedDecimals.of(v, n), v + " to " + n);
    }

    @Test
    void awkwardNumbersComeOutAsTheFormatterWritesThem() {
        double[] awkward = {
            0,
            -0.0,
            0.15,
            0.25,
            0.35,
            1.005,
            2.675,
            -2.675,
            0.0005,
            -0.0005,
            -0.0001,
            1e-7,
            -1e-7,
            123456.5,
            9.9995,
            99.995,
            0.1 + 0.2,
            1e15,
            -1e15,
            1e21,
            4.35,
            1234.5678,
            Double.MIN_VALUE,
            -Double.MIN_VALUE,
            Double.NaN,
            Double.POSITIVE_INFINITY,
            Double.NEGATIVE_INFINITY,
            5e-324,
            1.7976931348623157e308
        };
        for (double v : awkward) {
            for (int n = 0; n <= 7; n++) {
                same(v, n);
            }
        }
    }

    @Test
    void aHundredThousandRandomNumbersComeOutTheSame() {
        SplittableRandom r = new SplittableRandom(20261202);
        for (int i = 0; i < 100_000; i++) {
            double v = (r.nextDouble() - 0.5) * Math.pow(10, r.nextInt(-6, 9));
            if (r.nextInt(4) == 0) {
                // numbers on a half: where rounding goes one way or the other
                v = Math.round(v * 1000) / 1000.0 + 0.0005;
            }
            same(v, r.nextInt(0, 8));
        }
    }
}
