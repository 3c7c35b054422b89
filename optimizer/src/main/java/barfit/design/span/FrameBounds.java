package barfit.design.span;

import barfit.catalogs.BarSize;
import barfit.section.BarSpacing;
import barfit.section.Bending;
import barfit.section.SectionChecks;
import barfit.section.SectionShape;
import barfit.section.Span;
import barfit.section.Stirrups;
import barfit.section.StrengthBound;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * Lower bounds on what one frame's options can cost, found without searching bars: the section model's
 * strength bound on the steel (with minimum steel and crack control), and the leanest stirrups a zone
 * could take. What they are built from is remembered here, for this frame only; the generator keeps the
 * bounds of the frame it is working on, so a frame bounded and then evaluated computes them once.
 */
final class FrameBounds {
    private final SpanContext ctx;
    private final SpanProblem p;
    private final SpanFrame f;

    // remembered for the frame, each filled at its first use
    /** {@link #bottomBars}: [continuous top bars][top size][bottom size], NaN until asked. */
    private double[][][] bottomBars = new double[16][][];
    /** As,min of 9.6.1.2 per mm of d (NaN until asked). */
    private double asMinSagging = Double.NaN;

    private double asMinHogging = Double.NaN;
    /** The fewest bars crack control allows in a first layer, per bar size (-1 until asked). */
    private final int[] crackBars;
    /** {@link #leanStirrups} per place. */
    private final Map<SpanProblem.Place, Double> leanStirrups = new EnumMap<>(SpanProblem.Place.class);

    FrameBounds(SpanContext ctx, SpanFrame frame) {
        this.ctx = ctx;
        this.p = ctx.problem();
        this.f = frame;
        this.crackBars = new int[p.space().barSizes().size()];
        Arrays.fill(crackBars, -1);
    }

    SpanFrame frame() {
        return f;
    }

    /**
     * A tighter lower bound than the frame's first one, still without searching bars: the least of
     * {@link #pairs}.
     */
    double least(List<TopOption> tops) {
        double best = Double.POSITIVE_INFINITY;
        for (double[] row : pairs(tops)) {
            for (double v : row) {
                best = Math.min(best, v);
            }
        }
        return best;
    }

    /**
     * Per pair of bar sizes (top i, bottom j), a lower bound on any passing combination of the frame
     * without searching bars: the cheapest top option of size i; the least bottom bars of size j (with
     * the most continuous bars of size i as compression steel) and mid-span stirrups; and at each support
     * the fewest bars of size i the section model's strength bound allows over their real extension, with
     * the leanest stirrups of the support's zones. A new array on each call.
     */
    double[][] pairs(List<TopOption> tops) {
        List<BarSize> sizes = p.space().barSizes();
        int n = sizes.size();
        double[][] out = new double[n][n];
        for (double[] row : out) {
            Arrays.fill(row, Double.POSITIVE_INFINITY);
        }
        double fc = p.materials().fc();
        double fy = p.materials().fy();
        double leanMid = leanMid();
        // anchored bottom bars are compression steel at the supports: allow the most there could be
        double compressionArea = 0;
        if (p.bottomAnchored()) {
            for (BarSize bottom : sizes) {
                compressionArea = Math.max(
                        compressionArea,
                        BarSpacing.maxBars(f.b(), f.det(), bottom, p.materials(), p.code())
                                * bottom.area()
                                * p.space().maxLayers());
            }
        }
        for (int i = 0; i < n; i++) {
            BarSize top = sizes.get(i);
            double cheapestTop = Double.POSITIVE_INFINITY;
            TopOption mostContinuous = null;
            for (TopOption o : tops) {
                if (o.bar().equals(top)) {
                    cheapestTop = Math.min(cheapestTop, o.cost());
                    if (mostContinuous == null || o.continuous() > mostContinuous.continuous()) {
                        mostContinuous = o;
                    }
                }
            }
            if (mostContinuous == null) {
                continue;
            }
            int crackControlled = BarSpacing.minBarsForCrackControl(f.b(), f.det(), top, fy, p.code());
            double ext = Extension.of(p, f.b(), f.h(), f.det(), top).length();
            double dMax = f.h() - f.det().firstLayerCentroid(top.diameter());
            double dp = f.det().firstLayerCentroid(sizes.get(0).diameter());
            double supports = 0;
            for (SpanProblem.Place place : new SpanProblem.Place[] {SpanProblem.Place.LEFT, SpanProblem.Place.RIGHT}) {
                Double mu = place == SpanProblem.Place.LEFT
                        ? (p.leftSupport() ? p.mLeft() : null)
                        : (p.rightSupport() ? p.mRight() : null);
                if (mu == null) {
                    continue;
                }
                double area = StrengthBound.minTensionArea(mu, dMax, compressionArea, dp, dp, f.b(), fc, fy);
                if (Double.isInfinite(area)) {
                    supports = Double.POSITIVE_INFINITY;
                    break;
                }
                // minimum steel (9.6.1.2) at the shallowest d the layers could give, or 4/3 of the strength need
                double dMin = f.h()
                        - f.det().firstLayerCentroid(top.diameter())
                        - (p.space().maxLayers() - 1)
                                * (top.diameter() + f.det().layerGap());
                double asMin = asMinPerDepth(Bending.HOGGING) * dMin;
                area = StrengthBound.withMinimumSteel(area, asMin);
                int bars = Math.max(Math.max(2, crackControlled), (int) Math.ceil(area / top.area() - 1e-9));
                supports += ctx.barCost(top, bars, ext) + leanStirrups(place);
            }
            if (Double.isInfinite(supports)) {
                continue;
            }
            for (int j = 0; j < n; j++) {
                BarSize bottom = sizes.get(j);
                if (p.maxBarSizes() < 2 && !bottom.equals(top)) {
                    continue;
                }
                out[i][j] = f.cost() + cheapestTop + bottomBars(mostContinuous, bottom) + leanMid + supports;
            }
        }
        return out;
    }

