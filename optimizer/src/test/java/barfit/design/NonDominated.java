package barfit.design;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeMap;

/** For the frontier oracles: the exact frontier of a list of (cost, carbon) pairs in whole units. */
public final class NonDominated {
    private NonDominated() {}

    /** The (cost, carbon) pairs no other is at least as good as in both and better in one, cheapest first. */
    public static List<long[]> of(List<long[]> all) {
        TreeMap<Long, Long> leastCarbonAtCost = new TreeMap<>();
        for (long[] x : all) {
            leastCarbonAtCost.merge(x[0], x[1], Math::min);
        }
        List<long[]> out = new ArrayList<>();
        long best = Long.MAX_VALUE;
        for (var e : leastCarbonAtCost.entrySet()) {
            if (e.getValue() < best) {
                out.add(new long[] {e.getKey(), e.getValue()});
                best = e.getValue();
            }
        }
        return out;
    }
}
