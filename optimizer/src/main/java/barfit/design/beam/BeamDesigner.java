package barfit.design.beam;

import barfit.design.Binding;
import barfit.design.CostBreakdown;
import barfit.design.CostModel;
import barfit.design.Proof;
import barfit.design.SolverOptions;
import barfit.section.CheckResult;
import barfit.section.CodeEquations;
import barfit.section.SpanChecks;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.List;

/**
 * Designs a whole span: candidates from {@link BeamGenerator}, the choice and its proof from
 * {@link BeamSelection} (with deflection cuts as needed), every chosen span re-verified by
 * {@link BeamVerifier}, what binds, the next distinct alternatives, or a diagnosis.
 */
public final class BeamDesigner {
    /** A chosen span with its cost and full verification. */
    public record Design(BeamLayout layout, CostBreakdown cost, BeamReport report, List<BeamLayout.BarMark> bars) {
    }

    /**
     * A span's search, for its proof: the generator's counts, the CP-SAT solves and the deflection cuts
     * added between them.
     */
    public record Search(BeamGenerator.Stats generator, int solves, int deflectionCuts) {
    }

    /**
     * Why a span has no design, as data: {@code limit} names what fails at the cap (a check id such as
     * {@code deflection_total}, or {@code strength}, {@code shear}, {@code headroom}, {@code deflection} when
     * it cannot be computed, {@code group}, {@code time limit}) and {@code clause} its clause; {@code summary}
     * and {@code fixes} say it in words. {@code atCap} lists the failing checks of the cheapest layout that
     * passes everything else within the cap (when deflection alone fails), and {@code deeper} and {@code wider}
     * the changes that work, each found by designing the span and verified (null when none was found).
     */
    public record Diagnosis(String limit, String clause, String summary, List<String> fixes, List<CheckResult> atCap,
            Fix deeper, Fix wider) {
        public Diagnosis {
            fixes = List.copyOf(fixes);
            atCap = List.copyOf(atCap);
        }

        public Diagnosis(String limit, String summary, List<String> fixes) {
            this(limit, "", summary, fixes, List.of(), null, null);
        }
    }

    /** A size at which the span designs, with the cheapest layout found there (it passes BeamVerifier). */
    public record Fix(double width, double height, BeamLayout layout) {
    }

    public record Outcome(BeamProblem problem, String status, Design best, List<Design> alternatives,
            Proof<Search> proof, List<Binding> binding, Diagnosis diagnosis) {
        public boolean feasible() {
            return best != null;
        }
    }

    private final CostModel cost;
    private final SolverOptions options;
    private final UnitSystem units;

    public BeamDesigner(CostModel cost, SolverOptions options, UnitSystem units) {
        this.cost = cost;
        this.options = options;
        this.units = units;
    }

    /**
     * The span's proven cheapest design and up to {@code alternatives} next-cheapest ones. Alternatives need
     * the candidates the cost bound would discard: the generator keeps those within a margin of the
     * cheapest, widened (10 %, 30 %, 100 %, everything) until enough are found.
     */
    public Outcome design(BeamProblem p, int alternatives) {
        return design(p, alternatives, (BeamLayout) null);
    }

    /**
     * As {@link #design(BeamProblem, int)}, told of a layout that may pass ({@code hint}, e.g. the same span's
     * design for a slightly different demand): when it passes every check and its section is in the search
     * space, its cost bounds the search from the start. The optimum is the same; the search is shorter.
     */
    public Outcome design(BeamProblem p, int alternatives, BeamLayout hint) {
        double ceiling = ceiling(p, hint);
        Outcome o = design(p, alternatives, 0, ceiling);
        double[] margins = {0.1, 0.3, 1.0, Double.POSITIVE_INFINITY};
        for (int i = 0; i < margins.length && o.feasible() && o.alternatives().size() < alternatives; i++) {
            o = design(p, alternatives, margins[i], ceiling);
        }
        return o;
    }

