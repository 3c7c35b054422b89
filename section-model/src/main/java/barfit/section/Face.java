package barfit.section;

/** A face of the beam. Layers are counted from their face inward. */
public enum Face {
    TOP,
    BOTTOM;

    public Face opposite() {
        return this == TOP ? BOTTOM : TOP;
    }

    public String word() {
        return this == TOP ? "top" : "bottom";
    }
}
