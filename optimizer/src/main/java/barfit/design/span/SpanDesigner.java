package barfit.design.span;

import barfit.design.Binding;
import barfit.design.CostBreakdown;
import barfit.design.CostModel;
import barfit.design.Objective;
import barfit.design.Proof;
import barfit.design.SolverOptions;
import barfit.section.CheckResult;
import java.util.ArrayList;
import java.util.List;

/**
 * Designs a whole span: candidates from {@link SpanGenerator}, the choice and its proof from
 * {@link SpanSelection} (with deflection cuts as needed), every chosen span re-verified by
 * {@link SpanVerifier}, what binds, the next distinct alternatives, or a diagnosis.
 */
public final class SpanDesigner {
    /**
     * A chosen span with its cost and full verification, and its carbon (kg CO2e, A1-A3) priced through the
     * same model (null where no carbon factors were given).
     */
    public record Design(
            SpanLayout layout,
            CostBreakdown cost,
            SpanReport report,
            List<SpanLayout.BarMark> bars,
            CostBreakdown carbon) {
        public Design(SpanLayout layout, CostBreakdown cost, SpanReport report, List<SpanLayout.BarMark> bars) {
            this(layout, cost, report, bars, null);
        }

        /** What a search pricing with {@code model} minimised: the cost, the carbon, or a blend of the two. */
        public CostBreakdown searched(CostModel model) {
            if (model.objective() == Objective.CARBON) {
                return carbon;
            }
            // a blend's rates are its shares of the two, so its price is the same shares of the two prices
            double share = model.moneyShare();
            return share == 1 ? cost : cost.times(share).plus(carbon.times(1 - share));
        }
    }

    /**
     * A span's search, for its proof: the generator's counts, the CP-SAT solves and the deflection cuts
     * added between them; {@code withLine} where the span was chosen with the other parts of its line (they
     * share support bars), exactly, by the line's search over every part's options, with no solve of its own;
     * {@code enumerated} where the generator's enumeration of the options left found one combination cheaper
     * than every other, so no CP-SAT solve was needed ({@link Combinations#decided}).
     */
    public record Search(
            SpanGenerator.Stats generator, int solves, int deflectionCuts, boolean withLine, boolean enumerated) {
        public Search(SpanGenerator.Stats generator, int solves, int deflectionCuts) {
            this(generator, solves, deflectionCuts, false, false);
        }

        public Search(SpanGenerator.Stats generator, int solves, int deflectionCuts, boolean withLine) {
            this(generator, solves, deflectionCuts, withLine, false);
        }
    }

    /**
     * How much cheaper (currency) the generator's best combination must be than every other for the search to
     * take it without a CP-SAT solve: far above the model's rounding of each part to a millionth, so that the
     * model would have this one optimum too.
     */
    static final double DECIDED_MARGIN = 1e-5;

