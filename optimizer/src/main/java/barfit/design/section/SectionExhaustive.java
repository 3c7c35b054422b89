package barfit.design.section;

import barfit.catalogs.BarSize;
import barfit.design.CostModel;
import barfit.design.FrameEnumerator;
import barfit.section.BarSpacing;
import barfit.section.BeamSection;
import barfit.section.CheckReport;
import barfit.section.Demand;
import barfit.section.Detailing;
import barfit.section.SectionChecks;
import barfit.section.SkinBars;
import barfit.section.StirrupRules;
import barfit.section.Stirrups;
import barfit.section.TorsionChecks;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.List;

/**
 * The reference answer: every layout of the search space in plain loops, each checked by the full
 * section model ({@link SectionChecks#run}), no bounds, no bisection, no dominance. Used by the tests
 * as the oracle and by the benchmark as the baseline.
 *
 * <p>Counts run over what the space allows (2 up to the bars that fit a layer by 25.2.1). The only
 * shortcut: stirrups are chosen per (frame, tension bars) as the cheapest option passing the shear
 * checks, which depend on nothing else; every combined layout is then checked whole. Under torsion every
 * skin option of the frame ({@link SectionLayout#skinOptions}) is tried with every layout, and the stirrups are
 * the cheapest passing the shear checks and the section model's torsion checks on stirrups
 * ({@link TorsionChecks#stirrupChecks}) for those bars, compression bar size and skin; the whole layout is
 * then checked under the demand with Tu.
 */
public final class SectionExhaustive {
    /** The cheapest layout, its cost units, and the cheapest cost of every distinct (size, bar size) key. */
    public record Result(SectionLayout best, long units, long layoutsChecked, java.util.Map<String, Long> bestPerKey) {
        /** The n cheapest distinct-key costs, cheapest first. */
        public List<Long> cheapestKeys(int n) {
            return bestPerKey.values().stream().sorted().limit(n).toList();
        }
    }

    private final CostModel cost;
    /** Prices carbon for a cap (null: no cap). */
    private final CostModel carbon;
    /** The carbon cap in the searches' units per metre: layouts above it do not count. */
    private final long cap;
    /** Every passing layout within the cap, when asked for (null otherwise). */
    private final List<SectionLayout> passing;

    public SectionExhaustive(CostModel cost) {
        this(cost, null, Long.MAX_VALUE, false);
    }

    /**
     * The cheapest at {@code cost} among layouts whose carbon at {@code carbon} is at most {@code cap} units
     * per metre; {@code keepPassing}: also list every such layout ({@link #passing}).
     */
    public SectionExhaustive(CostModel cost, CostModel carbon, long cap, boolean keepPassing) {
        this.cost = cost;
        this.carbon = carbon;
        this.cap = cap;
        this.passing = keepPassing ? new ArrayList<>() : null;
    }

    /** Every passing layout within the cap that the solves so far met (when asked for). */
    public List<SectionLayout> passing() {
        return passing == null ? List.of() : List.copyOf(passing);
    }

    public Result solve(SectionProblem p) {
        SectionLayout best = null;
        long bestUnits = Long.MAX_VALUE;
        long checked = 0;
        java.util.Map<String, Long> perKey = new java.util.HashMap<>();
        Demand demand = p.demand();
        boolean torsion = p.hasTorsion();
        for (FrameEnumerator.Cell cell :
                FrameEnumerator.cells(p.widths(), p.depths(), p.flange(), p.space(), p.detailing())) {
            double b = cell.width();
            double h = cell.height();
            BarSize ds = cell.stirrupBar();
            Detailing det = cell.detailing();
            List<SkinBars> skins =
                    SectionLayout.skinOptions(h, p.space().skinBar(), det, p.materials(), p.code(), torsion);
            SkinBars skin = skins.get(0);
            for (BarSize t : p.space().barSizes()) {
                int nmax = BarSpacing.maxBars(b, det, t, p.materials(), p.code());
                for (int layers = 1; layers <= p.space().maxLayers(); layers++) {
                    for (List<Integer> counts : countVectors(layers, nmax)) {
                        // the cheapest stirrups per range of legs the bars allow (at least what the busiest layer
                        // needs, at most
                        // one per bar of the outer tension layer and of the compression layer)
                        java.util.Map<String, java.util.Optional<Stirrups>> byLegs = new java.util.HashMap<>();
                        for (BarSize c : p.space().compressionSizes()) {
                            int compressionFit = BarSpacing.maxBars(b, det, c, p.materials(), p.code());
                            if (!SectionLayout.fitsHeight(h, det, t, layers, c)) {
                                continue;
                            }
                            for (int m = 2; m <= compressionFit; m++) {
                                // the ties of 9.7.6.4 where these compression bars are relied on
                                SectionLayout bars = new SectionLayout(
                                        b,
                                        h,
                                        p.flange(),
                                        p.bending(),
                                        t,
                                        counts,
                                        c,
                                        m,
                                        new Stirrups(
                                                ds,
                                                2,
                                                p.space().stirrupSpacings().get(0)),
                                        skin);
                                StirrupRules.TieDemand ties = StirrupRules.ties(
                                        bars.section(p.materials(), p.detailing(), p.code()), p.bending(), p.mu());
                                if (!ties.sizeOk(ds.diameter())) {
                                    continue;
                                }
                                int need = Math.max(p.space().legsFor(Math.max(counts.get(0), m)), ties.minLegs());
                                int most = Math.min(counts.get(0), m);
                                double maxSpacing = ties.maxSpacing();
                                final BarSize compressionBar = c;
                                if (torsion) {
                                    for (SkinBars sk : skins) {
                                        Stirrups st = byLegs.computeIfAbsent(
                                                        need + "/" + most + "/" + maxSpacing + "/"
                                                                + compressionBar.designation() + "/" + sk,
                                                        k -> java.util.Optional.ofNullable(cheapestStirrups(
                                                                p,
                                                                b,
                                                                h,
                                                                det,
                                                                t,
                                                                counts,
                                                                compressionBar,
                                                                sk,
                                                                need,
                                                                most,
                                                                maxSpacing)))
                                                .orElse(null);
                                        if (st == null) {
                                            continue;
                                        }
                                        SectionLayout lay = new SectionLayout(
                                                b, h, p.flange(), p.bending(), t, counts, c, m, st, sk);
                                        checked++;
                                        long units = keepIfPasses(p, demand, lay, perKey);
                                        if (units >= 0 && units < bestUnits) {
                                            bestUnits = units;
                                            best = lay;
                                        }
                                    }
                                    continue;
                                }
                                Stirrups st = byLegs.computeIfAbsent(
                                                need + "/" + most + "/" + maxSpacing,
                                                k -> java.util.Optional.ofNullable(cheapestStirrups(
                                                        p,
                                                        b,
                                                        h,
                                                        det,
                                                        t,
                                                        counts,
                                                        compressionBar,
                                                        null,
                                                        need,
                                                        most,
                                                        maxSpacing)))
                                        .orElse(null);
                                if (st == null) {
                                    continue;
                                }
                                SectionLayout lay =
                                        new SectionLayout(b, h, p.flange(), p.bending(), t, counts, c, m, st, skin);
                                checked++;
                                long units = keepIfPasses(p, demand, lay, perKey);
                                if (units >= 0 && units < bestUnits) {
                                    bestUnits = units;
                                    best = lay;
                                }
                            }
                        }
                    }
                }
            }
        }
        return new Result(best, best == null ? -1 : bestUnits, checked, perKey);
    }

