package barfit.design.span;

import barfit.catalogs.BarSize;
import barfit.design.CostModel;
import barfit.design.FrameEnumerator;
import barfit.design.section.SectionExhaustive;
import barfit.design.section.SectionLayout;
import barfit.section.BarSpacing;
import barfit.section.CheckResult;
import barfit.section.Detailing;
import barfit.section.SkinBars;
import barfit.section.Stirrups;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The reference answer for a span: every combination of section, bar sizes, bottom layers, top
 * continuous bars and top bars at each support, in plain loops, each verified by {@link SpanVerifier}
 * (the full section model). Stirrups per zone are the cheapest option passing that zone's checks for
 * the bars in it. Results of sections already seen are remembered, which changes no answer.
 */
public final class SpanExhaustive {
    public record Result(SpanLayout best, long units, long combinations) {}

    private final CostModel cost;

    public SpanExhaustive(CostModel cost) {
        this.cost = cost;
    }

    public Result solve(SpanProblem p) {
        SpanLayout[] best = {null};
        long[] bestUnits = {Long.MAX_VALUE};
        long combos = forEachPassing(p, (lay, units) -> {
            if (units < bestUnits[0]) {
                bestUnits[0] = units;
                best[0] = lay;
            }
        });
        return new Result(best[0], best[0] == null ? -1 : bestUnits[0], combos);
    }

    /**
     * The cheapest passing layout per key (the first found among equals), for an oracle over several spans
     * that constrains how they fit together (a line's shared support bars): keyed, say, by the top bars
     * over each support.
     */
    public <K> java.util.Map<K, Result> cheapestBy(SpanProblem p, java.util.function.Function<SpanLayout, K> key) {
        java.util.Map<K, Result> out = new java.util.LinkedHashMap<>();
        forEachPassing(p, (lay, units) -> {
            K k = key.apply(lay);
            Result old = out.get(k);
            if (old == null || units < old.units()) {
                out.put(k, new Result(lay, units, 0));
            }
        });
        return out;
    }

    /**
     * Every passing layout's price in units, by this model and by {@code other} (a frontier's oracle: cost and
     * carbon). Stirrups are the lightest passing per zone, which is the cheapest under any rate per kg.
     */
    public List<long[]> priced(SpanProblem p, CostModel other) {
        List<long[]> out = new ArrayList<>();
        forEachPassing(
                p,
                (lay, units) -> out.add(
                        new long[] {units, CostModel.units(lay.cost(p, other).total())}));
        return out;
    }

    /** Every layout of the space that passes every check, with its cost in units; returns the count tried. */
    private long forEachPassing(SpanProblem p, java.util.function.ObjLongConsumer<SpanLayout> passing) {
        long combos = 0;
        List<SpanProblem.Zone> zones = p.zones();
        for (FrameEnumerator.Cell cell :
                FrameEnumerator.cells(p.widths(), p.depths(), p.flange(), p.space(), p.detailing())) {
            double b = cell.width();
            double h = cell.height();
            BarSize stirrupBar = cell.stirrupBar();
            Detailing det = cell.detailing();
            // under torsion every side-bar option of the section search
            for (SkinBars skin :
                    SectionLayout.skinOptions(h, p.space().skinBar(), det, p.materials(), p.code(), p.hasTorsion())) {
                Map<String, Boolean> sectionOk = new HashMap<>();
                Map<String, Stirrups> zoneMemo = new HashMap<>();
                for (BarSize topBar : p.space().barSizes()) {
                    int topFit = BarSpacing.maxBars(b, det, topBar, p.materials(), p.code());
                    for (BarSize bottomBar : p.space().barSizes()) {
                        if (!topBar.equals(bottomBar) && p.maxBarSizes() < 2) {
                            continue;
                        }
                        int bottomFit = BarSpacing.maxBars(b, det, bottomBar, p.materials(), p.code());
                        for (List<Integer> bottom : vectors(p.space().maxLayers(), bottomFit)) {
                            int mostContinuous = p.cantilever() ? 2 : topFit;
                            for (int continuous = 2; continuous <= mostContinuous; continuous++) {
                                for (List<Integer> left :
                                        p.leftSupport() ? vectors(p.space().maxLayers(), topFit) : singletonNull()) {
                                    if (left != null && left.get(0) < continuous) {
                                        continue;
                                    }
                                    for (List<Integer> right : p.rightSupport()
                                            ? vectors(p.space().maxLayers(), topFit)
                                            : singletonNull()) {
                                        if (right != null && right.get(0) < continuous) {
                                            continue;
                                        }
                                        double extL = left == null
                                                ? 0
                                                : Extension.of(p, b, h, det, topBar)
                                                        .length();
                                        double extR = right == null
                                                ? 0
                                                : Extension.of(p, b, h, det, topBar)
                                                        .length();
                                        // stirrups: the cheapest passing option per zone for these bars
                                        SpanLayout trial = new SpanLayout(
                                                b,
                                                h,
                                                p.flange(),
                                                stirrupBar,
                                                skin,
                                                topBar,
                                                continuous,
                                                left,
                                                right,
                                                bottomBar,
                                                bottom,
                                                fill(zones.size(), new Stirrups(stirrupBar, 2, 100)),
                                                extL,
                                                extR);
                                        List<Stirrups> st = new ArrayList<>();
                                        for (int z = 0; z < zones.size(); z++) {
                                            Stirrups s = zoneStirrups(p, trial, z, zoneMemo);
                                            if (s == null) {
                                                break;
                                            }
                                            st.add(s);
                                        }
                                        if (st.size() < zones.size()) {
                                            continue;
                                        }
                                        SpanLayout lay = new SpanLayout(
                                                b,
                                                h,
                                                p.flange(),
                                                stirrupBar,
                                                skin,
                                                topBar,
                                                continuous,
                                                left,
                                                right,
                                                bottomBar,
                                                bottom,
                                                st,
                                                extL,
                                                extR);
                                        combos++;
                                        if (!sectionsOk(p, lay, sectionOk)) {
                                            continue;
                                        }
                                        if (!SpanVerifier.verify(p, lay, false).ok()) {
                                            continue;
                                        }
                                        passing.accept(
                                                lay,
                                                CostModel.units(
                                                        lay.cost(p, cost).total()));
                                    }
                                }
                            }
                        }
                    }
                }
            }
        }
        return combos;
    }

