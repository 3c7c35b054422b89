package barfit.study;

import barfit.design.CostBreakdown;
import barfit.design.CostModel;
import barfit.design.Proof;
import barfit.design.SearchSpace;
import barfit.design.SolverOptions;
import barfit.design.line.LineSpans;
import barfit.design.span.SpanDesigner;
import barfit.input.LineInput;
import barfit.input.Settings;
import barfit.section.CheckReport;
import barfit.section.Materials;
import java.util.ArrayList;
import java.util.List;

/**
 * A beam line of one section under study: the cap holds the whole line's depth, and every option is the
 * line designed as one object (analysed with its own weight and stiffness, support bars shared, the
 * redistribution it asks for chosen), so its cost is the line's. The strength reported is that of the
 * section working hardest along the line.
 */
public final class LineTarget implements Target {
    private final LineInput line;
    private final Settings settings;
    private final SearchSpace space;
    private final int maxBarSizes;
    private final int barsPerTwoLegs;
    private final SolverOptions options;

    public LineTarget(
            LineInput line,
            Settings settings,
            SearchSpace space,
            int maxBarSizes,
            int barsPerTwoLegs,
            SolverOptions options) {
        this.line = line;
        this.settings = settings;
        this.space = space;
        this.maxBarSizes = maxBarSizes;
        this.barsPerTwoLegs = barsPerTwoLegs;
        this.options = options;
    }

    @Override
    public String id() {
        return line.id();
    }

    @Override
    public Double cap() {
        return line.maxDepth();
    }

    @Override
    public SearchSpace space() {
        return space;
    }

    @Override
    public boolean costPerBeam() {
        return true;
    }

    @Override
    public Materials materials() {
        return settings.materials();
    }

    @Override
    public Double fixedWidth() {
        return null;
    }

    @Override
    public Summary design(Double cap, SearchSpace s, Materials m, CostModel cost, boolean freeWidth) {
        LineSpans byLine = new LineSpans(
                settings.withMaterials(m), s, new SpanDesigner(cost, options), maxBarSizes, barsPerTwoLegs);
        LineSpans.Result r = byLine.design(line.withMaxDepth(cap), 0);
        if (r.oneSection() == null || r.oneSection().fellBack()) {
            return Summary.none("no one section of the search space carries every part of the line", "strength");
        }
        CostBreakdown total = CostBreakdown.ZERO;
        CostBreakdown carbon = CostBreakdown.ZERO;
        CheckReport governing = null;
        List<String> bottoms = new ArrayList<>();
        List<String> tops = new ArrayList<>();
        int bars = 0;
        int layers = 0;
        boolean optimal = true;
        var first = r.parts().get(0).outcome().best().layout();
        for (LineSpans.Part pt : r.parts()) {
            var d = pt.outcome().best();
            total = total.plus(d.cost());
            carbon = d.carbon() == null ? null : carbon == null ? null : carbon.plus(d.carbon());
            optimal &= pt.outcome().proof().status() == Proof.Status.OPTIMAL;
            var l = d.layout();
            if (!pt.problem().cantilever()) {
                bottoms.add(pt.name() + " "
                        + Summary.bars(l.bottomCounts(), l.bottom().label()));
            }
            bars += l.bottomCount() + l.topContinuous();
            layers = Math.max(layers, l.bottomCounts().size() + 1);
            for (CheckReport c : d.report().sections().values()) {
                if (governing == null
                        || Math.abs(c.demand().mu()) / c.flexure().phiMn()
                                > Math.abs(governing.demand().mu())
                                        / governing.flexure().phiMn()) {
                    governing = c;
                }
            }
        }
        for (var sb : r.supports()) {
            if (sb != null) {
                var side = sb.either();
                tops.add("support " + sb.index() + " "
                        + Summary.bars(side.counts(), side.bar().label()));
            }
        }
        var f = governing.flexure();
        return new Summary(
                true,
                first.width(),
                first.height(),
                "bottom " + String.join("; ", bottoms),
                "top " + first.topContinuous() + " " + first.top().label() + " continuous"
                        + (tops.isEmpty() ? "" : "; " + String.join("; ", tops)),
                "per part, see design",
                "bottom",
                first.bottomCounts(),
                first.bottom().designation(),
                "top",
                first.topContinuous(),
                first.top().designation(),
                f.phiMn(),
                Math.abs(governing.demand().mu()),
                f.epsT(),
                f.phi(),
                f.strainClass(),
                false,
                false,
                bars,
                layers,
                total,
                (optimal ? "optimal" : "feasible") + " for the line ("
                        + r.parts().size() + " parts, support bars " + "shared)",
                "",
                null,
                false,
                carbon,
                cost.objective() == barfit.design.Objective.CARBON);
    }
}