    /**
     * Why a span has no design, as data the reports put in words: {@code limit} names what fails at the cap
     * (a check id such as {@code deflection_total}, or {@code strength}, {@code shear}, {@code headroom},
     * {@code deflection} when it cannot be computed, {@code group}, {@code time limit}) and {@code clause} its
     * clause; {@code cause} holds the facts behind it. {@code atCap} lists the failing checks of the cheapest
     * layout that passes everything else within the cap (when deflection alone fails), and {@code deeper} and
     * {@code wider} the changes that work, each found by designing the span and verified (null when none was
     * found); {@code maxDepth} and {@code fixedWidth} are the span's own (null where it has none).
     */
    public record Diagnosis(
            String limit,
            String clause,
            Cause cause,
            List<CheckResult> atCap,
            Fix deeper,
            Fix wider,
            Double maxDepth,
            Double fixedWidth) {
        public Diagnosis {
            atCap = List.copyOf(atCap);
        }

        /** A span stopped by something other than its own limits (the time limit, a schedule's group). */
        public Diagnosis(String limit, Cause cause) {
            this(limit, "", cause, List.of(), null, null, null, null);
        }

        /** What stops the span, as facts: one of the records here, or a later stage's own (a schedule's group). */
        public interface Cause {}

        /** {@code max_depth} is below the shallowest depth searched. */
        public record BelowShallowest() implements Cause {}

        /** Every allowed depth is below Table 9.3.1.1's {@code hMin} and no service loads are given to compute deflection. */
        public record DeflectionUnchecked(double hMin) implements Cause {}

        /** Which deflection limits no layout within the cap meets: one, each alone but not both, or neither. */
        public enum Deflections {
            LIVE,
            TOTAL,
            EACH_BUT_NOT_BOTH,
            NEITHER
        }

        /**
         * Deflection, computed below Table 9.3.1.1's {@code hMin}, fails at every depth up to {@code tallest},
         * though the cheapest layout meeting every other check is {@code width} x {@code height}; the limits as
         * span divisors.
         */
        public record DeflectionFails(
                Deflections which,
                double hMin,
                double tallest,
                double liveDivisor,
                double totalDivisor,
                double width,
                double height)
                implements Cause {}

        /** The moments can be carried within the cap (deflection set aside where it is computed), not the shears. */
        public record ShearFails(boolean deflectionSetAside) implements Cause {}

        /** No layout carries the moments, even with deflection set aside and the shears taken as zero where given. */
        public record StrengthFails(boolean deflectionSetAside, boolean shearsTakenAsZero) implements Cause {}

        /** The time limit ({@code seconds} per solve) ended the search before a design passing every check was found. */
        public record TimeLimit(double seconds) implements Cause {}

        /**
         * Designs pass, but none within the carbon cap ({@code cap}, kg CO2e over the span of {@code span} mm):
         * {@code least} is the least carbon of any passing design, at {@code width} x {@code height}.
         */
        public record CarbonCapFails(double cap, double least, double width, double height, double span)
                implements Cause {}
    }

    /** A size at which the span designs, with the cheapest layout found there (it passes SpanVerifier). */
    public record Fix(double width, double height, SpanLayout layout) {}

    public record Outcome(
            SpanProblem problem,
            String status,
            Design best,
            List<Design> alternatives,
            Proof<Search> proof,
            List<Binding> binding,
            Diagnosis diagnosis) {
        public boolean feasible() {
            return best != null;
        }

        /** This outcome for another span the same but for its mark: the search is deterministic, so it is that span's own. */
        public Outcome forSpan(SpanProblem same) {
            return new Outcome(same, status, best, alternatives, proof, binding, diagnosis);
        }
    }

    private final CostModel cost;
    private final SolverOptions options;
    /** Whether a span the generator's enumeration decides is taken without a CP-SAT solve (see {@link #decided}). */
    private final boolean byEnumeration;

    public SpanDesigner(CostModel cost, SolverOptions options) {
        this(cost, options, true);
    }

    private SpanDesigner(CostModel cost, SolverOptions options, boolean byEnumeration) {
        this.cost = cost;
        this.options = options;
        this.byEnumeration = byEnumeration;
    }

    /** The same designer with every choice made by the CP-SAT model: the cross-check of {@link #decided}. */
    SpanDesigner solvingAlways() {
        return new SpanDesigner(cost, options, false);
    }

    /**
     * The span's proven cheapest design and up to {@code alternatives} next-cheapest ones. Alternatives need
     * the candidates the cost bound would discard: the generator keeps those within a margin of the
     * cheapest, widened (10 %, 30 %, 100 %, everything) until enough are found.
     */
    public Outcome design(SpanProblem p, int alternatives) {
        return design(p, alternatives, (SpanLayout) null);
    }

    /**
     * As {@link #design(SpanProblem, int)}, told of a layout that may pass ({@code hint}, e.g. the same span's
     * design for a slightly different demand): when it passes every check and its section is in the search
     * space, its cost bounds the search from the start. The optimum is the same; the search is shorter.
     */
    public Outcome design(SpanProblem p, int alternatives, SpanLayout hint) {
        double ceiling = ceiling(p, hint);
        Outcome o = design(p, alternatives, 0, ceiling);
        double[] margins = {0.1, 0.3, 1.0, Double.POSITIVE_INFINITY};
        for (int i = 0; i < margins.length && o.feasible() && o.alternatives().size() < alternatives; i++) {
            o = design(p, alternatives, margins[i], ceiling);
        }
        return o;
    }

