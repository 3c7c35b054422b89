package barfit.detailing;

import barfit.analysis.Line;
import barfit.analysis.LineResult;
import barfit.design.line.LineSpans;
import barfit.input.Settings;
import barfit.section.CheckResult;
import barfit.section.Face;
import barfit.section.anchorage.CutOffs;
import barfit.section.trail.Q;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.DoubleFunction;

/**
 * The detailing checks of a line's bars as built: what {@link DetailRules} asks (the section model's rules,
 * as the detailer asks them) against the runs given, each a check with its clause and, where it fails, what
 * would fix the bar. Runs are found by what they are: "top continuous", "top extra, support N", "bottom,
 * span N" ({@link AsBuilt#runs}).
 */
final class AsBuiltChecks {
    private final Settings settings;
    private final Trail trail;
    private final DetailRules rules;
    private final DoubleFunction<String> span;

    AsBuiltChecks(Settings settings, Trail trail, DoubleFunction<String> span) {
        this.settings = settings;
        this.trail = trail;
        this.rules = new DetailRules(settings, trail);
        this.span = span;
    }

    List<CheckResult> checks(LineSpans.Result r, List<BarRun> runs) {
        LineResult a = r.analysis();
        Line line = a.line();
        int n = line.spanCount();
        Map<Integer, LineSpans.Part> bySegment = new TreeMap<>();
        r.parts().forEach(p -> bySegment.put(p.segment(), p));
        List<CheckResult> out = new ArrayList<>();
        // the extra top bars over each support against the run 9.7.3 asks into each span beside it
        List<LineSpans.SupportBars> supports = r.supports();
        for (int j = 0; j <= n; j++) {
            BarRun run = find(runs, "top extra, support " + (j + 1));
            LineSpans.SupportBars sb = supports.get(j);
            if (run == null || sb == null) {
                continue;
            }
            double faceL = line.supportX(j) - sb.width() / 2;
            double faceR = line.supportX(j) + sb.width() / 2;
            if (j >= 1 && sb.left() != null) {
                out.addAll(reach(a, line, bySegment.get(j), sb.left(), j, false, faceL, faceL - run.start()));
            }
            if (j <= n - 1 && sb.right() != null) {
                out.addAll(reach(a, line, bySegment.get(j + 1), sb.right(), j, true, faceR, run.end() - faceR));
            }
        }
        // the bottom bars into their supports (9.7.3.8) and lapped over the interior ones (25.5.2, 9.7.7.5)
        for (int i = 1; i <= n; i++) {
            BarRun run = find(runs, "bottom, span " + i);
            out.addAll(rules.bottomChecks(
                    bySegment.get(i), line, i, new double[] {run.start(), run.end()}, run.hookStart(), run.hookEnd()));
            if (i < n) {
                out.add(bottomLap(line, i, run, find(runs, "bottom, span " + (i + 1))));
            }
        }
        BarRun hangers = find(runs, "top continuous");
        out.addAll(rules.integrity(r.line().perimeter(), bySegment, hangers.count(), hangers.bar()));
        // the ends of the line: hooks in their supports, straight top bars developed past an end column's face
        for (BarRun run : runs) {
            if (run.hookStart()) {
                out.add(rules.hookFit(run, line.supports().get(0), "support 1"));
            } else if (run.face() == Face.TOP && atEnd(run.start(), line, true) && integral(line, 0)) {
                out.add(straightEnd(run, line, true));
            }
            if (run.hookEnd()) {
                out.add(rules.hookFit(run, line.supports().get(n), "support " + (n + 1)));
            } else if (run.face() == Face.TOP && atEnd(run.end(), line, false) && integral(line, n)) {
                out.add(straightEnd(run, line, false));
            }
        }
        return out;
    }

    private static BarRun find(List<BarRun> runs, String what) {
        for (BarRun r : runs) {
            if (r.what().equals(what)) {
                return r;
            }
        }
        return null;
    }

