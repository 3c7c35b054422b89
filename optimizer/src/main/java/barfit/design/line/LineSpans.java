package barfit.design.line;

import barfit.analysis.Coefficients;
import barfit.analysis.Line;
import barfit.analysis.LineResult;
import barfit.design.SearchSpace;
import barfit.design.span.ShearDiagram;
import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanProblem;
import barfit.input.LineInput;
import barfit.input.Settings;
import barfit.section.SectionShape;
import java.util.ArrayList;
import java.util.List;

/**
 * Designs a beam line from its analysis, each span a whole-span problem and each overhang a cantilever
 * ({@link LineProblems}). A line of one set of forms takes one section for every part ({@link
 * OneSectionSearch}), or falls back to span by span where no one section carries every part; a line of
 * per-span forms is designed span by span, analysed again with the sections chosen until they settle (at
 * most {@link #MAX_ROUNDS} rounds, {@link SpanBySpan}). Each part's design is proved and re-verified
 * against the envelope of the last analysis. This class holds what the rest of the program sees: the entry
 * and the records of the result.
 */
public final class LineSpans {
    public static final int MAX_ROUNDS = 8;

    /** The steps of redistribution tried at a support (6.6.5), percent. */
    public static final double STEP = 5;

    /**
     * What the line's design gives: per segment designed, its problem and outcome; the rounds it took.
     * {@code redistribution} is what the last analysis used per support (percent): what was asked, lowered
     * where the sections designed beside the support do not allow it (6.6.5.3: εt ≥ 0.0075 and at most
     * 1000 εt percent); {@code epsT} the least εt of those sections (NaN where none was asked).
     */
    public record Result(
            LineInput line,
            List<Part> parts,
            int rounds,
            boolean settled,
            LineResult analysis,
            List<Coefficients.SpanValues> coefficients,
            List<Double> redistribution,
            List<Double> epsT,
            List<String> held,
            OneSection oneSection,
            double withoutRedistribution) {

        /**
         * Per support (left to right), the top bars over it as the parts beside it were designed: null where
         * no part has bars over it. In a line of one section they are one group; span by span each side
         * has its own.
         */
        public List<SupportBars> supports() {
            int n = line.spans().size();
            List<SupportBars> out = new ArrayList<>();
            for (int j = 0; j <= n; j++) {
                Side left = null; // the part on the support's left, its right end
                Side right = null;
                for (Part pt : parts) {
                    if (!pt.outcome().feasible()) {
                        continue;
                    }
                    int seg = pt.segment();
                    boolean overhang = seg == 0 || seg == n + 1;
                    var design = pt.outcome().best();
                    var l = design.layout();
                    var sections = design.report().sections();
                    if (seg == j && !overhang && l.topRight() != null) {
                        left = side(pt, l.topRight(), l.extRight(), 0, sections.get(SpanProblem.Place.RIGHT));
                    }
                    if (seg == j + 1 && !overhang && l.topLeft() != null) {
                        right = side(pt, l.topLeft(), l.extLeft(), 0, sections.get(SpanProblem.Place.LEFT));
                    }
                    if (overhang && (seg == 0 ? j == 0 : j == n) && l.topLeft() != null) {
                        // a cantilever's bars run its length and are anchored past the face into the back span
                        double length = pt.problem().span();
                        Side c = side(
                                pt, l.topLeft(), length, l.extLeft() - length, sections.get(SpanProblem.Place.LEFT));
                        if (seg == 0) {
                            left = c;
                        } else {
                            right = c;
                        }
                    }
                }
                if (left == null && right == null) {
                    out.add(null);
                    continue;
                }
                out.add(new SupportBars(j + 1, line.supports().get(j).width(), left, right));
            }
            return out;
        }
    }

    /**
     * One side of a support's top bars: the part it belongs to, the bars (per layer from the top face),
     * how far the bars beyond the continuous ones run into the part past the face (a cantilever's: its
     * length), how far they must run past the face into the part across the support ({@code anchorage}, a
     * cantilever's anchorage into its back span; 0 for a span), and that section's check.
     */
    public record Side(
            String part,
            barfit.catalogs.BarSize bar,
            int continuous,
            List<Integer> counts,
            double extension,
            double anchorage,
            barfit.section.CheckReport section) {}

    private static Side side(
            Part pt, List<Integer> counts, double extension, double anchorage, barfit.section.CheckReport section) {
        var l = pt.outcome().best().layout();
        return new Side(pt.name(), l.top(), l.topContinuous(), counts, extension, anchorage, section);
    }

    /**
     * The top bars over one support (1-based {@code index}): their size and continuous count, the
     * support's width, and each side as designed (null where that side carries no negative moment).
     * {@link #shared} when both sides take the same bars: one group, cut from bars that run over the
     * support into both parts.
     */
    public record SupportBars(int index, double width, Side left, Side right) {
        public boolean shared() {
            return left != null
                    && right != null
                    && left.bar().equals(right.bar())
                    && left.counts().equals(right.counts());
        }

        /** A side with bars: the left one where both have. */
        public Side either() {
            return left != null ? left : right;
        }

        /**
         * How far the extra bars run past the face into the left part: the longer of that side's own need
         * and the anchorage the right side asks.
         */
        public double intoLeft() {
            return Math.max(left == null ? 0 : left.extension(), right == null ? 0 : right.anchorage());
        }

