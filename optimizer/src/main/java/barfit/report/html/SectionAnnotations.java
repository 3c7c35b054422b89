package barfit.report.html;

import barfit.report.html.SectionDrawing.View;
import barfit.report.html.SectionGeometry.Mm;
import barfit.report.html.SectionGeometry.Placed;
import barfit.section.BarLayer;
import barfit.section.Bending;
import barfit.section.Flange;
import barfit.section.SectionShape;
import barfit.section.StirrupHooks;
import barfit.section.Stirrups;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * What a section drawing writes beside the section: the dimensions b, h and d with the flange's note, the
 * bar labels to the right (pushed apart, with leader lines), and the legend with its scale bar below.
 */
final class SectionAnnotations {
    /** Width of a character of the 11 px sans-serif text, px, for sizing the drawing (an estimate). */
    static final double TEXT_PX = 6.3;

    private SectionAnnotations() {}

    static void dimensions(StringBuilder out, View v, Mm m, UnitSystem u, double leftStub, double rightStub) {
        SectionShape shape = v.shape();
        double b = shape.width();
        double h = shape.height();
        // b under the web
        double yb = m.y(h) + 18;
        dimLine(out, m.x(0), yb, m.x(b), yb, true, -1);
        Svg.text(out, (m.x(0) + m.x(b)) / 2, yb + 14, "middle", null, "b = " + SectionDrawing.len(b, u));
        // h at the left of everything drawn
        double xh = m.x(-leftStub) - 18;
        dimLine(out, xh, m.y(0), xh, m.y(h), false, 1);
        rotated(out, xh - 5, (m.y(0) + m.y(h)) / 2, "h = " + SectionDrawing.len(h, u));
        // d from the compression face to the centroid of the tension steel
        if (v.d() != null) {
            double xd = m.x(b + rightStub) + 16;
            double top = v.bending() == Bending.SAGGING ? 0 : h - v.d();
            double bottom = v.bending() == Bending.SAGGING ? v.d() : h;
            dimLine(out, xd, m.y(top), xd, m.y(bottom), false, -1);
            rotated(out, xd + 12, (m.y(top) + m.y(bottom)) / 2, "d = " + SectionDrawing.len(v.d(), u));
            double yc = m.y(v.bending() == Bending.SAGGING ? v.d() : h - v.d());
            out.append("<line x1=\"")
                    .append(Svg.px(m.x(b) - 4))
                    .append("\" y1=\"")
                    .append(Svg.px(yc))
                    .append("\" x2=\"")
                    .append(Svg.px(xd + 3))
                    .append("\" y2=\"")
                    .append(Svg.px(yc))
                    .append("\" stroke=\"")
                    .append(SectionDrawing.DIM)
                    .append("\" stroke-width=\"0.6\" stroke-dasharray=\"2 2\"/>\n");
        }
        Flange f = shape.flange();
        if (f != null) {
            String what = (f.oneSided() ? "L-beam: " : "T-beam: ") + "flange b_f = " + SectionDrawing.len(f.width(), u)
                    + ", h_f = " + SectionDrawing.len(f.thickness(), u)
                    + (SectionGeometry.slabCut(shape) ? " (slab cut)" : "");
            Svg.text(out, m.x(-leftStub), m.y(0) - 6, "start", null, what);
        }
    }

