package barfit.report;

import java.util.ArrayList;
import java.util.List;

/**
 * The SVG the elevation is written with, by hand: coordinates in px with three decimals at most (the same
 * text on every run), text escaped, and labels spread along a row so they do not overlap.
 */
final class ElevationPen {
    /** Average width of a character of the drawing's sans-serif text, in font sizes (generous). */
    static final double CHAR = 0.6;

    private final StringBuilder out = new StringBuilder(64 * 1024);

    String text() {
        return out.toString();
    }

    ElevationPen raw(String s) {
        out.append(s);
        return this;
    }

    /** A coordinate in px as the report's other drawings write it. */
    static String px(double v) {
        return barfit.report.html.Svg.px(v);
    }

    static String esc(String s) {
        return barfit.report.html.Svg.esc(s);
    }

    /** The width a text takes at a font size, px (an estimate on the generous side). */
    static double width(String s, double size) {
        return s.length() * size * CHAR;
    }

    /** A line; {@code dash} null for a solid one. */
    void line(double x1, double y1, double x2, double y2, String cls, String stroke, double width, String dash) {
        out.append("<line class=\"")
                .append(cls)
                .append("\" x1=\"")
                .append(px(x1))
                .append("\" y1=\"")
                .append(px(y1))
                .append("\" x2=\"")
                .append(px(x2))
                .append("\" y2=\"")
                .append(px(y2))
                .append("\" stroke=\"")
                .append(stroke)
                .append("\" stroke-width=\"")
                .append(px(width))
                .append('"');
        if (dash != null) {
            out.append(" stroke-dasharray=\"").append(dash).append('"');
        }
        out.append("/>\n");
    }

    /** A path with no fill; {@code extra} more attributes written as given (or empty). */
    void path(String d, String cls, String stroke, double width, String dash, String extra) {
        out.append("<path class=\"")
                .append(cls)
                .append("\" d=\"")
                .append(d)
                .append("\" fill=\"none\" stroke=\"")
                .append(stroke)
                .append("\" stroke-width=\"")
                .append(px(width))
                .append('"');
        if (dash != null) {
            out.append(" stroke-dasharray=\"").append(dash).append('"');
        }
        out.append(extra).append("/>\n");
    }

    void rect(double x, double y, double w, double h, String cls, String fill, String stroke) {
        out.append("<rect class=\"")
                .append(cls)
                .append("\" x=\"")
                .append(px(x))
                .append("\" y=\"")
                .append(px(y))
                .append("\" width=\"")
                .append(px(w))
                .append("\" height=\"")
                .append(px(h))
                .append("\" fill=\"")
                .append(fill)
                .append("\" stroke=\"")
                .append(stroke)
                .append("\" stroke-width=\"0.8\"/>\n");
    }

    /**
     * A text at (x, y), {@code anchor} start, middle or end; {@code cls} names a class of the style sheet
     * (size, weight, colour, halo).
     */
    void text(double x, double y, String anchor, String cls, String s) {
        out.append("<text class=\"")
                .append(cls)
                .append("\" x=\"")
                .append(px(x))
                .append("\" y=\"")
                .append(px(y))
                .append('"');
        if (!"start".equals(anchor)) {
            out.append(" text-anchor=\"").append(anchor).append('"');
        }
        out.append('>').append(esc(s)).append("</text>\n");
    }

    /** A text turned to read upwards, its baseline's start at (x, y) ({@code anchor} as for {@link #text}). */
    void upright(double x, double y, String anchor, String cls, String s) {
        out.append("<text class=\"")
                .append(cls)
                .append("\" transform=\"translate(")
                .append(px(x))
                .append(' ')
                .append(px(y))
                .append(") rotate(-90)\"");
        if (!"start".equals(anchor)) {
            out.append(" text-anchor=\"").append(anchor).append('"');
        }
        out.append('>').append(esc(s)).append("</text>\n");
    }

    /**
     * Centres for labels along a row, as near as they can be to the centres asked ({@code want}, in order
     * along the row) with {@code gap} px between neighbours and all within [lo, hi]: neighbours that would
     * overlap are joined into a block centred on the mean of what its labels asked, until none overlaps.
     */
    static double[] spread(double[] want, double[] widths, double gap, double lo, double hi) {
        int n = want.length;
        List<int[]> blocks = new ArrayList<>(); // [first, last] label of each block
        List<Double> starts = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            blocks.add(new int[] {i, i});
            starts.add(blockStart(want, widths, gap, i, i, lo, hi));
            while (blocks.size() > 1) {
                int k = blocks.size() - 1;
                int[] prev = blocks.get(k - 1);
                int[] last = blocks.get(k);
                double prevEnd = starts.get(k - 1) + blockWidth(widths, gap, prev[0], prev[1]);
                if (prevEnd + gap <= starts.get(k) + 1e-9) {
                    break;
                }
                int[] joined = {prev[0], last[1]};
                blocks.remove(k);
                starts.remove(k);
                blocks.set(k - 1, joined);
                starts.set(k - 1, blockStart(want, widths, gap, joined[0], joined[1], lo, hi));
            }
        }
        double[] out = new double[n];
        for (int b = 0; b < blocks.size(); b++) {
            double x = starts.get(b);
            for (int i = blocks.get(b)[0]; i <= blocks.get(b)[1]; i++) {
                out[i] = x + widths[i] / 2;
                x += widths[i] + gap;
            }
        }
        return out;
    }

    private static double blockWidth(double[] widths, double gap, int from, int to) {
        double w = 0;
        for (int i = from; i <= to; i++) {
            w += widths[i] + (i > from ? gap : 0);
        }
        return w;
    }

    /** The start of a block of labels that puts them, on average, where they asked; kept within [lo, hi]. */
    private static double blockStart(
            double[] want, double[] widths, double gap, int from, int to, double lo, double hi) {
        double offset = 0;
        double sum = 0;
        for (int i = from; i <= to; i++) {
            sum += want[i] - (offset + widths[i] / 2);
            offset += widths[i] + gap;
        }
        double start = sum / (to - from + 1);
        double w = blockWidth(widths, gap, from, to);
        return Math.max(lo, Math.min(start, hi - w));
    }
}
