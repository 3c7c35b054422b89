package barfit.design.span;

import java.util.Arrays;

/**
 * The envelope of factored shear along a span from an analysis of its line: |V| at stations x (mm from
 * the left face, ascending; a position given twice holds the shear on each side of a point load), and
 * for each face whether sections within d of it may take the shear at d (9.4.3.2) or must take the shear
 * at the face. A cantilever is given fixed at the left, its tip free at the right.
 *
 * <p>Between stations every arrangement's shear is linear (the stations hold every load's ends), so the
 * envelope of |V| there is convex and the straight line between two stations never under-states it; and
 * since under gravity load each arrangement's shear only falls along the span, the largest |V| over an
 * interval is at one of its ends.
 */
public record ShearDiagram(double clear, double[] x, double[] v, boolean leftAtFace, boolean rightAtFace)
        implements ShearAlong {
    public ShearDiagram {
        if (x.length != v.length || x.length < 2) {
            throw new IllegalArgumentException("a shear diagram needs at least two stations, as many values");
        }
        x = x.clone();
        v = v.clone();
    }

    @Override
    public double at(double position, double d) {
        double half = 0.5 * clear;
        double dl = leftAtFace ? 0 : Math.min(d, half);
        double dr = rightAtFace ? 0 : Math.min(d, half);
        return value(Math.min(Math.max(position, dl), clear - dr));
    }

    /**
     * For any d, each end e of a zone is evaluated somewhere between e and mid-span, so the least envelope
     * value there, at the end where it is larger, bounds the zone's shear from below.
     */
    @Override
    public double least(double from, double to) {
        return Math.max(leastBetween(from, 0.5 * clear), leastBetween(to, 0.5 * clear));
    }

    @Override
    public ShearDiagram times(double k) {
        double[] scaled = v.clone();
        for (int i = 0; i < scaled.length; i++) {
            scaled[i] *= Math.abs(k);
        }
        return new ShearDiagram(clear, x, scaled, leftAtFace, rightAtFace);
    }

    /** Where the envelope is least (the first such station): where a span's shear changes sign. */
    public double whereLeast() {
        int best = 0;
        for (int i = 1; i < v.length; i++) {
            if (v[i] < v[best]) {
                best = i;
            }
        }
        return x[best];
    }

    /** |V| at a position: the larger side at a point load, else the straight line between stations. */
    double value(double position) {
        int n = x.length;
        if (position <= x[0]) {
            return v[0];
        }
        if (position >= x[n - 1]) {
            return v[n - 1];
        }
        int i = Arrays.binarySearch(x, position);
        if (i >= 0) {
            double best = v[i];
            for (int j = i - 1; j >= 0 && x[j] == position; j--) {
                best = Math.max(best, v[j]);
            }
            for (int j = i + 1; j < n && x[j] == position; j++) {
                best = Math.max(best, v[j]);
            }
            return best;
        }
        int hi = -i - 1;
        int lo = hi - 1;
        double t = (position - x[lo]) / (x[hi] - x[lo]);
        return v[lo] + t * (v[hi] - v[lo]);
    }

    private double leastBetween(double a, double b) {
        double lo = Math.min(a, b);
        double hi = Math.max(a, b);
        double least = Math.min(value(lo), value(hi));
        for (int i = 0; i < x.length; i++) {
            if (x[i] > lo && x[i] < hi) {
                least = Math.min(least, v[i]);
            }
        }
        return least;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ShearDiagram s
                && s.clear == clear
                && Arrays.equals(s.x, x)
                && Arrays.equals(s.v, v)
                && s.leftAtFace == leftAtFace
                && s.rightAtFace == rightAtFace;
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(v) * 31 + Double.hashCode(clear);
    }

    @Override
    public String toString() {
        return "ShearDiagram[clear=" + clear + ", stations=" + x.length + "]";
    }
}
