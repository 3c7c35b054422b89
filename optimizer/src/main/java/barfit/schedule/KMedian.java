package barfit.schedule;

import barfit.design.OrTools;
import barfit.design.SolverOptions;
import com.google.ortools.linearsolver.MPConstraint;
import com.google.ortools.linearsolver.MPObjective;
import com.google.ortools.linearsolver.MPSolver;
import com.google.ortools.linearsolver.MPVariable;
import com.google.ortools.sat.CpModel;
import com.google.ortools.sat.CpSolver;
import com.google.ortools.sat.CpSolverStatus;
import com.google.ortools.sat.LinearExpr;
import com.google.ortools.sat.LinearExprBuilder;
import com.google.ortools.sat.Literal;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Choose at most {@code k} section sizes and put every group of beams in one of them, each group in its
 * cheapest open size, paying {@code fixed} per open size: the k-median problem with opening costs.
 *
 * <p>Why not one plain CP-SAT model: with a boolean per (group, size) and "used" booleans its
 * relaxation is weak and the search stalls far from the bound on real schedules. Here (1) a greedy
 * start improved by swaps gives an upper bound; (2) the linear relaxation of the strong formulation
 * (x[g][s] <= y[s], solved with GLOP) gives a lower bound that is usually tight or exact; (3) reduced
 * costs remove every variable that cannot be in a solution better than the upper bound; (4) CP-SAT
 * solves what remains, started from the upper bound's solution. The proof is the larger of the
 * relaxation's and CP-SAT's bounds against the best solution.
 */
final class KMedian {
    static final long NONE = Long.MAX_VALUE;

    /**
     * The answer: each group's size index, the objective and best bound (cost units), how it was proven
     * ({@code cpSatStatus}: CP-SAT's status where it stopped short, else null; no method when there is no
     * answer).
     */
    record Result(
            String status,
            long objective,
            long bound,
            int[] assignment,
            ProofMethod method,
            String cpSatStatus,
            int variables,
            int variablesKept) {
        boolean feasible() {
            return assignment != null;
        }

        static Result infeasible() {
            return new Result("INFEASIBLE", NONE, NONE, null, null, null, 0, 0);
        }

        /** Nothing cheaper than the best found: the relaxation's bound is at or above it. */
        static Result pruned(long bound) {
            return new Result("PRUNED", NONE, bound, null, null, null, 0, 0);
        }
    }

    private final long[][] cost;
    private final long fixed;
    private final int k;
    private final int n;
    private final int m;

    /** {@code cost[g][s]}: group g in size s, {@link #NONE} where it does not fit. */
    KMedian(long[][] cost, long fixed, int k) {
        this.cost = cost;
        this.fixed = fixed;
        this.n = cost.length;
        this.m = n == 0 ? 0 : cost[0].length;
        this.k = Math.min(k, m);
    }

    /** Whether every group fits some size. */
    boolean eachGroupFits() {
        for (int g = 0; g < n; g++) {
            boolean any = false;
            for (int s = 0; s < m; s++) {
                any |= cost[g][s] != NONE;
            }
            if (!any) {
                return false;
            }
        }
        return true;
    }

    /**
     * A good solution fast: the hint's sizes (or a greedy start) improved by swaps, closings and
     * openings; the open sizes, or null when no k sizes hold every group.
     */
    int[] heuristic(int[] hint) {
        if (!eachGroupFits()) {
            return null;
        }
        return localSearch(hint != null && feasibleOpen(openOf(hint)) ? openOf(hint) : greedy());
    }

    /** Each group's size with these sizes open. */
    int[] assignment(int[] open) {
        return assign(open);
    }

    long objective(int[] open) {
        return total(open);
    }

    /** A Lagrangian bound (assignment constraints relaxed) and the multipliers that gave it. */
    record Lagrangian(double bound, double[] v, boolean[] open) {
        long floor() {
            return (long) Math.floor(bound - 1e-9 * Math.abs(bound) - 1);
        }
    }

    /**
     * Relaxes "each group in one size" with a price v[g] per group: the bound is the sum of the prices
     * plus, for the (up to k) sizes whose opening cost plus the groups' gains min(0, c - v) is most
     * negative, those sums. Any prices give a valid bound; a subgradient search raises it toward the
     * linear relaxation's value, cheaply.
     */
    Lagrangian lagrangian(long ub) {
        return lagrangian(ub, null);
    }

