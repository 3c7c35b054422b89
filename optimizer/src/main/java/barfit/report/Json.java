package barfit.report;

import barfit.section.trail.Dim;
import barfit.section.trail.Q;
import barfit.section.trail.Trail;
import barfit.units.UnitSystem;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

/** Helpers for the JSON reports: numbers in the user's units, 6 significant digits, stable order. */
public final class Json {
    public static final ObjectMapper MAPPER = new ObjectMapper();

    private Json() {}

    public static ObjectNode object() {
        return MAPPER.createObjectNode();
    }

    public static ArrayNode array() {
        return MAPPER.createArrayNode();
    }

    public static void put(ObjectNode o, String key, double si, Dim d, UnitSystem u) {
        double v = u.json(si, d);
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }

    public static void put(ObjectNode o, String key, Q q, UnitSystem u) {
        if (q == null) {
            o.putNull(key);
        } else {
            put(o, key, q.value(), q.dim(), u);
        }
    }

    public static void putRatio(ObjectNode o, String key, double r) {
        if (Double.isFinite(r)) {
            o.put(
                    key,
                    new java.math.BigDecimal(r)
                            .round(new java.math.MathContext(4))
                            .doubleValue());
        } else {
            o.putNull(key);
        }
    }

    public static ObjectNode units(UnitSystem u) {
        ObjectNode o = object();
        o.put("length", u.unit(Dim.LENGTH));
        o.put("area", u.unit(Dim.AREA));
        o.put("force", u.unit(Dim.FORCE));
        o.put("moment", u.unit(Dim.MOMENT));
        o.put("stress", u.unit(Dim.STRESS));
        o.put("span", u.unit(Dim.SPAN));
        return o;
    }

    public static ArrayNode trail(Trail t, UnitSystem u) {
        ArrayNode arr = array();
        for (Trail.Entry e : t.entries()) {
            ObjectNode o = arr.addObject();
            if (e instanceof Trail.Heading h) {
                o.put("heading", h.title());
                o.put("clause", h.clause());
            } else if (e instanceof Trail.Step s) {
                o.put("symbol", s.symbol());
                if (s.formula() != null) {
                    o.put("formula", s.formula());
                }
                String line = TrailText.step(s, u);
                o.put("line", line);
                put(o, "value", s.result(), u);
                o.put("unit", u.unit(s.result().dim()));
                if (s.note() != null) {
                    o.put("note", s.note());
                }
            } else if (e instanceof Trail.Note n) {
                o.put("note", n.text());
            }
        }
        return arr;
    }

    public static String write(JsonNode node) {
        DefaultPrettyPrinter pp = new DefaultPrettyPrinter();
        pp.indentArraysWith(DefaultIndenter.SYSTEM_LINEFEED_INSTANCE);
        try {
            return MAPPER.writer(pp).writeValueAsString(node).replace("\r\n", "\n") + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }
}
