package barfit.report.html;

import barfit.design.Proof;
import barfit.design.span.Extension;
import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.report.DiagnosisWords;
import barfit.report.Money;
import barfit.report.ScheduleRows;
import barfit.report.SpanText;
import barfit.report.TrailText;
import barfit.report.Words;
import barfit.schedule.ScheduleResult;
import barfit.section.CheckReport;
import barfit.section.CheckResult;
import barfit.section.FlexureResult;
import barfit.section.SpanChecks;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * One beam's section of the report: its data and design, the bar list, its sections drawn beside their strain
 * and stress, the stirrup zones no section drawing shows, every check and the calculation trail; for a beam
 * without a design, what failed and what would work.
 */
final class BeamSection {
    private BeamSection() {}

    static void render(
            ScheduleResult r,
            ScheduleRows.Row row,
            String id,
            List<barfit.schedule.LineDetails.Detailed> lines,
            StringBuilder out) {
        ScheduleResult.Beam b = row.entry();
        UnitSystem u = r.input().settings().units();
        String cur = r.input().currency();
        SpanDesigner.Outcome o = b.outcome();
        SpanProblem p = o.problem();
        out.append("<section class=\"beam\" id=\"")
                .append(Svg.esc(id))
                .append("\">\n<h3>Beam ")
                .append(Svg.esc(b.beam().id()))
                .append(" <span class=\"status ")
                .append(o.feasible() ? "ok" : "none")
                .append("\">")
                .append(Svg.esc(o.status().toUpperCase(Locale.ROOT)))
                .append("</span></h3>\n");
        out.append("<div class=\"cols\">\n<table class=\"kv\">\n<caption>Data</caption>\n");
        if (b.beam().group() != null) {
            Html.kv(out, "group", b.beam().group());
        }
        Html.kv(out, "span", Html.span(p.span(), u) + " clear, " + p.ends().words());
        if (p.maxDepth() != null) {
            Html.kv(out, "headroom cap", "h ≤ " + Html.len(p.maxDepth(), u));
        }
        if (p.fixedWidth() != null) {
            Html.kv(out, "width", "fixed at " + Html.len(p.fixedWidth(), u));
        }
        if (p.flange() != null) {
            Html.kv(
                    out,
                    "flange",
                    "b_f = " + Html.len(p.flange().given(), u) + " given, h_f = "
                            + Html.len(p.flange().thickness(), u)
                            + (p.flange().oneSided() ? " (one side)" : "")
                            + (p.flange().webGapKnown()
                                    ? ", clear to the next web "
                                            + Html.len(p.flange().clearToNextWeb(), u)
                                    : ", clear distance to the next web not given (sw/2 limit not checked)")
                            + "; taken at most at the effective width of Table 6.3.2.1, "
                            + (p.cantilever()
                                    ? "in tension at the fixed end, so not counted in strength (24.3.4: see the "
                                            + "checks)"
                                    : "counted at mid-span only"));
        }
        Html.kv(out, "Mu", moments(p, u));
        Html.kv(out, "Vu at d from the faces", shears(p, u));
        if (p.hasTorsion()) {
            Html.kv(
                    out,
                    p.torsion().atFaces() ? "Tu at the faces" : "Tu at d from the faces",
                    "left " + u.withUnit(p.torsion().left(), Dim.MOMENT) + ", mid-span "
                            + u.withUnit(p.torsion().mid(), Dim.MOMENT) + ", right "
                            + u.withUnit(p.torsion().right(), Dim.MOMENT)
                            + (p.torsion().compatibility() ? " (compatibility torsion)" : "") + ": "
                            + SpanText.torsionAlong(p.torsion()));
        }
        if (p.service() != null) {
            Html.kv(
                    out,
                    "service loads",
                    "D = " + u.withUnit(p.service().dead(), Dim.LINE_LOAD) + ", L = "
                            + u.withUnit(p.service().live(), Dim.LINE_LOAD)
                            + (p.service().sustainedLive() > 0
                                    ? ", sustained " + u.compact(p.service().sustainedLive(), Dim.NUMBER) + " of L"
                                    : ""));
            Html.kv(
                    out,
                    "deflection limits",
                    "live ℓ/" + Html.plain(p.limits().live()) + ", long-term + live ℓ/"
                            + Html.plain(p.limits().total()));
        }
        Html.kv(
                out,
                "bottom bars at supports",
                p.bottomAnchored() ? "anchored: compression steel there" : "not anchored: not counted there");
        out.append("</table>\n");
        if (!o.feasible()) {
            SpanDesigner.Diagnosis d = o.diagnosis();
            out.append("</div>\n<div class=\"diagnosis\">\n<p><strong>")
                    .append(Svg.esc(Html.headline(d)))
                    .append(".</strong></p>\n")
                    .append("<p>Binding limit: ")
                    .append(Svg.esc(d.limit()))
                    .append(" — ")
                    .append(Svg.esc(DiagnosisWords.summary(d, u)))
                    .append("</p>\n<p>")
                    .append(Svg.esc(
                            DiagnosisWords.fixes(d, u).isEmpty()
                                    ? "No single relaxed limit (depth, width) gives a passing layout."
                                    : "What would work, one limit at a time: "
                                            + Words.alternatives(DiagnosisWords.fixes(d, u))))
                    .append("</p>\n</div>\n")
                    .append("</section>\n");
            return;
        }
        SpanDesigner.Design d = o.best();
        SpanLayout l = d.layout();
        out.append("<table class=\"kv\">\n<caption>Design</caption>\n");
        Html.kv(out, "section", Words.shape(l.shape(), u));
        Html.kv(out, "bottom", ScheduleRows.bars(l.bottomCounts(), l.bottom()) + ", full span");
        if (p.cantilever()) {
            Html.kv(
                    out,
                    "top",
                    ScheduleRows.bars(l.topLeft(), l.top()) + ", full length and "
                            + u.withUnit(l.extLeft() - p.span(), Dim.SPAN)
                            + " past the support face (ld of 25.4.2.4, anchorage into the back span)");
        } else {
            Html.kv(
                    out,
                    "top continuous",
                    l.topContinuous() + " " + l.top().label() + ", full span" + SpanText.topAtMid(d, u));
            String rule = " ("
                    + Words.extension(Extension.of(p, l.width(), l.height(), l.detailing(p.detailing()), l.top())
                            .governs())
                    + ")";
            if (p.leftSupport()) {
                boolean extra = SpanLayout.sum(l.topLeft()) > l.topContinuous();
                Html.kv(out, "top at left support", Html.topAtSupport(row.left(), u) + (extra ? rule : ""));
            }
            if (p.rightSupport()) {
                boolean extra = SpanLayout.sum(l.topRight()) > l.topContinuous();
                Html.kv(out, "top at right support", Html.topAtSupport(row.right(), u) + (extra ? rule : ""));
            }
        }
        if (l.skin() != null) {
            Html.kv(
                    out,
                    "skin bars",
                    l.skin().bar().label() + " @ " + Html.len(l.skin().spacing(), u) + " each side face (9.7.2.3)");
        }
        List<SpanProblem.Zone> zones = p.zones();
        for (int i = 0; i < zones.size(); i++) {
            SpanProblem.Zone z = zones.get(i);
            var st = l.zoneStirrups().get(i);
            Html.kv(
                    out,
                    "stirrups, " + z.name() + " zone",
                    Html.span(z.from(), u) + " to " + Html.span(z.to(), u) + ": "
                            + Words.stirrups(st, u) + ", "
                            + SpanText.sets(SpanLayout.stirrupSets(z.length(), st.spacing()))
                            + (d.report().zoneShears().get(i) == null
                                    ? " (minimum"
                                    : " (Vu = "
                                            + u.withUnit(d.report().zoneShears().get(i), Dim.FORCE))
                            + (d.report().zoneTorsions().get(i) == null
                                    ? ""
                                    : ", Tu = "
                                            + u.withUnit(
                                                    d.report().zoneTorsions().get(i), Dim.MOMENT))
                            + ")");
        }
        for (Map.Entry<SpanProblem.Place, CheckReport> e : d.report().sections().entrySet()) {
            FlexureResult f = e.getValue().flexure();
            double mu = Math.abs(e.getValue().demand().mu());
            Html.kv(
                    out,
                    place(p, e.getKey()),
                    "φMn = " + u.withUnit(f.phiMn(), Dim.MOMENT) + " for Mu = "
                            + u.withUnit(mu, Dim.MOMENT) + " (Mu/φMn " + Words.ratio(mu / f.phiMn()) + "), ε_t = "
                            + Words.fixed(f.epsT(), 5) + ", φ = " + Words.phi(f.phi()));
        }
        Html.kv(out, "deflection", deflection(d.report().span(), p, u));
        Html.kv(out, "binding", binding(o.binding(), u));
        Html.kv(out, "cost" + (cur.isEmpty() ? "" : " (" + cur + ")"), Money.breakdown(d.cost()) + " for the span");
        if (d.carbon() != null) {
            Html.kv(
                    out,
                    "carbon, " + barfit.report.Carbon.unit(u),
                    barfit.report.Carbon.breakdown(barfit.report.Carbon.mass(d.carbon(), u)) + " for the span");
        }
        Html.kv(out, "proof", proofWords(o.proof()));
        out.append("</table>\n</div>\n");
        for (String w : SpanText.warnings(p)) {
            out.append("<p class=\"warn\">Warning: ").append(Svg.esc(w)).append(".</p>\n");
        }

        var line = barfit.schedule.LineDetails.lineOf(lines, b.beam().id());
        if (line != null) {
            BeamBars.line(line, b.beam().id(), u, out);
        } else {
            BeamBars.span(d, p, u, out);
        }

        out.append("<h4>Sections</h4>\n");
        double scale = SectionDrawing.scaleFor(l.shape());
        for (Map.Entry<SpanProblem.Place, CheckReport> e : d.report().sections().entrySet()) {
            SpanProblem.Place where = e.getKey();
            CheckReport rep = e.getValue();
            FlexureResult f = rep.flexure();
            double mu = rep.demand().mu();
            String title = place(p, where) + " — " + f.bending().word();
            String subtitle = "Mu = " + u.withUnit(mu, Dim.MOMENT) + ", φMn = " + u.withUnit(f.phiMn(), Dim.MOMENT)
                    + " (Mu/φMn " + Words.ratio(Math.abs(mu) / f.phiMn()) + ")";
            SectionDrawing.View view = SectionDrawing.of(p, l, where, f.d(), title, subtitle);
            out.append("<figure class=\"section-pair\" id=\"")
                    .append(Svg.esc(id))
                    .append('-')
                    .append(where.name().toLowerCase(Locale.ROOT))
                    .append("\" data-place=\"")
                    .append(where.name())
                    .append("\">\n<div class=\"pair\">\n")
                    .append(SectionDrawing.svg(view, scale, u))
                    .append(StrainStressDiagram.svg(f, l.height(), p.materials(), scale, u))
                    .append("</div>\n</figure>\n");
        }
        zoneDrawings(p, l, d, id, scale, u, out);

        out.append(
                        "<h4>Checks</h4>\n<div class=\"wide\">\n<table class=\"grid checks\">\n<thead><tr><th>where</th><th>id</th>")
                .append(
                        "<th>check</th><th>clause</th><th>demand</th><th></th><th>limit</th><th>ratio</th><th>result</th>")
                .append("<th>note</th></tr></thead>\n<tbody>\n");
        for (Map.Entry<SpanProblem.Place, CheckReport> e : d.report().sections().entrySet()) {
            for (CheckResult c : e.getValue().checks()) {
                check(out, place(p, e.getKey()), c, u);
            }
        }
        for (CheckResult c : d.report().zoneChecks()) {
            check(out, "stirrup zones", c, u);
        }
        for (CheckResult c : d.report().span().checks()) {
            check(out, "span", c, u);
        }
        out.append("</tbody>\n</table>\n</div>\n");

        out.append("<details class=\"trail\">\n<summary>Calculation trail</summary>\n");
        for (Map.Entry<SpanProblem.Place, CheckReport> e : d.report().sections().entrySet()) {
            trail(out, place(p, e.getKey()), e.getValue().trail(), u);
        }
        trail(out, "stirrup zones", d.report().zoneTrail(), u);
        trail(out, "span", d.report().spanTrail(), u);
        out.append("</details>\n</section>\n");
    }

