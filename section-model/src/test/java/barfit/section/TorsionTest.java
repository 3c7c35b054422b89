package barfit.section;

import static barfit.section.Sections.IN;
import static barfit.section.Sections.IN2;
import static barfit.section.Sections.KIP;
import static barfit.section.Sections.KIP_FT;
import static barfit.section.Sections.KSI;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.catalogs.BarSize;
import barfit.section.trail.Trail;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Torsion (ACI 318-19 22.7, 9.5.4, 9.6.4, 9.7.5, 9.7.6.3) against hand calculations written from the
 * clauses, the arithmetic in the comments. No published spandrel example could be recalled with its
 * numbers to the confidence a test needs, so none is used.
 */
class TorsionTest {
    private static final double KNM = 1e6;
    private static final BarSize NO13 = Sections.si("13x");

    /**
     * An L-shaped spandrel: web 350 × 600 mm, slab 150 mm on one side, 1850 mm wide as given (its effective
     * width for flexure is 350 + 6 × 150 = 1250 mm, Table 6.3.2.1); f'c = 28 MPa, fy = fyt = 420 MPa; 40 mm
     * cover to No. 13 closed stirrups (2 legs); 4 No. 25 bottom (d = 600 − 40 − 12.7 − 12.7 = 534.6 mm),
     * 3 No. 19 top; No. 13 skin bars at {@code skin} mm.
     */
    private static BeamSection spandrel(Stirrups st) {
        return spandrel(st, 100);
    }

    private static BeamSection spandrel(Stirrups st, double skin) {
        Detailing det = Sections.detailing(40, NO13);
        List<BarLayer> layers = new java.util.ArrayList<>(
                BeamSection.stack(Face.BOTTOM, List.of(new BeamSection.BarGroup(Sections.si("25"), 4)), det));
        layers.addAll(BeamSection.stack(Face.TOP, List.of(new BeamSection.BarGroup(Sections.si("19"), 3)), det));
        return new BeamSection(
                new SectionShape(350, 600, Flange.given(1850, 150, true, null, null)),
                Sections.materials(28, 420),
                det,
                layers,
                st,
                new SkinBars(NO13, skin),
                CodeEquations.SI);
    }

    private static final Stirrups NO13_AT_120 = new Stirrups(NO13, 2, 120);

    private static CheckResult check(CheckReport r, String id) {
        return r.check(id).orElseThrow(() -> new AssertionError("no check " + id));
    }

