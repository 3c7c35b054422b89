package barfit.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.catalogs.BarSize;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The closed-form neutral axis against an independent fibre integration, on thousands of random
 * rectangular and flanged sections bent both ways, with every bar in the analysis.
 */
class FibreCrossCheckTest {
    private static final BarSize[] BARS = {
        Sections.si("10"),
        Sections.si("16"),
        Sections.si("19"),
        Sections.si("25"),
        Sections.si("29"),
        Sections.bar("No. 36", 35.8, 1006)
    };

    record Case(BeamSection section, Bending bending) {}

    static Case random(Random rnd) {
        double b = 200 + 50 * rnd.nextInt(9);
        double h = 300 + 25 * rnd.nextInt(33);
        Flange flange = null;
        if (rnd.nextBoolean()) {
            double hf = 90 + 10 * rnd.nextInt(12);
            if (hf < h - 150) {
                flange = new Flange(b + 100 * (1 + rnd.nextInt(20)), hf, rnd.nextInt(4) == 0);
            }
        }
        double fc = 20 + rnd.nextDouble() * 60;
        double fy = 280 + rnd.nextDouble() * 270;
        Materials m = new Materials(fc, fy, fy, 20, 1.0);
        Detailing det = new Detailing(40, Sections.si("10"), 25, Exposure.INTERIOR);
        List<BarLayer> layers = new ArrayList<>();
        for (Face face : Face.values()) {
            int n = face == Face.BOTTOM ? 1 + rnd.nextInt(3) : rnd.nextInt(3);
            List<BeamSection.BarGroup> groups = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                BarSize bar = BARS[rnd.nextInt(BARS.length)];
                int maxCount = Math.max(1, BarSpacing.maxBars(b, det, bar, m, CodeEquations.SI));
                groups.add(new BeamSection.BarGroup(bar, 1 + rnd.nextInt(maxCount)));
            }
            layers.addAll(BeamSection.stack(face, groups, det));
        }
        // keep the two faces apart
        double bottomInner = 0;
        double topInner = 0;
        for (BarLayer l : layers) {
            if (l.face() == Face.BOTTOM) {
                bottomInner = Math.max(bottomInner, l.fromFace() + l.bar().diameter());
            } else {
                topInner = Math.max(topInner, l.fromFace() + l.bar().diameter());
            }
        }
        if (bottomInner + topInner >= h) {
            h = bottomInner + topInner + 100;
        }
        SectionShape shape = new SectionShape(b, h, flange);
        Bending bending = rnd.nextBoolean() ? Bending.SAGGING : Bending.HOGGING;
        return new Case(new BeamSection(shape, m, det, layers, null, null, CodeEquations.SI), bending);
    }

    static FibreSection fibre(BeamSection s, Bending bending) {
        SectionShape sh = s.shape();
        double[][] profile;
        Flange f = sh.flange();
        if (f == null) {
            profile = new double[][] {{0, sh.width()}, {sh.height(), 0}};
        } else if (bending == Bending.SAGGING) {
            profile = new double[][] {{0, f.width()}, {f.thickness(), sh.width()}, {sh.height(), 0}};
        } else {
            profile = new double[][] {{0, sh.width()}, {sh.height() - f.thickness(), f.width()}, {sh.height(), 0}};
        }
        int n = s.layers().size();
        double[] d = new double[n];
        double[] as = new double[n];
        double[] db = new double[n];
        for (int i = 0; i < n; i++) {
            BarLayer l = s.layers().get(i);
            d[i] = s.depthFromCompression(l, bending);
            as[i] = l.area();
            db[i] = l.bar().diameter();
        }
        Materials m = s.materials();
        return new FibreSection(
                        profile, d, as, db, m.fc(), m.fy(), s.code().es(), CodeTables.beta1(m.fc(), s.code()), 3000)
                .solve();
    }

    @Test
    void closedFormMatchesFibreIntegrationWithinOneThousandth() {
        Random rnd = new Random(20261201L);
        int cases = 3000;
        double worst = 0;
        for (int i = 0; i < cases; i++) {
            Case k = random(rnd);
            FlexureResult r = Flexure.analyse(k.section(), k.bending());
            FibreSection fib = fibre(k.section(), k.bending());
            double phiFib = CodeTables.phiFlexure(
                    fib.epsT, k.section().materials().fy() / k.section().code().es());
            double phiMnFib = phiFib * fib.mn;
            double rel = Math.abs(r.phiMn() - phiMnFib) / Math.abs(phiMnFib);
            worst = Math.max(worst, rel);
            assertTrue(
                    rel < 1e-3,
                    "case " + i + ": closed form " + r.phiMn() + " vs fibre " + phiMnFib + " (" + k.section() + ", "
                            + k.bending() + ")");
            assertEquals(fib.c, r.c(), 2e-3 * fib.c + 0.05, "neutral axis, case " + i);
        }
        assertTrue(worst < 1e-3);
    }

    @Test
    void everySolutionIsInEquilibrium() {
        Random rnd = new Random(7L);
        for (int i = 0; i < 3000; i++) {
            Case k = random(rnd);
            FlexureResult r = Flexure.analyse(k.section(), k.bending());
            double scale = Math.abs(r.concreteForce());
            for (LayerResult l : r.layers()) {
                scale += Math.abs(l.force());
            }
            double sum = r.concreteForce();
            for (LayerResult l : r.layers()) {
                sum -= l.force();
            }
            assertEquals(0, sum, 1e-9 * scale, "sum of forces, case " + i);
            assertEquals(0, r.residual(), 1e-9 * scale, "solver residual, case " + i);
            // the moment of the couple equals Mn
            double m = 0;
            for (LayerResult l : r.layers()) {
                m += l.force() * (l.d() - r.concreteCentroid());
            }
            assertEquals(r.mn(), m, 1e-7 * Math.abs(r.mn()) + 1, "moment of the couple, case " + i);
        }
    }
}
