package barfit.analysis;

/**
 * A service load on one segment of a line: a uniform load (N/mm) over [from, to] or a point load (N) at
 * {@code from}, with its dead and live parts. Positions in mm from the segment's left end (for a span,
 * the centre line of its left support; for the left overhang, its free end). Segment 0 is the left
 * overhang, 1..n the spans, n + 1 the right overhang.
 */
public record Load(int segment, boolean point, double from, double to, double dead, double live) {
    public static Load uniform(int segment, double from, double to, double dead, double live) {
        return new Load(segment, false, from, to, dead, live);
    }

    public static Load point(int segment, double at, double dead, double live) {
        return new Load(segment, true, at, at, dead, live);
    }

    /** The same load with only its dead or only its live part, scaled. */
    Load part(boolean liveOnly, double k) {
        return new Load(segment, point, from, to, liveOnly ? 0 : dead * k, liveOnly ? live * k : 0);
    }
}
