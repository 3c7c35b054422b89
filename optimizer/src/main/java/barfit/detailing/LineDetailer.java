package barfit.detailing;

import barfit.analysis.Line;
import barfit.analysis.LineResult;
import barfit.catalogs.BarSize;
import barfit.design.line.LineSpans;
import barfit.design.span.SpanLayout;
import barfit.input.Settings;
import barfit.section.CheckResult;
import barfit.section.Development;
import barfit.section.Face;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * A designed line detailed bar by bar: where every group of longitudinal bars starts and ends, its hooks
 * and laps, and the checks of Chapter 25 and 9.7.3 that decide them, all from the section model.
 *
 * <ul>
 *   <li>The continuous top bars (hangers) run the whole line, end cover to end cover.
 *   <li>The extra top bars over a support run as the design has them, or further where 9.7.3 asks: past
 *       the point where the hangers alone suffice by max(d, 12 db) (9.7.3.3), ld past the face (9.7.3.2),
 *       past the point of inflection by max(d, 12 db, ln/16) when the hangers are less than a third of
 *       the support's steel (9.7.3.8.4), and not cut in a tension zone unless 9.7.3.5 allows it.
 *   <li>Each span's bottom bars run into both supports: 150 mm (6 in) past the face of a continuous support
 *       (9.7.3.8.2, all of them, more than the quarter asked), to the far face less cover at an end
 *       support (9.7.3.8.1), where a column or fixed end takes them in a standard hook.
 *   <li>At an end built into a column every top and bottom bar ends in a 90-degree standard hook, whose
 *       ldh (25.4.3) must fit in the column (far cover deducted).
 * </ul>
 *
 * x along the line from the first support's centre line, mm, as the analysis has it.
 */
public final class LineDetailer {
    private final Settings settings;
    private final DetailRules rules;

    public LineDetailer(Settings settings, Trail trail) {
        this.settings = settings;
        this.rules = new DetailRules(settings, trail);
    }

