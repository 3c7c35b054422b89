package barfit.report.html;

import barfit.catalogs.BarSize;
import barfit.design.section.SectionLayout;
import barfit.report.html.SectionDrawing.DrawnLayer;
import barfit.report.html.SectionDrawing.View;
import barfit.section.BarLayer;
import barfit.section.Detailing;
import barfit.section.Face;
import barfit.section.Flange;
import barfit.section.SectionShape;
import barfit.section.SkinBars;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Where things sit in a section drawing, in mm from the web's top-left corner: the slab drawn beside the
 * web, every longitudinal and skin bar, the bars as circles and how far a hook's tail runs clear of them,
 * and the map from mm to the SVG's px.
 */
final class SectionGeometry {
    private SectionGeometry() {}

    /** mm in the section (from the web's top-left corner) to px in the SVG. */
    record Mm(double ox, double oy, double s) {
        double x(double mm) {
            return ox + mm * s;
        }

        double y(double mm) {
            return oy + mm * s;
        }

        /** A point (mm) as the "x,y" px text of an SVG path. */
        String p(double xMm, double yMm) {
            return Svg.px(x(xMm)) + "," + Svg.px(y(yMm));
        }
    }

    /** The length of slab drawn beyond a web face (mm): the slab is cut so the web stays large enough to read. */
    static double stub(SectionShape s) {
        Flange f = s.flange();
        if (f == null) {
            return 0;
        }
        double overhang = f.oneSided() ? f.width() - s.width() : (f.width() - s.width()) / 2;
        return Math.max(0, Math.min(overhang, Math.max(75, 0.25 * s.width())));
    }

    /** Whether the drawn slab is shorter than the effective flange (a break line is drawn). */
    static boolean slabCut(SectionShape s) {
        Flange f = s.flange();
        if (f == null) {
            return false;
        }
        double overhang = f.oneSided() ? f.width() - s.width() : (f.width() - s.width()) / 2;
        return overhang > stub(s) + 1e-9;
    }

    /**
     * Centres of the bars of one layer across the web, mm from the left face. The outer bars sit inside
     * the stirrup (cover + stirrup + db/2 from each side face, where the section model places them); the
     * rest are spread evenly between, as the clear-spacing check of 25.2.1 assumes for every layer.
     */
    static double[] xs(double width, Detailing det, BarLayer layer) {
        int n = layer.count();
        double db = layer.bar().diameter();
        double edge = det.cover() + det.stirrupBar().diameter() + db / 2;
        double[] x = new double[n];
        if (n == 1) {
            x[0] = width / 2;
            return x;
        }
        for (int i = 0; i < n; i++) {
            x[i] = edge + i * (width - 2 * edge) / (n - 1);
        }
        return x;
    }

    /** A bar layer placed: its layer, whether counted, and the centres (mm from the web's top-left corner). */
    record Placed(DrawnLayer drawn, double y, double[] x) {}

    static List<Placed> place(View v) {
        List<Placed> out = new ArrayList<>();
        double h = v.shape().height();
        for (Face face : Face.values()) {
            List<DrawnLayer> onFace = v.layers().stream()
                    .filter(l -> l.layer().face() == face)
                    .sorted(Comparator.comparingDouble(l -> l.layer().fromFace()))
                    .toList();
            for (DrawnLayer dl : onFace) {
                BarLayer bl = dl.layer();
                double[] x = xs(v.shape().width(), v.detailing(), bl);
                double y = face == Face.TOP ? bl.fromFace() : h - bl.fromFace();
                out.add(new Placed(dl, y, x));
            }
        }
        return out;
    }

    /** A circle in the section, mm: a bar's centre and radius. */
    record Circle(double x, double y, double r) {}

    /** Every longitudinal bar and skin bar drawn. */
    static List<Circle> circles(View v, List<Placed> placed) {
        List<Circle> out = new ArrayList<>();
        for (Placed pl : placed) {
            double rb = pl.drawn().layer().bar().diameter() / 2;
            for (double x : pl.x()) {
                out.add(new Circle(x, pl.y(), rb));
            }
        }
        if (v.skin() != null) {
            for (double[] c : skinCentres(v, placed)) {
                out.add(new Circle(c[0], c[1], v.skin().bar().diameter() / 2));
            }
        }
        return out;
    }

    /**
     * Skin bars (9.7.2.3) on both side faces, inside the stirrup legs, at their spacing from the layer
     * nearest the tension face over h/2, as the design rule places them.
     */
    static List<double[]> skinCentres(View v, List<Placed> placed) {
        List<double[]> out = new ArrayList<>();
        SkinBars skin = v.skin();
        if (skin == null) {
            return out;
        }
        double h = v.shape().height();
        int n = SectionLayout.skinBarsPerFace(h, skin.spacing());
        Face tension = v.bending().tensionFace();
        double y0 = tension == Face.BOTTOM
                ? h - v.detailing().firstLayerCentroid(skin.bar().diameter())
                : v.detailing().firstLayerCentroid(skin.bar().diameter());
        for (Placed pl : placed) {
            if (pl.drawn().layer().face() == tension) {
                y0 = pl.y();
                break;
            }
        }
        double edge = v.detailing().cover()
                + v.detailing().stirrupBar().diameter()
                + skin.bar().diameter() / 2;
        double sign = tension == Face.BOTTOM ? -1 : 1;
        for (int k = 1; k <= n; k++) {
            double y = y0 + sign * k * skin.spacing();
            out.add(new double[] {edge, y});
            out.add(new double[] {v.shape().width() - edge, y});
        }
        return out;
    }

    /**
     * How far a hook's tail may run from (x, y) along the unit vector (ux, uy), at most {@code ext}, before
     * its centreline comes within {@code rt} of a circle (rt: half the tail's thickness plus the clearance it
     * keeps). A circle the tail starts against and leaves is the bar the hook wraps.
     */
    static double tail(double x, double y, double ux, double uy, double ext, double rt, List<Circle> circles) {
        double len = ext;
        for (Circle c : circles) {
            double reach = c.r() + rt - 1e-6;
            double wx = x - c.x();
            double wy = y - c.y();
            double along = wx * ux + wy * uy;
            double gap = wx * wx + wy * wy - reach * reach;
            if (gap < 0) {
                if (along < -1e-6) {
                    len = 0;
                }
                continue;
            }
            double disc = along * along - gap;
            if (disc < 0 || along >= 0) {
                continue;
            }
            len = Math.min(len, Math.max(0, -along - Math.sqrt(disc)));
        }
        return len;
    }

    /**
     * The clear gap a drawn hook tail keeps from a bar it does not wrap, mm: half the stirrup's diameter, so
     * that a tail stopped by a bar reads as stopped short of it, not as touching it (drawing only).
     */
    static double clearance(BarSize stirrup) {
        return stirrup.diameter() / 2;
    }
}
