package barfit.catalogs.yaml;

/**
 * A scalar as written. {@code number} is true for an unquoted integer or decimal, {@code bool} for
 * true/false, {@code nul} for null or an empty value.
 */
public record YScalar(String text, boolean number, boolean bool, boolean nul, Location location) implements YNode {

    @Override
    public String kind() {
        if (nul) {
            return "an empty value";
        }
        if (number) {
            return "the number " + text;
        }
        if (bool) {
            return "the word " + text;
        }
        return "the text \"" + text + "\"";
    }
}