    /**
     * The cheapest design (the least of this designer's measure) whose embodied carbon over the span is at most
     * {@code carbonCap} kg CO2e per metre of span, with up to {@code alternatives} more; without a cap, {@link
     * #design(SpanProblem, int)}. The generator keeps every passing option (none is left out for another that
     * is cheaper but may weigh more in carbon), and the CP-SAT model holds the cap as a constraint, its carbon
     * priced part by part ({@link SpanPrices}): the proof covers the cap. When designs pass but none within the
     * cap, the diagnosis gives the least carbon of any.
     */
    public Outcome design(SpanProblem p, int alternatives, Double carbonCap) {
        return carbonCap == null
                ? design(p, alternatives)
                : new SpanUnderCarbonCap(this).design(p, alternatives, carbonCap);
    }

    /**
     * The span's optimum without a CP-SAT solve, where the options left hold one combination cheaper than every
     * other by more than {@link #DECIDED_MARGIN}: the model over them could choose nothing else. Null where
     * another comes close, a frame computes deflection, or the combination fails a check (the model decides).
     */
    private Outcome decided(SpanProblem p, SpanGenerator gen, SpanGenerator.Output out) {
        Combinations.Decided d = gen.combinations().decided(out.sets(), DECIDED_MARGIN);
        if (d == null) {
            return null;
        }
        SpanLayout layout = gen.layout(d.set().frame(), d.mid(), d.left(), d.right());
        SpanReport report = SpanVerifier.verify(p, layout, true);
        if (!report.ok()) {
            return null;
        }
        Design best = design(p, layout, report);
        var proof = Proof.solved(
                        Proof.Status.OPTIMAL,
                        d.units(),
                        d.units(),
                        CostModel.SPAN_UNITS,
                        Proof.SolverStats.NONE,
                        new Search(out.stats(), 0, 0, false, true),
                        options)
                .measuring(cost.objective());
        return new Outcome(p, "optimal", best, List.of(), proof, binding(p, best), null);
    }

    /** What the model chose: its first result (the proof), the best design, the next ones, solves and cuts. */
    record Selected(SpanSelection.Result first, Design best, List<Design> alternatives, int solves, int cuts) {}

    /**
     * The model's choices in turn, each re-verified with its trail: the best, then up to {@code alternatives}
     * next distinct ones. A choice too flexible is cut off with every one no stiffer and the model solved again;
     * one failing any other check is a bug in the search. {@code first} is the result of the solve that gave
     * the best, or of the last solve where none did.
     */
    Selected select(SpanProblem p, SpanGenerator gen, SpanSelection sel, int alternatives) {
        int solves = 0;
        int cuts = 0;
        SpanSelection.Result first = null;
        Design best = null;
        List<Design> alts = new ArrayList<>();
        while (best == null || alts.size() < alternatives) {
            solves++;
            SpanSelection.Result r = sel.solve(options);
            if (r.choice() == null) {
                if (best == null) {
                    first = r;
                }
                break;
            }
            SpanSelection.Choice c = r.choice();
            SpanLayout layout = gen.layout(c.set().frame(), c.mid(), c.left(), c.right());
            if (c.set().frame().deflection() && !SpanVerifier.deflectionOk(p, layout)) {
                sel.cutDeflection(c, gen.sections());
                cuts++;
                continue;
            }
            SpanReport report = SpanVerifier.verify(p, layout, true);
            if (!report.ok()) {
                if (report.okApartFromDeflection()) {
                    sel.cutDeflection(c, gen.sections());
                    cuts++;
                    continue;
                }
                StringBuilder sb = new StringBuilder();
                report.failures()
                        .forEach(f -> sb.append(sb.length() == 0 ? "" : ", ").append(f.id()));
                throw new IllegalStateException("re-verification failed for beam " + p.id() + " (" + sb
                        + " fail on the chosen layout); this is a bug in the search");
            }
            Design d = design(p, layout, report);
            if (best == null) {
                best = d;
                first = r;
            } else {
                alts.add(d);
            }
            sel.exclude(c);
        }
        return new Selected(first, best, alts, solves, cuts);
    }

