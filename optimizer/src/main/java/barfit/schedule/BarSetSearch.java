package barfit.schedule;

import barfit.design.CostModel;
import barfit.design.SolverOptions;
import barfit.input.Rationalise;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

/**
 * The cheapest schedule with at most K section sizes, over every allowed set of bar sizes. The sets are
 * tried cheapest bound first; for each, the choice of sizes is a k-median problem ({@link KMedian}) solved
 * on exact prices where known and lower bounds elsewhere, pricing exactly what a solution would use and
 * solving again until it uses exact prices only. Bounds never exceed prices, so that solution is optimal
 * for the set; a set whose bound cannot beat the best found so far is pruned.
 */
final class BarSetSearch {
    /** The best schedule for at most k sizes over every allowed bar-size set; {@code result} null when none fits. */
    record Solved(
            int k, boolean[] bars, KMedian.Result result, long bound, int setsTotal, int setsSolved, int setsPruned) {}

    private final Rationalise limits;
    private final int barSizeCount;
    private final BeamGroups groups;
    private final SizePrices prices;
    private final SolverOptions options;
    private final Progress progress;

    BarSetSearch(
            Rationalise limits,
            int barSizeCount,
            BeamGroups groups,
            SizePrices prices,
            SolverOptions options,
            Progress progress) {
        this.limits = limits;
        this.barSizeCount = barSizeCount;
        this.groups = groups;
        this.prices = prices;
        this.options = options;
        this.progress = progress;
    }

