package barfit.study;

import barfit.design.CostModel;
import barfit.design.SearchSpace;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The cost–depth frontier: the cheapest design at every depth cap in a range. Each depth of the
 * search is solved once, exactly (as is whether the minimum hangers alone can work there); a cap's
 * answer is the cheapest over the depths it allows, so a cap reuses every shallower depth's work.
 */
public final class Sweep {
    public record Point(double cap, Summary summary, double depthUsed) {}

    /**
     * Everything is reported within the range of caps asked: {@code shallowestFeasible} is the first cap
     * of the range with a passing design (null: none in the range); {@code hangersFrom} the shallowest
     * depth up to the last cap where the minimum hangers alone can work (null: none);
     * {@code compressionNeededBelow} that depth when caps of the range below it have a passing design
     * and it is within the range (null otherwise, {@link #compression()} says which: where the shallowest
     * passing cap is that depth, every passing design can do without compression steel).
     */
    public record Result(
            String id,
            List<Point> points,
            Double shallowestFeasible,
            Double compressionNeededBelow,
            Summary chosen,
            double chosenCap,
            Double hangersFrom) {
        /** Where compression steel beyond the hangers is needed within the range: "below", "nowhere" or "everywhere". */
        public String compression() {
            return compressionNeededBelow != null
                    ? "below"
                    : hangersFrom == null && shallowestFeasible != null ? "everywhere" : "nowhere";
        }

        public double firstCap() {
            return points.get(0).cap();
        }

        public double lastCap() {
            return points.get(points.size() - 1).cap();
        }
    }

    private Sweep() {}

    public static Result run(Target t, List<Double> caps, CostModel cost) {
        SearchSpace space = t.space();
        double top = caps.get(caps.size() - 1);
        Map<Double, Summary> atDepth = new LinkedHashMap<>();
        for (double d : space.depths()) {
            if (d > top + 1e-9) {
                break;
            }
            atDepth.put(d, t.design(null, space.withDepths(List.of(d)), t.materials(), cost, false));
        }
        // where the hangers alone first work (deeper still they keep working), caps below need compression steel
        Double singly = null;
        for (Map.Entry<Double, Summary> e : atDepth.entrySet()) {
            double d = e.getKey();
            Summary s = e.getValue();
            boolean ok = s.feasible() && !s.compressionUsed()
                    || t.design(null, space.withDepths(List.of(d)).withHangersOnly(), t.materials(), cost, false)
                            .feasible();
            if (ok) {
                singly = d;
                break;
            }
        }
        List<Point> points = new ArrayList<>();
        for (double cap : caps) {
            Summary best = null;
            double used = Double.NaN;
            for (Map.Entry<Double, Summary> e : atDepth.entrySet()) {
                if (e.getKey() > cap + 1e-9) {
                    break;
                }
                Summary s = e.getValue();
                if (s.feasible() && (best == null || s.total() < best.total() - 1e-9)) {
                    best = s;
                    used = e.getKey();
                }
            }
            // within a cap at or above the depth where the hangers alone work, compression steel is a matter of cost
            boolean avoidable = singly != null && cap >= singly - 1e-9;
            points.add(new Point(
                    cap,
                    best == null ? Summary.none("nothing passes with h ≤ cap") : best.withAvoidable(avoidable),
                    used));
        }
        Double shallowest = null;
        for (Point p : points) {
            if (p.summary().feasible()) {
                shallowest = p.cap();
                break;
            }
        }
        // compression steel is necessary below the hangers' first depth only if some cap below it has a design:
        // where nothing passes at all, it is not compression steel that is missing
        Double below = singly != null && shallowest != null && shallowest < singly - 1e-9 && singly <= top + 1e-9
                ? singly
                : null;
        double chosenCap =
                t.cap() != null ? t.cap() : space.depths().get(space.depths().size() - 1);
        Summary chosen = t.design(t.cap(), space, t.materials(), cost, false);
        if (chosen.feasible() && chosen.compressionNeeded()) {
            chosen = chosen.withAvoidable(singly != null && chosenCap >= singly - 1e-9
                    || t.design(t.cap(), space.withHangersOnly(), t.materials(), cost, false)
                            .feasible());
        }
        return new Result(t.id(), points, shallowest, below, chosen, chosenCap, singly);
    }
}
