package barfit.section.anchorage;

import static barfit.section.anchorage.Bars.IN;
import static barfit.section.anchorage.Bars.SI;
import static barfit.section.anchorage.Bars.US;
import static barfit.section.anchorage.Bars.si;
import static barfit.section.anchorage.Bars.us;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.section.CodeEquations;
import barfit.section.Materials;
import barfit.section.anchorage.StandardHooks.Bend;
import barfit.section.trail.Trail;
import org.junit.jupiter.api.Test;

/**
 * Standard hooks: Table 25.3.1's geometry and ldh of 25.4.3.1 with the factors of Table 25.4.3.2 (ACI
 * 318-19, quoted from memory of the code), against hand calculations with the arithmetic shown.
 */
class HooksTest {
    private static final HookDevelopment.Conditions NO_CREDIT = HookDevelopment.Conditions.uncoated(50, false);

    @Test
    void bendDiametersFollowTable25_3_1() {
        // Table 25.3.1: No. 10 to No. 25 (#3 to #8) 6 db; No. 29 to No. 36 (#9 to #11) 8 db; No. 43, No. 57 10 db
        assertEquals(6 * 9.5, StandardHooks.bendDiameter(si("10")), 1e-9);
        assertEquals(6 * 25.4, StandardHooks.bendDiameter(si("25")), 1e-9);
        assertEquals(6 * 1.0, StandardHooks.bendDiameter(us("8")) / IN, 1e-12);
        assertEquals(8 * 28.7, StandardHooks.bendDiameter(si("29")), 1e-9);
        assertEquals(8 * 1.41, StandardHooks.bendDiameter(us("11")) / IN, 1e-12);
        assertEquals(10 * 43.0, StandardHooks.bendDiameter(si("43")), 1e-9);
        assertEquals(10 * 1.693, StandardHooks.bendDiameter(us("14")) / IN, 1e-12);
    }

    @Test
    void extensionsFollowTable25_3_1() {
        // Table 25.3.1: 90-degree 12 db; 180-degree max(4 db, 65 mm) (ACI 318M-19), max(4 db, 2.5 in) (ACI 318-19)
        assertEquals(12 * 25.4, StandardHooks.extension(si("25"), Bend.DEG_90, SI), 1e-9);
        assertEquals(65.0, StandardHooks.extension(si("13"), Bend.DEG_180, SI), 1e-9); // 4 x 12.7 = 50.8 < 65
        assertEquals(4 * 25.4, StandardHooks.extension(si("25"), Bend.DEG_180, SI), 1e-9); // 101.6 > 65
        assertEquals(2.5, StandardHooks.extension(us("3"), Bend.DEG_180, US) / IN, 1e-12); // 1.5 in < 2.5
        assertEquals(4.0, StandardHooks.extension(us("8"), Bend.DEG_180, US) / IN, 1e-12);
    }

    @Test
    void hookGeometryByHand() {
        // hand calculation from Table 25.3.1's D and extension, No. 25 90-degree: D = 152.4, ext = 304.8 mm;
        // reach D/2 + db = 76.2 + 25.4 = 101.6; height db + D/2 + ext = 25.4 + 76.2 + 304.8 = 406.4 (16 in for
        // #8); developed π/2 × (152.4 + 25.4)/2 + 304.8 = 139.644 + 304.8 = 444.444 mm
        Trail t = Trail.recording();
        StandardHooks.Hook h = StandardHooks.of(si("25"), Bend.DEG_90, SI, t);
        assertEquals(152.4, h.bendDiameter(), 1e-9);
        assertEquals(101.6, h.reach(), 1e-9);
        assertEquals(406.4, h.height(), 1e-9);
        assertEquals(444.4438, h.developed(), 1e-4);
        // a hook whose outside lies 400 mm past the face: 400 − 101.6 = 298.4 straight, 742.84 mm of bar
        assertEquals(298.4 + 444.4438, h.barLength(400), 1e-4);
        assertThrows(IllegalArgumentException.class, () -> h.barLength(100));
        Bars.assertWhole(t);
        // No. 13 180-degree: D = 76.2, ext 65; height D + 2 db = 76.2 + 25.4 = 101.6; reach 38.1 + 12.7 = 50.8;
        // developed π × (76.2 + 12.7)/2 + 65 = 139.644 + 65 = 204.644 mm
        StandardHooks.Hook u = StandardHooks.of(si("13"), Bend.DEG_180, SI, Trail.recording());
        assertEquals(101.6, u.height(), 1e-9);
        assertEquals(50.8, u.reach(), 1e-9);
        assertEquals(204.6438, u.developed(), 1e-4);
        // #8 90-degree in inch-pound: height 1 + 3 + 12 = 16 in, reach 3 + 1 = 4 in
        StandardHooks.Hook us8 = StandardHooks.of(us("8"), Bend.DEG_90, US, Trail.off());
        assertEquals(16.0, us8.height() / IN, 1e-12);
        assertEquals(4.0, us8.reach() / IN, 1e-12);
    }

