package barfit.input;

import barfit.catalogs.yaml.YFields;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.Locale;

/**
 * The plausible range of every dimension, load, rate and spacing barfit reads, in the units of the file
 * (SI: mm, m for spans, kN, kN·m, kN/m; US: in, ft, kip, kip·ft, kip/ft). These are not code rules: they
 * catch typing and unit mistakes (a 100 m wide web, stirrups at 1e-300 mm, a span in mm) before the
 * section model or the search is asked about them, and they are wide enough for any real building
 * (common practice, no source). The code's own limits (f'c, fy, λ) are in the section model's
 * {@code MaterialLimits}; the checks themselves stay with the section model. The YAML and CSV readers
 * both check against these.
 */
public final class InputLimits {

    /**
     * A range: {@code what} names the value in a message ("a web width"); the bounds are in the file's
     * units, per unit system. A lower bound of 0 means "above zero" (the reader has already asked for a
     * positive number). {@code magnitude} ranges bound the absolute value (moments: + sagging, − hogging).
     */
    public record Range(
            String what, Dim dim, double siMin, double siMax, double usMin, double usMax, boolean magnitude) {

        public double min(UnitSystem u) {
            return u == UnitSystem.US ? usMin : siMin;
        }

        public double max(UnitSystem u) {
            return u == UnitSystem.US ? usMax : siMax;
        }

        public boolean contains(UnitSystem u, double v) {
            double x = magnitude ? Math.abs(v) : v;
            return x >= min(u) && x <= max(u);
        }

        /** The unit a value of this range is written in, or "" for plain numbers. */
        public String unit(UnitSystem u) {
            return dim == Dim.NUMBER ? "" : " " + u.unit(dim);
        }

        /** "a web width from 100 to 3000 mm" */
        public String words(UnitSystem u) {
            if (magnitude) {
                return what + " of at most " + fmt(max(u)) + unit(u) + " either way";
            }
            if (min(u) == 0) {
                return what + " of at most " + fmt(max(u)) + unit(u);
            }
            return what + " from " + fmt(min(u)) + " to " + fmt(max(u)) + unit(u);
        }

        /**
         * Null when {@code v} (in the file's units) is in range; otherwise what to say after the key's
         * path: "expected a web width from 100 to 3000 mm, got 100000", with a hint where a unit mistake
         * would explain the value.
         */
        public String problem(UnitSystem u, double v) {
            if (contains(u, v)) {
                return null;
            }
            return "expected " + words(u) + ", got " + fmt(v) + hint(u, v);
        }

        private String hint(UnitSystem u, double v) {
            boolean us = u == UnitSystem.US;
            if (dim == Dim.SPAN && v > max(u)) {
                if (us && contains(u, v / 12)) {
                    return " (" + fmt(v) + " ft: did you give in? spans are in ft)";
                }
                if (contains(u, v / (us ? MM_PER_IN * 12 : 1000))) {
                    return " (" + fmt(v) + " " + u.unit(Dim.SPAN) + ": did you give mm? spans are in "
                            + u.unit(Dim.SPAN) + ")";
                }
            }
            if (dim == Dim.LENGTH) {
                if (us && v > max(u) && contains(u, v / MM_PER_IN)) {
                    return " (" + fmt(v) + " in: did you give mm? inch-pound lengths are in in, or write units: SI)";
                }
                if (!us && v < min(u) && contains(u, v * 1000)) {
                    return " (" + fmt(v) + " mm: did you give m? SI lengths are in mm)";
                }
                if (!us && v < min(u) && contains(u, v * MM_PER_IN)) {
                    return " (" + fmt(v) + " mm: did you give in? SI lengths are in mm, or write units: US)";
                }
            }
            return "";
        }
    }

    private static final double MM_PER_IN = 25.4;

