package barfit.design.beam;

import barfit.catalogs.BarSize;
import barfit.design.CostModel;
import barfit.design.Layout;
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
import barfit.section.Span;
import barfit.section.SpanChecks;
import barfit.section.StrengthBound;
import barfit.section.Stirrups;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Candidates for a whole span, frame by frame (width, height, stirrup size), asked of the section
 * model: the top options (top bar size and continuous count), the mid-span options (bottom bars with
 * those continuous bars as compression steel, and the stirrups of the zones that use the mid-span
 * section), and each continuous support's options (top bars there, with its zone stirrups for each
 * number of legs). How they fit together (same top size, continuous bars within the support's first
 * layer, stirrup legs enough for the bottom bars, bar sizes per beam, deflection) is left to the CP-SAT
 * model; a cheap enumeration per frame gives the incumbent that bounds which frames and options are
 * worth handing over.
 */
public final class BeamGenerator {
    /** Money inside the beam model is counted in millionths of the currency. */
    public static final double UNITS = 1_000_000.0;

    /** The "legs" of a support option whose section sizes no stirrup zone: it limits nothing. */
    static final int NO_ZONES = 1000;

    public record Frame(double b, double h, BarSize ds, Detailing det, SkinBars skin, double cost, double lowerBound,
            boolean deflection, double extLeft, double extRight) {
    }

    public record TopOpt(BarSize bar, int nc, double cost) {
    }

    public record MidOpt(TopOpt top, BarSize bar, List<Integer> counts, double d, Map<Integer, Stirrups> zones,
            double cost, int legsNeeded) {
        public int total() {
            return BeamLayout.sum(counts);
        }

        public String key() {
            return bar.designation() + counts;
        }
    }

    /**
     * A support option; {@code legs} is the fewest stirrup legs its zones were given (each zone takes
     * the cheapest stirrups with at least that many), which must hold the bottom bars as well.
     */
    public record SupportOpt(BarSize bar, List<Integer> counts, double d, int legs, Map<Integer, Stirrups> zones,
            double cost, String bottomKey) {
        public int total() {
            return BeamLayout.sum(counts);
        }
    }

    /** One frame's options and its best combination found by enumeration (infinite if none). */
    public record FrameSet(Frame frame, List<TopOpt> tops, List<MidOpt> mids, List<SupportOpt> lefts,
            List<SupportOpt> rights, double best, BeamLayout bestLayout) {
    }

    public record Stats(int frames, int framesEvaluated, int framesSkipped, int flexureSolves, int shearEvaluations,
            long nanos) {
    }

    public record Output(List<FrameSet> sets, double incumbent, BeamLayout incumbentLayout, Stats stats) {
    }

    private final BeamProblem p;
    private final CostModel cost;
    private final SectionProbe midProbe;
    private final SectionProbe supportProbe;
    private final TensionSearch midSearch;
    private final StirrupChooser chooser;
    private final List<BeamProblem.Zone> zones;
    private final double lm;
    /** Zone stirrups depend only on the zone, the tension bars (d, As) and the legs asked for: remembered per frame. */
    private final Map<ZoneKey, Stirrups> zoneMemo = new HashMap<>();

    private record ZoneKey(int zone, double d, double as, int legs) {
    }

    /** Zone indices per place, computed once. */
    private final Map<BeamProblem.Place, List<Integer>> zonesAt = new java.util.EnumMap<>(BeamProblem.Place.class);

    public BeamGenerator(BeamProblem problem, CostModel cost) {
        this.p = problem;
        this.cost = cost;
        this.midProbe = new SectionProbe(p.materials(), p.code());
        this.supportProbe = new SectionProbe(p.materials(), p.code());
        this.midSearch = new TensionSearch(midProbe, p.mMid() == null ? 0 : p.mMid());
        this.chooser = new StirrupChooser(p.materials(), p.code(), p.space(), cost);
        this.zones = p.zones();
        this.lm = p.span() / 1000.0;
    }

    private double barCost(BarSize bar, int count, double length) {
        return cost.rates().mainBarsPerKg() * cost.rates().lapFactor() * bar.massPerMetre() * count * length / 1000.0;
    }

    private double stirrupCost(double b, double h, Stirrups s, BeamProblem.Zone z) {
        return cost.rates().stirrupsPerKg() * s.bar().massPerMetre() * BeamLayout.stirrupSets(z.length(), s.spacing())
                * cost.stirrupSetLength(b, h, s.bar(), s.legs()) / 1000.0;
    }

