package barfit.design.span;

import barfit.catalogs.BarSize;
import barfit.design.CostModel;
import barfit.design.OrTools;
import barfit.design.Proof;
import barfit.design.SolverOptions;
import com.google.ortools.sat.CpModel;
import com.google.ortools.sat.CpSolver;
import com.google.ortools.sat.LinearExpr;
import com.google.ortools.sat.LinearExprBuilder;
import com.google.ortools.sat.Literal;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The CP-SAT model of one span over the generator's options. One frame; in it one top option (top bar
 * size, continuous count), one mid-span option consistent with it, and one option at each continuous
 * support of the same top size whose first layer holds the continuous bars and whose stirrups have
 * legs enough for the bottom bars; at most {@code max_bar_sizes_per_beam} bar sizes. Deflection, which
 * couples everything, is added lazily: a combination found too flexible is cut off together with every
 * combination whose every section is no stiffer (Ie at each service level, and ρ').
 */
public final class SpanSelection {
    /** The chosen combination and the solver's proof. */
    public record Choice(FrameOptions set, MidOption mid, SupportOption left, SupportOption right) {}

    /** {@code choice}, {@code objective} and {@code bound} (in {@link CostModel#SPAN_UNITS}) only when solved. */
    public record Result(Proof.Status status, Choice choice, long objective, long bound, Proof.SolverStats stats) {}

    private final CpModel model = new CpModel();
    private final List<FrameOptions> sets;
    private final SpanProblem p;
    private final List<Literal> frameVars = new ArrayList<>();
    private final List<List<Literal>> midVars = new ArrayList<>();
    private final List<List<Literal>> leftVars = new ArrayList<>();
    private final List<List<Literal>> rightVars = new ArrayList<>();
    private final List<Literal> all = new ArrayList<>();
    private final List<Long> costs = new ArrayList<>();
    /** What each boolean of {@link #all} chooses (a frame, top, mid-span or support option) and in which frame. */
    private final List<Object> chosen = new ArrayList<>();

    private final List<SpanFrame> chosenIn = new ArrayList<>();
    private int booleans;
    /** Each option's stiffness for the deflection cuts, computed once (options are compared by identity). */
    private final Map<Object, double[]> stiffness = new java.util.IdentityHashMap<>();

    private static final double[] NO_PART = new double[0];

    public SpanSelection(SpanProblem problem, List<FrameOptions> sets) {
        OrTools.load();
        this.p = problem;
        this.sets = sets;
        build();
    }

    private Literal bool(String name, double cost, Object what, SpanFrame in) {
        Literal v = model.newBoolVar(name);
        all.add(v);
        costs.add(CostModel.SPAN_UNITS.units(cost));
        chosen.add(what);
        chosenIn.add(in);
        booleans++;
        return v;
    }

    private void build() {
        Map<String, Literal> sizeUsed = new LinkedHashMap<>();
        for (BarSize s : p.space().barSizes()) {
            sizeUsed.put(s.designation(), model.newBoolVar("size_" + s.designation()));
        }
        for (int fi = 0; fi < sets.size(); fi++) {
            FrameOptions fs = sets.get(fi);
            Literal y = bool("frame" + fi, fs.frame().cost(), fs.frame(), fs.frame());
            frameVars.add(y);
            List<TopOption> tops = fs.tops();
            List<Literal> topVars = new ArrayList<>();
            for (int i = 0; i < tops.size(); i++) {
                Literal x = bool("f" + fi + "_top" + i, tops.get(i).cost(), tops.get(i), fs.frame());
                topVars.add(x);
                model.addImplication(x, sizeUsed.get(tops.get(i).bar().designation()));
            }
            model.addEquality(LinearExpr.sum(topVars.toArray(new Literal[0])), y);
            List<Literal> midLiterals = new ArrayList<>();
            for (int i = 0; i < fs.mids().size(); i++) {
                MidOption m = fs.mids().get(i);
                Literal x = bool("f" + fi + "_mid" + i, m.cost(), m, fs.frame());
                midLiterals.add(x);
                model.addImplication(x, sizeUsed.get(m.bar().designation()));
            }
            midVars.add(midLiterals);
            // each top option is carried by exactly one mid-span option built on it
            for (int ti = 0; ti < tops.size(); ti++) {
                List<Literal> on = new ArrayList<>();
                for (int i = 0; i < fs.mids().size(); i++) {
                    if (fs.mids().get(i).top().equals(tops.get(ti))) {
                        on.add(midLiterals.get(i));
                    }
                }
                model.addEquality(LinearExpr.sum(on.toArray(new Literal[0])), topVars.get(ti));
            }
            leftVars.add(supports(fi, "left", fs, fs.lefts(), topVars, midLiterals, p.leftSupport()));
            rightVars.add(supports(fi, "right", fs, fs.rights(), topVars, midLiterals, p.rightSupport()));
        }
        model.addExactlyOne(frameVars.toArray(new Literal[0]));
        model.addLessOrEqual(LinearExpr.sum(sizeUsed.values().toArray(new Literal[0])), p.maxBarSizes());
        long[] c = costs.stream().mapToLong(Long::longValue).toArray();
        model.minimize(LinearExpr.weightedSum(all.toArray(new Literal[0]), c));
    }

    private List<Literal> supports(
            int fi,
            String side,
            FrameOptions fs,
            List<SupportOption> opts,
            List<Literal> topVars,
            List<Literal> midLiterals,
            boolean present) {
        List<Literal> supportLiterals = new ArrayList<>();
        if (!present) {
            return supportLiterals;
        }
        for (int i = 0; i < opts.size(); i++) {
            supportLiterals.add(bool("f" + fi + "_" + side + i, opts.get(i).cost(), opts.get(i), fs.frame()));
        }
        List<TopOption> tops = fs.tops();
        // same top size at the support as over the span
        for (BarSize s : p.space().barSizes()) {
            LinearExprBuilder lhs = LinearExpr.newBuilder();
            LinearExprBuilder rhs = LinearExpr.newBuilder();
            for (int i = 0; i < opts.size(); i++) {
                if (opts.get(i).bar().equals(s)) {
                    lhs.add(supportLiterals.get(i));
                }
            }
            for (int ti = 0; ti < tops.size(); ti++) {
                if (tops.get(ti).bar().equals(s)) {
                    rhs.add(topVars.get(ti));
                }
            }
            model.addEquality(lhs, rhs);
        }
        // the continuous bars sit in the support's first layer (a cantilever's top bars are all its own)
        if (!p.cantilever()) {
            LinearExprBuilder first = LinearExpr.newBuilder();
            for (int i = 0; i < opts.size(); i++) {
                first.addTerm(supportLiterals.get(i), opts.get(i).counts().get(0));
            }
            LinearExprBuilder continuous = LinearExpr.newBuilder();
            for (int ti = 0; ti < tops.size(); ti++) {
                continuous.addTerm(topVars.get(ti), tops.get(ti).continuous());
            }
            model.addGreaterOrEqual(first, continuous);
        }
        // stirrup legs at the support hold the bottom bars too
        LinearExprBuilder legs = LinearExpr.newBuilder();
        for (int i = 0; i < opts.size(); i++) {
            legs.addTerm(supportLiterals.get(i), opts.get(i).legs());
        }
        LinearExprBuilder need = LinearExpr.newBuilder();
        for (int i = 0; i < fs.mids().size(); i++) {
            need.addTerm(midLiterals.get(i), fs.mids().get(i).legsNeeded());
        }
        model.addGreaterOrEqual(legs, need);
        // and no more legs than the outer bottom layer holds (25.7.1.2, 25.7.1.3)
        LinearExprBuilder most = LinearExpr.newBuilder();
        for (int i = 0; i < opts.size(); i++) {
            most.addTerm(supportLiterals.get(i), opts.get(i).legsMax());
        }
        LinearExprBuilder held = LinearExpr.newBuilder();
        for (int i = 0; i < fs.mids().size(); i++) {
            held.addTerm(midLiterals.get(i), fs.mids().get(i).counts().get(0));
        }
        model.addLessOrEqual(most, held);
        // bottom bars counted as compression steel: the support option was built for those bottom bars
        if (p.bottomCoupled()) {
            Map<BottomBars, LinearExprBuilder[]> byKey = new LinkedHashMap<>();
            for (int i = 0; i < opts.size(); i++) {
                byKey
                        .computeIfAbsent(opts.get(i).bottom(), k ->
                                new LinearExprBuilder[] {LinearExpr.newBuilder(), LinearExpr.newBuilder()})[0]
                        .add(supportLiterals.get(i));
            }
            for (int i = 0; i < fs.mids().size(); i++) {
                byKey
                        .computeIfAbsent(fs.mids().get(i).bottom(), k ->
                                new LinearExprBuilder[] {LinearExpr.newBuilder(), LinearExpr.newBuilder()})[1]
                        .add(midLiterals.get(i));
            }
            for (LinearExprBuilder[] pair : byKey.values()) {
                model.addEquality(pair[0], pair[1]);
            }
        }
        return supportLiterals;
    }

    /**
     * Cuts off a combination found too flexible together with every combination of its frame whose every
     * section is no stiffer: Ie no larger at each service level and ρ' no larger where the long-term
     * multiplier takes it. A span's deflections only grow as Ie or ρ' fall ({@link
     * barfit.section.SpanChecks#deflections}), so each of those fails as well. (Fewer bars alone would not
     * do: with every layer at its own depth, a layout with no more bars but spread over more layers can be
     * the stiffer, and a shallower centroid raises ρ'.)
     */
    void cutDeflection(Choice c, SpanSections sections) {
        int fi = sets.indexOf(c.set());
        FrameOptions fs = c.set();
        SpanFrame f = fs.frame();
        boolean known = p.service() != null;
        LinearExprBuilder weaker = LinearExpr.newBuilder();
        int parts = 1;
        MidOption m0 = c.mid();
        double[] s0 = known ? stiffness(m0, () -> sections.deflectionStiffness(f, m0)) : null;
        for (int i = 0; i < fs.mids().size(); i++) {
            MidOption m = fs.mids().get(i);
            if (m == m0 || known && noStiffer(stiffness(m, () -> sections.deflectionStiffness(f, m)), s0)) {
                weaker.add(midVars.get(fi).get(i));
            }
        }
        parts += weakerSupports(
                weaker,
                fs.lefts(),
                leftVars.get(fi),
                c.left(),
                known,
                o -> sections.deflectionStiffness(f, o, SpanProblem.Place.LEFT));
        parts += weakerSupports(
                weaker,
                fs.rights(),
                rightVars.get(fi),
                c.right(),
                known,
                o -> sections.deflectionStiffness(f, o, SpanProblem.Place.RIGHT));
        model.addLessOrEqual(weaker, parts - 1);
    }

    private int weakerSupports(
            LinearExprBuilder weaker,
            List<SupportOption> opts,
            List<Literal> vars,
            SupportOption s0,
            boolean known,
            java.util.function.Function<SupportOption, double[]> of) {
        if (s0 == null) {
            return 0;
        }
        double[] k0 = known ? stiffness(s0, () -> of.apply(s0)) : null;
        for (int i = 0; i < opts.size(); i++) {
            SupportOption s = opts.get(i);
            if (s == s0 || known && noStiffer(stiffness(s, () -> of.apply(s)), k0)) {
                weaker.add(vars.get(i));
            }
        }
        return 1;
    }

    private double[] stiffness(Object option, java.util.function.Supplier<double[]> of) {
        double[] v = stiffness.computeIfAbsent(option, k -> {
            double[] s = of.get();
            return s == null ? NO_PART : s;
        });
        return v;
    }

    /** Whether a section's stiffness is nowhere above another's (a section that takes no part never is). */
    private static boolean noStiffer(double[] a, double[] b) {
        for (int i = 0; i < a.length; i++) {
            if (a[i] > b[i]) {
                return false;
            }
        }
        return true;
    }

    /**
     * Holds the span's price in another measure ({@code prices}: carbon, say) to at most {@code cap} in
     * {@link CostModel#SPAN_UNITS}: every boolean weighted by the price of what it chooses.
     */
    void atMost(SpanPrices prices, long cap) {
        long[] w = new long[all.size()];
        for (int i = 0; i < w.length; i++) {
            w[i] = CostModel.SPAN_UNITS.units(price(prices, chosen.get(i), chosenIn.get(i)));
        }
        model.addLessOrEqual(LinearExpr.weightedSum(all.toArray(new Literal[0]), w), cap);
    }

    /** The price in {@code prices} of one of the model's choices. */
    static double price(SpanPrices prices, Object what, SpanFrame in) {
        if (what instanceof SpanFrame f) {
            return prices.frame(f);
        }
        if (what instanceof TopOption t) {
            return prices.top(in, t);
        }
        if (what instanceof MidOption m) {
            return prices.mid(in, m);
        }
        return prices.support(in, (SupportOption) what);
    }

    /** Every choice of the model with its cost as the model holds it, for the cross-check of {@link SpanPrices}. */
    List<double[]> pricedChoices(SpanPrices prices) {
        List<double[]> out = new ArrayList<>();
        for (int i = 0; i < all.size(); i++) {
            out.add(new double[] {
                CostModel.SPAN_UNITS.currency(costs.get(i)), price(prices, chosen.get(i), chosenIn.get(i))
            });
        }
        return out;
    }

    /** Forbids a frame with given bar sizes (for the next distinct alternatives). */
    public void exclude(Choice c) {
        int fi = sets.indexOf(c.set());
        LinearExprBuilder same = LinearExpr.newBuilder();
        for (int i = 0; i < c.set().mids().size(); i++) {
            MidOption m = c.set().mids().get(i);
            if (m.bar().equals(c.mid().bar())
                    && m.top().bar().equals(c.mid().top().bar())) {
                same.add(midVars.get(fi).get(i));
            }
        }
        model.addEquality(same, 0);
    }

    public Result solve(SolverOptions o) {
        CpSolver solver = OrTools.solver(o);
        Proof.Status status = OrTools.status(solver.solve(model), solver, "the span selection model of beam " + p.id());
        Proof.SolverStats stats =
                new Proof.SolverStats(booleans, solver.numConflicts(), solver.numBranches(), solver.wallTime());
        if (status != Proof.Status.OPTIMAL && status != Proof.Status.FEASIBLE) {
            return new Result(status, null, 0, 0, stats);
        }
        for (int fi = 0; fi < sets.size(); fi++) {
            if (!solver.booleanValue(frameVars.get(fi))) {
                continue;
            }
            FrameOptions fs = sets.get(fi);
            MidOption mid = pick(solver, midVars.get(fi), fs.mids());
            SupportOption left = pick(solver, leftVars.get(fi), fs.lefts());
            SupportOption right = pick(solver, rightVars.get(fi), fs.rights());
            return new Result(
                    status,
                    new Choice(fs, mid, left, right),
                    Math.round(solver.objectiveValue()),
                    Math.round(solver.bestObjectiveBound()),
                    stats);
        }
        throw new IllegalStateException("the solver chose no frame");
    }

    private static <T> T pick(CpSolver solver, List<Literal> vars, List<T> opts) {
        for (int i = 0; i < vars.size(); i++) {
            if (solver.booleanValue(vars.get(i))) {
                return opts.get(i);
            }
        }
        return null;
    }
}
