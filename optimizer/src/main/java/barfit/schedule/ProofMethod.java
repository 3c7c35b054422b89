package barfit.schedule;

/** How a rationalised schedule was proven, or why there is none: data the reports put in words. */
public enum ProofMethod {
    /** The Lagrangian bound meets the local-search solution. */
    LAGRANGIAN_BOUND,
    /** The linear relaxation of the strong formulation has an integral solution. */
    LINEAR_RELAXATION_INTEGRAL,
    /** The relaxation's bound meets the local-search solution. */
    RELAXATION_BOUND,
    /** CP-SAT on what reduced-cost fixing leaves of the relaxation. */
    CP_SAT,
    /** CP-SAT stopped short (its status is kept beside): the local-search solution with the relaxation's bound. */
    CP_SAT_STOPPED,
    /** No schedule: every beam failed on its own or in its group. */
    NO_BEAM_LEFT,
    /** No schedule: the section-size and bar-size limits cannot hold every beam. */
    LIMITS_TOO_TIGHT
}