    /** The flexural sections alone, remembered by their bars (a failing one fails every combination). */
    private boolean sectionsOk(SpanProblem p, SpanLayout l, Map<String, Boolean> memo) {
        for (SpanProblem.Place place : SpanProblem.Place.values()) {
            boolean present = place == SpanProblem.Place.LEFT
                    ? p.leftSupport()
                    : place == SpanProblem.Place.RIGHT ? p.rightSupport() : p.midSection();
            if (!present) {
                continue;
            }
            String key = place + "|" + l.top() + l.topAt(p, place) + "|" + l.bottom() + l.bottomCounts() + "|"
                    + l.topContinuous();
            Boolean ok = memo.get(key);
            if (ok == null) {
                Double mu = place == SpanProblem.Place.LEFT
                        ? p.mLeft()
                        : place == SpanProblem.Place.RIGHT ? p.mRight() : p.mMid();
                ok = barfit.section.SectionChecks.run(
                                l.section(p, place, null),
                                new barfit.section.Demand(mu, null),
                                new barfit.section.Span(p.span(), p.ends()),
                                Trail.off(),
                                false)
                        .ok();
                memo.put(key, ok);
            }
            if (!ok) {
                return false;
            }
        }
        return true;
    }

    private Stirrups zoneStirrups(SpanProblem p, SpanLayout l, int z, Map<String, Stirrups> memo) {
        SpanProblem.Zone zone = p.zones().get(z);
        String key = z + "|" + l.top() + l.topAt(p, zone.section()) + "|" + l.bottom() + l.bottomCounts() + "|"
                + l.topContinuous();
        if (memo.containsKey(key)) {
            return memo.get(key);
        }
        Stirrups best = null;
        double bestCost = Double.POSITIVE_INFINITY;
        int need = p.legsFor(l.barsPerLayer(p, zone.section()));
        for (int legs : p.space().stirrupLegs()) {
            for (double s : p.space().stirrupSpacings()) {
                Stirrups st = new Stirrups(l.stirrupBar(), legs, s);
                if (legs < need) {
                    continue;
                }
                // the legs held by bars and the ties round compression steel relied on, as the section model has them
                boolean held = barfit.section.StirrupRules.checks(
                                l.section(p, zone.section(), st),
                                l.physicalSection(p, zone.section(), st),
                                SpanLayout.bending(p, zone.section()),
                                SpanLayout.momentAt(p, zone.section()),
                                null,
                                zone.name(),
                                Trail.off())
                        .stream()
                        .allMatch(CheckResult::pass);
                if (!held) {
                    continue;
                }
                var trial = l.section(p, zone.section(), st);
                Double vu =
                        zone.vu(barfit.section.SectionChecks.shearDepth(trial, SpanLayout.bending(p, zone.section())));
                var checks = barfit.section.SectionChecks.shearZone(
                        trial, SpanLayout.bending(p, zone.section()), vu == null ? 0 : vu, zone.name(), Trail.off());
                boolean ok = checks.stream().allMatch(CheckResult::pass);
                if (vu == null && ok) {
                    var s2 = l.section(p, zone.section(), st);
                    var fr = barfit.section.Flexure.analyse(s2, SpanLayout.bending(p, zone.section()));
                    ok = barfit.section.SectionChecks.minimumStirrupsPass(s2, fr.d(), fr.tensionSteelArea());
                }
                // under torsion every torsion check of the zone, on every bar at its section
                var torsion = SpanVerifier.torsionDemand(
                        p,
                        zone,
                        vu,
                        l.width(),
                        barfit.section.SectionChecks.shearDepth(trial, SpanLayout.bending(p, zone.section())));
                if (ok && torsion != null) {
                    ok = barfit.section.TorsionZone.checks(
                                    l.physicalSection(p, zone.section(), st),
                                    torsion,
                                    new barfit.section.Span(p.span(), p.ends()),
                                    zone.name(),
                                    Trail.off())
                            .stream()
                            .allMatch(CheckResult::pass);
                }
                double c = SpanLayout.stirrupSets(zone.length(), s)
                        * cost.stirrupSetLength(l.width(), l.height(), st.bar(), legs)
                        * st.bar().massPerMetre();
                if (ok && c < bestCost - 1e-12) {
                    bestCost = c;
                    best = st;
                }
            }
        }
        memo.put(key, best);
        return best;
    }

    private static List<Stirrups> fill(int n, Stirrups s) {
        List<Stirrups> l = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            l.add(s);
        }
        return l;
    }

    private static List<List<Integer>> singletonNull() {
        List<List<Integer>> l = new ArrayList<>();
        l.add(null);
        return l;
    }

    /** Count vectors of 1..maxLayers layers, n1 >= n2 >= ... >= 2, n1 <= nmax. */
    static List<List<Integer>> vectors(int maxLayers, int nmax) {
        List<List<Integer>> out = new ArrayList<>();
        for (int layers = 1; layers <= maxLayers; layers++) {
            out.addAll(SectionExhaustive.countVectors(layers, nmax));
        }
        return out;
    }
}
