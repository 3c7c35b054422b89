package barfit.design.span;

/**
 * The factored shear along a span as design takes it (N, magnitudes; x in mm from the left face): the
 * shear a section at x must carry when the section's effective depth is d, sections nearer a face than d
 * taking the shear at d where 9.4.3.2 allows it.
 */
public interface ShearAlong {
    /** The design shear at x for sections of effective depth d. */
    double at(double x, double d);

    /**
     * No more than a zone's design shear (the larger of {@link #at} at its two ends) for any d: what a
     * search may use as a bound before d is known.
     */
    double least(double from, double to);

    /** The same shear times k (a study's scaled demand). */
    ShearAlong times(double k);
}
