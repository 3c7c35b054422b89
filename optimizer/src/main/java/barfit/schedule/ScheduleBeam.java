package barfit.schedule;

import barfit.catalogs.yaml.Location;
import barfit.design.beam.BeamProblem;

/**
 * One beam of a schedule as the user gave it: its mark, its group (beams of a group share b x h when
 * the rationalisation asks for it; null when it has none), where it was given, and the span to design.
 */
public record ScheduleBeam(String id, String group, Location location, BeamProblem problem) {
}
