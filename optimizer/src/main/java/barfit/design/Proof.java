package barfit.design;

/**
 * Why the answer is the cheapest: the CP-SAT status over the candidates, its objective and best
 * bound (cost units), and what the generator skipped by its cost bound.
 */
public record Proof(Selection.Status status, long objective, long bound, int candidates,
        CandidateGenerator.Stats stats, double solveSeconds, int workers, int seed) {

    public double gap() {
        if (objective == 0) {
            return 0;
        }
        return Math.max(0, (double) (objective - bound) / Math.abs(objective));
    }
}
