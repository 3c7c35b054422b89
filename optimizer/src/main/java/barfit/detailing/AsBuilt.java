package barfit.detailing;

import barfit.analysis.Line;
import barfit.design.CostModel;
import barfit.design.line.LineSpans;
import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.input.LineBars;
import barfit.input.LineInput;
import barfit.input.Settings;
import barfit.section.Stirrups;
import barfit.section.anchorage.StandardHooks;
import java.util.ArrayList;
import java.util.List;

/**
 * A line's bars as built (a {@code check} file's {@code bars:}): each span's layout for the section checks,
 * and the runs along the line, as the detailer would have placed them: hangers end cover to end cover,
 * each support's extra top bars as far as given from its centre line, each span's bottom bars as far past
 * its supports' centre lines as given, hooked where they reach a hooked end.
 */
public final class AsBuilt {
    private AsBuilt() {}

    /**
     * A span's layout from the bars given: the hangers and the support bars beside it at its ends, its bottom
     * bars, and for each of its stirrup zones the weakest set of stirrups that reaches into the zone (least
     * Av/s, then the widest spacing), so that no zone is checked with better stirrups than it has.
     */
    public static SpanLayout layout(SpanProblem p, int span, LineInput in, LineBars bars) {
        LineBars.SpanBars sb = bars.spans().get(span - 1);
        LineBars.SupportTop left = bars.supports().get(span - 1);
        LineBars.SupportTop right = bars.supports().get(span);
        double halfLeft = in.supports().get(span - 1).width() / 2;
        double halfRight = in.supports().get(span).width() / 2;
        List<Stirrups> zones = new ArrayList<>();
        for (SpanProblem.Zone z : p.zones()) {
            zones.add(weakest(sb.stirrups(), z.from(), z.to(), p.span()));
        }
        return new SpanLayout(
                in.section().width(),
                in.section().height(),
                p.flange(),
                sb.stirrups().get(0).stirrups().bar(),
                null,
                bars.hangers().bar(),
                bars.hangers().count(),
                p.leftSupport() ? total(bars.hangers(), left) : null,
                p.rightSupport() ? total(bars.hangers(), right) : null,
                sb.bottom().bar(),
                sb.bottom().layers(),
                zones,
                left == null || left.right() == null ? 0 : Math.max(0, left.right() - halfLeft),
                right == null || right.left() == null ? 0 : Math.max(0, right.left() - halfRight));
    }

    /** The top bars over a support per layer: the hangers' and the extras' layer by layer. */
    private static List<Integer> total(LineBars.Group hangers, LineBars.SupportTop extra) {
        List<Integer> out = new ArrayList<>(hangers.layers());
        if (extra == null) {
            return out;
        }
        List<Integer> e = extra.bars().layers();
        for (int i = 0; i < e.size(); i++) {
            if (i < out.size()) {
                out.set(i, out.get(i) + e.get(i));
            } else {
                out.add(e.get(i));
            }
        }
        return out;
    }

    /** The weakest set reaching into [from, to] (from the left face; the last set runs to the right face). */
    static Stirrups weakest(List<LineBars.StirrupSet> sets, double from, double to, double clear) {
        Stirrups out = null;
        double a = 0;
        for (int i = 0; i < sets.size(); i++) {
            LineBars.StirrupSet s = sets.get(i);
            double b = i == sets.size() - 1 ? clear : a + s.length();
            // a set reaching into the zone by more than 1 mm (a length given to the mm or 0.01 ft)
            if (Math.min(b, to) - Math.max(a, from) > 1 && (out == null || weaker(s.stirrups(), out))) {
                out = s.stirrups();
            }
            a = b;
        }
        return out != null ? out : sets.get(sets.size() - 1).stirrups();
    }

    private static boolean weaker(Stirrups s, Stirrups than) {
        double av = s.legs() * s.bar().area() / s.spacing();
        double avThan = than.legs() * than.bar().area() / than.spacing();
        if (Math.abs(av - avThan) > 1e-9) {
            return av < avThan;
        }
        return s.spacing() > than.spacing();
    }

    /** The runs as given along the line: x from the first support's centre line, mm. */
    public static List<BarRun> runs(Line line, LineBars bars, Settings settings) {
        int n = line.spanCount();
        double cover = settings.detailing().cover();
        double start = -line.supports().get(0).width() / 2 + cover;
        double end = line.supportX(n) + line.supports().get(n).width() / 2 - cover;
        boolean hookLeft = bars.left().hooked();
        boolean hookRight = bars.right().hooked();
        StandardHooks.Bend bend = bars.left() == LineBars.End.HOOK_180 || bars.right() == LineBars.End.HOOK_180
                ? StandardHooks.Bend.DEG_180
                : StandardHooks.Bend.DEG_90;
        List<BarRun> out = new ArrayList<>();
        out.add(run(
                "top continuous",
                barfit.section.Face.TOP,
                bars.hangers(),
                start,
                end,
                start,
                end,
                hookLeft,
                hookRight,
                bend));
        for (int j = 0; j <= n; j++) {
            LineBars.SupportTop t = bars.supports().get(j);
            if (t == null) {
                continue;
            }
            double x = line.supportX(j);
            double a = t.left() == null ? start : Math.max(start, x - t.left());
            double b = t.right() == null ? end : Math.min(end, x + t.right());
            out.add(run(
                    "top extra, support " + (j + 1),
                    barfit.section.Face.TOP,
                    t.bars(),
                    a,
                    b,
                    start,
                    end,
                    hookLeft,
                    hookRight,
                    bend));
        }
        for (int i = 1; i <= n; i++) {
            LineBars.SpanBars s = bars.spans().get(i - 1);
            double a = s.pastLeft() == null ? start : Math.max(start, line.supportX(i - 1) - s.pastLeft());
            double b = s.pastRight() == null ? end : Math.min(end, line.supportX(i) + s.pastRight());
            out.add(run(
                    "bottom, span " + i,
                    barfit.section.Face.BOTTOM,
                    s.bottom(),
                    a,
                    b,
                    start,
                    end,
                    hookLeft,
                    hookRight,
                    bend));
        }
        return out;
    }

