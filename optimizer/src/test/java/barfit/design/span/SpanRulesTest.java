package barfit.design.span;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.catalogs.BarSize;
import barfit.design.SolverOptions;
import barfit.design.section.RandomProblems;
import barfit.section.BeamSection;
import barfit.section.Bending;
import barfit.section.CodeEquations;
import barfit.section.Detailing;
import barfit.section.EndCondition;
import barfit.section.Exposure;
import barfit.section.Flexure;
import barfit.section.FlexureResult;
import barfit.section.Materials;
import barfit.section.Shear;
import barfit.section.SpanChecks;
import barfit.section.Stirrups;
import barfit.section.trail.Trail;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Whole spans re-verified against rules written here from the clauses and from statics, not taken from
 * the verifier's own bookkeeping: the shear line through the given shears at d from the faces, legs held
 * by bars (25.7.1.2, 25.7.1.3), ties round compression steel that is relied on (9.7.6.4, 25.7.2.3) and
 * extra top bars developed past the face (25.4.2.4). Flexural and shear strengths come from the section
 * model (checked against textbook examples and a fibre integration elsewhere).
 */
class SpanRulesTest {
    private static final Materials M = new Materials(28, 420, 420, 20, 1.0);
    private static final Detailing DET = new Detailing(40, RandomProblems.bar("10"), 25, Exposure.INTERIOR);

    private static SpanProblem span(
            double l, EndCondition ends, Double vl, Double vr, SpanChecks.ServiceLoads service) {
        var space = new barfit.design.SearchSpace(
                List.of(300.0),
                List.of(500.0),
                List.of(RandomProblems.bar("25")),
                List.of(RandomProblems.bar("25")),
                1,
                List.of(RandomProblems.bar("10")),
                List.of(2),
                List.of(100.0, 200.0));
        Double ml = ends == EndCondition.CANTILEVER || ends == EndCondition.BOTH_ENDS_CONTINUOUS ? -100e6 : null;
        Double mr = ends == EndCondition.BOTH_ENDS_CONTINUOUS ? -100e6 : null;
        Double mm = ends == EndCondition.CANTILEVER ? null : 80e6;
        return new SpanProblem(
                "Z",
                M,
                DET,
                CodeEquations.SI,
                space,
                l,
                ends,
                ml,
                mm,
                mr,
                vl,
                vr,
                service,
                SpanChecks.Limits.DEFAULT,
                null,
                null,
                null,
                false,
                2,
                0);
    }

    @Test
    void middleZoneTakesTheLineThroughTheShearsAtD() {
        // Statics of a uniformly loaded span: with Vu = 300 kN at d = 500 mm from each face of a 6 m clear span,
        // w = (300 + 300) / (6000 - 2 x 500) = 0.12 kN/mm; the middle zone starts where the old straight line
        // (as if the shears were at the faces) halves, x = 6000 x 300 / 1200 = 1500 mm, and there
        // V = 300 - 0.12 x (1500 - 500) = 180 kN, not the 150 kN the face-to-face line gives.
        SpanProblem p = span(6000, EndCondition.BOTH_ENDS_CONTINUOUS, 300e3, 300e3, null);
        SpanProblem.Zone mid = p.zones().get(1);
        assertEquals("middle", mid.name());
        assertEquals(1500, mid.from(), 1e-9);
        assertEquals(180e3, mid.vu(500), 1);
        // unequal ends: Vl = 300, Vr = 200 kN, d = 450: w = 500 / 5100; the zone runs 1800 to 4800 mm;
        // V(1800) = 300 - 500 (1350) / 5100 = 167.6 kN; V(4800) = |300 - 500 (4350) / 5100| = 126.5 kN
        SpanProblem q = span(6000, EndCondition.BOTH_ENDS_CONTINUOUS, 300e3, 200e3, null);
        assertEquals(1800, q.zones().get(1).from(), 1e-9);
        assertEquals(167.647e3, q.zones().get(1).vu(450), 1);
    }

    @Test
    void middleZoneCarriesLiveLoadOnHalfTheSpan() {
        // Common practice, no clause: live load on half the span gives 1.6 wL ln / 8 at mid-span, which a
        // full-span line misses. wL = 20 kN/m, ln = 6 m: 1.6 x 20 x 6 / 8 = 24 kN. With Vu = 30 kN at d = 500
        // from each face the line gives only 30 - 60 x 1000 / 5000 = 18 kN at the zone's ends.
        SpanProblem p =
                span(6000, EndCondition.BOTH_ENDS_CONTINUOUS, 30e3, 30e3, new SpanChecks.ServiceLoads(15, 20, 0));
        assertEquals(24e3, p.zones().get(1).vu(500), 1e-6);
    }

