package barfit.input;

import barfit.design.CostModel;
import barfit.design.CostRates;
import barfit.design.SearchSpace;
import java.util.List;

/** A whole {@code design} file: settings, the search space, the cost rates and the beams. */
public record DesignInput(
        Settings settings,
        SearchSpace space,
        CostRates rates,
        String currency,
        List<DesignBeam> beams,
        int maxBarSizesPerBeam,
        int barsPerTwoLegs,
        SearchReader.Costs costs,
        CarbonReader.Carbon carbon) {
    public DesignInput {
        beams = List.copyOf(beams);
    }

    /** The cost model of this file's rates, with its carbon factors beside them. */
    public CostModel costModel() {
        return new CostModel(rates, settings.detailing().cover(), settings.code()).withCarbon(carbon.factors());
    }
}
