package barfit.section;

/** Tabulated factors of ACI 318-19 used across the checks. */
public final class CodeTables {
    /** Maximum usable strain at the extreme concrete compression fibre (22.2.2.1). */
    public static final double EPS_CU = 0.003;
    /** Minimum net tensile strain of a nonprestressed beam (9.3.3.1). */
    public static final double EPS_T_MIN_BEAM = 0.004;
    /** Strength reduction factor for shear (Table 21.2.1(b)). */
    public static final double PHI_SHEAR = 0.75;
    /** The equivalent block's uniform stress over f'c (22.2.2.4.1). */
    public static final double BLOCK_STRESS = 0.85;
    /** φ for moment, tension-controlled (Table 21.2.2): the largest it can be. */
    public static final double PHI_TENSION_CONTROLLED = 0.90;
    /** φ for moment, compression-controlled with other (tied) transverse reinforcement (Table 21.2.2). */
    public static final double PHI_COMPRESSION_CONTROLLED = 0.65;

    private CodeTables() {}

    /** beta1 of Table 22.2.2.4.3, with the breakpoints of the user's edition. */
    public static double beta1(double fc, CodeEquations code) {
        if (fc <= code.beta1FcLow()) {
            return 0.85;
        }
        if (fc >= code.beta1FcHigh()) {
            return 0.65;
        }
        return 0.85 - 0.05 * (fc - code.beta1FcLow()) / code.beta1FcStep();
    }

    /** The net tensile strain from which a section is tension-controlled: εty + 0.003 (Table 21.2.2). */
    public static double tensionControlledStrain(double epsTy) {
        return epsTy + 0.003;
    }

    /** phi for moment of Table 21.2.2, other (tied) transverse reinforcement. */
    public static double phiFlexure(double epsT, double epsTy) {
        if (epsT <= epsTy) {
            return PHI_COMPRESSION_CONTROLLED;
        }
        if (epsT >= tensionControlledStrain(epsTy)) {
            return PHI_TENSION_CONTROLLED;
        }
        return 0.65 + 0.25 * (epsT - epsTy) / 0.003;
    }

    /** Which row of Table 21.2.2 applies. */
    public static String strainClass(double epsT, double epsTy) {
        if (epsT <= epsTy) {
            return "compression-controlled";
        }
        if (epsT >= tensionControlledStrain(epsTy)) {
            return "tension-controlled";
        }
        return "transition";
    }
}
