package barfit.section;

import java.util.Arrays;
import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * Strain compatibility of 22.2 for one section, on primitive arrays so the search can call it many
 * thousands of times without allocating per call.
 *
 * <p>Depths x are measured from the extreme compression fibre. The concrete stress is the Whitney
 * block 0.85 f'c over a = beta1 c on the compression-zone widths; steel is elastic–perfectly-plastic.
 * A bar inside the block displaces block concrete. To keep the axial force continuous and increasing
 * in c (so the neutral axis is unique), a bar is treated as a band of its own diameter: the part of
 * the band inside the block displaces concrete. A bar wholly inside or outside the block, the usual
 * case, gets the textbook treatment exactly.
 *
 * <p>The axial force N(c) is, between consecutive "state changes" (a bar yields, the block edge
 * reaches a bar band or a flange soffit), of the form P c + Q + R / c, so the root is the closed-form
 * positive root of P c² + Q c + R = 0 on the interval that brackets it. Brent's method is the fallback
 * if rounding ever puts the root outside its interval.
 */
public final class FlexureSolver {
    private static final double BIG = 1e3;
    private static final double ECU = CodeTables.EPS_CU;

    // zone profile: widths w[k] over [x[k], x[k+1]) from the compression fibre
    private final double[] zx = new double[4];
    private final double[] zw = new double[3];
    private int nz;
    private double h;

    private double[] d = new double[8];
    private double[] as = new double[8];
    private double[] db = new double[8];
    private int nb;

    private double fc;
    private double fy;
    private double es;
    private double beta1;

    private double[] bp = new double[40];

    // solution
    private double c;
    private double mn;
    private double concreteForce;
    private double concreteCentroid;
    private double residual;

    /** Sets the compression-zone profile for a rectangle of width b and height h. */
    public FlexureSolver rectangle(double b, double height) {
        nz = 1;
        zx[0] = 0;
        zx[1] = height;
        zw[0] = b;
        h = height;
        return this;
    }

    /** Two-part profile: width {@code w1} down to {@code x1}, then {@code w2} to the full height. */
    public FlexureSolver twoPart(double w1, double x1, double w2, double height) {
        if (!(x1 > 0) || x1 >= height) {
            return rectangle(w2, height);
        }
        nz = 2;
        zx[0] = 0;
        zx[1] = x1;
        zx[2] = height;
        zw[0] = w1;
        zw[1] = w2;
        h = height;
        return this;
    }

    public FlexureSolver materials(double fcMpa, double fyMpa, double esMpa, double beta1Factor) {
        this.fc = fcMpa;
        this.fy = fyMpa;
        this.es = esMpa;
        this.beta1 = beta1Factor;
        return this;
    }

    public FlexureSolver clearBars() {
        nb = 0;
        return this;
    }

    /** Adds a bar group: depth from the compression fibre, total area, bar diameter. */
    public FlexureSolver bar(double depth, double area, double diameter) {
        if (nb == d.length) {
            d = Arrays.copyOf(d, nb * 2);
            as = Arrays.copyOf(as, nb * 2);
            db = Arrays.copyOf(db, nb * 2);
        }
        d[nb] = depth;
        as[nb] = area;
        db[nb] = diameter;
        nb++;
        return this;
    }

    public int barCount() {
        return nb;
    }

    /** Solves for the neutral axis and the nominal moment. Returns this for reading the results. */
    public FlexureSolver solve() {
        double ey = fy / es;
        int n = 0;
        int need = 4 * nb + nz + 3;
        if (bp.length < need) {
            bp = new double[need * 2];
        }
        for (int k = 1; k <= nz; k++) {
            bp[n++] = zx[k] / beta1;
        }
        for (int i = 0; i < nb; i++) {
            if (ECU > ey) {
                bp[n++] = ECU * d[i] / (ECU - ey);
            }
            bp[n++] = ECU * d[i] / (ECU + ey);
            double lo = (d[i] - db[i] / 2) / beta1;
            if (lo > 0) {
                bp[n++] = lo;
            }
            bp[n++] = (d[i] + db[i] / 2) / beta1;
        }
        bp[n++] = BIG * h;
        insertionSort(bp, n); // a dozen or so values: a plain insertion sort beats the general sort
        double lo = 0;
        double root = Double.NaN;
        for (int k = 0; k < n; k++) {
            double hi = bp[k];
            if (hi <= lo) {
                continue;
            }
            double nHi = axial(hi);
            if (nHi >= 0) {
                root = nHi == 0 ? hi : rootIn(lo, hi);
                break;
            }
            lo = hi;
        }
        if (Double.isNaN(root)) {
            throw new IllegalStateException("no neutral axis: the section cannot reach equilibrium");
        }
        c = root;
        finish();
        return this;
    }

    private static void insertionSort(double[] a, int n) {
        for (int i = 1; i < n; i++) {
            double v = a[i];
            int j = i - 1;
            while (j >= 0 && a[j] > v) {
                a[j + 1] = a[j];
                j--;
            }
            a[j + 1] = v;
        }
    }

    /** Net axial force (compression positive) for neutral-axis depth {@code cc}. */
    public double axial(double cc) {
        double a = Math.min(beta1 * cc, h);
        double k = 0.85 * fc;
        double n = k * blockArea(a);
        double ey = fy / es;
        for (int i = 0; i < nb; i++) {
            double top = d[i] - db[i] / 2;
            double ramp = (a - top) / db[i];
            if (ramp > 0) {
                n -= k * as[i] * Math.min(ramp, 1.0);
            }
            double eps = ECU * (cc - d[i]) / cc;
            double s = eps >= ey ? fy : eps <= -ey ? -fy : es * eps;
            n += as[i] * s;
        }
        return n;
    }