    /** As {@link #lagrangian(long)}, the search starting from {@code start} (prices from before) when given. */
    Lagrangian lagrangian(long ub, double[] start) {
        double[] v = new double[n];
        for (int g = 0; g < n; g++) {
            long min = NONE;
            for (long c : cost[g]) {
                min = Math.min(min, c);
            }
            v[g] = start != null && start.length == n ? Math.max(start[g], min) : min;
        }
        double best = Double.NEGATIVE_INFINITY;
        double[] bestV = v.clone();
        boolean[] bestOpen = new boolean[m];
        double mu = 2.0;
        int stall = 0;
        double[] rho = new double[m];
        boolean[] open = new boolean[m];
        Integer[] order = new Integer[m];
        for (int it = 0; it < 400 && mu > 1e-5; it++) {
            java.util.Arrays.fill(rho, fixed);
            double sumV = 0;
            for (int g = 0; g < n; g++) {
                sumV += v[g];
                long[] row = cost[g];
                for (int s = 0; s < m; s++) {
                    if (row[s] != NONE && row[s] < v[g]) {
                        rho[s] += row[s] - v[g];
                    }
                }
            }
            for (int s = 0; s < m; s++) {
                order[s] = s;
            }
            final double[] r = rho;
            java.util.Arrays.sort(order, (a, b) -> Double.compare(r[a], r[b]));
            java.util.Arrays.fill(open, false);
            double bound = sumV;
            for (int x = 0; x < k && x < m && rho[order[x]] < 0; x++) {
                open[order[x]] = true;
                bound += rho[order[x]];
            }
            if (best == Double.NEGATIVE_INFINITY || bound > best + 1e-9 * Math.abs(best)) {
                best = bound;
                bestV = v.clone();
                bestOpen = open.clone();
                stall = 0;
            } else if (++stall >= 15) {
                mu /= 2;
                stall = 0;
            }
            if (best >= ub) {
                break;
            }
            double norm = 0;
            double[] sub = new double[n];
            for (int g = 0; g < n; g++) {
                int covered = 0;
                for (int s = 0; s < m; s++) {
                    if (open[s] && cost[g][s] != NONE && cost[g][s] < v[g]) {
                        covered++;
                    }
                }
                sub[g] = 1 - covered;
                norm += sub[g] * sub[g];
            }
            if (norm == 0) {
                break; // the relaxed solution is feasible: its bound is the relaxation's optimum
            }
            double step = mu * Math.max(ub - bound, 1) / norm;
            for (int g = 0; g < n; g++) {
                v[g] += step * sub[g];
            }
        }
        return new Lagrangian(best, bestV, bestOpen);
    }

    /**
     * The (group, size) pairs any solution cheaper than {@code ub} could use. Forcing a pair into the
     * relaxed problem raises its value by at least max(0, c - v) and, for a size the relaxed solution
     * leaves shut, by what opening that size costs there; a pair whose forced value reaches {@code ub} is
     * in no cheaper solution.
     */
    boolean[][] relevant(Lagrangian lag, long ub) {
        double gap = ub - lag.bound() + 1e-6 * Math.max(1, Math.abs(ub));
        double[] v = lag.v();
        // what opening a size the relaxed solution leaves shut costs at least: its own gain rho, less the
        // gain of the size it would displace when k are open already
        double[] rho = new double[m];
        java.util.Arrays.fill(rho, fixed);
        for (int g = 0; g < n; g++) {
            for (int s = 0; s < m; s++) {
                if (cost[g][s] != NONE && cost[g][s] < v[g]) {
                    rho[s] += cost[g][s] - v[g];
                }
            }
        }
        Integer[] order = new Integer[m];
        for (int s = 0; s < m; s++) {
            order[s] = s;
        }
        java.util.Arrays.sort(order, (a, b) -> Double.compare(rho[a], rho[b]));
        boolean[] chosen = new boolean[m];
        int count = 0;
        double worstChosen = 0;
        for (int x = 0; x < k && x < m && rho[order[x]] < 0; x++) {
            chosen[order[x]] = true;
            worstChosen = rho[order[x]];
            count++;
        }
        double[] open = new double[m];
        for (int s = 0; s < m; s++) {
            open[s] = chosen[s] ? 0 : count == k ? rho[s] - worstChosen : Math.max(0, rho[s]);
        }
        boolean[][] out = new boolean[n][m];
        for (int g = 0; g < n; g++) {
            for (int s = 0; s < m; s++) {
                out[g][s] = cost[g][s] != NONE && Math.max(0, cost[g][s] - v[g]) + open[s] < gap;
            }
        }
        return out;
    }

