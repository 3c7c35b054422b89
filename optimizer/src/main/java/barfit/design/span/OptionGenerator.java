package barfit.design.span;

import barfit.catalogs.BarSize;
import barfit.design.TensionSearch;
import barfit.design.section.SectionExhaustive;
import barfit.design.section.SectionLayout;
import barfit.section.BarLayer;
import barfit.section.BarSpacing;
import barfit.section.BeamSection;
import barfit.section.Bending;
import barfit.section.CheckResult;
import barfit.section.Face;
import barfit.section.Flexure;
import barfit.section.SectionChecks;
import barfit.section.SectionProbe;
import barfit.section.SectionShape;
import barfit.section.Span;
import barfit.section.StirrupRules;
import barfit.section.Stirrups;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.ToDoubleFunction;

/**
 * One frame's options, asked of the section model: the top options (top bar size and continuous count),
 * the mid-span options (bottom bars with those continuous bars as compression steel, and the stirrups of
 * the zones the mid-span section sizes), and each continuous support's options (top bars there, with its
 * zones' stirrups for each range of legs). Bar counts rise from the fewest the tension search allows and
 * stop where the frame's bounds show more bars cannot pay.
 */
final class OptionGenerator {
    /** The "legs" of a support option whose section sizes no stirrup zone: it limits nothing. */
    static final int NO_ZONES = 1000;
    /** The most legs of a support option whose section sizes no stirrup zone: it asks nothing of the bottom bars. */
    static final int NO_ZONES_MAX = 0;

    /**
     * The most a mid-span option of a top option and bottom bar size may cost (its bars and stirrups) and
     * still be part of something cheaper than what is known: what the search beats, less the least the
     * rest of a combination costs. Options at or above it are not searched.
     */
    @FunctionalInterface
    interface MidLimit {
        double of(TopOption top, BarSize bottom);
    }

    private final SpanContext ctx;
    private final SpanProblem p;
    private final SpanFrame f;
    private final SectionShape shape;
    private final FrameBounds bounds;
    private final ZoneStirrups zoneStirrups;
    /**
     * {@link #framePasses} by bar sizes and layers, asked once each: 0 not yet asked, else {@link #PASSES} or
     * {@link #FAILS}. The mid-span and the supports ask it again for every top option and count.
     */
    private final byte[] framePasses;

    /** Whether a set of bottom bars stands without the top bars ({@link #midTies}), by {@link #bottomBarsKey}. */
    private final Map<Long, Boolean> standsWithoutTop = new HashMap<>();

    private static final byte PASSES = 1;
    private static final byte FAILS = 2;

    OptionGenerator(SpanContext ctx, FrameBounds bounds) {
        this.ctx = ctx;
        this.p = ctx.problem();
        this.f = bounds.frame();
        this.shape = new SectionShape(f.b(), f.h(), p.flange());
        this.bounds = bounds;
        this.zoneStirrups = new ZoneStirrups(ctx, f, shape);
        int n = p.space().barSizes().size();
        this.framePasses = new byte[n * n * Math.max(1, p.space().maxLayers())];
    }

    SectionShape shape() {
        return shape;
    }

    /**
     * The checks that depend on bar sizes but not counts (cover for the largest bar, skin, flange width,
     * the 25.2.2 gap of {@code layers} stacked layers of {@code a}), asked of the section model on a
     * stand-in section holding {@code layers} layers of {@code a} and one layer of {@code c}.
     */
    boolean framePasses(BarSize a, BarSize c, int layers) {
        int n = p.space().barSizes().size();
        int ia = ctx.index(a);
        int ic = ctx.index(c);
        if (ia < 0 || ic < 0 || layers < 1 || layers > p.space().maxLayers()) {
            return framePassesNow(a, c, layers);
        }
        int key = (ia * n + ic) * p.space().maxLayers() + layers - 1;
        if (framePasses[key] == 0) {
            framePasses[key] = framePassesNow(a, c, layers) ? PASSES : FAILS;
        }
        return framePasses[key] == PASSES;
    }

