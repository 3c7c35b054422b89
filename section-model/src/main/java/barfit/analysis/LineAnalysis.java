package barfit.analysis;

import barfit.section.LoadCombinations;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;

/**
 * Gravity analysis of a beam line by the stiffness method: every support holds the line vertically, so
 * the unknowns are the rotations of the supports; a column restrains its support's rotation with 4 EI / H
 * (far end fixed), a fixed support fully, a knife edge or wall not at all. The matrix work is Commons
 * Math's LU decomposition; the beam element (slope-deflection with fixed-end moments) is ours.
 *
 * <p>Loads are analysed once per basic case (all dead load; the live load on each segment; the live load
 * on each half of each span) and combined: 1.4 D (5.3.1a) and 1.2 D + 1.6 L (5.3.1b) with the live load
 * arranged as 6.4.2 permits for beams: on all spans, on alternate spans (both sets), on the two spans
 * beside each interior support, on each span alone, and on either half of each span alone (which gives
 * the shear near mid-span that full-span arrangements miss); each overhang loaded or not. Redistribution
 * (6.6.5) reduces the negative moment at a support by its percentage in each factored arrangement before
 * the envelope is taken, the span moments and shears following by equilibrium; the service arrangements
 * (deflection) keep their elastic moments.
 */
public final class LineAnalysis {
    /** Stations along every span at least (the code asks enough to find every maximum). */
    public static final int MIN_STATIONS_PER_SPAN = 20;

    private LineAnalysis() {}

    // ------------------------------------------------------------------ basic cases

    /** A basic load case: loads with factor 1 (their dead or live part only). */
    record Case(String name, List<Load> loads) {}

    /** Bending moments at the two ends of every segment for a case (sagging positive), N·mm. */
    record EndMoments(double[] left, double[] right) {}

    /** A factored combination of basic cases; {@code nz} the cases it takes (non-zero factors), in order. */
    /**
     * A combination of the basic cases: its name, factor per case and the cases with a factor; {@code
     * factored} for the strength combinations of 5.3.1, false for the service arrangements, to which
     * redistribution (6.6.5, a strength provision) does not apply: deflection takes the elastic moments.
     */
    record Combo(String name, double[] coef, int[] nz, boolean factored) {
        Combo(String name, double[] coef) {
            this(name, coef, nonZero(coef), true);
        }

        Combo(String name, double[] coef, boolean factored) {
            this(name, coef, nonZero(coef), factored);
        }

        private static int[] nonZero(double[] coef) {
            int n = 0;
            for (double c : coef) {
                if (c != 0) {
                    n++;
                }
            }
            int[] out = new int[n];
            int k = 0;
            for (int i = 0; i < coef.length; i++) {
                if (coef[i] != 0) {
                    out[k++] = i;
                }
            }
            return out;
        }
    }

    public static LineResult analyse(Line line) {
        return analyse(line, 50);
    }

    public static LineResult analyse(Line line, int stationsPerSpan) {
        return analyseEach(line, java.util.Collections.singletonList(line.redistribution()), stationsPerSpan)
                .get(0);
    }

    /**
     * The line analysed once and its envelope taken for each redistribution given (percent per support,
     * null for none): the basic cases, their solution and the statics at the stations do not depend on it,
     * so they are shared; each result is what {@link #analyse(Line, int)} gives for that redistribution.
     */
    public static List<LineResult> analyseEach(Line line, List<List<Double>> redistributions, int stationsPerSpan) {
        int per = Math.max(MIN_STATIONS_PER_SPAN, stationsPerSpan);
        List<Case> cases = cases(line);
        EndMoments[] ends = new EndMoments[cases.size()];
        for (int c = 0; c < cases.size(); c++) {
            ends[c] = solve(line, cases.get(c).loads());
        }
        List<Station> stations = stations(line, per);
        int ns = stations.size();
        // simple-span (or cantilever) moments and shears of every case at every station
        double[][] m = new double[cases.size()][ns];
        double[][] vl = new double[cases.size()][ns];
        double[][] vr = new double[cases.size()][ns];
        for (int c = 0; c < cases.size(); c++) {
            List<List<Load>> bySegment = new ArrayList<>();
            for (int s = 0; s < line.segments(); s++) {
                bySegment.add(onSegment(cases.get(c).loads(), s));
            }
            double[] ra = new double[line.segments()];
            for (int s = 0; s < line.segments(); s++) {
                ra[s] = spanReaction(line, s, bySegment.get(s));
            }
            for (int k = 0; k < ns; k++) {
                Station st = stations.get(k);
                List<Load> on = bySegment.get(st.segment());
                m[c][k] = staticMoment(line, st.segment(), on, st.local(), ra[st.segment()]);
                vl[c][k] = staticShear(line, st.segment(), on, st.local(), false, ra[st.segment()]);
                vr[c][k] = staticShear(line, st.segment(), on, st.local(), true, ra[st.segment()]);
            }
        }
        List<Combo> combos = combos(line, cases);
        List<Combo> service = serviceCombos(line, cases);
        double[][] serviceM = LineResult.serviceMoments(line, cases, ends, stations, m, service);
        List<LineResult> out = new ArrayList<>();
        for (List<Double> r : redistributions) {
            out.add(LineResult.build(
                    line.withRedistribution(r), cases, ends, stations, m, vl, vr, combos, service, serviceM));
        }
        return out;
    }

