package barfit.units;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.Locale;

/**
 * {@code String.format(Locale.ROOT, "%.nf", v)} without the Formatter: the same digits (the shortest decimal
 * that identifies the double, rounded half up at n decimals, as the Formatter rounds), a fraction of the time.
 * Reports write tens of thousands of numbers; the Formatter's parsing and locale look-up per call was most of
 * a large schedule's writing time.
 */
public final class FixedDecimals {
    private FixedDecimals() {}

    public static String of(double v, int decimals) {
        if (!Double.isFinite(v)) {
            return String.format(Locale.ROOT, "%." + decimals + "f", v);
        }
        BigDecimal d = new BigDecimal(Double.toString(v)).setScale(decimals, RoundingMode.HALF_UP);
        String s = d.toPlainString();
        // the Formatter keeps the sign of a negative number that rounds to zero ("-0.00"), and of -0.0
        boolean negative = v < 0 || (v == 0 && 1 / v < 0);
        return negative && d.signum() == 0 ? "-" + s : s;
    }
}
