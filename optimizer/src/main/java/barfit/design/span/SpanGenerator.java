package barfit.design.span;

import barfit.catalogs.BarSize;
import barfit.design.CostModel;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.function.ToDoubleFunction;

/**
 * Candidates for a whole span, frame by frame ({@link SpanFrames}), each frame's options asked of the
 * section model ({@link OptionGenerator}). How they fit together (same top size, continuous bars within
 * the support's first layer, stirrup legs enough for the bottom bars, bar sizes per beam, deflection) is
 * left to the CP-SAT model; a cheap enumeration per frame ({@link Combinations}) gives the incumbent that
 * bounds which frames ({@link FrameBounds}) and options are worth handing over.
 *
 * <p>A frame's evaluation is told what to beat by a {@link CostToBeat}: the cheapest design found, when
 * designing the span; the cheapest found per pair of bar sizes, when {@link PairTables} prices a size.
 */
public final class SpanGenerator {
    /** Support options designed with no bottom bars counted at the support: one pass, without them. */
    private static final List<BottomBars> NO_BOTTOM_BARS = Collections.singletonList(null);

    public record Stats(
            int frames, int framesEvaluated, int framesSkipped, int flexureSolves, int shearEvaluations, long nanos) {}

    public record Output(List<FrameOptions> sets, double incumbent, SpanLayout incumbentLayout, Stats stats) {}

    /**
     * What a frame's options must beat to be worth searching, and what evaluating a frame lowers: for a
     * span's design one cost, the cheapest design found; for pricing a size one cost per pair of top and
     * bottom bar sizes.
     */
    interface CostToBeat {
        /** A combination with top bars of size {@code top} and bottom bars of {@code bottom} pays only below this. */
        double limit(BarSize top, BarSize bottom);

        /** Any combination with top bars of this size pays only below this. */
        double limitForTop(BarSize top);

        /** The one cost every combination must beat, or infinity where each pair of sizes has its own. */
        double common();

        /** Takes account of a frame's options and their cheapest combination. */
        void lower(FrameOptions evaluated);
    }

    /**
     * The span's design: a combination pays only below the cheapest found (or the search's ceiling). Where
     * it does not {@code lower}, the cost stays as given: a part of a line, whose parts share their
     * support bars and so cannot each take their own cheapest combination.
     */
    private static final class Cheapest implements CostToBeat {
        private double cost;
        private final boolean lowers;

        Cheapest(double cost) {
            this(cost, true);
        }

        Cheapest(double cost, boolean lowers) {
            this.cost = cost;
            this.lowers = lowers;
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
            if (lowers) {
                cost = Math.min(cost, evaluated.best());
            }
        }
    }

    private final SpanProblem p;
    private final SpanContext ctx;
    private final Combinations combinations;
    /** The span's frames, made at the first use. */
    private List<SpanFrame> frames;
    /** The bounds of the frame last bounded or evaluated (see {@link #bounds}). */
    private FrameBounds bounds;

    public SpanGenerator(SpanProblem problem, CostModel cost) {
        this.p = problem;
        this.ctx = new SpanContext(problem, cost);
        this.combinations = new Combinations(ctx);
    }

    SpanContext context() {
        return ctx;
    }

    /**
     * Makes this generator keep every passing option, even one another beats on this model's price: for a
     * search capped in another measure ({@code --carbon-cap}), with {@link #optionsUnder} at no limit. Only
     * the price comparisons between options are given up; every check and every measure-free rule stays.
     */
    public SpanGenerator keepingDominated() {
        ctx.keepDominated(true);
        return this;
    }

    Combinations combinations() {
        return combinations;
    }

