package barfit.section;

/** Support conditions of a span, with the Table 9.3.1.1 minimum-depth divisor for fy = 420 MPa. */
public enum EndCondition {
    SIMPLE("simple", "simply supported", 16.0),
    ONE_END_CONTINUOUS("one-end-continuous", "one end continuous", 18.5),
    BOTH_ENDS_CONTINUOUS("both-ends-continuous", "both ends continuous", 21.0),
    CANTILEVER("cantilever", "cantilever", 8.0);

    private final String key;
    private final String words;
    private final double minDepthDivisor;

    EndCondition(String key, String words, double minDepthDivisor) {
        this.key = key;
        this.words = words;
        this.minDepthDivisor = minDepthDivisor;
    }

    public String key() {
        return key;
    }

    public String words() {
        return words;
    }

    /** Table 9.3.1.1: h_min = span / divisor, for normal-weight concrete and fy = 420 MPa. */
    public double minDepthDivisor() {
        return minDepthDivisor;
    }

    /** Whether the span is statically determinate (simple span or cantilever). */
    public boolean determinate() {
        return this == SIMPLE || this == CANTILEVER;
    }

    public static EndCondition byKey(String key) {
        for (EndCondition e : values()) {
            if (e.key.equals(key)) {
                return e;
            }
        }
        return null;
    }
}
