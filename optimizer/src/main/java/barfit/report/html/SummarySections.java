package barfit.report.html;

import barfit.design.CostRates;
import barfit.design.Proof;
import barfit.design.SearchSpace;
import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanLayout;
import barfit.input.Rationalise;
import barfit.input.Settings;
import barfit.report.Carbon;
import barfit.report.DiagnosisWords;
import barfit.report.Money;
import barfit.report.ScheduleRows;
import barfit.report.ScheduleWords;
import barfit.report.Words;
import barfit.schedule.ScheduleInput;
import barfit.schedule.ScheduleResult;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

/**
 * The report's summary sections: the project data and assumptions (with the cost rates), the beam schedule,
 * the rationalisation and its proof, the cost summary and the price of standardisation.
 */
final class SummarySections {
    private SummarySections() {}

    // ---------------------------------------------------------------- project data

    static void project(ScheduleResult r, StringBuilder out) {
        ScheduleInput input = r.input();
        Settings settings = input.settings();
        UnitSystem u = settings.units();
        var materials = settings.materials();
        var detailing = settings.detailing();
        SearchSpace space = input.space();
        out.append("<section id=\"project\">\n<h2>Project data and assumptions</h2>\n<div class=\"cols\">\n");
        out.append("<table class=\"kv\">\n<caption>Code, materials, detailing</caption>\n");
        Html.kv(out, "code", settings.code().edition() + ", nonprestressed beams");
        Html.kv(out, "units", Html.unitsWords(u));
        Html.kv(
                out,
                "concrete",
                "f'c = " + u.withUnit(materials.fc(), Dim.STRESS) + ", λ = "
                        + u.compact(materials.lambda(), Dim.NUMBER)
                        + ", aggregate " + Html.len(materials.aggregate(), u));
        Html.kv(
                out,
                "steel",
                "fy = " + u.withUnit(materials.fy(), Dim.STRESS) + " (longitudinal), fyt = "
                        + u.withUnit(materials.fyt(), Dim.STRESS)
                        + " (stirrups), Es = " + u.compact(settings.code().es(), Dim.STRESS) + " "
                        + u.unit(Dim.STRESS));
        Html.kv(
                out,
                "bar catalog",
                settings.catalog().id() + ": " + settings.catalog().title() + " ("
                        + settings.catalog().source() + ")");
        Html.kv(
                out,
                "cover",
                Html.len(detailing.cover(), u) + " clear to the stirrups, exposure "
                        + detailing.exposure().key() + " (20.5.1.3)");
        Html.kv(out, "layer gap", Html.len(detailing.layerGap(), u) + " clear between layers (25.2.2)");
        Html.kv(
                out,
                "stirrups",
                "sizes " + Html.labels(space.stirrupSizes()) + "; legs " + Html.joinInts(space.stirrupLegs())
                        + "; spacing " + Html.range(space.stirrupSpacings(), u));
        out.append("</table>\n");
        out.append("<table class=\"kv\">\n<caption>Search space</caption>\n");
        Html.kv(out, "widths", Html.lengths(space.widths(), u));
        Html.kv(out, "depths", Html.range(space.depths(), u));
        Html.kv(out, "bar sizes", Html.labels(space.barSizes()));
        Html.kv(out, "compression bar sizes", Html.labels(space.compressionSizes()));
        Html.kv(out, "layers of bars", "1 to " + space.maxLayers() + " on the tension face");
        Html.kv(out, "bar sizes per beam", "at most " + input.maxBarSizesPerBeam());
        out.append("</table>\n");
        out.append("<table class=\"kv\">\n<caption>Cost rates")
                .append(input.currency().isEmpty() ? "" : " (" + Svg.esc(input.currency()) + ")")
                .append("</caption>\n");
        rates(input.rates(), u, out);
        out.append("</table>\n");
        carbonFactors(input.carbon().factors(), u, out);
        out.append("</div>\n");

        out.append("<h3>Rules of thumb the design uses</h3>\n<ul class=\"rules\">\n");
        Html.li(
                out,
                "Stirrup legs: no more legs than bars in the outer layer of either face, so that every leg's bend "
                        + "holds a bar (25.7.1.2, 25.7.1.3); legs beyond two are crossties; where compression bars are relied "
                        + "on, ties round them as 9.7.6.4 and 25.7.2 ask"
                        + (input.barsPerTwoLegs() > 0
                                ? "; and, the office's own rule, two legs hold up to " + input.barsPerTwoLegs()
                                        + " bars in a layer, four legs up to " + 2 * input.barsPerTwoLegs()
                                        + ", and so on (no clause)"
                                : "")
                        + ".");
        Html.li(
                out,
                "Stirrup zones: from the shear line of a uniformly loaded span through the given shears at d from "
                        + "the faces; the middle zone takes the line's largest shear over its length (and at least "
                        + "1.6 wL ℓ / 8 where service loads are given).");
        Html.li(
                out,
                "Top bars: two or more bars run the full span; the extra bars at a continuous support run past the "
                        + "face the larger of 0.3 × span and the development length of 25.4.2.4 (top bars, Ktr = 0), "
                        + "never cut short of it.");
        Html.li(
                out,
                "At most " + input.maxBarSizesPerBeam()
                        + " longitudinal bar sizes per beam; bottom bars of one size run the " + "full span.");
        Html.li(
                out,
                "Main-bar mass is multiplied by the lap factor "
                        + u.compact(input.rates().lapFactor(), Dim.NUMBER) + " for laps and waste.");
        Html.li(
                out,
                "Skin bars of the smallest bar size at the 24.3.2 spacing where h > "
                        + (u == UnitSystem.US ? "36 in" : "900 mm") + " (9.7.2.3), priced as main bars.");
        Html.li(
                out,
                "Stirrup zones follow the shear envelope of a uniformly loaded span: each support zone runs to where "
                        + "the shear has fallen to half its end value.");
        Html.li(out, "Deflection is computed (24.2) only where h is below the minimum of Table 9.3.1.1.");
        Html.li(
                out,
                "Bars are drawn where the checks place them: corner bars at cover + stirrup + d_b/2 from each face, "
                        + "the rest evenly between. Where the stirrup's bend radius (Table 25.3.2) is larger than the bar's, a "
                        + "real corner bar nests slightly further in, and the drawing shows it touching the bend.");
        out.append("</ul>\n");

        Rationalise rationalise = input.rationalise();
        out.append("<h3>Rationalisation</h3>\n");
        if (rationalise == null) {
            out.append("<p>None: each beam is designed at its own optimum.</p>\n");
        } else {
            out.append("<table class=\"kv\">\n");
            Html.kv(
                    out,
                    "section sizes",
                    rationalise.maxSectionSizes() == null
                            ? "no limit"
                            : "at most " + rationalise.maxSectionSizes() + " distinct b × h over the schedule");
            Html.kv(
                    out,
                    "bar sizes",
                    rationalise.maxBarSizes() == null
                            ? "no limit"
                            : "at most " + rationalise.maxBarSizes()
                                    + " distinct longitudinal bar sizes over the schedule");
            Html.kv(
                    out,
                    "groups",
                    rationalise.groupsSameSection()
                            ? "beams of one group share b × h"
                            : "groups do not constrain b × h");
            Html.kv(
                    out,
                    "formwork set",
                    Html.money(rationalise.formworkSetCost(), input.currency()) + " per distinct section size");
            out.append("</table>\n");
        }
        out.append("</section>\n");
    }

