package barfit.design.section;

import barfit.design.CostBreakdown;
import barfit.design.CostModel;

/** A passing layout and its per-metre cost, as the generator found it. */
public record Candidate(SectionLayout layout, CostBreakdown cost) {
    public long units() {
        return CostModel.units(cost.total());
    }
}
