package barfit.design;

import barfit.catalogs.BarSize;
import barfit.section.BarLayer;
import barfit.section.BarSpacing;
import barfit.section.BeamSection;
import barfit.section.Bending;
import barfit.section.CheckResult;
import barfit.section.Detailing;
import barfit.section.SectionChecks;
import barfit.section.SectionProbe;
import barfit.section.SectionShape;
import barfit.section.StrengthBound;
import barfit.section.ShearVerdict;
import barfit.section.SkinBars;
import barfit.section.Stirrups;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Asks the section model only what it must to find, for every distinct (width, height, tension bar
 * size), the cheapest passing layout, and skips whatever a cost bound proves cannot beat the
 * {@code keep}-th cheapest found so far.
 *
 * <p>What it relies on (each exploited rule is re-checked against plain enumeration in the tests):
 * <ul>
 * <li>cost grows with every bar, with the width, the depth and the stirrup density;</li>
 * <li>for one frame, tension bar size, layer count and compression layer, phi Mn and As grow with the
 * number of tension bars while eps_t falls, so the passing counts form an interval whose lower end is
 * found by bisection; among the splits of one count over the layers, the bottom-heavy split is the
 * strongest, and the others are tried when it is not ductile enough;</li>
 * <li>any passing section needs sum(As) >= Mu / (0.9 fy d_max): a lower bound on its steel.</li>
 * </ul>
 */
public final class CandidateGenerator {
    /** What the generation did, for the proof statement and the benchmark. */
    public record Stats(int frames, int framesEvaluated, int framesPrunedByBound, int framesFailingFrameChecks,
            int flexureSolves, int shearEvaluations, int candidates, long nanos) {
    }

    public record Output(List<Candidate> candidates, Stats stats) {
    }

    private final SectionProblem p;
    private final CostModel cost;
    private final SectionProbe probe;
    private final Bending bending;
    private final List<BarSize> tensionSizes;
    private final List<BarSize> compressionSizes;
    private final BarSize smallestTension;
    private int shearEvaluations;

    /** Best candidate per distinct key, in discovery order. */
    private final Map<String, Candidate> best = new LinkedHashMap<>();
    private int keep;
    private double cachedBound = Double.POSITIVE_INFINITY;
    private boolean boundDirty = true;

    public CandidateGenerator(SectionProblem problem, CostModel cost) {
        this.p = problem;
        this.cost = cost;
        this.probe = new SectionProbe(problem.materials(), problem.code());
        this.bending = problem.bending();
        this.tensionSizes = problem.space().barSizes();
        List<BarSize> comp = new ArrayList<>(problem.space().compressionSizes());
        comp.sort(Comparator.comparingDouble(BarSize::massPerMetre));
        this.compressionSizes = comp;
        this.smallestTension = tensionSizes.stream().min(Comparator.comparingDouble(BarSize::diameter)).orElseThrow();
    }

    /** A concrete frame: width, height and the stirrup bar that positions the main bars. */
    private record Frame(double b, double h, BarSize stirrupBar, Detailing det, CostBreakdown frameCost,
            SkinBars skin, double skinCost, double lowerBound, double tensionAreaLb, double cheapestStirrups,
            double[] stirrupLb) {
        /** The stirrup lower bound, made tight (one shear search) only when the frame is reached. */
        double stirrupLb(CandidateGenerator g) {
            if (Double.isNaN(stirrupLb[0])) {
                Stirrups s = g.cheapestStirrups(b, h, det, h - det.firstLayerCentroid(g.smallestTension.diameter()),
                        g.maxTensionArea(b, det));
                stirrupLb[0] = s == null ? Double.POSITIVE_INFINITY : g.cost.stirrups(b, h, s);
            }
            return stirrupLb[0];
        }

        double tightLowerBound(CandidateGenerator g) {
            return lowerBound - cheapestStirrups + stirrupLb(g);
        }
    }

