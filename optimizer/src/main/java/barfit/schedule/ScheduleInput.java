package barfit.schedule;

import barfit.design.CarbonFactors;
import barfit.design.CostModel;
import barfit.design.CostRates;
import barfit.design.SearchSpace;
import barfit.design.line.LineSpans;
import barfit.input.CarbonReader;
import barfit.input.Rationalise;
import barfit.input.SearchReader;
import barfit.input.Settings;
import java.util.List;

/**
 * A whole schedule to design: the project settings, search space and costs, the beams (from the
 * {@code beams:} of a YAML file or the rows of a CSV file), and the rationalisation (null: each beam its
 * own optimum). {@code sources} names the files it was read from, for the report; {@code lines} the lines
 * of the file as designed from their own analysis (their parts are among the beams, by their ids), for
 * their detailing.
 */
public record ScheduleInput(
        List<String> sources,
        Settings settings,
        SearchSpace space,
        CostRates rates,
        String currency,
        SearchReader.Costs costs,
        int maxBarSizesPerBeam,
        int barsPerTwoLegs,
        List<ScheduleBeam> beams,
        Rationalise rationalise,
        List<LineSpans.Result> lines,
        CarbonReader.Carbon carbon) {
    public ScheduleInput {
        sources = List.copyOf(sources);
        beams = List.copyOf(beams);
        lines = List.copyOf(lines);
    }

    /** A schedule without lines, with the default carbon factors. */
    public ScheduleInput(
            List<String> sources,
            Settings settings,
            SearchSpace space,
            CostRates rates,
            String currency,
            SearchReader.Costs costs,
            int maxBarSizesPerBeam,
            int barsPerTwoLegs,
            List<ScheduleBeam> beams,
            Rationalise rationalise) {
        this(
                sources,
                settings,
                space,
                rates,
                currency,
                costs,
                maxBarSizesPerBeam,
                barsPerTwoLegs,
                beams,
                rationalise,
                List.of(),
                new CarbonReader.Carbon(
                        CarbonFactors.defaults(settings.materials().fc()), false, CarbonFactors.defaultConcreteByFc()));
    }

    /** The cost model of these rates, with the carbon factors beside them. */
    public CostModel costModel() {
        return new CostModel(rates, settings.detailing().cover(), settings.code()).withCarbon(carbon.factors());
    }
}
