package barfit.design.line;

import barfit.analysis.RedistributionLimit;
import barfit.catalogs.BarSize;
import barfit.design.span.FrameOptions;
import barfit.design.span.MidOption;
import barfit.design.span.SpanGenerator;
import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.design.span.SpanVerifier;
import barfit.design.span.SupportOption;
import barfit.section.Flexure;
import barfit.section.Stirrups;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Predicate;

/**
 * The bars of a line held at one section, chosen together: one top bar size along the line and the same
 * number of continuous top bars (the hangers) through every span; over each support one arrangement of top
 * bars serving the parts on both sides; bottom bars and stirrups per part; at most the line's number of bar
 * sizes, top and bottom. The parts meet only at the supports they share, so the cheapest choice is found
 * exactly by dynamic programming along the line: for each support and each arrangement over it, the
 * cheapest way to build everything to its left.
 *
 * <p>Exact over the options it is given: each part's options are every one that could be part of a
 * combination under that part's limit ({@link SpanGenerator#optionsUnder}), so a line whose total leaves
 * every part under its limit is the cheapest line.
 */
final class SharedSupports {
    private SharedSupports() {}

    /** No support option on that side of the part (no negative moment there, or no support). */
    static final List<Integer> NONE = List.of();

    /**
     * One part at the line's section. {@code left} and {@code right}: the support (0..n, left to right) at
     * the part's left and right end, -1 where there is none (an overhang's tip). {@code variants}: the part's
     * problem and options for each redistribution at its two end supports.
     */
    record PartOptions(int segment, int left, int right, List<Variant> variants) {}

    /**
     * The part designed for the percentages redistributed at its left and right supports (6.6.5): its
     * problem from that analysis, its generator and its frames' options.
     */
    record Variant(
            double rLeft,
            double rRight,
            SpanProblem problem,
            SpanGenerator generator,
            List<FrameOptions> sets,
            SpanGenerator.Stats stats) {}

    /**
     * A part's combination: its variant (the redistribution it was designed for), its frame's options, the
     * mid-span option and its support options (or null).
     */
    record Pick(
            Variant variant, FrameOptions set, MidOption mid, SupportOption left, SupportOption right, double cost) {
        SpanLayout layout() {
            return variant.generator().layout(set.frame(), mid, left, right);
        }
    }

    /** What is fixed at a support: its top bars ({@link #NONE} for none asked, null not yet) and percentage. */
    private record Slot(List<Integer> bars, Double percent) {
        static final Slot OPEN = new Slot(null, null);
    }

    /** The cheapest line: a pick per part (in the order given), the top bar size and the total. */
    record Solution(List<Pick> picks, BarSize top, double total) {}

    /** The cheapest line over the parts' options (null if none), parts in order along the line. */
    static Solution solve(List<PartOptions> parts, int supports, int maxBarSizes) {
        Set<BarSize> tops = new LinkedHashSet<>();
        Set<BarSize> bottoms = new LinkedHashSet<>();
        Set<Integer> continuous = new LinkedHashSet<>();
        for (PartOptions po : parts) {
            for (FrameOptions fs :
                    po.variants().stream().flatMap(v -> v.sets().stream()).toList()) {
                for (MidOption m : fs.mids()) {
                    tops.add(m.top().bar());
                    bottoms.add(m.bar());
                    continuous.add(m.top().continuous());
                }
            }
        }
        // every part's cheapest combination per slots, by top size, continuous bars and bottom size, in one pass
        List<Map<List<Object>, Map<Slot, Map<Slot, Pick>>>> byKind = new ArrayList<>();
        for (PartOptions po : parts) {
            byKind.add(tables(po));
        }
        // each choice of sizes and hangers with its tables and a bound (every part at its cheapest entry),
        // searched cheapest bound first so that the rest stop at the first bound past the best line found
        record Choice(BarSize top, List<Map<Slot, Map<Slot, Pick>>> tables, double bound, int order) {}
        List<Choice> choices = new ArrayList<>();
        for (BarSize top : tops) {
            for (int c : continuous) {
                for (Predicate<BarSize> bottomOk : bottomRules(top, bottoms, maxBarSizes)) {
                    List<Map<Slot, Map<Slot, Pick>>> tables = new ArrayList<>();
                    double bound = 0;
                    for (int i = 0; i < parts.size(); i++) {
                        var t = merged(byKind.get(i), top, c, bottomOk);
                        tables.add(t);
                        double least = Double.POSITIVE_INFINITY;
                        for (var row : t.values()) {
                            for (Pick p : row.values()) {
                                least = Math.min(least, p.cost());
                            }
                        }
                        bound += least;
                    }
                    if (Double.isFinite(bound)) {
                        choices.add(new Choice(top, tables, bound, choices.size()));
                    }
                }
            }
        }
        choices.sort(java.util.Comparator.comparingDouble(Choice::bound).thenComparingInt(Choice::order));
        Solution best = null;
        for (Choice ch : choices) {
            if (best != null && ch.bound() >= best.total() - 1e-9) {
                break;
            }
            Solution s = solve(parts, supports, ch.top(), ch.tables());
            if (s != null && (best == null || s.total() < best.total() - 1e-9)) {
                best = s;
            }
        }
        return best;
    }

