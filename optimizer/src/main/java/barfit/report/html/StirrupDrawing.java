package barfit.report.html;

import barfit.catalogs.BarSize;
import barfit.report.html.CrosstieLegs.HookEnd;
import barfit.report.html.CrosstieLegs.TieLeg;
import barfit.report.html.SectionDrawing.View;
import barfit.report.html.SectionGeometry.Circle;
import barfit.report.html.SectionGeometry.Mm;
import barfit.report.html.SectionGeometry.Placed;
import barfit.section.StirrupHooks;
import barfit.section.Stirrups;
import java.util.List;

/**
 * The stirrup of a section drawing as SVG paths: the closed hoop, the two 135-degree hooks that close it
 * at the corner where their tails run furthest, and each crosstie with its hooks, tails cut short where a
 * bar or another leg is in the way.
 */
final class StirrupDrawing {
    private static final String STIRRUP = "#3d6d99";

    private StirrupDrawing() {}

    /**
     * The stirrup along its centreline, stroke = its diameter: a closed hoop with corners bent to the
     * inside diameter of Table 25.3.2 and both ends finished at one corner with 135-degree hooks whose
     * straight extension is 6 db, at least 75 mm (Table 25.3.2). Legs beyond two are crossties with a
     * 135-degree hook at each end, as the cost model prices them. Returns whether a tail is drawn short.
     */
    static boolean draw(StringBuilder out, View v, Mm m, List<Placed> placed) {
        Stirrups st = v.stirrups();
        if (st == null) {
            return false;
        }
        BarSize bar = st.bar();
        double ds = bar.diameter();
        double b = v.shape().width();
        double h = v.shape().height();
        double e = v.detailing().cover() + ds / 2;
        double r = StirrupHooks.insideBendDiameter(bar) / 2 + ds / 2;
        double ext = StirrupHooks.extension135(bar, v.code());
        String stroke = "fill=\"none\" stroke=\"" + STIRRUP + "\" stroke-width=\"" + Svg.px(ds * m.s()) + "\"";
        String rr = Svg.px(r * m.s());
        StringBuilder d = new StringBuilder();
        d.append('M').append(m.p(e + r, e));
        d.append(" L").append(m.p(b - e - r, e));
        d.append(" A").append(rr).append(',').append(rr).append(" 0 0 1 ").append(m.p(b - e, e + r));
        d.append(" L").append(m.p(b - e, h - e - r));
        d.append(" A").append(rr).append(',').append(rr).append(" 0 0 1 ").append(m.p(b - e - r, h - e));
        d.append(" L").append(m.p(e + r, h - e));
        d.append(" A").append(rr).append(',').append(rr).append(" 0 0 1 ").append(m.p(e, h - e - r));
        d.append(" L").append(m.p(e, e + r));
        d.append(" A").append(rr).append(',').append(rr).append(" 0 0 1 ").append(m.p(e + r, e));
        out.append("<path class=\"stirrup\" d=\"")
                .append(d)
                .append("\" ")
                .append(stroke)
                .append(" stroke-linejoin=\"round\"/>\n");
        // the two hook ends close the hoop at one corner: each turns 135 degrees round the corner and runs into
        // the core along the diagonal; the corner is the first (top-left, top-right, bottom-left, bottom-right)
        // where both tails run their full extension clear of every bar (a second layer close under a corner
        // bar is in the way of the tails there), else the one where the shorter tail runs furthest
        List<Circle> circles = SectionGeometry.circles(v, placed);
        double rt = ds / 2 + SectionGeometry.clearance(bar);
        List<TieLeg> legs = CrosstieLegs.place(v, placed, e);
        List<Double> legXs = legs.stream().map(TieLeg::x).toList();
        Corner corner = null;
        for (int[] c : new int[][] {{-1, -1}, {1, -1}, {-1, 1}, {1, 1}}) {
            Corner k = Corner.of(c[0], c[1], b, h, e, r, ext, rt, circles, legXs, ds);
            if (corner == null || k.shortest() > corner.shortest() + 1e-9) {
                corner = k;
            }
            if (k.shortest() >= ext - 1e-9) {
                corner = k;
                break;
            }
        }
        StringBuilder hooks = new StringBuilder();
        corner.path(hooks, m, rr);
        out.append("<path class=\"stirrup hook\" data-corner=\"")
                .append(corner.name())
                .append("\" d=\"")
                .append(hooks)
                .append("\" ")
                .append(stroke)
                .append(" stroke-linecap=\"butt\"/>\n");
        boolean shortened = corner.shortest() < ext - 1e-6;
        for (int i = 0; i < legs.size(); i++) {
            TieLeg leg = legs.get(i);
            // down the leg, with a 135-degree hook at each end round the bar it wraps (or over the hoop)
            HookEnd top = leg.end(true, v, e, r, circles);
            HookEnd bottom = leg.end(false, v, e, r, circles);
            // a tail stops halfway to the next leg so two tails never meet
            double leftLimit = (i == 0 ? e : (legs.get(i - 1).x() + leg.x()) / 2);
            double rightLimit = (i == legs.size() - 1 ? b - e : (legs.get(i + 1).x() + leg.x()) / 2);
            double tTop = Math.min(
                    SectionGeometry.tail(top.ex(), top.ey(), top.ux(), top.uy(), ext, rt, circles),
                    reach(top, leftLimit, rightLimit, rt));
            double tBottom = Math.min(
                    SectionGeometry.tail(bottom.ex(), bottom.ey(), bottom.ux(), bottom.uy(), ext, rt, circles),
                    reach(bottom, leftLimit, rightLimit, rt));
            shortened |= Math.min(tTop, tBottom) < ext - 1e-6;
            String rTop = Svg.px(top.radius() * m.s());
            String rBottom = Svg.px(bottom.radius() * m.s());
            StringBuilder t = new StringBuilder();
            t.append('M').append(m.p(top.ex() + tTop * top.ux(), top.ey() + tTop * top.uy()));
            t.append(" L").append(m.p(top.ex(), top.ey()));
            t.append(" A")
                    .append(rTop)
                    .append(',')
                    .append(rTop)
                    .append(" 0 0 ")
                    .append(top.side() > 0 ? 0 : 1)
                    .append(' ')
                    .append(m.p(leg.x(), top.y()));
            t.append(" L").append(m.p(leg.x(), bottom.y()));
            t.append(" A")
                    .append(rBottom)
                    .append(',')
                    .append(rBottom)
                    .append(" 0 0 ")
                    .append(bottom.side() > 0 ? 0 : 1)
                    .append(' ')
                    .append(m.p(bottom.ex(), bottom.ey()));
            t.append(" L").append(m.p(bottom.ex() + tBottom * bottom.ux(), bottom.ey() + tBottom * bottom.uy()));
            out.append("<path class=\"stirrup tie\" d=\"")
                    .append(t)
                    .append("\" ")
                    .append(stroke)
                    .append(" stroke-linecap=\"butt\"/>\n");
        }
        return shortened;
    }

