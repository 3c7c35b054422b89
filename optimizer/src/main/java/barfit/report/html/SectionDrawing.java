package barfit.report.html;

import barfit.catalogs.BarSize;
import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.report.html.SectionGeometry.Mm;
import barfit.report.html.SectionGeometry.Placed;
import barfit.section.BarLayer;
import barfit.section.BeamSection;
import barfit.section.Bending;
import barfit.section.CodeEquations;
import barfit.section.Detailing;
import barfit.section.Face;
import barfit.section.Flange;
import barfit.section.SectionShape;
import barfit.section.SkinBars;
import barfit.section.StirrupHooks;
import barfit.section.Stirrups;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * A beam section drawn to scale as SVG: the concrete (with the slab, dashed, where it is on the tension
 * side and not counted), the clear cover, the stirrup as a bar of its own diameter with its bends and
 * hooks, every longitudinal bar at its real size and position, skin bars, and the dimensions b, h and d.
 * Coordinates are written in px; the root carries the scale and the px position of the web's top-left
 * corner so a reader (or a test) can map any point back to mm.
 */
public final class SectionDrawing {
    /** px from the top of the SVG to the top face of the section; the strain diagram uses the same. */
    static final double TOP = 58;
    /** px below the bottom face: b dimension, scale bar and the legend lines. */
    static final double BELOW = 126;

    private static final double LEFT = 60;
    private static final double LABELS = 130;
    private static final double MAX_HEIGHT_PX = 340;
    private static final double MAX_WIDTH_PX = 400;

    /** Dimension, cover and leader lines. */
    static final String DIM = "#6b6b6b";

    private SectionDrawing() {}

    /** A layer of bars as drawn, and whether the section model counts it at this section. */
    public record DrawnLayer(BarLayer layer, boolean counted) {}

    /**
     * What one drawing shows: a title, the concrete outline, the detailing (cover, stirrup bar, layer
     * gap), the bending at the section, every bar layer present, the stirrups of the zone the section
     * sits in, skin bars (or null), d from the section's flexure (or null) and the code edition (for the
     * inch-pound minimum hook extension).
     */
    public record View(
            String title,
            String subtitle,
            SectionShape shape,
            Detailing detailing,
            Bending bending,
            List<DrawnLayer> layers,
            Stirrups stirrups,
            SkinBars skin,
            Double d,
            CodeEquations code) {
        public View {
            layers = List.copyOf(layers);
        }
    }

    /**
     * The view of a designed span at one of its sections: the bars the section model counts there, plus
     * the full-span bottom bars at a hogging support when they are not anchored (present, not counted),
     * and the stirrups of the zone at that section.
     */
    public static View of(
            SpanProblem p, SpanLayout l, SpanProblem.Place place, Double d, String title, String subtitle) {
        return of(p, l, place, stirrupsAt(p, l, place), d, title, subtitle);
    }

    /** The view of a stirrup zone: the section the zone is designed with, and the zone's own stirrups. */
    public static View ofZone(SpanProblem p, SpanLayout l, int zone, Double d, String title, String subtitle) {
        return of(p, l, p.zones().get(zone).section(), l.zoneStirrups().get(zone), d, title, subtitle);
    }

    private static View of(
            SpanProblem p,
            SpanLayout l,
            SpanProblem.Place place,
            Stirrups st,
            Double d,
            String title,
            String subtitle) {
        BeamSection s = l.section(p, place, st);
        List<DrawnLayer> layers = new ArrayList<>();
        for (BarLayer bl : s.layers()) {
            layers.add(new DrawnLayer(bl, true));
        }
        Bending bending = SpanLayout.bending(p, place);
        if (bending == Bending.HOGGING && !p.bottomAnchored()) {
            List<BeamSection.BarGroup> groups = new ArrayList<>();
            for (int c : l.bottomCounts()) {
                groups.add(new BeamSection.BarGroup(l.bottom(), c));
            }
            for (BarLayer bl : BeamSection.stack(Face.BOTTOM, groups, s.detailing())) {
                layers.add(new DrawnLayer(bl, false));
            }
        }
        return new View(title, subtitle, s.shape(), s.detailing(), bending, layers, st, l.skin(), d, s.code());
    }

