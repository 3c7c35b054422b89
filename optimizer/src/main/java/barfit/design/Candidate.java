package barfit.design;

/** A passing layout and its per-metre cost, as the generator found it. */
public record Candidate(Layout layout, CostBreakdown cost) {
    public long units() {
        return CostModel.units(cost.total());
    }
}
