package barfit.schedule;

import barfit.catalogs.BarSize;
import barfit.design.CostModel;
import barfit.design.Proof;
import barfit.design.SolverOptions;
import barfit.design.beam.BeamDesigner;
import barfit.design.beam.BeamGenerator;
import barfit.design.beam.BeamProblem;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.IntFunction;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;

/**
 * Designs a schedule. Without rationalisation every beam gets its own proven optimum (in parallel).
 * With it: every beam's span is priced exactly in every section size for every pair of bar sizes (the
 * beam generator's pair tables); for each allowed set of bar sizes, cheapest-bound first, the choice of
 * at most K sizes is a k-median problem solved exactly ({@link KMedian}); sets whose bound cannot beat
 * the best found are pruned. Each beam is then designed afresh in its size with the schedule's bar
 * sizes, which re-verifies it and must reproduce the priced cost.
 */
public final class ScheduleSolver {
    private final CostModel cost;
    private final SolverOptions options;
    private final int threads;
    private final Progress progress;
    private final Parallel pool;

    public ScheduleSolver(CostModel cost, SolverOptions options, int threads, Progress progress) {
        this.cost = cost;
        this.options = options;
        this.threads = Math.max(1, threads);
        this.progress = progress;
        this.pool = new Parallel(threads, progress);
    }

    public ScheduleResult solve(ScheduleInput in) {
        long t0 = System.nanoTime();
        List<ScheduleBeam> beams = in.beams();
        BeamDesigner designer = new BeamDesigner(cost, options, in.settings().units());
        List<BeamDesigner.Outcome> own = parallel(beams.size(), Progress.Phase.of(Progress.Step.DESIGNING_BEAMS),
                i -> beams.get(i).designed() != null ? beams.get(i).designed()
                        : designer.design(beams.get(i).problem(), 0));
        double unconstrained = 0;
        for (BeamDesigner.Outcome o : own) {
            if (o.feasible()) {
                unconstrained += o.best().cost().total();
            }
        }
        if (in.rationalise() == null) {
            List<ScheduleResult.Beam> out = new ArrayList<>();
            for (int i = 0; i < beams.size(); i++) {
                BeamDesigner.Outcome o = own.get(i);
                out.add(new ScheduleResult.Beam(beams.get(i), o, o.feasible() ? o.best().cost().total() : Double.NaN));
            }
            return finish(in, out, 0, unconstrained, null, List.of(), t0);
        }
        return new Rationalisation(in, own, designer, t0).run();
    }

    /** Runs {@code task} for 0..n-1 on the solver's threads; results in index order whatever the timing. */
    <T> List<T> parallel(int n, Progress.Phase phase, IntFunction<T> task) {
        return pool.map(n, phase, task);
    }

    <T> List<T> parallel(int n, Progress.Phase phase, IntFunction<T> task, Progress report) {
        return pool.map(n, phase, task, report);
    }

    private ScheduleResult finish(ScheduleInput in, List<ScheduleResult.Beam> beams, double formworkSets,
            double unconstrained, Proof<ScheduleResult.Search> proof, List<ScheduleResult.StandardisationPoint> curve,
            long t0) {
        Map<List<Double>, List<String>> sizes = new TreeMap<>(Comparator.<List<Double>>comparingDouble(l -> l.get(0))
                .thenComparingDouble(l -> l.get(1)));
        Map<String, BarSize> bars = new TreeMap<>();
        double total = 0;
        for (ScheduleResult.Beam b : beams) {
            if (!b.feasible()) {
                continue;
            }
            var layout = b.outcome().best().layout();
            sizes.computeIfAbsent(List.of(layout.width(), layout.height()), k -> new ArrayList<>()).add(b.beam().id());
            bars.put(key(layout.top()), layout.top());
            bars.put(key(layout.bottom()), layout.bottom());
            total += b.outcome().best().cost().total();
        }
        List<ScheduleResult.SectionSize> used = new ArrayList<>();
        sizes.forEach((k, v) -> used.add(new ScheduleResult.SectionSize(k.get(0), k.get(1), v)));
        List<String> barNames = bars.values().stream().map(BarSize::designation).toList();
        return new ScheduleResult(in, beams, used, barNames, total, formworkSets, unconstrained, proof, curve, threads,
                (System.nanoTime() - t0) / 1_000_000);
    }