    /**
     * The stirrups of every zone whose arrangement (bar and legs) no section drawing above shows: a zone
     * away from the sections drawn, or one with its own legs (four legs at an end, two in the middle...),
     * drawn on the section the zone is designed with.
     */
    private static void zoneDrawings(
            SpanProblem p,
            SpanLayout l,
            SpanDesigner.Design d,
            String id,
            double scale,
            UnitSystem u,
            StringBuilder out) {
        Set<String> shown = new HashSet<>();
        for (SpanProblem.Place where : d.report().sections().keySet()) {
            shown.add(arrangement(where, SectionDrawing.stirrupsAt(p, l, where)));
        }
        // zones not shown yet, those with one arrangement on one section together (both ends of a span...)
        Map<String, List<Integer>> missing = new java.util.LinkedHashMap<>();
        List<SpanProblem.Zone> zones = p.zones();
        for (int i = 0; i < zones.size(); i++) {
            String key = arrangement(zones.get(i).section(), l.zoneStirrups().get(i));
            if (d.report().sections().containsKey(zones.get(i).section()) && !shown.contains(key)) {
                missing.computeIfAbsent(key, k -> new ArrayList<>()).add(i);
            }
        }
        for (List<Integer> group : missing.values()) {
            int first = group.get(0);
            SpanProblem.Zone z = zones.get(first);
            List<String> names = new ArrayList<>();
            List<String> where = new ArrayList<>();
            for (int i : group) {
                names.add(zones.get(i).name());
                where.add(u.number(zones.get(i).from(), Dim.SPAN) + "–"
                        + Html.span(zones.get(i).to(), u));
            }
            String title = "Stirrups, " + String.join(" and ", names) + (names.size() == 1 ? " zone" : " zones") + " ("
                    + String.join(", ", where) + ")";
            String subtitle = Words.stirrups(l.zoneStirrups().get(first), u) + "; bars as at "
                    + (z.section() == SpanProblem.Place.MID
                            ? "mid-span"
                            : "the " + place(p, z.section()).toLowerCase(Locale.ROOT));
            SectionDrawing.View view = SectionDrawing.ofZone(
                    p,
                    l,
                    first,
                    d.report().sections().get(z.section()).flexure().d(),
                    title,
                    subtitle);
            out.append("<figure class=\"zone-section\" id=\"")
                    .append(Svg.esc(id))
                    .append("-zone-")
                    .append(Svg.esc(String.join("-", names)))
                    .append("\" data-zones=\"")
                    .append(Svg.esc(String.join(" ", names)))
                    .append("\">\n")
                    .append(SectionDrawing.svg(view, scale, u))
                    .append("</figure>\n");
        }
    }

