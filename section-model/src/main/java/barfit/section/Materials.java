package barfit.section;

/**
 * f'c, fy of the longitudinal bars, fyt of the stirrups (MPa), maximum aggregate size (mm) and the
 * lightweight factor lambda (1.0 for normal-weight concrete).
 */
public record Materials(double fc, double fy, double fyt, double aggregate, double lambda) {
    public Materials {
        if (!(fc > 0) || !(fy > 0) || !(fyt > 0) || !(aggregate > 0) || !(lambda > 0) || lambda > 1) {
            throw new IllegalArgumentException("materials need positive f'c, fy, fyt, aggregate and 0 < lambda <= 1");
        }
    }
}
