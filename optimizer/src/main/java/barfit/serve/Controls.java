package barfit.serve;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * One request of the page: the beam or line it is about and the controls changed, in the file's units. A
 * control left out keeps the file's value; {@code max_depth: null} removes the beam's headroom cap. Only the
 * shape of each value is checked here; whether it is a plausible width, grade or rate is the file reader's
 * to say, exactly as for a file.
 */
public record Controls(
        String beam,
        String line,
        boolean capGiven,
        Double maxDepth,
        List<Double> widths,
        Double fc,
        List<String> barSizes,
        Map<String, Double> costs) {

    /** The request keys, in the order the page shows the controls. */
    public static final List<String> KEYS = List.of("beam", "line", "max_depth", "widths", "fc", "bar_sizes", "costs");

    private static final int MOST_ITEMS = 40;
    private static final int LONGEST_TEXT = 200;

    public Controls {
        widths = widths == null ? null : List.copyOf(widths);
        barSizes = barSizes == null ? null : List.copyOf(barSizes);
        costs = costs == null ? null : Collections.unmodifiableMap(new LinkedHashMap<>(costs));
    }

    /** The id of the beam or line asked about. */
    public String id() {
        return beam != null ? beam : line;
    }

    public static Controls parse(JsonNode body) {
        if (body == null || !body.isObject()) {
            throw new ControlError("request", "expected a JSON object such as {\"beam\": \"B1\"}");
        }
        Set<String> known = Set.copyOf(KEYS);
        for (Map.Entry<String, JsonNode> e : body.properties()) {
            String k = e.getKey();
            if (!known.contains(k)) {
                throw new ControlError(
                        "request", "unknown key \"" + cut(k) + "\"; expected one of " + String.join(", ", KEYS));
            }
        }
        String beam = text(body, "beam");
        String line = text(body, "line");
        if ((beam == null) == (line == null)) {
            throw new ControlError("request", "expected exactly one of \"beam\" and \"line\", naming what to design");
        }
        boolean capGiven = body.has("max_depth");
        Double cap = capGiven && !body.get("max_depth").isNull() ? number(body.get("max_depth"), "max_depth") : null;
        List<Double> widths = null;
        if (body.has("widths")) {
            widths = new ArrayList<>();
            for (JsonNode n : list(body, "widths", "web widths")) {
                widths.add(number(n, "widths"));
            }
        }
        Double fc = body.has("fc") ? number(body.get("fc"), "fc") : null;
        List<String> bars = null;
        if (body.has("bar_sizes")) {
            bars = new ArrayList<>();
            for (JsonNode n : list(body, "bar_sizes", "bar designations")) {
                if (!n.isTextual() || n.asText().isBlank() || n.asText().length() > LONGEST_TEXT) {
                    throw new ControlError("bar_sizes", "expected bar designations as text, such as \"16\"");
                }
                bars.add(n.asText());
            }
        }
        Map<String, Double> costs = null;
        if (body.has("costs")) {
            JsonNode c = body.get("costs");
            if (!c.isObject() || c.size() > MOST_ITEMS) {
                throw new ControlError("costs", "expected a map of cost rates, such as {\"main_bars_per_kg\": 1.6}");
            }
            costs = new LinkedHashMap<>();
            for (Map.Entry<String, JsonNode> e : c.properties()) {
                costs.put(e.getKey(), number(e.getValue(), "costs"));
            }
        }
        return new Controls(beam, line, capGiven, cap, widths, fc, bars, costs);
    }

    private static String text(JsonNode body, String key) {
        if (!body.has(key)) {
            return null;
        }
        JsonNode n = body.get(key);
        if (!n.isTextual() || n.asText().isEmpty() || n.asText().length() > LONGEST_TEXT) {
            throw new ControlError("request", "\"" + key + "\": expected the id of a " + key + " of the file, as text");
        }
        return n.asText();
    }

    private static List<JsonNode> list(JsonNode body, String key, String what) {
        JsonNode n = body.get(key);
        if (!n.isArray() || n.isEmpty() || n.size() > MOST_ITEMS) {
            throw new ControlError(key, "expected a list of 1 to " + MOST_ITEMS + " " + what);
        }
        List<JsonNode> out = new ArrayList<>();
        n.forEach(out::add);
        return out;
    }

    private static double number(JsonNode n, String control) {
        if (n == null || !n.isNumber() || !Double.isFinite(n.asDouble())) {
            throw new ControlError(control, "expected a number");
        }
        return n.asDouble();
    }

    static String cut(String s) {
        return s.length() > 40 ? s.substring(0, 40) + "…" : s;
    }
}
