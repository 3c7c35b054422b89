package barfit.schedule;

import barfit.design.span.SpanProblem;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Beams the same in every input but their marks, as the same beam on each typical floor is: the search is
 * deterministic, so one design or one price serves them all.
 */
final class Repeats {
    private Repeats() {}

    /**
     * For each span, the index of the first one the same but for its mark (its own index when none comes before
     * it); -1 for a null, a span not to be shared.
     */
    static int[] firstOf(List<SpanProblem> spans) {
        int[] first = new int[spans.size()];
        Map<SpanProblem, Integer> seen = new HashMap<>();
        for (int i = 0; i < spans.size(); i++) {
            SpanProblem p = spans.get(i);
            Integer earlier = p == null ? null : seen.putIfAbsent(p.withId(""), i);
            first[i] = p == null ? -1 : earlier == null ? i : earlier;
        }
        return first;
    }
}
