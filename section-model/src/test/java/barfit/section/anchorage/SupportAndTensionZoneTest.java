package barfit.section.anchorage;

import static barfit.section.anchorage.Bars.IN;
import static barfit.section.anchorage.Bars.IN2;
import static barfit.section.anchorage.Bars.KSI;
import static barfit.section.anchorage.Bars.SI;
import static barfit.section.anchorage.Bars.US;
import static barfit.section.anchorage.Bars.si;
import static barfit.section.anchorage.Bars.us;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.section.anchorage.SupportBars.End;
import barfit.section.anchorage.TensionZoneCut.AtCut;
import barfit.section.anchorage.TensionZoneCut.Basis;
import barfit.section.anchorage.TensionZoneCut.ExtraStirrups;
import barfit.section.trail.Trail;
import org.junit.jupiter.api.Test;

/** 9.7.3.5 (cut-off in a tension zone) and 9.7.3.8 (bars at supports and points of inflection), by hand. */
class SupportAndTensionZoneTest {
    /** Four No. 25 bars, one cut: As,cut = 510, continuing 1530 mm² (βb = 0.25); bw = 300, d = 500 mm. */
    private static AtCut cut(double vuOverPhiVn, double asRequired, ExtraStirrups extra) {
        return new AtCut(si("25"), true, vuOverPhiVn * 300e3, 300e3, 1530, asRequired, 510, 300, 500, extra);
    }

    @Test
    void tensionZoneCutReliesOnTheFirstConditionThatHolds() {
        // 9.7.3.5(a): Vu <= (2/3) φVn
        Trail t = Trail.recording();
        var a = TensionZoneCut.check(cut(0.6, 1200, null), SI, t);
        assertEquals(Basis.SHEAR, a.basis());
        assertTrue(a.allowed());
        Bars.assertWhole(t);
        // (b): No. 36 and smaller, continuing As twice the need (1530 / 700 = 2.19) and Vu <= (3/4) φVn
        assertEquals(
                Basis.DOUBLE_AREA,
                TensionZoneCut.check(cut(0.7, 700, null), SI, Trail.off()).basis());
        assertEquals(
                Basis.NOT_ALLOWED,
                TensionZoneCut.check(cut(0.7, 800, null), SI, Trail.off()).basis());
        assertEquals(
                Basis.NOT_ALLOWED,
                TensionZoneCut.check(cut(0.8, 700, null), SI, Trail.off()).basis());
        var big = new AtCut(si("43"), true, 0.7 * 300e3, 300e3, 1530, 700, 510, 300, 500, null);
        assertEquals(
                Basis.NOT_ALLOWED, TensionZoneCut.check(big, SI, Trail.off()).basis());
        // (c) (ACI 318M-19, 0.41 from memory): extra stirrups >= 0.41 bw s / fyt = 0.41 × 300 × 100 / 420
        // = 29.29 mm², at s <= d / (8 βb) = 500 / (8 × 0.25) = 250 mm, over (3/4) d = 375 mm from the bar's end
        Trail tc = Trail.recording();
        var c = TensionZoneCut.check(cut(0.9, 1200, new ExtraStirrups(2 * 71, 100, 420)), SI, tc);
        assertEquals(Basis.EXTRA_STIRRUPS, c.basis());
        assertEquals(29.286, c.extraArea(), 0.001);
        assertEquals(250, c.maxSpacing(), 1e-9);
        assertEquals(0.25, c.betaB(), 1e-12);
        assertEquals(375, c.stretch(), 1e-12);
        Bars.assertWhole(tc);
        assertEquals(
                Basis.NOT_ALLOWED,
                TensionZoneCut.check(cut(0.9, 1200, new ExtraStirrups(2 * 71, 260, 420)), SI, Trail.off())
                        .basis());
        assertEquals(
                Basis.NOT_ALLOWED,
                TensionZoneCut.check(cut(0.9, 1200, new ExtraStirrups(28, 100, 420)), SI, Trail.off())
                        .basis());
        // a cut outside the tension zone needs none of them
        var outside = new AtCut(si("25"), false, 300e3, 300e3, 1530, 1200, 510, 300, 500, null);
        assertEquals(
                Basis.NOT_IN_TENSION_ZONE,
                TensionZoneCut.check(outside, SI, Trail.off()).basis());
    }

    @Test
    void extraStirrupsInInchPound() {
        // 9.7.3.5(c) inch-pound: 60 bw s / fyt = 60 × 12 × 4 / 60 000 = 0.048 in²
        var at = new AtCut(
                us("8"),
                true,
                0.9,
                1.0,
                3 * 0.79 * IN2,
                3 * 0.79 * IN2,
                0.79 * IN2,
                12 * IN,
                20 * IN,
                new ExtraStirrups(0.22 * IN2, 4 * IN, 60 * KSI));
        var v = TensionZoneCut.check(at, US, Trail.off());
        assertEquals(0.048, v.extraArea() / IN2, 1e-9);
        assertEquals(Basis.EXTRA_STIRRUPS, v.basis());
    }

