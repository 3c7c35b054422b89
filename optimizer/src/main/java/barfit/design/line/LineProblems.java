package barfit.design.line;

import barfit.analysis.Coefficients;
import barfit.analysis.Line;
import barfit.analysis.LineAnalysis;
import barfit.analysis.LineResult;
import barfit.analysis.Load;
import barfit.analysis.TorqueEnvelope;
import barfit.design.SearchSpace;
import barfit.design.span.ShearDiagram;
import barfit.design.span.SpanProblem;
import barfit.design.span.SpanTorsion;
import barfit.input.LineInput;
import barfit.input.Settings;
import barfit.section.Deflection;
import barfit.section.EndCondition;
import barfit.section.Flange;
import barfit.section.SectionShape;
import barfit.section.SpanChecks;
import java.util.ArrayList;
import java.util.List;

/**
 * A line's analysis turned into its parts' span problems: each span a whole-span problem with the
 * moments at its support faces, its largest sagging moment, its shear diagram and its service moments
 * from the envelope (or from the 6.5 coefficients); each overhang a cantilever. With the helpers about
 * a part's segment and the supports at its ends. Apart from the searches because both searches (one
 * section for the line, span by span) design against the same problems, built the same way.
 *
 * <p>Each span and overhang takes from the analysis its service moments for deflection (dead load, and
 * dead plus live in the arrangement with the largest sagging moment in the span) and its whole shear
 * diagram, so that each stirrup zone is designed for the shear at the d of the section design chooses.
 * With the 6.5 coefficients, which give neither, the factored moments are scaled by the span's
 * dead-to-live proportion and the shears run straight between the faces.
 */
final class LineProblems {
    /** A moment smaller than this share of the span's largest is taken as none (a pinned end's rounding). */
    private static final double NEGLIGIBLE = 1e-6;

    private final Settings settings;
    private final SearchSpace space;
    private final int maxBarSizes;
    private final int barsPerTwoLegs;

    LineProblems(Settings settings, SearchSpace space, int maxBarSizes, int barsPerTwoLegs) {
        this.settings = settings;
        this.space = space;
        this.maxBarSizes = maxBarSizes;
        this.barsPerTwoLegs = barsPerTwoLegs;
    }

    /** One analysis of the line (by stiffness or by the 6.5 coefficients) and the part problems from it. */
    record Analysed(List<SpanProblem> problems, LineResult analysis, List<Coefficients.SpanValues> coefficients) {}

    /**
     * As {@link #analyse}, for several redistributions at once (by stiffness): the line is solved once and
     * its envelope taken for each, in the order given.
     */
    List<Analysed> analyseEach(LineInput in, List<SectionShape> shapes, double ec, List<List<Double>> reds) {
        Line line = in.toLine(shapes, ec, effectiveDepth(shapes), reds.get(0));
        List<LineResult> results = LineAnalysis.analyseEach(line, reds, 50);
        List<Analysed> out = new ArrayList<>();
        for (int i = 0; i < reds.size(); i++) {
            Line li = line.withRedistribution(reds.get(i));
            out.add(new Analysed(fromAnalysis(in, li, results.get(i)), results.get(i), null));
        }
        return out;
    }

    Analysed analyse(LineInput in, List<SectionShape> shapes, double ec, List<Double> red) {
        Line line = in.toLine(shapes, ec, effectiveDepth(shapes), red);
        if (in.coefficients()) {
            List<Coefficients.SpanValues> c = Coefficients.analyse(line);
            return new Analysed(fromCoefficients(in, line, c), null, c);
        }
        LineResult r = LineAnalysis.analyse(line);
        return new Analysed(fromAnalysis(in, line, r), r, null);
    }

    /**
     * The parts' problems with the whole line at one section, analysed with that section's own weight and
     * stiffness and the percentages redistributed at each support given, each held at that section.
     */
    List<SpanProblem> problemsAt(LineInput in, SectionShape shape, List<Double> redistribution) {
        double ec = Deflection.ec(settings.materials(), settings.code());
        List<SectionShape> shapes = throughout(shape, in.spans().size());
        List<SpanProblem> out = new ArrayList<>();
        for (SpanProblem p : analyse(in, shapes, ec, redistribution).problems()) {
            out.add(heldAt(p, shape));
        }
        return out;
    }

    /** d for the shears at d: the shallowest section's height less cover, stirrup and half a 25 mm bar. */
    private double effectiveDepth(List<SectionShape> shapes) {
        double h = Double.POSITIVE_INFINITY;
        for (SectionShape s : shapes) {
            h = Math.min(h, s.height());
        }
        return h - settings.detailing().cover() - settings.stirrupBar().diameter() - 12.7;
    }

