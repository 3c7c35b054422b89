package barfit.section.anchorage;

import barfit.catalogs.BarSize;
import barfit.section.CodeEquations;
import barfit.section.trail.Q;
import barfit.section.trail.Trail;

/**
 * Standard hooks of longitudinal bars, Table 25.3.1: the least inside bend diameter D (6 db to No. 25 / #8,
 * 8 db to No. 36 / #11, 10 db above) and the straight extension past the bend (12 db for a 90-degree hook;
 * 4 db but at least 65 mm / 2.5 in for a 180-degree hook). A hook develops a bar in tension only
 * (25.4.1.2).
 *
 * <p>The geometry, in the plane of the hook, of a bar running straight to the tangent point where its bend
 * starts:
 *
 * <ul>
 *   <li>reach: along the bar, from the tangent point to the outside of the bend, D/2 + db. ldh is measured
 *       from the critical section to that outside face (25.4.3.1), so a hook whose outside lies L past the
 *       critical section has L − reach of straight bar before its bend, and L must fit in the support;
 *   <li>height: across the bar, out to out, from the outer face of the straight bar to the farthest point of
 *       the hook: db + D/2 + extension for 90 degrees, D + 2 db for 180 degrees;
 *   <li>developed: the centre-line length from the tangent point to the tip, the arc θ (D + db)/2 plus the
 *       extension, for cut lengths.
 * </ul>
 */
public final class StandardHooks {
    /** The bend of a standard hook. */
    public enum Bend {
        DEG_90(Math.PI / 2, "90-degree"),
        DEG_180(Math.PI, "180-degree");

        private final double angle;
        private final String words;

        Bend(double angle, String words) {
            this.angle = angle;
            this.words = words;
        }

        /** The bend's angle in radians. */
        public double angle() {
            return angle;
        }

        public String words() {
            return words;
        }
    }

    /** One hook's geometry, mm (see the class comment). */
    public record Hook(
            Bend bend,
            double db,
            double bendDiameter,
            double extension,
            double reach,
            double height,
            double developed) {

        /**
         * Length of bar from the critical section to the tip of the hook when the hook's outside lies
         * {@code outside} past that section (the ldh provided): the straight part up to the bend plus the
         * developed hook.
         */
        public double barLength(double outside) {
            if (outside < reach - 1e-9) {
                throw new IllegalArgumentException(
                        "a hook reaches " + reach + " mm past its tangent point: its outside cannot be at " + outside);
            }
            return outside - reach + developed;
        }
    }

    private StandardHooks() {}

    /** Least inside bend diameter D of Table 25.3.1, mm. */
    public static double bendDiameter(BarSize bar) {
        int k = BarClasses.upToNo25(bar) ? 6 : BarClasses.upToNo36(bar) ? 8 : 10;
        return k * bar.diameter();
    }

    /** Straight extension past the bend, Table 25.3.1, mm. */
    public static double extension(BarSize bar, Bend bend, CodeEquations code) {
        double db = bar.diameter();
        return bend == Bend.DEG_90 ? 12 * db : Math.max(4 * db, code.anchorage().hook180Min());
    }

    /** The hook's geometry; the trail shows Table 25.3.1's values and the lengths that follow. */
    public static Hook of(BarSize bar, Bend bend, CodeEquations code, Trail t) {
        double db = bar.diameter();
        double d = bendDiameter(bar);
        double ext = extension(bar, bend, code);
        double reach = d / 2 + db;
        double height = bend == Bend.DEG_90 ? db + d / 2 + ext : d + 2 * db;
        double developed = bend.angle() * (d + db) / 2 + ext;
        if (t.isOn()) {
            t.heading("Standard " + bend.words() + " hook of " + bar.label(), "Table 25.3.1");
            t.step("D", "least inside bend diameter", "{} × {}", Q.length(d), Q.number(d / db), Q.length(db));
            if (bend == Bend.DEG_90) {
                t.step("ext", "12 db", "12 × {}", Q.length(ext), Q.length(db));
            } else {
                t.step(
                        "ext",
                        "max(4 db, " + (code.inchPound() ? "2.5 in" : "65 mm") + ")",
                        "max(4 × {}, {})",
                        Q.length(ext),
                        Q.length(db),
                        Q.length(code.anchorage().hook180Min()));
            }
            t.step("reach", "D/2 + db", "{} / 2 + {}", Q.length(reach), Q.length(d), Q.length(db));
            t.value("height", Q.length(height), "out to out across the bar");
            t.step(
                    "developed",
                    "θ (D + db)/2 + ext",
                    "{} × ({} + {}) / 2 + {}",
                    Q.length(developed),
                    Q.number(bend.angle()),
                    Q.length(d),
                    Q.length(db),
                    Q.length(ext));
        }
        return new Hook(bend, db, d, ext, reach, height, developed);
    }
}