    @Test
    void spandrelUnderEquilibriumTorsion() {
        // Hand calculation from ACI 318M-19 22.7, 9.2.4.4, 9.6.4, 9.7.6.3.3:
        // overhang = min(1850 − 350, 600 − 150, 4 × 150) = min(1500, 450, 600) = 450 mm
        // Acp = 350 × 600 + 450 × 150 = 277 500 mm²; pcp = 2 (350 + 450 + 600) = 2800 mm
        // Acp²/pcp = 27.502e6 mm³ > the web's 210 000² / 1900 = 23.211e6 mm³: the overhang counts
        // Tth = 0.083 × 1 × √28 × 27.502e6 = 0.083 × 5.2915 × 27.502e6 = 12.079 kN·m; φTth = 9.059 kN·m
        // Tcr = 0.33 × 5.2915 × 27.502e6 = 48.024 kN·m
        // hoop: x0 = 350 − 2 × 40 − 12.7 = 257.3; y0 = 600 − 92.7 = 507.3; Aoh = 130 528.3 mm²;
        //       ph = 2 (257.3 + 507.3) = 1529.2 mm; Ao = 0.85 Aoh = 110 949.0 mm²
        // Vc = 0.17 × 5.2915 × 350 × 534.6 = 168.32 kN (Table 22.5.5.1 (a): 0.66 ρw^(1/3) = 0.66 ×
        //      (2040 / (350 × 534.6))^(1/3) = 0.146 < 0.17)
        // Vu = 150 kN, Tu = 40 kN·m:
        // v = 150 000 / (350 × 534.6) = 0.8017 MPa; vt = 40e6 × 1529.2 / (1.7 × 130 528.3²) = 2.1119 MPa
        // √(0.8017² + 2.1119²) = 2.2589 MPa ≤ 0.75 (168 316 / 187 110 + 0.66 × 5.2915) = 0.75 × (0.8996 +
        //      3.4924) = 3.2940 MPa
        // At/s = 40e6 / (0.75 × 2 × 110 949.0 × 420) = 40e6 / 69.898e6 = 0.57226 mm²/mm
        // Av/s = (150 000 / 0.75 − 168 316) / (420 × 534.6) = 31 684 / 224 532 = 0.14111 mm²/mm
        // (Av + 2At)/s = 0.14111 + 2 × 0.57226 = 1.28564 ≤ 2 × 129 / 120 = 2.15 mm²/mm
        // minimum: max(0.062 × 5.2915, 0.35) × 350 / 420 = 0.35 × 350 / 420 = 0.29167 mm²/mm (Table 9.6.4.2)
        // s,max = min(1529.2 / 8, 300) = 191.15 mm (9.7.6.3.3)
        // Al = 0.57226 × 1529.2 × (420 / 420) = 875.10 mm²
        // Al,min = 0.42 × 5.2915 × 277 500 / 420 − 0.57226 × 1529.2 = 1468.39 − 875.10 = 593.29 mm² (9.6.4.3)
        // Al counted: Mu = 250 kN·m needs, with the block in the 1250 mm flange, 0.9 × 420 As (534.6 − As ×
        //      420 / (2 × 0.85 × 28 × 1250)) = 250e6, As = 1258.0 mm² (a = 17.8 mm < hf; As,min = 1.4 / 420 ×
        //      350 × 534.6 = 623.7 mm² is less); the top bars are not relied on (without them φMn = 0.9 × 2040
        //      × 420 × (534.6 − 14.4) = 401 kN·m ≥ Mu): (2040 − 1258.0) + 3 × 284 + 2 faces × 2 × 129
        //      (skin bars at 100 mm over h/2: ceil(300 / 100) − 1 = 2 a face) = 782.0 + 852 + 516 = 2150.0 mm²
        // bar spacing round the hoop (9.7.5.1): corner bars 65.4 mm (No. 25) and 600 − 62.25 = 537.75 mm (No. 19)
        //      from the bottom, skin bars at 165.4 and 265.4 mm: the largest gap 537.75 − 265.4 = 272.35 mm
        //      (across: (350 − 2 × 52.7 − 19.1) / 2 = 112.75 mm top, 73.07 mm bottom) ≤ 300 mm
        BeamSection s = spandrel(NO13_AT_120);
        Trail trail = Trail.recording();
        CheckReport r = SectionChecks.run(s, new Demand(250 * KNM, 150e3, 40 * KNM), null, trail);

        TorsionOutline o = TorsionOutline.of(s.shape());
        assertEquals(450, o.overhang(), 1e-9);
        assertEquals(277_500, o.acp(), 1e-6);
        assertEquals(2800, o.pcp(), 1e-9);
        assertEquals(12.079, Torsion.threshold(s) / KNM, 0.001);
        assertEquals(48.024, Torsion.cracking(s) / KNM, 0.001);
        Torsion.Hoop hoop = Torsion.hoop(s);
        assertEquals(130_528.3, hoop.aoh(), 0.1);
        assertEquals(1529.2, hoop.ph(), 1e-9);

        CheckResult threshold = check(r, "torsion_threshold");
        assertTrue(threshold.pass());
        assertEquals(9.059, threshold.limit().value() / KNM, 0.001);
        CheckResult section = check(r, "torsion_section");
        assertTrue(section.pass());
        assertEquals(2.2589, section.demand().value(), 1e-4);
        assertEquals(3.2940, section.limit().value(), 1e-4);
        CheckResult transverse = check(r, "torsion_transverse");
        assertTrue(transverse.pass());
        assertEquals(1.28564, transverse.demand().value(), 1e-5);
        assertEquals(2.15, transverse.limit().value(), 1e-9);
        assertEquals(0.29167, check(r, "torsion_transverse_min").limit().value(), 1e-5);
        assertEquals(191.15, check(r, "torsion_spacing").limit().value(), 1e-9);
        CheckResult longitudinal = check(r, "torsion_longitudinal");
        assertTrue(longitudinal.pass());
        assertEquals(875.10, longitudinal.demand().value(), 0.01);
        assertEquals(2150.0, longitudinal.limit().value(), 0.1);
        assertEquals(272.35, check(r, "torsion_bar_spacing").demand().value(), 1e-9);
        assertTrue(check(r, "torsion_closed_stirrups").pass());
        assertTrue(check(r, "torsion_corner_bars").pass());
        assertTrue(check(r, "torsion_bar_size").pass());
        assertTrue(r.ok(), () -> r.failures().toString());
        assertTrue(trail.entries().stream()
                .anyMatch(e -> e instanceof Trail.Step st && st.symbol().equals("Tth")));

        // the numbers behind the checks, for the search to call
        ShearResult sh = r.shear();
        TorsionResult t = Torsion.analyse(s, 40 * KNM, false, sh, Trail.off());
        assertEquals(0.57226, t.atPerS(), 1e-5);
        assertEquals(0.14111, t.avPerS(), 1e-5);
        assertEquals(593.29, t.alMin(), 0.01);
        assertEquals(875.10, t.alRequired(), 0.01);
        assertFalse(t.neglected());
    }

