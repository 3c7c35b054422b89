package barfit.section;

/**
 * Torsion of a section (22.7): torques N·mm, forces N, lengths mm, stresses MPa, reinforcement per unit
 * length mm²/mm. {@code tu} is the factored torsion given and {@code tuDesign} the torsion the section is
 * designed for (reduced to φTcr for compatibility torsion, 22.7.3.2). {@code fyt} and {@code fy} are the
 * stirrup and bar strengths as torsion counts them (at most Table 20.2.2.4(a)'s limit). {@code atPerS} is
 * At/s, one leg of the outer closed hoop for torsion; {@code avPerS} is Av/s, all legs for shear, with
 * Vu and Vc of the shear analysis ({@code vc} with Vu taken as 0 where none is given).
 */
public record TorsionResult(
        TorsionOutline outline,
        Torsion.Hoop hoop,
        double tu,
        double tuDesign,
        boolean compatibility,
        double tth,
        double tcr,
        double vu,
        double bw,
        double d,
        double vc,
        double fyt,
        double fy,
        double sectionStress,
        double sectionLimit,
        double atPerS,
        double avPerS,
        double transverseMin,
        double sMax,
        double al,
        double alMin) {

    public double phiTth() {
        return Torsion.PHI * tth;
    }

    public double phiTcr() {
        return Torsion.PHI * tcr;
    }

    /** Tu < φTth: torsion may be neglected (9.5.4.1, 22.7.1.1). */
    public boolean neglected() {
        return tu < phiTth();
    }

    /** Whether compatibility torsion was reduced to φTcr (22.7.3.2). */
    public boolean reduced() {
        return tuDesign < tu;
    }

    /** (Av + 2At)/s: all legs of the stirrups for shear, the two legs of the outer hoop for torsion too. */
    public double transverseRequired() {
        return avPerS + 2 * atPerS;
    }

    /** Al to provide: the space truss's Al (22.7.6.1), at least Al,min (9.6.4.3). */
    public double alRequired() {
        return Math.max(al, alMin);
    }
}