    /**
     * The prices the linear relaxation over the pairs in {@code keep} puts on "each group in one size"
     * (its duals), improved by the subgradient search: they are the best prices, so the bound nears the
     * relaxation's value, which the subgradient alone approaches slowly.
     */
    Lagrangian fromRelaxation(long ub, boolean[][] keep) {
        Relaxation lp = relax(ub, keep);
        if (lp.duals() == null) {
            return lagrangian(ub);
        }
        return lagrangian(ub, lp.duals());
    }

    /**
     * The (group, size) pairs the relaxed solution of the best prices gains from: an open size cheaper
     * for the group than its price. Where these are bounds rather than prices they hold the bound down.
     */
    boolean[][] usedByRelaxation(Lagrangian lag) {
        boolean[][] out = new boolean[n][m];
        for (int g = 0; g < n; g++) {
            for (int s = 0; s < m; s++) {
                out[g][s] = lag.open()[s] && cost[g][s] != NONE && cost[g][s] < lag.v()[g];
            }
        }
        return out;
    }

    /** Per group, the reduced cost c - v of each pair under the best prices (for pricing the likeliest first). */
    double reducedCost(Lagrangian lag, int g, int s) {
        return cost[g][s] == NONE ? Double.POSITIVE_INFINITY : cost[g][s] - lag.v()[g];
    }

    /**
     * Proves the best solution, starting from {@code start} (open sizes from {@link #heuristic}); gives up
     * early (status PRUNED) when a bound shows nothing cheaper than {@code cutoff} exists.
     */
    Result prove(int[] start, long cutoff, SolverOptions options) {
        long ub = total(start);
        Lagrangian lag = lagrangian(ub);
        return prove(start, cutoff, options, lag, relevant(lag, ub));
    }

    Result prove(int[] start, long cutoff, SolverOptions options, Lagrangian lag, boolean[][] relevant) {
        long ub = total(start);
        if (lag.floor() >= cutoff) {
            return Result.pruned(lag.floor());
        }
        if (lag.floor() >= ub) {
            return new Result("OPTIMAL", ub, ub, assign(start), ProofMethod.LAGRANGIAN_BOUND, null, 0, 0);
        }
        int[] startAssign = assign(start);
        boolean[][] keep = new boolean[n][];
        for (int g = 0; g < n; g++) {
            keep[g] = relevant[g].clone();
            keep[g][startAssign[g]] = true; // the incumbent stays expressible
        }
        Relaxation lp = relax(ub, keep);
        long bound = Math.max(lp.bound, lag.floor());
        if (bound >= cutoff) {
            return Result.pruned(bound);
        }
        if (lp.integral != null && total(lp.integral) <= ub) {
            long obj = total(lp.integral);
            return new Result(
                    "OPTIMAL",
                    obj,
                    obj,
                    assign(lp.integral),
                    ProofMethod.LINEAR_RELAXATION_INTEGRAL,
                    null,
                    lp.variables,
                    lp.variables);
        }
        if (bound >= ub) {
            return new Result("OPTIMAL", ub, ub, assign(start), ProofMethod.RELAXATION_BOUND, null, lp.variables, 0);
        }
        return exact(start, ub, lp, options, keep);
    }

    /** Heuristic then proof in one call. */
    Result solve(long cutoff, SolverOptions options, int[] hint) {
        if (!eachGroupFits()) {
            return Result.infeasible(); // a group fits no size
        }
        int[] start = heuristic(hint);
        if (start == null) {
            return Result.infeasible(); // no k sizes hold every group
        }
        return prove(start, cutoff, options);
    }

    // ------------------------------------------------------------------ heuristics