    private static String arrangement(SpanProblem.Place where, barfit.section.Stirrups st) {
        return where.name() + "/" + st.bar().designation() + "/" + st.legs();
    }

    private static void check(StringBuilder out, String where, CheckResult c, UnitSystem u) {
        out.append("<tr")
                .append(c.pass() ? "" : " class=\"fail\"")
                .append("><td>")
                .append(Svg.esc(where))
                .append("</td><td>")
                .append(Svg.esc(c.id()))
                .append("</td><td>")
                .append(Svg.esc(c.title()))
                .append("</td><td>")
                .append(Svg.esc(c.clause()))
                .append("</td><td class=\"num\">")
                .append(Svg.esc(Words.value(c.demand(), u)))
                .append("</td><td>")
                .append(c.sense().equals("<=") ? "≤" : "≥")
                .append("</td><td class=\"num\">")
                .append(Svg.esc(Words.value(c.limit(), u)))
                .append("</td><td class=\"num\">")
                .append(Words.ratio(c.ratio()))
                .append("</td><td>")
                .append(c.pass() ? "pass" : "FAIL")
                .append("</td><td>")
                .append(Svg.esc(c.note() == null ? "" : c.note()))
                .append("</td></tr>\n");
    }

    private static void trail(StringBuilder out, String where, barfit.section.trail.Trail t, UnitSystem u) {
        StringBuilder text = new StringBuilder();
        TrailText.write(t, u, "", text);
        out.append("<h5>")
                .append(Svg.esc(where))
                .append("</h5>\n<pre>")
                .append(Svg.esc(text.toString()))
                .append("</pre>\n");
    }