    private static void rates(CostRates rates, UnitSystem u, StringBuilder out) {
        boolean inchPound = u == UnitSystem.US;
        // the rates are held per SI unit; show them per the input's units
        double m3PerCubicYard = 0.764554857984;
        double kgPerPound = 0.45359237;
        double m2PerSquareFoot = 0.3048 * 0.3048;
        Html.kv(
                out,
                "concrete",
                Html.amount(inchPound ? rates.concretePerM3() * m3PerCubicYard : rates.concretePerM3())
                        + (inchPound ? " per yd³" : " per m³"));
        Html.kv(
                out,
                "main bars",
                Html.amount(inchPound ? rates.mainBarsPerKg() * kgPerPound : rates.mainBarsPerKg())
                        + (inchPound ? " per lb" : " per kg"));
        Html.kv(
                out,
                "stirrups",
                Html.amount(inchPound ? rates.stirrupsPerKg() * kgPerPound : rates.stirrupsPerKg())
                        + (inchPound ? " per lb" : " per kg"));
        Html.kv(
                out,
                "formwork",
                Html.amount(inchPound ? rates.formworkPerM2() * m2PerSquareFoot : rates.formworkPerM2())
                        + (inchPound ? " per ft²" : " per m²") + " of contact");
        Html.kv(
                out,
                "depth premium",
                Html.amount(inchPound ? rates.depthPremiumPerM() * m2PerSquareFoot : rates.depthPremiumPerM())
                        + (inchPound ? " per ft of depth per ft of beam" : " per m of depth per m of beam"));
        Html.kv(out, "lap factor", u.compact(rates.lapFactor(), Dim.NUMBER) + " on main-bar mass");
    }

