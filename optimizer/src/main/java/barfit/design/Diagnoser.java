package barfit.design;

import barfit.catalogs.BarSize;
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
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.List;

/**
 * Explains a beam no layout in the search space can satisfy: which limit binds, the strongest ductile
 * layout within the limits, and the least change that works when one limit at a time is relaxed
 * (deeper, wider, larger bars, one more layer).
 */
final class Diagnoser {
    /** Steps of a search with a single depth or width (in inch-pound input, 1 in and 2 in): a grid, no clause. */
    private static final double SI_DEPTH_STEP = 25.0;
    private static final double SI_WIDTH_STEP = 50.0;

    private Diagnoser() {
    }

    static Diagnosis diagnose(SectionProblem p, CostModel cost, UnitSystem u) {
        List<Double> widths = p.widths();
        List<Double> depths = p.depths();
        if (depths.isEmpty()) {
            String cap = p.maxDepth() == null ? "?" : say(u, p.maxDepth(), Dim.LENGTH);
            return new Diagnosis("headroom", "max_depth " + cap + " is below the shallowest depth searched ("
                    + say(u, p.space().depths().get(0), Dim.LENGTH) + ")", null, 0, fixes(p, cost, u));
        }
        double b = widths.get(widths.size() - 1);
        double h = depths.get(depths.size() - 1);
        BarSize ds = p.space().stirrupSizes().get(p.space().stirrupSizes().size() - 1);
        Detailing det = new Detailing(p.detailing().cover(), ds, p.detailing().layerGap(), p.detailing().exposure());
        SectionShape shape = new SectionShape(b, h, p.flange());

        // frame-level checks (cover, skin, minimum depth) on the largest frame
        BarSize t0 = p.space().barSizes().get(0);
        BarSize c0 = p.space().compressionSizes().get(0);
        BeamSection probeSection = new BeamSection(shape, p.materials(), det,
                List.of(new BarLayer(p.bending().tensionFace(), t0, 2, det.firstLayerCentroid(t0.diameter())),
                        new BarLayer(p.bending().compressionFace(), c0, 2, det.firstLayerCentroid(c0.diameter()))),
                null, Layout.skinFor(h, t0, det, p.materials(), p.code()), p.code());
        for (CheckResult r : SectionChecks.frameChecks(probeSection, p.span())) {
            if (!r.pass()) {
                String summary = switch (r.id()) {
                    case "min_depth" -> "Table 9.3.1.1 needs h ≥ " + say(u, r.limit().value(), Dim.LENGTH) + " for this span, but the "
                            + "deepest depth allowed is " + say(u, h, Dim.LENGTH) + " (deflection is not computed for single sections)";
                    case "cover" -> "the cover is below Table 20.5.1.3.1 (" + say(u, r.limit().value(), Dim.LENGTH) + ")";
                    default -> r.title() + " fails (" + r.clause() + ")";
                };
                return new Diagnosis(r.id(), summary, null, 0, fixes(p, cost, u));
            }
        }

        // the strongest ductile layout on the largest frame
        SectionProbe probe = new SectionProbe(p.materials(), p.code());
        probe.frame(shape, p.bending(), p.span());
        Layout strongest = null;
        double bestPhiMn = 0;
        for (BarSize t : p.space().barSizes()) {
            int nmax = BarSpacing.maxBars(b, det, t, p.materials(), p.code());
            int ncr = BarSpacing.minBarsForCrackControl(b, det, t, p.materials().fy(), p.code());
            if (nmax < Math.max(2, ncr)) {
                continue;
            }
            for (int layers = 1; layers <= p.space().maxLayers(); layers++) {
                for (BarSize c : p.space().compressionSizes()) {
                    int m = BarSpacing.maxBars(b, det, c, p.materials(), p.code());
                    if (m < 2 || !Layout.fitsHeight(h, det, t, layers, c)) {
                        continue;
                    }
                    for (int n = 2 * layers; n <= layers * nmax; n++) {
                        int[] split = TensionSearch.greedySplit(n, layers, nmax, Math.max(2, ncr));
                        if (split == null) {
                            continue;
                        }
                        probe.clear();
                        double y = det.firstLayerCentroid(t.diameter());
                        for (int i = 0; i < split.length; i++) {
                            if (i > 0) {
                                y += t.diameter() + det.layerGap();
                            }
                            probe.add(y, true, split[i] * t.area(), t.diameter());
                        }
                        probe.add(det.firstLayerCentroid(c.diameter()), false, m * c.area(), c.diameter());
                        probe.solve();
                        if (probe.ductilityOk() && probe.phiMn() > bestPhiMn) {
                            bestPhiMn = probe.phiMn();
                            List<Integer> counts = new ArrayList<>();
                            for (int k : split) {
                                counts.add(k);
                            }
                            strongest = new Layout(b, h, p.flange(), p.bending(), t, counts, c, m,
                                    new Stirrups(ds, 2, p.space().stirrupSpacings().get(0)), null);
                        }
                    }
                }
            }
        }
        List<String> fixes = fixes(p, cost, u);
        if (strongest == null) {
            return new Diagnosis("spacing", "no bar layout fits the web at b = " + say(u, b, Dim.LENGTH), null, 0, fixes);
        }
        if (bestPhiMn < Math.abs(p.mu())) {
            return new Diagnosis("flexure", "the strongest ductile layout at " + say(u, b, Dim.LENGTH) + " × " + say(u, h, Dim.LENGTH)
                    + " gives φMn = " + say(u, bestPhiMn, Dim.MOMENT) + " < Mu = " + say(u, Math.abs(p.mu()), Dim.MOMENT), strongest, bestPhiMn, fixes);
        }
        if (p.vu() != null) {
            return new Diagnosis("shear", "flexure can be met, but no stirrup option in the search carries Vu = "
                    + say(u, p.vu(), Dim.FORCE) + " (or the section is too small for it, 22.5.1.2)", strongest, bestPhiMn, fixes);
        }
        return new Diagnosis("detailing", "strength can be met but no layout passes every detailing check",
                strongest, bestPhiMn, fixes);
    }

