package barfit.catalogs;

/**
 * Plain decimal numbers as a person writes them: an optional sign, digits with at most one point, and an
 * optional exponent ({@code 12}, {@code -0.5}, {@code .25}, {@code 3e4}). Recognised in one pass, so a
 * run of 100 000 digits costs no more than reading it (a regular expression with nested repetition
 * backtracks over such a run in quadratic time).
 */
public final class Decimal {
    private Decimal() {}

    /** Whether {@code s}, exactly, is a plain decimal number. */
    public static boolean isPlain(CharSequence s) {
        int n = s.length();
        int i = 0;
        if (i < n && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
            i++;
        }
        int digits = 0;
        while (i < n && isDigit(s.charAt(i))) {
            i++;
            digits++;
        }
        if (i < n && s.charAt(i) == '.') {
            i++;
            while (i < n && isDigit(s.charAt(i))) {
                i++;
                digits++;
            }
        }
        if (digits == 0) {
            return false;
        }
        if (i < n && (s.charAt(i) == 'e' || s.charAt(i) == 'E')) {
            i++;
            if (i < n && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
                i++;
            }
            int exp = 0;
            while (i < n && isDigit(s.charAt(i))) {
                i++;
                exp++;
            }
            if (exp == 0) {
                return false;
            }
        }
        return i == n;
    }

    /**
     * The value of a plain decimal number, or NaN when {@code s} is not one. The value may be infinite
     * (1e999, or 400 digits): the caller's range check says so.
     */
    public static double parse(String s) {
        if (!isPlain(s)) {
            return Double.NaN;
        }
        return Double.parseDouble(s); // linear in the length: only the first digits are kept
    }

    private static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }
}