    // ---------------------------------------------------------------- schedule table

    static void schedule(ScheduleResult r, List<ScheduleRows.Row> rows, List<String> ids, StringBuilder out) {
        UnitSystem u = r.input().settings().units();
        String cur = r.input().currency();
        boolean own = r.proof() != null;
        out.append(
                "<section id=\"schedule\">\n<h2>Beam schedule</h2>\n<div class=\"wide\">\n<table class=\"grid schedule\">\n");
        out.append("<thead><tr><th>mark</th><th>group</th><th>span (")
                .append(u.unit(Dim.SPAN))
                .append(")</th><th>b × h (")
                .append(u.unit(Dim.LENGTH))
                .append(")</th><th>bottom, full span</th><th>top continuous</th>")
                .append("<th>top at left support</th><th>top at right support</th><th>stirrups by zone</th>")
                .append("<th>φMn / Mu (")
                .append(u.unit(Dim.MOMENT))
                .append(")</th><th>cost")
                .append(cur.isEmpty() ? "" : " (" + Svg.esc(cur) + ")")
                .append("</th>");
        if (own) {
            out.append("<th>own optimum</th>");
        }
        out.append("</tr></thead>\n<tbody>\n");
        for (int i = 0; i < rows.size(); i++) {
            ScheduleRows.Row row = rows.get(i);
            ScheduleResult.Beam b = row.entry();
            out.append("<tr")
                    .append(row.feasible() ? "" : " class=\"infeasible\"")
                    .append("><td class=\"mark\"><a href=\"#")
                    .append(Svg.esc(ids.get(i)))
                    .append("\">")
                    .append(Svg.esc(b.beam().id()))
                    .append("</a></td><td>")
                    .append(Svg.esc(b.beam().group() == null ? "—" : b.beam().group()))
                    .append("</td><td class=\"num\">")
                    .append(u.number(row.problem().span(), Dim.SPAN))
                    .append("</td>");
            if (!row.feasible()) {
                SpanDesigner.Diagnosis d = b.outcome().diagnosis();
                out.append("<td colspan=\"")
                        .append(own ? 9 : 8)
                        .append("\">")
                        .append(Svg.esc(Html.headline(d)))
                        .append(" — ")
                        .append(Svg.esc(diagnosis(d, u)))
                        .append("</td></tr>\n");
                continue;
            }
            SpanLayout l = row.layout();
            out.append("<td class=\"num\">")
                    .append(u.compact(l.width(), Dim.LENGTH))
                    .append(" × ")
                    .append(u.compact(l.height(), Dim.LENGTH))
                    .append(l.flange() != null ? (l.flange().oneSided() ? " L" : " T") : "")
                    .append("</td>");
            out.append("<td>").append(Svg.esc(row.bottom())).append("</td>");
            if (row.cantilever()) {
                out.append("<td>")
                        .append(Svg.esc(row.top()))
                        .append(", full length + ")
                        .append(Svg.esc(u.compact(row.topPastSupport(), Dim.SPAN)))
                        .append(' ')
                        .append(Svg.esc(u.unit(Dim.SPAN)))
                        .append(" past the support</td><td>—</td><td>—</td>");
            } else {
                out.append("<td>").append(Svg.esc(row.top())).append("</td>");
                out.append("<td>")
                        .append(row.left() != null ? Svg.esc(Html.topAtSupport(row.left(), u)) : "—")
                        .append("</td>");
                out.append("<td>")
                        .append(row.right() != null ? Svg.esc(Html.topAtSupport(row.right(), u)) : "—")
                        .append("</td>");
            }
            out.append("<td class=\"lines\">");
            for (int z = 0; z < row.zones().size(); z++) {
                ScheduleRows.ZoneStirrups zone = row.zones().get(z);
                out.append(z == 0 ? "" : "<br>")
                        .append(Svg.esc(zone.name()))
                        .append(": ")
                        .append(Svg.esc(Words.stirrups(zone.stirrups(), u)));
            }
            out.append("</td><td class=\"lines\">");
            for (int k = 0; k < row.strengths().size(); k++) {
                ScheduleRows.Strength st = row.strengths().get(k);
                out.append(k == 0 ? "" : "<br>")
                        .append(ScheduleRows.place(st.place()))
                        .append(": ")
                        .append(u.number(st.phiMn(), Dim.MOMENT))
                        .append(" / ")
                        .append(u.number(st.mu(), Dim.MOMENT));
            }
            out.append("</td><td class=\"num\">")
                    .append(Money.amount(row.design().cost().total()))
                    .append("</td>");
            if (own) {
                out.append("<td class=\"num\">")
                        .append(Double.isFinite(b.ownOptimum()) ? Money.amount(b.ownOptimum()) : "—")
                        .append("</td>");
            }
            out.append("</tr>\n");
        }
        out.append(
                "</tbody>\n</table>\n</div>\n<p class=\"note\">Bars per layer from the face inward (\"3+2\": three in "
                        + "the outer layer, two in the next). At a support the count includes the continuous top bars; the "
                        + "extras run the length given past the face. Stirrups: size × legs @ spacing, by zone (each zone's extent "
                        + "is in the beam's own section below).</p>\n</section>\n");
    }

