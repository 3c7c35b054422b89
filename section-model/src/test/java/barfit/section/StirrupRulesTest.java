package barfit.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.catalogs.BarSize;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The rules for how stirrups hold the bars, each checked against a hand calculation written from the
 * clause (ACI 318-19 25.7.1.2, 25.7.1.3, 9.7.6.4, 25.7.2.2, 25.7.2.3), not from the code under test.
 */
class StirrupRulesTest {
    private static final Detailing DET = Sections.detailing(40, Sections.si("10"));

    private static BeamSection beam(
            double b, double h, BarSize bottom, List<Integer> bottomCounts, BarSize top, int topCount, Stirrups st) {
        List<BeamSection.BarGroup> g = new ArrayList<>();
        for (int c : bottomCounts) {
            g.add(new BeamSection.BarGroup(bottom, c));
        }
        List<BarLayer> layers = new ArrayList<>(BeamSection.stack(Face.BOTTOM, g, DET));
        if (topCount > 0) {
            layers.addAll(BeamSection.stack(Face.TOP, List.of(new BeamSection.BarGroup(top, topCount)), DET));
        }
        return new BeamSection(
                SectionShape.rectangular(b, h), Sections.materials(28, 420), DET, layers, st, null, CodeEquations.SI);
    }

    @Test
    void everyLegHoldsABarOfEachFace() {
        // 25.7.1.2 / 25.7.1.3: each leg's bend is round a longitudinal bar; 4 legs over 3 bottom bars leave a
        // leg with nothing to hold (the case found on whole spans), 4 legs over 4 bottom and 4 top bars do not.
        Stirrups four = new Stirrups(Sections.si("10"), 4, 150);
        BeamSection three = beam(400, 600, Sections.si("25"), List.of(3), Sections.si("16"), 4, four);
        List<CheckResult> r = StirrupRules.checks(three, three, Bending.SAGGING, 100e6, null, "", Trail.off());
        CheckResult held = r.stream()
                .filter(c -> c.id().equals("stirrup_legs_held"))
                .findFirst()
                .orElseThrow();
        assertFalse(held.pass());
        assertEquals(3, held.limit().value(), 0);
        BeamSection fourBars = beam(400, 600, Sections.si("25"), List.of(4), Sections.si("16"), 4, four);
        assertTrue(StirrupRules.checks(fourBars, fourBars, Bending.SAGGING, 100e6, null, "", Trail.off()).stream()
                .allMatch(CheckResult::pass));
    }

    @Test
    void officePracticeIsOptionalAndStricter() {
        // Office practice, no clause: two legs per four bars a layer asks 4 legs of a layer of 5 bars; the code
        // alone (9.7.6.2.2 across the width, legs held) is content with 2 legs in a 400 mm web.
        Stirrups two = new Stirrups(Sections.si("10"), 2, 200);
        BeamSection s = beam(400, 600, Sections.si("25"), List.of(5), Sections.si("16"), 2, two);
        assertTrue(StirrupRules.checks(s, s, Bending.SAGGING, 100e6, null, "", Trail.off()).stream()
                .allMatch(CheckResult::pass));
        List<CheckResult> withPractice =
                StirrupRules.checks(s, s, Bending.SAGGING, 100e6, new StirrupRules.Practice(4), "", Trail.off());
        CheckResult practice = withPractice.stream()
                .filter(c -> c.id().equals("stirrup_legs_bars"))
                .findFirst()
                .orElseThrow();
        assertFalse(practice.pass());
        assertEquals(4, practice.limit().value(), 0);
    }

    @Test
    void compressionBarsReliedOnForDuctilityNeedTies() {
        // 300 x 500, f'c = 28, fy = 420, 6 No. 29 in two layers (3870 mm²). Without top bars: a = 3870 x 420 /
        // (0.85 x 28 x 300) = 227.6 mm, c = a / 0.85 = 267.8 mm, dt = 500 - 40 - 9.5 - 14.35 = 436.2 mm,
        // eps_t = 0.003 (436.2 - 267.8) / 267.8 = 0.0019 < 0.004 (9.3.3.1): the top bars are relied on.
        // Three No. 25 on top: clear spacing (300 - 2 x 49.5 - 3 x 25.4) / 2 = 62.4 mm <= 150 mm, so corners and
        // alternate bars suffice: 2 held (25.7.2.3); spacing <= min(16 x 25.4, 48 x 9.5, 300) = 300 mm (9.7.6.4.3);
        // No. 10 ties are enough round No. 25 bars (25.7.2.2).
        BeamSection s = beam(300, 500, Sections.si("29"), List.of(3, 3), Sections.si("25"), 3, null);
        assertEquals("ductility", StirrupRules.compressionReliedOn(s, Bending.SAGGING, null));
        StirrupRules.TieDemand td = StirrupRules.ties(s, Bending.SAGGING, null);
        assertTrue(td.required());
        assertEquals(2, td.minLegs());
        assertEquals(300, td.maxSpacing(), 1e-9);
        assertTrue(td.sizeOk(9.5));
        BeamSection wide = s.withStirrups(new Stirrups(Sections.si("10"), 2, 350));
        List<CheckResult> r = StirrupRules.checks(wide, wide, Bending.SAGGING, null, null, "", Trail.off());
        assertFalse(r.stream()
                .filter(c -> c.id().equals("compression_ties"))
                .findFirst()
                .orElseThrow()
                .pass());
        BeamSection close = s.withStirrups(new Stirrups(Sections.si("10"), 2, 300));
        assertTrue(StirrupRules.checks(close, close, Bending.SAGGING, null, null, "", Trail.off()).stream()
                .allMatch(CheckResult::pass));
        // four top bars: the two inner ones cannot both go unheld (alternate bars, 25.7.2.3): 3 held
        BeamSection four = beam(300, 500, Sections.si("29"), List.of(3, 3), Sections.si("16"), 4, null);
        StirrupRules.TieDemand td4 = StirrupRules.ties(four, Bending.SAGGING, null);
        assertEquals(3, td4.minLegs());
        // No. 16 bars: 16 x 15.9 = 254.4 mm governs over 300 mm (9.7.6.4.3)
        assertEquals(254.4, td4.maxSpacing(), 1e-9);
    }