    /** The basic cases: D, then L per segment, then L on each half of each span. */
    static List<Case> cases(Line line) {
        List<Case> out = new ArrayList<>();
        List<Load> dead = new ArrayList<>();
        for (Load l : line.loads()) {
            if (l.dead() != 0) {
                dead.add(l.part(false, 1));
            }
        }
        out.add(new Case("D", dead));
        int n = line.spanCount();
        for (int s = 0; s < line.segments(); s++) {
            out.add(new Case("L" + s, live(line, s, 0, Double.POSITIVE_INFINITY)));
        }
        for (int s = 1; s <= n; s++) {
            double half = line.length(s) / 2;
            out.add(new Case("L" + s + "a", live(line, s, 0, half)));
            out.add(new Case("L" + s + "b", live(line, s, half, Double.POSITIVE_INFINITY)));
        }
        return out;
    }

    /** The live part of the loads on a segment within [lo, hi) of its length. */
    private static List<Load> live(Line line, int segment, double lo, double hi) {
        List<Load> out = new ArrayList<>();
        for (Load l : line.loads()) {
            if (l.segment() != segment || l.live() == 0) {
                continue;
            }
            if (l.point()) {
                if (l.from() >= lo && l.from() < hi) {
                    out.add(l.part(true, 1));
                }
            } else {
                double a = Math.max(l.from(), lo);
                double b = Math.min(l.to(), hi);
                if (b > a) {
                    out.add(Load.uniform(segment, a, b, 0, l.live()));
                }
            }
        }
        return out;
    }

    static int caseIndexLive(int segment) {
        return 1 + segment;
    }

    static int caseIndexHalf(Line line, int span, boolean right) {
        return 1 + line.segments() + 2 * (span - 1) + (right ? 1 : 0);
    }

    /** The combinations of 5.3.1 with the live-load arrangements of 6.4.2 (see the class comment). */
    static List<Combo> combos(Line line, List<Case> cases) {
        int n = line.spanCount();
        List<Combo> out = new ArrayList<>();
        double[] only = new double[cases.size()];
        only[0] = LoadCombinations.DEAD_ALONE;
        out.add(new Combo("1.4D", only));
        List<String> names = new ArrayList<>();
        List<boolean[]> spanSets = new ArrayList<>();
        boolean[] all = new boolean[n + 1];
        for (int s = 1; s <= n; s++) {
            all[s] = true;
        }
        names.add("all spans");
        spanSets.add(all);
        if (n >= 2) {
            for (int parity = 1; parity <= 2; parity++) {
                boolean[] alt = new boolean[n + 1];
                StringBuilder nm = new StringBuilder(n - parity < 2 ? "span" : "spans");
                for (int s = parity; s <= n; s += 2) {
                    alt[s] = true;
                    nm.append(s == parity ? " " : ",").append(s);
                }
                names.add(nm.toString());
                spanSets.add(alt);
            }
            for (int s = 1; s < n; s++) {
                boolean[] pair = new boolean[n + 1];
                pair[s] = true;
                pair[s + 1] = true;
                names.add("spans " + s + "-" + (s + 1));
                spanSets.add(pair);
            }
            for (int s = 1; s <= n; s++) {
                boolean[] one = new boolean[n + 1];
                one[s] = true;
                names.add("span " + s);
                spanSets.add(one);
            }
        }
        List<int[]> overhangSets = new ArrayList<>();
        overhangSets.add(new int[0]);
        boolean left = line.overhangLeft() > 0;
        boolean right = line.overhangRight() > 0;
        if (left) {
            overhangSets.add(new int[] {0});
        }
        if (right) {
            overhangSets.add(new int[] {n + 1});
        }
        if (left && right) {
            overhangSets.add(new int[] {0, n + 1});
        }
        // the same set of spans reached twice (alternate spans of a short line, a pair that is the whole
        // line...) is one arrangement, named the first way
        List<String> seen = new ArrayList<>();
        for (int i = 0; i < spanSets.size(); i++) {
            String key = java.util.Arrays.toString(spanSets.get(i));
            if (seen.contains(key)) {
                continue;
            }
            seen.add(key);
            for (int[] oh : overhangSets) {
                double[] k = new double[cases.size()];
                k[0] = LoadCombinations.DEAD_WITH_LIVE;
                for (int s = 1; s <= n; s++) {
                    if (spanSets.get(i)[s]) {
                        k[caseIndexLive(s)] = LoadCombinations.LIVE;
                    }
                }
                for (int o : oh) {
                    k[caseIndexLive(o)] = LoadCombinations.LIVE;
                }
                out.add(new Combo("1.2D+1.6L " + names.get(i) + overhangWords(oh, n), k));
            }
        }
        // either half of each span alone, for the shear near mid-span
        for (int s = 1; s <= n; s++) {
            for (boolean r : new boolean[] {false, true}) {
                double[] k = new double[cases.size()];
                k[0] = LoadCombinations.DEAD_WITH_LIVE;
                k[caseIndexHalf(line, s, r)] = LoadCombinations.LIVE;
                out.add(new Combo("1.2D+1.6L " + (r ? "right" : "left") + " half of span " + s, k));
            }
        }
        return out;
    }