    @Test
    void cantileverOuterZoneFromTheLine() {
        // Statics: a uniformly loaded cantilever of 2 m with Vu = 100 kN at d = 400 mm from the face carries
        // V(x) = 100 (2000 - x) / (2000 - 400); at the outer zone's start, x = 1000: 62.5 kN (not 50 kN).
        SpanProblem p = span(2000, EndCondition.CANTILEVER, 100e3, null, null);
        assertEquals(62.5e3, p.zones().get(1).vu(400), 1e-6);
    }

    @Test
    void extraTopBarsAreNeverCutShortOfLd() {
        // A short span with a narrow web: 25.4.2.4 for No. 29 top bars, f'c = 28, fy = 420, psi_t = 1.3,
        // psi_s = psi_e = psi_g = 1, Ktr = 0, cb = cover to centre = 40 + 9.5 + 14.35 = 63.85 mm when the bars
        // are at least 2 cb apart: ld = 420 / (1.1 x 1 x 5.2915) x 1.3 / (63.85 / 28.7) x 28.7 = 1207 mm (or
        // more, at closer spacing). On a 2 m span continuous at both ends, half the span (1000 mm) is less:
        // the bars must run ld past the face all the same.
        SpanProblem p = span(2000, EndCondition.BOTH_ENDS_CONTINUOUS, 100e3, 100e3, null);
        Extension e = Extension.of(p, 250, 500, DET, RandomProblems.bar("29"));
        assertTrue(e.length() >= 1207 - 1, "extension " + e.length());
        assertTrue(e.length() >= e.ld());
        assertTrue(e.length() > 1000, "not cut at mid-span");
    }

    @Test
    void randomSpansPassTheRulesWrittenFromTheClauses() {
        SpanDesigner designer = new SpanDesigner(SpanOracleTest.COST, new SolverOptions(30, 1, 1));
        Random r = new Random(Long.getLong("spanrules.seed", 1010L));
        int designed = 0;
        int tiesSeen = 0;
        for (int i = 0; i < Integer.getInteger("spanrules.instances", 60); i++) {
            SpanProblem p = RandomSpans.small(r);
            var o = designer.design(p, 0);
            if (!o.feasible()) {
                continue;
            }
            designed++;
            tiesSeen += checkSpan(p, o.best().layout(), "instance " + i + ": " + p);
        }
        assertTrue(designed > 25, "designed " + designed);
        assertTrue(tiesSeen > 0, "no designed zone relied on its compression bars: the ties went untested");
    }

