package barfit.design.span;

/**
 * The exact cheapest cost of a span in one section size for each pair of bar sizes: {@code cost[i][j]}
 * for top bars of the space's i-th bar size and bottom bars of its j-th, over every stirrup size,
 * infinite where no layout of that pair passes. Nothing outside the size prunes it, so a schedule can
 * price the size for any set of bar sizes it allows.
 */
public record PairTable(double width, double height, double[][] cost) {
    /** The cheapest over the pairs whose sizes are both allowed. */
    public double best(boolean[] allowed) {
        double best = Double.POSITIVE_INFINITY;
        for (int i = 0; i < cost.length; i++) {
            for (int j = 0; j < cost.length; j++) {
                if (allowed[i] && allowed[j]) {
                    best = Math.min(best, cost[i][j]);
                }
            }
        }
        return best;
    }
}
