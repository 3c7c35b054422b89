package barfit.report;

import barfit.analysis.Line;
import barfit.analysis.Support;
import barfit.analysis.SupportKind;
import barfit.design.line.LineSpans;
import barfit.detailing.LineDetail;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.List;

/**
 * A detailed line drawn as an elevation (hand-written SVG, the same bytes on every run): the beam from end
 * to end with its supports, every bar run at its face from its real start to its real end with its hooks
 * and laps, the cut-off points, the stirrup zones; under it, on the same horizontal scale, the factored
 * moment envelope with the design strength of the bars as detailed. Lengths along the line are to scale;
 * the depth is drawn larger (the factor is written on the drawing) and the bars on one face are drawn a
 * few px apart so that each can be seen.
 */
public final class ElevationSvg {
    static final double WIDTH = 1500;
    /** px from the left edge to the line's left end, and the px the line's length takes. */
    static final double LEFT = 70;

    static final double ALONG = 1400;
    /** The beam's top face, px from the top. */
    static final double TOP = 180;
    /** The deepest section's depth at least, px. */
    static final double DEPTH = 150;
    /** px of a support block (or column stub) beyond the beam's faces. */
    static final double STUB = 44;

    static final String INK = "#333333";
    static final String HATCH = "url(#elevation-hatch)";

    private ElevationSvg() {}

    /** Where the drawing puts a length along the line, and the beam's depth at any x (px). */
    record Frame(double xMin, double xMax, double sx, double vy, double depthPx, List<Depth> depths) {
        /** px of an x along the line (mm). */
        double x(double mm) {
            return LEFT + (mm - xMin) * sx;
        }

        double top() {
            return TOP;
        }

        /** The beam's bottom face at x, px. */
        double bottom(double mm) {
            for (Depth d : depths) {
                if (mm >= d.from() - 1e-6 && mm <= d.to() + 1e-6) {
                    return TOP + d.h() * vy;
                }
            }
            return TOP + depthPx;
        }

        /** The deepest bottom face, px. */
        double lowest() {
            return TOP + depthPx;
        }
    }

    /** A stretch of the line and the depth of its section, mm. */
    record Depth(double from, double to, double h) {}

    /** The drawing of a detailed line; {@code r} the design it was detailed from (the sections' sizes). */
    public static String svg(LineDetail d, LineSpans.Result r, UnitSystem u) {
        Line line = d.line();
        int n = line.spanCount();
        double xMin = line.overhangLeft() > 0
                ? -line.overhangLeft()
                : -line.supports().get(0).width() / 2;
        double xMax = line.supportX(n)
                + (line.overhangRight() > 0
                        ? line.overhangRight()
                        : line.supports().get(n).width() / 2);
        double sx = ALONG / (xMax - xMin);
        List<Depth> depths = new ArrayList<>();
        double deepest = 0;
        String size = null;
        boolean oneSize = true;
        for (LineSpans.Part p : r.parts()) {
            if (!p.outcome().feasible()) {
                continue;
            }
            var l = p.outcome().best().layout();
            int seg = p.segment();
            // a span from support centre line to centre line; the end spans out to the line's ends
            double from = seg == 0 || seg == 1 && line.overhangLeft() <= 0 ? xMin : line.supportX(seg - 1);
            double to = seg == n + 1 || seg == n && line.overhangRight() <= 0 ? xMax : line.supportX(seg);
            depths.add(new Depth(from, to, l.height()));
            deepest = Math.max(deepest, l.height());
            String s = u.compact(l.width(), Dim.LENGTH) + " × " + u.compact(l.height(), Dim.LENGTH);
            oneSize &= size == null || size.equals(s);
            size = size == null ? s : size;
        }
        List<ElevationBars.Placed> placed = ElevationBars.place(d.runs(), sx);
        double depthPx = Math.max(DEPTH, ElevationBars.bandsPx(placed) + 60);
        double vy = depthPx / deepest;
        Frame f = new Frame(xMin, xMax, sx, vy, depthPx, depths);

        ElevationPen pen = new ElevationPen();
        pen.text(LEFT, 24, "start", "title", "Line " + d.id() + ": elevation of the bars as detailed");
        pen.text(LEFT, 42, "start", "caution", "CAUTION: " + Caution.SHORT);
        String span = u.unit(Dim.SPAN);
        pen.text(
                LEFT,
                60,
                "start",
                "note",
                "x from the centre line of support 1 (" + span + ")"
                        + (oneSize && size != null ? "; section " + size + " " + u.unit(Dim.LENGTH) : "")
                        + "; depth drawn " + String.format(java.util.Locale.ROOT, "%.1f", vy / sx)
                        + " times the length scale; the runs on a face are drawn apart and their hooks offset so"
                        + " that each can be seen");
        pen.text(
                LEFT,
                76,
                "start",
                "note",
                "each run: count, size, what it is; stirrups per zone: bar × legs @ spacing (" + u.unit(Dim.LENGTH)
                        + "); cut-off points marked with their x (" + span + ")");
        beam(pen, f);
        ElevationBars.stirrups(pen, f, d.zones(), placed, u);
        supports(pen, f, line);
        ElevationBars.runs(pen, f, placed, d.schedule(), u);
        double below = spans(pen, f, line, u, oneSize ? null : r);
        ElevationBars.cutOffs(pen, f, placed, u, below);
        double end = ElevationMoments.draw(pen, f, d, u, below + 84);

        StringBuilder svg = new StringBuilder(pen.text().length() + 2048);
        // the root carries the scale along the line, so a reader (or a test) can map px back to mm
        svg.append("<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"elevation\" data-left-px=\"")
                .append(ElevationPen.px(LEFT))
                .append("\" data-left-mm=\"")
                .append(ElevationPen.px(xMin))
                .append("\" data-px-per-mm=\"")
                .append(String.format(java.util.Locale.ROOT, "%.12f", sx))
                .append("\" data-depth-px-per-mm=\"")
                .append(String.format(java.util.Locale.ROOT, "%.12f", vy))
                .append("\" width=\"")
                .append(ElevationPen.px(WIDTH))
                .append("\" height=\"")
                .append(ElevationPen.px(end))
                .append("\" viewBox=\"0 0 ")
                .append(ElevationPen.px(WIDTH))
                .append(' ')
                .append(ElevationPen.px(end))
                .append("\" font-family=\"DejaVu Sans, Arial, Helvetica, sans-serif\">\n")
                .append(STYLE)
                .append("<rect x=\"0\" y=\"0\" width=\"")
                .append(ElevationPen.px(WIDTH))
                .append("\" height=\"")
                .append(ElevationPen.px(end))
                .append("\" fill=\"#ffffff\"/>\n")
                .append(pen.text())
                .append("</svg>\n");
        return svg.toString();
    }

