package barfit.input;

/** A line of a {@code check} file: the line as {@code design} reads it and its bars as built. */
public record CheckLine(LineInput line, LineBars bars) {}
