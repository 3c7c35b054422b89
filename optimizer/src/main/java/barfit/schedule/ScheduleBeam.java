package barfit.schedule;

import barfit.catalogs.yaml.Location;
import barfit.design.beam.BeamDesigner;
import barfit.design.beam.BeamProblem;

/**
 * One beam of a schedule as the user gave it: its mark, its group (beams of a group share b x h when
 * the rationalisation asks for it; null when it has none), where it was given, and the span to design;
 * {@code designed} its own optimum when that is already known (a span of a line, designed with its
 * line), else null; {@code sameSection} when its group shares b x h whatever the rationalisation's
 * setting (the parts of a line of one set of forms).
 */
public record ScheduleBeam(String id, String group, Location location, BeamProblem problem,
        BeamDesigner.Outcome designed, boolean sameSection) {
    public ScheduleBeam(String id, String group, Location location, BeamProblem problem) {
        this(id, group, location, problem, null, false);
    }

    public ScheduleBeam(String id, String group, Location location, BeamProblem problem,
            BeamDesigner.Outcome designed) {
        this(id, group, location, problem, designed, false);
    }
}
