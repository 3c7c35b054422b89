package barfit.design.span;

import barfit.catalogs.BarSize;
import barfit.design.CostModel;
import barfit.design.FrameEnumerator;
import barfit.design.section.SectionLayout;
import barfit.section.BarSpacing;
import barfit.section.Detailing;
import barfit.section.SkinBars;
import barfit.section.SpanChecks;
import barfit.section.Stirrups;
import barfit.section.StrengthBound;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * The frames of a span (from {@link FrameEnumerator}; below Table 9.3.1.1 only where service loads let
 * deflection be computed), each with its fixed cost and a first lower bound on any design in it (the
 * section model's strength bound on the steel, the leanest stirrups), cheapest bound first.
 */
final class SpanFrames {
    private SpanFrames() {}

    static List<SpanFrame> of(SpanContext ctx) {
        SpanProblem p = ctx.problem();
        CostModel cost = ctx.cost();
        BarSize smallest = ctx.smallestBar();
        double spanMetres = p.span() / 1000.0;
        double massPerArea = Double.MAX_VALUE;
        for (BarSize s : p.space().barSizes()) {
            massPerArea = Math.min(massPerArea, s.massPerMetre() / s.area());
        }
        double steelRate = cost.mainBarPricePerKg() * massPerArea;
        List<SpanFrame> out = new ArrayList<>();
        for (FrameEnumerator.Cell cell :
                FrameEnumerator.cells(p.widths(), p.depths(), p.flange(), p.space(), p.detailing())) {
            double b = cell.width();
            double h = cell.height();
            Detailing det = cell.detailing();
            boolean deflection = h < SpanChecks.minimumDepth(p.span(), p.ends(), p.materials(), p.code()) - 1e-9;
            if (deflection && p.service() == null) {
                continue; // below Table 9.3.1.1 and nothing to compute deflection from
            }
            // under torsion side bars may be the cheapest longitudinal steel round the hoop: each option a frame
            for (SkinBars skin :
                    SectionLayout.skinOptions(h, p.space().skinBar(), det, p.materials(), p.code(), p.hasTorsion())) {
                double frameCost = cost.frame(b, h, p.flange()).total() * spanMetres
                        + (skin == null
                                ? 0
                                : ctx.barCost(
                                        skin.bar(), 2 * SectionLayout.skinBarsPerFace(h, skin.spacing()), p.span()));
                double extLeft =
                        p.leftSupport() ? Extension.of(p, b, h, det, smallest).length() : 0;
                double extRight =
                        p.rightSupport() ? Extension.of(p, b, h, det, smallest).length() : 0;
                double lowerBound = frameCost
                        + steelLowerBound(p, b, h, det, smallest, steelRate)
                        + stirrupLowerBound(ctx, b, h, cell.stirrupBar());
                out.add(new SpanFrame(
                        b, h, cell.stirrupBar(), det, skin, frameCost, lowerBound, deflection, extLeft, extRight));
            }
        }
        out.sort(Comparator.comparingDouble(SpanFrame::lowerBound)
                .thenComparingDouble(SpanFrame::b)
                .thenComparingDouble(SpanFrame::h)
                .thenComparingDouble(f -> f.stirrupBar().diameter()));
        return out;
    }

    /**
     * The least bar cost any layout of the frame could have, from the section model's strength bound
     * ({@code steelRate}: the price of a mm² of the cheapest steel per metre).
     */
    private static double steelLowerBound(
            SpanProblem p, double b, double h, Detailing det, BarSize smallest, double steelRate) {
        double minPair = 2 * smallest.area();
        double compressionArea = 0;
        for (BarSize s : p.space().barSizes()) {
            int n = BarSpacing.maxBars(b, det, s, p.materials(), p.code());
            if (n >= 2) {
                compressionArea =
                        Math.max(compressionArea, n * s.area() * p.space().maxLayers());
            }
        }
        double dMax = h - det.firstLayerCentroid(smallest.diameter());
        double dp = det.firstLayerCentroid(smallest.diameter());
        double fc = p.materials().fc();
        double fy = p.materials().fy();
        double widest = p.flange() != null ? p.flange().on(b).width() : b; // at its effective width on this web
        double l = p.span();
        double bottom = p.midSection()
                ? StrengthBound.minTensionArea(p.mMid(), dMax, compressionArea, dp, dp + 60, widest, fc, fy)
                : minPair;
        double area = Math.max(bottom, minPair) * l;
        double supportL = p.leftSupport()
                ? StrengthBound.minTensionArea(p.mLeft(), dMax, compressionArea, dp, dp + 60, b, fc, fy)
                : 0;
        double supportR = p.rightSupport()
                ? StrengthBound.minTensionArea(p.mRight(), dMax, compressionArea, dp, dp + 60, b, fc, fy)
                : 0;
        if (Double.isInfinite(bottom) || Double.isInfinite(supportL) || Double.isInfinite(supportR)) {
            return Double.POSITIVE_INFINITY;
        }
        if (p.cantilever()) {
            area += Math.max(supportL, minPair) * l;
        } else {
            // the continuous pair over the span, and the rest of each support's steel over at least 0.3 x span
            area += minPair * l + Math.max(0, supportL - minPair) * 0.3 * l + Math.max(0, supportR - minPair) * 0.3 * l;
        }
        return steelRate * area / 1000.0;
    }

    /** The fewest legs at the widest spacing in every zone. */
    private static double stirrupLowerBound(SpanContext ctx, double b, double h, BarSize stirrupBar) {
        SpanProblem p = ctx.problem();
        double total = 0;
        double widest =
                p.space().stirrupSpacings().get(p.space().stirrupSpacings().size() - 1);
        int fewestLegs = p.space().stirrupLegs().get(0);
        for (SpanProblem.Zone z : ctx.zones()) {
            total += ctx.stirrupCost(b, h, new Stirrups(stirrupBar, fewestLegs, widest), z);
        }
        return total;
    }
}
