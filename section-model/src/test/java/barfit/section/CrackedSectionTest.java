package barfit.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The cracked transformed section of 24.2 with every bar layer at its own depth. Expected values are hand
 * calculations from 24.2 / the transformed section (common practice): f'c = 28 MPa, Ec = 4700 √28 =
 * 24 870 MPa (19.2.2.1(b)), n = Es / Ec = 200 000 / 24 870 = 8.0418.
 */
class CrackedSectionTest {
    private static final Materials M = Sections.materials(28, 420);
    private static final Detailing DET = Sections.detailing(40, Sections.si("10"));

    @Test
    void twoTensionLayersEachAtItsOwnDepth() {
        // b = 300, h = 600; 3 No. 25 (1530 mm²) at d1 = 540 and 2 No. 25 (1020 mm²) at d2 = 490.
        // First moment about the neutral axis at kd (both layers below it, each with n As):
        //   300 kd² / 2 = n [1530 (540 − kd) + 1020 (490 − kd)]
        //   150 kd² + 20 506.6 kd − 10 663 432 = 0  ->  kd = 206.89 mm
        // Icr = 300 kd³ / 3 + n [1530 (540 − kd)² + 1020 (490 − kd)²]
        //     = 885.61e6 + 1365.24e6 + 657.43e6 = 2908.29e6 mm⁴
        // (the layers lumped at their centroid d = 520 give the same kd but Icr = 2895.98e6 mm⁴: short by
        // n Σ As,i (di − d)² = 8.0418 × (1530 × 20² + 1020 × 30²) = 12.30e6 mm⁴)
        BeamSection s = Sections.section(
                SectionShape.rectangular(300, 600),
                M,
                DET,
                CodeEquations.SI,
                Sections.bottomAtDepth(Sections.si("25"), 3, 600, 540),
                Sections.bottomAtDepth(Sections.si("25"), 2, 600, 490));
        Deflection.Stiffness st = SpanChecks.stiffnessOf(s, Bending.SAGGING);
        assertEquals(8.0418, st.n(), 1e-4);
        assertEquals(206.89, st.kd(), 0.01);
        assertEquals(2908.29e6, st.icr(), 0.01e6);
    }

    @Test
    void compressionLayerBelowTheNeutralAxisCountsWithN() {
        // T-beam bf = 1800, hf = 120, bw = 300, h = 600; 2 No. 16 (398 mm²) at d = 540 and 2 No. 19 (568 mm²)
        // at d' = 60. The wide flange puts the neutral axis above the top bars, so they are cracked concrete's
        // bars in tension and count with n (not n − 1):
        //   1800 kd² / 2 = n [398 (540 − kd) + 568 (60 − kd)]  ->  kd = 43.05 mm (< hf and < d')
        // Icr = 1800 kd³ / 3 + n [398 (540 − kd)² + 568 (kd − 60)²] = 47.87e6 + 790.43e6 + 1.31e6 = 839.61e6 mm⁴
        SectionShape tee = new SectionShape(300, 600, new Flange(1800, 120, false));
        BeamSection s = Sections.section(
                tee,
                M,
                DET,
                CodeEquations.SI,
                Sections.bottomAtDepth(Sections.si("16"), 2, 600, 540),
                Sections.topAt(Sections.si("19"), 2, 60));
        Deflection.Stiffness st = SpanChecks.stiffnessOf(s, Bending.SAGGING);
        assertEquals(43.05, st.kd(), 0.01);
        assertEquals(839.61e6, st.icr(), 0.01e6);
    }

    /**
     * Lumping each face's layers at its centroid never overstates Icr. Icr is the minimum over the axis
     * depth x of F(x) = I(concrete above x) + Σ ci As,i (di − x)², ci = n below x and n − 1 above (F' is
     * twice the first moment, which grows with x, so F is convex with its minimum at kd). For each face, at
     * every x, Σ ci As,i (di − x)² ≥ c As (d − x)² with d the face's centroid and c its coefficient: for
     * c = n − 1 by Jensen's inequality; for c = n (centroid below x) by Cauchy–Schwarz over the layers below
     * x, whose first moment about x is at least As (d − x). So F ≥ F,lumped everywhere and their minima
     * keep that order (hand proof, transformed section, common practice).
     */
    @Test
    void perLayerIcrIsNeverBelowTheLumpedOne() {
        Random r = new Random(20240611);
        for (int k = 0; k < 2000; k++) {
            double h = 350 + 50 * r.nextInt(14);
            double b = 200 + 50 * r.nextInt(8);
            Flange f = r.nextInt(3) == 0
                    ? new Flange(b + 100 * (1 + r.nextInt(20)), 80 + 10 * r.nextInt(10), false)
                    : null;
            SectionShape shape = new SectionShape(b, h, f);
            List<BarLayer> layers = new ArrayList<>();
            int nb = 1 + r.nextInt(4);
            for (int i = 0; i < nb; i++) {
                layers.add(
                        new BarLayer(Face.BOTTOM, Sections.si(pick(r)), 2 + r.nextInt(5), 60 + 55 * i + r.nextInt(10)));
            }
            int nt = r.nextInt(4);
            for (int i = 0; i < nt; i++) {
                layers.add(new BarLayer(Face.TOP, Sections.si(pick(r)), 2 + r.nextInt(4), 60 + 55 * i + r.nextInt(10)));
            }
            BeamSection s = new BeamSection(
                    shape, Sections.materials(20 + 5 * r.nextInt(8), 420), DET, layers, null, null, CodeEquations.SI);
            for (Bending bending : Bending.values()) {
                double icr = SpanChecks.stiffnessOf(s, bending).icr();
                double lumped = lumped(s, bending).icr();
                assertTrue(icr >= lumped * (1 - 1e-9), "per layer " + icr + " < lumped " + lumped + " for " + s);
            }
        }
    }

    private static String pick(Random r) {
        String[] sizes = {"16", "19", "25", "29"};
        return sizes[r.nextInt(sizes.length)];
    }

    /** Each face's layers as one at their centroid (what the cracked section used to take). */
    private static Deflection.Stiffness lumped(BeamSection s, Bending bending) {
        List<Double> depth = new ArrayList<>();
        List<Double> area = new ArrayList<>();
        for (Face face : Face.values()) {
            double a = 0;
            double m = 0;
            for (BarLayer l : s.layersOn(face)) {
                a += l.area();
                m += l.area() * s.depthFromCompression(l, bending);
            }
            if (a > 0) {
                depth.add(m / a);
                area.add(a);
            }
        }
        return Deflection.stiffness(
                s.shape(),
                bending,
                s.materials(),
                s.code(),
                depth.stream().mapToDouble(Double::doubleValue).toArray(),
                area.stream().mapToDouble(Double::doubleValue).toArray());
    }
}