    /** The sections of this span's options, for the deflection cuts. */
    SpanSections sections() {
        return ctx.sections();
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

    /**
     * A tighter lower bound on any design of the span than {@link #leastCost}, still without searching
     * bars: per frame the greater of its first bound and its bounds per pair of bar sizes
     * ({@link FrameBounds#least}), the least over the frames.
     */
    public double sharpLeastCost() {
        double least = Double.POSITIVE_INFINITY;
        for (SpanFrame f : frames()) {
            if (!(f.lowerBound() < least)) {
                continue;
            }
            least = Math.min(least, Math.max(f.lowerBound(), bounds(f).least(OptionGenerator.tops(ctx, f))));
        }
        return least;
    }

    /**
     * A frame's bounds; those of the last frame asked about are kept, so that a frame bounded and then
     * evaluated computes them once.
     */
    FrameBounds bounds(SpanFrame f) {
        if (bounds == null || bounds.frame() != f) {
            bounds = new FrameBounds(ctx, f);
        }
        return bounds;
    }

    /** Builds the layout of a combination (a support option null where the span has no such support). */
    public SpanLayout layout(SpanFrame f, MidOption m, SupportOption left, SupportOption right) {
        return combinations.layout(f, m, left, right);
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
        SpanLayout incumbentLayout = null;
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
            double toBeat = Math.min(loose(incumbent, slack), roof);
            if (f.lowerBound() >= toBeat || Double.isInfinite(f.lowerBound())) {
                skipped = frames.size() - i;
                break;
            }
            if (Double.isFinite(Math.min(incumbent, roof))
                    && bounds(f).least(OptionGenerator.tops(ctx, f)) >= toBeat - 1e-9) {
                continue; // a closer look at its bars shows it cannot beat the incumbent
            }
            evaluated++;
            FrameOptions fs = evaluate(f, new Cheapest(toBeat));
            if (fs == null) {
                continue;
            }
            sets.add(fs);
            if (fs.best() < incumbent) {
                incumbent = fs.best();
                incumbentLayout = fs.bestLayout();
            }
        }
        final double toBeat = Math.min(loose(incumbent, slack), roof);
        List<FrameOptions> kept = new ArrayList<>();
        for (FrameOptions fs : sets) {
            if (fs.frame().lowerBound() < toBeat + 1e-9) {
                kept.add(combinations.prune(fs, toBeat));
            }
        }
        return new Output(
                kept,
                incumbent,
                incumbentLayout,
                new Stats(
                        frames.size(),
                        evaluated,
                        skipped,
                        ctx.flexureSolves(),
                        ctx.shearEvaluations(),
                        System.nanoTime() - t0));
    }

    /**
     * Every frame's options that could be part of a combination costing less than {@code limit}: none
     * cheaper is left out, whatever the other options it is combined with (a line's parts take the
     * support bars they share, not each its own cheapest). The incumbent is not searched for.
     */
    public Output optionsUnder(double limit) {
        long t0 = System.nanoTime();
        List<FrameOptions> sets = new ArrayList<>();
        int evaluated = 0;
        int skipped = 0;
        List<SpanFrame> frames = frames();
        for (int i = 0; i < frames.size(); i++) {
            SpanFrame f = frames.get(i);
            if (!(f.lowerBound() < limit)) {
                skipped = frames.size() - i;
                break;
            }
            evaluated++;
            FrameOptions fs = evaluate(f, new Cheapest(limit, false));
            if (fs != null) {
                sets.add(combinations.prune(fs, limit));
            }
        }
        return new Output(
                sets,
                Double.POSITIVE_INFINITY,
                null,
                new Stats(
                        frames.size(),
                        evaluated,
                        skipped,
                        ctx.flexureSolves(),
                        ctx.shearEvaluations(),
                        System.nanoTime() - t0));
    }

    /**
     * Whether a support option may go with a mid-span option in a combination: the size of its top bars,
     * its first layer holding their continuous bars (two hangers on a cantilever), stirrup legs suiting the
     * bottom bars, the same anchored bottom bars.
     */
    public boolean fits(SupportOption s, MidOption m, SpanProblem.Place side) {
        int continuous =
                side == SpanProblem.Place.LEFT && p.cantilever() ? 2 : m.top().continuous();
        return s.bar().equals(m.top().bar())
                && s.counts().get(0) >= continuous
                && s.holds(m)
                && java.util.Objects.equals(s.bottom(), combinations.anchored(m));
    }

    private static double loose(double incumbent, double slack) {
        return slack == 0 ? incumbent : incumbent * (1 + slack);
    }