    private static String key(BarSize b) {
        return String.format(java.util.Locale.ROOT, "%09.3f", b.diameter());
    }

    // ------------------------------------------------------------------ rationalisation

    private final class Rationalisation {
        private final ScheduleInput in;
        private final List<BeamDesigner.Outcome> own;
        private final BeamDesigner designer;
        private final long t0;
        private final Rationalise rat;
        private final List<BarSize> barSizes;
        /** Every section size any beam may take, ordered by width then height. */
        private final List<double[]> sizes = new ArrayList<>();
        private List<BeamGenerator> generators;
        /** {@code lower.get(i)[s]}: per bar pair, a lower bound on beam i in size s; null where it has no frame. */
        private List<double[][][]> lower;
        /** {@code exact.get(i)[s]}: beam i priced exactly in size s, once asked for. */
        private final List<BeamGenerator.PairTable[]> exact = new ArrayList<>();
        /** Groups of beam indices that share a size; beams with no design on their own are left out. */
        private final List<List<Integer>> groups = new ArrayList<>();
        private final List<String> groupNames = new ArrayList<>();
        private int[] groupOf;
        private int priced;
        private int pricedForProof;
        private long proofMillis;

        Rationalisation(ScheduleInput in, List<BeamDesigner.Outcome> own, BeamDesigner designer, long t0) {
            this.in = in;
            this.own = own;
            this.designer = designer;
            this.t0 = t0;
            this.rat = in.rationalise();
            this.barSizes = in.space().barSizes();
        }

        ScheduleResult run() {
            List<ScheduleBeam> beams = in.beams();
            for (double b : in.space().widths()) {
                for (double h : in.space().depths()) {
                    sizes.add(new double[] {b, h});
                }
            }
            for (ScheduleBeam b : beams) {
                Double w = b.problem().fixedWidth();
                if (w != null && sizes.stream().noneMatch(s -> s[0] == w)) {
                    for (double h : in.space().depths()) {
                        sizes.add(new double[] {w, h});
                    }
                }
            }
            sizes.sort(Comparator.<double[]>comparingDouble(s -> s[0]).thenComparingDouble(s -> s[1]));
            generators = new ArrayList<>();
            for (int i = 0; i < beams.size(); i++) {
                generators.add(own.get(i).feasible() ? new BeamGenerator(beams.get(i).problem(), cost) : null);
                exact.add(new BeamGenerator.PairTable[sizes.size()]);
            }
            lower = parallel(beams.size(), Progress.Phase.of(Progress.Step.BOUNDING_SIZES), this::lowerBoundsOf);
            buildGroups();
            dropGroupsWithoutCommonSize();
            int k = rat.maxSectionSizes() == null ? sizes.size() : rat.maxSectionSizes();
            Solved best = solveAll(k, null, null);
            pricedForProof = priced;
            long proofMillis = (System.nanoTime() - t0) / 1_000_000;
            this.proofMillis = proofMillis;
            List<BeamDesigner.Outcome> outcomes = designBeams(best);
            List<ScheduleResult.StandardisationPoint> curve = standardisation(best);
            return assemble(best, outcomes, curve);
        }

        /**
         * Lower bounds for one beam in every size: the generator's bar-free bound per bar pair, and never
         * below the beam's own optimum (no size or bar set can do better than the best of all).
         */
        private double[][][] lowerBoundsOf(int i) {
            double[][][] out = new double[sizes.size()][][];
            BeamGenerator gen = generators.get(i);
            if (gen == null) {
                return out;
            }
            double floor = own.get(i).best().cost().total();
            for (int s = 0; s < sizes.size(); s++) {
                double[][] lb = gen.pairLowerBounds(sizes.get(s)[0], sizes.get(s)[1]);
                if (lb != null) {
                    for (double[] row : lb) {
                        for (int j = 0; j < row.length; j++) {
                            row[j] = Math.max(row[j], floor);
                        }
                    }
                }
                out[s] = lb;
            }
            return out;
        }

