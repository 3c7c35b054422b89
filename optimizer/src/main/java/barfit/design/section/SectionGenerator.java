package barfit.design.section;

import barfit.catalogs.BarSize;
import barfit.design.CostBreakdown;
import barfit.design.CostModel;
import barfit.design.FrameEnumerator;
import barfit.design.StirrupChooser;
import barfit.design.TensionSearch;
import barfit.section.BarLayer;
import barfit.section.BarSpacing;
import barfit.section.BeamSection;
import barfit.section.Bending;
import barfit.section.CheckResult;
import barfit.section.Detailing;
import barfit.section.SectionChecks;
import barfit.section.SectionProbe;
import barfit.section.SectionShape;
import barfit.section.SkinBars;
import barfit.section.StirrupRules;
import barfit.section.Stirrups;
import barfit.section.StrengthBound;
import barfit.section.trail.Trail;
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
 *
 * <p>Under torsion the longitudinal steel for torsion can come from more tension bars, a heavier
 * compression layer or side bars, so every split of every count and every compression layer within the
 * cost bound is tried, with every skin option of the frame ({@link SectionLayout#skinOptions}); the stirrups
 * must pass the torsion checks on them as well, and a layout is kept only when the full section model
 * passes it under the torsion demand.
 */
public final class SectionGenerator {
    /** What the generation did, for the proof statement and the benchmark. */
    public record Stats(
            int frames,
            int framesEvaluated,
            int framesPrunedByBound,
            int framesFailingFrameChecks,
            int flexureSolves,
            int shearEvaluations,
            int candidates,
            long nanos) {}

    public record Output(List<Candidate> candidates, Stats stats) {}

    private final SectionProblem p;
    private final CostModel cost;
    private final SectionProbe probe;
    private final TensionSearch search;
    private final StirrupChooser chooser;
    private final Bending bending;
    private final List<BarSize> tensionSizes;
    private final List<BarSize> compressionSizes;
    private final BarSize smallestTension;

    /**
     * What is kept apart: a width, a height and a tension bar size (the stirrup bar that frames the section
     * is not part of it). A record, not a string, so that a lookup formats no number.
     */
    private record Key(double b, double h, String tensionBar) {}

    /** The stirrups cached per frame: asked again for the same bars, legs and spacing limit. */
    private record StirrupKey(
            String tensionBar, List<Integer> counts, int minLegs, int maxLegs, double maxSpacing, String torsionBars) {}

    /** The frame checks cached per frame: the stand-in section hangs on these alone. */
    private record FrameCheckKey(String tensionBar, String compressionBar, int layers) {}

    /** Best candidate per distinct key, in discovery order. */
    private final Map<Key, Candidate> best = new LinkedHashMap<>();

    private int keep;
    /**
     * The carbon cap in the searches' units per metre ({@link CostModel#units}): a layout whose carbon exceeds
     * it is never kept, so every bound and cut below is the cost of a layout within the cap. For one key the
     * cheapest layout within the cap is then found as the cheapest is without one: the scans go on past a
     * cheaper layout over the cap, and what they skip costs more than a layout within it (Long.MAX_VALUE: none).
     */
    private long carbonCap = Long.MAX_VALUE;
    /** What the cap measures: the carbon beside the cost model, or (for a frontier) the money beside carbon. */
    private CostModel capMeasure;

    private double cachedBound = Double.POSITIVE_INFINITY;
    private boolean boundDirty = true;
    /** Whether an option of the compression layer being tried relied on its bars (so needed ties). */
    private boolean tiesRelied;

    public SectionGenerator(SectionProblem problem, CostModel cost) {
        this.p = problem;
        this.cost = cost;
        this.probe = new SectionProbe(problem.materials(), problem.code());
        this.search = new TensionSearch(probe, problem.mu());
        this.chooser = new StirrupChooser(problem.materials(), problem.code(), problem.space(), cost);
        this.bending = problem.bending();
        this.tensionSizes = problem.space().barSizes();
        List<BarSize> comp = new ArrayList<>(problem.space().compressionSizes());
        comp.sort(Comparator.comparingDouble(BarSize::massPerMetre));
        this.compressionSizes = comp;
        this.smallestTension = tensionSizes.stream()
                .min(Comparator.comparingDouble(BarSize::diameter))
                .orElseThrow();
    }

    /** A concrete frame: width, height and the stirrup bar that positions the main bars. */
    private record Frame(
            double b,
            double h,
            BarSize stirrupBar,
            Detailing det,
            CostBreakdown frameCost,
            SkinBars skin,
            double skinCost,
            FrameTorsion torsion,
            double lowerBound,
            double tensionAreaLb,
            double cheapestStirrups,
            double[] stirrupLb) {
        /**
         * The stirrup lower bound, made tight (one shear search, with the torsion checks on stirrups where the
         * frame is designed for torsion) only when the frame is reached.
         */
        double stirrupLb(SectionGenerator g) {
            if (Double.isNaN(stirrupLb[0])) {
                Stirrups s = g.cheapestStirrups(
                        b,
                        h,
                        det,
                        h - det.firstLayerCentroid(g.smallestTension.diameter()),
                        g.maxTensionArea(b, det),
                        torsion.designed());
                stirrupLb[0] = s == null ? Double.POSITIVE_INFINITY : g.cost.stirrups(b, h, s);
            }
            return stirrupLb[0];
        }

        double tightLowerBound(SectionGenerator g) {
            return lowerBound - cheapestStirrups + stirrupLb(g);
        }
    }

    /** Keeps only layouts whose carbon per metre, in the searches' units, is at most {@code units}. */
    public SectionGenerator capCarbon(long units) {
        if (units != Long.MAX_VALUE && cost.carbon() == null) {
            throw new IllegalStateException("a carbon cap needs the carbon factors beside the cost model");
        }
        return cap(cost.carbon(), units);
    }

    /**
     * Keeps only layouts whose price at {@code measure} (another model over the same quantities, every rate
     * at least zero) is at most {@code units} per metre. The argument above holds for any such measure.
     */
    public SectionGenerator cap(CostModel measure, long units) {
        this.capMeasure = measure;
        this.carbonCap = units;
        return this;
    }

    /** Whether a layout is within the cap (always, without one). */
    private boolean withinCap(SectionLayout lay) {
        return carbonCap == Long.MAX_VALUE
                || CostModel.units(lay.cost(capMeasure).total()) <= carbonCap;
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
        out.sort(Comparator.comparingLong(Candidate::units)
                .thenComparing(c -> c.layout().distinctKey()));
        return new Output(
                out,
                new Stats(
                        frames.size(),
                        evaluated,
                        pruned,
                        frameFails,
                        probe.solves(),
                        chooser.evaluations(),
                        out.size(),
                        System.nanoTime() - t0));
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
        double dbMin = Double.MAX_VALUE;
        double massPerArea = Double.MAX_VALUE;
        for (BarSize bs : tensionSizes) {
            dbMin = Math.min(dbMin, bs.diameter());
            massPerArea = Math.min(massPerArea, bs.massPerMetre() / bs.area());
        }
        for (BarSize bs : compressionSizes) {
            massPerArea = Math.min(massPerArea, bs.massPerMetre() / bs.area());
        }
        double minPair = 2
                        * tensionSizes.stream().mapToDouble(BarSize::area).min().orElse(0)
                + 2 * compressionSizes.stream().mapToDouble(BarSize::area).min().orElse(0);
        for (FrameEnumerator.Cell cell :
                FrameEnumerator.cells(p.widths(), p.depths(), p.flange(), p.space(), p.detailing())) {
            double b = cell.width();
            double h = cell.height();
            BarSize ds = cell.stirrupBar();
            Detailing det = cell.detailing();
            CostBreakdown frameCost = cost.frame(b, h, p.flange());
            double areaLb = tensionAreaLowerBound(b, h, det, dbMin);
            FrameTorsion torsion =
                    FrameTorsion.of(p, new SectionShape(b, h, p.flange()), det, h - det.firstLayerCentroid(dbMin));
            List<SkinBars> skins = new ArrayList<>(torsion.skins());
            skins.sort(Comparator.comparingDouble(x -> skinCost(h, x)));
            torsion = torsion.withSkins(skins);
            SkinBars skin = skins.get(0); // the design rule's, the cheapest
            double skinCost = skinCost(h, skin);
            // the longitudinal steel beyond flexure's need counts for Al, and what counts may include the
            // compression bars: with Al, at least As + max(Al, the least compression layer) in all
            double perArea = torsion.designed()
                    ? Math.min(
                            massPerArea,
                            p.space().skinBar().massPerMetre()
                                    / p.space().skinBar().area())
                    : massPerArea;
            double steelLb = cost.mainBarPricePerKg()
                    * perArea
                    * Math.max(
                            areaLb
                                    + Math.max(
                                            torsion.alRequired(),
                                            2 * compressionSizes.get(0).area()),
                            minPair);
            double cheapestStirrups = cost.cheapestStirrups(
                    b, h, ds, p.space().stirrupLegs(), p.space().stirrupSpacings());
            // a frame too small for the torsion, or whose bars cannot be spaced round the hoop, has no layout
            double lb = torsion.blocking() != null
                    ? Double.POSITIVE_INFINITY
                    : frameCost.total() + skinCost + steelLb + cheapestStirrups;
            out.add(new Frame(
                    b, h, ds, det, frameCost, skin, skinCost, torsion, lb, areaLb, cheapestStirrups, new double[] {
                        Double.NaN
                    }));
        }
        out.sort(Comparator.comparingDouble(Frame::lowerBound)
                .thenComparingDouble(Frame::b)
                .thenComparingDouble(Frame::h)
                .thenComparingDouble(f -> f.stirrupBar().diameter()));
        return out;
    }

    private double skinCost(double h, SkinBars skin) {
        return skin == null ? 0 : cost.bars(skin.bar(), 2 * SectionLayout.skinBarsPerFace(h, skin.spacing()));
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
        double widest = p.flange() != null ? p.flange().on(b).width() : b; // at its effective width on this web
        double fy = p.materials().fy();
        return StrengthBound.minTensionArea(
                p.mu(), dMax, compArea, dpMin, dpMax, widest, p.materials().fc(), fy);
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
     * The cheapest stirrups of the frame for d and As (its largest); {@code torsion}: with the torsion checks
     * on stirrups but the section size, on the largest bars, so that it bounds every layout of the frame.
     */
    private Stirrups cheapestStirrups(double b, double h, Detailing det, double d, double as, boolean torsion) {
        SectionShape shape = new SectionShape(b, h, p.flange());
        if (!torsion) {
            return chooser.cheapest(shape, det, d, as, p.vu(), 0);
        }
        StirrupChooser.Torsion bound = FrameTorsion.stirrupBound(p, det);
        return chooser.cheapest(shape, det, d, as, p.vu(), 0, Integer.MAX_VALUE, Double.POSITIVE_INFINITY, 0, bound);
    }

    /** A compression layer option: bar size and count, with its cost per metre. */
    private record Comp(BarSize bar, int count, double cost) {}

    /** Evaluates one frame; false when its frame-level checks rule it out entirely. */
    private boolean evaluateFrame(Frame f) {
        SectionShape shape = new SectionShape(f.b(), f.h(), p.flange());
        probe.frame(shape, bending, p.span());
        search.frame(f.det());
        boolean anyFramePass = false;
        Map<StirrupKey, Stirrups> stirrupCache = new HashMap<>();
        Map<FrameCheckKey, Boolean> frameCheckCache = new HashMap<>();
        double base = f.frameCost().total() + f.skinCost();
        double stirLb = f.stirrupLb(this);
        // compression options in order of cost: the cheapest (the lightest pair of hangers) first
        List<Comp> comps = new ArrayList<>();
        for (BarSize c : compressionSizes) {
            int mmax = BarSpacing.maxBars(f.b(), f.det(), c, p.materials(), p.code());
            if (p.space().hangersOnly()) {
                mmax = Math.min(mmax, 2);
            }
            for (int m = 2; m <= mmax; m++) {
                comps.add(new Comp(c, m, cost.bars(c, m)));
            }
            if (p.space().hangersOnly()) {
                break; // the lightest size only
            }
        }
        comps.sort(Comparator.comparingDouble(Comp::cost)
                .thenComparingDouble(x -> x.bar().diameter())
                .thenComparingInt(Comp::count));
        if (comps.isEmpty()) {
            return false;
        }
        double cheapestComp = comps.get(0).cost();
        int maxLegs = p.space().stirrupLegs().stream()
                .mapToInt(Integer::intValue)
                .max()
                .orElse(2);
        for (BarSize t : tensionSizes) {
            int nmax = BarSpacing.maxBars(f.b(), f.det(), t, p.materials(), p.code());
            int ncr = BarSpacing.minBarsForCrackControl(
                    f.b(), f.det(), t, p.materials().fy(), p.code());
            int first = Math.max(2, ncr);
            if (nmax < first) {
                continue;
            }
            Key key = new Key(f.b(), f.h(), t.designation());
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
                    if (!SectionLayout.fitsHeight(f.h(), f.det(), t, layers, c)) {
                        continue;
                    }
                    FrameCheckKey fcKey = new FrameCheckKey(t.designation(), c.designation(), layers);
                    Boolean fcPass = frameCheckCache.get(fcKey);
                    if (fcPass == null) {
                        fcPass = framePasses(f, shape, t, layers, c);
                        frameCheckCache.put(fcKey, fcPass);
                    }
                    if (!fcPass) {
                        continue;
                    }
                    anyFramePass = true;
                    search.compression(List.of(new BeamSection.BarGroup(c, m)));
                    int[] counts = search.minCounts(t, nmax, ncr, layers, hiN);
                    if (counts == null) {
                        continue;
                    }
                    int nMin = Arrays.stream(counts).sum();
                    tiesRelied = false;
                    boolean ductilityStopped = scanUpward(
                            f, shape, key, t, nmax, ncr, counts, c, m, base + cm.cost(), stirLb, stirrupCache);
                    // later compression layers cost more; they cannot save a bar or make more bars ductile, and
                    // when this one leaves the stirrup legs free (it holds as many as any, needs no more than the
                    // tension bars do, and no more even split of them needs fewer) they cannot allow cheaper
                    // stirrups either
                    int layersUsed = counts.length;
                    boolean legsFree = m >= maxLegs
                            && p.space().legsFor(m) <= p.space().legsFor(counts[0])
                            && p.space().legsFor(counts[0]) == p.space().legsFor((nMin + layersUsed - 1) / layersUsed);
                    // ties round compression steel that is relied on ask more of the stirrups as the layer
                    // grows, so a later compression layer may then need fewer legs: keep trying
                    // under torsion a heavier compression layer may count for Al or allow wider stirrups: go on
                    if (!ductilityStopped
                            && nMin <= nFloor
                            && legsFree
                            && !tiesRelied
                            && !f.torsion().designed()) {
                        break;
                    }
                }
            }
        }
        return anyFramePass;
    }

    /** Nothing costing this much or more can be among the answers for this key. */
    private double cut(Key key) {
        Candidate kb = best.get(key);
        return Math.min(
                bound(), kb == null ? Double.POSITIVE_INFINITY : kb.cost().total());
    }

    /**
     * From the fewest passing tension bars upward: more bars raise rho_w (and so Vc) and may allow
     * cheaper stirrups. Stops when the bars alone cost more than the best found for this key, or when
     * the section is no longer ductile; returns true in the second case (more compression steel might
     * then allow more bars).
     */
    private boolean scanUpward(
            Frame f,
            SectionShape shape,
            Key key,
            BarSize t,
            int nmax,
            int ncr,
            int[] counts,
            BarSize c,
            int m,
            double fixed,
            double stirLb,
            Map<StirrupKey, Stirrups> cache) {
        int layers = counts.length;
        int first = Math.max(2, ncr);
        int[] split = counts;
        int n = Arrays.stream(counts).sum();
        while (true) {
            Candidate kb0 = best.get(key);
            double cut0 = Math.min(
                    bound(), kb0 == null ? Double.POSITIVE_INFINITY : kb0.cost().total());
            if (fixed + cost.bars(t, n) + stirLb >= cut0) {
                return false;
            }
            if (f.torsion().designed()) {
                // which split serves torsion best is not known in advance (d moves As,min and the need for
                // flexure both ways): every split of these bars that passes flexure is tried
                for (int[] alt : TensionSearch.splits(n, layers, nmax, first)) {
                    search.place(t, alt);
                    if (search.passesAll()) {
                        offer(f, shape, key, t, alt, c, m, cache);
                    }
                }
            } else {
                search.place(t, split);
                offer(f, shape, key, t, split, c, m, cache);
            }
            // the legs rule: a more even split of the same bars may need fewer stirrup legs
            int legs = p.space().legsFor(Math.max(split[0], m));
            if (!f.torsion().designed() && legs > p.space().legsFor(Math.max((n + layers - 1) / layers, m))) {
                for (int[] alt : search.passingSplits(t, n, layers, nmax, first)) {
                    if (p.space().legsFor(Math.max(alt[0], m)) < legs) {
                        search.place(t, alt);
                        offer(f, shape, key, t, alt, c, m, cache);
                    }
                }
            }
            n++;
            if (n > layers * nmax) {
                return false;
            }
            Candidate kb = best.get(key);
            double cut = Math.min(
                    bound(), kb == null ? Double.POSITIVE_INFINITY : kb.cost().total());
            if (fixed + cost.bars(t, n) + stirLb >= cut) {
                return false;
            }
            TensionSearch.Split next = search.passingSplit(t, n, layers, nmax, first);
            while (next.counts() == null) {
                if (!next.anyDuctile()) {
                    return true; // not ductile any more: more bars only lower eps_t
                }
                n++;
                if (n > layers * nmax || fixed + cost.bars(t, n) + stirLb >= cut) {
                    return false;
                }
                next = search.passingSplit(t, n, layers, nmax, first);
            }
            split = next.counts();
        }
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

    /** The layout of the bars just placed in the probe, with its cheapest stirrups, kept if the cheapest for its key. */
    private void offer(
            Frame f,
            SectionShape shape,
            Key key,
            BarSize t,
            int[] split,
            BarSize c,
            int m,
            Map<StirrupKey, Stirrups> cache) {
        // the ties 9.7.6.4 asks round compression steel relied on, judged on these bars by the section model
        SectionLayout bars = new SectionLayout(
                f.b(),
                f.h(),
                p.flange(),
                bending,
                t,
                TensionSearch.toList(split),
                c,
                m,
                new Stirrups(f.stirrupBar(), 2, p.space().stirrupSpacings().get(0)),
                f.skin());
        StirrupRules.TieDemand ties =
                StirrupRules.ties(bars.section(p.materials(), p.detailing(), p.code()), bending, p.mu());
        if (ties.required()) {
            tiesRelied = true;
            if (!ties.sizeOk(f.stirrupBar().diameter())) {
                return;
            }
        }
        int minLegs = Math.max(p.space().legsFor(Math.max(split[0], m)), ties.minLegs());
        if (f.torsion().designed()) {
            offerUnderTorsion(f, key, bars, minLegs, Math.min(split[0], m), ties.maxSpacing(), cache);
            return;
        }
        Stirrups st = stirrups(f, t, split, minLegs, Math.min(split[0], m), ties.maxSpacing(), null, cache);
        if (st == null) {
            return;
        }
        SectionLayout lay = new SectionLayout(
                f.b(), f.h(), p.flange(), bending, t, TensionSearch.toList(split), c, m, st, f.skin());
        Candidate cand = new Candidate(lay, lay.cost(cost));
        Candidate kb = best.get(key);
        if ((kb == null || cand.units() < kb.units()) && withinCap(lay)) {
            best.put(key, cand);
            boundDirty = true;
        }
    }

    /**
     * Under torsion: the bars just placed in the probe with each skin option of the frame (cheapest first,
     * while it can still beat the best for its key), their cheapest stirrups passing shear and the torsion
     * checks on them, and the layout kept only if the section model passes it whole under the torsion demand.
     */
    private void offerUnderTorsion(
            Frame f,
            Key key,
            SectionLayout bars,
            int minLegs,
            int maxLegs,
            double maxSpacing,
            Map<StirrupKey, Stirrups> cache) {
        int[] split = bars.tensionCounts().stream().mapToInt(Integer::intValue).toArray();
        double barCost = f.frameCost().total()
                + cost.bars(bars.tensionBar(), bars.tensionBarCount())
                + cost.bars(bars.compressionBar(), bars.compressionCount());
        List<BarLayer> layers =
                bars.section(p.materials(), p.detailing(), p.code()).layers();
        for (SkinBars skin : f.torsion().skins()) {
            if (barCost + skinCost(f.h(), skin) + f.stirrupLb(this) >= cut(key)) {
                break; // the skin options come cheapest first
            }
            StirrupChooser.Torsion need = new StirrupChooser.Torsion(p.demand(), layers, skin);
            Stirrups st = stirrups(f, bars.tensionBar(), split, minLegs, maxLegs, maxSpacing, need, cache);
            if (st == null) {
                continue;
            }
            SectionLayout lay = bars.withStirrups(st, skin);
            Candidate cand = new Candidate(lay, lay.cost(cost));
            Candidate kb = best.get(key);
            if (kb != null && cand.units() >= kb.units() || !withinCap(lay)) {
                continue;
            }
            BeamSection whole = lay.section(p.materials(), p.detailing(), p.code());
            if (SectionChecks.run(
                            whole,
                            p.demand(),
                            p.span(),
                            Trail.off(),
                            true,
                            p.space().practice())
                    .ok()) {
                best.put(key, cand);
                boundDirty = true;
            }
        }
    }

    /** The sizes of the outer layer of each face and of the skin bars, which the torsion checks on stirrups see. */
    private static String smallestBars(StirrupChooser.Torsion need) {
        StringBuilder sb = new StringBuilder();
        for (BarLayer l : need.layers()) {
            sb.append(l.face())
                    .append(l.bar().designation())
                    .append(l.fromFace())
                    .append(',');
        }
        return sb.append(need.skin() == null ? "-" : need.skin().bar().designation())
                .toString();
    }

    /**
     * The cheapest stirrups for the tension bars just placed in the probe with at least {@code minLegs} legs
     * (the legs the bars per layer and the ties need), at most {@code maxLegs} and at most {@code maxSpacing}
     * apart, cached per frame.
     */
    private Stirrups stirrups(
            Frame f,
            BarSize t,
            int[] counts,
            int minLegs,
            int maxLegs,
            double maxSpacing,
            StirrupChooser.Torsion need,
            Map<StirrupKey, Stirrups> cache) {
        StirrupKey key = new StirrupKey(
                t.designation(),
                TensionSearch.toList(counts),
                minLegs,
                maxLegs,
                maxSpacing,
                // under torsion the bar size of 9.7.5.2 hangs on the smallest corner or skin bar
                need == null ? "" : smallestBars(need));
        if (cache.containsKey(key)) {
            return cache.get(key);
        }
        Stirrups chosen = chooser.cheapest(
                new SectionShape(f.b(), f.h(), p.flange()),
                f.det(),
                probe.d(),
                probe.tensionArea(),
                p.vu(),
                minLegs,
                maxLegs,
                maxSpacing,
                0,
                need);
        cache.put(key, chosen);
        return chosen;
    }
}
