package barfit.input;

import barfit.analysis.Torque;
import barfit.catalogs.yaml.YFields;
import barfit.catalogs.yaml.YList;
import barfit.catalogs.yaml.YMap;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.List;

/**
 * A line's distributed service torques, {@code loads.torque}: {@code {dead, live}} on every span, or a list
 * {@code [{span, dead, live}]}, in kN·m/m (kip·ft/ft). Overhangs take none (a torque at a free end is not
 * restrained there).
 */
final class TorqueReader {
    private TorqueReader() {}

    static List<Torque> torques(YFields loads, int spans, UnitSystem u) {
        List<Torque> out = new ArrayList<>();
        if (!loads.has("torque")) {
            return out;
        }
        String unit = u.unit(Dim.MOMENT) + "/" + u.unit(Dim.SPAN);
        if (loads.node("torque") instanceof YMap) {
            YFields t = loads.map("torque", "the service torque on every span {dead, live}")
                    .allowOnly("dead", "live");
            double dead = part(t, "dead", unit, u);
            double live = part(t, "live", unit, u);
            for (int s = 1; s <= spans; s++) {
                out.add(new Torque(s, dead, live));
            }
            return out;
        }
        if (!(loads.node("torque") instanceof YList)) {
            throw loads.error(
                    "torque",
                    "expected the service torque {dead, live} (" + unit + ") on every span, or a list "
                            + "[{span, dead, live}]");
        }
        List<Integer> seen = new ArrayList<>();
        for (YFields t : loads.listOfMaps("torque", "service torques [{span, dead, live}]")) {
            t.allowOnly("span", "dead", "live");
            int s = LinesReader.spanIndex(t, spans);
            if (seen.contains(s)) {
                throw t.error("span", "span " + s + " has a torque already; expected one entry per span");
            }
            seen.add(s);
            out.add(new Torque(s, part(t, "dead", unit, u), part(t, "live", unit, u)));
        }
        return out;
    }

    private static double part(YFields t, String key, String unit, UnitSystem u) {
        if (!t.has(key)) {
            return 0;
        }
        double v = t.nonNegative(key, "the " + key + " service torque, " + unit);
        return u.toSI(InputLimits.require(t, key, InputLimits.TORQUE, u, v), Dim.FORCE);
    }
}
