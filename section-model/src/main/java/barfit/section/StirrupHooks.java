package barfit.section;

import barfit.catalogs.BarSize;

/**
 * Bends and hooks of stirrups and ties, Table 25.3.2: the least inside bend diameter and the straight
 * extension of a 90-degree or 135-degree hook. The table covers No. 10 to No. 25 (#3 to #8); a larger
 * bar bent as a stirrup takes the bend diameters of Table 25.3.1 (standard hooks). Sizes are told apart by
 * the bar diameter, so a catalog of plain millimetre sizes falls into the class of the next ASTM size up.
 * The 75 mm least extension is the SI edition's; the inch-pound edition's 3 in is 76.2 mm exactly, so US
 * input reproduces the inch-pound values.
 */
public final class StirrupHooks {
    /** No. 16 (#5): the largest bar of the 4 db bend class, 15.9 mm. */
    private static final double NO_16 = 16.0;
    /** No. 25 (#8): the largest bar Table 25.3.2 covers, 25.4 mm. */
    private static final double NO_25 = 25.4;
    /** No. 36 (#11): the largest bar of Table 25.3.1's 8 db class, 35.8 mm. */
    private static final double NO_36 = 36.0;
    /** Least straight extension of a 135-degree hook, mm: 75 mm (ACI 318M-19), 3 in (ACI 318-19). */
    private static final double MIN_135_SI = 75.0;

    private static final double MIN_135_INCH_POUND = 3 * CodeEquations.MM_PER_IN;

    private StirrupHooks() {}

    private static boolean upTo(BarSize bar, double limit) {
        return bar.diameter() <= limit + 1e-6;
    }

    /**
     * Least inside bend diameter, mm: 4 db for No. 10 to No. 16 and 6 db for No. 19 to No. 25 (Table 25.3.2);
     * beyond those, 8 db to No. 36 and 10 db above (Table 25.3.1).
     */
    public static double insideBendDiameter(BarSize bar) {
        double db = bar.diameter();
        if (upTo(bar, NO_16)) {
            return 4 * db;
        }
        if (upTo(bar, NO_25)) {
            return 6 * db;
        }
        return (upTo(bar, NO_36) ? 8 : 10) * db;
    }

    /**
     * Straight extension of a 135-degree hook, mm: 6 db, at least 75 mm (3 in) (Table 25.3.2, No. 10 to
     * No. 25; a larger stirrup is given the same rule, the table going no further).
     */
    public static double extension135(BarSize bar, CodeEquations code) {
        return Math.max(6 * bar.diameter(), code.inchPound() ? MIN_135_INCH_POUND : MIN_135_SI);
    }

    /** Straight extension of a 90-degree hook, mm: 6 db to No. 16, 12 db for No. 19 to No. 25 (Table 25.3.2). */
    public static double extension90(BarSize bar) {
        if (!upTo(bar, NO_25)) {
            throw new IllegalArgumentException(
                    "Table 25.3.2 gives no 90-degree stirrup hook for " + bar.designation() + " (larger than No. 25)");
        }
        return (upTo(bar, NO_16) ? 6 : 12) * bar.diameter();
    }
}
