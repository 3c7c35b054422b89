package barfit.design.span;

import barfit.design.CostModel;
import barfit.design.Objective;
import barfit.design.SolverOptions;
import barfit.design.SupportedFrontier;
import java.util.List;

/**
 * A whole span's cost-carbon frontier: the span's cheapest and lowest-carbon designs (as {@code design
 * --objective cost} and {@code --objective carbon} give them) and the extreme supported points between them,
 * each the proven optimum of a weighted sum of cost and carbon ({@link SupportedFrontier}). The span search
 * prunes by one measure at a time (its options, stirrups and bounds): under a carbon cap it must keep every
 * option ({@link SpanUnderCarbonCap}) and takes seconds, while a weighted sum is one more set of rates and
 * every bound of the fast search holds.
 */
public final class SpanFrontier {
    /** The frontier of one span, cheapest first (empty where nothing passes: {@code first} then says why). */
    public record Result(
            SpanProblem problem,
            List<SupportedFrontier.Point<SpanDesigner.Outcome>> points,
            SpanDesigner.Outcome first,
            int solves,
            boolean complete,
            long nanos) {
        public Result {
            points = List.copyOf(points);
        }
    }

    /** Points between the ends, at most: far more than a span's hull has in practice. */
    public static final int MOST_POINTS = 24;

    private SpanFrontier() {}

    /** @param model the cost model with the carbon factors beside it ({@link CostModel#withCarbon}) */
    public static Result of(SpanProblem p, CostModel model, SolverOptions options) {
        long t0 = System.nanoTime();
        if (model.carbon() == null) {
            throw new IllegalStateException("a frontier needs the carbon factors beside the cost model");
        }
        SpanDesigner.Outcome first = new SpanDesigner(model.minimising(Objective.COST), options).design(p, 0);
        if (!first.feasible()) {
            return new Result(p, List.of(), first, 1, true, System.nanoTime() - t0);
        }
        SpanDesigner.Outcome leanest = new SpanDesigner(model.minimising(Objective.CARBON), options).design(p, 0);
        if (!leanest.feasible()) {
            throw new IllegalStateException(
                    "beam " + p.id() + ": a design passes but none minimises carbon; this is " + "a bug in the search");
        }
        SupportedFrontier.Result<SpanDesigner.Outcome> r = SupportedFrontier.of(
                first,
                leanest,
                (wc, wk) -> {
                    SpanDesigner.Outcome o = new SpanDesigner(model.blend(wc, wk), options).design(p, 0);
                    return o.feasible() ? o : null;
                },
                SpanFrontier::costUnits,
                SpanFrontier::carbonUnits,
                MOST_POINTS);
        return new Result(p, r.points(), first, r.solves() + 2, r.complete(), System.nanoTime() - t0);
    }

    /** A designed span's cost over the span, in {@link CostModel#UNITS}. */
    public static long costUnits(SpanDesigner.Outcome o) {
        return CostModel.units(o.best().cost().total());
    }

    /** A designed span's carbon over the span, kg CO2e in {@link CostModel#UNITS}. */
    public static long carbonUnits(SpanDesigner.Outcome o) {
        return CostModel.units(o.best().carbon().total());
    }
}
