package barfit.report;

import java.util.ArrayList;
import java.util.List;

/** A plain text table: columns padded to their widest cell; numeric columns right-aligned. */
public final class TextTable {
    private final List<String[]> rows = new ArrayList<>();
    private final boolean[] right;

    public TextTable(boolean... rightAligned) {
        this.right = rightAligned;
    }

    public TextTable row(String... cells) {
        rows.add(cells);
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
        for (String[] r : rows) {
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
        }
    }

    private static int width(String s) {
        return s == null ? 0 : s.codePointCount(0, s.length());
    }
}
