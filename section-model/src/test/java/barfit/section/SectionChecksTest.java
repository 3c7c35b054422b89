package barfit.section;

import static barfit.section.Sections.IN;
import static barfit.section.Sections.IN2;
import static barfit.section.Sections.KIP;
import static barfit.section.Sections.KSI;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.catalogs.BarSize;
import barfit.section.trail.Trail;
import java.util.List;
import org.junit.jupiter.api.Test;

class SectionChecksTest {
    private static final CodeEquations SI = CodeEquations.SI;
    private static final CodeEquations US = CodeEquations.INCH_POUND;

    private static BeamSection siBeam(double b, double h, List<BarLayer> layers, Stirrups st) {
        return new BeamSection(
                SectionShape.rectangular(b, h),
                Sections.materials(28, 420),
                Sections.detailing(40, Sections.si("10")),
                layers,
                st,
                null,
                SI);
    }

    // ---- shear ----

    /** McCormac & Brown 9th ed., Example 8.2: bw = 14 in, d = 24 in, f'c = 3000 psi, #3 U stirrups, fyt = 60 ksi. */
    private static BeamSection example82(Stirrups st) {
        double h = 26.5 * IN;
        double fc = 3000 / CodeEquations.PSI_PER_MPA;
        // 3 #9 (3.00 in²): rho_w = 0.0089, so row (a) of Table 22.5.5.1 governs over (b) as in the book
        return new BeamSection(
                SectionShape.rectangular(14 * IN, h),
                new Materials(fc, 60 * KSI, 60 * KSI, 19.05, 1.0),
                Sections.detailing(1.5 * IN, Sections.us("3")),
                List.of(Sections.bottomAtDepth(Sections.us("9"), 3, h, 24 * IN)),
                st,
                null,
                US);
    }

    @Test
    void shearFollowsTextbookExample() {
        // McCormac & Brown 9th ed., Example 8.2 (Vc = 2 lambda sqrt(f'c) bw d, still row (a) of ACI 318-19
        // Table 22.5.5.1 when Av >= Av,min): phi Vc = 27,605 lb; phi sqrt(f'c) bw d = 13,803 lb (the
        // 318-19 9.6.3.1 threshold); (c) Vu = 60 kip needs s = 7.33 in; (d) Vu = 150 kip exceeds
        // 8 sqrt(f'c) bw d = 147,228 lb: the section is too small.
        Stirrups st = new Stirrups(Sections.us("3"), 2, 7.33 * IN);
        BeamSection s = example82(st);
        CheckReport r = SectionChecks.run(s, new Demand(null, 60 * KIP), null, Trail.off());
        ShearResult sh = r.shear();
        assertEquals("(a)", sh.vcRow());
        assertEquals(27_605, 0.75 * sh.vc() / KIP * 1000, 5, "phi Vc, lb");
        assertEquals(13_803, sh.minShearTrigger() / KIP * 1000, 3, "phi lambda sqrt(f'c) bw d, lb");
        assertEquals(60.0, sh.phiVn() / KIP, 0.05, "phi Vn at s = 7.33 in");
        assertTrue(r.check("shear_strength").orElseThrow().pass());
        assertEquals(12.0, sh.sMaxAlong() / IN, 1e-9, "s,max = d/2 (Vs <= 4 sqrt(f'c) bw d)");
        CheckReport tooSmall = SectionChecks.run(s, new Demand(null, 150 * KIP), null, Trail.off());
        assertFalse(tooSmall.check("shear_section").orElseThrow().pass());
        double vsMax = 8 * Math.sqrt(3000) * 14 * 24; // lb, as printed 147,228
        assertEquals(147_228, vsMax, 1);
        CheckReport noStirrups = SectionChecks.run(example82(null), new Demand(null, 12 * KIP), null, Trail.off());
        assertTrue(noStirrups.check("shear_min").orElseThrow().pass(), "Ex. 8.2(a): 12 kip needs no stirrups");
    }

