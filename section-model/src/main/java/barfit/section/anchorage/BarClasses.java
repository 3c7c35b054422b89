package barfit.section.anchorage;

import barfit.catalogs.BarSize;

/**
 * The size classes the tables of Chapter 25 name (No. 25 / #8, No. 36 / #11), told apart by the bar
 * diameter, so a catalog of plain millimetre sizes falls into the class of the next ASTM size up.
 */
final class BarClasses {
    /** No. 25 (#8): 25.4 mm. */
    static final double NO_25 = 25.4;
    /** No. 36 (#11): 35.8 mm; a 36 mm bar of a plain metric series counts with it. */
    static final double NO_36 = 36.0;

    private BarClasses() {}

    /** No. 25 (#8) and smaller. */
    static boolean upToNo25(BarSize bar) {
        return bar.diameter() <= NO_25 + 1e-6;
    }

    /** No. 36 (#11) and smaller. */
    static boolean upToNo36(BarSize bar) {
        return bar.diameter() <= NO_36 + 1e-6;
    }
}
