package barfit.detailing;

import barfit.catalogs.BarSize;
import barfit.input.Settings;
import barfit.section.Development;
import barfit.section.anchorage.HookDevelopment;
import barfit.section.anchorage.LapSplices;
import barfit.section.trail.Trail;

/**
 * The development lengths the detailing asks of the section model for a bar of a run: straight bars with cb
 * the cover to their centre (Ktr not counted, which errs long), hooked ends in a column (no ties counted),
 * and class B laps from ld before its minimum (25.5.2.1).
 */
final class Anchorage {
    private Anchorage() {}

    private static Development.Result general(BarSize bar, boolean top, Settings s) {
        double cb = s.detailing().cover() + s.detailing().stirrupBar().diameter() + bar.diameter() / 2;
        return Development.general(bar, s.materials(), s.code(), top, cb, 0, 0, 0, Trail.off());
    }

    /** ld of 25.4.2.4, mm. */
    static double ld(BarSize bar, boolean top, Settings s) {
        return general(bar, top, s).ld();
    }

    /** ld before 25.4.2.1(b)'s minimum, what a lap is taken from (25.5.2.1), mm. */
    static double ldBeforeMinimum(BarSize bar, boolean top, Settings s) {
        return general(bar, top, s).ldEquation();
    }

    /** A class B tension lap (25.5.2), mm (0 where a mechanical splice is needed). */
    static double classBLap(BarSize bar, boolean top, Settings s) {
        return LapSplices.classB(bar, general(bar, top, s).ldEquation(), s.code(), Trail.off())
                .length();
    }

    /** Side cover of a hooked bar: to the stirrups' outside plus the stirrup, mm. */
    static double hookSideCover(Settings s) {
        return s.detailing().cover() + s.detailing().stirrupBar().diameter();
    }

    /** ldh of 25.4.3.1 for a hook in a column core, no confining ties counted. */
    static HookDevelopment.Result ldh(BarSize bar, Settings s, Trail t) {
        return HookDevelopment.ldh(
                bar, s.materials(), s.code(), HookDevelopment.Conditions.uncoated(hookSideCover(s), true), t);
    }
}