    /**
     * The part of a span's cost that its section alone fixes (concrete, formwork, depth premium over the
     * span): a lower bound on any design of the span at that section.
     */
    public double frameCost(BeamProblem p, double b, double h) {
        return cost.frame(b, h, p.flange()).times(p.span() / 1000.0).total();
    }

    /** A lower bound on any design of the span: the span generator's, before anything is searched. */
    public double leastCost(BeamProblem p) {
        return new BeamGenerator(p, cost).leastCost();
    }

    /** The hint's cost, a hair above so that rounding never cuts the hint itself; infinite when unusable. */
    private double ceiling(BeamProblem p, BeamLayout hint) {
        if (hint == null || !p.widths().contains(hint.width()) || !p.depths().contains(hint.height())
                || !BeamVerifier.verify(p, hint, false).ok()) {
            return Double.POSITIVE_INFINITY;
        }
        double c = hint.cost(p, cost).total();
        return c * (1 + 1e-9) + 1e-9;
    }

    /**
     * The span's optimum when it costs less than {@code ceiling}, else null (no diagnosis is made): for a
     * search over several spans that only needs this one when it can still win.
     */
    public Outcome designUnder(BeamProblem p, double ceiling) {
        return design(p, 0, 0, ceiling, false);
    }

    private Outcome design(BeamProblem p, int alternatives, double slack, double ceiling) {
        return design(p, alternatives, slack, ceiling, true);
    }

    private Outcome design(BeamProblem p, int alternatives, double slack, double ceiling, boolean diagnoseNone) {
        BeamGenerator gen = new BeamGenerator(p, cost);
        BeamGenerator.Output out = gen.generate(slack, ceiling);
        var stats = out.stats();
        if (out.incumbentLayout() == null && !diagnoseNone) {
            return null;
        }
        if (out.incumbentLayout() == null) {
            var proof = Proof.none(Proof.Status.INFEASIBLE, new Search(stats, 0, 0), options);
            return new Outcome(p, "infeasible", null, List.of(), proof, List.of(), diagnose(p));
        }
        BeamSelection sel = new BeamSelection(p, out.sets());
        int solves = 0;
        int cuts = 0;
        BeamSelection.Result first = null;
        Design best = null;
        List<Design> alts = new ArrayList<>();
        while (best == null || alts.size() < alternatives) {
            solves++;
            BeamSelection.Result r = sel.solve(options);
            if (r.choice() == null) {
                break;
            }
            BeamSelection.Choice c = r.choice();
            BeamLayout layout = gen.layout(c.set().frame(), c.mid(), c.left(), c.right());
            if (c.set().frame().deflection() && !BeamVerifier.deflectionOk(p, layout)) {
                sel.cutDeflection(c, gen);
                cuts++;
                continue;
            }
            BeamReport report = BeamVerifier.verify(p, layout, true);
            if (!report.ok()) {
                if (report.okApartFromDeflection()) {
                    sel.cutDeflection(c, gen);
                    cuts++;
                    continue;
                }
                StringBuilder sb = new StringBuilder();
                report.failures().forEach(f -> sb.append(sb.length() == 0 ? "" : ", ").append(f.id()));
                throw new IllegalStateException("re-verification failed for beam " + p.id() + " (" + sb
                        + " fail on the chosen layout); this is a bug in the search");
            }
            Design d = new Design(layout, layout.cost(p, cost), report, layout.bars(p, cost));
            if (best == null) {
                best = d;
                first = r;
            } else {
                alts.add(d);
            }
            sel.exclude(c);
        }
        if (best == null) {
            // the time limit ended the first solve before it had a solution: give the generator's incumbent
            // when it passes every check, as found but not proven (no bound)
            BeamReport report = BeamVerifier.verify(p, out.incumbentLayout(), true);
            Search search = new Search(stats, solves, cuts);
            if (!report.ok()) {
                var proof = Proof.none(Proof.Status.OUT_OF_TIME, search, options);
                return new Outcome(p, "unknown", null, List.of(), proof, List.of(), new Diagnosis("time limit",
                        "the time limit (" + options.timeLimitSeconds() + " s) ended the search before a design"
                                + " passing every check was found", List.of("raise --time-limit")));
            }
            Design d = new Design(out.incumbentLayout(), out.incumbentLayout().cost(p, cost), report,
                    out.incumbentLayout().bars(p, cost));
            var proof = Proof.unproven(CostModel.SPAN_UNITS.units(out.incumbent()), CostModel.SPAN_UNITS, search,
                    options);
            return new Outcome(p, "feasible", d, List.of(), proof, binding(p, d), null);
        }
        var proof = Proof.solved(first.status(), first.objective(), first.bound(), CostModel.SPAN_UNITS, first.stats(),
                new Search(stats, solves, cuts), options);
        String status = first.status() == Proof.Status.OPTIMAL ? "optimal" : "feasible";
        return new Outcome(p, status, best, alts, proof, binding(p, best), null);
    }

