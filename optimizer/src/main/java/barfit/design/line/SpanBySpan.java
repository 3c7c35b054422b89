package barfit.design.line;

import barfit.analysis.Coefficients;
import barfit.analysis.LineResult;
import barfit.design.SearchSpace;
import barfit.design.line.LineSpans.Part;
import barfit.design.line.LineSpans.Result;
import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.input.LineInput;
import barfit.input.Settings;
import barfit.section.Deflection;
import barfit.section.SectionShape;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * A line of per-span forms, designed span by span: each part its own depth at one width along the line (its
 * own width where no one width carries every part); the line analysed again with the sections chosen (their
 * own weight and stiffness) and every part designed afresh against the new envelope, until the sections
 * stop changing (at most {@link LineSpans#MAX_ROUNDS} rounds; a cycle of sections is held at its largest).
 * Apart from the search for one section because it iterates analysis and design to a fixed point rather
 * than bounding a search over sections.
 */
final class SpanBySpan {
    private final Settings settings;
    private final SearchSpace space;
    private final SpanDesigner designer;
    private final LineProblems lineProblems;

    SpanBySpan(Settings settings, SearchSpace space, SpanDesigner designer, LineProblems lineProblems) {
        this.settings = settings;
        this.space = space;
        this.designer = designer;
        this.lineProblems = lineProblems;
    }

    /**
     * Span by span with one width along the line (each span its own depth): the line designed at each width
     * of the search space, the cheapest whose every part has a design; where no width carries every part,
     * each part takes its own width.
     */
    Result sameWidth(LineInput in, int alternatives) {
        Result best = null;
        double bestTotal = Double.POSITIVE_INFINITY;
        for (double b : space.widths()) {
            Result r = bySpan(in, alternatives, b);
            double total = 0;
            for (Part pt : r.parts()) {
                total += pt.outcome().feasible()
                        ? pt.outcome().best().searched(designer.costModel()).total()
                        : Double.POSITIVE_INFINITY;
            }
            if (total < bestTotal - 1e-9) {
                best = r;
                bestTotal = total;
            }
        }
        return best != null ? best : bySpan(in, alternatives, null);
    }

    /** Span by span: each part its own section, the line analysed again until the sections settle. */
    private Result bySpan(LineInput in, int alternatives, Double width) {
        int n = in.spans().size();
        List<SectionShape> shapes = LineProblems.throughout(in.section(), n);
        double ec = Deflection.ec(settings.materials(), settings.code());
        List<Part> parts = List.of();
        LineResult analysis = null;
        List<Coefficients.SpanValues> coefficients = null;
        int round = 0;
        boolean settled = false;
        List<Double> red = new ArrayList<>(in.redistribution());
        List<Double> epsT = new ArrayList<>();
        List<List<SectionShape>> seen = new ArrayList<>();
        List<SectionShape> held = null;
        while (round < LineSpans.MAX_ROUNDS) {
            seen.add(shapes);
            round++;
            LineProblems.Analysed a = lineProblems.analyse(in, shapes, ec, red);
            List<SpanProblem> problems = a.problems();
            if (in.coefficients()) {
                coefficients = a.coefficients();
            } else {
                analysis = a.analysis();
            }
            List<Part> next = new ArrayList<>();
            List<SectionShape> chosen = new ArrayList<>(shapes);
            for (SpanProblem p : problems) {
                int seg = LineProblems.segmentOf(p, n);
                if (held != null) {
                    p = LineProblems.heldAt(p, held.get(seg));
                } else if (width != null) {
                    p = p.withFixedWidth(width);
                }
                SpanDesigner.Outcome o = designer.design(p, alternatives, previous(parts, seg));
                next.add(new Part(seg, LineProblems.partName(seg, n), p, o));
                if (o.feasible()) {
                    var l = o.best().layout();
                    chosen.set(
                            seg,
                            new SectionShape(l.width(), l.height(), in.section().flange()));
                }
            }
            parts = next;
            // 6.6.5: a support's redistribution stands only where the sections designed beside it allow it
            epsT = Redistribution.supportStrains(in, parts);
            boolean lowered = Redistribution.lowerToAllowed(red, epsT);
            if (!lowered && sameSections(shapes, chosen)) {
                settled = true;
                break;
            }
            int again = lowered || held != null ? -1 : indexOfSections(seen, chosen);
            if (again >= 0) {
                // the sections alternate: each span's own weight and stiffness move its neighbours' envelope
                // back and forth. Hold every part at the largest section of the cycle and design its bars
                // for the envelope of exactly those sections, which then settles.
                held = largest(seen.subList(again, seen.size()));
                chosen = held;
            }
            shapes = chosen;
        }
        List<String> heldParts = new ArrayList<>();
        if (held != null) {
            parts.forEach(pt -> heldParts.add(pt.name()));
        }
        return new Result(in, parts, round, settled, analysis, coefficients, red, epsT, heldParts, null, Double.NaN);
    }

    /** The segment's design in the previous round: a layout that may pass again, to bound the next search. */
    private static SpanLayout previous(List<Part> parts, int seg) {
        for (Part pt : parts) {
            if (pt.segment() == seg && pt.outcome().feasible()) {
                return pt.outcome().best().layout();
            }
        }
        return null;
    }

    private static int indexOfSections(List<List<SectionShape>> seen, List<SectionShape> shapes) {
        for (int i = 0; i < seen.size(); i++) {
            if (sameSections(seen.get(i), shapes)) {
                return i;
            }
        }
        return -1;
    }

    /** Per segment, the deepest of the sections (the wider between equally deep ones). */
    private static List<SectionShape> largest(List<List<SectionShape>> states) {
        List<SectionShape> out = new ArrayList<>(states.get(0));
        for (List<SectionShape> st : states) {
            for (int i = 0; i < out.size(); i++) {
                SectionShape a = out.get(i);
                SectionShape b = st.get(i);
                if (b.height() > a.height() || b.height() == a.height() && b.width() > a.width()) {
                    out.set(i, b);
                }
            }
        }
        return out;
    }

    private static boolean sameSections(List<SectionShape> a, List<SectionShape> b) {
        for (int i = 0; i < a.size(); i++) {
            SectionShape x = a.get(i);
            SectionShape y = b.get(i);
            if (x.width() != y.width() || x.height() != y.height() || !Objects.equals(x.flange(), y.flange())) {
                return false;
            }
        }
        return true;
    }
}
