package barfit.design.span;

import barfit.design.CostModel;
import barfit.design.Objective;
import barfit.design.Proof;
import barfit.design.SolverOptions;
import barfit.design.span.SpanDesigner.Design;
import barfit.design.span.SpanDesigner.Diagnosis;
import barfit.design.span.SpanDesigner.Outcome;
import barfit.design.span.SpanDesigner.Search;
import java.util.List;

/**
 * A whole span's best design within a carbon cap ({@code design --carbon-cap}): the span generator keeping
 * every passing option, the CP-SAT model holding the span's carbon under the cap, priced part by part
 * ({@link SpanPrices}), so the proof covers the cap; where designs pass but none within it, a diagnosis.
 */
final class SpanUnderCarbonCap {
    private final SpanDesigner designer;
    private final CostModel cost;
    private final SolverOptions options;

    SpanUnderCarbonCap(SpanDesigner designer) {
        this.designer = designer;
        this.cost = designer.costModel();
        this.options = designer.options();
    }

    Outcome design(SpanProblem p, int alternatives, double carbonCap) {
        CostModel carbon = cost.carbon();
        if (carbon == null) {
            throw new IllegalStateException("a carbon cap needs the carbon factors beside the cost model");
        }
        double capOverSpan = carbonCap * p.span() / 1000.0;
        SpanGenerator gen = new SpanGenerator(p, cost).keepingDominated();
        SpanGenerator.Output out = gen.optionsUnder(Double.POSITIVE_INFINITY);
        if (out.sets().isEmpty()) {
            var proof = Proof.none(Proof.Status.INFEASIBLE, new Search(out.stats(), 0, 0), options)
                    .measuring(cost.objective());
            return new Outcome(p, "infeasible", null, List.of(), proof, List.of(), new SpanDiagnoser(cost).diagnose(p));
        }
        SpanSelection sel = new SpanSelection(p, out.sets());
        long capUnits = CostModel.SPAN_UNITS.units(capOverSpan);
        sel.atMost(new SpanPrices(p, carbon), capUnits);
        SpanDesigner.Selected chosen = designer.select(p, gen, sel, alternatives);
        int solves = chosen.solves();
        int cuts = chosen.cuts();
        SpanSelection.Result first = chosen.first();
        Design best = chosen.best();
        List<Design> alts = chosen.alternatives();
        // the model's carbon, part by part, is the layout's: a cap it holds is a cap the design meets
        List<Design> designed = new java.util.ArrayList<>(alts);
        if (best != null) {
            designed.add(0, best);
        }
        for (Design d : designed) {
            if (CostModel.SPAN_UNITS.units(d.carbon().total()) > capUnits + 10) {
                throw new IllegalStateException(
                        "beam " + p.id() + ": the design's carbon " + d.carbon().total() + " exceeds the cap "
                                + capOverSpan + " the search held; this is a bug in the search");
            }
        }
        Search search = new Search(out.stats(), solves, cuts);
        if (best == null) {
            Proof.Status status = first != null && first.status() == Proof.Status.INFEASIBLE
                    ? Proof.Status.INFEASIBLE
                    : Proof.Status.OUT_OF_TIME;
            var proof = Proof.none(status, search, options).measuring(cost.objective());
            Diagnosis why = status == Proof.Status.OUT_OF_TIME
                    ? new Diagnosis("time limit", new Diagnosis.TimeLimit(options.timeLimitSeconds()))
                    : capDiagnosis(p, capOverSpan);
            return new Outcome(
                    p,
                    status == Proof.Status.INFEASIBLE ? "infeasible" : "unknown",
                    null,
                    List.of(),
                    proof,
                    List.of(),
                    why);
        }
        var proof = Proof.solved(
                        first.status(),
                        first.objective(),
                        first.bound(),
                        CostModel.SPAN_UNITS,
                        first.stats(),
                        search,
                        options)
                .measuring(cost.objective());
        return new Outcome(
                p,
                first.status() == Proof.Status.OPTIMAL ? "optimal" : "feasible",
                best,
                alts,
                proof,
                designer.binding(p, best),
                null);
    }

    /** Why nothing is within the cap: the span's own diagnosis when nothing passes, else the least carbon of any. */
    private Diagnosis capDiagnosis(SpanProblem p, double capOverSpan) {
        Outcome leanest = new SpanDesigner(cost.minimising(Objective.CARBON), options).design(p, 0);
        if (!leanest.feasible()) {
            return leanest.diagnosis() != null ? leanest.diagnosis() : new SpanDiagnoser(cost).diagnose(p);
        }
        SpanLayout l = leanest.best().layout();
        return new Diagnosis(
                "carbon_cap",
                "",
                new Diagnosis.CarbonCapFails(
                        capOverSpan, leanest.best().carbon().total(), l.width(), l.height(), p.span()),
                List.of(),
                null,
                null,
                p.maxDepth(),
                p.fixedWidth());
    }
}
