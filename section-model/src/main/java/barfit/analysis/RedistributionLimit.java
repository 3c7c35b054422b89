package barfit.analysis;

/**
 * ACI 318-19 6.6.5: negative moments at supports may be redistributed only where εt ≥ 0.0075 at the
 * section (6.6.5.1), by at most 1000 εt percent and 20 percent (6.6.5.3).
 */
public final class RedistributionLimit {
    /** 6.6.5.1: the least net tensile strain for any redistribution. */
    public static final double EPS_T_MIN = 0.0075;
    /** 6.6.5.3: the most, in percent. */
    public static final double MAX_PERCENT = 20;

    private RedistributionLimit() {}

    /** The largest redistribution allowed at a section of net tensile strain εt, percent (0 when NaN). */
    public static double percent(double epsT) {
        if (Double.isNaN(epsT) || epsT < EPS_T_MIN) {
            return 0;
        }
        return Math.min(1000 * epsT, MAX_PERCENT);
    }
}
