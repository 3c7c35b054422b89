package barfit.design.line;

import barfit.analysis.Coefficients;
import barfit.analysis.LineResult;
import barfit.design.CostModel;
import barfit.design.Proof;
import barfit.design.SearchSpace;
import barfit.design.line.LineSpans.OneSection;
import barfit.design.line.LineSpans.Part;
import barfit.design.line.LineSpans.Result;
import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanGenerator;
import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.input.LineInput;
import barfit.input.Settings;
import barfit.section.Deflection;
import barfit.section.SectionShape;
import java.util.ArrayList;
import java.util.List;

/**
 * A line of one set of forms (forms: line), one b x h for every part: the sections tried in order of a
 * bound on the line's cost, each analysed with its own weight and stiffness; at each, the parts' options
 * under their share of the best line go to {@link SharedSupports}, which chooses one arrangement of top
 * bars over each support for both sides and, where the line asks for it, the redistribution per support.
 * Apart from span-by-span design because it is a bounded search over sections, exact for its model.
 */
final class OneSectionSearch {
    private final Settings settings;
    private final SearchSpace space;
    private final SpanDesigner designer;
    private final int maxBarSizes;
    private final LineProblems lineProblems;

    OneSectionSearch(
            Settings settings, SearchSpace space, SpanDesigner designer, int maxBarSizes, LineProblems lineProblems) {
        this.settings = settings;
        this.space = space;
        this.designer = designer;
        this.maxBarSizes = maxBarSizes;
        this.lineProblems = lineProblems;
    }

    /**
     * One b x h for the whole line: for each section of the search space (under the line's cap), the line
     * analysed with that section's own weight and stiffness and every part designed at that section; the
     * cheapest total wins. Sections are taken in order of the sum of the span generator's lower bounds of
     * the parts (concrete, formwork and the section model's strength bound on the steel, for that
     * section's own envelope), so the search stops at the first section whose bound reaches the cheapest
     * total found. Exact for its model: every section is analysed as it is built.
     * Null when no single section carries every part.
     */
    Result design(LineInput in, int alternatives) {
        double ec = Deflection.ec(settings.materials(), settings.code());
        List<SectionShape> frames = new ArrayList<>();
        for (double b : space.widths()) {
            for (double h : space.depths()) {
                if (in.maxDepth() == null || h <= in.maxDepth() + 1e-9) {
                    frames.add(new SectionShape(b, h, in.section().flange()));
                }
            }
        }
        // the bound of each frame from the parts of its own analysis (their lengths and flanges)
        // each frame analysed on its own: both cores, the list in the frames' order whatever the threads
        List<Trial> trials = new ArrayList<>(java.util.stream.IntStream.range(0, frames.size())
                .parallel()
                .mapToObj(i -> trial(in, frames.get(i), ec, new ArrayList<>(in.redistribution())))
                .toList());
        trials.sort(java.util.Comparator.comparingDouble(Trial::bound));
        // the cheapest line and, when asked, the next cheapest sections: a frame is searched while it could
        // enter that list, so each kept line is the cheapest of its section and the list is exact
        int keep = 1 + Math.max(0, alternatives);
        List<Evaluated> kept = new ArrayList<>();
        java.util.Set<SectionShape> designedShapes = new java.util.HashSet<>();
        double without = Double.NaN;
        // choosing the redistribution: the line with none first, whose best bounds every section after
        for (boolean choose : Redistribution.choosing(in) ? new boolean[] {false, true} : new boolean[] {false}) {
            if (choose) {
                without =
                        kept.isEmpty() ? Double.POSITIVE_INFINITY : kept.get(0).total();
            }
            for (Trial t : trials) {
                double beat = kept.size() < keep
                        ? Double.POSITIVE_INFINITY
                        : kept.get(keep - 1).total();
                if (t.bound() >= beat - 1e-9) {
                    break;
                }
                // the generators' sharper bound (bars searched per size pair, none placed) skips a frame
                // before its parts are designed; for the choice, with the support moments least
                if (Double.isFinite(beat) && sharpBound(choose ? t.leastDemand() : t.problems()) >= beat - 1e-9) {
                    continue;
                }
                // a section already kept is searched again only to beat itself
                Evaluated same = kept.stream()
                        .filter(k -> k.trial().shape().equals(t.shape()))
                        .findFirst()
                        .orElse(null);
                double toBeat = same == null ? beat : Math.min(beat, same.total());
                designedShapes.add(t.shape());
                Evaluated e = choose ? evaluateChoosing(in, t, ec, toBeat) : evaluate(in, t, ec, toBeat, 0);
                if (e != null && e.total() < toBeat - 1e-9) {
                    kept.remove(same);
                    int at = 0;
                    while (at < kept.size() && kept.get(at).total() <= e.total() + 1e-9) {
                        at++;
                    }
                    kept.add(at, e);
                    while (kept.size() > keep) {
                        kept.remove(kept.size() - 1);
                    }
                }
            }
        }
        if (kept.isEmpty()) {
            return null;
        }
        Evaluated best = kept.get(0);
        List<LineSpans.Alternative> others = new ArrayList<>();
        for (Evaluated e : kept.subList(1, kept.size())) {
            others.add(new LineSpans.Alternative(
                    e.trial().shape().width(),
                    e.trial().shape().height(),
                    e.total(),
                    e.trial().redistribution()));
        }
        // the parts share their support bars: no part has alternatives of its own
        LineResult analysis = best.trial().analysis();
        if (Redistribution.choosing(in)) {
            // the envelope of the redistribution chosen, for the report
            List<SectionShape> shapes =
                    LineProblems.throughout(best.trial().shape(), in.spans().size());
            analysis = lineProblems
                    .analyse(in, shapes, ec, best.trial().redistribution())
                    .analysis();
        }
        return new Result(
                in,
                best.parts(),
                best.rounds(),
                true,
                analysis,
                best.trial().coefficients(),
                best.trial().redistribution(),
                best.epsT(),
                List.of(),
                new OneSection(trials.size(), designedShapes.size(), false, List.copyOf(others)),
                without);
    }