    /**
     * The least a combination with top bars of size {@code top} could cost apart from its supports'
     * options: the frame, the cheapest top option of that size, and the least bottom bars (with the most
     * continuous bars of that size as compression steel) and mid-span stirrups.
     */
    double besideSupports(List<TopOption> tops, BarSize top) {
        double cheapestTop = Double.POSITIVE_INFINITY;
        TopOption mostContinuous = null;
        for (TopOption o : tops) {
            if (o.bar().equals(top)) {
                cheapestTop = Math.min(cheapestTop, o.cost());
                if (mostContinuous == null || o.continuous() > mostContinuous.continuous()) {
                    mostContinuous = o;
                }
            }
        }
        if (mostContinuous == null) {
            return Double.POSITIVE_INFINITY;
        }
        double bottom = Double.POSITIVE_INFINITY;
        for (BarSize size : p.space().barSizes()) {
            if (p.maxBarSizes() >= 2 || size.equals(top)) {
                bottom = Math.min(bottom, bottomBars(mostContinuous, size));
            }
        }
        return f.cost() + cheapestTop + bottom + leanMid();
    }

    /**
     * A lower bound on a mid-span option's cost for a top option: the least bottom bars of any size (see
     * {@link #bottomBars}) and the leanest mid-span stirrups.
     */
    double midSpan(TopOption top) {
        double best = Double.POSITIVE_INFINITY;
        for (BarSize bottom : p.space().barSizes()) {
            best = Math.min(best, bottomBars(top, bottom));
        }
        return best + leanMid();
    }

    /**
     * The least the bottom bars of one size could cost with a top option's continuous bars as compression
     * steel: the section model's strength bound on the area, in whole bars, no fewer than two or than crack
     * control asks of the first layer.
     */
    double bottomBars(TopOption top, BarSize bottom) {
        int continuous = top.continuous();
        if (bottomBars.length <= continuous) {
            bottomBars = Arrays.copyOf(bottomBars, continuous + 1);
        }
        if (bottomBars[continuous] == null) {
            int n = p.space().barSizes().size();
            bottomBars[continuous] = new double[n][n];
            for (double[] row : bottomBars[continuous]) {
                Arrays.fill(row, Double.NaN);
            }
        }
        double[] row = bottomBars[continuous][ctx.index(top.bar())];
        int j = ctx.index(bottom);
        if (Double.isNaN(row[j])) {
            row[j] = computeBottomBars(top, bottom);
        }
        return row[j];
    }

