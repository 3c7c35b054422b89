package barfit.detailing;

/** The shape a bar is bent to, in plain words (the bending schedule's "shape" column). */
public enum BarShape {
    STRAIGHT("straight"),
    ONE_END_HOOKED("one end hooked"),
    BOTH_ENDS_HOOKED("both ends hooked"),
    HOOP("closed hoop"),
    CROSSTIE("crosstie");

    private final String words;

    BarShape(String words) {
        this.words = words;
    }

    public String words() {
        return words;
    }

    /** A longitudinal bar's shape from its hooked ends. */
    public static BarShape of(boolean hookStart, boolean hookEnd) {
        if (hookStart && hookEnd) {
            return BOTH_ENDS_HOOKED;
        }
        return hookStart || hookEnd ? ONE_END_HOOKED : STRAIGHT;
    }
}