    /**
     * The parts' problems with the whole line at one section, analysed with that section's own weight and
     * stiffness and the redistribution asked: what a line of one section designs against (for its oracle).
     */
    List<SpanProblem> problemsAt(LineInput in, SectionShape shape) {
        double ec = Deflection.ec(settings.materials(), settings.code());
        return trial(in, shape, ec, new ArrayList<>(in.redistribution())).problems();
    }

    /**
     * A section tried for the whole line: its analysis, the parts' problems held at it, and its bound.
     * {@code lowerBounds}: per part (in the order of {@code problems}), a lower bound on its cost whatever
     * the redistribution chosen; {@code bound} their sum.
     */
    private record Trial(
            SectionShape shape,
            List<SpanProblem> problems,
            LineResult analysis,
            List<Coefficients.SpanValues> coefficients,
            List<Double> redistribution,
            double bound,
            List<Double> lowerBounds,
            List<SpanProblem> leastDemand) {}

    /** The parts designed at a trial's section, their total cost, the rounds redistribution took. */
    private record Evaluated(Trial trial, List<Part> parts, double total, int rounds, List<Double> epsT) {}

    private Trial trial(LineInput in, SectionShape shape, double ec, List<Double> red) {
        int n = in.spans().size();
        List<SectionShape> shapes = LineProblems.throughout(shape, n);
        boolean choosing = Redistribution.choosing(in);
        // choosing: the line with none, and a bound that holds whatever is chosen (a support's moment
        // falls and the span's rises with the percentage, and the bound rises with each)
        LineProblems.Analysed a;
        LineProblems.Analysed most = null;
        if (choosing) {
            var both =
                    lineProblems.analyseEach(in, shapes, ec, List.of(Redistribution.none(in), Redistribution.most(in)));
            a = both.get(0);
            most = both.get(1);
        } else {
            a = lineProblems.analyse(in, shapes, ec, red);
        }
        List<SpanProblem> problems = a.problems();
        LineResult analysis = a.analysis();
        List<Coefficients.SpanValues> coefficients = a.coefficients();
        List<SpanProblem> held = new ArrayList<>();
        List<SpanProblem> leastDemand = new ArrayList<>();
        List<Double> lower = new ArrayList<>();
        double bound = 0;
        for (int k = 0; k < problems.size(); k++) {
            SpanProblem q = LineProblems.heldAt(problems.get(k), shape);
            held.add(q);
            SpanProblem least = q;
            if (most != null) {
                SpanProblem m = most.problems().get(k);
                least = q.withSupportMoments(m.mLeft(), m.mRight());
            }
            leastDemand.add(least);
            double lb = designer.leastCost(least);
            lower.add(lb);
            bound += lb;
        }
        return new Trial(
                shape,
                held,
                analysis,
                coefficients,
                List.copyOf(choosing ? Redistribution.none(in) : red),
                bound,
                List.copyOf(lower),
                List.copyOf(leastDemand));
    }