    private static final String STYLE = "<defs>\n"
            + "<pattern id=\"elevation-hatch\" width=\"6\" height=\"6\" patternUnits=\"userSpaceOnUse\""
            + " patternTransform=\"rotate(45)\"><rect width=\"6\" height=\"6\" fill=\"#d9d9d9\"/>"
            + "<line x1=\"0\" y1=\"0\" x2=\"0\" y2=\"6\" stroke=\"#8c8c8c\" stroke-width=\"1\"/></pattern>\n"
            + "<style>\n"
            + "text { font-size: 10px; fill: #333333; }\n"
            + ".title { font-size: 15px; font-weight: bold; }\n"
            + ".caution { font-size: 11px; fill: #9c1c1c; }\n"
            + ".note { font-size: 10.5px; fill: #555555; }\n"
            + ".halo { paint-order: stroke; stroke: #ffffff; stroke-width: 3px; stroke-linejoin: round; }\n"
            + ".top-bar { fill: #8e2424; }\n"
            + ".bottom-bar { fill: #1a4d80; }\n"
            + ".skin-bar { fill: #6d4c41; }\n"
            + ".zone { fill: #3f5566; font-size: 9.5px; }\n"
            + ".cut { font-size: 9px; fill: #444444; }\n"
            + ".support { font-size: 11px; font-weight: bold; }\n"
            + ".axis { font-size: 10px; fill: #444444; }\n"
            + ".verdict { font-size: 11.5px; font-weight: bold; fill: #1b5e20; }\n"
            + ".fails { fill: #b71c1c; }\n"
            + "</style>\n"
            + "</defs>\n";

    /** The concrete: top face flat, the bottom face stepping where the sections' depths differ. */
    private static void beam(ElevationPen pen, Frame f) {
        StringBuilder d = new StringBuilder();
        d.append('M').append(ElevationPen.px(f.x(f.xMin()))).append(' ').append(ElevationPen.px(f.top()));
        d.append(" L").append(ElevationPen.px(f.x(f.xMax()))).append(' ').append(ElevationPen.px(f.top()));
        List<Depth> depths = new ArrayList<>(f.depths());
        depths.sort(java.util.Comparator.comparingDouble(Depth::from).reversed());
        for (Depth dp : depths) {
            double y = f.top() + dp.h() * f.vy();
            d.append(" L").append(ElevationPen.px(f.x(dp.to()))).append(' ').append(ElevationPen.px(y));
            d.append(" L").append(ElevationPen.px(f.x(dp.from()))).append(' ').append(ElevationPen.px(y));
        }
        d.append(" Z");
        pen.raw("<path class=\"beam\" d=\"" + d + "\" fill=\"#f4f4f2\" stroke=\"" + INK
                + "\" stroke-width=\"1.4\"/>\n");
    }