    /** The checks working hardest in the chosen span, and the headroom cap when the height sits at it. */
    private List<Binding> binding(BeamProblem p, Design d) {
        List<Binding> out = new ArrayList<>();
        for (var e : d.report().sections().entrySet()) {
            String where = switch (e.getKey()) {
                case LEFT -> "left support ";
                case MID -> "mid-span ";
                case RIGHT -> "right support ";
            };
            for (CheckResult c : e.getValue().checks()) {
                if (tight(c)) {
                    out.add(new Binding(where + c.id(), ratio(c)));
                }
            }
        }
        for (CheckResult c : d.report().zoneChecks()) {
            if (tight(c)) {
                out.add(new Binding(c.id(), ratio(c)));
            }
        }
        for (CheckResult c : d.report().span().checks()) {
            if (tight(c)) {
                out.add(new Binding(c.id(), ratio(c)));
            }
        }
        if (p.maxDepth() != null && d.layout().height() >= p.maxDepth() - 1e-9) {
            out.add(new Binding("headroom", "h = max_depth"));
        }
        return out;
    }

    private static boolean tight(CheckResult c) {
        // a flange at its Table 6.3.2.1 width is not a limit the design works against
        return c.pass() && Double.isFinite(c.ratio()) && c.ratio() >= 0.95 && !c.id().startsWith("cover")
                && !c.id().startsWith("layer_gap") && !c.id().startsWith("stirrup_legs_bars")
                && !c.id().equals("flange_width");
    }

    private static String ratio(CheckResult c) {
        return String.format(java.util.Locale.ROOT, "%.2f", c.ratio());
    }

    /** Steps of a search with a single depth or width (in inch-pound input, 1 in and 2 in): a grid, no clause. */
    private static final double SI_DEPTH_STEP = 25.0;
    private static final double SI_WIDTH_STEP = 50.0;

    /** Deflection limits that allow any deflection (a span divisor of 0: the limit ℓ/0 is infinite). */
    private static final double NO_LIMIT = 0;

    /** The generator's cheapest layout passing every check of {@code q}, verified; null when there is none. */
    private BeamLayout cheapest(BeamProblem q) {
        if (q.depths().isEmpty() || q.widths().isEmpty()) {
            return null;
        }
        BeamLayout l = new BeamGenerator(q, cost).generate().incumbentLayout();
        if (l != null && !BeamVerifier.verify(q, l, false).ok()) {
            throw new IllegalStateException("the layout found for beam " + q.id() + " at " + l.width() + " x " + l.height()
                    + " fails re-verification; this is a bug in the search");
        }
        return l;
    }

    private boolean feasible(BeamProblem q) {
        return cheapest(q) != null;
    }