    @Test
    void sideBarsTooFarApartFail9_7_5_1() {
        // 9.7.5.1, longitudinal bars round the hoop at most 300 mm apart: with the skin bars at 150 mm there is
        // one a face over h/2 (ceil(300 / 150) − 1), at 65.4 + 150 = 215.4 mm, and 537.75 − 215.4 = 322.35 mm
        // is left open below the top corner bar
        CheckReport r = SectionChecks.run(
                spandrel(NO13_AT_120, 150), new Demand(250 * KNM, 150e3, 40 * KNM), null, Trail.off());
        CheckResult c = check(r, "torsion_bar_spacing");
        assertFalse(c.pass());
        assertEquals(322.35, c.demand().value(), 1e-9);
    }

    @Test
    void belowTheThresholdTorsionIsNeglected() {
        // φTth = 9.059 kN·m for the spandrel (see above). Tu = 9.0 kN·m < φTth: torsion may be neglected
        // (9.5.4.1); the torsion checks pass and say so, and ask nothing of the stirrups: with No. 13 at
        // 260 mm (more than ph/8 = 191 mm) the beam still passes its torsion checks.
        BeamSection s = spandrel(new Stirrups(NO13, 2, 260));
        CheckReport r = SectionChecks.run(s, new Demand(250 * KNM, 100e3, 9.0 * KNM), null, Trail.off());
        for (String id :
                List.of("torsion_threshold", "torsion_section", "torsion_transverse", "torsion_longitudinal")) {
            CheckResult c = check(r, id);
            assertTrue(c.pass(), id);
            assertTrue(c.note().contains("neglected"), id + ": " + c.note());
        }
        assertTrue(r.check("torsion_spacing").isEmpty());
        assertTrue(r.check("torsion_closed_stirrups").isEmpty());
        // Tu = 9.1 kN·m ≥ φTth: designed for, and 260 mm exceeds s,max = 191.15 mm
        CheckReport above = SectionChecks.run(s, new Demand(250 * KNM, 100e3, 9.1 * KNM), null, Trail.off());
        assertFalse(check(above, "torsion_spacing").pass());
        assertTrue(check(above, "torsion_threshold").pass());
    }

    @Test
    void noTorsionLeavesTheChecksAsTheyWere() {
        // Tu null or zero: no torsion check at all, the same checks as the two-argument demand
        BeamSection s = spandrel(NO13_AT_120);
        List<String> plain = SectionChecks.run(s, new Demand(250 * KNM, 150e3), null, Trail.off()).checks().stream()
                .map(CheckResult::id)
                .toList();
        List<String> zero = SectionChecks.run(s, new Demand(250 * KNM, 150e3, 0.0), null, Trail.off()).checks().stream()
                .map(CheckResult::id)
                .toList();
        assertEquals(plain, zero);
        assertTrue(plain.stream().noneMatch(id -> id.startsWith("torsion")));
        assertNull(new Demand(1.0, 2.0).tu());
    }

    @Test
    void compatibilityTorsionIsReducedToPhiTcr() {
        // 22.7.3.2: Tu = 60 kN·m > φTcr = 0.75 × 48.024 = 36.018 kN·m is reduced to 36.018 kN·m:
        // At/s = 36.018e6 / 69.898e6 = 0.51530 mm²/mm, against 60e6 / 69.898e6 = 0.85840 as equilibrium torsion
        BeamSection s = spandrel(NO13_AT_120);
        CheckReport compat = SectionChecks.run(s, new Demand(250 * KNM, 150e3, 60 * KNM, true), null, Trail.off());
        CheckResult c = check(compat, "torsion_compatibility");
        assertTrue(c.pass());
        assertEquals(36.018, c.limit().value() / KNM, 0.001);
        assertTrue(c.note().contains("22.7.3.3"), c.note());
        ShearResult sh = compat.shear();
        TorsionResult reduced = Torsion.analyse(s, 60 * KNM, true, sh, Trail.off());
        assertEquals(36.018, reduced.tuDesign() / KNM, 0.001);
        assertEquals(0.51530, reduced.atPerS(), 1e-5);
        assertTrue(reduced.reduced());
        TorsionResult equilibrium = Torsion.analyse(s, 60 * KNM, false, sh, Trail.off());
        assertEquals(0.85840, equilibrium.atPerS(), 1e-5);
        assertTrue(SectionChecks.run(s, new Demand(250 * KNM, 150e3, 60 * KNM), null, Trail.off())
                .check("torsion_compatibility")
                .isEmpty());
        // Tu = 30 kN·m ≤ φTcr: compatibility torsion is kept as given
        TorsionResult kept = Torsion.analyse(s, 30 * KNM, true, sh, Trail.off());
        assertFalse(kept.reduced());
        assertEquals(30, kept.tuDesign() / KNM, 1e-12);
    }

