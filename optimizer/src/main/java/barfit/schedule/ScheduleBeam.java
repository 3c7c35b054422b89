package barfit.schedule;

import barfit.catalogs.yaml.Location;
import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanProblem;

/**
 * One beam of a schedule as the user gave it: its mark, its group (beams of a group share b x h when
 * the rationalisation asks for it; null when it has none), where it was given, and the span to design;
 * {@code designed} its own optimum when that is already known (a span of a line, designed with its
 * line), else null; {@code sameSection} when its group shares b x h whatever the rationalisation's
 * setting (the parts of a line of one set of forms).
 */
public record ScheduleBeam(
        String id,
        String group,
        Location location,
        SpanProblem problem,
        SpanDesigner.Outcome designed,
        boolean sameSection) {
    public ScheduleBeam(String id, String group, Location location, SpanProblem problem) {
        this(id, group, location, problem, null, false);
    }

    public ScheduleBeam(
            String id, String group, Location location, SpanProblem problem, SpanDesigner.Outcome designed) {
        this(id, group, location, problem, designed, false);
    }
}
