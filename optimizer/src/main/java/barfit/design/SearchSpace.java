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
        List<Double> stirrupSpacings) {

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
        return new SearchSpace(w, depths, barSizes, compressionSizes, maxLayers, stirrupSizes, stirrupLegs,
                stirrupSpacings);
    }

    public SearchSpace withDepths(List<Double> d) {
        return new SearchSpace(widths, d, barSizes, compressionSizes, maxLayers, stirrupSizes, stirrupLegs,
                stirrupSpacings);
    }

    public SearchSpace withBarSizes(List<BarSize> bars, List<BarSize> comp) {
        return new SearchSpace(widths, depths, bars, comp, maxLayers, stirrupSizes, stirrupLegs, stirrupSpacings);
    }

    public SearchSpace withMaxLayers(int layers) {
        return new SearchSpace(widths, depths, barSizes, compressionSizes, layers, stirrupSizes, stirrupLegs,
                stirrupSpacings);
    }

    /** Number of (width, depth, stirrup size) frames before any cap. */
    public int frameCount() {
        return widths.size() * depths.size() * stirrupSizes.size();
    }
}
