package barfit.design.span;

import barfit.catalogs.BarSize;
import barfit.design.CostModel;
import barfit.section.Stirrups;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * How a frame's options fit together, the rules the CP-SAT model states as constraints, here applied by
 * hand: a support option of the top option's size, its first layer holding the continuous bars (on a
 * cantilever two hangers), stirrup legs suiting the bottom bars, the same anchored bottom bars; at most
 * one bar size where the beam allows one. Used for the cheap enumeration that gives the search its
 * incumbent, for pruning by cost, and to assemble a combination's layout.
 */
final class Combinations {
    /** A mid-span option with its cheapest compatible supports (null where there is no support), and the total. */
    record Cheapest(MidOption mid, SupportOption left, SupportOption right, double cost) {}

    private final SpanProblem p;
    private final List<SpanProblem.Zone> zones;

    Combinations(SpanContext ctx) {
        this.p = ctx.problem();
        this.zones = ctx.zones();
    }

    /** Support options by top bar size, cheapest first. */
    static Map<BarSize, List<SupportOption>> bySize(List<SupportOption> options) {
        Map<BarSize, List<SupportOption>> out = new IdentityHashMap<>();
        for (SupportOption s : options) {
            out.computeIfAbsent(s.bar(), k -> new ArrayList<>()).add(s);
        }
        out.values().forEach(l -> l.sort(Comparator.comparingDouble(SupportOption::cost)));
        return out;
    }

    /** Whether a support option of the right size suits a mid-span option and its continuous bars. */
    private static boolean fits(SupportOption s, int continuous, MidOption m, BottomBars bottom) {
        return s.counts().get(0) >= continuous && s.holds(m) && Objects.equals(s.bottom(), bottom);
    }

    /**
     * The support options compatible with a mid-span option, cheapest first ({@code bySize} from
     * {@link #bySize}); a single null where the span has no such support.
     */
    static List<SupportOption> compatible(
            Map<BarSize, List<SupportOption>> bySize,
            BarSize bar,
            int continuous,
            MidOption m,
            BottomBars bottom,
            boolean present) {
        List<SupportOption> out = new ArrayList<>();
        if (!present) {
            out.add(null);
            return out;
        }
        for (SupportOption s : bySize.getOrDefault(bar, List.of())) {
            if (fits(s, continuous, m, bottom)) {
                out.add(s);
            }
        }
        return out;
    }

    private static SupportOption cheapestIn(
            Map<BarSize, List<SupportOption>> bySize, BarSize bar, int continuous, MidOption m, BottomBars bottom) {
        for (SupportOption s : bySize.getOrDefault(bar, List.of())) {
            if (fits(s, continuous, m, bottom)) {
                return s;
            }
        }
        return null;
    }

    /** The cheapest support option of the top option's size holding its continuous bars (0 if no support). */
    static double cheapestAbove(List<SupportOption> options, TopOption top, boolean present) {
        if (!present) {
            return 0;
        }
        double best = Double.POSITIVE_INFINITY;
        for (SupportOption s : options) {
            if (s.bar().equals(top.bar()) && s.counts().get(0) >= top.continuous()) {
                best = Math.min(best, s.cost());
            }
        }
        return best;
    }

    /** Whether the mid-span option's bottom bars may differ in size from its top bars. */
    boolean sizesAllowed(MidOption m) {
        return m.top().bar().equals(m.bar()) || p.maxBarSizes() >= 2;
    }

    /** The bottom bars a support option must have been designed with for this mid-span option (null: none). */
    BottomBars anchored(MidOption m) {
        return p.bottomCoupled() ? m.bottom() : null;
    }

