package barfit.study;

import barfit.design.CostModel;
import barfit.design.SearchSpace;
import barfit.design.SolverOptions;
import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.design.span.SpanVerifier;
import barfit.section.CheckReport;
import barfit.section.Materials;
import java.util.List;

/**
 * A whole span under study. Its compression steel is the continuous top bars at mid-span; the minimum
 * hangers are two of them.
 */
public final class SpanTarget implements Target {
    private final SpanProblem p;
    private final SolverOptions options;
    private final Say say;

    public SpanTarget(SpanProblem p, SolverOptions options, Say say) {
        this.p = p;
        this.options = options;
        this.say = say;
    }

    @Override
    public String id() {
        return p.id();
    }

    @Override
    public Double cap() {
        return p.maxDepth();
    }

    @Override
    public boolean costPerBeam() {
        return true;
    }

    @Override
    public SearchSpace space() {
        return p.space();
    }

    @Override
    public Materials materials() {
        return p.materials();
    }

    @Override
    public Double fixedWidth() {
        return p.fixedWidth();
    }

    @Override
    public Summary design(Double cap, SearchSpace space, Materials m, CostModel cost, boolean freeWidth) {
        SpanProblem q = new SpanProblem(
                        p.id(),
                        m,
                        p.detailing(),
                        p.code(),
                        space,
                        p.span(),
                        p.ends(),
                        p.mLeft(),
                        p.mMid(),
                        p.mRight(),
                        p.vLeft(),
                        p.vRight(),
                        p.service(),
                        p.limits(),
                        cap,
                        freeWidth ? null : p.fixedWidth(),
                        p.flange(),
                        p.bottomAnchored(),
                        p.maxBarSizes(),
                        p.barsPerTwoLegs())
                .withAnalysis(p.analysedService(), p.shearDiagram())
                .withTorsion(p.torsion());
        SpanDesigner.Outcome o = new SpanDesigner(cost, options).design(q, 0);
        if (!o.feasible()) {
            return Summary.none(say.why(o.diagnosis()), o.diagnosis().limit());
        }
        SpanLayout l = o.best().layout();
        CheckReport governing = null;
        for (CheckReport r : o.best().report().sections().values()) {
            if (governing == null
                    || Math.abs(r.demand().mu()) / r.flexure().phiMn()
                            > Math.abs(governing.demand().mu())
                                    / governing.flexure().phiMn()) {
                governing = r;
            }
        }
        boolean used = !p.cantilever() && l.topContinuous() > 2;
        boolean needed = false;
        String fails = "";
        if (used) {
            SpanLayout hangers = l.withTop(2, l.topLeft(), l.topRight());
            var r = SpanVerifier.verify(q, hangers, false);
            needed = !r.ok();
            fails = Summary.checks(r.failures());
        }
        int top = l.topContinuous();
        if (l.topLeft() != null) {
            top = Math.max(top, SpanLayout.sum(l.topLeft()));
        }
        if (l.topRight() != null) {
            top = Math.max(top, SpanLayout.sum(l.topRight()));
        }
        int layers = l.bottomCounts().size()
                + Math.max(
                        l.topLeft() == null ? 1 : l.topLeft().size(),
                        l.topRight() == null ? 1 : l.topRight().size());
        var f = governing.flexure();
        String bottom = "bottom " + Summary.bars(l.bottomCounts(), l.bottom().label());
        String topText = "top " + l.topContinuous() + " " + l.top().label() + " continuous"
                + (l.topLeft() != null
                        ? ", " + Summary.bars(l.topLeft(), l.top().label()) + " at left"
                        : "")
                + (l.topRight() != null
                        ? ", " + Summary.bars(l.topRight(), l.top().label()) + " at right"
                        : "");
        List<String> zones = l.zoneStirrups().stream().map(say::stirrups).toList();
        String st = zones.stream().distinct().count() == 1 ? zones.get(0) + " throughout" : String.join(" / ", zones);
        return new Summary(
                true,
                l.width(),
                l.height(),
                bottom,
                topText,
                st,
                "bottom",
                l.bottomCounts(),
                l.bottom().designation(),
                "top",
                l.topContinuous(),
                l.top().designation(),
                f.phiMn(),
                Math.abs(governing.demand().mu()),
                f.epsT(),
                f.phi(),
                f.strainClass(),
                used,
                needed,
                l.bottomCount() + top,
                layers,
                o.best().cost(),
                o.status() + " over " + o.proof().solver().booleans() + " booleans",
                fails,
                null,
                false,
                o.best().carbon(),
                cost.objective() == barfit.design.Objective.CARBON);
    }
}
