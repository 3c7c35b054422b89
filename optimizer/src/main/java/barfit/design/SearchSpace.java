package barfit.design;

import barfit.catalogs.BarSize;
import java.util.List;

/**
 * The discrete space a design is chosen from. Lengths in mm. Depths are the candidate total
 * heights; a beam's headroom cap filters them further.
 */
public record SearchSpace(
        List<Double> widths,
        List<Double> depths,
        List<BarSize> barSizes,
        List<BarSize> compressionSizes,
        int maxLayers,
        List<BarSize> stirrupSizes,
        List<Integer> stirrupLegs,
        List<Double> stirrupSpacings,
        boolean hangersOnly,
        BarSize fixedSkinBar,
        int barsPerTwoLegs) {

    /**
     * No office legs rule unless the user asks for one: the code's rules (legs held by bars, 9.7.6.2.2
     * across the width, 9.7.6.4's ties) apply always; 0 here means no stricter practice on top.
     */
    public static final int DEFAULT_BARS_PER_TWO_LEGS = 0;

    public SearchSpace(
            List<Double> widths,
            List<Double> depths,
            List<BarSize> barSizes,
            List<BarSize> compressionSizes,
            int maxLayers,
            List<BarSize> stirrupSizes,
            List<Integer> stirrupLegs,
            List<Double> stirrupSpacings,
            boolean hangersOnly,
            BarSize fixedSkinBar) {
        this(
                widths,
                depths,
                barSizes,
                compressionSizes,
                maxLayers,
                stirrupSizes,
                stirrupLegs,
                stirrupSpacings,
                hangersOnly,
                fixedSkinBar,
                DEFAULT_BARS_PER_TWO_LEGS);
    }

    /** A space with skin bars of its smallest bar size. */
    public SearchSpace(
            List<Double> widths,
            List<Double> depths,
            List<BarSize> barSizes,
            List<BarSize> compressionSizes,
            int maxLayers,
            List<BarSize> stirrupSizes,
            List<Integer> stirrupLegs,
            List<Double> stirrupSpacings,
            boolean hangersOnly) {
        this(
                widths,
                depths,
                barSizes,
                compressionSizes,
                maxLayers,
                stirrupSizes,
                stirrupLegs,
                stirrupSpacings,
                hangersOnly,
                null);
    }

    /** A space whose compression layer may be anything from the compression sizes. */
    public SearchSpace(
            List<Double> widths,
            List<Double> depths,
            List<BarSize> barSizes,
            List<BarSize> compressionSizes,
            int maxLayers,
            List<BarSize> stirrupSizes,
            List<Integer> stirrupLegs,
            List<Double> stirrupSpacings) {
        this(widths, depths, barSizes, compressionSizes, maxLayers, stirrupSizes, stirrupLegs, stirrupSpacings, false);
    }

    public SearchSpace {
        widths = List.copyOf(widths);
        depths = List.copyOf(depths);
        barSizes = List.copyOf(barSizes);
        compressionSizes = List.copyOf(compressionSizes);
        stirrupSizes = List.copyOf(stirrupSizes);
        stirrupLegs = List.copyOf(stirrupLegs);
        stirrupSpacings = List.copyOf(stirrupSpacings);
    }

    public SearchSpace withWidths(List<Double> w) {
        return new SearchSpace(
                w,
                depths,
                barSizes,
                compressionSizes,
                maxLayers,
                stirrupSizes,
                stirrupLegs,
                stirrupSpacings,
                hangersOnly,
                fixedSkinBar,
                barsPerTwoLegs);
    }

    public SearchSpace withDepths(List<Double> d) {
        return new SearchSpace(
                widths,
                d,
                barSizes,
                compressionSizes,
                maxLayers,
                stirrupSizes,
                stirrupLegs,
                stirrupSpacings,
                hangersOnly,
                fixedSkinBar,
                barsPerTwoLegs);
    }

    public SearchSpace withBarSizes(List<BarSize> bars, List<BarSize> comp) {
        return new SearchSpace(
                widths,
                depths,
                bars,
                comp,
                maxLayers,
                stirrupSizes,
                stirrupLegs,
                stirrupSpacings,
                hangersOnly,
                fixedSkinBar,
                barsPerTwoLegs);
    }

    public SearchSpace withMaxLayers(int layers) {
        return new SearchSpace(
                widths,
                depths,
                barSizes,
                compressionSizes,
                layers,
                stirrupSizes,
                stirrupLegs,
                stirrupSpacings,
                hangersOnly,
                fixedSkinBar,
                barsPerTwoLegs);
    }

    /**
     * The same space with the compression layer limited to the minimum hangers: two bars of the lightest
     * compression size (for a whole span, two continuous top bars). A design found in it needs no
     * compression steel beyond the hangers.
     */
    public SearchSpace withHangersOnly() {
        return new SearchSpace(
                widths,
                depths,
                barSizes,
                compressionSizes,
                maxLayers,
                stirrupSizes,
                stirrupLegs,
                stirrupSpacings,
                true,
                fixedSkinBar,
                barsPerTwoLegs);
    }

    /**
     * The same space with the longitudinal bars limited to {@code bars} (a schedule's bar sizes); skin
     * bars keep the size they had, so limiting the main bars does not change them.
     */
    public SearchSpace withMainBars(List<BarSize> bars) {
        List<BarSize> comp = compressionSizes.stream().filter(bars::contains).toList();
        return new SearchSpace(
                widths,
                depths,
                bars,
                comp.isEmpty() ? bars : comp,
                maxLayers,
                stirrupSizes,
                stirrupLegs,
                stirrupSpacings,
                hangersOnly,
                skinBar(),
                barsPerTwoLegs);
    }

    /** The size of skin bars (9.7.2.3): the smallest bar size searched unless fixed. */
    public BarSize skinBar() {
        if (fixedSkinBar != null) {
            return fixedSkinBar;
        }
        return barSizes.stream()
                .min(java.util.Comparator.comparingDouble(BarSize::diameter))
                .orElseThrow();
    }

    /** Number of (width, depth, stirrup size) frames before any cap. */
    public int frameCount() {
        return widths.size() * depths.size() * stirrupSizes.size();
    }

    /** The same space with another legs rule: two legs hold up to {@code n} bars in a layer. */
    public SearchSpace withBarsPerTwoLegs(int n) {
        return new SearchSpace(
                widths,
                depths,
                barSizes,
                compressionSizes,
                maxLayers,
                stirrupSizes,
                stirrupLegs,
                stirrupSpacings,
                hangersOnly,
                fixedSkinBar,
                n);
    }

    /** The office's legs rule, or null when only the code's rules apply. */
    public barfit.section.StirrupRules.Practice practice() {
        return barsPerTwoLegs > 0 ? new barfit.section.StirrupRules.Practice(barsPerTwoLegs) : null;
    }

    /** Stirrup legs the bars of a layer need by the office's rule (two when there is none). */
    public int legsFor(int barsInLayer) {
        return barsPerTwoLegs > 0 ? practice().legsFor(barsInLayer) : 2;
    }
}
