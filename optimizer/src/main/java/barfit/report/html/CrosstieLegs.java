package barfit.report.html;

import barfit.catalogs.BarSize;
import barfit.report.html.SectionDrawing.View;
import barfit.report.html.SectionGeometry.Circle;
import barfit.report.html.SectionGeometry.Placed;
import barfit.section.BarLayer;
import barfit.section.Face;
import barfit.section.StirrupHooks;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Where a section drawing's crosstie legs stand (the stirrup legs beyond two) and how each end's
 * 135-degree hook bends: round the bar the leg touches, or over the hoop clear of the bars beside it.
 */
final class CrosstieLegs {
    private CrosstieLegs() {}

    /**
     * One end of a crosstie: the leg stops at y, bends 135 degrees towards {@code side} (+1 right) with
     * centreline radius {@code radius} and leaves at (ex, ey) along (ux, uy).
     */
    record HookEnd(double y, double side, double radius, double ex, double ey, double ux, double uy) {}

    /**
     * A crosstie leg: the x of its centreline (mm) and the bar each end wraps, or null where no bar of
     * that face's outer layer touches the leg and the hook goes over the hoop.
     */
    record TieLeg(double x, Circle top, Circle bottom) {
        HookEnd end(boolean atTop, View v, double e, double hoopRadius, List<Circle> all) {
            double ds = v.stirrups().bar().diameter();
            double b = v.shape().width();
            double h = v.shape().height();
            Circle bar = atTop ? top : bottom;
            if (bar != null) {
                // drawn tight round the bar, so the leg stays against it
                return hook(atTop, Math.signum(bar.x() - x), bar.r() + ds / 2, bar.x(), bar.y());
            }
            // over the hoop: turned towards the core, or away from it, or bent tighter, whichever first
            // keeps the drawing's clearance from the bars beside the leg; failing all, the one that keeps furthest
            double in = x < b / 2 ? 1 : -1;
            double keep = SectionGeometry.clearance(v.stirrups().bar());
            HookEnd best = null;
            double bestMargin = Double.NEGATIVE_INFINITY;
            for (double rad = hoopRadius; rad >= ds - 1e-9; rad -= ds / 4) {
                for (double sd : new double[] {in, -in}) {
                    double cy = atTop ? e + rad : h - e - rad;
                    HookEnd hk = hook(atTop, sd, rad, x + sd * rad, cy);
                    double margin = arcMargin(atTop, hk, all, ds / 2);
                    if (margin >= keep - 1e-6) {
                        return hk;
                    }
                    if (margin > bestMargin + 1e-9) {
                        best = hk;
                        bestMargin = margin;
                    }
                }
            }
            return best;
        }

        private HookEnd hook(boolean atTop, double side, double radius, double cx, double cy) {
            double k = Math.sqrt(0.5);
            double v1 = atTop ? -1 : 1;
            return new HookEnd(cy, side, radius, cx + radius * side * k, cy + radius * v1 * k, side * k, -v1 * k);
        }

        /** The least clear distance from a hook's bend, from the leg round 135 degrees, to any bar. */
        private double arcMargin(boolean atTop, HookEnd hk, List<Circle> all, double rt) {
            double cx = x + hk.side() * hk.radius();
            double a0 = hk.side() > 0 ? Math.PI : 0;
            double sweep = (atTop ? hk.side() : -hk.side()) * 0.75 * Math.PI;
            double margin = Double.POSITIVE_INFINITY;
            for (int i = 0; i <= 24; i++) {
                double a = a0 + sweep * i / 24;
                double px = cx + hk.radius() * Math.cos(a);
                double py = hk.y() + hk.radius() * Math.sin(a);
                for (Circle c : all) {
                    margin = Math.min(margin, Math.hypot(px - c.x(), py - c.y()) - c.r() - rt);
                }
            }
            return margin;
        }
    }

    /**
     * The crosstie legs (the legs beyond two), each vertical and beside bars, never through one: it
     * touches an interior bar of the tension face's outer layer, one roughly at each third (quarter...)
     * point of the width and just outside it, mirrored about the centre line. Where that layer has too
     * few interior bars the outer layer of the other face is used, and failing both the leg stands at its
     * even position, moved clear of every bar.
     */
    static List<TieLeg> place(View v, List<Placed> placed, double e) {
        int ties = v.stirrups().legs() - 2;
        List<TieLeg> out = new ArrayList<>();
        if (ties <= 0) {
            return out;
        }
        double b = v.shape().width();
        double rt = v.stirrups().bar().diameter() / 2;
        List<Circle> all = SectionGeometry.circles(v, placed);
        Face tension = v.bending().tensionFace();
        Face other = tension == Face.TOP ? Face.BOTTOM : Face.TOP;
        List<Circle> first = interior(outerLayer(placed, tension));
        List<Circle> second = interior(outerLayer(placed, other));
        List<Circle> otherOuter = layerCircles(outerLayer(placed, other));
        List<Circle> topOuter = layerCircles(outerLayer(placed, Face.TOP));
        List<Circle> bottomOuter = layerCircles(outerLayer(placed, Face.BOTTOM));
        // how far the shorter of a leg's two hook tails would run, for choosing the side of a bar a leg takes
        BarSize bar = v.stirrups().bar();
        double hoopR = StirrupHooks.insideBendDiameter(bar) / 2 + rt;
        double ext = StirrupHooks.extension135(bar, v.code());
        double keep = rt + SectionGeometry.clearance(bar);
        java.util.function.DoubleUnaryOperator tails = x -> {
            TieLeg leg = new TieLeg(x, touching(x, topOuter, rt), touching(x, bottomOuter, rt));
            HookEnd t = leg.end(true, v, e, hoopR, all);
            HookEnd d = leg.end(false, v, e, hoopR, all);
            return Math.min(
                    SectionGeometry.tail(t.ex(), t.ey(), t.ux(), t.uy(), ext, keep, all),
                    SectionGeometry.tail(d.ex(), d.ey(), d.ux(), d.uy(), ext, keep, all));
        };
        List<Double> xs = new ArrayList<>();
        List<Circle> used = new ArrayList<>();
        double lo = e + 2 * rt;
        for (int k = 1; k <= ties / 2; k++) {
            double target = e + (b - 2 * e) * k / (ties + 1);
            Double x = pick(target, first, otherOuter, all, used, lo, b / 2 - rt, b, rt, tails, ext);
            if (x == null) {
                x = pick(target, second, List.of(), all, used, lo, b / 2 - rt, b, rt, tails, ext);
            }
            if (x == null) {
                x = nudge(target, all, lo, b / 2 - rt, rt);
            }
            xs.add(x);
            xs.add(b - x);
            lo = x + 2 * rt;
        }
        if (ties % 2 != 0) {
            Double x = pick(b / 2, first, otherOuter, all, used, lo, b - lo, b, rt, tails, ext);
            if (x == null) {
                x = pick(b / 2, second, List.of(), all, used, lo, b - lo, b, rt, tails, ext);
            }
            if (x == null) {
                x = nudge(b / 2, all, lo, b - lo, rt);
            }
            xs.add(x);
        }
        xs.sort(Double::compare);
        for (double x : xs) {
            out.add(new TieLeg(x, touching(x, topOuter, rt), touching(x, bottomOuter, rt)));
        }
        return out;
    }

