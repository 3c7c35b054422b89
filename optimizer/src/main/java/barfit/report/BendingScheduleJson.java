package barfit.report;

import barfit.detailing.BarRun;
import barfit.detailing.LineDetail;
import barfit.detailing.ScheduleRow;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;

/**
 * The bending schedule in JSON: {@code bending_schedule[{mark, shape, bar, count, length, mass}]}, length
 * the cut length of one bar (m / ft), mass that of all the mark's bars (kg / lb); and a line's detailing.
 */
final class BendingScheduleJson {
    private BendingScheduleJson() {}

    static ArrayNode rows(List<ScheduleRow> rows, UnitSystem u) {
        ArrayNode out = Json.array();
        for (ScheduleRow r : rows) {
            ObjectNode o = out.addObject();
            o.put("mark", r.mark());
            o.put("shape", r.shape().words());
            o.put("bar", r.bar().designation());
            o.put("count", r.count());
            Json.put(o, "length", r.length(), Dim.SPAN, u);
            Json.put(o, "mass", r.mass(), Dim.MASS, u);
            Json.put(o, "a", r.a(), Dim.LENGTH, u);
            Json.put(o, "b", r.b(), Dim.LENGTH, u);
            o.put("what", r.where());
        }
        return out;
    }

    /** A line's runs, checks, coverage and masses. */
    static ObjectNode detailing(LineDetail d, UnitSystem u) {
        ObjectNode o = Json.object();
        Json.put(o, "stock_length", d.stockLength(), Dim.SPAN, u);
        ArrayNode runs = o.putArray("runs");
        for (BarRun r : d.runs()) {
            ObjectNode x = runs.addObject();
            x.put("what", r.what());
            x.put("face", r.face().word());
            x.put("bar", r.bar().designation());
            x.put("count", r.count());
            Json.put(x, "start", r.start(), Dim.SPAN, u);
            Json.put(x, "end", r.end(), Dim.SPAN, u);
            x.put("hook_start", r.hookStart());
            x.put("hook_end", r.hookEnd());
            ArrayNode laps = x.putArray("laps");
            for (BarRun.Lap lap : r.laps()) {
                ObjectNode l = laps.addObject();
                Json.put(l, "from", lap.from(), Dim.SPAN, u);
                Json.put(l, "to", lap.to(), Dim.SPAN, u);
                l.put("kind", lap.kind());
            }
            Json.put(x, "lengthened", r.lengthened(), Dim.SPAN, u);
            if (r.lengthened() > 0) {
                x.put("why", r.why());
            }
        }
        ArrayNode checks = o.putArray("checks");
        d.checks().forEach(c -> checks.add(CheckJson.check(c, u)));
        ObjectNode cov = o.putObject("capacity");
        cov.put("covers_envelope", d.coverage().covered());
        cov.put("worst_ratio", CheckJson.round(d.coverage().worstRatio()));
        if (Double.isNaN(d.coverage().worstX())) {
            cov.putNull("worst_x");
        } else {
            Json.put(cov, "worst_x", d.coverage().worstX(), Dim.SPAN, u);
        }
        ObjectNode mass = o.putObject("mass");
        d.massBySize().forEach((size, kg) -> Json.put(mass, size, kg, Dim.MASS, u));
        Json.put(mass, "total", d.totalMass(), Dim.MASS, u);
        o.put("steel_cost", Math.round(d.steelCost() * 100) / 100.0);
        o.put("design_steel_cost", Math.round(d.designSteelCost() * 100) / 100.0);
        o.put("ok", d.ok());
        return o;
    }
}
