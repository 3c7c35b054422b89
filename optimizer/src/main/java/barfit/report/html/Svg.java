package barfit.report.html;

import barfit.units.FixedDecimals;

/** Number and text formatting shared by the SVG drawings and the page: fixed decimals, Locale.ROOT. */
public final class Svg {
    static final String NS = "http://www.w3.org/2000/svg";

    private Svg() {}

    /** A coordinate in px with three decimals, trailing zeros dropped (stable text, fine enough for 0.01 px). */
    public static String px(double v) {
        String s = FixedDecimals.of(v + 0.0, 3);
        if (s.indexOf('.') >= 0) {
            s = trimZeros(s);
        }
        return s.equals("-0") ? "0" : s;
    }

    /** The decimal without trailing zeros after its point, nor the point when nothing follows it. */
    static String trimZeros(String s) {
        int end = s.length();
        while (end > 0 && s.charAt(end - 1) == '0') {
            end--;
        }
        if (end > 0 && s.charAt(end - 1) == '.') {
            end--;
        }
        return s.substring(0, end);
    }

    /** Escapes text for HTML and SVG content and attribute values. */
    public static String esc(String s) {
        if (s == null) {
            return "";
        }
        StringBuilder sb = new StringBuilder(s.length() + 8);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '&' -> sb.append("&amp;");
                case '<' -> sb.append("&lt;");
                case '>' -> sb.append("&gt;");
                case '"' -> sb.append("&quot;");
                case '\'' -> sb.append("&#39;");
                default -> sb.append(c);
            }
        }
        return sb.toString();
    }

    /** A text element; {@code anchor} is start, middle or end. */
    static void text(StringBuilder out, double x, double y, String anchor, String cls, String content) {
        out.append("<text x=\"").append(px(x)).append("\" y=\"").append(px(y)).append('"');
        if (!"start".equals(anchor)) {
            out.append(" text-anchor=\"").append(anchor).append('"');
        }
        if (cls != null) {
            out.append(" class=\"").append(cls).append('"');
        }
        out.append('>').append(esc(content)).append("</text>\n");
    }

    /** A line with its stroke colour and width, dashed when {@code dash} is not null. */
    static void line(
            StringBuilder out,
            double x1,
            double y1,
            double x2,
            double y2,
            String cls,
            String colour,
            double width,
            String dash) {
        out.append("<line x1=\"")
                .append(px(x1))
                .append("\" y1=\"")
                .append(px(y1))
                .append("\" x2=\"")
                .append(px(x2))
                .append("\" y2=\"")
                .append(px(y2))
                .append("\" class=\"")
                .append(cls)
                .append("\" stroke=\"")
                .append(colour)
                .append("\" stroke-width=\"")
                .append(px(width))
                .append('"');
        if (dash != null) {
            out.append(" stroke-dasharray=\"").append(dash).append('"');
        }
        out.append("/>\n");
    }

    /** A strain with its sign and five decimals, e.g. "+0.01234" or "−0.00210". */
    static String strain(double e) {
        String s = FixedDecimals.of(Math.abs(e), 5);
        if (s.equals("0.00000")) {
            return s;
        }
        return (e < 0 ? "\u2212" : "+") + s;
    }
}
