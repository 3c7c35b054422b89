package barfit.design.section;

import barfit.design.SearchSpace;
import barfit.section.Bending;
import barfit.section.CodeEquations;
import barfit.section.Detailing;
import barfit.section.Flange;
import barfit.section.Materials;
import barfit.section.Span;

/**
 * One section to design: its factored moment (N·mm, + sagging) and shear (N, or null), the limits
 * the beam imposes (headroom cap, fixed width, flange, span for the depth and flange-width rules),
 * and the length its cost is counted over (m; 1 for a cost per metre).
 */
public record SectionProblem(
        String id,
        Materials materials,
        Detailing detailing,
        CodeEquations code,
        SearchSpace space,
        double mu,
        Double vu,
        Span span,
        Double maxDepth,
        Double fixedWidth,
        Flange flange,
        double costLength) {

    public Bending bending() {
        return Bending.of(mu);
    }

    public SectionProblem withSpace(SearchSpace s) {
        return new SectionProblem(
                id, materials, detailing, code, s, mu, vu, span, maxDepth, fixedWidth, flange, costLength);
    }

    public SectionProblem withMaxDepth(Double cap) {
        return new SectionProblem(
                id, materials, detailing, code, space, mu, vu, span, cap, fixedWidth, flange, costLength);
    }

    public SectionProblem withFixedWidth(Double w) {
        return new SectionProblem(id, materials, detailing, code, space, mu, vu, span, maxDepth, w, flange, costLength);
    }

    public SectionProblem withMoment(double m) {
        return new SectionProblem(
                id, materials, detailing, code, space, m, vu, span, maxDepth, fixedWidth, flange, costLength);
    }

    public SectionProblem withShear(Double v) {
        return new SectionProblem(
                id, materials, detailing, code, space, mu, v, span, maxDepth, fixedWidth, flange, costLength);
    }

    /** Widths the search may use. */
    public java.util.List<Double> widths() {
        return fixedWidth != null ? java.util.List.of(fixedWidth) : space.widths();
    }

    /** Depths the search may use (the headroom cap applied). */
    public java.util.List<Double> depths() {
        if (maxDepth == null) {
            return space.depths();
        }
        return space.depths().stream().filter(h -> h <= maxDepth + 1e-9).toList();
    }
}
