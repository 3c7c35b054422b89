package barfit.design.span;

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
 * Whole spans under {@code --objective carbon} against plain enumeration: with random carbon factors
 * (invented), the least carbon equals the exhaustive search's with the factors as rates, and the cost
 * reported beside it is that span's at the cost rates.
 */
class SpanCarbonOracleTest {
    @Test
    void leastCarbonMatchesExhaustiveEnumeration() {
        Random rnd = new Random(Long.getLong("beam.seed", 1_8L));
        int instances = Integer.getInteger("beam.instances", 40);
        CostModel money = new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI);
        int feasible = 0;
        for (int i = 0; i < instances; i++) {
            CarbonFactors f = new CarbonFactors(
                    150 + 450 * rnd.nextDouble(),
                    0.3 + 2.7 * rnd.nextDouble(),
                    0.3 + 2.7 * rnd.nextDouble(),
                    rnd.nextInt(3) == 0 ? 0 : 6 * rnd.nextDouble());
            SpanProblem p = RandomSpans.small(rnd);
            SpanExhaustive.Result ref = new SpanExhaustive(
                            new CostModel(f.rates(CostRates.DEFAULTS.lapFactor()), 40, CodeEquations.SI))
                    .solve(p);
            SpanDesigner.Outcome got = new SpanDesigner(
                            money.withCarbon(f).minimising(Objective.CARBON), new SolverOptions(30, 1, 1))
                    .design(p, 0);
            String where = "beam " + i + ": " + f + " " + p;
            if (ref.best() == null) {
                assertTrue(!got.feasible(), "oracle finds nothing, optimizer does — " + where);
                continue;
            }
            feasible++;
            assertTrue(got.feasible(), "optimizer finds nothing, oracle " + ref.best() + " — " + where);
            assertEquals(
                    ref.units(),
                    CostModel.units(got.best().carbon().total()),
                    "carbon; oracle " + ref.best() + " optimizer " + got.best().layout() + " — " + where);
            assertEquals(
                    got.best().layout().cost(p, money).total(),
                    got.best().cost().total(),
                    1e-9,
                    "the cost beside it — " + where);
        }
        assertTrue(feasible >= instances / 2, "enough feasible beams: " + feasible);
    }
}