    private List<SpanProblem> fromAnalysis(LineInput in, Line line, LineResult r) {
        List<SpanProblem> out = new ArrayList<>();
        int n = in.spans().size();
        for (LineResult.SpanValues s : r.spans()) {
            double big = Math.max(Math.abs(s.mSpanMax()), Math.max(Math.abs(s.mLeftFace()), Math.abs(s.mRightFace())));
            Double ml = s.mLeftFace() < -NEGLIGIBLE * big ? s.mLeftFace() : null;
            Double mr = s.mRightFace() < -NEGLIGIBLE * big ? s.mRightFace() : null;
            Double mm = s.mSpanMax() > NEGLIGIBLE * big ? s.mSpanMax() : null;
            SpanChecks.ServiceMoments service = SpanChecks.ServiceMoments.analysed(
                    ml == null ? null : s.deadLeft(),
                    mm == null ? null : s.deadMid(),
                    mr == null ? null : s.deadRight(),
                    ml == null ? null : s.deflectionLeft(),
                    mm == null ? null : s.deflectionMid(),
                    mr == null ? null : s.deflectionRight(),
                    in.sustainedLive());
            out.add(problem(in, line, s.index(), n, s.clear(), ml, mm, mr, s.vLeftD(), s.vRightD())
                    .withAnalysis(service, spanShear(line, r, s)));
        }
        for (LineResult.OverhangValues o : r.overhangs()) {
            int seg = o.side().equals("left") ? 0 : n + 1;
            SpanChecks.ServiceMoments service = SpanChecks.ServiceMoments.analysed(
                    o.deadFace(), null, null, o.totalFace(), null, null, in.sustainedLive());
            out.add(cantilever(in, line, seg, n, o.clear(), o.mFace(), o.vD())
                    .withAnalysis(service, overhangShear(line, r, seg)));
        }
        return out;
    }

    private List<SpanProblem> fromCoefficients(LineInput in, Line line, List<Coefficients.SpanValues> c) {
        List<SpanProblem> out = new ArrayList<>();
        int n = in.spans().size();
        for (Coefficients.SpanValues s : c) {
            // Table 6.5.4 gives the shear at the face; taken there (the section at d would need 9.4.3.2)
            out.add(problem(
                    in,
                    line,
                    s.index(),
                    n,
                    s.clear(),
                    s.mLeftFace() < 0 ? s.mLeftFace() : null,
                    s.mSpan(),
                    s.mRightFace() < 0 ? s.mRightFace() : null,
                    s.vLeftFace(),
                    s.vRightFace()));
        }
        return out;
    }

    private SpanProblem problem(
            LineInput in,
            Line line,
            int s,
            int n,
            double clear,
            Double ml,
            Double mm,
            Double mr,
            double vl,
            double vr) {
        // Table 9.3.1.1's end conditions: a span is continuous over an interior support
        int continuous = (s > 1 ? 1 : 0) + (s < n ? 1 : 0);
        EndCondition ends = continuous == 0
                ? EndCondition.SIMPLE
                : continuous == 1 ? EndCondition.ONE_END_CONTINUOUS : EndCondition.BOTH_ENDS_CONTINUOUS;
        return new SpanProblem(
                        in.id() + "/span " + s,
                        settings.materials(),
                        settings.detailing(),
                        settings.code(),
                        space,
                        clear,
                        ends,
                        ml,
                        mm,
                        mr,
                        vl,
                        vr,
                        service(in, line, s),
                        SpanChecks.Limits.DEFAULT,
                        in.maxDepth(),
                        null,
                        flange(in, clear),
                        false,
                        maxBarSizes,
                        barsPerTwoLegs)
                .withTorsion(torsion(in, s));
    }

    /**
     * A span's torsion from the line's torque envelope (supports restraining twist): at its faces and mid
     * clear span, taken at d near the faces by the span search; null where the span carries no torque.
     */
    static SpanTorsion torsion(LineInput in, int s) {
        for (TorqueEnvelope.SpanTorsion t : in.torsion()) {
            if (t.index() == s) {
                return new SpanTorsion(t.atLeftFace(), t.atMidClear(), t.atRightFace(), false, true);
            }
        }
        return null;
    }

    private SpanProblem cantilever(LineInput in, Line line, int seg, int n, double clear, double m, double v) {
        return new SpanProblem(
                in.id() + "/" + partName(seg, n),
                settings.materials(),
                settings.detailing(),
                settings.code(),
                space,
                clear,
                EndCondition.CANTILEVER,
                m,
                null,
                null,
                v,
                null,
                service(in, line, seg),
                SpanChecks.Limits.DEFAULT,
                in.maxDepth(),
                null,
                null,
                false,
                maxBarSizes,
                barsPerTwoLegs);
    }