    public Output generate() {
        long t0 = System.nanoTime();
        List<Frame> frames = frames();
        List<FrameSet> sets = new ArrayList<>();
        double incumbent = Double.POSITIVE_INFINITY;
        BeamLayout incumbentLayout = null;
        int evaluated = 0;
        int skipped = 0;
        for (int i = 0; i < frames.size(); i++) {
            Frame f = frames.get(i);
            if (f.lowerBound() >= incumbent || Double.isInfinite(f.lowerBound())) {
                skipped = frames.size() - i;
                break;
            }
            evaluated++;
            FrameSet fs = evaluate(f, incumbent);
            if (fs == null) {
                continue;
            }
            sets.add(fs);
            if (fs.best() < incumbent) {
                incumbent = fs.best();
                incumbentLayout = fs.bestLayout();
            }
        }
        final double inc = incumbent;
        List<FrameSet> kept = new ArrayList<>();
        for (FrameSet fs : sets) {
            if (fs.frame().lowerBound() < inc + 1e-9) {
                kept.add(prune(fs, inc));
            }
        }
        return new Output(kept, incumbent, incumbentLayout, new Stats(frames.size(), evaluated, skipped,
                midProbe.solves() + supportProbe.solves(), chooser.evaluations(), System.nanoTime() - t0));
    }

    // ------------------------------------------------------------------ frames and their bounds

    private List<Frame> frames() {
        List<Frame> out = new ArrayList<>();
        BarSize smallest = p.space().barSizes().stream().min(Comparator.comparingDouble(BarSize::diameter)).orElseThrow();
        double massPerArea = Double.MAX_VALUE;
        for (BarSize s : p.space().barSizes()) {
            massPerArea = Math.min(massPerArea, s.massPerMetre() / s.area());
        }
        double rate = cost.rates().mainBarsPerKg() * cost.rates().lapFactor() * massPerArea;
        for (double b : p.widths()) {
            for (double h : p.depths()) {
                if (p.flange() != null && h <= p.flange().thickness()) {
                    continue;
                }
                for (BarSize ds : p.space().stirrupSizes()) {
                    Detailing det = new Detailing(p.detailing().cover(), ds, p.detailing().layerGap(),
                            p.detailing().exposure());
                    if (BarSpacing.innerWidth(b, det) <= smallest.diameter()) {
                        continue;
                    }
                    boolean deflection = h < SpanChecks.minimumDepth(p.span(), p.ends(), p.materials(), p.code()) - 1e-9;
                    if (deflection && p.service() == null) {
                        continue; // below Table 9.3.1.1 and nothing to compute deflection from
                    }
                    SkinBars skin = Layout.skinFor(h, smallest, det, p.materials(), p.code());
                    double frameCost = cost.frame(b, h, p.flange()).total() * lm
                            + (skin == null ? 0 : barCost(skin.bar(), 2 * Layout.skinBarsPerFace(h, skin.spacing()), p.span()));
                    double extL = p.leftSupport() ? Extension.of(p, b, h, det, smallest).length() : 0;
                    double extR = p.rightSupport() ? Extension.of(p, b, h, det, smallest).length() : 0;
                    double lb = frameCost + steelLowerBound(b, h, det, smallest, rate) + stirrupLowerBound(b, h, ds);
                    out.add(new Frame(b, h, ds, det, skin, frameCost, lb, deflection, extL, extR));
                }
            }
        }
        out.sort(Comparator.comparingDouble(Frame::lowerBound).thenComparingDouble(Frame::b)
                .thenComparingDouble(Frame::h).thenComparingDouble(f -> f.ds().diameter()));
        return out;
    }

    /** The least bar cost any layout of the frame could have, from the section model's strength bound. */
    private double steelLowerBound(double b, double h, Detailing det, BarSize smallest, double rate) {
        double minPair = 2 * smallest.area();
        double compArea = 0;
        for (BarSize s : p.space().barSizes()) {
            int n = BarSpacing.maxBars(b, det, s, p.materials(), p.code());
            if (n >= 2) {
                compArea = Math.max(compArea, n * s.area() * p.space().maxLayers());
            }
        }
        double dMax = h - det.firstLayerCentroid(smallest.diameter());
        double dp = det.firstLayerCentroid(smallest.diameter());
        double fc = p.materials().fc();
        double fy = p.materials().fy();
        double widest = p.flange() != null ? p.flange().width() : b;
        double ceilingMid = (0.85 * fc * widest * dMax + compArea * fy) / fy;
        double ceilingSup = (0.85 * fc * b * dMax + compArea * fy) / fy;
        double l = p.span();
        double bottom = p.midSection()
                ? StrengthBound.minTensionArea(p.mMid(), dMax, compArea, dp, dp + 60, widest, fc, fy, ceilingMid)
                : minPair;
        double area = Math.max(bottom, minPair) * l;
        double supportL = p.leftSupport()
                ? StrengthBound.minTensionArea(p.mLeft(), dMax, compArea, dp, dp + 60, b, fc, fy, ceilingSup) : 0;
        double supportR = p.rightSupport()
                ? StrengthBound.minTensionArea(p.mRight(), dMax, compArea, dp, dp + 60, b, fc, fy, ceilingSup) : 0;
        if (Double.isInfinite(bottom) || Double.isInfinite(supportL) || Double.isInfinite(supportR)) {
            return Double.POSITIVE_INFINITY;
        }
        if (p.cantilever()) {
            area += Math.max(supportL, minPair) * l;
        } else {
            // the continuous pair over the span, and the rest of each support's steel over at least 0.3 x span
            area += minPair * l + Math.max(0, supportL - minPair) * 0.3 * l + Math.max(0, supportR - minPair) * 0.3 * l;
        }
        return rate * area / 1000.0;
    }