    /**
     * What fails at the cap and the least single change that works. What fails is found by designing with
     * one requirement set aside at a time (deflection, then the shears); each change that works is found
     * by designing the span at each depth of the search's grid above the cap in turn (then on beyond it by
     * the same step), and at each wider web at the deepest allowed depth.
     */
    private Diagnosis diagnose(BeamProblem p) {
        List<String> fixes = new ArrayList<>();
        List<CheckResult> atCap = List.of();
        double hMin = barfit.section.SpanChecks.minimumDepth(p.span(), p.ends(), p.materials(), p.code());
        List<Double> allowed = p.depths();
        double tallest = allowed.isEmpty() ? 0 : allowed.get(allowed.size() - 1);
        String limit;
        String clause;
        String summary;
        if (allowed.isEmpty()) {
            limit = "headroom";
            clause = "";
            summary = "max_depth is below the shallowest depth searched";
        } else if (p.service() == null && tallest < hMin) {
            limit = "deflection";
            clause = "Table 9.3.1.1, 9.3.2";
            summary = "every allowed depth is below Table 9.3.1.1 (h,min = " + say(hMin) + ") and no service loads "
                    + "are given, so deflection cannot be checked: give service: {dead, live}";
        } else {
            boolean shears = p.vLeft() != null || p.vRight() != null;
            BeamProblem noDeflection = p.service() == null ? p : p.withLimits(new SpanChecks.Limits(NO_LIMIT, NO_LIMIT));
            BeamLayout free = p.service() == null ? null : cheapest(noDeflection);
            if (free != null) {
                // every other check can be met within the cap: deflection fails at every allowed depth
                SpanChecks.Limits l = p.limits();
                boolean liveAlone = feasible(p.withLimits(new SpanChecks.Limits(l.live(), NO_LIMIT)));
                boolean totalAlone = feasible(p.withLimits(new SpanChecks.Limits(NO_LIMIT, l.total())));
                boolean together = liveAlone && totalAlone; // each can be met, not both at once
                String live = "the immediate live-load deflection within ℓ/" + divisor(l.live());
                String total = "the long-term plus live deflection within ℓ/" + divisor(l.total());
                String what;
                if (together) {
                    limit = "deflection_live, deflection_total";
                    what = "both " + live + " and " + total + " at once";
                } else if (!liveAlone && !totalAlone) {
                    limit = "deflection_live, deflection_total";
                    what = "either " + live + " or " + total;
                } else if (!liveAlone) {
                    limit = "deflection_live";
                    what = live;
                } else {
                    limit = "deflection_total";
                    what = total;
                }
                clause = "9.3.2, 24.2, Table 24.2.2";
                atCap = BeamVerifier.verify(p, free, false).span().checks().stream().filter(c -> !c.pass()).toList();
                StringBuilder sb = new StringBuilder("deflection is computed below Table 9.3.1.1's h,min = " + say(hMin)
                        + ", and within the depths allowed (h ≤ " + say(tallest) + ") no layout keeps " + what
                        + " (9.3.2, 24.2, Table 24.2.2), though every other check can be met: the cheapest layout that "
                        + "meets them, " + say(free.width()) + " × " + say(free.height()) + ", deflects");
                String sep = " ";
                for (CheckResult c : atCap) {
                    sb.append(sep).append(say(c.demand().value())).append(c.id().equals("deflection_live")
                            ? " under live load" : " long-term plus live").append(" against ").append(say(c.limit().value()));
                    sep = " and ";
                }
                summary = sb.toString();
            } else if (shears && feasible(noDeflection.scaled(1.0, 0.0))) {
                limit = "shear";
                clause = "22.5, 9.6.3, 9.7.6.2.2";
                summary = "the moments can be carried within the cap" + (p.service() == null ? "" : " (deflection set aside)")
                        + ", but no stirrups in the search carry the factored shears (or the web is too small for them, "
                        + "22.5.1.2)";
            } else {
                limit = "strength";
                clause = "9.5.1.1, 22.2, 9.3.3.1, 9.6.1, 25.2";
                List<String> aside = new ArrayList<>();
                if (p.service() != null) {
                    aside.add("deflection set aside");
                }
                if (shears) {
                    aside.add("the shears taken as zero");
                }
                summary = (aside.isEmpty() ? "" : "even with " + String.join(" and ", aside) + ", ")
                        + "no layout within the limits carries "
                        + "the factored moments with every flexure, ductility, minimum steel, spacing and detailing check met";
            }
        }
        Fix deeper = deeper(p, tallest);
        if (deeper != null) {
            fixes.add("needs h ≥ " + say(deeper.height()) + ": the span designs at " + say(deeper.width()) + " × "
                    + say(deeper.height()) + (p.maxDepth() != null ? " (max_depth is " + say(p.maxDepth()) + ")" : ""));
        }
        Fix wider = allowed.isEmpty() ? null : wider(p, tallest);
        if (wider != null) {
            fixes.add("b ≥ " + say(wider.width()) + " at h = " + say(wider.height())
                    + (p.fixedWidth() != null ? " (the beam fixes b)" : ""));
        }
        return new Diagnosis(limit, clause, summary, fixes, atCap, deeper, wider);
    }

