package barfit.report;

import barfit.design.Diagnosis;
import barfit.design.span.SpanDesigner;
import barfit.schedule.GroupClash;
import barfit.section.CheckResult;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.List;

/**
 * A diagnosis in words, in the user's units: why a section or a span has no design (its summary) and the
 * changes that would give one (its fixes). The searches give the facts; every report words them here.
 */
public final class DiagnosisWords {
    private DiagnosisWords() {}

    // ---------------------------------------------------------------- single sections

    public static String summary(Diagnosis d, UnitSystem u) {
        Diagnosis.Cause cause = d.cause();
        if (cause instanceof Diagnosis.BelowShallowest c) {
            String cap = d.maxDepth() == null ? "?" : say(u, d.maxDepth(), Dim.LENGTH);
            return "max_depth " + cap + " is below the shallowest depth searched (" + say(u, c.shallowest(), Dim.LENGTH)
                    + ")";
        }
        if (cause instanceof Diagnosis.FrameCheckFails c) {
            CheckResult r = c.check();
            return switch (r.id()) {
                case "min_depth" ->
                    "Table 9.3.1.1 needs h ≥ " + say(u, r.limit().value(), Dim.LENGTH) + " for this span, "
                            + "but the deepest depth allowed is " + say(u, c.deepest(), Dim.LENGTH)
                            + " (deflection is not computed for single sections)";
                case "cover" ->
                    "the cover is below Table 20.5.1.3.1 (" + say(u, r.limit().value(), Dim.LENGTH) + ")";
                default -> r.title() + " fails (" + r.clause() + ")";
            };
        }
        if (cause instanceof Diagnosis.NoLayoutFits c) {
            return "no bar layout fits the web at b = " + say(u, c.width(), Dim.LENGTH);
        }
        if (cause instanceof Diagnosis.FlexureFails c) {
            return "the strongest ductile layout at " + say(u, c.width(), Dim.LENGTH) + " × "
                    + say(u, c.height(), Dim.LENGTH) + " gives φMn = " + say(u, d.strongestPhiMn(), Dim.MOMENT)
                    + " < Mu = " + say(u, c.mu(), Dim.MOMENT);
        }
        if (cause instanceof Diagnosis.ShearFails c) {
            return "flexure can be met, but no stirrup option in the search carries Vu = " + say(u, c.vu(), Dim.FORCE)
                    + " (or the section is too small for it, 22.5.1.2)";
        }
        if (cause instanceof Diagnosis.TorsionFails c) {
            return torsion(c, u);
        }
        if (cause instanceof Diagnosis.CarbonCapFails c) {
            return "layouts pass, but none within the carbon cap of " + Carbon.amount(Carbon.perLength(c.cap(), u))
                    + " " + Carbon.perLengthUnit(u) + ": the least carbon of any passing layout is "
                    + Carbon.amount(Carbon.perLength(c.least(), u)) + " " + Carbon.perLengthUnit(u) + " (at "
                    + say(u, c.leastLayout().width(), Dim.LENGTH) + " × "
                    + say(u, c.leastLayout().height(), Dim.LENGTH)
                    + ")";
        }
        return "strength can be met but no layout passes every detailing check";
    }

    private static String torsion(Diagnosis.TorsionFails c, UnitSystem u) {
        CheckResult r = c.check();
        String at = say(u, c.width(), Dim.LENGTH) + " × " + say(u, c.height(), Dim.LENGTH);
        String where = c.everyFrame() ? "at every size searched; at " + at : "at " + at;
        return switch (r.id()) {
            case "torsion_section" ->
                "flexure can be met, but the section is too small for the torsion with the shear " + where + ", "
                        + "√(v² + vt²) = " + say(u, r.demand().value(), Dim.STRESS) + " > "
                        + say(u, r.limit().value(), Dim.STRESS) + " (22.7.7.1(a)); a wider or deeper section "
                        + "lowers it";
            case "torsion_bar_spacing" ->
                "flexure can be met, but the longitudinal bars cannot be spaced round the hoop " + where
                        + ": the largest gap is " + say(u, r.demand().value(), Dim.LENGTH) + " > "
                        + say(u, r.limit().value(), Dim.LENGTH)
                        + " (9.7.5.1; side bars stand over h/2 from the tension face)";
            case "torsion_transverse", "torsion_transverse_min", "torsion_spacing" ->
                "flexure can be met, but no stirrup option in the search carries the torsion with the shear " + where
                        + " (" + r.clause() + "); larger stirrup bars, more legs or closer spacings would";
            default ->
                "flexure can be met, but the check " + r.id() + " (" + r.title() + ", " + r.clause() + ") fails "
                        + where;
        };
    }