    public Output generate(int keepDistinct) {
        long t0 = System.nanoTime();
        this.keep = Math.max(1, keepDistinct);
        List<Frame> frames = frames();
        int evaluated = 0;
        int pruned = 0;
        int frameFails = 0;
        for (int i = 0; i < frames.size(); i++) {
            Frame f = frames.get(i);
            if (f.lowerBound() > bound() || Double.isInfinite(f.lowerBound())) {
                pruned += frames.size() - i;
                break;
            }
            if (f.tightLowerBound(this) > bound()) {
                pruned++;
                continue;
            }
            evaluated++;
            if (!evaluateFrame(f)) {
                frameFails++;
            }
        }
        List<Candidate> out = new ArrayList<>(best.values());
        out.sort(Comparator.comparingLong(Candidate::units).thenComparing(c -> c.layout().distinctKey()));
        return new Output(out, new Stats(frames.size(), evaluated, pruned, frameFails, probe.solves(),
                shearEvaluations, out.size(), System.nanoTime() - t0));
    }

    /** The keep-th cheapest distinct cost found so far (infinite until there are that many). */
    private double bound() {
        if (!boundDirty) {
            return cachedBound;
        }
        boundDirty = false;
        if (best.size() < keep) {
            cachedBound = Double.POSITIVE_INFINITY;
            return cachedBound;
        }
        double[] costs = new double[best.size()];
        int i = 0;
        for (Candidate c : best.values()) {
            costs[i++] = c.cost().total();
        }
        Arrays.sort(costs);
        cachedBound = costs[keep - 1] + 1e-9;
        return cachedBound;
    }

    private List<Frame> frames() {
        List<Frame> out = new ArrayList<>();
        double cover = p.detailing().cover();
        double dbMin = Double.MAX_VALUE;
        double massPerArea = Double.MAX_VALUE;
        for (BarSize bs : tensionSizes) {
            dbMin = Math.min(dbMin, bs.diameter());
            massPerArea = Math.min(massPerArea, bs.massPerMetre() / bs.area());
        }
        for (BarSize bs : compressionSizes) {
            massPerArea = Math.min(massPerArea, bs.massPerMetre() / bs.area());
        }
        double minPair = 2 * tensionSizes.stream().mapToDouble(BarSize::area).min().orElse(0)
                + 2 * compressionSizes.stream().mapToDouble(BarSize::area).min().orElse(0);
        BarSize smallest = tensionSizes.stream().min(Comparator.comparingDouble(BarSize::diameter)).orElseThrow();
        for (double b : p.widths()) {
            for (double h : p.depths()) {
                if (p.flange() != null && h <= p.flange().thickness()) {
                    continue;
                }
                for (BarSize ds : p.space().stirrupSizes()) {
                    if (b <= 2 * (cover + ds.diameter()) + dbMin) {
                        continue;
                    }
                    Detailing det = new Detailing(cover, ds, p.detailing().layerGap(), p.detailing().exposure());
                    CostBreakdown fc = cost.frame(b, h, p.flange());
                    SkinBars skin = Layout.skinFor(h, smallest, det, p.materials(), p.code());
                    double skinCost = skin == null ? 0 : cost.bars(skin.bar(), 2 * Layout.skinBarsPerFace(h, skin.spacing()));
                    double areaLb = tensionAreaLowerBound(b, h, det, dbMin);
                    double steelLb = cost.rates().mainBarsPerKg() * cost.rates().lapFactor() * massPerArea
                            * Math.max(areaLb + 2 * compressionSizes.get(0).area(), minPair);
                    double cheapestStirrups = Double.POSITIVE_INFINITY;
                    for (int legs : p.space().stirrupLegs()) {
                        for (double sp : p.space().stirrupSpacings()) {
                            cheapestStirrups = Math.min(cheapestStirrups, cost.stirrups(b, h, new Stirrups(ds, legs, sp)));
                        }
                    }
                    double lb = fc.total() + skinCost + steelLb + cheapestStirrups;
                    out.add(new Frame(b, h, ds, det, fc, skin, skinCost, lb, areaLb, cheapestStirrups, new double[] {Double.NaN}));
                }
            }
        }
        out.sort(Comparator.comparingDouble(Frame::lowerBound).thenComparingDouble(Frame::b)
                .thenComparingDouble(Frame::h).thenComparingDouble(f -> f.stirrupBar().diameter()));
        return out;
    }