    // ---------------------------------------------------------------- words

    /** Where a section is; a cantilever's only section is its fixed end. */
    static String place(SpanProblem problem, SpanProblem.Place p) {
        if (problem.cantilever() && p == SpanProblem.Place.LEFT) {
            return "Fixed end";
        }
        return switch (p) {
            case LEFT -> "Left support";
            case MID -> "Mid-span";
            case RIGHT -> "Right support";
        };
    }

    private static String moments(SpanProblem p, UnitSystem u) {
        List<String> parts = new ArrayList<>();
        if (p.mLeft() != null) {
            parts.add("left " + u.withUnit(p.mLeft(), Dim.MOMENT));
        }
        if (p.mMid() != null) {
            parts.add("mid-span " + u.withUnit(p.mMid(), Dim.MOMENT));
        }
        if (p.mRight() != null) {
            parts.add("right " + u.withUnit(p.mRight(), Dim.MOMENT));
        }
        return String.join(", ", parts) + " (+ sagging, − hogging)";
    }

    private static String shears(SpanProblem p, UnitSystem u) {
        if (p.vLeft() == null && p.vRight() == null) {
            return "not given: minimum stirrups";
        }
        List<String> parts = new ArrayList<>();
        if (p.vLeft() != null) {
            parts.add("left " + u.withUnit(p.vLeft(), Dim.FORCE));
        }
        if (p.vRight() != null) {
            parts.add("right " + u.withUnit(p.vRight(), Dim.FORCE));
        }
        return String.join(", ", parts);
    }