    /**
     * The shallowest depth above the allowed ones at which the span designs (any width it may have): the
     * search's depths above the cap in turn, then on by the search's step (25 mm, or 1 in in inch-pound
     * input, when it has one depth) up to twice its deepest or 1000 mm beyond. Every depth below the one
     * found has been designed and failed, so lifting the cap one step less gives no design.
     */
    private Fix deeper(BeamProblem p, double tallest) {
        List<Double> grid = p.space().depths();
        double deepest = grid.get(grid.size() - 1);
        double step = grid.size() > 1 ? grid.get(grid.size() - 1) - grid.get(grid.size() - 2)
                : p.code().inchPound() ? CodeEquations.MM_PER_IN : SI_DEPTH_STEP;
        List<Double> tries = new ArrayList<>();
        for (double h : grid) {
            if (p.depths().isEmpty() || h > tallest + 1e-9) {
                tries.add(h);
            }
        }
        double end = Math.max(2 * deepest, deepest + 1000);
        for (int k = 1; deepest + k * step <= end + 1e-9; k++) {
            tries.add(Math.round((deepest + k * step) * 1e6) / 1e6);
        }
        for (double h : tries) {
            BeamLayout l = cheapest(p.withMaxDepth(null).withSpace(p.space().withDepths(List.of(h))));
            if (l != null) {
                return new Fix(l.width(), h, l);
            }
        }
        return null;
    }

    /** The narrowest web beyond the widths allowed at which the span designs at the deepest allowed depth. */
    private Fix wider(BeamProblem p, double h) {
        List<Double> widths = p.widths();
        double widest = widths.get(widths.size() - 1);
        List<Double> grid = p.space().widths();
        double step = widths.size() > 1 ? widths.get(widths.size() - 1) - widths.get(widths.size() - 2)
                : grid.size() > 1 ? grid.get(grid.size() - 1) - grid.get(grid.size() - 2)
                : p.code().inchPound() ? 2 * CodeEquations.MM_PER_IN : SI_WIDTH_STEP;
        for (int k = 1; widest + k * step <= 2.5 * widest + 1e-9; k++) {
            double w = Math.round((widest + k * step) * 1e6) / 1e6;
            BeamLayout l = cheapest(p.withSpace(p.space().withDepths(List.of(h))).withFixedWidth(w));
            if (l != null) {
                return new Fix(w, h, l);
            }
        }
        return null;
    }

    private static String divisor(double d) {
        return d == Math.rint(d) ? String.valueOf((long) d) : String.valueOf(d);
    }

    private String say(double mm) {
        return units.compact(mm, Dim.LENGTH) + " " + units.unit(Dim.LENGTH);
    }
}
