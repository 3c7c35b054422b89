package barfit.section;

/**
 * One-way shear of a section (22.5): forces N, lengths mm. {@code vcRow} names the row of Table
 * 22.5.5.1 used; {@code avMin} is for the stirrup spacing given (0 without stirrups). {@code vs} is the
 * Vs the section is credited with, at most Vs,max = 0.66 √f'c bw d (8 √f'c bw d in inch-pound units,
 * 22.5.1.2); {@code vsStirrups} is Av fyt d / s of the stirrups, which may exceed it; {@code phiVn} is
 * φ (Vc + vs), what the section can really carry.
 */
public record ShearResult(
        double vu,
        double bw,
        double d,
        double rhoW,
        double lambdaS,
        double vc,
        String vcRow,
        double vs,
        double vsStirrups,
        double phiVn,
        double vnLimit,
        double avMin,
        double av,
        double minShearTrigger,
        double sMaxAlong,
        double sMaxAcross,
        boolean highShear) {}
