package barfit.report.html;

import barfit.report.html.SectionDrawing.View;
import barfit.report.html.SectionGeometry.Mm;
import barfit.report.html.SectionGeometry.Placed;
import barfit.section.BarLayer;
import barfit.section.Bending;
import barfit.section.Flange;
import barfit.section.SectionShape;
import java.util.List;

/**
 * The section itself in a section drawing: the concrete outline with its slab (one piece with the web in
 * compression, pale and dashed on the tension side, a break line where the drawn slab is cut), the
 * clear-cover line, and the longitudinal and skin bars at their real size.
 */
final class SectionBody {
    private static final String CONCRETE = "#e9e6df";
    private static final String EDGE = "#4a4a4a";
    private static final String SLAB_OFF = "#f7f6f3";
    private static final String STEEL = "#1d2b3a";
    private static final String OFF = "#a3a3a3";

    private SectionBody() {}

    /** The clear cover: the outside face of the stirrup, dashed. */
    static void cover(StringBuilder out, View v, Mm m) {
        double b = v.shape().width();
        double h = v.shape().height();
        double c = v.detailing().cover();
        out.append("<rect class=\"cover\" x=\"")
                .append(Svg.px(m.x(c)))
                .append("\" y=\"")
                .append(Svg.px(m.y(c)))
                .append("\" width=\"")
                .append(Svg.px((b - 2 * c) * m.s()))
                .append("\" height=\"")
                .append(Svg.px((h - 2 * c) * m.s()))
                .append("\" fill=\"none\" stroke=\"")
                .append(SectionDrawing.DIM)
                .append("\" stroke-width=\"0.8\" stroke-dasharray=\"4 3\"/>\n");
    }

    static void concrete(StringBuilder out, View v, Mm m, double leftStub, double rightStub) {
        SectionShape shape = v.shape();
        double b = shape.width();
        double h = shape.height();
        Flange f = shape.flange();
        if (f == null) {
            out.append("<rect class=\"concrete\" x=\"")
                    .append(Svg.px(m.x(0)))
                    .append("\" y=\"")
                    .append(Svg.px(m.y(0)))
                    .append("\" width=\"")
                    .append(Svg.px(b * m.s()))
                    .append("\" height=\"")
                    .append(Svg.px(h * m.s()))
                    .append("\" fill=\"")
                    .append(CONCRETE)
                    .append("\" stroke=\"")
                    .append(EDGE)
                    .append("\" stroke-width=\"1.2\"/>\n");
            return;
        }
        double hf = f.thickness();
        boolean cut = SectionGeometry.slabCut(shape);
        if (v.bending() == Bending.SAGGING) {
            // the compression flange and the web are one piece: one outline
            StringBuilder d = new StringBuilder();
            d.append('M').append(m.p(0, h)).append(" L").append(m.p(0, hf));
            if (leftStub > 0) {
                d.append(" L").append(m.p(-leftStub, hf));
                breakLine(d, m, -leftStub, hf, 0, cut, 1);
            } else {
                d.append(" L").append(m.p(0, 0));
            }
            d.append(" L").append(m.p(b + rightStub, 0));
            breakLine(d, m, b + rightStub, 0, hf, cut, -1);
            d.append(" L").append(m.p(b, hf)).append(" L").append(m.p(b, h)).append(" Z");
            out.append("<path class=\"concrete\" d=\"")
                    .append(d)
                    .append("\" fill=\"")
                    .append(CONCRETE)
                    .append("\" stroke=\"")
                    .append(EDGE)
                    .append("\" stroke-width=\"1.2\"/>\n");
            return;
        }
        // hogging: the slab is on the tension side and the section model does not count it; drawn pale
        // and dashed beside the web
        String slabStyle =
                "fill=\"" + SLAB_OFF + "\" stroke=\"" + OFF + "\" stroke-width=\"1\" stroke-dasharray=\"5 3\"";
        if (leftStub > 0) {
            StringBuilder d = new StringBuilder();
            d.append('M').append(m.p(0, 0)).append(" L").append(m.p(-leftStub, 0));
            breakLine(d, m, -leftStub, 0, hf, cut, 1);
            d.append(" L").append(m.p(0, hf));
            out.append("<path class=\"slab not-counted\" d=\"")
                    .append(d)
                    .append("\" ")
                    .append(slabStyle)
                    .append("/>\n");
        }
        if (rightStub > 0) {
            StringBuilder d = new StringBuilder();
            d.append('M').append(m.p(b, 0)).append(" L").append(m.p(b + rightStub, 0));
            breakLine(d, m, b + rightStub, 0, hf, cut, -1);
            d.append(" L").append(m.p(b, hf));
            out.append("<path class=\"slab not-counted\" d=\"")
                    .append(d)
                    .append("\" ")
                    .append(slabStyle)
                    .append("/>\n");
        }
        out.append("<rect class=\"concrete\" x=\"")
                .append(Svg.px(m.x(0)))
                .append("\" y=\"")
                .append(Svg.px(m.y(0)))
                .append("\" width=\"")
                .append(Svg.px(b * m.s()))
                .append("\" height=\"")
                .append(Svg.px(h * m.s()))
                .append("\" fill=\"")
                .append(CONCRETE)
                .append("\" stroke=\"")
                .append(EDGE)
                .append("\" stroke-width=\"1.2\"/>\n");
    }

