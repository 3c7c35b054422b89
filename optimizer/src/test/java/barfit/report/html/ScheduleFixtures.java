package barfit.report.html;

import barfit.design.CostModel;
import barfit.design.Proof;
import barfit.design.SolverOptions;
import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanLayout;
import barfit.input.DesignBeam;
import barfit.input.DesignInput;
import barfit.input.DesignInputReader;
import barfit.schedule.ScheduleBeam;
import barfit.schedule.ScheduleInput;
import barfit.schedule.ScheduleResult;
import barfit.schedule.Spans;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

/**
 * Real schedules for the report tests: every whole span of an example file designed by the beam designer,
 * wrapped in a {@link ScheduleResult} as an unrationalised schedule would be (each beam at its own
 * optimum, no formwork sets). {@link #withRenderingFixtures} adds a proof and a price of standardisation
 * that are rendering fixtures only, not results of any computation.
 */
final class ScheduleFixtures {
    /** The examples directory, seen from the optimizer module where its tests run. */
    static final Path EXAMPLES = Path.of("..", "examples", "design");

    private static final Map<String, ScheduleResult> CACHE = new LinkedHashMap<>();

    private ScheduleFixtures() {}

    static synchronized ScheduleResult designed(String exampleFile) {
        return CACHE.computeIfAbsent(exampleFile, f -> design(EXAMPLES.resolve(f)));
    }

    /** The same for any design file (a test resource). */
    static synchronized ScheduleResult designed(Path file) {
        return CACHE.computeIfAbsent(file.toString(), f -> design(file));
    }

    private static ScheduleResult design(Path file) {
        DesignInput in = DesignInputReader.read(file);
        List<ScheduleBeam> beams = new ArrayList<>();
        for (DesignBeam b : in.beams()) {
            if (b.isWhole()) {
                beams.add(new ScheduleBeam(b.id(), null, b.location(), Spans.problem(in, b)));
            }
        }
        ScheduleInput input = new ScheduleInput(
                List.of(file.getFileName().toString()),
                in.settings(),
                in.space(),
                in.rates(),
                in.currency(),
                in.costs(),
                in.maxBarSizesPerBeam(),
                in.barsPerTwoLegs(),
                beams,
                null);
        SpanDesigner designer = new SpanDesigner(
                new CostModel(
                        in.rates(),
                        in.settings().detailing().cover(),
                        in.settings().units().code()),
                new SolverOptions(60, 1, 1));
        List<ScheduleResult.Beam> out = new ArrayList<>();
        Map<String, List<String>> sizes = new LinkedHashMap<>();
        TreeSet<String> bars = new TreeSet<>();
        double total = 0;
        for (ScheduleBeam b : beams) {
            SpanDesigner.Outcome o = designer.design(b.problem(), 0);
            double cost = o.feasible() ? o.best().cost().total() : Double.NaN;
            out.add(new ScheduleResult.Beam(b, o, cost));
            if (o.feasible()) {
                SpanLayout l = o.best().layout();
                total += cost;
                sizes.computeIfAbsent(l.width() + "x" + l.height(), k -> new ArrayList<>())
                        .add(b.id());
                bars.add(l.bottom().label());
                bars.add(l.top().label());
            }
        }
        List<ScheduleResult.SectionSize> sectionSizes = new ArrayList<>();
        for (var e : sizes.entrySet()) {
            String[] bh = e.getKey().split("x");
            sectionSizes.add(
                    new ScheduleResult.SectionSize(Double.parseDouble(bh[0]), Double.parseDouble(bh[1]), e.getValue()));
        }
        return new ScheduleResult(
                input, out, sectionSizes, List.copyOf(bars), total, 0, total, null, List.of(), 1, 0, Double.NaN);
    }

    /**
     * The same schedule with a proof and a price-of-standardisation table filled in for rendering only:
     * the numbers are placeholders, not engineering or solver results.
     */
    static ScheduleResult withRenderingFixtures(ScheduleResult r) {
        double t = r.totalCost();
        Proof<ScheduleResult.Search> proof = new Proof<>(
                Proof.Status.OPTIMAL,
                t,
                t,
                0,
                Proof.SolverStats.NONE,
                new ScheduleResult.Search(barfit.schedule.ProofMethod.LINEAR_RELAXATION_INTEGRAL, null, 4, 3, 1, 9, 0),
                1,
                1);
        List<ScheduleResult.StandardisationPoint> points = List.of(
                new ScheduleResult.StandardisationPoint(1, t * 1.08, Proof.Status.OPTIMAL, r.barSizes()),
                new ScheduleResult.StandardisationPoint(2, t * 1.02, Proof.Status.OPTIMAL, r.barSizes()),
                new ScheduleResult.StandardisationPoint(3, t, Proof.Status.OPTIMAL, r.barSizes()));
        return new ScheduleResult(
                r.input(),
                r.beams(),
                r.sizes(),
                r.barSizes(),
                r.beamsCost(),
                r.formworkSetsCost(),
                r.unconstrainedCost(),
                proof,
                points,
                r.threads(),
                r.millis(),
                r.unconstrainedCarbon());
    }
}
