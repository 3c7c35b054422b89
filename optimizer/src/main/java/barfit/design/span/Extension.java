package barfit.design.span;

import barfit.catalogs.BarSize;
import barfit.section.BarSpacing;
import barfit.section.CodeEquations;
import barfit.section.Detailing;
import barfit.section.Development;
import barfit.section.Materials;
import barfit.section.trail.Trail;

/**
 * How far the extra top bars at a continuous support run into the span past the face: the larger of
 * 0.3 x span and the development length of 25.4.2.4 (top bars, Ktr taken as 0, cb from the cover and
 * the spacing of a full first layer, which is conservative). A bar is never cut short of ld: where ld
 * passes mid-span of a span continuous at both ends the extras of the two supports overlap over the
 * middle, and where it passes the far face the extras run through the span and on past that face
 * (into the next span or support) until they are developed. A cantilever's top bars run its full
 * length and, to be anchored, the same development length past the support face into the back span
 * (its own bars are not checked further).
 */
public record Extension(double length, double ld, Governs governs) {
    /** What sets the run (the reports word it). */
    public enum Governs {
        /** A cantilever: its full length and ld past the support face. */
        CANTILEVER,
        /** 0.3 x span, over ld. */
        THREE_TENTHS_OF_SPAN,
        /** ld, over 0.3 x span. */
        LD,
        /** ld, past mid-span of a span continuous at both ends: the two supports' extras overlap. */
        LD_PAST_MID_SPAN,
        /** ld, longer than the span: the extras run through it and past the far face. */
        LD_BEYOND_SPAN,
        /**
         * Under torsion, to the far end of the support's stirrup zones, so that the longitudinal steel those
         * zones count at the support is there over their length.
         */
        TORSION_ZONES
    }

    public static Extension of(SpanProblem p, double b, double h, Detailing det, BarSize top) {
        Extension plain = plain(p, b, h, det, top);
        double reach = p.cantilever() || !p.hasTorsion() ? 0 : torsionReach(p);
        return reach > plain.length() ? new Extension(reach, plain.ld(), Governs.TORSION_ZONES) : plain;
    }

    /**
     * How far the stirrup zones designed with a support section reach from its face (the farther side); 0
     * without torsion or on a cantilever.
     */
    public static double torsionReach(SpanProblem p) {
        if (p.cantilever() || !p.hasTorsion()) {
            return 0;
        }
        double reach = 0;
        for (SpanProblem.Zone z : p.zones()) {
            if (z.section() == SpanProblem.Place.LEFT && p.leftSupport()) {
                reach = Math.max(reach, z.to());
            } else if (z.section() == SpanProblem.Place.RIGHT && p.rightSupport()) {
                reach = Math.max(reach, p.span() - z.from());
            }
        }
        return reach;
    }

    private static Extension plain(SpanProblem p, double b, double h, Detailing det, BarSize top) {
        double ld = developmentLength(p, b, h, det, top);
        if (p.cantilever()) {
            return new Extension(p.span() + ld, ld, Governs.CANTILEVER);
        }
        double rule03 = 0.3 * p.span();
        if (ld <= rule03) {
            return new Extension(rule03, ld, Governs.THREE_TENTHS_OF_SPAN);
        }
        if (ld > p.span()) {
            return new Extension(ld, ld, Governs.LD_BEYOND_SPAN);
        }
        if (p.leftSupport() && p.rightSupport() && ld > p.span() / 2) {
            return new Extension(ld, ld, Governs.LD_PAST_MID_SPAN);
        }
        return new Extension(ld, ld, Governs.LD);
    }

    /** ld of 25.4.2.4 for the top bars (Ktr taken as 0; cb from the cover and a full first layer's spacing). */
    static double developmentLength(SpanProblem p, double b, double h, Detailing det, BarSize top) {
        int firstLayer = Math.max(2, BarSpacing.maxBars(b, det, top, p.materials(), p.code()));
        Materials m = p.materials();
        CodeEquations code = p.code();
        double db = top.diameter();
        double coverToCentre = det.cover() + det.stirrupBar().diameter() + db / 2;
        double halfSpacing = firstLayer > 1 ? BarSpacing.centreSpacing(b, det, db, firstLayer) / 2 : coverToCentre;
        double cb = Math.min(coverToCentre, halfSpacing);
        boolean topBar = h - coverToCentre - db / 2 > code.topBarConcreteBelow();
        return Development.general(top, m, code, topBar, cb, 0, 0, 0, Trail.off())
                .ld();
    }
}