    private boolean framePassesNow(BarSize a, BarSize c, int layers) {
        List<BeamSection.BarGroup> groups = new ArrayList<>();
        for (int i = 0; i < layers; i++) {
            groups.add(new BeamSection.BarGroup(a, 2));
        }
        List<BarLayer> standIn = new ArrayList<>(BeamSection.stack(Face.BOTTOM, groups, f.det()));
        standIn.add(new BarLayer(Face.TOP, c, 2, f.det().firstLayerCentroid(c.diameter())));
        BeamSection s = new BeamSection(shape, p.materials(), f.det(), standIn, null, f.skin(), p.code());
        return allPass(SectionChecks.frameChecks(s, new Span(p.span(), null))) && allPass(SectionChecks.layerGaps(s));
    }

    private static boolean allPass(List<CheckResult> checks) {
        for (CheckResult c : checks) {
            if (!c.pass()) {
                return false;
            }
        }
        return true;
    }

    /**
     * The ties 9.7.6.4 asks round a mid-span section's top bars ({@link StirrupRules#ties}). Whether the
     * bottom bars stand without the top bars hangs on the bottom bars alone, and most do: that is asked of the
     * section model once per set of bottom bars, not again for every top option.
     */
    private StirrupRules.TieDemand midTies(BeamSection mid, BarSize bottom, int[] split) {
        long key = bottomBarsKey(bottom, split);
        if (key >= 0) {
            Boolean stands = standsWithoutTop.get(key);
            if (stands == null) {
                BeamSection without = StirrupRules.withoutCompressionBars(mid, Bending.SAGGING);
                stands = without != null
                        && StirrupRules.standsWithout(Flexure.analyse(without, Bending.SAGGING), p.mMid());
                standsWithoutTop.put(key, stands);
            }
            if (stands) {
                return StirrupRules.TieDemand.NONE;
            }
        }
        return StirrupRules.ties(mid, Bending.SAGGING, p.mMid());
    }

    /** A set of bottom bars (size and count per layer) as one number, or -1 when it will not fit in one. */
    private long bottomBarsKey(BarSize bottom, int[] split) {
        int size = ctx.index(bottom);
        if (size < 0 || split.length > 6) {
            return -1;
        }
        long key = size;
        for (int count : split) {
            if (count < 0 || count > 255) {
                return -1;
            }
            key = (key << 8) | count;
        }
        return (key << 3) | split.length;
    }

    /** The frame's top options (see {@link #tops(SpanContext, SpanFrame)}). */
    List<TopOption> tops() {
        return tops(ctx, f);
    }

    /** A frame's top options: each bar size with two continuous bars up to as many as fit (two on a cantilever). */
    static List<TopOption> tops(SpanContext ctx, SpanFrame f) {
        SpanProblem p = ctx.problem();
        List<TopOption> out = new ArrayList<>();
        for (BarSize bar : p.space().barSizes()) {
            int fit = BarSpacing.maxBars(f.b(), f.det(), bar, p.materials(), p.code());
            int mostContinuous = p.cantilever() || p.space().hangersOnly() ? Math.min(2, fit) : fit;
            double extLeft = p.leftSupport()
                    ? Extension.of(p, f.b(), f.h(), f.det(), bar).length()
                    : 0;
            double extRight = p.rightSupport()
                    ? Extension.of(p, f.b(), f.h(), f.det(), bar).length()
                    : 0;
            // a continuous bar is priced over the span less the stretches the support options price it over;
            // where the extras' ld makes those overlap, that is negative: a continuous bar then costs less
            // than the two extras it replaces, and the sum still prices it at the full span
            // (a cantilever's top bars are all priced with its support option)
            double run = p.cantilever() ? 0 : p.span() - extLeft - extRight;
            for (int continuous = 2; continuous <= mostContinuous; continuous++) {
                out.add(new TopOption(bar, continuous, ctx.barCost(bar, continuous, run)));
            }
        }
        return out;
    }