    @Test
    void aSectionTooSmallFailsTheCombinedLimit() {
        // Hand calculation from 22.7.7.1(a): rectangular 250 × 400 mm, f'c = 28 MPa, 40 mm cover, No. 10
        // stirrups (2 legs at 100 mm), 2 No. 25 bottom: d = 400 − 40 − 9.5 − 12.7 = 337.8 mm; Vc = 0.17 ×
        // 5.2915 × 250 × 337.8 = 75.97 kN (row (a): 0.66 × (1020 / 84 450)^(1/3) = 0.151 < 0.17);
        // x0 = 250 − 89.5 = 160.5, y0 = 400 − 89.5 = 310.5: Aoh = 49 835.25 mm², ph = 942 mm
        // Vu = 150 kN, Tu = 25 kN·m: v = 150 000 / 84 450 = 1.7762; vt = 25e6 × 942 / (1.7 × 49 835.25²) = 5.5779
        // √(1.7762² + 5.5779²) = 5.8539 MPa > 0.75 × (0.8996 + 3.4924) = 3.2940 MPa: too small
        Detailing det = Sections.detailing(40, Sections.si("10"));
        List<BarLayer> layers = new java.util.ArrayList<>(
                BeamSection.stack(Face.BOTTOM, List.of(new BeamSection.BarGroup(Sections.si("25"), 2)), det));
        layers.addAll(BeamSection.stack(Face.TOP, List.of(new BeamSection.BarGroup(Sections.si("13x"), 2)), det));
        BeamSection s = new BeamSection(
                SectionShape.rectangular(250, 400),
                Sections.materials(28, 420),
                det,
                layers,
                new Stirrups(Sections.si("10"), 2, 100),
                null,
                CodeEquations.SI);
        CheckReport r = SectionChecks.run(s, new Demand(80 * KNM, 150e3, 25 * KNM), null, Trail.off());
        CheckResult c = check(r, "torsion_section");
        assertFalse(c.pass());
        assertEquals(5.8539, c.demand().value(), 1e-4);
        assertEquals(3.2940, c.limit().value(), 1e-4);
        assertFalse(r.ok());
    }

