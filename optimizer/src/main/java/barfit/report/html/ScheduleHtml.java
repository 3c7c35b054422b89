package barfit.report.html;

import barfit.input.Settings;
import barfit.report.Caution;
import barfit.report.ScheduleRows;
import barfit.schedule.ScheduleInput;
import barfit.schedule.ScheduleResult;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * The HTML report of a designed schedule: one self-contained page (inline CSS and SVG, nothing fetched)
 * with the caution, the project data and assumptions, the beam schedule, the rationalisation proof, the
 * cost summary, the price of standardisation, and one block per beam with its bar list, its sections
 * drawn to scale beside their strain and stress, every check and the calculation trail. The same result
 * gives the same bytes: fixed formatting, input order, no times or dates.
 *
 * <p>This class writes the page around the sections: the head, the caution, the table of contents and the
 * footer. {@link SummarySections} writes the sections up to the beams, {@link BeamSection} each beam's, and
 * {@link Html} holds what they share.
 */
public final class ScheduleHtml {
    private ScheduleHtml() {}

    public static String render(ScheduleResult r) {
        ScheduleInput in = r.input();
        Settings s = in.settings();
        UnitSystem u = s.units();
        List<String> ids = beamIds(r);
        List<ScheduleRows.Row> rows = ScheduleRows.rows(r);
        StringBuilder out = new StringBuilder(1 << 16);
        String title = "Beam schedule: " + String.join(", ", in.sources());
        out.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n");
        out.append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n");
        out.append("<title>")
                .append(Svg.esc(title))
                .append("</title>\n<style>\n")
                .append(Html.CSS)
                .append("</style>\n</head>\n<body>\n");
        out.append("<header>\n<h1>")
                .append(Svg.esc(title))
                .append("</h1>\n<p class=\"sub\">barfit schedule report · ")
                .append(Svg.esc(s.code().edition()))
                .append(" · ")
                .append(Html.unitsWords(u))
                .append("</p>\n</header>\n");
        caution(out);
        contents(r, out);
        SummarySections.project(r, out);
        SummarySections.schedule(r, rows, ids, out);
        if (r.proof() != null) {
            SummarySections.proof(r, out);
        }
        SummarySections.costs(r, out);
        if (!r.standardisation().isEmpty()) {
            SummarySections.standardisation(r, out);
        }
        out.append("<section id=\"beams\">\n<h2>Beams</h2>\n");
        List<barfit.schedule.LineDetails.Detailed> lines = barfit.schedule.LineDetails.of(r);
        // each beam's block is independent of the others: drawn on every core, joined in schedule order
        List<String> blocks = java.util.stream.IntStream.range(0, rows.size())
                .parallel()
                .mapToObj(i -> {
                    StringBuilder b = new StringBuilder(1 << 12);
                    BeamSection.render(r, rows.get(i), ids.get(i), lines, b);
                    return b.toString();
                })
                .toList();
        blocks.forEach(out::append);
        out.append("</section>\n");
        out.append("<footer>\n<p>").append(Svg.esc(Caution.SHORT)).append("</p>\n</footer>\n</body>\n</html>\n");
        return out.toString();
    }

    /** Element ids of the beam blocks: "beam-" and the mark, made safe for a fragment and unique. */
    static List<String> beamIds(ScheduleResult r) {
        List<String> out = new ArrayList<>();
        Set<String> used = new HashSet<>();
        for (ScheduleResult.Beam b : r.beams()) {
            String base = "beam-" + b.beam().id().replaceAll("[^A-Za-z0-9_.-]", "_");
            String id = base;
            for (int k = 2; !used.add(id); k++) {
                id = base + "-" + k;
            }
            out.add(id);
        }
        return out;
    }

    private static void caution(StringBuilder out) {
        List<String> lines = Caution.LINES;
        out.append("<aside class=\"caution\" role=\"note\">\n<p><strong>")
                .append(Svg.esc(lines.get(0)))
                .append("</strong></p>\n<p>");
        for (int i = 1; i < lines.size(); i++) {
            out.append(i == 1 ? "" : "\n").append(Svg.esc(lines.get(i)));
        }
        out.append("</p>\n<p>The cost rates are the input's (barfit's invented defaults where none are given): compare "
                + "them with your own before relying on a price.</p>\n</aside>\n");
    }

    private static void contents(ScheduleResult r, StringBuilder out) {
        out.append("<nav>\n<a href=\"#project\">Project data</a> · <a href=\"#schedule\">Schedule</a>");
        if (r.proof() != null) {
            out.append(" · <a href=\"#rationalisation\">Rationalisation</a>");
        }
        out.append(" · <a href=\"#costs\">Costs</a>");
        if (!r.standardisation().isEmpty()) {
            out.append(" · <a href=\"#standardisation\">Price of standardisation</a>");
        }
        out.append(" · <a href=\"#beams\">Beams</a>\n</nav>\n");
    }
}
