package barfit.input;

import barfit.catalogs.yaml.Location;
import barfit.section.BeamSection;
import barfit.section.Demand;
import barfit.section.Span;

/** A beam of a {@code check} file: a given section and layout under a given demand. */
public record CheckBeam(String id, Location location, BeamSection section, Demand demand, Span span) {}