        /** Prices exactly the (beam, size) pairs asked for that are not priced yet, beam by beam in parallel. */
        private void price(List<int[]> pairs) {
            Map<Integer, List<Integer>> byBeam = new TreeMap<>();
            for (int[] bs : pairs) {
                if (exact.get(bs[0])[bs[1]] == null && lower.get(bs[0])[bs[1]] != null) {
                    byBeam.computeIfAbsent(bs[0], x -> new ArrayList<>()).add(bs[1]);
                }
            }
            List<Integer> beams = new ArrayList<>(byBeam.keySet());
            List<BeamGenerator.PairTable[]> got = parallel(beams.size(), Progress.Phase.of(Progress.Step.PRICING_SIZES), j -> {
                int i = beams.get(j);
                BeamGenerator.PairTable[] t = new BeamGenerator.PairTable[sizes.size()];
                for (int s : new java.util.TreeSet<>(byBeam.get(i))) {
                    t[s] = generators.get(i).pairTable(sizes.get(s)[0], sizes.get(s)[1]);
                }
                return t;
            }, Progress.NONE);
            for (int j = 0; j < beams.size(); j++) {
                BeamGenerator.PairTable[] t = got.get(j);
                for (int s = 0; s < t.length; s++) {
                    if (t[s] != null) {
                        checkBound(beams.get(j), s, t[s]);
                        exact.get(beams.get(j))[s] = t[s];
                        priced++;
                    }
                }
            }
        }

        /** The search is exact only if no bound exceeds its price: a breach is a bug, never a result. */
        private void checkBound(int i, int s, BeamGenerator.PairTable t) {
            double[][] lb = lower.get(i)[s];
            for (int a = 0; a < lb.length; a++) {
                for (int b = 0; b < lb.length; b++) {
                    if (t.cost()[a][b] < lb[a][b] - 1e-6) {
                        throw new IllegalStateException("beam " + in.beams().get(i).id() + " in " + sizes.get(s)[0]
                                + " x " + sizes.get(s)[1] + ": bar pair " + a + "/" + b + " priced at " + t.cost()[a][b]
                                + " below its bound " + lb[a][b] + "; this is a bug in the bounds");
                    }
                }
            }
        }

        private void buildGroups() {
            Map<String, List<Integer>> named = new LinkedHashMap<>();
            for (int i = 0; i < in.beams().size(); i++) {
                if (!own.get(i).feasible()) {
                    continue;
                }
                String g = in.beams().get(i).group();
                if ((rat.groupsSameSection() || in.beams().get(i).sameSection()) && g != null) {
                    named.computeIfAbsent(g, x -> new ArrayList<>()).add(i);
                } else {
                    named.put("\u0000" + i, new ArrayList<>(List.of(i)));
                }
            }
            named.forEach((name, members) -> {
                groups.add(members);
                groupNames.add(name.startsWith("\u0000") ? null : name);
            });
            groupOf = new int[in.beams().size()];
            java.util.Arrays.fill(groupOf, -1);
            for (int g = 0; g < groups.size(); g++) {
                for (int i : groups.get(g)) {
                    groupOf[i] = g;
                }
            }
        }

        /** Beams of a group that share no size in which each passes: each with why, for the report. */
        private final Map<Integer, BeamDesigner.Diagnosis> groupFailures = new TreeMap<>();

