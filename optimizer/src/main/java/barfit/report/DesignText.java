package barfit.report;

import barfit.design.Binding;
import barfit.design.Diagnosis;
import barfit.design.Objective;
import barfit.design.Proof;
import barfit.design.section.Design;
import barfit.design.section.DesignOutcome;
import barfit.design.section.SectionGenerator;
import barfit.design.section.SectionLayout;
import barfit.input.Settings;
import barfit.section.CheckReport;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/** The terminal report of {@code barfit design}. */
public final class DesignText {
    private DesignText() {}

    /** What the carbon figures are, said once under the cost note. */
    static final String CARBON_NOTE = "Carbon is embodied carbon, " + Carbon.STAGES
            + ", from the factors in the file or barfit's defaults (published averages, named in the README); "
            + "use your suppliers' declarations (EPDs) for a figure to report.";

    public static String render(Settings settings, List<DesignItem> outcomes, String currency, boolean trail) {
        return render(settings, outcomes, currency, trail, Objective.COST);
    }

    /** As above, for designs that minimised {@code objective}. */
    public static String render(
            Settings settings, List<DesignItem> outcomes, String currency, boolean trail, Objective objective) {
        return render(settings, outcomes, currency, trail, objective, null);
    }

    /** As above, each design within {@code carbonCap} (the user's carbon per length, as --carbon-cap gave it). */
    public static String render(
            Settings settings,
            List<DesignItem> outcomes,
            String currency,
            boolean trail,
            Objective objective,
            Double carbonCap) {
        UnitSystem u = settings.units();
        StringBuilder out = new StringBuilder();
        out.append("barfit design — ")
                .append(settings.file())
                .append(" — ")
                .append(settings.code().edition())
                .append('\n');
        out.append(Caution.text()).append('\n');
        out.append("Costs use the rates in the file (or barfit's invented defaults when none are given); ")
                .append("compare them with your own before relying on a price.\n")
                .append(CARBON_NOTE)
                .append('\n');
        if (carbonCap != null) {
            out.append("Carbon cap (--carbon-cap): at most ")
                    .append(Carbon.amount(carbonCap))
                    .append(' ')
                    .append(Carbon.perLengthUnit(u))
                    .append(" of beam, held in the CP-SAT model: each design is the best within it, proven.\n");
        }
        if (objective == Objective.CARBON) {
            out.append(Carbon.OBJECTIVE_NOTE).append('\n');
        }
        out.append('\n');
        out.append(CheckText.materials(settings)).append('\n');
        int infeasible = 0;
        for (DesignItem o : outcomes) {
            out.append('\n');
            var one = o.line() == null ? null : o.line().oneSection();
            if (o.line() != null && o.line().first() && one != null && !one.fellBack()) {
                var l = o.whole().best() == null ? null : o.whole().best().layout();
                out.append("Line ").append(o.line().line()).append(": one section for the whole line");
                if (l != null) {
                    out.append(", ")
                            .append(len(l.width(), u))
                            .append(" × ")
                            .append(len(l.height(), u))
                            .append(' ')
                            .append(u.unit(Dim.LENGTH));
                }
                out.append(", the cheapest of ")
                        .append(one.sections())
                        .append(" analysed each with its own weight and " + "stiffness (")
                        .append(one.designed())
                        .append(" designed before the cost bound stopped the " + "search)");
                if (o.line().rounds() > 1) {
                    out.append("; analysed again ")
                            .append(o.line().rounds() - 1)
                            .append(o.line().rounds() == 2 ? " time" : " times")
                            .append(" for the redistribution the " + "support sections allow");
                }
                out.append('\n');
            } else if (o.line() != null && o.line().first()) {
                if (one != null) {
                    out.append("Line ")
                            .append(o.line().line())
                            .append(": no one section of the search space carries "
                                    + "every part; each span takes its own\n");
                }
                out.append("Line ")
                        .append(o.line().line())
                        .append(": designed span by span from its analysis, ")
                        .append(o.line().rounds())
                        .append(o.line().rounds() == 1 ? " round" : " rounds")
                        .append(" of analysis and design")
                        .append(
                                !o.line().undesigned().isEmpty()
                                        ? " (no design for "
                                                + String.join(", ", o.line().undesigned()) + ": the analysis "
                                                + "took the first estimate of the section there, so the envelope holds only "
                                                + "once every part is designed)"
                                        : o.line().settled() && o.line().held()
                                                ? " (the sections alternated from round to round: every part is held at the largest "
                                                        + "of them, with its bars designed for the envelope of exactly those sections)"
                                                : o.line().settled()
                                                        ? " (the sections designed are those analysed)"
                                                        : " (the sections still changed in the last round: check the envelope by hand)")
                        .append('\n');
            }
            if (o.line() != null && o.line().first()) {
                supports(o.line(), u, out);
                if (one != null && !one.fellBack() && !Double.isNaN(o.line().lineCost())) {
                    out.append("  line cost ")
                            .append(String.format(Locale.ROOT, "%.2f", o.line().lineCost()))
                            .append(currency == null || currency.isEmpty() ? "" : " " + currency)
                            .append(" (its parts below): the cheapest line of the search space, proved by dynamic "
                                    + "programming along it over every part's options\n");
                    lineAlternatives(one, o.line().lineCost(), u, out);
                }
            }
            if (o.line() != null && o.line().first()) {
                var lp = o.line();
                for (int j = 0; j < lp.asked().size(); j++) {
                    if (lp.asked().get(j) > 0) {
                        out.append("  redistribution at support ")
                                .append(j + 1)
                                .append(" (6.6.5): ")
                                .append(
                                        lp.chosen()
                                                ? u.compact(lp.used().get(j), Dim.NUMBER) + " % chosen of 0 to "
                                                        + u.compact(lp.asked().get(j), Dim.NUMBER) + " % in steps of "
                                                        + u.compact(barfit.design.line.LineSpans.STEP, Dim.NUMBER)
                                                        + " %"
                                                : "asked "
                                                        + u.compact(lp.asked().get(j), Dim.NUMBER) + " %, used "
                                                        + u.compact(lp.used().get(j), Dim.NUMBER) + " %")
                                .append(
                                        Double.isNaN(lp.epsT().get(j))
                                                ? ""
                                                : " (εt = "
                                                        + String.format(
                                                                Locale.ROOT,
                                                                "%.5f",
                                                                lp.epsT().get(j))
                                                        + " beside it; allowed where εt ≥ 0.0075, at most "
                                                        + "1000 εt percent and 20 %)")
                                .append('\n');
                    }
                }
                if (lp.chosen()) {
                    out.append("  with no redistribution the cheapest line ")
                            .append(
                                    Double.isInfinite(lp.withoutRedistribution())
                                            ? "does not exist: no section carries it"
                                            : "costs " + String.format(Locale.ROOT, "%.2f", lp.withoutRedistribution()))
                            .append('\n');
                }
            }
            if (o.section() != null) {
                beam(o.section(), u, currency, trail, out);
            } else {
                SpanText.render(o.whole(), u, currency, trail, out);
            }
            if (o.line() != null && o.line().detail() != null) {
                BendingScheduleText.render(o.line().detail(), u, currency, out);
            }
            if (!o.feasible()) {
                infeasible++;
            }
        }
        out.append('\n')
                .append(outcomes.size())
                .append(outcomes.size() == 1 ? " beam designed: " : " beams designed: ")
                .append(outcomes.size() - infeasible)
                .append(" with a passing layout, ")
                .append(infeasible)
                .append(" with none in the search space.\n");
        return out.toString();
    }