    @Test
    void inchPoundSpandrelFollowsTheInchPoundEquations() {
        // Hand calculation from ACI 318-19 (inch-pound) 22.7, 9.2.4.4, 9.6.4.3: web 14 × 24 in, slab 6 in on one
        // side, 44 in wide as given; f'c = 4000 psi, fy = fyt = 60 000 psi; 1.5 in cover to #4 stirrups (2 legs
        // at 5 in); 4 #8 bottom (d = 24 − 1.5 − 0.5 − 0.5 = 21.5 in); Vu = 40 kip, Tu = 20 kip·ft.
        // overhang = min(44 − 14, 24 − 6, 4 × 6) = 18 in; Acp = 336 + 18 × 6 = 444 in²; pcp = 2 (14 + 18 + 24)
        //     = 112 in; Acp²/pcp = 1760.14 in³ (web alone 336² / 76 = 1485.47 in³)
        // Tth = 1 × √4000 × 1760.14 = 63.246 × 1760.14 = 111 321 lb·in = 9.2768 kip·ft; Tcr = 4 Tth = 37.107 kip·ft
        // x0 = 14 − 3 − 0.5 = 10.5, y0 = 24 − 3.5 = 20.5 in; Aoh = 215.25 in²; ph = 62 in; Ao = 182.96 in²
        // At/s = 240 000 / (0.75 × 2 × 182.9625 × 60 000) = 0.014575 in²/in
        // Vc = 2 × 63.246 × 14 × 21.5 = 38 074 lb (row (a): 8 × (3.16 / 301)^(1/3) = 1.75 < 2)
        // Av/s = (40 000 / 0.75 − 38 074) / (60 000 × 21.5) = 0.011829 in²/in; (Av + 2At)/s = 0.040979 in²/in
        // v = 40 000 / 301 = 132.89 psi; vt = 240 000 × 62 / (1.7 × 215.25²) = 188.92 psi; √ = 230.97 psi
        // limit = 0.75 × (38 074 / 301 + 8 × 63.246) = 474.34 psi
        // Al = 0.014575 × 62 = 0.90365 in²; Al,min = 5 × 63.246 × 444 / 60 000 − max(0.014575, 25 × 14 / 60 000)
        //     × 62 = 2.34009 − 0.90365 = 1.43644 in² (governs); s,max = min(62 / 8, 12) = 7.75 in
        double h = 24 * IN;
        BarSize no4 = Sections.bar("#4", 0.5 * IN, 0.20 * IN2);
        Detailing det = Sections.detailing(1.5 * IN, no4);
        List<BarLayer> layers = new java.util.ArrayList<>(
                BeamSection.stack(Face.BOTTOM, List.of(new BeamSection.BarGroup(Sections.us("8"), 4)), det));
        layers.addAll(BeamSection.stack(Face.TOP, List.of(new BeamSection.BarGroup(Sections.us("8"), 2)), det));
        BeamSection s = new BeamSection(
                new SectionShape(14 * IN, h, Flange.given(44 * IN, 6 * IN, true, null, null)),
                new Materials(4000 / CodeEquations.PSI_PER_MPA, 60 * KSI, 60 * KSI, 19.05, 1.0),
                det,
                layers,
                new Stirrups(no4, 2, 5 * IN),
                null,
                CodeEquations.INCH_POUND);
        double psi = 1 / CodeEquations.PSI_PER_MPA;
        CheckReport r = SectionChecks.run(s, new Demand(100 * KIP_FT, 40 * KIP, 20 * KIP_FT), null, Trail.off());
        assertEquals(444, TorsionOutline.of(s.shape()).acp() / IN2, 1e-9);
        assertEquals(112, TorsionOutline.of(s.shape()).pcp() / IN, 1e-9);
        assertEquals(9.2768, Torsion.threshold(s) / KIP_FT, 1e-4);
        assertEquals(37.107, Torsion.cracking(s) / KIP_FT, 1e-3);
        TorsionResult t = Torsion.analyse(s, 20 * KIP_FT, false, r.shear(), Trail.off());
        assertEquals(0.014575, t.atPerS() / IN, 1e-6);
        assertEquals(0.011829, t.avPerS() / IN, 1e-6);
        assertEquals(230.97, t.sectionStress() / psi, 0.01);
        assertEquals(474.34, t.sectionLimit() / psi, 0.01);
        assertEquals(0.90365, t.al() / IN2, 1e-5);
        assertEquals(1.43644, t.alMin() / IN2, 1e-5);
        assertEquals(7.75, t.sMax() / IN, 1e-9);
        assertEquals(0.040979, check(r, "torsion_transverse").demand().value() / IN, 1e-6);
        assertTrue(check(r, "torsion_section").pass());
        assertEquals(1.43644, check(r, "torsion_longitudinal").demand().value() / IN2, 1e-5);
    }

    @Test
    void aFlangeThatLowersAcpSquaredOverPcpIsNeglected() {
        // 9.2.4.4(b): a thin slab on a deep narrow web: web 250 × 900 mm, slab 100 mm both sides, overhang
        // min(bf given, 900 − 100, 4 × 100) = 400 mm each side. Web: 225 000² / 2300 = 22.011e6 mm³; with the
        // flanges Acp = 225 000 + 2 × 400 × 100 = 305 000 mm², pcp = 2 (250 + 800 + 900) = 3900 mm,
        // 305 000² / 3900 = 23.853e6 mm³: larger, they count. With 60 mm slabs: overhang min(1000, 840, 240) =
        // 240; Acp = 225 000 + 2 × 240 × 60 = 253 800, pcp = 2 (250 + 480 + 900) = 3260: 253 800² / 3260 =
        // 19.759e6 mm³ < 22.011e6: neglected.
        TorsionOutline thick =
                TorsionOutline.of(new SectionShape(250, 900, Flange.given(2250, 100, false, null, null)));
        assertTrue(thick.flangesCounted());
        assertEquals(305_000, thick.acp(), 1e-6);
        TorsionOutline thin = TorsionOutline.of(new SectionShape(250, 900, Flange.given(2250, 60, false, null, null)));
        assertFalse(thin.flangesCounted());
        assertEquals(225_000, thin.acp(), 1e-6);
        assertEquals(2300, thin.pcp(), 1e-9);
    }
}
