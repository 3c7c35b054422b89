package barfit.bench;

import barfit.design.CostModel;
import barfit.design.SolverOptions;
import barfit.schedule.ScheduleInput;
import barfit.schedule.ScheduleInputReader;
import barfit.schedule.ScheduleResult;
import barfit.schedule.ScheduleSolver;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.Locale;

/**
 * Whole schedules from {@link ScheduleGenerator}, written to files and read back as a user's would be:
 * one without rationalisation, one rationalised to K section sizes and M bar sizes. Prints wall time,
 * the proof and the peak heap.
 */
public final class ScheduleBench {
    public record Figures(
            int beams,
            double seconds,
            int rationalisedBeams,
            int k,
            int m,
            double provenSeconds,
            double rationalisedSeconds,
            String status,
            double gap,
            double peakHeapMb,
            double peakLiveMb,
            int threads,
            double cpuSeconds,
            double writeSeconds) {
        /** CPU time over wall time of the schedule, designed and its files rendered: 2 is both cores busy. */
        public double cpuRatio() {
            return cpuSeconds / (seconds + writeSeconds);
        }
    }

    /** The largest schedule whose files the bench renders after designing it. */
    static final int MOST_BEAMS_RENDERED = 2000;

    /** The most heap still in use just after any collection: what the run really holds, garbage aside. */
    private static final class LiveHeap implements javax.management.NotificationListener {
        private volatile long peak;

        void watch() {
            for (var gc : ManagementFactory.getGarbageCollectorMXBeans()) {
                if (gc instanceof javax.management.NotificationEmitter e) {
                    e.addNotificationListener(this, null, null);
                }
            }
        }

        void unwatch() {
            for (var gc : ManagementFactory.getGarbageCollectorMXBeans()) {
                if (gc instanceof javax.management.NotificationEmitter e) {
                    try {
                        e.removeNotificationListener(this);
                    } catch (javax.management.ListenerNotFoundException ignored) {
                        // not registered on this collector
                    }
                }
            }
        }

        @Override
        public void handleNotification(javax.management.Notification n, Object handback) {
            if (!n.getType()
                    .equals(com.sun.management.GarbageCollectionNotificationInfo.GARBAGE_COLLECTION_NOTIFICATION)) {
                return;
            }
            var info = com.sun.management.GarbageCollectionNotificationInfo.from(
                    (javax.management.openmbean.CompositeData) n.getUserData());
            long used = 0;
            for (var e : info.getGcInfo().getMemoryUsageAfterGc().entrySet()) {
                used += e.getValue().getUsed();
            }
            peak = Math.max(peak, used);
        }
    }

    private ScheduleBench() {}

