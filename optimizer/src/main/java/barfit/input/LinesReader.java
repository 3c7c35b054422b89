package barfit.input;

import barfit.analysis.Column;
import barfit.analysis.Load;
import barfit.analysis.Support;
import barfit.analysis.SupportKind;
import barfit.analysis.Torque;
import barfit.catalogs.InputError;
import barfit.catalogs.yaml.YFields;
import barfit.catalogs.yaml.YList;
import barfit.catalogs.yaml.YNode;
import barfit.section.SectionShape;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads {@code lines:}: beam lines given by their geometry, supports and service loads. Lengths along the
 * line in m (ft), section and support sizes in mm (in), loads in kN/m and kN (kip/ft, kip).
 */
public final class LinesReader {
    static final String[] LINE_KEYS = {
        "id",
        "spans",
        "overhangs",
        "supports",
        "loads",
        "sustained_live",
        "section",
        "flange",
        "method",
        "redistribution",
        "max_depth",
        "forms",
        "perimeter",
        "stock_length"
    };

    /** Default unit weight of reinforced concrete: 24 kN/m³ (150 lb/ft³), common practice. */
    static final double UNIT_WEIGHT_SI = 24e3 / 1e9;

    static final double UNIT_WEIGHT_US_PCF = 150;

    /** A support's width along the line: 0 (a knife edge) to 5 m (200 in). */
    static final InputLimits.Range SUPPORT_WIDTH =
            new InputLimits.Range("a support width", Dim.LENGTH, 0, 5000, 0, 200, false);

    private LinesReader() {}

    /** The lines of a file, or an empty list when it has none. */
    public static List<LineInput> read(YFields doc, Settings settings) {
        return read(doc, settings, new String[0]);
    }

    /** As above, a line taking {@code extraKeys} besides its own (a checked line's bars), read by the caller. */
    static List<LineInput> read(YFields doc, Settings settings, String... extraKeys) {
        if (!doc.has("lines")) {
            return List.of();
        }
        UnitSystem u = settings.units();
        double unitWeight = unitWeight(doc, u);
        SectionReader sr = new SectionReader(settings);
        List<YFields> lines = doc.listOfMaps("lines", "beam lines");
        if (lines.isEmpty()) {
            throw doc.error("lines", "expected at least one line");
        }
        List<LineInput> out = new ArrayList<>();
        Map<String, Integer> ids = new HashMap<>();
        String[] allowed = java.util.Arrays.copyOf(LINE_KEYS, LINE_KEYS.length + extraKeys.length);
        System.arraycopy(extraKeys, 0, allowed, LINE_KEYS.length, extraKeys.length);
        for (YFields f : lines) {
            f.allowOnly(allowed);
            String id = f.text("id", "the line's name, e.g. L2-B");
            if (id.isBlank()) {
                throw f.error("id", "expected a name for the line, got an empty one");
            }
            Integer first = ids.putIfAbsent(id, f.location().line());
            if (first != null) {
                throw f.error(
                        "id",
                        "line id \"" + id + "\" is used twice (first at line " + first + "); expected unique ids");
            }
            out.add(line(f, id, settings, sr, u, unitWeight));
        }
        return out;
    }

    private static double unitWeight(YFields doc, UnitSystem u) {
        if (!doc.has("concrete")) {
            return u == UnitSystem.US ? pcf(UNIT_WEIGHT_US_PCF) : UNIT_WEIGHT_SI;
        }
        YFields c = doc.map("concrete", "the concrete");
        if (!c.has("density")) {
            return u == UnitSystem.US ? pcf(UNIT_WEIGHT_US_PCF) : UNIT_WEIGHT_SI;
        }
        String unit = u == UnitSystem.US ? "lb/ft³" : "kN/m³";
        double v = c.positive("density", "the unit weight of the concrete, " + unit);
        double lo = u == UnitSystem.US ? 60 : 10;
        double hi = u == UnitSystem.US ? 200 : 30;
        if (v < lo || v > hi) {
            throw c.error(
                    "density",
                    "expected the unit weight of reinforced concrete, " + lo + " to " + hi + " " + unit + ", got "
                            + SettingsReader.fmt(v));
        }
        return u == UnitSystem.US ? pcf(v) : v * 1e3 / 1e9;
    }

