package barfit.design;

import barfit.section.BarLayer;
import barfit.section.BeamSection;
import barfit.section.CheckResult;
import barfit.section.CodeEquations;
import barfit.section.Demand;
import barfit.section.Detailing;
import barfit.section.Materials;
import barfit.section.SectionChecks;
import barfit.section.SectionShape;
import barfit.section.ShearVerdict;
import barfit.section.SkinBars;
import barfit.section.Stirrups;
import barfit.section.TorsionChecks;
import java.util.List;

/**
 * The cheapest stirrup option that passes the shear checks (or, without Vu, the minimum-stirrup rule)
 * for tension steel As at effective depth d. Per number of legs, strength and minimum area only get
 * easier as the spacing closes, so the widest spacing meeting them is found by bisection; the spacing
 * limits of 9.7.6.2.2 (which halve when Vs is high) are then settled by stepping down. Under torsion the
 * stirrups must pass the section model's torsion checks on them too ({@link TorsionChecks#stirrupChecks}),
 * each of which also only gets easier as the spacing closes.
 */
public final class StirrupChooser {
    /**
     * What torsion asks of the stirrups of one layout: the demand with its Tu, and the bars whose smallest
     * corner or skin bar 9.7.5.2 weighs against the spacing.
     */
    public record Torsion(Demand demand, List<BarLayer> layers, SkinBars skin, boolean withSectionSize) {
        public Torsion {
            layers = List.copyOf(layers);
        }

        /** Every torsion check on stirrups. */
        public Torsion(Demand demand, List<BarLayer> layers, SkinBars skin) {
            this(demand, layers, skin, true);
        }

        /**
         * Whether the stirrups of {@code s} pass; without the section size check ({@code withSectionSize}
         * false) for a lower bound over a frame, where d and As are the frame's largest: the other checks only
         * get easier as they grow, the section size need not.
         */
        boolean pass(BeamSection s, double d, double as) {
            return TorsionChecks.stirrupsPass(s, demand, d, as, withSectionSize);
        }
    }

    private final Materials materials;
    private final CodeEquations code;
    private final SearchSpace space;
    private final CostModel cost;
    private int evaluations;

    public StirrupChooser(Materials materials, CodeEquations code, SearchSpace space, CostModel cost) {
        this.materials = materials;
        this.code = code;
        this.space = space;
        this.cost = cost;
    }

    public int evaluations() {
        return evaluations;
    }

    /**
     * Cheapest per metre of beam.
     *
     * @param vu the zone's factored shear, or null for minimum stirrups; {@code minLegs} from the bars per layer
     */
    public Stirrups cheapest(SectionShape shape, Detailing det, double d, double as, Double vu, int minLegs) {
        return cheapest(shape, det, d, as, vu, minLegs, 0);
    }

    /**
     * Cheapest over a zone of the given length (whole sets, one per spacing started), or per metre when
     * {@code zoneLength} is 0.
     */
    public Stirrups cheapest(
            SectionShape shape, Detailing det, double d, double as, Double vu, int minLegs, double zoneLength) {
        return cheapest(shape, det, d, as, vu, minLegs, Integer.MAX_VALUE, zoneLength);
    }

    /** As above with at most {@code maxLegs} legs (each leg's bend must hold a bar of each face). */
    public Stirrups cheapest(
            SectionShape shape,
            Detailing det,
            double d,
            double as,
            Double vu,
            int minLegs,
            int maxLegs,
            double zoneLength) {
        return cheapest(shape, det, d, as, vu, minLegs, maxLegs, Double.POSITIVE_INFINITY, zoneLength);
    }

    /**
     * As above with the spacing at most {@code maxSpacing} (the ties round compression steel that is relied
     * on, 9.7.6.4.3), or null when no spacing of the space is that close.
     */
    public Stirrups cheapest(
            SectionShape shape,
            Detailing det,
            double d,
            double as,
            Double vu,
            int minLegs,
            int maxLegs,
            double maxSpacing,
            double zoneLength) {
        return cheapest(shape, det, d, as, vu, minLegs, maxLegs, maxSpacing, zoneLength, null);
    }

    /** As above, the stirrups passing the torsion checks of {@code torsion} too (null: no torsion). */
    public Stirrups cheapest(
            SectionShape shape,
            Detailing det,
            double d,
            double as,
            Double vu,
            int minLegs,
            int maxLegs,
            double maxSpacing,
            double zoneLength,
            Torsion torsion) {
        List<Double> spacings = space.stirrupSpacings();
        if (maxSpacing < spacings.get(spacings.size() - 1)) {
            spacings = spacings.stream()
                    .filter(sp -> CheckResult.within(sp, maxSpacing))
                    .toList();
            if (spacings.isEmpty()) {
                return null;
            }
        }
        Stirrups best = null;
        double bestCost = Double.POSITIVE_INFINITY;
        for (int legs : space.stirrupLegs()) {
            if (legs < minLegs || legs > maxLegs) {
                continue;
            }
            Stirrups widest = new Stirrups(det.stirrupBar(), legs, spacings.get(spacings.size() - 1));
            if (cost(shape, widest, zoneLength) >= bestCost) {
                continue; // even its widest spacing costs more than the best found
            }
            int lo = -1;
            int hi = spacings.size() - 1;
            while (lo < hi) {
                int mid = (lo + hi + 1) >>> 1;
                if (verdict(shape, det, new Stirrups(det.stirrupBar(), legs, spacings.get(mid)), d, as, vu, torsion)
                        .easing()) {
                    lo = mid;
                } else {
                    hi = mid - 1;
                }
            }
            for (int i = lo; i >= 0; i--) {
                Stirrups st = new Stirrups(det.stirrupBar(), legs, spacings.get(i));
                double c = cost(shape, st, zoneLength);
                if (c >= bestCost) {
                    break;
                }
                if (verdict(shape, det, st, d, as, vu, torsion).all()) {
                    best = st;
                    bestCost = c;
                    break;
                }
            }
        }
        return best;
    }

    private double cost(SectionShape shape, Stirrups st, double zoneLength) {
        return zoneLength > 0
                ? Math.max(1, Math.ceil(zoneLength / st.spacing() - 1e-9))
                        * cost.stirrupSetLength(shape.width(), shape.height(), st.bar(), st.legs())
                        * st.bar().massPerMetre()
                : cost.stirrups(shape.width(), shape.height(), st);
    }

    /** {@code easing}: the checks that only get easier as the spacing closes; {@code all}: every check. */
    private record Verdict(boolean easing, boolean all) {}

    private Verdict verdict(
            SectionShape shape, Detailing det, Stirrups st, double d, double as, Double vu, Torsion torsion) {
        BeamSection s = torsion == null
                ? new BeamSection(shape, materials, det, List.of(), st, null, code)
                : new BeamSection(shape, materials, det, torsion.layers(), st, torsion.skin(), code);
        evaluations++;
        ShearVerdict shear =
                vu == null ? SectionChecks.minimumStirrupsVerdict(s, d, as) : SectionChecks.shearVerdict(s, vu, d, as);
        boolean torsionOk = torsion == null || torsion.pass(s, d, as);
        return new Verdict(shear.strengthAndMinimum() && torsionOk, shear.all() && torsionOk);
    }
}