    /** Whether the compression layer is just the two lightest bars the search allows. */
    static boolean hangersOnly(SectionLayout l, barfit.design.SearchSpace space) {
        var lightest = space.compressionSizes().stream()
                .min(java.util.Comparator.comparingDouble(barfit.catalogs.BarSize::massPerMetre))
                .orElseThrow();
        return l.compressionCount() == 2 && l.compressionBar().equals(lightest);
    }

    static String len(double v, UnitSystem u) {
        return u.compact(v, Dim.LENGTH);
    }

    public static String describe(SectionLayout l, UnitSystem u) {
        return len(l.width(), u) + " × " + len(l.height(), u) + "  "
                + l.bending().tensionFace().word() + " "
                + bars(l) + "  " + l.bending().compressionFace().word() + " " + l.compressionCount() + " "
                + l.compressionBar().label() + "  stirrups " + Words.stirrups(l.stirrups(), u);
    }

    /** Size and longitudinal bars only. */
    public static String describeBars(SectionLayout l, UnitSystem u) {
        return len(l.width(), u) + " × " + len(l.height(), u) + "  "
                + l.bending().tensionFace().word() + " "
                + bars(l) + "  " + l.bending().compressionFace().word() + " " + l.compressionCount() + " "
                + l.compressionBar().label();
    }

