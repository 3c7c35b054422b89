package barfit.study;

import barfit.catalogs.BarSize;
import barfit.design.CostModel;
import barfit.design.SearchSpace;
import barfit.design.SolverOptions;
import barfit.design.section.DesignOutcome;
import barfit.design.section.SectionDesigner;
import barfit.design.section.SectionLayout;
import barfit.design.section.SectionProblem;
import barfit.section.Materials;
import barfit.section.SectionChecks;
import barfit.section.trail.Trail;
import java.util.Comparator;

/** A single section under study. */
public final class SectionTarget implements Target {
    private final SectionProblem p;
    private final SolverOptions options;
    private final Say say;

    public SectionTarget(SectionProblem p, SolverOptions options, Say say) {
        this.p = p;
        this.options = options;
        this.say = say;
    }

    public SectionProblem problem() {
        return p;
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
        return p.span() != null;
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
        SectionProblem q = new SectionProblem(
                p.id(),
                m,
                p.detailing(),
                p.code(),
                space,
                p.mu(),
                p.vu(),
                p.span(),
                cap,
                freeWidth ? null : p.fixedWidth(),
                p.flange(),
                p.costLength(),
                p.tu(),
                p.compatibilityTorsion());
        DesignOutcome o = new SectionDesigner(cost, options).design(q, 0);
        if (!o.feasible()) {
            return Summary.none(say.why(o.diagnosis()), o.diagnosis().limit());
        }
        SectionLayout l = o.best().layout();
        var f = o.best().report().flexure();
        BarSize lightest = space.compressionSizes().stream()
                .min(Comparator.comparingDouble(BarSize::massPerMetre))
                .orElseThrow();
        boolean used = !(l.compressionCount() == 2 && l.compressionBar().equals(lightest));
        boolean needed = false;
        String fails = "";
        if (used) {
            SectionLayout hangers = new SectionLayout(
                    l.width(),
                    l.height(),
                    l.flange(),
                    l.bending(),
                    l.tensionBar(),
                    l.tensionCounts(),
                    lightest,
                    2,
                    l.stirrups(),
                    l.skin());
            var r = SectionChecks.run(hangers.section(m, q.detailing(), q.code()), q.demand(), q.span(), Trail.off());
            needed = !r.ok();
            fails = Summary.checks(r.failures());
        }
        int bars = l.tensionBarCount() + l.compressionCount();
        return new Summary(
                true,
                l.width(),
                l.height(),
                l.bending().tensionFace().word() + " "
                        + Summary.bars(l.tensionCounts(), l.tensionBar().label()),
                l.bending().compressionFace().word() + " " + l.compressionCount() + " "
                        + l.compressionBar().label(),
                say.stirrups(l.stirrups()),
                l.bending().tensionFace().word(),
                l.tensionCounts(),
                l.tensionBar().designation(),
                l.bending().compressionFace().word(),
                l.compressionCount(),
                l.compressionBar().designation(),
                f.phiMn(),
                Math.abs(q.mu()),
                f.epsT(),
                f.phi(),
                f.strainClass(),
                used,
                needed,
                bars,
                l.tensionCounts().size() + 1,
                o.best().cost(),
                o.status() + " over " + o.proof().search().candidates() + " candidates",
                fails,
                null,
                false,
                o.best().carbon(),
                cost.objective() == barfit.design.Objective.CARBON);
    }
}
