package barfit.schedule;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.catalogs.BarCatalog;
import barfit.catalogs.BarCatalogs;
import barfit.catalogs.BarSize;
import barfit.catalogs.yaml.Location;
import barfit.design.CostModel;
import barfit.design.CostRates;
import barfit.design.Proof;
import barfit.design.SearchSpace;
import barfit.design.SolverOptions;
import barfit.design.span.SpanExhaustive;
import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.design.span.SpanVerifier;
import barfit.input.Rationalise;
import barfit.input.SearchReader;
import barfit.input.Settings;
import barfit.section.CodeEquations;
import barfit.section.Detailing;
import barfit.section.EndCondition;
import barfit.section.Exposure;
import barfit.section.Flange;
import barfit.section.Materials;
import barfit.section.SpanChecks;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

/**
 * Rationalised schedules against brute force on small invented schedules: every beam priced in every
 * section size for every set of bar sizes by plain enumeration of all its layouts (each verified by the
 * section model), then every choice of at most K sizes and every bar-size set tried. The schedule's
 * total must equal the brute-force optimum, be proven, respect the limits and never beat each beam's
 * own optimum.
 */
class RationaliseOracleTest {
    static final BarCatalog BARS = BarCatalogs.builtIn("astm-a615m").orElseThrow();
    static final CostModel COST = new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI);

    static BarSize bar(String s) {
        return BARS.find(s).orElseThrow();
    }

    @Test
    void rationalisedCostEqualsBruteForce() {
        Random r = new Random(Long.getLong("schedule.seed", 606L));
        int instances = Integer.getInteger("schedule.instances", 10);
        int proven = 0;
        for (int i = 0; i < instances; i++) {
            ScheduleInput in = schedule(r, i);
            ScheduleResult got = new ScheduleSolver(COST, new SolverOptions(30, 1, 1), 2, Progress.NONE).solve(in);
            long[][][] prices = prices(in);
            Brute ref = bruteForce(
                    in,
                    prices,
                    in.rationalise().maxSectionSizes() == null
                            ? Integer.MAX_VALUE
                            : in.rationalise().maxSectionSizes());
            String where =
                    "schedule " + i + " " + in.rationalise() + ", " + in.beams().size() + " beams";
            if (ref.total == Long.MAX_VALUE) {
                assertTrue(
                        !got.allFeasible(),
                        "brute force finds nothing; the schedule claims " + got.totalCost() + " — " + where);
                continue;
            }
            if (Boolean.getBoolean("schedule.debug")) {
                System.out.println(where + " brute " + ref + " got " + got.totalCost() + " formwork "
                        + got.formworkSetsCost() + " proof " + got.proof());
                for (ScheduleResult.Beam b : got.beams()) {
                    System.out.println("  " + b.beam().id() + " group "
                            + b.beam().group() + " "
                            + (b.feasible()
                                    ? b.outcome().best().layout().width() + "x"
                                            + b.outcome().best().layout().height() + " "
                                            + b.outcome().best().cost().total() + " top "
                                            + b.outcome().best().layout().top() + " bottom "
                                            + b.outcome().best().layout().bottom()
                                    : "none " + b.outcome().diagnosis())
                            + " own " + b.ownOptimum());
                }
            }
            assertTrue(
                    got.proof() != null && got.proof().status() == Proof.Status.OPTIMAL,
                    "proof " + got.proof() + " — " + where);
            assertEquals(
                    ref.total,
                    CostModel.units(got.totalCost()),
                    in.beams().size() + 1.0,
                    "total against brute force " + ref + " — " + where);
            checkLimits(in, got, where);
            double own = got.beams().stream()
                    .filter(ScheduleResult.Beam::feasible)
                    .mapToDouble(ScheduleResult.Beam::ownOptimum)
                    .sum();
            assertTrue(got.beamsCost() >= own - 1e-6, "beams priced below their own optima — " + where);
            checkCurve(in, got, prices, CostModel.units(in.rationalise().formworkSetCost()), where);
            proven++;
        }
        assertTrue(proven >= instances / 2, "enough feasible schedules: " + proven);
    }

    /**
     * A schedule rationalised for the least carbon ({@code schedule --objective carbon} with a rationalise:
     * block), or for a blend of cost and carbon (a frontier's point), against the same brute force with every
     * beam priced in that measure (random factors, invented) and a set of forms at money's share of it (none
     * for carbon): the proven objective and each point of the price of standardisation equal the enumerated
     * optimum, the limits hold, and a carbon schedule's carbon is its objective.
     */
    @Test
    void rationalisedCarbonEqualsBruteForce() {
        Random r = new Random(Long.getLong("schedule.seed", 707L));
        int instances = Integer.getInteger("schedule.instances", 6);
        int proven = 0;
        for (int i = 0; i < instances; i++) {
            ScheduleInput in = schedule(r, i);
            CostModel withCarbon = COST.withCarbon(new barfit.design.CarbonFactors(
                    100 + 300 * r.nextDouble(), 0.8 + 2.2 * r.nextDouble(), 0.8 + 2.2 * r.nextDouble(), 0));
            // every other instance a blend of cost and carbon (a frontier's point): the sets of forms then
            // enter with cost's share
            boolean blend = i % 2 == 1;
            double share = 0.3 + 0.4 * r.nextDouble();
            CostModel carbon =
                    blend ? withCarbon.blend(share, 1 - share) : withCarbon.minimising(barfit.design.Objective.CARBON);
            ScheduleResult got = new ScheduleSolver(carbon, new SolverOptions(30, 1, 1), 2, Progress.NONE).solve(in);
            long[][][] prices = prices(in, carbon);
            int k = in.rationalise().maxSectionSizes() == null
                    ? Integer.MAX_VALUE
                    : in.rationalise().maxSectionSizes();
            long fixed = blend ? Math.round(CostModel.units(in.rationalise().formworkSetCost()) * share) : 0;
            Brute ref = bruteForce(in, prices, k, fixed);
            String where = "carbon schedule " + i + " " + in.rationalise() + ", "
                    + in.beams().size() + " beams";
            if (ref.total == Long.MAX_VALUE) {
                assertTrue(!got.allFeasible(), where);
                continue;
            }
            assertTrue(
                    got.proof() != null && got.proof().status() == Proof.Status.OPTIMAL,
                    "proof " + got.proof() + " — " + where);
            assertEquals(
                    ref.total,
                    CostModel.units(got.proof().objective()),
                    in.beams().size() + 1.0,
                    (blend ? "blend" : "carbon") + " against brute force " + ref + " — " + where);
            if (!blend) {
                assertEquals(barfit.design.Objective.CARBON, got.proof().measure(), where);
                assertEquals(
                        ref.total,
                        CostModel.units(got.totalCarbon()),
                        in.beams().size() + 1.0,
                        where);
                assertTrue(got.leastCarbon(), where);
            }
            checkLimits(in, got, where);
            checkCurve(in, got, prices, fixed, where);
            proven++;
        }
        assertTrue(proven >= instances / 2, "enough feasible schedules: " + proven);
    }

    /** The price of standardisation, point by point, against brute force with {@code fixed} units per size. */
    private static void checkCurve(ScheduleInput in, ScheduleResult got, long[][][] prices, long fixed, String where) {
        for (ScheduleResult.StandardisationPoint pt : got.standardisation()) {
            Brute b = bruteForce(in, prices, pt.sizes(), fixed);
            if (b.total() == Long.MAX_VALUE) {
                assertTrue(
                        Double.isNaN(pt.cost()),
                        "K = " + pt.sizes() + " has no schedule, got " + pt.cost() + " — " + where);
            } else {
                assertEquals(
                        b.total(),
                        CostModel.units(pt.cost()),
                        in.beams().size() + 1.0,
                        "K = " + pt.sizes() + " — " + where);
            }
        }
    }

    private static void checkLimits(ScheduleInput in, ScheduleResult got, String where) {
        Set<String> sizes = new HashSet<>();
        Set<String> bars = new HashSet<>();
        Map<String, String> groupSize = new TreeMap<>();
        for (ScheduleResult.Beam b : got.beams()) {
            if (!b.feasible()) {
                continue;
            }
            assertTrue(b.outcome().best().report().ok(), "re-verified — " + where);
            SpanLayout l = b.outcome().best().layout();
            // verified afresh by the section model, against the beam as the schedule gave it
            assertTrue(SpanVerifier.verify(b.beam().problem(), l, false).ok(), "verifies afresh — " + where);
            String size = l.width() + "x" + l.height();
            sizes.add(size);
            bars.add(l.top().designation());
            bars.add(l.bottom().designation());
            if (in.rationalise().groupsSameSection() && b.beam().group() != null) {
                String first = groupSize.putIfAbsent(b.beam().group(), size);
                assertTrue(
                        first == null || first.equals(size), "group " + b.beam().group() + " shares b x h — " + where);
            }
        }
        if (in.rationalise().maxSectionSizes() != null) {
            assertTrue(sizes.size() <= in.rationalise().maxSectionSizes(), "sizes " + sizes + " — " + where);
        }
        if (in.rationalise().maxBarSizes() != null) {
            assertTrue(bars.size() <= in.rationalise().maxBarSizes(), "bar sizes " + bars + " — " + where);
        }
    }

    // ------------------------------------------------------------------ brute force

    record Brute(long total, List<Integer> sizes, List<String> bars) {}

    /** Each beam's price by enumeration: [bar-size set as a bit mask][beam][size], MAX where nothing passes. */
    static long[][][] prices(ScheduleInput in) {
        return prices(in, COST);
    }

    /** As above, each beam priced by {@code model} (the carbon factors, for a schedule minimising carbon). */
    static long[][][] prices(ScheduleInput in, CostModel model) {
        SearchSpace space = in.space();
        List<double[]> sizes = new ArrayList<>();
        for (double b : space.widths()) {
            for (double h : space.depths()) {
                sizes.add(new double[] {b, h});
            }
        }
        int nb = space.barSizes().size();
        int take = in.rationalise().maxBarSizes() == null
                ? nb
                : Math.min(in.rationalise().maxBarSizes(), nb);
        SpanExhaustive oracle = new SpanExhaustive(model);
        int n = in.beams().size();
        // beams with no design at all, and groups with no common size, are left out as the schedule does
        long[][][] price = new long[1 << nb][n][sizes.size()];
        for (int set = 0; set < (1 << nb); set++) {
            if (Integer.bitCount(set) != take && set != (1 << nb) - 1) {
                continue;
            }
            List<BarSize> allowed = new ArrayList<>();
            for (int x = 0; x < nb; x++) {
                if ((set & (1 << x)) != 0) {
                    allowed.add(space.barSizes().get(x));
                }
            }
            for (int i = 0; i < n; i++) {
                SpanProblem p = in.beams().get(i).problem();
                for (int s = 0; s < sizes.size(); s++) {
                    SpanProblem q = p.withFixedWidth(sizes.get(s)[0])
                            .withSpace(p.space()
                                    .withDepths(List.of(sizes.get(s)[1]))
                                    .withMainBars(allowed));
                    boolean widthOk = p.fixedWidth() == null || p.fixedWidth() == sizes.get(s)[0];
                    SpanExhaustive.Result e = widthOk ? oracle.solve(q) : null;
                    price[set][i][s] = e == null || e.best() == null ? Long.MAX_VALUE : e.units();
                }
            }
        }
        return price;
    }

    /** Every subset of at most k sizes and every bar-size set of min(M, all) sizes, at the enumerated prices. */
    static Brute bruteForce(ScheduleInput in, long[][][] price, int k) {
        return bruteForce(in, price, k, CostModel.units(in.rationalise().formworkSetCost()));
    }

    /** As above, with {@code fixed} units for each size used (a set of forms; none when minimising carbon). */
    static Brute bruteForce(ScheduleInput in, long[][][] price, int k, long fixed) {
        SearchSpace space = in.space();
        int sizeCount = space.widths().size() * space.depths().size();
        List<double[]> sizes = new ArrayList<>();
        for (double b : space.widths()) {
            for (double h : space.depths()) {
                sizes.add(new double[] {b, h});
            }
        }
        int nb = space.barSizes().size();
        int take = in.rationalise().maxBarSizes() == null
                ? nb
                : Math.min(in.rationalise().maxBarSizes(), nb);
        int n = in.beams().size();
        int all = (1 << nb) - 1;
        if (Boolean.getBoolean("schedule.debug") && sizeCount > 0) {
            for (int i = 0; i < n; i++) {
                System.out.println(
                        "  brute " + in.beams().get(i).id() + " " + java.util.Arrays.toString(price[all][i]));
            }
        }
        List<List<Integer>> groups = new ArrayList<>();
        Map<String, List<Integer>> named = new LinkedHashMap<>();
        for (int i = 0; i < n; i++) {
            boolean any = false;
            for (int s = 0; s < sizes.size(); s++) {
                any |= price[all][i][s] != Long.MAX_VALUE;
            }
            if (!any) {
                continue;
            }
            String g = in.beams().get(i).group();
            if (in.rationalise().groupsSameSection() && g != null) {
                named.computeIfAbsent(g, x -> new ArrayList<>()).add(i);
            } else {
                named.put("#" + i, new ArrayList<>(List.of(i)));
            }
        }
        for (List<Integer> members : named.values()) {
            boolean common = false;
            for (int s = 0; s < sizes.size() && !common; s++) {
                final int size = s;
                common = members.stream().allMatch(i -> price[all][i][size] != Long.MAX_VALUE);
            }
            if (common) {
                groups.add(members);
            }
        }
        Brute best = new Brute(Long.MAX_VALUE, List.of(), List.of());
        for (int set = 0; set < (1 << nb); set++) {
            if (Integer.bitCount(set) != take) {
                continue;
            }
            for (int mask = 1; mask < (1 << sizes.size()); mask++) {
                if (Integer.bitCount(mask) > k) {
                    continue;
                }
                long total = fixed * Integer.bitCount(mask);
                for (List<Integer> members : groups) {
                    long g = Long.MAX_VALUE;
                    for (int s = 0; s < sizes.size(); s++) {
                        if ((mask & (1 << s)) == 0) {
                            continue;
                        }
                        long sum = 0;
                        for (int i : members) {
                            long v = price[set][i][s];
                            if (v == Long.MAX_VALUE) {
                                sum = Long.MAX_VALUE;
                                break;
                            }
                            sum += v;
                        }
                        g = Math.min(g, sum);
                    }
                    if (g == Long.MAX_VALUE) {
                        total = Long.MAX_VALUE;
                        break;
                    }
                    total += g;
                }
                if (total < best.total()) {
                    List<Integer> open = new ArrayList<>();
                    for (int s = 0; s < sizes.size(); s++) {
                        if ((mask & (1 << s)) != 0) {
                            open.add(s);
                        }
                    }
                    List<String> names = new ArrayList<>();
                    for (int x = 0; x < nb; x++) {
                        if ((set & (1 << x)) != 0) {
                            names.add(space.barSizes().get(x).designation());
                        }
                    }
                    best = new Brute(total, open, names);
                }
            }
        }
        return best;
    }

    // ------------------------------------------------------------------ invented small schedules

    static ScheduleInput schedule(Random r, int index) {
        Materials m = new Materials(28, 420, 420, 20, 1.0);
        Detailing det = new Detailing(40, bar("10"), 25, Exposure.INTERIOR);
        List<BarSize> sizes = List.of(bar("16"), bar("19"), bar("22"));
        SearchSpace space = new SearchSpace(
                List.of(250.0, 300.0),
                List.of(400.0, 500.0, 600.0),
                sizes,
                sizes,
                1,
                List.of(bar("10")),
                List.of(2, 4),
                List.of(100.0, 150.0, 200.0, 250.0));
        Settings settings = new Settings("oracle-" + index, UnitSystem.SI, m, BARS, det, Location.ofFile("oracle"));
        int n = 3 + r.nextInt(3);
        List<ScheduleBeam> beams = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            EndCondition ends = EndCondition.values()[r.nextInt(3)]; // simple, one end or both ends continuous
            double span = 4000 + 500 * r.nextInt(6);
            double w = 15 + r.nextDouble() * 30; // kN/m, factored
            double l = span / 1000;
            Double ml = null;
            Double mm;
            Double mr = null;
            switch (ends) {
                case SIMPLE -> mm = w * l * l / 8 * 1e6;
                case ONE_END_CONTINUOUS -> {
                    mm = w * l * l / 14 * 1e6;
                    mr = -w * l * l / 10 * 1e6;
                }
                default -> {
                    mm = w * l * l / 16 * 1e6;
                    ml = -w * l * l / 11 * 1e6;
                    mr = -w * l * l / 11 * 1e6;
                }
            }
            double v = w * l / 2 * 1e3;
            SpanChecks.ServiceLoads service =
                    r.nextBoolean() ? new SpanChecks.ServiceLoads(w / 1.5 * 0.6, w / 1.5 * 0.4, 0.25) : null;
            Double cap = r.nextInt(4) == 0 ? 500.0 : null;
            Flange flange = ends != EndCondition.SIMPLE && r.nextInt(3) == 0
                    ? Flange.given(1000, 120, false, null, span)
                    : null;
            SpanProblem p = new SpanProblem(
                    "S" + index + "-" + (i + 1),
                    m,
                    det,
                    CodeEquations.SI,
                    space,
                    span,
                    ends,
                    ml,
                    mm,
                    mr,
                    v,
                    v,
                    service,
                    SpanChecks.Limits.DEFAULT,
                    cap,
                    null,
                    flange,
                    false,
                    2,
                    4);
            String group = r.nextInt(3) == 0 ? "G" + r.nextInt(2) : null;
            beams.add(new ScheduleBeam(p.id(), group, Location.ofFile("oracle"), p));
        }
        Integer k = r.nextInt(4) == 0 ? null : 1 + r.nextInt(3);
        Integer mBars = r.nextInt(4) == 0 ? null : 1 + r.nextInt(2);
        Rationalise rat = new Rationalise(k, mBars, r.nextBoolean(), r.nextBoolean() ? 0 : 40 + r.nextInt(60));
        SearchReader.Costs costs = new SearchReader.Costs(CostRates.DEFAULTS, "", new java.util.TreeMap<>(), false);
        return new ScheduleInput(
                List.of("oracle-" + index), settings, space, CostRates.DEFAULTS, "", costs, 2, 4, beams, rat);
    }
}