    public static String bars(SectionLayout l) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < l.tensionCounts().size(); i++) {
            sb.append(i == 0 ? "" : " + ")
                    .append(l.tensionCounts().get(i))
                    .append(' ')
                    .append(l.tensionBar().label());
        }
        return sb.toString();
    }

    static void beam(DesignOutcome o, UnitSystem u, String currency, boolean trail, StringBuilder out) {
        var p = o.problem();
        StringBuilder head = new StringBuilder("Beam ")
                .append(p.id())
                .append("   Mu = ")
                .append(u.withUnit(Math.abs(p.mu()), Dim.MOMENT))
                .append(' ')
                .append(p.bending().word());
        if (p.vu() != null) {
            head.append("   Vu = ").append(u.withUnit(p.vu(), Dim.FORCE));
        }
        if (p.hasTorsion()) {
            head.append("   Tu = ").append(u.withUnit(Math.abs(p.tu()), Dim.MOMENT));
        }
        if (p.maxDepth() != null) {
            head.append("   max depth ").append(u.withUnit(p.maxDepth(), Dim.LENGTH));
        }
        if (p.fixedWidth() != null) {
            head.append("   width ").append(u.withUnit(p.fixedWidth(), Dim.LENGTH));
        }
        head.append("   ").append(o.status().toUpperCase(Locale.ROOT));
        out.append(head).append('\n');
        if (!o.feasible()) {
            diagnosis(o.diagnosis(), u, out);
            return;
        }
        Design d = o.best();
        SectionLayout l = d.layout();
        CheckReport r = d.report();
        TextTable t = new TextTable(false, false);
        t.row("section", Words.shape(l.shape(), u));
        t.row(
                l.bending().tensionFace().word(),
                bars(l) + "  (tension, " + l.tensionCounts().size()
                        + (l.tensionCounts().size() == 1 ? " layer)" : " layers)"));
        t.row(
                l.bending().compressionFace().word(),
                l.compressionCount() + " " + l.compressionBar().label()
                        + (hangersOnly(l, p.space())
                                ? "  (hangers, counted in strength)"
                                : "  (compression steel beyond the minimum hangers)"));
        t.row(
                "stirrups",
                Words.stirrups(l.stirrups(), u)
                        + (p.vu() == null ? "  (minimum stirrups; " + CheckText.SHEAR_NOT_CHECKED + ")" : ""));
        if (l.skin() != null) {
            t.row(
                    "skin bars",
                    l.skin().bar().label() + " @ " + u.withUnit(l.skin().spacing(), Dim.LENGTH)
                            + " on both side faces "
                            + (l.height() > p.code().skinDepthLimit()
                                    ? p.hasTorsion() ? "(9.7.2.3, 9.7.5.1)" : "(9.7.2.3)"
                                    : "(side bars for torsion, 9.7.5.1)"));
        }
        var f = r.flexure();
        t.row(
                "strength",
                "φMn = " + u.withUnit(f.phiMn(), Dim.MOMENT) + "   Mu/φMn = "
                        + Words.ratio(Math.abs(p.mu()) / f.phiMn()) + "   εt = " + Words.fixed(f.epsT(), 5) + "   φ = "
                        + Words.phi(f.phi()) + " (" + f.strainClass() + ")");
        if (r.shear() != null) {
            t.row(
                    "shear",
                    "φVn = " + u.withUnit(r.shear().phiVn(), Dim.FORCE) + "   Vu/φVn = "
                            + Words.ratio(r.shear().vu() / r.shear().phiVn()));
        }
        String torsion = TorsionWords.summary(r, u);
        if (torsion != null) {
            t.row("torsion", torsion);
        }
        t.row("binding", binding(o.binding(), u));
        if (p.span() != null && p.span().ends() == null) {
            t.row("not checked", "minimum depth (Table 9.3.1.1): the span is given without its ends");
        }
        String cur = currency.isEmpty() ? "" : " (" + currency + ")";
        t.row("cost " + Money.perLengthLabel(u) + cur, Money.breakdown(Money.scaled(d.costPerMetre(), u)));
        if (p.span() != null) {
            t.row(
                    "cost of the beam" + cur,
                    Money.breakdown(d.cost()) + "  over " + u.compact(p.span().length(), Dim.SPAN) + " "
                            + u.unit(Dim.SPAN));
        }
        if (d.carbonPerMetre() != null) {
            // labels no longer than the cost rows' above, so the table keeps its columns
            t.row("carbon", Carbon.breakdown(Carbon.perLength(d.carbonPerMetre(), u)) + " " + Carbon.perLengthUnit(u));
            if (p.span() != null) {
                t.row(
                        "carbon of beam",
                        Carbon.breakdown(Carbon.mass(d.carbon(), u)) + " " + Carbon.unit(u) + "  over "
                                + u.compact(p.span().length(), Dim.SPAN) + " " + u.unit(Dim.SPAN));
            }
        }
        t.row("proof", proof(o.proof(), u));
        t.write("  ", out);
        if (!o.alternatives().isEmpty()) {
            boolean carbon = o.proof().measure() == Objective.CARBON;
            out.append(
                    carbon
                            ? "  alternatives (next lowest-carbon distinct section or bar size; " + Carbon.unit(u)
                                    + "):\n"
                            : "  alternatives (next cheapest distinct section or bar size):\n");
            TextTable a = new TextTable(false, false, true, true);
            double bestCost = (carbon ? d.carbon() : d.cost()).total();
            int k = 1;
            for (Design alt : o.alternatives()) {
                double c = (carbon ? alt.carbon() : alt.cost()).total();
                a.row(
                        "#" + k++,
                        describe(alt.layout(), u)
                                // under torsion the side bars are part of what the alternative is
                                + (p.hasTorsion() && alt.layout().skin() != null
                                        ? "  side bars "
                                                + alt.layout().skin().bar().label() + " @ "
                                                + u.withUnit(alt.layout().skin().spacing(), Dim.LENGTH)
                                        : ""),
                        carbon
                                ? Carbon.amount(
                                        p.span() != null
                                                ? Carbon.mass(c, u)
                                                : Carbon.perLength(
                                                        alt.carbonPerMetre().total(), u))
                                : Money.amount(
                                        p.span() != null
                                                ? c
                                                : Money.perLength(
                                                        alt.costPerMetre().total(), u)),
                        String.format(Locale.ROOT, "+%.1f %%", 100 * (c - bestCost) / bestCost));
            }
            a.write("    ", out);
        }
        if (trail) {
            out.append("\n  Checks of the chosen layout (section model)\n");
            TextTable ct = new TextTable(false, false, true, false, true, true, false);
            for (var c : r.checks()) {
                ct.row(
                        c.title(),
                        c.clause(),
                        Words.value(c.demand(), u),
                        c.sense().equals("<=") ? "≤" : "≥",
                        Words.value(c.limit(), u),
                        Words.ratio(c.ratio()),
                        c.pass() ? "ok" : "FAIL");
            }
            ct.write("    ", out);
            out.append("\n  Calculation trail\n");
            TrailText.write(r.trail(), u, "    ", out);
        }
    }

    /** "one No. 29 fewer → flexure; h = 475 mm → flexure, shear_strength; ..." */
    static String binding(List<Binding> bs, UnitSystem u) {
        if (bs.isEmpty()) {
            return "nothing found by the one-step tests (fewer bars, shallower, narrower, wider stirrups, fewer legs)";
        }
        Map<String, List<String>> byWhen = new LinkedHashMap<>();
        for (Binding b : bs) {
            byWhen.computeIfAbsent(Words.when(b, u), k -> new java.util.ArrayList<>())
                    .add(
                            b.limit().startsWith("stirrup_legs_bars")
                                    ? b.limit() + " (the office's legs rule, not the code)"
                                    : b.limit());
        }
        StringBuilder sb = new StringBuilder();
        for (var e : byWhen.entrySet()) {
            sb.append(sb.length() == 0 ? "" : "; ")
                    .append(e.getKey())
                    .append(" → ")
                    .append(String.join(", ", e.getValue()));
        }
        return sb.toString();
    }

    static String proof(Proof<SectionGenerator.Stats> p, UnitSystem u) {
        var s = p.search();
        if (p.status() == Proof.Status.UNPROVEN) {
            return "not proven: the time limit ended CP-SAT before it had a solution; the cheapest of " + s.candidates()
                    + " candidates the generator found is given, with no bound (raise --time-limit for the proof); "
                    + p.workers() + (p.workers() == 1 ? " worker" : " workers") + ", seed " + p.seed();
        }
        String bound = String.format(Locale.ROOT, "%.4f", Carbon.proofPerLength(p.bound(), p.measure(), u));
        String obj = String.format(Locale.ROOT, "%.4f", Carbon.proofPerLength(p.objective(), p.measure(), u));
        if (p.withoutSolve()) {
            return "optimal by comparison of " + s.candidates()
                    + (s.candidates() == 1 ? " candidate" : " candidates") + " (objective " + obj + " "
                    + Carbon.proofBasis(p.measure(), u) + "): each is the least of its frame, and one is the least "
                    + "of all, ahead of the next, so no CP-SAT solve was needed; " + s.framesEvaluated() + " of "
                    + s.frames() + " frames evaluated, " + s.framesPrunedByBound() + " skipped by the "
                    + (p.measure() == Objective.CARBON ? "carbon" : "cost") + " bound";
        }
        return "CP-SAT " + Words.status(p.status()) + " over " + s.candidates()
                + (s.candidates() == 1 ? " candidate" : " candidates") + " (objective " + obj + ", bound " + bound + " "
                + Carbon.proofBasis(p.measure(), u) + ", gap "
                + String.format(Locale.ROOT, "%.2f", 100 * p.gap()) + " %); " + s.framesEvaluated() + " of "
                + s.frames()
                + " frames evaluated, " + s.framesPrunedByBound() + " skipped by the "
                + (p.measure() == Objective.CARBON ? "carbon" : "cost") + " bound; " + p.workers()
                + (p.workers() == 1 ? " worker" : " workers") + ", seed " + p.seed();
    }

    static void diagnosis(Diagnosis d, UnitSystem u, StringBuilder out) {
        out.append("  no layout in the search space passes.\n");
        out.append("  binding limit: ")
                .append(d.limit())
                .append(" — ")
                .append(DiagnosisWords.summary(d, u))
                .append('\n');
        if (d.strongest() != null) {
            out.append("  strongest ductile layout: ")
                    .append(describeBars(d.strongest(), u))
                    .append("  φMn = ")
                    .append(u.withUnit(d.strongestPhiMn(), Dim.MOMENT))
                    .append('\n');
        }
        List<String> fixes = DiagnosisWords.fixes(d, u);
        if (fixes.isEmpty()) {
            out.append("  no single relaxed limit (depth, width, one more layer) gives a passing layout\n");
        } else {
            out.append("  what would work (one limit at a time): ")
                    .append(Words.alternatives(fixes))
                    .append('\n');
        }
    }

    /**
     * The top bars over each support, once per support: one group where the parts on both sides share them,
     * with the length of one extra bar from end to end; else each side's own.
     */
    static void supports(DesignItem.LinePart lp, UnitSystem u, StringBuilder out) {
        for (var sb : lp.supports()) {
            if (sb == null) {
                continue;
            }
            out.append("  top bars over support ").append(sb.index()).append(": ");
            if (sb.shared() || sb.left() == null || sb.right() == null) {
                var side = sb.either();
                out.append(bars(side, u));
                int extra = barfit.design.span.SpanLayout.sum(side.counts()) - side.continuous();
                if (extra > 0) {
                    out.append(", ")
                            .append(extra)
                            .append(extra == 1 ? " extra bar " : " extra bars ")
                            .append(SpanText.span(sb.extraBarLength(), u))
                            .append(" long (");
                    if (sb.intoLeft() > 0) {
                        out.append(SpanText.span(sb.intoLeft(), u))
                                .append(" into ")
                                .append(sb.left() != null ? sb.left().part() : "the back span")
                                .append(", ");
                    }
                    out.append(SpanText.span(sb.width(), u)).append(" over the support");
                    if (sb.intoRight() > 0) {
                        out.append(", ")
                                .append(SpanText.span(sb.intoRight(), u))
                                .append(" into ")
                                .append(sb.right() != null ? sb.right().part() : "the back span");
                    }
                    out.append(')');
                }
                out.append(sb.left() != null && sb.right() != null ? ", one group for both sides" : "");
            } else {
                out.append(bars(sb.left(), u))
                        .append(" from ")
                        .append(sb.left().part())
                        .append("; ")
                        .append(bars(sb.right(), u))
                        .append(" from ")
                        .append(sb.right().part())
                        .append(" (each span designed alone)");
            }
            out.append('\n');
        }
    }

    private static String bars(barfit.design.line.LineSpans.Side side, UnitSystem u) {
        StringBuilder sb = new StringBuilder();
        for (int n : side.counts()) {
            sb.append(sb.length() == 0 ? "" : " + ")
                    .append(n)
                    .append(' ')
                    .append(side.bar().label());
        }
        return sb.toString();
    }

    /** The next cheapest sections for the whole line, each the cheapest line at that section. */
    private static void lineAlternatives(
            barfit.design.line.LineSpans.OneSection one, double cost, UnitSystem u, StringBuilder out) {
        if (one.alternatives().isEmpty()) {
            return;
        }
        out.append("  alternatives (the cheapest line at each of the next cheapest sections):\n");
        TextTable a = new TextTable(false, false, true, true, false);
        int k = 1;
        for (var alt : one.alternatives()) {
            boolean redistributed = alt.redistribution().stream().anyMatch(r -> r > 0);
            StringBuilder r = new StringBuilder();
            if (redistributed) {
                r.append("redistribution");
                for (int j = 0; j < alt.redistribution().size(); j++) {
                    if (alt.redistribution().get(j) > 0) {
                        r.append(" ")
                                .append(u.compact(alt.redistribution().get(j), Dim.NUMBER))
                                .append(" % at support ")
                                .append(j + 1);
                    }
                }
            }
            a.row(
                    "#" + k++,
                    len(alt.width(), u) + " × " + len(alt.height(), u) + " " + u.unit(Dim.LENGTH),
                    Money.amount(alt.cost()),
                    String.format(Locale.ROOT, "+%.1f %%", 100 * (alt.cost() - cost) / cost),
                    r.toString());
        }
        a.write("    ", out);
    }
}
