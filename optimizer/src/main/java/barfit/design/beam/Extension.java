package barfit.design.beam;

import barfit.catalogs.BarSize;
import barfit.section.BarSpacing;
import barfit.section.Detailing;
import barfit.section.Development;
import barfit.section.Materials;
import barfit.section.CodeEquations;
import barfit.section.trail.Trail;

/**
 * How far the extra top bars at a continuous support run into the span past the face: the larger of
 * 0.3 x span and the development length of 25.4.2.4 (top bars, Ktr taken as 0, cb from the cover and
 * the spacing of a full first layer, which is conservative), never more than the span, nor more than
 * half of it when both ends are continuous. A cantilever's top bars run its full length and, to be
 * anchored, the same development length past the support face into the back span (its own bars are
 * not checked further).
 */
public record Extension(double length, String rule) {

    public static Extension of(BeamProblem p, double b, double h, Detailing det, BarSize top) {
        double ld = developmentLength(p, b, h, det, top);
        if (p.cantilever()) {
            return new Extension(p.span() + ld, "full length of the cantilever and ld of 25.4.2.4 past the support face");
        }
        double rule03 = 0.3 * p.span();
        double cap = p.leftSupport() && p.rightSupport() ? p.span() / 2 : p.span();
        if (ld > rule03) {
            return ld > cap ? new Extension(cap, "ld of 25.4.2.4 exceeds the room: the extra bars run to "
                    + (cap < p.span() ? "mid-span" : "the far end") + " and are not fully developed there; run them"
                    + " through or hook them (not checked)")
                    : new Extension(ld, "ld of 25.4.2.4 governs over 0.3 × span");
        }
        return new Extension(rule03, "0.3 × span governs over ld of 25.4.2.4");
    }

    /** ld of 25.4.2.4 for the top bars (Ktr taken as 0; cb from the cover and a full first layer's spacing). */
    private static double developmentLength(BeamProblem p, double b, double h, Detailing det, BarSize top) {
        int firstLayer = Math.max(2, BarSpacing.maxBars(b, det, top, p.materials(), p.code()));
        Materials m = p.materials();
        CodeEquations code = p.code();
        double db = top.diameter();
        double coverToCentre = det.cover() + det.stirrupBar().diameter() + db / 2;
        double halfSpacing = firstLayer > 1 ? BarSpacing.centreSpacing(b, det, db, firstLayer) / 2 : coverToCentre;
        double cb = Math.min(coverToCentre, halfSpacing);
        boolean topBar = h - coverToCentre - db / 2 > code.topBarConcreteBelow();
        return Development.general(top, m, code, topBar, cb, 0, 0, 0, Trail.off()).ld();
    }
}
