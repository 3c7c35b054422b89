package barfit.design.span;

import barfit.catalogs.BarSize;
import barfit.design.CostModel;
import barfit.design.StirrupChooser;
import barfit.design.TensionSearch;
import barfit.section.SectionProbe;
import barfit.section.Stirrups;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;

/**
 * What one span's search shares across its frames: the problem and its prices, the stirrup zones by the
 * section that sizes them, the option sections, and the section model's fast paths (whose counts are the
 * search's statistics). Nothing in it depends on a frame.
 */
final class SpanContext {
    private final SpanProblem p;
    private final CostModel cost;
    private final SectionProbe midProbe;
    private final SectionProbe supportProbe;
    private final TensionSearch midSearch;
    private final StirrupChooser chooser;
    private final SpanSections sections;
    private final BarSize smallest;
    /** The span's stirrup zones ({@link SpanProblem#zones} builds them afresh on each call). */
    private final List<SpanProblem.Zone> zones;

    private final Map<SpanProblem.Place, List<Integer>> zonesAt = new EnumMap<>(SpanProblem.Place.class);
    /** Each bar size's place in the space's list, found once per size object. */
    private final Map<BarSize, Integer> barIndex = new IdentityHashMap<>();
    /** The space's bar sizes, for {@link #index}. */
    private final BarSize[] sizeArray;
    /**
     * Whether the mid-span options keep the ones another option beats on this model's price (a search under a
     * cap in another measure, whose prices weigh bars and stirrups otherwise, may need them).
     */
    private boolean keepDominated;

    SpanContext(SpanProblem problem, CostModel cost) {
        this.p = problem;
        this.cost = cost;
        this.midProbe = new SectionProbe(p.materials(), p.code());
        this.supportProbe = new SectionProbe(p.materials(), p.code());
        this.midSearch = new TensionSearch(midProbe, p.mMid() == null ? 0 : p.mMid());
        this.chooser = new StirrupChooser(p.materials(), p.code(), p.space(), cost);
        this.sections = new SpanSections(p);
        this.smallest = p.space().barSizes().stream()
                .min(Comparator.comparingDouble(BarSize::diameter))
                .orElseThrow();
        this.zones = p.zones();
        this.sizeArray = p.space().barSizes().toArray(BarSize[]::new);
        for (SpanProblem.Place place : SpanProblem.Place.values()) {
            List<Integer> at = new ArrayList<>();
            for (int i = 0; i < zones.size(); i++) {
                if (zones.get(i).section() == place) {
                    at.add(i);
                }
            }
            zonesAt.put(place, at);
        }
    }

    SpanProblem problem() {
        return p;
    }

    CostModel cost() {
        return cost;
    }

    /** The mid-span section's flexure probe, and the tension search on it. */
    SectionProbe midProbe() {
        return midProbe;
    }

    TensionSearch midSearch() {
        return midSearch;
    }

    /** The support sections' flexure probe (each support option search makes its own tension search on it). */
    SectionProbe supportProbe() {
        return supportProbe;
    }

    StirrupChooser chooser() {
        return chooser;
    }

    SpanSections sections() {
        return sections;
    }

    /** The space's bar size of the smallest diameter. */
    BarSize smallestBar() {
        return smallest;
    }

    List<SpanProblem.Zone> zones() {
        return zones;
    }

    /** The indices of the stirrup zones whose stirrups the section at {@code place} sizes. */
    List<Integer> zonesAt(SpanProblem.Place place) {
        return zonesAt.get(place);
    }

    /** A bar size's index in the space's bar sizes. */
    int index(BarSize bar) {
        BarSize[] sizes = sizeArray;
        for (int k = 0; k < sizes.length; k++) {
            if (sizes[k] == bar) {
                return k; // the space's own objects, as nearly every caller holds: no hashing
            }
        }
        Integer i = barIndex.get(bar);
        if (i == null) {
            i = p.space().barSizes().indexOf(bar);
            barIndex.put(bar, i);
        }
        return i;
    }

    /** Keep the options another beats on price: see {@link #keepDominated()}. */
    void keepDominated(boolean keep) {
        this.keepDominated = keep;
    }

    boolean keepDominated() {
        return keepDominated;
    }

    /** {@code count} main bars each {@code length} mm long. */
    double barCost(BarSize bar, int count, double length) {
        return cost.bars(bar, count, length);
    }

    /** Stirrups of a frame over one zone. */
    double stirrupCost(double b, double h, Stirrups s, SpanProblem.Zone zone) {
        return cost.stirrupSets(b, h, s, SpanLayout.stirrupSets(zone.length(), s.spacing()));
    }

    /** The flexure solves and shear evaluations asked of the section model so far. */
    int flexureSolves() {
        return midProbe.solves() + supportProbe.solves();
    }

    int shearEvaluations() {
        return chooser.evaluations();
    }
}
