package barfit.input;

import barfit.catalogs.yaml.Location;
import barfit.design.span.SpanTorsion;
import barfit.section.Flange;
import barfit.section.Span;
import barfit.section.SpanChecks;

/**
 * A beam of a {@code design} file. A single section gives Mu in N·mm (+ sagging), Vu in N or null and Tu in
 * N·mm or null ({@code compatibilityTorsion}: Tu is compatibility torsion, 22.7.3.2);
 * a whole span gives {@code whole} instead. Both carry the headroom cap and fixed width in mm or null,
 * the flange, and the span (for the cost over the length and, with ends, the depth rule). {@code group}
 * names beams a schedule may make share one section size (null: none).
 */
public record DesignBeam(
        String id,
        Location location,
        double mu,
        Double vu,
        Double maxDepth,
        Double width,
        Flange flange,
        Span span,
        WholeSpan whole,
        String group,
        boolean sameSection,
        Double tu,
        boolean compatibilityTorsion) {

    /** A beam without torsion. */
    public DesignBeam(
            String id,
            Location location,
            double mu,
            Double vu,
            Double maxDepth,
            Double width,
            Flange flange,
            Span span,
            WholeSpan whole,
            String group,
            boolean sameSection) {
        this(id, location, mu, vu, maxDepth, width, flange, span, whole, group, sameSection, null, false);
    }

    /**
     * {@code sameSection}: the beam's group keeps one b × h whatever the rationalisation asks (the spans of a
     * line given in a CSV's {@code line} column: one set of forms).
     */
    public DesignBeam(
            String id,
            Location location,
            double mu,
            Double vu,
            Double maxDepth,
            Double width,
            Flange flange,
            Span span,
            WholeSpan whole,
            String group) {
        this(id, location, mu, vu, maxDepth, width, flange, span, whole, group, false);
    }

    /**
     * The parts of a whole span: moments at the left support, mid-span and right support (N·mm, null
     * where absent), shears at d from each face (N, null where absent), service loads (or null),
     * deflection limits, whether the bottom bars are anchored at the supports, and the factored torsion
     * (null: none).
     */
    public record WholeSpan(
            Double mLeft,
            Double mMid,
            Double mRight,
            Double vLeft,
            Double vRight,
            SpanChecks.ServiceLoads service,
            SpanChecks.Limits limits,
            boolean bottomAnchored,
            SpanTorsion torsion) {}

    public boolean isWhole() {
        return whole != null;
    }
}
