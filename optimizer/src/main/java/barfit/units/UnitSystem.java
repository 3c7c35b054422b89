package barfit.units;

import barfit.section.CodeEquations;
import barfit.section.trail.Dim;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Locale;

/**
 * The units a user writes and reads. Everything inside barfit is N, mm, MPa; this converts at the
 * edges and formats numbers for reports.
 */
public enum UnitSystem {
    /** mm, MPa, kN, kN·m, m for spans and bar lengths, kN/m for line loads. */
    SI,
    /** in, psi, kip, kip·ft, ft for spans and bar lengths, kip/ft for line loads. */
    US;

    private static final double IN = 25.4;
    private static final double FT = 304.8;
    private static final double KIP = 4448.2216152605;
    private static final double PSI_PER_MPA = CodeEquations.PSI_PER_MPA;
    private static final double KG_PER_LB = 0.45359237;

    public CodeEquations code() {
        return this == SI ? CodeEquations.SI : CodeEquations.INCH_POUND;
    }

    /** Factor f with SI-internal = user value × f. */
    public double factor(Dim d) {
        if (this == SI) {
            return switch (d) {
                case FORCE -> 1e3;
                case MOMENT -> 1e6;
                case SPAN -> 1e3;
                case LINE_LOAD -> 1.0; // kN/m = N/mm
                default -> 1.0;
            };
        }
        return switch (d) {
            case LENGTH -> IN;
            case AREA -> IN * IN;
            case FORCE -> KIP;
            case MOMENT -> KIP * FT;
            case STRESS -> 1.0 / PSI_PER_MPA;
            case SPAN -> FT;
            case LINE_LOAD -> KIP / FT;
            case INERTIA -> IN * IN * IN * IN;
            case AREA_PER_LENGTH -> IN;
            case MASS_PER_LENGTH -> KG_PER_LB / 0.3048;
            case MASS -> KG_PER_LB;
            case ROOT_STRESS -> 1.0 / Math.sqrt(PSI_PER_MPA);
            default -> 1.0;
        };
    }

    public double toSI(double userValue, Dim d) {
        return userValue * factor(d);
    }

    public double fromSI(double siValue, Dim d) {
        return siValue / factor(d);
    }

    /** A limit of the code in the user's units, rounded to 1e-6 so that 80 000 psi reads as 80000. */
    public double limit(double siValue, Dim d) {
        return Math.round(fromSI(siValue, d) * 1e6) / 1e6;
    }

    public String unit(Dim d) {
        if (this == SI) {
            return switch (d) {
                case LENGTH -> "mm";
                case AREA -> "mm²";
                case FORCE -> "kN";
                case MOMENT -> "kN·m";
                case STRESS -> "MPa";
                case SPAN -> "m";
                case LINE_LOAD -> "kN/m";
                case INERTIA -> "mm⁴";
                case AREA_PER_LENGTH -> "mm²/mm";
                case MASS_PER_LENGTH -> "kg/m";
                case MASS -> "kg";
                case ROOT_STRESS -> "√MPa";
                default -> "";
            };
        }
        return switch (d) {
            case LENGTH -> "in";
            case AREA -> "in²";
            case FORCE -> "kip";
            case MOMENT -> "kip·ft";
            case STRESS -> "psi";
            case SPAN -> "ft";
            case LINE_LOAD -> "kip/ft";
            case INERTIA -> "in⁴";
            case AREA_PER_LENGTH -> "in²/in";
            case MASS_PER_LENGTH -> "lb/ft";
            case MASS -> "lb";
            case ROOT_STRESS -> "√psi";
            default -> "";
        };
    }

    /** Decimals shown in tables. */
    public int decimals(Dim d) {
        if (this == SI) {
            return switch (d) {
                case LENGTH, FORCE, MOMENT, STRESS -> 1;
                case AREA, COUNT -> 0;
                case SPAN -> 3;
                case LINE_LOAD, MASS_PER_LENGTH, ROOT_STRESS -> 2;
                case MASS -> 1;
                case STRAIN -> 5;
                case AREA_PER_LENGTH -> 3;
                case NUMBER -> 3;
                case INERTIA -> 0;
            };
        }
        return switch (d) {
            case LENGTH, FORCE -> 2;
            case AREA, LINE_LOAD, NUMBER, MASS_PER_LENGTH -> 3;
            case MOMENT -> 1;
            case STRESS, INERTIA, COUNT -> 0;
            case SPAN, ROOT_STRESS -> 2;
            case STRAIN -> 5;
            case AREA_PER_LENGTH -> 4;
            case MASS -> 1;
        };
    }

    /** A number in user units with the table's decimals, no unit. */
    public String number(double siValue, Dim d) {
        double v = fromSI(siValue, d);
        if (d == Dim.INERTIA) {
            return sci(v);
        }
        return clean(FixedDecimals.of(v + 0.0, decimals(d)));
    }

    private static String clean(String s) {
        return isNegativeZero(s) ? s.substring(1) : s;
    }

    /** "-0", "-0.", "-0.000": a negative number rounded to zero. */
    private static boolean isNegativeZero(String s) {
        if (!s.startsWith("-0")) {
            return false;
        }
        for (int i = 2; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c != '0' && !(c == '.' && i == 2)) {
                return false;
            }
        }
        return true;
    }

    /** As {@link #number}, trailing zeros dropped: for equations written out. */
    public String compact(double siValue, Dim d) {
        double v = fromSI(siValue, d);
        String s;
        if (d == Dim.INERTIA || d == Dim.COUNT || v == 0 || !Double.isFinite(v)) {
            s = number(siValue, d);
        } else {
            // at least four significant digits, so every substituted number can be re-keyed
            int mag = (int) Math.floor(Math.log10(Math.abs(v)));
            int dec = Math.min(7, Math.max(decimals(d), 3 - mag));
            s = clean(FixedDecimals.of(v, dec));
        }
        if (s.indexOf('.') >= 0 && s.indexOf('e') < 0 && s.indexOf('×') < 0) {
            s = trimZeros(s);
        }
        return s.equals("-0") ? "0" : s;
    }

    private static String trimZeros(String s) {
        int end = s.length();
        while (end > 0 && s.charAt(end - 1) == '0') {
            end--;
        }
        if (end > 0 && s.charAt(end - 1) == '.') {
            end--;
        }
        return s.substring(0, end);
    }

    public String withUnit(double siValue, Dim d) {
        String u = unit(d);
        return u.isEmpty() ? number(siValue, d) : number(siValue, d) + " " + u;
    }

    /** The value rounded to 6 significant digits in user units, for JSON. */
    public double json(double siValue, Dim d) {
        double v = fromSI(siValue, d);
        if (!Double.isFinite(v) || v == 0) {
            return Double.isFinite(v) ? 0.0 : v;
        }
        return new BigDecimal(v).round(new MathContext(6)).doubleValue();
    }

    private static String sci(double v) {
        if (v == 0) {
            return "0";
        }
        int exp = (int) Math.floor(Math.log10(Math.abs(v)));
        int e3 = exp - Math.floorMod(exp, 3);
        if (e3 == 0) {
            return String.format(Locale.ROOT, "%.0f", v);
        }
        return String.format(Locale.ROOT, "%.3f×10^%d", v / Math.pow(10, e3), e3);
    }
}
