package barfit.design.section;

import barfit.catalogs.BarSize;
import barfit.design.Binding;
import barfit.design.CostBreakdown;
import barfit.design.CostModel;
import barfit.design.Diagnosis;
import barfit.design.Objective;
import barfit.design.Proof;
import barfit.design.SolverOptions;
import barfit.design.TensionSearch;
import barfit.section.BarSpacing;
import barfit.section.BeamSection;
import barfit.section.CheckReport;
import barfit.section.CheckResult;
import barfit.section.SectionChecks;
import barfit.section.Stirrups;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.List;

/**
 * Designs one section: generates candidates, lets CP-SAT choose the cheapest (and the next distinct
 * ones), re-verifies every chosen layout with the full section model, says what binds, and diagnoses
 * a beam that cannot pass.
 */
public final class SectionDesigner {
    private final CostModel cost;
    private final SolverOptions options;
    /** Whether a choice the candidates' prices decide is taken without a CP-SAT solve (see {@link #decided}). */
    private final boolean byComparison;

    public SectionDesigner(CostModel cost, SolverOptions options) {
        this(cost, options, true);
    }

    private SectionDesigner(CostModel cost, SolverOptions options, boolean byComparison) {
        this.cost = cost;
        this.options = options;
        this.byComparison = byComparison;
    }

    /** The same designer with every choice made by the CP-SAT model: the cross-check of {@link #decided}. */
    SectionDesigner solvingAlways() {
        return new SectionDesigner(cost, options, false);
    }

    public DesignOutcome design(SectionProblem p, int alternatives) {
        return design(p, alternatives, null);
    }

    /**
     * The cheapest passing layout (least of this model's measure) whose carbon per metre is at most
     * {@code carbonCap} (kg CO2e per m; null: no cap). The generator keeps only layouts within the cap and the
     * CP-SAT model holds the cap as a constraint, so the proof covers it; when layouts pass but none is within
     * the cap, the diagnosis gives the least carbon any passing layout has.
     */
    public DesignOutcome design(SectionProblem p, int alternatives, Double carbonCap) {
        long cap = carbonCap == null ? Long.MAX_VALUE : CostModel.units(carbonCap);
        return design(p, alternatives, carbonCap == null ? null : cost.carbon(), cap, carbonCap);
    }

    /**
     * The least of this model's measure among passing layouts whose price at {@code capMeasure} is at most
     * {@code cap} units per metre (the money beside a carbon model, for a frontier), with no diagnosis.
     */
    public DesignOutcome designCapped(SectionProblem p, CostModel capMeasure, long cap) {
        return design(p, 0, capMeasure, cap, null);
    }

    private DesignOutcome design(SectionProblem p, int alternatives, CostModel capMeasure, long cap, Double carbonCap) {
        SectionGenerator.Output gen =
                new SectionGenerator(p, cost).cap(capMeasure, cap).generate(1 + alternatives);
        List<Candidate> cands = gen.candidates();
        if (cands.isEmpty()) {
            var proof =
                    Proof.none(Proof.Status.INFEASIBLE, gen.stats(), options).measuring(cost.objective());
            return new DesignOutcome(p, "infeasible", null, List.of(), proof, List.of(), capDiagnosis(p, carbonCap));
        }
        if (byComparison) {
            DesignOutcome decided = decided(p, gen, alternatives, capMeasure, cap);
            if (decided != null) {
                return decided;
            }
        }
        SectionSelection sel = new SectionSelection();
        List<Integer> all = new ArrayList<>();
        for (int i = 0; i < cands.size(); i++) {
            all.add(sel.add(cands.get(i).units(), "c" + i));
        }
        sel.exactlyOne(all);
        if (capMeasure != null) {
            long[] capped = new long[cands.size()];
            for (int i = 0; i < capped.length; i++) {
                capped[i] =
                        CostModel.units(cands.get(i).layout().cost(capMeasure).total());
            }
            sel.atMost(capped, cap);
        }
        SectionSelection.Result first = sel.solve(options);
        if (!solved(first)) {
            // the time limit ended the solve before it had a solution: give the generator's cheapest
            // candidate, as found but not proven (no bound)
            int cheapest = 0;
            for (int i = 1; i < cands.size(); i++) {
                if (cands.get(i).units() < cands.get(cheapest).units()) {
                    cheapest = i;
                }
            }
            Design best = verified(p, cands.get(cheapest));
            var proof = Proof.unproven(cands.get(cheapest).units(), CostModel.UNITS, gen.stats(), options)
                    .measuring(cost.objective());
            return new DesignOutcome(p, "feasible", best, List.of(), proof, binding(p, best.layout()), null);
        }
        int chosen = indexOf(first.chosen());
        Design best = verified(p, cands.get(chosen));
        List<Design> alts = new ArrayList<>();
        sel.exclude(chosen);
        for (int k = 0; k < alternatives && alts.size() < cands.size() - 1; k++) {
            SectionSelection.Result r = sel.solve(options);
            if (!solved(r)) {
                break;
            }
            int i = indexOf(r.chosen());
            alts.add(verified(p, cands.get(i)));
            sel.exclude(i);
        }
        String status = first.status() == Proof.Status.OPTIMAL ? "optimal" : "feasible";
        var proof = Proof.solved(
                        first.status(),
                        first.objective(),
                        first.bound(),
                        CostModel.UNITS,
                        first.stats(),
                        gen.stats(),
                        options)
                .measuring(cost.objective());
        return new DesignOutcome(p, status, best, alts, proof, binding(p, best.layout()), null);
    }

