package barfit.analysis;

/** One support of a line: its width along the line (mm), its kind, and the columns that frame into it. */
public record Support(double width, SupportKind kind, Column below, Column above) {
    public Support {
        if (!(width >= 0)) {
            throw new IllegalArgumentException("a support width is zero or more");
        }
        if (kind == SupportKind.COLUMN && below == null && above == null) {
            throw new IllegalArgumentException("a column support needs a column below or above");
        }
    }
}