        /**
         * A group whose beams have no section size in common where each passes (say one is capped below
         * what another needs) cannot be rationalised: its beams are reported with the reason and left out.
         */
        private void dropGroupsWithoutCommonSize() {
            boolean[] all = new boolean[barSizes.size()];
            java.util.Arrays.fill(all, true);
            List<Integer> bad = new ArrayList<>();
            for (int g = 0; g < groups.size(); g++) {
                List<Integer> members = groups.get(g);
                if (members.size() < 2) {
                    continue;
                }
                List<int[]> candidates = new ArrayList<>();
                for (int s = 0; s < sizes.size(); s++) {
                    final int size = s;
                    if (members.stream().allMatch(i -> Double.isFinite(entry(i, size, all)))) {
                        for (int i : members) {
                            candidates.add(new int[] {i, s});
                        }
                    }
                }
                price(candidates);
                boolean fits = false;
                for (int s = 0; s < sizes.size() && !fits; s++) {
                    final int size = s;
                    fits = members.stream().allMatch(i -> Double.isFinite(entry(i, size, all)));
                }
                if (!fits) {
                    bad.add(g);
                }
            }
            for (int gi = bad.size() - 1; gi >= 0; gi--) {
                int g = bad.get(gi);
                List<Integer> members = groups.get(g);
                UnitSystem u = in.settings().units();
                List<String> optima = new ArrayList<>();
                for (int i : members) {
                    BeamProblem p = in.beams().get(i).problem();
                    var l = own.get(i).best().layout();
                    optima.add(p.id() + " " + u.compact(l.width(), Dim.LENGTH) + " × " + u.compact(l.height(), Dim.LENGTH)
                            + (p.maxDepth() != null ? " (max_depth " + u.compact(p.maxDepth(), Dim.LENGTH) + ")" : "")
                            + (p.fixedWidth() != null ? " (width " + u.compact(p.fixedWidth(), Dim.LENGTH) + ")" : ""));
                }
                String name = groupNames.get(g);
                BeamDesigner.Diagnosis d = new BeamDesigner.Diagnosis("group", "the beams of group " + name
                        + " share no section size in which each passes; their own optima: " + String.join("; ", optima),
                        List.of("give them different groups, or lift the max_depth or width that keeps them apart"));
                for (int i : members) {
                    groupFailures.put(i, d);
                }
                groups.remove(g);
                groupNames.remove(g);
            }
            groupOf = new int[in.beams().size()];
            java.util.Arrays.fill(groupOf, -1);
            for (int g = 0; g < groups.size(); g++) {
                for (int i : groups.get(g)) {
                    groupOf[i] = g;
                }
            }
        }

        /** Bar-size sets to try: every set of min(M, all) sizes. */
        private List<boolean[]> barSets() {
            int nb = barSizes.size();
            int take = rat.maxBarSizes() == null ? nb : Math.min(rat.maxBarSizes(), nb);
            List<boolean[]> out = new ArrayList<>();
            combinations(nb, take, 0, new boolean[nb], 0, out);
            return out;
        }

        private void combinations(int n, int take, int from, boolean[] cur, int chosen, List<boolean[]> out) {
            if (chosen == take) {
                out.add(cur.clone());
                return;
            }
            for (int i = from; i <= n - (take - chosen); i++) {
                cur[i] = true;
                combinations(n, take, i + 1, cur, chosen + 1, out);
                cur[i] = false;
            }
        }

        /** Beam i in size s with bar sizes {@code bars}: exact where priced, else the lower bound. */
        private double entry(int i, int s, boolean[] bars) {
            BeamGenerator.PairTable t = exact.get(i)[s];
            if (t != null) {
                return t.best(bars);
            }
            double[][] lb = lower.get(i)[s];
            if (lb == null) {
                return Double.POSITIVE_INFINITY;
            }
            double best = Double.POSITIVE_INFINITY;
            for (int a = 0; a < lb.length; a++) {
                for (int b = 0; b < lb.length; b++) {
                    if (bars[a] && bars[b]) {
                        best = Math.min(best, lb[a][b]);
                    }
                }
            }
            return best;
        }