    /** The runs and the checks that placed them; null for a line without an analysis of its own. */
    public Placed place(LineSpans.Result r) {
        if (r.analysis() == null
                || r.parts().stream().anyMatch(p -> !p.outcome().feasible())) {
            return null;
        }
        LineResult a = r.analysis();
        Line line = a.line();
        int n = line.spanCount();
        Map<Integer, LineSpans.Part> bySegment = new TreeMap<>();
        r.parts().forEach(p -> bySegment.put(p.segment(), p));
        double cover = settings.detailing().cover();
        double left = line.overhangLeft() > 0
                ? -line.overhangLeft()
                : -line.supports().get(0).width() / 2;
        double right = line.overhangRight() > 0
                ? line.supportX(n) + line.overhangRight()
                : line.supportX(n) + line.supports().get(n).width() / 2;
        boolean hookLeft =
                line.overhangLeft() <= 0 && line.supports().get(0).kind().integral();
        boolean hookRight =
                line.overhangRight() <= 0 && line.supports().get(n).kind().integral();
        double start = left + cover;
        double end = right - cover;
        List<BarRun> runs = new ArrayList<>();
        List<CheckResult> checks = new ArrayList<>();
        List<CutOff> cutOffs = new ArrayList<>();

        // hangers: one run when every part has the same, else each part's over its length and supports
        SpanLayout first = bySegment.values().iterator().next().outcome().best().layout();
        boolean sameHangers = bySegment.values().stream().allMatch(p -> {
            SpanLayout l = p.outcome().best().layout();
            return l.top().equals(first.top())
                    && continuousOf(p, n) == continuousOf(bySegment.get(firstSpan(bySegment)), n);
        });
        int hangers = continuousOf(bySegment.get(firstSpan(bySegment)), n);
        if (sameHangers && hangers > 0) {
            runs.add(new BarRun(
                    "top continuous",
                    Face.TOP,
                    first.top(),
                    hangers,
                    start,
                    end,
                    hookLeft,
                    hookRight,
                    List.of(),
                    0,
                    ""));
        } else {
            for (LineSpans.Part p : bySegment.values()) {
                int c = continuousOf(p, n);
                if (c > 0) {
                    double[] ends = segmentEnds(
                            line,
                            p.segment(),
                            start,
                            end,
                            p.outcome().best().layout().top());
                    runs.add(new BarRun(
                            "top continuous, " + p.name(),
                            Face.TOP,
                            p.outcome().best().layout().top(),
                            c,
                            ends[0],
                            ends[1],
                            hookLeft && ends[0] <= start + 1e-6,
                            hookRight && ends[1] >= end - 1e-6,
                            List.of(),
                            0,
                            ""));
                }
            }
        }

        // the extra top bars over each support, checked against 9.7.3 and run further where it asks
        List<LineSpans.SupportBars> supports = r.supports();
        for (int j = 0; j <= n; j++) {
            LineSpans.SupportBars whole = supports.get(j);
            if (whole == null) {
                continue;
            }
            // a support whose two sides chose their own bars (span by span): each side's group on its own,
            // developed ld past its own face across the support
            List<LineSpans.SupportBars> groups = whole.left() != null && whole.right() != null && !whole.shared()
                    ? List.of(
                            new LineSpans.SupportBars(whole.index(), whole.width(), whole.left(), null),
                            new LineSpans.SupportBars(whole.index(), whole.width(), null, whole.right()))
                    : List.of(whole);
            for (LineSpans.SupportBars sb : groups) {
                LineSpans.Side side = sb.either();
                int total = SpanLayout.sum(side.counts());
                int extra = total - side.continuous();
                if (extra <= 0) {
                    continue;
                }
                double faceL = line.supportX(j) - sb.width() / 2;
                double faceR = line.supportX(j) + sb.width() / 2;
                double intoLeft = sb.intoLeft();
                double intoRight = sb.intoRight();
                if (groups.size() == 2) {
                    double ld = Development.ofLayer(
                                    side.section().section(),
                                    side.section().section().layersOn(Face.TOP).get(0),
                                    Trail.off())
                            .ld();
                    if (sb.right() == null) {
                        intoRight = Math.max(intoRight, ld - sb.width());
                    } else {
                        intoLeft = Math.max(intoLeft, ld - sb.width());
                    }
                }
                String why = "";
                double added = 0;
                // the spans beside the support: what 9.7.3 asks of the bars' run into each
                if (j >= 1 && sb.left() != null) {
                    DetailRules.Reach need = rules.reach(a, bySegment.get(j), sb.left(), j, false, faceL, line);
                    checks.addAll(need.checks());
                    cutOffs.add(new CutOff(
                            j + 1, false, need.theoretical(), need.inflection(), need.ld(), need.length(), intoLeft));
                    if (need.length() > intoLeft + 1) {
                        added += need.length() - intoLeft;
                        why = need.why();
                        intoLeft = need.length();
                    }
                }
                if (j <= n - 1 && sb.right() != null) {
                    DetailRules.Reach need = rules.reach(a, bySegment.get(j + 1), sb.right(), j, true, faceR, line);
                    checks.addAll(need.checks());
                    cutOffs.add(new CutOff(
                            j + 1, true, need.theoretical(), need.inflection(), need.ld(), need.length(), intoRight));
                    if (need.length() > intoRight + 1) {
                        added += need.length() - intoRight;
                        why = why.isEmpty() ? need.why() : why + "; " + need.why();
                        intoRight = need.length();
                    }
                }
                double s = Math.max(start, faceL - intoLeft);
                double e = Math.min(end, faceR + intoRight);
                boolean hs = hookLeft && j == 0;
                boolean he = hookRight && j == n;
                if (hs) {
                    s = start;
                }
                if (he) {
                    e = end;
                }
                String what = "top extra, support " + (j + 1)
                        + (groups.size() == 2
                                ? ", from " + side.part().substring(side.part().indexOf('/') + 1)
                                : "");
                runs.add(new BarRun(what, Face.TOP, side.bar(), extra, s, e, hs, he, List.of(), added, why));
            }
        }

        // bottom bars, span by span (and an overhang's, from its tip into the support)
        double[] bottomLaps = bottomLaps(line, bySegment);
        for (LineSpans.Part p : bySegment.values()) {
            SpanLayout l = p.outcome().best().layout();
            int seg = p.segment();
            double[] ends = bottomEnds(line, seg, start, end, bottomLaps);
            boolean hs = hookLeft && seg == 1;
            boolean he = hookRight && seg == n;
            runs.add(new BarRun(
                    "bottom, " + p.name(),
                    Face.BOTTOM,
                    l.bottom(),
                    l.bottomCount(),
                    ends[0],
                    ends[1],
                    hs,
                    he,
                    List.of(),
                    0,
                    ""));
            if (seg >= 1 && seg <= n) {
                checks.addAll(rules.bottomChecks(p, line, seg, ends, hs, he));
            }
            if (l.skin() != null) {
                double[] faces = DetailRules.faces(line, seg);
                runs.add(new BarRun(
                        "skin, " + p.name(),
                        Face.BOTTOM,
                        l.skin().bar(),
                        2
                                * barfit.design.section.SectionLayout.skinBarsPerFace(
                                        l.height(), l.skin().spacing()),
                        faces[0],
                        faces[1],
                        false,
                        false,
                        List.of(),
                        0,
                        ""));
            }
        }
        checks.addAll(rules.integrity(r.line().perimeter(), bySegment, hangers, first.top()));
        // hooks at the ends built into columns: ldh must fit
        for (BarRun run : runs) {
            if (run.hookStart()) {
                checks.add(rules.hookFit(run, line.supports().get(0), "support 1"));
            }
            if (run.hookEnd()) {
                checks.add(rules.hookFit(run, line.supports().get(n), "support " + (n + 1)));
            }
        }
        return new Placed(line, runs, checks, cutOffs, start, end);
    }