    /** The stirrups of the zone that contains the section: left end, mid-span or right end. */
    static Stirrups stirrupsAt(SpanProblem p, SpanLayout l, SpanProblem.Place place) {
        List<SpanProblem.Zone> zones = p.zones();
        double x = switch (place) {
            case LEFT -> 0;
            case MID -> p.span() / 2;
            case RIGHT -> p.span();
        };
        for (int i = 0; i < zones.size(); i++) {
            if (x >= zones.get(i).from() - 1e-9 && x <= zones.get(i).to() + 1e-9) {
                return l.zoneStirrups().get(i);
            }
        }
        return l.zoneStirrups().get(0);
    }

    /**
     * One scale for every section of a beam (px per mm), a multiple of 0.05 so the scale note reads
     * cleanly: the height fits {@value #MAX_HEIGHT_PX} px and the drawn width {@value #MAX_WIDTH_PX} px.
     */
    public static double scaleFor(SectionShape shape) {
        double drawnWidth = shape.width()
                + SectionGeometry.stub(shape)
                        * (shape.flange() != null && !shape.flange().oneSided() ? 2 : 1);
        double s = Math.min(MAX_HEIGHT_PX / shape.height(), MAX_WIDTH_PX / drawnWidth);
        s = Math.min(1.5, Math.floor(s * 20 + 1e-9) / 20);
        return Math.max(0.05, s);
    }

    /** px from the left of the SVG to the web's left face. */
    static double originX(SectionShape shape, double scale) {
        boolean slabLeft = shape.flange() != null && !shape.flange().oneSided();
        return LEFT + (slabLeft ? SectionGeometry.stub(shape) * scale : 0);
    }

    /** Total SVG height for a section of height h at this scale (the strain diagram matches it). */
    static double svgHeight(SectionShape shape, double scale) {
        return TOP + shape.height() * scale + BELOW;
    }

    public static String svg(View v, double scale, UnitSystem u) {
        SectionShape shape = v.shape();
        double b = shape.width();
        double ox = originX(shape, scale);
        double oy = TOP;
        Flange f = shape.flange();
        double stub = SectionGeometry.stub(shape);
        double leftStub = f != null && !f.oneSided() ? stub : 0;
        double rightStub = f != null ? stub : 0;
        double right = ox + (b + rightStub) * scale;
        double width = right + 40 + LABELS;
        double height = svgHeight(shape, scale);
        Mm m = new Mm(ox, oy, scale);
        StringBuilder out = new StringBuilder();
        out.append("<text x=\"4\" y=\"16\" font-size=\"13\" font-weight=\"bold\">")
                .append(Svg.esc(v.title()))
                .append("</text>\n");
        if (v.subtitle() != null) {
            Svg.text(out, 4, 32, "start", null, v.subtitle());
        }

        SectionBody.concrete(out, v, m, leftStub, rightStub);
        SectionBody.cover(out, v, m);
        List<Placed> placed = SectionGeometry.place(v);
        boolean shortTails = StirrupDrawing.draw(out, v, m, placed);
        SectionBody.bars(out, v, m, placed);
        SectionBody.skin(out, v, m, placed);
        dimensions(out, v, m, u, leftStub, rightStub);
        labels(out, v, m, placed, right + 40);
        double legendRight = legend(out, v, m, u, shortTails);
        // wide enough for the legend's longest line and the titles (11 px text: about 6.3 px a character)
        width = Math.max(
                width,
                Math.max(
                                legendRight,
                                Math.max(
                                        4 + 8 * v.title().length(),
                                        v.subtitle() == null
                                                ? 0
                                                : 4 + TEXT_PX * v.subtitle().length()))
                        + 8);
        StringBuilder svg = new StringBuilder(out.length() + 512);
        svg.append("<svg xmlns=\"")
                .append(Svg.NS)
                .append("\" class=\"section-drawing\" width=\"")
                .append(Svg.px(width))
                .append("\" height=\"")
                .append(Svg.px(height))
                .append("\" viewBox=\"0 0 ")
                .append(Svg.px(width))
                .append(' ')
                .append(Svg.px(height))
                .append("\" data-px-per-mm=\"")
                .append(Svg.px(scale))
                .append("\" data-origin-x=\"")
                .append(Svg.px(ox))
                .append("\" data-origin-y=\"")
                .append(Svg.px(oy))
                .append("\" role=\"img\" aria-label=\"")
                .append(Svg.esc(v.title()))
                .append("\">\n");
        svg.append("<g font-family=\"sans-serif\" font-size=\"11\" fill=\"#222\">\n");
        svg.append(out);
        svg.append("</g>\n</svg>\n");
        return svg.toString();
    }

