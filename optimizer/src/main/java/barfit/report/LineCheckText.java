package barfit.report;

import barfit.design.line.LineSpans;
import barfit.design.span.SpanProblem;
import barfit.detailing.AsBuilt;
import barfit.section.CheckReport;
import barfit.section.CheckResult;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.List;
import java.util.Map;

/** A checked line in {@code barfit check}'s text: each span's section checks, the detailing checks, the bars. */
final class LineCheckText {
    private LineCheckText() {}

    static void line(AsBuilt.Checked c, UnitSystem u, boolean trail, StringBuilder out) {
        var in = c.given().line();
        var d = c.detail();
        long failing = failures(c);
        out.append("Line ")
                .append(in.id())
                .append(": ")
                .append(in.spans().size())
                .append(in.spans().size() == 1 ? " span" : " spans")
                .append(", ")
                .append(u.compact(in.section().width(), Dim.LENGTH))
                .append(" × ")
                .append(u.compact(in.section().height(), Dim.LENGTH))
                .append(' ')
                .append(u.unit(Dim.LENGTH))
                .append(", bars as built, analysed by stiffness as design analyses it — ")
                .append(c.ok() ? "PASS" : "FAIL (" + failing + (failing == 1 ? " check fails)" : " checks fail)"))
                .append('\n');
        for (LineSpans.Part p : c.result().parts()) {
            var report = p.outcome().best().report();
            out.append("\n  ").append(p.name()).append(": clear span ");
            out.append(u.number(p.problem().span(), Dim.SPAN)).append(' ').append(u.unit(Dim.SPAN));
            out.append(report.ok() ? ", sections pass\n" : ", sections FAIL\n");
            for (Map.Entry<SpanProblem.Place, CheckReport> e : report.sections().entrySet()) {
                table(
                        where(e.getKey()) + " (Mu "
                                + (e.getValue().demand().mu() == null
                                        ? "none"
                                        : u.withUnit(e.getValue().demand().mu(), Dim.MOMENT))
                                + ")",
                        e.getValue().checks(),
                        u,
                        out);
            }
            table("stirrup zones", report.zoneChecks(), u, out);
            table("span", report.span().checks(), u, out);
        }
        out.append("\n  detailing (the bars as given, each rule from ACI 318-19 Chapters 9 and 25):\n");
        table("bars along the line", d.checks(), u, out);
        BendingScheduleText.runs(d, u, out);
        BendingScheduleText.schedule(d, u, out);
        if (trail) {
            out.append("\n  Calculation trail\n");
            for (LineSpans.Part p : c.result().parts()) {
                var report = p.outcome().best().report();
                for (Map.Entry<SpanProblem.Place, CheckReport> e :
                        report.sections().entrySet()) {
                    out.append("    ")
                            .append(p.name())
                            .append(", ")
                            .append(where(e.getKey()))
                            .append('\n');
                    TrailText.write(e.getValue().trail(), u, "      ", out);
                }
            }
            if (c.trail().isOn()) {
                out.append("    detailing\n");
                TrailText.write(c.trail(), u, "      ", out);
            }
        }
    }

    static long failures(AsBuilt.Checked c) {
        long n = c.detail().checks().stream().filter(x -> !x.pass()).count();
        for (LineSpans.Part p : c.result().parts()) {
            n += p.outcome().best().report().failures().size();
        }
        return n;
    }

    private static String where(SpanProblem.Place place) {
        return switch (place) {
            case LEFT -> "left support face";
            case MID -> "mid-span";
            case RIGHT -> "right support face";
        };
    }

    /** The checks as rows: title, clause, value, sense, limit, ratio, result; then the notes of failures. */
    private static void table(String heading, List<CheckResult> checks, UnitSystem u, StringBuilder out) {
        if (checks.isEmpty()) {
            return;
        }
        out.append("    ").append(heading).append('\n');
        TextTable t = new TextTable(false, false, false, true, false, true, true, false);
        t.row("check", "id", "clause", "value", "", "limit", "ratio", "result");
        for (CheckResult c : checks) {
            t.row(
                    c.title(),
                    c.id(),
                    c.clause(),
                    Words.value(c.demand(), u),
                    sense(c.sense()),
                    Words.value(c.limit(), u),
                    Words.ratio(c.ratio()),
                    c.pass() ? "ok" : "FAIL");
        }
        t.write("      ", out);
        for (CheckResult c : checks) {
            if (!c.pass() && c.note() != null) {
                out.append("      FAILS ")
                        .append(c.id())
                        .append(" (")
                        .append(c.clause())
                        .append("): ")
                        .append(c.note())
                        .append('\n');
            }
        }
    }

    private static String sense(String s) {
        return switch (s) {
            case "<=" -> "≤";
            case ">=" -> "≥";
            default -> s;
        };
    }
}
