package barfit.section;

/** Factored line loads of the basic strength combinations of 5.3.1 for dead and live load alone. */
public final class LoadCombinations {
    private LoadCombinations() {
    }

    /** U = max(1.2 D + 1.6 L (5.3.1b), 1.4 D (5.3.1a)), in the units of D and L. */
    public static double factored(double dead, double live) {
        return Math.max(1.2 * dead + 1.6 * live, 1.4 * dead);
    }

    /**
     * The factored shear of live load on half a span, 1.6 wL ln / 8 (5.3.1b's live-load factor on the
     * shear at mid-span of a simple span loaded over one half): a floor on the design shear near mid-span,
     * which a full-span shear line misses (common practice, no clause).
     */
    public static double halfSpanLiveShear(double live, double ln) {
        return 1.6 * live * ln / 8;
    }
}