        private long[][] matrix(boolean[] bars) {
            long[][] c = new long[groups.size()][sizes.size()];
            for (int g = 0; g < groups.size(); g++) {
                for (int s = 0; s < sizes.size(); s++) {
                    long sum = 0;
                    for (int i : groups.get(g)) {
                        double v = entry(i, s, bars);
                        if (Double.isInfinite(v)) {
                            sum = KMedian.NONE;
                            break;
                        }
                        sum += CostModel.units(v);
                    }
                    c[g][s] = sum;
                }
            }
            return c;
        }

        /** The least total ignoring the size limit: each group in its cheapest size, plus one formwork set. */
        private long quickBound(long[][] c, long fixed) {
            long sum = 0;
            for (long[] row : c) {
                long best = KMedian.NONE;
                for (long v : row) {
                    best = Math.min(best, v);
                }
                if (best == KMedian.NONE) {
                    return KMedian.NONE;
                }
                sum += best;
            }
            return sum + (groups.isEmpty() ? 0 : fixed);
        }

        /** The best schedule for at most k sizes over every allowed bar-size set. */
        record Solved(int k, boolean[] bars, KMedian.Result result, long bound, int setsTotal, int setsSolved,
                int setsPruned) {
        }

        /**
         * For a bar-size set: solve on bounds and exact prices, price exactly what the solution uses, and
         * repeat until it uses only exact prices. Bounds never exceed prices, so that solution is optimal.
         */
        private KMedian.Result solveSet(boolean[] bars, int k, long cutoff, int[] hint) {
            long fixed = CostModel.units(rat.formworkSetCost());
            double[] warm = null;
            while (true) {
                long[][] c = matrix(bars);
                long qb = quickBound(c, fixed);
                if (qb == KMedian.NONE) {
                    return KMedian.Result.infeasible("a beam fits no size with these bar sizes");
                }
                if (qb >= cutoff) {
                    return KMedian.Result.pruned(qb);
                }
                KMedian km = new KMedian(c, fixed, k);
                // the cheap heuristic first: price what it uses until it uses only prices; then the proof
                int[] start = km.heuristic(hint);
                if (start == null) {
                    return KMedian.Result.infeasible("no " + k + " sizes hold every beam");
                }
                if (cutoff != KMedian.NONE) {
                    // before pricing anything for this set: can it beat the best found at all?
                    KMedian.Lagrangian early = km.lagrangian(Math.min(cutoff, km.objective(start)));
                    if (early.floor() >= cutoff) {
                        return KMedian.Result.pruned(early.floor());
                    }
                }
                List<int[]> missing = unpriced(km.assignment(start));
                KMedian.Result r = null;
                if (missing.isEmpty()) {
                    long ub = km.objective(start);
                    KMedian.Lagrangian lag = km.lagrangian(ub, warm);
                    if (lag.floor() >= cutoff) {
                        return KMedian.Result.pruned(lag.floor());
                    }
                    // every pair a cheaper solution could use is priced before the proof: first those the
                    // relaxation gains from (they hold the bound down), then the rest, likeliest first
                    boolean[][] relevant = km.relevant(lag, ub);
                    missing = unpriced(relevant);
                    if (missing.size() > groups.size()) {
                        // the bound is loose: the linear relaxation's prices tighten it (and so the pairs to price)
                        KMedian.Lagrangian tighter = km.fromRelaxation(ub, relevant);
                        if (tighter.bound() > lag.bound()) {
                            lag = tighter;
                            if (lag.floor() >= cutoff) {
                                return KMedian.Result.pruned(lag.floor());
                            }
                            relevant = km.relevant(lag, ub);
                            missing = unpriced(relevant);
                        }
                    }
                    warm = lag.v();
                    if (!missing.isEmpty()) {
                        List<int[]> used = unpriced(km.usedByRelaxation(lag));
                        if (!used.isEmpty()) {
                            missing = used;
                        } else {
                            final KMedian.Lagrangian at = lag;
                            missing.sort(Comparator.comparingDouble((int[] bs) -> km.reducedCost(at, groupOf[bs[0]],
                                    bs[1])).thenComparingInt(bs -> bs[0]).thenComparingInt(bs -> bs[1]));
                            missing = new ArrayList<>(missing.subList(0, Math.min(missing.size(),
                                    Math.max(64, groups.size()))));
                        }
                    }
                    if (missing.isEmpty()) {
                        r = km.prove(start, cutoff, options, lag, relevant);
                        if (!r.feasible()) {
                            return r;
                        }
                        missing = unpriced(r.assignment());
                    }
                }
                if (missing.isEmpty()) {
                    return r;
                }
                price(missing);
                hint = r == null ? km.assignment(start) : r.assignment();
            }
        }