    private static void dimensions(StringBuilder out, View v, Mm m, UnitSystem u, double leftStub, double rightStub) {
        SectionShape shape = v.shape();
        double b = shape.width();
        double h = shape.height();
        // b under the web
        double yb = m.y(h) + 18;
        dimLine(out, m.x(0), yb, m.x(b), yb, true, -1);
        Svg.text(out, (m.x(0) + m.x(b)) / 2, yb + 14, "middle", null, "b = " + len(b, u));
        // h at the left of everything drawn
        double xh = m.x(-leftStub) - 18;
        dimLine(out, xh, m.y(0), xh, m.y(h), false, 1);
        rotated(out, xh - 5, (m.y(0) + m.y(h)) / 2, "h = " + len(h, u));
        // d from the compression face to the centroid of the tension steel
        if (v.d() != null) {
            double xd = m.x(b + rightStub) + 16;
            double top = v.bending() == Bending.SAGGING ? 0 : h - v.d();
            double bottom = v.bending() == Bending.SAGGING ? v.d() : h;
            dimLine(out, xd, m.y(top), xd, m.y(bottom), false, -1);
            rotated(out, xd + 12, (m.y(top) + m.y(bottom)) / 2, "d = " + len(v.d(), u));
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
                    .append(DIM)
                    .append("\" stroke-width=\"0.6\" stroke-dasharray=\"2 2\"/>\n");
        }
        Flange f = shape.flange();
        if (f != null) {
            String what = (f.oneSided() ? "L-beam: " : "T-beam: ") + "flange b_f = " + len(f.width(), u) + ", h_f = "
                    + len(f.thickness(), u) + (SectionGeometry.slabCut(shape) ? " (slab cut)" : "");
            Svg.text(out, m.x(-leftStub), m.y(0) - 6, "start", null, what);
        }
    }

    /** Width of a character of the 11 px sans-serif text, px, for sizing the drawing (an estimate). */
    private static final double TEXT_PX = 6.3;

    /** The legend under the section; returns the x (px) its longest line reaches. */
    private static double legend(StringBuilder out, View v, Mm m, UnitSystem u, boolean shortTails) {
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
        lines.add("cover " + len(v.detailing().cover(), u) + " to the stirrup (dashed)");
        if (v.stirrups() != null) {
            Stirrups s = v.stirrups();
            String bend = Math.round(
                            StirrupHooks.insideBendDiameter(s.bar()) / s.bar().diameter()) + " d_b";
            lines.add("stirrup " + s.bar().label() + ", " + s.legs() + " legs @ " + len(s.spacing(), u) + "; bends "
                    + bend + " inside, 135° hooks + " + len(StirrupHooks.extension135(s.bar(), v.code()), u));
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
    private static void labels(StringBuilder out, View v, Mm m, List<Placed> placed, double x) {
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
                    .append(DIM)
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
        out.append("<g stroke=\"").append(DIM).append("\" stroke-width=\"0.8\">");
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

    /** The clear gap a drawn hook tail keeps from a bar it does not wrap, mm (see {@link SectionGeometry}). */
    static double clearance(BarSize stirrup) {
        return SectionGeometry.clearance(stirrup);
    }

    static String len(double mm, UnitSystem u) {
        return u.compact(mm, Dim.LENGTH) + " " + u.unit(Dim.LENGTH);
    }
}
