package barfit.design.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.CarbonFactors;
import barfit.design.CostModel;
import barfit.design.CostRates;
import barfit.design.Diagnosis;
import barfit.design.SolverOptions;
import barfit.section.CodeEquations;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * {@code --carbon-cap} against plain enumeration: on random small spaces, random carbon factors (invented)
 * and random caps between the least carbon and the carbon of the cheapest design (and some below the least),
 * the optimizer's cost equals the cheapest the exhaustive search finds among layouts within the cap, its
 * design is within the cap, and where nothing is, the diagnosis gives the least carbon achievable.
 */
class SectionCarbonCapOracleTest {
    @Test
    void cheapestWithinTheCapMatchesExhaustiveEnumeration() {
        // most small spaces have one design cheapest and least in carbon alike: run on until enough caps bind
        check(
                RandomProblems::small,
                Long.getLong("oracle.seed", 2_718L),
                Integer.getInteger("oracle.instances", 1200),
                Integer.getInteger("oracle.binding", 20));
    }

    /** Under torsion the generator tries every split, compression layer and skin option: the cap holds there too. */
    @Test
    void underTorsionToo() {
        check(
                RandomProblems::torsion,
                Long.getLong("oracle.seed", 577L),
                Integer.getInteger("oracle.instances", 600),
                Integer.getInteger("oracle.binding", 8));
    }

    private static void check(
            java.util.function.Function<Random, SectionProblem> problems, long seed, int instances, int enough) {
        Random rnd = new Random(seed);
        CostModel money = new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI);
        int capped = 0;
        int refused = 0;
        int binding = 0;
        for (int i = 0; i < instances && binding < enough; i++) {
            CarbonFactors f = new CarbonFactors(
                    150 + 450 * rnd.nextDouble(),
                    0.3 + 2.7 * rnd.nextDouble(),
                    0.3 + 2.7 * rnd.nextDouble(),
                    rnd.nextInt(3) == 0 ? 0 : 6 * rnd.nextDouble());
            CostModel model = money.withCarbon(f);
            CostModel carbon = model.carbon();
            SectionProblem p = problems.apply(rnd);
            SectionExhaustive.Result cheapest = new SectionExhaustive(money).solve(p);
            if (cheapest.best() == null) {
                continue;
            }
            long least = new SectionExhaustive(carbon).solve(p).units();
            long atCheapest = CostModel.units(cheapest.best().cost(carbon).total());
            long cap = rnd.nextInt(5) == 0
                    ? least - 1 - rnd.nextInt(1000)
                    // below the cheapest design's carbon where that is above the least, so the cap binds
                    : least + (long) (rnd.nextDouble() * Math.max(1, atCheapest - least));
            SectionExhaustive.Result ref = new SectionExhaustive(money, carbon, cap, false).solve(p);
            DesignOutcome got =
                    new SectionDesigner(model, new SolverOptions(30, 1, 1)).design(p, 0, CostModel.currency(cap));
            String where = "instance " + i + ": cap " + cap + " " + f + " " + p;
            if (ref.best() == null) {
                refused++;
                assertTrue(!got.feasible(), "oracle finds nothing within the cap, optimizer does — " + where);
                assertTrue(got.diagnosis().cause() instanceof Diagnosis.CarbonCapFails, where);
                var c = (Diagnosis.CarbonCapFails) got.diagnosis().cause();
                assertEquals(least, CostModel.units(c.least()), "the least carbon achievable — " + where);
                continue;
            }
            capped++;
            if (ref.units() > cheapest.units()) {
                binding++; // the cap moved the answer off the cheapest design
            }
            assertTrue(got.feasible(), "optimizer finds nothing, oracle " + ref.best() + " — " + where);
            assertEquals("optimal", got.status(), where);
            assertEquals(
                    ref.units(),
                    CostModel.units(got.best().costPerMetre().total()),
                    "cost; oracle " + ref.best() + " optimizer " + got.best().layout() + " — " + where);
            assertNotNull(got.best().carbonPerMetre());
            assertTrue(CostModel.units(got.best().carbonPerMetre().total()) <= cap, "within the cap — " + where);
        }
        assertTrue(refused >= 3, "some caps below the least carbon: " + refused);
        assertTrue(binding >= enough, "caps that move the answer: " + binding);
    }
}
