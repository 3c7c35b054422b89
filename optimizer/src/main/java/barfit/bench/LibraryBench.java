package barfit.bench;

import barfit.cli.Main;
import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;

/**
 * Times the library example both ways in one process, alternately so that a busy machine slows both
 * alike: as lines (analysis, span-by-span design, re-analysis, rationalisation) and as the schedule of
 * the same spans with their moments typed in (the CSV). The figures are whole {@code schedule} commands,
 * output discarded; the ratio is what holds from machine to machine.
 */
public final class LibraryBench {
    /**
     * Median wall seconds and process CPU seconds (every thread, what a busy machine does not inflate) of
     * each form, and the runs.
     */
    public record Figures(
            int runs, double linesSeconds, double csvSeconds, double linesCpuSeconds, double csvCpuSeconds) {
        public double ratio() {
            return linesSeconds / csvSeconds;
        }

        public double cpuRatio() {
            return linesCpuSeconds / csvCpuSeconds;
        }
    }

    private LibraryBench() {}

    /** The example's files under {@code dir}, or null when one is missing. */
    public static String[][] commands(Path dir, int threads) {
        Path lines = dir.resolve("library-lines-si.yaml");
        Path settings = dir.resolve("library-si.yaml");
        Path csv = dir.resolve("library-beams.csv");
        if (!Files.isRegularFile(lines) || !Files.isRegularFile(settings) || !Files.isRegularFile(csv)) {
            return null;
        }
        String t = String.valueOf(threads);
        return new String[][] {
            {"schedule", lines.toString(), "--quiet", "--threads", t},
            {"schedule", settings.toString(), "--beams", csv.toString(), "--quiet", "--threads", t}
        };
    }

    public static Figures run(String[][] commands, int runs) {
        PrintStream none = new PrintStream(OutputStream.nullOutputStream(), true, StandardCharsets.UTF_8);
        // one of each first: the JIT, the native library and the catalogs
        Main.run(commands[0], none, none);
        Main.run(commands[1], none, none);
        double[] lines = new double[runs];
        double[] csv = new double[runs];
        double[] linesCpu = new double[runs];
        double[] csvCpu = new double[runs];
        for (int i = 0; i < runs; i++) {
            long c0 = processCpu();
            long t0 = System.nanoTime();
            check(Main.run(commands[0], none, none), commands[0]);
            lines[i] = (System.nanoTime() - t0) / 1e9;
            long c1 = processCpu();
            linesCpu[i] = (c1 - c0) / 1e9;
            t0 = System.nanoTime();
            check(Main.run(commands[1], none, none), commands[1]);
            csv[i] = (System.nanoTime() - t0) / 1e9;
            csvCpu[i] = (processCpu() - c1) / 1e9;
        }
        Arrays.sort(lines);
        Arrays.sort(csv);
        Arrays.sort(linesCpu);
        Arrays.sort(csvCpu);
        return new Figures(runs, lines[runs / 2], csv[runs / 2], linesCpu[runs / 2], csvCpu[runs / 2]);
    }

    /** CPU time of the whole process so far, ns (every thread, the solver's included). */
    private static long processCpu() {
        var os = java.lang.management.ManagementFactory.getOperatingSystemMXBean();
        if (os instanceof com.sun.management.OperatingSystemMXBean sun) {
            return sun.getProcessCpuTime();
        }
        return 0;
    }

    private static void check(int code, String[] command) {
        if (code != Main.OK) {
            throw new IllegalStateException(
                    "the bench's schedule " + String.join(" ", command) + " ended with " + code);
        }
    }
}
