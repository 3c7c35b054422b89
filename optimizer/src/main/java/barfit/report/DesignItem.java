package barfit.report;

import barfit.design.section.DesignOutcome;
import barfit.design.span.SpanDesigner;

/**
 * One beam's answer: a single section's or a whole span's (exactly one is set); a span or overhang of a
 * beam line designed from its analysis also says which line and part it is ({@code line}, else null).
 */
public record DesignItem(DesignOutcome section, SpanDesigner.Outcome whole, LinePart line) {
    /**
     * Where a whole span came from: its line, which part, and how many rounds of analysis and design it took;
     * {@code undesigned} names the line's parts that have no design (the analysis kept its first estimate
     * of their sections); {@code held} when the sections alternated and every part was held at the largest;
     * {@code oneSection} how a line of one set of forms was designed (null for span by span); {@code supports}
     * the top bars over each support (null where none); {@code withoutRedistribution} what the line
     * costs with none where the search chose the redistribution (infinite where it has no design with none),
     * else NaN; {@code lineCost} the sum of the parts' costs (NaN where a part has no design); {@code detail}
     * the line detailed bar by bar, on its last part only (null elsewhere, or where it cannot be detailed).
     */
    public record LinePart(
            String line,
            String part,
            boolean first,
            int spans,
            int rounds,
            boolean settled,
            java.util.List<Double> asked,
            java.util.List<Double> used,
            java.util.List<Double> epsT,
            java.util.List<String> undesigned,
            boolean held,
            barfit.design.line.LineSpans.OneSection oneSection,
            java.util.List<barfit.design.line.LineSpans.SupportBars> supports,
            double withoutRedistribution,
            double lineCost,
            barfit.detailing.LineDetail detail) {
        /** Whether the search chose the redistribution at each support (else it was lowered to what is allowed). */
        public boolean chosen() {
            return !Double.isNaN(withoutRedistribution);
        }
    }

    public boolean feasible() {
        return section != null ? section.feasible() : whole.feasible();
    }

    public static DesignItem of(DesignOutcome o) {
        return new DesignItem(o, null, null);
    }

    public static DesignItem of(SpanDesigner.Outcome o) {
        return new DesignItem(null, o, null);
    }

    public static DesignItem of(SpanDesigner.Outcome o, LinePart line) {
        return new DesignItem(null, o, line);
    }
}
