package barfit.report;

import barfit.catalogs.BarSize;
import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.schedule.ScheduleResult;
import barfit.section.CheckReport;
import barfit.section.Stirrups;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * The rows of a schedule, built here once for the text, CSV and HTML schedules: each beam's bars, top bars
 * at the supports, stirrup zones and strengths as data (lengths in mm, moments in N·mm). The text and CSV
 * word them with the phrases below; the HTML report words the same rows its own way.
 */
public final class ScheduleRows {
    private ScheduleRows() {}

    /**
     * One beam's row. Where the beam has no design, {@code design} and everything drawn from it are null
     * (and {@code zones} and {@code strengths} empty).
     *
     * @param top            the top bars of the schedule's "top continuous" column: a cantilever's per layer
     *                       ("3+2 No. 25"), else the continuous count ("2 No. 25")
     * @param topPastSupport a cantilever's top bars' run past the support face (mm); NaN for other spans
     * @param left           the top bars at the left support, null where the span has no continuous support there
     * @param right          the same at the right support
     * @param strengths      phi Mn and Mu at each section the span has, in the design's order
     */
    public record Row(
            ScheduleResult.Beam entry,
            SpanProblem problem,
            SpanDesigner.Design design,
            SpanLayout layout,
            String bottom,
            String top,
            double topPastSupport,
            SupportTop left,
            SupportTop right,
            List<ZoneStirrups> zones,
            List<Strength> strengths) {
        public boolean feasible() {
            return design != null;
        }

        public boolean cantilever() {
            return problem.cantilever();
        }
    }

    /** Top bars at a continuous support: per layer, with {@code extra} of them run {@code extension} (mm) past the face. */
    public record SupportTop(String bars, int extra, double extension) {}

    /** A stirrup zone: its name, its extent from the left face (mm) and its stirrups. */
    public record ZoneStirrups(String name, double from, double to, Stirrups stirrups) {}

    /** phi Mn and |Mu| (N·mm) at a section of the span. */
    public record Strength(SpanProblem.Place place, double phiMn, double mu) {}

    public static List<Row> rows(ScheduleResult r) {
        List<Row> out = new ArrayList<>();
        for (ScheduleResult.Beam b : r.beams()) {
            out.add(row(b));
        }
        return out;
    }

    public static Row row(ScheduleResult.Beam b) {
        return row(b, b.outcome(), b.outcome().best());
    }

    /** The row of a span's design outside a schedule (a frontier's point): {@code entry} is null. */
    public static Row row(SpanDesigner.Outcome o, SpanDesigner.Design d) {
        return row(null, o, d);
    }

    private static Row row(ScheduleResult.Beam b, SpanDesigner.Outcome o, SpanDesigner.Design d) {
        SpanProblem p = o.problem();
        if (d == null) {
            return new Row(b, p, null, null, null, null, Double.NaN, null, null, List.of(), List.of());
        }
        SpanLayout l = d.layout();
        String top = p.cantilever()
                ? bars(l.topLeft(), l.top())
                : l.topContinuous() + " " + l.top().label();
        double past = p.cantilever() ? l.extLeft() - p.span() : Double.NaN;
        List<ZoneStirrups> zones = new ArrayList<>();
        for (int i = 0; i < p.zones().size(); i++) {
            SpanProblem.Zone z = p.zones().get(i);
            zones.add(new ZoneStirrups(
                    z.name(), z.from(), z.to(), l.zoneStirrups().get(i)));
        }
        List<Strength> strengths = new ArrayList<>();
        for (Map.Entry<SpanProblem.Place, CheckReport> e : d.report().sections().entrySet()) {
            strengths.add(new Strength(
                    e.getKey(),
                    e.getValue().flexure().phiMn(),
                    Math.abs(e.getValue().demand().mu())));
        }
        return new Row(
                b,
                p,
                d,
                l,
                bars(l.bottomCounts(), l.bottom()),
                top,
                past,
                supportTop(p, l, SpanProblem.Place.LEFT),
                supportTop(p, l, SpanProblem.Place.RIGHT),
                zones,
                strengths);
    }

    private static SupportTop supportTop(SpanProblem p, SpanLayout l, SpanProblem.Place place) {
        if (p.cantilever() || !(place == SpanProblem.Place.LEFT ? p.leftSupport() : p.rightSupport())) {
            return null;
        }
        List<Integer> counts = place == SpanProblem.Place.LEFT ? l.topLeft() : l.topRight();
        return new SupportTop(
                bars(counts, l.top()),
                SpanLayout.sum(counts) - l.topContinuous(),
                place == SpanProblem.Place.LEFT ? l.extLeft() : l.extRight());
    }

