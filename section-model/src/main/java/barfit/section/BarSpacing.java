package barfit.section;

import barfit.catalogs.BarSize;

/**
 * Where bars fit across a web: clear spacing in a layer (25.2.1) and the crack-control spacing of the
 * layer nearest the tension face (24.3.2). Bars sit against the stirrup legs: the outer bars' surfaces
 * are cover + stirrup diameter from the side faces.
 */
public final class BarSpacing {
    private BarSpacing() {}

    /** Width between the inner faces of the stirrup legs, where a layer's bars must fit. */
    public static double innerWidth(double bw, Detailing det) {
        return bw - 2 * (det.cover() + det.stirrupBar().diameter());
    }

    /**
     * Whether the web leaves bars of this size room between the inner faces of its stirrup legs: an inner
     * width of one bar diameter or less holds no bar beside another, so no layer of them.
     */
    public static boolean roomFor(double bw, Detailing det, BarSize bar) {
        return innerWidth(bw, det) > bar.diameter();
    }

    /** Least clear spacing between bars in a layer: max(25 mm, db, 4/3 aggregate) (25.2.1). */
    public static double minClear(BarSize bar, Materials m, CodeEquations code) {
        return Math.max(code.minClearSpacing(), Math.max(bar.diameter(), 4.0 / 3.0 * m.aggregate()));
    }

    /** Clear spacing between n bars of diameter db spread across the inner width. */
    public static double clear(double bw, Detailing det, double db, int n) {
        double inner = innerWidth(bw, det);
        return n <= 1 ? inner - db : (inner - n * db) / (n - 1);
    }

    /** Centre-to-centre spacing of n bars; a single bar leaves the whole web width unreinforced. */
    public static double centreSpacing(double bw, Detailing det, double db, int n) {
        return n <= 1 ? bw : (innerWidth(bw, det) - db) / (n - 1);
    }

    /** Most bars of this size that fit in one layer with the 25.2.1 clear spacing (0 if none fits). */
    public static int maxBars(double bw, Detailing det, BarSize bar, Materials m, CodeEquations code) {
        double inner = innerWidth(bw, det);
        double db = bar.diameter();
        if (inner < db) {
            return 0;
        }
        double smin = minClear(bar, m, code);
        int n = (int) Math.floor((inner + smin) / (db + smin) + 1e-9);
        return Math.max(n, 1);
    }

    /** fs = 2/3 fy, permitted by 24.3.2.1. */
    public static double serviceStress(double fy) {
        return 2.0 / 3.0 * fy;
    }

    /** Maximum centre-to-centre spacing of 24.3.2: min(380(280/fs) − 2.5 cc, 300(280/fs)). */
    public static double crackSpacingLimit(double fy, double cc, CodeEquations code) {
        double ratio = code.crackFsRef() / serviceStress(fy);
        return Math.min(code.crackA() * ratio - 2.5 * cc, code.crackB() * ratio);
    }

    /** Fewest bars of this size in the layer nearest the tension face that satisfy 24.3.2. */
    public static int minBarsForCrackControl(double bw, Detailing det, BarSize bar, double fy, CodeEquations code) {
        double limit = crackSpacingLimit(fy, det.coverToMainBars(), code);
        if (bw <= limit) {
            return 1;
        }
        if (limit <= 0) {
            return Integer.MAX_VALUE;
        }
        double span = innerWidth(bw, det) - bar.diameter();
        int n = (int) Math.ceil(span / limit - 1e-9) + 1;
        return Math.max(n, 2);
    }
}