    /** The layout's cost units if the section model passes it whole (and its key's cheapest noted), else -1. */
    private long keepIfPasses(SectionProblem p, Demand demand, SectionLayout lay, java.util.Map<String, Long> perKey) {
        BeamSection s = lay.section(p.materials(), p.detailing(), p.code());
        CheckReport r = SectionChecks.run(s, demand, p.span(), Trail.off());
        if (!r.ok()) {
            return -1;
        }
        if (carbon != null && CostModel.units(lay.cost(carbon).total()) > cap) {
            return -1;
        }
        if (passing != null) {
            passing.add(lay);
        }
        long units = CostModel.units(lay.cost(cost).total());
        perKey.merge(lay.distinctKey(), units, Math::min);
        return units;
    }

    /** All count vectors n1 >= n2 >= ... >= 2 with n1 <= nmax. */
    public static List<List<Integer>> countVectors(int layers, int nmax) {
        List<List<Integer>> out = new ArrayList<>();
        fill(layers, nmax, new ArrayList<>(), out);
        return out;
    }

    private static void fill(int layers, int cap, List<Integer> cur, List<List<Integer>> out) {
        if (cur.size() == layers) {
            out.add(List.copyOf(cur));
            return;
        }
        for (int v = 2; v <= cap; v++) {
            cur.add(v);
            fill(layers, v, cur, out);
            cur.remove(cur.size() - 1);
        }
    }

    /**
     * The cheapest stirrup option whose shear checks pass for these tension bars (any hangers), with the
     * compression layer {@code c} and the skin bars {@code skin} (null for none); under torsion, the torsion
     * checks on stirrups too (every legs and spacing).
     */
    private Stirrups cheapestStirrups(
            SectionProblem p,
            double b,
            double h,
            Detailing det,
            BarSize t,
            List<Integer> counts,
            BarSize c,
            SkinBars skin,
            int minLegs,
            int maxLegs,
            double maxSpacing) {
        Stirrups best = null;
        double bestCost = Double.POSITIVE_INFINITY;
        for (int legs : p.space().stirrupLegs()) {
            if (legs < minLegs || legs > maxLegs) {
                continue;
            }
            for (double s : p.space().stirrupSpacings()) {
                if (s > maxSpacing * (1 + 1e-9)) {
                    continue;
                }
                Stirrups st = new Stirrups(det.stirrupBar(), legs, s);
                SectionLayout lay = new SectionLayout(b, h, p.flange(), p.bending(), t, counts, c, 2, st, skin);
                BeamSection sec = lay.section(p.materials(), p.detailing(), p.code());
                var fr = barfit.section.Flexure.analyse(sec, p.bending());
                boolean ok = (p.vu() == null
                                ? SectionChecks.minimumStirrupsPass(sec, fr.d(), fr.tensionSteelArea())
                                : SectionChecks.shearPasses(sec, p.vu(), fr.d(), fr.tensionSteelArea()))
                        && (!p.demand().hasTorsion()
                                || TorsionChecks.stirrupsPass(sec, p.demand(), fr.d(), fr.tensionSteelArea()));
                double sc = cost.stirrups(b, h, st);
                if (ok && sc < bestCost - 1e-12) {
                    bestCost = sc;
                    best = st;
                }
            }
        }
        return best;
    }
}