    /** Service arrangements: D alone and D + L in every arrangement of {@link #combos} (factors 1). */
    static List<Combo> serviceCombos(Line line, List<Case> cases) {
        List<Combo> out = new ArrayList<>();
        for (Combo c : combos(line, cases)) {
            double[] k = new double[c.coef().length];
            for (int i = 0; i < k.length; i++) {
                k[i] = c.coef()[i] == 0 ? 0 : 1;
            }
            String name = c.name().equals("1.4D") ? "D" : c.name().replace("1.2D+1.6L", "D+L");
            out.add(new Combo(name, k, false));
        }
        return out;
    }

    private static String overhangWords(int[] oh, int n) {
        if (oh.length == 0) {
            return "";
        }
        if (oh.length == 2) {
            return " + both overhangs";
        }
        return oh[0] == 0 ? " + left overhang" : " + right overhang";
    }

    // ------------------------------------------------------------------ the stiffness solution

    /**
     * The end moments of every segment under one set of loads: support rotations from the joint
     * equilibrium (slope-deflection, no sway), overhang roots by statics.
     */
    static EndMoments solve(Line line, List<Load> loads) {
        int n = line.spanCount();
        int nodes = n + 1;
        double[] fLeft = new double[n + 1];
        double[] fRight = new double[n + 1];
        double[] joint = new double[nodes]; // constant moments on the joints (clockwise on members)
        for (int s = 1; s <= n; s++) {
            double[] fem = fixedEndMoments(line.length(s), onSegment(loads, s));
            fLeft[s] = fem[0];
            fRight[s] = fem[1];
            joint[s - 1] += fem[0];
            joint[s] += fem[1];
        }
        double rootLeft = staticMoment(line, 0, onSegment(loads, 0), line.overhangLeft());
        double rootRight = staticMoment(line, n + 1, onSegment(loads, n + 1), 0);
        // an overhang's end moment at its support, clockwise on the overhang
        joint[0] += -rootLeft;
        joint[n] += rootRight;
        // unknown rotations of supports that are not fixed
        int[] dof = new int[nodes];
        int free = 0;
        for (int j = 0; j < nodes; j++) {
            dof[j] = line.supports().get(j).kind() == SupportKind.FIXED ? -1 : free++;
        }
        double[] theta = new double[nodes];
        if (free > 0) {
            RealMatrix k = new Array2DRowRealMatrix(free, free);
            double[] rhs = new double[free];
            for (int s = 1; s <= n; s++) {
                double stiff = 2 * line.spanEI().get(s - 1) / line.length(s);
                int a = dof[s - 1];
                int b = dof[s];
                if (a >= 0) {
                    k.addToEntry(a, a, 2 * stiff);
                    if (b >= 0) {
                        k.addToEntry(a, b, stiff);
                    }
                }
                if (b >= 0) {
                    k.addToEntry(b, b, 2 * stiff);
                    if (a >= 0) {
                        k.addToEntry(b, a, stiff);
                    }
                }
            }
            for (int j = 0; j < nodes; j++) {
                if (dof[j] < 0) {
                    continue;
                }
                k.addToEntry(dof[j], dof[j], columnStiffness(line, j));
                rhs[dof[j]] = -joint[j];
            }
            DecompositionSolver solver = new LUDecomposition(k).getSolver();
            if (!solver.isNonSingular()) {
                throw new IllegalArgumentException("the line is unstable: its supports do not hold it");
            }
            double[] x = solver.solve(new ArrayRealVector(rhs, false)).toArray();
            for (int j = 0; j < nodes; j++) {
                theta[j] = dof[j] < 0 ? 0 : x[dof[j]];
            }
        }
        double[] left = new double[n + 2];
        double[] right = new double[n + 2];
        for (int s = 1; s <= n; s++) {
            double stiff = 2 * line.spanEI().get(s - 1) / line.length(s);
            double mij = fLeft[s] + stiff * (2 * theta[s - 1] + theta[s]);
            double mji = fRight[s] + stiff * (2 * theta[s] + theta[s - 1]);
            left[s] = mij; // clockwise on the member's left end is sagging there
            right[s] = -mji;
        }
        left[0] = 0;
        right[0] = rootLeft;
        left[n + 1] = rootRight;
        right[n + 1] = 0;
        return new EndMoments(left, right);
    }

