package barfit.section;

/**
 * Factored demand on a section: Mu in N·mm (positive sagging, negative hogging; null when only the
 * capacity is wanted), Vu in N (null when shear is not checked) and Tu in N·mm (null, or zero, when the
 * section carries no torsion; its sign does not matter). {@code compatibilityTorsion} marks Tu as
 * compatibility torsion of a statically indeterminate structure, which 22.7.3.2 lets be reduced to φTcr.
 */
public record Demand(Double mu, Double vu, Double tu, boolean compatibilityTorsion) {

    /** Moment and shear, no torsion. */
    public Demand(Double mu, Double vu) {
        this(mu, vu, null, false);
    }

    /** Moment, shear and equilibrium torsion (22.7.3.1). */
    public Demand(Double mu, Double vu, Double tu) {
        this(mu, vu, tu, false);
    }

    public Bending bending() {
        return mu == null ? Bending.SAGGING : Bending.of(mu);
    }

    /** Whether the section carries torsion to check (Tu given and not zero). */
    public boolean hasTorsion() {
        return tu != null && tu != 0;
    }
}