    private boolean[] openOf(int[] assignment) {
        boolean[] open = new boolean[m];
        for (int s : assignment) {
            if (s >= 0) {
                open[s] = true;
            }
        }
        return open;
    }

    private boolean feasibleOpen(boolean[] open) {
        int count = 0;
        for (boolean o : open) {
            count += o ? 1 : 0;
        }
        return count <= k && total(open) != NONE;
    }

    /** Total cost with these sizes open, each group in its cheapest open size; NONE if a group fits none. */
    long total(boolean[] open) {
        long sum = 0;
        int[] list = openSizes(open);
        int count = list.length;
        for (int g = 0; g < n; g++) {
            long best = cheapestOpen(cost[g], list, count);
            if (best == NONE) {
                return NONE;
            }
            sum += best;
        }
        return sum + fixed * count;
    }

    private long total(int[] open) {
        return open == null ? NONE : total(toMask(open));
    }

    private boolean[] toMask(int[] open) {
        boolean[] mask = new boolean[m];
        for (int s : open) {
            mask[s] = true;
        }
        return mask;
    }

    private int[] assign(int[] open) {
        boolean[] mask = toMask(open);
        int[] out = new int[n];
        for (int g = 0; g < n; g++) {
            int best = -1;
            for (int s = 0; s < m; s++) {
                if (mask[s] && cost[g][s] != NONE && (best < 0 || cost[g][s] < cost[g][best])) {
                    best = s;
                }
            }
            out[g] = best;
        }
        return out;
    }

    /** The indices of the open sizes, in order. */
    private int[] openSizes(boolean[] open) {
        int count = 0;
        int[] list = new int[m];
        for (int s = 0; s < m; s++) {
            if (open[s]) {
                list[count++] = s;
            }
        }
        return Arrays.copyOf(list, count);
    }

    /** The least of a group's costs over the first {@code count} sizes of {@code open}; NONE if none fits. */
    private static long cheapestOpen(long[] row, int[] open, int count) {
        long best = NONE;
        for (int x = 0; x < count; x++) {
            best = Math.min(best, row[open[x]]);
        }
        return best;
    }

    /** A penalised total for the greedy: groups that fit no open size count a large fixed sum. */
    private double penalised(boolean[] open) {
        double sum = 0;
        int[] list = openSizes(open);
        int count = list.length;
        for (int g = 0; g < n; g++) {
            long best = cheapestOpen(cost[g], list, count);
            sum += best == NONE ? 1e18 : best;
        }
        return sum + (double) fixed * count;
    }

    /** Opens, one at a time, the size that lowers the (penalised) total most, while it does and k allows. */
    private boolean[] greedy() {
        boolean[] open = new boolean[m];
        double current = Double.POSITIVE_INFINITY;
        for (int step = 0; step < k; step++) {
            int pick = -1;
            double pickValue = current;
            for (int s = 0; s < m; s++) {
                if (open[s]) {
                    continue;
                }
                open[s] = true;
                double v = penalised(open);
                open[s] = false;
                if (v < pickValue) {
                    pickValue = v;
                    pick = s;
                }
            }
            if (pick < 0) {
                break;
            }
            open[pick] = true;
            current = pickValue;
        }
        return open;
    }

    /** Swaps, closings and openings while any lowers the total; the open sizes, or null if infeasible. */
    private int[] localSearch(boolean[] open) {
        long current = total(open);
        boolean improved = true;
        while (improved) {
            improved = false;
            int count = 0;
            for (boolean o : open) {
                count += o ? 1 : 0;
            }
            long best = current;
            int out = -1;
            int in = -1;
            for (int a = -1; a < m; a++) {
                if (a >= 0 && !open[a]) {
                    continue;
                }
                for (int b = -1; b < m; b++) {
                    if ((b >= 0 && open[b]) || (a < 0 && b < 0) || (a < 0 && count >= k)) {
                        continue;
                    }
                    if (a >= 0) {
                        open[a] = false;
                    }
                    if (b >= 0) {
                        open[b] = true;
                    }
                    long v = total(open);
                    if (b >= 0) {
                        open[b] = false;
                    }
                    if (a >= 0) {
                        open[a] = true;
                    }
                    if (v < best) {
                        best = v;
                        out = a;
                        in = b;
                    }
                }
            }
            if (best < current) {
                if (out >= 0) {
                    open[out] = false;
                }
                if (in >= 0) {
                    open[in] = true;
                }
                current = best;
                improved = true;
            }
        }
        if (current == NONE) {
            return null;
        }
        List<Integer> list = new ArrayList<>();
        for (int s = 0; s < m; s++) {
            if (open[s]) {
                list.add(s);
            }
        }
        return list.stream().mapToInt(Integer::intValue).toArray();
    }