    /**
     * A mid-span option with the cheapest support options compatible with it, and what the frame, top
     * option, mid-span option and supports cost together; null where no combination is allowed.
     */
    Cheapest cheapestWith(
            SpanFrame f,
            MidOption m,
            Map<BarSize, List<SupportOption>> lefts,
            Map<BarSize, List<SupportOption>> rights) {
        TopOption t = m.top();
        if (!sizesAllowed(m)) {
            return null;
        }
        BottomBars bottom = anchored(m);
        double total = f.cost() + t.cost() + m.cost();
        SupportOption left = null;
        SupportOption right = null;
        if (p.leftSupport()) {
            left = cheapestIn(lefts, t.bar(), p.cantilever() ? 2 : t.continuous(), m, bottom);
            if (left == null) {
                return null;
            }
            total += left.cost();
        }
        if (p.rightSupport()) {
            right = cheapestIn(rights, t.bar(), t.continuous(), m, bottom);
            if (right == null) {
                return null;
            }
            total += right.cost();
        }
        return new Cheapest(m, left, right, total);
    }

    /** The one combination cheaper than every other by more than the margin, and its price as the model sums it. */
    record Decided(FrameOptions set, MidOption mid, SupportOption left, SupportOption right, long units) {}

    /**
     * The cheapest combination of these frames' options when it is cheaper than every other combination of
     * them by more than {@code margin} (currency): the CP-SAT model over the same options, whose constraints
     * these are, has then this one optimum and nothing to choose between. Null where a frame computes
     * deflection (its combinations are cut one by one as they fail) or where another comes within the margin.
     */
    Decided decided(List<FrameOptions> sets, double margin) {
        double best = Double.POSITIVE_INFINITY;
        double second = Double.POSITIVE_INFINITY;
        Decided chosen = null;
        for (FrameOptions fs : sets) {
            if (fs.frame().deflection()) {
                return null;
            }
            Map<BarSize, List<SupportOption>> lefts = bySize(fs.lefts());
            Map<BarSize, List<SupportOption>> rights = bySize(fs.rights());
            for (MidOption m : fs.mids()) {
                TopOption t = m.top();
                if (!sizesAllowed(m)) {
                    continue;
                }
                BottomBars bottom = anchored(m);
                List<SupportOption> ls =
                        compatible(lefts, t.bar(), p.cantilever() ? 2 : t.continuous(), m, bottom, p.leftSupport());
                List<SupportOption> rs = compatible(rights, t.bar(), t.continuous(), m, bottom, p.rightSupport());
                if (ls.isEmpty() || rs.isEmpty()) {
                    continue;
                }
                double base = fs.frame().cost() + t.cost() + m.cost();
                double total = base + price(ls.get(0)) + price(rs.get(0));
                double next = Math.min(
                        ls.size() > 1 ? base + price(ls.get(1)) + price(rs.get(0)) : Double.POSITIVE_INFINITY,
                        rs.size() > 1 ? base + price(ls.get(0)) + price(rs.get(1)) : Double.POSITIVE_INFINITY);
                if (total < best) {
                    second = Math.min(best, next);
                    best = total;
                    long units = CostModel.SPAN_UNITS.units(fs.frame().cost())
                            + CostModel.SPAN_UNITS.units(t.cost())
                            + CostModel.SPAN_UNITS.units(m.cost())
                            + (ls.get(0) == null
                                    ? 0
                                    : CostModel.SPAN_UNITS.units(ls.get(0).cost()))
                            + (rs.get(0) == null
                                    ? 0
                                    : CostModel.SPAN_UNITS.units(rs.get(0).cost()));
                    chosen = new Decided(fs, m, ls.get(0), rs.get(0), units);
                } else {
                    second = Math.min(second, total);
                }
            }
        }
        return chosen != null && second - best > margin ? chosen : null;
    }

    private static double price(SupportOption s) {
        return s == null ? 0 : s.cost();
    }

    /** The frame's cheapest combination that passes, found by plain enumeration of its options. */
    FrameOptions enumerate(FrameOptions fs) {
        double best = Double.POSITIVE_INFINITY;
        SpanLayout bestLayout = null;
        Map<BarSize, List<SupportOption>> lefts = bySize(fs.lefts());
        Map<BarSize, List<SupportOption>> rights = bySize(fs.rights());
        for (MidOption m : fs.mids()) {
            Cheapest c = cheapestWith(fs.frame(), m, lefts, rights);
            if (c != null && c.cost() < best - 1e-9) {
                SpanLayout layout = layout(fs.frame(), m, c.left(), c.right());
                if (fs.frame().deflection()
                        && !SpanVerifier.verify(p, layout, false).ok()) {
                    continue;
                }
                best = c.cost();
                bestLayout = layout;
            }
        }
        return new FrameOptions(fs.frame(), fs.tops(), fs.mids(), fs.lefts(), fs.rights(), best, bestLayout);
    }