    /** Rotational stiffness of the columns at a support: 4 EI / H each, far ends fixed. */
    static double columnStiffness(Line line, int support) {
        Support s = line.supports().get(support);
        if (s.kind() != SupportKind.COLUMN) {
            return 0;
        }
        double k = 0;
        for (Column c : new Column[] {s.below(), s.above()}) {
            if (c != null) {
                k += 4 * Stiffness.columnEI(line.ec(), c) / c.height();
            }
        }
        return k;
    }

    /**
     * Fixed-end moments of a span (clockwise positive on the member): a point load P at a gives
     * −P a b² / L² and +P a² b / L²; a uniform load is the same integrated over its length.
     */
    static double[] fixedEndMoments(double len, List<Load> loads) {
        double left = 0;
        double right = 0;
        double l2 = len * len;
        for (Load ld : loads) {
            double w = ld.dead() + ld.live();
            if (ld.point()) {
                double a = ld.from();
                double b = len - a;
                left -= w * a * b * b / l2;
                right += w * a * a * b / l2;
            } else {
                left -= w * (primLeft(len, ld.to()) - primLeft(len, ld.from())) / l2;
                right += w * (primRight(len, ld.to()) - primRight(len, ld.from())) / l2;
            }
        }
        return new double[] {left, right};
    }

    /** ∫ ξ (L − ξ)² dξ. */
    private static double primLeft(double l, double x) {
        return l * l * x * x / 2 - 2 * l * x * x * x / 3 + x * x * x * x / 4;
    }

    /** ∫ ξ² (L − ξ) dξ. */
    private static double primRight(double l, double x) {
        return l * x * x * x / 3 - x * x * x * x / 4;
    }

    // ------------------------------------------------------------------ statics of one segment

    static List<Load> onSegment(List<Load> loads, int segment) {
        List<Load> out = new ArrayList<>();
        for (Load l : loads) {
            if (l.segment() == segment) {
                out.add(l);
            }
        }
        return out;
    }

    /**
     * The moment at a position of a segment from its own loads alone: for a span, simply supported at its
     * supports' centre lines; for an overhang, a cantilever from its support. Sagging positive.
     */
    static double staticMoment(Line line, int segment, List<Load> loads, double x) {
        return staticMoment(line, segment, loads, x, spanReaction(line, segment, loads));
    }

    /** The left reaction of a span's loads alone (simply supported), 0 for an overhang: what statics reuse. */
    static double spanReaction(Line line, int segment, List<Load> loads) {
        double len = line.length(segment);
        return segment == 0 || segment == line.spanCount() + 1 || len == 0 ? 0 : leftReaction(len, loads);
    }

    /** As {@link #staticMoment(Line, int, List, double)} with the span's left reaction {@code ra} known. */
    static double staticMoment(Line line, int segment, List<Load> loads, double x, double ra) {
        double len = line.length(segment);
        if (len == 0) {
            return 0;
        }
        int n = line.spanCount();
        double mo = 0;
        if (segment == 0) {
            return -momentOfLoadsBefore(loads, x);
        }
        if (segment == n + 1) {
            for (Load l : loads) {
                double w = l.dead() + l.live();
                if (l.point()) {
                    if (l.from() > x) {
                        mo -= w * (l.from() - x);
                    }
                } else if (l.to() > x) {
                    double u = Math.max(x, l.from());
                    mo -= w * ((l.to() * l.to() - u * u) / 2 - x * (l.to() - u));
                }
            }
            return mo;
        }
        return ra * x - momentOfLoadsBefore(loads, x);
    }

