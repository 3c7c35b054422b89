package barfit.cli;

import barfit.bench.SectionBench;
import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

@Command(
        name = "bench",
        mixinStandardHelpOptions = true,
        description = "Time a whole ./barfit design of the three-beam example (child processes of the launcher), "
                + "then the optimizer against plain enumeration on fixed, seeded instances in this process; "
                + "prints a table and ends with one JSON line of figures.")
final class BenchCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Option(
            names = "--instances",
            defaultValue = "40",
            description = "single sections to time (default: ${DEFAULT-VALUE})")
    int instances;

    @Option(
            names = "--exhaustive-every",
            defaultValue = "4",
            description = "run the exhaustive enumeration on every k-th instance (default: ${DEFAULT-VALUE})")
    int every;

    @Option(names = "--seed", defaultValue = "2026", description = "instance seed (default: ${DEFAULT-VALUE})")
    long seed;

    @Option(
            names = "--beams",
            defaultValue = "20",
            description = "whole spans to time (default: ${DEFAULT-VALUE}; 0 skips)")
    int beams;

    @Option(
            names = "--beams-compared",
            defaultValue = "12",
            description = "whole spans also enumerated exhaustively on a reduced space (default: ${DEFAULT-VALUE})")
    int beamsCompared;

    @Option(
            names = "--frontier",
            paramLabel = "N",
            description = "time instead the cost-carbon frontier of N invented beams on the default space")
    Integer frontier;

    @Option(
            names = "--schedule-frontier",
            paramLabel = "N",
            description = "time instead the cost-carbon frontier of an invented schedule of N whole spans: its two "
                    + "ends and at most five schedules between them")
    Integer scheduleFrontier;

    @Option(names = "--schedule", description = "time whole schedules instead: designed beam by beam, and rationalised")
    boolean schedule;

    @Option(
            names = "--every-beam",
            description = "with --schedule: design every beam anew, repeats too (beams the same but for their marks "
                    + "otherwise share one design), to time the search over the whole schedule")
    boolean everyBeam;

    @Option(
            names = "--schedule-beams",
            defaultValue = "1000",
            description = "beams of the schedule designed without rationalisation (default: ${DEFAULT-VALUE})")
    int scheduleBeams;

    @Option(
            names = "--rationalised-beams",
            defaultValue = "300",
            description = "beams of the rationalised schedule (default: ${DEFAULT-VALUE})")
    int rationalisedBeams;

    @Option(
            names = "--max-section-sizes",
            defaultValue = "6",
            description = "K of the rationalised schedule (default: ${DEFAULT-VALUE})")
    int k;

    @Option(
            names = "--max-bar-sizes",
            defaultValue = "3",
            description = "M of the rationalised schedule (default: ${DEFAULT-VALUE})")
    int m;

    @Option(
            names = "--startup-runs",
            paramLabel = "N",
            defaultValue = "7",
            description = "whole runs of ./barfit design on the three-beam example whose median start-to-exit time "
                    + "is given first (default: ${DEFAULT-VALUE}; 0 skips)")
    int startupRuns;

    @Option(names = "--threads", paramLabel = "N", description = "threads for schedules (default: the cores)")
    Integer threads;

    @Option(
            names = "--library",
            paramLabel = "DIR",
            description = "time the library example as lines against the same spans as a CSV schedule (DIR holds "
                    + "library-lines-si.yaml, library-si.yaml and library-beams.csv: examples/schedule)")
    java.nio.file.Path library;

    @Option(
            names = "--runs",
            paramLabel = "N",
            defaultValue = "3",
            description = "runs of each form for --library (default: ${DEFAULT-VALUE})")
    int runs;

    @Option(
            names = "--make-schedule",
            paramLabel = "N",
            description = "write an invented schedule of N beams (settings.yaml and beams.csv) into --out and stop")
    Integer make;

    @Option(
            names = "--out",
            paramLabel = "DIR",
            description = "where --make-schedule writes (must not hold those files)")
    java.nio.file.Path outDir;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        if (make != null) {
            return makeSchedule(out);
        }
        if (library != null) {
            int t = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
            String[][] commands = barfit.bench.LibraryBench.commands(library, t);
            if (commands == null) {
                spec.commandLine()
                        .getErr()
                        .println("barfit bench --library: " + library + " does not hold "
                                + "library-lines-si.yaml, library-si.yaml and library-beams.csv");
                return Main.BAD_INPUT;
            }
            out.println("barfit bench --library: the library example as lines and as a CSV schedule, alternately, " + t
                    + " threads, median of " + runs);
            var f = barfit.bench.LibraryBench.run(commands, Math.max(1, runs));
            out.printf(
                    Locale.ROOT,
                    "as lines %.2f s (CPU %.2f s), as a CSV schedule %.2f s (CPU %.2f s): ratio %.2f, "
                            + "CPU ratio %.2f (at most 1 is the target)%n",
                    f.linesSeconds(),
                    f.linesCpuSeconds(),
                    f.csvSeconds(),
                    f.csvCpuSeconds(),
                    f.ratio(),
                    f.cpuRatio());
            out.printf(
                    Locale.ROOT,
                    "{\"library_lines_seconds\": %.3f, \"library_csv_seconds\": %.3f, "
                            + "\"library_ratio\": %.3f, \"library_cpu_ratio\": %.3f}%n",
                    f.linesSeconds(),
                    f.csvSeconds(),
                    f.ratio(),
                    f.cpuRatio());
            return Main.OK;
        }
        if (scheduleFrontier != null) {
            if (scheduleFrontier < 1 || scheduleFrontier > 20_000) {
                throw OptionError.of("--schedule-frontier", "expected 1 to 20000 beams, got " + scheduleFrontier);
            }
            int t = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
            out.println("barfit bench --schedule-frontier: an invented schedule (seed " + seed + "), " + t
                    + " threads, 1 CP-SAT worker per solve");
            var f = barfit.bench.FrontierBench.schedule(scheduleFrontier, seed, t, out);
            out.printf(
                    Locale.ROOT,
                    "{\"schedule_frontier_beams\": %d, \"threads\": %d, \"schedule_frontier_seconds\": %.3f, "
                            + "\"schedule_frontier_points\": %d, \"schedule_frontier_solves\": %d}%n",
                    f.beams(),
                    f.threads(),
                    f.seconds(),
                    f.points(),
                    f.solves());
            out.flush();
            return Main.OK;
        }
        if (frontier != null) {
            if (frontier < 1 || frontier > 10_000) {
                throw OptionError.of("--frontier", "expected 1 to 10000 beams, got " + frontier);
            }
            out.println("barfit bench --frontier: invented sections (seed " + seed + "), default space and carbon "
                    + "factors, 1 CP-SAT worker per solve");
            var f = barfit.bench.FrontierBench.run(frontier, seed, out);
            out.printf(
                    Locale.ROOT,
                    "{\"frontier_beams\": %d, \"frontier_ms_median\": %.1f, \"frontier_ms_max\": %.1f, "
                            + "\"points_mean\": %.2f, \"solves_mean\": %.2f, \"span_frontier_ms_median\": %.1f, "
                            + "\"span_frontier_ms_max\": %.1f, \"span_points_mean\": %.2f}%n",
                    f.beams(),
                    f.msMedian(),
                    f.msMax(),
                    f.pointsMean(),
                    f.solvesMean(),
                    f.spanMsMedian(),
                    f.spanMsMax(),
                    f.spanPointsMean());
            out.flush();
            return Main.OK;
        }
        if (schedule) {
            if (scheduleBeams < 1 || rationalisedBeams < 1) {
                boolean plain = scheduleBeams < 1;
                throw OptionError.of(
                        plain ? "--schedule-beams" : "--rationalised-beams",
                        "expected at least 1 beam, got " + (plain ? scheduleBeams : rationalisedBeams));
            }
            int t = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
            out.println("barfit bench --schedule: invented schedules (seed " + seed + "), " + t + " threads, 1 CP-SAT "
                    + "worker per solve");
            var f = barfit.bench.ScheduleBench.run(scheduleBeams, rationalisedBeams, k, m, seed, t, everyBeam, out);
            out.printf(
                    Locale.ROOT,
                    "{\"schedule_beams\": %d, \"schedule_seconds\": %.3f, \"rationalised_beams\": %d, "
                            + "\"k\": %d, \"m\": %d, \"proven_seconds\": %.3f, \"rationalised_seconds\": %.3f, \"status\": \"%s\", \"gap\": %.6f, "
                            + "\"peak_heap_mb\": %.0f, \"peak_live_heap_mb\": %.0f, \"threads\": %d, "
                            + "\"schedule_write_seconds\": %.3f, \"schedule_cpu_ratio\": %.2f}%n",
                    f.beams(),
                    f.seconds(),
                    f.rationalisedBeams(),
                    f.k(),
                    f.m(),
                    f.provenSeconds(),
                    f.rationalisedSeconds(),
                    f.status(),
                    f.gap(),
                    f.peakHeapMb(),
                    f.peakLiveMb(),
                    f.threads(),
                    f.writeSeconds(),
                    f.cpuRatio());
            out.flush();
            return Main.OK;
        }
        if (instances < 1) {
            throw OptionError.of("--instances", "expected at least 1 single section to time, got " + instances);
        }
        if (beams < 0) {
            throw OptionError.of("--beams", "expected 0 (skip the spans) or more whole spans to time, got " + beams);
        }
        if (startupRuns < 0 || startupRuns > 100) {
            throw OptionError.of(
                    "--startup-runs", "expected 0 (skip the start-up figure) to 100 runs, got " + startupRuns);
        }
        String startupJson = startup(out);
        out.println("barfit bench: single sections, default search space, 1 CP-SAT worker, seed " + seed);
        var f = SectionBench.run(instances, Math.max(1, every), seed, out);
        out.printf(
                Locale.ROOT,
                "optimizer median %.2f ms (max %.2f ms); exhaustive median %.0f ms over %d layouts "
                        + "checked; speedup %.0fx; equal optimum: %s%n",
                f.optimizerMsMedian(),
                f.optimizerMsMax(),
                f.exhaustiveMsMedian(),
                f.layoutsChecked(),
                f.speedup(),
                f.equalOptimum());
        boolean equal = f.equalOptimum();
        String beamJson = "";
        if (beams > 0) {
            out.println();
            out.println("whole spans (two supports, mid-span, shear, service loads), default search space:");
            var b = barfit.bench.SpanBench.run(beams, Math.max(0, beamsCompared), seed, out);
            out.printf(
                    Locale.ROOT,
                    "spans: optimizer median %.2f ms (max %.2f ms) on the default space; on the reduced "
                            + "space median %.2f ms against exhaustive %.0f ms: speedup %.0fx; equal optimum: %s%n",
                    b.optimizerMsMedian(),
                    b.optimizerMsMax(),
                    b.reducedOptimizerMsMedian(),
                    b.exhaustiveMsMedian(),
                    b.speedup(),
                    b.equalOptimum());
            equal &= b.equalOptimum();
            beamJson = String.format(
                    Locale.ROOT,
                    ", \"spans\": %d, \"span_optimizer_ms_median\": %.3f, "
                            + "\"span_reduced_optimizer_ms_median\": %s, \"span_exhaustive_ms_median\": %s, "
                            + "\"span_speedup\": %s, \"span_equal_optimum\": %s",
                    b.instances(),
                    b.optimizerMsMedian(),
                    json(b.reducedOptimizerMsMedian(), 3),
                    json(b.exhaustiveMsMedian(), 1),
                    json(b.speedup(), 1),
                    b.equalOptimum());
        }
        out.println();
        var la = barfit.bench.LineBench.run(200);
        out.printf(
                Locale.ROOT,
                "line analysis (six spans on columns, an overhang, %d arrangements, %d stations): "
                        + "median %.3f ms (max %.3f ms; CPU %.3f ms) over %d runs%n",
                la.arrangements(),
                la.stations(),
                la.msMedian(),
                la.msMax(),
                la.cpuMsMedian(),
                la.runs());
        beamJson += String.format(
                Locale.ROOT,
                ", \"line_analysis_ms_median\": %.3f, \"line_analysis_cpu_ms_median\": %.3f",
                la.msMedian(),
                la.cpuMsMedian());
        var l0 = barfit.bench.LineDesignBench.run(5, "0");
        out.printf(
                Locale.ROOT,
                "line design (four spans on columns, one section, default space, no redistribution): "
                        + "median %.0f ms (max %.0f ms; CPU %.0f ms) over %d runs; cost %.2f; every part optimal: %s%n",
                l0.msMedian(),
                l0.msMax(),
                l0.cpuMsMedian(),
                l0.runs(),
                l0.cost(),
                l0.optimal());
        beamJson += String.format(Locale.ROOT, ", \"line_design_no_redistribution_ms_median\": %.1f", l0.msMedian());
        var ld = barfit.bench.LineDesignBench.run(5, "20");
        out.printf(
                Locale.ROOT,
                "line design (the same, redistribution chosen at each support, 0 to 20 %%): "
                        + "median %.0f ms (max %.0f ms; CPU %.0f ms) over %d runs; cost %.2f; every part optimal: %s%n",
                ld.msMedian(),
                ld.msMax(),
                ld.cpuMsMedian(),
                ld.runs(),
                ld.cost(),
                ld.optimal());
        beamJson += String.format(
                Locale.ROOT,
                ", \"line_design_ms_median\": %.1f, \"line_design_cpu_ms_median\": %.1f",
                ld.msMedian(),
                ld.cpuMsMedian());
        out.printf(
                Locale.ROOT,
                "{\"instances\": %d, \"optimizer_ms_median\": %.3f, \"exhaustive_ms_median\": %s, "
                        + "\"speedup\": %s, \"equal_optimum\": %s%s%s}%n",
                f.instances(),
                f.optimizerMsMedian(),
                json(f.exhaustiveMsMedian(), 1),
                json(f.speedup(), 1),
                f.equalOptimum(),
                beamJson,
                startupJson);
        out.flush();
        return equal ? Main.OK : Main.FAILED;
    }

    /**
     * The whole-process time of the three-beam design, through the launcher as a child process; prints
     * it (or why it was not taken) and returns its fields for the JSON line.
     */
    private String startup(PrintWriter out) {
        if (startupRuns == 0) {
            return "";
        }
        try {
            var s = barfit.bench.StartupBench.run(barfit.bench.StartupBench.launcher(), startupRuns);
            out.printf(
                    Locale.ROOT,
                    "start-up: %s, whole process from start to exit, median of %d runs (after one "
                            + "unmeasured): %.2f s (min %.2f s, max %.2f s)%n%n",
                    s.command(),
                    s.seconds().size(),
                    s.median(),
                    s.min(),
                    s.max());
            out.flush();
            return String.format(
                    Locale.ROOT,
                    ", \"startup_runs\": %d, \"startup_design_s_median\": %.3f, "
                            + "\"startup_design_s_min\": %.3f, \"startup_design_s_max\": %.3f",
                    s.seconds().size(),
                    s.median(),
                    s.min(),
                    s.max());
        } catch (barfit.bench.StartupBench.NotMeasured e) {
            out.println("start-up: not measured (" + e.getMessage() + ")");
            out.println();
            out.flush();
            return ", \"startup_runs\": 0, \"startup_design_s_median\": null";
        }
    }

    /** A figure for the JSON line, or null when there is none (JSON has no NaN). */
    static String json(double v, int decimals) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%." + decimals + "f", v) : "null";
    }

    private int makeSchedule(PrintWriter out) {
        if (make < 1 || make > 100_000) {
            throw OptionError.of("--make-schedule", "expected 1 to 100000 beams, got " + make);
        }
        if (outDir == null) {
            throw OptionError.of("--out", "--make-schedule needs --out DIR");
        }
        for (String name : new String[] {"settings.yaml", "beams.csv"}) {
            if (java.nio.file.Files.exists(outDir.resolve(name))) {
                throw new barfit.catalogs.InputError(
                        barfit.catalogs.yaml.Location.ofFile(
                                outDir.resolve(name).toString()),
                        "already exists; expected a directory without settings.yaml and beams.csv");
            }
        }
        barfit.bench.ScheduleBench.write(outDir, make, seed, null);
        out.println("wrote " + outDir.resolve("settings.yaml") + " and " + outDir.resolve("beams.csv") + " (" + make
                + " invented beams, seed " + seed + ")");
        out.flush();
        return Main.OK;
    }
}