    /**
     * A span's shear diagram handed to design: the envelope of |V| at the analysis' stations between its
     * faces (the faces are stations), measured from the left face.
     */
    static ShearDiagram spanShear(Line line, LineResult r, LineResult.SpanValues s) {
        double faceLeft = line.supports().get(s.index() - 1).width() / 2;
        double faceRight = faceLeft + s.clear();
        List<double[]> points = new ArrayList<>();
        for (LineResult.StationValues st : r.stations()) {
            if (st.segment() == s.index() && st.local() >= faceLeft - 1e-6 && st.local() <= faceRight + 1e-6) {
                points.add(new double[] {Math.min(Math.max(st.local() - faceLeft, 0), s.clear()), magnitude(st)});
            }
        }
        return diagram(s.clear(), points, s.vLeftAtFace(), s.vRightAtFace());
    }

    /** An overhang's, from the face of its support (x = 0, fixed) to its tip. */
    static ShearDiagram overhangShear(Line line, LineResult r, int seg) {
        boolean left = seg == 0;
        double len = line.length(seg);
        double half = line.supports().get(left ? 0 : line.spanCount()).width() / 2;
        double clear = len - half;
        List<double[]> points = new ArrayList<>();
        for (LineResult.StationValues st : r.stations()) {
            if (st.segment() != seg) {
                continue;
            }
            double x = left ? len - half - st.local() : st.local() - half;
            if (x >= -1e-6 && x <= clear + 1e-6) {
                points.add(new double[] {Math.min(Math.max(x, 0), clear), magnitude(st)});
            }
        }
        points.sort((a, b) -> Double.compare(a[0], b[0]));
        return diagram(clear, points, false, true);
    }

    private static double magnitude(LineResult.StationValues st) {
        return Math.max(0, Math.max(st.vMax(), -st.vMin()));
    }

    private static ShearDiagram diagram(double clear, List<double[]> points, boolean leftAtFace, boolean rightAtFace) {
        double[] x = new double[points.size()];
        double[] v = new double[points.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = points.get(i)[0];
            v[i] = points.get(i)[1];
        }
        return new ShearDiagram(clear, x, v, leftAtFace, rightAtFace);
    }

    /** The flange as given, bounded on each span by that span's clear length (Table 6.3.2.1). */
    private static Flange flange(LineInput in, double clear) {
        Flange f = in.section().flange();
        if (f == null) {
            return null;
        }
        return Flange.given(
                f.given(),
                f.thickness(),
                f.oneSided(),
                Double.isNaN(f.clearToNextWeb()) ? null : f.clearToNextWeb(),
                clear);
    }

    /** Equivalent uniform service loads of a segment: its whole dead and live load over its length. */
    private static SpanChecks.ServiceLoads service(LineInput in, Line line, int seg) {
        double dead = 0;
        double live = 0;
        for (Load l : line.loads()) {
            if (l.segment() != seg) {
                continue;
            }
            double k = l.point() ? 1 : l.to() - l.from();
            dead += l.dead() * k;
            live += l.live() * k;
        }
        double len = line.length(seg);
        return new SpanChecks.ServiceLoads(dead / len, live / len, in.sustainedLive());
    }

    /** The part restricted to the one section it is held at. */
    static SpanProblem heldAt(SpanProblem p, SectionShape shape) {
        return p.withFixedWidth(shape.width()).withSpace(p.space().withDepths(List.of(shape.height())));
    }

    /** A part's name in the report: "span 2", "left overhang". */
    static String partName(int seg, int n) {
        return seg == 0 ? "left overhang" : seg == n + 1 ? "right overhang" : "span " + seg;
    }

    /** The segment of a part's problem, read back from its id: 0 and n + 1 the overhangs, 1..n the spans. */
    static int segmentOf(SpanProblem p, int n) {
        String id = p.id();
        if (id.endsWith("/left overhang")) {
            return 0;
        }
        if (id.endsWith("/right overhang")) {
            return n + 1;
        }
        return Integer.parseInt(id.substring(id.lastIndexOf("/span ") + 6));
    }

    /** The support at a part's left end (0..n): a span's left support, an overhang's root. */
    static int leftSupportOf(int seg, int n) {
        return seg == 0 ? 0 : seg == n + 1 ? n : seg - 1;
    }

    /** The support at a part's right end, -1 for an overhang (its tip). */
    static int rightSupportOf(int seg, int n) {
        return seg == 0 || seg == n + 1 ? -1 : seg;
    }

    /** One section for every segment of a line of n spans (the spans and both overhangs). */
    static List<SectionShape> throughout(SectionShape shape, int n) {
        return new ArrayList<>(java.util.Collections.nCopies(n + 2, shape));
    }
}