    /**
     * Every part designed at the trial's section, stopping as soon as the parts so far and the bounds of
     * the rest reach {@code beat}; where the support sections do not allow the redistribution asked
     * (6.6.5), the line is analysed again at the same section with what they allow. Null when a part has
     * no design at this section or the total cannot beat {@code beat}.
     */
    private Evaluated evaluate(LineInput in, Trial t, double ec, double beat, int alternatives) {
        int n = in.spans().size();
        int rounds = 0;
        Trial current = t;
        while (true) {
            rounds++;
            List<Part> parts = new ArrayList<>();
            double total = 0;
            double rest = current.bound();
            for (SpanProblem p : current.problems()) {
                rest -= designer.leastCost(p);
                // only a design that leaves room for the rest's bounds under the total to beat can matter
                SpanDesigner.Outcome o = Double.isInfinite(beat)
                        ? designer.design(p, alternatives)
                        : designer.designUnder(p, beat - total - rest);
                if (o == null || !o.feasible()) {
                    return null;
                }
                total += o.best().searched(designer.costModel()).total();
                if (total + rest >= beat - 1e-9) {
                    return null;
                }
                int seg = LineProblems.segmentOf(p, n);
                parts.add(new Part(seg, LineProblems.partName(seg, n), p, o));
            }
            if (alternatives == 0) {
                // the parts' own optima bound the line from below; now the support bars they share
                parts = share(n, parts, total, beat);
                if (parts == null) {
                    return null;
                }
                total = 0;
                for (Part pt : parts) {
                    total += pt.outcome().best().searched(designer.costModel()).total();
                }
            }
            List<Double> epsT = Redistribution.supportStrains(in, parts);
            List<Double> red = new ArrayList<>(current.redistribution());
            boolean lowered = Redistribution.lowerToAllowed(red, epsT);
            if (!lowered || rounds >= LineSpans.MAX_ROUNDS) {
                return new Evaluated(current, parts, total, rounds, epsT);
            }
            current = trial(in, current.shape(), ec, red);
        }
    }

    /** How far above the parts' own optima the shared search first looks, then wider, then everywhere. */
    private static final double[] SHARE_MARGINS = {0.05, 0.2, 0.8, 3.2, Double.POSITIVE_INFINITY};

