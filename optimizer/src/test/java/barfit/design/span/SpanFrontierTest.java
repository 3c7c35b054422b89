package barfit.design.span;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.CarbonFactors;
import barfit.design.CostModel;
import barfit.design.Objective;
import barfit.design.SolverOptions;
import barfit.design.SupportedFrontier;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * A whole span's cost-carbon frontier against plain enumeration of every passing layout, on random small
 * spans and random carbon factors (invented): the ends are {@code design --objective cost} and {@code
 * --objective carbon}; every point is on the exact frontier of the enumeration (no passing layout is both
 * cheaper and lower in carbon), is the cheapest layout within its own carbon, and no point dominates another;
 * and no exact frontier point lies strictly below the hull the points span (the supported points are all found).
 */
class SpanFrontierTest {
    @Test
    void frontierMatchesExhaustiveEnumeration() {
        Random rnd = new Random(Long.getLong("oracle.seed", 31_415L));
        int instances = Integer.getInteger("oracle.instances", 30);
        SolverOptions options = new SolverOptions(30, 1, 1);
        int longer = 0;
        int feasible = 0;
        for (int i = 0; i < instances; i++) {
            CarbonFactors f = new CarbonFactors(
                    150 + 450 * rnd.nextDouble(),
                    0.3 + 2.7 * rnd.nextDouble(),
                    0.3 + 2.7 * rnd.nextDouble(),
                    rnd.nextInt(3) == 0 ? 0 : 6 * rnd.nextDouble());
            CostModel model = SpanOracleTest.COST.withCarbon(f);
            SpanProblem p = RandomSpans.small(rnd);
            String where = "instance " + i + ": " + f + " " + p;
            SpanFrontier.Result r = SpanFrontier.of(p, model, options);
            List<long[]> all = new SpanExhaustive(model.money()).priced(p, model.carbon());
            if (all.isEmpty()) {
                assertTrue(r.points().isEmpty() && !r.first().feasible(), where);
                continue;
            }
            feasible++;
            assertTrue(r.complete(), where);
            List<long[]> exact = barfit.design.NonDominated.of(all);
            var pts = r.points();
            SpanDesigner.Outcome cheapest = new SpanDesigner(model, options).design(p, 0);
            SpanDesigner.Outcome lowest = new SpanDesigner(model.minimising(Objective.CARBON), options).design(p, 0);
            assertEquals(SpanFrontier.costUnits(cheapest), pts.get(0).cost(), "cheapest end — " + where);
            assertEquals(
                    SpanFrontier.carbonUnits(lowest), pts.get(pts.size() - 1).carbon(), "lowest-carbon end — " + where);
            for (int k = 0; k < pts.size(); k++) {
                SupportedFrontier.Point<SpanDesigner.Outcome> pt = pts.get(k);
                assertEquals(SpanFrontier.costUnits(pt.answer()), pt.cost(), where);
                // the cheapest passing layout within its own carbon, by enumeration
                long leastUnderCap = Long.MAX_VALUE;
                for (long[] x : all) {
                    if (x[1] <= pt.carbon()) {
                        leastUnderCap = Math.min(leastUnderCap, x[0]);
                    }
                }
                assertEquals(leastUnderCap, pt.cost(), "point " + k + " optimal under its cap — " + where);
                if (k > 0) {
                    assertTrue(
                            pt.cost() > pts.get(k - 1).cost()
                                    && pt.carbon() < pts.get(k - 1).carbon(),
                            where);
                }
            }
            // every exact frontier point lies on or above each segment's line (within a unit's rounding)
            for (int k = 0; k + 1 < pts.size(); k++) {
                long wc = pts.get(k).carbon() - pts.get(k + 1).carbon();
                long wk = pts.get(k + 1).cost() - pts.get(k).cost();
                double line = (double) wc * pts.get(k).cost()
                        + (double) wk * pts.get(k).carbon();
                for (long[] x : exact) {
                    assertTrue(
                            (double) wc * x[0] + (double) wk * x[1] >= line - (wc + wk) * 2.0,
                            "a frontier point below the hull: (" + x[0] + ", " + x[1] + ") — " + where);
                }
            }
            if (pts.size() > 1) {
                longer++;
            }
        }
        assertTrue(feasible >= instances / 3, "enough spans with designs: " + feasible);
        assertTrue(longer >= 3, "frontiers of more than one point: " + longer);
    }
}
