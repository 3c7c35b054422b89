package barfit.catalogs.yaml;

import barfit.catalogs.Decimal;
import barfit.catalogs.Echo;
import barfit.catalogs.InputError;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * Typed, located access to the keys of one YAML map. Every failure names the file, line, column, the
 * key's path (e.g. {@code beams[2].section.width}) and what was expected.
 */
public final class YFields {
    private final YMap map;
    private final String path;

    private YFields(YMap map, String path) {
        this.map = map;
        this.path = path;
    }

    /** Wraps {@code node}, which must be a map; {@code what} says what the map is for. */
    public static YFields of(YNode node, String path, String what) {
        if (!(node instanceof YMap m)) {
            throw new InputError(
                    node.location(), label(path) + "expected " + what + " (a map of keys), got " + node.kind());
        }
        return new YFields(m, path);
    }

    private static String label(String path) {
        return path == null || path.isEmpty() ? "" : path + ": ";
    }

    public YMap map() {
        return map;
    }

    public String path() {
        return path;
    }

    public Location location() {
        return map.location();
    }

    public String child(String key) {
        return path == null || path.isEmpty() ? key : path + "." + key;
    }

    /** Rejects keys not in {@code allowed}; catches typos such as {@code widht}. */
    public YFields allowOnly(String... allowed) {
        Set<String> ok = new LinkedHashSet<>(Arrays.asList(allowed));
        for (YMap.Entry e : map.entries()) {
            if (!ok.contains(e.key())) {
                throw new InputError(
                        e.keyLocation(),
                        label(path) + "unknown key '" + Echo.cut(e.key()) + "'; expected one of: "
                                + String.join(", ", ok));
            }
        }
        return this;
    }

    public boolean has(String key) {
        YNode n = map.get(key);
        return n != null && !(n instanceof YScalar s && s.nul());
    }

    public YNode node(String key) {
        YNode n = map.get(key);
        if (n == null || (n instanceof YScalar s && s.nul())) {
            throw new InputError(n == null ? map.location() : n.location(), label(path) + "missing key '" + key + "'");
        }
        return n;
    }

    /** Where the value of {@code key} was written (the map itself when the key is absent). */
    public Location locationOf(String key) {
        YNode n = map.get(key);
        return n == null ? map.location() : n.location();
    }

    public InputError error(String key, String message) {
        YNode n = map.get(key);
        return new InputError(n == null ? map.location() : n.location(), child(key) + ": " + message);
    }

    public double number(String key, String expected) {
        YNode n = map.get(key);
        if (n == null || (n instanceof YScalar s && s.nul())) {
            throw new InputError(
                    n == null ? map.location() : n.location(),
                    label(path) + "missing key '" + key + "'; expected " + expected);
        }
        return numberOf(n, child(key), expected);
    }

    public Optional<Double> optNumber(String key, String expected) {
        return has(key) ? Optional.of(numberOf(map.get(key), child(key), expected)) : Optional.empty();
    }

    public double positive(String key, String expected) {
        double v = number(key, "a positive number (" + expected + ")");
        requirePositive(map.get(key), child(key), v, expected);
        return v;
    }

    public Optional<Double> optPositive(String key, String expected) {
        if (!has(key)) {
            return Optional.empty();
        }
        return Optional.of(positive(key, expected));
    }

    public double nonNegative(String key, String expected) {
        double v = number(key, "a number >= 0 (" + expected + ")");
        if (v < 0) {
            throw new InputError(
                    map.get(key).location(),
                    child(key) + ": expected a number >= 0 (" + expected + "), got " + text(map.get(key)));
        }
        return v;
    }

    public int positiveInt(String key, String expected) {
        double v = number(key, "a whole number >= 1 (" + expected + ")");
        YNode n = map.get(key);
        if (v != Math.rint(v) || v < 1 || v > 1_000_000) {
            throw new InputError(
                    n.location(), child(key) + ": expected a whole number >= 1 (" + expected + "), got " + text(n));
        }
        return (int) v;
    }

    public String text(String key, String expected) {
        YNode n = map.get(key);
        if (n == null || (n instanceof YScalar s && s.nul())) {
            throw new InputError(
                    n == null ? map.location() : n.location(),
                    label(path) + "missing key '" + key + "'; expected " + expected);
        }
        return textOf(n, child(key), expected);
    }

    public Optional<String> optText(String key, String expected) {
        return has(key) ? Optional.of(textOf(map.get(key), child(key), expected)) : Optional.empty();
    }

    public Optional<Boolean> optBool(String key) {
        if (!has(key)) {
            return Optional.empty();
        }
        YNode n = map.get(key);
        if (n instanceof YScalar s && s.bool()) {
            return Optional.of(Boolean.parseBoolean(s.text()));
        }
        throw new InputError(n.location(), child(key) + ": expected true or false, got " + n.kind());
    }

    public YFields map(String key, String what) {
        return of(node(key), child(key), what);
    }

    public Optional<YFields> optMap(String key, String what) {
        return has(key) ? Optional.of(of(map.get(key), child(key), what)) : Optional.empty();
    }

    public YList list(String key, String what) {
        YNode n = node(key);
        if (!(n instanceof YList l)) {
            throw new InputError(n.location(), child(key) + ": expected " + what + " (a list), got " + n.kind());
        }
        return l;
    }

    public Optional<YList> optList(String key, String what) {
        return has(key) ? Optional.of(list(key, what)) : Optional.empty();
    }

    /** The items of a list that must each be a map. */
    public List<YFields> listOfMaps(String key, String what) {
        YList l = list(key, "a list of " + what);
        List<YFields> out = new ArrayList<>();
        for (int i = 0; i < l.size(); i++) {
            out.add(of(l.get(i), child(key) + "[" + (i + 1) + "]", what));
        }
        return out;
    }

    // ---- helpers usable on bare nodes ----

    public static double numberOf(YNode n, String path, String expected) {
        String text = n instanceof YScalar s && !s.nul() && !s.bool() ? s.text().strip() : null;
        // a number as written, or a quoted text that reads as a plain decimal ("300"); checked in one pass
        double v = text == null ? Double.NaN : ((YScalar) n).number() ? parseYamlNumber(text) : Decimal.parse(text);
        if (Double.isNaN(v)) {
            throw new InputError(n.location(), path + ": expected " + expected + ", got " + n.kind());
        }
        if (Double.isInfinite(v)) {
            throw new InputError(
                    n.location(), path + ": expected " + expected + ", got " + n.kind() + ", too large a number");
        }
        return v;
    }

    /**
     * A scalar the YAML parser took for a number (its own scan of the digits is linear): NaN for the YAML
     * forms Java does not read, such as "1_000" or "0x1F".
     */
    private static double parseYamlNumber(String text) {
        try {
            return Double.parseDouble(text);
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }

    public static void requirePositive(YNode n, String path, double v, String expected) {
        if (!(v > 0)) {
            throw new InputError(
                    n.location(), path + ": expected a positive number (" + expected + "), got " + text(n));
        }
    }

    public static String textOf(YNode n, String path, String expected) {
        if (n instanceof YScalar s && !s.nul()) {
            return s.text().strip();
        }
        throw new InputError(n.location(), path + ": expected " + expected + ", got " + n.kind());
    }

    private static String text(YNode n) {
        return n instanceof YScalar s ? Echo.cut(s.text()) : n.kind();
    }
}
