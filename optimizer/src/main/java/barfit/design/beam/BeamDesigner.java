package barfit.design.beam;

import barfit.design.Binding;
import barfit.design.CostBreakdown;
import barfit.design.CostModel;
import barfit.design.SolverOptions;
import barfit.section.CheckResult;
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

    /** The proof of one beam's answer. */
    public record Proof(String status, long objective, long bound, int booleans, int frames, int framesEvaluated,
            int framesSkipped, int solves, int deflectionCuts, int workers, int seed) {
        public double gap() {
            return objective == 0 ? 0 : Math.max(0, (double) (objective - bound) / Math.abs(objective));
        }
    }

    public record Diagnosis(String limit, String summary, List<String> fixes) {
    }

    public record Outcome(BeamProblem problem, String status, Design best, List<Design> alternatives, Proof proof,
            List<Binding> binding, Diagnosis diagnosis) {
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
        Outcome o = design(p, alternatives, 0);
        double[] margins = {0.1, 0.3, 1.0, Double.POSITIVE_INFINITY};
        for (int i = 0; i < margins.length && o.feasible() && o.alternatives().size() < alternatives; i++) {
            o = design(p, alternatives, margins[i]);
        }
        return o;
    }

    private Outcome design(BeamProblem p, int alternatives, double slack) {
        BeamGenerator gen = new BeamGenerator(p, cost);
        BeamGenerator.Output out = gen.generate(slack);
        var stats = out.stats();
        if (out.incumbentLayout() == null) {
            Proof proof = new Proof("infeasible", 0, 0, 0, stats.frames(), stats.framesEvaluated(), stats.framesSkipped(),
                    0, 0, options.workers(), options.seed());
            return new Outcome(p, "infeasible", null, List.of(), proof, List.of(), diagnose(p));
        }
        BeamSelection sel = new BeamSelection(p, out.sets());
        int solves = 0;
        int cuts = 0;
        BeamSelection.Result first = null;
        Design best = null;
        List<Design> alts = new ArrayList<>();
        while (best == null || alts.size() < alternatives) {
            BeamSelection.Result r = sel.solve(options, ++solves, cuts);
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
            Proof proof = new Proof(report.ok() ? "feasible" : "unknown", report.ok()
                    ? Math.round(out.incumbent() * BeamGenerator.UNITS) : 0, 0, 0, stats.frames(),
                    stats.framesEvaluated(), stats.framesSkipped(), solves, cuts, options.workers(), options.seed());
            if (!report.ok()) {
                return new Outcome(p, "unknown", null, List.of(), proof, List.of(), new Diagnosis("time limit",
                        "the time limit (" + options.timeLimitSeconds() + " s) ended the search before a design"
                                + " passing every check was found", List.of("raise --time-limit")));
            }
            Design d = new Design(out.incumbentLayout(), out.incumbentLayout().cost(p, cost), report,
                    out.incumbentLayout().bars(p, cost));
            return new Outcome(p, "feasible", d, List.of(), proof, binding(p, d), null);
        }
        Proof proof = new Proof(first.status(), first.objective(), first.bound(), first.booleans(), stats.frames(),
                stats.framesEvaluated(), stats.framesSkipped(), solves, cuts, options.workers(), options.seed());
        return new Outcome(p, first.status(), best, alts, proof, binding(p, best), null);
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

    private boolean feasible(BeamProblem q) {
        if (q.depths().isEmpty() || q.widths().isEmpty()) {
            return false;
        }
        return new BeamGenerator(q, cost).generate().incumbentLayout() != null;
    }

    /** Which limit binds and the least single change that works. */
    private Diagnosis diagnose(BeamProblem p) {
        List<String> fixes = new ArrayList<>();
        List<Double> depths = p.space().depths();
        double step = depths.size() > 1 ? depths.get(1) - depths.get(0) : 25.0;
        double deepest = depths.get(depths.size() - 1);
        List<Double> widths = p.widths();
        double widest = widths.get(widths.size() - 1);
        String limit;
        String summary;
        double hMin = barfit.section.SpanChecks.minimumDepth(p.span(), p.ends(), p.materials(), p.code());
        double tallest = p.depths().isEmpty() ? 0 : p.depths().get(p.depths().size() - 1);
        if (p.depths().isEmpty()) {
            limit = "headroom";
            summary = "max_depth is below the shallowest depth searched";
        } else if (p.service() == null && tallest < hMin) {
            limit = "deflection";
            summary = "every allowed depth is below Table 9.3.1.1 (h,min = " + say(hMin) + ") and no service loads "
                    + "are given, so deflection cannot be checked: give service: {dead, live}";
        } else {
            limit = "strength";
            summary = "no combination of the searched sections, bars and stirrups passes every check of the span";
        }
        double start = p.depths().isEmpty() ? depths.get(0) : tallest + step;
        for (double h = start; h <= Math.max(2 * deepest, deepest + 1000) + 1e-9; h += step) {
            BeamProblem q = p.withMaxDepth(null).withSpace(p.space().withDepths(List.of(h))).withFixedWidth(widest);
            if (feasible(q)) {
                fixes.add("needs h ≥ " + say(h) + " at b = " + say(widest)
                        + (p.maxDepth() != null ? " (max_depth is " + say(p.maxDepth()) + ")" : ""));
                break;
            }
        }
        if (!p.depths().isEmpty()) {
            double wStep = widths.size() > 1 ? widths.get(1) - widths.get(0) : 50.0;
            for (double w = widest + wStep; w <= 2.5 * widest + 1e-9; w += wStep) {
                BeamProblem q = p.withSpace(p.space().withDepths(List.of(tallest))).withFixedWidth(w);
                if (feasible(q)) {
                    fixes.add("or b ≥ " + say(w) + " at h = " + say(tallest));
                    break;
                }
            }
        }
        return new Diagnosis(limit, summary, fixes);
    }

    private String say(double mm) {
        return units.compact(mm, Dim.LENGTH) + " " + units.unit(Dim.LENGTH);
    }
}