    /** Asserts the rules on one designed span; returns how many zones needed ties. */
    static int checkSpan(SpanProblem p, SpanLayout l, String what) {
        int ties = 0;
        List<SpanProblem.Zone> zones = p.zones();
        double span = p.span();
        for (int i = 0; i < zones.size(); i++) {
            SpanProblem.Zone z = zones.get(i);
            Stirrups st = l.zoneStirrups().get(i);
            Bending bending = SpanLayout.bending(p, z.section());
            BeamSection s = l.section(p, z.section(), st);
            FlexureResult fr = Flexure.analyse(s, bending);
            double d = fr.tensionSteelArea() > 0 ? fr.d() : fr.dt();
            // demand: the given end shear for a support zone, the line's largest value over the zone otherwise
            Double demand;
            if (z.vu() != null) {
                demand = z.vu();
            } else if (p.vLeft() == null && p.vRight() == null) {
                demand = null;
            } else if (p.cantilever()) {
                double x = Math.max(z.from(), d);
                demand = p.vLeft() * (span - x) / (span - d);
            } else {
                double vl = p.vLeft() == null ? 0 : p.vLeft();
                double vr = p.vRight() == null ? 0 : p.vRight();
                double w = (vl + vr) / (span - 2 * d);
                double a = Math.abs(vl - w * (Math.min(Math.max(z.from(), d), span - d) - d));
                double b = Math.abs(vl - w * (Math.min(Math.max(z.to(), d), span - d) - d));
                double floor = p.service() == null ? 0 : 1.6 * p.service().live() * span / 8;
                demand = Math.max(Math.max(a, b), floor);
            }
            if (demand != null) {
                double phiVn = Shear.analyse(s, demand, d, fr.tensionSteelArea(), Trail.off())
                        .phiVn();
                assertTrue(
                        phiVn >= demand * (1 - 1e-9),
                        what + " zone " + z.name() + ": phi Vn " + phiVn + " < " + demand);
            }
            // every leg's bend holds a bar of the outer layer of each face (every bar present, counted or not)
            int top = l.topAt(p, z.section()).get(0);
            int bottom = l.bottomCounts().get(0);
            assertTrue(
                    st.legs() <= Math.min(top, bottom),
                    what + " zone " + z.name() + ": " + st.legs() + " legs over " + top + " top and " + bottom
                            + " bottom bars");
            // ties where the compression bars are relied on
            List<barfit.section.BarLayer> tension = s.layers().stream()
                    .filter(x -> x.face() == bending.tensionFace())
                    .toList();
            List<barfit.section.BarLayer> comp = s.layers().stream()
                    .filter(x -> x.face() == bending.compressionFace())
                    .toList();
            if (comp.isEmpty()) {
                continue;
            }
            FlexureResult without = Flexure.analyse(s.withLayers(tension), bending);
            Double mu = SpanLayout.momentAt(p, z.section());
            // compression steel: some of those bars above the neutral axis, and the section failing without them
            boolean compressed =
                    fr.layers().stream().anyMatch(x -> x.layer().face() == bending.compressionFace() && x.strain() < 0);
            boolean relied = compressed
                    && (without.epsT() < 0.004 * (1 - 1e-9)
                            || mu != null && Math.abs(mu) > without.phiMn() * (1 + 1e-9));
            if (relied) {
                ties++;
                BarSize cb = comp.get(0).bar();
                int n = comp.get(0).count();
                double sMax = Math.min(
                        16 * cb.diameter(), Math.min(48 * st.bar().diameter(), Math.min(l.width(), l.height())));
                assertTrue(
                        st.spacing() <= sMax + 1e-9,
                        what + " zone " + z.name() + ": ties @ " + st.spacing() + " > " + sMax);
                double inner = l.width() - 2 * (p.detailing().cover() + st.bar().diameter());
                double clear = (inner - n * cb.diameter()) / (n - 1);
                int heldNeeded = clear > 150 ? n : n / 2 + 1;
                assertTrue(
                        Math.min(st.legs(), n) >= Math.min(heldNeeded, n) && st.legs() >= heldNeeded,
                        what + " zone " + z.name() + ": " + st.legs() + " legs hold " + n + " compression bars");
            }
        }
        // extra top bars run at least ld of 25.4.2.4 past the face, ld for the bars as placed
        if (!p.cantilever()) {
            if (p.leftSupport() && SpanLayout.sum(l.topLeft()) > l.topContinuous()) {
                double ld = handLd(p, l, l.topLeft().get(0));
                assertTrue(l.extLeft() >= ld - 1e-6, what + ": left extras " + l.extLeft() + " < ld " + ld);
            }
            if (p.rightSupport() && SpanLayout.sum(l.topRight()) > l.topContinuous()) {
                double ld = handLd(p, l, l.topRight().get(0));
                assertTrue(l.extRight() >= ld - 1e-6, what + ": right extras " + l.extRight() + " < ld " + ld);
            }
        }
        return ties;
    }

    /**
     * ld of ACI 318-19 25.4.2.4 for the top bars of a support's first layer of n bars, written out here:
     * fy / (1.1 lambda sqrt(f'c)) x psi_t psi_e psi_s psi_g / ((cb + Ktr) / db) x db, Ktr = 0, (cb + Ktr)/db
     * at most 2.5, psi_t = 1.3 with more than 300 mm of concrete below, psi_s = 0.8 for No. 19 and smaller,
     * psi_g = 1 for Grade 420, and at least 300 mm (25.4.2.1).
     */
    static double handLd(SpanProblem p, SpanLayout l, int n) {
        double db = l.top().diameter();
        double ds = l.stirrupBar().diameter();
        double toCentre = p.detailing().cover() + ds + db / 2;
        double inner = l.width() - 2 * (p.detailing().cover() + ds);
        double halfSpacing = n > 1 ? (inner - db) / (n - 1) / 2 : toCentre;
        double cb = Math.min(toCentre, halfSpacing);
        double conf = Math.min(cb / db, 2.5);
        double psiT = l.height() - toCentre - db / 2 > 300 ? 1.3 : 1.0;
        double psiS = db < 20 ? 0.8 : 1.0;
        double fc = Math.min(Math.sqrt(p.materials().fc()), 8.3);
        double ld = p.materials().fy() / (1.1 * p.materials().lambda() * fc) * psiT * psiS / conf * db;
        return Math.max(ld, 300);
    }
}
