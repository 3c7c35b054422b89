package barfit.section;

import barfit.catalogs.BarSize;

/** Skin reinforcement along each side face (9.7.2.3): bar size and vertical spacing, mm. */
public record SkinBars(BarSize bar, double spacing) {
    /** Bars on one face of a beam {@code h} deep: over h/2 from the tension face at the spacing, one at least. */
    public static int perFace(double h, double spacing) {
        return Math.max(1, (int) Math.ceil(h / 2 / spacing - 1e-9) - 1);
    }
}