    /** The legend under the section; returns the x (px) its longest line reaches. */
    static double legend(StringBuilder out, View v, Mm m, UnitSystem u, boolean shortTails) {
        double h = v.shape().height();
        double y = m.y(h) + 50;
        // a scale bar of 100 mm (4 in)
        double barMm = u == UnitSystem.US ? 101.6 : 100;
        double x0 = m.x(0)
                - (v.shape().flange() != null && !v.shape().flange().oneSided()
                        ? SectionGeometry.stub(v.shape()) * m.s()
                        : 0);
        double x1 = x0 + barMm * m.s();
        out.append("<rect x=\"")
                .append(Svg.px(x0))
                .append("\" y=\"")
                .append(Svg.px(y - 4))
                .append("\" width=\"")
                .append(Svg.px(barMm * m.s() / 2))
                .append("\" height=\"4\" fill=\"#333\"/>\n");
        out.append("<rect x=\"")
                .append(Svg.px((x0 + x1) / 2))
                .append("\" y=\"")
                .append(Svg.px(y - 4))
                .append("\" width=\"")
                .append(Svg.px(barMm * m.s() / 2))
                .append("\" height=\"4\" fill=\"#fff\" stroke=\"#333\" stroke-width=\"0.8\"/>\n");
        // the bar, not a ratio, states the scale: it stays true when the page is zoomed or printed
        String scaleText = (u == UnitSystem.US ? "4 in" : "100 mm") + "   (section drawn to scale)";
        Svg.text(out, x1 + 6, y, "start", null, scaleText);
        double reach = x1 + 6 + TEXT_PX * scaleText.length();
        List<String> lines = new ArrayList<>();
        lines.add("cover " + SectionDrawing.len(v.detailing().cover(), u) + " to the stirrup (dashed)");
        if (v.stirrups() != null) {
            Stirrups s = v.stirrups();
            String bend = Math.round(
                            StirrupHooks.insideBendDiameter(s.bar()) / s.bar().diameter()) + " d_b";
            lines.add("stirrup " + s.bar().label() + ", " + s.legs() + " legs @ " + SectionDrawing.len(s.spacing(), u)
                    + "; bends " + bend + " inside, 135° hooks + "
                    + SectionDrawing.len(StirrupHooks.extension135(s.bar(), v.code()), u));
            if (shortTails) {
                lines.add("hook tails drawn short where a bar or crosstie is in the way");
            }
        }
        boolean anyOff = v.layers().stream().anyMatch(l -> !l.counted());
        boolean slabOff = v.shape().flange() != null && v.bending() == Bending.HOGGING;
        if (anyOff || slabOff) {
            lines.add("grey: present, not counted here" + (slabOff ? " (slab on the tension side)" : ""));
        }
        for (int i = 0; i < lines.size(); i++) {
            Svg.text(out, x0, y + 16 + 14 * i, "start", null, lines.get(i));
            reach = Math.max(reach, x0 + TEXT_PX * lines.get(i).length());
        }
        return reach;
    }

    /** Bar labels to the right of the section, pushed apart so they never overlap, with leader lines. */
    static void labels(StringBuilder out, View v, Mm m, List<Placed> placed, double x) {
        List<double[]> rows = new ArrayList<>();
        List<String> texts = new ArrayList<>();
        List<Boolean> counted = new ArrayList<>();
        List<Placed> order = new ArrayList<>(placed);
        order.sort(Comparator.comparingDouble(Placed::y));
        for (Placed pl : order) {
            BarLayer bl = pl.drawn().layer();
            double lastX = pl.x()[pl.x().length - 1] + bl.bar().diameter() / 2;
            rows.add(new double[] {m.y(pl.y()), m.x(lastX), m.y(pl.y())});
            texts.add(bl.count() + " " + bl.bar().label() + (pl.drawn().counted() ? "" : " (not counted)"));
            counted.add(pl.drawn().counted());
        }
        if (v.skin() != null) {
            List<double[]> sk = SectionGeometry.skinCentres(v, placed);
            if (!sk.isEmpty()) {
                double yMid = 0;
                for (double[] c : sk) {
                    yMid += c[1];
                }
                yMid /= sk.size();
                double[] last = sk.get(sk.size() - 1);
                int at = 0;
                while (at < rows.size() && rows.get(at)[0] < m.y(yMid)) {
                    at++;
                }
                rows.add(at, new double[] {
                    m.y(yMid), m.x(last[0] + v.skin().bar().diameter() / 2), m.y(yMid)
                });
                texts.add(at, "skin " + sk.size() / 2 + " " + v.skin().bar().label() + " each face");
                counted.add(at, true);
            }
        }
        double gap = 14;
        for (int i = 1; i < rows.size(); i++) {
            rows.get(i)[0] = Math.max(rows.get(i)[0], rows.get(i - 1)[0] + gap);
        }
        double limit = m.y(v.shape().height()) + 8;
        for (int i = rows.size() - 1; i >= 0; i--) {
            double max = i == rows.size() - 1 ? limit : rows.get(i + 1)[0] - gap;
            rows.get(i)[0] = Math.min(rows.get(i)[0], max);
        }
        for (int i = 0; i < rows.size(); i++) {
            double[] r = rows.get(i);
            out.append("<polyline fill=\"none\" stroke=\"")
                    .append(SectionDrawing.DIM)
                    .append("\" stroke-width=\"0.6\" points=\"")
                    .append(Svg.px(r[1] + 2))
                    .append(',')
                    .append(Svg.px(r[2]))
                    .append(' ')
                    .append(Svg.px(x - 10))
                    .append(',')
                    .append(Svg.px(r[0] - 4))
                    .append(' ')
                    .append(Svg.px(x - 3))
                    .append(',')
                    .append(Svg.px(r[0] - 4))
                    .append("\"/>\n");
            Svg.text(out, x, r[0], "start", counted.get(i) ? "bar-label" : "bar-label not-counted", texts.get(i));
        }
    }

