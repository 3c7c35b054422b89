package barfit.input;

import barfit.catalogs.BarSize;
import barfit.catalogs.Echo;
import barfit.catalogs.InputError;
import barfit.catalogs.yaml.YFields;
import barfit.catalogs.yaml.YList;
import barfit.catalogs.yaml.YNode;
import barfit.section.Stirrups;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads a checked line's {@code bars:}: {@code hangers: {bar, count}}, {@code ends: {left, right}} (straight,
 * hook-90, hook-180), {@code spans:} one per span ({@code bottom: {bar, count, left, right}}, {@code
 * stirrups:} one set or a list of sets with their {@code length}) and {@code supports:} one per support
 * ({@code {bar, count, left, right}} or {@code {}}). Reaches in m (ft) from the support centre lines; a count
 * is a number or a list per layer from the face.
 */
final class LineBarsReader {
    private final SectionReader sr;
    private final UnitSystem u;
    private final Settings settings;

    LineBarsReader(Settings settings) {
        this.settings = settings;
        this.sr = new SectionReader(settings);
        this.u = settings.units();
    }

    LineBars read(YFields line, LineInput in) {
        if (!line.has("bars")) {
            throw new InputError(
                    line.location(),
                    line.path() + ": missing key 'bars'; expected the bars as built {hangers, spans, supports, ends}");
        }
        YFields f = line.map("bars", "the bars as built {hangers, spans, supports, ends}")
                .allowOnly("hangers", "spans", "supports", "ends");
        if (in.overhangLeft() > 0 || in.overhangRight() > 0) {
            throw line.error("overhangs", "check takes lines without overhangs; expected no overhangs key");
        }
        if (in.coefficients()) {
            throw line.error(
                    "method", "check needs the analysis' envelope for the cut-off points; expected method: stiffness");
        }
        if (!in.oneSection()) {
            throw line.error("forms", "a checked line has its one section throughout; expected forms: line");
        }
        int n = in.spans().size();
        if (!f.has("hangers")) {
            throw new InputError(
                    f.location(), f.path() + ": missing key 'hangers'; expected the continuous top bars {bar, count}");
        }
        YFields h = f.map("hangers", "the continuous top bars {bar, count}").allowOnly("bar", "count");
        LineBars.Group hangers = group(h);
        List<Double> x = supportX(in);
        double endLeft = -in.supports().get(0).width() / 2;
        double endRight = x.get(n) + in.supports().get(n).width() / 2;
        List<YFields> spans = f.listOfMaps("spans", "one entry per span {bottom, stirrups}");
        if (spans.size() != n) {
            throw f.error(
                    "spans",
                    "the line has " + n + " span" + (n == 1 ? "" : "s") + ", got " + spans.size()
                            + "; expected one entry per span, left to right");
        }
        List<LineBars.SpanBars> spanBars = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            YFields s = spans.get(i).allowOnly("bottom", "stirrups");
            if (!s.has("bottom")) {
                throw new InputError(
                        s.location(), s.path() + ": missing key 'bottom'; expected {bar, count, left, right}");
            }
            YFields b = s.map("bottom", "the span's bottom bars {bar, count, left, right}")
                    .allowOnly("bar", "count", "left", "right");
            LineBars.Group bottom = group(b);
            // past the centre line of the span's left (right) support: into the span before (after) it
            Double pastLeft =
                    reach(b, "left", i == 0 ? x.get(0) - endLeft : in.spans().get(i - 1), i == 0, true);
            Double pastRight = reach(
                    b, "right", i == n - 1 ? endRight - x.get(n) : in.spans().get(i + 1), i == n - 1, true);
            spanBars.add(new LineBars.SpanBars(
                    bottom, pastLeft, pastRight, stirrups(s, in.spans().get(i))));
        }
        List<YFields> supports = f.listOfMaps("supports", "one entry per support {bar, count, left, right} or {}");
        if (supports.size() != n + 1) {
            throw f.error(
                    "supports",
                    "the line has " + (n + 1) + " supports, got " + supports.size()
                            + "; expected one entry per support, left to right ({} where no extra top bars)");
        }
        List<LineBars.SupportTop> tops = new ArrayList<>();
        for (int j = 0; j <= n; j++) {
            YFields s = supports.get(j).allowOnly("bar", "count", "left", "right");
            if (!s.has("bar") && !s.has("count") && !s.has("left") && !s.has("right")) {
                tops.add(null);
                continue;
            }
            LineBars.Group g = group(s);
            if (!g.bar().equals(hangers.bar())) {
                throw s.error(
                        "bar",
                        "the extra top bars are " + g.bar().label() + " and the hangers "
                                + hangers.bar().label() + "; expected one top bar size along the line");
            }
            Double left =
                    reach(s, "left", j == 0 ? x.get(0) - endLeft : in.spans().get(j - 1), j == 0, false);
            Double right =
                    reach(s, "right", j == n ? endRight - x.get(n) : in.spans().get(j), j == n, false);
            tops.add(new LineBars.SupportTop(g, left, right));
        }
        LineBars.End left = LineBars.End.STRAIGHT;
        LineBars.End right = LineBars.End.STRAIGHT;
        if (f.has("ends")) {
            YFields e = f.map("ends", "the anchorage at each end {left, right}").allowOnly("left", "right");
            left = e.has("left") ? end(e, "left") : left;
            right = e.has("right") ? end(e, "right") : right;
        }
        if (left.hooked() && right.hooked() && left != right) {
            throw f.error(
                    "ends",
                    "expected the same standard hook at both ends (hook-90 or hook-180), got " + left.key() + " and "
                            + right.key());
        }
        return new LineBars(f.location(), hangers, spanBars, tops, left, right);
    }

    private LineBars.Group group(YFields g) {
        BarSize bar = sr.bar(g, "bar");
        if (!g.has("count")) {
            throw new InputError(
                    g.location(), g.path() + ": missing key 'count'; expected a number of bars, or one per layer");
        }
        List<Integer> layers = new ArrayList<>();
        YNode node = g.node("count");
        if (node instanceof YList list) {
            if (list.size() == 0) {
                throw g.error("count", "expected one count per layer, got none");
            }
            for (int i = 0; i < list.size(); i++) {
                layers.add(count(list.get(i), g.child("count") + "[" + (i + 1) + "]"));
            }
        } else {
            layers.add(count(node, g.child("count")));
        }
        return new LineBars.Group(bar, layers);
    }

    private static int count(YNode n, String path) {
        double v = YFields.numberOf(n, path, "a number of bars");
        if (v != Math.rint(v) || v < 1 || v > 100) {
            throw new InputError(
                    n.location(), path + ": expected a whole number of bars, 1 to 100, got " + SettingsReader.fmt(v));
        }
        return (int) v;
    }

    /**
     * A reach from a support's centre line, mm: null where omitted at the line's end (the bars run to the end
     * cover); required elsewhere. No longer than {@code room} (the span beside, or the concrete to the
     * line's end); a bottom bar may stop short of the centre line (negative).
     */
    private Double reach(YFields f, String key, double room, boolean atEnd, boolean bottom) {
        String what = (bottom
                        ? "how far the bars run past the support's centre line, "
                        : "how far the bars reach from the support's centre line, ")
                + u.unit(Dim.SPAN);
        if (!f.has(key)) {
            if (atEnd) {
                return null;
            }
            throw new InputError(f.location(), f.path() + ": missing key '" + key + "'; expected " + what);
        }
        double v = u.toSI(f.number(key, what), Dim.SPAN);
        if (!bottom && v < 0) {
            throw f.error(key, "expected a reach of zero or more, got " + sr.fmt(v, Dim.SPAN));
        }
        if (v > room + 1e-6) {
            throw f.error(
                    key,
                    "the bars reach " + sr.fmt(v, Dim.SPAN)
                            + (atEnd ? ", past the end of the line " : ", beyond the span ")
                            + "(" + sr.fmt(room, Dim.SPAN) + " from the centre line); expected at most that"
                            + (atEnd ? ", or no " + key + " key for bars run to the end" : ""));
        }
        if (bottom && v < -room / 2) {
            throw f.error(
                    key,
                    "the bars stop " + sr.fmt(-v, Dim.SPAN) + " short of the centre line; expected them "
                            + "to reach the support");
        }
        return v;
    }

    /** One set of stirrups for the span, or sets from the left face with their lengths. */
    private List<LineBars.StirrupSet> stirrups(YFields s, double span) {
        if (!s.has("stirrups")) {
            throw new InputError(
                    s.location(),
                    s.path() + ": missing key 'stirrups'; expected {bar, legs, spacing} or a list of sets");
        }
        List<LineBars.StirrupSet> out = new ArrayList<>();
        if (!(s.node("stirrups") instanceof YList)) {
            out.add(new LineBars.StirrupSet(
                    sr.stirrups(s.map("stirrups", "the span's stirrups {bar, legs, spacing}")), Double.NaN));
            return out;
        }
        List<YFields> sets = s.listOfMaps("stirrups", "sets of stirrups {bar, legs, spacing, length}");
        if (sets.isEmpty()) {
            throw s.error("stirrups", "expected at least one set of stirrups");
        }
        double along = 0;
        BarSize bar = null;
        for (int i = 0; i < sets.size(); i++) {
            YFields set = sets.get(i).allowOnly("bar", "legs", "spacing", "length");
            double length = Double.NaN;
            boolean last = i == sets.size() - 1;
            if (set.has("length") && last) {
                throw set.error("length", "the last set runs to the right face; expected no length on it");
            }
            if (set.has("length")) {
                length = u.toSI(set.positive("length", "the length the set runs, " + u.unit(Dim.SPAN)), Dim.SPAN);
                along += length;
                if (along > span + 1e-6) {
                    throw set.error(
                            "length",
                            "the sets run " + sr.fmt(along, Dim.SPAN) + ", past the span (" + sr.fmt(span, Dim.SPAN)
                                    + "); expected shorter sets");
                }
            } else if (!last) {
                throw new InputError(
                        set.location(),
                        set.path() + ": missing key 'length'; expected the length the set runs, " + u.unit(Dim.SPAN)
                                + " (only the last set runs to the right face)");
            }
            Stirrups stirrups = stirrupsOf(set);
            if (bar != null && !bar.equals(stirrups.bar())) {
                throw set.error(
                        "bar",
                        "expected one stirrup bar size per span, got "
                                + stirrups.bar().label() + " after " + bar.label());
            }
            bar = stirrups.bar();
            out.add(new LineBars.StirrupSet(stirrups, length));
        }
        return out;
    }

    private Stirrups stirrupsOf(YFields set) {
        BarSize bar = set.has("bar") ? sr.bar(set, "bar") : settings.stirrupBar();
        int legs = set.has("legs") ? set.positiveInt("legs", "number of vertical legs, 2 or more") : 2;
        if (legs < 2 || legs > InputLimits.MAX_LEGS) {
            throw set.error("legs", "expected 2 to " + InputLimits.MAX_LEGS + " legs, got " + legs);
        }
        double spacing = sr.length(set, "spacing", "stirrup spacing along the beam", InputLimits.STIRRUP_SPACING);
        return new Stirrups(bar, legs, spacing);
    }

    private static LineBars.End end(YFields e, String key) {
        String v = e.text(key, "straight, hook-90 or hook-180");
        for (LineBars.End end : LineBars.End.values()) {
            if (end.key().equals(v)) {
                return end;
            }
        }
        throw e.error(key, "expected straight, hook-90 or hook-180, got \"" + Echo.cut(v) + "\"");
    }

    /** x of each support's centre line from the first's, mm. */
    private static List<Double> supportX(LineInput in) {
        List<Double> out = new ArrayList<>();
        double x = 0;
        out.add(x);
        for (double s : in.spans()) {
            x += s;
            out.add(x);
        }
        return out;
    }
}
