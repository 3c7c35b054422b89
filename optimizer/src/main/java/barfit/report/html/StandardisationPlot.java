package barfit.report.html;

import barfit.report.Money;
import barfit.schedule.ScheduleResult;
import barfit.units.UnitSystem;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.util.List;
import java.util.Locale;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.ViewBox;

/**
 * The price of standardisation as an SVG chart (JFreeChart drawn on JFreeSVG): the least total cost of
 * the schedule against the most section sizes allowed, each point labelled with its cost. The same
 * string serves as a file and inline in the HTML report: one {@code <svg>} element with a view box and
 * no XML prolog, fixed defs prefix so it is the same run to run. The unit system is taken like the other
 * plots take it, though this chart has only a count and money on its axes.
 */
public final class StandardisationPlot {
    static final double WIDTH = 720;
    static final double HEIGHT = 400;
    private static final Color LINE = new Color(0x1f, 0x4e, 0x79);
    private static final Color MARK = new Color(0xb0, 0x3a, 0x2e);

    private StandardisationPlot() {}

    public static String svg(List<ScheduleResult.StandardisationPoint> points, UnitSystem u, String currency) {
        return svg(points, u, currency, -1, null);
    }

    /** The schedule's plot: its chosen number of sizes marked, and what the curve leaves out said in a subtitle. */
    public static String svg(ScheduleResult r) {
        var rat = r.input().rationalise();
        UnitSystem u = r.input().settings().units();
        if (r.leastCarbon()) {
            // minimised for carbon: the curve is of carbon, in the user's mass unit
            List<ScheduleResult.StandardisationPoint> carbon = r.standardisation().stream()
                    .map(p -> new ScheduleResult.StandardisationPoint(
                            p.sizes(), barfit.report.Carbon.mass(p.cost(), u), p.status(), p.barSizes()))
                    .toList();
            return svg(
                    carbon,
                    u,
                    barfit.report.Carbon.unit(u),
                    r.sizes().size(),
                    rat == null ? null : rat.maxSectionSizes(),
                    true);
        }
        return svg(
                r.standardisation(),
                u,
                r.input().currency(),
                r.sizes().size(),
                rat == null ? null : rat.maxSectionSizes());
    }

    /**
     * {@code chosen}: the number of sizes of the schedule (marked; -1 for none); {@code limit}: the user's
     * max_section_sizes, so a curve that stops short of it can say why.
     */
    public static String svg(
            List<ScheduleResult.StandardisationPoint> points,
            UnitSystem u,
            String currency,
            int chosen,
            Integer limit) {
        return svg(points, u, currency, chosen, limit, false);
    }

