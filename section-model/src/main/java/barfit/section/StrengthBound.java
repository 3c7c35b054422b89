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
 *
 * <p>The two cases assume the compression-face bars act together: all in compression or all in tension,
 * as one layer does. Layers of that face that straddle the neutral axis (the outer one in compression, a
 * deeper one in tension) are outside it: StrengthBoundTest found a three-layer face reaching 0.2 % more.
 */
public final class StrengthBound {
    private StrengthBound() {}

    /** The largest Mn any layout with tension-face area {@code as} could reach. */
    public static double maxMn(
            double as,
            double dMax,
            double compressionArea,
            double dPrimeMin,
            double dPrimeMax,
            double widest,
            double fc,
            double fy) {
        double k = CodeTables.BLOCK_STRESS * fc * widest;
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
     * The strength ceiling: the tension-face area whose force at fy balances the widest block
     * (0.85 f'c over {@code widest}) reaching {@code dMax} plus every compression bar at fy. {@link #maxMn}
     * falls beyond it, so no larger area reaches a moment that it does not.
     */
    public static double ceiling(double dMax, double compressionArea, double widest, double fc, double fy) {
        return (CodeTables.BLOCK_STRESS * fc * widest * dMax + compressionArea * fy) / fy;
    }

    /**
     * The least tension-face area for which φ x {@link #maxMn} reaches Mu, φ at most 0.90 (Table 21.2.2);
     * infinite if no area up to the {@link #ceiling} does.
     */
    public static double minTensionArea(
            double mu,
            double dMax,
            double compressionArea,
            double dPrimeMin,
            double dPrimeMax,
            double widest,
            double fc,
            double fy) {
        double ceiling = ceiling(dMax, compressionArea, widest, fc, fy);
        double target = Math.abs(mu) / CodeTables.PHI_TENSION_CONTROLLED;
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

    /**
     * A lower bound on the tension area any passing layout has, given {@code strengthArea}, a lower bound on
     * the area strength needs (As,req), and As,min of 9.6.1.2 at the shallowest d a layout could have: the
     * layout has As ≥ As,req, and As ≥ As,min unless As ≥ 4/3 As,req (9.6.1.3), so As ≥ min(As,min, 4/3 As,req).
     */
    public static double withMinimumSteel(double strengthArea, double asMin) {
        return Math.max(strengthArea, Math.min(asMin, 4.0 / 3.0 * strengthArea));
    }

    /**
     * The largest net tensile strain εt any layout with no compression steel could have while carrying
     * Mu: the least area that can (φ at most 0.90) gives the shallowest block, c = As fy / (0.85 f'c b β1),
     * and the deepest tension steel {@code dMax} the most strain, εt = 0.003 (dMax − c) / c (22.2.2.1,
     * 22.2.2.4.1). More steel, a shallower layer or steel below yield only lower it. Infinite for no moment.
     */
    public static double maxEpsT(double mu, double dMax, double b, double fc, double fy, CodeEquations code) {
        double as = minTensionArea(mu, dMax, 0, 0, 0, b, fc, fy);
        if (as == 0) {
            return Double.POSITIVE_INFINITY;
        }
        if (Double.isInfinite(as)) {
            return 0;
        }
        double c = as * fy / (CodeTables.BLOCK_STRESS * fc * b * CodeTables.beta1(fc, code));
        return CodeTables.EPS_CU * (dMax - c) / c;
    }
}