    /** The reach 9.7.3 asks past one face, against the reach given (both from the face, mm). */
    private List<CheckResult> reach(
            LineResult a,
            Line line,
            LineSpans.Part part,
            LineSpans.Side side,
            int j,
            boolean intoRight,
            double face,
            double given) {
        DetailRules.Reach need = rules.reach(a, part, side, j, intoRight, face, line);
        List<CheckResult> out = new ArrayList<>(need.checks());
        String into = part.name();
        CheckResult c = CheckResult.atLeast(
                "top_reach",
                "Extra top bars at support " + (j + 1) + " run into " + into + " past the face",
                need.clause(),
                Q.length(given),
                Q.length(need.length()),
                null);
        double half = line.supports().get(j).width() / 2;
        out.add(
                c.pass()
                        ? c
                        : c.withNote(
                                "extend the top bars at support " + (j + 1) + " to " + span.apply(need.length() + half)
                                        + " past the centre line into " + into + ": " + need.why()));
        return out;
    }

    /** The bottom bars of spans i and i + 1 overlap over support i + 1 by a class B lap (25.5.2, 9.7.7.5). */
    private CheckResult bottomLap(Line line, int i, BarRun left, BarRun right) {
        double lap = Math.max(
                Anchorage.classBLap(left.bar(), false, settings), Anchorage.classBLap(right.bar(), false, settings));
        double overlap = left.end() - right.start();
        CheckResult c = CheckResult.atLeast(
                "bottom_lap",
                "Bottom bars of spans " + i + " and " + (i + 1) + " lapped over support " + (i + 1),
                "25.5.2, 9.7.7.5",
                Q.length(Math.max(0, overlap)),
                Q.length(lap),
                null);
        if (c.pass()) {
            return c;
        }
        double x = line.supportX(i);
        return c.withNote("overlap the bottom bars over support " + (i + 1) + " by a class B lap: run those of span "
                + i + " to " + span.apply(right.start() + lap - x) + " past the centre line, or those of span "
                + (i + 1) + " to " + span.apply(x - (left.end() - lap)) + " before it");
    }

    private static boolean integral(Line line, int j) {
        return line.supports().get(j).kind().integral();
    }

    /** Whether a run's end at x reaches an end of the line (its end cover). */
    private boolean atEnd(double x, Line line, boolean start) {
        int n = line.spanCount();
        double cover = settings.detailing().cover();
        double end = start
                ? -line.supports().get(0).width() / 2 + cover
                : line.supportX(n) + line.supports().get(n).width() / 2 - cover;
        return Math.abs(x - end) < 1e-6;
    }

    /**
     * Straight top bars ending in an end support built into a column: developed for ld past its face, the
     * critical section of the support's moment (9.7.3.2).
     */
    private CheckResult straightEnd(BarRun run, Line line, boolean start) {
        int j = start ? 0 : line.spanCount();
        var s = line.supports().get(j);
        double half = s.width() / 2;
        double face = start ? line.supportX(0) + half : line.supportX(j) - half;
        double ld = Anchorage.ld(run.bar(), true, settings);
        double available = start ? face - run.start() : run.end() - face;
        var side = start
                ? CutOffs.developedEachSide(face, run.start(), run.end(), ld, 0, trail)
                        .left()
                : CutOffs.developedEachSide(face, run.start(), run.end(), 0, ld, trail)
                        .right();
        CheckResult c = CheckResult.atLeast(
                "end_development",
                run.count() + " " + run.bar().label() + " " + run.what() + " straight into support " + (j + 1),
                "9.7.3.2",
                Q.length(available),
                Q.length(side.required()),
                null);
        return c.pass()
                ? c
                : c.withNote("ld " + span.apply(ld) + " does not fit past the face: hook the bars (ends: "
                        + (start ? "left" : "right") + ": hook-90) or widen the support");
    }

    /** The capacity of the bars as detailed against the envelope, as a check. */
    static CheckResult coverage(DetailedCapacity.Coverage cov, DoubleFunction<String> span) {
        CheckResult c = CheckResult.atMost(
                "capacity_as_detailed",
                "Bars as detailed cover the envelope (built up over ld from their ends)",
                "9.5.1.1, 9.7.3.2",
                Q.number(cov.worstRatio()),
                Q.number(1),
                null);
        return Double.isNaN(cov.worstX())
                ? c
                : c.withNote("largest Mu/φMn at x = " + span.apply(cov.worstX())
                        + (c.pass() ? "" : ": lengthen or add bars there"));
    }
}
