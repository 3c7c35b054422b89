package barfit.analysis;

import java.util.List;

/**
 * A beam line: spans centre-to-centre of supports (mm), optional overhangs past the end supports (0 for
 * none), one support per span end, service loads on its segments (the web's own weight included by the
 * caller as dead load), the beam's flexural stiffness EI per span (N·mm², see {@link Stiffness}), the concrete's Ec
 * for the columns (MPa), an effective depth d for the shears at d (mm), and redistribution of the
 * negative moment at each support (percent, 0 for none; see {@link LineAnalysis}).
 */
public record Line(
        String id,
        List<Double> spans,
        double overhangLeft,
        double overhangRight,
        List<Support> supports,
        List<Load> loads,
        List<Double> spanEI,
        double ec,
        double d,
        List<Double> redistribution) {

    /** A line of one section throughout: the same EI on every span. */
    public Line(
            String id,
            List<Double> spans,
            double overhangLeft,
            double overhangRight,
            List<Support> supports,
            List<Load> loads,
            double beamEI,
            double ec,
            double d,
            List<Double> redistribution) {
        this(
                id,
                spans,
                overhangLeft,
                overhangRight,
                supports,
                loads,
                java.util.Collections.nCopies(spans.size(), beamEI),
                ec,
                d,
                redistribution);
    }

    /** The same line with other percentages of redistribution at its supports (null for none). */
    public Line withRedistribution(List<Double> percent) {
        return new Line(id, spans, overhangLeft, overhangRight, supports, loads, spanEI, ec, d, percent);
    }

    public Line {
        spans = List.copyOf(spans);
        spanEI = List.copyOf(spanEI);
        supports = List.copyOf(supports);
        loads = List.copyOf(loads);
        redistribution = redistribution == null ? null : List.copyOf(redistribution);
        if (spans.isEmpty()) {
            throw new IllegalArgumentException("a line needs at least one span between two supports");
        }
        if (supports.size() != spans.size() + 1) {
            throw new IllegalArgumentException(
                    "a line of " + spans.size() + " spans needs " + (spans.size() + 1) + " supports");
        }
        for (double l : spans) {
            if (!(l > 0)) {
                throw new IllegalArgumentException("spans must be positive");
            }
        }
        if (overhangLeft < 0 || overhangRight < 0) {
            throw new IllegalArgumentException("overhangs are zero or more");
        }
        if (spanEI.size() != spans.size()) {
            throw new IllegalArgumentException("one stiffness per span");
        }
        for (double ei : spanEI) {
            if (!(ei > 0)) {
                throw new IllegalArgumentException("the beam's stiffness must be positive");
            }
        }
    }

    public int spanCount() {
        return spans.size();
    }

    /** Segment count: the left overhang (index 0, maybe of zero length), the spans, the right overhang. */
    public int segments() {
        return spans.size() + 2;
    }

    /** Length of a segment, mm (0 for an absent overhang). */
    public double length(int segment) {
        if (segment == 0) {
            return overhangLeft;
        }
        if (segment == spans.size() + 1) {
            return overhangRight;
        }
        return spans.get(segment - 1);
    }

    /** x of a support's centre line along the line, from the first support's, mm. */
    public double supportX(int support) {
        double x = 0;
        for (int i = 0; i < support; i++) {
            x += spans.get(i);
        }
        return x;
    }

    /** x along the line of a position in a segment (left overhangs measured from their free end). */
    public double globalX(int segment, double local) {
        if (segment == 0) {
            return local - overhangLeft;
        }
        if (segment == spans.size() + 1) {
            return supportX(spans.size()) + local;
        }
        return supportX(segment - 1) + local;
    }

    public double redistributionAt(int support) {
        return redistribution == null ? 0 : redistribution.get(support);
    }
}
