package barfit.report;

import java.util.ArrayList;
import java.util.List;

/**
 * A plain text table: columns padded to their widest cell; numeric columns right-aligned. A row may be
 * followed by free lines ({@link #under}) that do not count in the column widths.
 */
public final class TextTable {
    private final List<String[]> rows = new ArrayList<>();
    private final List<List<String>> under = new ArrayList<>();
    private final boolean[] right;

    public TextTable(boolean... rightAligned) {
        this.right = rightAligned;
    }

    public TextTable row(String... cells) {
        rows.add(cells);
        under.add(new ArrayList<>());
        return this;
    }

    /** A line printed under the last row, indented like the table, outside the columns. */
    public TextTable under(String line) {
        under.get(under.size() - 1).add(line);
        return this;
    }

    public void write(String indent, StringBuilder out) {
        int cols = right.length;
        int[] w = new int[cols];
        for (String[] r : rows) {
            for (int i = 0; i < cols && i < r.length; i++) {
                w[i] = Math.max(w[i], width(r[i]));
            }
        }
        for (int k = 0; k < rows.size(); k++) {
            String[] r = rows.get(k);
            StringBuilder line = new StringBuilder(indent);
            for (int i = 0; i < cols; i++) {
                String c = i < r.length && r[i] != null ? r[i] : "";
                int pad = w[i] - width(c);
                if (right[i]) {
                    line.append(" ".repeat(pad)).append(c);
                } else {
                    line.append(c).append(i == cols - 1 ? "" : " ".repeat(pad));
                }
                if (i < cols - 1) {
                    line.append("  ");
                }
            }
            out.append(line.toString().stripTrailing()).append('\n');
            for (String u : under.get(k)) {
                out.append((indent + u).stripTrailing()).append('\n');
            }
        }
    }

    private static int width(String s) {
        return s == null ? 0 : s.codePointCount(0, s.length());
    }
}
