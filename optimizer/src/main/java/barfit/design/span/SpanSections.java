package barfit.design.span;

import barfit.catalogs.BarSize;
import barfit.design.TensionSearch;
import barfit.section.BarLayer;
import barfit.section.BeamSection;
import barfit.section.Bending;
import barfit.section.Face;
import barfit.section.SectionShape;
import barfit.section.SpanChecks;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The section model's sections of a span's options, for the checks that need the whole section (the
 * ties of 9.7.6.4, deflection): a mid-span option's bottom bars with the continuous top bars above, a
 * support option's top bars with the bottom bars it counts.
 */
final class SpanSections {
    private final SpanProblem p;

    SpanSections(SpanProblem problem) {
        this.p = problem;
    }

    /** A mid-span option's section. */
    BeamSection mid(SpanFrame f, SectionShape shape, MidOption m) {
        return mid(f, shape, m.top(), m.bar(), m.counts());
    }

    /** The mid-span section of bottom bars split over layers, the continuous top bars above (for its ties). */
    BeamSection mid(SpanFrame f, SectionShape shape, TopOption top, BarSize bottom, int[] split) {
        return mid(f, shape, top, bottom, TensionSearch.toList(split));
    }

    private BeamSection mid(SpanFrame f, SectionShape shape, TopOption top, BarSize bottom, List<Integer> counts) {
        List<BarLayer> layers = new ArrayList<>(BeamSection.stack(Face.BOTTOM, groups(bottom, counts), f.det()));
        layers.addAll(
                BeamSection.stack(Face.TOP, List.of(new BeamSection.BarGroup(top.bar(), top.continuous())), f.det()));
        return new BeamSection(shape, p.materials(), f.det(), layers, null, f.skin(), p.code());
    }

    /** A support option's section, with the bottom bars it was designed with. */
    BeamSection support(SpanFrame f, SectionShape shape, SupportOption s) {
        return support(
                f,
                shape,
                s.bar(),
                s.counts(),
                s.bottom() == null || !p.bottomAnchored()
                        ? List.of()
                        : s.bottom().groups());
    }

    /** A support section of top bars split over layers, the bottom bars counted there below (for its ties). */
    BeamSection support(SpanFrame f, SectionShape shape, BarSize top, int[] split, List<BeamSection.BarGroup> bottom) {
        return support(f, shape, top, TensionSearch.toList(split), bottom);
    }

    private BeamSection support(
            SpanFrame f, SectionShape shape, BarSize top, List<Integer> counts, List<BeamSection.BarGroup> bottom) {
        List<BarLayer> layers = new ArrayList<>(BeamSection.stack(Face.TOP, groups(top, counts), f.det()));
        if (!bottom.isEmpty()) {
            layers.addAll(BeamSection.stack(Face.BOTTOM, bottom, f.det()));
        }
        return new BeamSection(shape, p.materials(), f.det(), layers, null, f.skin(), p.code());
    }

    private static List<BeamSection.BarGroup> groups(BarSize bar, List<Integer> counts) {
        List<BeamSection.BarGroup> out = new ArrayList<>();
        for (int count : counts) {
            out.add(new BeamSection.BarGroup(bar, count));
        }
        return out;
    }

    /**
     * What the span's deflection takes from one mid-span option's section, for the deflection cuts: Ie of
     * Table 24.2.3.5 at the dead, sustained and total service levels, then ρ' (24.2.4.1). Null where the
     * section takes no part (a cantilever's deflection is its support's).
     */
    double[] deflectionStiffness(SpanFrame f, MidOption m) {
        if (p.cantilever()) {
            return null;
        }
        BeamSection s = mid(f, new SectionShape(f.b(), f.h(), p.flange()), m);
        double[] ie = SpanChecks.ieLevels(s, Bending.SAGGING, p.serviceMoments().mid());
        return append(ie, SpanChecks.rhoPrime(s, Bending.SAGGING));
    }

    /**
     * As {@link #deflectionStiffness(SpanFrame, MidOption)} for a support option; ρ' only at a cantilever's
     * support.
     */
    double[] deflectionStiffness(SpanFrame f, SupportOption o, SpanProblem.Place place) {
        BeamSection s = support(f, new SectionShape(f.b(), f.h(), p.flange()), o);
        double[] ie = SpanChecks.ieLevels(
                s,
                Bending.HOGGING,
                place == SpanProblem.Place.LEFT
                        ? p.serviceMoments().left()
                        : p.serviceMoments().right());
        return p.cantilever() ? append(ie, SpanChecks.rhoPrime(s, Bending.HOGGING)) : ie;
    }

    private static double[] append(double[] values, double last) {
        double[] out = Arrays.copyOf(values, values.length + 1);
        out[values.length] = last;
        return out;
    }
}
