package barfit.report.html;

import barfit.catalogs.BarSize;
import barfit.design.section.SectionLayout;
import barfit.design.section.SectionProblem;
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
import barfit.section.Stirrups;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.List;

/**
 * A beam section drawn to scale as SVG: the concrete (with the slab, dashed, where it is on the tension
 * side and not counted), the clear cover, the stirrup as a bar of its own diameter with its bends and
 * hooks, every longitudinal bar at its real size and position, skin bars, and the dimensions b, h and d.
 * Coordinates are written in px; the root carries the scale and the px position of the web's top-left
 * corner so a reader (or a test) can map any point back to mm.
 *
 * <p>This class holds what a drawing shows ({@link View}), the scale and the SVG around the parts:
 * {@link SectionGeometry} places the bars, {@link SectionBody} draws the concrete, cover and bars,
 * {@link StirrupDrawing} the stirrup (with {@link CrosstieLegs} for where its crossties stand) and
 * {@link SectionAnnotations} the dimensions, bar labels and legend.
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

    /** The view of a single designed section: every bar it has, counted, and its stirrups and skin bars. */
    public static View ofSection(SectionProblem p, SectionLayout l, Double d, String title, String subtitle) {
        BeamSection s = l.section(p.materials(), p.detailing(), p.code());
        List<DrawnLayer> layers = new ArrayList<>();
        for (BarLayer bl : s.layers()) {
            layers.add(new DrawnLayer(bl, true));
        }
        return new View(
                title, subtitle, s.shape(), s.detailing(), l.bending(), layers, l.stirrups(), l.skin(), d, s.code());
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

    /** The drawing of a view at a scale (px per mm, from {@link #scaleFor}), lengths written in {@code u}. */
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
        SectionAnnotations.dimensions(out, v, m, u, leftStub, rightStub);
        SectionAnnotations.labels(out, v, m, placed, right + 40);
        double legendRight = SectionAnnotations.legend(out, v, m, u, shortTails);
        // wide enough for the legend's longest line and the titles (11 px text: about 6.3 px a character)
        double subtitleWidth = v.subtitle() == null
                ? 0
                : 4 + SectionAnnotations.TEXT_PX * v.subtitle().length();
        width = Math.max(width, Math.max(legendRight, Math.max(4 + 8 * v.title().length(), subtitleWidth)) + 8);
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

    /** The clear gap a drawn hook tail keeps from a bar it does not wrap, mm (see {@link SectionGeometry}). */
    static double clearance(BarSize stirrup) {
        return SectionGeometry.clearance(stirrup);
    }

    /** A length (mm) as written in the drawings: compact, with its unit. */
    static String len(double mm, UnitSystem u) {
        return u.compact(mm, Dim.LENGTH) + " " + u.unit(Dim.LENGTH);
    }
}
