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
    private final SpanContext ctx;
    private final Combinations combinations;
    /** The span's frames, made at the first use. */
    private List<SpanFrame> frames;
    /** The bounds of the frame last bounded or evaluated (see {@link #bounds}). */
    private FrameBounds bounds;
    /** Zone stirrups depend only on the zone, the tension bars (d, As) and the legs asked for: remembered per frame. */
    private final Map<ZoneKey, Stirrups> zoneMemo = new HashMap<>();

    private record ZoneKey(int zone, double d, double as, int legs, int mostLegs, double maxSpacing) {
    }

    public BeamGenerator(BeamProblem problem, CostModel cost) {
        this.p = problem;
        this.ctx = new SpanContext(problem, cost);
        this.combinations = new Combinations(problem, ctx.zones());
    }

    SpanContext context() {
        return ctx;
    }

    List<SpanFrame> frames() {
        if (frames == null) {
            frames = SpanFrames.of(ctx);
        }
        return frames;
    }

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

    /** A frame's bounds; those of the last frame asked about are kept, so a frame bounded then evaluated computes them once. */
    FrameBounds bounds(SpanFrame f) {
        if (bounds == null || bounds.frame() != f) {
            bounds = new FrameBounds(ctx, f);
        }
        return bounds;
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
        List<SpanFrame> frames = frames();
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
            if (Double.isFinite(Math.min(incumbent, roof)) && bounds(f).least(tops(f)) >= Math.min(loose(incumbent, slack), roof) - 1e-9) {
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
                ctx.flexureSolves(), ctx.shearEvaluations(), System.nanoTime() - t0));
    }

    private static double loose(double incumbent, double slack) {
        return slack == 0 ? incumbent : incumbent * (1 + slack);
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
        bounds(f);
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
        return Double.isInfinite(common) ? t -> Double.POSITIVE_INFINITY : t -> common - bounds(f).besideSupports(tops, t);
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
            double least = f.cost() + t.cost() + bounds(f).midSpan(t)
                    + Combinations.cheapestAbove(lefts, t, p.leftSupport())
                    + Combinations.cheapestAbove(rights, t, p.rightSupport());
            if (least < target.limitForTop(t.bar())) {
                mids.addAll(mids(f, shape, List.of(t), midLimit(f, target, lefts, rights)));
                added = true;
            }
        }
        return added;
    }

    Combinations combinations() {
        return combinations;
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
            DeflectionScreen screen = new DeflectionScreen(p, ctx.sections(), f, shape, mids, lefts, rights);
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

    List<TopOption> tops(SpanFrame f) {
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
                out.add(new TopOption(t, nc, ctx.barCost(t, nc, run)));
            }
        }
        return out;
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

    private List<MidOption> mids(SpanFrame f, SectionShape shape, List<TopOption> tops, MidLimit cut) {
        List<MidOption> out = new ArrayList<>();
        List<Integer> midZones = ctx.zonesAt(BeamProblem.Place.MID);
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
                                    ctx.barCost(bb, BeamLayout.sum(counts), p.span()), p.legsFor(counts.get(0))));
                        }
                    }
                }
            }
            return out;
        }
        ctx.midProbe().frame(shape, Bending.SAGGING, new Span(p.span(), p.ends()));
        ctx.midSearch().frame(f.det());
        for (TopOption top : tops) {
            ctx.midSearch().compression(List.of(new BeamSection.BarGroup(top.bar(), top.continuous())));
            for (BarSize bb : p.space().barSizes()) {
                if (p.maxBarSizes() < 2 && !bb.equals(top.bar())) {
                    continue;
                }
                double limit = cut.of(top, bb);
                if (bounds(f).bottomBars(top, bb) + bounds(f).leanMid() >= limit - 1e-9) {
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
                    int[] min = ctx.midSearch().minCounts(bb, nmax, ncr, layers, layers * nmax);
                    if (min == null) {
                        continue;
                    }
                    int nMin = java.util.Arrays.stream(min).sum();
                    double firstStirrups = Double.NaN;
                    for (int n = nMin; n <= layers * nmax; n++) {
                        if (ctx.barCost(bb, n, p.span()) + bounds(f).leanMid() >= limit - 1e-9) {
                            break; // this many bars cost more than an option could and still pay
                        }
                        List<int[]> splits = ctx.midSearch().passingSplits(bb, n, layers, nmax, first);
                        if (splits.isEmpty()) {
                            if (!ctx.midSearch().passingSplit(bb, n, layers, nmax, first).anyDuctile()) {
                                break; // more bars only lower eps_t
                            }
                            continue;
                        }
                        for (int[] split : splits) {
                            ctx.midSearch().place(bb, split);
                            double d = ctx.midSearch().d();
                            double as = ctx.midSearch().tensionArea();
                            // legs: the office's rule, the ties round top bars relied on (9.7.6.4), and no more
                            // than the outer bottom layer and the continuous top bars hold (25.7.1.2, 25.7.1.3)
                            StirrupRules.TieDemand ties = midZones.isEmpty() ? StirrupRules.TieDemand.NONE
                                    : StirrupRules.ties(ctx.sections().mid(f, shape, top, bb, split), Bending.SAGGING, p.mMid());
                            if (!ties.sizeOk(f.stirrupBar().diameter())) {
                                continue;
                            }
                            int legs = Math.max(p.legsFor(Math.max(split[0], top.continuous())), ties.minLegs());
                            int most = Math.min(split[0], top.continuous());
                            ZoneSet zs = zoneSet(shape, f, midZones, bb, split, legs, most, ties.maxSpacing(), d, as);
                            if (zs != null) {
                                double stirCost = zs.cost();
                                out.add(new MidOption(top, bb, TensionSearch.toList(split), d, zs.stirrups(),
                                        ctx.barCost(bb, n, p.span()) + stirCost, p.legsFor(split[0])));
                                // only an option whose bottom bars hold every legs count the supports may use
                                // can stand for the dearer options with more bars below
                                if (split[0] >= mostLegs) {
                                    cheapestByLegs.merge(p.legsFor(split[0]), ctx.barCost(bb, n, p.span()) + stirCost,
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
                                && ctx.barCost(bb, n + 1 - nMin, p.span()) >= bounds(f).stirrupCeiling()) {
                            break;
                        }
                        // tighter where the bottom bars meet nothing but the mid-span zones: an option with
                        // n + 1 or more bars costs at least its bars and the leanest stirrups, and asks for
                        // at least the legs of its fullest possible first layer; one found already that is
                        // no dearer and asks no more legs of the supports is as good in every combination
                        if (!f.deflection() && !p.bottomAnchored()
                                && dominated(cheapestByLegs, p.legsFor((n + layers) / layers),
                                        ctx.barCost(bb, n + 1, p.span()) + bounds(f).leanMid())) {
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
            cost += ctx.stirrupCost(f.b(), f.h(), st, ctx.zones().get(zi));
        }
        return new ZoneSet(zs, cost);
    }

    private Stirrups zoneStirrups(SectionShape shape, SpanFrame f, int zone, int legs, int mostLegs, double maxSpacing,
            double d, double as) {
        ZoneKey key = new ZoneKey(zone, d, as, legs, mostLegs, maxSpacing);
        if (zoneMemo.containsKey(key)) {
            return zoneMemo.get(key);
        }
        BeamProblem.Zone z = ctx.zones().get(zone);
        Stirrups st = ctx.chooser().cheapest(shape, f.det(), d, as, z.vu(d), legs, mostLegs, maxSpacing, z.length());
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

    /**
     * A continuous support's options. {@code limit} gives, per top bar size, the cost at or above which an
     * option cannot be part of anything cheaper than the incumbent; the bar count stops rising there.
     */
    private List<SupportOption> supports(SpanFrame f, SectionShape shape, BeamProblem.Place place, double mu,
            java.util.function.ToDoubleFunction<BarSize> limit, List<BottomBars> bottoms) {
        List<SupportOption> out = new ArrayList<>();
        List<Integer> myZones = ctx.zonesAt(place);
        double leanZones = bounds(f).leanStirrups(place);
        ctx.supportProbe().frame(shape, Bending.HOGGING, new Span(p.span(), p.ends()));
        TensionSearch search = new TensionSearch(ctx.supportProbe(), mu).frame(f.det());
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
                        if (ctx.barCost(t, n, ext) + leanZones >= most - 1e-9) {
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
                            double bars = ctx.barCost(t, n, ext);
                            if (myZones.isEmpty()) {
                                out.add(new SupportOption(t, TensionSearch.toList(split), d, NO_ZONES, NO_ZONES_MAX,
                                        Map.of(), bars, bottom));
                                continue;
                            }
                            // ties round bottom bars relied on here (9.7.6.4); the legs the top bars hold
                            StirrupRules.TieDemand ties = StirrupRules.ties(
                                    ctx.sections().support(f, shape, t, split, bottomGroups), Bending.HOGGING, mu);
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
        return ctx.sections();
    }
}