    private double stirrupLowerBound(double b, double h, BarSize ds) {
        double total = 0;
        double widest = p.space().stirrupSpacings().get(p.space().stirrupSpacings().size() - 1);
        int fewestLegs = p.space().stirrupLegs().get(0);
        for (BeamProblem.Zone z : zones) {
            total += stirrupCost(b, h, new Stirrups(ds, fewestLegs, widest), z);
        }
        return total;
    }

    // ------------------------------------------------------------------ one frame

    /**
     * The checks that depend on bar sizes but not counts (cover for the largest bar, skin, flange width,
     * the 25.2.2 gap of {@code layers} stacked layers of {@code a}), asked of the section model on a
     * stand-in section holding {@code layers} layers of {@code a} and one layer of {@code c}.
     */
    private boolean framePasses(Frame f, SectionShape shape, BarSize a, BarSize c, int layers) {
        List<BeamSection.BarGroup> groups = new ArrayList<>();
        for (int i = 0; i < layers; i++) {
            groups.add(new BeamSection.BarGroup(a, 2));
        }
        List<BarLayer> ls = new ArrayList<>(BeamSection.stack(barfit.section.Face.BOTTOM, groups, f.det()));
        ls.add(new BarLayer(barfit.section.Face.TOP, c, 2, f.det().firstLayerCentroid(c.diameter())));
        BeamSection s = new BeamSection(shape, p.materials(), f.det(), ls, null, f.skin(), p.code());
        List<CheckResult> checks = new ArrayList<>(SectionChecks.frameChecks(s, new Span(p.span(), null)));
        checks.addAll(SectionChecks.layerGaps(s));
        return checks.stream().allMatch(CheckResult::pass);
    }

    private FrameSet evaluate(Frame f, double incumbent) {
        zoneMemo.clear();
        SectionShape shape = new SectionShape(f.b(), f.h(), p.flange());
        BarSize smallest = p.space().barSizes().stream().min(Comparator.comparingDouble(BarSize::diameter)).orElseThrow();
        if (!framePasses(f, shape, smallest, smallest, 1)) {
            return null; // cover, flange width or skin rules fail for this frame whatever the bars
        }
        List<TopOpt> tops = tops(f);
        if (p.bottomAnchored() || f.deflection()) {
            return everything(f, shape, tops);
        }
        // supports first (they do not depend on the other options), then the mid-span options for two
        // continuous bars, then more continuous bars only where a bound says they could pay
        Map<String, List<BeamSection.BarGroup>> none = new LinkedHashMap<>();
        none.put(null, List.of());
        List<SupportOpt> lefts = p.leftSupport() ? supports(f, shape, BeamProblem.Place.LEFT, p.mLeft(), 0, none)
                : List.of();
        List<SupportOpt> rights = p.rightSupport() ? supports(f, shape, BeamProblem.Place.RIGHT, p.mRight(), 0, none)
                : List.of();
        List<TopOpt> first = tops.stream().filter(t -> t.nc() == 2).toList();
        List<MidOpt> mids = new ArrayList<>(mids(f, shape, first));
        FrameSet fs = enumerate(new FrameSet(f, tops, mids, lefts, rights, Double.POSITIVE_INFINITY, null));
        double cut = Math.min(incumbent, fs.best());
        for (TopOpt t : tops) {
            if (t.nc() == 2) {
                continue;
            }
            double lb = f.cost() + t.cost() + bottomLowerBound(f, t) + cheapestAbove(lefts, t, p.leftSupport())
                    + cheapestAbove(rights, t, p.rightSupport());
            if (lb < cut) {
                mids.addAll(mids(f, shape, List.of(t)));
            }
        }
        return enumerate(new FrameSet(f, tops, mids, lefts, rights, Double.POSITIVE_INFINITY, null));
    }

    /** The cheapest support option of the top option's size holding its continuous bars (0 if no support). */
    private static double cheapestAbove(List<SupportOpt> opts, TopOpt t, boolean present) {
        if (!present) {
            return 0;
        }
        double best = Double.POSITIVE_INFINITY;
        for (SupportOpt s : opts) {
            if (s.bar().equals(t.bar()) && s.counts().get(0) >= t.nc()) {
                best = Math.min(best, s.cost());
            }
        }
        return best;
    }

    /**
     * A lower bound on the mid-span option cost for a top option: the least bottom area any layout
     * could carry Mu with (the section model's strength bound, with the continuous bars as compression
     * steel), priced per size, plus the cheapest stirrups of the mid-span zones.
     */
    private double bottomLowerBound(Frame f, TopOpt t) {
        double widest = p.flange() != null ? p.flange().width() : f.b();
        double fc = p.materials().fc();
        double fy = p.materials().fy();
        double comp = t.nc() * t.bar().area();
        double dp = f.det().firstLayerCentroid(t.bar().diameter());
        double best = Double.POSITIVE_INFINITY;
        for (BarSize bb : p.space().barSizes()) {
            double dMax = f.h() - f.det().firstLayerCentroid(bb.diameter());
            double ceiling = (0.85 * fc * widest * dMax + comp * fy) / fy;
            double area = StrengthBound.minTensionArea(p.mMid(), dMax, comp, dp, dp, widest, fc, fy, ceiling);
            if (Double.isInfinite(area)) {
                continue;
            }
            int n = Math.max(2, (int) Math.ceil(area / bb.area() - 1e-9));
            best = Math.min(best, barCost(bb, n, p.span()));
        }
        double widestSpacing = p.space().stirrupSpacings().get(p.space().stirrupSpacings().size() - 1);
        Stirrups lean = new Stirrups(f.ds(), p.space().stirrupLegs().get(0), widestSpacing);
        for (int zi : zoneIndices(BeamProblem.Place.MID)) {
            best += stirrupCost(f.b(), f.h(), lean, zones.get(zi));
        }
        return best;
    }