    /** One limit relaxed at a time; each answer found by the same generator. */
    private static List<String> fixes(SectionProblem p, CostModel cost, UnitSystem u) {
        List<String> out = new ArrayList<>();
        SearchSpace sp = p.space();
        List<Double> depths = sp.depths();
        double step = depths.size() > 1 ? depths.get(1) - depths.get(0)
                : p.code().inchPound() ? CodeEquations.MM_PER_IN : SI_DEPTH_STEP;
        double deepest = depths.get(depths.size() - 1);
        List<Double> widths = p.widths();
        double widest = widths.get(widths.size() - 1);
        // deeper, at the widest width
        double start = p.depths().isEmpty() ? depths.get(0) : p.depths().get(p.depths().size() - 1) + step;
        double limitH = Math.max(2 * deepest, deepest + 1000);
        for (double h = start; h <= limitH + 1e-9; h += step) {
            SectionProblem q = p.withMaxDepth(null).withSpace(sp.withDepths(List.of(h))).withFixedWidth(widest);
            if (feasible(q, cost)) {
                out.add("needs h ≥ " + say(u, h, Dim.LENGTH) + " at b = " + say(u, widest, Dim.LENGTH)
                        + (p.maxDepth() != null ? " (max_depth is " + say(u, p.maxDepth(), Dim.LENGTH) + ")" : ""));
                break;
            }
        }
        // wider, at the deepest allowed depth
        if (!p.depths().isEmpty()) {
            double h = p.depths().get(p.depths().size() - 1);
            double wStep = widths.size() > 1 ? widths.get(1) - widths.get(0)
                    : p.code().inchPound() ? 2 * CodeEquations.MM_PER_IN : SI_WIDTH_STEP;
            for (double w = widest + wStep; w <= 2.5 * widest + 1e-9; w += wStep) {
                SectionProblem q = p.withSpace(sp.withDepths(List.of(h))).withFixedWidth(w).withMaxDepth(null);
                if (feasible(q, cost)) {
                    out.add("b ≥ " + say(u, w, Dim.LENGTH) + " at h = " + say(u, h, Dim.LENGTH) + (p.fixedWidth() != null ? " (the beam fixes b)" : ""));
                    break;
                }
            }
        }
        // one more layer
        SectionProblem moreLayers = p.withSpace(sp.withMaxLayers(sp.maxLayers() + 1));
        if (feasible(moreLayers, cost)) {
            out.add("allow " + (sp.maxLayers() + 1) + " layers of tension bars (max_layers)");
        }
        return out;
    }

    private static boolean feasible(SectionProblem q, CostModel cost) {
        if (q.depths().isEmpty() || q.widths().isEmpty()) {
            return false;
        }
        return !new CandidateGenerator(q, cost).generate(1).candidates().isEmpty();
    }

    private static String say(UnitSystem u, double v, Dim d) {
        return u.compact(v, d) + " " + u.unit(d);
    }
}
