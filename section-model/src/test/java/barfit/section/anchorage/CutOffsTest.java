package barfit.section.anchorage;

import static barfit.section.anchorage.Bars.si;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.analysis.Line;
import barfit.analysis.LineAnalysis;
import barfit.analysis.LineResult;
import barfit.analysis.Load;
import barfit.analysis.Support;
import barfit.analysis.SupportKind;
import barfit.section.anchorage.CutOffs.Interpolation;
import barfit.section.trail.Trail;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.api.Test;

/**
 * Cut-off points of 9.7.3 against closed forms: where a parabolic moment falls to the continuing bars'
 * strength (statics of a uniformly loaded span, solved by hand), on envelopes sampled here and on envelopes
 * from the line analysis.
 */
class CutOffsTest {
    private static final double L = 6000;
    private static final double W = 30; // N/mm

    /** A simple span's moment under uniform load w: w x (L − x) / 2 (statics). */
    private static double simple(double w, double x) {
        return w * x * (L - x) / 2;
    }

    private static Envelope sample(DoubleUnaryOperator m, double from, double to, double step) {
        int n = (int) Math.round((to - from) / step) + 1;
        double[] x = new double[n];
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = from + i * step;
            v[i] = m.applyAsDouble(x[i]);
        }
        return new Envelope(x, v);
    }

    private static Support knife() {
        return new Support(0, SupportKind.KNIFE_EDGE, null, null);
    }

    @Test
    void simpleSpanCutOffInClosedForm() {
        // w x (L − x) / 2 = Mc -> x = L/2 ∓ √(L²/4 − 2 Mc / w); w = 30 N/mm, L = 6 m, Mc = wL²/16 = 67.5 kN·m:
        // x = 3000 ∓ √(9e6 − 4.5e6) = 3000 ∓ 2121.32 -> 878.68 and 5121.32 mm
        double mc = W * L * L / 16;
        double x1 = L / 2 - Math.sqrt(L * L / 4 - 2 * mc / W);
        assertEquals(878.680, x1, 0.001);
        // straight lines between stations 25 mm apart: within 0.1 mm (the chord's sag w h²/8 over the slope)
        var fine = CutOffs.needed(sample(x -> simple(W, x), 0, L, 25), mc, Interpolation.LINEAR)
                .orElseThrow();
        assertEquals(x1, fine.from(), 0.1);
        assertEquals(L - x1, fine.to(), 0.1);
        assertFalse(fine.fromEnd() || fine.toEnd());
        // the parabola through three stations is exact for this moment, even 300 mm apart
        var coarse = CutOffs.needed(sample(x -> simple(W, x), 0, L, 300), mc, Interpolation.QUADRATIC)
                .orElseThrow();
        assertEquals(x1, coarse.from(), 1e-6);
        assertEquals(L - x1, coarse.to(), 1e-6);
        // and the straight lines at 300 mm are not (a sag of 30 × 300² / 8 = 0.34 kN·m, about 5 mm here)
        var rough = CutOffs.needed(sample(x -> simple(W, x), 0, L, 300), mc, Interpolation.LINEAR)
                .orElseThrow();
        assertTrue(rough.from() - x1 > 1, "straight lines cross inside the parabola");
    }

    @Test
    void simpleSpanFromTheLineAnalysis() {
        // a single knife-edge span, dead load 20 N/mm: 1.4 D governs, wu = 28 N/mm (5.3.1); bars continuing
        // with half the largest moment: x = L/2 − √(L²/4 − 2 (wu L²/16) / wu) = 3000 − 2121.32 = 878.68 mm
        Line line = new Line(
                "S",
                List.of(L),
                0,
                0,
                List.of(knife(), knife()),
                List.of(Load.uniform(1, 0, L, 20, 0)),
                1e14,
                25000,
                500,
                null);
        LineResult r = LineAnalysis.analyse(line);
        double wu = 1.4 * 20;
        double mc = wu * L * L / 16;
        var n = CutOffs.needed(Envelope.sagging(r, 1), mc, Interpolation.QUADRATIC)
                .orElseThrow();
        assertEquals(878.680, n.from(), 0.1);
        assertEquals(L - 878.680, n.to(), 0.1);
        // the largest moment at mid-span (statics), found by the parabola's vertex
        assertEquals(L / 2, CutOffs.peak(Envelope.sagging(r, 1), Interpolation.QUADRATIC), 1e-6);
    }

    @Test
    void continuousSpanNegativeEnvelopeInClosedForm() {
        // two equal knife-edge spans, dead load only (1.4 D governs): span 1 carries M(x) = wu (3 L x / 8 − x²/2)
        // (handbook two-span coefficients, support moment −wL²/8, as LineAnalysisTest checks). The top bars over
        // the middle support are needed where wu (x²/2 − 3 L x / 8) > Mc: x > 3L/8 + √(9 L²/64 + 2 Mc / wu).
        // Mc = a third of the support moment: wu L² / 24.
        double w = 20;
        double wu = 1.4 * w;
        Line line = new Line(
                "T",
                List.of(L, L),
                0,
                0,
                List.of(knife(), knife(), knife()),
                List.of(Load.uniform(1, 0, L, w, 0), Load.uniform(2, 0, L, w, 0)),
                1e14,
                25000,
                500,
                null);
        double mc = wu * L * L / 24;
        double x = 3 * L / 8 + Math.sqrt(9 * L * L / 64 + 2 * mc / wu);
        // by hand: 2250 + √(5 062 500 + 3 000 000) = 2250 + 2839.45 = 5089.45 mm
        assertEquals(5089.454, x, 0.001);
        var quad = CutOffs.needed(Envelope.hogging(LineAnalysis.analyse(line), 1), mc, Interpolation.QUADRATIC)
                .orElseThrow();
        assertEquals(x, quad.from(), 0.1);
        assertEquals(L, quad.to(), 1e-9);
        assertTrue(quad.toEnd(), "the bars run over the support");
        var lin = CutOffs.needed(Envelope.hogging(LineAnalysis.analyse(line, 600), 1), mc, Interpolation.LINEAR)
                .orElseThrow();
        assertEquals(x, lin.from(), 0.1);
        // the point of inflection, 3L/4 (statics), where the whole top steel is no longer needed. The envelope
        // changes arrangement there (1.2 D above zero, 1.4 D below), between two stations 120 mm apart: each
        // side's own parabola finds it exactly, where a straight line across the gap misses by 5.4 mm
        LineResult r = LineAnalysis.analyse(line);
        var all = CutOffs.needed(Envelope.hogging(r, 1), 0, Interpolation.QUADRATIC)
                .orElseThrow();
        assertEquals(0.75 * L, all.from(), 1e-6);
        var straight =
                CutOffs.needed(Envelope.hogging(r, 1), 0, Interpolation.LINEAR).orElseThrow();
        assertTrue(Math.abs(straight.from() - 0.75 * L) > 1);
    }

    @Test
    void kinkedNegativeEnvelopeTakesTheFartherArrangement() {
        // hogging over the left support of an 8 m span from two arrangements (statics of a span with end moment
        // M0 and uniform load w, the other end's moment the same): h(x) = M0 − w x (L − x)/2.
        // A: w = 30 N/mm, M0 = 160 kN·m; B: w = 12 N/mm, M0 = 110 kN·m. The envelope max(hA, hB) changes
        // arrangement at x(L − x) = 50e6 / 9 (x = 768 mm). With Mc = 40 kN·m:
        // A: 4000 − √(16e6 − 2 × 120e6/30) = 1171.57 mm; B: 4000 − √(16e6 − 2 × 70e6/12) = 1918.33 mm -> B's
        double span = 8000;
        DoubleUnaryOperator a = x -> 160e6 - 30 * x * (span - x) / 2;
        DoubleUnaryOperator b = x -> 110e6 - 12 * x * (span - x) / 2;
        DoubleUnaryOperator env = x -> Math.max(0, Math.max(a.applyAsDouble(x), b.applyAsDouble(x)));
        double xb = span / 2 - Math.sqrt(span * span / 4 - 2 * (110e6 - 40e6) / 12);
        assertEquals(1918.334, xb, 0.001);
        Envelope e = sample(env, 0, span, 10).between(0, span / 2);
        var lin = CutOffs.needed(e, 40e6, Interpolation.LINEAR).orElseThrow();
        assertEquals(0, lin.from(), 1e-12);
        assertTrue(lin.fromEnd());
        assertEquals(xb, lin.to(), 0.1);
        var quad = CutOffs.needed(sample(env, 0, span / 2, 200), 40e6, Interpolation.QUADRATIC)
                .orElseThrow();
        assertEquals(xb, quad.to(), 1e-6);
    }

    @Test
    void nothingNeededAboveThePeak() {
        Envelope e = sample(x -> simple(W, x), 0, L, 100);
        assertTrue(CutOffs.needed(e, W * L * L / 8 + 1, Interpolation.LINEAR).isEmpty());
    }

    @Test
    void peakFoundByTheParabolaOnUnevenStations() {
        // the vertex of w x (L − x)/2 is at L/2 (statics), whatever stations sample it
        double[] x = {0, 700, 2300, 2900, 3600, 5100, 6000};
        double[] m = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            m[i] = simple(W, x[i]);
        }
        assertEquals(3000, CutOffs.peak(new Envelope(x, m), Interpolation.QUADRATIC), 1e-9);
        assertEquals(2900, CutOffs.peak(new Envelope(x, m), Interpolation.LINEAR), 1e-12);
    }

    @Test
    void extensionPastTheTheoreticalPoint() {
        // 9.7.3.3: max(d, 12 db): d = 500 mm, No. 25 -> max(500, 304.8) = 500; d = 250 mm -> 304.8
        assertEquals(500, CutOffs.extension(500, si("25")), 1e-12);
        assertEquals(304.8, CutOffs.extension(250, si("25")), 1e-9);
        // the simple span's stretch 878.68 to 5121.32 mm: cut at 378.68 and 5621.32 mm
        Trail t = Trail.recording();
        var cut = CutOffs.cutPoints(new CutOffs.Needed(878.68, 5121.32, false, false), 500, si("25"), t);
        assertEquals(378.68, cut.left(), 1e-9);
        assertEquals(5621.32, cut.right(), 1e-9);
        Bars.assertWhole(t);
        // bars needed up to the envelope's end run to it (9.7.3.3's exception at supports; 9.7.3.8 then rules)
        var toEnd = CutOffs.cutPoints(new CutOffs.Needed(5089.45, 6000, false, true), 500, si("25"), Trail.off());
        assertEquals(4589.45, toEnd.left(), 1e-9);
        assertEquals(6000, toEnd.right(), 1e-12);
    }

    @Test
    void continuingBarsReachLdPastTheCutBars() {
        // 9.7.3.4: ld = 600 mm past 878.68 and 5121.32 -> 278.68 and 5721.32 mm
        Trail t = Trail.recording();
        var reach = CutOffs.continuingReach(new CutOffs.Needed(878.68, 5121.32, false, false), 600, t);
        assertEquals(278.68, reach.left(), 1e-9);
        assertEquals(5721.32, reach.right(), 1e-9);
        Bars.assertWhole(t);
        // bars over the whole span pass; bars from 400 mm miss by 600 − (878.68 − 400) = 121.32 mm
        assertTrue(CutOffs.checkContinuing(reach, 0, 6000).pass());
        var shortBars = CutOffs.checkContinuing(reach, 400, 6000);
        assertFalse(shortBars.pass());
        assertEquals(121.32, shortBars.left().shortfall(), 1e-9);
        assertEquals(0, shortBars.right().shortfall(), 1e-12);
        assertEquals("9.7.3.4", shortBars.left().check().clause());
        // a stretch that runs to the end asks nothing on that side
        var open = CutOffs.continuingReach(new CutOffs.Needed(5089.45, 6000, false, true), 600, Trail.off());
        assertFalse(open.rightApplies());
        assertTrue(CutOffs.checkContinuing(open, 4489.45, 6000).pass());
    }

    @Test
    void developedOnEachSideOfTheCriticalSection() {
        // 9.7.3.2: a bar from 1000 to 5000 mm, peak stress at 3000: 2000 mm each side against ld 1500 -> met;
        // against 2500 on the left -> short by 500 mm
        Trail t = Trail.recording();
        assertTrue(CutOffs.developedEachSide(3000, 1000, 5000, 1500, 1500, t).pass());
        Bars.assertWhole(t);
        var s = CutOffs.developedEachSide(3000, 1000, 5000, 2500, 1500, Trail.off());
        assertFalse(s.pass());
        assertEquals(500, s.left().shortfall(), 1e-12);
        assertEquals("9.7.3.2", s.left().check().clause());
    }

    @Test
    void envelopeGuardsItsInput() {
        assertThrows(IllegalArgumentException.class, () -> new Envelope(new double[] {0}, new double[] {1}));
        assertThrows(IllegalArgumentException.class, () -> new Envelope(new double[] {0, 1}, new double[] {1}));
        assertThrows(IllegalArgumentException.class, () -> new Envelope(new double[] {1, 0}, new double[] {1, 1}));
        assertThrows(
                IllegalArgumentException.class, () -> new Envelope(new double[] {0, 1}, new double[] {1, Double.NaN}));
    }
}
