package barfit.design.span;

import barfit.catalogs.BarSize;
import barfit.section.Stirrups;
import java.util.List;
import java.util.Map;

/**
 * The top bars at a continuous support ({@code counts} per layer from the top face, the continuous bars
 * in the first), their effective depth, the stirrups of the zones that use the section (by zone index) and
 * the cost of both. {@code legs} is the fewest stirrup legs its zones were given and {@code legsMax} the
 * most: the bottom bars must ask no more than the first and hold the second. {@code bottom} is the bottom
 * bars it was designed with as compression steel (anchored bottom bars), null for none.
 */
public record SupportOption(
        BarSize bar,
        List<Integer> counts,
        double d,
        int legs,
        int legsMax,
        Map<Integer, Stirrups> zones,
        double cost,
        BottomBars bottom) {
    /**
     * Whether its stirrups suit a mid-span option's bottom bars: enough legs for the office's rule
     * and no more legs than the bottom bars' outer layer can hold (25.7.1.2, 25.7.1.3).
     */
    public boolean holds(MidOption m) {
        return legs >= m.legsNeeded() && legsMax <= m.counts().get(0);
    }
}