    @Test
    void psiCOfTable25_4_3_2() {
        // inch-pound: f'c / 15 000 + 0.6 below 6000 psi: 4000 psi -> 0.8667, 5000 psi -> 0.9333; 1.0 from 6000
        assertEquals(4000 / 15000.0 + 0.6, HookDevelopment.psiC(4000 / CodeEquations.PSI_PER_MPA, US), 1e-12);
        assertEquals(5000 / 15000.0 + 0.6, HookDevelopment.psiC(5000 / CodeEquations.PSI_PER_MPA, US), 1e-12);
        assertEquals(1.0, HookDevelopment.psiC(6000 / CodeEquations.PSI_PER_MPA, US), 1e-12);
        assertEquals(1.0, HookDevelopment.psiC(7000 / CodeEquations.PSI_PER_MPA, US), 1e-12);
        // SI (from memory): f'c / 105 + 0.6: 28 MPa -> 0.8667, 35 MPa -> 0.9333; 1.0 from 40 MPa
        assertEquals(28 / 105.0 + 0.6, HookDevelopment.psiC(28, SI), 1e-12);
        assertEquals(35 / 105.0 + 0.6, HookDevelopment.psiC(35, SI), 1e-12);
        assertEquals(1.0, HookDevelopment.psiC(40, SI), 1e-12);
    }

    @Test
    void psiRAndPsiOOfTable25_4_3_2() {
        // ψr 1.0 with Ath >= 0.4 Ahs or spacing >= 6 db (No. 36 and smaller), else 1.6
        var ties = new HookDevelopment.Conditions(false, 0.4 * 1530, 1530, 0, 50, false, 50, false);
        assertEquals(1.0, HookDevelopment.psiR(si("25"), ties, SI), 1e-12);
        var fewTies = new HookDevelopment.Conditions(false, 0.39 * 1530, 1530, 0, 50, false, 50, false);
        assertEquals(1.6, HookDevelopment.psiR(si("25"), fewTies, SI), 1e-12);
        var spaced = new HookDevelopment.Conditions(false, 0, 1530, 6 * 25.4, 50, false, 50, false);
        assertEquals(1.0, HookDevelopment.psiR(si("25"), spaced, SI), 1e-12);
        assertEquals(1.6, HookDevelopment.psiR(si("43"), ties, SI), 1e-12); // larger than No. 36
        // ψo 1.0 inside a column core with side cover >= 65 mm, or side cover >= 6 db; else 1.25
        assertEquals(1.0, HookDevelopment.psiO(si("25"), HookDevelopment.Conditions.uncoated(65, true), SI), 1e-12);
        assertEquals(1.25, HookDevelopment.psiO(si("25"), HookDevelopment.Conditions.uncoated(64, true), SI), 1e-12);
        assertEquals(1.0, HookDevelopment.psiO(si("25"), HookDevelopment.Conditions.uncoated(152.4, false), SI), 1e-12);
        assertEquals(1.25, HookDevelopment.psiO(si("25"), HookDevelopment.Conditions.uncoated(150, false), SI), 1e-12);
        assertEquals(
                1.0, HookDevelopment.psiO(us("8"), HookDevelopment.Conditions.uncoated(2.5 * IN, true), US), 1e-12);
        // 25.4.3.4 (from memory): at a discontinuous end with side cover and cover over the hook both below
        // 65 mm, ties along ldh are asked for and ψr = 1.6 even with ties counted
        var end = new HookDevelopment.Conditions(false, 1530, 1530, 0, 50, false, 50, true);
        assertTrue(HookDevelopment.enclosingTies(end, SI));
        assertEquals(1.6, HookDevelopment.psiR(si("25"), end, SI), 1e-12);
        var covered = new HookDevelopment.Conditions(false, 1530, 1530, 0, 50, false, 70, true);
        assertFalse(HookDevelopment.enclosingTies(covered, SI));
    }

