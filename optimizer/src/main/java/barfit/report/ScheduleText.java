package barfit.report;

import barfit.design.Proof;
import barfit.design.beam.BeamProblem;
import barfit.schedule.ScheduleResult;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** The terminal summary of {@code barfit schedule}: the schedule table, the totals, the proof. */
public final class ScheduleText {
    private ScheduleText() {
    }

    public static String render(ScheduleResult r) {
        UnitSystem u = r.input().settings().units();
        StringBuilder out = new StringBuilder();
        out.append(Caution.text()).append("\n\n");
        out.append("Beam schedule: ").append(String.join(" + ", r.input().sources())).append(", ")
                .append(r.beams().size()).append(r.beams().size() == 1 ? " beam" : " beams").append(", ")
                .append(r.input().settings().code().edition()).append('\n');
        var rat = r.input().rationalise();
        out.append(rat == null ? "each beam at its own optimum (no rationalise: block)\n" : "rationalised: "
                + limits(rat) + "\n");
        // a line of one set of forms is a group that always shares b x h: only the user's groups need the note
        boolean grouped = r.beams().stream().anyMatch(b -> b.beam().group() != null && !b.beam().sameSection());
        if (grouped && (rat == null || !rat.groupsSameSection())) {
            out.append("note: the beams' groups are not used; rationalise: {groups: same_section} makes a group share b × h\n");
        }
        out.append('\n');
        // each beam's stirrups go on a line of their own under its row, so the table stays about 150 columns wide
        TextTable t = new TextTable(false, false, false, false, false, false, false, true);
        t.row("beam", "group", "b × h (" + u.unit(Dim.LENGTH) + ")", "bottom", "top continuous", "top at left",
                "top at right", "cost");
        List<String> noShears = new ArrayList<>();
        for (ScheduleRows.Row row : ScheduleRows.rows(r)) {
            ScheduleResult.Beam b = row.entry();
            BeamProblem p = row.problem();
            String group = b.beam().group() == null ? "" : b.beam().group();
            if (!row.feasible()) {
                t.row(b.beam().id(), group, "NO DESIGN", "(see below)", "", "", "", "");
                continue;
            }
            t.row(b.beam().id(), group, ScheduleRows.size(row, u), row.bottom(), ScheduleRows.topContinuousShort(row, u),
                    ScheduleRows.topAt(row.left(), u), ScheduleRows.topAt(row.right(), u),
                    Money.amount(row.design().cost().total()));
            t.under("  stirrups " + ScheduleRows.stirrupsShort(row, u)
                    + (BeamText.warnings(p).isEmpty() ? "" : "  (minimum: no shears given)"));
            if (!BeamText.warnings(p).isEmpty()) {
                noShears.add(b.beam().id());
            }
        }
        t.write("  ", out);
        out.append("  bars per layer from the face inward (\"3+2\": three in the outer layer); at a support the count "
                + "includes the continuous bars,\n  and the extras run the length given past the face; stirrup zones "
                + "are measured from the left face\n");
        if (!noShears.isEmpty()) {
            out.append("WARNING: no shears given for ").append(String.join(", ", noShears)).append(": minimum stirrups "
                    + "(Av,min at the widest spacing allowed), shear strength not checked; give v_left, v_right (or "
                    + "shear: {left, right})\n");
        }
        out.append('\n');
        String cur = r.input().currency().isEmpty() ? "" : " " + r.input().currency();
        out.append("section sizes: ").append(r.sizes().size()).append(" (");
        for (int i = 0; i < r.sizes().size(); i++) {
            var s = r.sizes().get(i);
            out.append(i == 0 ? "" : ", ").append(u.compact(s.width(), Dim.LENGTH)).append(" × ")
                    .append(u.compact(s.height(), Dim.LENGTH)).append(": ").append(s.beams().size());
        }
        out.append(");  bar sizes: ").append(r.barSizes().size()).append(" (").append(String.join(", ",
                r.barSizes().stream().map(x -> labelOf(r, x)).toList())).append(")\n");
        out.append("cost: beams ").append(Money.amount(r.beamsCost()));
        if (r.formworkSetsCost() > 0) {
            out.append(" + formwork sets ").append(Money.amount(r.formworkSetsCost()));
        }
        out.append(" = ").append(Money.amount(r.totalCost())).append(cur);
        if (r.proof() != null && r.proof().status() == Proof.Status.INFEASIBLE) {
            out.append(";  the limits cannot be met: every beam is shown at its own optimum, nothing is rationalised");
        } else if (r.proof() != null) {
            double extra = r.totalCost() - r.unconstrainedCost();
            out.append(";  every beam at its own optimum").append(r.input().rationalise().formworkSetCost() > 0
                    ? " (with a set of forms per size)" : "").append(": ").append(Money.amount(r.unconstrainedCost()))
                    .append(cur).append(String.format(Locale.ROOT, " (rationalising %s %s, %.1f %%)", extra >= 0 ? "adds"
                    : "saves", Money.amount(Math.abs(extra)), r.unconstrainedCost() > 0 ? 100 * Math.abs(extra)
                    / r.unconstrainedCost() : 0));
        }
        out.append('\n');
        if (r.proof() != null) {
            out.append("proof: ").append(proof(r)).append('\n');
        }
        if (!r.standardisation().isEmpty()) {
            out.append("\nprice of standardisation (least total cost for at most K section sizes):\n");
            TextTable s = new TextTable(true, true, true, false, false);
            s.row("K", "total" + cur, "saving of the K-th size", "bar sizes allowed", "status");
            double prev = Double.NaN;
            for (ScheduleResult.StandardisationPoint p : r.standardisation()) {
                s.row(String.valueOf(p.sizes()), Double.isNaN(p.cost()) ? "none fits" : Money.amount(p.cost()),
                        Double.isNaN(prev) || Double.isNaN(p.cost()) ? "" : Money.amount(prev - p.cost()),
                        String.join(", ", p.barSizes().stream().map(x -> labelOf(r, x)).toList()), p.status().name());
                prev = p.cost();
            }
            s.write("  ", out);
        }
        long failed = r.beams().stream().filter(b -> !b.feasible()).count();
        if (failed > 0) {
            out.append('\n').append(failed).append(failed == 1 ? " beam has" : " beams have")
                    .append(" no passing design:\n");
            for (ScheduleResult.Beam b : r.beams()) {
                if (!b.feasible()) {
                    var d = b.outcome().diagnosis();
                    out.append("  ").append(b.beam().id()).append(": ").append(d.limit()).append(" — ")
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
        return r.input().space().barSizes().stream().filter(b -> b.designation().equals(designation))
                .map(barfit.catalogs.BarSize::label).findFirst().orElse(designation);
    }

    public static String limits(barfit.schedule.Rationalise rat) {
        StringBuilder sb = new StringBuilder();
        sb.append(rat.maxSectionSizes() == null ? "any number of section sizes" : "at most " + rat.maxSectionSizes()
                + " section sizes");
        sb.append(", ").append(rat.maxBarSizes() == null ? "any number of bar sizes" : "at most " + rat.maxBarSizes()
                + " longitudinal bar sizes");
        if (rat.groupsSameSection()) {
            sb.append(", beams of a group share b × h");
        }
        if (rat.formworkSetCost() > 0) {
            sb.append(", formwork set ").append(Money.amount(rat.formworkSetCost())).append(" per size");
        }
        return sb.toString();
    }

    public static String proof(ScheduleResult r) {
        Proof<ScheduleResult.Search> p = r.proof();
        var s = p.search();
        if (p.status() == Proof.Status.INFEASIBLE) {
            return "INFEASIBLE — " + ScheduleWords.method(r) + "; the beams are shown at their own optima";
        }
        return p.status().name() + " — objective " + Money.amount(p.objective()) + ", bound " + Money.amount(p.bound())
                + String.format(Locale.ROOT, ", gap %.2f %%", 100 * p.gap()) + "; " + ScheduleWords.method(r)
                + "; bar-size sets: "
                + s.barSetsTotal() + " (" + s.barSetsSolved() + " solved to optimality, " + s.barSetsPruned()
                + " ruled out by a bound); "
                + s.pairsEvaluated() + " (beam, size) pairs priced exactly; " + p.workers()
                + (p.workers() == 1 ? " CP-SAT worker" : " CP-SAT workers") + ", seed " + p.seed();
    }
}