    /**
     * The parts designed together at their one section, each support's top bars one arrangement for the
     * parts on both sides ({@link SharedSupports}); null when no such line costs less than {@code beat}.
     * {@code own}: each part's own optimum, whose sum bounds the line from below. Exact: a line costing T
     * has no part dearer than T less the other parts' own optima, so the options under that limit hold
     * every line cheaper than the one found once it lies within the margin searched.
     */
    private List<Part> share(int n, List<Part> own, double ownTotal, double beat) {
        List<Part> ordered = new ArrayList<>(own);
        ordered.sort(java.util.Comparator.comparingInt(Part::segment));
        for (double margin : SHARE_MARGINS) {
            double ceiling = Math.min(beat, ownTotal * (1 + margin));
            List<SharedSupports.PartOptions> options = new ArrayList<>();
            List<SpanGenerator.Stats> stats = new ArrayList<>();
            for (Part pt : ordered) {
                SpanProblem p = pt.problem();
                double limit = ceiling
                        - (ownTotal
                                - pt.outcome()
                                        .best()
                                        .searched(designer.costModel())
                                        .total());
                SpanGenerator g = designer.generator(p);
                SpanGenerator.Output out = g.optionsUnder(limit * (1 + 1e-9) + 1e-9);
                stats.add(out.stats());
                int seg = pt.segment();
                options.add(new SharedSupports.PartOptions(
                        seg,
                        LineProblems.leftSupportOf(seg, n),
                        LineProblems.rightSupportOf(seg, n),
                        List.of(new SharedSupports.Variant(0, 0, p, g, out.sets(), out.stats()))));
            }
            SharedSupports.Solution s = SharedSupports.solve(options, n + 1, maxBarSizes);
            if (s != null && s.total() <= ceiling * (1 + 1e-9)) {
                List<Part> out = new ArrayList<>();
                for (int i = 0; i < ordered.size(); i++) {
                    Part pt = ordered.get(i);
                    out.add(new Part(
                            pt.segment(),
                            pt.name(),
                            pt.problem(),
                            adopted(pt.problem(), s.picks().get(i).layout(), stats.get(i))));
                }
                return out;
            }
            if (ceiling >= beat) {
                return null;
            }
        }
        return null;
    }