    /** All options at once (anchored bottom bars, or below Table 9.3.1.1 where more steel can pay). */
    private FrameSet everything(Frame f, SectionShape shape, List<TopOpt> tops) {
        List<MidOpt> mids = mids(f, shape, tops);
        Map<String, List<BeamSection.BarGroup>> bottoms = new LinkedHashMap<>();
        if (p.bottomAnchored()) {
            for (MidOpt m : mids) {
                List<BeamSection.BarGroup> g = new ArrayList<>();
                m.counts().forEach(c -> g.add(new BeamSection.BarGroup(m.bar(), c)));
                bottoms.putIfAbsent(m.key(), g);
            }
        } else {
            bottoms.put(null, List.of());
        }
        List<SupportOpt> lefts = p.leftSupport() ? supports(f, shape, BeamProblem.Place.LEFT, p.mLeft(), 0, bottoms)
                : List.of();
        List<SupportOpt> rights = p.rightSupport() ? supports(f, shape, BeamProblem.Place.RIGHT, p.mRight(), 0, bottoms)
                : List.of();
        if (f.deflection()) {
            DeflectionScreen screen = new DeflectionScreen(f, shape, mids, lefts, rights);
            mids = screen.mids();
            lefts = screen.lefts();
            rights = screen.rights();
        }
        return enumerate(new FrameSet(f, tops, mids, lefts, rights, Double.POSITIVE_INFINITY, null));
    }

    private List<TopOpt> tops(Frame f) {
        List<TopOpt> out = new ArrayList<>();
        for (BarSize t : p.space().barSizes()) {
            int nmax = BarSpacing.maxBars(f.b(), f.det(), t, p.materials(), p.code());
            int ncMax = p.cantilever() || p.space().hangersOnly() ? Math.min(2, nmax) : nmax;
            double extL = p.leftSupport() ? Extension.of(p, f.b(), f.h(), f.det(), t).length() : 0;
            double extR = p.rightSupport() ? Extension.of(p, f.b(), f.h(), f.det(), t).length() : 0;
            double run = Math.max(0, p.span() - extL - extR);
            for (int nc = 2; nc <= ncMax; nc++) {
                out.add(new TopOpt(t, nc, barCost(t, nc, run)));
            }
        }
        return out;
    }

    private List<MidOpt> mids(Frame f, SectionShape shape, List<TopOpt> tops) {
        List<MidOpt> out = new ArrayList<>();
        List<Integer> midZones = zoneIndices(BeamProblem.Place.MID);
        if (p.cantilever()) {
            // the bottom bars of a cantilever are its hangers: two or more of one size, one layer
            TopOpt only = null;
            for (TopOpt t : tops) {
                for (BarSize bb : p.space().barSizes()) {
                    int nmax = BarSpacing.maxBars(f.b(), f.det(), bb, p.materials(), p.code());
                    for (int n = 2; n <= nmax; n++) {
                        out.add(new MidOpt(t, bb, List.of(n), f.det().firstLayerCentroid(bb.diameter()), Map.of(),
                                barCost(bb, n, p.span()), p.legsFor(n)));
                    }
                }
            }
            return out;
        }
        midProbe.frame(shape, Bending.SAGGING, new Span(p.span(), p.ends()));
        midSearch.frame(f.det());
        for (TopOpt top : tops) {
            midSearch.compression(List.of(new BeamSection.BarGroup(top.bar(), top.nc())));
            for (BarSize bb : p.space().barSizes()) {
                if (p.maxBarSizes() < 2 && !bb.equals(top.bar())) {
                    continue;
                }
                int nmax = BarSpacing.maxBars(f.b(), f.det(), bb, p.materials(), p.code());
                int ncr = BarSpacing.minBarsForCrackControl(f.b(), f.det(), bb, p.materials().fy(), p.code());
                int first = Math.max(2, ncr);
                if (nmax < first || !framePasses(f, shape, bb, top.bar(), 1)) {
                    continue;
                }
                for (int layers = 1; layers <= p.space().maxLayers(); layers++) {
                    if (layers > 1 && !framePasses(f, shape, bb, top.bar(), layers)) {
                        break;
                    }
                    if (!barfit.design.Layout.fitsHeight(f.h(), f.det(), bb, layers, top.bar())) {
                        break;
                    }
                    int[] min = midSearch.minCounts(bb, nmax, ncr, layers, layers * nmax);
                    if (min == null) {
                        continue;
                    }
                    int nMin = java.util.Arrays.stream(min).sum();
                    double firstStirrups = Double.NaN;
                    for (int n = nMin; n <= layers * nmax; n++) {
                        List<int[]> splits = midSearch.passingSplits(bb, n, layers, nmax, first);
                        if (splits.isEmpty()) {
                            if (!midSearch.passingSplit(bb, n, layers, nmax, first).anyDuctile()) {
                                break; // more bars only lower eps_t
                            }
                            continue;
                        }
                        for (int[] split : splits) {
                            midSearch.place(bb, split);
                            double d = midSearch.d();
                            double as = midSearch.tensionArea();
                            int legs = p.legsFor(Math.max(split[0], top.nc()));
                            Map<Integer, Stirrups> zs = new LinkedHashMap<>();
                            double stirCost = 0;
                            boolean ok = true;
                            for (int zi : midZones) {
                                BeamProblem.Zone z = zones.get(zi);
                                Stirrups st = zoneStirrups(shape, f, zi, bb, split, legs, d, as);
                                if (st == null) {
                                    ok = false;
                                    break;
                                }
                                zs.put(zi, st);
                                stirCost += stirrupCost(f.b(), f.h(), st, z);
                            }
                            if (ok) {
                                out.add(new MidOpt(top, bb, TensionSearch.toList(split), d, zs,
                                        barCost(bb, n, p.span()) + stirCost, p.legsFor(split[0])));
                                if (Double.isNaN(firstStirrups)) {
                                    firstStirrups = stirCost;
                                }
                            }
                        }
                        // more bars only pay through cheaper stirrups (rho_w, fewer legs) or, below Table 9.3.1.1,
                        // stiffness: stop once one more bar costs more than all the stirrups could
                        if (!f.deflection() && !Double.isNaN(firstStirrups)
                                && barCost(bb, n + 1 - nMin, p.span()) >= stirrupCeiling(f)) {
                            break;
                        }
                    }
                }
            }
        }
        return out;
    }