    /**
     * The frame's options and its cheapest combination, searched only as far as {@code toBeat} says they
     * could pay; null if the frame fails whatever its bars.
     */
    FrameOptions evaluate(SpanFrame f, CostToBeat toBeat) {
        FrameBounds frameBounds = bounds(f);
        OptionGenerator options = new OptionGenerator(ctx, frameBounds);
        if (!options.framePasses(ctx.smallestBar(), ctx.smallestBar(), 1)) {
            return null; // cover, flange width or skin rules fail for this frame whatever the bars
        }
        List<TopOption> tops = options.tops();
        if (p.bottomCoupled() || f.deflection()) {
            return everything(options, frameBounds, tops, toBeat);
        }
        // supports first (they do not depend on the other options), then the mid-span options for two
        // continuous bars, then more continuous bars only where a bound says they could pay
        ToDoubleFunction<BarSize> supportLimit = supportLimit(frameBounds, tops, toBeat);
        List<SupportOption> lefts = p.leftSupport()
                ? options.supports(SpanProblem.Place.LEFT, p.mLeft(), supportLimit, NO_BOTTOM_BARS)
                : List.of();
        List<SupportOption> rights = p.rightSupport()
                ? options.supports(SpanProblem.Place.RIGHT, p.mRight(), supportLimit, NO_BOTTOM_BARS)
                : List.of();
        List<TopOption> twoContinuous =
                tops.stream().filter(t -> t.continuous() == 2).toList();
        List<MidOption> mids = new ArrayList<>(options.mids(twoContinuous, midLimit(f, toBeat, lefts, rights)));
        toBeat.lower(
                combinations.enumerate(new FrameOptions(f, tops, mids, lefts, rights, Double.POSITIVE_INFINITY, null)));
        addMoreContinuous(options, frameBounds, tops, mids, toBeat, lefts, rights);
        FrameOptions out =
                combinations.enumerate(new FrameOptions(f, tops, mids, lefts, rights, Double.POSITIVE_INFINITY, null));
        toBeat.lower(out);
        return out;
    }

    /**
     * Per top bar size, the cost at or above which a support option cannot be part of anything that pays:
     * what must be beaten less the least the rest of a combination costs (no limit without one cost to beat).
     */
    private static ToDoubleFunction<BarSize> supportLimit(
            FrameBounds frameBounds, List<TopOption> tops, CostToBeat toBeat) {
        double common = toBeat.common();
        return Double.isInfinite(common)
                ? t -> Double.POSITIVE_INFINITY
                : t -> common - frameBounds.besideSupports(tops, t);
    }

    /**
     * A mid-span option pays only below what its pair of sizes must beat less the frame, its top option
     * and the cheapest support options that could go with it ({@code lefts} or {@code rights} null: not
     * known yet, counted as nothing).
     */
    private OptionGenerator.MidLimit midLimit(
            SpanFrame f, CostToBeat toBeat, List<SupportOption> lefts, List<SupportOption> rights) {
        return (top, bottom) -> toBeat.limit(top.bar(), bottom)
                - f.cost()
                - top.cost()
                - (lefts == null ? 0 : Combinations.cheapestAbove(lefts, top, p.leftSupport()))
                - (rights == null ? 0 : Combinations.cheapestAbove(rights, top, p.rightSupport()));
    }

    /**
     * Adds the mid-span options of the top options with more than two continuous bars whose least cost
     * (the frame's bounds, the cheapest supports) could still pay; whether it added any.
     */
    private boolean addMoreContinuous(
            OptionGenerator options,
            FrameBounds frameBounds,
            List<TopOption> tops,
            List<MidOption> mids,
            CostToBeat toBeat,
            List<SupportOption> lefts,
            List<SupportOption> rights) {
        SpanFrame f = frameBounds.frame();
        boolean added = false;
        for (TopOption t : tops) {
            if (t.continuous() == 2) {
                continue;
            }
            double least = f.cost()
                    + t.cost()
                    + frameBounds.midSpan(t)
                    + Combinations.cheapestAbove(lefts, t, p.leftSupport())
                    + Combinations.cheapestAbove(rights, t, p.rightSupport());
            if (least < toBeat.limitForTop(t.bar())) {
                mids.addAll(options.mids(List.of(t), midLimit(f, toBeat, lefts, rights)));
                added = true;
            }
        }
        return added;
    }

