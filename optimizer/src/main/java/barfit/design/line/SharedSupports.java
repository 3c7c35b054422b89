package barfit.design.line;

import barfit.catalogs.BarSize;
import barfit.design.span.FrameOptions;
import barfit.design.span.MidOption;
import barfit.design.span.SpanGenerator;
import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.design.span.SpanVerifier;
import barfit.design.span.SupportOption;
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
     * One part's options at the line's section. {@code left} and {@code right}: the support (0..n, left to
     * right) under the problem's left and right support sections, -1 where it has none.
     */
    record PartOptions(
            int segment, SpanProblem problem, SpanGenerator generator, List<FrameOptions> sets, int left, int right) {}

    /** A part's combination: its frame's options, the mid-span option and its support options (or null). */
    record Pick(FrameOptions set, MidOption mid, SupportOption left, SupportOption right, double cost) {
        SpanLayout layout(SpanGenerator g) {
            return g.layout(set.frame(), mid, left, right);
        }
    }

    /** The cheapest line: a pick per part (in the order given), the top bar size and the total. */
    record Solution(List<Pick> picks, BarSize top, double total) {}

    /** The cheapest line over the parts' options (null if none), parts in order along the line. */
    static Solution solve(List<PartOptions> parts, int supports, int maxBarSizes) {
        Set<BarSize> tops = new LinkedHashSet<>();
        Set<BarSize> bottoms = new LinkedHashSet<>();
        Set<Integer> continuous = new LinkedHashSet<>();
        for (PartOptions po : parts) {
            for (FrameOptions fs : po.sets()) {
                for (MidOption m : fs.mids()) {
                    tops.add(m.top().bar());
                    bottoms.add(m.bar());
                    continuous.add(m.top().continuous());
                }
            }
        }
        Solution best = null;
        for (BarSize top : tops) {
            for (int c : continuous) {
                for (Predicate<BarSize> bottomOk : bottomRules(top, bottoms, maxBarSizes)) {
                    Solution s = solve(parts, supports, top, c, bottomOk);
                    if (s != null && (best == null || s.total() < best.total() - 1e-9)) {
                        best = s;
                    }
                }
            }
        }
        return best;
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
            List<PartOptions> parts, int supports, BarSize top, int continuous, Predicate<BarSize> bottomOk) {
        List<Map<List<Integer>, Map<List<Integer>, Pick>>> tables = new ArrayList<>();
        for (PartOptions po : parts) {
            var t = table(po, top, continuous, bottomOk);
            if (t.isEmpty()) {
                return null;
            }
            tables.add(t);
        }
        // what each support's arrangement must be: every part beside it asks for the same (NONE asks nothing)
        // state: the arrangement over each support fixed so far, as the cheapest cost to reach it
        Map<List<List<Integer>>, Double> costs = new LinkedHashMap<>();
        Map<List<List<Integer>>, List<Pick>> picks = new HashMap<>();
        List<List<Integer>> start = new ArrayList<>();
        for (int j = 0; j < supports; j++) {
            start.add(null);
        }
        costs.put(start, 0.0);
        picks.put(start, List.of());
        for (int i = 0; i < parts.size(); i++) {
            PartOptions po = parts.get(i);
            Map<List<List<Integer>>, Double> nextCosts = new LinkedHashMap<>();
            Map<List<List<Integer>>, List<Pick>> nextPicks = new HashMap<>();
            for (var state : costs.entrySet()) {
                for (var byLeft : tables.get(i).entrySet()) {
                    List<List<Integer>> s1 = assign(state.getKey(), po.left(), byLeft.getKey());
                    if (s1 == null) {
                        continue;
                    }
                    for (var byRight : byLeft.getValue().entrySet()) {
                        List<List<Integer>> s2 = assign(s1, po.right(), byRight.getKey());
                        if (s2 == null) {
                            continue;
                        }
                        // supports no later part touches are settled: forget them, so states merge
                        List<List<Integer>> key = forget(s2, parts, i + 1);
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
        List<List<Integer>> bestKey = null;
        for (var e : costs.entrySet()) {
            if (bestKey == null || e.getValue() < costs.get(bestKey) - 1e-9) {
                bestKey = e.getKey();
            }
        }
        return new Solution(picks.get(bestKey), top, costs.get(bestKey));
    }

    /**
     * The state with support {@code j} given {@code arrangement}: unchanged where the part has no support
     * option there ({@code j} = -1 or NONE), null where a part beside it already fixed another.
     */
    private static List<List<Integer>> assign(List<List<Integer>> state, int j, List<Integer> arrangement) {
        if (j < 0 || arrangement == NONE) {
            return state;
        }
        List<Integer> fixed = state.get(j);
        if (fixed != null) {
            return fixed.equals(arrangement) ? state : null;
        }
        List<List<Integer>> out = new ArrayList<>(state);
        out.set(j, arrangement);
        return out;
    }

    /** The state with the supports that no part from {@code from} on touches set back to unknown. */
    private static List<List<Integer>> forget(List<List<Integer>> state, List<PartOptions> parts, int from) {
        List<List<Integer>> out = new ArrayList<>(state);
        for (int j = 0; j < out.size(); j++) {
            boolean touched = false;
            for (int k = from; k < parts.size() && !touched; k++) {
                touched = parts.get(k).left() == j || parts.get(k).right() == j;
            }
            if (!touched) {
                out.set(j, null);
            }
        }
        return out;
    }

    /**
     * A part's cheapest combination for each pair of arrangements over its left and right supports (NONE
     * where it has no support option), with the top size and continuous bars given (a cantilever's own
     * continuous bars are its own), bottom bars of an allowed size, and deflection computed where the
     * frame is below Table 9.3.1.1.
     */
    private static Map<List<Integer>, Map<List<Integer>, Pick>> table(
            PartOptions po, BarSize top, int continuous, Predicate<BarSize> bottomOk) {
        SpanProblem p = po.problem();
        SpanGenerator g = po.generator();
        Map<List<Integer>, Map<List<Integer>, Pick>> out = new LinkedHashMap<>();
        for (FrameOptions fs : po.sets()) {
            for (MidOption m : fs.mids()) {
                if (!m.top().bar().equals(top)
                        || !p.cantilever() && m.top().continuous() != continuous
                        || !bottomOk.test(m.bar())) {
                    continue;
                }
                Map<List<Integer>, SupportOption> lefts =
                        p.leftSupport() ? cheapestByArrangement(g, fs.lefts(), m, SpanProblem.Place.LEFT) : none();
                Map<List<Integer>, SupportOption> rights =
                        p.rightSupport() ? cheapestByArrangement(g, fs.rights(), m, SpanProblem.Place.RIGHT) : none();
                double base = fs.frame().cost() + m.top().cost() + m.cost();
                for (var l : lefts.entrySet()) {
                    for (var r : rights.entrySet()) {
                        double c = base
                                + (l.getValue() == null ? 0 : l.getValue().cost())
                                + (r.getValue() == null ? 0 : r.getValue().cost());
                        Pick old = out.computeIfAbsent(l.getKey(), k -> new LinkedHashMap<>())
                                .get(r.getKey());
                        if (old != null && c >= old.cost() - 1e-9) {
                            continue;
                        }
                        Pick pick = new Pick(fs, m, l.getValue(), r.getValue(), c);
                        if (fs.frame().deflection() && !SpanVerifier.deflectionOk(p, pick.layout(g))) {
                            continue;
                        }
                        out.get(l.getKey()).put(r.getKey(), pick);
                    }
                }
            }
        }
        out.values().removeIf(Map::isEmpty);
        return out;
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
