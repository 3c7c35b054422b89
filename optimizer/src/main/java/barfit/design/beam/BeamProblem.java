package barfit.design.beam;

import barfit.design.SearchSpace;
import barfit.section.CodeEquations;
import barfit.section.Detailing;
import barfit.section.EndCondition;
import barfit.section.Flange;
import barfit.section.Materials;
import barfit.section.SpanChecks;
import java.util.ArrayList;
import java.util.List;

/**
 * A whole span to design: its clear span (mm) and end conditions, factored moments at the left support,
 * mid-span and right support (N·mm; supports hogging, mid-span sagging; null where the span has no such
 * section), factored shears at d from each support face (N, or null), service loads for deflection, and
 * the limits of the beam (headroom cap, fixed width, flange, anchorage of the bottom bars).
 */
public record BeamProblem(
        String id,
        Materials materials,
        Detailing detailing,
        CodeEquations code,
        SearchSpace space,
        double span,
        EndCondition ends,
        Double mLeft,
        Double mMid,
        Double mRight,
        Double vLeft,
        Double vRight,
        SpanChecks.ServiceLoads service,
        SpanChecks.Limits limits,
        Double maxDepth,
        Double fixedWidth,
        Flange flange,
        boolean bottomAnchored,
        int maxBarSizes,
        int barsPerTwoLegs) {

    /** Where a section or zone is. */
    public enum Place { LEFT, MID, RIGHT }

    /** A stirrup zone: its place in the span (mm from the left face), design shear and the section it uses. */
    public record Zone(String name, double from, double to, Double vu, Place section) {
        public double length() {
            return to - from;
        }
    }

    public boolean cantilever() {
        return ends == EndCondition.CANTILEVER;
    }

    /** A continuous (hogging) support at the left end. */
    public boolean leftSupport() {
        return mLeft != null;
    }

    public boolean rightSupport() {
        return mRight != null;
    }

    public boolean midSection() {
        return !cantilever();
    }

    /**
     * Stirrup zones from the shear envelope of a uniformly loaded span between the two end shears: each
     * support zone runs from the face to where the envelope has fallen to half that end's shear; the
     * middle zone is designed for the larger shear at those points. A cantilever (fixed at the left)
     * has a support zone to mid-length and an outer zone designed for half the support shear. Without
     * shears, minimum stirrups: one zone over a simple span, zones at the quarter points otherwise. The
     * stirrup legs of a zone hold the bars of the section it is designed with.
     */
    public List<Zone> zones() {
        List<Zone> out = new ArrayList<>();
        double l = span;
        if (cantilever()) {
            Double v = vLeft;
            out.add(new Zone("support", 0, l / 2, v, Place.LEFT));
            out.add(new Zone("outer", l / 2, l, v == null ? null : v / 2, Place.LEFT));
            return out;
        }
        if (vLeft == null && vRight == null) {
            if (!leftSupport() && !rightSupport()) {
                out.add(new Zone("whole", 0, l, null, Place.MID));
                return out;
            }
            // minimum stirrups, zoned at the quarter points so each zone's legs suit its own section
            out.add(new Zone("left", 0, l / 4, null, leftSupport() ? Place.LEFT : Place.MID));
            out.add(new Zone("middle", l / 4, 3 * l / 4, null, Place.MID));
            out.add(new Zone("right", 3 * l / 4, l, null, rightSupport() ? Place.RIGHT : Place.MID));
            return out;
        }
        double vl = vLeft == null ? 0 : vLeft;
        double vr = vRight == null ? 0 : vRight;
        double total = vl + vr;
        double xl = total > 0 ? l * vl / (2 * total) : l / 4;
        double xr = total > 0 ? l * vr / (2 * total) : l / 4;
        out.add(new Zone("left", 0, xl, vl, leftSupport() ? Place.LEFT : Place.MID));
        out.add(new Zone("middle", xl, l - xr, Math.max(vl, vr) / 2, Place.MID));
        out.add(new Zone("right", l - xr, l, vr, rightSupport() ? Place.RIGHT : Place.MID));
        return out;
    }

    /** Widths the search may use. */
    public List<Double> widths() {
        return fixedWidth != null ? List.of(fixedWidth) : space.widths();
    }

    /** Depths the search may use (the headroom cap applied). */
    public List<Double> depths() {
        if (maxDepth == null) {
            return space.depths();
        }
        return space.depths().stream().filter(h -> h <= maxDepth + 1e-9).toList();
    }

    public BeamProblem withMaxDepth(Double cap) {
        return new BeamProblem(id, materials, detailing, code, space, span, ends, mLeft, mMid, mRight, vLeft, vRight,
                service, limits, cap, fixedWidth, flange, bottomAnchored, maxBarSizes, barsPerTwoLegs);
    }

    public BeamProblem withSpace(SearchSpace s) {
        return new BeamProblem(id, materials, detailing, code, s, span, ends, mLeft, mMid, mRight, vLeft, vRight,
                service, limits, maxDepth, fixedWidth, flange, bottomAnchored, maxBarSizes, barsPerTwoLegs);
    }

    public BeamProblem withFixedWidth(Double w) {
        return new BeamProblem(id, materials, detailing, code, space, span, ends, mLeft, mMid, mRight, vLeft, vRight,
                service, limits, maxDepth, w, flange, bottomAnchored, maxBarSizes, barsPerTwoLegs);
    }

    public BeamProblem withLimits(SpanChecks.Limits l) {
        return new BeamProblem(id, materials, detailing, code, space, span, ends, mLeft, mMid, mRight, vLeft, vRight,
                service, l, maxDepth, fixedWidth, flange, bottomAnchored, maxBarSizes, barsPerTwoLegs);
    }

    public BeamProblem scaled(double moments, double shears) {
        return new BeamProblem(id, materials, detailing, code, space, span, ends, mul(mLeft, moments), mul(mMid, moments),
                mul(mRight, moments), mul(vLeft, shears), mul(vRight, shears), service, limits, maxDepth, fixedWidth,
                flange, bottomAnchored, maxBarSizes, barsPerTwoLegs);
    }

    private static Double mul(Double v, double k) {
        return v == null ? null : v * k;
    }

    /** Stirrup legs needed to hold the bars of a layer at stirrup corners and legs (common practice). */
    public int legsFor(int barsInLayer) {
        return 2 * Math.max(1, (int) Math.ceil(barsInLayer / (double) barsPerTwoLegs));
    }
}
