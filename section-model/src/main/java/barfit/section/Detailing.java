package barfit.section;

import barfit.catalogs.BarSize;

/**
 * Clear cover to the stirrups, the stirrup bar that sets where the longitudinal bars sit, the clear
 * gap between layers and the exposure class. mm.
 */
public record Detailing(double cover, BarSize stirrupBar, double layerGap, Exposure exposure) {
    /** Distance from a face to the centroid of a first-layer bar of diameter {@code db}. */
    public double firstLayerCentroid(double db) {
        return cover + stirrupBar.diameter() + db / 2.0;
    }

    /** Clear cover from the tension face to the longitudinal bars (cc of 24.3.2). */
    public double coverToMainBars() {
        return cover + stirrupBar.diameter();
    }
}
