package barfit.design.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.catalogs.BarSize;
import barfit.design.SearchSpace;
import barfit.design.SolverOptions;
import barfit.section.CheckResult;
import barfit.section.CodeEquations;
import barfit.section.Detailing;
import barfit.section.Exposure;
import barfit.section.Materials;
import barfit.section.Stirrups;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * A section designed for torsion against a hand calculation from ACI 318M-19: its stirrups are the widest
 * spacing of the search space meeting (Av + 2At)/s, and the design re-verifies under Tu.
 */
class TorsionDesignTest {
    private static final double KNM = 1e6;
    private final SectionDesigner designer = new SectionDesigner(SectionOracleTest.COST, new SolverOptions(30, 1, 1));

    /** One frame, 350 × 600 mm (invented data), No. 10 two-leg stirrups at 75 to 300 mm by 25 mm. */
    private static SectionProblem problem(Double tu) {
        List<Double> spacings = new ArrayList<>();
        for (double s = 75; s <= 300; s += 25) {
            spacings.add(s);
        }
        List<BarSize> tension =
                Stream.of("19", "22", "25").map(RandomProblems::bar).toList();
        List<BarSize> compression =
                Stream.of("13", "16").map(RandomProblems::bar).toList();
        SearchSpace space = new SearchSpace(
                List.of(350.0),
                List.of(600.0),
                tension,
                compression,
                2,
                List.of(RandomProblems.bar("10")),
                List.of(2),
                spacings);
        return new SectionProblem(
                        "T1",
                        new Materials(28, 420, 420, 20, 1.0),
                        new Detailing(40, RandomProblems.bar("10"), 25, Exposure.INTERIOR),
                        CodeEquations.SI,
                        space,
                        200 * KNM,
                        100e3,
                        null,
                        null,
                        null,
                        null,
                        1.0)
                .withTorsion(tu, false);
    }

    @Test
    void torsionGovernedStirrupsAreTheHandCalculationRoundedToTheSpacings() {
        // Hand calculation from ACI 318M-19 22.7.6.1, 22.7.6.1.1, 9.5.4.3, Table 9.6.4.2, 9.7.6.3.3:
        // hoop centre-line: x0 = 350 − 2 × 40 − 9.5 = 260.5 mm, y0 = 600 − 2 × 40 − 9.5 = 510.5 mm
        // Aoh = 260.5 × 510.5 = 132 985.25 mm²; ph = 2 (260.5 + 510.5) = 1542 mm; Ao = 0.85 Aoh = 113 037.46 mm²
        // At/s = Tu / (φ 2 Ao fyt cot 45°) = 30e6 / (0.75 × 2 × 113 037.46 × 420) = 0.42127 mm²/mm
        // Av/s = max(0, Vu/φ − Vc) / (fyt d) = 0: Vu/φ = 133.3 kN < Vc = 0.17 × 1 × √28 × 350 × d ≥ 160 kN for
        //      any d ≥ 510 mm the bars can give (Table 22.5.5.1(a))
        // (Av + 2At)/s = 0 + 2 × 0.42127 = 0.84254 mm²/mm; two No. 10 legs give 142 / s, so s ≤ 142 / 0.84254
        //      = 168.5 mm: the widest spacing of 75, 100, ..., 300 mm is 150 mm (175 mm gives 0.81143 < 0.84254)
        // also s ≤ min(ph / 8, 300) = min(192.75, 300) mm (9.7.6.3.3) and (Av + 2At)/s ≥ max(0.062 √28, 0.35)
        //      × 350 / 420 = 0.29167 mm²/mm (Table 9.6.4.2): neither binds
        // threshold: φTth = 0.75 × 0.083 × √28 × 210 000² / 1900 = 7.65 kN·m < Tu = 30 kN·m (Table 22.7.4.1(a))
        DesignOutcome o = designer.design(problem(30 * KNM), 0);
        assertTrue(o.feasible());
        assertEquals("optimal", o.status());
        Stirrups st = o.best().layout().stirrups();
        assertEquals(new Stirrups(RandomProblems.bar("10"), 2, 150), st);
        CheckResult transverse = o.best().report().check("torsion_transverse").orElseThrow();
        assertTrue(transverse.pass());
        assertEquals(0.84254, transverse.demand().value(), 1e-5);
        assertEquals(142.0 / 150, transverse.limit().value(), 1e-9);
        assertEquals(
                7.65,
                o.best()
                                .report()
                                .check("torsion_threshold")
                                .orElseThrow()
                                .limit()
                                .value()
                        / KNM,
                0.01);
        assertEquals(
                192.75,
                o.best().report().check("torsion_spacing").orElseThrow().limit().value(),
                1e-9);
        assertTrue(o.best().report().ok());
        // the same beam without torsion: shear alone lets the stirrups out to the spacing limit of 9.7.6.2.2
        // (d/2 ≥ 255 mm: 250 mm), so here torsion governs them
        DesignOutcome plain = designer.design(problem(null), 0);
        assertEquals(250, plain.best().layout().stirrups().spacing(), 1e-9);
        assertFalse(plain.best().report().check("torsion_transverse").isPresent());
        assertTrue(o.best().costPerMetre().total() > plain.best().costPerMetre().total());
    }

    @Test
    void torsionBelowTheThresholdDesignsAsWithoutIt() {
        // φTth = 7.65 kN·m for this web (hand calculation above): 5 kN·m is neglected (9.5.4.1), so the design and
        // its cost are those without torsion, and its torsion checks pass as neglected
        DesignOutcome small = designer.design(problem(5 * KNM), 0);
        DesignOutcome plain = designer.design(problem(null), 0);
        assertEquals(plain.best().layout(), small.best().layout());
        assertEquals(
                plain.best().costPerMetre().total(), small.best().costPerMetre().total(), 0);
        assertTrue(small.best()
                .report()
                .check("torsion_transverse")
                .orElseThrow()
                .title()
                .endsWith("(neglected)"));
    }

    @Test
    void aSectionTooSmallForTheTorsionIsDiagnosed() {
        // 350 × 600 mm under Tu = 120 kN·m, Vu = 100 kN: vt = 120e6 × 1542 / (1.7 × 132 985.25²) = 6.155 MPa alone
        // exceeds the largest limit φ (0.42 + 0.66) √28 = 0.75 × 1.08 × 5.2915 = 4.286 MPa (22.7.7.1(a), Vc at
        // its cap of Table 22.5.5.1): no layout passes, and the diagnosis names the section size
        DesignOutcome o = designer.design(problem(120 * KNM), 0);
        assertFalse(o.feasible());
        assertEquals("torsion_section", o.diagnosis().limit());
        var cause = (barfit.design.Diagnosis.TorsionFails) o.diagnosis().cause();
        assertTrue(cause.everyFrame());
        assertTrue(cause.check().demand().value() > 6.155);
        assertTrue(o.diagnosis().wider() != null || o.diagnosis().deeper() != null, "a larger section that works");
    }
}
