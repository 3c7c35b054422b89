package barfit.report;

import barfit.analysis.LineResult;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.geom.Rectangle2D;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;

/**
 * A line's factored moment and shear envelopes, one above the other on the same x (JFreeChart drawn on
 * JFreeSVG, as the sweep plot): the largest and least values over the load arrangements, with the
 * supports' centre lines marked.
 */
public final class EnvelopePlot {
    private static final Color MAX = new Color(0x1f, 0x4e, 0x79);
    private static final Color MIN = new Color(0xb0, 0x3a, 0x2e);
    private static final Color SUPPORT = new Color(0x88, 0x88, 0x88);

    private EnvelopePlot() {}

    public static String svg(LineResult r, String id, UnitSystem u) {
        System.setProperty("java.awt.headless", "true");
        XYSeries mMax = new XYSeries("M, largest", false);
        XYSeries mMin = new XYSeries("M, least", false);
        XYSeries vMax = new XYSeries("V, largest", false);
        XYSeries vMin = new XYSeries("V, least", false);
        for (LineResult.StationValues s : r.stations()) {
            double x = u.fromSI(s.x(), Dim.SPAN);
            mMax.add(x, u.fromSI(s.mMax(), Dim.MOMENT));
            mMin.add(x, u.fromSI(s.mMin(), Dim.MOMENT));
            vMax.add(x, u.fromSI(s.vMax(), Dim.FORCE));
            vMin.add(x, u.fromSI(s.vMin(), Dim.FORCE));
        }
        XYPlot moments = plot("M (" + u.unit(Dim.MOMENT) + "), + sagging", mMax, mMin);
        XYPlot shears = plot("V (" + u.unit(Dim.FORCE) + ")", vMax, vMin);
        markSupports(r, u, moments, shears);
        CombinedDomainXYPlot combined = new CombinedDomainXYPlot(xAxis(u));
        combined.setGap(12);
        combined.add(moments, 3);
        combined.add(shears, 2);
        JFreeChart chart = new JFreeChart(null, new Font(Font.SANS_SERIF, Font.BOLD, 14), combined, true);
        chart.setTitle(new TextTitle(
                "Line " + id + ": factored moment and shear envelopes", new Font(Font.SANS_SERIF, Font.BOLD, 14)));
        return draw(chart, "envelope-", 640);
    }

    private static final Color CAPACITY = new Color(0x2e, 0x7d, 0x32);
    /** The second strength series (the top bars'), told apart from the first by colour and dash. */
    private static final Color CAPACITY_TOP = new Color(0x7b, 0x1f, 0xa2);

    /**
     * A designed line's moment envelope with the design strength its bars provide drawn over it on the
     * same scale: +φMn of the bottom bars in each span, −φMn of the top bars over each support and of the
     * continuous top bars between (steps where bars end), the supports' centre lines marked.
     */
    public static String capacitySvg(
            LineResult r, barfit.design.line.LineCapacity.Diagram cap, String id, UnitSystem u) {
        System.setProperty("java.awt.headless", "true");
        XYSeries mMax = new XYSeries("M, largest", false);
        XYSeries mMin = new XYSeries("M, least", false);
        for (LineResult.StationValues s : r.stations()) {
            double x = u.fromSI(s.x(), Dim.SPAN);
            mMax.add(x, u.fromSI(s.mMax(), Dim.MOMENT));
            mMin.add(x, u.fromSI(s.mMin(), Dim.MOMENT));
        }
        XYPlot p = plot(
                "M and φMn (" + u.unit(Dim.MOMENT) + "), + sagging",
                mMax,
                mMin,
                steps("φMn, bottom bars", cap.sagging(), 1, u),
                steps("−φMn, top bars", cap.hogging(), -1, u));
        markSupports(r, u, p);
        p.setDomainAxis(xAxis(u));
        JFreeChart chart = new JFreeChart(null, new Font(Font.SANS_SERIF, Font.BOLD, 14), p, true);
        chart.setTitle(new TextTitle(
                "Line " + id + ": factored moment envelope and the φMn of the bars as designed",
                new Font(Font.SANS_SERIF, Font.BOLD, 14)));
        chart.addSubtitle(new TextTitle(
                "supports' centre lines dashed; sections at columns and fixed supports are designed at their faces"
                        + " (9.4.2.1), so over a support's width the envelope may pass the strength drawn",
                new Font(Font.SANS_SERIF, Font.PLAIN, 11)));
        return draw(chart, "capacity-", 520);
    }

