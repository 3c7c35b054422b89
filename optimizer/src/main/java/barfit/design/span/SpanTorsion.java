package barfit.design.span;

/**
 * The factored torsion of a whole span (N·mm, magnitudes): at the critical sections d from the left and
 * right faces (9.4.4.2) and at mid-span ({@code mid}, 0 where a distributed torque falls to nothing there);
 * {@code compatibility} marks it as compatibility torsion, which 22.7.3.2 lets be reduced to φTcr.
 *
 * <p>Between those sections it varies linearly (a distributed torque); nearer a face than d it is taken at d.
 * From a line's torque envelope ({@code atFaces}) the values are those at the faces and mid clear span,
 * the line straight between them and taken at d nearer a face than d.
 * A stirrup zone is designed for the largest torsion within bt + d of it (bt the web width), so that its
 * closed stirrups and the longitudinal bars checked with it run bt + d past every point that needs them
 * (9.7.6.3.2, 9.7.5.3).
 */
public record SpanTorsion(double left, double mid, double right, boolean compatibility, boolean atFaces) {
    public SpanTorsion {
        if (left < 0 || mid < 0 || right < 0) {
            throw new IllegalArgumentException("torsion is given as magnitudes");
        }
    }

    /** Torsion given at the critical sections d from the faces. */
    public SpanTorsion(double left, double mid, double right, boolean compatibility) {
        this(left, mid, right, compatibility, false);
    }

    /** Whether any torsion is given. */
    public boolean any() {
        return left > 0 || mid > 0 || right > 0;
    }

    /** The torsion at {@code x} from the left face of a span {@code span} long, critical sections at d. */
    public double at(double span, double x, double d) {
        double half = 0.5 * span;
        double dd = Math.min(d, half - 1e-6);
        double xx = Math.min(Math.max(x, dd), span - dd);
        if (atFaces) {
            // a line's envelope: the values at the faces, straight to mid-span and taken at d near a face
            return xx <= half ? left + (mid - left) * xx / half : mid + (right - mid) * (xx - half) / half;
        }
        if (xx <= half) {
            return left + (mid - left) * (xx - dd) / (half - dd);
        }
        return mid + (right - mid) * (xx - half) / (half - dd);
    }

    /**
     * The design torsion of a zone from {@code from} to {@code to} in a web {@code bt} wide with effective
     * depth d: the largest within bt + d of the zone (the torsion line is straight between d, mid-span and
     * l − d, so its largest over a stretch is at an end of it or at one of those).
     */
    public double overZone(double span, double from, double to, double bt, double d) {
        double a = Math.max(0, from - bt - d);
        double b = Math.min(span, to + bt + d);
        double most = Math.max(at(span, a, d), at(span, b, d));
        double half = 0.5 * span;
        for (double x : new double[] {d, half, span - d}) {
            if (x > a && x < b) {
                most = Math.max(most, at(span, x, d));
            }
        }
        return most;
    }
}
