package barfit.catalogs.yaml;

import barfit.catalogs.Echo;

/**
 * A scalar as written. {@code number} is true for an unquoted integer or decimal, {@code bool} for
 * true/false, {@code nul} for null or an empty value. {@link #kind} quotes at most {@link Echo#MAX}
 * characters of the text.
 */
public record YScalar(String text, boolean number, boolean bool, boolean nul, Location location) implements YNode {

    @Override
    public String kind() {
        if (nul) {
            return "an empty value";
        }
        if (number) {
            return "the number " + Echo.cut(text);
        }
        if (bool) {
            return "the word " + text;
        }
        return "the text \"" + Echo.cut(text) + "\"";
    }
}
