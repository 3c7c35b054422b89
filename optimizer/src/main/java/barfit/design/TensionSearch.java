package barfit.design;

import barfit.catalogs.BarSize;
import barfit.section.BeamSection;
import barfit.section.Detailing;
import barfit.section.SectionProbe;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Within one section frame: the fewest tension bars of one size, and their split over layers, that
 * pass flexure, ductility and minimum steel, for a given compression side. The bars sit where the
 * layout rules put them (first layer at cover + stirrup + db/2, each further layer a gap further in).
 *
 * <p>phi Mn can fall as bars are added in the transition zone, so bisection runs on the conditions
 * that only get easier with more bars (0.90 Mn >= Mu, minimum steel), and a short upward scan settles
 * phi; eps_t only falls with more bars, so the scan stops as soon as no split of a count is ductile.
 */
public final class TensionSearch {
    /** The outcome of trying every split of one count. */
    public record Split(int[] counts, boolean anyDuctile) {}

    private final SectionProbe probe;
    private final double mu;
    private Detailing det;
    private double[] compFromFace = new double[0];
    private double[] compArea = new double[0];
    private double[] compDb = new double[0];

    public TensionSearch(SectionProbe probe, double mu) {
        this.probe = probe;
        this.mu = mu;
    }

    /** The probe must already be framed for this section; {@code det} gives the bar positions. */
    public TensionSearch frame(Detailing detailing) {
        this.det = detailing;
        return this;
    }

    /** The compression-face bars, layers from the face inward (may be empty). */
    public TensionSearch compression(List<BeamSection.BarGroup> groups) {
        compFromFace = new double[groups.size()];
        compArea = new double[groups.size()];
        compDb = new double[groups.size()];
        double y = 0;
        double prevDb = 0;
        for (int i = 0; i < groups.size(); i++) {
            BeamSection.BarGroup g = groups.get(i);
            double db = g.bar().diameter();
            y = i == 0 ? det.firstLayerCentroid(db) : y + prevDb / 2 + det.layerGap() + db / 2;
            compFromFace[i] = y;
            compArea[i] = g.count() * g.bar().area();
            compDb[i] = db;
            prevDb = db;
        }
        return this;
    }

    /** Puts the tension bars and the compression bars in the probe and solves. */
    public void place(BarSize t, int[] counts) {
        probe.clear();
        double y = det.firstLayerCentroid(t.diameter());
        for (int i = 0; i < counts.length; i++) {
            if (i > 0) {
                y += t.diameter() + det.layerGap();
            }
            probe.add(y, true, counts[i] * t.area(), t.diameter());
        }
        for (int i = 0; i < compArea.length; i++) {
            probe.add(compFromFace[i], false, compArea[i], compDb[i]);
        }
        probe.solve();
    }

    /** Effective depth and tension area of the bars last placed (for the shear checks). */
    public double d() {
        return probe.d();
    }

    public double tensionArea() {
        return probe.tensionArea();
    }

    public boolean passesAll() {
        return probe.ductilityOk() && probe.strengthOk(mu) && probe.minSteelOk(mu);
    }

    private boolean couldPass(BarSize t, int[] counts) {
        place(t, counts);
        return probe.strengthPossible(mu) && probe.minSteelOk(mu);
    }

    /**
     * Whether some split of n bars meets the steady conditions. The bottom-heavy split is the
     * strongest, but a more even split has a smaller d and so a smaller As,min (9.6.1.2).
     */
    private boolean couldPassAny(BarSize t, int n, int layers, int nmax, int first) {
        int[] greedy = greedySplit(n, layers, nmax, first);
        if (greedy != null && couldPass(t, greedy)) {
            return true;
        }
        if (layers == 1) {
            return false;
        }
        for (int[] alt : splits(n, layers, nmax, first)) {
            if ((greedy == null || !Arrays.equals(alt, greedy)) && couldPass(t, alt)) {
                return true;
            }
        }
        return false;
    }

