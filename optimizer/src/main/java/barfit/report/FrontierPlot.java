package barfit.report;

import barfit.units.UnitSystem;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import java.util.Locale;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;

/**
 * A section's cost-carbon frontier as an SVG chart (JFreeChart drawn on JFreeSVG, as {@link SweepPlot}):
 * carbon per length across, cost per length up, one point per design, the cheapest and the lowest-carbon
 * ends marked.
 */
public final class FrontierPlot {
    private static final Color FRONTIER = new Color(0x2e, 0x6b, 0x3a);
    private static final Color END = new Color(0xb0, 0x3a, 0x2e);

    private FrontierPlot() {}

    public static String svg(FrontierReport.Entry r, UnitSystem u, String currency) {
        XYSeries line = new XYSeries("the frontier: no design is both cheaper and lower in carbon", false, true);
        XYSeries ends = new XYSeries("the cheapest and the lowest-carbon designs", false, true);
        for (FrontierReport.Row pt : r.rows()) {
            line.add(round(pt.carbon()), round(pt.cost()));
        }
        if (!r.rows().isEmpty()) {
            ends.add(round(r.rows().get(0).carbon()), round(r.rows().get(0).cost()));
            var last = r.rows().get(r.rows().size() - 1);
            ends.add(round(last.carbon()), round(last.cost()));
        }
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(line);
        data.addSeries(ends);
        NumberAxis x = new NumberAxis("embodied carbon, " + r.carbonBasis(u) + " (" + Carbon.STAGES + ")");
        x.setAutoRangeIncludesZero(false);
        NumberAxis y = new NumberAxis("cost " + r.costBasis(u) + (currency.isEmpty() ? "" : " (" + currency + ")"));
        y.setAutoRangeIncludesZero(false);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer();
        renderer.setSeriesPaint(0, FRONTIER);
        renderer.setSeriesStroke(0, new BasicStroke(2.0f));
        renderer.setSeriesShape(0, new Ellipse2D.Double(-3.5, -3.5, 7, 7));
        renderer.setSeriesLinesVisible(1, false);
        renderer.setSeriesPaint(1, END);
        renderer.setSeriesShape(1, new Ellipse2D.Double(-7, -7, 14, 14));
        XYPlot plot = new XYPlot(data, x, y, renderer);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(0xdd, 0xdd, 0xdd));
        plot.setRangeGridlinePaint(new Color(0xdd, 0xdd, 0xdd));
        JFreeChart chart = new JFreeChart(null, new Font(Font.SANS_SERIF, Font.BOLD, 14), plot, true);
        chart.setBackgroundPaint(Color.WHITE);
        chart.setTitle(
                new TextTitle(r.title() + ": cost against embodied carbon", new Font(Font.SANS_SERIF, Font.BOLD, 14)));
        SVGGraphics2D g = new SVGGraphics2D(800, 480);
        g.setDefsKeyPrefix("frontier-"); // a fixed prefix keeps the file the same from run to run
        chart.draw(g, new Rectangle2D.Double(0, 0, 800, 480));
        return g.getSVGDocument().replace("\r\n", "\n") + "\n";
    }

    private static double round(double v) {
        return Double.parseDouble(String.format(Locale.ROOT, "%.2f", v));
    }
}
