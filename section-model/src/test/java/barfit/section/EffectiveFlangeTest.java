package barfit.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.section.trail.Trail;
import org.junit.jupiter.api.Test;

/**
 * A flange wider than Table 6.3.2.1 allows is analysed at its effective width (the lesser of the given
 * width and the limit), in every calculation of the section. Limits worked by hand from ACI 318-19
 * Table 6.3.2.1: T-beam overhang ≤ min(8 hf, sw/2, ln/8); L-beam overhang ≤ min(6 hf, sw/2, ln/12).
 */
class EffectiveFlangeTest {
    private static final double H = 500;
    private static final double D = 440;
    private static final Span SPAN = new Span(6000, EndCondition.SIMPLE);

    private static BeamSection tee(Flange f) {
        return Sections.section(
                new SectionShape(300, H, f),
                Sections.materials(28, 420),
                Sections.detailing(40, Sections.si("10")),
                CodeEquations.SI,
                Sections.bottomAtDepth(Sections.si("29"), 4, H, D));
    }

    @Test
    void tBeamWiderThanTheTableIsTakenAtItsEffectiveWidth() {
        // Table 6.3.2.1, T-beam: bw = 300, hf = 120, ln = 6000: each overhang min(8 × 120, 6000 / 8) = 750,
        // so bf,max = 300 + 2 × 750 = 1800 mm (hand calculation from the table)
        Flange given = Flange.given(2400, 120, false, null, 6000.0);
        assertEquals(1800, given.limit(300), 1e-9);
        SectionShape shape = new SectionShape(300, H, given);
        assertEquals(1800, shape.flange().width(), 1e-9, "the section holds its flange at the effective width");
        assertEquals(2400, shape.flange().given(), 1e-9);
        assertTrue(shape.flange().reduced());
        // the gross area uses the effective width: 300 × 500 + (1800 − 300) × 120 = 330 000 mm²
        assertEquals(330_000, shape.grossArea(), 1e-6);

        Trail trail = Trail.recording();
        CheckReport wide = SectionChecks.run(tee(given), new Demand(300e6, null), SPAN, trail);
        CheckReport exact = SectionChecks.run(
                tee(Flange.given(1800, 120, false, null, 6000.0)), new Demand(300e6, null), SPAN, Trail.off());
        CheckResult fw = wide.check("flange_width").orElseThrow();
        assertTrue(fw.pass(), "a wider flange no longer fails the beam");
        assertEquals(1800, fw.demand().value(), 1e-9);
        assertEquals(1800, fw.limit().value(), 1e-9);
        assertTrue(
                fw.note().contains("flange given 2400 mm, taken at its effective width 1800 mm (Table 6.3.2.1)"),
                fw.note());
        assertTrue(fw.note().contains("sw/2 limit not checked"), fw.note());
        assertTrue(
                trail.entries().stream()
                        .anyMatch(e -> e instanceof Trail.Note n && n.text().contains("taken at its effective width")),
                "the trail says so too");
        // flexure with the flange at 1800 mm equals a section given 1800 mm directly
        assertEquals(exact.flexure().phiMn(), wide.flexure().phiMn(), 1e-6);
        assertEquals(exact.flexure().c(), wide.flexure().c(), 1e-9);
        // and that is the hand value: 4 No. 29 = 2580 mm², T = 2580 × 420 = 1 083 600 N,
        // a = T / (0.85 × 28 × 1800) = 25.29 mm < hf, Mn = T (440 − a/2) = 463.08 kN·m, c = a / 0.85 = 29.76 mm,
        // εt = 0.003 (440 − 29.76) / 29.76 = 0.041 > 0.005: φ = 0.90, φMn = 416.8 kN·m (22.2, 21.2.2;
        // hand calculation). With the flange at 2400 mm it would be 419.9 kN·m.
        assertEquals(416.8, wide.flexure().phiMn() / 1e6, 0.05);
        assertTrue(wide.ok(), wide.failures().toString());
    }

    @Test
    void clearDistanceToTheNextWebLimitsTheOverhang() {
        // Table 6.3.2.1, T-beam: sw = 1000 mm gives overhangs of min(960, 500, 750) = 500: bf,max = 1300 mm
        Flange f = Flange.given(2400, 120, false, 1000.0, 6000.0);
        assertEquals(1300, f.limit(300), 1e-9);
        CheckReport r = SectionChecks.run(tee(f), new Demand(300e6, null), SPAN, Trail.off());
        CheckResult fw = r.check("flange_width").orElseThrow();
        assertTrue(fw.pass());
        assertEquals(1300, fw.demand().value(), 1e-9);
        assertFalse(fw.note().contains("sw/2 limit not checked"), fw.note());
        CheckReport exact =
                SectionChecks.run(tee(new Flange(1300, 120, false)), new Demand(300e6, null), null, Trail.off());
        assertEquals(exact.flexure().phiMn(), r.flexure().phiMn(), 1e-6);
    }