    private Stirrups zoneStirrups(SectionShape shape, Frame f, int zone, BarSize tension, int[] counts, int legs, double d,
            double as) {
        ZoneKey key = new ZoneKey(zone, d, as, legs);
        if (zoneMemo.containsKey(key)) {
            return zoneMemo.get(key);
        }
        BeamProblem.Zone z = zones.get(zone);
        Stirrups st = chooser.cheapest(shape, f.det(), d, as, z.vu(), legs, z.length());
        zoneMemo.put(key, st);
        return st;
    }

    /** More than any choice of stirrups over the whole span could cost (the most legs, the closest spacing). */
    private double stirrupCeiling(Frame f) {
        int legs = p.space().stirrupLegs().get(p.space().stirrupLegs().size() - 1);
        Stirrups dense = new Stirrups(f.ds(), legs, p.space().stirrupSpacings().get(0));
        double c = 0;
        for (BeamProblem.Zone z : zones) {
            c += stirrupCost(f.b(), f.h(), dense, z);
        }
        return c;
    }

    private List<Integer> zoneIndices(BeamProblem.Place place) {
        return zonesAt.computeIfAbsent(place, this::findZones);
    }

    private List<Integer> findZones(BeamProblem.Place place) {
        List<Integer> out = new ArrayList<>();
        for (int i = 0; i < zones.size(); i++) {
            if (zones.get(i).section() == place) {
                out.add(i);
            }
        }
        return out;
    }

    private List<SupportOpt> supports(Frame f, SectionShape shape, BeamProblem.Place place, double mu, double extUnused,
            Map<String, List<BeamSection.BarGroup>> bottoms) {
        List<SupportOpt> out = new ArrayList<>();
        List<Integer> myZones = zoneIndices(place);
        supportProbe.frame(shape, Bending.HOGGING, new Span(p.span(), p.ends()));
        TensionSearch search = new TensionSearch(supportProbe, mu).frame(f.det());
        for (BarSize t : p.space().barSizes()) {
            int nmax = BarSpacing.maxBars(f.b(), f.det(), t, p.materials(), p.code());
            int ncr = BarSpacing.minBarsForCrackControl(f.b(), f.det(), t, p.materials().fy(), p.code());
            int first = Math.max(2, ncr);
            if (nmax < first) {
                continue;
            }
            double ext = Extension.of(p, f.b(), f.h(), f.det(), t).length();
            for (Map.Entry<String, List<BeamSection.BarGroup>> bottom : bottoms.entrySet()) {
                search.compression(bottom.getValue());
                for (int layers = 1; layers <= p.space().maxLayers(); layers++) {
                    BarSize other = bottom.getValue().isEmpty() ? t : bottom.getValue().get(0).bar();
                    if (!framePasses(f, shape, t, other, layers)) {
                        if (layers == 1) {
                            break;
                        }
                        break;
                    }
                    int[] min = search.minCounts(t, nmax, ncr, layers, layers * nmax);
                    if (min == null) {
                        continue;
                    }
                    int nMin = java.util.Arrays.stream(min).sum();
                    for (int n = nMin; n <= layers * nmax; n++) {
                        List<int[]> splits = search.passingSplits(t, n, layers, nmax, first);
                        if (splits.isEmpty()) {
                            if (!search.passingSplit(t, n, layers, nmax, first).anyDuctile()) {
                                break;
                            }
                            continue;
                        }
                        for (int[] split : splits) {
                            search.place(t, split);
                            double d = search.d();
                            double as = search.tensionArea();
                            double bars = barCost(t, n, ext);
                            List<Integer> legOptions = myZones.isEmpty() ? List.of(NO_ZONES) : p.space().stirrupLegs();
                            for (int legs : legOptions) {
                                if (legs < p.legsFor(split[0])) {
                                    continue;
                                }
                                Map<Integer, Stirrups> zs = new LinkedHashMap<>();
                                double stirCost = 0;
                                boolean ok = true;
                                for (int zi : myZones) {
                                    BeamProblem.Zone z = zones.get(zi);
                                    Stirrups st = zoneStirrups(shape, f, zi, t, split, legs, d, as);
                                    if (st == null) {
                                        ok = false;
                                        break;
                                    }
                                    zs.put(zi, st);
                                    stirCost += stirrupCost(f.b(), f.h(), st, z);
                                }
                                if (ok) {
                                    out.add(new SupportOpt(t, TensionSearch.toList(split), d, legs, zs, bars + stirCost,
                                            bottom.getKey()));
                                }
                            }
                        }
                    }
                }
            }
        }
        return out;
    }

