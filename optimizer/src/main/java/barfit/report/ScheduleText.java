package barfit.report;

import barfit.design.Proof;
import barfit.design.span.SpanProblem;
import barfit.schedule.ScheduleResult;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** The terminal summary of {@code barfit schedule}: the schedule table, the totals, the proof. */
public final class ScheduleText {
    private ScheduleText() {}

    public static String render(ScheduleResult r) {
        UnitSystem u = r.input().settings().units();
        StringBuilder out = new StringBuilder();
        out.append(Caution.text()).append("\n\n");
        if (r.leastCarbon()) {
            out.append(Carbon.OBJECTIVE_NOTE).append("\n\n");
        }
        out.append("Beam schedule: ")
                .append(String.join(" + ", r.input().sources()))
                .append(", ")
                .append(r.beams().size())
                .append(r.beams().size() == 1 ? " beam" : " beams")
                .append(", ")
                .append(r.input().settings().code().edition())
                .append('\n');
        var rationalise = r.input().rationalise();
        out.append(
                rationalise == null
                        ? "each beam at its own optimum (no rationalise: block)\n"
                        : "rationalised: " + limits(rationalise)
                                + (r.leastCarbon() && rationalise.formworkSetCost() > 0
                                        ? " (paid in money: no carbon is counted for a set of forms)"
                                        : "")
                                + "\n");
        // a line of one set of forms is a group that always shares b x h: only the user's groups need the note
        boolean grouped = r.beams().stream()
                .anyMatch(b -> b.beam().group() != null && !b.beam().sameSection());
        if (grouped && (rationalise == null || !rationalise.groupsSameSection())) {
            out.append(
                    "note: the beams' groups are not used; rationalise: {groups: same_section} makes a group share b × h\n");
        }
        out.append('\n');
        // each beam's stirrups go on a line of their own under its row, so the table stays about 150 columns wide
        TextTable table = new TextTable(false, false, false, false, false, false, false, true);
        table.row(
                "beam",
                "group",
                "b × h (" + u.unit(Dim.LENGTH) + ")",
                "bottom",
                "top continuous",
                "top at left",
                "top at right",
                "cost");
        List<String> noShears = new ArrayList<>();
        for (ScheduleRows.Row row : ScheduleRows.rows(r)) {
            ScheduleResult.Beam b = row.entry();
            SpanProblem problem = row.problem();
            String group = b.beam().group() == null ? "" : b.beam().group();
            if (!row.feasible()) {
                table.row(b.beam().id(), group, "NO DESIGN", "(see below)", "", "", "", "");
                continue;
            }
            table.row(
                    b.beam().id(),
                    group,
                    ScheduleRows.size(row, u),
                    row.bottom(),
                    ScheduleRows.topContinuousShort(row, u),
                    ScheduleRows.topAt(row.left(), u),
                    ScheduleRows.topAt(row.right(), u),
                    Money.amount(row.design().cost().total()));
            table.under("  stirrups " + ScheduleRows.stirrupsShort(row, u)
                    + (SpanText.warnings(problem).isEmpty() ? "" : "  (minimum: no shears given)"));
            if (!SpanText.warnings(problem).isEmpty()) {
                noShears.add(b.beam().id());
            }
        }
        table.write("  ", out);
        out.append("  bars per layer from the face inward (\"3+2\": three in the outer layer); at a support the count "
                + "includes the continuous bars,\n  and the extras run the length given past the face; stirrup zones "
                + "are measured from the left face\n");
        if (!noShears.isEmpty()) {
            out.append("WARNING: no shears given for ")
                    .append(String.join(", ", noShears))
                    .append(": minimum stirrups "
                            + "(Av,min at the widest spacing allowed), shear strength not checked; give v_left, v_right (or "
                            + "shear: {left, right})\n");
        }
        out.append('\n');
        String currency = r.input().currency().isEmpty() ? "" : " " + r.input().currency();
        out.append("section sizes: ").append(r.sizes().size()).append(" (");
        for (int i = 0; i < r.sizes().size(); i++) {
            var curve = r.sizes().get(i);
            out.append(i == 0 ? "" : ", ")
                    .append(u.compact(curve.width(), Dim.LENGTH))
                    .append(" × ")
                    .append(u.compact(curve.height(), Dim.LENGTH))
                    .append(": ")
                    .append(curve.beams().size());
        }
        out.append(");  bar sizes: ")
                .append(r.barSizes().size())
                .append(" (")
                .append(String.join(
                        ", ", r.barSizes().stream().map(x -> labelOf(r, x)).toList()))
                .append(")\n");
        out.append("cost: beams ").append(Money.amount(r.beamsCost()));
        if (r.formworkSetsCost() > 0) {
            out.append(" + formwork sets ").append(Money.amount(r.formworkSetsCost()));
        }
        out.append(" = ").append(Money.amount(r.totalCost())).append(currency);
        if (r.proof() != null && r.proof().status() == Proof.Status.INFEASIBLE) {
            out.append(";  the limits cannot be met: every beam is shown at its own optimum, nothing is rationalised");
        } else if (r.proof() != null && !r.leastCarbon()) {
            double extra = r.totalCost() - r.unconstrainedCost();
            out.append(";  every beam at its own optimum")
                    .append(r.input().rationalise().formworkSetCost() > 0 ? " (with a set of forms per size)" : "")
                    .append(": ")
                    .append(Money.amount(r.unconstrainedCost()))
                    .append(currency)
                    .append(String.format(
                            Locale.ROOT,
                            " (rationalising %s %s, %.1f %%)",
                            extra >= 0 ? "adds" : "saves",
                            Money.amount(Math.abs(extra)),
                            r.unconstrainedCost() > 0 ? 100 * Math.abs(extra) / r.unconstrainedCost() : 0));
        }
        out.append('\n');
        if (!Double.isNaN(r.totalCarbon())) {
            out.append("carbon: ")
                    .append(Carbon.amount(Carbon.mass(r.totalCarbon(), u)))
                    .append(' ')
                    .append(Carbon.unit(u))
                    .append(", ")
                    .append(Carbon.STAGES);
            if (r.leastCarbon()
                    && r.proof() != null
                    && r.proof().status() != Proof.Status.INFEASIBLE
                    && !Double.isNaN(r.unconstrainedCarbon())) {
                double extra = r.totalCarbon() - r.unconstrainedCarbon();
                out.append(";  every beam at its own lowest-carbon design: ")
                        .append(Carbon.amount(Carbon.mass(r.unconstrainedCarbon(), u)))
                        .append(String.format(
                                Locale.ROOT,
                                " (rationalising %s %s, %.1f %%)",
                                extra >= 0 ? "adds" : "saves",
                                Carbon.amount(Carbon.mass(Math.abs(extra), u)),
                                r.unconstrainedCarbon() > 0 ? 100 * Math.abs(extra) / r.unconstrainedCarbon() : 0));
            }
            out.append('\n');
        }
        if (r.proof() != null) {
            out.append("proof: ").append(proof(r)).append('\n');
        }
        if (!r.standardisation().isEmpty()) {
            boolean carbon = r.leastCarbon();
            out.append(
                    carbon
                            ? "\nprice of standardisation (least total carbon of the beams, " + Carbon.unit(u)
                                    + ", for at most K section sizes):\n"
                            : "\nprice of standardisation (least total cost for at most K section sizes):\n");
            TextTable curve = new TextTable(true, true, true, false, false);
            curve.row(
                    "K",
                    carbon ? "total " + Carbon.unit(u) : "total" + currency,
                    "saving of the K-th size",
                    "bar sizes allowed",
                    "status");
            double previous = Double.NaN;
            for (ScheduleResult.StandardisationPoint point : r.standardisation()) {
                curve.row(
                        String.valueOf(point.sizes()),
                        Double.isNaN(point.cost()) ? "none fits" : measure(point.cost(), carbon, u),
                        Double.isNaN(previous) || Double.isNaN(point.cost())
                                ? ""
                                : measure(previous - point.cost(), carbon, u),
                        String.join(
                                ", ",
                                point.barSizes().stream()
                                        .map(x -> labelOf(r, x))
                                        .toList()),
                        point.status().name());
                previous = point.cost();
            }
            curve.write("  ", out);
        }
        long failed = r.beams().stream().filter(b -> !b.feasible()).count();
        if (failed > 0) {
            out.append('\n')
                    .append(failed)
                    .append(failed == 1 ? " beam has" : " beams have")
                    .append(" no passing design:\n");
            for (ScheduleResult.Beam b : r.beams()) {
                if (!b.feasible()) {
                    var d = b.outcome().diagnosis();
                    out.append("  ")
                            .append(b.beam().id())
                            .append(": ")
                            .append(d.limit())
                            .append(" — ")
                            .append(DiagnosisWords.summary(d, u));
                    List<String> fixes = DiagnosisWords.fixes(d, u);
                    if (!fixes.isEmpty()) {
                        out.append("; what would work (one limit at a time): ").append(Words.alternatives(fixes));
                    }
                    out.append('\n');
                }
            }
        }
        return out.toString();
    }