    /** The mid-span options for these top options, each cheaper than {@code limit} says it must be. */
    List<MidOption> mids(List<TopOption> tops, MidLimit limit) {
        if (p.cantilever()) {
            return hangers(tops);
        }
        List<MidOption> out = new ArrayList<>();
        List<Integer> midZones = ctx.zonesAt(SpanProblem.Place.MID);
        int mostLegs = p.space().stirrupLegs().get(p.space().stirrupLegs().size() - 1);
        TensionSearch search = ctx.midSearch();
        ctx.midProbe().frame(shape, Bending.SAGGING, new Span(p.span(), p.ends()));
        search.frame(f.det());
        for (TopOption top : tops) {
            search.compression(List.of(new BeamSection.BarGroup(top.bar(), top.continuous())));
            for (BarSize bottom : p.space().barSizes()) {
                if (p.maxBarSizes() < 2 && !bottom.equals(top.bar())) {
                    continue;
                }
                double most = limit.of(top, bottom);
                if (bounds.bottomBars(top, bottom) + bounds.leanMid() >= most - 1e-9) {
                    continue;
                }
                // the cheapest option found so far for each number of legs it asks of the supports
                Map<Integer, Double> cheapestByLegs = new HashMap<>();
                int fit = BarSpacing.maxBars(f.b(), f.det(), bottom, p.materials(), p.code());
                int crackControlled = BarSpacing.minBarsForCrackControl(
                        f.b(), f.det(), bottom, p.materials().fy(), p.code());
                int first = Math.max(2, crackControlled);
                if (fit < first || !framePasses(bottom, top.bar(), 1)) {
                    continue;
                }
                for (int layers = 1; layers <= p.space().maxLayers(); layers++) {
                    if (layers > 1 && !framePasses(bottom, top.bar(), layers)) {
                        break;
                    }
                    if (!SectionLayout.fitsHeight(f.h(), f.det(), bottom, layers, top.bar())) {
                        break;
                    }
                    int[] min = search.minCounts(bottom, fit, crackControlled, layers, layers * fit);
                    if (min == null) {
                        continue;
                    }
                    int fewest = Arrays.stream(min).sum();
                    double firstStirrups = Double.NaN;
                    for (int n = fewest; n <= layers * fit; n++) {
                        if (ctx.barCost(bottom, n, p.span()) + bounds.leanMid() >= most - 1e-9) {
                            break; // this many bars cost more than an option could and still pay
                        }
                        List<int[]> splits = search.passingSplits(bottom, n, layers, fit, first);
                        if (splits.isEmpty()) {
                            if (!search.passingSplit(bottom, n, layers, fit, first)
                                    .anyDuctile()) {
                                break; // more bars only lower eps_t
                            }
                            continue;
                        }
                        for (int[] split : splits) {
                            search.place(bottom, split);
                            double d = search.d();
                            double as = search.tensionArea();
                            // legs: the office's rule, the ties round top bars relied on (9.7.6.4), and no more
                            // than the outer bottom layer and the continuous top bars hold (25.7.1.2, 25.7.1.3)
                            BeamSection midSection = ctx.sections().mid(f, shape, top, bottom, split);
                            StirrupRules.TieDemand ties = midZones.isEmpty()
                                    ? StirrupRules.TieDemand.NONE
                                    : midTies(midSection, bottom, split);
                            if (!ties.sizeOk(f.stirrupBar().diameter())) {
                                continue;
                            }
                            int legs = Math.max(p.legsFor(Math.max(split[0], top.continuous())), ties.minLegs());
                            int legsHeld = Math.min(split[0], top.continuous());
                            ZoneStirrups.Choice stirrups = zoneStirrups.cheapest(
                                    midZones, legs, legsHeld, ties.maxSpacing(), d, as, midSection);
                            if (stirrups != null) {
                                double stirrupCost = stirrups.cost();
                                out.add(new MidOption(
                                        top,
                                        bottom,
                                        TensionSearch.toList(split),
                                        d,
                                        stirrups.stirrups(),
                                        ctx.barCost(bottom, n, p.span()) + stirrupCost,
                                        p.legsFor(split[0])));
                                // only an option whose bottom bars hold every legs count the supports may use
                                // can stand for the dearer options with more bars below
                                if (split[0] >= mostLegs) {
                                    cheapestByLegs.merge(
                                            p.legsFor(split[0]),
                                            ctx.barCost(bottom, n, p.span()) + stirrupCost,
                                            Math::min);
                                }
                                if (Double.isNaN(firstStirrups)) {
                                    firstStirrups = stirrupCost;
                                }
                            }
                        }
                        // more bars only pay through cheaper stirrups (rho_w, fewer legs) or, below Table 9.3.1.1,
                        // stiffness, or under torsion as longitudinal steel: stop once one more bar costs more
                        // than all the stirrups could
                        if (!f.deflection()
                                && !p.hasTorsion()
                                && !ctx.keepDominated()
                                && !Double.isNaN(firstStirrups)
                                && ctx.barCost(bottom, n + 1 - fewest, p.span()) >= bounds.stirrupCeiling()) {
                            break;
                        }
                        // tighter where the bottom bars meet nothing but the mid-span zones: an option with
                        // n + 1 or more bars costs at least its bars and the leanest stirrups, and asks for
                        // at least the legs of its fullest possible first layer; one found already that is
                        // no dearer and asks no more legs of the supports is as good in every combination
                        if (!f.deflection()
                                && !p.bottomCoupled()
                                && !ctx.keepDominated()
                                && dominated(
                                        cheapestByLegs,
                                        p.legsFor((n + layers) / layers),
                                        ctx.barCost(bottom, n + 1, p.span()) + bounds.leanMid())) {
                            break;
                        }
                    }
                }
            }
        }
        return out;
    }

