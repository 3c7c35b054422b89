package barfit.design;

/** A cost split into its terms. Per metre of beam unless scaled by a length. */
public record CostBreakdown(double concrete, double mainBars, double stirrups, double formwork, double depthPremium) {
    public static final CostBreakdown ZERO = new CostBreakdown(0, 0, 0, 0, 0);

    public double total() {
        return concrete + mainBars + stirrups + formwork + depthPremium;
    }

    public CostBreakdown plus(CostBreakdown o) {
        return new CostBreakdown(
                concrete + o.concrete,
                mainBars + o.mainBars,
                stirrups + o.stirrups,
                formwork + o.formwork,
                depthPremium + o.depthPremium);
    }

    public CostBreakdown times(double k) {
        return new CostBreakdown(concrete * k, mainBars * k, stirrups * k, formwork * k, depthPremium * k);
    }
}
