package barfit.design.span;

import java.util.List;

/**
 * One frame's options, which the CP-SAT model chooses among, and the cheapest passing combination a plain
 * enumeration of them found ({@code best}, infinite and {@code bestLayout} null if none).
 */
public record FrameOptions(
        SpanFrame frame,
        List<TopOption> tops,
        List<MidOption> mids,
        List<SupportOption> lefts,
        List<SupportOption> rights,
        double best,
        SpanLayout bestLayout) {}
