package barfit.design.span;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.catalogs.BarSize;
import barfit.design.CostModel;
import barfit.design.CostRates;
import barfit.design.SolverOptions;
import barfit.section.CodeEquations;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The pair table (each section size priced exactly for every pair of bar sizes, what a schedule's
 * rationalisation is built on) against fresh proven designs of the same span restricted to that size
 * and those bar sizes.
 */
class PairTableTest {
    static final CostModel COST = new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI);

    @Test
    void everyEntryEqualsARestrictedDesign() {
        Random rnd = new Random(Long.getLong("pairs.seed", 4049L));
        SpanDesigner designer = new SpanDesigner(COST, new SolverOptions(30, 1, 1));
        int instances = Integer.getInteger("pairs.instances", 25);
        int compared = 0;
        int finite = 0;
        for (int i = 0; i < instances; i++) {
            SpanProblem p = RandomSpans.small(rnd);
            PairTables tables = new PairTables(p, COST);
            List<BarSize> sizes = p.space().barSizes();
            for (double b : p.widths()) {
                for (double h : p.depths()) {
                    PairTable t = tables.exact(b, h);
                    for (int x = 0; x < sizes.size(); x++) {
                        for (int y = x; y < sizes.size(); y++) {
                            boolean[] allowed = new boolean[sizes.size()];
                            allowed[x] = true;
                            allowed[y] = true;
                            List<BarSize> only = new ArrayList<>(List.of(sizes.get(x)));
                            if (y != x) {
                                only.add(sizes.get(y));
                            }
                            SpanProblem q = p.withFixedWidth(b)
                                    .withSpace(p.space().withDepths(List.of(h)).withMainBars(only));
                            SpanDesigner.Outcome o = designer.design(q, 0);
                            double table = t.best(allowed);
                            String where = "beam " + i + " " + b + "x" + h + " " + only + ": " + p;
                            compared++;
                            if (!o.feasible()) {
                                assertTrue(Double.isInfinite(table), "table " + table + " but no design — " + where);
                                continue;
                            }
                            finite++;
                            // the two sum the same terms in another order: equal to the last unit of 1e-4
                            assertEquals(
                                    o.best().cost().total(),
                                    table,
                                    1.5e-4,
                                    "table against design " + o.best().layout() + " — " + where);
                        }
                    }
                }
            }
        }
        assertTrue(finite >= compared / 4, "enough feasible entries: " + finite + " of " + compared);
    }
}
