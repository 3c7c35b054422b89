package barfit.catalogs;

/**
 * What a message quotes of the user's own text: at most {@link #MAX} characters, so that a value of
 * 200 kB pasted by mistake still gives a one-line error a person can read.
 */
public final class Echo {
    /** Characters of a value quoted in full; a longer one is cut here and marked with "…". */
    public static final int MAX = 60;

    private Echo() {}

    /** {@code text} itself, or its first {@link #MAX} characters, "…" and its length. */
    public static String cut(String text) {
        if (text == null) {
            return "";
        }
        int n = text.codePointCount(0, text.length());
        if (n <= MAX) {
            return text;
        }
        return text.substring(0, text.offsetByCodePoints(0, MAX)) + "… (" + n + " characters)";
    }
}
