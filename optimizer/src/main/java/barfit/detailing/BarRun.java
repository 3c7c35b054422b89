package barfit.detailing;

import barfit.catalogs.BarSize;
import barfit.section.Face;
import barfit.section.anchorage.StandardHooks;
import java.util.List;

/**
 * A group of longitudinal bars as placed along a line: {@code count} bars of one size on one face, from
 * {@code start} to {@code end} (x along the line from the first support's centre line, mm; a hooked end at
 * the outside of its hook), made of stock pieces joined at {@code laps} (each lap's start and end, mm).
 * {@code what} says what the bars are for; {@code lengthened} where the detailing ran them further than
 * the design had them (mm added, 0 when none), and why; {@code bend} the standard hook its hooked ends take.
 */
public record BarRun(
        String what,
        Face face,
        BarSize bar,
        int count,
        double start,
        double end,
        boolean hookStart,
        boolean hookEnd,
        List<Lap> laps,
        double lengthened,
        String why,
        StandardHooks.Bend bend) {

    public BarRun {
        laps = List.copyOf(laps);
    }

    /** A run whose hooked ends, if any, are 90-degree standard hooks. */
    public BarRun(
            String what,
            Face face,
            BarSize bar,
            int count,
            double start,
            double end,
            boolean hookStart,
            boolean hookEnd,
            List<Lap> laps,
            double lengthened,
            String why) {
        this(what, face, bar, count, start, end, hookStart, hookEnd, laps, lengthened, why, StandardHooks.Bend.DEG_90);
    }

    /** A lap splice between two stock pieces: from, to (mm along the line) and its kind in words. */
    public record Lap(double from, double to, String kind) {}

    public double length() {
        return end - start;
    }

    public BarRun withLaps(List<Lap> l) {
        return new BarRun(what, face, bar, count, start, end, hookStart, hookEnd, l, lengthened, why, bend);
    }
}