        /** The (beam, size) pairs of the marked (group, size) pairs that are not priced exactly yet. */
        private List<int[]> unpriced(boolean[][] marked) {
            List<int[]> missing = new ArrayList<>();
            for (int g = 0; g < groups.size(); g++) {
                for (int s = 0; s < sizes.size(); s++) {
                    if (marked[g][s]) {
                        for (int i : groups.get(g)) {
                            if (exact.get(i)[s] == null) {
                                missing.add(new int[] {i, s});
                            }
                        }
                    }
                }
            }
            return missing;
        }

        /** The (beam, size) pairs of an assignment of groups that are not priced exactly yet. */
        private List<int[]> unpriced(int[] assignment) {
            List<int[]> missing = new ArrayList<>();
            for (int g = 0; g < groups.size(); g++) {
                for (int i : groups.get(g)) {
                    if (exact.get(i)[assignment[g]] == null) {
                        missing.add(new int[] {i, assignment[g]});
                    }
                }
            }
            return missing;
        }

        /**
         * {@code hint}: a schedule to start the local search from; {@code first}: a bar-size set to try
         * before the others (a neighbouring K's best), so a good incumbent prunes the rest early.
         */
        private Solved solveAll(int k, int[] hint, boolean[] first) {
            List<boolean[]> sets = barSets();
            if (groups.isEmpty()) {
                return new Solved(k, null, null, KMedian.NONE, sets.size(), 0, 0);
            }
            long fixed = CostModel.units(rat.formworkSetCost());
            List<Long> quick = new ArrayList<>();
            for (boolean[] set : sets) {
                quick.add(quickBound(matrix(set), fixed));
            }
            List<Integer> order = new ArrayList<>();
            for (int i = 0; i < sets.size(); i++) {
                order.add(i);
            }
            order.sort(Comparator.comparingLong(quick::get));
            if (first != null) {
                for (int i = 0; i < sets.size(); i++) {
                    if (java.util.Arrays.equals(sets.get(i), first)) {
                        order.remove(Integer.valueOf(i));
                        order.add(0, i);
                        break;
                    }
                }
            }
            long incumbent = KMedian.NONE;
            int bestSet = -1;
            KMedian.Result best = null;
            long bound = KMedian.NONE;
            int solved = 0;
            int pruned = 0;
            int considered = 0;
            for (int idx : order) {
                progress.update(new Progress.Phase(Progress.Step.BAR_SIZE_SETS, k >= sizes.size()
                        ? Progress.Phase.ANY_NUMBER : k), considered++, sets.size());
                long qb = quickBound(matrix(sets.get(idx)), fixed); // bounds only rise as pricing goes on
                if (qb == KMedian.NONE) {
                    continue;
                }
                if (qb >= incumbent) {
                    pruned++;
                    bound = Math.min(bound, qb);
                    continue;
                }
                KMedian.Result r = solveSet(sets.get(idx), k, incumbent, hint);
                if (r.feasible()) {
                    solved++;
                }
                if (!r.feasible()) {
                    if (r.status().equals("PRUNED")) {
                        pruned++;
                        bound = Math.min(bound, r.bound());
                    }
                    continue;
                }
                bound = Math.min(bound, r.bound());
                if (r.objective() < incumbent) {
                    incumbent = r.objective();
                    best = r;
                    bestSet = idx;
                    hint = r.assignment();
                }
            }
            if (best == null) {
                return new Solved(k, null, null, bound, sets.size(), solved, pruned);
            }
            return new Solved(k, sets.get(bestSet), best, Math.min(bound, best.objective()), sets.size(), solved, pruned);
        }

