package barfit.design.span;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.CostModel;
import barfit.design.SolverOptions;
import barfit.section.CheckResult;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Whole spans under torsion: the optimizer against plain enumeration of every combination (each verified
 * by the full section model, the torsion checks of every zone included) on random small beams: equal cost,
 * and a design exactly when one exists. 25 in {@code mvn verify} (about 30 s); more with
 * {@code -Dspan.torsion.instances=N -Dspan.torsion.seed=S}.
 */
class SpanTorsionOracleTest {
    @Test
    void optimizerMatchesExhaustiveEnumerationUnderTorsion() {
        Random rnd = new Random(Long.getLong("span.torsion.seed", 9_4_4L));
        SpanDesigner designer = new SpanDesigner(SpanOracleTest.COST, new SolverOptions(30, 1, 1));
        SpanExhaustive oracle = new SpanExhaustive(SpanOracleTest.COST);
        int instances = Integer.getInteger("span.torsion.instances", 25);
        int feasible = 0;
        int designedForTorsion = 0;
        for (int i = 0; i < instances; i++) {
            SpanProblem p = RandomSpans.torsion(rnd);
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
            // the printed span was re-verified with its zones' torsion checks
            SpanReport report = SpanVerifier.verify(p, got.best().layout(), false);
            assertTrue(report.ok(), where);
            boolean designed = report.zoneChecks().stream()
                    .filter(c -> c.id().startsWith("torsion_threshold."))
                    .anyMatch(c -> !c.title().contains("neglected"));
            assertTrue(
                    report.zoneChecks().stream().anyMatch(c -> c.id().startsWith("torsion_")),
                    "torsion checks in the zones — " + where);
            if (designed) {
                designedForTorsion++;
                assertTrue(report.zoneChecks().stream()
                        .filter(c -> c.id().startsWith("torsion_longitudinal."))
                        .allMatch(CheckResult::pass));
            }
        }
        assertTrue(feasible >= instances / 3, "enough feasible beams: " + feasible);
        assertTrue(designedForTorsion >= feasible / 3, "enough designed for torsion: " + designedForTorsion);
    }
}
