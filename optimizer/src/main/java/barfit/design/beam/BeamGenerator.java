package barfit.design.beam;

import barfit.catalogs.BarSize;
import barfit.design.CostModel;
import barfit.design.FrameEnumerator;
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
import barfit.section.StirrupRules;
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
    /** Support options designed with no bottom bars counted at the support: one pass, without them. */
    private static final List<BottomBars> NO_BOTTOM_BARS = java.util.Collections.singletonList(null);
    /** The "legs" of a support option whose section sizes no stirrup zone: it limits nothing. */
    static final int NO_ZONES = 1000;
    /** The most legs of a support option whose section sizes no stirrup zone: it asks nothing of the bottom bars. */
    static final int NO_ZONES_MAX = 0;

    public record Stats(int frames, int framesEvaluated, int framesSkipped, int flexureSolves, int shearEvaluations,
            long nanos) {
    }

    public record Output(List<FrameOptions> sets, double incumbent, BeamLayout incumbentLayout, Stats stats) {
    }

    /**
     * What a frame's options must beat to be worth searching, and what evaluating a frame lowers: for a
     * span's design one cost, the cheapest design found; for pricing a size one cost per pair of top and
     * bottom bar sizes.
     */
    interface Target {
        /** A combination with top bars of size {@code top} and bottom bars of size {@code bottom} pays only below this. */
        double limit(BarSize top, BarSize bottom);

        /** Any combination with top bars of this size pays only below this. */
        double limitForTop(BarSize top);

        /** The one cost every combination must beat, or infinity where each pair of sizes has its own. */
        double common();

        /** Takes account of a frame's options and their cheapest combination. */
        void lower(FrameOptions evaluated);
    }

    /** The span's design: a combination pays only below the cheapest found (or the search's ceiling). */
    private static final class Cheapest implements Target {
        private double cost;

        Cheapest(double cost) {
            this.cost = cost;
        }

        @Override
        public double limit(BarSize top, BarSize bottom) {
            return cost;
        }

        @Override
        public double limitForTop(BarSize top) {
            return cost;
        }

        @Override
        public double common() {
            return cost;
        }

        @Override
        public void lower(FrameOptions evaluated) {
            cost = Math.min(cost, evaluated.best());
        }
    }

    private final BeamProblem p;
    private final CostModel cost;
    private final SectionProbe midProbe;
    private final SectionProbe supportProbe;
    private final TensionSearch midSearch;
    private final StirrupChooser chooser;
    private final SpanSections sections;
    private final Combinations combinations;
    private final List<BeamProblem.Zone> zones;
    private final double lm;
    /** Zone stirrups depend only on the zone, the tension bars (d, As) and the legs asked for: remembered per frame. */
    private final Map<ZoneKey, Stirrups> zoneMemo = new HashMap<>();

    private record ZoneKey(int zone, double d, double as, int legs, int mostLegs, double maxSpacing) {
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
        this.sections = new SpanSections(p);
        this.combinations = new Combinations(p, zones);
        this.lm = p.span() / 1000.0;
    }

    private double barCost(BarSize bar, int count, double length) {
        return cost.bars(bar, count, length);
    }

    private double stirrupCost(double b, double h, Stirrups s, BeamProblem.Zone z) {
        return cost.rates().stirrupsPerKg() * s.bar().massPerMetre() * BeamLayout.stirrupSets(z.length(), s.spacing())
                * cost.stirrupSetLength(b, h, s.bar(), s.legs()) / 1000.0;
    }

    public Output generate() {
        return generate(0);
    }

    /**
     * Generates the frames and options of the span. With {@code slack} 0 everything that cannot beat the
     * cheapest design found is left out; with slack s everything costing more than (1 + s) times it, so
     * that the next-cheapest designs within that margin stay in the candidate sets (alternatives).
     */
    public Output generate(double slack) {
        return generate(slack, Double.POSITIVE_INFINITY);
    }

    /**
     * As {@link #generate(double)}, with the cost of a design known to pass ({@code ceiling}, per span; a
     * line's previous round, say) bounding the search from the start as the cheapest found would.
     */
    public Output generate(double slack, double ceiling) {
        long t0 = System.nanoTime();
        final double roof = loose(ceiling, slack);
        List<SpanFrame> frames = cachedFrames();
        List<FrameOptions> sets = new ArrayList<>();
        double incumbent = Double.POSITIVE_INFINITY;
        BeamLayout incumbentLayout = null;
        int evaluated = 0;
        int skipped = 0;
        // Below Table 9.3.1.1 a frame is costly to search without a cost to beat, and the cheapest bounds
        // are often there: search the most promising frame at or above h,min first for that cost.
        SpanFrame opener = null;
        for (SpanFrame f : frames) {
            if (!f.deflection() && Double.isFinite(f.lowerBound())) {
                opener = f;
                break;
            }
        }
        if (opener != null && frames.get(0) != opener && frames.get(0).deflection()) {
            evaluated++;
            FrameOptions fs = evaluate(opener, new Cheapest(Math.min(loose(incumbent, slack), roof)));
            if (fs != null) {
                sets.add(fs);
                if (fs.best() < incumbent) {
                    incumbent = fs.best();
                    incumbentLayout = fs.bestLayout();
                }
            }
        } else {
            opener = null;
        }
        for (int i = 0; i < frames.size(); i++) {
            SpanFrame f = frames.get(i);
            if (f == opener) {
                continue;
            }
            if (f.lowerBound() >= Math.min(loose(incumbent, slack), roof) || Double.isInfinite(f.lowerBound())) {
                skipped = frames.size() - i;
                break;
            }
            if (Double.isFinite(Math.min(incumbent, roof)) && frameLowerBound(f) >= Math.min(loose(incumbent, slack), roof) - 1e-9) {
                continue; // a closer look at its bars shows it cannot beat the incumbent
            }
            evaluated++;
            FrameOptions fs = evaluate(f, new Cheapest(Math.min(loose(incumbent, slack), roof)));
            if (fs == null) {
                continue;
            }
            sets.add(fs);
            if (fs.best() < incumbent) {
                incumbent = fs.best();
                incumbentLayout = fs.bestLayout();
            }
        }
        final double inc = Math.min(loose(incumbent, slack), roof);
        List<FrameOptions> kept = new ArrayList<>();
        for (FrameOptions fs : sets) {
            if (fs.frame().lowerBound() < inc + 1e-9) {
                kept.add(combinations.prune(fs, inc));
            }
        }
        return new Output(kept, incumbent, incumbentLayout, new Stats(frames.size(), evaluated, skipped,
                midProbe.solves() + supportProbe.solves(), chooser.evaluations(), System.nanoTime() - t0));
    }

    private static double loose(double incumbent, double slack) {
        return slack == 0 ? incumbent : incumbent * (1 + slack);
    }

    // ------------------------------------------------------------------ frames and their bounds

    /**
     * No design of the span costs less than this: the least of its frames' lower bounds (concrete,
     * formwork, skin bars, and the section model's strength bound on the bars and stirrups); infinite
     * when no frame can hold it.
     */
    public double leastCost() {
        double least = Double.POSITIVE_INFINITY;
        for (SpanFrame f : frames()) {
            least = Math.min(least, f.lowerBound());
        }
        return least;
    }

    private List<SpanFrame> frames() {
        List<SpanFrame> out = new ArrayList<>();
        BarSize smallest = p.space().barSizes().stream().min(Comparator.comparingDouble(BarSize::diameter)).orElseThrow();
        double massPerArea = Double.MAX_VALUE;
        for (BarSize s : p.space().barSizes()) {
            massPerArea = Math.min(massPerArea, s.massPerMetre() / s.area());
        }
        double rate = cost.mainBarPricePerKg() * massPerArea;
        for (FrameEnumerator.Cell cell : FrameEnumerator.cells(p.widths(), p.depths(),
                p.flange(), p.space(), p.detailing())) {
            double b = cell.width();
            double h = cell.height();
            BarSize ds = cell.stirrupBar();
            Detailing det = cell.detailing();
            boolean deflection = h < SpanChecks.minimumDepth(p.span(), p.ends(), p.materials(), p.code()) - 1e-9;
            if (deflection && p.service() == null) {
                continue; // below Table 9.3.1.1 and nothing to compute deflection from
            }
            SkinBars skin = Layout.skinFor(h, p.space().skinBar(), det, p.materials(), p.code());
            double frameCost = cost.frame(b, h, p.flange()).total() * lm
                    + (skin == null ? 0 : barCost(skin.bar(), 2 * Layout.skinBarsPerFace(h, skin.spacing()), p.span()));
            double extL = p.leftSupport() ? Extension.of(p, b, h, det, smallest).length() : 0;
            double extR = p.rightSupport() ? Extension.of(p, b, h, det, smallest).length() : 0;
            double lb = frameCost + steelLowerBound(b, h, det, smallest, rate) + stirrupLowerBound(b, h, ds);
            out.add(new SpanFrame(b, h, ds, det, skin, frameCost, lb, deflection, extL, extR));
        }
        out.sort(Comparator.comparingDouble(SpanFrame::lowerBound).thenComparingDouble(SpanFrame::b)
                .thenComparingDouble(SpanFrame::h).thenComparingDouble(f -> f.stirrupBar().diameter()));
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
        double widest = p.flange() != null ? p.flange().on(b).width() : b; // at its effective width on this web
        double l = p.span();
        double bottom = p.midSection()
                ? StrengthBound.minTensionArea(p.mMid(), dMax, compArea, dp, dp + 60, widest, fc, fy)
                : minPair;
        double area = Math.max(bottom, minPair) * l;
        double supportL = p.leftSupport()
                ? StrengthBound.minTensionArea(p.mLeft(), dMax, compArea, dp, dp + 60, b, fc, fy) : 0;
        double supportR = p.rightSupport()
                ? StrengthBound.minTensionArea(p.mRight(), dMax, compArea, dp, dp + 60, b, fc, fy) : 0;
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
    private boolean framePasses(SpanFrame f, SectionShape shape, BarSize a, BarSize c, int layers) {
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

    /**
     * The frame's options and its cheapest combination, searched only as far as {@code target} says they
     * could pay; null if the frame fails whatever its bars.
     */
    FrameOptions evaluate(SpanFrame f, Target target) {
        zoneMemo.clear();
        useFrame(f);
        SectionShape shape = new SectionShape(f.b(), f.h(), p.flange());
        BarSize smallest = p.space().barSizes().stream().min(Comparator.comparingDouble(BarSize::diameter)).orElseThrow();
        if (!framePasses(f, shape, smallest, smallest, 1)) {
            return null; // cover, flange width or skin rules fail for this frame whatever the bars
        }
        List<TopOption> tops = tops(f);
        if (p.bottomAnchored() || f.deflection()) {
            return everything(f, shape, tops, target);
        }
        // supports first (they do not depend on the other options), then the mid-span options for two
        // continuous bars, then more continuous bars only where a bound says they could pay
        java.util.function.ToDoubleFunction<BarSize> supportLimit = supportLimit(f, tops, target);
        List<SupportOption> lefts = p.leftSupport()
                ? supports(f, shape, BeamProblem.Place.LEFT, p.mLeft(), supportLimit, NO_BOTTOM_BARS) : List.of();
        List<SupportOption> rights = p.rightSupport()
                ? supports(f, shape, BeamProblem.Place.RIGHT, p.mRight(), supportLimit, NO_BOTTOM_BARS) : List.of();
        List<TopOption> twoContinuous = tops.stream().filter(t -> t.continuous() == 2).toList();
        List<MidOption> mids = new ArrayList<>(mids(f, shape, twoContinuous, midLimit(f, target, lefts, rights)));
        target.lower(combinations.enumerate(new FrameOptions(f, tops, mids, lefts, rights, Double.POSITIVE_INFINITY,
                null)));
        addMoreContinuous(f, shape, tops, mids, target, lefts, rights);
        FrameOptions out = combinations.enumerate(new FrameOptions(f, tops, mids, lefts, rights,
                Double.POSITIVE_INFINITY, null));
        target.lower(out);
        return out;
    }

    /**
     * Per top bar size, the cost at or above which a support option cannot be part of anything that pays:
     * what must be beaten less the least the rest of a combination costs (no limit without one cost to beat).
     */
    private java.util.function.ToDoubleFunction<BarSize> supportLimit(SpanFrame f, List<TopOption> tops,
            Target target) {
        double common = target.common();
        return Double.isInfinite(common) ? t -> Double.POSITIVE_INFINITY : t -> common - leastWithout(f, tops, t);
    }

    /**
     * A mid-span option pays only below what its pair of sizes must beat less the frame, its top option
     * and the cheapest support options that could go with it ({@code lefts} or {@code rights} null: not
     * known yet, counted as nothing).
     */
    private MidLimit midLimit(SpanFrame f, Target target, List<SupportOption> lefts, List<SupportOption> rights) {
        return (top, bottom) -> target.limit(top.bar(), bottom) - f.cost() - top.cost()
                - (lefts == null ? 0 : Combinations.cheapestAbove(lefts, top, p.leftSupport()))
                - (rights == null ? 0 : Combinations.cheapestAbove(rights, top, p.rightSupport()));
    }

    /**
     * Adds the mid-span options of the top options with more than two continuous bars whose least cost
     * (the frame's bounds, the cheapest supports) could still pay; whether it added any.
     */
    private boolean addMoreContinuous(SpanFrame f, SectionShape shape, List<TopOption> tops, List<MidOption> mids,
            Target target, List<SupportOption> lefts, List<SupportOption> rights) {
        boolean added = false;
        for (TopOption t : tops) {
            if (t.continuous() == 2) {
                continue;
            }
            double least = f.cost() + t.cost() + bottomLowerBound(f, t)
                    + Combinations.cheapestAbove(lefts, t, p.leftSupport())
                    + Combinations.cheapestAbove(rights, t, p.rightSupport());
            if (least < target.limitForTop(t.bar())) {
                mids.addAll(mids(f, shape, List.of(t), midLimit(f, target, lefts, rights)));
                added = true;
            }
        }
        return added;
    }

    private List<SpanFrame> allFrames;

    /** The frames of the problem, computed once. */
    List<SpanFrame> cachedFrames() {
        if (allFrames == null) {
            allFrames = frames();
        }
        return allFrames;
    }

    private final Map<BarSize, Integer> barIndex = new java.util.IdentityHashMap<>();

    int index(BarSize bar) {
        Integer i = barIndex.get(bar);
        if (i == null) {
            i = p.space().barSizes().indexOf(bar);
            barIndex.put(bar, i);
        }
        return i;
    }

    Combinations combinations() {
        return combinations;
    }

    /**
     * A lower bound on the mid-span option cost for a top option: the least bottom area any layout
     * could carry Mu with (the section model's strength bound, with the continuous bars as compression
     * steel), priced per size, plus the cheapest stirrups of the mid-span zones.
     */
    private double bottomLowerBound(SpanFrame f, TopOption t) {
        double best = Double.POSITIVE_INFINITY;
        for (BarSize bb : p.space().barSizes()) {
            best = Math.min(best, bottomBarLowerBound(f, t, bb));
        }
        return best + leanMid(f);
    }

    /** All options at once (anchored bottom bars, or below Table 9.3.1.1 where more steel can pay). */
    private FrameOptions everything(SpanFrame f, SectionShape shape, List<TopOption> tops, Target target) {
        // deflection and anchorage only add demands: what cannot beat the target on cost alone is not searched
        java.util.function.ToDoubleFunction<BarSize> limit = supportLimit(f, tops, target);
        // without anchored bottom bars the supports do not depend on the mid-span options: find them first,
        // so the mid-span search knows the least the supports add
        List<SupportOption> knownLeft = null;
        List<SupportOption> knownRight = null;
        if (!p.bottomAnchored()) {
            knownLeft = p.leftSupport()
                    ? supports(f, shape, BeamProblem.Place.LEFT, p.mLeft(), limit, NO_BOTTOM_BARS) : List.of();
            knownRight = p.rightSupport()
                    ? supports(f, shape, BeamProblem.Place.RIGHT, p.mRight(), limit, NO_BOTTOM_BARS) : List.of();
        }
        if (f.deflection() && !p.bottomAnchored()) {
            return belowMinimumDepth(f, shape, tops, target, knownLeft, knownRight);
        }
        List<MidOption> mids = mids(f, shape, tops, midLimit(f, target, knownLeft, knownRight));
        List<BottomBars> bottoms;
        if (p.bottomAnchored()) {
            java.util.Set<BottomBars> distinct = new java.util.LinkedHashSet<>();
            for (MidOption m : mids) {
                distinct.add(m.bottom());
            }
            bottoms = new ArrayList<>(distinct);
        } else {
            bottoms = NO_BOTTOM_BARS;
        }
        List<SupportOption> lefts = knownLeft != null ? knownLeft : p.leftSupport()
                ? supports(f, shape, BeamProblem.Place.LEFT, p.mLeft(), limit, bottoms) : List.of();
        List<SupportOption> rights = knownRight != null ? knownRight : p.rightSupport()
                ? supports(f, shape, BeamProblem.Place.RIGHT, p.mRight(), limit, bottoms) : List.of();
        return screened(f, shape, tops, mids, lefts, rights, target);
    }

    /** The frame's options after the deflection screen (below Table 9.3.1.1), enumerated; the target lowered. */
    private FrameOptions screened(SpanFrame f, SectionShape shape, List<TopOption> tops, List<MidOption> mids,
            List<SupportOption> lefts, List<SupportOption> rights, Target target) {
        if (f.deflection()) {
            DeflectionScreen screen = new DeflectionScreen(p, sections, f, shape, mids, lefts, rights);
            mids = screen.mids();
            lefts = screen.lefts();
            rights = screen.rights();
        }
        FrameOptions out = combinations.enumerate(new FrameOptions(f, tops, mids, lefts, rights,
                Double.POSITIVE_INFINITY, null));
        target.lower(out);
        return out;
    }

    /**
     * Below Table 9.3.1.1 (bottom bars not anchored): as for other frames, two continuous top bars first;
     * their best passing combination then bounds which top options with more continuous bars (stiffer,
     * dearer) are searched.
     */
    private FrameOptions belowMinimumDepth(SpanFrame f, SectionShape shape, List<TopOption> tops, Target target,
            List<SupportOption> lefts, List<SupportOption> rights) {
        List<TopOption> twoContinuous = tops.stream().filter(t -> t.continuous() == 2).toList();
        List<MidOption> mids = new ArrayList<>(mids(f, shape, twoContinuous, midLimit(f, target, lefts, rights)));
        FrameOptions first = screened(f, shape, tops, new ArrayList<>(mids), lefts, rights, target);
        boolean more = addMoreContinuous(f, shape, tops, mids, target, lefts, rights);
        return more ? screened(f, shape, tops, mids, lefts, rights, target) : first;
    }

    private List<TopOption> tops(SpanFrame f) {
        List<TopOption> out = new ArrayList<>();
        for (BarSize t : p.space().barSizes()) {
            int nmax = BarSpacing.maxBars(f.b(), f.det(), t, p.materials(), p.code());
            int ncMax = p.cantilever() || p.space().hangersOnly() ? Math.min(2, nmax) : nmax;
            double extL = p.leftSupport() ? Extension.of(p, f.b(), f.h(), f.det(), t).length() : 0;
            double extR = p.rightSupport() ? Extension.of(p, f.b(), f.h(), f.det(), t).length() : 0;
            // a continuous bar is priced over the span less the stretches the support options price it over;
            // where the extras' ld makes those overlap, that is negative: a continuous bar then costs less
            // than the two extras it replaces, and the sum still prices it at the full span
            // (a cantilever's top bars are all priced with its support option)
            double run = p.cantilever() ? 0 : p.span() - extL - extR;
            for (int nc = 2; nc <= ncMax; nc++) {
                out.add(new TopOption(t, nc, barCost(t, nc, run)));
            }
        }
        return out;
    }

    /**
     * The least a combination with top bars of size {@code t} could cost apart from one support's option:
     * the frame, the cheapest top option of that size, and the least bottom bars (with the most continuous
     * bars of that size as compression steel) and mid-span stirrups.
     */
    private double leastWithout(SpanFrame f, List<TopOption> tops, BarSize t) {
        double top = Double.POSITIVE_INFINITY;
        TopOption most = null;
        for (TopOption o : tops) {
            if (o.bar().equals(t)) {
                top = Math.min(top, o.cost());
                if (most == null || o.continuous() > most.continuous()) {
                    most = o;
                }
            }
        }
        if (most == null) {
            return Double.POSITIVE_INFINITY;
        }
        double bottom = Double.POSITIVE_INFINITY;
        for (BarSize bb : p.space().barSizes()) {
            if (p.maxBarSizes() >= 2 || bb.equals(t)) {
                bottom = Math.min(bottom, bottomBarLowerBound(f, most, bb));
            }
        }
        return f.cost() + top + bottom + leanMid(f);
    }

    /**
     * The most a mid-span option of a top option and bottom bar size may cost (its bars and stirrups) and
     * still be part of something cheaper than what is known: what the search beats, less the least the
     * rest of a combination costs. Options at or above it are not searched.
     */
    @FunctionalInterface
    private interface MidLimit {
        double of(TopOption top, BarSize bottom);
    }

    /**
     * The least the bottom bars of one size could cost with a top option's continuous bars as compression
     * steel: the section model's strength bound on the area, in whole bars, no fewer than two or than crack
     * control asks of the first layer.
     */
    private double bottomBarLowerBound(SpanFrame f, TopOption t, BarSize bb) {
        int nb = p.space().barSizes().size();
        int ti = index(t.bar());
        int bi = index(bb);
        if (bottomMemo == null || bottomMemo.length <= t.continuous()) {
            bottomMemo = new double[Math.max(t.continuous() + 1, 16)][][];
        }
        if (bottomMemo[t.continuous()] == null) {
            bottomMemo[t.continuous()] = new double[nb][nb];
            for (double[] row : bottomMemo[t.continuous()]) {
                java.util.Arrays.fill(row, Double.NaN);
            }
        }
        double known = bottomMemo[t.continuous()][ti][bi];
        if (Double.isNaN(known)) {
            known = computeBottomBarLowerBound(f, t, bb);
            bottomMemo[t.continuous()][ti][bi] = known;
        }
        return known;
    }

    private SpanFrame memoFrame;
    private double asMinSagging = Double.NaN;
    private double asMinHogging = Double.NaN;
    private int[] crackMemo;

    /** As,min of 9.6.1.2 per mm of d for the frame (the section model's rule at d = 1 mm). */
    private double asMinPerDepth(SpanFrame f, Bending bending) {
        useFrame(f);
        if (Double.isNaN(asMinSagging)) {
            SectionShape shape = new SectionShape(f.b(), f.h(), p.flange());
            Span span = new Span(p.span(), p.ends());
            asMinSagging = SectionChecks.asMin(shape, Bending.SAGGING, span, p.materials(), p.code(), 1.0);
            asMinHogging = SectionChecks.asMin(shape, Bending.HOGGING, span, p.materials(), p.code(), 1.0);
        }
        return bending == Bending.SAGGING ? asMinSagging : asMinHogging;
    }

    /** The fewest bars of a size crack control (24.3.2) allows in the frame's first layer. */
    private int crackBars(SpanFrame f, BarSize bar) {
        useFrame(f);
        if (crackMemo == null) {
            crackMemo = new int[p.space().barSizes().size()];
            java.util.Arrays.fill(crackMemo, -1);
        }
        int i = index(bar);
        if (crackMemo[i] < 0) {
            crackMemo[i] = BarSpacing.minBarsForCrackControl(f.b(), f.det(), bar, p.materials().fy(), p.code());
        }
        return crackMemo[i];
    }

    private void useFrame(SpanFrame f) {
        if (memoFrame != f) {
            bottomMemo = null;
            asMinSagging = Double.NaN;
            asMinHogging = Double.NaN;
            crackMemo = null;
            leanMemo.clear();
            memoFrame = f;
        }
    }

    /**
     * A tighter lower bound than the frame's first one, still without searching bars: the least of
     * {@link #pairLowerBound}.
     */
    private double frameLowerBound(SpanFrame f) {
        double best = Double.POSITIVE_INFINITY;
        for (double[] row : pairLowerBound(f)) {
            for (double v : row) {
                best = Math.min(best, v);
            }
        }
        return best;
    }

    /**
     * Per pair of bar sizes (top i, bottom j), a lower bound on any passing combination of the frame
     * without searching bars: the cheapest top option of size i; the least bottom bars of size j (with
     * the most continuous bars of size i as compression steel) and mid-span stirrups; and at each support
     * the fewest bars of size i the section model's strength bound allows over their real extension, with
     * the leanest stirrups of the support's zones.
     */
    double[][] pairLowerBound(SpanFrame f) {
        useFrame(f);
        int nb = p.space().barSizes().size();
        double[][] out = new double[nb][nb];
        for (double[] row : out) {
            java.util.Arrays.fill(row, Double.POSITIVE_INFINITY);
        }
        List<TopOption> tops = tops(f);
        double fc = p.materials().fc();
        double fy = p.materials().fy();
        double leanMid = leanMid(f);
        // anchored bottom bars are compression steel at the supports: allow the most there could be
        double comp = 0;
        if (p.bottomAnchored()) {
            for (BarSize bb : p.space().barSizes()) {
                comp = Math.max(comp, BarSpacing.maxBars(f.b(), f.det(), bb, p.materials(), p.code()) * bb.area()
                        * p.space().maxLayers());
            }
        }
        for (int i = 0; i < nb; i++) {
            BarSize t = p.space().barSizes().get(i);
            double top = Double.POSITIVE_INFINITY;
            TopOption most = null;
            for (TopOption o : tops) {
                if (o.bar().equals(t)) {
                    top = Math.min(top, o.cost());
                    if (most == null || o.continuous() > most.continuous()) {
                        most = o;
                    }
                }
            }
            if (most == null) {
                continue;
            }
            int ncr = BarSpacing.minBarsForCrackControl(f.b(), f.det(), t, fy, p.code());
            double ext = Extension.of(p, f.b(), f.h(), f.det(), t).length();
            double dMax = f.h() - f.det().firstLayerCentroid(t.diameter());
            double dp = f.det().firstLayerCentroid(p.space().barSizes().get(0).diameter());
            double supports = 0;
            for (BeamProblem.Place place : new BeamProblem.Place[] {BeamProblem.Place.LEFT, BeamProblem.Place.RIGHT}) {
                Double mu = place == BeamProblem.Place.LEFT ? (p.leftSupport() ? p.mLeft() : null)
                        : (p.rightSupport() ? p.mRight() : null);
                if (mu == null) {
                    continue;
                }
                double area = StrengthBound.minTensionArea(mu, dMax, comp, dp, dp, f.b(), fc, fy);
                if (Double.isInfinite(area)) {
                    supports = Double.POSITIVE_INFINITY;
                    break;
                }
                // minimum steel (9.6.1.2) at the shallowest d the layers could give, or 4/3 of the strength need
                double dMin = f.h() - f.det().firstLayerCentroid(t.diameter())
                        - (p.space().maxLayers() - 1) * (t.diameter() + f.det().layerGap());
                double asMin = asMinPerDepth(f, Bending.HOGGING) * dMin;
                area = StrengthBound.withMinimumSteel(area, asMin);
                int n = Math.max(Math.max(2, ncr), (int) Math.ceil(area / t.area() - 1e-9));
                supports += barCost(t, n, ext) + leanStirrups(f, place);
            }
            if (Double.isInfinite(supports)) {
                continue;
            }
            for (int j = 0; j < nb; j++) {
                BarSize u = p.space().barSizes().get(j);
                if (p.maxBarSizes() < 2 && !u.equals(t)) {
                    continue;
                }
                out[i][j] = f.cost() + top + bottomBarLowerBound(f, most, u) + leanMid + supports;
            }
        }
        return out;
    }

    /** {@link #bottomBarLowerBound} per frame: [continuous bars][top size][bottom size], NaN until asked. */
    private double[][][] bottomMemo;

    private double computeBottomBarLowerBound(SpanFrame f, TopOption t, BarSize bb) {
        if (!p.midSection()) {
            return barCost(bb, 2, p.span()); // a cantilever's bottom bars are two or more hangers
        }
        double widest = p.flange() != null ? p.flange().on(f.b()).width() : f.b(); // effective width on this web
        double fc = p.materials().fc();
        double fy = p.materials().fy();
        double comp = t.continuous() * t.bar().area();
        double dp = f.det().firstLayerCentroid(t.bar().diameter());
        double dMax = f.h() - f.det().firstLayerCentroid(bb.diameter());
        double area = StrengthBound.minTensionArea(p.mMid(), dMax, comp, dp, dp, widest, fc, fy);
        if (Double.isInfinite(area)) {
            return Double.POSITIVE_INFINITY;
        }
        // minimum steel (9.6.1.2) at the shallowest d the layers could give, or 4/3 of the strength need (9.6.1.3)
        double dMin = f.h() - f.det().firstLayerCentroid(bb.diameter())
                - (p.space().maxLayers() - 1) * (bb.diameter() + f.det().layerGap());
        double asMin = asMinPerDepth(f, Bending.SAGGING) * dMin; // As,min is proportional to d
        area = StrengthBound.withMinimumSteel(area, asMin);
        int ncr = crackBars(f, bb);
        int n = Math.max(Math.max(2, ncr), (int) Math.ceil(area / bb.area() - 1e-9));
        return barCost(bb, n, p.span());
    }

    private List<MidOption> mids(SpanFrame f, SectionShape shape, List<TopOption> tops, MidLimit cut) {
        List<MidOption> out = new ArrayList<>();
        List<Integer> midZones = zoneIndices(BeamProblem.Place.MID);
        int mostLegs = p.space().stirrupLegs().get(p.space().stirrupLegs().size() - 1);
        if (p.cantilever()) {
            // the bottom bars of a cantilever are its hangers: two or more of one size, one layer
            TopOption only = null;
            // (in more than one layer only where they are anchored and so count as compression steel)
            int bottomLayers = p.bottomAnchored() ? p.space().maxLayers() : 1;
            for (TopOption t : tops) {
                for (BarSize bb : p.space().barSizes()) {
                    int nmax = BarSpacing.maxBars(f.b(), f.det(), bb, p.materials(), p.code());
                    for (int layers = 1; layers <= bottomLayers; layers++) {
                        if (layers > 1 && !barfit.design.Layout.fitsHeight(f.h(), f.det(), bb, layers, t.bar())) {
                            break;
                        }
                        for (List<Integer> counts : barfit.design.ExhaustiveSearch.countVectors(layers, nmax)) {
                            out.add(new MidOption(t, bb, counts, f.det().firstLayerCentroid(bb.diameter()), Map.of(),
                                    barCost(bb, BeamLayout.sum(counts), p.span()), p.legsFor(counts.get(0))));
                        }
                    }
                }
            }
            return out;
        }
        midProbe.frame(shape, Bending.SAGGING, new Span(p.span(), p.ends()));
        midSearch.frame(f.det());
        for (TopOption top : tops) {
            midSearch.compression(List.of(new BeamSection.BarGroup(top.bar(), top.continuous())));
            for (BarSize bb : p.space().barSizes()) {
                if (p.maxBarSizes() < 2 && !bb.equals(top.bar())) {
                    continue;
                }
                double limit = cut.of(top, bb);
                if (bottomBarLowerBound(f, top, bb) + leanMid(f) >= limit - 1e-9) {
                    continue;
                }
                // the cheapest option found so far for each number of legs it asks of the supports
                Map<Integer, Double> cheapestByLegs = new HashMap<>();
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
                        if (barCost(bb, n, p.span()) + leanMid(f) >= limit - 1e-9) {
                            break; // this many bars cost more than an option could and still pay
                        }
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
                            // legs: the office's rule, the ties round top bars relied on (9.7.6.4), and no more
                            // than the outer bottom layer and the continuous top bars hold (25.7.1.2, 25.7.1.3)
                            StirrupRules.TieDemand ties = midZones.isEmpty() ? StirrupRules.TieDemand.NONE
                                    : StirrupRules.ties(sections.mid(f, shape, top, bb, split), Bending.SAGGING, p.mMid());
                            if (!ties.sizeOk(f.stirrupBar().diameter())) {
                                continue;
                            }
                            int legs = Math.max(p.legsFor(Math.max(split[0], top.continuous())), ties.minLegs());
                            int most = Math.min(split[0], top.continuous());
                            ZoneSet zs = zoneSet(shape, f, midZones, bb, split, legs, most, ties.maxSpacing(), d, as);
                            if (zs != null) {
                                double stirCost = zs.cost();
                                out.add(new MidOption(top, bb, TensionSearch.toList(split), d, zs.stirrups(),
                                        barCost(bb, n, p.span()) + stirCost, p.legsFor(split[0])));
                                // only an option whose bottom bars hold every legs count the supports may use
                                // can stand for the dearer options with more bars below
                                if (split[0] >= mostLegs) {
                                    cheapestByLegs.merge(p.legsFor(split[0]), barCost(bb, n, p.span()) + stirCost,
                                            Math::min);
                                }
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
                        // tighter where the bottom bars meet nothing but the mid-span zones: an option with
                        // n + 1 or more bars costs at least its bars and the leanest stirrups, and asks for
                        // at least the legs of its fullest possible first layer; one found already that is
                        // no dearer and asks no more legs of the supports is as good in every combination
                        if (!f.deflection() && !p.bottomAnchored()
                                && dominated(cheapestByLegs, p.legsFor((n + layers) / layers),
                                        barCost(bb, n + 1, p.span()) + leanMid(f))) {
                            break;
                        }
                    }
                }
            }
        }
        return out;
    }

    /** The cheapest stirrups of some zones for one set of tension bars, and their cost over the zones. */
    private record ZoneSet(Map<Integer, Stirrups> stirrups, double cost) {
    }

    /**
     * Stirrups with {@code legs} to {@code mostLegs} legs, at most {@code maxSpacing} apart, in each of the
     * zones, or null if some zone has none that pass.
     */
    private ZoneSet zoneSet(SectionShape shape, SpanFrame f, List<Integer> zoneIds, BarSize tension, int[] counts, int legs,
            int mostLegs, double maxSpacing, double d, double as) {
        Map<Integer, Stirrups> zs = new LinkedHashMap<>();
        double cost = 0;
        for (int zi : zoneIds) {
            Stirrups st = zoneStirrups(shape, f, zi, legs, mostLegs, maxSpacing, d, as);
            if (st == null) {
                return null;
            }
            zs.put(zi, st);
            cost += stirrupCost(f.b(), f.h(), st, zones.get(zi));
        }
        return new ZoneSet(zs, cost);
    }

    private Stirrups zoneStirrups(SectionShape shape, SpanFrame f, int zone, int legs, int mostLegs, double maxSpacing,
            double d, double as) {
        ZoneKey key = new ZoneKey(zone, d, as, legs, mostLegs, maxSpacing);
        if (zoneMemo.containsKey(key)) {
            return zoneMemo.get(key);
        }
        BeamProblem.Zone z = zones.get(zone);
        Stirrups st = chooser.cheapest(shape, f.det(), d, as, z.vu(d), legs, mostLegs, maxSpacing, z.length());
        zoneMemo.put(key, st);
        return st;
    }

    /** Whether an option asking at most {@code legs} and costing at most {@code cost} has been found. */
    private static boolean dominated(Map<Integer, Double> cheapestByLegs, int legs, double cost) {
        for (Map.Entry<Integer, Double> e : cheapestByLegs.entrySet()) {
            if (e.getKey() <= legs && e.getValue() <= cost + 1e-9) {
                return true;
            }
        }
        return false;
    }

    /** The least the stirrups of the mid-span zones could cost (see {@link #leanStirrups}). */
    private double leanMid(SpanFrame f) {
        return leanStirrups(f, BeamProblem.Place.MID);
    }

    private final Map<BeamProblem.Place, Double> leanMemo = new java.util.EnumMap<>(BeamProblem.Place.class);

    /**
     * The least the stirrups of the zones at a place could cost: each zone's cheapest stirrups (fewest
     * legs allowed) for the most favourable section the frame could have (the deepest d, a tension area
     * that takes Vc to its cap), which can only pass more than any real layout does. Infinite if even
     * that fails.
     */
    private double leanStirrups(SpanFrame f, BeamProblem.Place place) {
        useFrame(f);
        Double known = leanMemo.get(place);
        if (known != null) {
            return known;
        }
        SectionShape shape = new SectionShape(f.b(), f.h(), p.flange());
        BarSize smallest = p.space().barSizes().stream().min(Comparator.comparingDouble(BarSize::diameter)).orElseThrow();
        double dMax = f.h() - f.det().firstLayerCentroid(smallest.diameter());
        double asBig = 0.1 * f.b() * dMax;
        double c = 0;
        for (int zi : zoneIndices(place)) {
            BeamProblem.Zone z = zones.get(zi);
            Stirrups st = chooser.cheapest(shape, f.det(), dMax, asBig, z.vuLeast(), p.space().stirrupLegs().get(0),
                    z.length());
            if (st == null) {
                c = Double.POSITIVE_INFINITY;
                break;
            }
            c += stirrupCost(f.b(), f.h(), st, z);
        }
        leanMemo.put(place, c);
        return c;
    }

    /** More than any choice of stirrups over the whole span could cost (the most legs, the closest spacing). */
    private double stirrupCeiling(SpanFrame f) {
        int legs = p.space().stirrupLegs().get(p.space().stirrupLegs().size() - 1);
        Stirrups dense = new Stirrups(f.stirrupBar(), legs, p.space().stirrupSpacings().get(0));
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

    /**
     * A continuous support's options. {@code limit} gives, per top bar size, the cost at or above which an
     * option cannot be part of anything cheaper than the incumbent; the bar count stops rising there.
     */
    private List<SupportOption> supports(SpanFrame f, SectionShape shape, BeamProblem.Place place, double mu,
            java.util.function.ToDoubleFunction<BarSize> limit, List<BottomBars> bottoms) {
        List<SupportOption> out = new ArrayList<>();
        List<Integer> myZones = zoneIndices(place);
        double leanZones = leanStirrups(f, place);
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
            double most = limit.applyAsDouble(t);
            for (BottomBars bottom : bottoms) {
                List<BeamSection.BarGroup> bottomGroups = bottom == null ? List.of() : bottom.groups();
                search.compression(bottomGroups);
                for (int layers = 1; layers <= p.space().maxLayers(); layers++) {
                    BarSize other = bottom == null ? t : bottom.bar();
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
                        if (barCost(t, n, ext) + leanZones >= most - 1e-9) {
                            break; // this many bars cost more than an option could and still pay
                        }
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
                            if (myZones.isEmpty()) {
                                out.add(new SupportOption(t, TensionSearch.toList(split), d, NO_ZONES, NO_ZONES_MAX,
                                        Map.of(), bars, bottom));
                                continue;
                            }
                            // ties round bottom bars relied on here (9.7.6.4); the legs the top bars hold
                            StirrupRules.TieDemand ties = StirrupRules.ties(
                                    sections.support(f, shape, t, split, bottomGroups), Bending.HOGGING, mu);
                            if (!ties.sizeOk(f.stirrupBar().diameter())) {
                                continue;
                            }
                            // one option per range of legs: the fewest must meet the office's rule for the
                            // bottom bars, the most must be held by them (both settled with the mid-span option)
                            java.util.Set<Map<Integer, Stirrups>> seen = new java.util.HashSet<>();
                            List<Integer> legOptions = p.space().stirrupLegs();
                            for (int lo : legOptions) {
                                if (lo < p.legsFor(split[0]) || lo < ties.minLegs()) {
                                    continue;
                                }
                                for (int hi : legOptions) {
                                    if (hi < lo || hi > split[0]) {
                                        continue;
                                    }
                                    ZoneSet zs = zoneSet(shape, f, myZones, t, split, lo, hi, ties.maxSpacing(), d, as);
                                    if (zs == null || !seen.add(zs.stirrups())) {
                                        continue;
                                    }
                                    int fewest = Integer.MAX_VALUE;
                                    int mostUsed = 0;
                                    for (Stirrups st : zs.stirrups().values()) {
                                        fewest = Math.min(fewest, st.legs());
                                        mostUsed = Math.max(mostUsed, st.legs());
                                    }
                                    out.add(new SupportOption(t, TensionSearch.toList(split), d, fewest, mostUsed,
                                            zs.stirrups(), bars + zs.cost(), bottom));
                                }
                            }
                        }
                    }
                }
            }
        }
        return out;
    }

    /** Builds the layout of a combination (a support option null where the span has no such support). */
    public BeamLayout layout(SpanFrame f, MidOption m, SupportOption left, SupportOption right) {
        return combinations.layout(f, m, left, right);
    }

    /** The sections of this span's options, for the deflection cuts. */
    SpanSections sections() {
        return sections;
    }
}
