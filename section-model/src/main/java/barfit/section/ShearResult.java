package barfit.section;

/**
 * One-way shear of a section (22.5): forces N, lengths mm. {@code vcRow} names the row of Table
 * 22.5.5.1 used; {@code avMin} is for the stirrup spacing given (0 without stirrups).
 */
public record ShearResult(double vu, double bw, double d, double rhoW, double lambdaS, double vc, String vcRow,
        double vs, double phiVn, double vnLimit, double avMin, double av, double minShearTrigger,
        double sMaxAlong, double sMaxAcross, boolean highShear) {
}