        /** The least total for K = 1, 2, ... up to the sizes the schedule uses with no limit on them. */
        private List<ScheduleResult.StandardisationPoint> standardisation(Solved chosen) {
            if (groups.isEmpty()) {
                return List.of();
            }
            Solved free = rat.maxSectionSizes() == null ? chosen : solveAll(sizes.size(), null, chosen.bars());
            if (free.result() == null) {
                return List.of();
            }
            int most = distinct(free.result().assignment());
            List<ScheduleResult.StandardisationPoint> out = new ArrayList<>();
            // upward from one size, each K started from the K - 1 schedule and its bar sizes
            int[] hint = null;
            boolean[] bars = chosen.bars() != null ? chosen.bars() : free.bars();
            for (int k = 1; k <= most; k++) {
                Solved s = k == most ? free : rat.maxSectionSizes() != null && k == rat.maxSectionSizes() ? chosen
                        : solveAll(k, hint, bars);
                if (s.result() != null) {
                    hint = s.result().assignment();
                    bars = s.bars();
                }
                progress.update(Progress.Phase.of(Progress.Step.STANDARDISATION), k, most);
                if (s.result() == null) {
                    out.add(new ScheduleResult.StandardisationPoint(k, Double.NaN, Proof.Status.INFEASIBLE, List.of()));
                } else {
                    out.add(new ScheduleResult.StandardisationPoint(k, CostModel.currency(s.result().objective()),
                            s.bound() >= s.result().objective() ? Proof.Status.OPTIMAL : Proof.Status.FEASIBLE,
                            names(s.bars())));
                }
            }
            return out;
        }

        private int distinct(int[] assignment) {
            return (int) java.util.Arrays.stream(assignment).distinct().count();
        }

        private List<String> names(boolean[] bars) {
            List<String> out = new ArrayList<>();
            for (int i = 0; i < barSizes.size(); i++) {
                if (bars[i]) {
                    out.add(barSizes.get(i).designation());
                }
            }
            return out;
        }

        /** Each beam designed afresh in its size with the schedule's bar sizes; its cost must equal its price. */
        private List<BeamDesigner.Outcome> designBeams(Solved best) {
            List<ScheduleBeam> beams = in.beams();
            int[] sizeOf = new int[beams.size()];
            java.util.Arrays.fill(sizeOf, -1);
            if (best.result() != null) {
                for (int g = 0; g < groups.size(); g++) {
                    for (int i : groups.get(g)) {
                        sizeOf[i] = best.result().assignment()[g];
                    }
                }
            }
            List<BarSize> allowed = new ArrayList<>();
            if (best.bars() != null) {
                for (int i = 0; i < barSizes.size(); i++) {
                    if (best.bars()[i]) {
                        allowed.add(barSizes.get(i));
                    }
                }
            }
            List<BeamDesigner.Outcome> outcomes = parallel(beams.size(), Progress.Phase.of(Progress.Step.DESIGNING_IN_CHOSEN_SIZES), i -> {
                if (groupFailures.containsKey(i)) {
                    BeamDesigner.Outcome mine = own.get(i);
                    return new BeamDesigner.Outcome(mine.problem(), "infeasible", null, List.of(), mine.proof(),
                            List.of(), groupFailures.get(i));
                }
                if (sizeOf[i] < 0) {
                    return own.get(i);
                }
                double[] sz = sizes.get(sizeOf[i]);
                BeamProblem p = beams.get(i).problem();
                BeamProblem q = p.withFixedWidth(sz[0]).withSpace(p.space().withDepths(List.of(sz[1]))
                        .withMainBars(allowed));
                BeamDesigner.Outcome o = designer.design(q, 0);
                double priced = exact.get(i)[sizeOf[i]].best(best.bars());
                if (!o.feasible() || Math.abs(o.best().cost().total() - priced) > 1e-3) {
                    throw new IllegalStateException("beam " + p.id() + " in " + sz[0] + " x " + sz[1] + " was priced at "
                            + priced + " but designs at " + (o.feasible() ? o.best().cost().total() : "nothing")
                            + "; this is a bug in the schedule search");
                }
                // reported against the beam as given (its own width and depth limits), designed in its size
                return new BeamDesigner.Outcome(p, o.status(), o.best(), o.alternatives(), o.proof(), o.binding(),
                        o.diagnosis());
            });
            return outcomes;
        }