    /** "3+2 No. 25": bars per layer from the face, and the size. */
    public static String bars(List<Integer> counts, BarSize bar) {
        StringBuilder sb = new StringBuilder();
        for (int c : counts) {
            sb.append(sb.length() == 0 ? "" : "+").append(c);
        }
        return sb + " " + bar.label();
    }

    // ---------------------------------------------------------------- the text's and the CSV's words

    public static String size(Row row, UnitSystem u) {
        return u.compact(row.layout().width(), Dim.LENGTH) + " × "
                + u.compact(row.layout().height(), Dim.LENGTH);
    }

    public static String topContinuous(Row row, UnitSystem u) {
        return row.cantilever()
                ? row.top() + " (full length + " + u.withUnit(row.topPastSupport(), Dim.SPAN) + " past the support)"
                : row.top();
    }

    /** As {@link #topContinuous}, shorter for the terminal. */
    public static String topContinuousShort(Row row, UnitSystem u) {
        return row.cantilever()
                ? row.top() + " (+ " + u.withUnit(row.topPastSupport(), Dim.SPAN) + " past support)"
                : row.top();
    }

    /** Top bars at a continuous support with the extension of the extra bars, or "" where there is none. */
    public static String topAt(SupportTop at, UnitSystem u) {
        if (at == null) {
            return "";
        }
        return at.bars()
                + (at.extra() > 0 ? " (" + at.extra() + " extra × " + u.withUnit(at.extension(), Dim.SPAN) + ")" : "");
    }

    /**
     * "left 0.000–2.400 m: No. 10 × 2 legs @ 150 mm; middle 2.400–7.200 m: ...": zone ends from the left face
     * with the span's fixed decimals and unit, spacing with its unit.
     */
    public static String stirrups(Row row, UnitSystem u) {
        List<String> parts = new ArrayList<>();
        for (ZoneStirrups z : row.zones()) {
            parts.add(z.name() + " " + range(z.from(), z.to(), u) + ": " + Words.stirrups(z.stirrups(), u));
        }
        return String.join("; ", parts);
    }

    /**
     * The zones condensed for the terminal: neighbouring zones with the same stirrups merged, "0.000–1.988 m:
     * No. 10 × 2 legs @ 150 mm; 1.988–7.950 m: ...", or "No. 10 × 2 legs @ 200 mm over the whole span".
     */
    public static String stirrupsShort(Row row, UnitSystem u) {
        List<ZoneStirrups> zones = row.zones();
        List<String> parts = new ArrayList<>();
        int i = 0;
        while (i < zones.size()) {
            Stirrups s = zones.get(i).stirrups();
            int j = i;
            while (j + 1 < zones.size() && zones.get(j + 1).stirrups().equals(s)) {
                j++;
            }
            if (i == 0 && j == zones.size() - 1) {
                return Words.stirrups(s, u) + " over the whole " + (row.cantilever() ? "length" : "span");
            }
            parts.add(range(zones.get(i).from(), zones.get(j).to(), u) + ": " + Words.stirrups(s, u));
            i = j + 1;
        }
        return String.join("; ", parts);
    }

    private static String range(double from, double to, UnitSystem u) {
        return u.number(from, Dim.SPAN) + "–" + u.number(to, Dim.SPAN) + " " + u.unit(Dim.SPAN);
    }

    /** phi Mn and Mu (absolute, user units) at a place, or null where the span has no such section. */
    public static double[] strength(Row row, SpanProblem.Place place, UnitSystem u) {
        for (Strength s : row.strengths()) {
            if (s.place() == place) {
                return new double[] {u.fromSI(s.phiMn(), Dim.MOMENT), u.fromSI(s.mu(), Dim.MOMENT)};
            }
        }
        return null;
    }

    /** "B2-07/B1: 5 No. 25 × 7.20 m" for every bar mark of the beam. */
    public static List<String> marks(String id, SpanDesigner.Design d, UnitSystem u) {
        List<String> out = new ArrayList<>();
        for (SpanLayout.BarMark m : d.bars()) {
            out.add(id + "/" + m.mark() + ": " + m.count() + " " + m.bar().label() + " × "
                    + u.withUnit(m.length(), Dim.SPAN));
        }
        return out;
    }

    /** "left", "mid", "right". */
    public static String place(SpanProblem.Place p) {
        return switch (p) {
            case LEFT -> "left";
            case MID -> "mid";
            case RIGHT -> "right";
        };
    }
}