    private static String deflection(SpanChecks.Result r, SpanProblem p, UnitSystem u) {
        if (r.liveDeflection() == null) {
            return "not computed: h ≥ h,min = " + Html.len(r.hMin(), u) + " of Table 9.3.1.1";
        }
        return "computed (h < h,min = " + Html.len(r.hMin(), u) + "): live "
                + u.withUnit(r.liveDeflection(), Dim.LENGTH)
                + " ≤ ℓ/" + Html.plain(p.limits().live()) + " = "
                + u.withUnit(p.span() / p.limits().live(), Dim.LENGTH)
                + "; long-term + live " + u.withUnit(r.longTermDeflection(), Dim.LENGTH) + " ≤ ℓ/"
                + Html.plain(p.limits().total()) + " = "
                + u.withUnit(p.span() / p.limits().total(), Dim.LENGTH);
    }

    private static String binding(List<barfit.design.Binding> bs, UnitSystem u) {
        if (bs.isEmpty()) {
            return "no check above 0.95 of its limit";
        }
        List<String> parts = new ArrayList<>();
        for (var b : bs) {
            parts.add(b.limit() + " (" + Words.when(b, u) + ")");
        }
        return String.join(", ", parts);
    }

    private static String proofWords(Proof<SpanDesigner.Search> p) {
        if (p.status() == Proof.Status.UNPROVEN) {
            return SpanText.proof(p, barfit.units.UnitSystem.SI);
        }
        var s = p.search();
        return "CP-SAT " + Words.status(p.status()) + ", objective " + String.format(Locale.ROOT, "%.4f", p.objective())
                + ", bound " + String.format(Locale.ROOT, "%.4f", p.bound()) + ", gap "
                + String.format(Locale.ROOT, "%.2f %%", 100 * p.gap()) + "; "
                + s.generator().framesEvaluated() + " of "
                + s.generator().frames() + " frames evaluated, " + s.generator().framesSkipped()
                + " skipped by the cost bound; " + s.solves() + (s.solves() == 1 ? " solve" : " solves")
                + (s.deflectionCuts() > 0 ? ", " + s.deflectionCuts() + " deflection cuts" : "") + "; " + p.workers()
                + (p.workers() == 1 ? " worker" : " workers") + ", seed " + p.seed();
    }
}