    @Test
    void vsBeyondTheSectionLimitIsNotCounted() {
        // McCormac & Brown 9th ed., Example 8.2 section (bw = 14 in, d = 24 in, f'c = 3000 psi): Vc = 2 sqrt(f'c)
        // bw d = 36,807 lb (the book's phi Vc = 27,605 lb / 0.75) and 8 sqrt(f'c) bw d = 147,228 lb (as printed).
        // Four #3 legs (Av = 0.44 in²) at 3 in give Av fyt d / s = 0.44 x 60,000 x 24 / 3 = 211,200 lb by hand,
        // more than ACI 318-19 22.5.1.2 lets the section carry: phi Vn = 0.75 (36,807 + 147,228) = 138,026 lb.
        Stirrups dense = new Stirrups(Sections.us("3"), 4, 3 * IN);
        ShearResult sh = SectionChecks.run(example82(dense), new Demand(null, 100 * KIP), null, Trail.off())
                .shear();
        assertEquals(211_200, sh.vsStirrups() / KIP * 1000, 5, "Av fyt d / s, lb");
        assertEquals(147_228, sh.vs() / KIP * 1000, 5, "Vs taken at Vs,max, lb");
        assertEquals(138_026, sh.phiVn() / KIP * 1000, 10, "phi (Vc + Vs,max), lb");
        // at 7.33 in (the book's spacing) the stirrups stay below the limit and count in full
        ShearResult open = SectionChecks.run(
                        example82(new Stirrups(Sections.us("3"), 2, 7.33 * IN)),
                        new Demand(null, 60 * KIP),
                        null,
                        Trail.off())
                .shear();
        assertEquals(open.vsStirrups(), open.vs(), 1e-9);
        Trail t = Trail.recording();
        SectionChecks.run(example82(dense), new Demand(null, 100 * KIP), null, t);
        assertTrue(
                t.entries().stream()
                        .anyMatch(e -> e instanceof Trail.Step st && st.symbol().equals("Vs,max")),
                "the trail shows the limit it applied");
    }

    @Test
    void sizeEffectRowCWithoutStirrups() {
        // Hand evaluation of ACI 318-19 Table 22.5.5.1(c) and 22.5.5.1.3 (no published example found):
        // bw = 300, d = 500 mm, rho_w = 0.0100, f'c = 28 MPa: lambda_s = sqrt(2/(1 + 0.004 x 500)) = 0.8165;
        // Vc = 0.66 x 0.8165 x 0.01^(1/3) x sqrt(28) x 300 x 500 = 92.15 kN
        double h = 560;
        BarSize lump = Sections.bar("As", 25, 1500);
        BeamSection s = siBeam(300, h, List.of(Sections.bottomAtDepth(lump, 1, h, 500)), null);
        CheckReport r = SectionChecks.run(s, new Demand(null, 40e3), null, Trail.off());
        assertEquals("(c)", r.shear().vcRow());
        assertEquals(0.8165, r.shear().lambdaS(), 1e-4);
        assertEquals(92.15e3, r.shear().vc(), 20);
    }

    @Test
    void stirrupSpacingHalvesAboveRequiredVsLimit() {
        // ACI 318-19 Table 9.7.6.2.2: s <= min(d/2, 600 mm); where the required Vs = Vu/phi - Vc exceeds
        // 0.33 sqrt(f'c) bw d, min(d/4, 300 mm). Hand calculation from the clause: bw = 300, d = 500,
        // f'c = 28 MPa: 0.33 x 5.2915 x 300 x 500 = 261.9 kN; 4 No. 29 (2580 mm², rho_w = 0.0172) with
        // Av >= Av,min: Vc = max(0.17, 0.66 x 0.0172^(1/3)) x 5.2915 x 150 000 = 135.3 kN (row (b)).
        double h = 560;
        List<BarLayer> bars = List.of(Sections.bottomAtDepth(Sections.si("29"), 4, h, 500));
        Stirrups dense = new Stirrups(Sections.si("10"), 4, 60); // provides Vs = 4 x 71 x 420 x 500 / 60 ≈ 1000 kN
        // Vu = 250 kN: Vs,req = 333.3 - 135.3 = 198 kN <= 261.9 kN, so the full limits apply however much
        // Vs the stirrups provide
        ShearResult lo = SectionChecks.run(siBeam(300, h, bars, dense), new Demand(null, 250e3), null, Trail.off())
                .shear();
        assertFalse(lo.highShear());
        assertEquals(250, lo.sMaxAlong(), 1e-9);
        // Vu = 400 kN: Vs,req = 533.3 - 135.3 = 398 kN > 261.9 kN: halved, s,max = d/4 = 125 mm
        ShearResult hi = SectionChecks.run(
                        siBeam(300, h, bars, new Stirrups(Sections.si("10"), 4, 100)),
                        new Demand(null, 400e3),
                        null,
                        Trail.off())
                .shear();
        assertTrue(hi.highShear());
        assertEquals(125, hi.sMaxAlong(), 1e-9);
    }

    @Test
    void lightShearKeepsFullSpacingLimitOnAShallowBeam() {
        // ACI 318-19 Table 9.7.6.2.2 read with the required Vs: a 300 x 300 mm beam, d = 250 mm, f'c = 28,
        // Vu = 14.6 kN, No. 10 stirrups (2 legs) at 100 mm. The stirrups provide Vs = 2 x 71 x 420 x 250 / 100
        // = 149 kN > 0.33 sqrt(f'c) bw d = 131 kN, but the beam needs none of it (Vu/phi = 19.5 kN < Vc):
        // s,max = d/2 = 125 mm and the stirrups pass (hand calculation from the clause).
        double h = 300;
        List<BarLayer> bars = List.of(Sections.bottomAtDepth(Sections.si("16"), 3, h, 250));
        CheckReport r = SectionChecks.run(
                siBeam(300, h, bars, new Stirrups(Sections.si("10"), 2, 100)),
                new Demand(null, 14.6e3),
                null,
                Trail.off());
        assertFalse(r.shear().highShear());
        assertEquals(125, r.shear().sMaxAlong(), 1e-9);
        assertTrue(r.check("stirrup_spacing").orElseThrow().pass());
    }

