package barfit.section.anchorage;

import static barfit.section.anchorage.Bars.SI;
import static barfit.section.anchorage.Bars.si;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.section.Face;
import barfit.section.anchorage.Integrity.Anchor;
import barfit.section.anchorage.LapSplices.Kind;
import barfit.section.trail.Trail;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Structural integrity reinforcement (9.7.7, from memory of ACI 318-19) and the bars' force build-up. */
class IntegrityAndForceTest {
    @Test
    void perimeterBeamNeedsBothFacesEnclosed() {
        // 9.7.7.1: bottom As+ / 4 = 2040 / 4 = 510 mm², two bars at least; top As− / 6 = 3000 / 6 = 500 mm², two
        // bars at least; closed stirrups along the clear span
        Trail t = Trail.recording();
        var need = Integrity.of(true, 2040, 3000, t);
        assertEquals(510, need.bottomArea(), 1e-9);
        assertEquals(500, need.topArea(), 1e-9);
        assertEquals(2, need.bottomBars(si("25"))); // 510 / 510 = 1 bar, two at least
        assertEquals(3, need.topBars(si("16"))); // ceil(500 / 199) = 3
        assertTrue(need.enclosed());
        Bars.assertWhole(t);
    }

    @Test
    void otherBeamsNeedTheBottomQuarter() {
        // 9.7.7.2: As+ / 4 = 4080 / 4 = 1020 mm², two bars at least; no top bars, no enclosure
        var need = Integrity.of(false, 4080, 3000, Trail.off());
        assertEquals(1020, need.bottomArea(), 1e-9);
        assertEquals(2, need.bottomBars(si("25")));
        assertEquals(6, need.bottomBars(si("16"))); // ceil(1020 / 199) = 6
        assertEquals(0, need.topBars(si("16")));
        assertFalse(need.enclosed());
    }

    @Test
    void integritySplicesAndAnchorage() {
        // 9.7.7.5: bottom bars spliced at or near the supports, top bars near mid-span; class B or mechanical
        assertEquals(Integrity.SpliceZone.AT_OR_NEAR_SUPPORTS, Integrity.spliceZone(Face.BOTTOM));
        assertEquals(Integrity.SpliceZone.NEAR_MID_SPAN, Integrity.spliceZone(Face.TOP));
        assertTrue(Integrity.inSpliceZone(Face.BOTTOM, 500, 0, 8000, 1000));
        assertFalse(Integrity.inSpliceZone(Face.BOTTOM, 4000, 0, 8000, 1000));
        assertTrue(Integrity.inSpliceZone(Face.TOP, 4500, 0, 8000, 1000));
        assertFalse(Integrity.inSpliceZone(Face.TOP, 500, 0, 8000, 1000));
        var lap = Integrity.splice(si("25"), 1000, SI, Trail.off());
        assertEquals(Kind.CLASS_B, lap.kind());
        assertEquals(1300, lap.length(), 1e-9); // 1.3 ld, Table 25.5.2.1
        assertEquals(
                Kind.MECHANICAL,
                Integrity.splice(si("43"), 1500, SI, Trail.off()).kind());
        // 9.7.7.4: fy developed at the face of a noncontinuous support with 360 mm available
        Trail t = Trail.recording();
        assertEquals(
                Anchor.HOOK, Integrity.atNoncontinuousSupport(360, 700, 300, t).by());
        Bars.assertWhole(t);
        assertEquals(
                Anchor.STRAIGHT,
                Integrity.atNoncontinuousSupport(360, 300, 200, Trail.off()).by());
        var none = Integrity.atNoncontinuousSupport(360, 700, 400, Trail.off());
        assertEquals(Anchor.NONE, none.by());
        assertEquals(40, none.shortfall(), 1e-12);
    }

    @Test
    void forceBuildsUpOverLd() {
        // straight-line build-up (common practice, no source): No. 25 (510 mm²) at fy = 420 MPa: As fy = 214.2 kN;
        // from 0 to 5000 mm, ld = 1000 mm at both ends: at 250 mm a quarter, 53.55 kN; full from 1000 to 4000
        var bar = new BarForce.Bar(0, 5000, 510, 420, 1000, 1000);
        assertEquals(53_550, BarForce.force(bar, 250), 1e-6);
        assertEquals(214_200, BarForce.force(bar, 2500), 1e-6);
        assertEquals(21_420, BarForce.force(bar, 4900), 1e-6);
        assertEquals(0, BarForce.force(bar, -1), 1e-12);
        assertEquals(0, BarForce.force(bar, 5001), 1e-12);
        // a hooked end with ldh = 400 mm, measured from the outside of the hook at x = 0: half at 200 mm
        var hooked = new BarForce.Bar(0, 5000, 510, 420, 400, 1000);
        assertEquals(107_100, BarForce.force(hooked, 200), 1e-6);
        // an end anchored beyond what is looked at (build-up 0) delivers As fy right at it
        assertEquals(214_200, BarForce.force(new BarForce.Bar(0, 5000, 510, 420, 0, 1000), 0), 1e-6);
        // two bars together at 250 mm: 250/1000 and 250/400 of 214.2 kN = 53.55 + 133.875 kN
        assertEquals(53_550 + 133_875, BarForce.total(List.of(bar, hooked), 250), 1e-6);
        // a bar shorter than two ld never reaches fy: 1200 mm with ld 1000 peaks at 0.6 As fy mid-length
        assertEquals(0.6 * 214_200, BarForce.force(new BarForce.Bar(0, 1200, 510, 420, 1000, 1000), 600), 1e-6);
        assertThrows(IllegalArgumentException.class, () -> new BarForce.Bar(10, 0, 510, 420, 1000, 1000));
    }
}
