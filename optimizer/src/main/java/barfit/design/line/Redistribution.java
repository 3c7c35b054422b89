package barfit.design.line;

import barfit.design.span.SpanProblem;
import barfit.input.LineInput;
import java.util.ArrayList;
import java.util.List;

/**
 * The redistribution of the support moments (6.6.5), per support: whether a search chooses it, the
 * percentages it tries, and what the sections designed beside each support allow. Apart because both
 * searches (one section for the line, span by span) gate what they analyse with the same rule.
 */
final class Redistribution {
    private Redistribution() {}

    /** Whether the search chooses the redistribution: the line asks for some, analysed by stiffness. */
    static boolean choosing(LineInput in) {
        return !in.coefficients() && in.redistribution().stream().anyMatch(r -> r > 0);
    }

    /**
     * Per support, the percentages tried: 0 up to what the line allows there, in steps of {@link
     * LineSpans#STEP}.
     */
    static List<List<Double>> steps(LineInput in) {
        List<List<Double>> out = new ArrayList<>();
        for (double asked : in.redistribution()) {
            List<Double> s = new ArrayList<>();
            for (int k = 0; k * LineSpans.STEP <= asked + 1e-9; k++) {
                s.add(k * LineSpans.STEP);
            }
            if (asked > s.get(s.size() - 1) + 1e-9) {
                s.add(asked);
            }
            out.add(s);
        }
        return out;
    }

    /** Per support, what the line asks: the most the search tries. */
    static List<Double> most(LineInput in) {
        return new ArrayList<>(in.redistribution());
    }

    /** Per support, none. */
    static List<Double> none(LineInput in) {
        List<Double> out = new ArrayList<>();
        in.redistribution().forEach(r -> out.add(0.0));
        return out;
    }

    /** The least εt of the designed support sections beside each support (NaN where none is designed). */
    static List<Double> supportStrains(LineInput in, List<LineSpans.Part> parts) {
        int n = in.spans().size();
        List<Double> out = new ArrayList<>();
        for (int j = 0; j <= n; j++) {
            out.add(Double.NaN);
        }
        for (LineSpans.Part p : parts) {
            if (!p.outcome().feasible() || p.segment() < 1 || p.segment() > n) {
                continue;
            }
            var sections = p.outcome().best().report().sections();
            var left = sections.get(SpanProblem.Place.LEFT);
            var right = sections.get(SpanProblem.Place.RIGHT);
            if (left != null) {
                out.set(
                        p.segment() - 1,
                        least(out.get(p.segment() - 1), left.flexure().epsT()));
            }
            if (right != null) {
                out.set(p.segment(), least(out.get(p.segment()), right.flexure().epsT()));
            }
        }
        return out;
    }

    /**
     * Lowers each support's redistribution (percent, in place) to what the sections designed beside it
     * allow (6.6.5: εt ≥ 0.0075, at most 1000 εt percent); true when any was lowered.
     */
    static boolean lowerToAllowed(List<Double> red, List<Double> epsT) {
        boolean lowered = false;
        for (int j = 0; j < red.size(); j++) {
            if (red.get(j) > 0) {
                double allowed = barfit.analysis.RedistributionLimit.percent(epsT.get(j));
                if (red.get(j) > allowed + 1e-9) {
                    red.set(j, allowed);
                    lowered = true;
                }
            }
        }
        return lowered;
    }

    private static double least(double a, double b) {
        return Double.isNaN(a) ? b : Math.min(a, b);
    }
}
