package barfit.design.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.CostModel;
import barfit.design.CostRates;
import barfit.design.SolverOptions;
import barfit.section.CodeEquations;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The optimizer against plain enumeration: on hundreds of random small spaces, its cost equals the
 * exhaustive search's exactly (in cost units) and it finds a design exactly when one exists.
 */
class SectionOracleTest {
    static final CostModel COST = new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI);

    @Test
    void optimizerMatchesExhaustiveEnumeration() {
        Random rnd = new Random(Long.getLong("oracle.seed", 318_19L));
        SectionDesigner designer = new SectionDesigner(COST, new SolverOptions(30, 1, 1));
        SectionExhaustive oracle = new SectionExhaustive(COST);
        int feasible = 0;
        int instances = Integer.getInteger("oracle.instances", 320);
        for (int i = 0; i < instances; i++) {
            SectionProblem p =
                    Boolean.getBoolean("oracle.medium") ? RandomProblems.medium(rnd) : RandomProblems.small(rnd);
            SectionExhaustive.Result ref = oracle.solve(p);
            DesignOutcome got = designer.design(p, 0);
            String where = "instance " + i + ": " + p;
            if (ref.best() == null) {
                assertTrue(
                        !got.feasible(),
                        "oracle finds nothing but the optimizer found "
                                + (got.best() == null ? "" : got.best().layout()) + " — " + where);
                continue;
            }
            feasible++;
            assertTrue(got.feasible(), "optimizer finds nothing, oracle " + ref.best() + " — " + where);
            assertEquals("optimal", got.status(), where);
            long units = CostModel.units(got.best().costPerMetre().total());
            assertEquals(
                    ref.units(),
                    units,
                    "cost; oracle " + ref.best() + " optimizer " + got.best().layout() + " — " + where);
            assertEquals(units, CostModel.units(got.proof().objective()), "the proof's objective is the design's cost");
            if (i % 4 == 0) {
                // the next-cheapest distinct designs, too
                DesignOutcome withAlts = designer.design(p, 2);
                List<Long> mine = new ArrayList<>();
                mine.add(CostModel.units(withAlts.best().costPerMetre().total()));
                withAlts.alternatives()
                        .forEach(d -> mine.add(CostModel.units(d.costPerMetre().total())));
                assertEquals(ref.cheapestKeys(3), mine, "alternatives — " + where);
            }
        }
        // spaces with two-leg stirrups only cannot hold more than four bars a layer (the legs rule), so a
        // little under half of the random spaces have no design
        assertTrue(feasible >= instances * 2 / 5, "enough feasible instances to mean something: " + feasible);
    }
}