    private static String diagnosis(SpanDesigner.Diagnosis d, UnitSystem u) {
        List<String> fixes = DiagnosisWords.fixes(d, u);
        return "binding limit: " + d.limit() + " (" + DiagnosisWords.summary(d, u) + ")"
                + (fixes.isEmpty()
                        ? "; no single relaxed limit (depth, width) gives a passing layout"
                        : "; what would work, one limit at a time: " + Words.alternatives(fixes));
    }

    // ---------------------------------------------------------------- rationalisation proof

    static void proof(ScheduleResult r, StringBuilder out) {
        UnitSystem u = r.input().settings().units();
        Proof<ScheduleResult.Search> proof = r.proof();
        ScheduleResult.Search search = proof.search();
        String currency = r.input().currency();
        out.append("<section id=\"rationalisation\">\n<h2>Rationalisation and its proof</h2>\n<div class=\"cols\">\n");
        out.append("<table class=\"kv\">\n<caption>Proof</caption>\n");
        Html.kv(out, "method", ScheduleWords.method(r));
        Html.kv(out, "status", proof.status().name());
        boolean noSchedule = !proof.bounded();
        boolean carbon = proof.measure() == barfit.design.Objective.CARBON;
        // what the proof bounds: the schedule's cost, or its carbon where it minimised carbon
        java.util.function.DoubleFunction<String> measure =
                v -> carbon ? Carbon.amount(Carbon.mass(v, u)) + " " + Carbon.unit(u) : Html.money(v, currency);
        Html.kv(out, "objective", noSchedule ? "— (no schedule meets the limits)" : measure.apply(proof.objective()));
        Html.kv(out, "best bound", noSchedule ? "—" : measure.apply(proof.bound()));
        Html.kv(out, "gap", noSchedule ? "—" : String.format(Locale.ROOT, "%.2f %%", 100 * proof.gap()));
        Html.kv(
                out,
                "bar-size sets",
                search.barSetsTotal() + " considered, " + search.barSetsSolved() + " solved, " + search.barSetsPruned()
                        + " pruned by the " + (carbon ? "carbon" : "cost") + " bound");
        Html.kv(out, "(beam, size) pairs", search.pairsEvaluated() + " designed exactly (a beam once for its repeats)");
        // measured times are left out so that the same result always gives the same page
        Html.kv(
                out,
                "CP-SAT",
                proof.workers() + (proof.workers() == 1 ? " worker" : " workers") + ", seed " + proof.seed());
        out.append("</table>\n");
        out.append("<table class=\"grid\">\n<caption>Section sizes used</caption>\n<thead><tr><th>b × h (")
                .append(u.unit(Dim.LENGTH))
                .append(")</th><th>beams</th></tr></thead>\n<tbody>\n");
        for (ScheduleResult.SectionSize size : r.sizes()) {
            out.append("<tr><td class=\"num\">")
                    .append(u.compact(size.width(), Dim.LENGTH))
                    .append(" × ")
                    .append(u.compact(size.height(), Dim.LENGTH))
                    .append("</td><td>")
                    .append(Svg.esc(String.join(", ", size.beams())))
                    .append("</td></tr>\n");
        }
        out.append("</tbody>\n</table>\n</div>\n<p>Bar sizes used: ")
                .append(Svg.esc(r.barSizes().isEmpty() ? "none" : Html.labels(r, r.barSizes())))
                .append(".</p>\n</section>\n");
    }

