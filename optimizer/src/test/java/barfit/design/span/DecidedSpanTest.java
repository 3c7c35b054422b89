package barfit.design.span;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.SolverOptions;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * A span the generator's enumeration decides (one combination of the options left cheaper than every other)
 * is designed without a CP-SAT solve: on random small spans, with and without torsion (invented), the design,
 * its cost and its proof's objective are exactly those the CP-SAT model gives over the same options.
 */
class DecidedSpanTest {
    @Test
    void enumerationGivesWhatTheModelGives() {
        Random rnd = new Random(Long.getLong("oracle.seed", 8_128L));
        SpanDesigner designer = new SpanDesigner(SpanOracleTest.COST, new SolverOptions(30, 1, 1));
        SpanDesigner solver = designer.solvingAlways();
        int decided = 0;
        int feasible = 0;
        for (int i = 0; i < 160; i++) {
            SpanProblem p = i % 4 == 3 ? RandomSpans.torsion(rnd) : RandomSpans.small(rnd);
            SpanDesigner.Outcome got = designer.design(p, 0);
            SpanDesigner.Outcome ref = solver.design(p, 0);
            String where = "span " + i + ": " + p;
            assertEquals(ref.feasible(), got.feasible(), where);
            if (!ref.feasible()) {
                continue;
            }
            feasible++;
            assertEquals(ref.best().layout(), got.best().layout(), where);
            assertEquals(ref.best().cost().total(), got.best().cost().total(), 1e-9, where);
            assertEquals(ref.proof().objective(), got.proof().objective(), 1e-9, where);
            assertEquals(ref.proof().status(), got.proof().status(), where);
            decided += got.proof().search().enumerated() ? 1 : 0;
        }
        assertTrue(feasible >= 60, "spans with a design: " + feasible);
        assertTrue(decided >= feasible / 3, "spans decided by enumeration: " + decided + " of " + feasible);
    }
}
