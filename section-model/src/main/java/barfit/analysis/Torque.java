package barfit.analysis;

/**
 * A distributed service torque on one span of a line (segment {@code span}, 1 to n), N·mm per mm of
 * length: its dead and live parts.
 */
public record Torque(int span, double dead, double live) {
    public Torque {
        if (!(dead >= 0) || !(live >= 0)) {
            throw new IllegalArgumentException("a torque is given as magnitudes, zero or more");
        }
    }
}