    /** The carbon factors the report's carbon figures use, in the file's units. */
    private static void carbonFactors(barfit.design.CarbonFactors f, barfit.units.UnitSystem u, StringBuilder out) {
        boolean us = u == barfit.units.UnitSystem.US;
        out.append("<table class=\"kv\">\n<caption>Carbon factors (")
                .append(Carbon.unit(u))
                .append(", ")
                .append(Carbon.STAGES)
                .append(")</caption>\n");
        Html.kv(out, "concrete, per " + (us ? "yd³" : "m³"), Carbon.amount(Carbon.perVolume(f.concretePerM3(), u)));
        Html.kv(
                out,
                "main bars, per " + (us ? "lb" : "kg"),
                String.format(java.util.Locale.ROOT, "%.3f", f.mainBarsPerKg()));
        Html.kv(
                out,
                "stirrups, per " + (us ? "lb" : "kg"),
                String.format(java.util.Locale.ROOT, "%.3f", f.stirrupsPerKg()));
        Html.kv(
                out,
                "formwork, per " + (us ? "ft²" : "m²"),
                String.format(java.util.Locale.ROOT, "%.3f", Carbon.perArea(f.formworkPerM2(), u)));
        out.append("</table>\n");
    }

    // ---------------------------------------------------------------- costs

