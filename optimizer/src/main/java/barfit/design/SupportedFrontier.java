package barfit.design;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.function.ToLongFunction;

/**
 * The extreme supported points of a cost-carbon frontier, by the dichotomic method of Aneja and Nair
 * ("Bicriteria transportation problem", Management Science 25(1), 1979): between two points A (cheaper)
 * and B (lower in carbon) already found, minimise w_c × cost + w_k × carbon with the weights of the line
 * through them, w_c = carbon(A) − carbon(B) and w_k = cost(B) − cost(A). An answer strictly below that line
 * is a new point, and both halves are searched in turn; none below it closes the segment. Every point is
 * a proven optimum of its weighted sum, so none is dominated and each is the cheapest answer within its
 * own carbon. Points in the hull's concave gaps (unsupported ones) are not found: the frontier may have
 * more points than this lists, never fewer between the ones it lists on the hull.
 *
 * <p>Costs and carbons are compared in whole units ({@link CostModel#UNITS}) so that the test "below the
 * line" is exact.
 */
public final class SupportedFrontier {
    /** The weighted search: the answer minimising {@code costWeight} × cost + {@code carbonWeight} × carbon, or null. */
    public interface Search<T> {
        T minimise(double costWeight, double carbonWeight);
    }

    /** A point: the answer, its cost and carbon in units, and the weights it minimised (1, 0 and 0, 1 at the ends). */
    public record Point<T>(T answer, long cost, long carbon, double costWeight, double carbonWeight) {}

    /**
     * The points, cheapest first; {@code solves} the weighted searches made between the ends; {@code complete}
     * unless {@code most} stopped the search with segments left open.
     */
    public record Result<T>(List<Point<T>> points, int solves, boolean complete) {
        public Result {
            points = List.copyOf(points);
        }
    }

    private SupportedFrontier() {}

    /**
     * @param cheapest the proven cheapest answer (its carbon the least among the cheapest, where known)
     * @param leanest  the proven lowest-carbon answer
     * @param most     at most this many points between the ends
     */
    public static <T> Result<T> of(
            T cheapest, T leanest, Search<T> search, ToLongFunction<T> cost, ToLongFunction<T> carbon, int most) {
        Point<T> a = new Point<>(cheapest, cost.applyAsLong(cheapest), carbon.applyAsLong(cheapest), 1, 0);
        Point<T> b = new Point<>(leanest, cost.applyAsLong(leanest), carbon.applyAsLong(leanest), 0, 1);
        if (b.carbon() >= a.carbon() || b.cost() <= a.cost()) {
            // one answer is best in both (or the ends tie in one measure): the better of the two stands alone
            return new Result<>(List.of(b.carbon() < a.carbon() || b.cost() < a.cost() ? b : a), 0, true);
        }
        List<Point<T>> found = new ArrayList<>(List.of(a, b));
        Deque<Point<T>[]> open = new ArrayDeque<>();
        open.add(pair(a, b));
        int solves = 0;
        int added = 0;
        while (!open.isEmpty() && added < most) {
            Point<T>[] seg = open.removeFirst();
            long wc = seg[0].carbon() - seg[1].carbon();
            long wk = seg[1].cost() - seg[0].cost();
            T r = search.minimise(wc, wk);
            solves++;
            if (r == null) {
                continue;
            }
            Point<T> x = new Point<>(r, cost.applyAsLong(r), carbon.applyAsLong(r), wc, wk);
            // exact in longs: costs and carbons of a few million units, weights of the same order
            if (Math.addExact(Math.multiplyExact(wc, x.cost()), Math.multiplyExact(wk, x.carbon()))
                            < Math.addExact(
                                    Math.multiplyExact(wc, seg[0].cost()), Math.multiplyExact(wk, seg[0].carbon()))
                    && x.cost() > seg[0].cost()
                    && x.carbon() > seg[1].carbon()) {
                found.add(x);
                added++;
                open.addLast(pair(seg[0], x));
                open.addLast(pair(x, seg[1]));
            }
        }
        found.sort(java.util.Comparator.comparingLong(Point<T>::cost));
        return new Result<>(found, solves, open.isEmpty());
    }

    @SuppressWarnings("unchecked")
    private static <T> Point<T>[] pair(Point<T> a, Point<T> b) {
        return (Point<T>[]) new Point<?>[] {a, b};
    }
}
