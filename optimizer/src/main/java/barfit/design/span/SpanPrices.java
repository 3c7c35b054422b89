package barfit.design.span;

import barfit.catalogs.BarSize;
import barfit.design.CostModel;
import barfit.design.section.SectionLayout;
import barfit.section.Stirrups;
import java.util.Map;

/**
 * The parts of a span's search priced by another model than the one that built them: the frame, a top
 * option, a mid-span option, a support option, each exactly as {@link SpanFrames} and {@link OptionGenerator}
 * price them (the same lengths and the same order of products), so that a cap in that measure can be held
 * in the CP-SAT model ({@link SpanSelection#atMost}). Carbon is linear in the same quantities as cost, so
 * each part's carbon is its quantities times the factors, as its cost is their times the rates.
 */
final class SpanPrices {
    private final SpanProblem p;
    private final CostModel model;

    SpanPrices(SpanProblem p, CostModel model) {
        this.p = p;
        this.model = model;
    }

    /** Concrete, formwork, depth premium and skin bars over the span. */
    double frame(SpanFrame f) {
        return model.frame(f.b(), f.h(), p.flange()).total() * (p.span() / 1000.0)
                + (f.skin() == null
                        ? 0
                        : model.bars(
                                f.skin().bar(),
                                2
                                        * SectionLayout.skinBarsPerFace(
                                                f.h(), f.skin().spacing()),
                                p.span()));
    }

    /** The continuous top bars over the span less the stretches the support options price them over. */
    double top(SpanFrame f, TopOption t) {
        double extLeft = p.leftSupport() ? extension(f, t.bar()) : 0;
        double extRight = p.rightSupport() ? extension(f, t.bar()) : 0;
        double run = p.cantilever() ? 0 : p.span() - extLeft - extRight;
        return model.bars(t.bar(), t.continuous(), run);
    }

    /** The bottom bars over the span and the stirrups of the zones that use the mid-span section. */
    double mid(SpanFrame f, MidOption m) {
        return model.bars(m.bar(), SpanLayout.sum(m.counts()), p.span()) + stirrups(f, m.zones());
    }

    /** The top bars at a support over their extension, and the stirrups of its zones. */
    double support(SpanFrame f, SupportOption s) {
        return model.bars(s.bar(), SpanLayout.sum(s.counts()), extension(f, s.bar())) + stirrups(f, s.zones());
    }

    private double extension(SpanFrame f, BarSize bar) {
        return Extension.of(p, f.b(), f.h(), f.det(), bar).length();
    }

    private double stirrups(SpanFrame f, Map<Integer, Stirrups> zones) {
        double sum = 0;
        for (Map.Entry<Integer, Stirrups> e : new java.util.TreeMap<>(zones).entrySet()) {
            Stirrups s = e.getValue();
            sum += model.stirrupSets(
                    f.b(),
                    f.h(),
                    s,
                    SpanLayout.stirrupSets(p.zones().get(e.getKey()).length(), s.spacing()));
        }
        return sum;
    }
}