    @Test
    void widelySpacedCompressionBarsAreEachHeld() {
        // 600 mm web, three No. 25 on top: clear spacing (600 - 99 - 76.2) / 2 = 212.4 mm > 150 mm, so the middle
        // bar is farther than 150 mm clear from a held bar and must be held itself: 3 held (25.7.2.3(b)).
        // 10 No. 29 in two layers of 5 (6450 mm²) are far from ductile without the top bars.
        BeamSection s = beam(600, 500, Sections.si("29"), List.of(5, 5), Sections.si("25"), 3, null);
        StirrupRules.TieDemand td = StirrupRules.ties(s, Bending.SAGGING, null);
        assertTrue(td.required());
        assertEquals(3, td.minLegs());
    }

    @Test
    void largeCompressionBarsNeedNo13Ties() {
        // 25.7.2.2: No. 13 ties round No. 36 and larger bars; No. 10 stirrups fail.
        BeamSection s = beam(
                400,
                500,
                Sections.si("29"),
                List.of(4, 4),
                Sections.si("36"),
                2,
                new Stirrups(Sections.si("10"), 2, 200));
        StirrupRules.TieDemand td = StirrupRules.ties(s, Bending.SAGGING, null);
        assertTrue(td.required());
        assertFalse(td.sizeOk(9.5));
        assertTrue(td.sizeOk(12.7));
        assertFalse(StirrupRules.checks(s, s, Bending.SAGGING, null, null, "", Trail.off()).stream()
                .filter(c -> c.id().equals("compression_ties_size"))
                .findFirst()
                .orElseThrow()
                .pass());
    }

    @Test
    void compressionBarsNotReliedOnNeedNoTies() {
        // 300 x 500 with 3 No. 16 (597 mm²): a = 597 x 420 / (0.85 x 28 x 300) = 35.1 mm, far below the depth at
        // which eps_t reaches 0.004, and phi Mn without top bars (about 92 kN·m) exceeds Mu = 60 kN·m.
        BeamSection s = beam(300, 500, Sections.si("16"), List.of(3), Sections.si("16"), 2, null);
        assertFalse(StirrupRules.ties(s, Bending.SAGGING, 60e6).required());
        // (there the hangers are below the neutral axis: c = 35.1 / 0.85 = 41.3 mm < d' = 57.45 mm)
        // 3 No. 29 (1935 mm²): a = 1935 x 420 / (0.85 x 28 x 300) = 113.8 mm, c = 133.9 mm > d': the hangers are
        // in compression; for Mu at the full section's phi Mn, the section without them falls short (strength)
        BeamSection heavier = beam(300, 500, Sections.si("29"), List.of(3), Sections.si("16"), 2, null);
        double full = Flexure.analyse(heavier, Bending.SAGGING).phiMn();
        assertEquals("strength", StirrupRules.compressionReliedOn(heavier, Bending.SAGGING, full));
        assertEquals(null, StirrupRules.compressionReliedOn(heavier, Bending.SAGGING, 0.95 * full));
    }

    @Test
    void topBarsLeftInTensionByAShallowBlockAreNotCompressionSteel() {
        // T-beam, bw = 350, h = 525, flange 2200 x 200, 3 No. 25 bottom (1530 mm²): a = 1530 x 420 /
        // (0.85 x 28 x 2200) = 12.3 mm, c = 14.5 mm, while the two No. 16 top bars sit 57.45 mm down: they are
        // below the neutral axis, in tension, and add to Mn. Taking them away lowers phi Mn below an Mu set at
        // the full section's strength, yet there is no compression steel for 9.7.6.4 to enclose.
        List<BarLayer> layers = new ArrayList<>(
                BeamSection.stack(Face.BOTTOM, List.of(new BeamSection.BarGroup(Sections.si("25"), 3)), DET));
        layers.addAll(BeamSection.stack(Face.TOP, List.of(new BeamSection.BarGroup(Sections.si("16"), 2)), DET));
        BeamSection s = new BeamSection(
                new SectionShape(350, 525, new Flange(2200, 200, false)),
                Sections.materials(28, 420),
                DET,
                layers,
                null,
                null,
                CodeEquations.SI);
        FlexureResult full = Flexure.analyse(s, Bending.SAGGING);
        assertTrue(full.c() < 57.45, "neutral axis above the top bars: c = " + full.c());
        assertEquals(null, StirrupRules.compressionReliedOn(s, Bending.SAGGING, full.phiMn()));
        assertFalse(StirrupRules.ties(s, Bending.SAGGING, full.phiMn()).required());
    }
}
