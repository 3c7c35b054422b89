package barfit.report;

import barfit.analysis.Line;
import barfit.analysis.LineResult;
import barfit.detailing.DetailedCapacity;
import barfit.detailing.LineDetail;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.function.ToDoubleFunction;

/**
 * The moment diagram under an elevation, on its horizontal scale: the factored envelope (largest and least
 * Mu over the load arrangements) and the design strength of the bars as detailed (+φMn of the bottom bars,
 * −φMn of the top bars), each series its own colour and dash; the worst Mu/φMn marked and said in words.
 */
final class ElevationMoments {
    /** px of the plot's height. */
    static final double HEIGHT = 250;

    private static final String GRID = "#e3e3e3";

    /** A series: its name, colour and dash (null: solid). */
    private record Series(String name, String colour, String dash) {}

    private static final Series MAX = new Series("Mu, largest", "#1f4e79", null);
    private static final Series MIN = new Series("Mu, least", "#b03a2e", "9 3");
    private static final Series SAG = new Series("+φMn, bottom bars as detailed", "#2e7d32", "3 3");
    private static final Series HOG = new Series("−φMn, top bars as detailed", "#7b1fa2", "10 3 2 3");

    private ElevationMoments() {}

    /** Draws the diagram from {@code top} (px) down; returns the px height the drawing needs in all. */
    static double draw(ElevationPen pen, ElevationSvg.Frame f, LineDetail d, UnitSystem u, double top) {
        Line line = d.line();
        List<LineResult.StationValues> stations = new ArrayList<>(d.analysis().stations());
        stations.sort(Comparator.comparingDouble(LineResult.StationValues::x));
        DetailedCapacity.Coverage cov = d.coverage();
        double lo = 0;
        double hi = 0;
        for (LineResult.StationValues s : stations) {
            lo = Math.min(lo, u.fromSI(s.mMin(), Dim.MOMENT));
            hi = Math.max(hi, u.fromSI(s.mMax(), Dim.MOMENT));
        }
        for (DetailedCapacity.Point p : cov.points()) {
            lo = Math.min(lo, -u.fromSI(p.phiMnHogging(), Dim.MOMENT));
            hi = Math.max(hi, u.fromSI(p.phiMnSagging(), Dim.MOMENT));
        }
        double step = nice((hi - lo) / 6);
        lo = Math.floor(lo / step - 1e-9) * step;
        hi = Math.ceil(hi / step + 1e-9) * step;
        double bottom = top + HEIGHT;
        double left = f.x(f.xMin());
        double right = f.x(f.xMax());
        final double low = lo;
        final double range = hi - lo;
        ToDoubleFunction<Double> y = m -> bottom - (u.fromSI(m, Dim.MOMENT) - low) / range * HEIGHT;

        // grid, axes, ticks
        for (int k = 0; lo + k * step <= hi + 1e-9; k++) {
            double v = lo + k * step;
            double py = bottom - (v - lo) / range * HEIGHT;
            pen.line(
                    left,
                    py,
                    right,
                    py,
                    "grid",
                    Math.abs(v) < 1e-9 ? "#000000" : GRID,
                    Math.abs(v) < 1e-9 ? 1 : 0.7,
                    null);
            pen.text(left - 6, py + 3.5, "end", "axis", number(v, step));
        }
        double perUnit = f.sx() * u.factor(Dim.SPAN); // px per m (ft)
        double xStep = nice(55 / perUnit);
        double first = u.fromSI(f.xMin(), Dim.SPAN);
        double last = u.fromSI(f.xMax(), Dim.SPAN);
        for (double v = Math.ceil(first / xStep - 1e-9) * xStep; v <= last + 1e-9; v += xStep) {
            double px = f.x(u.toSI(v, Dim.SPAN));
            pen.line(px, top, px, bottom, "grid", GRID, 0.7, null);
            pen.line(px, bottom, px, bottom + 5, "tick", ElevationSvg.INK, 1, null);
            pen.text(px, bottom + 16, "middle", "axis", number(v, xStep));
        }
        for (int j = 0; j <= line.spanCount(); j++) {
            double px = f.x(line.supportX(j));
            pen.line(px, top, px, bottom, "support-line", "#8a8a8a", 1, "4 4");
        }
        pen.rect(left, top, right - left, HEIGHT, "plot-frame", "none", "#9a9a9a");
        pen.text(
                (left + right) / 2,
                bottom + 33,
                "middle",
                "axis",
                "x along the line from the centre line of support 1 (" + u.unit(Dim.SPAN) + ")");
        pen.upright(left - 46, (top + bottom) / 2, "middle", "axis", "M (" + u.unit(Dim.MOMENT) + "), + sagging");

        // the four series
        List<double[]> maxPts = new ArrayList<>();
        List<double[]> minPts = new ArrayList<>();
        for (LineResult.StationValues s : stations) {
            maxPts.add(new double[] {s.x(), s.mMax()});
            minPts.add(new double[] {s.x(), s.mMin()});
        }
        List<double[]> sag = new ArrayList<>();
        List<double[]> hog = new ArrayList<>();
        for (DetailedCapacity.Point p : cov.points()) {
            sag.add(new double[] {p.x(), p.phiMnSagging()});
            hog.add(new double[] {p.x(), -p.phiMnHogging()});
        }
        curve(pen, f, y, maxPts, MAX, "envelope", null);
        curve(pen, f, y, minPts, MIN, "envelope", null);
        curve(pen, f, y, sag, SAG, "strength", line);
        curve(pen, f, y, hog, HOG, "strength", line);

        // the worst station
        String span = u.unit(Dim.SPAN);
        String verdict;
        if (Double.isNaN(cov.worstX())) {
            verdict = "No station between the supports' faces carries a factored moment.";
        } else {
            DetailedCapacity.Point worst = cov.points().stream()
                    .min(Comparator.comparingDouble(p -> Math.abs(p.x() - cov.worstX())))
                    .orElseThrow();
            boolean sagging = ratio(worst.mMax(), worst.phiMnSagging()) >= ratio(-worst.mMin(), worst.phiMnHogging());
            double m = sagging ? worst.mMax() : worst.mMin();
            double px = f.x(worst.x());
            double py = y.applyAsDouble(m);
            String colour = cov.covered() ? "#1b5e20" : "#b71c1c";
            pen.raw("<circle class=\"worst\" cx=\"" + ElevationPen.px(px) + "\" cy=\"" + ElevationPen.px(py)
                    + "\" r=\"5\" fill=\"none\" stroke=\"" + colour + "\" stroke-width=\"1.6\"/>\n");
            String ratio = Double.isInfinite(cov.worstRatio())
                    ? "no bar developed"
                    : String.format(Locale.ROOT, "%.2f", cov.worstRatio());
            pen.text(
                    Math.min(px + 8, right - 4 - ElevationPen.width("Mu/φMn " + ratio, 10)),
                    py + (sagging ? -8 : 14),
                    "start",
                    "axis halo",
                    "Mu/φMn " + ratio);
            String where = "x = " + u.number(worst.x(), Dim.SPAN) + " " + span;
            verdict = cov.covered()
                    ? "The bars as detailed cover the factored envelope at every station looked at: largest Mu/φMn "
                            + ratio + " at " + where + "."
                    : "The bars as detailed do NOT cover the factored envelope everywhere: largest Mu/φMn " + ratio
                            + " at " + where + ".";
        }
        double legendY = bottom + 54;
        legend(pen, left, legendY);
        pen.text(left, legendY + 24, "start", cov.covered() ? "verdict" : "verdict fails", verdict);
        pen.text(
                left,
                legendY + 40,
                "start",
                "note",
                "φMn at each station of the analysis from the bars present there, each bar's force built up from"
                        + " its ends over ld (over ldh from a hook's outside); stations inside a support's width are"
                        + " not looked at (sections designed at the faces, 9.4.2.1).");
        return legendY + 54;
    }

