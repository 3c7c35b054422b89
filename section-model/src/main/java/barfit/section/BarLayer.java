package barfit.section;

import barfit.catalogs.BarSize;

/**
 * {@code count} bars of one size in a layer on {@code face}; {@code fromFace} is the distance from that
 * face to the bars' centroid, mm.
 */
public record BarLayer(Face face, BarSize bar, int count, double fromFace) {
    public BarLayer {
        if (count < 1) {
            throw new IllegalArgumentException("a layer needs at least one bar");
        }
    }

    public double area() {
        return count * bar.area();
    }
}