    private double blockArea(double a) {
        double area = 0;
        for (int k = 0; k < nz; k++) {
            double x0 = zx[k];
            double x1 = Math.min(zx[k + 1], a);
            if (x1 > x0) {
                area += zw[k] * (x1 - x0);
            }
        }
        return area;
    }

    private double blockFirstMoment(double a) {
        double m = 0;
        for (int k = 0; k < nz; k++) {
            double x0 = zx[k];
            double x1 = Math.min(zx[k + 1], a);
            if (x1 > x0) {
                m += zw[k] * (x1 * x1 - x0 * x0) / 2;
            }
        }
        return m;
    }

    /** Closed-form root on (lo, hi], where every bar and the block keep one state. */
    private double rootIn(double lo, double hi) {
        double mid = 0.5 * (lo + hi);
        double am = beta1 * mid;
        double k = 0.85 * fc;
        double ey = fy / es;
        double p = 0;
        double q = 0;
        double r = 0;
        if (am >= h) {
            q += k * blockArea(h);
        } else {
            double cum = 0;
            for (int s = 0; s < nz; s++) {
                if (am < zx[s + 1] || s == nz - 1) {
                    q += k * (cum - zw[s] * zx[s]);
                    p += k * zw[s] * beta1;
                    break;
                }
                cum += zw[s] * (zx[s + 1] - zx[s]);
            }
        }
        for (int i = 0; i < nb; i++) {
            double top = d[i] - db[i] / 2;
            double bot = d[i] + db[i] / 2;
            if (am >= bot) {
                q -= k * as[i];
            } else if (am > top) {
                p -= k * as[i] * beta1 / db[i];
                q += k * as[i] * top / db[i];
            }
            double eps = ECU * (mid - d[i]) / mid;
            if (eps >= ey) {
                q += as[i] * fy;
            } else if (eps <= -ey) {
                q -= as[i] * fy;
            } else {
                q += as[i] * es * ECU;
                r -= as[i] * es * ECU * d[i];
            }
        }
        double x = Double.NaN;
        double scale = Math.abs(q) + Math.abs(p) * hi + Math.abs(r) / Math.max(lo, 1e-9);
        if (Math.abs(p) * hi < 1e-14 * scale) {
            x = -r / q;
        } else {
            double disc = q * q - 4 * p * r;
            if (disc >= 0) {
                double sq = Math.sqrt(disc);
                // numerically stable pair of roots
                double t = -0.5 * (q + Math.copySign(sq, q));
                double r1 = t / p;
                double r2 = t != 0 ? r / t : Double.NaN;
                double tol = 1e-9 * hi;
                if (r1 >= lo - tol && r1 <= hi + tol) {
                    x = r1;
                } else if (r2 >= lo - tol && r2 <= hi + tol) {
                    x = r2;
                }
            }
        }
        if (Double.isNaN(x) || x < lo - 1e-9 * hi || x > hi + 1e-9 * hi) {
            double from = Math.max(lo, 1e-9 * h);
            x = new BrentSolver(1e-12 * h).solve(200, this::axial, from, hi);
        }
        return Math.min(Math.max(x, Math.max(lo, 1e-12)), hi);
    }

    private void finish() {
        double a = Math.min(beta1 * c, h);
        double k = 0.85 * fc;
        double force = k * blockArea(a);
        double moment = k * blockFirstMoment(a);
        double ey = fy / es;
        double steelForce = 0;
        double steelMoment = 0;
        for (int i = 0; i < nb; i++) {
            double top = d[i] - db[i] / 2;
            double covered = Math.min(a, d[i] + db[i] / 2) - top;
            if (covered > 0) {
                double band = as[i] / db[i];
                force -= k * band * covered;
                moment -= k * band * covered * (top + covered / 2);
            }
            double eps = ECU * (c - d[i]) / c;
            double s = eps >= ey ? fy : eps <= -ey ? -fy : es * eps;
            steelForce += as[i] * s;
            steelMoment += as[i] * s * d[i];
        }
        concreteForce = force;
        concreteCentroid = force > 0 ? moment / force : 0;
        residual = force + steelForce;
        // moment of all forces about the compression fibre, sign so that Mn > 0
        mn = -(moment + steelMoment);
    }

    public double c() {
        return c;
    }

    public double a() {
        return Math.min(beta1 * c, h);
    }

    public double mn() {
        return mn;
    }

    public double beta1() {
        return beta1;
    }

    /** Net concrete compression (block less displaced concrete), N. */
    public double concreteForce() {
        return concreteForce;
    }

    /** Depth of the net concrete force below the compression fibre, mm. */
    public double concreteCentroid() {
        return concreteCentroid;
    }

    /** Sum of all forces at the solution, N (zero up to rounding). */
    public double residual() {
        return residual;
    }

    /** Strain of bar group i, compression positive. */
    public double strain(int i) {
        return ECU * (c - d[i]) / c;
    }

    /** Stress of bar group i, compression positive, MPa. */
    public double stress(int i) {
        double eps = strain(i);
        double ey = fy / es;
        return eps >= ey ? fy : eps <= -ey ? -fy : es * eps;
    }

    /** Concrete displaced by bar group i, mm² (zero when the bar is below the block). */
    public double displacedArea(int i) {
        double a = a();
        double top = d[i] - db[i] / 2;
        double covered = Math.min(a, d[i] + db[i] / 2) - top;
        return covered > 0 ? as[i] / db[i] * covered : 0;
    }

    public double depth(int i) {
        return d[i];
    }

    /** Net tensile strain at depth {@code x} (tension positive). */
    public double tensileStrainAt(double x) {
        return ECU * (x - c) / c;
    }
}
