package barfit.section;

import barfit.catalogs.BarSize;

/** Skin reinforcement along each side face (9.7.2.3): bar size and vertical spacing, mm. */
public record SkinBars(BarSize bar, double spacing) {}
