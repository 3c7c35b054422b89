package barfit.section;

/** Exposure classes of Table 20.5.1.3.1 for cast-in-place nonprestressed beams. */
public enum Exposure {
    /** Not exposed to weather or in contact with ground. */
    INTERIOR("interior"),
    /** Exposed to weather or in contact with ground. */
    WEATHER("weather"),
    /** Cast against and permanently in contact with ground. */
    GROUND("ground");

    private final String key;

    Exposure(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }
}
