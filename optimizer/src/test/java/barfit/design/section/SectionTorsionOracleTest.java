package barfit.design.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.CostModel;
import barfit.design.SolverOptions;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The optimizer against plain enumeration on sections under torsion: on random small spaces each carrying a
 * factored torsion, its cost equals the exhaustive search's exactly (in cost units) and it finds a design
 * exactly when one exists. 200 instances in {@code mvn verify}; more with
 * {@code -Doracle.torsion.instances=N -Doracle.torsion.seed=S}, wider spaces (more sizes, up to three layers,
 * either edition's equations) with {@code -Doracle.torsion.medium=true}.
 */
class SectionTorsionOracleTest {
    @Test
    void optimizerMatchesExhaustiveEnumerationUnderTorsion() {
        Random rnd = new Random(Long.getLong("oracle.torsion.seed", 22_7L));
        SectionDesigner designer = new SectionDesigner(SectionOracleTest.COST, new SolverOptions(30, 1, 1));
        SectionExhaustive oracle = new SectionExhaustive(SectionOracleTest.COST);
        int feasible = 0;
        int designedForTorsion = 0;
        int instances = Integer.getInteger("oracle.torsion.instances", 200);
        long oracleNanos = 0;
        long designNanos = 0;
        for (int i = 0; i < instances; i++) {
            SectionProblem p = Boolean.getBoolean("oracle.torsion.medium")
                    ? RandomProblems.mediumTorsion(rnd)
                    : RandomProblems.torsion(rnd);
            long t0 = System.nanoTime();
            SectionExhaustive.Result ref = oracle.solve(p);
            long t1 = System.nanoTime();
            DesignOutcome got = designer.design(p, 0);
            long t2 = System.nanoTime();
            oracleNanos += t1 - t0;
            designNanos += t2 - t1;
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
            if (!got.best()
                    .report()
                    .check("torsion_transverse")
                    .orElseThrow()
                    .title()
                    .endsWith("(neglected)")) {
                designedForTorsion++;
            }
            if (i % 4 == 0) {
                DesignOutcome withAlts = designer.design(p, 2);
                List<Long> mine = new ArrayList<>();
                mine.add(CostModel.units(withAlts.best().costPerMetre().total()));
                withAlts.alternatives()
                        .forEach(d -> mine.add(CostModel.units(d.costPerMetre().total())));
                assertEquals(ref.cheapestKeys(3), mine, "alternatives — " + where);
            }
        }
        System.out.printf(
                "torsion oracle: %d instances, %d feasible, %d designed for torsion; oracle %.1f s, optimizer %.1f s%n",
                instances, feasible, designedForTorsion, oracleNanos / 1e9, designNanos / 1e9);
        assertTrue(feasible >= instances / 4, "enough feasible instances to mean something: " + feasible);
        assertTrue(designedForTorsion >= instances / 8, "enough designed for torsion: " + designedForTorsion);
    }
}
