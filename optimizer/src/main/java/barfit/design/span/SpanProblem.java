package barfit.design.span;

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
public record SpanProblem(
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
        int barsPerTwoLegs,
        SpanChecks.ServiceMoments analysedService,
        ShearDiagram shearDiagram,
        SpanTorsion torsion) {

    /** A span of a line, without torsion. */
    public SpanProblem(
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
            int barsPerTwoLegs,
            SpanChecks.ServiceMoments analysedService,
            ShearDiagram shearDiagram) {
        this(
                id,
                materials,
                detailing,
                code,
                space,
                span,
                ends,
                mLeft,
                mMid,
                mRight,
                vLeft,
                vRight,
                service,
                limits,
                maxDepth,
                fixedWidth,
                flange,
                bottomAnchored,
                maxBarSizes,
                barsPerTwoLegs,
                analysedService,
                shearDiagram,
                null);
    }

    /** A span whose demand is given as moments and shears at its critical sections (no analysis of its own). */
    public SpanProblem(
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
        this(
                id,
                materials,
                detailing,
                code,
                space,
                span,
                ends,
                mLeft,
                mMid,
                mRight,
                vLeft,
                vRight,
                service,
                limits,
                maxDepth,
                fixedWidth,
                flange,
                bottomAnchored,
                maxBarSizes,
                barsPerTwoLegs,
                null,
                null,
                null);
    }

    /** The same span with the service moments and the shear diagram of an analysis of its line. */
    public SpanProblem withAnalysis(SpanChecks.ServiceMoments analysed, ShearDiagram diagram) {
        return new SpanProblem(
                id,
                materials,
                detailing,
                code,
                space,
                span,
                ends,
                mLeft,
                mMid,
                mRight,
                vLeft,
                vRight,
                service,
                limits,
                maxDepth,
                fixedWidth,
                flange,
                bottomAnchored,
                maxBarSizes,
                barsPerTwoLegs,
                analysed,
                diagram,
                torsion);
    }

    /**
     * Ma at the critical sections for deflection: the analysis' where the span comes from a line, else the
     * factored moments scaled by the service load ratio; null without service loads.
     */
    public SpanChecks.ServiceMoments serviceMoments() {
        if (service == null) {
            return null;
        }
        return analysedService != null
                ? analysedService
                : SpanChecks.ServiceMoments.scaled(mLeft, mMid, mRight, service);
    }

    /** Where a section or zone is. */
    public enum Place {
        LEFT,
        MID,
        RIGHT
    }

    /**
     * A stirrup zone: its place in the span (mm from the left face), the section it uses and its design
     * shear. A support zone is designed for the given shear at d from its face ({@code vu}); a zone away
     * from the supports ({@code line} set) for the largest shear of the span's shear line over its length,
     * which depends on the d of the section the zone is designed with, and for at least {@code floor}.
     */
    public record Zone(
            String name,
            double from,
            double to,
            Double vu,
            Place section,
            ShearAlong line,
            double floor,
            SpanTorsion torsion,
            double span) {
        public Zone(String name, double from, double to, Double vu, Place section) {
            this(name, from, to, vu, section, null, 0);
        }

        public Zone(String name, double from, double to, Double vu, Place section, ShearAlong line, double floor) {
            this(name, from, to, vu, section, line, floor, null, 0);
        }

        /** The same zone under the torsion of a span {@code span} long. */
        Zone withTorsion(SpanTorsion t, double spanLength) {
            return new Zone(name, from, to, vu, section, line, floor, t, spanLength);
        }

        /**
         * The design torsion of the zone (N·mm) in a web {@code bt} wide at effective depth d: the largest
         * within bt + d of it ({@link SpanTorsion#overZone}); 0 without torsion.
         */
        public double tu(double bt, double d) {
            return torsion == null ? 0 : torsion.overZone(span, from, to, bt, d);
        }

        /** Whether the span gives this zone any torsion to check. */
        public boolean torsionGiven() {
            return torsion != null && torsion.any();
        }

        public double length() {
            return to - from;
        }

        /** The design shear of the zone for a section of effective depth d (N), or null for minimum stirrups. */
        public Double vu(double d) {
            if (line == null) {
                return vu;
            }
            return Math.max(floor, Math.max(line.at(from, d), line.at(to, d)));
        }

        /**
         * No more than the design shear for any d: the shear line only rises at the zone's ends as d grows
         * (the given shears sit at d from the faces), so its value at d = 0 bounds it from below.
         */
        public Double vuLeast() {
            if (line == null) {
                return vu;
            }
            return Math.max(floor, line.least(from, to));
        }
    }

    /**
     * The shear along a uniformly loaded span (the README's assumption) through the given shears at d from
     * the faces: (d, vLeft) and (l - d, -vRight); a cantilever fixed at the left falls from vLeft at d to
     * nothing at the tip. Sections nearer a face than d take the shear at d (9.4.3.2). Magnitudes, N.
     */
    public record ShearLine(double span, double vLeft, double vRight, boolean cantilever) implements ShearAlong {
        @Override
        public double least(double from, double to) {
            return Math.max(at(from, 0), at(to, 0));
        }

        @Override
        public ShearLine times(double k) {
            return new ShearLine(span, vLeft * Math.abs(k), vRight * Math.abs(k), cantilever);
        }

        @Override
        public double at(double x, double d) {
            double l = span;
            double dd = Math.min(d, 0.5 * l - 1e-6);
            if (cantilever) {
                double xx = Math.max(x, dd);
                return vLeft * Math.max(0, l - xx) / (l - dd);
            }
            double xx = Math.min(Math.max(x, dd), l - dd);
            double v = vLeft - (vLeft + vRight) * (xx - dd) / (l - 2 * dd);
            return Math.abs(v);
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
     * Stirrup zones from the shear line of a uniformly loaded span through the two end shears at d from
     * the faces ({@link ShearLine}): each support zone runs from the face to about where the line has
     * fallen to half that end's shear and is designed for that end's shear; the middle zone for the
     * largest shear of the line over its length (at the d of the section it uses) and at least the shear
     * of live load on half the span where service loads are given. A cantilever (fixed at the left)
     * has a support zone to mid-length and an outer zone designed for the line's shear at mid-length. Without
     * shears, minimum stirrups: one zone over a simple span, zones at the quarter points otherwise. The
     * stirrup legs of a zone hold the bars of the section it is designed with.
     */
    public List<Zone> zones() {
        List<Zone> plain = plainZones();
        if (!hasTorsion()) {
            return plain;
        }
        List<Zone> out = new ArrayList<>();
        for (Zone z : plain) {
            out.add(z.withTorsion(torsion, span));
        }
        return out;
    }

    /**
     * Whether a support option is designed for given bottom bars: where they are anchored (compression
     * steel there) or under torsion (longitudinal steel round the hoop there, anchored or not).
     */
    public boolean bottomCoupled() {
        return bottomAnchored || hasTorsion();
    }

    /** Whether the span carries torsion to design for. */
    public boolean hasTorsion() {
        return torsion != null && torsion.any();
    }

    /** The same span under the given torsion (null: none). */
    public SpanProblem withTorsion(SpanTorsion t) {
        return new SpanProblem(
                id,
                materials,
                detailing,
                code,
                space,
                span,
                ends,
                mLeft,
                mMid,
                mRight,
                vLeft,
                vRight,
                service,
                limits,
                maxDepth,
                fixedWidth,
                flange,
                bottomAnchored,
                maxBarSizes,
                barsPerTwoLegs,
                analysedService,
                shearDiagram,
                t);
    }

    private List<Zone> plainZones() {
        if (shearDiagram != null) {
            return zonesFrom(shearDiagram);
        }
        List<Zone> out = new ArrayList<>();
        double l = span;
        if (cantilever()) {
            Double v = vLeft;
            out.add(new Zone("support", 0, l / 2, v, Place.LEFT));
            out.add(
                    v == null
                            ? new Zone("outer", l / 2, l, null, Place.LEFT)
                            : new Zone("outer", l / 2, l, null, Place.LEFT, new ShearLine(l, v, 0, true), 0));
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
        out.add(new Zone("middle", xl, l - xr, null, Place.MID, new ShearLine(l, vl, vr, false), midSpanLiveShear()));
        out.add(new Zone("right", l - xr, l, vr, rightSupport() ? Place.RIGHT : Place.MID));
        return out;
    }

    /**
     * Stirrup zones from the shear diagram of the line's analysis: each support zone runs from the face
     * to half way to where the shear is least and is designed for the largest shear over it (at d from the
     * face where 9.4.3.2 allows), the middle zone likewise; the live-load arrangements on half spans are
     * in the analysis, so no other floor is needed. A cantilever: a support zone to mid-length and an
     * outer zone.
     */
    private List<Zone> zonesFrom(ShearDiagram diagram) {
        List<Zone> out = new ArrayList<>();
        double l = span;
        if (cantilever()) {
            out.add(new Zone("support", 0, l / 2, null, Place.LEFT, diagram, 0));
            out.add(new Zone("outer", l / 2, l, null, Place.LEFT, diagram, 0));
            return out;
        }
        // kept off the ends so that no zone is too short to hold a stirrup or two
        double zero = Math.min(Math.max(diagram.whereLeast(), 0.2 * l), 0.8 * l);
        double xl = zero / 2;
        double xr = (l - zero) / 2;
        out.add(new Zone("left", 0, xl, null, leftSupport() ? Place.LEFT : Place.MID, diagram, 0));
        out.add(new Zone("middle", xl, l - xr, null, Place.MID, diagram, 0));
        out.add(new Zone("right", l - xr, l, null, rightSupport() ? Place.RIGHT : Place.MID, diagram, 0));
        return out;
    }

    /**
     * The factored shear of live load on half the span, 1.6 wL ln / 8, which a full-span shear line misses
     * near mid-span (common practice); 0 without service loads.
     */
    public double midSpanLiveShear() {
        return service == null ? 0 : barfit.section.LoadCombinations.halfSpanLiveShear(service.live(), span);
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

    public SpanProblem withMaxDepth(Double cap) {
        return new SpanProblem(
                id,
                materials,
                detailing,
                code,
                space,
                span,
                ends,
                mLeft,
                mMid,
                mRight,
                vLeft,
                vRight,
                service,
                limits,
                cap,
                fixedWidth,
                flange,
                bottomAnchored,
                maxBarSizes,
                barsPerTwoLegs,
                analysedService,
                shearDiagram,
                torsion);
    }

    public SpanProblem withSpace(SearchSpace s) {
        return new SpanProblem(
                id,
                materials,
                detailing,
                code,
                s,
                span,
                ends,
                mLeft,
                mMid,
                mRight,
                vLeft,
                vRight,
                service,
                limits,
                maxDepth,
                fixedWidth,
                flange,
                bottomAnchored,
                maxBarSizes,
                barsPerTwoLegs,
                analysedService,
                shearDiagram,
                torsion);
    }

    /**
     * The span with other moments at its support faces (a bound over several analyses, say): each null
     * where the span has no support section there.
     */
    public SpanProblem withSupportMoments(Double left, Double right) {
        return new SpanProblem(
                id,
                materials,
                detailing,
                code,
                space,
                span,
                ends,
                mLeft == null ? null : left,
                mMid,
                mRight == null ? null : right,
                vLeft,
                vRight,
                service,
                limits,
                maxDepth,
                fixedWidth,
                flange,
                bottomAnchored,
                maxBarSizes,
                barsPerTwoLegs,
                analysedService,
                shearDiagram,
                torsion);
    }

    /** The same span under another mark. */
    public SpanProblem withId(String mark) {
        return new SpanProblem(
                mark,
                materials,
                detailing,
                code,
                space,
                span,
                ends,
                mLeft,
                mMid,
                mRight,
                vLeft,
                vRight,
                service,
                limits,
                maxDepth,
                fixedWidth,
                flange,
                bottomAnchored,
                maxBarSizes,
                barsPerTwoLegs,
                analysedService,
                shearDiagram,
                torsion);
    }

    public SpanProblem withFixedWidth(Double w) {
        return new SpanProblem(
                id,
                materials,
                detailing,
                code,
                space,
                span,
                ends,
                mLeft,
                mMid,
                mRight,
                vLeft,
                vRight,
                service,
                limits,
                maxDepth,
                w,
                flange,
                bottomAnchored,
                maxBarSizes,
                barsPerTwoLegs,
                analysedService,
                shearDiagram,
                torsion);
    }

    public SpanProblem withLimits(SpanChecks.Limits l) {
        return new SpanProblem(
                id,
                materials,
                detailing,
                code,
                space,
                span,
                ends,
                mLeft,
                mMid,
                mRight,
                vLeft,
                vRight,
                service,
                l,
                maxDepth,
                fixedWidth,
                flange,
                bottomAnchored,
                maxBarSizes,
                barsPerTwoLegs,
                analysedService,
                shearDiagram,
                torsion);
    }

    public SpanProblem scaled(double moments, double shears) {
        return new SpanProblem(
                id,
                materials,
                detailing,
                code,
                space,
                span,
                ends,
                mul(mLeft, moments),
                mul(mMid, moments),
                mul(mRight, moments),
                mul(vLeft, shears),
                mul(vRight, shears),
                service,
                limits,
                maxDepth,
                fixedWidth,
                flange,
                bottomAnchored,
                maxBarSizes,
                barsPerTwoLegs,
                analysedService == null ? null : analysedService.times(moments),
                shearDiagram == null ? null : shearDiagram.times(shears),
                torsion);
    }

    private static Double mul(Double v, double k) {
        return v == null ? null : v * k;
    }

    /** The office's legs rule, or null when only the code's rules apply (barsPerTwoLegs 0). */
    public barfit.section.StirrupRules.Practice practice() {
        return barsPerTwoLegs > 0 ? new barfit.section.StirrupRules.Practice(barsPerTwoLegs) : null;
    }

    /** Stirrup legs the bars of a layer need by the office's rule (two when there is none). */
    public int legsFor(int barsInLayer) {
        return barsPerTwoLegs > 0 ? practice().legsFor(barsInLayer) : 2;
    }
}