        private ScheduleResult assemble(Solved best, List<BeamDesigner.Outcome> outcomes,
                List<ScheduleResult.StandardisationPoint> curve) {
            List<ScheduleBeam> beams = in.beams();
            List<ScheduleResult.Beam> out = new ArrayList<>();
            for (int i = 0; i < beams.size(); i++) {
                BeamDesigner.Outcome o = outcomes.get(i);
                out.add(new ScheduleResult.Beam(beams.get(i), o,
                        own.get(i).feasible() ? own.get(i).best().cost().total() : Double.NaN));
            }
            double formwork = 0;
            Proof<ScheduleResult.Search> proof;
            if (best.result() == null) {
                int fewest = curve.stream().filter(pt -> !Double.isNaN(pt.cost())).mapToInt(
                        ScheduleResult.StandardisationPoint::sizes).min().orElse(-1);
                String why = groups.isEmpty() ? "no beam is left to rationalise: each failed on its own or in its group"
                        : (rat.maxSectionSizes() == null ? "the bar sizes allowed" : "at most "
                        + rat.maxSectionSizes() + (rat.maxSectionSizes() == 1 ? " section size" : " section sizes")
                        + (rat.maxBarSizes() == null ? "" : " with " + rat.maxBarSizes()
                        + (rat.maxBarSizes() == 1 ? " bar size" : " bar sizes"))) + " cannot hold every beam"
                        + (fewest > 0 ? "; at least " + fewest + " section sizes are needed" : "");
                proof = Proof.none(Proof.Status.INFEASIBLE, new ScheduleResult.Search(why, best.setsTotal(),
                        best.setsSolved(), best.setsPruned(), pricedForProof, proofMillis), options);
            } else {
                int used = distinct(best.result().assignment());
                formwork = used * rat.formworkSetCost();
                Proof.Status status = best.bound() >= best.result().objective() ? Proof.Status.OPTIMAL
                        : Proof.Status.FEASIBLE;
                proof = Proof.solved(status, best.result().objective(), best.bound(), CostModel.UNITS,
                        Proof.SolverStats.NONE, new ScheduleResult.Search(best.result().method()
                        + "; sizes priced lazily against bar-free bounds", best.setsTotal(), best.setsSolved(),
                        best.setsPruned(), pricedForProof, proofMillis), options);
            }
            // every beam at its own optimum, for comparison: the beams designed here, each in its own best
            // size, with a set of forms for each distinct size
            double ownTotal = 0;
            java.util.Set<List<Double>> ownSizes = new java.util.HashSet<>();
            for (int i = 0; i < beams.size(); i++) {
                if (out.get(i).feasible() && own.get(i).feasible()) {
                    var l = own.get(i).best().layout();
                    ownTotal += own.get(i).best().cost().total();
                    ownSizes.add(List.of(l.width(), l.height()));
                }
            }
            if (best.result() == null) {
                formwork = ownSizes.size() * rat.formworkSetCost(); // the beams stand at their own optima, forms and all
            }
            return finish(in, out, formwork, ownTotal + ownSizes.size() * rat.formworkSetCost(), proof, curve, t0);
        }
    }
}
