package barfit.report.html;

import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.report.Words;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;

/** A beam's bars in the report: a span's bar list with cut lengths, or its line's bending schedule. */
final class BeamBars {
    private BeamBars() {}

    /** A span's bar list as the design lists it, with each mark's cut length (straight: no supports to detail). */
    static void span(SpanDesigner.Design d, SpanProblem p, UnitSystem u, StringBuilder out) {
        out.append("<h4>Bar list and bending schedule</h4>\n<table class=\"grid bars\">\n<thead><tr><th>mark</th>"
                        + "<th>role</th><th>shape</th><th>count</th>")
                .append("<th>bar</th><th>length (")
                .append(u.unit(Dim.SPAN))
                .append(")</th><th>cut length (")
                .append(u.unit(Dim.SPAN))
                .append(")</th><th>mass (")
                .append(u.unit(Dim.MASS))
                .append(")</th></tr></thead>\n<tbody>\n");
        var rows = barfit.detailing.SpanSchedule.of(d.bars(), p.code());
        double mass = 0;
        for (int i = 0; i < d.bars().size(); i++) {
            SpanLayout.BarMark m = d.bars().get(i);
            var cut = rows.get(i);
            mass += cut.mass();
            out.append("<tr><td>")
                    .append(Svg.esc(m.mark()))
                    .append("</td><td>")
                    .append(Svg.esc(Words.role(m)))
                    .append("</td><td>")
                    .append(Svg.esc(cut.shape().words()))
                    .append("</td><td class=\"num\">")
                    .append(m.count())
                    .append("</td><td>")
                    .append(Svg.esc(m.bar().label()))
                    .append("</td><td class=\"num\">")
                    .append(u.number(m.length(), Dim.SPAN))
                    .append("</td><td class=\"num\">")
                    .append(u.number(cut.length(), Dim.SPAN))
                    .append("</td><td class=\"num\">")
                    .append(u.number(cut.mass(), Dim.MASS))
                    .append("</td></tr>\n");
        }
        out.append("<tr><td colspan=\"7\">total</td><td class=\"num\">")
                .append(u.number(mass, Dim.MASS))
                .append("</td></tr>\n");
        out.append("</tbody>\n</table>\n");
    }

    /**
     * A part of a line detailed with its line: at the line's first part, the line's runs and bending
     * schedule (cut-off points, hooks, laps, cut lengths); at the others, where to find them.
     */
    static void line(barfit.schedule.LineDetails.Detailed line, String beam, UnitSystem u, StringBuilder out) {
        var det = line.detail();
        out.append("<h4>Bending schedule of line ").append(Svg.esc(line.line())).append("</h4>\n");
        if (!line.beams().get(0).equals(beam)) {
            out.append("<p>The bars of this part are detailed with line ")
                    .append(Svg.esc(line.line()))
                    .append(": see its bending schedule under beam ")
                    .append(Svg.esc(line.beams().get(0)))
                    .append(".</p>\n");
            return;
        }
        out.append("<p>The parts of the line (")
                .append(Svg.esc(String.join(", ", line.beams())))
                .append(") detailed together as design details a line: x from the centre line of support 1; ")
                .append(
                        det.ok()
                                ? "every detailing check passes and the bars as detailed cover the envelope"
                                : "NOT every detailing check passes, or the bars as detailed do not cover the envelope"
                                        + " everywhere")
                .append(".</p>\n");
        for (var c : det.checks()) {
            if (!c.pass()) {
                out.append("<p class=\"warn\">Fails ")
                        .append(Svg.esc(c.title()))
                        .append(" (")
                        .append(Svg.esc(c.clause()))
                        .append(")")
                        .append(c.note() == null ? "" : ": " + Svg.esc(c.note()))
                        .append(".</p>\n");
            }
        }
        out.append("<ul>\n");
        for (barfit.detailing.BarRun run : det.runs()) {
            out.append("<li>")
                    .append(run.count())
                    .append(' ')
                    .append(Svg.esc(run.bar().label()))
                    .append(' ')
                    .append(Svg.esc(run.what()))
                    .append(": x ")
                    .append(Html.span(run.start(), u))
                    .append(" to ")
                    .append(Html.span(run.end(), u))
                    .append(run.hookStart() || run.hookEnd() ? ", hooked" : "")
                    .append(run.laps().isEmpty() ? "" : ", " + run.laps().size() + " lap(s)")
                    .append("</li>\n");
        }
        out.append("</ul>\n<table class=\"grid bars\">\n<thead><tr><th>mark</th><th>shape</th><th>count</th>")
                .append("<th>bar</th><th>cut length (")
                .append(u.unit(Dim.SPAN))
                .append(")</th><th>mass (")
                .append(u.unit(Dim.MASS))
                .append(")</th><th>what</th></tr></thead>\n<tbody>\n");
        for (barfit.detailing.ScheduleRow row : det.schedule()) {
            out.append("<tr><td>")
                    .append(Svg.esc(row.mark()))
                    .append("</td><td>")
                    .append(Svg.esc(row.shape().words()))
                    .append("</td><td class=\"num\">")
                    .append(row.count())
                    .append("</td><td>")
                    .append(Svg.esc(row.bar().label()))
                    .append("</td><td class=\"num\">")
                    .append(u.number(row.length(), Dim.SPAN))
                    .append("</td><td class=\"num\">")
                    .append(u.number(row.mass(), Dim.MASS))
                    .append("</td><td>")
                    .append(Svg.esc(row.where()))
                    .append("</td></tr>\n");
        }
        out.append("<tr><td colspan=\"5\">total</td><td class=\"num\">")
                .append(u.number(det.totalMass(), Dim.MASS))
                .append("</td><td></td></tr>\n</tbody>\n</table>\n");
    }
}
