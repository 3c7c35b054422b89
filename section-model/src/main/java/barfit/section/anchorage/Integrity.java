package barfit.section.anchorage;

import barfit.catalogs.BarSize;
import barfit.section.CodeEquations;
import barfit.section.Face;
import barfit.section.trail.Q;
import barfit.section.trail.Trail;

/**
 * Structural integrity reinforcement of beams, 9.7.7 (read from memory of ACI 318-19). Perimeter beams
 * (9.7.7.1): at least a quarter of the largest positive moment steel, and two bars at least, continuous at
 * the bottom; at least a sixth of the negative moment steel at the supports, and two bars at least,
 * continuous at the top; both enclosed by closed stirrups or hoops along the clear span. Other beams
 * (9.7.7.2): the bottom quarter, two bars at least, continuous; no enclosure asked (ACI 318-14 accepted
 * closed stirrups instead of these bars). The bars pass inside the column bars (9.7.7.3), develop fy at
 * the face of a noncontinuous support (9.7.7.4), and where spliced, the bottom bars are spliced at or near
 * the supports and the top bars near mid-span, by a class B tension lap or a mechanical or welded splice
 * (9.7.7.5).
 */
public final class Integrity {
    /**
     * What a beam needs: {@code bottomArea} and at least {@code bottomBarsMin} bars continuous at the bottom;
     * for a perimeter beam {@code topArea} and at least {@code topBarsMin} at the top (0 otherwise);
     * {@code enclosed}: closed stirrups or hoops along the clear span.
     */
    public record Need(
            boolean perimeter, double bottomArea, int bottomBarsMin, double topArea, int topBarsMin, boolean enclosed) {

        /** Bottom bars of {@code bar} that satisfy the need. */
        public int bottomBars(BarSize bar) {
            return Math.max(bottomBarsMin, (int) Math.ceil(bottomArea / bar.area() - 1e-9));
        }

        /** Top bars of {@code bar} that satisfy the need (0 for a beam that is not on the perimeter). */
        public int topBars(BarSize bar) {
            return perimeter ? Math.max(topBarsMin, (int) Math.ceil(topArea / bar.area() - 1e-9)) : 0;
        }
    }

    /** Where 9.7.7.5 lets integrity bars be spliced. */
    public enum SpliceZone {
        /** bottom bars: at or near the supports */
        AT_OR_NEAR_SUPPORTS,
        /** top bars: near mid-span */
        NEAR_MID_SPAN
    }

    /** How an integrity bar is anchored at a noncontinuous support (9.7.7.4). */
    public enum Anchor {
        STRAIGHT,
        HOOK,
        /** neither fits: {@code shortfall} says by how much the hook misses */
        NONE
    }

    /** The anchorage chosen, the length it needs and what the support offers, mm. */
    public record EndAnchorage(Anchor by, double available, double required, double shortfall) {}

    private Integrity() {}

    /**
     * 9.7.7.1 (perimeter beams) or 9.7.7.2 (others).
     *
     * @param asPositiveMax the largest positive moment steel of the span, mm²
     * @param asNegative    the negative moment steel at the supports, the larger of the two ends, mm²
     */
    public static Need of(boolean perimeter, double asPositiveMax, double asNegative, Trail t) {
        double bottom = asPositiveMax / 4;
        double top = perimeter ? asNegative / 6 : 0;
        String clause = perimeter ? "9.7.7.1" : "9.7.7.2";
        if (t.isOn()) {
            t.heading("Structural integrity reinforcement" + (perimeter ? " of a perimeter beam" : ""), clause);
            t.step("As,bottom", "As,max+ / 4, two bars at least", "{} / 4", Q.area(bottom), Q.area(asPositiveMax));
            if (perimeter) {
                t.step("As,top", "As− / 6, two bars at least", "{} / 6", Q.area(top), Q.area(asNegative));
                t.note("Enclosed by closed stirrups or hoops along the clear span (9.7.7.1(c)).");
            }
            t.note("Continuous, or spliced: bottom bars at or near the supports, top bars near mid-span;"
                    + " class B tension laps or mechanical splices (9.7.7.5).");
        }
        return new Need(perimeter, bottom, 2, top, perimeter ? 2 : 0, perimeter);
    }

    /** 9.7.7.5: bottom bars are spliced at or near the supports, top bars near mid-span. */
    public static SpliceZone spliceZone(Face face) {
        return face == Face.BOTTOM ? SpliceZone.AT_OR_NEAR_SUPPORTS : SpliceZone.NEAR_MID_SPAN;
    }

    /**
     * Whether a lap centred at {@code x} lies in 9.7.7.5's zone for bars of {@code face} in the span from
     * {@code start} to {@code end}. The code does not say how near "near" is: {@code near} is that distance,
     * from a support for bottom bars and from mid-span for top bars, the caller's (an office's) choice.
     */
    public static boolean inSpliceZone(Face face, double x, double start, double end, double near) {
        if (spliceZone(face) == SpliceZone.AT_OR_NEAR_SUPPORTS) {
            return Math.min(Math.abs(x - start), Math.abs(x - end)) <= near;
        }
        return Math.abs(x - (start + end) / 2) <= near;
    }

    /** 9.7.7.5: a class B tension lap, or a mechanical splice for bars larger than No. 36 (#11). */
    public static LapSplices.Lap splice(BarSize bar, double ld, CodeEquations code, Trail t) {
        return LapSplices.classB(bar, ld, code, t);
    }

    /**
     * 9.7.7.4: an integrity bar develops fy at the face of a noncontinuous support: straight where ld fits in
     * {@code available} (the support width past the face less the far cover), else by a standard hook whose
     * ldh fits, else neither.
     */
    public static EndAnchorage atNoncontinuousSupport(double available, double ld, double ldh, Trail t) {
        EndAnchorage a;
        if (ld <= available * (1 + 1e-12)) {
            a = new EndAnchorage(Anchor.STRAIGHT, available, ld, 0);
        } else if (ldh <= available * (1 + 1e-12)) {
            a = new EndAnchorage(Anchor.HOOK, available, ldh, 0);
        } else {
            a = new EndAnchorage(Anchor.NONE, available, ldh, ldh - available);
        }
        if (t.isOn()) {
            t.heading("Integrity bars anchored at the noncontinuous support", "9.7.7.4");
            t.value("available", Q.length(available), "past the support face");
            t.value("ld", Q.length(ld), a.by() == Anchor.STRAIGHT ? "straight bars fit" : "straight bars do not fit");
            if (a.by() != Anchor.STRAIGHT) {
                t.value("ldh", Q.length(ldh), a.by() == Anchor.HOOK ? "a standard hook fits" : "no hook fits either");
            }
        }
        return a;
    }
}
