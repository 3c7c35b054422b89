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

    @Option(names = "--beams", defaultValue = "20", description = "whole spans to time (default: ${DEFAULT-VALUE}; 0 skips)")
    int beams;

    @Option(names = "--beams-compared", defaultValue = "6",
            description = "whole spans also enumerated exhaustively on a reduced space (default: ${DEFAULT-VALUE})")
    int beamsCompared;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        out.println("barfit bench: single sections, default search space, 1 CP-SAT worker, seed " + seed);
        var f = SectionBench.run(instances, Math.max(1, every), seed, out);
        out.printf(Locale.ROOT, "optimizer median %.2f ms (max %.2f ms); exhaustive median %.0f ms over %d layouts "
                + "checked; speedup %.0fx; equal optimum: %s%n", f.optimizerMsMedian(), f.optimizerMsMax(),
                f.exhaustiveMsMedian(), f.layoutsChecked(), f.speedup(), f.equalOptimum());
        boolean equal = f.equalOptimum();
        String beamJson = "";
        if (beams > 0) {
            out.println();
            out.println("whole spans (two supports, mid-span, shear, service loads), default search space:");
            var b = barfit.bench.BeamBench.run(beams, Math.max(0, beamsCompared), seed, out);
            out.printf(Locale.ROOT, "spans: optimizer median %.2f ms (max %.2f ms) on the default space; on the reduced "
                    + "space median %.2f ms against exhaustive %.0f ms: speedup %.0fx; equal optimum: %s%n",
                    b.optimizerMsMedian(), b.optimizerMsMax(), b.reducedOptimizerMsMedian(), b.exhaustiveMsMedian(),
                    b.speedup(), b.equalOptimum());
            equal &= b.equalOptimum();
            beamJson = String.format(Locale.ROOT, ", \"spans\": %d, \"span_optimizer_ms_median\": %.3f, "
                    + "\"span_reduced_optimizer_ms_median\": %.3f, \"span_exhaustive_ms_median\": %.1f, "
                    + "\"span_speedup\": %.1f, \"span_equal_optimum\": %s", b.instances(), b.optimizerMsMedian(),
                    b.reducedOptimizerMsMedian(), b.exhaustiveMsMedian(), b.speedup(), b.equalOptimum());
        }
        out.printf(Locale.ROOT, "{\"instances\": %d, \"optimizer_ms_median\": %.3f, \"exhaustive_ms_median\": %.1f, "
                + "\"speedup\": %.1f, \"equal_optimum\": %s%s}%n", f.instances(), f.optimizerMsMedian(),
                f.exhaustiveMsMedian(), f.speedup(), f.equalOptimum(), beamJson);
        out.flush();
        return equal ? Main.OK : Main.FAILED;
    }
}
