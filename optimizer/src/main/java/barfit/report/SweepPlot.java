package barfit.report;

import barfit.section.trail.Dim;
import barfit.study.Sweep;
import barfit.units.UnitSystem;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import java.util.Locale;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;

/**
 * The cost–depth frontier as an SVG chart (JFreeChart drawn on JFreeSVG): the cheapest cost at each
 * depth cap, the caps that need compression steel shaded, the shallowest feasible cap and the cap below
 * which compression steel is needed marked, and the design the {@code design} command would choose.
 */
public final class SweepPlot {
    private static final Color FRONTIER = new Color(0x1f, 0x4e, 0x79);
    private static final Color DOUBLY = new Color(0xf2, 0xd7, 0xa6);
    private static final Color SINGLY = new Color(0xdc, 0xea, 0xd5);
    private static final Color CHOSEN = new Color(0xb0, 0x3a, 0x2e);
    private static final Color CLEAR = new Color(255, 255, 255, 0);

    private SweepPlot() {}

    public static String svg(Sweep.Result r, UnitSystem u, String currency, boolean perBeam) {
        return svg(r, u, currency, perBeam, null);
    }

    /** As above, with the headroom cap in force ({@code cap}, mm; null for none) drawn as a line. */
    public static String svg(Sweep.Result r, UnitSystem u, String currency, boolean perBeam, Double cap) {
        System.setProperty("java.awt.headless", "true");
        XYSeries frontier = new XYSeries("cheapest design at the cap");
        XYSeries needing = new XYSeries("layout with compression steel beyond the hangers");
        for (Sweep.Point p : r.points()) {
            if (p.summary().feasible()) {
                double cost = cost(p.summary().cost().total(), u, perBeam);
                frontier.add(u.fromSI(p.cap(), Dim.LENGTH), cost);
                if (p.summary().compressionUsed()) {
                    needing.add(u.fromSI(p.cap(), Dim.LENGTH), cost);
                }
            }
        }
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(frontier);
        data.addSeries(needing);
        XYSeries chosen = new XYSeries("chosen by design");
        if (r.chosen().feasible()) {
            chosen.add(
                    u.fromSI(r.chosenCap(), Dim.LENGTH), cost(r.chosen().cost().total(), u, perBeam));
        }
        data.addSeries(chosen);

        String len = u.unit(Dim.LENGTH);
        NumberAxis x = new NumberAxis("depth cap (" + len + ")");
        x.setAutoRangeIncludesZero(false);
        x.setRange(
                u.fromSI(r.points().get(0).cap(), Dim.LENGTH) - 5 * (u == UnitSystem.US ? 0.2 : 1),
                u.fromSI(r.points().get(r.points().size() - 1).cap(), Dim.LENGTH) + 5 * (u == UnitSystem.US ? 0.2 : 1));
        NumberAxis y = new NumberAxis("cost " + (perBeam ? "of the beam" : Money.perLengthLabel(u))
                + (currency.isEmpty() ? "" : " (" + currency + ")"));
        y.setAutoRangeIncludesZero(false);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer();
        renderer.setSeriesPaint(0, FRONTIER);
        renderer.setSeriesStroke(0, new BasicStroke(2.2f));
        renderer.setSeriesShape(0, new Ellipse2D.Double(-3, -3, 6, 6));
        renderer.setSeriesLinesVisible(1, false);
        renderer.setSeriesPaint(1, new Color(0xc0, 0x7a, 0x00));
        renderer.setSeriesShape(1, new Rectangle2D.Double(-4, -4, 8, 8));
        renderer.setSeriesLinesVisible(2, false);
        renderer.setSeriesPaint(2, CHOSEN);
        renderer.setSeriesShape(2, new Ellipse2D.Double(-7, -7, 14, 14));
        XYPlot plot = new XYPlot(data, x, y, renderer);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(0xdd, 0xdd, 0xdd));
        plot.setRangeGridlinePaint(new Color(0xdd, 0xdd, 0xdd));

