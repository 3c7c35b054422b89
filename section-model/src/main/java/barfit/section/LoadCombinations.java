package barfit.section;

/** Factored line loads of the basic strength combinations of 5.3.1 for dead and live load alone. */
public final class LoadCombinations {
    private LoadCombinations() {
    }

    /** U = max(1.2 D + 1.6 L (5.3.1b), 1.4 D (5.3.1a)), in the units of D and L. */
    public static double factored(double dead, double live) {
        return Math.max(1.2 * dead + 1.6 * live, 1.4 * dead);
    }
}
