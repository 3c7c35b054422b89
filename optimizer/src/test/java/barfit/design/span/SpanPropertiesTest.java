package barfit.design.span;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.CostModel;
import barfit.design.SolverOptions;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** Properties of whole-span answers on seeded random beams. */
class SpanPropertiesTest {
    private final SpanDesigner designer = new SpanDesigner(SpanOracleTest.COST, new SolverOptions(30, 1, 1));

    private long cost(SpanProblem p) {
        var o = designer.design(p, 0);
        return o.feasible() ? CostModel.units(o.best().cost().total()) : Long.MAX_VALUE;
    }

    @Test
    void largerMomentsOrShearsNeverCostLess() {
        Random r = new Random(44);
        for (int i = 0; i < 40; i++) {
            SpanProblem p = RandomSpans.small(r);
            long base = cost(p);
            assertTrue(cost(p.scaled(1.25, 1.0)) >= base, "moments x1.25 cost less: " + p);
            if (p.vLeft() != null) {
                assertTrue(cost(p.scaled(1.0, 1.4)) >= base, "shears x1.4 cost less: " + p);
            }
        }
    }

    @Test
    void everyPrintedSpanPassesAndTheProofIsTight() {
        Random r = new Random(45);
        int seen = 0;
        int alternatives = 0;
        for (int i = 0; i < 40; i++) {
            SpanProblem p = RandomSpans.small(r);
            var o = designer.design(p, 2);
            if (!o.feasible()) {
                assertTrue(o.diagnosis() != null);
                continue;
            }
            seen++;
            assertTrue(SpanVerifier.verify(p, o.best().layout(), false).ok());
            assertEquals("optimal", o.status());
            assertEquals(o.proof().objective(), o.proof().bound());
            double previous = o.best().cost().total();
            for (var alt : o.alternatives()) {
                assertTrue(alt.report().ok());
                assertTrue(SpanVerifier.verify(p, alt.layout(), false).ok());
                assertTrue(alt.cost().total() >= previous - 1e-6, "alternatives come cheapest first");
                previous = alt.cost().total();
            }
            alternatives += o.alternatives().size();
            // the bar list accounts for the cost of the bars
            double main = 0;
            for (var m : o.best().bars()) {
                if (!m.mark().startsWith("S")) {
                    main += m.count() * m.length() / 1000 * m.bar().massPerMetre();
                }
            }
            double rates = SpanOracleTest.COST.rates().mainBarsPerKg()
                    * SpanOracleTest.COST.rates().lapFactor();
            assertEquals(o.best().cost().mainBars(), main * rates, 1e-6);
            // and of the stirrups: hoops and crossties, each set as the cost model prices it
            double stirrupKg = 0;
            double setKg = 0;
            var zones = p.zones();
            for (int z = 0; z < zones.size(); z++) {
                var st = o.best().layout().zoneStirrups().get(z);
                setKg += SpanLayout.stirrupSets(zones.get(z).length(), st.spacing())
                        * SpanOracleTest.COST.stirrupSetLength(
                                o.best().layout().width(), o.best().layout().height(), st.bar(), st.legs())
                        / 1000
                        * st.bar().massPerMetre();
            }
            for (var m : o.best().bars()) {
                if (m.mark().startsWith("S")) {
                    stirrupKg += m.count() * m.length() / 1000 * m.bar().massPerMetre();
                }
            }
            assertEquals(setKg, stirrupKg, 1e-6, "the bar list's hoops and crossties weigh what is priced");
            assertEquals(
                    o.best().cost().stirrups(),
                    stirrupKg * SpanOracleTest.COST.rates().stirrupsPerKg(),
                    1e-6);
        }
        assertTrue(seen > 20);
        // two were asked of every span; a small space may hold fewer distinct designs, but not across the board
        assertTrue(alternatives > seen, "alternatives found: " + alternatives + " over " + seen + " spans");
    }
}