    // ---- the section ----
    public static final Range WEB_WIDTH = new Range("a web width", Dim.LENGTH, 100, 3000, 4, 120, false);
    public static final Range HEIGHT = new Range("a total height", Dim.LENGTH, 150, 5000, 6, 200, false);
    public static final Range FLANGE_WIDTH = new Range("a flange width", Dim.LENGTH, 100, 30_000, 4, 1200, false);
    public static final Range FLANGE_THICKNESS =
            new Range("a flange (slab) thickness", Dim.LENGTH, 40, 1500, 1.5, 60, false);
    public static final Range WEB_GAP =
            new Range("a clear distance to the next web", Dim.LENGTH, 50, 30_000, 2, 1200, false);
    // ---- detailing ----
    public static final Range COVER = new Range("a clear cover", Dim.LENGTH, 10, 150, 0.375, 6, false);
    public static final Range AGGREGATE = new Range("a maximum aggregate size", Dim.LENGTH, 5, 100, 0.2, 4, false);
    public static final Range LAYER_GAP = new Range("a clear gap between layers", Dim.LENGTH, 0, 300, 0, 12, false);
    public static final Range STIRRUP_SPACING = new Range("a stirrup spacing", Dim.LENGTH, 10, 1500, 0.5, 60, false);
    public static final Range SKIN_SPACING = new Range("a skin bar spacing", Dim.LENGTH, 10, 1500, 0.5, 60, false);
    /** Vertical legs of a stirrup set (the search's legs list takes the same). */
    public static final int MAX_LEGS = 12;
    // ---- the span and its actions ----
    public static final Range SPAN = new Range("a span", Dim.SPAN, 0.3, 60, 1, 200, false);
    public static final Range MOMENT = new Range("a factored moment", Dim.MOMENT, 0, 150_000, 0, 110_000, true);
    public static final Range SHEAR = new Range("a factored shear", Dim.FORCE, 0, 50_000, 0, 11_000, false);
    public static final Range TORSION = new Range("a factored torsion", Dim.MOMENT, 0, 20_000, 0, 15_000, false);
    public static final Range LINE_LOAD = new Range("a service load", Dim.LINE_LOAD, 0, 2000, 0, 140, false);
    /** A distributed service torque, kN·m/m (kip·ft/ft): a force in either system's units. */
    public static final Range TORQUE = new Range("a distributed service torque", Dim.FORCE, 0, 1000, 0, 225, false);

    public static final Range SPAN_DIVISOR = new Range("a span divisor", Dim.NUMBER, 100, 2000, 100, 2000, false);
    // ---- costs (any currency; above these a rate is taken for a typing mistake) ----
    public static final Range RATE = new Range("a rate", Dim.NUMBER, 0, 10_000_000, 0, 10_000_000, false);
    /** A carbon factor: kg CO2e per m³, kg or m² (lb CO2e per yd³, lb or ft² in US files). */
    public static final Range CARBON_FACTOR = new Range("a carbon factor", Dim.NUMBER, 0, 50_000, 0, 50_000, false);

    public static final Range SET_COST =
            new Range("a cost per set of forms", Dim.NUMBER, 0, 1_000_000_000, 0, 1_000_000_000, false);

    private InputLimits() {}

    /** Refuses {@code v} (in the file's units), the value of {@code key} in {@code f}, when out of {@code r}. */
    public static double require(YFields f, String key, Range r, UnitSystem u, double v) {
        String problem = r.problem(u, v);
        if (problem != null) {
            throw f.error(key, problem);
        }
        return v;
    }

    /** As above, for a value without units (a count, a cost): its range is the same in either system. */
    public static double require(YFields f, String key, Range r, double v) {
        if (r.dim() != Dim.NUMBER || r.siMin() != r.usMin() || r.siMax() != r.usMax()) {
            throw new IllegalArgumentException(r.what() + " has units; give the file's units");
        }
        return require(f, key, r, UnitSystem.SI, v);
    }

    static String fmt(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e12) {
            return String.valueOf((long) v);
        }
        if (Math.abs(v) >= 1e-3 && Math.abs(v) < 1e12) {
            return String.format(Locale.ROOT, "%.4g", v).replaceAll("\\.?0+$", "");
        }
        return String.format(Locale.ROOT, "%.3g", v);
    }
}