    static void costs(ScheduleResult r, StringBuilder out) {
        String currency = r.input().currency();
        out.append("<section id=\"costs\">\n<h2>Cost summary</h2>\n<table class=\"kv money\">\n");
        Html.kv(out, "beams", Html.money(r.beamsCost(), currency));
        String sets = r.input().rationalise() == null
                ? ""
                : " (" + r.sizes().size() + " section " + (r.sizes().size() == 1 ? "size" : "sizes") + ")";
        Html.kv(out, "formwork sets" + sets, Html.money(r.formworkSetsCost(), currency));
        Html.kvStrong(out, "total", Html.money(r.totalCost(), currency));
        boolean formsPerSize =
                r.input().rationalise() != null && r.input().rationalise().formworkSetCost() > 0;
        if (r.proof() != null && r.proof().status() == Proof.Status.INFEASIBLE) {
            Html.kv(out, "rationalisation", "the limits cannot be met: every beam is shown at its own optimum");
        } else if (!r.leastCarbon()) { // minimised for carbon, it is weighed in carbon below
            Html.kv(
                    out,
                    "every beam at its own optimum" + (formsPerSize ? " (a set of forms per size)" : ""),
                    Html.money(r.unconstrainedCost(), currency));
            double difference = r.totalCost() - r.unconstrainedCost();
            String percent = r.unconstrainedCost() > 0
                    ? String.format(Locale.ROOT, " (%+.1f %%)", 100 * difference / r.unconstrainedCost())
                    : "";
            Html.kv(out, "difference", (difference >= 0 ? "+" : "") + Html.money(difference, currency) + percent);
        }
        if (!Double.isNaN(r.totalCarbon())) {
            var u = r.input().settings().units();
            Html.kv(
                    out,
                    "embodied carbon, " + Carbon.STAGES,
                    Carbon.amount(Carbon.mass(r.totalCarbon(), u)) + " " + Carbon.unit(u));
            boolean rationalised = r.proof() != null && r.proof().status() != Proof.Status.INFEASIBLE;
            if (r.leastCarbon() && rationalised && !Double.isNaN(r.unconstrainedCarbon())) {
                double difference = r.totalCarbon() - r.unconstrainedCarbon();
                Html.kv(
                        out,
                        "every beam at its own lowest-carbon design",
                        Carbon.amount(Carbon.mass(r.unconstrainedCarbon(), u)) + " " + Carbon.unit(u)
                                + " (rationalising "
                                + (difference >= 0 ? "adds " : "saves ")
                                + Carbon.amount(Carbon.mass(Math.abs(difference), u)) + ")");
            }
        }
        out.append("</table>\n");
        long withoutDesign = r.beams().stream().filter(b -> !b.feasible()).count();
        if (withoutDesign > 0) {
            out.append("<p class=\"warn\">")
                    .append(withoutDesign)
                    .append(withoutDesign == 1 ? " beam has" : " beams have")
                    .append(" no passing layout: the costs cover only the beams that have one.</p>\n");
        }
        out.append("</section>\n");
    }

    // ---------------------------------------------------------------- price of standardisation

    static void standardisation(ScheduleResult r, StringBuilder out) {
        String currency = r.input().currency();
        boolean carbon = r.leastCarbon();
        var u = r.input().settings().units();
        java.util.function.DoubleFunction<String> amount =
                v -> carbon ? Carbon.amount(Carbon.mass(v, u)) : Money.amount(v);
        List<ScheduleResult.StandardisationPoint> points = new ArrayList<>(r.standardisation());
        points.sort(Comparator.comparingInt(ScheduleResult.StandardisationPoint::sizes));
        out.append(
                        "<section id=\"standardisation\">\n<h2>Price of standardisation</h2>\n<table class=\"grid\">\n<thead><tr>")
                .append("<th>most section sizes K</th><th>")
                .append(
                        carbon
                                ? "total carbon of the beams (" + Carbon.unit(u) + ")"
                                : "total cost" + (currency.isEmpty() ? "" : " (" + Svg.esc(currency) + ")"))
                .append(
                        "</th><th>saving of one more size</th><th>status</th><th>bar sizes allowed</th></tr></thead>\n<tbody>\n");
        double previous = Double.NaN;
        for (ScheduleResult.StandardisationPoint point : points) {
            String saving = Double.isFinite(previous) && Double.isFinite(point.cost())
                    ? amount.apply(previous - point.cost())
                    : "—";
            out.append("<tr><td class=\"num\">")
                    .append(point.sizes())
                    .append("</td><td class=\"num\">")
                    .append(Double.isFinite(point.cost()) ? amount.apply(point.cost()) : "none feasible")
                    .append("</td><td class=\"num\">")
                    .append(saving)
                    .append("</td><td>")
                    .append(Svg.esc(point.status().name()))
                    .append("</td><td>")
                    .append(Svg.esc(Html.labels(r, point.barSizes())))
                    .append("</td></tr>\n");
            previous = point.cost();
        }
        out.append("</tbody>\n</table>\n<figure class=\"plot\">\n")
                .append(StandardisationPlot.svg(r))
                .append("</figure>\n</section>\n");
    }
}
