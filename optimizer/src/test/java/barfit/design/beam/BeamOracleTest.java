package barfit.design.beam;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.CostModel;
import barfit.design.CostRates;
import barfit.design.SolverOptions;
import barfit.units.UnitSystem;
import barfit.section.CodeEquations;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Whole spans: the optimizer against plain enumeration of every combination (each verified by the
 * full section model) on random small beams: equal cost, and a design exactly when one exists.
 */
class BeamOracleTest {
    static final CostModel COST = new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI);

    @Test
    void optimizerMatchesExhaustiveEnumeration() {
        Random rnd = new Random(Long.getLong("beam.seed", 2027L));
        BeamDesigner designer = new BeamDesigner(COST, new SolverOptions(30, 1, 1));
        BeamExhaustive oracle = new BeamExhaustive(COST);
        int instances = Integer.getInteger("beam.instances", 110);
        int feasible = 0;
        for (int i = 0; i < instances; i++) {
            BeamProblem p = RandomBeams.small(rnd);
            BeamExhaustive.Result ref = oracle.solve(p);
            BeamDesigner.Outcome got = designer.design(p, 0);
            String where = "beam " + i + ": " + p;
            if (ref.best() == null) {
                assertTrue(!got.feasible(), "oracle finds nothing, optimizer found "
                        + (got.best() == null ? "" : got.best().layout()) + " — " + where);
                continue;
            }
            feasible++;
            assertTrue(got.feasible(), "optimizer finds nothing, oracle " + ref.best() + " — " + where);
            assertEquals(ref.units(), CostModel.units(got.best().cost().total()), "cost; oracle " + ref.best()
                    + " optimizer " + got.best().layout() + " — " + where);
        }
        assertTrue(feasible >= instances / 2, "enough feasible beams: " + feasible);
    }
}
