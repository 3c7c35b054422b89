package barfit.design.span;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.CarbonFactors;
import barfit.design.CostModel;
import barfit.design.Objective;
import barfit.design.SolverOptions;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * A whole span's cheapest design under a carbon cap ({@code design --carbon-cap}) against plain enumeration
 * of every passing layout, on random small spans with random carbon factors and caps (invented): the same
 * least cost within the cap, and no design exactly when no layout is within it. The parts' carbon as the
 * CP-SAT model holds it ({@link SpanPrices}) is first checked against the prices the generator gave them.
 */
class SpanCarbonCapOracleTest {
    @Test
    void pricesOfThePartsAreTheGeneratorsOwn() {
        Random rnd = new Random(Long.getLong("oracle.seed", 4_242L));
        int checked = 0;
        for (int i = 0; i < 25; i++) {
            SpanProblem p = RandomSpans.small(rnd);
            SpanGenerator gen = new SpanGenerator(p, SpanOracleTest.COST).keepingDominated();
            var out = gen.optionsUnder(Double.POSITIVE_INFINITY);
            if (out.sets().isEmpty()) {
                continue;
            }
            SpanSelection sel = new SpanSelection(p, out.sets());
            for (double[] x : sel.pricedChoices(new SpanPrices(p, SpanOracleTest.COST))) {
                // the model holds each price in millionths: equal to within that rounding
                assertEquals(x[0], x[1], 1e-6 + 1e-12 * Math.abs(x[1]), "span " + i + ": " + p);
                checked++;
            }
        }
        assertTrue(checked > 100, "parts checked: " + checked);
    }

    @Test
    void cheapestUnderACapMatchesEnumeration() {
        Random rnd = new Random(Long.getLong("oracle.seed", 1_729L));
        int instances = Integer.getInteger("oracle.instances", 50);
        SolverOptions options = new SolverOptions(30, 1, 1);
        int capped = 0;
        int binding = 0;
        int refused = 0;
        for (int i = 0; i < instances; i++) {
            CarbonFactors f = new CarbonFactors(
                    100 + 300 * rnd.nextDouble(),
                    0.8 + 2.2 * rnd.nextDouble(),
                    0.8 + 2.2 * rnd.nextDouble(),
                    rnd.nextInt(3) == 0 ? 0 : 6 * rnd.nextDouble());
            CostModel model = SpanOracleTest.COST.withCarbon(f);
            SpanProblem p = RandomSpans.small(rnd);
            List<long[]> all = new SpanExhaustive(model.money()).priced(p, model.carbon());
            if (all.isEmpty()) {
                continue;
            }
            long leastCarbon = all.stream().mapToLong(x -> x[1]).min().orElseThrow();
            long cheapest = all.stream().mapToLong(x -> x[0]).min().orElseThrow();
            long carbonOfCheapest = all.stream()
                    .filter(x -> x[0] == cheapest)
                    .mapToLong(x -> x[1])
                    .min()
                    .orElseThrow();
            // a cap below the least carbon (one in six), else up to a little above the cheapest design's, kept clear
            // (by 0.01 kg) of every layout's carbon so that rounding cannot decide which side one falls
            long cap = rnd.nextInt(6) == 0
                    ? leastCarbon - 2_000 - rnd.nextInt(20_000)
                    : leastCarbon + (long) (rnd.nextDouble() * (carbonOfCheapest - leastCarbon + 2_000));
            final long c0 = cap;
            while (all.stream().anyMatch(x -> Math.abs(x[1] - c0) < 100)) {
                cap += 100;
                final long c1 = cap;
                if (all.stream().noneMatch(x -> Math.abs(x[1] - c1) < 100)) {
                    break;
                }
            }
            final long capUnits = cap;
            long expected = all.stream()
                    .filter(x -> x[1] <= capUnits)
                    .mapToLong(x -> x[0])
                    .min()
                    .orElse(-1);
            double capPerMetre = CostModel.currency(capUnits) / (p.span() / 1000.0);
            SpanDesigner.Outcome got = new SpanDesigner(model, options).design(p, 0, capPerMetre);
            String where = "span " + i + ", cap " + CostModel.currency(capUnits) + " kg, " + f + " " + p;
            capped++;
            if (expected < 0) {
                refused++;
                assertTrue(!got.feasible(), "nothing within the cap, yet a design — " + where);
                assertEquals("carbon_cap", got.diagnosis().limit(), where);
                continue;
            }
            assertTrue(got.feasible(), "the oracle has a design within the cap — " + where);
            assertEquals(expected, CostModel.units(got.best().cost().total()), "least cost within the cap — " + where);
            assertTrue(CostModel.units(got.best().carbon().total()) <= capUnits, where);
            binding += expected > cheapest ? 1 : 0;
            // minimising carbon under the same cap gives the least carbon when it is within it
            SpanDesigner.Outcome lean =
                    new SpanDesigner(model.minimising(Objective.CARBON), options).design(p, 0, capPerMetre);
            assertEquals(leastCarbon, CostModel.units(lean.best().carbon().total()), where);
        }
        assertTrue(capped >= instances / 3, "spans capped: " + capped);
        assertTrue(binding >= 3, "caps that bind: " + binding);
        assertTrue(refused >= 1, "caps below every design: " + refused);
    }
}