    /** lb/ft³ to N/mm³. */
    private static double pcf(double v) {
        return v * 4.4482216152605 / Math.pow(304.8, 3);
    }

    private static LineInput line(
            YFields f, String id, Settings settings, SectionReader sr, UnitSystem u, double unitWeight) {
        YList spanList = f.list("spans", "the spans centre to centre of supports, " + u.unit(Dim.SPAN));
        if (spanList.size() == 0) {
            throw f.error("spans", "expected at least one span");
        }
        List<Double> spans = new ArrayList<>();
        for (int i = 0; i < spanList.size(); i++) {
            YNode n = spanList.get(i);
            String path = f.child("spans") + "[" + (i + 1) + "]";
            double v = YFields.numberOf(n, path, "a span, " + u.unit(Dim.SPAN));
            YFields.requirePositive(n, path, v, "a span, " + u.unit(Dim.SPAN));
            String problem = InputLimits.SPAN.problem(u, v);
            if (problem != null) {
                throw new InputError(n.location(), path + ": " + problem);
            }
            spans.add(u.toSI(v, Dim.SPAN));
        }
        int n = spans.size();
        double ol = 0;
        double or = 0;
        if (f.has("overhangs")) {
            YFields o = f.map("overhangs", "the overhangs {left, right}").allowOnly("left", "right");
            ol = u.toSI(
                    o.optNumber("left", "the left overhang past the support's centre line, " + u.unit(Dim.SPAN))
                            .orElse(0.0),
                    Dim.SPAN);
            or = u.toSI(
                    o.optNumber("right", "the right overhang past the support's centre line, " + u.unit(Dim.SPAN))
                            .orElse(0.0),
                    Dim.SPAN);
            if (ol < 0) {
                throw o.error("left", "expected an overhang of zero or more");
            }
            if (or < 0) {
                throw o.error("right", "expected an overhang of zero or more");
            }
        }
        List<Support> supports = supports(f, n, sr, u);
        for (int side = 0; side < 2; side++) {
            double oh = side == 0 ? ol : or;
            Support s = supports.get(side == 0 ? 0 : n);
            if (oh > 0 && oh <= s.width() / 2) {
                throw f.error(
                        "overhangs",
                        "the " + (side == 0 ? "left" : "right") + " overhang ends inside its support ("
                                + sr.fmt(s.width() / 2, Dim.LENGTH)
                                + " from the centre line to the face); expected a longer"
                                + " overhang or none");
            }
        }
        for (int i = 0; i < n; i++) {
            double clear = spans.get(i)
                    - supports.get(i).width() / 2
                    - supports.get(i + 1).width() / 2;
            if (clear <= 0) {
                throw f.error(
                        "spans",
                        "span " + (i + 1) + " (" + sr.fmt(spans.get(i), Dim.SPAN) + ") is no longer than"
                                + " the half widths of its supports; expected spans centre to centre of supports, "
                                + u.unit(Dim.SPAN));
            }
        }
        YFields sec = f.map("section", "the section analysed: {width, height}").allowOnly("width", "height");
        double b = sr.length(sec, "width", "web width", InputLimits.WEB_WIDTH);
        double h = sr.length(sec, "height", "total height", InputLimits.HEIGHT);
        barfit.section.Flange flange = null;
        if (f.has("flange")) {
            // its effective width for the line's stiffness and weight: on the shortest span (the least width)
            double shortest =
                    spans.stream().mapToDouble(Double::doubleValue).min().orElseThrow();
            flange = sr.flange(
                    f.map("flange", "the flange: {width, thickness}"), b, new barfit.section.Span(shortest, null));
        }
        SectionShape shape = new SectionShape(b, h, flange);
        List<Load> loads = loads(f, spans, ol, or, u, sr);
        List<Torque> torques = TorqueReader.torques(f.map("loads", "the service loads"), spans.size(), u);
        double sus = f.optNumber("sustained_live", "the sustained part of the live load, 0 to 1")
                .orElse(0.0);
        if (sus < 0 || sus > 1) {
            throw f.error(
                    "sustained_live",
                    "expected the sustained part of the live load from 0 to 1, got " + SettingsReader.fmt(sus));
        }
        boolean coefficients = false;
        if (f.has("method")) {
            String m = f.text("method", "stiffness or coefficients");
            if (m.equals("coefficients")) {
                coefficients = true;
            } else if (!m.equals("stiffness")) {
                throw f.error(
                        "method",
                        "expected stiffness (the analysis) or coefficients (ACI 318-19 6.5), got \"" + m + "\"");
            }
        }
        List<Double> redistribution = redistribution(f, n, coefficients);
        Double cap = sr.optLength(f, "max_depth", "the headroom cap on the total height", InputLimits.HEIGHT)
                .orElse(null);
        boolean oneSection = true;
        if (f.has("forms")) {
            String forms = f.text("forms", "line or per-span");
            if (forms.equals("per-span")) {
                oneSection = false;
            } else if (!forms.equals("line")) {
                throw f.error(
                        "forms",
                        "expected line (one b × h for the whole line) or per-span (each span its own "
                                + "section), got \"" + forms + "\"");
            }
        }
        boolean perimeter = f.optBool("perimeter").orElse(false);
        Double stock = null;
        if (f.has("stock_length")) {
            // a stock bar: 3 m to 30 m (10 ft to 100 ft)
            double v = f.number("stock_length", "the stock bar length in " + u.unit(barfit.section.trail.Dim.SPAN));
            double mm = u.toSI(v, barfit.section.trail.Dim.SPAN);
            if (!(mm >= 3000 - 1e-6 && mm <= 30000 + 1e-6)) {
                throw f.error("stock_length", "expected a stock bar length of 3 to 30 m (10 to 100 ft), got " + v);
            }
            stock = mm;
        }
        return new LineInput(
                id,
                f.location(),
                spans,
                ol,
                or,
                supports,
                loads,
                shape,
                sus,
                coefficients,
                redistribution,
                unitWeight,
                cap,
                oneSection,
                perimeter,
                stock,
                torques);
    }

