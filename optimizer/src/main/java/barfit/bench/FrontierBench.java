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
    public record Figures(int beams, double msMedian, double msMax, double pointsMean, double solvesMean) {}

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
        return new Figures(n, sorted[n / 2], sorted[n - 1], points / n, solves / n);
    }
}