    // ---- minimum steel ----

    @Test
    void minimumSteelFollows9_6_1_2() {
        // McCormac & Brown 9th ed., Example 5.1: bw = 10 in, d = 24 in, f'c = 4000 psi, fy = 60 ksi ->
        // As,min = 200 bw d / fy = 0.80 in² (3 sqrt(f'c) bw d / fy = 0.76 in²)
        double h = 27 * IN;
        BeamSection s = new BeamSection(
                SectionShape.rectangular(10 * IN, h),
                Sections.materials(4000 / CodeEquations.PSI_PER_MPA, 60 * KSI),
                Sections.detailing(1.5 * IN, Sections.us("3")),
                List.of(Sections.bottomAtDepth(Sections.bar("As", 1.0 * IN, 0.6 * IN2), 1, h, 24 * IN)),
                null,
                null,
                US);
        CheckReport r = SectionChecks.run(s, new Demand(null, null), null, Trail.off());
        CheckResult c = r.check("min_steel").orElseThrow();
        assertEquals(0.80, c.limit().value() / IN2, 0.002);
        assertFalse(c.pass());
    }

    @Test
    void minimumSteelWaivedWhenOneThirdMoreThanRequired() {
        // ACI 318-19 9.6.1.3: As,min need not be met if As provided >= 4/3 As required.
        // 300 x 700 mm, d about 640 mm: As,min = 1.4/420 x 300 x 640 = 640 mm². Two No. 16 (398 mm²)
        // carry phi Mn of about 95 kN·m; for Mu = 40 kN·m As,req is about 165 mm² and 4/3 of it about 220.
        double h = 700;
        BeamSection s = siBeam(
                300,
                h,
                BeamSection.stack(
                        Face.BOTTOM,
                        List.of(new BeamSection.BarGroup(Sections.si("16"), 2)),
                        Sections.detailing(40, Sections.si("10"))),
                null);
        CheckReport light = SectionChecks.run(s, new Demand(40e6, null), null, Trail.off());
        CheckResult c = light.check("min_steel").orElseThrow();
        assertTrue(c.pass(), c.toString());
        assertEquals("9.6.1.3", c.clause());
        CheckReport heavy = SectionChecks.run(s, new Demand(80e6, null), null, Trail.off());
        assertFalse(heavy.check("min_steel").orElseThrow().pass());
        double req = SectionChecks.requiredTensionArea(s, Bending.SAGGING, 40e6);
        BeamSection scaled = siBeam(
                300,
                h,
                List.of(new BarLayer(
                        Face.BOTTOM,
                        Sections.bar("x", 15.9, req / 2),
                        2,
                        s.layers().get(0).fromFace())),
                null);
        assertEquals(40e6, Flexure.analyse(scaled, Bending.SAGGING).phiMn(), 40e6 * 1e-6);
    }

    // ---- spacing ----

    @Test
    void crackControlSpacingLimit() {
        // ACI 318-19 24.3.2 with fs = 2/3 fy: SI, fy = 420, cc = 50 mm: min(380 - 125, 300) = 255 mm
        assertEquals(255, BarSpacing.crackSpacingLimit(420, 50, SI), 1e-9);
        // inch-pound, fy = 60 ksi, cc = 2 in: min(15 - 5, 12) = 10 in (a commonly quoted value; common practice)
        assertEquals(10 * IN, BarSpacing.crackSpacingLimit(60 * KSI, 2 * IN, US), 1e-9);
    }

    @Test
    void clearSpacingCountsBarsThatFit() {
        // 25.2.1: clear spacing >= max(25 mm, db, 4/3 x 20 mm) = 28.7 mm for No. 29; inner width of a
        // 300 mm web with 40 mm cover and No. 10 stirrups = 201 mm: n = floor((201 + 28.7)/(28.7 + 28.7)) = 4
        Detailing det = Sections.detailing(40, Sections.si("10"));
        Materials m = Sections.materials(28, 420);
        assertEquals(4, BarSpacing.maxBars(300, det, Sections.si("29"), m, SI));
        assertEquals(28.7, BarSpacing.minClear(Sections.si("29"), m, SI), 1e-12);
        double clear4 = BarSpacing.clear(300, det, 28.7, 4);
        assertTrue(clear4 >= 28.7 && BarSpacing.clear(300, det, 28.7, 5) < 28.7);
    }

