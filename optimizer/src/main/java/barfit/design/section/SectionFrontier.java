package barfit.design.section;

import barfit.design.CostModel;
import barfit.design.Objective;
import barfit.design.SolverOptions;
import java.util.ArrayList;
import java.util.List;

/**
 * A section's cost-carbon frontier: the designs no other is both cheaper than and lower in carbon than, from
 * the cheapest to the lowest-carbon, by the epsilon-constraint method on the searches' whole units per metre.
 * Each point is the cheapest design within a carbon cap (proven as {@code design --carbon-cap} is), then the
 * lowest-carbon design costing no more (so that a tie in cost does not leave a dominated point); the next cap
 * is one unit below that point's carbon, until no design fits under it. Every point is therefore the cheapest
 * within its own carbon, and the last is the least carbon of any passing design.
 */
public final class SectionFrontier {
    /** One point: its design (cost and carbon per metre) and the proofs behind it. */
    public record Point(Design design, DesignOutcome cheapest, DesignOutcome leanest) {
        public long costUnits() {
            return CostModel.units(design.costPerMetre().total());
        }

        public long carbonUnits() {
            return CostModel.units(design.carbonPerMetre().total());
        }
    }

    /**
     * The frontier, cheapest first ({@code points} empty where no layout passes, with the cost search's outcome
     * and its diagnosis in {@code first}); {@code solves} the designs it took; {@code nanos} its time.
     */
    public record Result(SectionProblem problem, List<Point> points, DesignOutcome first, int solves, long nanos) {
        public Result {
            points = List.copyOf(points);
        }
    }

    private SectionFrontier() {}

    /** @param model the cost model with the carbon factors beside it ({@link CostModel#withCarbon}) */
    public static Result of(SectionProblem p, CostModel model, SolverOptions options) {
        long t0 = System.nanoTime();
        CostModel money = model.money();
        CostModel carbon = model.carbon();
        if (carbon == null) {
            throw new IllegalStateException("a frontier needs the carbon factors beside the cost model");
        }
        SectionDesigner byCost = new SectionDesigner(model.minimising(Objective.COST), options);
        SectionDesigner byCarbon = new SectionDesigner(model.minimising(Objective.CARBON), options);
        List<Point> points = new ArrayList<>();
        DesignOutcome first = byCost.design(p, 0);
        int solves = 1;
        DesignOutcome cheapest = first;
        while (cheapest.feasible()) {
            DesignOutcome leanest = byCarbon.designCapped(
                    p, money, CostModel.units(cheapest.best().costPerMetre().total()));
            solves++;
            if (!leanest.feasible()) {
                throw new IllegalStateException("beam " + p.id() + ": no design as cheap as the cheapest within its "
                        + "cap; this is a bug in the frontier");
            }
            Point point = new Point(leanest.best(), cheapest, leanest);
            points.add(point);
            cheapest = byCost.designCapped(p, carbon, point.carbonUnits() - 1);
            solves++;
        }
        return new Result(p, points, first, solves, System.nanoTime() - t0);
    }
}
