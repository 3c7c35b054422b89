package barfit.bench;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The whole-process time of a small design, as a user sees it: the launcher started as a child process
 * on the three-beam example, from start to exit, the median of several runs after one unmeasured run
 * (which warms the file cache). Only possible through the launcher, which says where it is.
 */
public final class StartupBench {
    /** The environment variable the launcher sets to its own path. */
    public static final String LAUNCHER_ENV = "BARFIT_LAUNCHER";
    /** The design measured, relative to the launcher's folder. */
    public static final String EXAMPLE = "examples/design/clinic-beams-si.yaml";

    /** Every run's wall time in seconds, in the order run. */
    public record Figures(String command, List<Double> seconds) {
        public double median() {
            return SectionBench.median(
                    seconds.stream().mapToDouble(Double::doubleValue).toArray());
        }

        public double min() {
            return seconds.stream().mapToDouble(Double::doubleValue).min().orElse(Double.NaN);
        }

        public double max() {
            return seconds.stream().mapToDouble(Double::doubleValue).max().orElse(Double.NaN);
        }
    }

    /** Why the figure could not be taken, when it could not. */
    public static final class NotMeasured extends Exception {
        private static final long serialVersionUID = 1L;

        public NotMeasured(String why) {
            super(why);
        }
    }

    private StartupBench() {}

    /** The launcher named by {@value #LAUNCHER_ENV}, or why there is none. */
    public static Path launcher() throws NotMeasured {
        String l = System.getenv(LAUNCHER_ENV);
        if (l == null || l.isBlank()) {
            throw new NotMeasured("not run through the ./barfit launcher");
        }
        Path p = Path.of(l);
        if (!Files.isExecutable(p)) {
            throw new NotMeasured("the launcher " + p + " is not an executable file");
        }
        return p;
    }

    /** Runs {@code launcher design EXAMPLE} once unmeasured, then {@code runs} times, each to its exit. */
    public static Figures run(Path launcher, int runs) throws NotMeasured {
        Path folder = launcher.toAbsolutePath().getParent();
        Path example = folder == null ? null : folder.resolve(EXAMPLE);
        if (example == null || !Files.isRegularFile(example)) {
            throw new NotMeasured(EXAMPLE + " is not beside the launcher");
        }
        List<String> command = List.of(launcher.toString(), "design", example.toString());
        once(command);
        List<Double> seconds = new ArrayList<>();
        for (int i = 0; i < runs; i++) {
            seconds.add(once(command));
        }
        return new Figures("./barfit design " + EXAMPLE, seconds);
    }

    /** One run's wall time in seconds; a run that fails stops the measurement. */
    static double once(List<String> command) throws NotMeasured {
        ProcessBuilder pb = new ProcessBuilder(command)
                .redirectOutput(ProcessBuilder.Redirect.DISCARD)
                .redirectError(ProcessBuilder.Redirect.PIPE);
        long t0 = System.nanoTime();
        try {
            Process p = pb.start();
            byte[] err;
            try (InputStream e = p.getErrorStream()) {
                err = e.readAllBytes();
            }
            int code = p.waitFor();
            double s = (System.nanoTime() - t0) / 1e9;
            if (code != 0) {
                String first = new String(err, java.nio.charset.StandardCharsets.UTF_8)
                        .lines()
                        .findFirst()
                        .orElse("");
                throw new NotMeasured(
                        "the design ended with exit code " + code + (first.isEmpty() ? "" : ": " + first));
            }
            return s;
        } catch (IOException e) {
            throw new NotMeasured("cannot start " + command.get(0) + ": " + e.getMessage());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new NotMeasured("interrupted");
        }
    }
}
