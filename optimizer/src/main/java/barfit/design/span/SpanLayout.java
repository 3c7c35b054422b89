package barfit.design.span;

import barfit.catalogs.BarSize;
import barfit.design.CostBreakdown;
import barfit.design.CostModel;
import barfit.design.section.SectionLayout;
import barfit.section.BarLayer;
import barfit.section.BeamSection;
import barfit.section.Bending;
import barfit.section.Detailing;
import barfit.section.Face;
import barfit.section.Flange;
import barfit.section.SectionShape;
import barfit.section.SkinBars;
import barfit.section.Stirrups;
import java.util.ArrayList;
import java.util.List;

/**
 * A designed span: one width and height; bottom bars (one size, layers) over the full span; top bars of
 * one size, {@code topContinuous} of them over the full span and, at each continuous support, the total
 * given by {@code topLeft} / {@code topRight} (layers from the top face; the extra bars run
 * {@code extLeft} / {@code extRight} into the span); and stirrups per zone, in the order of
 * {@link SpanProblem#zones()}.
 */
public record SpanLayout(
        double width,
        double height,
        Flange flange,
        BarSize stirrupBar,
        SkinBars skin,
        BarSize top,
        int topContinuous,
        List<Integer> topLeft,
        List<Integer> topRight,
        BarSize bottom,
        List<Integer> bottomCounts,
        List<Stirrups> zoneStirrups,
        double extLeft,
        double extRight) {

    public SpanLayout {
        topLeft = topLeft == null ? null : List.copyOf(topLeft);
        topRight = topRight == null ? null : List.copyOf(topRight);
        bottomCounts = List.copyOf(bottomCounts);
        zoneStirrups = List.copyOf(zoneStirrups);
    }

    /** The same layout with other top bars: continuous count and the totals at each support (null: none). */
    public SpanLayout withTop(int continuous, List<Integer> left, List<Integer> right) {
        return new SpanLayout(
                width,
                height,
                flange,
                stirrupBar,
                skin,
                top,
                continuous,
                left,
                right,
                bottom,
                bottomCounts,
                zoneStirrups,
                extLeft,
                extRight);
    }

    public SectionShape shape() {
        return new SectionShape(width, height, flange);
    }

    public Detailing detailing(Detailing base) {
        return new Detailing(base.cover(), stirrupBar, base.layerGap(), base.exposure());
    }

    public static int sum(List<Integer> counts) {
        int n = 0;
        for (int c : counts) {
            n += c;
        }
        return n;
    }

    public int bottomCount() {
        return sum(bottomCounts);
    }

    /** The bending of the section at a place: hogging at a continuous support, sagging elsewhere. */
    public static Bending bending(SpanProblem p, SpanProblem.Place place) {
        boolean support = place == SpanProblem.Place.LEFT && p.leftSupport()
                || place == SpanProblem.Place.RIGHT && p.rightSupport();
        return support ? Bending.HOGGING : Bending.SAGGING;
    }

    private static List<BeamSection.BarGroup> groups(BarSize bar, List<Integer> counts) {
        List<BeamSection.BarGroup> g = new ArrayList<>();
        for (int c : counts) {
            g.add(new BeamSection.BarGroup(bar, c));
        }
        return g;
    }

    /** The top bars at a place: the support's total at a continuous support, else the continuous bars. */
    public List<Integer> topAt(SpanProblem p, SpanProblem.Place place) {
        if (place == SpanProblem.Place.LEFT && p.leftSupport()) {
            return topLeft;
        }
        if (place == SpanProblem.Place.RIGHT && p.rightSupport()) {
            return topRight;
        }
        return List.of(topContinuous);
    }

    /**
     * The section at a place, as the section model checks it. At a continuous support the top bars are
     * in tension and the bottom bars count as compression steel only if anchored there; elsewhere the
     * bottom bars are in tension and the continuous top bars are the compression layer.
     */
    public BeamSection section(SpanProblem p, SpanProblem.Place place, Stirrups stirrups) {
        Detailing det = detailing(p.detailing());
        List<BarLayer> layers = new ArrayList<>();
        if (bending(p, place) == Bending.HOGGING) {
            layers.addAll(BeamSection.stack(Face.TOP, groups(top, topAt(p, place)), det));
            if (p.bottomAnchored()) {
                layers.addAll(BeamSection.stack(Face.BOTTOM, groups(bottom, bottomCounts), det));
            }
        } else {
            layers.addAll(BeamSection.stack(Face.BOTTOM, groups(bottom, bottomCounts), det));
            layers.addAll(BeamSection.stack(Face.TOP, List.of(new BeamSection.BarGroup(top, topContinuous)), det));
        }
        return new BeamSection(shape(), p.materials(), det, layers, stirrups, skin, p.code());
    }

    /**
     * Every bar that is at a place, whether or not its strength is counted there (the bottom bars run
     * the full span even where they are not anchored as compression steel): the bars the legs can hold.
     */
    public BeamSection physicalSection(SpanProblem p, SpanProblem.Place place, Stirrups stirrups) {
        Detailing det = detailing(p.detailing());
        List<BarLayer> layers = new ArrayList<>(BeamSection.stack(Face.TOP, groups(top, topAt(p, place)), det));
        layers.addAll(BeamSection.stack(Face.BOTTOM, groups(bottom, bottomCounts), det));
        return new BeamSection(shape(), p.materials(), det, layers, stirrups, skin, p.code());
    }

    /** The factored moment of the section at a place (N·mm), or null. */
    public static Double momentAt(SpanProblem p, SpanProblem.Place place) {
        return switch (place) {
            case LEFT -> p.mLeft();
            case MID -> p.mMid();
            case RIGHT -> p.mRight();
        };
    }

    /** Most bars in any layer within a zone whose section is at {@code place} (for the stirrup legs). */
    public int barsPerLayer(SpanProblem p, SpanProblem.Place place) {
        int most = bottomCounts.get(0);
        for (int c : topAt(p, place)) {
            most = Math.max(most, c);
        }
        return most;
    }

    /**
     * A bar mark of the schedule: count bars of one size, each {@code length} long (mm), in a role; a
     * stirrup's hoops and crossties name their zone and the stirrups' legs (else null and 0).
     */
    public record BarMark(String mark, Role role, BarSize bar, int count, double length, String zone, int legs) {
        BarMark(String mark, Role role, BarSize bar, int count, double length) {
            this(mark, role, bar, count, length, null, 0);
        }
    }

    /** What a bar mark is for (the reports word it). */
    public enum Role {
        BOTTOM,
        /** A cantilever's top bars: its full length and ld past the support. */
        CANTILEVER_TOP,
        TOP_CONTINUOUS,
        TOP_EXTRA_LEFT,
        TOP_EXTRA_RIGHT,
        SKIN,
        /** A zone's closed hoops: two of its legs. */
        HOOPS,
        /** A zone's crossties: one per leg beyond two, per hoop. */
        CROSSTIES
    }

    /** The bar list: bottom, top continuous, top extras at each support, stirrups per zone. */
    public List<BarMark> bars(SpanProblem p, CostModel cost) {
        List<BarMark> out = new ArrayList<>();
        double l = p.span();
        out.add(new BarMark("B1", Role.BOTTOM, bottom, bottomCount(), l));
        int k = 1;
        if (p.cantilever()) {
            out.add(new BarMark("T1", Role.CANTILEVER_TOP, top, sum(topLeft), extLeft));
        } else {
            out.add(new BarMark("T" + k++, Role.TOP_CONTINUOUS, top, topContinuous, l));
            if (p.leftSupport() && sum(topLeft) > topContinuous) {
                out.add(new BarMark("T" + k++, Role.TOP_EXTRA_LEFT, top, sum(topLeft) - topContinuous, extLeft));
            }
            if (p.rightSupport() && sum(topRight) > topContinuous) {
                out.add(new BarMark("T" + k++, Role.TOP_EXTRA_RIGHT, top, sum(topRight) - topContinuous, extRight));
            }
        }
        if (skin != null) {
            out.add(new BarMark(
                    "K1", Role.SKIN, skin.bar(), 2 * SectionLayout.skinBarsPerFace(height, skin.spacing()), l));
        }
        // a stirrup set is a closed hoop and, for each leg beyond two, a crosstie: separate bars, separate marks
        List<SpanProblem.Zone> zones = p.zones();
        int s = 1;
        for (int i = 0; i < zones.size(); i++) {
            Stirrups st = zoneStirrups.get(i);
            int sets = stirrupSets(zones.get(i).length(), st.spacing());
            String zone = zones.get(i).name();
            out.add(new BarMark(
                    "S" + s++, Role.HOOPS, st.bar(), sets, cost.hoopLength(width, height, st.bar()), zone, st.legs()));
            if (st.legs() > 2) {
                int ties = st.legs() - 2;
                out.add(new BarMark(
                        "S" + s++,
                        Role.CROSSTIES,
                        st.bar(),
                        sets * ties,
                        cost.crosstieLength(height, st.bar()),
                        zone,
                        st.legs()));
            }
        }
        return out;
    }

    public static int stirrupSets(double zoneLength, double spacing) {
        return Math.max(1, (int) Math.ceil(zoneLength / spacing - 1e-9));
    }

    /** The cost of the whole span. */
    public CostBreakdown cost(SpanProblem p, CostModel cost) {
        double spanMetres = p.span() / 1000.0;
        CostBreakdown frame = cost.frame(width, height, flange).times(spanMetres);
        double bars = 0;
        double stirrups = 0;
        for (BarMark b : bars(p, cost)) {
            double metres = b.count() * b.length() / 1000.0;
            if (b.mark().startsWith("S")) {
                stirrups += cost.rates().stirrupsPerKg() * b.bar().massPerMetre() * metres;
            } else {
                bars += cost.barMetres(b.bar(), metres);
            }
        }
        return frame.plus(new CostBreakdown(0, bars, stirrups, 0, 0));
    }
}
