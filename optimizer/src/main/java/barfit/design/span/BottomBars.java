package barfit.design.span;

import barfit.catalogs.BarSize;
import barfit.section.BeamSection;
import java.util.ArrayList;
import java.util.List;

/**
 * A span's bottom bars: one size, a count per layer from the bottom face up. Where they are anchored at
 * a support they are its compression steel, and a support option is designed for a given set of them.
 */
public record BottomBars(BarSize bar, List<Integer> counts) {
    public BottomBars {
        counts = List.copyOf(counts);
    }

    /** The layers as the section model stacks them. */
    public List<BeamSection.BarGroup> groups() {
        List<BeamSection.BarGroup> out = new ArrayList<>();
        for (int count : counts) {
            out.add(new BeamSection.BarGroup(bar, count));
        }
        return out;
    }
}
