package barfit.cli;

import barfit.bench.SectionBench;
import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

@Command(name = "bench", mixinStandardHelpOptions = true,
        description = "Time the optimizer against plain enumeration on fixed, seeded instances in this process; "
                + "prints a table and ends with one JSON line of figures.")
final class BenchCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Option(names = "--instances", defaultValue = "40", description = "single sections to time (default: ${DEFAULT-VALUE})")
    int instances;

    @Option(names = "--exhaustive-every", defaultValue = "4",
            description = "run the exhaustive enumeration on every k-th instance (default: ${DEFAULT-VALUE})")
    int every;

    @Option(names = "--seed", defaultValue = "2026", description = "instance seed (default: ${DEFAULT-VALUE})")
    long seed;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        out.println("barfit bench: single sections, default search space, 1 CP-SAT worker, seed " + seed);
        var f = SectionBench.run(instances, Math.max(1, every), seed, out);
        out.printf(Locale.ROOT, "optimizer median %.2f ms (max %.2f ms); exhaustive median %.0f ms over %d layouts "
                + "checked; speedup %.0fx; equal optimum: %s%n", f.optimizerMsMedian(), f.optimizerMsMax(),
                f.exhaustiveMsMedian(), f.layoutsChecked(), f.speedup(), f.equalOptimum());
        out.printf(Locale.ROOT, "{\"instances\": %d, \"optimizer_ms_median\": %.3f, \"exhaustive_ms_median\": %.1f, "
                + "\"speedup\": %.1f, \"equal_optimum\": %s}%n", f.instances(), f.optimizerMsMedian(),
                f.exhaustiveMsMedian(), f.speedup(), f.equalOptimum());
        out.flush();
        return f.equalOptimum() ? Main.OK : Main.FAILED;
    }
}
