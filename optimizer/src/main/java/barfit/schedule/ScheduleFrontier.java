package barfit.schedule;

import barfit.design.CostModel;
import barfit.design.Objective;
import barfit.design.SolverOptions;
import barfit.design.SupportedFrontier;
import java.util.List;
import java.util.function.UnaryOperator;

/**
 * A schedule's cost-carbon frontier: the total cost and carbon of the cost-optimal schedule ({@code schedule
 * --objective cost}), of the carbon-optimal one ({@code --objective carbon}) and of a handful of schedules
 * between them, each minimising a weighted sum of cost and carbon ({@link SupportedFrontier}). Without a
 * rationalise: block the beams do not share anything, so a weighted sum of the schedule's totals is least
 * exactly when every beam minimises its own; with one, the rationalisation minimises the weighted sum over
 * the whole schedule (a set of forms weighted as money) with its proof. Either way each point is the
 * cheapest schedule within its own total carbon.
 */
public final class ScheduleFrontier {
    /** Reads the schedule with its lines designed by the model the operator makes of the file's. */
    public interface Inputs {
        ScheduleInput read(UnaryOperator<CostModel> pricing);
    }

    /**
     * The schedules, cheapest first ({@code points} empty where a beam has no design: {@code first}, the cost
     * search's schedule, says which); {@code solves} the schedules designed; {@code complete} unless
     * {@code most} stopped the search with segments left open.
     */
    public record Result(
            List<SupportedFrontier.Point<ScheduleResult>> points,
            ScheduleResult first,
            int solves,
            boolean complete,
            long nanos) {
        public Result {
            points = List.copyOf(points);
        }
    }

    private ScheduleFrontier() {}

    /** @param most at most this many schedules between the two ends */
    public static Result of(Inputs inputs, SolverOptions options, int threads, Progress progress, int most) {
        long t0 = System.nanoTime();
        ScheduleInput byCost = inputs.read(m -> m.minimising(Objective.COST));
        ScheduleResult first = solve(byCost, byCost.costModel(), options, threads, progress);
        if (!first.allFeasible()) {
            return new Result(List.of(), first, 1, true, System.nanoTime() - t0);
        }
        boolean lines = !byCost.lines().isEmpty();
        ScheduleInput byCarbon = lines ? inputs.read(m -> m.minimising(Objective.CARBON)) : byCost;
        ScheduleResult leanest =
                solve(byCarbon, byCarbon.costModel().minimising(Objective.CARBON), options, threads, progress);
        SupportedFrontier.Result<ScheduleResult> r = SupportedFrontier.of(
                first,
                leanest,
                (wc, wk) -> {
                    ScheduleInput in = lines ? inputs.read(m -> m.blend(wc, wk)) : byCost;
                    ScheduleResult s = solve(in, in.costModel().blend(wc, wk), options, threads, progress);
                    return s.allFeasible() ? s : null;
                },
                ScheduleFrontier::costUnits,
                ScheduleFrontier::carbonUnits,
                most);
        return new Result(r.points(), first, r.solves() + 2, r.complete(), System.nanoTime() - t0);
    }

    private static ScheduleResult solve(
            ScheduleInput in, CostModel model, SolverOptions options, int threads, Progress progress) {
        return new ScheduleSolver(model, options, threads, progress).solve(in);
    }

    /**
     * A schedule's total cost in {@link CostModel#UNITS}: the sum of its beams' own, each rounded as they are,
     * and its sets of forms.
     */
    public static long costUnits(ScheduleResult r) {
        long sum = CostModel.units(r.formworkSetsCost());
        for (ScheduleResult.Beam b : r.beams()) {
            sum += CostModel.units(b.outcome().best().cost().total());
        }
        return sum;
    }

    /** A schedule's total carbon (kg CO2e) in {@link CostModel#UNITS}, summed as {@link #costUnits} is. */
    public static long carbonUnits(ScheduleResult r) {
        long sum = 0;
        for (ScheduleResult.Beam b : r.beams()) {
            sum += CostModel.units(b.outcome().best().carbon().total());
        }
        return sum;
    }
}