    @Test
    void lBeamLimitsItsOneOverhang() {
        // Table 6.3.2.1, L-beam: bw = 300, hf = 120, ln = 6000: overhang min(6 × 120, 6000 / 12) = 500:
        // bf,max = 800 mm; with sw = 600 also, min(720, 300, 500) = 300: bf,max = 600 mm
        assertEquals(800, Flange.given(1500, 120, true, null, 6000.0).limit(300), 1e-9);
        assertEquals(600, Flange.given(1500, 120, true, 600.0, 6000.0).limit(300), 1e-9);
        // without a span only the slab limit applies: 300 + 6 × 120 = 1020 mm
        assertEquals(1020, new Flange(1500, 120, true).limit(300), 1e-9);
        assertEquals(
                1020,
                new SectionShape(300, H, new Flange(1500, 120, true)).flange().width(),
                1e-9);
    }

    @Test
    void aFlangeWithinTheLimitIsTakenAsGiven() {
        // Table 6.3.2.1: 1400 mm is within 300 + 2 min(960, 750) = 1800 mm
        SectionShape s = new SectionShape(300, H, Flange.given(1400, 120, false, null, 6000.0));
        assertEquals(1400, s.flange().width(), 1e-9);
        assertFalse(s.flange().reduced());
        // the limit follows the web: the same flange on a narrower web may be cut, on a wider one not
        Flange f = Flange.given(1800, 120, false, null, 6000.0);
        assertEquals(1750, new SectionShape(250, H, f).flange().width(), 1e-9);
        assertEquals(
                1800,
                new SectionShape(350, H, new SectionShape(250, H, f).flange())
                        .flange()
                        .width(),
                1e-9,
                "the given width is kept, so a shape built from another's flange limits it afresh");
    }

    @Test
    void minimumSteelAndStiffnessUseTheEffectiveWidth() {
        // the gross and cracked stiffness (24.2) of the cut flange equal those of a section given 1800 mm
        Flange wide = Flange.given(2400, 120, false, null, 6000.0);
        BeamSection s = tee(wide);
        BeamSection exact = tee(Flange.given(1800, 120, false, null, 6000.0));
        Deflection.Stiffness a = SpanChecks.stiffnessOf(s, Bending.SAGGING);
        Deflection.Stiffness b = SpanChecks.stiffnessOf(exact, Bending.SAGGING);
        assertEquals(b.ig(), a.ig(), 1e-3);
        assertEquals(b.icr(), a.icr(), 1e-3);
        // ρ' of 24.2.4.1 with b the compression face's (effective) width: 2 No. 19 / (1800 × 440)
        BeamSection withTop = Sections.section(
                new SectionShape(300, H, wide),
                Sections.materials(28, 420),
                Sections.detailing(40, Sections.si("10")),
                CodeEquations.SI,
                Sections.bottomAtDepth(Sections.si("29"), 4, H, D),
                Sections.topAt(Sections.si("19"), 2, 60));
        assertEquals(2 * 284 / (1800.0 * D), SpanChecks.rhoPrime(withTop, Bending.SAGGING), 1e-12);
        // 9.6.1.2, statically determinate with the flange in tension: bw taken as min(bf, 2 bw). An L flange
        // given 1500 on a 400 web, hf = 100, sw = 300, ln = 6000 has the effective width
        // 400 + min(6 × 100, 300 / 2, 6000 / 12) = 550 mm (Table 6.3.2.1), so bw = min(550, 800) = 550 mm
        // (with the given width it would be min(1500, 800) = 800 mm)
        SectionShape edge = new SectionShape(400, H, Flange.given(1500, 100, true, 300.0, 6000.0));
        assertEquals(550, SectionChecks.minSteelWidth(edge, Bending.HOGGING, SPAN), 1e-9);
    }

    @Test
    void flangeInTensionSaysWhat24_3_4Asks() {
        // 24.3.4: part of the tension bars over min(effective width, ln/10); ln/10 = 600 < 1800, so bars are
        // also wanted in the outer flange
        Flange f = Flange.given(2400, 120, false, null, 6000.0);
        BeamSection s = Sections.section(
                new SectionShape(300, H, f),
                Sections.materials(28, 420),
                Sections.detailing(40, Sections.si("10")),
                CodeEquations.SI,
                Sections.topAt(Sections.si("25"), 4, 60),
                Sections.bottomAtDepth(Sections.si("19"), 2, H, D));
        Trail t = Trail.recording();
        CheckReport r =
                SectionChecks.run(s, new Demand(-150e6, null), new Span(6000, EndCondition.BOTH_ENDS_CONTINUOUS), t);
        CheckResult fw = r.check("flange_width").orElseThrow();
        assertTrue(fw.pass());
        assertTrue(
                fw.note().contains("24.3.4")
                        && fw.note().contains("min(bf, ln/10) = 600 mm")
                        && fw.note().contains("outer flange"),
                fw.note());
        assertTrue(t.entries().stream()
                .anyMatch(e -> e instanceof Trail.Heading h && h.clause().equals("24.3.4")));
        // in sagging the flange is in compression: no such note
        CheckReport sag = SectionChecks.run(tee(f), new Demand(100e6, null), SPAN, Trail.off());
        assertFalse(sag.check("flange_width").orElseThrow().note().contains("24.3.4"));
    }

    @Test
    void theFlangeSpanMustBeTheSpanChecked() {
        // the flange's own ln sets its width, so a different span given to the checks is a caller's bug
        BeamSection s = tee(Flange.given(1800, 120, false, null, 5000.0));
        assertThrows(
                IllegalArgumentException.class, () -> SectionChecks.run(s, new Demand(100e6, null), SPAN, Trail.off()));
    }
}