    /** Writes an invented schedule: {@code settings.yaml} and {@code beams.csv} in {@code dir}. */
    public static void write(Path dir, int beams, long seed, String rationalise) {
        try {
            Files.createDirectories(dir);
            Files.writeString(
                    dir.resolve("settings.yaml"),
                    ScheduleGenerator.settings("Invented schedule of " + beams + " beams, seed " + seed, rationalise));
            Files.writeString(dir.resolve("beams.csv"), ScheduleGenerator.csv(beams, seed));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * The schedules timed. {@code everyBeam}: design every beam of the schedule without rationalisation anew,
     * repeats too, as schedules were designed before beams the same but for their marks shared one design.
     */
    public static Figures run(
            int beams, int ratBeams, int k, int m, long seed, int threads, boolean everyBeam, PrintWriter out) {
        Path dir;
        try {
            dir = Files.createTempDirectory("barfit-schedule-bench");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        LiveHeap live = new LiveHeap();
        live.watch();
        try {
            resetPeaks();
            // warm-up on a small schedule so the figures are of compiled code
            solve(dir.resolve("warm"), 30, seed + 99, null, threads, everyBeam, barfit.schedule.Progress.NONE);
            write(dir.resolve("plain"), beams, seed, null);
            long cpu0 = processCpuNanos();
            long t0 = System.nanoTime();
            ScheduleResult plain =
                    solve(dir.resolve("plain"), beams, seed, null, threads, everyBeam, barfit.schedule.Progress.NONE);
            double plainS = (System.nanoTime() - t0) / 1e9;
            // the files the command writes, rendered as it renders them (not written to disk); the report of a
            // very large schedule (about 60 MB of text per 1,000 beams) is left out to keep the heap figures
            // of the design
            long w0 = System.nanoTime();
            long chars = 0;
            if (beams <= MOST_BEAMS_RENDERED) {
                for (String text : barfit.report.ScheduleFiles.render(plain).values()) {
                    chars += text.length();
                }
            }
            double writeS = (System.nanoTime() - w0) / 1e9;
            double cpuS = (processCpuNanos() - cpu0) / 1e9;
            long feasible =
                    plain.beams().stream().filter(ScheduleResult.Beam::feasible).count();
            out.printf(
                    Locale.ROOT,
                    "%d beams, each its own optimum, %d threads, %s: %.2f s wall (%.1f ms a beam); "
                            + "%d with a design; total %.0f%n",
                    beams,
                    threads,
                    everyBeam
                            ? "every beam designed anew"
                            : ScheduleSolver.distinctBeams(plain.input()) + " distinct designed, repeats sharing them",
                    plainS,
                    1000 * plainS / beams,
                    feasible,
                    plain.totalCost());
            out.printf(
                    Locale.ROOT,
                    "  %s; CPU %.2f s over %.2f s wall, %.2f cores busy%n",
                    beams <= MOST_BEAMS_RENDERED
                            ? String.format(
                                    Locale.ROOT,
                                    "its files (schedule.csv, bending-schedule.csv, schedule.json, report.html: %.1f MB "
                                            + "of text) rendered in %.2f s",
                                    chars / 1048576.0,
                                    writeS)
                            : "its files not rendered (over " + MOST_BEAMS_RENDERED + " beams)",
                    cpuS,
                    plainS + writeS,
                    cpuS / (plainS + writeS));
            String rationalise = "rationalise: {max_section_sizes: " + k + ", max_bar_sizes: " + m + "}\n";
            Path rdir = dir.resolve("rationalised");
            write(rdir, ratBeams, seed + 1, rationalise);
            t0 = System.nanoTime();
            PhaseClock clock = new PhaseClock();
            ScheduleResult r = solve(rdir, ratBeams, seed + 1, rationalise, threads, false, clock);
            double ratS = (System.nanoTime() - t0) / 1e9;
            double mainS = (clock.curveStart - t0) / 1e9;
            var p = r.proof();
            out.printf(
                    Locale.ROOT,
                    "%d beams rationalised to K = %d sizes, M = %d bar sizes, %d threads: proven in %.2f s "
                            + "wall, %.2f s with the price of standardisation; "
                            + "%s, objective %.2f, bound %.2f, gap %.3f %%; %d of %d bar-size sets solved, %d pruned; "
                            + "%d (beam, size) pairs priced; own optima %.2f (+%.2f %%); price of standardisation for "
                            + "K = 1..%d%n",
                    ratBeams,
                    k,
                    m,
                    threads,
                    mainS,
                    ratS,
                    p.status(),
                    p.objective(),
                    p.bound(),
                    100 * p.gap(),
                    p.search().barSetsSolved(),
                    p.search().barSetsTotal(),
                    p.search().barSetsPruned(),
                    p.search().pairsEvaluated(),
                    r.unconstrainedCost(),
                    100 * (r.totalCost() - r.unconstrainedCost()) / r.unconstrainedCost(),
                    r.standardisation().size());
            double peak = peakHeapMb();
            double liveMb = live.peak / 1048576.0;
            out.printf(
                    Locale.ROOT,
                    "heap: at most %.0f MB in use after a collection (what the runs hold); peak %.0f MB "
                            + "including garbage not yet collected (of %.0f MB allowed)%n",
                    liveMb,
                    peak,
                    Runtime.getRuntime().maxMemory() / 1048576.0);
            return new Figures(
                    beams,
                    plainS,
                    ratBeams,
                    k,
                    m,
                    mainS,
                    ratS,
                    p.status().name(),
                    p.gap(),
                    peak,
                    liveMb,
                    threads,
                    cpuS,
                    writeS);
        } finally {
            live.unwatch();
            delete(dir);
        }
    }

    /** When the price of standardisation began: the rationalised schedule itself is proven by then. */
    private static final class PhaseClock implements barfit.schedule.Progress {
        volatile long curveStart;

        @Override
        public void update(barfit.schedule.Progress.Phase phase, int done, int total) {
            if (curveStart == 0 && phase.step() == barfit.schedule.Progress.Step.STANDARDISATION) {
                curveStart = System.nanoTime();
            }
            if (curveStart == 0
                    && phase.step() == barfit.schedule.Progress.Step.BAR_SIZE_SETS
                    && phase.maxSizes() == barfit.schedule.Progress.Phase.ANY_NUMBER) {
                curveStart = System.nanoTime(); // the curve starts with the schedule without a size limit
            }
        }
    }

    private static ScheduleResult solve(
            Path dir,
            int beams,
            long seed,
            String rationalise,
            int threads,
            boolean everyBeam,
            barfit.schedule.Progress progress) {
        if (!Files.exists(dir.resolve("beams.csv"))) {
            write(dir, beams, seed, rationalise);
        }
        ScheduleInput in = ScheduleInputReader.read(dir.resolve("settings.yaml"), dir.resolve("beams.csv"));
        CostModel cost = new CostModel(
                in.rates(),
                in.settings().detailing().cover(),
                in.settings().units().code());
        ScheduleSolver solver = new ScheduleSolver(cost, new SolverOptions(60, 1, 1), threads, progress);
        return (everyBeam ? solver.designingEveryBeam() : solver).solve(in);
    }

    /** CPU time of the whole process (every thread, the collector's too), ns. */
    private static long processCpuNanos() {
        return ((com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean())
                .getProcessCpuTime();
    }

    private static void resetPeaks() {
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                pool.resetPeakUsage();
            }
        }
    }

    private static double peakHeapMb() {
        long sum = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP && pool.getPeakUsage() != null) {
                sum += pool.getPeakUsage().getUsed();
            }
        }
        return sum / 1048576.0;
    }

    /** Deletes a temporary folder and what it holds, quietly; nothing for null. */
    static void deleteDir(Path dir) {
        if (dir != null) {
            delete(dir);
        }
    }

    private static void delete(Path dir) {
        try (var s = Files.walk(dir)) {
            s.sorted(Comparator.reverseOrder()).forEach(p -> deleteQuietly(p));
        } catch (IOException e) {
            // a temporary folder left behind is harmless
        }
    }

    private static void deleteQuietly(Path p) {
        try {
            Files.deleteIfExists(p);
        } catch (IOException e) {
            // as above: what cannot be deleted is left behind
        }
    }
}