    private double computeBottomBars(TopOption top, BarSize bottom) {
        if (!p.midSection()) {
            return ctx.barCost(bottom, 2, p.span()); // a cantilever's bottom bars are two or more hangers
        }
        double widest = p.flange() != null ? p.flange().on(f.b()).width() : f.b(); // effective width on this web
        double fc = p.materials().fc();
        double fy = p.materials().fy();
        double compressionArea = top.continuous() * top.bar().area();
        double dp = f.det().firstLayerCentroid(top.bar().diameter());
        double dMax = f.h() - f.det().firstLayerCentroid(bottom.diameter());
        double area = StrengthBound.minTensionArea(p.mMid(), dMax, compressionArea, dp, dp, widest, fc, fy);
        if (Double.isInfinite(area)) {
            return Double.POSITIVE_INFINITY;
        }
        // minimum steel (9.6.1.2) at the shallowest d the layers could give, or 4/3 of the strength need (9.6.1.3)
        double dMin = f.h()
                - f.det().firstLayerCentroid(bottom.diameter())
                - (p.space().maxLayers() - 1) * (bottom.diameter() + f.det().layerGap());
        double asMin = asMinPerDepth(Bending.SAGGING) * dMin; // As,min is proportional to d
        area = StrengthBound.withMinimumSteel(area, asMin);
        int crackControlled = crackBars(bottom);
        int bars = Math.max(Math.max(2, crackControlled), (int) Math.ceil(area / bottom.area() - 1e-9));
        return ctx.barCost(bottom, bars, p.span());
    }

    /** As,min of 9.6.1.2 per mm of d for the frame (the section model's rule at d = 1 mm). */
    private double asMinPerDepth(Bending bending) {
        if (Double.isNaN(asMinSagging)) {
            SectionShape shape = new SectionShape(f.b(), f.h(), p.flange());
            Span span = new Span(p.span(), p.ends());
            asMinSagging = SectionChecks.asMin(shape, Bending.SAGGING, span, p.materials(), p.code(), 1.0);
            asMinHogging = SectionChecks.asMin(shape, Bending.HOGGING, span, p.materials(), p.code(), 1.0);
        }
        return bending == Bending.SAGGING ? asMinSagging : asMinHogging;
    }

    /** The fewest bars of a size crack control (24.3.2) allows in the frame's first layer. */
    private int crackBars(BarSize bar) {
        int i = ctx.index(bar);
        if (crackBars[i] < 0) {
            crackBars[i] = BarSpacing.minBarsForCrackControl(
                    f.b(), f.det(), bar, p.materials().fy(), p.code());
        }
        return crackBars[i];
    }

    /** The least the stirrups of the mid-span zones could cost (see {@link #leanStirrups}). */
    double leanMid() {
        return leanStirrups(SpanProblem.Place.MID);
    }

    /**
     * The least the stirrups of the zones at a place could cost: each zone's cheapest stirrups (fewest
     * legs allowed) for the most favourable section the frame could have (the deepest d, a tension area
     * that takes Vc to its cap), which can only pass more than any real layout does. Infinite if even
     * that fails.
     */
    double leanStirrups(SpanProblem.Place place) {
        Double known = leanStirrups.get(place);
        if (known != null) {
            return known;
        }
        SectionShape shape = new SectionShape(f.b(), f.h(), p.flange());
        double dMax = f.h() - f.det().firstLayerCentroid(ctx.smallestBar().diameter());
        double asBig = 0.1 * f.b() * dMax;
        double total = 0;
        for (int zi : ctx.zonesAt(place)) {
            SpanProblem.Zone z = ctx.zones().get(zi);
            Stirrups st = ctx.chooser()
                    .cheapest(
                            shape,
                            f.det(),
                            dMax,
                            asBig,
                            z.vuLeast(),
                            p.space().stirrupLegs().get(0),
                            z.length());
            if (st == null) {
                total = Double.POSITIVE_INFINITY;
                break;
            }
            total += ctx.stirrupCost(f.b(), f.h(), st, z);
        }
        leanStirrups.put(place, total);
        return total;
    }

    /** More than any choice of stirrups over the whole span could cost (the most legs, the closest spacing). */
    double stirrupCeiling() {
        int legs = p.space().stirrupLegs().get(p.space().stirrupLegs().size() - 1);
        Stirrups dense =
                new Stirrups(f.stirrupBar(), legs, p.space().stirrupSpacings().get(0));
        double total = 0;
        for (SpanProblem.Zone z : ctx.zones()) {
            total += ctx.stirrupCost(f.b(), f.h(), dense, z);
        }
        return total;
    }
}