    /**
     * A part's table for one top size, continuous count (a cantilever's own count is free) and the bottom
     * sizes allowed: per pair of slots the cheapest over the kinds that qualify, in a fixed order.
     */
    private static Map<Slot, Map<Slot, Pick>> merged(
            Map<List<Object>, Map<Slot, Map<Slot, Pick>>> byKind,
            BarSize top,
            int continuous,
            Predicate<BarSize> bottomOk) {
        Map<Slot, Map<Slot, Pick>> out = new LinkedHashMap<>();
        for (var kind : byKind.entrySet()) {
            List<Object> k = kind.getKey();
            int c = (Integer) k.get(1);
            if (!k.get(0).equals(top) || c >= 0 && c != continuous || !bottomOk.test((BarSize) k.get(2))) {
                continue;
            }
            for (var byLeft : kind.getValue().entrySet()) {
                Map<Slot, Pick> row = out.computeIfAbsent(byLeft.getKey(), x -> new LinkedHashMap<>());
                for (var e : byLeft.getValue().entrySet()) {
                    Pick old = row.get(e.getKey());
                    if (old == null || e.getValue().cost() < old.cost() - 1e-9) {
                        row.put(e.getKey(), e.getValue());
                    }
                }
            }
        }
        out.values().removeIf(Map::isEmpty);
        return out;
    }

    /**
     * The bottom bar sizes allowed with a top size: the top size alone for one size per line; the top size
     * and one other (each in turn) for two; any for more.
     */
    private static List<Predicate<BarSize>> bottomRules(BarSize top, Set<BarSize> bottoms, int maxBarSizes) {
        List<Predicate<BarSize>> out = new ArrayList<>();
        if (maxBarSizes >= 3) {
            out.add(b -> true);
        } else if (maxBarSizes == 2) {
            out.add(b -> b.equals(top));
            for (BarSize other : bottoms) {
                if (!other.equals(top)) {
                    out.add(b -> b.equals(top) || b.equals(other));
                }
            }
        } else {
            out.add(b -> b.equals(top));
        }
        return out;
    }

