package barfit.schedule;

import barfit.catalogs.BarSize;
import barfit.design.CostModel;
import barfit.design.Proof;
import barfit.design.SolverOptions;
import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanProblem;
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
    /** Whether beams the same but for their marks share one design (see {@link #ownDesigns}). */
    private final boolean shareRepeats;

    public ScheduleSolver(CostModel cost, SolverOptions options, int threads, Progress progress) {
        this(cost, options, threads, progress, true);
    }

    private ScheduleSolver(CostModel cost, SolverOptions options, int threads, Progress progress, boolean share) {
        this.cost = cost;
        this.options = options;
        this.progress = progress;
        this.pool = new Parallel(threads, progress);
        this.shareRepeats = share;
    }

    /** The same solver designing every beam anew, repeats too: the same answer, for timing the search alone. */
    public ScheduleSolver designingEveryBeam() {
        return new ScheduleSolver(cost, options, pool.threads(), progress, false);
    }

    /** How many designs a schedule's own optima take: one per beam the same but for its mark (lines' spans aside). */
    public static int distinctBeams(ScheduleInput in) {
        int[] first = Repeats.firstOf(undesigned(in.beams()));
        int n = 0;
        for (int i = 0; i < first.length; i++) {
            n += first[i] == i ? 1 : 0;
        }
        return n;
    }

    /** Each beam's span, null for a line's (designed with its line already). */
    private static List<SpanProblem> undesigned(List<ScheduleBeam> beams) {
        List<SpanProblem> out = new ArrayList<>();
        for (ScheduleBeam b : beams) {
            out.add(b.designed() == null ? b.problem() : null);
        }
        return out;
    }

    public ScheduleResult solve(ScheduleInput in) {
        long started = System.nanoTime();
        List<ScheduleBeam> beams = in.beams();
        SpanDesigner designer = new SpanDesigner(cost, options);
        List<SpanDesigner.Outcome> own = ownDesigns(beams, designer);
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

    /**
     * Each beam's own proven optimum (or the one its line gave it). Beams the same but for their marks, as a
     * typical floor's are, are designed once: the search is deterministic, so each gets the very outcome its
     * own design would give, under its own mark.
     */
    private List<SpanDesigner.Outcome> ownDesigns(List<ScheduleBeam> beams, SpanDesigner designer) {
        List<SpanProblem> spans = undesigned(beams);
        int[] first = shareRepeats ? Repeats.firstOf(spans) : null;
        List<Integer> toDesign = new ArrayList<>();
        for (int i = 0; i < spans.size(); i++) {
            if (spans.get(i) != null && (first == null || first[i] == i)) {
                toDesign.add(i);
            }
        }
        List<SpanDesigner.Outcome> designed = pool.map(
                toDesign.size(),
                Progress.Phase.of(Progress.Step.DESIGNING_BEAMS),
                j -> designer.design(spans.get(toDesign.get(j)), 0));
        SpanDesigner.Outcome[] byBeam = new SpanDesigner.Outcome[beams.size()];
        for (int j = 0; j < toDesign.size(); j++) {
            byBeam[toDesign.get(j)] = designed.get(j);
        }
        List<SpanDesigner.Outcome> own = new ArrayList<>();
        for (int i = 0; i < beams.size(); i++) {
            ScheduleBeam b = beams.get(i);
            own.add(spans.get(i) == null ? b.designed() : byBeam[first == null ? i : first[i]].forSpan(b.problem()));
        }
        return own;
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
