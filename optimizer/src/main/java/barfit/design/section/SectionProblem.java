package barfit.design.section;

import barfit.design.SearchSpace;
import barfit.section.Bending;
import barfit.section.CodeEquations;
import barfit.section.Demand;
import barfit.section.Detailing;
import barfit.section.Flange;
import barfit.section.Materials;
import barfit.section.Span;

/**
 * One section to design: its factored moment (N·mm, + sagging), shear (N, or null) and torsion (N·mm, or
 * null; {@code compatibilityTorsion} marks it as compatibility torsion, 22.7.3.2), the limits the beam
 * imposes (headroom cap, fixed width, flange, span for the depth and flange-width rules), and the length
 * its cost is counted over (m; 1 for a cost per metre).
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
        double costLength,
        Double tu,
        boolean compatibilityTorsion) {

    /** A section without torsion. */
    public SectionProblem(
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
        this(
                id,
                materials,
                detailing,
                code,
                space,
                mu,
                vu,
                span,
                maxDepth,
                fixedWidth,
                flange,
                costLength,
                null,
                false);
    }

    public Bending bending() {
        return Bending.of(mu);
    }

    /** The demand every layout is checked under. */
    public Demand demand() {
        return new Demand(mu, vu, tu, compatibilityTorsion);
    }

    /** Whether the section carries torsion to design for (Tu given and not zero). */
    public boolean hasTorsion() {
        return demand().hasTorsion();
    }

    public SectionProblem withTorsion(Double t, boolean compatibility) {
        return new SectionProblem(
                id,
                materials,
                detailing,
                code,
                space,
                mu,
                vu,
                span,
                maxDepth,
                fixedWidth,
                flange,
                costLength,
                t,
                compatibility);
    }

    public SectionProblem withSpace(SearchSpace s) {
        return new SectionProblem(
                id,
                materials,
                detailing,
                code,
                s,
                mu,
                vu,
                span,
                maxDepth,
                fixedWidth,
                flange,
                costLength,
                tu,
                compatibilityTorsion);
    }

    public SectionProblem withMaxDepth(Double cap) {
        return new SectionProblem(
                id,
                materials,
                detailing,
                code,
                space,
                mu,
                vu,
                span,
                cap,
                fixedWidth,
                flange,
                costLength,
                tu,
                compatibilityTorsion);
    }

    public SectionProblem withFixedWidth(Double w) {
        return new SectionProblem(
                id,
                materials,
                detailing,
                code,
                space,
                mu,
                vu,
                span,
                maxDepth,
                w,
                flange,
                costLength,
                tu,
                compatibilityTorsion);
    }

    public SectionProblem withMoment(double m) {
        return new SectionProblem(
                id,
                materials,
                detailing,
                code,
                space,
                m,
                vu,
                span,
                maxDepth,
                fixedWidth,
                flange,
                costLength,
                tu,
                compatibilityTorsion);
    }

    public SectionProblem withShear(Double v) {
        return new SectionProblem(
                id,
                materials,
                detailing,
                code,
                space,
                mu,
                v,
                span,
                maxDepth,
                fixedWidth,
                flange,
                costLength,
                tu,
                compatibilityTorsion);
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