    public static List<String> fixes(Diagnosis d, UnitSystem u) {
        List<String> out = new ArrayList<>();
        if (d.cause() instanceof Diagnosis.CarbonCapFails c) {
            // rounded up, so that the cap it names admits the least-carbon layout
            double least = Math.ceil(Carbon.perLength(c.least(), u) * 10) / 10;
            out.add("--carbon-cap " + Carbon.amount(least) + " or more (the least carbon any passing layout has)");
        }
        if (d.deeper() != null) {
            out.add("needs h ≥ " + say(u, d.deeper().height(), Dim.LENGTH) + " at b = "
                    + say(u, d.deeper().width(), Dim.LENGTH)
                    + (d.maxDepth() != null ? " (max_depth is " + say(u, d.maxDepth(), Dim.LENGTH) + ")" : ""));
        }
        if (d.wider() != null) {
            out.add("b ≥ " + say(u, d.wider().width(), Dim.LENGTH) + " at h = "
                    + say(u, d.wider().height(), Dim.LENGTH) + (d.fixedWidth() != null ? " (the beam fixes b)" : ""));
        }
        if (d.moreLayers() != null) {
            out.add("allow " + d.moreLayers() + " layers of tension bars (max_layers)");
        }
        return out;
    }

    // ---------------------------------------------------------------- whole spans

    public static String summary(SpanDesigner.Diagnosis d, UnitSystem u) {
        SpanDesigner.Diagnosis.Cause cause = d.cause();
        if (cause instanceof SpanDesigner.Diagnosis.BelowShallowest) {
            return "max_depth is below the shallowest depth searched";
        }
        if (cause instanceof SpanDesigner.Diagnosis.DeflectionUnchecked c) {
            return "every allowed depth is below Table 9.3.1.1 (h,min = " + say(u, c.hMin()) + ") and no service loads "
                    + "are given, so deflection cannot be checked: give service: {dead, live}";
        }
        if (cause instanceof SpanDesigner.Diagnosis.DeflectionFails c) {
            return deflection(c, d.atCap(), u);
        }
        if (cause instanceof SpanDesigner.Diagnosis.ShearFails c) {
            return "the moments can be carried within the cap"
                    + (c.deflectionSetAside() ? " (deflection set aside)" : "")
                    + ", but no stirrups in the search carry the factored shears (or the web is too small for them, "
                    + "22.5.1.2)";
        }
        if (cause instanceof SpanDesigner.Diagnosis.StrengthFails c) {
            List<String> aside = new ArrayList<>();
            if (c.deflectionSetAside()) {
                aside.add("deflection set aside");
            }
            if (c.shearsTakenAsZero()) {
                aside.add("the shears taken as zero");
            }
            return (aside.isEmpty() ? "" : "even with " + String.join(" and ", aside) + ", ")
                    + "no layout within the limits carries "
                    + "the factored moments with every flexure, ductility, minimum steel, spacing and detailing check met";
        }
        if (cause instanceof SpanDesigner.Diagnosis.CarbonCapFails c) {
            return "designs pass, but none within the carbon cap of " + Carbon.amount(Carbon.mass(c.cap(), u)) + " "
                    + Carbon.unit(u) + " over the span: the least carbon of any passing design is "
                    + Carbon.amount(Carbon.mass(c.least(), u)) + " " + Carbon.unit(u) + " (at " + say(u, c.width())
                    + " × " + say(u, c.height()) + ")";
        }
        if (cause instanceof SpanDesigner.Diagnosis.TimeLimit c) {
            return "the time limit (" + c.seconds()
                    + " s) ended the search before a design passing every check was found";
        }
        if (cause instanceof GroupClash c) {
            List<String> optima = new ArrayList<>();
            for (GroupClash.Member m : c.members()) {
                optima.add(m.id() + " " + u.compact(m.width(), Dim.LENGTH) + " × " + u.compact(m.height(), Dim.LENGTH)
                        + (m.maxDepth() != null ? " (max_depth " + u.compact(m.maxDepth(), Dim.LENGTH) + ")" : "")
                        + (m.fixedWidth() != null ? " (width " + u.compact(m.fixedWidth(), Dim.LENGTH) + ")" : ""));
            }
            return "the beams of group " + c.group() + " share no section size in which each passes; their own optima: "
                    + String.join("; ", optima);
        }
        throw new IllegalArgumentException("no words for " + cause);
    }