    private static List<Support> supports(YFields f, int spans, SectionReader sr, UnitSystem u) {
        List<YFields> items = f.listOfMaps("supports", "supports {width, kind, below, above}");
        if (items.size() != 1 && items.size() != spans + 1) {
            throw f.error(
                    "supports",
                    spans + " span" + (spans == 1 ? "" : "s") + " need " + (spans + 1) + " supports, got "
                            + items.size() + "; expected one per support, left to right, or one for all");
        }
        List<Support> out = new ArrayList<>();
        for (int j = 0; j <= spans; j++) {
            YFields s = items.get(items.size() == 1 ? 0 : j);
            out.add(support(s, sr, u));
        }
        return out;
    }

    private static Support support(YFields s, SectionReader sr, UnitSystem u) {
        s.allowOnly("width", "kind", "below", "above");
        double width = s.has("width") ? sr.length(s, "width", "the support's width along the line", SUPPORT_WIDTH) : 0;
        Column below = s.has("below") ? column(s.map("below", "the column below {b, h, height}"), sr, u) : null;
        Column above = s.has("above") ? column(s.map("above", "the column above {b, h, height}"), sr, u) : null;
        SupportKind kind;
        if (s.has("kind")) {
            String k = s.text("kind", "column, knife-edge, wall or fixed");
            kind = switch (k) {
                case "column" -> SupportKind.COLUMN;
                case "knife-edge" -> SupportKind.KNIFE_EDGE;
                case "wall" -> SupportKind.WALL;
                case "fixed" -> SupportKind.FIXED;
                default -> throw s.error("kind", "expected column, knife-edge, wall or fixed, got \"" + k + "\"");
            };
        } else if (below != null || above != null) {
            kind = SupportKind.COLUMN;
        } else {
            throw new InputError(
                    s.location(),
                    s.path() + ": expected kind: knife-edge | wall | fixed, or the columns"
                            + " below: {b, h, height} and/or above: {...}");
        }
        if (kind == SupportKind.COLUMN && below == null && above == null) {
            throw s.error("kind", "a column support needs below: {b, h, height} and/or above: {b, h, height}");
        }
        if (kind != SupportKind.COLUMN && (below != null || above != null)) {
            throw s.error(
                    below != null ? "below" : "above",
                    "columns belong to kind: column; expected no columns on a " + kind.word() + " support");
        }
        return new Support(width, kind, below, above);
    }

