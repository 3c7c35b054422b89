package barfit.section;

/** Span length (mm) and end conditions, for Table 9.3.1.1 and the effective flange width. */
public record Span(double length, EndCondition ends) {}
