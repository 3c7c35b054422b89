package barfit.section;

/**
 * A slab flange at the top of the web. {@code given} is the width the input gave and {@code width} the
 * width every analysis uses: the lesser of the given width and the effective width of Table 6.3.2.1 on
 * the web it sits on ({@link SectionShape} applies the limit when it is built, so a section's flange is
 * always at its effective width). {@code thickness} is the slab thickness, {@code oneSided} marks an
 * L-section (edge beam). {@code clearToNextWeb} (sw, the clear distance to the next web) and
 * {@code clearSpan} (ln, the beam's clear span) bound the overhangs; each is NaN when not known, and that
 * limit is then not applied.
 */
public record Flange(
        double width, double thickness, boolean oneSided, double given, double clearToNextWeb, double clearSpan) {

    public Flange {
        if (!(thickness > 0) || !(given > 0) || !(width > 0) || width > given) {
            throw new IllegalArgumentException("a flange needs a positive thickness and a width no wider than given");
        }
        if (clearToNextWeb <= 0 || clearSpan <= 0) {
            throw new IllegalArgumentException(
                    "the clear distance to the next web and the clear span must be positive");
        }
    }

    /** A flange of the given width with neither sw nor ln known: only the slab-thickness limit applies. */
    public Flange(double width, double thickness, boolean oneSided) {
        this(width, thickness, oneSided, width, Double.NaN, Double.NaN);
    }

    /** A flange as the input gives it; {@code clearToNextWeb} and {@code clearSpan} may be null (not known). */
    public static Flange given(
            double width, double thickness, boolean oneSided, Double clearToNextWeb, Double clearSpan) {
        return new Flange(
                width,
                thickness,
                oneSided,
                width,
                clearToNextWeb == null ? Double.NaN : clearToNextWeb,
                clearSpan == null ? Double.NaN : clearSpan);
    }

    /**
     * Table 6.3.2.1: the widest flange the analysis may count on a web {@code bw}. Each overhang of a
     * T-beam is at most min(8 hf, sw/2, ln/8); the one overhang of an L-beam at most min(6 hf, sw/2, ln/12).
     */
    public double limit(double bw) {
        return bw + (oneSided ? 1 : 2) * overhangLimit();
    }

    /** The largest overhang Table 6.3.2.1 allows with what is known. */
    public double overhangLimit() {
        double overhang = (oneSided ? 6 : 8) * thickness;
        if (webGapKnown()) {
            overhang = Math.min(overhang, clearToNextWeb / 2);
        }
        if (spanKnown()) {
            overhang = Math.min(overhang, clearSpan / (oneSided ? 12 : 8));
        }
        return overhang;
    }

    /** This flange on a web {@code bw}, taken at its effective width (the given width, limited by Table 6.3.2.1). */
    public Flange on(double bw) {
        return new Flange(Math.min(given, limit(bw)), thickness, oneSided, given, clearToNextWeb, clearSpan);
    }

    /**
     * 24.3.4, a flange in tension: the width over which part of the flexural tension bars is to be
     * distributed, the effective width or ln/10, whichever is smaller (NaN without a span).
     */
    public double tensionBarsWidth() {
        return spanKnown() ? Math.min(width, clearSpan / 10) : Double.NaN;
    }

    /** 24.3.4: whether the effective width exceeds ln/10, so bars are also wanted in the outer flange. */
    public boolean outerFlangeBars() {
        return spanKnown() && width > clearSpan / 10;
    }

    /** Whether the given width was wider than Table 6.3.2.1 allows, so the analysis takes less. */
    public boolean reduced() {
        return width < given;
    }

    public boolean webGapKnown() {
        return !Double.isNaN(clearToNextWeb);
    }

    public boolean spanKnown() {
        return !Double.isNaN(clearSpan);
    }
}
