package barfit.design.line;

import barfit.analysis.Line;
import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.section.Flexure;
import barfit.section.Stirrups;
import java.util.ArrayList;
import java.util.List;

/**
 * The design strength φMn the bars of a designed line provide along it, to draw over the moment envelope:
 * sagging, the bottom bars of each span between its faces (the mid-span section as checked); hogging, over
 * each support the support section's top bars from the support's centre line to where its extra bars end
 * in the part, and the continuous top bars alone between. An overhang's top bars run its length. Every
 * value is the section model's flexure of the section as built (x from the first support's centre line).
 */
public final class LineCapacity {
    /** A stretch of the line, from x to x (mm), and the φMn there (N·mm, positive). */
    public record Stretch(double from, double to, double phiMn) {}

    /** Sagging and hogging strength along the line. */
    public record Diagram(List<Stretch> sagging, List<Stretch> hogging) {}

    private LineCapacity() {}

    /** Null where the line has no analysis of its own (the 6.5 coefficients) or a part has no design. */
    public static Diagram of(LineSpans.Result r) {
        if (r.analysis() == null) {
            return null;
        }
        Line line = r.analysis().line();
        int n = line.spanCount();
        List<Stretch> sagging = new ArrayList<>();
        List<Stretch> hogging = new ArrayList<>();
        for (LineSpans.Part pt : r.parts()) {
            if (!pt.outcome().feasible()) {
                return null;
            }
            var d = pt.outcome().best();
            SpanLayout l = d.layout();
            SpanProblem p = pt.problem();
            var sections = d.report().sections();
            int seg = pt.segment();
            if (seg == 0 || seg == n + 1) {
                // an overhang: its top bars over its whole length from the support's centre line
                double root = line.supportX(seg == 0 ? 0 : n);
                double tip = seg == 0 ? root - line.length(0) : root + line.length(n + 1);
                var left = sections.get(SpanProblem.Place.LEFT);
                if (left != null) {
                    hogging.add(new Stretch(
                            Math.min(root, tip),
                            Math.max(root, tip),
                            left.flexure().phiMn()));
                }
                continue;
            }
            double cl = line.supportX(seg - 1);
            double cr = line.supportX(seg);
            double faceL = cl + line.supports().get(seg - 1).width() / 2;
            double faceR = cr - line.supports().get(seg).width() / 2;
            var mid = sections.get(SpanProblem.Place.MID);
            if (mid != null) {
                sagging.add(new Stretch(faceL, faceR, mid.flexure().phiMn()));
            }
            var left = sections.get(SpanProblem.Place.LEFT);
            var right = sections.get(SpanProblem.Place.RIGHT);
            double from = cl;
            double to = cr;
            if (left != null) {
                from = Math.min(faceL + l.extLeft(), cr);
                hogging.add(new Stretch(cl, from, left.flexure().phiMn()));
            }
            if (right != null) {
                to = Math.max(faceR - l.extRight(), from);
                hogging.add(new Stretch(to, cr, right.flexure().phiMn()));
            }
            if (to > from && (left != null || right != null)) {
                hogging.add(new Stretch(from, to, hangersPhiMn(p, l, left != null)));
            }
        }
        return new Diagram(sagging, hogging);
    }

    /** φMn in hogging of the continuous top bars alone, at the support section the span has. */
    public static double hangersPhiMn(SpanProblem p, SpanLayout l, boolean atLeft) {
        SpanProblem.Place place = atLeft ? SpanProblem.Place.LEFT : SpanProblem.Place.RIGHT;
        List<Integer> onlyContinuous = List.of(l.topContinuous());
        SpanLayout continuous = atLeft
                ? l.withTop(l.topContinuous(), onlyContinuous, l.topRight())
                : l.withTop(l.topContinuous(), l.topLeft(), onlyContinuous);
        Stirrups any = l.zoneStirrups().get(0);
        return Flexure.analyse(continuous.section(p, place, any), SpanLayout.bending(p, place))
                .phiMn();
    }
}
