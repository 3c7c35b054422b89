package barfit.design.span;

import barfit.catalogs.BarSize;
import barfit.section.Detailing;
import barfit.section.SkinBars;

/**
 * A span's section outline with its stirrup size: the concrete, formwork and skin bars it costs over the
 * span ({@code cost}), a lower bound on any design in it ({@code lowerBound}), whether it is below
 * Table 9.3.1.1's depth so deflection must be computed, and how far top bars of the smallest size extend
 * past each support's face (0 where there is no support).
 */
public record SpanFrame(
        double b,
        double h,
        BarSize stirrupBar,
        Detailing det,
        SkinBars skin,
        double cost,
        double lowerBound,
        boolean deflection,
        double extLeft,
        double extRight) {}
