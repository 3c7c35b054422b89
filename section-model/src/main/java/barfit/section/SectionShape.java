package barfit.section;

/** Concrete outline: web width, total height, optional top flange. mm. */
public record SectionShape(double width, double height, Flange flange) {
    public SectionShape {
        if (!(width > 0) || !(height > 0)) {
            throw new IllegalArgumentException("width and height must be positive");
        }
    }

    public static SectionShape rectangular(double width, double height) {
        return new SectionShape(width, height, null);
    }

    public boolean flanged() {
        return flange != null;
    }

    /** Gross area, mm². */
    public double grossArea() {
        double a = width * height;
        if (flange != null) {
            a += (flange.width() - width) * flange.thickness();
        }
        return a;
    }
}