    /**
     * Below Table 9.3.1.1: drops the options that fail deflection even with the stiffest partners the
     * frame offers (the largest Ie of every other section at every load level, the most compression
     * steel), a bound the section model's deflection functions make safe. What remains is settled by the
     * CP-SAT model's deflection cuts.
     */
    private final class DeflectionScreen {
        private final List<MidOpt> mids = new ArrayList<>();
        private final List<SupportOpt> lefts = new ArrayList<>();
        private final List<SupportOpt> rights = new ArrayList<>();

        DeflectionScreen(Frame f, SectionShape shape, List<MidOpt> allMids, List<SupportOpt> allLefts,
                List<SupportOpt> allRights) {
            double[] ratios = SpanChecks.ratios(p.service());
            double ec = barfit.section.Deflection.ec(p.materials(), p.code());
            Map<MidOpt, double[]> midIe = new HashMap<>();
            Map<MidOpt, Double> midRho = new HashMap<>();
            for (MidOpt m : allMids) {
                BeamSection s = midSection(f, shape, m);
                midIe.put(m, p.cantilever() ? null : SpanChecks.ieLevels(s, Bending.SAGGING, p.mMid(), ratios));
                midRho.put(m, p.cantilever() ? 0.0 : SpanChecks.rhoPrime(s, Bending.SAGGING));
            }
            Map<SupportOpt, double[]> leftIe = new HashMap<>();
            Map<SupportOpt, double[]> rightIe = new HashMap<>();
            Map<SupportOpt, Double> leftRho = new HashMap<>();
            for (SupportOpt l : allLefts) {
                BeamSection s = supportSection(f, shape, l);
                leftIe.put(l, SpanChecks.ieLevels(s, Bending.HOGGING, p.mLeft(), ratios));
                leftRho.put(l, SpanChecks.rhoPrime(s, Bending.HOGGING));
            }
            for (SupportOpt r : allRights) {
                rightIe.put(r, SpanChecks.ieLevels(supportSection(f, shape, r), Bending.HOGGING, p.mRight(), ratios));
            }
            for (MidOpt m : allMids) {
                String tt = m.top().bar().designation();
                double[] l = best(leftIe, tt);
                double[] r = best(rightIe, tt);
                double rho = p.cantilever() ? bestRho(leftRho, tt) : midRho.get(m);
                if (passes(ec, ratios, l, midIe.get(m), r, rho)) {
                    mids.add(m);
                }
            }
            for (SupportOpt l : allLefts) {
                String tt = l.bar().designation();
                double[] mi = bestMid(midIe, tt);
                double rho = p.cantilever() ? leftRho.get(l) : bestMidRho(midRho, tt);
                if (passes(ec, ratios, leftIe.get(l), mi, best(rightIe, tt), rho)) {
                    lefts.add(l);
                }
            }
            for (SupportOpt r : allRights) {
                String tt = r.bar().designation();
                if (passes(ec, ratios, best(leftIe, tt), bestMid(midIe, tt), rightIe.get(r), bestMidRho(midRho, tt))) {
                    rights.add(r);
                }
            }
        }

        private boolean passes(double ec, double[] ratios, double[] l, double[] m, double[] r, double rho) {
            if ((p.leftSupport() && l == null) || (p.rightSupport() && r == null) || (p.midSection() && m == null)) {
                return false;
            }
            double[] d = SpanChecks.deflections(p.span(), p.ends(), ec, p.mLeft(), p.mMid(), p.mRight(), ratios,
                    p.leftSupport() ? l : null, m, p.rightSupport() ? r : null, rho);
            return SpanChecks.within(p.span(), p.limits(), d);
        }

