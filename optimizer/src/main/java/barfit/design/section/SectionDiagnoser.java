package barfit.design.section;

import barfit.catalogs.BarSize;
import barfit.design.CostModel;
import barfit.design.Diagnosis;
import barfit.design.SearchSpace;
import barfit.design.TensionSearch;
import barfit.section.BarLayer;
import barfit.section.BarSpacing;
import barfit.section.BeamSection;
import barfit.section.CheckResult;
import barfit.section.CodeEquations;
import barfit.section.Detailing;
import barfit.section.SectionChecks;
import barfit.section.SectionProbe;
import barfit.section.SectionShape;
import barfit.section.Stirrups;
import java.util.ArrayList;
import java.util.List;

/**
 * Explains a beam no layout in the search space can satisfy: which limit binds, the strongest ductile
 * layout within the limits, and the least change that works when one limit at a time is relaxed
 * (deeper, wider, larger bars, one more layer).
 */
final class SectionDiagnoser {
    /** Steps of a search with a single depth or width (in inch-pound input, 1 in and 2 in): a grid, no clause. */
    private static final double SI_DEPTH_STEP = 25.0;

    private static final double SI_WIDTH_STEP = 50.0;

    private SectionDiagnoser() {}

    static Diagnosis diagnose(SectionProblem p, CostModel cost) {
        List<Double> widths = p.widths();
        List<Double> depths = p.depths();
        if (depths.isEmpty()) {
            return diagnosis(
                    p,
                    cost,
                    "headroom",
                    new Diagnosis.BelowShallowest(p.space().depths().get(0)),
                    null,
                    0);
        }
        double b = widths.get(widths.size() - 1);
        double h = depths.get(depths.size() - 1);
        BarSize stirrupBar =
                p.space().stirrupSizes().get(p.space().stirrupSizes().size() - 1);
        Detailing detailing = new Detailing(
                p.detailing().cover(),
                stirrupBar,
                p.detailing().layerGap(),
                p.detailing().exposure());
        SectionShape shape = new SectionShape(b, h, p.flange());

        // frame-level checks (cover, skin, minimum depth) on the largest frame
        BarSize smallestTension = p.space().barSizes().get(0);
        BarSize smallestCompression = p.space().compressionSizes().get(0);
        BeamSection probeSection = new BeamSection(
                shape,
                p.materials(),
                detailing,
                List.of(
                        new BarLayer(
                                p.bending().tensionFace(),
                                smallestTension,
                                2,
                                detailing.firstLayerCentroid(smallestTension.diameter())),
                        new BarLayer(
                                p.bending().compressionFace(),
                                smallestCompression,
                                2,
                                detailing.firstLayerCentroid(smallestCompression.diameter()))),
                null,
                SectionLayout.skinFor(h, smallestTension, detailing, p.materials(), p.code()),
                p.code());
        for (CheckResult check : SectionChecks.frameChecks(probeSection, p.span())) {
            if (!check.pass()) {
                return diagnosis(p, cost, check.id(), new Diagnosis.FrameCheckFails(check, h), null, 0);
            }
        }

        // the strongest ductile layout on the largest frame
        SectionProbe probe = new SectionProbe(p.materials(), p.code());
        probe.frame(shape, p.bending(), p.span());
        SectionLayout strongest = null;
        double bestPhiMn = 0;
        for (BarSize t : p.space().barSizes()) {
            int mostBars = BarSpacing.maxBars(b, detailing, t, p.materials(), p.code());
            int fewestForCracks = BarSpacing.minBarsForCrackControl(
                    b, detailing, t, p.materials().fy(), p.code());
            if (mostBars < Math.max(2, fewestForCracks)) {
                continue;
            }
            for (int layers = 1; layers <= p.space().maxLayers(); layers++) {
                for (BarSize c : p.space().compressionSizes()) {
                    int compressionBars = BarSpacing.maxBars(b, detailing, c, p.materials(), p.code());
                    if (compressionBars < 2 || !SectionLayout.fitsHeight(h, detailing, t, layers, c)) {
                        continue;
                    }
                    for (int n = 2 * layers; n <= layers * mostBars; n++) {
                        int[] split = TensionSearch.greedySplit(n, layers, mostBars, Math.max(2, fewestForCracks));
                        if (split == null) {
                            continue;
                        }
                        probe.clear();
                        double y = detailing.firstLayerCentroid(t.diameter());
                        for (int i = 0; i < split.length; i++) {
                            if (i > 0) {
                                y += t.diameter() + detailing.layerGap();
                            }
                            probe.add(y, true, split[i] * t.area(), t.diameter());
                        }
                        probe.add(
                                detailing.firstLayerCentroid(c.diameter()),
                                false,
                                compressionBars * c.area(),
                                c.diameter());
                        probe.solve();
                        if (probe.ductilityOk() && probe.phiMn() > bestPhiMn) {
                            bestPhiMn = probe.phiMn();
                            List<Integer> counts = new ArrayList<>();
                            for (int k : split) {
                                counts.add(k);
                            }
                            strongest = new SectionLayout(
                                    b,
                                    h,
                                    p.flange(),
                                    p.bending(),
                                    t,
                                    counts,
                                    c,
                                    compressionBars,
                                    new Stirrups(
                                            stirrupBar,
                                            2,
                                            p.space().stirrupSpacings().get(0)),
                                    null);
                        }
                    }
                }
            }
        }
        if (strongest == null) {
            return diagnosis(p, cost, "spacing", new Diagnosis.NoLayoutFits(b), null, 0);
        }
        if (bestPhiMn < Math.abs(p.mu())) {
            return diagnosis(
                    p, cost, "flexure", new Diagnosis.FlexureFails(b, h, Math.abs(p.mu())), strongest, bestPhiMn);
        }
        if (p.hasTorsion()) {
            Diagnosis.TorsionFails torsion = SectionTorsionDiagnosis.cause(p, strongest);
            if (torsion != null) {
                return diagnosis(p, cost, torsion.check().id(), torsion, strongest, bestPhiMn);
            }
        }
        if (p.vu() != null) {
            return diagnosis(p, cost, "shear", new Diagnosis.ShearFails(p.vu()), strongest, bestPhiMn);
        }
        return diagnosis(p, cost, "detailing", new Diagnosis.DetailingFails(), strongest, bestPhiMn);
    }

