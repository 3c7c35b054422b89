package barfit.report;

import barfit.design.beam.BeamDesigner;
import barfit.design.beam.BeamLayout;
import barfit.design.beam.BeamProblem;
import barfit.section.CheckReport;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/** The words of one schedule row, shared by the text, CSV and HTML schedules. */
public final class ScheduleRows {
    private ScheduleRows() {
    }

    /** "3+2 No. 25": bars per layer from the face, and the size. */
    public static String bars(List<Integer> counts, barfit.catalogs.BarSize bar) {
        StringBuilder sb = new StringBuilder();
        for (int c : counts) {
            sb.append(sb.length() == 0 ? "" : "+").append(c);
        }
        return sb + " " + bar.label();
    }

    public static String size(BeamLayout l, UnitSystem u) {
        return u.compact(l.width(), Dim.LENGTH) + " × " + u.compact(l.height(), Dim.LENGTH);
    }

    public static String bottom(BeamLayout l) {
        return bars(l.bottomCounts(), l.bottom());
    }

    public static String topContinuous(BeamProblem p, BeamLayout l, UnitSystem u) {
        return p.cantilever() ? bars(l.topLeft(), l.top()) + " (full length + " + u.withUnit(l.extLeft() - p.span(),
                Dim.SPAN) + " past the support)" : l.topContinuous() + " " + l.top().label();
    }

    /** As {@link #topContinuous}, shorter for the terminal. */
    public static String topContinuousShort(BeamProblem p, BeamLayout l, UnitSystem u) {
        return p.cantilever() ? bars(l.topLeft(), l.top()) + " (+ " + u.withUnit(l.extLeft() - p.span(), Dim.SPAN)
                + " past support)" : l.topContinuous() + " " + l.top().label();
    }

    /** Top bars at a continuous support with the extension of the extra bars, or "" where there is none. */
    public static String topAt(BeamProblem p, BeamLayout l, BeamProblem.Place place, UnitSystem u) {
        if (p.cantilever() || !(place == BeamProblem.Place.LEFT ? p.leftSupport() : p.rightSupport())) {
            return "";
        }
        List<Integer> counts = place == BeamProblem.Place.LEFT ? l.topLeft() : l.topRight();
        int extra = BeamLayout.sum(counts) - l.topContinuous();
        double ext = place == BeamProblem.Place.LEFT ? l.extLeft() : l.extRight();
        return bars(counts, l.top()) + (extra > 0 ? " (" + extra + " extra × " + u.withUnit(ext, Dim.SPAN) + ")" : "");
    }

    /**
     * "left 0.000–2.400 m: No. 10 × 2 legs @ 150 mm; middle 2.400–7.200 m: ...": zone ends from the left face
     * with the span's fixed decimals and unit, spacing with its unit.
     */
    public static String stirrups(BeamProblem p, BeamLayout l, UnitSystem u) {
        List<String> parts = new ArrayList<>();
        List<BeamProblem.Zone> zones = p.zones();
        for (int i = 0; i < zones.size(); i++) {
            var s = l.zoneStirrups().get(i);
            parts.add(zones.get(i).name() + " " + range(zones.get(i).from(), zones.get(i).to(), u) + ": "
                    + stirrup(s, u));
        }
        return String.join("; ", parts);
    }

    /**
     * The zones condensed for the terminal: neighbouring zones with the same stirrups merged, "0.000–1.988 m:
     * No. 10 × 2 legs @ 150 mm; 1.988–7.950 m: ...", or "No. 10 × 2 legs @ 200 mm over the whole span".
     */
    public static String stirrupsShort(BeamProblem p, BeamLayout l, UnitSystem u) {
        List<BeamProblem.Zone> zones = p.zones();
        List<String> parts = new ArrayList<>();
        int i = 0;
        while (i < zones.size()) {
            var s = l.zoneStirrups().get(i);
            int j = i;
            while (j + 1 < zones.size() && l.zoneStirrups().get(j + 1).equals(s)) {
                j++;
            }
            if (i == 0 && j == zones.size() - 1) {
                return stirrup(s, u) + " over the whole " + (p.cantilever() ? "length" : "span");
            }
            parts.add(range(zones.get(i).from(), zones.get(j).to(), u) + ": " + stirrup(s, u));
            i = j + 1;
        }
        return String.join("; ", parts);
    }

    private static String range(double from, double to, UnitSystem u) {
        return u.number(from, Dim.SPAN) + "–" + u.number(to, Dim.SPAN) + " " + u.unit(Dim.SPAN);
    }

    private static String stirrup(barfit.section.Stirrups s, UnitSystem u) {
        return Words.stirrups(s, u);
    }

    /** phi Mn and Mu (absolute, user units) at a place, or null where the span has no such section. */
    public static double[] strength(BeamDesigner.Design d, BeamProblem.Place place, UnitSystem u) {
        CheckReport r = d.report().sections().get(place);
        if (r == null) {
            return null;
        }
        return new double[] {u.fromSI(r.flexure().phiMn(), Dim.MOMENT), u.fromSI(Math.abs(r.demand().mu()), Dim.MOMENT)};
    }

    /** "B2-07/B1: 5 No. 25 × 7.20 m" for every bar mark of the beam. */
    public static List<String> marks(String id, BeamDesigner.Design d, UnitSystem u) {
        List<String> out = new ArrayList<>();
        for (BeamLayout.BarMark m : d.bars()) {
            out.add(id + "/" + m.mark() + ": " + m.count() + " " + m.bar().label() + " × " + u.withUnit(m.length(), Dim.SPAN));
        }
        return out;
    }

    public static String place(BeamProblem.Place p) {
        return switch (p) {
            case LEFT -> "left";
            case MID -> "mid";
            case RIGHT -> "right";
        };
    }

    static Map<BeamProblem.Place, CheckReport> sections(BeamDesigner.Design d) {
        return d.report().sections();
    }
}
