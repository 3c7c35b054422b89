package barfit.section.anchorage;

import static barfit.section.anchorage.Bars.IN;
import static barfit.section.anchorage.Bars.SI;
import static barfit.section.anchorage.Bars.US;
import static barfit.section.anchorage.Bars.si;
import static barfit.section.anchorage.Bars.us;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.section.Development;
import barfit.section.Materials;
import barfit.section.anchorage.LapSplices.Kind;
import barfit.section.trail.Trail;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Development in compression (25.4.9) and tension lap splices (25.5), by hand and from a textbook's ld. */
class CompressionAndLapsTest {
    @Test
    void compressionInchPound() {
        // hand calculation from 25.4.9.2, #8, fy = 60 ksi, f'c = 4000 psi: (a) 60 000 × 1.0 / (50 × 1.0 × √4000)
        // × 1.0 = 18.97 in; (b) 0.0003 × 60 000 × 1.0 × 1.0 = 18.0 in -> 18.97 in
        Materials m = Bars.usMaterials(4000, 60);
        Trail t = Trail.recording();
        var r = CompressionDevelopment.ldc(us("8"), m, US, false, t);
        assertEquals(18.974, r.byRoot() / IN, 0.001);
        assertEquals(18.0, r.byFlat() / IN, 1e-9);
        assertEquals(18.974, r.ldc() / IN, 0.001);
        Bars.assertWhole(t);
        // enclosed (Table 25.4.9.3): ψr = 0.75 -> (a) 14.23 in, (b) 13.5 in
        assertEquals(
                14.230,
                CompressionDevelopment.ldc(us("8"), m, US, true, Trail.off()).ldc() / IN,
                0.001);
        // #3: (a) 18.974 × 0.375 = 7.12 in, (b) 6.75 in, 25.4.9.1's 8 in governs
        assertEquals(
                8.0,
                CompressionDevelopment.ldc(us("3"), m, US, false, Trail.off()).ldc() / IN,
                1e-12);
    }

    @Test
    void compressionSi() {
        // hand calculation from 25.4.9.2 of ACI 318M-19: No. 25, fy = 420 MPa, f'c = 28 MPa:
        // (a) 0.24 × 420 / √28 × 25.4 = 483.85 mm; (b) 0.043 × 420 × 25.4 = 458.72 mm -> 483.85 mm
        var r = CompressionDevelopment.ldc(si("25"), Bars.siMaterials(28, 420), SI, false, Trail.off());
        assertEquals(483.85, r.ldc(), 0.01);
        assertEquals(458.724, r.byFlat(), 1e-6);
        // No. 10 at f'c = 40 MPa: (a) 0.24 × 420 / 6.325 × 9.5 = 151.4 mm, 25.4.9.1's 200 mm governs
        assertEquals(
                200.0,
                CompressionDevelopment.ldc(si("10"), Bars.siMaterials(40, 420), SI, false, Trail.off())
                        .ldc(),
                1e-12);
    }

    @Test
    void lapClassFromTable25_5_2_1() {
        // Table 25.5.2.1: class A only with As,prov/As,req >= 2 over the lap and at most half of As spliced
        assertEquals(Kind.CLASS_A, LapSplices.tensionClass(si("25"), 2.0, 0.5));
        assertEquals(Kind.CLASS_B, LapSplices.tensionClass(si("25"), 1.99, 0.5));
        assertEquals(Kind.CLASS_B, LapSplices.tensionClass(si("25"), 2.5, 0.51));
        assertEquals(Kind.CLASS_B, LapSplices.tensionClass(si("25"), 1.0, 1.0));
        assertEquals(Kind.CLASS_A, LapSplices.tensionClass(si("36"), 3.0, 0.25));
    }

    @Test
    void barsLargerThanNo36AreNotLapped() {
        // 25.5.1.1: no lap splices for bars larger than No. 36 (#11): a mechanical or welded splice
        assertFalse(LapSplices.lapAllowed(si("43")));
        assertFalse(LapSplices.lapAllowed(si("57")));
        assertFalse(LapSplices.lapAllowed(us("14")));
        assertTrue(LapSplices.lapAllowed(si("36")));
        assertTrue(LapSplices.lapAllowed(us("11")));
        Trail t = Trail.recording();
        var lap = LapSplices.tension(si("43"), 2000, 3.0, 0.25, SI, t);
        assertEquals(Kind.MECHANICAL, lap.kind());
        assertFalse(lap.lapped());
        assertEquals(0, lap.length(), 1e-12);
        assertEquals("25.5.1.1", lap.clause());
        Bars.assertWhole(t);
    }

