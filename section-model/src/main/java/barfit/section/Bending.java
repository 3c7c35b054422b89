package barfit.section;

/** Sagging: bottom face in tension (positive Mu). Hogging: top face in tension (negative Mu). */
public enum Bending {
    SAGGING,
    HOGGING;

    public static Bending of(double mu) {
        return mu < 0 ? HOGGING : SAGGING;
    }

    public Face tensionFace() {
        return this == SAGGING ? Face.BOTTOM : Face.TOP;
    }

    public Face compressionFace() {
        return tensionFace().opposite();
    }

    public String word() {
        return this == SAGGING ? "sagging" : "hogging";
    }
}
