package barfit.design.span;

import barfit.section.SectionShape;
import barfit.section.Stirrups;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The cheapest passing stirrups of a span's zones in one frame, asked of the stirrup chooser and
 * remembered: in a frame they depend only on the zone, the tension bars' d and As, and the legs and
 * spacing asked for. One per frame evaluated.
 */
final class ZoneStirrups {
    /** The cheapest stirrups of some zones for one set of tension bars (by zone index), and their cost. */
    record Choice(Map<Integer, Stirrups> stirrups, double cost) {}

    private record Key(int zone, double d, double as, int legs, int mostLegs, double maxSpacing) {}

    private final SpanContext ctx;
    private final SpanFrame f;
    private final SectionShape shape;
    private final Map<Key, Stirrups> known = new HashMap<>();

    ZoneStirrups(SpanContext ctx, SpanFrame frame, SectionShape shape) {
        this.ctx = ctx;
        this.f = frame;
        this.shape = shape;
    }

    /**
     * Stirrups with {@code legs} to {@code mostLegs} legs, at most {@code maxSpacing} apart, in each of the
     * zones, for tension bars at depth {@code d} of area {@code as}; null if some zone has none that pass.
     */
    Choice cheapest(List<Integer> zoneIds, int legs, int mostLegs, double maxSpacing, double d, double as) {
        Map<Integer, Stirrups> chosen = new LinkedHashMap<>();
        double cost = 0;
        for (int zi : zoneIds) {
            Stirrups st = inZone(zi, legs, mostLegs, maxSpacing, d, as);
            if (st == null) {
                return null;
            }
            chosen.put(zi, st);
            cost += ctx.stirrupCost(f.b(), f.h(), st, ctx.zones().get(zi));
        }
        return new Choice(chosen, cost);
    }

    private Stirrups inZone(int zone, int legs, int mostLegs, double maxSpacing, double d, double as) {
        Key key = new Key(zone, d, as, legs, mostLegs, maxSpacing);
        if (known.containsKey(key)) {
            return known.get(key);
        }
        SpanProblem.Zone z = ctx.zones().get(zone);
        Stirrups st = ctx.chooser().cheapest(shape, f.det(), d, as, z.vu(d), legs, mostLegs, maxSpacing, z.length());
        known.put(key, st);
        return st;
    }
}