    /**
     * The line at a trial's section with the redistribution at each support chosen with the bars (6.6.5):
     * first the line with none (each part's own optimum, then the support bars shared), which bounds the
     * rest; then every part analysed for every pair of percentages at its two supports, its options under
     * its share of that bound, and the line chosen by {@link SharedSupports} with a percentage per support
     * that the support sections as built allow. Null when no line beats {@code beat}.
     */
    private Evaluated evaluateChoosing(LineInput in, Trial t, double ec, double beat) {
        int n = in.spans().size();
        // every part for every pair of percentages at its supports: alternating percentages along the line
        // give every span each pair at its two supports
        // a support where a section beside it cannot reach εt >= 0.0075 even with the least steel carrying
        // its most redistributed moment takes none (6.6.5); with none anywhere, the first pass has the answer
        List<List<Double>> steps = new ArrayList<>(Redistribution.steps(in));
        for (int j = 0; j <= n; j++) {
            if (steps.get(j).size() > 1 && !mayRedistribute(t, j, n)) {
                steps.set(j, List.of(0.0));
            }
        }
        if (steps.stream().allMatch(sj -> sj.size() == 1)) {
            return null;
        }
        int len = steps.stream().mapToInt(List::size).max().orElse(1);
        List<SectionShape> shapes = LineProblems.throughout(t.shape(), n);
        java.util.Map<Integer, java.util.Map<List<Double>, SpanProblem>> variants = new java.util.TreeMap<>();
        List<List<Double>> patterns = new ArrayList<>();
        for (int a = 0; a < len; a++) {
            for (int b = 0; b < len; b++) {
                List<Double> v = new ArrayList<>();
                for (int j = 0; j <= n; j++) {
                    List<Double> sj = steps.get(j);
                    v.add(sj.get(Math.min(j % 2 != 0 ? a : b, sj.size() - 1)));
                }
                patterns.add(v);
            }
        }
        List<LineProblems.Analysed> analysed = lineProblems.analyseEach(in, shapes, ec, patterns);
        for (int i = 0; i < patterns.size(); i++) {
            List<Double> v = patterns.get(i);
            for (SpanProblem p : analysed.get(i).problems()) {
                int seg = LineProblems.segmentOf(p, n);
                int right = LineProblems.rightSupportOf(seg, n);
                double rRight = right < 0 ? 0.0 : v.get(right);
                List<Double> key = List.of(v.get(LineProblems.leftSupportOf(seg, n)), rRight);
                variants.computeIfAbsent(seg, k -> new java.util.LinkedHashMap<>())
                        .putIfAbsent(key, LineProblems.heldAt(p, t.shape()));
            }
        }
        // per variant the generator's sharper bound; per part the least over its variants holds whatever
        // is chosen, and the frame is searched only where their sum could beat what is known
        java.util.Map<Integer, java.util.Map<List<Double>, SpanGenerator>> generators = new java.util.TreeMap<>();
        java.util.Map<Integer, java.util.Map<List<Double>, Double>> bounds = new java.util.TreeMap<>();
        java.util.Map<Integer, Double> least = new java.util.TreeMap<>();
        double boundSum = 0;
        // the variants' generators and sharp bounds on both cores, then read in order
        java.util.Map<SpanProblem, SpanGenerator> made = parallelMap(
                variants.values().stream().flatMap(m -> m.values().stream()).toList(), p -> {
                    SpanGenerator g = designer.generator(p);
                    g.sharpLeastCost();
                    return g;
                });
        for (var e : variants.entrySet()) {
            double lb = Double.POSITIVE_INFINITY;
            for (var v : e.getValue().entrySet()) {
                SpanGenerator g = made.get(v.getValue());
                double b = g.sharpLeastCost();
                generators
                        .computeIfAbsent(e.getKey(), k -> new java.util.LinkedHashMap<>())
                        .put(v.getKey(), g);
                bounds.computeIfAbsent(e.getKey(), k -> new java.util.LinkedHashMap<>())
                        .put(v.getKey(), b);
                lb = Math.min(lb, b);
            }
            least.put(e.getKey(), lb);
            boundSum += lb;
        }
        if (boundSum >= beat - 1e-9) {
            return null;
        }
        // beat: the cheapest line found, at least the cheapest with no redistribution (searched first); a
        // line under it leaves every part under its share, so the options under those shares hold it
        List<SpanProblem> wanted = new ArrayList<>();
        java.util.Map<SpanProblem, Double> limits = new java.util.IdentityHashMap<>();
        for (var e : variants.entrySet()) {
            int seg = e.getKey();
            double limit = beat - (boundSum - least.get(seg));
            for (var v : e.getValue().entrySet()) {
                if (!(Double.isFinite(limit) && bounds.get(seg).get(v.getKey()) >= limit)) {
                    wanted.add(v.getValue());
                    limits.put(v.getValue(), limit);
                }
            }
        }
        java.util.Map<SpanProblem, SpanGenerator.Output> outputs =
                parallelMap(wanted, p -> made.get(p).optionsUnder(limits.get(p) * (1 + 1e-9) + 1e-9));
        List<SharedSupports.PartOptions> options = new ArrayList<>();
        for (var e : variants.entrySet()) {
            int seg = e.getKey();
            List<SharedSupports.Variant> vs = new ArrayList<>();
            for (var v : e.getValue().entrySet()) {
                if (!limits.containsKey(v.getValue())) {
                    continue;
                }
                SpanGenerator g = generators.get(seg).get(v.getKey());
                SpanGenerator.Output out = outputs.get(v.getValue());
                vs.add(new SharedSupports.Variant(
                        v.getKey().get(0), v.getKey().get(1), v.getValue(), g, out.sets(), out.stats()));
            }
            options.add(new SharedSupports.PartOptions(
                    seg, LineProblems.leftSupportOf(seg, n), LineProblems.rightSupportOf(seg, n), vs));
        }
        SharedSupports.Solution s = SharedSupports.solve(options, n + 1, maxBarSizes);
        List<Part> parts;
        List<Double> chosen = Redistribution.none(in);
        if (s != null && s.total() < beat - 1e-6) {
            parts = new ArrayList<>();
            for (int k = 0; k < options.size(); k++) {
                var pick = s.picks().get(k);
                SpanProblem p = pick.variant().problem();
                int seg = options.get(k).segment();
                parts.add(new Part(
                        seg,
                        LineProblems.partName(seg, n),
                        p,
                        adopted(p, pick.layout(), pick.variant().stats())));
                chosen.set(
                        LineProblems.leftSupportOf(seg, n),
                        Math.max(
                                chosen.get(LineProblems.leftSupportOf(seg, n)),
                                pick.variant().rLeft()));
                if (LineProblems.rightSupportOf(seg, n) >= 0) {
                    chosen.set(
                            LineProblems.rightSupportOf(seg, n),
                            Math.max(
                                    chosen.get(LineProblems.rightSupportOf(seg, n)),
                                    pick.variant().rRight()));
                }
            }
        } else {
            return null;
        }
        double total = total(parts);
        if (total >= beat - 1e-9) {
            return null;
        }
        Trial used = new Trial(
                t.shape(),
                t.problems(),
                t.analysis(),
                t.coefficients(),
                chosen,
                t.bound(),
                t.lowerBounds(),
                t.leastDemand());
        return new Evaluated(used, parts, total, 1, Redistribution.supportStrains(in, parts));
    }