    /** Mu/φMn, 0 without a demand, infinite without a strength. */
    private static double ratio(double demand, double capacity) {
        if (demand <= 1e-6) {
            return 0;
        }
        return capacity <= 0 ? Double.POSITIVE_INFINITY : demand / capacity;
    }

    /**
     * A series as one path through its points in order; where {@code breakAt} is given, a new stretch
     * starts past each support's centre line (the strength is not looked at inside a support).
     */
    private static void curve(
            ElevationPen pen,
            ElevationSvg.Frame f,
            ToDoubleFunction<Double> y,
            List<double[]> pts,
            Series s,
            String cls,
            Line breakAt) {
        StringBuilder d = new StringBuilder();
        double prev = Double.NaN;
        for (double[] p : pts) {
            boolean jump = Double.isNaN(prev);
            if (!jump && breakAt != null) {
                for (int j = 0; j <= breakAt.spanCount(); j++) {
                    double c = breakAt.supportX(j);
                    jump |= prev < c && p[0] > c;
                }
            }
            d.append(jump ? (d.length() == 0 ? "M" : " M") : " L")
                    .append(ElevationPen.px(f.x(p[0])))
                    .append(' ')
                    .append(ElevationPen.px(y.applyAsDouble(p[1])));
            prev = p[0];
        }
        if (d.length() > 0) {
            pen.path(d.toString(), cls, s.colour(), 1.8, s.dash(), " stroke-linejoin=\"round\"");
        }
    }

    /** The four series, each with a sample of its line: colour and dash. */
    private static void legend(ElevationPen pen, double x, double y) {
        for (Series s : List.of(MAX, MIN, SAG, HOG)) {
            pen.line(x, y - 3.5, x + 34, y - 3.5, "legend", s.colour(), 2, s.dash());
            pen.text(x + 40, y, "start", "axis", s.name());
            x += 40 + ElevationPen.width(s.name(), 10) + 24;
        }
    }

    /** A round step for about a given size: 1, 2, 2.5 or 5 times a power of ten. */
    static double nice(double raw) {
        if (!(raw > 0)) {
            return 1;
        }
        double p = Math.pow(10, Math.floor(Math.log10(raw)));
        for (double m : new double[] {1, 2, 2.5, 5, 10}) {
            if (m * p >= raw - 1e-12) {
                return m * p;
            }
        }
        return 10 * p;
    }

    /** A tick's number with as many decimals as its step needs. */
    private static String number(double v, double step) {
        int decimals = 0;
        while (decimals < 3
                && Math.abs(step * Math.pow(10, decimals) - Math.rint(step * Math.pow(10, decimals))) > 1e-6) {
            decimals++;
        }
        String s = String.format(Locale.ROOT, "%." + decimals + "f", v + 0.0);
        return s.matches("-0(\\.0*)?") ? s.substring(1) : s;
    }
}
