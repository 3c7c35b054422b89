package barfit.section.anchorage;

import barfit.analysis.LineResult;
import java.util.Arrays;

/**
 * A moment envelope along a member as the cut-off rules read it: stations {@code x} (mm, non-decreasing)
 * and at each the moment {@code m} (N·mm) the bars of interest must resist there, positive where those
 * bars are in tension and needed, zero or less where they are not.
 */
public record Envelope(double[] x, double[] m) {
    public Envelope {
        if (x.length != m.length || x.length < 2) {
            throw new IllegalArgumentException("an envelope needs at least two stations, each with its moment");
        }
        for (int i = 0; i < x.length; i++) {
            if (!Double.isFinite(x[i]) || !Double.isFinite(m[i])) {
                throw new IllegalArgumentException("an envelope's stations and moments must be finite numbers");
            }
            if (i > 0 && x[i] < x[i - 1]) {
                throw new IllegalArgumentException("an envelope's stations must not go backwards");
            }
        }
        x = x.clone();
        m = m.clone();
    }

    public int size() {
        return x.length;
    }

    /**
     * The stations from {@code from} to {@code to} (inclusive): the stretch of one group of bars, such as the
     * top bars over one support, where the envelope also holds the other support's.
     */
    public Envelope between(double from, double to) {
        int a = 0;
        while (a < x.length && x[a] < from) {
            a++;
        }
        int b = x.length;
        while (b > a && x[b - 1] > to) {
            b--;
        }
        return new Envelope(Arrays.copyOfRange(x, a, b), Arrays.copyOfRange(m, a, b));
    }

    /** The sagging envelope of a span of a line: what the bottom bars must resist, mMax (negative where none). */
    public static Envelope sagging(LineResult r, int span) {
        return of(r, span, true);
    }

    /**
     * The hogging envelope of a span of a line: what the top bars must resist, −mMin (negative where none),
     * left unclipped so that a crossing of zero, the point of inflection, is read between stations.
     */
    public static Envelope hogging(LineResult r, int span) {
        return of(r, span, false);
    }

    private static Envelope of(LineResult r, int span, boolean sagging) {
        var in = r.stations().stream().filter(s -> s.segment() == span).toList();
        double[] x = new double[in.size()];
        double[] m = new double[in.size()];
        for (int i = 0; i < in.size(); i++) {
            x[i] = in.get(i).x();
            m[i] = sagging ? in.get(i).mMax() : -in.get(i).mMin();
        }
        return new Envelope(x, m);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Envelope e && Arrays.equals(x, e.x) && Arrays.equals(m, e.m);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(x) + Arrays.hashCode(m);
    }

    @Override
    public String toString() {
        return "Envelope" + Arrays.toString(x) + Arrays.toString(m);
    }
}
