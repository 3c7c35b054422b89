package barfit.design.span;

import barfit.catalogs.BarSize;
import barfit.section.Stirrups;
import java.util.List;
import java.util.Map;

/**
 * The mid-span section for a top option: the bottom bars ({@code counts} per layer from the bottom face)
 * with the continuous top bars as compression steel, its effective depth, the stirrups of the zones that
 * use it (by zone index), their cost with the bottom bars', and the fewest stirrup legs the office's rule
 * asks of the supports' zones too for these bottom bars.
 */
public record MidOption(
        TopOption top,
        BarSize bar,
        List<Integer> counts,
        double d,
        Map<Integer, Stirrups> zones,
        double cost,
        int legsNeeded) {
    /** Its bottom bars, which a support option counts as compression steel where they are anchored. */
    public BottomBars bottom() {
        return new BottomBars(bar, counts);
    }
}
