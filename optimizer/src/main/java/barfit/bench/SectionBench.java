package barfit.bench;

import barfit.catalogs.BarCatalog;
import barfit.catalogs.BarCatalogs;
import barfit.catalogs.BarSize;
import barfit.design.CostModel;
import barfit.design.CostRates;
import barfit.design.SearchSpace;
import barfit.design.SolverOptions;
import barfit.design.section.DesignOutcome;
import barfit.design.section.SectionDesigner;
import barfit.design.section.SectionExhaustive;
import barfit.design.section.SectionProblem;
import barfit.section.CodeEquations;
import barfit.section.Detailing;
import barfit.section.Exposure;
import barfit.section.Materials;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Random;

/**
 * Single sections on the default search space (4 widths, 400–800 mm in 25 mm steps, No. 16 to No. 36,
 * two layers, stirrup spacings 75–600 mm with 2 or 4 legs): the optimizer and the exhaustive
 * enumeration on the same seeded instances in one process.
 */
public final class SectionBench {
    public record Figures(
            int instances,
            double optimizerMsMedian,
            double optimizerMsMax,
            double exhaustiveMsMedian,
            double speedup,
            boolean equalOptimum,
            long layoutsChecked) {}

    private SectionBench() {}

    static SearchSpace defaultSpace() {
        BarCatalog c = BarCatalogs.builtIn("astm-a615m").orElseThrow();
        List<BarSize> bars = List.of("16", "19", "22", "25", "29", "32", "36").stream()
                .map(s -> c.find(s).orElseThrow())
                .toList();
        List<Double> depths = new ArrayList<>();
        for (int h = 400; h <= 800; h += 25) {
            depths.add((double) h);
        }
        List<Double> spacings = new ArrayList<>();
        for (int s = 75; s <= 600; s += 25) {
            spacings.add((double) s);
        }
        return new SearchSpace(
                List.of(250.0, 300.0, 350.0, 400.0),
                depths,
                bars,
                bars,
                2,
                List.of(c.find("10").orElseThrow()),
                List.of(2, 4),
                spacings);
    }

    static List<SectionProblem> instances(int n, long seed) {
        Random r = new Random(seed);
        BarCatalog c = BarCatalogs.builtIn("astm-a615m").orElseThrow();
        Materials m = new Materials(28, 420, 420, 20, 1.0);
        Detailing det = new Detailing(40, c.find("10").orElseThrow(), 25, Exposure.INTERIOR);
        SearchSpace space = defaultSpace();
        List<SectionProblem> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            double mu = (60 + r.nextDouble() * 740) * 1e6 * (r.nextInt(4) == 0 ? -1 : 1);
            Double vu = r.nextInt(4) == 0 ? null : (60 + r.nextDouble() * 360) * 1e3;
            Double cap = r.nextInt(3) == 0 ? 450.0 + 25 * r.nextInt(10) : null;
            out.add(new SectionProblem(
                    "S" + (i + 1), m, det, CodeEquations.SI, space, mu, vu, null, cap, null, null, 1.0));
        }
        return out;
    }

    /** The least and the most a warm-up runs (see {@link WarmUp}), in seconds. */
    static final double WARM_UP_LEAST = 2;

    static final double WARM_UP_MOST = 20;

    /**
     * The optimizer on {@code n} instances, and the exhaustive enumeration on every {@code exhaustiveEvery}-th.
     * Both are warmed up until the compiler is quiet, then each is timed in a block of its own over the
     * instances, as a schedule runs its designs one after another: timed in turn, a design of a millisecond
     * would start each time with the caches and the heap as the enumeration's hundreds of megabytes left them.
     */
    public static Figures run(int n, int exhaustiveEvery, long seed, PrintWriter out) {
        CostModel cost = new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI);
        SectionDesigner designer = new SectionDesigner(cost, new SolverOptions(60, 1, 1));
        SectionExhaustive oracle = new SectionExhaustive(cost);
        List<SectionProblem> problems = instances(n, seed);
        List<SectionProblem> warm = instances(30, seed + 1);
        int[] next = {0};
        WarmUp.Figures w = WarmUp.untilQuiet(
                () -> {
                    warm.forEach(p -> designer.design(p, 0));
                    oracle.solve(warm.get(next[0]++ % warm.size()));
                },
                WARM_UP_LEAST,
                WARM_UP_MOST);
        out.println(w.describe() + "; then each timed in a block of its own");
        double[] opt = new double[n];
        DesignOutcome[] outcomes = new DesignOutcome[n];
        for (int i = 0; i < n; i++) {
            long t0 = System.nanoTime();
            outcomes[i] = designer.design(problems.get(i), 0);
            opt[i] = (System.nanoTime() - t0) / 1e6;
        }
        List<Double> exh = new ArrayList<>();
        SectionExhaustive.Result[] refs = new SectionExhaustive.Result[n];
        double[] exMs = new double[n];
        for (int i = 0; i < n; i += exhaustiveEvery) {
            long t1 = System.nanoTime();
            refs[i] = oracle.solve(problems.get(i));
            exMs[i] = (System.nanoTime() - t1) / 1e6;
            exh.add(exMs[i]);
        }
        boolean equal = true;
        long checked = 0;
        out.printf(
                Locale.ROOT, "%-5s %10s %12s %12s %14s%n", "beam", "optimizer", "exhaustive", "cost", "equal optimum");
        for (int i = 0; i < n; i++) {
            DesignOutcome o = outcomes[i];
            String ex = "-";
            String eq = "-";
            if (refs[i] != null) {
                checked += refs[i].layoutsChecked();
                long units =
                        o.feasible() ? CostModel.units(o.best().costPerMetre().total()) : -1;
                boolean same = units == refs[i].units();
                equal &= same;
                ex = String.format(Locale.ROOT, "%.0f ms", exMs[i]);
                eq = same ? "yes" : "NO";
            }
            String costText = o.feasible()
                    ? String.format(Locale.ROOT, "%.2f", o.best().costPerMetre().total())
                    : "none";
            out.printf(
                    Locale.ROOT,
                    "%-5s %8.2f ms %12s %12s %14s%n",
                    problems.get(i).id(),
                    opt[i],
                    ex,
                    costText,
                    eq);
        }
        out.flush();
        double optMedian = median(opt);
        double exMedian = median(exh.stream().mapToDouble(Double::doubleValue).toArray());
        return new Figures(
                n, optMedian, Arrays.stream(opt).max().orElse(0), exMedian, exMedian / optMedian, equal, checked);
    }

    static double median(double[] v) {
        if (v.length == 0) {
            return 0;
        }
        double[] s = v.clone();
        Arrays.sort(s);
        return s.length % 2 == 1 ? s[s.length / 2] : 0.5 * (s[s.length / 2 - 1] + s[s.length / 2]);
    }
}
