package barfit.section;

/** Factored line loads of the basic strength combinations of 5.3.1 for dead and live load alone. */
public final class LoadCombinations {
    private LoadCombinations() {}

    /** 5.3.1a: U = 1.4 D. */
    public static final double DEAD_ALONE = 1.4;
    /** 5.3.1b: U = 1.2 D + 1.6 L, the dead-load factor. */
    public static final double DEAD_WITH_LIVE = 1.2;
    /** 5.3.1b: the live-load factor. */
    public static final double LIVE = 1.6;

    /** U = max(1.2 D + 1.6 L (5.3.1b), 1.4 D (5.3.1a)), in the units of D and L. */
    public static double factored(double dead, double live) {
        return Math.max(DEAD_WITH_LIVE * dead + LIVE * live, DEAD_ALONE * dead);
    }

    /**
     * The factored shear of live load on half a span, 1.6 wL ln / 8 (5.3.1b's live-load factor on the
     * shear at mid-span of a simple span loaded over one half): a floor on the design shear near mid-span,
     * which a full-span shear line misses (common practice, no clause).
     */
    public static double halfSpanLiveShear(double live, double ln) {
        return LIVE * live * ln / 8;
    }
}