    @Test
    void aWebNoWiderThanABarBetweenItsStirrupLegsHasNoRoomForBars() {
        // inner width = bw - 2 (cover + stirrup diameter), bars against the legs (common practice, no source);
        // 150 mm web, 40 mm cover, No. 10 stirrups (9.5 mm, ASTM A615M Table 1): 150 - 2 x 49.5 = 51 mm
        Detailing det = Sections.detailing(40, Sections.si("10"));
        assertEquals(51, BarSpacing.innerWidth(150, det), 1e-9);
        assertTrue(BarSpacing.roomFor(150, det, Sections.si("29"))); // 28.7 mm bars in 51 mm
        assertFalse(BarSpacing.roomFor(127, det, Sections.si("29"))); // 28 mm inside
        assertFalse(BarSpacing.roomFor(110, det, Sections.si("16"))); // 11 mm inside, 15.9 mm bars
        assertTrue(BarSpacing.roomFor(120, det, Sections.si("16"))); // 21 mm inside
    }

    @Test
    void minimumDepthUsesTheFyFactor() {
        // ACI 318-19 Table 9.3.1.1: simple span 6 m, fy = 420 MPa -> 6000/16 = 375 mm; for fy = 280 MPa
        // the factor (0.4 + 280/700) = 0.8 -> 300 mm
        double h = 350;
        List<BarLayer> bars = List.of(Sections.bottomAtDepth(Sections.si("19"), 3, h, 290));
        BeamSection s420 = siBeam(300, h, bars, null);
        CheckResult c = SectionChecks.run(
                        s420, new Demand(50e6, null), new Span(6000, EndCondition.SIMPLE), Trail.off())
                .check("min_depth")
                .orElseThrow();
        assertEquals(375, c.limit().value(), 1e-9);
        assertFalse(c.pass());
        BeamSection s280 =
                new BeamSection(s420.shape(), Sections.materials(28, 280), s420.detailing(), bars, null, null, SI);
        CheckResult c2 = SectionChecks.run(
                        s280, new Demand(50e6, null), new Span(6000, EndCondition.SIMPLE), Trail.off())
                .check("min_depth")
                .orElseThrow();
        assertEquals(300, c2.limit().value(), 1e-9);
        assertTrue(c2.pass());
    }

    @Test
    void skinReinforcementNeededAbove900mm() {
        // ACI 318-19 9.7.2.3: skin reinforcement where h exceeds 900 mm
        double h = 1000;
        List<BarLayer> bars = List.of(Sections.bottomAtDepth(Sections.si("29"), 4, h, 930));
        CheckReport r = SectionChecks.run(siBeam(400, h, bars, null), new Demand(500e6, null), null, Trail.off());
        assertFalse(r.check("skin").orElseThrow().pass());
        BeamSection withSkin = new BeamSection(
                SectionShape.rectangular(400, h),
                Sections.materials(28, 420),
                Sections.detailing(40, Sections.si("10")),
                bars,
                null,
                new SkinBars(Sections.si("13x"), 200),
                SI);
        assertTrue(SectionChecks.run(withSkin, new Demand(500e6, null), null, Trail.off())
                .check("skin")
                .orElseThrow()
                .pass());
    }

    @Test
    void trailRecordsEveryCheckWithNumbers() {
        double h = 600;
        Detailing det = Sections.detailing(40, Sections.si("10"));
        List<BarLayer> bars = new java.util.ArrayList<>(
                BeamSection.stack(Face.BOTTOM, List.of(new BeamSection.BarGroup(Sections.si("25"), 4)), det));
        // two hangers: each stirrup leg's bend holds a bar at the top as well (25.7.1.3)
        bars.addAll(BeamSection.stack(Face.TOP, List.of(new BeamSection.BarGroup(Sections.si("13x"), 2)), det));
        BeamSection s = siBeam(300, h, bars, new Stirrups(Sections.si("10"), 2, 200));
        Trail t = Trail.recording();
        CheckReport r = SectionChecks.run(s, new Demand(250e6, 150e3), new Span(6000, EndCondition.SIMPLE), t);
        long headings =
                t.entries().stream().filter(e -> e instanceof Trail.Heading).count();
        assertTrue(headings >= 6, "flexure, minimum steel, spacing, cover, shear, depth: " + headings);
        assertTrue(r.ok(), r.failures().toString());
        Trail.Step phiMn = t.entries().stream()
                .filter(e -> e instanceof Trail.Step s2 && s2.symbol().equals("φMn"))
                .map(e -> (Trail.Step) e)
                .findFirst()
                .orElseThrow();
        assertEquals(r.flexure().phiMn(), phiMn.result().value(), 1e-6);
    }
}