    // ------------------------------------------------------------------ relaxation

    /** The relaxation: its bound (units, rounded down), an integral solution if it found one, reduced costs. */
    private record Relaxation(
            long bound,
            int[] integral,
            double[][] xReduced,
            double[] yReduced,
            double value,
            int variables,
            double[] duals) {}

    /**
     * The relaxation over the solutions no dearer than {@code ub}: a group's size whose cost exceeds the
     * group's cheapest by more than ub less the bound without a size limit cannot be in one, so it is left
     * out, which makes the relaxation small.
     */
    private Relaxation relax(long ub, boolean[][] keep) {
        OrTools.load();
        boolean[] usable = new boolean[m];
        for (int g = 0; g < n; g++) {
            for (int s = 0; s < m; s++) {
                usable[s] |= keep[g][s];
            }
        }
        MPSolver lp = MPSolver.createSolver("GLOP");
        double scale = 1e-4; // currency units keep the relaxation well scaled
        MPVariable[] y = new MPVariable[m];
        MPVariable[][] x = new MPVariable[n][m];
        MPObjective obj = lp.objective();
        int vars = 0;
        for (int s = 0; s < m; s++) {
            if (usable[s]) {
                y[s] = lp.makeNumVar(0, 1, "y" + s);
                obj.setCoefficient(y[s], fixed * scale);
            }
        }
        MPConstraint sizes = lp.makeConstraint(-MPSolver.infinity(), k, "k");
        for (int s = 0; s < m; s++) {
            if (y[s] != null) {
                sizes.setCoefficient(y[s], 1);
            }
        }
        MPConstraint[] rows = new MPConstraint[n];
        for (int g = 0; g < n; g++) {
            MPConstraint one = lp.makeConstraint(1, 1, "g" + g);
            rows[g] = one;
            for (int s = 0; s < m; s++) {
                if (!keep[g][s]) {
                    continue;
                }
                x[g][s] = lp.makeNumVar(0, 1, "x" + g + "_" + s);
                vars++;
                obj.setCoefficient(x[g][s], cost[g][s] * scale);
                one.setCoefficient(x[g][s], 1);
                MPConstraint link = lp.makeConstraint(-MPSolver.infinity(), 0, "l" + g + "_" + s);
                link.setCoefficient(x[g][s], 1);
                link.setCoefficient(y[s], -1);
            }
        }
        obj.setMinimization();
        MPSolver.ResultStatus st = lp.solve();
        if (st != MPSolver.ResultStatus.OPTIMAL) {
            lp.delete();
            return new Relaxation(0, null, null, null, 0, vars, null); // no bound beyond zero
        }
        double value = obj.value();
        // a safe integer bound: round down after allowing for the solver's tolerance
        long bound = (long) Math.floor(value / scale - 1e-6 * Math.max(1, Math.abs(value / scale)) - 1);
        double[][] xr = new double[n][m];
        double[] yr = new double[m];
        boolean integral = true;
        for (int s = 0; s < m; s++) {
            if (y[s] == null) {
                yr[s] = Double.POSITIVE_INFINITY;
                continue;
            }
            yr[s] = y[s].reducedCost() / scale;
            double v = y[s].solutionValue();
            integral &= v < 1e-7 || v > 1 - 1e-7;
        }
        for (int g = 0; g < n; g++) {
            for (int s = 0; s < m; s++) {
                xr[g][s] = x[g][s] == null ? Double.POSITIVE_INFINITY : x[g][s].reducedCost() / scale;
                if (x[g][s] != null) {
                    double v = x[g][s].solutionValue();
                    integral &= v < 1e-7 || v > 1 - 1e-7;
                }
            }
        }
        int[] open = null;
        if (integral) {
            List<Integer> list = new ArrayList<>();
            for (int s = 0; s < m; s++) {
                if (y[s] != null && y[s].solutionValue() > 0.5) {
                    list.add(s);
                }
            }
            open = list.stream().mapToInt(Integer::intValue).toArray();
        }
        double[] duals = new double[n];
        for (int g = 0; g < n; g++) {
            duals[g] = rows[g].dualValue() / scale;
        }
        lp.delete();
        return new Relaxation(Math.max(0, bound), open, xr, yr, value / scale, vars, duals);
    }

