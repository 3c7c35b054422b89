package barfit.design;

/**
 * Why an answer is the cheapest, alike for a section, a span and a schedule: the status, the objective
 * and the best bound in currency (NaN where there is none), the relative gap between them, what CP-SAT
 * reports of the solve that gave the answer, the solver's workers and seed, and the counts of the search
 * that built the model ({@code S}: the section generator's, the span designer's, the schedule's).
 */
public record Proof<S>(
        Status status,
        double objective,
        double bound,
        double gap,
        SolverStats solver,
        S search,
        int workers,
        int seed,
        Objective measure) {

    /** As above, proving a cost. */
    public Proof(
            Status status,
            double objective,
            double bound,
            double gap,
            SolverStats solver,
            S search,
            int workers,
            int seed) {
        this(status, objective, bound, gap, solver, search, workers, seed, Objective.COST);
    }

    /** The same proof of what {@code m} measures: the objective and bound are carbon (kg CO2e) for carbon. */
    public Proof<S> measuring(Objective m) {
        return new Proof<>(status, objective, bound, gap, solver, search, workers, seed, m);
    }

    /** What the searches tell apart. A model CP-SAT finds invalid is a bug, never a status: {@link OrTools#status}. */
    public enum Status {
        /** The objective meets the bound: nothing cheaper exists. */
        OPTIMAL,
        /** A solution whose bound stays below it (the time limit ended the proof): the gap says how far. */
        FEASIBLE,
        /**
         * The time limit ended CP-SAT before its first solution: the generator's cheapest design passing every
         * check is given, with no bound.
         */
        UNPROVEN,
        /** Nothing in the search space passes (or no schedule meets the limits). */
        INFEASIBLE,
        /** The time limit ended the search before any design passing every check was found. */
        OUT_OF_TIME
    }

    /**
     * What CP-SAT reports of a solve: the booleans of the model as built, the conflicts and branches of its
     * search and its wall time (s); {@link #NONE} where no solve gave the answer.
     */
    public record SolverStats(int booleans, long conflicts, long branches, double wallSeconds) {
        public static final SolverStats NONE = new SolverStats(0, 0, 0, 0);
    }

    /** A solved answer: objective and bound in whole units of {@code scale}, given in currency. */
    public static <S> Proof<S> solved(
            Status status,
            long objective,
            long bound,
            CostModel.Scale scale,
            SolverStats solver,
            S search,
            SolverOptions options) {
        return new Proof<>(
                status,
                scale.currency(objective),
                scale.currency(bound),
                gap(objective, bound),
                solver,
                search,
                options.workers(),
                options.seed());
    }

    /** A design found but not proven ({@link Status#UNPROVEN}): its cost, no bound. */
    public static <S> Proof<S> unproven(long objective, CostModel.Scale scale, S search, SolverOptions options) {
        return new Proof<>(
                Status.UNPROVEN,
                scale.currency(objective),
                Double.NaN,
                Double.NaN,
                SolverStats.NONE,
                search,
                options.workers(),
                options.seed());
    }

    /** No answer ({@link Status#INFEASIBLE}, {@link Status#OUT_OF_TIME}): nothing to bound. */
    public static <S> Proof<S> none(Status status, S search, SolverOptions options) {
        return new Proof<>(
                status,
                Double.NaN,
                Double.NaN,
                Double.NaN,
                SolverStats.NONE,
                search,
                options.workers(),
                options.seed());
    }

    /** The relative gap, from the solver's integers (exact but for one rounding): 0 when they meet. */
    static double gap(long objective, long bound) {
        return objective == 0 ? 0 : Math.max(0, (double) (objective - bound) / Math.abs(objective));
    }

    /**
     * Whether the answer was proven without a CP-SAT solve: optimal with no solver figures, as where the
     * candidates' prices alone decide a section's choice.
     */
    public boolean withoutSolve() {
        return status == Status.OPTIMAL && solver == SolverStats.NONE;
    }

    /** Whether there is an objective with a bound below it: {@link Status#OPTIMAL} or {@link Status#FEASIBLE}. */
    public boolean bounded() {
        return status == Status.OPTIMAL || status == Status.FEASIBLE;
    }
}
