package barfit.design.span;

import static barfit.design.section.RandomProblems.bar;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.SearchSpace;
import barfit.section.CheckResult;
import barfit.section.CodeEquations;
import barfit.section.Detailing;
import barfit.section.EndCondition;
import barfit.section.Exposure;
import barfit.section.Materials;
import barfit.section.SpanChecks;
import barfit.section.Stirrups;
import java.util.List;
import org.junit.jupiter.api.Test;

/** A whole span's torsion along it, per zone, and its checks: hand calculations with their clauses. */
class SpanTorsionTest {
    private static final double KNM = 1e6;

    @Test
    void torsionFallsLinearlyFromTheCriticalSectionsToMidSpan() {
        // hand calculation from 9.4.4.2 and the README's distributed torque: l = 6000 mm, d = 440 mm, 20 kN·m
        // at d from each face, 0 at mid-span; at x = 1000: 20 − 20 (1000 − 440) / (3000 − 440) = 15.625 kN·m
        SpanTorsion t = new SpanTorsion(20 * KNM, 0, 20 * KNM, false);
        assertEquals(15.625, t.at(6000, 1000, 440) / KNM, 1e-9);
        // nearer the face than d it is taken at d (9.4.4.2): 20 kN·m at x = 100
        assertEquals(20, t.at(6000, 100, 440) / KNM, 1e-9);
        // a zone from 1500 to 4500 in a web bt = 300 mm: the largest Tu within bt + d = 740 mm of it
        // (9.7.6.3.2, 9.7.5.3), at x = 1500 − 740 = 760: 20 − 20 (760 − 440) / 2560 = 17.5 kN·m
        assertEquals(17.5, t.overZone(6000, 1500, 4500, 300, 440) / KNM, 1e-9);
        // a mid-span value: 20 at d, 8 at mid-span, 5 at l − d; at x = 4000: 8 + (5 − 8)(4000 − 3000)/2560
        SpanTorsion u = new SpanTorsion(20 * KNM, 8 * KNM, 5 * KNM, false);
        assertEquals(8 - 3 * 1000 / 2560.0, u.at(6000, 4000, 440) / KNM, 1e-9);
    }

    /** A 7.2 m span continuous at both ends (invented), f'c = 32 MPa, fy = fyt = 420 MPa, No. 10 stirrups. */
    private static SpanProblem spandrel(double vLeft, double vRight) {
        Materials m = new Materials(32, 420, 420, 20, 1.0);
        Detailing det = new Detailing(40, bar("10"), 25, Exposure.INTERIOR);
        SearchSpace space = new SearchSpace(
                List.of(300.0, 350.0),
                List.of(500.0, 550.0, 600.0),
                List.of(bar("16"), bar("19"), bar("22")),
                List.of(bar("16"), bar("19"), bar("22")),
                2,
                List.of(bar("10")),
                List.of(2, 4),
                List.of(75.0, 100.0, 125.0, 150.0));
        return new SpanProblem(
                        "E1",
                        m,
                        det,
                        CodeEquations.SI,
                        space,
                        7200,
                        EndCondition.BOTH_ENDS_CONTINUOUS,
                        -210 * KNM,
                        140 * KNM,
                        -230 * KNM,
                        vLeft * 1e3,
                        vRight * 1e3,
                        null,
                        SpanChecks.Limits.DEFAULT,
                        null,
                        null,
                        null,
                        false,
                        2,
                        0)
                .withTorsion(new SpanTorsion(30 * KNM, 0, 32 * KNM, false));
    }

