package barfit.design.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.CostModel;
import barfit.design.CostRates;
import barfit.design.SolverOptions;
import barfit.section.CodeEquations;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * A section whose candidates' prices decide the choice (the cheapest strictly below the next) is designed
 * without a CP-SAT solve: on random small problems (invented), with and without alternatives, the design,
 * the alternatives and the proof's objective are exactly those the CP-SAT model gives over the same
 * candidates.
 */
class DecidedSectionTest {
    @Test
    void comparisonGivesWhatTheModelGives() {
        Random rnd = new Random(Long.getLong("oracle.seed", 496L));
        CostModel cost = new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI);
        SectionDesigner designer = new SectionDesigner(cost, new SolverOptions(30, 1, 1));
        SectionDesigner solver = designer.solvingAlways();
        int decided = 0;
        int feasible = 0;
        for (int i = 0; i < 300; i++) {
            SectionProblem p = RandomProblems.small(rnd);
            int alternatives = i % 3;
            DesignOutcome got = designer.design(p, alternatives);
            DesignOutcome ref = solver.design(p, alternatives);
            String where = "section " + i + ": " + p;
            assertEquals(ref.feasible(), got.feasible(), where);
            if (!ref.feasible()) {
                continue;
            }
            feasible++;
            assertEquals(ref.best().layout(), got.best().layout(), where);
            assertEquals(ref.alternatives().size(), got.alternatives().size(), where);
            for (int k = 0; k < ref.alternatives().size(); k++) {
                assertEquals(
                        ref.alternatives().get(k).layout(),
                        got.alternatives().get(k).layout(),
                        where + " alt " + k);
            }
            assertEquals(ref.proof().objective(), got.proof().objective(), 1e-9, where);
            assertEquals(ref.proof().status(), got.proof().status(), where);
            decided += got.proof().withoutSolve() ? 1 : 0;
        }
        assertTrue(feasible >= 100, "sections with a design: " + feasible);
        assertTrue(decided >= feasible / 3, "sections decided by comparison: " + decided + " of " + feasible);
    }

    /**
     * Where the model does decide and the time limit ends it before its first solution, the generator's
     * cheapest candidate is given as found but not proven (no bound).
     */
    @Test
    void aSolveCutShortIsNotProven() {
        CostModel cost = new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI);
        SectionDesigner solver = new SectionDesigner(cost, new SolverOptions(1e-9, 1, 1)).solvingAlways();
        Random rnd = new Random(7);
        int unproven = 0;
        for (int i = 0; i < 20; i++) {
            DesignOutcome o = solver.design(RandomProblems.small(rnd), 0);
            if (o.feasible()) {
                assertEquals(barfit.design.Proof.Status.UNPROVEN, o.proof().status(), o.toString());
                assertTrue(Double.isNaN(o.proof().bound()));
                unproven++;
            }
        }
        assertTrue(unproven > 0);
    }
}