    /**
     * The part of a span's cost that its section alone fixes (concrete, formwork, depth premium over the
     * span): a lower bound on any design of the span at that section.
     */
    public double frameCost(SpanProblem p, double b, double h) {
        return cost.frame(b, h, p.flange()).times(p.span() / 1000.0).total();
    }

    /** A lower bound on any design of the span: the span generator's, before anything is searched. */
    public double leastCost(SpanProblem p) {
        return new SpanGenerator(p, cost).leastCost();
    }

    /** The hint's cost, a hair above so that rounding never cuts the hint itself; infinite when unusable. */
    private double ceiling(SpanProblem p, SpanLayout hint) {
        if (hint == null
                || !p.widths().contains(hint.width())
                || !p.depths().contains(hint.height())
                || !SpanVerifier.verify(p, hint, false).ok()) {
            return Double.POSITIVE_INFINITY;
        }
        double c = hint.cost(p, cost).total();
        return c * (1 + 1e-9) + 1e-9;
    }

    /**
     * The span's optimum when it costs less than {@code ceiling}, else null (no diagnosis is made): for a
     * search over several spans that only needs this one when it can still win.
     */
    public Outcome designUnder(SpanProblem p, double ceiling) {
        return design(p, 0, 0, ceiling, false);
    }

    private Outcome design(SpanProblem p, int alternatives, double slack, double ceiling) {
        return design(p, alternatives, slack, ceiling, true);
    }

    private Outcome design(SpanProblem p, int alternatives, double slack, double ceiling, boolean diagnoseNone) {
        SpanGenerator gen = new SpanGenerator(p, cost);
        SpanGenerator.Output out = gen.generate(slack, ceiling);
        var stats = out.stats();
        if (out.incumbentLayout() == null && !diagnoseNone) {
            return null;
        }
        if (out.incumbentLayout() == null) {
            var proof = Proof.none(Proof.Status.INFEASIBLE, new Search(stats, 0, 0), options)
                    .measuring(cost.objective());
            return new Outcome(p, "infeasible", null, List.of(), proof, List.of(), new SpanDiagnoser(cost).diagnose(p));
        }
        if (alternatives == 0 && byEnumeration) {
            Outcome decided = decided(p, gen, out);
            if (decided != null) {
                return decided;
            }
        }
        SpanSelection sel = new SpanSelection(p, out.sets());
        Selected chosen = select(p, gen, sel, alternatives);
        int solves = chosen.solves();
        int cuts = chosen.cuts();
        SpanSelection.Result first = chosen.first();
        Design best = chosen.best();
        List<Design> alts = chosen.alternatives();
        if (best == null) {
            // the time limit ended the first solve before it had a solution: give the generator's incumbent
            // when it passes every check, as found but not proven (no bound)
            SpanReport report = SpanVerifier.verify(p, out.incumbentLayout(), true);
            Search search = new Search(stats, solves, cuts);
            if (!report.ok()) {
                var proof =
                        Proof.none(Proof.Status.OUT_OF_TIME, search, options).measuring(cost.objective());
                return new Outcome(
                        p,
                        "unknown",
                        null,
                        List.of(),
                        proof,
                        List.of(),
                        new Diagnosis("time limit", new Diagnosis.TimeLimit(options.timeLimitSeconds())));
            }
            Design d = design(p, out.incumbentLayout(), report);
            var proof = Proof.unproven(
                            CostModel.SPAN_UNITS.units(out.incumbent()), CostModel.SPAN_UNITS, search, options)
                    .measuring(cost.objective());
            return new Outcome(p, "feasible", d, List.of(), proof, binding(p, d), null);
        }
        var proof = Proof.solved(
                        first.status(),
                        first.objective(),
                        first.bound(),
                        CostModel.SPAN_UNITS,
                        first.stats(),
                        new Search(stats, solves, cuts),
                        options)
                .measuring(cost.objective());
        String status = first.status() == Proof.Status.OPTIMAL ? "optimal" : "feasible";
        return new Outcome(p, status, best, alts, proof, binding(p, best), null);
    }

