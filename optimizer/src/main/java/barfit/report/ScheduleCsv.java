package barfit.report;

import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanProblem;
import barfit.schedule.ScheduleResult;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** {@code schedule.csv}: one row per beam, in the input's units. */
public final class ScheduleCsv {
    private ScheduleCsv() {}

    public static String render(ScheduleResult r) {
        UnitSystem u = r.input().settings().units();
        String len = u.unit(Dim.LENGTH);
        String mom = u.unit(Dim.MOMENT);
        StringBuilder out = new StringBuilder();
        List<String> header = List.of(
                "id",
                "group",
                "status",
                "width_" + len,
                "height_" + len,
                "bottom",
                "top_continuous",
                "top_left",
                "top_right",
                "stirrups",
                "phiMn_left_" + mom,
                "Mu_left_" + mom,
                "phiMn_mid_" + mom,
                "Mu_mid_" + mom,
                "phiMn_right_" + mom,
                "Mu_right_" + mom,
                "cost",
                "own_optimum_cost",
                "carbon_" + (u == barfit.units.UnitSystem.US ? "lbCO2e" : "kgCO2e"),
                "bar_marks");
        out.append(String.join(",", header)).append('\n');
        for (ScheduleRows.Row schedule : ScheduleRows.rows(r)) {
            ScheduleResult.Beam b = schedule.entry();
            List<String> row = new ArrayList<>();
            row.add(b.beam().id());
            row.add(b.beam().group() == null ? "" : b.beam().group());
            if (!b.feasible()) {
                row.add("no design: " + b.outcome().diagnosis().limit() + " - "
                        + DiagnosisWords.summary(b.outcome().diagnosis(), u));
                while (row.size() < header.size() - 1) { // every cell but the bar marks, empty
                    row.add("");
                }
                out.append(line(row)).append('\n');
                continue;
            }
            SpanDesigner.Design d = schedule.design();
            row.add("ok");
            row.add(u.compact(schedule.layout().width(), Dim.LENGTH));
            row.add(u.compact(schedule.layout().height(), Dim.LENGTH));
            row.add(schedule.bottom());
            row.add(ScheduleRows.topContinuous(schedule, u));
            row.add(ScheduleRows.topAt(schedule.left(), u));
            row.add(ScheduleRows.topAt(schedule.right(), u));
            row.add(ScheduleRows.stirrups(schedule, u));
            for (SpanProblem.Place place : SpanProblem.Place.values()) {
                double[] s = ScheduleRows.strength(schedule, place, u);
                row.add(s == null ? "" : num(s[0]));
                row.add(s == null ? "" : num(s[1]));
            }
            row.add(Money.amount(d.cost().total()));
            row.add(Double.isNaN(b.ownOptimum()) ? "" : Money.amount(b.ownOptimum()));
            row.add(
                    d.carbon() == null
                            ? ""
                            : Carbon.amount(Carbon.mass(d.carbon().total(), u)));
            row.add(String.join("; ", ScheduleRows.marks(b.beam().id(), d, u)));
            out.append(line(row)).append('\n');
        }
        return out.toString();
    }

    private static String num(double v) {
        return String.format(Locale.ROOT, "%.1f", v);
    }

    static String line(List<String> cells) {
        StringBuilder sb = new StringBuilder();
        for (String c : cells) {
            if (sb.length() > 0) {
                sb.append(',');
            }
            sb.append(quote(c));
        }
        return sb.toString();
    }

    /** RFC 4180 quoting where a cell holds a comma, quote or line break. */
    static String quote(String c) {
        if (c.contains(",") || c.contains("\"") || c.contains("\n")) {
            return "\"" + c.replace("\"", "\"\"") + "\"";
        }
        return c;
    }
}