    /** The runs along a line and the checks that placed them; the bars' first and last x (end covers). */
    public record Placed(
            Line line, List<BarRun> runs, List<CheckResult> checks, List<CutOff> cutOffs, double start, double end) {}

    /**
     * What 9.7.3 asks of one support's extra top bars on one side: x where the continuous bars alone
     * suffice (NaN where they suffice everywhere), the point of inflection (NaN where none), ld, the run past
     * the face it asks and the run the design gave (mm).
     */
    public record CutOff(
            int support,
            boolean intoRight,
            double theoretical,
            double inflection,
            double ld,
            double required,
            double designed) {}

    private static int firstSpan(Map<Integer, LineSpans.Part> bySegment) {
        for (int seg : bySegment.keySet()) {
            if (seg >= 1) {
                return seg;
            }
        }
        return bySegment.keySet().iterator().next();
    }

    /** A part's continuous top bars (an overhang's count as its own top bars' continuous share). */
    private static int continuousOf(LineSpans.Part p, int n) {
        SpanLayout l = p.outcome().best().layout();
        return l.topContinuous();
    }

    /** A segment's bars from the centre line of one support to the next, clipped to the bars' ends. */
    /**
     * A part's own continuous top bars (parts with different ones): over its length and half a class B lap
     * (25.5.2) past the centre line of each support it shares with a neighbour, so the neighbours' bars lap
     * there; to the end cover where the line ends.
     */
    private double[] segmentEnds(Line line, int seg, double start, double end, BarSize bar) {
        int n = line.spanCount();
        double half = Anchorage.classBLap(bar, true, settings) / 2;
        boolean firstPart = seg == 0 || seg == 1 && line.overhangLeft() <= 0;
        boolean lastPart = seg == n + 1 || seg == n && line.overhangRight() <= 0;
        double a = firstPart ? start : line.supportX(seg - 1) - half;
        double b = lastPart ? end : line.supportX(Math.min(seg, n)) + half;
        return new double[] {Math.max(start, a), Math.min(end, b)};
    }

    /**
     * Bottom bars: lapped over each interior support (class B, centred on its centre line: continuous as
     * 9.7.7.2 asks, spliced at the support as 9.7.7.5 allows), to the end cover at an end; an overhang's
     * run 150 mm (6 in) past the face into its support (9.7.3.8.2).
     */
    private double[] bottomEnds(Line line, int seg, double start, double end, double[] laps) {
        int n = line.spanCount();
        double into = settings.code().anchorage().intoSupport();
        double[] f = DetailRules.faces(line, seg);
        double a;
        double b;
        if (seg == 0) {
            a = start;
            b = f[1] + into;
        } else if (seg == n + 1) {
            a = f[0] - into;
            b = end;
        } else {
            boolean endLeft = seg == 1 && line.overhangLeft() <= 0;
            boolean endRight = seg == n && line.overhangRight() <= 0;
            a = endLeft
                    ? start
                    : seg == 1 ? f[0] - into : line.supportX(seg - 1) - Math.max(laps[seg - 1], 2 * into) / 2;
            b = endRight ? end : seg == n ? f[1] + into : line.supportX(seg) + Math.max(laps[seg], 2 * into) / 2;
        }
        return new double[] {Math.max(start, a), Math.min(end, b)};
    }

    /** Per support, the class B lap of the bottom bars of the spans either side (the longer), mm. */
    private double[] bottomLaps(Line line, Map<Integer, LineSpans.Part> bySegment) {
        int n = line.spanCount();
        double[] out = new double[n + 1];
        for (int j = 1; j < n; j++) {
            double lap = 0;
            for (int seg : new int[] {j, j + 1}) {
                LineSpans.Part p = bySegment.get(seg);
                if (p == null) {
                    continue;
                }
                BarSize bar = p.outcome().best().layout().bottom();
                lap = Math.max(lap, Anchorage.classBLap(bar, false, settings));
            }
            out[j] = lap;
        }
        return out;
    }
}
