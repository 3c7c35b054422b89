package barfit.schedule;

import barfit.catalogs.BarSize;
import barfit.design.CostModel;
import barfit.design.Proof;
import barfit.design.SolverOptions;
import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanProblem;
import barfit.input.Rationalise;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Rationalises a schedule whose beams have their own optima: bounds and lazy exact prices
 * ({@link SizePrices}), the groups that share a size ({@link BeamGroups}), the cheapest schedule within
 * the limits over every bar-size set ({@link BarSetSearch}), then each beam designed afresh in its size
 * with the schedule's bar sizes, which re-verifies it and must reproduce its price; and the price of
 * standardisation (the least total for K = 1, 2, ... sizes).
 */
final class Rationaliser {
    /** What the rationalisation gives the schedule: its beams, formwork, the own-optima total, proof and curve. */
    record Rationalised(
            List<ScheduleResult.Beam> beams,
            double formworkSets,
            double unconstrained,
            Proof<ScheduleResult.Search> proof,
            List<ScheduleResult.StandardisationPoint> curve,
            double ownCarbon) {}

    private final ScheduleInput in;
    private final Rationalise limits;
    private final List<SpanDesigner.Outcome> own;
    private final SpanDesigner designer;
    private final CostModel cost;
    private final SolverOptions options;
    private final Parallel pool;
    private final Progress progress;
    private final List<BarSize> barSizes;

    Rationaliser(
            ScheduleInput in,
            List<SpanDesigner.Outcome> own,
            SpanDesigner designer,
            CostModel cost,
            SolverOptions options,
            Parallel pool,
            Progress progress) {
        this.in = in;
        // a set of forms costs money but no carbon the beams do not already count (their formwork factor per
        // m² of contact): it enters the search with money's weight in the model (none minimising carbon, when
        // K alone holds the number of sizes; a blend's share of cost on a cost-carbon frontier)
        Rationalise given = in.rationalise();
        this.limits = cost.moneyShare() == 1
                ? given
                : new Rationalise(
                        given.maxSectionSizes(),
                        given.maxBarSizes(),
                        given.groupsSameSection(),
                        given.formworkSetCost() * cost.moneyShare());
        this.own = own;
        this.designer = designer;
        this.cost = cost;
        this.options = options;
        this.pool = pool;
        this.progress = progress;
        this.barSizes = in.space().barSizes();
    }

    /** {@code started}: when the schedule's run began (System.nanoTime), for the proof's time. */
    Rationalised run(long started) {
        SizePrices prices = new SizePrices(in, own, cost, pool);
        BeamGroups groups = new BeamGroups(in, own, prices);
        BarSetSearch search = new BarSetSearch(limits, barSizes.size(), groups, prices, options, progress);
        int k = limits.maxSectionSizes() == null ? prices.sizeCount() : limits.maxSectionSizes();
        BarSetSearch.Solved best = search.solve(k, null, null);
        int pricedForProof = prices.pricedPairs();
        long proofMillis = (System.nanoTime() - started) / 1_000_000;
        List<SpanDesigner.Outcome> outcomes = designInChosenSizes(best, groups, prices);
        List<ScheduleResult.StandardisationPoint> curve = standardisation(best, search, groups, prices.sizeCount());
        return assemble(best, outcomes, curve, groups, pricedForProof, proofMillis);
    }

    /** The least total for K = 1, 2, ... up to the sizes the schedule uses with no limit on them. */
    private List<ScheduleResult.StandardisationPoint> standardisation(
            BarSetSearch.Solved chosen, BarSetSearch search, BeamGroups groups, int sizeCount) {
        if (groups.isEmpty()) {
            return List.of();
        }
        BarSetSearch.Solved free =
                limits.maxSectionSizes() == null ? chosen : search.solve(sizeCount, null, chosen.bars());
        if (free.result() == null) {
            return List.of();
        }
        int most = distinct(free.result().assignment());
        List<ScheduleResult.StandardisationPoint> out = new ArrayList<>();
        // upward from one size, each K started from the K - 1 schedule and its bar sizes
        int[] hint = null;
        boolean[] bars = chosen.bars() != null ? chosen.bars() : free.bars();
        for (int k = 1; k <= most; k++) {
            BarSetSearch.Solved solved = k == most
                    ? free
                    : limits.maxSectionSizes() != null && k == limits.maxSectionSizes()
                            ? chosen
                            : search.solve(k, hint, bars);
            if (solved.result() != null) {
                hint = solved.result().assignment();
                bars = solved.bars();
            }
            progress.update(Progress.Phase.of(Progress.Step.STANDARDISATION), k, most);
            if (solved.result() == null) {
                out.add(new ScheduleResult.StandardisationPoint(k, Double.NaN, Proof.Status.INFEASIBLE, List.of()));
            } else {
                out.add(new ScheduleResult.StandardisationPoint(
                        k,
                        CostModel.currency(solved.result().objective()),
                        solved.bound() >= solved.result().objective() ? Proof.Status.OPTIMAL : Proof.Status.FEASIBLE,
                        designations(solved.bars())));
            }
        }
        return out;
    }

    private static int distinct(int[] assignment) {
        return (int) Arrays.stream(assignment).distinct().count();
    }