    /** The sum of the parts' sharp lower bounds ({@link SpanGenerator#sharpLeastCost}), on both cores. */
    private double sharpBound(List<SpanProblem> parts) {
        return parallelMap(parts, p -> designer.generator(p).sharpLeastCost()).values().stream()
                .mapToDouble(Double::doubleValue)
                .sum();
    }

    /** {@code f} of each item on both cores, keyed by the item itself (identity), the same whatever the threads. */
    private static <K, V> java.util.Map<K, V> parallelMap(List<K> items, java.util.function.Function<K, V> f) {
        List<V> values = java.util.stream.IntStream.range(0, items.size())
                .parallel()
                .mapToObj(i -> f.apply(items.get(i)))
                .toList();
        java.util.Map<K, V> out = new java.util.IdentityHashMap<>();
        for (int i = 0; i < items.size(); i++) {
            out.put(items.get(i), values.get(i));
        }
        return out;
    }

    private double total(List<Part> parts) {
        double t = 0;
        for (Part pt : parts) {
            t += pt.outcome().best().searched(designer.costModel()).total();
        }
        return t;
    }

    /**
     * A part's layout as the line's search chose it, re-verified by the span designer and given the line's
     * proof: optimal for the line (the dynamic programming is exhaustive over the options), with this
     * part's own generator counts and no solve of its own.
     */
    private SpanDesigner.Outcome adopted(SpanProblem p, SpanLayout layout, SpanGenerator.Stats stats) {
        long units =
                CostModel.SPAN_UNITS.units(layout.cost(p, designer.costModel()).total());
        var proof = Proof.solved(
                        Proof.Status.OPTIMAL,
                        units,
                        units,
                        CostModel.SPAN_UNITS,
                        Proof.SolverStats.NONE,
                        new SpanDesigner.Search(stats, 0, 0, true),
                        designer.options())
                .measuring(designer.costModel().objective());
        return designer.adopt(p, layout, proof);
    }

    /**
     * Whether every support section beside support {@code j} could reach the strain 6.6.5 asks for any
     * redistribution (the section model's bound on εt: the least steel carrying its moment at the most
     * redistribution, as deep as the cover allows, no compression steel, as at a line's supports).
     */
    private static boolean mayRedistribute(Trial t, int j, int n) {
        for (SpanProblem p : t.leastDemand()) {
            int seg = LineProblems.segmentOf(p, n);
            Double mu = null;
            if (LineProblems.leftSupportOf(seg, n) == j && p.leftSupport()) {
                mu = p.mLeft();
            } else if (LineProblems.rightSupportOf(seg, n) == j && p.rightSupport()) {
                mu = p.mRight();
            }
            if (mu == null) {
                continue;
            }
            double dMax = t.shape().height() - p.detailing().cover();
            double epsT = barfit.section.StrengthBound.maxEpsT(
                    Math.abs(mu),
                    dMax,
                    t.shape().width(),
                    p.materials().fc(),
                    p.materials().fy(),
                    p.code());
            if (barfit.analysis.RedistributionLimit.percent(epsT) <= 0) {
                return false;
            }
        }
        return true;
    }
}
