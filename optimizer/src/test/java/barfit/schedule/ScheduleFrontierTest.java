package barfit.schedule;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.CarbonFactors;
import barfit.design.CostModel;
import barfit.design.Objective;
import barfit.design.SolverOptions;
import barfit.design.span.SpanExhaustive;
import barfit.input.CarbonReader;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * A schedule's cost-carbon frontier against plain enumeration, on small invented schedules with random carbon
 * factors (invented): every beam's passing layouts are enumerated, their (cost, carbon) pairs summed over the
 * beams into the schedule's exact frontier; the ends equal {@code schedule --objective cost} and {@code
 * --objective carbon}; every schedule found is on the exact frontier and is the cheapest within its own total
 * carbon; and no two dominate each other.
 */
class ScheduleFrontierTest {
    @Test
    void frontierMatchesEnumeratedSchedules() {
        Random rnd = new Random(Long.getLong("oracle.seed", 2_718L));
        int instances = Integer.getInteger("oracle.instances", 10);
        SolverOptions options = new SolverOptions(30, 1, 1);
        int longer = 0;
        int between = 0;
        for (int i = 0; i < instances; i++) {
            ScheduleInput base = RationaliseOracleTest.schedule(rnd, i);
            CarbonFactors f = new CarbonFactors(
                    100 + 300 * rnd.nextDouble(), 0.8 + 2.2 * rnd.nextDouble(), 0.8 + 2.2 * rnd.nextDouble(), 0);
            ScheduleInput in = new ScheduleInput(
                    base.sources(),
                    base.settings(),
                    base.space(),
                    base.rates(),
                    base.currency(),
                    base.costs(),
                    base.maxBarSizesPerBeam(),
                    base.barsPerTwoLegs(),
                    base.beams(),
                    null,
                    List.of(),
                    new CarbonReader.Carbon(f, true, CarbonFactors.defaultConcreteByFc()));
            CostModel model = in.costModel();
            String where = "schedule " + i + ", " + f;
            // the exact frontier: each beam's non-dominated pairs, summed beam by beam and pruned again
            List<long[]> exact = List.of(new long[] {0, 0});
            boolean feasible = true;
            for (ScheduleBeam b : in.beams()) {
                List<long[]> own = barfit.design.NonDominated.of(
                        new SpanExhaustive(model.money()).priced(b.problem(), model.carbon()));
                feasible &= !own.isEmpty();
                List<long[]> sums = new ArrayList<>();
                for (long[] a : exact) {
                    for (long[] x : own) {
                        sums.add(new long[] {a[0] + x[0], a[1] + x[1]});
                    }
                }
                exact = barfit.design.NonDominated.of(sums);
            }
            ScheduleFrontier.Result r = ScheduleFrontier.of(pricing -> in, options, 1, Progress.NONE, 20);
            if (!feasible) {
                assertTrue(r.points().isEmpty(), where);
                continue;
            }
            var pts = r.points();
            ScheduleResult byCost = new ScheduleSolver(model, options, 1, Progress.NONE).solve(in);
            ScheduleResult byCarbon =
                    new ScheduleSolver(model.minimising(Objective.CARBON), options, 1, Progress.NONE).solve(in);
            assertEquals(ScheduleFrontier.costUnits(byCost), pts.get(0).cost(), where);
            assertEquals(
                    ScheduleFrontier.carbonUnits(byCarbon),
                    pts.get(pts.size() - 1).carbon(),
                    where);
            assertEquals(exact.get(0)[0], pts.get(0).cost(), "the least cost — " + where);
            assertEquals(exact.get(exact.size() - 1)[1], pts.get(pts.size() - 1).carbon(), "least carbon — " + where);
            for (int k = 0; k < pts.size(); k++) {
                long least = Long.MAX_VALUE;
                for (long[] x : exact) {
                    if (x[1] <= pts.get(k).carbon()) {
                        least = Math.min(least, x[0]);
                    }
                }
                assertEquals(least, pts.get(k).cost(), "schedule " + k + " cheapest within its carbon — " + where);
                if (k > 0) {
                    assertTrue(
                            pts.get(k).cost() > pts.get(k - 1).cost()
                                    && pts.get(k).carbon() < pts.get(k - 1).carbon(),
                            where);
                }
            }
            longer += pts.size() > 1 ? 1 : 0;
            between += pts.size() > 2 ? 1 : 0;
        }
        assertTrue(
                longer >= 3 && between >= 1, "frontiers of two points or more: " + longer + ", of three: " + between);
    }
}
