package barfit.analysis;

import barfit.section.LoadCombinations;
import java.util.ArrayList;
import java.util.List;

/**
 * The approximate moments and shears of ACI 318-19 6.5 for continuous beams, usable only where 6.5.1's
 * conditions hold: (a) prismatic members (one section along the line), (b) uniformly distributed loads,
 * (c) L ≤ 3 D, (d) at least two spans, (e) the longer of two adjacent spans no more than 1.2 times the
 * shorter; and never with redistribution (6.6.5.1). Overhangs are outside 6.5 and refused here.
 *
 * <p>Table 6.5.2 (moments, wu ln²): positive, end span with the discontinuous end unrestrained 1/11,
 * integral with its support 1/14, interior spans 1/16; negative at the interior face of an exterior
 * support built integrally with a column 1/16 (a fixed support is taken so), at the exterior face of the
 * first interior support 1/9 for two spans and 1/10 for more, at the other faces of interior supports
 * 1/11. Table 6.5.4 (shear): 1.15 wu ln / 2 at the exterior face of the first interior support, wu ln / 2
 * at the others. ln is the clear span; for negative moments at interior supports, the average of the
 * clear spans beside it.
 */
public final class Coefficients {
    private Coefficients() {}

    /** One span's moments at its faces and in the span, and shears at its faces (N, mm; hogging negative). */
    public record SpanValues(
            int index,
            double wu,
            double clear,
            double mLeftFace,
            double mSpan,
            double mRightFace,
            double vLeftFace,
            double vRightFace) {}

    /** Thrown with the 6.5.1 condition that fails, in words. */
    public static final class NotApplicable extends IllegalArgumentException {
        private static final long serialVersionUID = 1L;

        NotApplicable(String why) {
            super(why);
        }
    }

    public static List<SpanValues> analyse(Line line) {
        int n = line.spanCount();
        if (n < 2) {
            throw new NotApplicable("6.5.1(d): the approximate coefficients need at least two spans");
        }
        if (line.overhangLeft() > 0 || line.overhangRight() > 0) {
            throw new NotApplicable("6.5 has no coefficients for overhangs: analyse this line with method: stiffness");
        }
        for (int j = 0; j <= n; j++) {
            if (line.redistributionAt(j) != 0) {
                throw new NotApplicable("6.6.5.1: moments from the approximate coefficients may not be redistributed");
            }
        }
        double[] dead = new double[n + 1];
        double[] live = new double[n + 1];
        for (Load l : line.loads()) {
            int s = l.segment();
            if (l.point() || l.from() > 1e-6 || Math.abs(l.to() - line.length(s)) > 1e-6) {
                throw new NotApplicable("6.5.1(b): the loads must be uniformly distributed over whole spans"
                        + (l.point() ? " (span " + s + " has a point load)" : " (span " + s + " has a partial load)"));
            }
            dead[s] += l.dead();
            live[s] += l.live();
        }
        double[] clear = new double[n + 1];
        for (int s = 1; s <= n; s++) {
            if (live[s] > 3 * dead[s] + 1e-9) {
                throw new NotApplicable("6.5.1(c): L ≤ 3D is not met on span " + s);
            }
            clear[s] = line.length(s)
                    - line.supports().get(s - 1).width() / 2
                    - line.supports().get(s).width() / 2;
        }
        for (int s = 1; s < n; s++) {
            double a = line.length(s);
            double b = line.length(s + 1);
            if (Math.max(a, b) > 1.2 * Math.min(a, b) + 1e-9) {
                throw new NotApplicable("6.5.1(e): span " + (a > b ? s : s + 1) + " is more than 1.2 times span "
                        + (a > b ? s + 1 : s));
            }
        }
        List<SpanValues> out = new ArrayList<>();
        for (int s = 1; s <= n; s++) {
            double wu = LoadCombinations.factored(dead[s], live[s]);
            double ln = clear[s];
            boolean first = s == 1;
            boolean last = s == n;
            Support ext =
                    first ? line.supports().get(0) : last ? line.supports().get(n) : null;
            boolean integral = ext != null && ext.kind().integral();
            double pos = first || last ? (integral ? 1.0 / 14 : 1.0 / 11) : 1.0 / 16;
            double mLeft;
            double mRight;
            double firstInterior = n == 2 ? 1.0 / 9 : 1.0 / 10;
            if (first) {
                mLeft = integral ? -wu * ln * ln / 16 : 0;
                mRight = -wu * sq((ln + clear[s + 1]) / 2) * firstInterior;
            } else if (last) {
                mLeft = -wu * sq((ln + clear[s - 1]) / 2) * firstInterior;
                mRight = integral ? -wu * ln * ln / 16 : 0;
            } else {
                // the interior faces of the first interior supports are "other faces" too
                mLeft = -wu * sq((ln + clear[s - 1]) / 2) / 11;
                mRight = -wu * sq((ln + clear[s + 1]) / 2) / 11;
            }
            double vLeft = wu * ln / 2 * (last && n >= 2 ? 1.15 : 1.0);
            double vRight = wu * ln / 2 * (first ? 1.15 : 1.0);
            out.add(new SpanValues(s, wu, ln, mLeft, wu * ln * ln * pos, mRight, vLeft, vRight));
        }
        return out;
    }

    private static double sq(double v) {
        return v * v;
    }
}