    /** The left reaction of a simply supported span of length {@code len} under its loads. */
    private static double leftReaction(double len, List<Load> loads) {
        double ra = 0;
        for (Load l : loads) {
            double w = l.dead() + l.live();
            if (l.point()) {
                ra += w * (len - l.from()) / len;
            } else {
                ra += w * ((len * l.to() - l.to() * l.to() / 2) - (len * l.from() - l.from() * l.from() / 2)) / len;
            }
        }
        return ra;
    }

    /** The moment about x of the loads (or parts of loads) to the left of x, downward loads positive. */
    private static double momentOfLoadsBefore(List<Load> loads, double x) {
        double mo = 0;
        for (Load l : loads) {
            double w = l.dead() + l.live();
            if (l.point()) {
                if (l.from() < x) {
                    mo += w * (x - l.from());
                }
            } else if (x > l.from()) {
                double u = Math.min(x, l.to());
                mo += w * (x * (u - l.from()) - (u * u - l.from() * l.from()) / 2);
            }
        }
        return mo;
    }

    /**
     * The shear (dM/dx) at a position of a segment from its own loads alone, just left of it or, with
     * {@code rightLimit}, just right of it (a point load there counts only from the right).
     */
    static double staticShear(Line line, int segment, List<Load> loads, double x, boolean rightLimit) {
        return staticShear(line, segment, loads, x, rightLimit, spanReaction(line, segment, loads));
    }

    /** As {@link #staticShear(Line, int, List, double, boolean)} with the span's left reaction known. */
    static double staticShear(Line line, int segment, List<Load> loads, double x, boolean rightLimit, double ra) {
        double len = line.length(segment);
        if (len == 0) {
            return 0;
        }
        int n = line.spanCount();
        double v = 0;
        if (segment == n + 1) {
            for (Load l : loads) {
                double w = l.dead() + l.live();
                if (l.point()) {
                    if (l.from() > x || l.from() == x && !rightLimit) {
                        v += w;
                    }
                } else if (l.to() > x) {
                    v += w * (l.to() - Math.max(x, l.from()));
                }
            }
            return v;
        }
        if (segment != 0) {
            v = ra;
        }
        for (Load l : loads) {
            double w = l.dead() + l.live();
            if (l.point()) {
                if (l.from() < x || l.from() == x && rightLimit) {
                    v -= w;
                }
            } else if (x > l.from()) {
                v -= w * (Math.min(x, l.to()) - l.from());
            }
        }
        return v;
    }

    // ------------------------------------------------------------------ stations

    /** A place where the envelope is taken: segment, position in it (mm) and along the line. */
    public record Station(int segment, double local, double x) {}

    /**
     * Stations: {@code per} equal steps over every span and proportionally many over the overhangs, plus
     * every point load, every support face and the face plus d, without repeats.
     */
    static List<Station> stations(Line line, int per) {
        List<Station> out = new ArrayList<>();
        int n = line.spanCount();
        for (int s = 0; s < line.segments(); s++) {
            double len = line.length(s);
            if (len == 0) {
                continue;
            }
            TreeSet<Double> xs = new TreeSet<>();
            int steps = s >= 1 && s <= n
                    ? per
                    : Math.max(4, (int) Math.ceil(per * len / line.spans().get(0)));
            for (int i = 0; i <= steps; i++) {
                xs.add(round(len * i / steps));
            }
            for (Load l : line.loads()) {
                if (l.segment() == s) {
                    xs.add(round(l.from()));
                    if (!l.point()) {
                        xs.add(round(l.to()));
                    }
                }
            }
            if (s >= 1 && s <= n) {
                double wl = line.supports().get(s - 1).width() / 2;
                double wr = line.supports().get(s).width() / 2;
                for (double x : new double[] {wl, wl + line.d(), len - wr, len - wr - line.d()}) {
                    if (x > 0 && x < len) {
                        xs.add(round(x));
                    }
                }
            }
            for (double x : xs) {
                if (x >= 0 && x <= len) {
                    out.add(new Station(s, x, line.globalX(s, x)));
                }
            }
        }
        return out;
    }

    private static double round(double x) {
        return Math.rint(x * 1e6) / 1e6;
    }
}