    /**
     * A lower bound on the tension-face steel area of any passing layout in this frame, from the
     * section model's {@link StrengthBound} (bars at most at fy, as deep as the smallest bar can sit,
     * the most compression steel that fits, the widest compression zone). Infinite if no area works.
     */
    private double tensionAreaLowerBound(double b, double h, Detailing det, double dbMin) {
        double compArea = 0;
        double dpMin = Double.MAX_VALUE;
        double dpMax = 0;
        for (BarSize c : compressionSizes) {
            int mm = BarSpacing.maxBars(b, det, c, p.materials(), p.code());
            if (mm >= 2) {
                compArea = Math.max(compArea, mm * c.area());
                dpMin = Math.min(dpMin, det.firstLayerCentroid(c.diameter()));
                dpMax = Math.max(dpMax, det.firstLayerCentroid(c.diameter()));
            }
        }
        if (compArea == 0) {
            return Double.POSITIVE_INFINITY;
        }
        double dMax = h - det.firstLayerCentroid(dbMin);
        double widest = p.flange() != null ? p.flange().width() : b;
        double fy = p.materials().fy();
        double ceiling = (0.85 * p.materials().fc() * widest * dMax + compArea * fy) / fy;
        return StrengthBound.minTensionArea(p.mu(), dMax, compArea, dpMin, dpMax, widest, p.materials().fc(), fy,
                ceiling);
    }

    /** The most tension steel any layout of this width can hold: the largest Vc any layout could have. */
    private double maxTensionArea(double b, Detailing det) {
        double asMax = 0;
        for (BarSize t : tensionSizes) {
            int n = BarSpacing.maxBars(b, det, t, p.materials(), p.code());
            asMax = Math.max(asMax, p.space().maxLayers() * n * t.area());
        }
        return asMax;
    }

    /**
     * The cheapest stirrup option that passes the shear checks (or, without Vu, the minimum-stirrup
     * rule) for tension steel As at effective depth d. Per number of legs, strength and minimum area
     * only get easier as the spacing closes, so the widest spacing meeting them is found by bisection;
     * the spacing limits of 9.7.6.2.2 (which halve when Vs is high) are then settled by stepping down.
     */
    private Stirrups cheapestStirrups(double b, double h, Detailing det, double d, double as) {
        SectionShape shape = new SectionShape(b, h, p.flange());
        List<Double> spacings = p.space().stirrupSpacings();
        Stirrups best = null;
        double bestCost = Double.POSITIVE_INFINITY;
        for (int legs : p.space().stirrupLegs()) {
            int lo = -1;
            int hi = spacings.size() - 1;
            while (lo < hi) {
                int mid = (lo + hi + 1) >>> 1;
                if (verdict(shape, det, new Stirrups(det.stirrupBar(), legs, spacings.get(mid)), d, as).strengthAndMinimum()) {
                    lo = mid;
                } else {
                    hi = mid - 1;
                }
            }
            for (int i = lo; i >= 0; i--) {
                Stirrups st = new Stirrups(det.stirrupBar(), legs, spacings.get(i));
                double c = cost.stirrups(b, h, st);
                if (c >= bestCost) {
                    break;
                }
                if (verdict(shape, det, st, d, as).all()) {
                    best = st;
                    bestCost = c;
                    break;
                }
            }
        }
        return best;
    }

    private ShearVerdict verdict(SectionShape shape, Detailing det, Stirrups st, double d, double as) {
        BeamSection s = new BeamSection(shape, p.materials(), det, List.of(), st, null, p.code());
        shearEvaluations++;
        return p.vu() == null ? SectionChecks.minimumStirrupsVerdict(s, d, as) : SectionChecks.shearVerdict(s, p.vu(), d, as);
    }

    /** A compression layer option: bar size and count, with its cost per metre. */
    private record Comp(BarSize bar, int count, double cost) {
    }

