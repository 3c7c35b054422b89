package barfit.analysis;

import barfit.section.SectionShape;

/**
 * Member stiffnesses for the analysis of a line, ACI 318-19 Table 6.6.3.1.1 (moment of inertia for
 * factored-load analysis): beams 0.35 Ig, columns 0.70 Ig, with Ig of the gross concrete section (for a
 * flanged beam, the web with its effective flange, 6.3.2.1).
 */
public final class Stiffness {
    /** Table 6.6.3.1.1: beams. */
    public static final double BEAM_FACTOR = 0.35;
    /** Table 6.6.3.1.1: columns. */
    public static final double COLUMN_FACTOR = 0.70;

    private Stiffness() {}

    /** Ig of a gross section (web and effective flange), mm⁴, about its own centroid. */
    public static double grossInertia(SectionShape shape) {
        double bw = shape.width();
        double h = shape.height();
        double bf = shape.flanged() ? shape.flange().width() : bw;
        double hf = shape.flanged() ? shape.flange().thickness() : 0;
        double area = bw * h + (bf - bw) * hf;
        double yc = (bw * h * h / 2 + (bf - bw) * hf * hf / 2) / area;
        return bw * h * h * h / 12
                + bw * h * sq(h / 2 - yc)
                + (bf - bw) * hf * hf * hf / 12
                + (bf - bw) * hf * sq(hf / 2 - yc);
    }

    /** EI of the beam for the analysis, N·mm². */
    public static double beamEI(double ec, SectionShape shape) {
        return ec * BEAM_FACTOR * grossInertia(shape);
    }

    /** EI of a column for the analysis, N·mm². */
    public static double columnEI(double ec, Column c) {
        return ec * COLUMN_FACTOR * c.grossInertia();
    }

    private static double sq(double v) {
        return v * v;
    }
}