    /**
     * The free edge of a slab from y0 to y1 (mm) at x: a zigzag break line when the slab goes on beyond
     * what is drawn, else straight; {@code towardsWeb} is +1 for a left free edge, -1 for a right one.
     */
    private static void breakLine(StringBuilder d, Mm m, double x, double y0, double y1, boolean cut, int towardsWeb) {
        if (cut) {
            double zig = 6 / m.s();
            double dy = y1 - y0;
            d.append(" L").append(m.p(x, y0 + dy * 0.35));
            d.append(" L").append(m.p(x - towardsWeb * zig, y0 + dy * 0.45));
            d.append(" L").append(m.p(x + towardsWeb * zig, y0 + dy * 0.55));
            d.append(" L").append(m.p(x, y0 + dy * 0.65));
        }
        d.append(" L").append(m.p(x, y1));
    }

    static void bars(StringBuilder out, View v, Mm m, List<Placed> placed) {
        for (Placed pl : placed) {
            BarLayer bl = pl.drawn().layer();
            double r = bl.bar().diameter() / 2 * m.s();
            String fill = pl.drawn().counted() ? STEEL : OFF;
            String cls = pl.drawn().counted() ? "bar" : "bar not-counted";
            for (double x : pl.x()) {
                out.append("<circle class=\"")
                        .append(cls)
                        .append("\" data-face=\"")
                        .append(bl.face().word())
                        .append("\" data-bar=\"")
                        .append(Svg.esc(bl.bar().label()))
                        .append("\" cx=\"")
                        .append(Svg.px(m.x(x)))
                        .append("\" cy=\"")
                        .append(Svg.px(m.y(pl.y())))
                        .append("\" r=\"")
                        .append(Svg.px(r))
                        .append("\" fill=\"")
                        .append(fill)
                        .append("\"/>\n");
            }
        }
    }

    static void skin(StringBuilder out, View v, Mm m, List<Placed> placed) {
        if (v.skin() == null) {
            return;
        }
        double r = v.skin().bar().diameter() / 2 * m.s();
        for (double[] c : SectionGeometry.skinCentres(v, placed)) {
            out.append("<circle class=\"skin\" cx=\"")
                    .append(Svg.px(m.x(c[0])))
                    .append("\" cy=\"")
                    .append(Svg.px(m.y(c[1])))
                    .append("\" r=\"")
                    .append(Svg.px(r))
                    .append("\" fill=\"#5b5b5b\"/>\n");
        }
    }
}
