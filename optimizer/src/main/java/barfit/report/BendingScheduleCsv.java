package barfit.report;

import barfit.detailing.ScheduleRow;
import barfit.detailing.SpanSchedule;
import barfit.schedule.LineDetails;
import barfit.schedule.ScheduleResult;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * {@code bending-schedule.csv}: one row per bar mark of every beam designed (a beam given alone as a span:
 * its bars as listed, straight, hoops and crossties as sized; the parts of a line detailed together as
 * {@code design} details a line, under "line ID": cut-off points, hooks, laps, cut lengths), then the total
 * mass per bar size and of the whole schedule. Lengths in m / ft, masses in kg / lb.
 */
public final class BendingScheduleCsv {
    private BendingScheduleCsv() {}

    public static String render(ScheduleResult r) {
        UnitSystem u = r.input().settings().units();
        StringBuilder out = new StringBuilder();
        out.append(String.join(
                        ",",
                        "beam",
                        "mark",
                        "shape",
                        "bar",
                        "count",
                        "length_" + u.unit(Dim.SPAN),
                        "mass_" + u.unit(Dim.MASS),
                        "what"))
                .append('\n');
        Map<String, Double> bySize = new TreeMap<>();
        double total = 0;
        List<LineDetails.Detailed> lines = LineDetails.of(r);
        for (ScheduleRows.Row schedule : ScheduleRows.rows(r)) {
            ScheduleResult.Beam b = schedule.entry();
            if (!b.feasible()) {
                continue;
            }
            // a part of a detailed line: the line's bars once, under the line's name, at its first part
            LineDetails.Detailed line = LineDetails.lineOf(lines, b.beam().id());
            if (line != null && !line.beams().get(0).equals(b.beam().id())) {
                continue;
            }
            String beam = line != null ? "line " + line.line() : b.beam().id();
            List<ScheduleRow> rows = line != null
                    ? line.detail().schedule()
                    : SpanSchedule.of(
                            schedule.design().bars(), r.input().settings().code());
            for (ScheduleRow row : rows) {
                out.append(ScheduleCsv.line(List.of(
                                beam,
                                row.mark(),
                                row.shape().words(),
                                row.bar().designation(),
                                String.valueOf(row.count()),
                                u.compact(row.length(), Dim.SPAN),
                                u.number(row.mass(), Dim.MASS),
                                row.where())))
                        .append('\n');
                bySize.merge(row.bar().designation(), row.mass(), Double::sum);
                total += row.mass();
            }
        }
        for (Map.Entry<String, Double> e : bySize.entrySet()) {
            out.append(ScheduleCsv.line(
                            List.of("total", "", "", e.getKey(), "", "", u.number(e.getValue(), Dim.MASS), "")))
                    .append('\n');
        }
        out.append(ScheduleCsv.line(List.of("total", "", "", "all", "", "", u.number(total, Dim.MASS), "")))
                .append('\n');
        return out.toString();
    }
}
