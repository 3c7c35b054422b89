package barfit.section;

/**
 * An independent layered ("fibre") integration of a section, for the tests only. The depth is cut
 * into thin fibres (flange soffit on a fibre boundary); each fibre carries 0.85 f'c over the part of
 * it inside a = beta1 c, on its width less the bar bands crossing it; bars carry Es eps capped at fy.
 * c is found by plain bisection on the total force, Mn by summing fibre and bar moments.
 */
final class FibreSection {
    private final double[] top;
    private final double[] width;
    private final double[] barD;
    private final double[] barA;
    private final double[] barDb;
    private final double fc;
    private final double fy;
    private final double es;
    private final double beta1;

    double c;
    double mn;
    double epsT;

    /**
     * @param profile widths as pairs {x from the compression face, width} starting at x = 0 with the
     *                last pair {h, 0}
     */
    FibreSection(
            double[][] profile,
            double[] d,
            double[] as,
            double[] db,
            double fc,
            double fy,
            double es,
            double beta1,
            int fibresPerPart) {
        int parts = profile.length - 1;
        top = new double[parts * fibresPerPart + 1];
        width = new double[parts * fibresPerPart];
        int k = 0;
        for (int p = 0; p < parts; p++) {
            double x0 = profile[p][0];
            double x1 = profile[p + 1][0];
            for (int i = 0; i < fibresPerPart; i++) {
                top[k] = x0 + (x1 - x0) * i / fibresPerPart;
                width[k] = profile[p][1];
                k++;
            }
        }
        top[k] = profile[parts][0];
        this.barD = d;
        this.barA = as;
        this.barDb = db;
        this.fc = fc;
        this.fy = fy;
        this.es = es;
        this.beta1 = beta1;
    }

    private double netWidth(int k) {
        double mid = 0.5 * (top[k] + top[k + 1]);
        double w = width[k];
        for (int i = 0; i < barD.length; i++) {
            if (Math.abs(mid - barD[i]) < barDb[i] / 2) {
                w -= barA[i] / barDb[i];
            }
        }
        return w;
    }

    /** Force (compression positive) and, in out[1], moment about the compression face. */
    private void forces(double cc, double[] out) {
        double a = beta1 * cc;
        double f = 0;
        double m = 0;
        for (int k = 0; k < width.length; k++) {
            double x0 = top[k];
            double x1 = Math.min(top[k + 1], a);
            if (x1 <= x0) {
                break;
            }
            double w = netWidth(k);
            double df = 0.85 * fc * w * (x1 - x0);
            f += df;
            m += df * 0.5 * (x0 + x1);
        }
        for (int i = 0; i < barD.length; i++) {
            double eps = 0.003 * (cc - barD[i]) / cc;
            double s = Math.max(-fy, Math.min(fy, es * eps));
            f += barA[i] * s;
            m += barA[i] * s * barD[i];
        }
        out[0] = f;
        out[1] = m;
    }

    FibreSection solve() {
        double h = top[top.length - 1];
        double lo = 1e-9 * h;
        double hi = 100 * h;
        double[] o = new double[2];
        for (int it = 0; it < 200; it++) {
            double mid = 0.5 * (lo + hi);
            forces(mid, o);
            if (o[0] > 0) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        c = 0.5 * (lo + hi);
        forces(c, o);
        mn = -o[1];
        double dt = 0;
        for (double di : barD) {
            dt = Math.max(dt, di);
        }
        epsT = 0.003 * (dt - c) / c;
        return this;
    }
}
