package barfit.design.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.CarbonFactors;
import barfit.design.CostModel;
import barfit.design.CostRates;
import barfit.design.Objective;
import barfit.design.SolverOptions;
import barfit.section.CodeEquations;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

/**
 * The cost-carbon frontier of a section against plain enumeration, on random small spaces and random carbon
 * factors (invented): its ends are the cheapest and the lowest-carbon designs, each point is the cheapest
 * design within its own carbon (the exhaustive search under that cap), no point dominates another, and the
 * points are exactly the non-dominated (cost, carbon) pairs of every passing layout.
 */
class SectionFrontierTest {
    @Test
    void frontierMatchesExhaustiveEnumeration() {
        Random rnd = new Random(Long.getLong("oracle.seed", 16_180L));
        int instances = Integer.getInteger("oracle.instances", 80);
        CostModel money = new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI);
        SolverOptions options = new SolverOptions(30, 1, 1);
        int withFrontier = 0;
        int longer = 0;
        for (int i = 0; i < instances; i++) {
            CarbonFactors f = new CarbonFactors(
                    150 + 450 * rnd.nextDouble(),
                    0.3 + 2.7 * rnd.nextDouble(),
                    0.3 + 2.7 * rnd.nextDouble(),
                    rnd.nextInt(3) == 0 ? 0 : 6 * rnd.nextDouble());
            CostModel model = money.withCarbon(f);
            CostModel carbon = model.carbon();
            SectionProblem p = RandomProblems.small(rnd);
            SectionFrontier.Result r = SectionFrontier.of(p, model, options);
            String where = "instance " + i + ": " + f + " " + p;
            SectionExhaustive all = new SectionExhaustive(money, carbon, Long.MAX_VALUE, true);
            all.solve(p);
            List<long[]> expected = nonDominated(all.passing(), money, carbon);
            List<long[]> got = new ArrayList<>();
            r.points().forEach(pt -> got.add(new long[] {pt.costUnits(), pt.carbonUnits()}));
            assertEquals(text(expected), text(got), "the frontier — " + where);
            if (got.isEmpty()) {
                assertTrue(!r.first().feasible(), where);
                continue;
            }
            withFrontier++;
            if (got.size() > 1) {
                longer++;
            }
            // the ends: design --objective cost and --objective carbon
            DesignOutcome cheapest = new SectionDesigner(model, options).design(p, 0);
            DesignOutcome lowest = new SectionDesigner(model.minimising(Objective.CARBON), options).design(p, 0);
            assertEquals(CostModel.units(cheapest.best().costPerMetre().total()), got.get(0)[0], where);
            assertEquals(CostModel.units(lowest.best().carbonPerMetre().total()), got.get(got.size() - 1)[1], where);
            for (int k = 0; k < got.size(); k++) {
                // the cheapest within its own carbon, by enumeration
                long cap = got.get(k)[1];
                assertEquals(
                        new SectionExhaustive(money, carbon, cap, false)
                                .solve(p)
                                .units(),
                        got.get(k)[0],
                        "point " + k + " optimal under its cap — " + where);
                if (k > 0) {
                    // no point dominates another: cost rises strictly as carbon falls strictly
                    assertTrue(got.get(k)[0] > got.get(k - 1)[0] && got.get(k)[1] < got.get(k - 1)[1], where);
                }
            }
        }
        assertTrue(withFrontier >= instances * 2 / 5, "enough instances with designs: " + withFrontier);
        assertTrue(longer >= 3, "frontiers of more than one point: " + longer);
    }

    /** The (cost, carbon) pairs no other pair is at least as good as in both and better in one, cheapest first. */
    private static List<long[]> nonDominated(List<SectionLayout> layouts, CostModel money, CostModel carbon) {
        TreeMap<Long, Long> leastCarbonAtCost = new TreeMap<>();
        for (SectionLayout l : layouts) {
            long c = CostModel.units(l.cost(money).total());
            long k = CostModel.units(l.cost(carbon).total());
            leastCarbonAtCost.merge(c, k, Math::min);
        }
        List<long[]> out = new ArrayList<>();
        long best = Long.MAX_VALUE;
        for (var e : leastCarbonAtCost.entrySet()) {
            if (e.getValue() < best) {
                out.add(new long[] {e.getKey(), e.getValue()});
                best = e.getValue();
            }
        }
        return out;
    }

    private static String text(List<long[]> points) {
        StringBuilder sb = new StringBuilder();
        points.forEach(
                x -> sb.append('(').append(x[0]).append(", ").append(x[1]).append(") "));
        return sb.toString();
    }
}