    /** Evaluates one frame; false when its frame-level checks rule it out entirely. */
    private boolean evaluateFrame(Frame f) {
        SectionShape shape = new SectionShape(f.b(), f.h(), p.flange());
        probe.frame(shape, bending, p.span());
        boolean anyFramePass = false;
        Map<String, Stirrups> stirrupCache = new HashMap<>();
        Map<String, Boolean> frameCheckCache = new HashMap<>();
        double base = f.frameCost().total() + f.skinCost();
        double stirLb = f.stirrupLb(this);
        // compression options in order of cost: the cheapest (the lightest pair of hangers) first
        List<Comp> comps = new ArrayList<>();
        for (BarSize c : compressionSizes) {
            int mmax = BarSpacing.maxBars(f.b(), f.det(), c, p.materials(), p.code());
            for (int m = 2; m <= mmax; m++) {
                comps.add(new Comp(c, m, cost.bars(c, m)));
            }
        }
        comps.sort(Comparator.comparingDouble(Comp::cost).thenComparingDouble(x -> x.bar().diameter())
                .thenComparingInt(Comp::count));
        if (comps.isEmpty()) {
            return false;
        }
        double cheapestComp = comps.get(0).cost();
        for (BarSize t : tensionSizes) {
            int nmax = BarSpacing.maxBars(f.b(), f.det(), t, p.materials(), p.code());
            int ncr = BarSpacing.minBarsForCrackControl(f.b(), f.det(), t, p.materials().fy(), p.code());
            int first = Math.max(2, ncr);
            if (nmax < first) {
                continue;
            }
            String key = f.b() + "x" + f.h() + "/" + t.designation();
            int nArea = (int) Math.ceil(f.tensionAreaLb() / t.area() - 1e-9);
            for (int layers = 1; layers <= p.space().maxLayers(); layers++) {
                int nLow = first + 2 * (layers - 1);
                if (layers * nmax < Math.max(nLow, nArea)) {
                    continue;
                }
                int nFloor = Math.max(nLow, nArea);
                if (base + stirLb + cheapestComp + cost.bars(t, nFloor) >= cut(key)) {
                    continue;
                }
                int hiN = layers * nmax;
                for (Comp cm : comps) {
                    BarSize c = cm.bar();
                    int m = cm.count();
                    if (base + stirLb + cm.cost() + cost.bars(t, nFloor) >= cut(key)) {
                        break; // every later compression option costs more
                    }
                    if (!Layout.fitsHeight(f.h(), f.det(), t, layers, c)) {
                        continue;
                    }
                    String fcKey = t.designation() + "/" + c.designation() + "/" + layers;
                    Boolean fcPass = frameCheckCache.get(fcKey);
                    if (fcPass == null) {
                        fcPass = framePasses(f, shape, t, layers, c);
                        frameCheckCache.put(fcKey, fcPass);
                    }
                    if (!fcPass) {
                        continue;
                    }
                    anyFramePass = true;
                    int[] counts = minTension(f, t, nmax, ncr, layers, c, m, hiN);
                    if (counts == null) {
                        continue;
                    }
                    int nMin = Arrays.stream(counts).sum();
                    boolean ductilityStopped = scanUpward(f, shape, key, t, nmax, ncr, counts, c, m,
                            base + cm.cost(), stirLb, stirrupCache);
                    if (!ductilityStopped && nMin <= nFloor) {
                        break; // no compression layer can save a bar, nor make more bars ductile
                    }
                }
            }
        }
        return anyFramePass;
    }

    /** Nothing costing this much or more can be among the answers for this key. */
    private double cut(String key) {
        Candidate kb = best.get(key);
        return Math.min(bound(), kb == null ? Double.POSITIVE_INFINITY : kb.cost().total());
    }

