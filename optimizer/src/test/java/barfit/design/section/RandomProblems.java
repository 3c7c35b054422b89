package barfit.design.section;

import barfit.catalogs.BarCatalog;
import barfit.catalogs.BarCatalogs;
import barfit.catalogs.BarSize;
import barfit.design.SearchSpace;
import barfit.section.CodeEquations;
import barfit.section.Detailing;
import barfit.section.EndCondition;
import barfit.section.Exposure;
import barfit.section.Flange;
import barfit.section.Materials;
import barfit.section.Span;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.TreeSet;

/**
 * Seeded random small design problems (invented data, for cross-checks only), and the draws they are
 * made of, which the random spans ({@code RandomSpans}) share.
 */
public final class RandomProblems {
    static final BarCatalog BARS = BarCatalogs.builtIn("astm-a615m").orElseThrow();

    private RandomProblems() {}

    public static BarSize bar(String s) {
        return BARS.find(s).orElseThrow();
    }

    /** {@code count} distinct values from {@code from} to {@code to} in steps of {@code step}, ascending. */
    public static List<Double> pick(Random r, double from, double to, double step, int count) {
        TreeSet<Double> set = new TreeSet<>();
        int n = (int) Math.round((to - from) / step) + 1;
        while (set.size() < count) {
            set.add(from + step * r.nextInt(n));
        }
        return new ArrayList<>(set);
    }

    /** {@code count} distinct sizes of {@code pool}, in the pool's order. */
    public static List<BarSize> bars(Random r, String[] pool, int count) {
        TreeSet<Integer> idx = new TreeSet<>();
        while (idx.size() < count) {
            idx.add(r.nextInt(pool.length));
        }
        List<BarSize> out = new ArrayList<>();
        for (int i : idx) {
            out.add(bar(pool[i]));
        }
        return out;
    }

    /** Wider spaces: more widths, depths and sizes, up to three layers, either edition's equations. */
    public static SectionProblem medium(Random r) {
        SectionProblem p = small(r);
        List<Double> widths = pick(r, 200, 500, 50, 2 + r.nextInt(3));
        List<Double> depths = pick(r, 300, 1000, 50, 3 + r.nextInt(5));
        List<BarSize> tension =
                bars(r, new String[] {"13", "16", "19", "22", "25", "29", "32", "36", "43"}, 2 + r.nextInt(3));
        List<BarSize> comp = bars(r, new String[] {"10", "13", "16", "19", "22", "25"}, 1 + r.nextInt(3));
        SearchSpace base = p.space();
        SearchSpace space = new SearchSpace(
                        widths,
                        depths,
                        tension,
                        comp,
                        1 + r.nextInt(3),
                        base.stirrupSizes(),
                        base.stirrupLegs(),
                        base.stirrupSpacings())
                .withBarsPerTwoLegs(base.barsPerTwoLegs());
        CodeEquations code = r.nextInt(3) == 0 ? CodeEquations.INCH_POUND : CodeEquations.SI;
        Double cap = r.nextInt(3) == 0 ? depths.get(r.nextInt(depths.size())) : null;
        return new SectionProblem(
                "M",
                p.materials(),
                p.detailing(),
                code,
                space,
                p.mu() * (0.5 + 1.5 * r.nextDouble()),
                p.vu(),
                p.span(),
                cap,
                null,
                p.flange(),
                p.costLength());
    }

    /**
     * A small problem (as {@link #small}) that also carries a factored torsion from 1 to 60 kN·m, a quarter of
     * them compatibility torsion; its draws follow the small problem's.
     */
    public static SectionProblem torsion(Random r) {
        return torsion(r, small(r));
    }

    /** A medium problem (as {@link #medium}) with a torsion drawn as {@link #torsion(Random)} draws it. */
    public static SectionProblem mediumTorsion(Random r) {
        return torsion(r, medium(r));
    }

    private static SectionProblem torsion(Random r, SectionProblem p) {
        double tu = (1 + 59 * r.nextDouble()) * 1e6;
        return p.withTorsion(tu, r.nextInt(4) == 0);
    }

    public static SectionProblem small(Random r) {
        double fc = new double[] {21, 25, 28, 35, 42}[r.nextInt(5)];
        double fy = new double[] {420, 420, 500}[r.nextInt(3)];
        Materials m = new Materials(fc, fy, Math.min(fy, 420), 20, 1.0);
        Exposure exposure = r.nextInt(5) == 0 ? Exposure.WEATHER : Exposure.INTERIOR;
        Detailing det = new Detailing(40, bar("10"), 25, exposure);
        List<Double> widths = pick(r, 200, 450, 50, 1 + r.nextInt(2));
        List<Double> depths = pick(r, 300, 950, 50, 2 + r.nextInt(3));
        List<BarSize> tension =
                bars(r, new String[] {"13", "16", "19", "22", "25", "29", "32", "36"}, 1 + r.nextInt(3));
        List<BarSize> comp = bars(r, new String[] {"13", "16", "19", "25"}, 1 + r.nextInt(2));
        int layers = 1 + r.nextInt(2);
        List<BarSize> stirrupSizes = r.nextInt(4) == 0 ? List.of(bar("10"), bar("13")) : List.of(bar("10"));
        List<Integer> legs = r.nextBoolean() ? List.of(2) : List.of(2, 3);
        List<Double> spacings = pick(r, 75, 400, 25, 2 + r.nextInt(3));
        SearchSpace space = new SearchSpace(widths, depths, tension, comp, layers, stirrupSizes, legs, spacings);
        double mu = (20 + r.nextDouble() * 900) * 1e6 * (r.nextInt(4) == 0 ? -1 : 1);
        Double vu = r.nextInt(3) == 0 ? null : (30 + r.nextDouble() * 450) * 1e3;
        // the flange's draws come before the span's (kept in this order so the instances stay the same)
        boolean flanged = r.nextInt(4) == 0;
        double bf = flanged ? widths.get(widths.size() - 1) + 400 + 100 * r.nextInt(10) : 0;
        double hf = flanged ? 100 + 10 * r.nextInt(8) : 0;
        boolean oneSided = flanged && r.nextInt(3) == 0;
        Span span = null;
        if (r.nextInt(3) == 0) {
            EndCondition e = EndCondition.values()[r.nextInt(4)];
            span = new Span(3000 + 1000 * r.nextInt(7), r.nextBoolean() ? e : null);
        }
        // the span, when given, is the flange's clear span too (Table 6.3.2.1 may cut the flange)
        Flange flange = flanged ? Flange.given(bf, hf, oneSided, null, span == null ? null : span.length()) : null;
        Double cap = r.nextInt(3) == 0 ? depths.get(r.nextInt(depths.size())) : null;
        // the code's legs rules alone, or with an office's rule of two legs per four bars
        space = space.withBarsPerTwoLegs(r.nextBoolean() ? 0 : 4);
        return new SectionProblem(
                "R",
                m,
                det,
                CodeEquations.SI,
                space,
                mu,
                vu,
                span,
                cap,
                null,
                flange,
                span == null ? 1.0 : span.length() / 1000);
    }
}
