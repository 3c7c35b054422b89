package barfit.section;

/**
 * Factored demand on a section: Mu in N·mm (positive sagging, negative hogging; null when only the
 * capacity is wanted) and Vu in N (null when shear is not checked).
 */
public record Demand(Double mu, Double vu) {
    public Bending bending() {
        return mu == null ? Bending.SAGGING : Bending.of(mu);
    }
}