    /** A dimension line with oblique ticks; {@code towards} (+1 or -1) is the side of the object, for the extension lines. */
    private static void dimLine(
            StringBuilder out, double x1, double y1, double x2, double y2, boolean horizontal, int towards) {
        out.append("<g stroke=\"").append(SectionDrawing.DIM).append("\" stroke-width=\"0.8\">");
        out.append("<line x1=\"")
                .append(Svg.px(x1))
                .append("\" y1=\"")
                .append(Svg.px(y1))
                .append("\" x2=\"")
                .append(Svg.px(x2))
                .append("\" y2=\"")
                .append(Svg.px(y2))
                .append("\"/>");
        // oblique ticks at both ends, and short extension lines back to the object
        for (double[] pt : new double[][] {{x1, y1}, {x2, y2}}) {
            out.append("<line x1=\"")
                    .append(Svg.px(pt[0] - 4))
                    .append("\" y1=\"")
                    .append(Svg.px(pt[1] + 4))
                    .append("\" x2=\"")
                    .append(Svg.px(pt[0] + 4))
                    .append("\" y2=\"")
                    .append(Svg.px(pt[1] - 4))
                    .append("\"/>");
            if (horizontal) {
                out.append("<line x1=\"")
                        .append(Svg.px(pt[0]))
                        .append("\" y1=\"")
                        .append(Svg.px(pt[1] + towards * 14))
                        .append("\" x2=\"")
                        .append(Svg.px(pt[0]))
                        .append("\" y2=\"")
                        .append(Svg.px(pt[1] - towards * 3))
                        .append("\"/>");
            } else {
                out.append("<line x1=\"")
                        .append(Svg.px(pt[0] - towards * 3))
                        .append("\" y1=\"")
                        .append(Svg.px(pt[1]))
                        .append("\" x2=\"")
                        .append(Svg.px(pt[0] + towards * 14))
                        .append("\" y2=\"")
                        .append(Svg.px(pt[1]))
                        .append("\"/>");
            }
        }
        out.append("</g>\n");
    }

    private static void rotated(StringBuilder out, double x, double y, String text) {
        out.append("<text x=\"")
                .append(Svg.px(x))
                .append("\" y=\"")
                .append(Svg.px(y))
                .append("\" text-anchor=\"middle\"")
                .append(" transform=\"rotate(-90 ")
                .append(Svg.px(x))
                .append(' ')
                .append(Svg.px(y))
                .append(")\">")
                .append(Svg.esc(text))
                .append("</text>\n");
    }
}
