package barfit.bench;

import barfit.design.CarbonFactors;
import barfit.design.CostModel;
import barfit.design.CostRates;
import barfit.design.SolverOptions;
import barfit.design.section.SectionFrontier;
import barfit.design.section.SectionProblem;
import barfit.section.CodeEquations;
import java.io.PrintWriter;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * Times one beam's cost-carbon frontier on the default search space: the invented sections of
 * {@link SectionBench} with the invented rates and the default carbon factors at 28 MPa.
 */
public final class FrontierBench {
    /** The median and largest time of a beam's frontier, and the points and proven designs on average. */
    public record Figures(
            int beams,
            double msMedian,
            double msMax,
            double pointsMean,
            double solvesMean,
            double spanMsMedian,
            double spanMsMax,
            double spanPointsMean) {}

    private FrontierBench() {}

    public static Figures run(int n, long seed, PrintWriter out) {
        CostModel model =
                new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI).withCarbon(CarbonFactors.defaults(28));
        SolverOptions options = new SolverOptions(60, 1, 1);
        // warm up the JIT and the native library on instances outside the measured set
        for (SectionProblem p : SectionBench.instances(10, seed + 1)) {
            SectionFrontier.of(p, model, options);
        }
        List<SectionProblem> problems = SectionBench.instances(n, seed);
        double[] ms = new double[n];
        double points = 0;
        double solves = 0;
        out.printf(Locale.ROOT, "%-5s %10s %7s %7s%n", "beam", "frontier", "points", "solves");
        for (int i = 0; i < n; i++) {
            SectionFrontier.Result r = SectionFrontier.of(problems.get(i), model, options);
            ms[i] = r.nanos() / 1e6;
            points += r.points().size();
            solves += r.solves();
            out.printf(
                    Locale.ROOT,
                    "%-5s %7.0f ms %7d %7d%n",
                    problems.get(i).id(),
                    ms[i],
                    r.points().size(),
                    r.solves());
        }
        double[] sorted = ms.clone();
        Arrays.sort(sorted);
        // whole spans on the default space: the supported points by weighted sums
        out.printf(Locale.ROOT, "%-5s %10s %7s %7s%n", "span", "frontier", "points", "solves");
        double[] spanMs = new double[n];
        double spanPoints = 0;
        List<barfit.design.span.SpanProblem> spans = SpanBench.instances(n, seed, SectionBench.defaultSpace());
        barfit.design.span.SpanFrontier.of(
                SpanBench.instances(1, seed + 1, SectionBench.defaultSpace()).get(0), model, options);
        for (int i = 0; i < n; i++) {
            var r = barfit.design.span.SpanFrontier.of(spans.get(i), model, options);
            spanMs[i] = r.nanos() / 1e6;
            spanPoints += r.points().size();
            out.printf(
                    Locale.ROOT,
                    "%-5s %7.0f ms %7d %7d%n",
                    spans.get(i).id(),
                    spanMs[i],
                    r.points().size(),
                    r.solves());
        }
        Arrays.sort(spanMs);
        return new Figures(
                n, sorted[n / 2], sorted[n - 1], points / n, solves / n, spanMs[n / 2], spanMs[n - 1], spanPoints / n);
    }

    /** A schedule's frontier: its size, the seconds for its two ends and the points between, and its points. */
    public record ScheduleFigures(int beams, int threads, double seconds, int points, int solves) {}

    /**
     * Times the frontier of an invented schedule of {@code beams} whole spans ({@link ScheduleGenerator}, no
     * rationalise:), written to files and read back as a user's would be: its two ends and at most five
     * schedules between them, the beams {@code threads} at a time.
     */
    public static ScheduleFigures schedule(int beams, long seed, int threads, PrintWriter out) {
        java.nio.file.Path dir = null;
        try {
            dir = java.nio.file.Files.createTempDirectory("barfit-frontier-bench");
            ScheduleBench.write(dir, beams, seed, null);
            java.nio.file.Path settings = dir.resolve("settings.yaml");
            java.nio.file.Path csv = dir.resolve("beams.csv");
            SolverOptions options = new SolverOptions(60, 1, 1);
            long t0 = System.nanoTime();
            barfit.schedule.ScheduleFrontier.Result r = barfit.schedule.ScheduleFrontier.of(
                    pricing -> barfit.schedule.ScheduleInputReader.read(settings, csv, options, threads, pricing),
                    options,
                    threads,
                    barfit.schedule.Progress.NONE,
                    5);
            double seconds = (System.nanoTime() - t0) / 1e9;
            for (var pt : r.points()) {
                out.printf(
                        Locale.ROOT,
                        "  cost %12.2f   carbon %12.1f kg%n",
                        CostModel.currency(pt.cost()),
                        CostModel.currency(pt.carbon()));
            }
            return new ScheduleFigures(beams, threads, seconds, r.points().size(), r.solves());
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        } finally {
            ScheduleBench.deleteDir(dir);
        }
    }
}