    private static Column column(YFields c, SectionReader sr, UnitSystem u) {
        c.allowOnly("b", "h", "height");
        double b = sr.length(c, "b", "the column's width across the line", InputLimits.WEB_WIDTH);
        double h = sr.length(c, "h", "the column's depth along the line", InputLimits.HEIGHT);
        if (!c.has("height")) {
            throw new InputError(
                    c.location(),
                    c.path() + ": missing key 'height'; expected the storey height of the " + "column, "
                            + u.unit(Dim.SPAN));
        }
        double height = u.toSI(c.positive("height", "the column's storey height, " + u.unit(Dim.SPAN)), Dim.SPAN);
        return new Column(b, h, height);
    }

    private static List<Load> loads(
            YFields f, List<Double> spans, double ol, double or, UnitSystem u, SectionReader sr) {
        int n = spans.size();
        List<Load> out = new ArrayList<>();
        if (!f.has("loads")) {
            throw new InputError(
                    f.location(),
                    f.path() + ": missing key 'loads'; expected the service loads {dead, live}" + " in "
                            + u.unit(Dim.LINE_LOAD) + " (the web's own weight is added by barfit)");
        }
        YFields l = f.map("loads", "the service loads {dead, live, spans, overhangs, points, partial, torque}")
                .allowOnly("dead", "live", "spans", "overhangs", "points", "partial", "torque");
        String lineLoad = u.unit(Dim.LINE_LOAD);
        double dead = u.toSI(
                l.has("dead")
                        ? InputLimits.require(
                                l,
                                "dead",
                                InputLimits.LINE_LOAD,
                                u,
                                l.nonNegative("dead", "superimposed dead load, " + lineLoad))
                        : 0,
                Dim.LINE_LOAD);
        double live = u.toSI(
                l.has("live")
                        ? InputLimits.require(
                                l, "live", InputLimits.LINE_LOAD, u, l.nonNegative("live", "live load, " + lineLoad))
                        : 0,
                Dim.LINE_LOAD);
        double[] d = new double[n + 2];
        double[] lv = new double[n + 2];
        java.util.Arrays.fill(d, dead);
        java.util.Arrays.fill(lv, live);
        if (l.has("spans")) {
            for (YFields s : l.listOfMaps("spans", "loads of one span {span, dead, live}")) {
                s.allowOnly("span", "dead", "live");
                int i = spanIndex(s, n);
                if (s.has("dead")) {
                    d[i] = u.toSI(s.nonNegative("dead", "superimposed dead load, " + lineLoad), Dim.LINE_LOAD);
                }
                if (s.has("live")) {
                    lv[i] = u.toSI(s.nonNegative("live", "live load, " + lineLoad), Dim.LINE_LOAD);
                }
            }
        }
        if (l.has("overhangs")) {
            YFields o = l.map("overhangs", "loads of the overhangs {left: {dead, live}, right: {dead, live}}")
                    .allowOnly("left", "right");
            for (String side : new String[] {"left", "right"}) {
                if (!o.has(side)) {
                    continue;
                }
                YFields x = o.map(side, "the " + side + " overhang's loads {dead, live}")
                        .allowOnly("dead", "live");
                int i = side.equals("left") ? 0 : n + 1;
                if ((i == 0 ? ol : or) == 0) {
                    throw o.error(
                            side,
                            "the line has no " + side + " overhang; expected loads only on overhangs given "
                                    + "under overhangs:");
                }
                if (x.has("dead")) {
                    d[i] = u.toSI(x.nonNegative("dead", "superimposed dead load, " + lineLoad), Dim.LINE_LOAD);
                }
                if (x.has("live")) {
                    lv[i] = u.toSI(x.nonNegative("live", "live load, " + lineLoad), Dim.LINE_LOAD);
                }
            }
        }
        for (int s = 0; s <= n + 1; s++) {
            double len = s == 0 ? ol : s == n + 1 ? or : spans.get(s - 1);
            if (len > 0 && (d[s] > 0 || lv[s] > 0)) {
                out.add(Load.uniform(s, 0, len, d[s], lv[s]));
            }
        }
        String force = u.unit(Dim.FORCE);
        if (l.has("points")) {
            for (YFields p : l.listOfMaps("points", "point loads {span, at, dead, live}")) {
                p.allowOnly("span", "at", "dead", "live");
                int i = spanIndex(p, n);
                double len = spans.get(i - 1);
                double at = u.toSI(
                        p.nonNegative(
                                "at", "the distance from the span's left support centre line, " + u.unit(Dim.SPAN)),
                        Dim.SPAN);
                if (at > len) {
                    throw p.error(
                            "at",
                            "the point load is at " + sr.fmt(at, Dim.SPAN) + " in a span of " + sr.fmt(len, Dim.SPAN)
                                    + "; expected a distance within the span");
                }
                double pd = u.toSI(p.has("dead") ? p.nonNegative("dead", "its dead part, " + force) : 0, Dim.FORCE);
                double pl = u.toSI(p.has("live") ? p.nonNegative("live", "its live part, " + force) : 0, Dim.FORCE);
                out.add(Load.point(i, at, pd, pl));
            }
        }
        if (l.has("partial")) {
            for (YFields p : l.listOfMaps("partial", "partial loads {span, from, to, dead, live}")) {
                p.allowOnly("span", "from", "to", "dead", "live");
                int i = spanIndex(p, n);
                double len = spans.get(i - 1);
                double a = u.toSI(
                        p.nonNegative(
                                "from",
                                "where it starts, from the span's left support centre line, " + u.unit(Dim.SPAN)),
                        Dim.SPAN);
                double b = u.toSI(p.nonNegative("to", "where it ends, " + u.unit(Dim.SPAN)), Dim.SPAN);
                if (b <= a) {
                    throw p.error("to", "the load ends at or before it starts; expected to > from");
                }
                if (b > len) {
                    throw p.error(
                            "to",
                            "the load runs to " + sr.fmt(b, Dim.SPAN) + " in a span of " + sr.fmt(len, Dim.SPAN)
                                    + "; expected it within the span");
                }
                double pd =
                        u.toSI(p.has("dead") ? p.nonNegative("dead", "its dead part, " + lineLoad) : 0, Dim.LINE_LOAD);
                double pl =
                        u.toSI(p.has("live") ? p.nonNegative("live", "its live part, " + lineLoad) : 0, Dim.LINE_LOAD);
                out.add(Load.uniform(i, a, b, pd, pl));
            }
        }
        return out;
    }

