package barfit.design.section;

import barfit.design.OrTools;
import barfit.design.Proof;
import barfit.design.SolverOptions;
import com.google.ortools.sat.CpModel;
import com.google.ortools.sat.CpSolver;
import com.google.ortools.sat.LinearExpr;
import com.google.ortools.sat.Literal;
import java.util.ArrayList;
import java.util.List;

/**
 * The CP-SAT choice among candidates: one boolean per candidate, exactly one chosen per group, extra
 * linking constraints added by the caller (shared sections, bar-size limits...), minimum total cost in
 * integer cost units ({@link CostModel#UNITS}). Returns which candidates are chosen and the solver's
 * answer (status, objective, bound, its statistics).
 */
public final class SectionSelection {
    /** {@code chosen}, {@code objective} and {@code bound} only when the status is OPTIMAL or FEASIBLE. */
    public record Result(Proof.Status status, boolean[] chosen, long objective, long bound, Proof.SolverStats stats) {}

    private final CpModel model = new CpModel();
    private final List<Literal> vars = new ArrayList<>();
    private final List<Long> costs = new ArrayList<>();
    private boolean objectiveSet;

    public SectionSelection() {
        OrTools.load();
    }

    public CpModel model() {
        return model;
    }

    /** Adds a candidate with its cost (cost units); returns its index. */
    public int add(long cost, String name) {
        vars.add(model.newBoolVar(name));
        costs.add(cost);
        return vars.size() - 1;
    }

    public Literal var(int i) {
        return vars.get(i);
    }

    public int size() {
        return vars.size();
    }

    public void exactlyOne(List<Integer> group) {
        model.addExactlyOne(group.stream().map(vars::get).toList());
    }

    /** At most {@code limit} of a second measure (a carbon cap): {@code values} per candidate, in index order. */
    public void atMost(long[] values, long limit) {
        model.addLessOrEqual(LinearExpr.weightedSum(vars.toArray(new Literal[0]), values), limit);
    }

    /** Forbids candidate i (for the next-best alternatives). */
    public void exclude(int i) {
        model.addEquality(vars.get(i), 0);
    }

    public Result solve(SolverOptions o) {
        Literal[] v = vars.toArray(new Literal[0]);
        long[] c = costs.stream().mapToLong(Long::longValue).toArray();
        if (!objectiveSet) {
            model.minimize(LinearExpr.weightedSum(v, c));
            objectiveSet = true;
        }
        CpSolver solver = OrTools.solver(o);
        Proof.Status status = OrTools.status(solver.solve(model), solver, "the section selection model");
        boolean[] chosen = new boolean[v.length];
        long obj = 0;
        long bound = 0;
        if (status == Proof.Status.OPTIMAL || status == Proof.Status.FEASIBLE) {
            for (int i = 0; i < v.length; i++) {
                chosen[i] = solver.booleanValue(v[i]);
            }
            obj = Math.round(solver.objectiveValue());
            bound = Math.round(solver.bestObjectiveBound());
        }
        return new Result(
                status,
                chosen,
                obj,
                bound,
                new Proof.SolverStats(v.length, solver.numConflicts(), solver.numBranches(), solver.wallTime()));
    }
}