    private List<String> designations(boolean[] bars) {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < barSizes.size(); i++) {
            if (bars[i]) {
                out.add(barSizes.get(i).designation());
            }
        }
        return out;
    }

    /** Each beam designed afresh in its size with the schedule's bar sizes; its cost must equal its price. */
    private List<SpanDesigner.Outcome> designInChosenSizes(
            BarSetSearch.Solved best, BeamGroups groups, SizePrices prices) {
        List<ScheduleBeam> beams = in.beams();
        int[] sizeOf = new int[beams.size()];
        Arrays.fill(sizeOf, -1);
        if (best.result() != null) {
            for (int g = 0; g < groups.count(); g++) {
                for (int i : groups.members(g)) {
                    sizeOf[i] = best.result().assignment()[g];
                }
            }
        }
        List<BarSize> allowed = new ArrayList<>();
        if (best.bars() != null) {
            for (int i = 0; i < barSizes.size(); i++) {
                if (best.bars()[i]) {
                    allowed.add(barSizes.get(i));
                }
            }
        }
        return pool.map(beams.size(), Progress.Phase.of(Progress.Step.DESIGNING_IN_CHOSEN_SIZES), i -> {
            if (groups.failure(i) != null) {
                SpanDesigner.Outcome mine = own.get(i);
                return new SpanDesigner.Outcome(
                        mine.problem(), "infeasible", null, List.of(), mine.proof(), List.of(), groups.failure(i));
            }
            if (sizeOf[i] < 0) {
                return own.get(i);
            }
            SizePrices.Size size = prices.sizes().get(sizeOf[i]);
            SpanProblem given = beams.get(i).problem();
            SpanProblem restricted = given.withFixedWidth(size.width())
                    .withSpace(given.space().withDepths(List.of(size.height())).withMainBars(allowed));
            SpanDesigner.Outcome o = designer.design(restricted, 0);
            double price = prices.exactPrice(i, sizeOf[i], best.bars());
            if (!o.feasible() || Math.abs(o.best().searched(cost).total() - price) > 1e-3) {
                throw new IllegalStateException("beam " + given.id() + " in " + size.width() + " x " + size.height()
                        + " was priced at " + price + " but designs at "
                        + (o.feasible() ? o.best().searched(cost).total() : "nothing")
                        + "; this is a bug in the schedule search");
            }
            // reported against the beam as given (its own width and depth limits), designed in its size
            return new SpanDesigner.Outcome(
                    given, o.status(), o.best(), o.alternatives(), o.proof(), o.binding(), o.diagnosis());
        });
    }

    private Rationalised assemble(
            BarSetSearch.Solved best,
            List<SpanDesigner.Outcome> outcomes,
            List<ScheduleResult.StandardisationPoint> curve,
            BeamGroups groups,
            int pricedForProof,
            long proofMillis) {
        List<ScheduleBeam> beams = in.beams();
        List<ScheduleResult.Beam> out = new ArrayList<>();
        for (int i = 0; i < beams.size(); i++) {
            out.add(new ScheduleResult.Beam(
                    beams.get(i),
                    outcomes.get(i),
                    own.get(i).feasible() ? own.get(i).best().cost().total() : Double.NaN));
        }
        double formwork = 0;
        Proof<ScheduleResult.Search> proof;
        if (best.result() == null) {
            ProofMethod why = groups.isEmpty() ? ProofMethod.NO_BEAM_LEFT : ProofMethod.LIMITS_TOO_TIGHT;
            proof = Proof.none(
                    Proof.Status.INFEASIBLE,
                    new ScheduleResult.Search(
                            why,
                            null,
                            best.setsTotal(),
                            best.setsSolved(),
                            best.setsPruned(),
                            pricedForProof,
                            proofMillis),
                    options);
        } else {
            int used = distinct(best.result().assignment());
            formwork = used * in.rationalise().formworkSetCost();
            Proof.Status status =
                    best.bound() >= best.result().objective() ? Proof.Status.OPTIMAL : Proof.Status.FEASIBLE;
            proof = Proof.solved(
                            status,
                            best.result().objective(),
                            best.bound(),
                            CostModel.UNITS,
                            Proof.SolverStats.NONE,
                            new ScheduleResult.Search(
                                    best.result().method(),
                                    best.result().cpSatStatus(),
                                    best.setsTotal(),
                                    best.setsSolved(),
                                    best.setsPruned(),
                                    pricedForProof,
                                    proofMillis),
                            options)
                    .measuring(cost.objective());
        }
        // every beam at its own optimum, for comparison: the beams designed here, each in its own best
        // size, with a set of forms for each distinct size
        double ownTotal = 0;
        double ownCarbon = 0;
        Set<List<Double>> ownSizes = new HashSet<>();
        for (int i = 0; i < beams.size(); i++) {
            if (out.get(i).feasible() && own.get(i).feasible()) {
                var layout = own.get(i).best().layout();
                ownTotal += own.get(i).best().cost().total();
                var c = own.get(i).best().carbon();
                ownCarbon += c == null ? Double.NaN : c.total();
                ownSizes.add(List.of(layout.width(), layout.height()));
            }
        }
        if (best.result() == null) {
            // the beams stand at their own optima, forms and all
            formwork = ownSizes.size() * in.rationalise().formworkSetCost();
        }
        return new Rationalised(
                out,
                formwork,
                ownTotal + ownSizes.size() * in.rationalise().formworkSetCost(),
                proof,
                curve,
                ownCarbon);
    }
}