    /** Drops the options that cannot be part of anything cheaper than {@code incumbent}. */
    FrameOptions prune(FrameOptions fs, double incumbent) {
        double frame = fs.frame().cost();
        // the cheapest option of each top bar size (by designation) at each support
        Map<String, Double> cheapestLeft = new HashMap<>();
        Map<String, Double> cheapestRight = new HashMap<>();
        for (SupportOption s : fs.lefts()) {
            cheapestLeft.merge(s.bar().designation(), s.cost(), Math::min);
        }
        for (SupportOption s : fs.rights()) {
            cheapestRight.merge(s.bar().designation(), s.cost(), Math::min);
        }
        List<MidOption> mids = new ArrayList<>();
        Map<String, Double> cheapestMidPlusTop = new HashMap<>();
        for (MidOption m : fs.mids()) {
            String topSize = m.top().bar().designation();
            double least = frame
                    + m.top().cost()
                    + m.cost()
                    + (p.leftSupport() ? cheapestLeft.getOrDefault(topSize, 1e300) : 0)
                    + (p.rightSupport() ? cheapestRight.getOrDefault(topSize, 1e300) : 0);
            if (least <= incumbent + 1e-9) {
                mids.add(m);
                cheapestMidPlusTop.merge(topSize, m.top().cost() + m.cost(), Math::min);
            }
        }
        List<TopOption> tops = fs.tops().stream()
                .filter(t -> mids.stream().anyMatch(m -> m.top().equals(t)))
                .toList();
        List<SupportOption> lefts = new ArrayList<>();
        for (SupportOption s : fs.lefts()) {
            String topSize = s.bar().designation();
            double least = frame
                    + cheapestMidPlusTop.getOrDefault(topSize, 1e300)
                    + s.cost()
                    + (p.rightSupport() ? cheapestRight.getOrDefault(topSize, 1e300) : 0);
            if (least <= incumbent + 1e-9) {
                lefts.add(s);
            }
        }
        List<SupportOption> rights = new ArrayList<>();
        for (SupportOption s : fs.rights()) {
            String topSize = s.bar().designation();
            double least = frame
                    + cheapestMidPlusTop.getOrDefault(topSize, 1e300)
                    + s.cost()
                    + (p.leftSupport() ? cheapestLeft.getOrDefault(topSize, 1e300) : 0);
            if (least <= incumbent + 1e-9) {
                rights.add(s);
            }
        }
        return new FrameOptions(fs.frame(), tops, mids, lefts, rights, fs.best(), fs.bestLayout());
    }

    /** The layout of a combination (a support option null where the span has no such support). */
    SpanLayout layout(SpanFrame f, MidOption m, SupportOption left, SupportOption right) {
        List<Stirrups> stirrups = new ArrayList<>();
        for (int i = 0; i < zones.size(); i++) {
            Stirrups s = m.zones().get(i);
            if (s == null && left != null) {
                s = left.zones().get(i);
            }
            if (s == null && right != null) {
                s = right.zones().get(i);
            }
            stirrups.add(s);
        }
        double extLeft = left == null
                ? 0
                : Extension.of(p, f.b(), f.h(), f.det(), m.top().bar()).length();
        double extRight = right == null
                ? 0
                : Extension.of(p, f.b(), f.h(), f.det(), m.top().bar()).length();
        return new SpanLayout(
                f.b(),
                f.h(),
                p.flange(),
                f.stirrupBar(),
                f.skin(),
                m.top().bar(),
                m.top().continuous(),
                left == null ? null : left.counts(),
                right == null ? null : right.counts(),
                m.bar(),
                m.counts(),
                stirrups,
                extLeft,
                extRight);
    }
}