    static String labelOf(ScheduleResult r, String designation) {
        return r.input().space().barSizes().stream()
                .filter(b -> b.designation().equals(designation))
                .map(barfit.catalogs.BarSize::label)
                .findFirst()
                .orElse(designation);
    }

    public static String limits(barfit.input.Rationalise rationalise) {
        StringBuilder words = new StringBuilder();
        words.append(
                rationalise.maxSectionSizes() == null
                        ? "any number of section sizes"
                        : "at most " + rationalise.maxSectionSizes() + " section sizes");
        words.append(", ")
                .append(
                        rationalise.maxBarSizes() == null
                                ? "any number of bar sizes"
                                : "at most " + rationalise.maxBarSizes() + " longitudinal bar sizes");
        if (rationalise.groupsSameSection()) {
            words.append(", beams of a group share b × h");
        }
        if (rationalise.formworkSetCost() > 0) {
            words.append(", formwork set ")
                    .append(Money.amount(rationalise.formworkSetCost()))
                    .append(" per size");
        }
        return words.toString();
    }

    /** An amount of what the schedule minimised: currency, or carbon in the user's mass unit. */
    private static String measure(double v, boolean carbon, UnitSystem u) {
        return carbon ? Carbon.amount(Carbon.mass(v, u)) : Money.amount(v);
    }

    public static String proof(ScheduleResult r) {
        Proof<ScheduleResult.Search> p = r.proof();
        var s = p.search();
        if (p.status() == Proof.Status.INFEASIBLE) {
            return "INFEASIBLE — " + ScheduleWords.method(r) + "; the beams are shown at their own optima";
        }
        boolean carbon = p.measure() == barfit.design.Objective.CARBON;
        UnitSystem u = r.input().settings().units();
        return p.status().name() + " — objective " + measure(p.objective(), carbon, u) + ", bound "
                + measure(p.bound(), carbon, u) + (carbon ? " " + Carbon.unit(u) : "")
                + String.format(Locale.ROOT, ", gap %.2f %%", 100 * p.gap()) + "; " + ScheduleWords.method(r)
                + "; bar-size sets: "
                + s.barSetsTotal() + " (" + s.barSetsSolved() + " solved to optimality, " + s.barSetsPruned()
                + " ruled out by a bound); "
                + s.pairsEvaluated() + " (beam, size) pairs priced exactly (a beam once for its repeats); "
                + p.workers()
                + (p.workers() == 1 ? " CP-SAT worker" : " CP-SAT workers") + ", seed " + p.seed();
    }
}
