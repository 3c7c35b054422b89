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
            FrameSet fs = evaluate(f);
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

    private FrameSet evaluate(Frame f) {
        SectionShape shape = new SectionShape(f.b(), f.h(), p.flange());
        BarSize smallest = p.space().barSizes().stream().min(Comparator.comparingDouble(BarSize::diameter)).orElseThrow();
        if (!framePasses(f, shape, smallest, smallest, 1)) {
            return null; // cover, flange width or skin rules fail for this frame whatever the bars
        }
        List<TopOpt> tops = tops(f);
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
        List<SupportOpt> lefts = p.leftSupport() ? supports(f, shape, BeamProblem.Place.LEFT, p.mLeft(), f.extLeft(),
                bottoms) : List.of();
        List<SupportOpt> rights = p.rightSupport() ? supports(f, shape, BeamProblem.Place.RIGHT, p.mRight(),
                f.extRight(), bottoms) : List.of();
        FrameSet fs = new FrameSet(f, tops, mids, lefts, rights, Double.POSITIVE_INFINITY, null);
        return enumerate(fs);
    }

    private List<TopOpt> tops(Frame f) {
        List<TopOpt> out = new ArrayList<>();
        for (BarSize t : p.space().barSizes()) {
            int nmax = BarSpacing.maxBars(f.b(), f.det(), t, p.materials(), p.code());
            int ncMax = p.cantilever() ? Math.min(2, nmax) : nmax;
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
                                Stirrups st = chooser.cheapest(shape, f.det(), d, as, z.vu(), legs, z.length());
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
                                    Stirrups st = chooser.cheapest(shape, f.det(), d, as, z.vu(), legs, z.length());
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

    /** The frame's cheapest combination that passes, found by plain enumeration of its options. */
    private FrameSet enumerate(FrameSet fs) {
        double best = Double.POSITIVE_INFINITY;
        BeamLayout bestLayout = null;
        for (MidOpt m : fs.mids()) {
            TopOpt t = m.top();
            if (!t.bar().equals(m.bar()) && p.maxBarSizes() < 2) {
                continue;
            }
            String key = p.bottomAnchored() ? m.key() : null;
            SupportOpt l = null;
            SupportOpt r = null;
            if (p.leftSupport()) {
                l = cheapestSupport(fs.lefts(), t.bar(), p.cantilever() ? 2 : t.nc(), m.legsNeeded(), key);
                if (l == null) {
                    continue;
                }
            }
            if (p.rightSupport()) {
                r = cheapestSupport(fs.rights(), t.bar(), t.nc(), m.legsNeeded(), key);
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