    /**
     * A layout chosen for this span by a larger search (a line's, whose parts share their support bars),
     * verified here with its trail and given that search's proof. A layout that fails a check is a bug in
     * that search, never an answer.
     */
    public Outcome adopt(SpanProblem p, SpanLayout layout, Proof<Search> proof) {
        SpanReport report = SpanVerifier.verify(p, layout, true);
        if (!report.ok()) {
            StringBuilder sb = new StringBuilder();
            report.failures()
                    .forEach(f -> sb.append(sb.length() == 0 ? "" : ", ").append(f.id()));
            throw new IllegalStateException("re-verification failed for beam " + p.id() + " (" + sb
                    + " fail on the chosen layout); this is a bug in the search");
        }
        Design d = design(p, layout, report);
        String status = proof.status() == Proof.Status.OPTIMAL ? "optimal" : "feasible";
        return new Outcome(p, status, d, List.of(), proof, binding(p, d), null);
    }

    /**
     * A layout given for this span (a line's bars as built, for {@code check}), verified with its trail and
     * kept whether it passes or not: status "given", no search, no proof.
     */
    public static Outcome asGiven(SpanProblem p, SpanLayout layout, CostModel cost) {
        SpanReport report = SpanVerifier.verify(p, layout, true);
        Design d = new Design(layout, layout.cost(p, cost), report, layout.bars(p, cost));
        return new Outcome(p, "given", d, List.of(), null, List.of(), null);
    }

    /** A verified layout with its cost in currency and its carbon, whichever the search minimised. */
    Design design(SpanProblem p, SpanLayout layout, SpanReport report) {
        CostModel carbon = cost.carbon();
        return new Design(
                layout,
                layout.cost(p, cost.money()),
                report,
                layout.bars(p, cost),
                carbon == null ? null : layout.cost(p, carbon));
    }

    /** The span generator of a problem, with this designer's cost model. */
    public SpanGenerator generator(SpanProblem p) {
        return new SpanGenerator(p, cost);
    }

    public CostModel costModel() {
        return cost;
    }

    public SolverOptions options() {
        return options;
    }

    /** The checks working hardest in the chosen span, and the headroom cap when the height sits at it. */
    List<Binding> binding(SpanProblem p, Design d) {
        List<Binding> out = new ArrayList<>();
        for (var e : d.report().sections().entrySet()) {
            String where = switch (e.getKey()) {
                case LEFT -> "left support ";
                case MID -> "mid-span ";
                case RIGHT -> "right support ";
            };
            for (CheckResult c : e.getValue().checks()) {
                if (tight(c)) {
                    out.add(new Binding(where + c.id(), Binding.Leaner.NEAR_LIMIT, c.ratio()));
                }
            }
        }
        for (CheckResult c : d.report().zoneChecks()) {
            if (tight(c)) {
                out.add(new Binding(c.id(), Binding.Leaner.NEAR_LIMIT, c.ratio()));
            }
        }
        for (CheckResult c : d.report().span().checks()) {
            if (tight(c)) {
                out.add(new Binding(c.id(), Binding.Leaner.NEAR_LIMIT, c.ratio()));
            }
        }
        if (p.maxDepth() != null && d.layout().height() >= p.maxDepth() - 1e-9) {
            out.add(new Binding(
                    "headroom", Binding.Leaner.AT_MAX_DEPTH, d.layout().height()));
        }
        return out;
    }

    private static boolean tight(CheckResult c) {
        // a flange at its Table 6.3.2.1 width is not a limit the design works against
        return c.pass()
                && Double.isFinite(c.ratio())
                && c.ratio() >= 0.95
                && !c.id().startsWith("cover")
                && !c.id().startsWith("layer_gap")
                && !c.id().startsWith("stirrup_legs_bars")
                && !c.id().equals("flange_width");
    }
}
