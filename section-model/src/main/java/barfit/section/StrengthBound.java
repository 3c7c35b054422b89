package barfit.section;

/**
 * An upper bound on the nominal moment of ANY bar layout in a section, given only its tension-face
 * steel area: used by a search to skip sections that cannot work, never to pass one.
 *
 * <p>Taking moments about the extreme compression fibre, Mn = sum(T_i d_i) - Cc yc - Cs ys, with
 * equilibrium Cc + Cs = sum(T_i). Bounds that hold for every layout: bar stresses at most fy; tension
 * bars no deeper than {@code dMax}; compression bars (at most {@code compressionArea}, no shallower than
 * {@code dPrimeMin}) carry at most their area times fy; the concrete block is at most {@code widest}
 * wide, so for a force Cc its centroid is at least Cc / (2 x 0.85 f'c x widest) deep. If the
 * compression bars end up in tension instead (c < d'), they add at most their area times fy at
 * {@code dPrimeMax}, and the concrete takes all the compression.
 */
public final class StrengthBound {
    private StrengthBound() {
    }

    /** The largest Mn any layout with tension-face area {@code as} could reach. */
    public static double maxMn(double as, double dMax, double compressionArea, double dPrimeMin, double dPrimeMax,
            double widest, double fc, double fy) {
        double k = 0.85 * fc * widest;
        double t = as * fy;
        // (i) compression bars in compression: choose their force to minimise the compression moment
        double csMax = Math.min(compressionArea * fy, t);
        double cs = Math.min(Math.max(t - k * dPrimeMin, 0), csMax);
        double cc = t - cs;
        double caseCompression = t * dMax - (cc * cc / (2 * k) + cs * dPrimeMin);
        // (ii) compression bars in tension: their force at d' is chosen to maximise the moment
        double th = Math.min(Math.max(k * dPrimeMax - t, 0), compressionArea * fy);
        double c2 = t + th;
        double caseTension = t * dMax + th * dPrimeMax - c2 * c2 / (2 * k);
        return Math.max(caseCompression, caseTension);
    }

    /**
     * The least tension-face area for which 0.90 x {@link #maxMn} reaches Mu (phi never exceeds 0.90);
     * infinite if none up to {@code ceiling} does.
     */
    public static double minTensionArea(double mu, double dMax, double compressionArea, double dPrimeMin,
            double dPrimeMax, double widest, double fc, double fy, double ceiling) {
        double target = Math.abs(mu) / 0.90;
        if (maxMn(ceiling, dMax, compressionArea, dPrimeMin, dPrimeMax, widest, fc, fy) < target) {
            return Double.POSITIVE_INFINITY;
        }
        double lo = 0;
        double hi = ceiling;
        for (int i = 0; i < 60 && hi - lo > 1e-6 * ceiling; i++) {
            double mid = 0.5 * (lo + hi);
            if (maxMn(mid, dMax, compressionArea, dPrimeMin, dPrimeMax, widest, fc, fy) >= target) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return lo;
    }
}