    private static Solution solve(
            List<PartOptions> parts, int supports, BarSize top, List<Map<Slot, Map<Slot, Pick>>> tables) {
        for (var t : tables) {
            if (t.isEmpty()) {
                return null;
            }
        }
        // the state: what is fixed over each support still touched by a later part, with the cheapest
        // cost of the parts so far that reaches it
        Map<List<Slot>, Double> costs = new LinkedHashMap<>();
        Map<List<Slot>, List<Pick>> picks = new HashMap<>();
        List<Slot> start = new ArrayList<>();
        for (int j = 0; j < supports; j++) {
            start.add(Slot.OPEN);
        }
        costs.put(start, 0.0);
        picks.put(start, List.of());
        for (int i = 0; i < parts.size(); i++) {
            PartOptions po = parts.get(i);
            Map<List<Slot>, Double> nextCosts = new LinkedHashMap<>();
            Map<List<Slot>, List<Pick>> nextPicks = new HashMap<>();
            for (var state : costs.entrySet()) {
                for (var byLeft : tables.get(i).entrySet()) {
                    List<Slot> s1 = assign(state.getKey(), po.left(), byLeft.getKey());
                    if (s1 == null) {
                        continue;
                    }
                    for (var byRight : byLeft.getValue().entrySet()) {
                        List<Slot> s2 = assign(s1, po.right(), byRight.getKey());
                        if (s2 == null) {
                            continue;
                        }
                        // supports no later part touches are settled: forget them, so states merge
                        List<Slot> key = forget(s2, parts, i + 1);
                        double c = state.getValue() + byRight.getValue().cost();
                        Double old = nextCosts.get(key);
                        if (old == null || c < old - 1e-9) {
                            nextCosts.put(key, c);
                            List<Pick> p = new ArrayList<>(picks.get(state.getKey()));
                            p.add(byRight.getValue());
                            nextPicks.put(key, p);
                        }
                    }
                }
            }
            costs = nextCosts;
            picks = nextPicks;
            if (costs.isEmpty()) {
                return null;
            }
        }
        List<Slot> bestKey = null;
        for (var e : costs.entrySet()) {
            if (bestKey == null || e.getValue() < costs.get(bestKey) - 1e-9) {
                bestKey = e.getKey();
            }
        }
        return new Solution(picks.get(bestKey), top, costs.get(bestKey));
    }

    /**
     * The state with support {@code j} given a part's slot there: the percentage must match what a part
     * beside it fixed, and the bars too where both ask for bars (NONE asks for none); null where they clash.
     */
    private static List<Slot> assign(List<Slot> state, int j, Slot slot) {
        if (j < 0) {
            return state;
        }
        Slot fixed = state.get(j);
        if (fixed.percent() != null && !fixed.percent().equals(slot.percent())) {
            return null;
        }
        List<Integer> bars = fixed.bars();
        if (slot.bars() != NONE) {
            if (bars != null && bars != NONE && !bars.equals(slot.bars())) {
                return null;
            }
            bars = slot.bars();
        } else if (bars == null) {
            bars = NONE;
        }
        Slot merged = new Slot(bars, slot.percent());
        if (merged.equals(fixed)) {
            return state;
        }
        List<Slot> out = new ArrayList<>(state);
        out.set(j, merged);
        return out;
    }

    /** The state with the supports that no part from {@code from} on touches opened again. */
    private static List<Slot> forget(List<Slot> state, List<PartOptions> parts, int from) {
        List<Slot> out = new ArrayList<>(state);
        for (int j = 0; j < out.size(); j++) {
            boolean touched = false;
            for (int k = from; k < parts.size() && !touched; k++) {
                touched = parts.get(k).left() == j || parts.get(k).right() == j;
            }
            if (!touched) {
                out.set(j, Slot.OPEN);
            }
        }
        return out;
    }

