package barfit.detailing;

import barfit.catalogs.BarSize;

/**
 * One mark of the bar bending schedule: {@code count} bars of one size and shape, each {@code length} long
 * as cut (mm, centre line, bends by Table 25.3.1 / 25.3.2), {@code mass} of all of them (kg); {@code a} the
 * straight length and {@code b} the hook's leg (a hoop: its outside width and height), mm; {@code where}
 * says what and where the bars are.
 */
public record ScheduleRow(
        String mark,
        BarShape shape,
        BarSize bar,
        int count,
        double length,
        double mass,
        double a,
        double b,
        String where) {}