    /**
     * A cantilever's bottom bars are its hangers: two or more of one size, in one layer (in more only where
     * they are anchored and so count as compression steel), for every top option.
     */
    private List<MidOption> hangers(List<TopOption> tops) {
        List<MidOption> out = new ArrayList<>();
        int bottomLayers = p.bottomAnchored() ? p.space().maxLayers() : 1;
        for (TopOption top : tops) {
            for (BarSize bottom : p.space().barSizes()) {
                int fit = BarSpacing.maxBars(f.b(), f.det(), bottom, p.materials(), p.code());
                for (int layers = 1; layers <= bottomLayers; layers++) {
                    if (layers > 1 && !SectionLayout.fitsHeight(f.h(), f.det(), bottom, layers, top.bar())) {
                        break;
                    }
                    for (List<Integer> counts : SectionExhaustive.countVectors(layers, fit)) {
                        out.add(new MidOption(
                                top,
                                bottom,
                                counts,
                                f.det().firstLayerCentroid(bottom.diameter()),
                                Map.of(),
                                ctx.barCost(bottom, SpanLayout.sum(counts), p.span()),
                                p.legsFor(counts.get(0))));
                    }
                }
            }
        }
        return out;
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
     * A continuous support's options, designed with each of {@code bottoms} as compression steel (a single
     * null: none). {@code limit} gives, per top bar size, the cost at or above which an option cannot be
     * part of anything cheaper than the incumbent; the bar count stops rising there.
     */
    List<SupportOption> supports(
            SpanProblem.Place place, double mu, ToDoubleFunction<BarSize> limit, List<BottomBars> bottoms) {
        List<SupportOption> out = new ArrayList<>();
        List<Integer> zonesHere = ctx.zonesAt(place);
        double leanZones = bounds.leanStirrups(place);
        SectionProbe probe = ctx.supportProbe();
        probe.frame(shape, Bending.HOGGING, new Span(p.span(), p.ends()));
        TensionSearch search = new TensionSearch(probe, mu).frame(f.det());
        for (BarSize top : p.space().barSizes()) {
            int fit = BarSpacing.maxBars(f.b(), f.det(), top, p.materials(), p.code());
            int crackControlled = BarSpacing.minBarsForCrackControl(
                    f.b(), f.det(), top, p.materials().fy(), p.code());
            int first = Math.max(2, crackControlled);
            if (fit < first) {
                continue;
            }
            double ext = Extension.of(p, f.b(), f.h(), f.det(), top).length();
            double most = limit.applyAsDouble(top);
            for (BottomBars bottom : bottoms) {
                List<BeamSection.BarGroup> bottomGroups = bottom == null ? List.of() : bottom.groups();
                // only anchored bottom bars are compression steel; under torsion they are round the hoop too
                List<BeamSection.BarGroup> compression = p.bottomAnchored() ? bottomGroups : List.of();
                search.compression(compression);
                for (int layers = 1; layers <= p.space().maxLayers(); layers++) {
                    if (!framePasses(top, bottom == null ? top : bottom.bar(), layers)) {
                        break;
                    }
                    int[] min = search.minCounts(top, fit, crackControlled, layers, layers * fit);
                    if (min == null) {
                        continue;
                    }
                    int fewest = Arrays.stream(min).sum();
                    for (int n = fewest; n <= layers * fit; n++) {
                        if (ctx.barCost(top, n, ext) + leanZones >= most - 1e-9) {
                            break; // this many bars cost more than an option could and still pay
                        }
                        List<int[]> splits = search.passingSplits(top, n, layers, fit, first);
                        if (splits.isEmpty()) {
                            if (!search.passingSplit(top, n, layers, fit, first).anyDuctile()) {
                                break;
                            }
                            continue;
                        }
                        for (int[] split : splits) {
                            search.place(top, split);
                            out.addAll(supportOptions(
                                    place,
                                    mu,
                                    top,
                                    split,
                                    search.d(),
                                    search.tensionArea(),
                                    ctx.barCost(top, n, ext),
                                    bottom,
                                    compression,
                                    bottomGroups,
                                    zonesHere));
                        }
                    }
                }
            }
        }
        return out;
    }