    /**
     * The corner where the hoop closes, as drawn: {@code sx} -1 at the left face, +1 at the right; {@code sy}
     * -1 at the top, +1 at the bottom. (cx, cy) is the centre of the hoop's bend there, r its centreline
     * radius; the hook from the side leg ends its bend at (ax, ay), the one from the top or bottom leg at
     * (bx, by), and both tails run along (ux, uy) into the core, {@code ta} and {@code tb} long.
     */
    record Corner(
            int sx,
            int sy,
            double cx,
            double cy,
            double r,
            double ax,
            double ay,
            double bx,
            double by,
            double ux,
            double uy,
            double ta,
            double tb) {
        static Corner of(
                int sx,
                int sy,
                double b,
                double h,
                double e,
                double r,
                double ext,
                double rt,
                List<Circle> circles,
                List<Double> legXs,
                double ds) {
            double k = Math.sqrt(0.5);
            double cx = sx < 0 ? e + r : b - e - r;
            double cy = sy < 0 ? e + r : h - e - r;
            double ux = -sx * k;
            double uy = -sy * k;
            // from the side leg: the bend ends on the side of the diagonal nearer the side face, and the other way
            double ax = cx + sx * r * k;
            double ay = cy - sy * r * k;
            double bx = cx - sx * r * k;
            double by = cy + sy * r * k;
            // a tail also stops short of a crosstie's leg, a bar of the stirrup's own diameter
            double ta = Math.min(
                    SectionGeometry.tail(ax, ay, ux, uy, ext, rt, circles), beforeLegs(ax, ux, rt + ds / 2, legXs));
            double tb = Math.min(
                    SectionGeometry.tail(bx, by, ux, uy, ext, rt, circles), beforeLegs(bx, ux, rt + ds / 2, legXs));
            return new Corner(sx, sy, cx, cy, r, ax, ay, bx, by, ux, uy, ta, tb);
        }

        /** How far along (ux, ·) from x a tail runs before its centreline comes within {@code gap} of a leg. */
        private static double beforeLegs(double x, double ux, double gap, List<Double> legXs) {
            double len = Double.POSITIVE_INFINITY;
            for (double lx : legXs) {
                double ahead = (lx - x) * Math.signum(ux);
                if (ahead > 0) {
                    len = Math.min(len, Math.max(0, (ahead - gap) / Math.abs(ux)));
                }
            }
            return len;
        }

        double shortest() {
            return Math.min(ta, tb);
        }

        String name() {
            return (sy < 0 ? "top" : "bottom") + "-" + (sx < 0 ? "left" : "right");
        }

        /** Both hooks: from the end of the hoop's straight leg round the bend, then the tail. */
        void path(StringBuilder d, Mm m, String rr) {
            // mirrored corners turn the other way: the sweep flag follows the number of mirrors
            int flip = sx * sy > 0 ? 0 : 1;
            d.append('M')
                    .append(m.p(cx + sx * r, cy))
                    .append(" A")
                    .append(rr)
                    .append(',')
                    .append(rr)
                    .append(" 0 0 ")
                    .append(flip)
                    .append(' ')
                    .append(m.p(ax, ay))
                    .append(" L")
                    .append(m.p(ax + ta * ux, ay + ta * uy));
            d.append(" M")
                    .append(m.p(cx, cy + sy * r))
                    .append(" A")
                    .append(rr)
                    .append(',')
                    .append(rr)
                    .append(" 0 0 ")
                    .append(1 - flip)
                    .append(' ')
                    .append(m.p(bx, by))
                    .append(" L")
                    .append(m.p(bx + tb * ux, by + tb * uy));
        }
    }

    /** How far a tail may run before its edge reaches x = left or x = right. */
    private static double reach(HookEnd hk, double left, double right, double rt) {
        double limit = hk.ux() > 0 ? right - rt - hk.ex() : hk.ex() - rt - left;
        return Math.max(0, limit / Math.abs(hk.ux()));
    }
}
