package barfit.schedule;

/**
 * Where a long schedule run has got to, for a progress bar; the solver knows nothing of terminals and
 * says nothing in words: the phase is data the bar names.
 */
@FunctionalInterface
public interface Progress {
    Progress NONE = (phase, done, total) -> {};

    void update(Phase phase, int done, int total);

    /** The steps of a schedule run, in the order they come. */
    enum Step {
        DESIGNING_BEAMS,
        BOUNDING_SIZES,
        PRICING_SIZES,
        BAR_SIZE_SETS,
        STANDARDISATION,
        DESIGNING_IN_CHOSEN_SIZES
    }

    /** A step; for {@link Step#BAR_SIZE_SETS}, the most section sizes solved for ({@link #ANY_NUMBER}: no limit). */
    record Phase(Step step, int maxSizes) {
        public static final int ANY_NUMBER = 0;

        public static Phase of(Step step) {
            return new Phase(step, ANY_NUMBER);
        }
    }
}