    /** The layer nearest a face, or null. */
    private static Placed outerLayer(List<Placed> placed, Face face) {
        Placed best = null;
        for (Placed pl : placed) {
            BarLayer bl = pl.drawn().layer();
            if (bl.face() == face
                    && (best == null || bl.fromFace() < best.drawn().layer().fromFace())) {
                best = pl;
            }
        }
        return best;
    }

    private static List<Circle> layerCircles(Placed pl) {
        List<Circle> out = new ArrayList<>();
        if (pl != null) {
            for (double x : pl.x()) {
                out.add(new Circle(x, pl.y(), pl.drawn().layer().bar().diameter() / 2));
            }
        }
        return out;
    }

    /** The bars of a layer other than its two corner bars. */
    private static List<Circle> interior(Placed pl) {
        List<Circle> all = layerCircles(pl);
        return all.size() <= 2 ? List.of() : all.subList(1, all.size() - 1);
    }

    /** Whether a leg at x is clear of every bar (touching allowed). */
    private static boolean clear(double x, List<Circle> all, double rt) {
        for (Circle c : all) {
            if (Math.abs(c.x() - x) < c.r() + rt - 1e-6) {
                return false;
            }
        }
        return true;
    }

    /** The bar of a layer that a leg at x touches, or null. */
    private static Circle touching(double x, List<Circle> layer, double rt) {
        for (Circle c : layer) {
            if (Math.abs(Math.abs(c.x() - x) - (c.r() + rt)) < 1e-6) {
                return c;
            }
        }
        return null;
    }

    /**
     * A leg position in [lo, hi] beside an unused bar of {@code bars}, the bar nearest the target first;
     * of its two sides, the one whose hooks' tails run their full extension {@code ext} (by {@code tails}),
     * else the one where the shorter runs furthest; between equals, one that also touches a bar of the other
     * face first, then the one nearer the side face (so the hook's tail turns into the core).
     */
    private static Double pick(
            double target,
            List<Circle> bars,
            List<Circle> otherFace,
            List<Circle> all,
            List<Circle> used,
            double lo,
            double hi,
            double b,
            double rt,
            java.util.function.DoubleUnaryOperator tails,
            double ext) {
        List<Circle> order = new ArrayList<>(bars);
        order.sort(Comparator.comparingDouble(c -> Math.abs(c.x() - target)));
        for (Circle c : order) {
            if (used.contains(c)) {
                continue;
            }
            double out = c.x() <= b / 2 ? -1 : 1;
            double[] sides = {c.x() + out * (c.r() + rt), c.x() - out * (c.r() + rt)};
            if (touching(sides[1], otherFace, rt) != null && touching(sides[0], otherFace, rt) == null) {
                sides = new double[] {sides[1], sides[0]};
            }
            Double best = null;
            double bestTail = -1;
            for (double x : sides) {
                if (x >= lo - 1e-9 && x <= hi + 1e-9 && clear(x, all, rt)) {
                    double t = Math.min(ext, tails.applyAsDouble(x));
                    if (t > bestTail + 1e-9) {
                        best = x;
                        bestTail = t;
                    }
                }
            }
            if (best != null) {
                used.add(c);
                return best;
            }
        }
        return null;
    }

    /** The clear position in [lo, hi] nearest the target: the target itself or just beside a bar. */
    private static double nudge(double target, List<Circle> all, double lo, double hi, double rt) {
        List<Double> options = new ArrayList<>();
        options.add(target);
        for (Circle c : all) {
            options.add(c.x() - c.r() - rt);
            options.add(c.x() + c.r() + rt);
        }
        double best = target;
        double dist = Double.POSITIVE_INFINITY;
        for (double x : options) {
            if (x >= lo - 1e-9 && x <= hi + 1e-9 && clear(x, all, rt) && Math.abs(x - target) < dist) {
                best = x;
                dist = Math.abs(x - target);
            }
        }
        return best;
    }
}