    /** All options at once (anchored bottom bars, or below Table 9.3.1.1 where more steel can pay). */
    private FrameOptions everything(
            OptionGenerator options, FrameBounds frameBounds, List<TopOption> tops, CostToBeat toBeat) {
        SpanFrame f = frameBounds.frame();
        // deflection and anchorage only add demands: what cannot beat the cost on cost alone is not searched
        ToDoubleFunction<BarSize> limit = supportLimit(frameBounds, tops, toBeat);
        // without anchored bottom bars the supports do not depend on the mid-span options: find them first,
        // so the mid-span search knows the least the supports add
        List<SupportOption> knownLeft = null;
        List<SupportOption> knownRight = null;
        if (!p.bottomCoupled()) {
            knownLeft = p.leftSupport()
                    ? options.supports(SpanProblem.Place.LEFT, p.mLeft(), limit, NO_BOTTOM_BARS)
                    : List.of();
            knownRight = p.rightSupport()
                    ? options.supports(SpanProblem.Place.RIGHT, p.mRight(), limit, NO_BOTTOM_BARS)
                    : List.of();
        }
        if (f.deflection() && !p.bottomCoupled()) {
            return belowMinimumDepth(options, frameBounds, tops, toBeat, knownLeft, knownRight);
        }
        List<MidOption> mids = options.mids(tops, midLimit(f, toBeat, knownLeft, knownRight));
        List<BottomBars> bottoms;
        if (p.bottomCoupled()) {
            Set<BottomBars> distinct = new LinkedHashSet<>();
            for (MidOption m : mids) {
                distinct.add(m.bottom());
            }
            bottoms = new ArrayList<>(distinct);
        } else {
            bottoms = NO_BOTTOM_BARS;
        }
        List<SupportOption> lefts = knownLeft != null
                ? knownLeft
                : p.leftSupport() ? options.supports(SpanProblem.Place.LEFT, p.mLeft(), limit, bottoms) : List.of();
        List<SupportOption> rights = knownRight != null
                ? knownRight
                : p.rightSupport() ? options.supports(SpanProblem.Place.RIGHT, p.mRight(), limit, bottoms) : List.of();
        return screened(options, f, tops, mids, lefts, rights, toBeat);
    }

    /**
     * Below Table 9.3.1.1 (bottom bars not anchored): as for other frames, two continuous top bars first;
     * their best passing combination then bounds which top options with more continuous bars (stiffer,
     * dearer) are searched.
     */
    private FrameOptions belowMinimumDepth(
            OptionGenerator options,
            FrameBounds frameBounds,
            List<TopOption> tops,
            CostToBeat toBeat,
            List<SupportOption> lefts,
            List<SupportOption> rights) {
        SpanFrame f = frameBounds.frame();
        List<TopOption> twoContinuous =
                tops.stream().filter(t -> t.continuous() == 2).toList();
        List<MidOption> mids = new ArrayList<>(options.mids(twoContinuous, midLimit(f, toBeat, lefts, rights)));
        FrameOptions first = screened(options, f, tops, new ArrayList<>(mids), lefts, rights, toBeat);
        boolean more = addMoreContinuous(options, frameBounds, tops, mids, toBeat, lefts, rights);
        return more ? screened(options, f, tops, mids, lefts, rights, toBeat) : first;
    }

    /** The frame's options after the deflection screen (below Table 9.3.1.1), enumerated; the cost lowered. */
    private FrameOptions screened(
            OptionGenerator options,
            SpanFrame f,
            List<TopOption> tops,
            List<MidOption> mids,
            List<SupportOption> lefts,
            List<SupportOption> rights,
            CostToBeat toBeat) {
        if (f.deflection()) {
            DeflectionScreen screen = new DeflectionScreen(p, ctx.sections(), f, options.shape(), mids, lefts, rights);
            mids = screen.mids();
            lefts = screen.lefts();
            rights = screen.rights();
        }
        FrameOptions out =
                combinations.enumerate(new FrameOptions(f, tops, mids, lefts, rights, Double.POSITIVE_INFINITY, null));
        toBeat.lower(out);
        return out;
    }
}
