package barfit.design;

import barfit.catalogs.BarSize;

/**
 * A limit that stops the design from being cheaper, as data the reports put in words: the check
 * ({@code limit}) that fails when the design is made leaner as {@code leaner} says, with {@code value} the
 * leaner design's depth, width or stirrup spacing (mm), its legs, or, for a span, the check's ratio of
 * demand to limit; {@code bar} is the bar size of which there is one fewer (else null).
 */
public record Binding(String limit, Leaner leaner, double value, BarSize bar) {
    /** How the design was made leaner (or, for a span, how near the check is to its limit). */
    public enum Leaner {
        ONE_BAR_FEWER,
        SHALLOWER,
        NARROWER,
        STIRRUPS_WIDER_APART,
        FEWER_LEGS,
        /** The height sits at the headroom cap. */
        AT_MAX_DEPTH,
        /** A span's check working at {@code value} of its limit (0.95 or more). */
        NEAR_LIMIT
    }

    public Binding(String limit, Leaner leaner, double value) {
        this(limit, leaner, value, null);
    }
}