    @Test
    void positiveBarsIntoSupports() {
        // 9.7.3.8.1: a third at a simple support, 150 mm in; 9.7.3.8.2: a quarter at a continuous one
        Trail t = Trail.recording();
        var simple = SupportBars.positiveIntoSupport(End.SIMPLE, 2040, false, SI, t);
        assertEquals(680, simple.area(), 1e-9);
        assertEquals(150, simple.embedment(), 1e-12);
        assertEquals(2, simple.bars(4)); // ceil(4/3)
        assertEquals(1, simple.bars(3));
        Bars.assertWhole(t);
        var cont = SupportBars.positiveIntoSupport(End.CONTINUOUS, 2040, true, SI, Trail.off());
        assertEquals(510, cont.area(), 1e-9);
        assertEquals(1, cont.bars(4));
        assertEquals(2, cont.bars(5)); // ceil(1.25)
        assertTrue(cont.developAtFace());
        assertEquals(
                6.0,
                SupportBars.positiveIntoSupport(End.SIMPLE, 1, false, US, Trail.off())
                                .embedment()
                        / IN,
                1e-12);
        var checks = SupportBars.checkIntoSupport(simple, 2 * 510, 140);
        assertTrue(checks.get(0).pass());
        assertFalse(checks.get(1).pass());
        assertEquals("9.7.3.8.1", checks.get(1).clause());
    }

    @Test
    void barSizeLimitAtSupportsAndInflection() {
        // Mn with every bar at fy: 3 No. 25 (1530 mm²), fy = 420, d = 540, b = 300, f'c = 28 MPa:
        // a = 1530 × 420 / (0.85 × 28 × 300) = 90.0 mm; Mn = 642 600 × (540 − 45) = 318.09 kN·m
        double mn = SupportBars.mnAtYield(1530, 420, 540, 300, 28);
        assertEquals(318.087e6, mn, 1);
        // ld of No. 25 bottom bars with (cb + Ktr)/db = 1.5: 420 / (1.1 √28) / 1.5 × 25.4 = 1221.86 mm
        double ld = 1221.86;
        // 9.7.3.8.3(a), Vu = 250 kN, la = 100 mm, ends confined: 1.3 × 318.09e6 / 250e3 + 100 = 1754.05 mm
        Trail t = Trail.recording();
        var a = SupportBars.atSimpleSupport(ld, mn, 250e3, 100, true, false, t);
        assertEquals(1754.05, a.limit(), 0.01);
        assertTrue(a.check().pass());
        Bars.assertWhole(t);
        // (b), not confined: 318.09e6 / 250e3 + 100 = 1372.35 mm
        assertEquals(
                1372.35,
                SupportBars.atSimpleSupport(ld, mn, 250e3, 100, false, false, Trail.off())
                        .limit(),
                0.01);
        // at Vu = 400 kN, not confined: 795.22 + 100 = 895.22 mm < ld: the bars must be smaller
        var fails = SupportBars.atSimpleSupport(ld, mn, 400e3, 100, false, false, Trail.off());
        assertEquals(895.22, fails.limit(), 0.01);
        assertFalse(fails.check().pass());
        assertEquals("9.7.3.8.3", fails.check().clause());
        // hooked past the support's centre line: the clause excuses them
        assertTrue(SupportBars.atSimpleSupport(ld, mn, 400e3, 100, false, true, Trail.off())
                .check()
                .pass());
        // at a point of inflection la counts up to max(d, 12 db) = max(540, 304.8): 800 -> 540;
        // limit 318.09e6 / 400e3 + 540 = 1335.22 mm
        var infl = SupportBars.atInflection(ld, mn, 400e3, 800, 540, si("25"), Trail.off());
        assertEquals(540, infl.la(), 1e-12);
        assertEquals(1335.22, infl.limit(), 0.01);
        assertTrue(infl.check().pass());
    }

    @Test
    void negativeBarsPastTheInflection() {
        // 9.7.3.8.4: a third of As− runs max(d, 12 db, ln/16) past the point of inflection:
        // d = 540, No. 25 (304.8), ln = 9000 (562.5) -> 562.5 mm; ln = 6000 (375) -> d = 540 mm
        Trail t = Trail.recording();
        var p = SupportBars.negativePastInflection(2550, 540, si("25"), 9000, t);
        assertEquals(562.5, p.length(), 1e-12);
        assertEquals(850, p.area(), 1e-9);
        Bars.assertWhole(t);
        assertEquals(
                540,
                SupportBars.negativePastInflection(2550, 540, si("25"), 6000, Trail.off())
                        .length(),
                1e-12);
        // 12 db governs in a shallow beam: d = 250, No. 36 -> 12 × 35.8 = 429.6 mm
        assertEquals(
                429.6,
                SupportBars.negativePastInflection(2000, 250, si("36"), 6000, Trail.off())
                        .length(),
                1e-9);
    }
}
