package barfit.section.anchorage;

import java.util.List;

/**
 * The tension a bar can deliver along its length: nothing at a free end, growing in proportion to the
 * distance from it until the bar is developed, As fy from there on: As fy × min(1, x / ld) for a straight
 * end, As fy × min(1, x / ldh) for a hooked end with x measured from the outside of the hook (where ldh is
 * measured from, 25.4.3.1). The straight-line build-up is the usual reading of 25.4 between a bar's end
 * and its development length (common practice, no clause gives the shape); with it a capacity diagram
 * drawn from the bars as detailed never credits a bar with more than it can develop.
 */
public final class BarForce {
    /**
     * A bar along the member, from {@code start} to {@code end} (mm; a hooked end at the outside of its
     * hook), its area (mm²) and fy (MPa), and at each end the length over which it builds up to fy: ld for a
     * straight end, ldh for a hooked one, 0 where it is anchored beyond what is looked at (it runs on).
     */
    public record Bar(double start, double end, double area, double fy, double buildUpStart, double buildUpEnd) {
        public Bar {
            if (!(end >= start) || !(area > 0) || !(fy > 0) || buildUpStart < 0 || buildUpEnd < 0) {
                throw new IllegalArgumentException("a bar needs end ≥ start, positive area and fy, build-ups ≥ 0");
            }
        }
    }

    private BarForce() {}

    /** The share of fy a bar reaches {@code x} from its end, with build-up length {@code ld}: min(1, x / ld). */
    public static double share(double x, double ld) {
        if (x < 0) {
            return 0;
        }
        return ld <= 0 ? 1 : Math.min(1, x / ld);
    }

    /** The tension {@code b} can deliver at {@code x}, N. */
    public static double force(Bar b, double x) {
        if (x < b.start() || x > b.end()) {
            return 0;
        }
        double s = Math.min(share(x - b.start(), b.buildUpStart()), share(b.end() - x, b.buildUpEnd()));
        return s * b.area() * b.fy();
    }

    /** The tension a group of bars can deliver at {@code x}, N. */
    public static double total(List<Bar> bars, double x) {
        double sum = 0;
        for (Bar b : bars) {
            sum += force(b, x);
        }
        return sum;
    }
}