    /**
     * From the fewest passing tension bars upward: more bars raise rho_w (and so Vc) and may allow
     * cheaper stirrups. Stops when the bars alone cost more than the best found for this key, or when
     * the section is no longer ductile; returns true in the second case (more compression steel might
     * then allow more bars).
     */
    private boolean scanUpward(Frame f, SectionShape shape, String key, BarSize t, int nmax, int ncr, int[] counts,
            BarSize c, int m, double fixed, double stirLb, Map<String, Stirrups> cache) {
        int layers = counts.length;
        int first = Math.max(2, ncr);
        int[] split = counts;
        int n = Arrays.stream(counts).sum();
        while (true) {
            Candidate kb0 = best.get(key);
            double cut0 = Math.min(bound(), kb0 == null ? Double.POSITIVE_INFINITY : kb0.cost().total());
            if (fixed + cost.bars(t, n) + stirLb >= cut0) {
                return false;
            }
            place(f, t, split, c, m);
            Stirrups st = stirrups(f, shape, t, split, cache);
            if (st != null) {
                Layout lay = new Layout(f.b(), f.h(), p.flange(), bending, t, toList(split), c, m, st, f.skin());
                Candidate cand = new Candidate(lay, lay.cost(cost));
                Candidate kb = best.get(key);
                if (kb == null || cand.units() < kb.units()) {
                    best.put(key, cand);
                    boundDirty = true;
                }
            }
            n++;
            if (n > layers * nmax) {
                return false;
            }
            Candidate kb = best.get(key);
            double cut = Math.min(bound(), kb == null ? Double.POSITIVE_INFINITY : kb.cost().total());
            if (fixed + cost.bars(t, n) + stirLb >= cut) {
                return false;
            }
            Split next = passingSplit(f, t, n, layers, nmax, first, c, m);
            while (next.counts() == null) {
                if (!next.anyDuctile()) {
                    return true; // not ductile any more: more bars only lower eps_t
                }
                n++;
                if (n > layers * nmax || fixed + cost.bars(t, n) + stirLb >= cut) {
                    return false;
                }
                next = passingSplit(f, t, n, layers, nmax, first, c, m);
            }
            split = next.counts();
        }
    }

    /**
     * A split of n bars that passes flexure, minimum steel and ductility (bottom-heavy first), and
     * whether any split of n is ductile at all.
     */
    private Split passingSplit(Frame f, BarSize t, int n, int layers, int nmax, int first, BarSize c, int m) {
        boolean anyDuctile = false;
        int[] greedy = greedySplit(n, layers, nmax, first);
        if (greedy != null) {
            place(f, t, greedy, c, m);
            anyDuctile = probe.ductilityOk();
            if (anyDuctile && probe.strengthOk(p.mu()) && probe.minSteelOk(p.mu())) {
                return new Split(greedy, true);
            }
        }
        for (int[] alt : splits(n, layers, nmax, first)) {
            if (greedy != null && Arrays.equals(alt, greedy)) {
                continue;
            }
            place(f, t, alt, c, m);
            boolean ductile = probe.ductilityOk();
            anyDuctile |= ductile;
            if (ductile && probe.strengthOk(p.mu()) && probe.minSteelOk(p.mu())) {
                return new Split(alt, true);
            }
        }
        return new Split(null, anyDuctile);
    }

    /**
     * The checks that do not depend on bar counts (cover, skin, flange width, minimum depth, and the
     * 25.2.2 gap between stacked layers), asked of the section model on a stand-in section.
     */
    private boolean framePasses(Frame f, SectionShape shape, BarSize t, int tensionLayers, BarSize c) {
        List<BeamSection.BarGroup> groups = new ArrayList<>();
        for (int i = 0; i < tensionLayers; i++) {
            groups.add(new BeamSection.BarGroup(t, 2));
        }
        List<BarLayer> layers = new ArrayList<>(BeamSection.stack(bending.tensionFace(), groups, f.det()));
        layers.add(new BarLayer(bending.compressionFace(), c, 2, f.det().firstLayerCentroid(c.diameter())));
        BeamSection s = new BeamSection(shape, p.materials(), f.det(), layers, null, f.skin(), p.code());
        List<CheckResult> checks = new ArrayList<>(SectionChecks.frameChecks(s, p.span()));
        checks.addAll(SectionChecks.layerGaps(s));
        for (CheckResult r : checks) {
            if (!r.pass()) {
                return false;
            }
        }
        return true;
    }