    /** A run from a to b, hooked at an end of the line it reaches where that end is hooked. */
    private static BarRun run(
            String what,
            barfit.section.Face face,
            LineBars.Group g,
            double a,
            double b,
            double start,
            double end,
            boolean hookLeft,
            boolean hookRight,
            StandardHooks.Bend bend) {
        return new BarRun(
                what,
                face,
                g.bar(),
                g.count(),
                a,
                b,
                hookLeft && a <= start + 1e-6,
                hookRight && b >= end - 1e-6,
                List.of(),
                0,
                "",
                bend);
    }

    /**
     * The line's bars as built, cut and scheduled, with every detailing check the detailer runs (from the
     * section model, {@link DetailRules}) made on the bars as given ({@link AsBuiltChecks}), and the
     * capacity of the bars as detailed against the envelope as a check of its own. {@code span} words a
     * length along the line in the user's units for the diagnoses.
     */
    public static LineDetail detail(
            LineSpans.Result r,
            List<BarRun> runs,
            Settings settings,
            CostModel cost,
            double stock,
            barfit.section.trail.Trail t,
            java.util.function.DoubleFunction<String> span) {
        Line line = r.analysis().line();
        var checks = new AsBuiltChecks(settings, t, span).checks(r, runs);
        LineDetail d = LineDetail.assemble(r, line, runs, checks, List.of(), settings, cost, stock);
        List<barfit.section.CheckResult> all = new ArrayList<>(d.checks());
        all.add(AsBuiltChecks.coverage(d.coverage(), span));
        return d.withChecks(all);
    }

    /** A checked line: the line and its bars as given, its parts verified as given, and its detail. */
    public record Checked(
            barfit.input.CheckLine given,
            LineSpans.Result result,
            LineDetail detail,
            barfit.section.trail.Trail trail) {
        public boolean ok() {
            return detail.ok()
                    && result.parts().stream()
                            .allMatch(p -> p.outcome().best().report().ok());
        }
    }

    /**
     * A line with its bars as built checked as {@code design} checks what it designs: analysed the same way
     * ({@link LineSpans#analyseGiven}), each span's layout through the section and span checks
     * ({@code SpanDesigner.asGiven}), and the runs through the detailing checks ({@link #detail}).
     */
    public static Checked check(
            barfit.input.CheckLine cl,
            Settings settings,
            barfit.section.trail.Trail t,
            java.util.function.DoubleFunction<String> span) {
        LineInput in = cl.line();
        LineBars bars = cl.bars();
        List<barfit.catalogs.BarSize> sizes =
                new ArrayList<>(List.of(bars.hangers().bar()));
        bars.spans().forEach(s -> sizes.add(s.bottom().bar()));
        List<barfit.catalogs.BarSize> stirrupSizes = new ArrayList<>();
        bars.spans()
                .forEach(s -> stirrupSizes.add(s.stirrups().get(0).stirrups().bar()));
        var space = new barfit.design.SearchSpace(
                List.of(in.section().width()),
                List.of(in.section().height()),
                sizes.stream().distinct().toList(),
                sizes.stream().distinct().toList(),
                3,
                stirrupSizes.stream().distinct().toList(),
                List.of(2),
                List.of(100.0));
        CostModel cost = new CostModel(
                barfit.design.CostRates.DEFAULTS, settings.detailing().cover(), settings.code());
        LineSpans.Given g = LineSpans.analyseGiven(in, settings, space);
        int n = in.spans().size();
        List<LineSpans.Part> parts = new ArrayList<>();
        for (int i = 0; i < g.problems().size(); i++) {
            SpanProblem p = g.problems().get(i);
            int seg = i + 1;
            SpanLayout layout = layout(p, seg, in, bars);
            parts.add(new LineSpans.Part(
                    seg, g.names().get(i), p, barfit.design.span.SpanDesigner.asGiven(p, layout, cost)));
        }
        LineSpans.Result r = LineSpans.given(in, g, parts);
        double stock = in.stockLength() != null ? in.stockLength() : LineDetail.defaultStock(settings);
        List<BarRun> runs = runs(r.analysis().line(), bars, settings);
        if (n != parts.size()) {
            throw new IllegalStateException("a line without overhangs has one part per span");
        }
        return new Checked(cl, r, detail(r, runs, settings, cost, stock, t, span), t);
    }
}