    /**
     * A part's cheapest combination for each pair of slots at its left and right supports (bars, NONE where
     * it has no support option, and the percentage redistributed), per kind (top size, continuous bars, -1
     * for a cantilever's own, bottom size), with deflection computed where the frame is below Table
     * 9.3.1.1 and a redistribution only where the support section it lowers allows it (6.6.5: εt ≥ 0.0075,
     * at most 1000 εt percent).
     */
    private static Map<List<Object>, Map<Slot, Map<Slot, Pick>>> tables(PartOptions po) {
        Map<List<Object>, Map<Slot, Map<Slot, Pick>>> out = new LinkedHashMap<>();
        for (Variant v : po.variants()) {
            SpanProblem p = v.problem();
            SpanGenerator g = v.generator();
            Map<Object, Double> strains = new HashMap<>();
            for (FrameOptions fs : v.sets()) {
                Map<List<Object>, Map<List<Integer>, SupportOption>> leftMemo = new HashMap<>();
                Map<List<Object>, Map<List<Integer>, SupportOption>> rightMemo = new HashMap<>();
                for (MidOption m : fs.mids()) {
                    List<Object> kind =
                            List.of(m.top().bar(), p.cantilever() ? -1 : m.top().continuous(), m.bar());
                    Map<Slot, Map<Slot, Pick>> table = out.computeIfAbsent(kind, k -> new LinkedHashMap<>());
                    // the support options that fit depend on the mid-span option only through these
                    List<Object> fit = java.util.Arrays.asList(
                            m.top().bar(),
                            m.top().continuous(),
                            m.legsNeeded(),
                            m.counts().get(0),
                            p.bottomCoupled() ? m.bottom() : null);
                    Map<List<Integer>, SupportOption> lefts = p.leftSupport()
                            ? leftMemo.computeIfAbsent(
                                    fit, k -> cheapestByArrangement(g, fs.lefts(), m, SpanProblem.Place.LEFT))
                            : none();
                    Map<List<Integer>, SupportOption> rights = p.rightSupport()
                            ? rightMemo.computeIfAbsent(
                                    fit, k -> cheapestByArrangement(g, fs.rights(), m, SpanProblem.Place.RIGHT))
                            : none();
                    double base = fs.frame().cost() + m.top().cost() + m.cost();
                    for (var l : lefts.entrySet()) {
                        Slot ls = new Slot(l.getKey(), v.rLeft());
                        Map<Slot, Pick> row = table.computeIfAbsent(ls, k -> new LinkedHashMap<>());
                        for (var r : rights.entrySet()) {
                            Slot rs = new Slot(r.getKey(), v.rRight());
                            double c = base
                                    + (l.getValue() == null ? 0 : l.getValue().cost())
                                    + (r.getValue() == null ? 0 : r.getValue().cost());
                            Pick old = row.get(rs);
                            if (old != null && c >= old.cost() - 1e-9) {
                                continue;
                            }
                            Pick pick = new Pick(v, fs, m, l.getValue(), r.getValue(), c);
                            if (!redistributionAllowed(pick, SpanProblem.Place.LEFT, v.rLeft(), strains)
                                    || !redistributionAllowed(pick, SpanProblem.Place.RIGHT, v.rRight(), strains)) {
                                continue;
                            }
                            if (fs.frame().deflection() && !SpanVerifier.deflectionOk(p, pick.layout())) {
                                continue;
                            }
                            row.put(rs, pick);
                        }
                    }
                }
            }
        }
        for (var t : out.values()) {
            t.values().removeIf(Map::isEmpty);
        }
        return out;
    }

    /**
     * Whether the support section at {@code side} allows {@code percent} redistributed there (6.6.5):
     * always for none, or where the part has no support bars there (no negative moment to lower); else its
     * εt, from the section model's flexure of the section as built, remembered per frame and bars.
     */
    private static boolean redistributionAllowed(
            Pick pick, SpanProblem.Place side, double percent, Map<Object, Double> strains) {
        SupportOption s = side == SpanProblem.Place.LEFT ? pick.left() : pick.right();
        if (percent == 0 || s == null) {
            return true;
        }
        SpanProblem p = pick.variant().problem();
        double epsT = strains.computeIfAbsent(List.of(pick.set().frame(), side, s.bar(), s.counts()), k -> {
            SpanLayout l = pick.layout();
            Stirrups any = l.zoneStirrups().get(0);
            return Flexure.analyse(l.section(p, side, any), SpanLayout.bending(p, side))
                    .epsT();
        });
        return percent <= RedistributionLimit.percent(epsT) + 1e-9;
    }

    private static Map<List<Integer>, SupportOption> none() {
        Map<List<Integer>, SupportOption> out = new LinkedHashMap<>();
        out.put(NONE, null);
        return out;
    }

    /** Per arrangement of top bars, the cheapest support option that fits the mid-span option. */
    private static Map<List<Integer>, SupportOption> cheapestByArrangement(
            SpanGenerator g, List<SupportOption> options, MidOption m, SpanProblem.Place side) {
        Map<List<Integer>, SupportOption> out = new LinkedHashMap<>();
        for (SupportOption s : options) {
            if (!g.fits(s, m, side)) {
                continue;
            }
            SupportOption old = out.get(s.counts());
            if (old == null || s.cost() < old.cost() - 1e-9) {
                out.put(List.copyOf(s.counts()), s);
            }
        }
        return out;
    }
}