    /** The diagnosis with the changes that work, one limit relaxed at a time; each found by the same generator. */
    private static Diagnosis diagnosis(
            SectionProblem p,
            CostModel cost,
            String limit,
            Diagnosis.Cause cause,
            SectionLayout strongest,
            double strongestPhiMn) {
        SearchSpace space = p.space();
        Diagnosis.Fix deeper = null;
        Diagnosis.Fix wider = null;
        Integer moreLayers = null;
        List<Double> depths = space.depths();
        double step = depths.size() > 1
                ? depths.get(1) - depths.get(0)
                : p.code().inchPound() ? CodeEquations.MM_PER_IN : SI_DEPTH_STEP;
        double deepest = depths.get(depths.size() - 1);
        List<Double> widths = p.widths();
        double widest = widths.get(widths.size() - 1);
        // deeper, at the widest width
        double start =
                p.depths().isEmpty() ? depths.get(0) : p.depths().get(p.depths().size() - 1) + step;
        double highest = Math.max(2 * deepest, deepest + 1000);
        for (double h = start; h <= highest + 1e-9; h += step) {
            SectionProblem trial =
                    p.withMaxDepth(null).withSpace(space.withDepths(List.of(h))).withFixedWidth(widest);
            if (feasible(trial, cost)) {
                deeper = new Diagnosis.Fix(widest, h);
                break;
            }
        }
        // wider, at the deepest allowed depth
        if (!p.depths().isEmpty()) {
            double h = p.depths().get(p.depths().size() - 1);
            double widthStep = widths.size() > 1
                    ? widths.get(1) - widths.get(0)
                    : p.code().inchPound() ? 2 * CodeEquations.MM_PER_IN : SI_WIDTH_STEP;
            for (double w = widest + widthStep; w <= 2.5 * widest + 1e-9; w += widthStep) {
                SectionProblem trial = p.withSpace(space.withDepths(List.of(h)))
                        .withFixedWidth(w)
                        .withMaxDepth(null);
                if (feasible(trial, cost)) {
                    wider = new Diagnosis.Fix(w, h);
                    break;
                }
            }
        }
        // one more layer
        SectionProblem oneMoreLayer = p.withSpace(space.withMaxLayers(space.maxLayers() + 1));
        if (feasible(oneMoreLayer, cost)) {
            moreLayers = space.maxLayers() + 1;
        }
        return new Diagnosis(
                limit, cause, strongest, strongestPhiMn, deeper, wider, moreLayers, p.maxDepth(), p.fixedWidth());
    }

    private static boolean feasible(SectionProblem q, CostModel cost) {
        if (q.depths().isEmpty() || q.widths().isEmpty()) {
            return false;
        }
        return !new SectionGenerator(q, cost).generate(1).candidates().isEmpty();
    }
}
