package barfit.bench;

import barfit.design.CostModel;
import barfit.design.SolverOptions;
import barfit.design.line.LineSpans;
import barfit.design.span.SpanDesigner;
import barfit.input.DesignInput;
import barfit.input.DesignInputReader;
import barfit.input.LineInput;
import barfit.input.LinesReader;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;

/**
 * Times the design of an invented four-span line of one section (columns below every support, a point
 * load, the default search space): analysis per section, every part's options, the support bars shared,
 * the redistribution the file asks for. Median of several runs after a warm-up, in this process.
 */
public final class LineDesignBench {
    /** Wall and thread CPU milliseconds per design, the line's cost and whether every part is proved optimal. */
    public record Figures(int runs, double msMedian, double msMax, double cpuMsMedian, double cost, boolean optimal) {}

    private LineDesignBench() {}

    /** The invented line, in the form {@code design} reads. */
    static String yaml(String redistribution) {
        return """
                units: SI
                concrete: {fc: 30}
                steel: {fy: 420}
                lines:
                  - id: BENCH-4
                    spans: [7.2, 8.4, 8.4, 7.2]
                    supports:
                      - {width: 450, below: {b: 450, h: 450, height: 4.0}}
                    loads:
                      dead: 24
                      live: 12
                      points: [{span: 2, at: 3.0, dead: 40, live: 20}]
                    section: {width: 300, height: 600}
                    redistribution: REDISTRIBUTION
                """.replace("REDISTRIBUTION", redistribution);
    }

    public static Figures run(int runs, String redistribution) {
        try {
            Path dir = Files.createTempDirectory("barfit-bench");
            Path f = dir.resolve("line.yaml");
            Files.writeString(f, yaml(redistribution));
            DesignInput in = DesignInputReader.read(f, false);
            LineInput line = LinesReader.read(DesignInputReader.document(f), in.settings())
                    .get(0);
            Files.delete(f);
            Files.delete(dir);
            CostModel cost = new CostModel(
                    in.rates(), in.settings().detailing().cover(), in.settings().code());
            LineSpans lines = new LineSpans(
                    in.settings(),
                    in.space(),
                    new SpanDesigner(cost, new SolverOptions(30, 1, 1)),
                    in.maxBarSizesPerBeam(),
                    in.barsPerTwoLegs());
            lines.design(line, 0); // warm-up: the JIT, the native library
            double[] ms = new double[runs];
            double[] cpu = new double[runs];
            var bean = java.lang.management.ManagementFactory.getThreadMXBean();
            double total = 0;
            boolean optimal = true;
            for (int i = 0; i < runs; i++) {
                long c0 = bean.getCurrentThreadCpuTime();
                long t0 = System.nanoTime();
                LineSpans.Result r = lines.design(line, 0);
                ms[i] = (System.nanoTime() - t0) / 1e6;
                cpu[i] = (bean.getCurrentThreadCpuTime() - c0) / 1e6;
                total = 0;
                for (LineSpans.Part p : r.parts()) {
                    optimal &= p.outcome().feasible()
                            && "optimal".equals(p.outcome().status());
                    total += p.outcome().feasible() ? p.outcome().best().cost().total() : Double.NaN;
                }
            }
            Arrays.sort(ms);
            Arrays.sort(cpu);
            return new Figures(runs, ms[runs / 2], ms[runs - 1], cpu[runs / 2], total, optimal);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
