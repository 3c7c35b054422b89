package barfit.design.span;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.CostModel;
import barfit.design.CostRates;
import barfit.design.SolverOptions;
import barfit.section.CodeEquations;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Whole spans: the optimizer against plain enumeration of every combination (each verified by the
 * full section model) on random small beams: equal cost, and a design exactly when one exists.
 */
class SpanOracleTest {
    static final CostModel COST = new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI);

    @Test
    void optimizerMatchesExhaustiveEnumeration() {
        Random rnd = new Random(Long.getLong("beam.seed", 2027L));
        SpanDesigner designer = new SpanDesigner(COST, new SolverOptions(30, 1, 1));
        SpanExhaustive oracle = new SpanExhaustive(COST);
        int instances = Integer.getInteger("beam.instances", 110);
        int feasible = 0;
        for (int i = 0; i < instances; i++) {
            SpanProblem p = RandomSpans.small(rnd);
            SpanExhaustive.Result ref = oracle.solve(p);
            SpanDesigner.Outcome got = designer.design(p, 0);
            String where = "beam " + i + ": " + p;
            if (ref.best() == null) {
                assertTrue(
                        !got.feasible(),
                        "oracle finds nothing, optimizer found "
                                + (got.best() == null ? "" : got.best().layout()) + " — " + where);
                continue;
            }
            feasible++;
            assertTrue(got.feasible(), "optimizer finds nothing, oracle " + ref.best() + " — " + where);
            assertEquals(
                    ref.units(),
                    CostModel.units(got.best().cost().total()),
                    "cost; oracle " + ref.best() + " optimizer " + got.best().layout() + " — " + where);
        }
        assertTrue(feasible >= instances / 2, "enough feasible beams: " + feasible);
    }
}