    /**
     * The design and its alternatives without a CP-SAT solve, where the candidates' prices decide them: the
     * model is one candidate of least price (within the cap, where there is one), then the next as each is
     * excluded, so when the 1 + {@code alternatives} cheapest candidates each cost strictly less than the next,
     * the model could choose nothing else. Null where two tie there or none is within the cap (the model
     * decides, or finds nothing).
     */
    private DesignOutcome decided(
            SectionProblem p, SectionGenerator.Output gen, int alternatives, CostModel capMeasure, long cap) {
        List<Candidate> cands = gen.candidates();
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < cands.size(); i++) {
            if (capMeasure == null
                    || CostModel.units(cands.get(i).layout().cost(capMeasure).total()) <= cap) {
                order.add(i);
            }
        }
        if (order.isEmpty()) {
            return null;
        }
        order.sort(java.util.Comparator.comparingLong(i -> cands.get(i).units()));
        int taken = Math.min(1 + alternatives, order.size());
        for (int k = 0; k < taken && k + 1 < order.size(); k++) {
            if (cands.get(order.get(k)).units() == cands.get(order.get(k + 1)).units()) {
                return null;
            }
        }
        Design best = verified(p, cands.get(order.get(0)));
        List<Design> alts = new ArrayList<>();
        for (int k = 1; k < taken; k++) {
            alts.add(verified(p, cands.get(order.get(k))));
        }
        long units = cands.get(order.get(0)).units();
        var proof = Proof.solved(
                        Proof.Status.OPTIMAL,
                        units,
                        units,
                        CostModel.UNITS,
                        Proof.SolverStats.NONE,
                        gen.stats(),
                        options)
                .measuring(cost.objective());
        return new DesignOutcome(p, "optimal", best, alts, proof, binding(p, best.layout()), null);
    }

    /**
     * Why nothing is within the cap: the section's own diagnosis when no layout passes at all, else the least
     * carbon of any passing layout (designed for it).
     */
    private Diagnosis capDiagnosis(SectionProblem p, Double carbonCap) {
        if (carbonCap == null) {
            return SectionDiagnoser.diagnose(p, cost);
        }
        DesignOutcome least = new SectionDesigner(cost.minimising(Objective.CARBON), options).design(p, 0);
        if (!least.feasible()) {
            return least.diagnosis();
        }
        return new Diagnosis(
                "carbon_cap",
                new Diagnosis.CarbonCapFails(
                        carbonCap,
                        least.best().carbonPerMetre().total(),
                        least.best().layout()),
                null,
                0,
                null,
                null,
                null,
                p.maxDepth(),
                p.fixedWidth());
    }

    private static boolean solved(SectionSelection.Result r) {
        return r.status() == Proof.Status.OPTIMAL || r.status() == Proof.Status.FEASIBLE;
    }

    private static int indexOf(boolean[] chosen) {
        for (int i = 0; i < chosen.length; i++) {
            if (chosen[i]) {
                return i;
            }
        }
        throw new IllegalStateException("the solver chose no candidate");
    }

    /** The full section model on a chosen layout; a failure here is a bug, never printed as a design. */
    Design verified(SectionProblem p, Candidate c) {
        CheckReport report = check(p, c.layout(), Trail.recording());
        if (!report.ok()) {
            StringBuilder sb = new StringBuilder();
            for (CheckResult r : report.failures()) {
                sb.append(sb.length() == 0 ? "" : ", ").append(r.id());
            }
            throw new IllegalStateException("re-verification failed for beam " + p.id() + " (" + sb
                    + " fail on the chosen layout); this is a bug in the search");
        }
        CostBreakdown perMetre =
                cost.objective() == Objective.COST ? c.cost() : c.layout().cost(cost.money());
        CostModel carbon = cost.carbon();
        CostBreakdown carbonPerMetre = carbon == null
                ? null
                : cost.objective() == Objective.CARBON ? c.cost() : c.layout().cost(carbon);
        return new Design(
                c.layout(),
                perMetre,
                perMetre.times(p.costLength()),
                report,
                carbonPerMetre,
                carbonPerMetre == null ? null : carbonPerMetre.times(p.costLength()));
    }

    /** The section model's checks of a layout, with the office's legs rule when the search has one. */
    static CheckReport check(SectionProblem p, SectionLayout l, Trail trail) {
        BeamSection s = l.section(p.materials(), p.detailing(), p.code());
        return SectionChecks.run(s, p.demand(), p.span(), trail, true, p.space().practice());
    }

    private static List<String> failingIds(SectionProblem p, SectionLayout l) {
        List<String> ids = new ArrayList<>();
        for (CheckResult r : check(p, l, Trail.off()).failures()) {
            ids.add(r.id());
        }
        return ids;
    }

    /** What fails when the design is made one step leaner in each direction. */
    List<Binding> binding(SectionProblem p, SectionLayout l) {
        List<Binding> out = new ArrayList<>();
        // one tension bar fewer
        int tensionBars = l.tensionBarCount();
        int layers = l.tensionCounts().size();
        BarSize tensionBar = l.tensionBar();
        var detailing = l.detailing(p.detailing());
        int mostBars = BarSpacing.maxBars(l.width(), detailing, tensionBar, p.materials(), p.code());
        int[] fewer = TensionSearch.greedySplit(tensionBars - 1, layers, mostBars, 2);
        if (fewer == null && layers > 1) {
            fewer = TensionSearch.greedySplit(tensionBars - 1, layers - 1, mostBars, 2);
        }
        if (fewer != null) {
            List<Integer> counts = new ArrayList<>();
            for (int c : fewer) {
                counts.add(c);
            }
            SectionLayout lean = new SectionLayout(
                    l.width(),
                    l.height(),
                    l.flange(),
                    l.bending(),
                    tensionBar,
                    counts,
                    l.compressionBar(),
                    l.compressionCount(),
                    l.stirrups(),
                    l.skin());
            add(out, failingIds(p, lean), Binding.Leaner.ONE_BAR_FEWER, tensionBars - 1, tensionBar);
        }
        // one depth step shallower, same bars
        List<Double> depths = p.space().depths();
        int depthIndex = depths.indexOf(l.height());
        if (depthIndex > 0) {
            double shallower = depths.get(depthIndex - 1);
            SectionLayout lean = new SectionLayout(
                    l.width(),
                    shallower,
                    l.flange(),
                    l.bending(),
                    tensionBar,
                    l.tensionCounts(),
                    l.compressionBar(),
                    l.compressionCount(),
                    l.stirrups(),
                    l.skin());
            add(out, failingIds(p, lean), Binding.Leaner.SHALLOWER, shallower, null);
        }
        if (p.maxDepth() != null && l.height() >= p.maxDepth() - 1e-9) {
            out.add(new Binding("headroom", Binding.Leaner.AT_MAX_DEPTH, l.height()));
        }
        // next narrower width, same bars
        List<Double> widths = p.widths();
        int widthIndex = widths.indexOf(l.width());
        if (widthIndex > 0) {
            SectionLayout lean = new SectionLayout(
                    widths.get(widthIndex - 1),
                    l.height(),
                    l.flange(),
                    l.bending(),
                    tensionBar,
                    l.tensionCounts(),
                    l.compressionBar(),
                    l.compressionCount(),
                    l.stirrups(),
                    l.skin());
            add(out, failingIds(p, lean), Binding.Leaner.NARROWER, widths.get(widthIndex - 1), null);
        }
        // stirrups one spacing step wider
        List<Double> spacings = p.space().stirrupSpacings();
        int spacingIndex = spacings.indexOf(l.stirrups().spacing());
        if (spacingIndex >= 0 && spacingIndex < spacings.size() - 1) {
            Stirrups wider = new Stirrups(l.stirrups().bar(), l.stirrups().legs(), spacings.get(spacingIndex + 1));
            SectionLayout lean = new SectionLayout(
                    l.width(),
                    l.height(),
                    l.flange(),
                    l.bending(),
                    tensionBar,
                    l.tensionCounts(),
                    l.compressionBar(),
                    l.compressionCount(),
                    wider,
                    l.skin());
            add(out, failingIds(p, lean), Binding.Leaner.STIRRUPS_WIDER_APART, spacings.get(spacingIndex + 1), null);
        }
        // fewer stirrup legs, same spacing: says when the office's legs rule (or the code's) decided them
        List<Integer> legs = p.space().stirrupLegs();
        int legsIndex = legs.indexOf(l.stirrups().legs());
        if (legsIndex > 0) {
            Stirrups fewerLegs = new Stirrups(
                    l.stirrups().bar(), legs.get(legsIndex - 1), l.stirrups().spacing());
            SectionLayout lean = new SectionLayout(
                    l.width(),
                    l.height(),
                    l.flange(),
                    l.bending(),
                    tensionBar,
                    l.tensionCounts(),
                    l.compressionBar(),
                    l.compressionCount(),
                    fewerLegs,
                    l.skin());
            add(out, failingIds(p, lean), Binding.Leaner.FEWER_LEGS, legs.get(legsIndex - 1), null);
        }
        return out;
    }

    private static void add(List<Binding> out, List<String> ids, Binding.Leaner leaner, double value, BarSize bar) {
        for (String id : ids) {
            out.add(new Binding(id, leaner, value, bar));
        }
    }
}
