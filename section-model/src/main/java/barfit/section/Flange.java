package barfit.section;

/**
 * A slab flange at the top of the web: {@code width} is the effective flange width used in the
 * analysis, {@code thickness} the slab thickness. {@code oneSided} marks an L-section (edge beam).
 */
public record Flange(double width, double thickness, boolean oneSided) {
}