    static int spanIndex(YFields s, int n) {
        if (!s.has("span")) {
            throw new InputError(
                    s.location(), s.path() + ": missing key 'span'; expected the span it is on, 1 to " + n);
        }
        double v = s.number("span", "the span it is on, 1 to " + n);
        if (v != Math.rint(v) || v < 1 || v > n) {
            throw s.error("span", "there is no span " + SettingsReader.fmt(v) + " on this line; expected 1 to " + n);
        }
        return (int) v;
    }

    private static List<Double> redistribution(YFields f, int n, boolean coefficients) {
        List<Double> out = new ArrayList<>();
        for (int j = 0; j <= n; j++) {
            out.add(0.0);
        }
        if (!f.has("redistribution")) {
            return out;
        }
        if (coefficients) {
            throw f.error(
                    "redistribution",
                    "6.6.5.1 does not allow redistributing moments from the 6.5 coefficients;"
                            + " expected method: stiffness with redistribution");
        }
        YNode node = f.node("redistribution");
        if (node instanceof YList list) {
            if (list.size() != n + 1) {
                throw f.error(
                        "redistribution", "expected one percentage per support (" + (n + 1) + "), got " + list.size());
            }
            for (int j = 0; j <= n; j++) {
                String path = f.child("redistribution") + "[" + (j + 1) + "]";
                double v = YFields.numberOf(list.get(j), path, "a percentage, 0 to 20");
                check(list.get(j), path, v);
                out.set(j, v);
            }
        } else {
            double v = f.number("redistribution", "a percentage for every interior support, 0 to 20");
            check(node, f.child("redistribution"), v);
            for (int j = 1; j < n; j++) {
                out.set(j, v);
            }
        }
        return out;
    }

    private static void check(YNode node, String path, double v) {
        if (v < 0 || v > 20) {
            throw new InputError(
                    node.location(),
                    path + ": expected a percentage from 0 to 20 (6.6.5.3: at most"
                            + " 1000 εt percent and 20 percent), got " + SettingsReader.fmt(v));
        }
    }
}
