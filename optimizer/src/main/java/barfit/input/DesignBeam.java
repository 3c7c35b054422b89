package barfit.input;

import barfit.catalogs.yaml.Location;
import barfit.section.Flange;
import barfit.section.Span;

/**
 * A beam of a {@code design} file (single section): Mu in N·mm (+ sagging), Vu in N or null, the
 * headroom cap and fixed width in mm or null, the flange, and the span (for the cost over the length
 * and, with ends, the depth rule).
 */
public record DesignBeam(String id, Location location, double mu, Double vu, Double maxDepth, Double width,
        Flange flange, Span span) {
}