    /** The supports' centre lines, dashed, on each plot. */
    private static void markSupports(LineResult r, UnitSystem u, XYPlot... plots) {
        for (int j = 0; j <= r.line().spanCount(); j++) {
            double x = u.fromSI(r.line().supportX(j), Dim.SPAN);
            for (XYPlot p : plots) {
                p.addDomainMarker(new ValueMarker(
                        x,
                        SUPPORT,
                        new BasicStroke(
                                1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f, new float[] {4f, 4f}, 0f)));
            }
        }
    }

    private static NumberAxis xAxis(UnitSystem u) {
        NumberAxis x =
                new NumberAxis("x along the line from the first support's centre line (" + u.unit(Dim.SPAN) + ")");
        x.setAutoRangeIncludesZero(false);
        return x;
    }

    /** The chart as SVG, 900 px wide; a fixed defs prefix keeps the file the same from run to run. */
    private static String draw(JFreeChart chart, String prefix, int height) {
        chart.setBackgroundPaint(Color.WHITE);
        chart.setAntiAlias(true);
        SVGGraphics2D g = new SVGGraphics2D(900, height);
        g.setDefsKeyPrefix(prefix);
        chart.draw(g, new Rectangle2D.Double(0, 0, 900, height));
        return g.getSVGDocument().replace("\r\n", "\n") + "\n";
    }

    /** Stretches as a step line, a gap between stretches that do not meet. */
    private static XYSeries steps(
            String name, java.util.List<barfit.design.line.LineCapacity.Stretch> stretches, int sign, UnitSystem u) {
        XYSeries out = new XYSeries(name, false);
        java.util.List<barfit.design.line.LineCapacity.Stretch> sorted = new java.util.ArrayList<>(stretches);
        sorted.sort(java.util.Comparator.comparingDouble(barfit.design.line.LineCapacity.Stretch::from));
        Double lastTo = null;
        for (var st : sorted) {
            if (lastTo != null && st.from() > lastTo + 1) {
                out.add(u.fromSI((lastTo + st.from()) / 2, Dim.SPAN), (Number) null);
            }
            double v = sign * u.fromSI(st.phiMn(), Dim.MOMENT);
            out.add(u.fromSI(st.from(), Dim.SPAN), v);
            out.add(u.fromSI(st.to(), Dim.SPAN), v);
            lastTo = st.to();
        }
        return out;
    }

    /**
     * A plot of the largest and least values (solid) and any further series (the strength, dashed), with the
     * zero line.
     */
    private static XYPlot plot(String label, XYSeries hi, XYSeries lo, XYSeries... more) {
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(hi);
        data.addSeries(lo);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        renderer.setSeriesPaint(0, MAX);
        renderer.setSeriesPaint(1, MIN);
        renderer.setSeriesStroke(0, new BasicStroke(2f));
        renderer.setSeriesStroke(1, new BasicStroke(2f));
        BasicStroke dashed =
                new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f, new float[] {7f, 4f}, 0f);
        BasicStroke dotDashed = new BasicStroke(
                2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f, new float[] {10f, 3f, 2f, 3f}, 0f);
        for (int i = 0; i < more.length; i++) {
            data.addSeries(more[i]);
            renderer.setSeriesPaint(2 + i, i % 2 == 0 ? CAPACITY : CAPACITY_TOP);
            renderer.setSeriesStroke(2 + i, i % 2 == 0 ? dashed : dotDashed);
        }
        NumberAxis y = new NumberAxis(label);
        XYPlot p = new XYPlot(data, null, y, renderer);
        p.setBackgroundPaint(Color.WHITE);
        p.setDomainGridlinePaint(new Color(0xdd, 0xdd, 0xdd));
        p.setRangeGridlinePaint(new Color(0xdd, 0xdd, 0xdd));
        p.addRangeMarker(new ValueMarker(0, Color.BLACK, new BasicStroke(0.8f)));
        return p;
    }
}
