package barfit.schedule;

import barfit.catalogs.BarSize;
import barfit.design.CostModel;
import barfit.design.Proof;
import barfit.design.SolverOptions;
import barfit.design.span.SpanDesigner;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

/**
 * Designs a schedule. Every beam first gets its own proven optimum, the beams in parallel
 * ({@link Parallel}). Without rationalisation that is the schedule; with it, {@link Rationaliser} chooses
 * at most K section sizes and M bar sizes for the whole schedule and proves the choice cheapest.
 */
public final class ScheduleSolver {
    private final CostModel cost;
    private final SolverOptions options;
    private final Progress progress;
    private final Parallel pool;

    public ScheduleSolver(CostModel cost, SolverOptions options, int threads, Progress progress) {
        this.cost = cost;
        this.options = options;
        this.progress = progress;
        this.pool = new Parallel(threads, progress);
    }

    public ScheduleResult solve(ScheduleInput in) {
        long started = System.nanoTime();
        List<ScheduleBeam> beams = in.beams();
        SpanDesigner designer = new SpanDesigner(cost, options);
        List<SpanDesigner.Outcome> own = pool.map(
                beams.size(),
                Progress.Phase.of(Progress.Step.DESIGNING_BEAMS),
                i -> beams.get(i).designed() != null
                        ? beams.get(i).designed()
                        : designer.design(beams.get(i).problem(), 0));
        if (in.rationalise() == null) {
            double unconstrained = 0;
            List<ScheduleResult.Beam> out = new ArrayList<>();
            for (int i = 0; i < beams.size(); i++) {
                SpanDesigner.Outcome o = own.get(i);
                double ownCost = o.feasible() ? o.best().cost().total() : Double.NaN;
                if (o.feasible()) {
                    unconstrained += ownCost;
                }
                out.add(new ScheduleResult.Beam(beams.get(i), o, ownCost));
            }
            return finish(in, out, 0, unconstrained, null, List.of(), started, Double.NaN);
        }
        Rationaliser.Rationalised r = new Rationaliser(in, own, designer, cost, options, pool, progress).run(started);
        return finish(in, r.beams(), r.formworkSets(), r.unconstrained(), r.proof(), r.curve(), started, r.ownCarbon());
    }

    /** The schedule's section sizes (each with its beams) and bar sizes, in size order, and its total. */
    private ScheduleResult finish(
            ScheduleInput in,
            List<ScheduleResult.Beam> beams,
            double formworkSets,
            double unconstrained,
            Proof<ScheduleResult.Search> proof,
            List<ScheduleResult.StandardisationPoint> curve,
            long started,
            double ownCarbon) {
        Map<List<Double>, List<String>> beamsBySize = new TreeMap<>(
                Comparator.<List<Double>>comparingDouble(size -> size.get(0)).thenComparingDouble(size -> size.get(1)));
        Map<String, BarSize> bars = new TreeMap<>();
        double total = 0;
        for (ScheduleResult.Beam b : beams) {
            if (!b.feasible()) {
                continue;
            }
            var layout = b.outcome().best().layout();
            beamsBySize
                    .computeIfAbsent(List.of(layout.width(), layout.height()), k -> new ArrayList<>())
                    .add(b.beam().id());
            bars.put(byDiameter(layout.top()), layout.top());
            bars.put(byDiameter(layout.bottom()), layout.bottom());
            total += b.outcome().best().cost().total();
        }
        List<ScheduleResult.SectionSize> used = new ArrayList<>();
        beamsBySize.forEach((size, ids) -> used.add(new ScheduleResult.SectionSize(size.get(0), size.get(1), ids)));
        List<String> barNames = bars.values().stream().map(BarSize::designation).toList();
        return new ScheduleResult(
                in,
                beams,
                used,
                barNames,
                total,
                formworkSets,
                unconstrained,
                proof,
                curve,
                pool.threads(),
                (System.nanoTime() - started) / 1_000_000,
                ownCarbon);
    }

    /** A key that sorts bar sizes by diameter. */
    private static String byDiameter(BarSize b) {
        return String.format(Locale.ROOT, "%09.3f", b.diameter());
    }
}