        /** How far they run past the face into the right part, likewise. */
        public double intoRight() {
            return Math.max(right == null ? 0 : right.extension(), left == null ? 0 : left.anchorage());
        }

        /** The length of one extra bar of a shared group: into the left part, over the support, into the right. */
        public double extraBarLength() {
            return intoLeft() + width + intoRight();
        }
    }

    /**
     * How a line of one set of forms was designed: the sections analysed (each with its own weight and
     * stiffness) and how many of them were designed before the cost bound stopped the search; or, where
     * no one section carries every part, that the line fell back to span-by-span design; and the next
     * cheapest sections when alternatives were asked for.
     */
    public record OneSection(int sections, int designed, boolean fellBack, List<Alternative> alternatives) {}

    /**
     * The cheapest line at another section, next after the chosen one (design's alternatives): its b x h,
     * its cost and the redistribution per support it takes (percent).
     */
    public record Alternative(double width, double height, double cost, List<Double> redistribution) {}

    /** A span (index 1..n) or an overhang (0 left, n + 1 right) and its design. */
    public record Part(int segment, String name, SpanProblem problem, SpanDesigner.Outcome outcome) {}

    private final LineProblems lineProblems;
    private final OneSectionSearch oneSectionSearch;
    private final SpanBySpan spanBySpan;

    public LineSpans(Settings settings, SearchSpace space, SpanDesigner designer, int maxBarSizes, int barsPerTwoLegs) {
        this.lineProblems = new LineProblems(settings, space, maxBarSizes, barsPerTwoLegs);
        this.oneSectionSearch = new OneSectionSearch(settings, space, designer, maxBarSizes, lineProblems);
        this.spanBySpan = new SpanBySpan(settings, space, designer, lineProblems);
    }

    public Result design(LineInput in, int alternatives) {
        if (in.oneSection()) {
            Result one = oneSectionSearch.design(in, alternatives);
            if (one != null) {
                return one;
            }
            Result bySpan = spanBySpan.sameWidth(in, alternatives);
            return new Result(
                    in,
                    bySpan.parts(),
                    bySpan.rounds(),
                    bySpan.settled(),
                    bySpan.analysis(),
                    bySpan.coefficients(),
                    bySpan.redistribution(),
                    bySpan.epsT(),
                    bySpan.held(),
                    new OneSection(0, 0, true, List.of()),
                    Double.NaN);
        }
        return spanBySpan.sameWidth(in, alternatives);
    }

    /** A line as given, analysed: its parts' problems, in segment order, and the analysis. */
    public record Given(List<SpanProblem> problems, List<String> names, LineResult analysis) {}

    /**
     * A line with its section as given, analysed as design analyses it (by stiffness, its own weight and
     * stiffness, the redistribution it asks), each part's problem held at that section: what {@code check}
     * verifies a line's bars against.
     */
    public static Given analyseGiven(LineInput in, Settings settings, SearchSpace space) {
        LineProblems lp = new LineProblems(settings, space, 2, space.barsPerTwoLegs());
        double ec = barfit.section.Deflection.ec(settings.materials(), settings.code());
        int n = in.spans().size();
        var a = lp.analyse(in, LineProblems.throughout(in.section(), n), ec, in.redistribution());
        List<SpanProblem> problems = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (SpanProblem p : a.problems()) {
            problems.add(LineProblems.heldAt(p, in.section()));
            names.add(LineProblems.partName(LineProblems.segmentOf(p, n), n));
        }
        return new Given(problems, names, a.analysis());
    }

    /** A given line's result, its parts verified as given (no search: one round, settled). */
    public static Result given(LineInput in, Given g, List<Part> parts) {
        List<Double> none = new ArrayList<>();
        for (int j = 0; j <= in.spans().size(); j++) {
            none.add(Double.NaN);
        }
        return new Result(
                in,
                parts,
                1,
                true,
                g.analysis(),
                null,
                in.redistribution(),
                none,
                List.of(),
                new OneSection(1, 1, false, List.of()),
                Double.NaN);
    }

    /**
     * The parts' problems with the whole line at one section, analysed with that section's own weight and
     * stiffness: with none redistributed where the search chooses the redistribution (the line asks for
     * some, by stiffness), else with what is asked. What a line of one section designs against with no
     * redistribution (for its oracle).
     */
    List<SpanProblem> problemsAt(LineInput in, SectionShape shape) {
        return oneSectionSearch.problemsAt(in, shape);
    }

    /** As above, with the percentages redistributed at each support given. */
    List<SpanProblem> problemsAt(LineInput in, SectionShape shape, List<Double> redistribution) {
        return lineProblems.problemsAt(in, shape, redistribution);
    }

    /** The part restricted to the one section it is held at. */
    static SpanProblem heldAt(SpanProblem p, SectionShape shape) {
        return LineProblems.heldAt(p, shape);
    }

    /** The segment of a part's problem ({@link LineProblems#segmentOf}). */
    static int segmentOf(SpanProblem p, int n) {
        return LineProblems.segmentOf(p, n);
    }

    /** A span's shear diagram handed to design ({@link LineProblems#spanShear}). */
    static ShearDiagram spanShear(Line line, LineResult r, LineResult.SpanValues s) {
        return LineProblems.spanShear(line, r, s);
    }
}