    /** The options of one split of top bars at a support: one per set of zone stirrups its legs allow. */
    private List<SupportOption> supportOptions(
            SpanProblem.Place place,
            double mu,
            BarSize top,
            int[] split,
            double d,
            double as,
            double bars,
            BottomBars bottom,
            List<BeamSection.BarGroup> compression,
            List<BeamSection.BarGroup> bottomGroups,
            List<Integer> zonesHere) {
        if (zonesHere.isEmpty()) {
            return List.of(new SupportOption(
                    top, TensionSearch.toList(split), d, NO_ZONES, NO_ZONES_MAX, Map.of(), bars, bottom));
        }
        // ties round bottom bars relied on here (9.7.6.4); the legs the top bars hold
        StirrupRules.TieDemand ties =
                StirrupRules.ties(ctx.sections().support(f, shape, top, split, compression), Bending.HOGGING, mu);
        // every bar at the support, for the torsion checks
        BeamSection physical = ctx.sections().support(f, shape, top, split, bottomGroups);
        if (!ties.sizeOk(f.stirrupBar().diameter())) {
            return List.of();
        }
        // one option per range of legs: the fewest must meet the office's rule for the bottom bars, the most
        // must be held by them (both settled with the mid-span option)
        List<SupportOption> out = new ArrayList<>();
        Set<Map<Integer, Stirrups>> seen = new HashSet<>();
        List<Integer> legOptions = p.space().stirrupLegs();
        for (int fewestLegs : legOptions) {
            if (fewestLegs < p.legsFor(split[0]) || fewestLegs < ties.minLegs()) {
                continue;
            }
            for (int mostLegs : legOptions) {
                if (mostLegs < fewestLegs || mostLegs > split[0]) {
                    continue;
                }
                ZoneStirrups.Choice stirrups =
                        zoneStirrups.cheapest(zonesHere, fewestLegs, mostLegs, ties.maxSpacing(), d, as, physical);
                if (stirrups == null || !seen.add(stirrups.stirrups())) {
                    continue;
                }
                int fewestUsed = Integer.MAX_VALUE;
                int mostUsed = 0;
                for (Stirrups st : stirrups.stirrups().values()) {
                    fewestUsed = Math.min(fewestUsed, st.legs());
                    mostUsed = Math.max(mostUsed, st.legs());
                }
                out.add(new SupportOption(
                        top,
                        TensionSearch.toList(split),
                        d,
                        fewestUsed,
                        mostUsed,
                        stirrups.stirrups(),
                        bars + stirrups.cost(),
                        bottom));
            }
        }
        return out;
    }
}
