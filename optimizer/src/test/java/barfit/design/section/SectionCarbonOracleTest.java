package barfit.design.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.CarbonFactors;
import barfit.design.CostModel;
import barfit.design.CostRates;
import barfit.design.Objective;
import barfit.design.SolverOptions;
import barfit.section.CodeEquations;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * {@code --objective carbon} against plain enumeration: on random small spaces and random carbon factors
 * (invented, over a range wider than published averages), the optimizer's least carbon equals the exhaustive
 * search's with the factors as its rates, exactly in the searches' units, and the cost it reports beside it
 * is that layout's at the cost rates.
 */
class SectionCarbonOracleTest {
    @Test
    void leastCarbonMatchesExhaustiveEnumeration() {
        Random rnd = new Random(Long.getLong("oracle.seed", 4_18L));
        int instances = Integer.getInteger("oracle.instances", 120);
        CostModel money = new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI);
        int feasible = 0;
        for (int i = 0; i < instances; i++) {
            CarbonFactors f = new CarbonFactors(
                    150 + 450 * rnd.nextDouble(),
                    0.3 + 2.7 * rnd.nextDouble(),
                    0.3 + 2.7 * rnd.nextDouble(),
                    rnd.nextInt(3) == 0 ? 0 : 6 * rnd.nextDouble());
            CostModel carbon = money.withCarbon(f).minimising(Objective.CARBON);
            SectionProblem p = RandomProblems.small(rnd);
            SectionExhaustive.Result ref = new SectionExhaustive(
                            new CostModel(f.rates(CostRates.DEFAULTS.lapFactor()), 40, CodeEquations.SI))
                    .solve(p);
            DesignOutcome got = new SectionDesigner(carbon, new SolverOptions(30, 1, 1)).design(p, 0);
            String where = "instance " + i + ": " + f + " " + p;
            if (ref.best() == null) {
                assertTrue(!got.feasible(), "oracle finds nothing, optimizer does — " + where);
                continue;
            }
            feasible++;
            assertTrue(got.feasible(), "optimizer finds nothing, oracle " + ref.best() + " — " + where);
            assertEquals("optimal", got.status(), where);
            long units = CostModel.units(got.best().carbonPerMetre().total());
            assertEquals(
                    ref.units(),
                    units,
                    "carbon; oracle " + ref.best() + " optimizer " + got.best().layout() + " — " + where);
            assertEquals(units, CostModel.units(got.proof().objective()), "the proof's objective is the carbon");
            assertEquals(Objective.CARBON, got.proof().measure());
            assertEquals(
                    got.best().layout().cost(money).total(),
                    got.best().costPerMetre().total(),
                    1e-9,
                    "the cost beside it — " + where);
        }
        assertTrue(feasible >= instances * 2 / 5, "enough feasible instances to mean something: " + feasible);
    }
}
