package barfit.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The search's strength bound against the section model's own strain-compatibility solution: it must
 * bound Mn of every layout (a search may only skip what cannot work), the ceiling must be where it stops
 * growing, and the 9.6.1.3 bound must never exceed what 9.6.1.2 and 9.6.1.3 allow.
 */
class StrengthBoundTest {

    @Test
    void maxMnBoundsEveryLayoutsNominalMoment() {
        Random rnd = new Random(31);
        int checked = 0;
        for (int i = 0; i < 3000; i++) {
            FibreCrossCheckTest.Case k = FibreCrossCheckTest.random(rnd);
            BeamSection s = k.section();
            Bending b = k.bending();
            double as = 0;
            double dMax = 0;
            for (BarLayer l : s.layersOn(b.tensionFace())) {
                as += l.area();
                dMax = Math.max(dMax, s.depthFromCompression(l, b));
            }
            if (as == 0 || s.layersOn(b.compressionFace()).size() > 1) {
                // no tension-face bars, or compression-face layers that may straddle the neutral axis: outside
                // the bound's domain (see StrengthBound)
                continue;
            }
            checked++;
            double comp = 0;
            double dpMin = Double.MAX_VALUE;
            double dpMax = 0;
            for (BarLayer l : s.layersOn(b.compressionFace())) {
                comp += l.area();
                dpMin = Math.min(dpMin, s.depthFromCompression(l, b));
                dpMax = Math.max(dpMax, s.depthFromCompression(l, b));
            }
            if (comp == 0) {
                dpMin = dpMax = 0;
            }
            SectionShape sh = s.shape();
            double widest = sh.flanged() && b == Bending.SAGGING ? sh.flange().width() : sh.width();
            double fc = s.materials().fc();
            double fy = s.materials().fy();
            double mn = Math.abs(Flexure.analyse(s, b).mn());
            double bound = StrengthBound.maxMn(as, dMax, comp, dpMin, dpMax, widest, fc, fy);
            assertTrue(mn <= bound * (1 + 1e-9), "case " + i + ": Mn " + mn + " above the bound " + bound);
            // the least area for phi Mn = this phi Mn is at most the area this layout has
            double phiMn = Flexure.analyse(s, b).phiMn();
            double least = StrengthBound.minTensionArea(phiMn, dMax, comp, dpMin, dpMax, widest, fc, fy);
            assertTrue(least <= as * (1 + 1e-6), "case " + i + ": least area " + least + " above " + as);
        }
        assertTrue(checked > 1000, "sections checked: " + checked);
    }

    @Test
    void noAreaBeyondTheCeilingReachesMore() {
        // 300 mm web, d up to 540 mm, 2 No. 19 in compression at 60 mm (invented)
        double fc = 28;
        double fy = 420;
        double ceiling = StrengthBound.ceiling(540, 568, 300, fc, fy);
        // 22.2.2.4.1: the block's stress is 0.85 f'c; the force at fy balances the block to d plus the bars at fy
        assertEquals((0.85 * 28 * 300 * 540 + 568 * 420) / 420, ceiling, 1e-9);
        double top = StrengthBound.maxMn(ceiling, 540, 568, 60, 60, 300, fc, fy);
        for (double k = 1.0; k <= 3.0; k += 0.05) {
            assertTrue(StrengthBound.maxMn(k * ceiling, 540, 568, 60, 60, 300, fc, fy) <= top * (1 + 1e-12));
        }
        // a moment above what the ceiling reaches, even at phi = 0.90 (Table 21.2.2), needs an unbounded area
        assertEquals(
                Double.POSITIVE_INFINITY,
                StrengthBound.minTensionArea(0.9 * top * 1.01, 540, 568, 60, 60, 300, fc, fy));
        assertTrue(StrengthBound.minTensionArea(0.9 * top * 0.99, 540, 568, 60, 60, 300, fc, fy) < ceiling);
    }

    @Test
    void minimumSteelBoundFollows9_6_1_2And9_6_1_3() {
        // 9.6.1.2: As >= As,min; 9.6.1.3: unless As >= 4/3 As,req. With As,req = 1000 mm² and As,min = 800:
        assertEquals(1000, StrengthBound.withMinimumSteel(1000, 800), 1e-9); // strength governs
        // As,req = 500: As,min = 800 applies unless As >= 4/3 x 500 = 666.7, so at least 666.7
        assertEquals(4.0 / 3.0 * 500, StrengthBound.withMinimumSteel(500, 800), 1e-9);
        // As,req = 700: 4/3 x 700 = 933.3 > As,min = 800, so As,min does
        assertEquals(800, StrengthBound.withMinimumSteel(700, 800), 1e-9);
    }

    @Test
    void maxEpsTByHand() {
        // hand calculation from ACI 318-19 22.2.2 (Whitney block, 0.85 f'c, beta1 = 0.85 for 28 MPa, Table
        // 22.2.2.4.3) and phi = 0.90 (Table 21.2.2): b = 300 mm, d = 500 mm, f'c = 28 MPa, fy = 420 MPa,
        // Mu = 200 kN·m. Mn = 222.22 kN·m = T (d - T / (2 x 0.85 x 28 x 300)) gives T = 476.2 kN,
        // a = 66.70 mm, c = a / 0.85 = 78.47 mm, eps_t = 0.003 (500 - 78.47) / 78.47 = 0.01612
        double e = StrengthBound.maxEpsT(200e6, 500, 300, 28, 420, CodeEquations.SI);
        assertEquals(0.01612, e, 0.00002);
        // a larger moment needs more steel: a deeper block, less strain
        assertTrue(StrengthBound.maxEpsT(400e6, 500, 300, 28, 420, CodeEquations.SI) < e);
        // a layout with more steel than the least has less strain (hand calculation): 4 No. 22 at d = 500
        // (As = 1548 mm²) gives c = 1548 x 420 / (0.85 x 28 x 300 x 0.85) = 107.1 mm, eps_t = 0.0110
        assertEquals(0.0110, 0.003 * (500 - 107.1) / 107.1, 0.0001);
        assertTrue(0.003 * (500 - 107.1) / 107.1 <= e);
    }
}
