package barfit.section;

import barfit.catalogs.BarSize;
import java.util.ArrayList;
import java.util.List;

/** Test helpers: build sections from textbook data (areas and depths given directly). */
final class Sections {
    static final double IN = 25.4;
    static final double IN2 = IN * IN;
    static final double KSI = 1000.0 / CodeEquations.PSI_PER_MPA;
    static final double KIP_FT = 4448.2216152605 * 304.8;
    static final double KIP = 4448.2216152605;

    private Sections() {}

    /** A bar of the given designation and size; area need not match pi d²/4 (textbooks give areas). */
    static BarSize bar(String name, double dbMm, double areaMm2) {
        return new BarSize(name, name, dbMm, areaMm2, areaMm2 * 7.85e-3);
    }

    static BarSize us(String name) {
        return switch (name) {
            case "3" -> bar("#3", 0.375 * IN, 0.11 * IN2);
            case "8" -> bar("#8", 1.000 * IN, 0.79 * IN2);
            case "9" -> bar("#9", 1.128 * IN, 1.00 * IN2);
            case "10" -> bar("#10", 1.270 * IN, 1.27 * IN2);
            default -> throw new IllegalArgumentException(name);
        };
    }

    static BarSize si(String name) {
        return switch (name) {
            case "10" -> bar("No. 10", 9.5, 71);
            case "13x" -> bar("No. 13", 12.7, 129);
            case "16" -> bar("No. 16", 15.9, 199);
            case "19" -> bar("No. 19", 19.1, 284);
            case "25" -> bar("No. 25", 25.4, 510);
            case "29" -> bar("No. 29", 28.7, 645);
            case "36" -> bar("No. 36", 35.8, 1006);
            default -> throw new IllegalArgumentException(name);
        };
    }

    static Materials materials(double fc, double fy) {
        return new Materials(fc, fy, fy, 20, 1.0);
    }

    static Detailing detailing(double cover, BarSize stirrup) {
        return new Detailing(cover, stirrup, 25, Exposure.INTERIOR);
    }

    /** A layer whose centroid is {@code d} below the top face (for the bottom face: h − d above it). */
    static BarLayer bottomAtDepth(BarSize bar, int count, double h, double d) {
        return new BarLayer(Face.BOTTOM, bar, count, h - d);
    }

    static BarLayer topAt(BarSize bar, int count, double dPrime) {
        return new BarLayer(Face.TOP, bar, count, dPrime);
    }

    static BeamSection section(SectionShape shape, Materials m, Detailing det, CodeEquations code, BarLayer... layers) {
        return new BeamSection(shape, m, det, List.of(layers), null, null, code);
    }

    static List<BarLayer> list(BarLayer... layers) {
        return new ArrayList<>(List.of(layers));
    }
}
