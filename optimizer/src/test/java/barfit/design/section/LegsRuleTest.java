package barfit.design.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.CostModel;
import barfit.design.SearchSpace;
import barfit.design.SolverOptions;
import barfit.section.CheckResult;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The office rule of two stirrup legs per four bars is stricter than the code (ACI 318-19 asks only
 * 9.7.6.2.2 across the width and a bar in every leg's bend, 25.7.1.3): off by default, an option when
 * asked for, and never cheaper than the code's rules alone.
 */
class LegsRuleTest {
    private final SectionDesigner designer = new SectionDesigner(SectionOracleTest.COST, new SolverOptions(30, 1, 1));

    @Test
    void theOfficeRuleIsOffByDefaultAndNeverCheaper() {
        assertEquals(0, SearchSpace.DEFAULT_BARS_PER_TWO_LEGS);
        Random r = new Random(77);
        for (int i = 0; i < 40; i++) {
            SectionProblem p = RandomProblems.small(r);
            SectionProblem code = p.withSpace(p.space().withBarsPerTwoLegs(0));
            SectionProblem office = p.withSpace(p.space().withBarsPerTwoLegs(4));
            DesignOutcome a = designer.design(code, 0);
            DesignOutcome b = designer.design(office, 0);
            if (!b.feasible()) {
                continue;
            }
            assertTrue(a.feasible(), "the code's rules alone admit whatever the office rule admits: " + p);
            long ca = CostModel.units(a.best().costPerMetre().total());
            long cb = CostModel.units(b.best().costPerMetre().total());
            assertTrue(ca <= cb, "the office rule made it cheaper: " + p);
            assertFalse(a.best().report().check("stirrup_legs_bars").isPresent(), "no practice check by default");
            CheckResult practice = b.best().report().check("stirrup_legs_bars").orElseThrow();
            assertTrue(practice.pass());
        }
    }

    @Test
    void fiveLargeBarsInOneLayerNeedNoMoreThanTwoLegsByTheCode() {
        // Invented beam (demo data): Mu = 700 kN·m, Vu = 300 kN under a 600 mm cap, the default SI space. By
        // the code's rules the cheapest design is 5 bars in one layer with 2 legs; the office rule (two legs
        // per four bars) forbids that layout and so costs more.
        java.util.List<Double> depths = new java.util.ArrayList<>();
        for (double h = 400; h <= 800; h += 25) {
            depths.add(h);
        }
        java.util.List<Double> spacings = new java.util.ArrayList<>();
        for (double s = 75; s <= 600; s += 25) {
            spacings.add(s);
        }
        java.util.List<barfit.catalogs.BarSize> sizes = java.util.stream.Stream.of(
                        "16", "19", "22", "25", "29", "32", "36")
                .map(RandomProblems::bar)
                .toList();
        SearchSpace space = new SearchSpace(
                java.util.List.of(250.0, 300.0, 350.0, 400.0),
                depths,
                sizes,
                sizes,
                2,
                java.util.List.of(RandomProblems.bar("10")),
                java.util.List.of(2, 4),
                spacings);
        SectionProblem p = new SectionProblem(
                "P1",
                new barfit.section.Materials(28, 420, 420, 20, 1.0),
                new barfit.section.Detailing(40, RandomProblems.bar("10"), 25, barfit.section.Exposure.INTERIOR),
                barfit.section.CodeEquations.SI,
                space,
                700e6,
                300e3,
                null,
                600.0,
                null,
                null,
                1.0);
        DesignOutcome code = designer.design(p, 0);
        DesignOutcome office = designer.design(p.withSpace(space.withBarsPerTwoLegs(4)), 0);
        SectionLayout l = code.best().layout();
        assertEquals(2, l.stirrups().legs());
        assertTrue(l.tensionCounts().get(0) > 4, "more than four bars in the layer: " + l);
        assertTrue(office.best().layout().stirrups().legs() >= 2);
        assertTrue(CostModel.units(code.best().costPerMetre().total())
                < CostModel.units(office.best().costPerMetre().total()));
    }
}