    /** As above; {@code carbon}: the points are the least carbon (in {@code unit}), not the least cost. */
    private static String svg(
            List<ScheduleResult.StandardisationPoint> points,
            UnitSystem u,
            String currency,
            int chosen,
            Integer limit,
            boolean carbon) {
        System.setProperty("java.awt.headless", "true");
        String measure = carbon ? "carbon" : "cost";
        XYSeries cost = new XYSeries("least total " + measure);
        int kMin = Integer.MAX_VALUE;
        int kMax = Integer.MIN_VALUE;
        for (ScheduleResult.StandardisationPoint p : points) {
            kMin = Math.min(kMin, p.sizes());
            kMax = Math.max(kMax, p.sizes());
            if (Double.isFinite(p.cost())) {
                cost.add(p.sizes(), round(p.cost()));
            }
        }
        if (points.isEmpty()) {
            kMin = 1;
            kMax = 1;
        }
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(cost);
        XYSeries mark = new XYSeries("the schedule");
        for (ScheduleResult.StandardisationPoint p : points) {
            if (p.sizes() == chosen && Double.isFinite(p.cost())) {
                mark.add(p.sizes(), round(p.cost()));
            }
        }
        data.addSeries(mark);
        NumberAxis x = new NumberAxis("most section sizes allowed (K)");
        x.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        x.setRange(kMin - 0.5, kMax + 0.5);
        NumberAxis y = new NumberAxis((carbon ? "total carbon of the beams" : "total cost of the schedule")
                + (currency.isEmpty() ? "" : " (" + currency + ")"));
        y.setAutoRangeIncludesZero(false);
        // tick labels in a fixed locale, so the chart is the same on every machine
        y.setNumberFormatOverride(new DecimalFormat("0.##", DecimalFormatSymbols.getInstance(Locale.ROOT)));
        x.setNumberFormatOverride(new DecimalFormat("0", DecimalFormatSymbols.getInstance(Locale.ROOT)));
        y.setUpperMargin(0.15);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer();
        renderer.setSeriesPaint(0, LINE);
        renderer.setSeriesStroke(0, new BasicStroke(2.2f));
        renderer.setSeriesShape(0, new Ellipse2D.Double(-4, -4, 8, 8));
        renderer.setSeriesPaint(1, MARK);
        renderer.setSeriesLinesVisible(1, false);
        renderer.setSeriesShape(1, new Ellipse2D.Double(-7, -7, 14, 14));
        XYPlot plot = new XYPlot(data, x, y, renderer);
        plot.setSeriesRenderingOrder(org.jfree.chart.plot.SeriesRenderingOrder.FORWARD); // the mark on top
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(0xdd, 0xdd, 0xdd));
        plot.setRangeGridlinePaint(new Color(0xdd, 0xdd, 0xdd));
        for (ScheduleResult.StandardisationPoint p : points) {
            String text = !Double.isFinite(p.cost())
                    ? "none feasible"
                    : carbon ? barfit.report.Carbon.amount(p.cost()) : Money.amount(p.cost());
            double at = Double.isFinite(p.cost()) ? round(p.cost()) : Double.NaN;
            if (!Double.isFinite(at)) {
                continue;
            }
            // beside the point, clear of the line
            XYTextAnnotation note = new XYTextAnnotation("  " + text, p.sizes() + 0.04, at);
            note.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
            note.setTextAnchor(TextAnchor.BOTTOM_LEFT);
            plot.addAnnotation(note);
        }
        JFreeChart chart = new JFreeChart(null, new Font(Font.SANS_SERIF, Font.BOLD, 14), plot, false);
        chart.setTitle(new TextTitle(
                "Price of standardisation: least total " + measure + " against the number of section sizes",
                new Font(Font.SANS_SERIF, Font.BOLD, 14)));
        List<String> notes = new java.util.ArrayList<>();
        int lastInfeasible = points.stream()
                .filter(p -> !Double.isFinite(p.cost()))
                .mapToInt(ScheduleResult.StandardisationPoint::sizes)
                .max()
                .orElse(0);
        if (lastInfeasible > 0) {
            notes.add(
                    lastInfeasible == 1
                            ? "no schedule fits in one section size"
                            : "no schedule fits in " + lastInfeasible + " or fewer section sizes");
        }
        if (chosen > 0) {
            notes.add("red: the schedule (" + chosen + (chosen == 1 ? " size)" : " sizes)"));
        }
        if (limit != null && kMax < limit && !points.isEmpty()) {
            notes.add(
                    "with no limit the cheapest schedule uses " + kMax + " sizes: another would not pay for its forms");
        }
        for (String note : notes) {
            chart.addSubtitle(new TextTitle(note, new Font(Font.SANS_SERIF, Font.PLAIN, 11)));
        }
        chart.setBackgroundPaint(Color.WHITE);
        chart.setAntiAlias(true);
        SVGGraphics2D g = new SVGGraphics2D(WIDTH, HEIGHT);
        g.setDefsKeyPrefix("standardisation-"); // a fixed prefix keeps the file the same from run to run
        chart.draw(g, new Rectangle2D.Double(0, 0, WIDTH, HEIGHT));
        String svg = g.getSVGElement(null, true, new ViewBox(0, 0, WIDTH, HEIGHT), null, null);
        // nothing in the chart uses JFreeSVG's own namespace: drop it, so the only URIs left are SVG's and XLink's
        svg = svg.replace(" xmlns:jfreesvg='http://www.jfree.org/jfreesvg/svg'", "");
        return svg.replace("\r\n", "\n") + "\n";
    }

    /** Costs to cents, so the drawn points do not depend on the last bits of a sum. */
    private static double round(double v) {
        return Math.round(v * 100) / 100.0;
    }
}
