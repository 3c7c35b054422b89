package barfit.design.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.CostModel;
import barfit.design.SolverOptions;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** Properties every answer must have, on seeded random problems. */
class SectionPropertiesTest {
    private final SectionDesigner designer = new SectionDesigner(SectionOracleTest.COST, new SolverOptions(30, 1, 1));

    private long cost(SectionProblem p) {
        DesignOutcome o = designer.design(p, 0);
        return o.feasible() ? CostModel.units(o.best().costPerMetre().total()) : Long.MAX_VALUE;
    }

    @Test
    void aLargerMomentNeverCostsLess() {
        Random r = new Random(7);
        for (int i = 0; i < 60; i++) {
            SectionProblem p = RandomProblems.small(r);
            long previous = 0;
            for (double k : new double[] {0.4, 0.7, 1.0, 1.3}) {
                long c = cost(p.withMoment(p.mu() * k));
                assertTrue(c >= previous, "moment x" + k + " costs less: " + p);
                previous = c;
            }
        }
    }

    @Test
    void aLargerShearNeverCostsLess() {
        Random r = new Random(8);
        for (int i = 0; i < 60; i++) {
            SectionProblem p = RandomProblems.small(r).withShear(50e3);
            long previous = 0;
            for (double v : new double[] {50e3, 150e3, 300e3, 450e3}) {
                long c = cost(p.withShear(v));
                assertTrue(c >= previous, "Vu " + v + " costs less: " + p);
                previous = c;
            }
        }
    }

    @Test
    void aLowerHeadroomCapNeverCostsLess() {
        Random r = new Random(9);
        for (int i = 0; i < 60; i++) {
            SectionProblem p = RandomProblems.small(r).withMaxDepth(null);
            List<Double> depths = p.space().depths();
            long previous = 0;
            for (int k = depths.size() - 1; k >= 0; k--) {
                long c = cost(p.withMaxDepth(depths.get(k)));
                assertTrue(c >= previous, "cap " + depths.get(k) + " costs less than a higher cap: " + p);
                previous = c;
            }
        }
    }

    @Test
    void alternativesAreDistinctDearerAndVerified() {
        Random r = new Random(10);
        int seen = 0;
        for (int i = 0; i < 40; i++) {
            SectionProblem p = RandomProblems.small(r);
            DesignOutcome o = designer.design(p, 3);
            if (!o.feasible()) {
                continue;
            }
            long best = CostModel.units(o.best().costPerMetre().total());
            java.util.Set<String> keys = new java.util.HashSet<>();
            keys.add(o.best().layout().distinctKey());
            for (Design d : o.alternatives()) {
                seen++;
                assertTrue(CostModel.units(d.costPerMetre().total()) >= best);
                assertTrue(keys.add(d.layout().distinctKey()), "alternatives must differ in size or bar");
                assertTrue(d.report().ok());
            }
            assertEquals(o.proof().objective(), o.proof().bound(), "optimal: the bound meets the objective");
        }
        assertTrue(seen > 20, "enough alternatives exercised: " + seen);
    }
}
