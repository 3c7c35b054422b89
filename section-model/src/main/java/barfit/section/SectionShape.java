package barfit.section;

/**
 * Concrete outline: web width, total height, optional top flange. mm. The flange is held at its
 * effective width on this web (Table 6.3.2.1, {@link Flange#on}), whatever width it was given, so every
 * analysis of the section uses that width.
 */
public record SectionShape(double width, double height, Flange flange) {
    public SectionShape {
        if (!(width > 0) || !(height > 0)) {
            throw new IllegalArgumentException("width and height must be positive");
        }
        if (flange != null) {
            flange = flange.on(width);
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
