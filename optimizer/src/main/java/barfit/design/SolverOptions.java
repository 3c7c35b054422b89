package barfit.design;

/** How CP-SAT runs: a time limit, the number of workers and a fixed seed (for repeatable answers). */
public record SolverOptions(double timeLimitSeconds, int workers, int seed) {
    public static final SolverOptions DEFAULT = new SolverOptions(60, 1, 1);
}