    @Test
    void lapLengthsFromATextbookLd() {
        // McCormac and Brown, "Design of Reinforced Concrete", 9th ed., Example 7.2(a) (as in
        // DevelopmentAndDeflectionTest): #8 bottom bars, f'c = 3000 psi, fy = 60 ksi, cb = 1.5 in, Ktr = 0:
        // ld = 55 diameters. By hand from 25.4.2.4: (3/40)(60 000/√3000)(1.0/1.5) × 1.0 = 54.77 in.
        // Table 25.5.2.1: class A 1.0 ld = 54.77 in, class B 1.3 ld = 71.20 in
        Materials m = Bars.usMaterials(3000, 60);
        Development.Result ld = Development.general(us("8"), m, US, false, 1.5 * IN, 0, 0, 0, Trail.off());
        assertEquals(55, ld.ld() / IN, 0.5);
        Trail t = Trail.recording();
        var a = LapSplices.tension(us("8"), ld, 2.0, 0.5, US, t);
        assertEquals(Kind.CLASS_A, a.kind());
        assertEquals(54.772, a.length() / IN, 0.001);
        var b = LapSplices.tension(us("8"), ld, 1.5, 0.5, US, t);
        assertEquals(Kind.CLASS_B, b.kind());
        assertEquals(71.204, b.length() / IN, 0.001);
        Bars.assertWhole(t);
    }

    @Test
    void lapTakesLdBeforeItsMinimum() {
        // 25.5.2.1: ld of 25.4.2.1(a), without 25.4.2.1(b)'s 300 mm. No. 13 bottom bars, f'c = 40 MPa,
        // fy = 420 MPa, (cb + Ktr)/db capped at 2.5: ld = 420 / (1.1 × √40) × 0.8 / 2.5 × 12.7 = 245.35 mm
        // (the section's ld is raised to 300 mm); class B = max(1.3 × 245.35, 300) = 318.95 mm, not 390 mm
        Development.Result ld =
                Development.general(si("13"), Bars.siMaterials(40, 420), SI, false, 60, 0, 0, 0, Trail.off());
        assertEquals(300, ld.ld(), 1e-9);
        assertEquals(245.347, ld.ldEquation(), 0.001);
        assertEquals(
                318.951,
                LapSplices.tension(si("13"), ld, 1.0, 1.0, SI, Trail.off()).length(),
                0.001);
        // class A of the same: max(245.35, 300) = 300 mm (Table 25.5.2.1's least lap)
        assertEquals(
                300, LapSplices.tension(si("13"), ld, 2.0, 0.5, SI, Trail.off()).length(), 1e-12);
        // and 12 in in inch-pound
        assertEquals(
                12.0,
                LapSplices.tension(us("3"), 5 * IN, 2.0, 0.5, US, Trail.off()).length() / IN,
                1e-12);
    }

    @Test
    void mixedSizesTakeTheLonger() {
        // 25.5.2.2 (from memory): the greater of ld of the larger bar and the lap of the smaller
        var small = LapSplices.tension(si("19"), 700, 1.0, 1.0, SI, Trail.off()); // class B 910 mm
        assertEquals(910, small.length(), 1e-9);
        assertEquals(1000, LapSplices.mixedSizes(1000, small), 1e-12);
        assertEquals(910, LapSplices.mixedSizes(800, small), 1e-12);
    }

    @Test
    void stockBarsLapWhereThePiecesEnd() {
        // hand calculation: a 30 m run of 12 m stock with 1 m laps: pieces cover 0-12, 11-23, 22-34 m:
        // ceil((30 − 1) / (12 − 1)) = 3 pieces, laps starting at 11 m and 22 m
        var plan = LapSplices.stock(30_000, 12_000, 1000);
        assertEquals(3, plan.pieces());
        assertEquals(List.of(11_000.0, 22_000.0), plan.lapStarts());
        // 23 m exactly: two pieces, 0-12 and 11-23 m
        assertEquals(2, LapSplices.stock(23_000, 12_000, 1000).pieces());
        assertEquals(3, LapSplices.stock(23_001, 12_000, 1000).pieces()); // 1 mm more needs a third piece
        assertEquals(0, LapSplices.stock(12_000, 12_000, 1000).laps());
        // common practice, no source: 12 m, or 40 ft = 12 192 mm
        assertEquals(12_000, LapSplices.defaultStockLength(SI), 1e-12);
        assertEquals(12_192, LapSplices.defaultStockLength(US), 1e-9);
    }
}
