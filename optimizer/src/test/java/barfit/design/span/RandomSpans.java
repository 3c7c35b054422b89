package barfit.design.span;

import static barfit.design.section.RandomProblems.bar;
import static barfit.design.section.RandomProblems.bars;
import static barfit.design.section.RandomProblems.pick;

import barfit.catalogs.BarSize;
import barfit.design.SearchSpace;
import barfit.section.CodeEquations;
import barfit.section.Detailing;
import barfit.section.EndCondition;
import barfit.section.Exposure;
import barfit.section.Flange;
import barfit.section.Materials;
import barfit.section.SpanChecks;
import java.util.List;
import java.util.Random;

/** Seeded random small spans (invented data, for cross-checks only). */
public final class RandomSpans {
    private RandomSpans() {}

    /**
     * A small span (not a cantilever) under a random factored torsion: 3 to 40 kN·m at each critical
     * section, at mid-span nothing or up to a third of the larger end, a quarter of them compatibility torsion.
     */
    public static SpanProblem torsion(Random r) {
        SpanProblem p = small(r);
        while (p.cantilever()) {
            p = small(r);
        }
        double left = (3 + 37 * r.nextDouble()) * 1e6;
        double right = r.nextInt(4) == 0 ? 0 : (3 + 37 * r.nextDouble()) * 1e6;
        double mid = r.nextBoolean() ? 0 : Math.max(left, right) * r.nextDouble() / 3;
        return p.withTorsion(new SpanTorsion(left, mid, right, r.nextInt(4) == 0));
    }

    public static SpanProblem small(Random r) {
        double fc = new double[] {25, 28, 35}[r.nextInt(3)];
        Materials m = new Materials(fc, 420, 420, 20, 1.0);
        Detailing det = new Detailing(40, bar("10"), 25, Exposure.INTERIOR);
        List<Double> widths = pick(r, 250, 400, 50, 1 + r.nextInt(2));
        List<Double> depths = pick(r, 350, 750, 50, 2 + r.nextInt(2));
        List<BarSize> sizes = bars(r, new String[] {"16", "19", "22", "25", "29"}, 1 + r.nextInt(2));
        SearchSpace space = new SearchSpace(
                widths,
                depths,
                sizes,
                sizes,
                1 + r.nextInt(2),
                List.of(bar("10")),
                r.nextBoolean() ? List.of(2) : List.of(2, 4),
                pick(r, 100, 300, 50, 2 + r.nextInt(2)));
        EndCondition ends = EndCondition.values()[r.nextInt(4)];
        double span = (ends == EndCondition.CANTILEVER ? 1500 + 500 * r.nextInt(4) : 4000 + 1000 * r.nextInt(5));
        double base = 40 + r.nextDouble() * 260;
        Double ml = null;
        Double mm = null;
        Double mr = null;
        switch (ends) {
            case SIMPLE -> mm = base * 1e6;
            case ONE_END_CONTINUOUS -> {
                mm = base * 0.7 * 1e6;
                if (r.nextBoolean()) {
                    ml = -base * 1e6;
                } else {
                    mr = -base * 1e6;
                }
            }
            case BOTH_ENDS_CONTINUOUS -> {
                mm = base * 0.6 * 1e6;
                ml = -base * (0.8 + 0.4 * r.nextDouble()) * 1e6;
                mr = -base * (0.8 + 0.4 * r.nextDouble()) * 1e6;
            }
            case CANTILEVER -> ml = -base * 1e6;
        }
        Double vl = r.nextInt(4) == 0 ? null : (40 + r.nextDouble() * 260) * 1e3;
        Double vr = vl == null || ends == EndCondition.CANTILEVER ? null : vl * (0.7 + 0.6 * r.nextDouble());
        SpanChecks.ServiceLoads service = r.nextBoolean()
                ? new SpanChecks.ServiceLoads(8 + r.nextDouble() * 20, 4 + r.nextDouble() * 15, 0.25 * r.nextInt(2))
                : null;
        Flange flange = ends != EndCondition.CANTILEVER && r.nextInt(4) == 0
                ? Flange.given(widths.get(widths.size() - 1) + 500, 120, false, null, span)
                : null;
        Double cap = r.nextInt(3) == 0 ? depths.get(r.nextInt(depths.size())) : null;
        return new SpanProblem(
                "R",
                m,
                det,
                CodeEquations.SI,
                space,
                span,
                ends,
                ml,
                mm,
                mr,
                vl,
                vr,
                service,
                SpanChecks.Limits.DEFAULT,
                cap,
                null,
                flange,
                r.nextInt(3) == 0,
                r.nextInt(4) == 0 ? 1 : 2,
                r.nextBoolean()
                        ? 0
                        : 4); // the code's legs rules alone, or with the office rule of two legs per four bars
    }
}