    /**
     * Each support at its real width: a hatched block under the beam (a column's stub, cut by a break line,
     * also above where a column is above); a knife edge as a wedge. Numbered in circles under it.
     */
    private static void supports(ElevationPen pen, Frame f, Line line) {
        for (int j = 0; j <= line.spanCount(); j++) {
            Support s = line.supports().get(j);
            double c = line.supportX(j);
            double x0 = f.x(c - s.width() / 2);
            double w = Math.max(2, s.width() * f.sx());
            double bottom = f.lowest();
            double yb = f.bottom(c);
            if (s.kind() == SupportKind.KNIFE_EDGE) {
                double half = Math.max(7, w / 2);
                double xc = f.x(c);
                pen.raw("<path class=\"support\" d=\"M" + ElevationPen.px(xc) + ' ' + ElevationPen.px(yb) + " L"
                        + ElevationPen.px(xc + half) + ' ' + ElevationPen.px(yb + 16) + " L"
                        + ElevationPen.px(xc - half) + ' ' + ElevationPen.px(yb + 16) + " Z\" fill=\"" + HATCH
                        + "\" stroke=\"" + INK + "\" stroke-width=\"1\"/>\n");
            } else {
                pen.rect(x0, yb, w, bottom + STUB - yb, "support", HATCH, INK);
                if (s.below() != null) {
                    breakLine(pen, x0, w, bottom + STUB);
                }
            }
            if (s.above() != null) {
                pen.rect(x0, f.top() - STUB, w, STUB, "support", HATCH, INK);
                breakLine(pen, x0, w, f.top() - STUB);
            }
            double yc = bottom + STUB + 16;
            pen.raw("<circle cx=\"" + ElevationPen.px(f.x(c)) + "\" cy=\"" + ElevationPen.px(yc)
                    + "\" r=\"9\" fill=\"#ffffff\" stroke=\"" + INK + "\" stroke-width=\"1\"/>\n");
            pen.text(f.x(c), yc + 4, "middle", "support", String.valueOf(j + 1));
        }
    }

    /** A column cut short: a zigzag across it, on a white band. */
    private static void breakLine(ElevationPen pen, double x0, double w, double y) {
        pen.rect(x0 - 2, y - 3, w + 4, 6, "break", "#ffffff", "none");
        double q = w / 4;
        pen.path(
                "M" + ElevationPen.px(x0 - 3) + ' ' + ElevationPen.px(y) + " L" + ElevationPen.px(x0 + q) + ' '
                        + ElevationPen.px(y) + " L" + ElevationPen.px(x0 + 1.5 * q) + ' ' + ElevationPen.px(y - 4)
                        + " L" + ElevationPen.px(x0 + 2.5 * q) + ' ' + ElevationPen.px(y + 4) + " L"
                        + ElevationPen.px(x0 + 3 * q) + ' ' + ElevationPen.px(y) + " L" + ElevationPen.px(x0 + w + 3)
                        + ' ' + ElevationPen.px(y),
                "break",
                INK,
                1,
                null,
                "");
    }

    /**
     * The spans' and overhangs' lengths, centre line to centre line of supports (an overhang from its
     * support's centre line to its tip), as dimension lines under the supports; with each part's section
     * where they differ ({@code r} null where the line is of one section). Returns the px below them.
     */
    private static double spans(ElevationPen pen, Frame f, Line line, UnitSystem u, LineSpans.Result r) {
        double y = f.lowest() + STUB + 46;
        int n = line.spanCount();
        List<double[]> dims = new ArrayList<>();
        List<String> words = new ArrayList<>();
        if (line.overhangLeft() > 0) {
            dims.add(new double[] {-line.overhangLeft(), 0});
            words.add("overhang " + u.withUnit(line.overhangLeft(), Dim.SPAN) + section(r, 0, u));
        }
        for (int i = 0; i < n; i++) {
            dims.add(new double[] {line.supportX(i), line.supportX(i + 1)});
            words.add("span " + (i + 1) + ": " + u.withUnit(line.spans().get(i), Dim.SPAN) + section(r, i + 1, u));
        }
        if (line.overhangRight() > 0) {
            dims.add(new double[] {line.supportX(n), line.supportX(n) + line.overhangRight()});
            words.add("overhang " + u.withUnit(line.overhangRight(), Dim.SPAN) + section(r, n + 1, u));
        }
        for (int i = 0; i < dims.size(); i++) {
            double a = f.x(dims.get(i)[0]);
            double b = f.x(dims.get(i)[1]);
            pen.line(a, y, b, y, "dimension", INK, 0.8, null);
            for (double x : new double[] {a, b}) {
                pen.line(x, y - 6, x, y + 6, "dimension", INK, 0.8, null);
                pen.line(x - 3, y + 3, x + 3, y - 3, "dimension", INK, 1.1, null);
            }
            pen.text((a + b) / 2, y - 4, "middle", "axis halo", words.get(i));
        }
        return y;
    }

    /** ", b × h" of the part on a segment, where the line's parts differ (else empty). */
    private static String section(LineSpans.Result r, int segment, UnitSystem u) {
        if (r == null) {
            return "";
        }
        for (LineSpans.Part p : r.parts()) {
            if (p.segment() == segment && p.outcome().feasible()) {
                var l = p.outcome().best().layout();
                return ", " + u.compact(l.width(), Dim.LENGTH) + " × " + u.compact(l.height(), Dim.LENGTH);
            }
        }
        return "";
    }
}