    /** Fewest tension bars (with their split) that pass; null if none does. */
    public int[] minCounts(BarSize t, int nmax, int ncr, int layers, int hiLimit) {
        int first = Math.max(2, ncr);
        int lo = first + 2 * (layers - 1);
        int hi = Math.min(hiLimit, layers * nmax);
        if (hi < lo || !couldPassAny(t, hi, layers, nmax, first)) {
            hi = layers * nmax;
            if (!couldPassAny(t, hi, layers, nmax, first)) {
                return null;
            }
        }
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (couldPassAny(t, mid, layers, nmax, first)) {
                hi = mid;
            } else {
                lo = mid + 1;
            }
        }
        for (int n = lo; n <= layers * nmax; n++) {
            Split s = passingSplit(t, n, layers, nmax, first);
            if (s.counts() != null) {
                return s.counts();
            }
            if (!s.anyDuctile()) {
                return null;
            }
        }
        return null;
    }

    /**
     * A split of n bars that passes (bottom-heavy first) and whether any split of n is ductile. The
     * probe is left holding the passing split.
     */
    public Split passingSplit(BarSize t, int n, int layers, int nmax, int first) {
        boolean anyDuctile = false;
        int[] greedy = greedySplit(n, layers, nmax, first);
        if (greedy != null) {
            place(t, greedy);
            anyDuctile = probe.ductilityOk();
            if (anyDuctile && passesAll()) {
                return new Split(greedy, true);
            }
        }
        for (int[] alt : splits(n, layers, nmax, first)) {
            if (greedy != null && Arrays.equals(alt, greedy)) {
                continue;
            }
            place(t, alt);
            boolean ductile = probe.ductilityOk();
            anyDuctile |= ductile;
            if (ductile && passesAll()) {
                return new Split(alt, true);
            }
        }
        return new Split(null, anyDuctile);
    }

    /**
     * Every split of n bars that passes, at most one per first-layer count (the deepest such), bottom
     * heavy first: the first layer decides how many stirrup legs the bars need, and at a support how
     * many continuous bars it can hold.
     */
    public List<int[]> passingSplits(BarSize t, int n, int layers, int nmax, int first) {
        List<int[]> out = new ArrayList<>();
        java.util.Set<Integer> firsts = new java.util.HashSet<>();
        for (int[] s : splits(n, layers, nmax, first)) {
            if (firsts.contains(s[0])) {
                continue;
            }
            place(t, s);
            if (passesAll()) {
                out.add(s);
                firsts.add(s[0]);
            }
        }
        return out;
    }

    /** The bottom-heavy split of n bars over the layers, or null if none is valid. */
    public static int[] greedySplit(int n, int layers, int nmax, int first) {
        int[] out = new int[layers];
        int rest = n;
        for (int i = 0; i < layers; i++) {
            int reserve = 2 * (layers - 1 - i);
            int cap = i == 0 ? nmax : out[i - 1];
            int v = Math.min(cap, rest - reserve);
            if (v < 2 || (i == 0 && v < first)) {
                return null;
            }
            out[i] = v;
            rest -= v;
        }
        return rest == 0 ? out : null;
    }

    /** All splits of n into non-increasing layer counts, each >= 2, the first in [first, nmax]. */
    public static List<int[]> splits(int n, int layers, int nmax, int first) {
        List<int[]> out = new ArrayList<>();
        splitInto(n, layers, nmax, new int[layers], 0, out);
        out.removeIf(s -> s[0] < first);
        return out;
    }

    private static void splitInto(int rest, int layers, int cap, int[] cur, int i, List<int[]> out) {
        if (i == layers) {
            if (rest == 0) {
                out.add(cur.clone());
            }
            return;
        }
        int reserve = 2 * (layers - 1 - i);
        for (int v = Math.min(cap, rest - reserve); v >= 2; v--) {
            cur[i] = v;
            splitInto(rest - v, layers, v, cur, i + 1, out);
        }
    }

    public static List<Integer> toList(int[] counts) {
        List<Integer> l = new ArrayList<>(counts.length);
        for (int c : counts) {
            l.add(c);
        }
        return l;
    }
}
