package barfit.section;

/**
 * The ranges of material properties the section model is used within, in MPa: the least f'c of Table
 * 19.2.1.1, the greatest fy of Table 20.2.2.4(a) for flexural bars ({@link CodeEquations#fyMax}), and λ of
 * 19.2.4. The greatest f'c and the greatest fyt are barfit's own range checks of the input, not clauses.
 */
public final class MaterialLimits {
    /** λ of 19.2.4: 0.75 (all-lightweight concrete) to 1.0 (normal weight). */
    public static final double LAMBDA_MIN = 0.75;

    public static final double LAMBDA_MAX = 1.0;

    private MaterialLimits() {}

    /** The least specified compressive strength, Table 19.2.1.1: 17 MPa (ACI 318M-19), 2500 psi (ACI 318-19). */
    public static double fcMin(CodeEquations code) {
        return code.inchPound() ? 2500 / CodeEquations.PSI_PER_MPA : 17;
    }

    /** The greatest f'c barfit accepts (no clause): 140 MPa, or 20 000 psi in inch-pound input. */
    public static double fcMax(CodeEquations code) {
        return code.inchPound() ? 20_000 / CodeEquations.PSI_PER_MPA : 140;
    }

    /**
     * The greatest stirrup fyt barfit accepts (a range check of the input, no clause): 690 MPa, or
     * 100 000 psi, the highest grade Table 20.2.2.4(a) lists for any transverse reinforcement (confinement;
     * from memory). Shear takes fyt at most at its own limit of that table ({@link CodeEquations}), so a
     * higher grade given is allowed but not counted.
     */
    public static double fytMax(CodeEquations code) {
        return code.inchPound() ? 100_000 / CodeEquations.PSI_PER_MPA : 690;
    }
}