    private static String deflection(SpanDesigner.Diagnosis.DeflectionFails c, List<CheckResult> atCap, UnitSystem u) {
        String live = "the immediate live-load deflection within ℓ/" + divisor(c.liveDivisor());
        String total = "the long-term plus live deflection within ℓ/" + divisor(c.totalDivisor());
        String what = switch (c.which()) {
            case EACH_BUT_NOT_BOTH -> "both " + live + " and " + total + " at once";
            case NEITHER -> "either " + live + " or " + total;
            case LIVE -> live;
            case TOTAL -> total;
        };
        StringBuilder sb = new StringBuilder("deflection is computed below Table 9.3.1.1's h,min = " + say(u, c.hMin())
                + ", and within the depths allowed (h ≤ " + say(u, c.tallest()) + ") no layout keeps " + what
                + " (9.3.2, 24.2, Table 24.2.2), though every other check can be met: the cheapest layout that "
                + "meets them, " + say(u, c.width()) + " × " + say(u, c.height()) + ", deflects");
        String sep = " ";
        for (CheckResult r : atCap) {
            sb.append(sep)
                    .append(say(u, r.demand().value()))
                    .append(r.id().equals("deflection_live") ? " under live load" : " long-term plus live")
                    .append(" against ")
                    .append(say(u, r.limit().value()));
            sep = " and ";
        }
        return sb.toString();
    }

    public static List<String> fixes(SpanDesigner.Diagnosis d, UnitSystem u) {
        if (d.cause() instanceof SpanDesigner.Diagnosis.CarbonCapFails c) {
            // per length, as the option takes it, rounded up so that the cap it names admits the leanest design
            double least = Math.ceil(Carbon.perLength(c.least() / (c.span() / 1000.0), u) * 10) / 10;
            return List.of("--carbon-cap " + Carbon.amount(least) + " or more (the least carbon of any passing "
                    + "design, per length of span)");
        }
        if (d.cause() instanceof SpanDesigner.Diagnosis.TimeLimit) {
            return List.of("raise --time-limit");
        }
        if (d.cause() instanceof GroupClash) {
            return List.of("give them different groups, or lift the max_depth or width that keeps them apart");
        }
        List<String> out = new ArrayList<>();
        SpanDesigner.Fix deeper = d.deeper();
        if (deeper != null) {
            out.add("needs h ≥ " + say(u, deeper.height()) + ": the span designs at " + say(u, deeper.width()) + " × "
                    + say(u, deeper.height())
                    + (d.maxDepth() != null ? " (max_depth is " + say(u, d.maxDepth()) + ")" : ""));
        }
        SpanDesigner.Fix wider = d.wider();
        if (wider != null) {
            out.add("b ≥ " + say(u, wider.width()) + " at h = " + say(u, wider.height())
                    + (d.fixedWidth() != null ? " (the beam fixes b)" : ""));
        }
        return out;
    }

    private static String divisor(double d) {
        return d == Math.rint(d) ? String.valueOf((long) d) : String.valueOf(d);
    }

    private static String say(UnitSystem u, double mm) {
        return say(u, mm, Dim.LENGTH);
    }

    private static String say(UnitSystem u, double v, Dim d) {
        return u.compact(v, d) + " " + u.unit(d);
    }
}
