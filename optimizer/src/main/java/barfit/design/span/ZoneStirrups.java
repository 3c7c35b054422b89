package barfit.design.span;

import barfit.design.StirrupChooser;
import barfit.section.BarLayer;
import barfit.section.BeamSection;
import barfit.section.CheckResult;
import barfit.section.Demand;
import barfit.section.Face;
import barfit.section.SectionShape;
import barfit.section.Span;
import barfit.section.Stirrups;
import barfit.section.TorsionZone;
import barfit.section.trail.Trail;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The cheapest passing stirrups of a span's zones in one frame, asked of the stirrup chooser and
 * remembered: in a frame they depend only on the zone, the tension bars' d and As, and the legs and
 * spacing asked for. One per frame evaluated.
 *
 * <p>Under torsion the stirrups of a zone must pass the section model's torsion checks on stirrups too,
 * which also hang on the smallest corner or skin bar (9.7.5.2); the zone's other torsion checks (the
 * longitudinal steel, its corners and spacing) do not hang on the stirrups, so where they fail on the
 * bars given no stirrups pass.
 */
final class ZoneStirrups {
    /** The cheapest stirrups of some zones for one set of tension bars (by zone index), and their cost. */
    record Choice(Map<Integer, Stirrups> stirrups, double cost) {}

    private record Key(int zone, double d, double as, int legs, int mostLegs, double maxSpacing, double smallestBar) {}

    private record BarsKey(int zone, Stirrups stirrups, List<BarLayer> layers, double d) {}

    private final SpanContext ctx;
    private final SpanFrame f;
    private final SectionShape shape;
    private final Map<Key, Stirrups> known = new HashMap<>();
    private final Map<BarsKey, Boolean> barsPass = new HashMap<>();

    ZoneStirrups(SpanContext ctx, SpanFrame frame, SectionShape shape) {
        this.ctx = ctx;
        this.f = frame;
        this.shape = shape;
    }

    /**
     * Stirrups with {@code legs} to {@code mostLegs} legs, at most {@code maxSpacing} apart, in each of the
     * zones, for tension bars at depth {@code d} of area {@code as}; null if some zone has none that pass.
     * {@code bars}: every bar at the zones' section (without stirrups), for the torsion checks.
     */
    Choice cheapest(
            List<Integer> zoneIds, int legs, int mostLegs, double maxSpacing, double d, double as, BeamSection bars) {
        Map<Integer, Stirrups> chosen = new LinkedHashMap<>();
        double cost = 0;
        for (int zi : zoneIds) {
            Stirrups st = inZone(zi, legs, mostLegs, maxSpacing, d, as, bars);
            if (st == null) {
                return null;
            }
            chosen.put(zi, st);
            cost += ctx.stirrupCost(f.b(), f.h(), st, ctx.zones().get(zi));
        }
        return new Choice(chosen, cost);
    }

    private Stirrups inZone(
            int zone, int legs, int mostLegs, double maxSpacing, double d, double as, BeamSection bars) {
        SpanProblem.Zone z = ctx.zones().get(zone);
        Demand torsion = SpanVerifier.torsionDemand(ctx.problem(), z, z.vu(d), f.b(), d);
        Key key = new Key(zone, d, as, legs, mostLegs, maxSpacing, torsion == null ? 0 : smallestBar(bars));
        Stirrups st;
        if (known.containsKey(key)) {
            st = known.get(key);
        } else {
            StirrupChooser.Torsion t =
                    torsion == null ? null : new StirrupChooser.Torsion(torsion, bars.layers(), bars.skin());
            st = ctx.chooser().cheapest(shape, f.det(), d, as, z.vu(d), legs, mostLegs, maxSpacing, z.length(), t);
            known.put(key, st);
        }
        if (st == null || torsion == null) {
            return st;
        }
        return barsPass.computeIfAbsent(
                        new BarsKey(zone, st, bars.layers(), d),
                        k -> TorsionZone.checks(
                                        bars.withStirrups(k.stirrups()),
                                        torsion,
                                        new Span(
                                                ctx.problem().span(),
                                                ctx.problem().ends()),
                                        z.name(),
                                        Trail.off())
                                .stream()
                                .allMatch(CheckResult::pass))
                ? st
                : null;
    }

    /** The smallest corner or skin bar (what 9.7.5.2 weighs against the spacing): part of the memo's key. */
    private static double smallestBar(BeamSection s) {
        double smallest =
                s.skin() == null ? Double.POSITIVE_INFINITY : s.skin().bar().diameter();
        for (Face face : Face.values()) {
            List<BarLayer> layers = s.layersOn(face);
            if (!layers.isEmpty()) {
                smallest = Math.min(smallest, layers.get(0).bar().diameter());
            }
        }
        return smallest;
    }
}