        private double[] best(Map<SupportOpt, double[]> ie, String tt) {
            double[] out = null;
            for (Map.Entry<SupportOpt, double[]> e : ie.entrySet()) {
                if (e.getKey().bar().designation().equals(tt)) {
                    out = max(out, e.getValue());
                }
            }
            return out;
        }

        private double[] bestMid(Map<MidOpt, double[]> ie, String tt) {
            double[] out = null;
            for (Map.Entry<MidOpt, double[]> e : ie.entrySet()) {
                if (e.getValue() != null && e.getKey().top().bar().designation().equals(tt)) {
                    out = max(out, e.getValue());
                }
            }
            return out;
        }

        private double bestMidRho(Map<MidOpt, Double> rho, String tt) {
            double out = 0;
            for (Map.Entry<MidOpt, Double> e : rho.entrySet()) {
                if (e.getKey().top().bar().designation().equals(tt)) {
                    out = Math.max(out, e.getValue());
                }
            }
            return out;
        }

        private double bestRho(Map<SupportOpt, Double> rho, String tt) {
            double out = 0;
            for (Map.Entry<SupportOpt, Double> e : rho.entrySet()) {
                if (e.getKey().bar().designation().equals(tt)) {
                    out = Math.max(out, e.getValue());
                }
            }
            return out;
        }

        private double[] max(double[] a, double[] b) {
            if (a == null) {
                return b.clone();
            }
            for (int i = 0; i < a.length; i++) {
                a[i] = Math.max(a[i], b[i]);
            }
            return a;
        }

        List<MidOpt> mids() {
            return mids;
        }

        List<SupportOpt> lefts() {
            return lefts;
        }

        List<SupportOpt> rights() {
            return rights;
        }
    }

    private List<BeamSection.BarGroup> groups(BarSize bar, List<Integer> counts) {
        List<BeamSection.BarGroup> g = new ArrayList<>();
        counts.forEach(c -> g.add(new BeamSection.BarGroup(bar, c)));
        return g;
    }

    private BeamSection midSection(Frame f, SectionShape shape, MidOpt m) {
        List<BarLayer> ls = new ArrayList<>(BeamSection.stack(barfit.section.Face.BOTTOM, groups(m.bar(), m.counts()),
                f.det()));
        ls.addAll(BeamSection.stack(barfit.section.Face.TOP, List.of(new BeamSection.BarGroup(m.top().bar(),
                m.top().nc())), f.det()));
        return new BeamSection(shape, p.materials(), f.det(), ls, null, f.skin(), p.code());
    }

    private BeamSection supportSection(Frame f, SectionShape shape, SupportOpt s) {
        List<BarLayer> ls = new ArrayList<>(BeamSection.stack(barfit.section.Face.TOP, groups(s.bar(), s.counts()),
                f.det()));
        if (s.bottomKey() != null) {
            // the bottom bars the option was built with: its key is "<size>[counts]"
            String key = s.bottomKey();
            BarSize bb = p.space().barSizes().stream().filter(b -> key.startsWith(b.designation() + "["))
                    .findFirst().orElseThrow();
            List<Integer> counts = new ArrayList<>();
            for (String part : key.substring(key.indexOf('[') + 1, key.length() - 1).split(",")) {
                counts.add(Integer.parseInt(part.strip()));
            }
            ls.addAll(BeamSection.stack(barfit.section.Face.BOTTOM, groups(bb, counts), f.det()));
        }
        return new BeamSection(shape, p.materials(), f.det(), ls, null, f.skin(), p.code());
    }

    // ------------------------------------------------------------------ combining and bounding

    /** The cheapest compatible support option, or null. */
    static SupportOpt cheapestSupport(List<SupportOpt> opts, BarSize bar, int nc, int legsNeeded, String bottomKey) {
        SupportOpt best = null;
        for (SupportOpt s : opts) {
            if (s.bar().equals(bar) && s.counts().get(0) >= nc && s.legs() >= legsNeeded
                    && java.util.Objects.equals(s.bottomKey(), bottomKey) && (best == null || s.cost() < best.cost())) {
                best = s;
            }
        }
        return best;
    }

    /** Builds the layout of a combination. */
    public BeamLayout layout(Frame f, MidOpt m, SupportOpt l, SupportOpt r) {
        List<Stirrups> st = new ArrayList<>();
        for (int i = 0; i < zones.size(); i++) {
            Stirrups s = m.zones().get(i);
            if (s == null && l != null) {
                s = l.zones().get(i);
            }
            if (s == null && r != null) {
                s = r.zones().get(i);
            }
            st.add(s);
        }
        double extL = l == null ? 0 : Extension.of(p, f.b(), f.h(), f.det(), m.top().bar()).length();
        double extR = r == null ? 0 : Extension.of(p, f.b(), f.h(), f.det(), m.top().bar()).length();
        return new BeamLayout(f.b(), f.h(), p.flange(), f.ds(), f.skin(), m.top().bar(), m.top().nc(),
                l == null ? null : l.counts(), r == null ? null : r.counts(), m.bar(), m.counts(), st, extL, extR);
    }

