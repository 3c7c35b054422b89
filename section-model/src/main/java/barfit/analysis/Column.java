package barfit.analysis;

/** A column above or below a support: its section b × h (h along the line) and storey height, mm. */
public record Column(double b, double h, double height) {
    public Column {
        if (!(b > 0) || !(h > 0) || !(height > 0)) {
            throw new IllegalArgumentException("a column needs a positive width, depth and height");
        }
    }

    /** Gross moment of inertia about the axis bending with the beam, mm⁴. */
    public double grossInertia() {
        return b * h * h * h / 12;
    }
}
