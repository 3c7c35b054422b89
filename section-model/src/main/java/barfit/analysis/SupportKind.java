package barfit.analysis;

/**
 * How a support holds the beam line. Every kind holds it vertically; a column restrains rotation by its
 * own stiffness (far ends fixed, as ACI 318-19 6.4.1 / 6.3.1 permit for gravity analysis of a floor), a
 * fixed support fully; a knife edge and a wall let the beam rotate freely.
 */
public enum SupportKind {
    COLUMN("column"),
    KNIFE_EDGE("knife-edge"),
    WALL("wall"),
    FIXED("fixed");

    private final String word;

    SupportKind(String word) {
        this.word = word;
    }

    public String word() {
        return word;
    }

    /** Built integrally with the beam: moments are taken at its faces (9.4.2.1), else at its centre line. */
    public boolean integral() {
        return this == COLUMN || this == FIXED;
    }
}