    /** Support options by top bar size, cheapest first. */
    private static Map<BarSize, List<SupportOpt>> bySize(List<SupportOpt> opts) {
        Map<BarSize, List<SupportOpt>> out = new java.util.IdentityHashMap<>();
        for (SupportOpt s : opts) {
            out.computeIfAbsent(s.bar(), k -> new ArrayList<>()).add(s);
        }
        out.values().forEach(l -> l.sort(Comparator.comparingDouble(SupportOpt::cost)));
        return out;
    }

    private static SupportOpt cheapestIn(Map<BarSize, List<SupportOpt>> index, BarSize bar, int nc, int legsNeeded,
            String bottomKey) {
        List<SupportOpt> l = index.get(bar);
        if (l == null) {
            return null;
        }
        for (SupportOpt s : l) {
            if (s.counts().get(0) >= nc && s.legs() >= legsNeeded && java.util.Objects.equals(s.bottomKey(), bottomKey)) {
                return s;
            }
        }
        return null;
    }

    /** The frame's cheapest combination that passes, found by plain enumeration of its options. */
    private FrameSet enumerate(FrameSet fs) {
        double best = Double.POSITIVE_INFINITY;
        BeamLayout bestLayout = null;
        Map<BarSize, List<SupportOpt>> lefts = bySize(fs.lefts());
        Map<BarSize, List<SupportOpt>> rights = bySize(fs.rights());
        for (MidOpt m : fs.mids()) {
            TopOpt t = m.top();
            if (!t.bar().equals(m.bar()) && p.maxBarSizes() < 2) {
                continue;
            }
            String key = p.bottomAnchored() ? m.key() : null;
            SupportOpt l = null;
            SupportOpt r = null;
            if (p.leftSupport()) {
                l = cheapestIn(lefts, t.bar(), p.cantilever() ? 2 : t.nc(), m.legsNeeded(), key);
                if (l == null) {
                    continue;
                }
            }
            if (p.rightSupport()) {
                r = cheapestIn(rights, t.bar(), t.nc(), m.legsNeeded(), key);
                if (r == null) {
                    continue;
                }
            }
            double total = fs.frame().cost() + t.cost() + m.cost() + (l == null ? 0 : l.cost()) + (r == null ? 0 : r.cost());
            if (total < best - 1e-9) {
                BeamLayout lay = layout(fs.frame(), m, l, r);
                if (fs.frame().deflection() && !BeamVerifier.verify(p, lay, false).ok()) {
                    continue;
                }
                best = total;
                bestLayout = lay;
            }
        }
        return new FrameSet(fs.frame(), fs.tops(), fs.mids(), fs.lefts(), fs.rights(), best, bestLayout);
    }

    /** Drops the options that cannot be part of anything cheaper than the incumbent. */
    private FrameSet prune(FrameSet fs, double incumbent) {
        double frame = fs.frame().cost();
        Map<String, Double> cheapestLeft = new HashMap<>();
        Map<String, Double> cheapestRight = new HashMap<>();
        for (SupportOpt s : fs.lefts()) {
            cheapestLeft.merge(s.bar().designation(), s.cost(), Math::min);
        }
        for (SupportOpt s : fs.rights()) {
            cheapestRight.merge(s.bar().designation(), s.cost(), Math::min);
        }
        List<MidOpt> mids = new ArrayList<>();
        Map<String, Double> cheapestMidPlusTop = new HashMap<>();
        for (MidOpt m : fs.mids()) {
            String tb = m.top().bar().designation();
            double lb = frame + m.top().cost() + m.cost() + (p.leftSupport() ? cheapestLeft.getOrDefault(tb, 1e300) : 0)
                    + (p.rightSupport() ? cheapestRight.getOrDefault(tb, 1e300) : 0);
            if (lb <= incumbent + 1e-9) {
                mids.add(m);
                cheapestMidPlusTop.merge(tb, m.top().cost() + m.cost(), Math::min);
            }
        }
        List<TopOpt> tops = fs.tops().stream().filter(t -> mids.stream().anyMatch(m -> m.top().equals(t))).toList();
        List<SupportOpt> lefts = new ArrayList<>();
        for (SupportOpt s : fs.lefts()) {
            String tb = s.bar().designation();
            double lb = frame + cheapestMidPlusTop.getOrDefault(tb, 1e300) + s.cost()
                    + (p.rightSupport() ? cheapestRight.getOrDefault(tb, 1e300) : 0);
            if (lb <= incumbent + 1e-9) {
                lefts.add(s);
            }
        }
        List<SupportOpt> rights = new ArrayList<>();
        for (SupportOpt s : fs.rights()) {
            String tb = s.bar().designation();
            double lb = frame + cheapestMidPlusTop.getOrDefault(tb, 1e300) + s.cost()
                    + (p.leftSupport() ? cheapestLeft.getOrDefault(tb, 1e300) : 0);
            if (lb <= incumbent + 1e-9) {
                rights.add(s);
            }
        }
        return new FrameSet(fs.frame(), tops, mids, lefts, rights, fs.best(), fs.bestLayout());
    }

    public BeamProblem problem() {
        return p;
    }
}