    /**
     * The best schedule for at most {@code k} sizes. {@code hint}: a schedule to start the local search
     * from; {@code first}: a bar-size set to try before the others (a neighbouring K's best), so a good
     * incumbent prunes the rest early.
     */
    Solved solve(int k, int[] hint, boolean[] first) {
        List<boolean[]> sets = barSets();
        if (groups.isEmpty()) {
            return new Solved(k, null, null, KMedian.NONE, sets.size(), 0, 0);
        }
        long formworkSet = CostModel.units(limits.formworkSetCost());
        List<Long> quick = new ArrayList<>();
        for (boolean[] set : sets) {
            quick.add(quickBound(costMatrix(set), formworkSet));
        }
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < sets.size(); i++) {
            order.add(i);
        }
        order.sort(Comparator.comparingLong(quick::get));
        if (first != null) {
            for (int i = 0; i < sets.size(); i++) {
                if (Arrays.equals(sets.get(i), first)) {
                    order.remove(Integer.valueOf(i));
                    order.add(0, i);
                    break;
                }
            }
        }
        Progress.Phase phase = new Progress.Phase(
                Progress.Step.BAR_SIZE_SETS, k >= prices.sizeCount() ? Progress.Phase.ANY_NUMBER : k);
        long incumbent = KMedian.NONE;
        int bestSet = -1;
        KMedian.Result best = null;
        long bound = KMedian.NONE;
        int solved = 0;
        int pruned = 0;
        int considered = 0;
        for (int set : order) {
            progress.update(phase, considered++, sets.size());
            long setBound = quickBound(costMatrix(sets.get(set)), formworkSet); // bounds only rise as pricing goes on
            if (setBound == KMedian.NONE) {
                continue;
            }
            if (setBound >= incumbent) {
                pruned++;
                bound = Math.min(bound, setBound);
                continue;
            }
            KMedian.Result r = solveSet(sets.get(set), k, incumbent, hint);
            if (!r.feasible()) {
                if (r.status().equals("PRUNED")) {
                    pruned++;
                    bound = Math.min(bound, r.bound());
                }
                continue;
            }
            solved++;
            bound = Math.min(bound, r.bound());
            if (r.objective() < incumbent) {
                incumbent = r.objective();
                best = r;
                bestSet = set;
                hint = r.assignment();
            }
        }
        if (best == null) {
            return new Solved(k, null, null, bound, sets.size(), solved, pruned);
        }
        return new Solved(k, sets.get(bestSet), best, Math.min(bound, best.objective()), sets.size(), solved, pruned);
    }

    /** Bar-size sets to try: every set of min(M, all) sizes. */
    private List<boolean[]> barSets() {
        int take = limits.maxBarSizes() == null ? barSizeCount : Math.min(limits.maxBarSizes(), barSizeCount);
        List<boolean[]> out = new ArrayList<>();
        combinations(barSizeCount, take, 0, new boolean[barSizeCount], 0, out);
        return out;
    }

    private static void combinations(int n, int take, int from, boolean[] current, int chosen, List<boolean[]> out) {
        if (chosen == take) {
            out.add(current.clone());
            return;
        }
        for (int i = from; i <= n - (take - chosen); i++) {
            current[i] = true;
            combinations(n, take, i + 1, current, chosen + 1, out);
            current[i] = false;
        }
    }

    /** {@code [g][s]}: group g in size s with these bar sizes (cost units), {@link KMedian#NONE} where a beam does not fit. */
    private long[][] costMatrix(boolean[] bars) {
        long[][] cost = new long[groups.count()][prices.sizeCount()];
        for (int g = 0; g < groups.count(); g++) {
            for (int s = 0; s < prices.sizeCount(); s++) {
                long sum = 0;
                for (int i : groups.members(g)) {
                    double price = prices.price(i, s, bars);
                    if (Double.isInfinite(price)) {
                        sum = KMedian.NONE;
                        break;
                    }
                    sum += CostModel.units(price);
                }
                cost[g][s] = sum;
            }
        }
        return cost;
    }

    /** The least total ignoring the size limit: each group in its cheapest size, plus one formwork set. */
    private long quickBound(long[][] cost, long formworkSet) {
        long sum = 0;
        for (long[] row : cost) {
            long best = KMedian.NONE;
            for (long v : row) {
                best = Math.min(best, v);
            }
            if (best == KMedian.NONE) {
                return KMedian.NONE;
            }
            sum += best;
        }
        return sum + (groups.isEmpty() ? 0 : formworkSet);
    }

    /**
     * For a bar-size set: solve on bounds and exact prices, price exactly what the solution uses, and
     * repeat until it uses only exact prices. Bounds never exceed prices, so that solution is optimal.
     */
    private KMedian.Result solveSet(boolean[] bars, int k, long cutoff, int[] hint) {
        long formworkSet = CostModel.units(limits.formworkSetCost());
        double[] warmPrices = null;
        while (true) {
            long[][] cost = costMatrix(bars);
            long setBound = quickBound(cost, formworkSet);
            if (setBound == KMedian.NONE) { // a beam fits no size with these bar sizes
                return KMedian.Result.infeasible();
            }
            if (setBound >= cutoff) {
                return KMedian.Result.pruned(setBound);
            }
            KMedian kmedian = new KMedian(cost, formworkSet, k);
            // the cheap heuristic first: price what it uses until it uses only prices; then the proof
            int[] start = kmedian.heuristic(hint);
            if (start == null) { // no k sizes hold every beam
                return KMedian.Result.infeasible();
            }
            if (cutoff != KMedian.NONE) {
                // before pricing anything for this set: can it beat the best found at all?
                KMedian.Lagrangian early = kmedian.lagrangian(Math.min(cutoff, kmedian.objective(start)));
                if (early.floor() >= cutoff) {
                    return KMedian.Result.pruned(early.floor());
                }
            }
            List<SizePrices.BeamSize> missing = unpriced(kmedian.assignment(start));
            KMedian.Result r = null;
            if (missing.isEmpty()) {
                long upper = kmedian.objective(start);
                KMedian.Lagrangian lagrangian = kmedian.lagrangian(upper, warmPrices);
                if (lagrangian.floor() >= cutoff) {
                    return KMedian.Result.pruned(lagrangian.floor());
                }
                // every pair a cheaper solution could use is priced before the proof: first those the
                // relaxation gains from (they hold the bound down), then the rest, likeliest first
                boolean[][] relevant = kmedian.relevant(lagrangian, upper);
                missing = unpriced(relevant);
                if (missing.size() > groups.count()) {
                    // the bound is loose: the linear relaxation's prices tighten it (and so the pairs to price)
                    KMedian.Lagrangian tighter = kmedian.fromRelaxation(upper, relevant);
                    if (tighter.bound() > lagrangian.bound()) {
                        lagrangian = tighter;
                        if (lagrangian.floor() >= cutoff) {
                            return KMedian.Result.pruned(lagrangian.floor());
                        }
                        relevant = kmedian.relevant(lagrangian, upper);
                        missing = unpriced(relevant);
                    }
                }
                warmPrices = lagrangian.v();
                if (!missing.isEmpty()) {
                    List<SizePrices.BeamSize> used = unpriced(kmedian.usedByRelaxation(lagrangian));
                    if (!used.isEmpty()) {
                        missing = used;
                    } else {
                        final KMedian.Lagrangian at = lagrangian;
                        missing.sort(Comparator.comparingDouble((SizePrices.BeamSize pair) ->
                                        kmedian.reducedCost(at, groups.groupOf(pair.beam()), pair.size()))
                                .thenComparingInt(SizePrices.BeamSize::beam)
                                .thenComparingInt(SizePrices.BeamSize::size));
                        missing = new ArrayList<>(
                                missing.subList(0, Math.min(missing.size(), Math.max(64, groups.count()))));
                    }
                }
                if (missing.isEmpty()) {
                    r = kmedian.prove(start, cutoff, options, lagrangian, relevant);
                    if (!r.feasible()) {
                        return r;
                    }
                    missing = unpriced(r.assignment());
                }
            }
            if (missing.isEmpty()) {
                return r;
            }
            prices.priceExactly(missing);
            hint = r == null ? kmedian.assignment(start) : r.assignment();
        }
    }

    /** The (beam, size) pairs of the marked (group, size) pairs that are not priced exactly yet. */
    private List<SizePrices.BeamSize> unpriced(boolean[][] marked) {
        List<SizePrices.BeamSize> missing = new ArrayList<>();
        for (int g = 0; g < groups.count(); g++) {
            for (int s = 0; s < prices.sizeCount(); s++) {
                if (marked[g][s]) {
                    for (int i : groups.members(g)) {
                        if (!prices.isPriced(i, s)) {
                            missing.add(new SizePrices.BeamSize(i, s));
                        }
                    }
                }
            }
        }
        return missing;
    }

    /** The (beam, size) pairs of an assignment of groups that are not priced exactly yet. */
    private List<SizePrices.BeamSize> unpriced(int[] assignment) {
        List<SizePrices.BeamSize> missing = new ArrayList<>();
        for (int g = 0; g < groups.count(); g++) {
            for (int i : groups.members(g)) {
                if (!prices.isPriced(i, assignment[g])) {
                    missing.add(new SizePrices.BeamSize(i, assignment[g]));
                }
            }
        }
        return missing;
    }
}
