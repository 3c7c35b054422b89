package barfit.design.span;

import barfit.design.CostModel;
import barfit.design.span.SpanDesigner.Diagnosis;
import barfit.design.span.SpanDesigner.Fix;
import barfit.section.CheckResult;
import barfit.section.CodeEquations;
import barfit.section.SpanChecks;
import java.util.ArrayList;
import java.util.List;

/**
 * Explains a span with no design, as data: what fails at the cap, found by designing with one
 * requirement set aside at a time (deflection, then the shears), and the least single change that works,
 * found by designing the span at each depth of the search's grid above the cap in turn (then on beyond it
 * by the same step), and at each wider web at the deepest allowed depth.
 */
final class SpanDiagnoser {
    /** Steps of a search with a single depth or width (in inch-pound input, 1 in and 2 in): a grid, no clause. */
    private static final double SI_DEPTH_STEP = 25.0;

    private static final double SI_WIDTH_STEP = 50.0;

    /** Deflection limits that allow any deflection (a span divisor of 0: the limit ℓ/0 is infinite). */
    private static final double NO_LIMIT = 0;

    private final CostModel cost;

    SpanDiagnoser(CostModel cost) {
        this.cost = cost;
    }

    /** The generator's cheapest layout passing every check of {@code q}, verified; null when there is none. */
    private SpanLayout cheapest(SpanProblem q) {
        if (q.depths().isEmpty() || q.widths().isEmpty()) {
            return null;
        }
        SpanLayout l = new SpanGenerator(q, cost).generate().incumbentLayout();
        if (l != null && !SpanVerifier.verify(q, l, false).ok()) {
            throw new IllegalStateException("the layout found for beam " + q.id() + " at " + l.width() + " x "
                    + l.height() + " fails re-verification; this is a bug in the search");
        }
        return l;
    }

    private boolean feasible(SpanProblem q) {
        return cheapest(q) != null;
    }

    Diagnosis diagnose(SpanProblem p) {
        List<CheckResult> atCap = List.of();
        double hMin = SpanChecks.minimumDepth(p.span(), p.ends(), p.materials(), p.code());
        List<Double> allowed = p.depths();
        double tallest = allowed.isEmpty() ? 0 : allowed.get(allowed.size() - 1);
        String limit;
        String clause;
        Diagnosis.Cause cause;
        if (allowed.isEmpty()) {
            limit = "headroom";
            clause = "";
            cause = new Diagnosis.BelowShallowest();
        } else if (p.service() == null && tallest < hMin) {
            limit = "deflection";
            clause = "Table 9.3.1.1, 9.3.2";
            cause = new Diagnosis.DeflectionUnchecked(hMin);
        } else {
            boolean shears = p.vLeft() != null || p.vRight() != null;
            SpanProblem noDeflection =
                    p.service() == null ? p : p.withLimits(new SpanChecks.Limits(NO_LIMIT, NO_LIMIT));
            SpanLayout free = p.service() == null ? null : cheapest(noDeflection);
            if (free != null) {
                // every other check can be met within the cap: deflection fails at every allowed depth
                SpanChecks.Limits limits = p.limits();
                boolean liveAlone = feasible(p.withLimits(new SpanChecks.Limits(limits.live(), NO_LIMIT)));
                boolean totalAlone = feasible(p.withLimits(new SpanChecks.Limits(NO_LIMIT, limits.total())));
                Diagnosis.Deflections which;
                if (liveAlone && totalAlone) { // each can be met, not both at once
                    limit = "deflection_live, deflection_total";
                    which = Diagnosis.Deflections.EACH_BUT_NOT_BOTH;
                } else if (!liveAlone && !totalAlone) {
                    limit = "deflection_live, deflection_total";
                    which = Diagnosis.Deflections.NEITHER;
                } else if (!liveAlone) {
                    limit = "deflection_live";
                    which = Diagnosis.Deflections.LIVE;
                } else {
                    limit = "deflection_total";
                    which = Diagnosis.Deflections.TOTAL;
                }
                clause = "9.3.2, 24.2, Table 24.2.2";
                atCap = SpanVerifier.verify(p, free, false).span().checks().stream()
                        .filter(c -> !c.pass())
                        .toList();
                cause = new Diagnosis.DeflectionFails(
                        which, hMin, tallest, limits.live(), limits.total(), free.width(), free.height());
            } else if (shears && feasible(noDeflection.scaled(1.0, 0.0))) {
                limit = "shear";
                clause = "22.5, 9.6.3, 9.7.6.2.2";
                cause = new Diagnosis.ShearFails(p.service() != null);
            } else {
                limit = "strength";
                clause = "9.5.1.1, 22.2, 9.3.3.1, 9.6.1, 25.2";
                cause = new Diagnosis.StrengthFails(p.service() != null, shears);
            }
        }
        Fix deeper = deeper(p, tallest);
        Fix wider = allowed.isEmpty() ? null : wider(p, tallest);
        return new Diagnosis(limit, clause, cause, atCap, deeper, wider, p.maxDepth(), p.fixedWidth());
    }

    /**
     * The shallowest depth above the allowed ones at which the span designs (any width it may have): the
     * search's depths above the cap in turn, then on by the search's step (25 mm, or 1 in in inch-pound
     * input, when it has one depth) up to twice its deepest or 1000 mm beyond. Every depth below the one
     * found has been designed and failed, so lifting the cap one step less gives no design.
     */
    private Fix deeper(SpanProblem p, double tallest) {
        List<Double> grid = p.space().depths();
        double deepest = grid.get(grid.size() - 1);
        double step = grid.size() > 1
                ? grid.get(grid.size() - 1) - grid.get(grid.size() - 2)
                : p.code().inchPound() ? CodeEquations.MM_PER_IN : SI_DEPTH_STEP;
        List<Double> tries = new ArrayList<>();
        for (double h : grid) {
            if (p.depths().isEmpty() || h > tallest + 1e-9) {
                tries.add(h);
            }
        }
        double end = Math.max(2 * deepest, deepest + 1000);
        for (int k = 1; deepest + k * step <= end + 1e-9; k++) {
            tries.add(Math.round((deepest + k * step) * 1e6) / 1e6);
        }
        for (double h : tries) {
            SpanLayout l = cheapest(p.withMaxDepth(null).withSpace(p.space().withDepths(List.of(h))));
            if (l != null) {
                return new Fix(l.width(), h, l);
            }
        }
        return null;
    }

    /** The narrowest web beyond the widths allowed at which the span designs at the deepest allowed depth. */
    private Fix wider(SpanProblem p, double h) {
        List<Double> widths = p.widths();
        double widest = widths.get(widths.size() - 1);
        List<Double> grid = p.space().widths();
        double step = widths.size() > 1
                ? widths.get(widths.size() - 1) - widths.get(widths.size() - 2)
                : grid.size() > 1
                        ? grid.get(grid.size() - 1) - grid.get(grid.size() - 2)
                        : p.code().inchPound() ? 2 * CodeEquations.MM_PER_IN : SI_WIDTH_STEP;
        for (int k = 1; widest + k * step <= 2.5 * widest + 1e-9; k++) {
            double w = Math.round((widest + k * step) * 1e6) / 1e6;
            SpanLayout l =
                    cheapest(p.withSpace(p.space().withDepths(List.of(h))).withFixedWidth(w));
            if (l != null) {
                return new Fix(w, h, l);
            }
        }
        return null;
    }
}