    @Test
    void eachZoneIsCheckedForItsTorsionWithEveryBarThere() {
        SpanProblem p = spandrel(170, 180);
        Stirrups st = new Stirrups(bar("10"), 2, 75);
        SpanLayout l = new SpanLayout(
                300,
                500,
                null,
                bar("10"),
                null,
                bar("16"),
                4,
                List.of(8),
                List.of(8),
                bar("16"),
                List.of(4),
                List.of(st, st, st),
                2160,
                2160);
        SpanReport r = SpanVerifier.verify(p, l, false);
        // the middle zone runs from 7200 × 170 / 700 = 1748.6 to 7200 − 7200 × 180 / 700 = 5348.6 mm; its d at
        // mid-span is 500 − 40 − 9.5 − 15.9 / 2 = 442.55 mm (No. 10: 9.5 mm, No. 16: 15.9 mm, ASTM A615M), so
        // bt + d = 742.55 mm and the design torsion is the larger of the line at 1006.0 and at 6091.1 mm:
        // 30 − 30 (1006.0 − 442.55) / 3157.45 = 24.65 and 32 (6091.1 − 3600) / 3157.45 = 25.25 kN·m (9.7.6.3.2)
        double d = 500 - 40 - 9.5 - 15.9 / 2;
        double to = 7200 - 7200 * 180 / 700.0;
        double right = 32 * (to + 300 + d - 3600) / (3600 - d);
        assertEquals(right, r.zoneTorsions().get(1) / KNM, 1e-6);
        assertEquals(25.25, r.zoneTorsions().get(1) / KNM, 0.01);
        // the left zone is within d of the face: 30 kN·m
        assertEquals(30, r.zoneTorsions().get(0) / KNM, 1e-9);
        // Al of the left zone, hand calculation from 22.7.6.1 (θ = 45°, Ao = 0.85 Aoh): x0 = 300 − 80 − 9.5 =
        // 210.5, y0 = 500 − 80 − 9.5 = 410.5 mm, Ao = 0.85 × 210.5 × 410.5 = 73 448.7 mm²; At/s = 30e6 /
        // (0.75 × 2 × 73 448.7 × 420) = 0.6483 mm²/mm; Al = 0.6483 × 2 (210.5 + 410.5) × 420/420 = 805.2 mm²
        double ao = 0.85 * 210.5 * 410.5;
        double atS = 30e6 / (0.75 * 2 * ao * 420);
        double al = atS * 2 * (210.5 + 410.5);
        assertEquals(805.2, al, 0.1);
        CheckResult alLeft = check(r, "torsion_longitudinal.left");
        assertEquals(al, alLeft.demand().value(), 0.01);
        // threshold, hand calculation from 22.7.4.1(a) (web alone, no flange given): φTth = 0.75 × 0.083 × √32 ×
        // (300 × 500)² / (2 (300 + 500)) = 4.952 kN·m
        double phiTth = 0.75 * 0.083 * Math.sqrt(32) * Math.pow(300 * 500, 2) / 1600;
        assertEquals(phiTth, check(r, "torsion_threshold.left").limit().value(), 1);
        assertEquals(4.952, phiTth / KNM, 0.001);
        // every zone carries the four torsion checks of the issue, with its name
        for (String zone : List.of("left", "middle", "right")) {
            for (String id :
                    List.of("torsion_threshold", "torsion_section", "torsion_transverse", "torsion_longitudinal")) {
                check(r, id + "." + zone);
            }
        }
    }

    @Test
    void extraTopBarsRunOverTheSupportZoneUnderTorsion() {
        // shears 300 and 100 kN: the left zone runs to 7200 × 300 / 800 = 2700 mm, past 0.3 × 7200 = 2160 mm;
        // under torsion the extras there run to its end so that Al counted at the support is there over it
        SpanProblem p = spandrel(300, 100);
        Extension e = Extension.of(p, 300, 500, p.detailing(), bar("16"));
        assertEquals(Extension.Governs.TORSION_ZONES, e.governs());
        assertEquals(2700, e.length(), 1e-9);
        // without torsion 0.3 × span governs (ld of No. 16 top bars is shorter)
        Extension plain = Extension.of(p.withTorsion(null), 300, 500, p.detailing(), bar("16"));
        assertEquals(Extension.Governs.THREE_TENTHS_OF_SPAN, plain.governs());
        assertEquals(2160, plain.length(), 1e-9);
    }

    @Test
    void theDesignedSpanPassesWithItsTorsionChecks() {
        SpanProblem p = spandrel(170, 180);
        SpanDesigner.Outcome o =
                new SpanDesigner(SpanOracleTest.COST, new barfit.design.SolverOptions(30, 1, 1)).design(p, 0);
        assertTrue(o.feasible());
        SpanReport r = SpanVerifier.verify(p, o.best().layout(), true);
        assertTrue(r.ok());
        assertTrue(r.zoneChecks().stream().anyMatch(c -> c.id().equals("torsion_transverse.right")));
    }

    private static CheckResult check(SpanReport r, String id) {
        return r.zoneChecks().stream()
                .filter(c -> c.id().equals(id))
                .findFirst()
                .orElseThrow(() -> new AssertionError("no check " + id));
    }
}