        double first = u.fromSI(r.points().get(0).cap(), Dim.LENGTH);
        double last = u.fromSI(r.points().get(r.points().size() - 1).cap(), Dim.LENGTH);
        if (r.compression().equals("below")) {
            double split = u.fromSI(r.compressionNeededBelow(), Dim.LENGTH);
            double from = r.shallowestFeasible() == null ? first : u.fromSI(r.shallowestFeasible(), Dim.LENGTH);
            if (split > from) {
                IntervalMarker doubly = new IntervalMarker(from, split, DOUBLY);
                doubly.setLabel("compression steel needed");
                doubly.setLabelBackgroundColor(CLEAR);
                doubly.setLabelAnchor(RectangleAnchor.TOP_LEFT);
                doubly.setLabelTextAnchor(TextAnchor.TOP_LEFT);
                doubly.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
                plot.addDomainMarker(doubly, Layer.BACKGROUND);
            }
            IntervalMarker singly = new IntervalMarker(split, last, SINGLY);
            singly.setLabel("the minimum hangers can suffice");
            singly.setLabelBackgroundColor(CLEAR);
            singly.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
            singly.setLabelTextAnchor(TextAnchor.TOP_RIGHT);
            singly.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
            plot.addDomainMarker(singly, Layer.BACKGROUND);
        } else {
            boolean everywhere = r.compression().equals("everywhere");
            IntervalMarker whole = new IntervalMarker(first, last, everywhere ? DOUBLY : SINGLY);
            whole.setLabel(
                    everywhere
                            ? "compression steel needed at every cap"
                            : "the minimum hangers can suffice " + "wherever a design passes");
            whole.setLabelBackgroundColor(CLEAR);
            whole.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
            whole.setLabelTextAnchor(TextAnchor.TOP_RIGHT);
            whole.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
            plot.addDomainMarker(whole, Layer.BACKGROUND);
        }
        if (r.shallowestFeasible() != null) {
            ValueMarker shallow = new ValueMarker(
                    u.fromSI(r.shallowestFeasible(), Dim.LENGTH),
                    Color.GRAY,
                    new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f, new float[] {4f, 4f}, 0f));
            shallow.setLabel("shallowest feasible");
            shallow.setLabelBackgroundColor(CLEAR);
            double firstCap = first;
            double shallowAt = u.fromSI(r.shallowestFeasible(), Dim.LENGTH);
            if (shallowAt > firstCap) {
                IntervalMarker none = new IntervalMarker(firstCap, shallowAt, new Color(0xe4, 0xe4, 0xe4));
                none.setLabel("nothing passes");
                none.setLabelBackgroundColor(CLEAR);
                none.setLabelAnchor(RectangleAnchor.CENTER);
                none.setLabelTextAnchor(TextAnchor.CENTER);
                none.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
                plot.addDomainMarker(none, Layer.BACKGROUND);
            }
            shallow.setLabelAnchor(RectangleAnchor.BOTTOM_RIGHT);
            shallow.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
            shallow.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
            plot.addDomainMarker(shallow);
        }
        if (cap != null) {
            ValueMarker capLine = new ValueMarker(u.fromSI(cap, Dim.LENGTH), CHOSEN, new BasicStroke(1.5f));
            capLine.setLabel("headroom cap " + u.compact(cap, Dim.LENGTH) + " " + len);
            capLine.setLabelBackgroundColor(CLEAR);
            capLine.setLabelPaint(CHOSEN);
            capLine.setLabelAnchor(RectangleAnchor.BOTTOM_LEFT);
            capLine.setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
            capLine.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
            plot.addDomainMarker(capLine);
        }
        if (r.chosen().feasible()) {
            // keep the label inside the plot: to the right of the point in the left half, to the left in the
            // right half; below it in the upper half of the costs, above it in the lower half
            double cx = u.fromSI(r.chosenCap(), Dim.LENGTH);
            double cy = cost(r.chosen().cost().total(), u, perBeam);
            double lo = frontier.isEmpty() ? cy : Math.min(cy, frontier.getMinY());
            double hi = frontier.isEmpty() ? cy : Math.max(cy, frontier.getMaxY());
            boolean right = cx <= (first + last) / 2;
            boolean below = cy >= (lo + hi) / 2;
            double dx = 0.012 * Math.max(last - first, 1e-9) * (right ? 1 : -1);
            double dy = 0.03 * Math.max(hi - lo, Math.abs(cy) * 1e-3 + 1e-9) * (below ? -1 : 1);
            XYTextAnnotation note = new XYTextAnnotation(
                    "design: " + u.compact(r.chosen().width(), Dim.LENGTH) + " × "
                            + u.compact(r.chosen().height(), Dim.LENGTH),
                    cx + dx,
                    cy + dy);
            note.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 11));
            note.setPaint(CHOSEN);
            note.setTextAnchor(
                    below
                            ? (right ? TextAnchor.TOP_LEFT : TextAnchor.TOP_RIGHT)
                            : (right ? TextAnchor.BOTTOM_LEFT : TextAnchor.BOTTOM_RIGHT));
            plot.addAnnotation(note);
        }
        JFreeChart chart = new JFreeChart(null, new Font(Font.SANS_SERIF, Font.BOLD, 14), plot, true);
        chart.setTitle(new TextTitle(
                "Beam " + r.id() + ": cheapest design against the depth cap",
                new Font(Font.SANS_SERIF, Font.BOLD, 14)));
        chart.setBackgroundPaint(Color.WHITE);
        chart.setAntiAlias(true);
        SVGGraphics2D g = new SVGGraphics2D(800, 480);
        g.setDefsKeyPrefix("sweep-"); // a fixed prefix keeps the file the same from run to run
        chart.draw(g, new Rectangle2D.Double(0, 0, 800, 480));
        return g.getSVGDocument().replace("\r\n", "\n") + "\n";
    }

    private static double cost(double perMetreOrBeam, UnitSystem u, boolean perBeam) {
        double v = perBeam ? perMetreOrBeam : Money.perLength(perMetreOrBeam, u);
        return Double.parseDouble(String.format(Locale.ROOT, "%.2f", v));
    }
}
