package barfit.design.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.analysis.Line;
import barfit.analysis.LineAnalysis;
import barfit.analysis.LineResult;
import barfit.analysis.Load;
import barfit.analysis.Support;
import barfit.analysis.SupportKind;
import barfit.design.span.ShearDiagram;
import barfit.design.span.SpanProblem;
import barfit.section.SpanChecks;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The shear diagram a line hands to design, and the service moments it hands to deflection, against hand
 * calculations from statics written here, not from the analysis code.
 */
class LineShearTest {
    private static final double L = 8000; // mm
    private static final double WD = 20; // N/mm, dead
    private static final double WL = 12; // N/mm, live

    private static Support knife() {
        return new Support(0, SupportKind.KNIFE_EDGE, null, null);
    }

    private static LineResult simpleSpan() {
        Line line = new Line(
                "S",
                List.of(L),
                0,
                0,
                List.of(knife(), knife()),
                List.of(Load.uniform(1, 0, L, WD, WL)),
                1e14,
                25000,
                500,
                null);
        return LineAnalysis.analyse(line, 50);
    }

    /**
     * A simple span under uniform dead load and live load on the whole span or either half (the
     * arrangements the analysis takes): by statics, for x up to mid-span,
     * Vu(x) = 1.2 wD (l/2 − x) + 1.6 wL max(l/2 − x, l/8) — the second term is the left reaction of live
     * load on the far half, wL (l/2)(l/4) / l, with no load between the support and x.
     */
    private static double hand(double x) {
        return 1.2 * WD * (L / 2 - x) + 1.6 * WL * Math.max(L / 2 - x, L / 8);
    }

    /**
     * Between stations the diagram is the straight line between them: exact where the envelope is straight,
     * above it across the kink at l/2 − l/8 (never below), by less than the live load's share of one step.
     */
    private static void within(double hand, double got, String what) {
        assertTrue(got >= hand - 1e-6 * hand(0), what + ": " + got + " below the hand value " + hand);
        assertTrue(got <= hand + 1.6 * WL * L / 50, what + ": " + got + " far above the hand value " + hand);
    }

    @Test
    void simpleSpanDiagramFollowsStatics() {
        LineResult r = simpleSpan();
        Line line = r.line();
        ShearDiagram v = LineSpans.spanShear(line, r, r.spans().get(0));
        assertEquals(L, v.clear(), 1e-9, "knife edges of no width: the clear span is the span");
        for (double x : new double[] {0, 400, 1000, 2000, 2600, 3000, 3999}) {
            double d = 10; // sections nearer the face than d take the shear at d; d small here
            within(hand(Math.max(x, d)), v.at(x, d), "Vu at " + x + " mm");
        }
        // exact at the stations (every l/50 = 160 mm), and exact between them where nothing kinks
        assertEquals(hand(2880), v.at(2880, 10), 1e-6 * hand(0));
        assertEquals(hand(1000), v.at(1000, 10), 1e-6 * hand(0));
        // sections within d of the face take the shear at d (9.4.3.2: support in compression, load on top)
        assertEquals(hand(500), v.at(0, 500), 1e-6 * hand(0));
        assertEquals(hand(500), v.at(L, 500), 1e-6 * hand(0), "symmetric");
    }

    @Test
    void zonesTakeTheEnvelopeAndTheBoundNeverExceedsIt() {
        LineResult r = simpleSpan();
        ShearDiagram v = LineSpans.spanShear(r.line(), r, r.spans().get(0));
        SpanProblem p = new SpanProblem(
                        "S",
                        null,
                        null,
                        null,
                        null,
                        L,
                        barfit.section.EndCondition.SIMPLE,
                        null,
                        1e8,
                        null,
                        v.at(0, 500),
                        v.at(L, 500),
                        null,
                        null,
                        null,
                        null,
                        null,
                        false,
                        2,
                        0)
                .withAnalysis(null, v);
        List<SpanProblem.Zone> zones = p.zones();
        assertEquals(3, zones.size());
        Random rnd = new Random(7);
        for (SpanProblem.Zone z : zones) {
            for (int k = 0; k < 200; k++) {
                double d = 100 + 900 * rnd.nextDouble();
                double at = z.vu(d);
                // the zone's design shear is the hand value at its worst point: at d from the face or at its
                // end nearer the support
                double near = Math.min(z.from(), L - z.to());
                double want = hand(Math.max(near, d));
                within(want, at, z.name() + " at d = " + d);
                assertTrue(z.vuLeast() <= at + 1e-9, "the bound stays below the design shear");
            }
        }
    }

    @Test
    void serviceMomentsForDeflectionAreOneArrangements() {
        // two equal knife-edge spans, uniform D + L: the largest sagging moment in span 1 comes with live
        // load on span 1 only; then the interior support moment is −(wD + wL/2) l² / 16... by the
        // three-moment equation with w1 = wD + wL, w2 = wD: M = −(w1 + w2) l² / 16.
        Line line = new Line(
                "T",
                List.of(L, L),
                0,
                0,
                List.of(knife(), knife(), knife()),
                List.of(Load.uniform(1, 0, L, WD, WL), Load.uniform(2, 0, L, WD, WL)),
                1e14,
                25000,
                500,
                null);
        LineResult r = LineAnalysis.analyse(line, 50);
        LineResult.SpanValues s = r.spans().get(0);
        double m = -((WD + WL) + WD) * L * L / 16;
        assertEquals(m, s.deflectionRight(), 1e-6 * Math.abs(m), "three-moment equation");
        assertEquals(-2 * WD * L * L / 16, s.deadRight(), 1e-6 * Math.abs(m), "dead: −wD l² / 8");
        // the sustained level: D + s (D+L − D) at the support, s = 0.25
        SpanChecks.ServiceMoments sm = SpanChecks.ServiceMoments.analysed(
                null, s.deadMid(), s.deadRight(), null, s.deflectionMid(), s.deflectionRight(), 0.25);
        assertEquals(-s.deadRight() + 0.25 * (s.deadRight() - s.deflectionRight()), sm.right()[1], 1e-6);
        assertEquals(-s.deflectionRight(), sm.right()[2], 1e-6, "magnitudes, hogging at the support");
        // the envelope's support moment (both spans loaded) is larger than the arrangement's
        assertTrue(s.totalRight() < s.deflectionRight());
    }
}
