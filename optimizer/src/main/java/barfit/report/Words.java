package barfit.report;

import barfit.design.Binding;
import barfit.design.Proof;
import barfit.design.span.Extension;
import barfit.design.span.SpanLayout;
import barfit.section.BarLayer;
import barfit.section.CodeTables;
import barfit.section.SectionShape;
import barfit.section.Stirrups;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.List;
import java.util.Locale;

/** Short phrases shared by the reports. */
public final class Words {
    private Words() {}

    /**
     * A section's or span's proof status as its text and JSON say it: a design found but not proven reads
     * "feasible" (its bound is left out), a search the time limit ended with nothing "unknown".
     */
    public static String status(Proof.Status s) {
        return switch (s) {
            case OPTIMAL -> "optimal";
            case FEASIBLE, UNPROVEN -> "feasible";
            case INFEASIBLE -> "infeasible";
            case OUT_OF_TIME -> "unknown";
        };
    }

    /**
     * When a binding check fails, or how hard it works: "one No. 29 fewer", "h = 475 mm", "b = 300 mm",
     * "stirrups @ 175 mm", "2 stirrup legs", "h = max_depth", or a span's ratio "0.97".
     */
    public static String when(Binding b, UnitSystem u) {
        return switch (b.leaner()) {
            case ONE_BAR_FEWER -> "one " + b.bar().label() + " fewer";
            case SHALLOWER -> "h = " + u.compact(b.value(), Dim.LENGTH) + " " + u.unit(Dim.LENGTH);
            case NARROWER -> "b = " + u.compact(b.value(), Dim.LENGTH) + " " + u.unit(Dim.LENGTH);
            case STIRRUPS_WIDER_APART -> "stirrups @ " + u.compact(b.value(), Dim.LENGTH) + " " + u.unit(Dim.LENGTH);
            case FEWER_LEGS -> (int) b.value() + " stirrup legs";
            case AT_MAX_DEPTH -> "h = max_depth";
            case NEAR_LIMIT -> String.format(Locale.ROOT, "%.2f", b.value());
        };
    }

    /** What sets the run of the extra top bars past the face. */
    public static String extension(Extension.Governs governs) {
        return switch (governs) {
            case CANTILEVER -> "full length of the cantilever and ld of 25.4.2.4 past the support face";
            case THREE_TENTHS_OF_SPAN -> "0.3 × span governs over ld of 25.4.2.4";
            case LD_BEYOND_SPAN ->
                "ld of 25.4.2.4 exceeds the span: the extra bars run through it and past the far face "
                        + "until developed";
            case LD_PAST_MID_SPAN ->
                "ld of 25.4.2.4 governs, past mid-span: the extra bars of the two supports overlap "
                        + "over the middle";
            case LD -> "ld of 25.4.2.4 governs over 0.3 × span";
            case TORSION_ZONES ->
                "under torsion, to the far end of the support's stirrup zones, so that the longitudinal steel "
                        + "counted there runs over them";
        };
    }

    /** A bar mark's role: "bottom, full span", "stirrup hoops, left zone (2 of 4 legs)", "crossties, ...". */
    public static String role(SpanLayout.BarMark m) {
        return switch (m.role()) {
            case BOTTOM -> "bottom, full span";
            case CANTILEVER_TOP -> "top, full length and ld past the support";
            case TOP_CONTINUOUS -> "top continuous, full span";
            case TOP_EXTRA_LEFT -> "top extra at left support";
            case TOP_EXTRA_RIGHT -> "top extra at right support";
            case SKIN -> "skin bars, both faces";
            case HOOPS ->
                "stirrup hoops, " + m.zone() + " zone" + (m.legs() > 2 ? " (2 of " + m.legs() + " legs)" : ", 2 legs");
            case CROSSTIES -> "crossties, " + m.zone() + " zone (" + (m.legs() - 2) + " per hoop)";
        };
    }

    public static String shape(SectionShape s, UnitSystem u) {
        String bh =
                u.compact(s.width(), Dim.LENGTH) + " × " + u.compact(s.height(), Dim.LENGTH) + " " + u.unit(Dim.LENGTH);
        if (s.flange() == null) {
            return bh + " rectangular";
        }
        return bh + (s.flange().oneSided() ? " L" : " T") + ", flange "
                + u.compact(s.flange().width(), Dim.LENGTH)
                + " × " + u.compact(s.flange().thickness(), Dim.LENGTH)
                + (s.flange().reduced()
                        ? " (given " + u.compact(s.flange().given(), Dim.LENGTH) + ", taken at its effective width, "
                                + "Table 6.3.2.1)"
                        : "");
    }

    public static String layers(List<BarLayer> layers) {
        if (layers.isEmpty()) {
            return "none";
        }
        StringBuilder sb = new StringBuilder();
        for (BarLayer l : layers) {
            if (sb.length() > 0) {
                sb.append(" + ");
            }
            sb.append(l.count()).append(' ').append(l.bar().label());
        }
        return sb.toString();
    }

    public static String stirrups(Stirrups s, UnitSystem u) {
        if (s == null) {
            return "none";
        }
        return s.bar().label() + " × " + s.legs() + " legs @ " + u.compact(s.spacing(), Dim.LENGTH) + " "
                + u.unit(Dim.LENGTH);
    }

    /** Alternatives, one limit relaxed at a time, as one sentence: "a", "a; or b", "a; or b; or c". */
    public static String alternatives(List<String> fixes) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < fixes.size(); i++) {
            sb.append(i == 0 ? "" : "; or ").append(fixes.get(i));
        }
        return sb.toString();
    }

    public static String value(barfit.section.trail.Q q, UnitSystem u) {
        return q == null ? "" : u.withUnit(q.value(), q.dim());
    }

    public static String ratio(double r) {
        if (!Double.isFinite(r)) {
            return "—";
        }
        return String.format(Locale.ROOT, "%.2f", r);
    }

    public static String fixed(double v, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }

    /**
     * φ to three decimals; to four when three would round a transition-zone φ up to 0.900 (or down to
     * 0.650) and so read as tension- or compression-controlled.
     */
    public static String phi(double phi) {
        String three = fixed(phi, 3);
        boolean atLimit = three.equals("0.900") || three.equals("0.650");
        boolean inside =
                phi < CodeTables.PHI_TENSION_CONTROLLED - 1e-12 && phi > CodeTables.PHI_COMPRESSION_CONTROLLED + 1e-12;
        return atLimit && inside ? fixed(phi, 4) : three;
    }
}