    private static List<Integer> toList(int[] counts) {
        List<Integer> l = new ArrayList<>(counts.length);
        for (int c : counts) {
            l.add(c);
        }
        return l;
    }

    /** The bottom-heavy split of n bars over the layers, or null if none is valid. */
    static int[] greedySplit(int n, int layers, int nmax, int first) {
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

    private void place(Frame f, BarSize t, int[] counts, BarSize c, int m) {
        probe.clear();
        Detailing det = f.det();
        double y = det.firstLayerCentroid(t.diameter());
        for (int i = 0; i < counts.length; i++) {
            if (i > 0) {
                y += t.diameter() + det.layerGap();
            }
            probe.add(y, true, counts[i] * t.area(), t.diameter());
        }
        probe.add(det.firstLayerCentroid(c.diameter()), false, m * c.area(), c.diameter());
        probe.solve();
    }

    /** The conditions that only get easier with more tension bars: 0.90 Mn >= Mu and minimum steel. */
    private boolean couldPass(Frame f, BarSize t, int[] counts, BarSize c, int m) {
        place(f, t, counts, c, m);
        return probe.strengthPossible(p.mu()) && probe.minSteelOk(p.mu());
    }

    /**
     * Whether some split of n bars meets those conditions. The bottom-heavy split is the strongest,
     * but a more even split has a smaller d and so a smaller As,min (9.6.1.2); both are tried.
     */
    private boolean couldPassAny(Frame f, BarSize t, int n, int layers, int nmax, int first, BarSize c, int m) {
        int[] greedy = greedySplit(n, layers, nmax, first);
        if (greedy != null && couldPass(f, t, greedy, c, m)) {
            return true;
        }
        if (layers == 1) {
            return false;
        }
        for (int[] alt : splits(n, layers, nmax, first)) {
            if ((greedy == null || !Arrays.equals(alt, greedy)) && couldPass(f, t, alt, c, m)) {
                return true;
            }
        }
        return false;
    }

    /**
     * Fewest tension bars (with their split) that pass flexure, ductility and minimum steel; or null.
     * phi Mn itself can fall as bars are added in the transition zone, so bisection runs on the steady
     * necessary conditions and a short upward scan settles the rest; eps_t only falls with more bars,
     * so the scan stops as soon as no split is ductile.
     */
    private int[] minTension(Frame f, BarSize t, int nmax, int ncr, int layers, BarSize c, int m, int hiLimit) {
        int first = Math.max(2, ncr);
        int lo = first + 2 * (layers - 1);
        int hi = Math.min(hiLimit, layers * nmax);
        if (hi < lo || !couldPassAny(f, t, hi, layers, nmax, first, c, m)) {
            hi = layers * nmax;
            if (!couldPassAny(f, t, hi, layers, nmax, first, c, m)) {
                return null;
            }
        }
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (couldPassAny(f, t, mid, layers, nmax, first, c, m)) {
                hi = mid;
            } else {
                lo = mid + 1;
            }
        }
        for (int n = lo; n <= layers * nmax; n++) {
            Split s = passingSplit(f, t, n, layers, nmax, first, c, m);
            if (s.counts() != null) {
                return s.counts();
            }
            if (!s.anyDuctile()) {
                return null;
            }
        }
        return null;
    }


    /** The outcome of trying every split of one count. */
    private record Split(int[] counts, boolean anyDuctile) {
    }

    /** All splits of n into non-increasing layer counts, each >= 2, the first in [first, nmax]. */
    static List<int[]> splits(int n, int layers, int nmax, int first) {
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

    /** The cheapest stirrups for the tension bars just placed in the probe (cached per frame). */
    private Stirrups stirrups(Frame f, SectionShape shape, BarSize t, int[] counts, Map<String, Stirrups> cache) {
        String key = t.designation() + Arrays.toString(counts);
        if (cache.containsKey(key)) {
            return cache.get(key);
        }
        Stirrups chosen = cheapestStirrups(f.b(), f.h(), f.det(), probe.d(), probe.tensionArea());
        cache.put(key, chosen);
        return chosen;
    }
}
