package barfit.design.span;

import barfit.catalogs.BarSize;
import barfit.design.CostModel;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Map;

/**
 * A span priced per section size and pair of bar sizes, for the schedule's rationalisation: exactly
 * ({@link #exact}, every frame of the size evaluated against a table of the cheapest found per pair
 * instead of one incumbent) or as a cheap lower bound ({@link #lowerBounds}, no bars searched). The exact
 * price of a size must equal designing the span restricted to that size and those bar sizes
 * ({@code PairTableTest}), and no bound may exceed it (the schedule checks every pricing).
 */
public final class PairTables {
    private final SpanGenerator generator;
    private final SpanContext ctx;
    private final SpanProblem p;

    public PairTables(SpanProblem problem, CostModel cost) {
        this.generator = new SpanGenerator(problem, cost);
        this.ctx = generator.context();
        this.p = problem;
    }

    /** The span's exact price in a section size of width b and height h for every pair of bar sizes. */
    public PairTable exact(double b, double h) {
        double[][] cost = infinite(p.space().barSizes().size());
        Table table = new Table(cost);
        for (SpanFrame f : generator.frames()) {
            if (f.b() == b && f.h() == h && Double.isFinite(f.lowerBound())) {
                generator.evaluate(f, table);
            }
        }
        return new PairTable(b, h, cost);
    }

    /**
     * Per pair of bar sizes, a lower bound on the span in one section size (the least over its stirrup
     * sizes), or null where the problem has no frame of that size. Cheap: no bars are searched.
     */
    public double[][] lowerBounds(double b, double h) {
        double[][] out = null;
        for (SpanFrame f : generator.frames()) {
            if (f.b() == b && f.h() == h && Double.isFinite(f.lowerBound())) {
                double[][] bounds = generator.bounds(f).pairs(OptionGenerator.tops(ctx, f));
                if (out == null) {
                    out = bounds;
                } else {
                    for (int i = 0; i < out.length; i++) {
                        for (int j = 0; j < out.length; j++) {
                            out[i][j] = Math.min(out[i][j], bounds[i][j]);
                        }
                    }
                }
            }
        }
        if (out == null && generator.frames().stream().anyMatch(f -> f.b() == b && f.h() == h)) {
            out = infinite(p.space().barSizes().size());
        }
        return out;
    }

    private static double[][] infinite(int n) {
        double[][] out = new double[n][n];
        for (double[] row : out) {
            Arrays.fill(row, Double.POSITIVE_INFINITY);
        }
        return out;
    }

    /**
     * The evaluation's target in table mode: a combination is worth having if it is cheaper than the best
     * found for its pair of bar sizes, and each frame's options lower every pair's entry they can.
     */
    private final class Table implements SpanGenerator.CostToBeat {
        private final double[][] cost;

        Table(double[][] cost) {
            this.cost = cost;
        }

        @Override
        public double limit(BarSize top, BarSize bottom) {
            return cost[ctx.index(top)][ctx.index(bottom)];
        }

        /** The dearest pair of a top size found so far: a top option that cannot beat it improves no pair. */
        @Override
        public double limitForTop(BarSize top) {
            int i = ctx.index(top);
            double worst = 0;
            for (int j = 0; j < cost.length; j++) {
                if (p.maxBarSizes() >= 2 || j == i) {
                    worst = Math.max(worst, cost[i][j]);
                }
            }
            return worst;
        }

        @Override
        public double common() {
            return Double.POSITIVE_INFINITY;
        }

        /** Lowers each pair's entry to the cheapest passing combination of the frame's options. */
        @Override
        public void lower(FrameOptions fs) {
            if (fs.frame().deflection()) {
                lowerChecked(fs);
                return;
            }
            Combinations combinations = generator.combinations();
            Map<BarSize, List<SupportOption>> lefts = Combinations.bySize(fs.lefts());
            Map<BarSize, List<SupportOption>> rights = Combinations.bySize(fs.rights());
            for (MidOption m : fs.mids()) {
                Combinations.Cheapest c = combinations.cheapestWith(fs.frame(), m, lefts, rights);
                double total = c == null ? Double.POSITIVE_INFINITY : c.cost();
                int i = ctx.index(m.top().bar());
                int j = ctx.index(m.bar());
                cost[i][j] = Math.min(cost[i][j], total);
            }
        }

        /**
         * Below Table 9.3.1.1 the cheapest compatible supports may fail deflection with a mid-span option
         * while dearer ones pass: search each pair's combinations cheapest first, pruned by cost, asking the
         * section model's span checks, so each entry is exact.
         */
        private void lowerChecked(FrameOptions fs) {
            Combinations combinations = generator.combinations();
            List<MidOption> mids = new ArrayList<>(fs.mids());
            mids.sort(Comparator.comparingDouble((MidOption m) -> m.top().cost() + m.cost()));
            Map<BarSize, List<SupportOption>> lefts = Combinations.bySize(fs.lefts());
            Map<BarSize, List<SupportOption>> rights = Combinations.bySize(fs.rights());
            for (MidOption m : mids) {
                TopOption t = m.top();
                if (!combinations.sizesAllowed(m)) {
                    continue;
                }
                int i = ctx.index(t.bar());
                int j = ctx.index(m.bar());
                BottomBars bottom = combinations.anchored(m);
                double base = fs.frame().cost() + t.cost() + m.cost();
                List<SupportOption> leftOptions = Combinations.compatible(
                        lefts, t.bar(), p.cantilever() ? 2 : t.continuous(), m, bottom, p.leftSupport());
                List<SupportOption> rightOptions =
                        Combinations.compatible(rights, t.bar(), t.continuous(), m, bottom, p.rightSupport());
                if (leftOptions.isEmpty() || rightOptions.isEmpty()) {
                    continue;
                }
                double cheapestRight =
                        rightOptions.get(0) == null ? 0 : rightOptions.get(0).cost();
                double cheapestLeft =
                        leftOptions.get(0) == null ? 0 : leftOptions.get(0).cost();
                if (base + cheapestLeft + cheapestRight >= cost[i][j] - 1e-9) {
                    continue;
                }
                for (SupportOption l : leftOptions) {
                    double withLeft = base + (l == null ? 0 : l.cost());
                    if (withLeft + cheapestRight >= cost[i][j] - 1e-9) {
                        break;
                    }
                    for (SupportOption r : rightOptions) {
                        double total = withLeft + (r == null ? 0 : r.cost());
                        if (total >= cost[i][j] - 1e-9) {
                            break;
                        }
                        if (SpanVerifier.deflectionOk(p, combinations.layout(fs.frame(), m, l, r))) {
                            cost[i][j] = total;
                            break;
                        }
                    }
                }
            }
        }
    }
}
