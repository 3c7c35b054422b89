package barfit.bench;

import barfit.catalogs.BarCatalog;
import barfit.catalogs.BarCatalogs;
import barfit.catalogs.BarSize;
import barfit.design.CostModel;
import barfit.design.CostRates;
import barfit.design.SearchSpace;
import barfit.design.SolverOptions;
import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanExhaustive;
import barfit.design.span.SpanProblem;
import barfit.section.CodeEquations;
import barfit.section.Detailing;
import barfit.section.EndCondition;
import barfit.section.Exposure;
import barfit.section.Materials;
import barfit.section.SpanChecks;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;

/**
 * Whole spans (supports, mid-span and shear): the optimizer on the default search space, and the
 * optimizer against exhaustive enumeration on a reduced space where enumeration finishes.
 */
public final class SpanBench {
    public record Figures(
            int instances,
            double optimizerMsMedian,
            double optimizerMsMax,
            int compared,
            double reducedOptimizerMsMedian,
            double exhaustiveMsMedian,
            double speedup,
            boolean equalOptimum) {}

    private SpanBench() {}

    static SearchSpace reducedSpace() {
        BarCatalog c = BarCatalogs.builtIn("astm-a615m").orElseThrow();
        List<BarSize> bars = List.of("19", "22", "25").stream()
                .map(s -> c.find(s).orElseThrow())
                .toList();
        return new SearchSpace(
                List.of(300.0, 350.0),
                List.of(500.0, 550.0, 600.0),
                bars,
                bars,
                1,
                List.of(c.find("10").orElseThrow()),
                List.of(2, 4),
                List.of(100.0, 150.0, 200.0, 250.0, 300.0));
    }

    static List<SpanProblem> instances(int n, long seed, SearchSpace space) {
        Random r = new Random(seed);
        BarCatalog c = BarCatalogs.builtIn("astm-a615m").orElseThrow();
        Materials m = new Materials(28, 420, 420, 20, 1.0);
        Detailing det = new Detailing(40, c.find("10").orElseThrow(), 25, Exposure.INTERIOR);
        List<SpanProblem> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            double span = 5000 + 500 * r.nextInt(8);
            double base = 120 + r.nextDouble() * 200;
            double ml = -base * (0.9 + 0.3 * r.nextDouble()) * 1e6;
            double mr = -base * (0.9 + 0.3 * r.nextDouble()) * 1e6;
            double mm = base * (0.5 + 0.3 * r.nextDouble()) * 1e6;
            double v = (90 + r.nextDouble() * 160) * 1e3;
            SpanChecks.ServiceLoads service =
                    new SpanChecks.ServiceLoads(10 + 10 * r.nextDouble(), 5 + 8 * r.nextDouble(), 0.25);
            Double cap = r.nextInt(4) == 0 ? 450.0 + 50 * r.nextInt(3) : null;
            out.add(new SpanProblem(
                    "S" + (i + 1),
                    m,
                    det,
                    CodeEquations.SI,
                    space,
                    span,
                    EndCondition.BOTH_ENDS_CONTINUOUS,
                    ml,
                    mm,
                    mr,
                    v,
                    v * (0.85 + 0.3 * r.nextDouble()),
                    service,
                    SpanChecks.Limits.DEFAULT,
                    cap,
                    null,
                    null,
                    false,
                    2,
                    4));
        }
        return out;
    }

    /**
     * The optimizer on {@code n} spans of the default space, then on {@code compare} spans of the reduced space
     * against the exhaustive enumeration. Each part is warmed up until the compiler is quiet (the reduced
     * space's with the enumeration too), and each search is timed in a block of its own (see
     * {@link SectionBench#run}).
     */
    public static Figures run(int n, int compare, long seed, PrintWriter out) {
        CostModel cost = new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI);
        SpanDesigner designer = new SpanDesigner(cost, new SolverOptions(60, 1, 1));
        SearchSpace full = SectionBench.defaultSpace();
        List<SpanProblem> warmFull = instances(10, seed + 1, full);
        WarmUp.Figures w = WarmUp.untilQuiet(
                () -> warmFull.forEach(p -> designer.design(p, 0)),
                SectionBench.WARM_UP_LEAST,
                SectionBench.WARM_UP_MOST);
        out.println(w.describe());
        double[] opt = new double[n];
        out.printf(Locale.ROOT, "%-5s %10s %12s%n", "span", "optimizer", "cost");
        List<SpanProblem> problems = instances(n, seed, full);
        for (int i = 0; i < n; i++) {
            long t0 = System.nanoTime();
            var o = designer.design(problems.get(i), 0);
            opt[i] = (System.nanoTime() - t0) / 1e6;
            out.printf(
                    Locale.ROOT,
                    "%-5s %8.2f ms %12s%n",
                    problems.get(i).id(),
                    opt[i],
                    o.feasible()
                            ? String.format(Locale.ROOT, "%.2f", o.best().cost().total())
                            : "none");
            out.flush();
        }
        out.println("reduced space (2 widths, 3 depths, No. 19/22/25, one layer) against exhaustive enumeration:");
        SpanExhaustive oracle = new SpanExhaustive(cost);
        List<SpanProblem> small = instances(compare, seed + 2, reducedSpace());
        List<SpanProblem> warm = instances(10, seed + 3, reducedSpace());
        int[] next = {0};
        WarmUp.Figures ws = WarmUp.untilQuiet(
                () -> {
                    warm.forEach(p -> designer.design(p, 0));
                    oracle.solve(warm.get(next[0]++ % warm.size()));
                },
                SectionBench.WARM_UP_LEAST,
                SectionBench.WARM_UP_MOST);
        out.println(ws.describe() + "; then each timed in a block of its own");
        double[] ro = new double[compare];
        long[] mine = new long[compare];
        for (int i = 0; i < compare; i++) {
            long t0 = System.nanoTime();
            var o = designer.design(small.get(i), 0);
            ro[i] = (System.nanoTime() - t0) / 1e6;
            mine[i] = o.feasible() ? CostModel.units(o.best().cost().total()) : -1;
        }
        double[] ex = new double[compare];
        SpanExhaustive.Result[] refs = new SpanExhaustive.Result[compare];
        for (int i = 0; i < compare; i++) {
            long t1 = System.nanoTime();
            refs[i] = oracle.solve(small.get(i));
            ex[i] = (System.nanoTime() - t1) / 1e6;
        }
        boolean equal = true;
        for (int i = 0; i < compare; i++) {
            boolean same = mine[i] == refs[i].units();
            equal &= same;
            out.printf(
                    Locale.ROOT,
                    "%-5s optimizer %8.2f ms   exhaustive %9.0f ms over %d combinations   equal: %s%n",
                    small.get(i).id(),
                    ro[i],
                    ex[i],
                    refs[i].combinations(),
                    same ? "yes" : "NO");
        }
        out.flush();
        double roMed = SectionBench.median(ro);
        double exMed = SectionBench.median(ex);
        return new Figures(
                n,
                SectionBench.median(opt),
                java.util.Arrays.stream(opt).max().orElse(0),
                compare,
                roMed,
                exMed,
                exMed / roMed,
                equal);
    }
}