    @Test
    void inchPoundLdhReproducesTheHandCalculation() {
        // hand calculation from 25.4.3.1(a), #8, fy = 60 ksi, f'c = 4000 psi, normal weight, uncoated:
        // ψc = 4000/15000 + 0.6 = 0.8667; no ties counted and side cover 2 in: ψr = 1.6, ψo = 1.25
        // ldh = 60 000 × 1.0 × 1.6 × 1.25 × 0.8667 / (55 × 1.0 × √4000) × 1.0^1.5 = 104 000 / 3478.5 = 29.90 in
        Materials m = Bars.usMaterials(4000, 60);
        var c = HookDevelopment.Conditions.uncoated(2 * IN, false);
        Trail t = Trail.recording();
        var r = HookDevelopment.ldh(us("8"), m, US, c, t);
        assertEquals(29.898, r.ldh() / IN, 0.001);
        assertEquals(1.6, r.psiR(), 1e-12);
        assertEquals(1.25, r.psiO(), 1e-12);
        Bars.assertWhole(t);
        // confined (Ath = 0.4 Ahs) and inside a column core with 2.5 in side cover: ψr = ψo = 1.0
        // ldh = 60 000 × 0.8667 / 3478.5 = 14.95 in (> 8 db = 8 in and 6 in)
        var good = new HookDevelopment.Conditions(
                false, 0.4 * 0.79 * 4 * IN * IN, 0.79 * 4 * IN * IN, 0, 2.5 * IN, true, 2 * IN, false);
        assertEquals(
                14.949, HookDevelopment.ldh(us("8"), m, US, good, Trail.off()).ldh() / IN, 0.001);
        // epoxy-coated: ψe = 1.2 -> 1.2 × 14.949 = 17.94 in
        var coated = new HookDevelopment.Conditions(true, good.ath(), good.ahs(), 0, 2.5 * IN, true, 2 * IN, false);
        assertEquals(
                17.939, HookDevelopment.ldh(us("8"), m, US, coated, Trail.off()).ldh() / IN, 0.001);
        // #3 with every factor 1.0: (a) 14.949 × 0.375^1.5 = 3.43 in, (b) 8 × 0.375 = 3 in, (c) 6 in -> 6 in
        var r3 = HookDevelopment.ldh(us("3"), m, US, good, Trail.off());
        assertEquals(3.433, r3.equation() / IN, 0.001);
        assertEquals(6.0, r3.ldh() / IN, 1e-12);
    }

    @Test
    void siLdhByHand() {
        // hand calculation from 25.4.3.1(a) of ACI 318M-19 (coefficient 23 from memory): No. 25, fy = 420 MPa,
        // f'c = 28 MPa, ψc = 28/105 + 0.6 = 0.8667, ψr = ψo = 1.0:
        // ldh = 420 × 0.8667 / (23 × √28) × 25.4^1.5 = 364 / 121.70 × 128.01 = 382.86 mm
        Materials m = Bars.siMaterials(28, 420);
        var good = new HookDevelopment.Conditions(false, 600, 1500, 0, 70, true, 50, false);
        var r = HookDevelopment.ldh(si("25"), m, SI, good, Trail.off());
        assertEquals(382.86, r.ldh(), 0.01);
        // 8 db governs for a low fy: fy = 280 MPa, f'c = 40 MPa (ψc = 1.0), No. 10:
        // (a) 280 / (23 × 6.325) × 9.5^1.5 = 1.925 × 29.28 = 56.4 mm; 8 db = 76 mm; 150 mm governs
        var r10 = HookDevelopment.ldh(si("10"), Bars.siMaterials(40, 280), SI, good, Trail.off());
        assertEquals(56.36, r10.equation(), 0.01);
        assertEquals(150.0, r10.ldh(), 1e-12);
        // 25.4.3.1: λ = 0.75 for lightweight concrete whatever λ the section uses (0.85 here): ldh / 0.75
        Materials light = new Materials(28, 420, 420, 20, 0.85);
        assertEquals(
                382.86 / 0.75,
                HookDevelopment.ldh(si("25"), light, SI, good, Trail.off()).ldh(),
                0.02);
    }

    @Test
    void bothEditionsAgreeOnTheSameBar() {
        // the inch-pound coefficient 55 is 55 √25.4 / √145.04 = 23.02 in N and mm: a #8 bar (25.4 mm) at
        // 60 ksi and 4000 psi gives ldh by the SI edition's 23 within 23.02/23 = 0.07 %
        Materials m = Bars.usMaterials(4000, 60);
        var c = HookDevelopment.Conditions.uncoated(2 * IN, false);
        double us = HookDevelopment.ldh(us("8"), m, US, c, Trail.off()).ldh();
        // the SI edition's ψc uses f'c/105 (4000 psi = 27.58 MPa -> 0.8627 against 0.8667)
        double si = HookDevelopment.ldh(us("8"), m, SI, c, Trail.off()).ldh();
        double expected = us
                * (55 * Math.sqrt(25.4) / Math.sqrt(CodeEquations.PSI_PER_MPA) / 23)
                * (27.579 / 105 + 0.6)
                / (4000 / 15000.0 + 0.6);
        assertEquals(expected, si, 0.01);
    }

    @Test
    void hookFitInTheSupport() {
        // the No. 25 hook above (ldh = 382.86 mm) into a 400 mm column with 40 mm cover at its far face:
        // available 400 − 40 = 360 mm, short by 382.86 − 360 = 22.86 mm (hand calculation from 25.4.3.1)
        Trail t = Trail.recording();
        var fit = HookDevelopment.fit(382.86, 400, 40, t);
        assertEquals(360, fit.available(), 1e-12);
        assertEquals(22.86, fit.shortfall(), 1e-9);
        assertFalse(fit.fits());
        assertEquals("25.4.3.1", fit.check().clause());
        Bars.assertWhole(t);
        var wide = HookDevelopment.fit(382.86, 500, 40, Trail.off());
        assertTrue(wide.fits());
        assertEquals(0, wide.shortfall(), 1e-12);
    }
}