    // ------------------------------------------------------------------ exact

    private Result exact(int[] start, long ub, Relaxation lp, SolverOptions options, boolean[][] keep) {
        double slack = ub - lp.value + 1e-6 * Math.max(1, ub);
        boolean[] sizeKept = new boolean[m];
        for (int s = 0; s < m; s++) {
            sizeKept[s] = lp.yReduced[s] <= slack;
        }
        for (int s : start) {
            sizeKept[s] = true; // the incumbent stays expressible
        }
        int[] startAssign = assign(start);
        CpModel model = new CpModel();
        Literal[] y = new Literal[m];
        for (int s = 0; s < m; s++) {
            if (sizeKept[s]) {
                y[s] = model.newBoolVar("y" + s);
            }
        }
        LinearExprBuilder objective = LinearExpr.newBuilder();
        LinearExprBuilder open = LinearExpr.newBuilder();
        for (int s = 0; s < m; s++) {
            if (y[s] != null) {
                objective.addTerm(y[s], fixed);
                open.add(y[s]);
            }
        }
        model.addLessOrEqual(open, k);
        int kept = 0;
        List<Literal> hintVars = new ArrayList<>();
        List<Boolean> hintValues = new ArrayList<>();
        for (int g = 0; g < n; g++) {
            List<Literal> choices = new ArrayList<>();
            for (int s = 0; s < m; s++) {
                if (y[s] == null || !keep[g][s]) {
                    continue;
                }
                boolean incumbent = startAssign[g] == s;
                if (!incumbent && lp.xReduced[g][s] > slack) {
                    continue;
                }
                Literal xs = model.newBoolVar("x" + g + "_" + s);
                model.addImplication(xs, y[s]);
                objective.addTerm(xs, cost[g][s]);
                choices.add(xs);
                hintVars.add(xs);
                hintValues.add(incumbent);
                kept++;
            }
            model.addExactlyOne(choices);
        }
        for (int s = 0; s < m; s++) {
            if (y[s] != null) {
                hintVars.add(y[s]);
                final int size = s;
                hintValues.add(Arrays.stream(start).anyMatch(v -> v == size));
            }
        }
        for (int i = 0; i < hintVars.size(); i++) {
            model.addHint(hintVars.get(i), hintValues.get(i));
        }
        model.minimize(objective);
        CpSolver solver = OrTools.solver(options);
        solver.getParameters().setLinearizationLevel(2);
        CpSolverStatus st = solver.solve(model);
        OrTools.status(st, solver, "the schedule's k-median model"); // MODEL_INVALID stops here, as a bug
        if (st != CpSolverStatus.OPTIMAL && st != CpSolverStatus.FEASIBLE) {
            // nothing better within the time: the local-search solution with the relaxation's bound
            return new Result(
                    "FEASIBLE", ub, lp.bound, assign(start), ProofMethod.CP_SAT_STOPPED, st.name(), lp.variables, kept);
        }
        List<Integer> chosen = new ArrayList<>();
        for (int s = 0; s < m; s++) {
            if (y[s] != null && solver.booleanValue(y[s])) {
                chosen.add(s);
            }
        }
        int[] openSizes = chosen.stream().mapToInt(Integer::intValue).toArray();
        long obj = total(openSizes);
        long bound = Math.max(lp.bound, (long) Math.ceil(solver.bestObjectiveBound() - 1e-6));
        if (obj > ub) {
            openSizes = start;
            obj = ub;
        }
        String status = st == CpSolverStatus.OPTIMAL || bound >= obj ? "OPTIMAL" : "FEASIBLE";
        return new Result(
                status, obj, Math.min(bound, obj), assign(openSizes), ProofMethod.CP_SAT, null, lp.variables, kept);
    }
}
