package barfit.design;

/**
 * The user's unit rates, held in SI: currency per m³ of concrete, per kg of main bars and of
 * stirrups, per m² of formwork contact, and per metre of depth per metre of beam (the storey-height
 * premium of a deeper beam). {@code lapFactor} scales main-bar mass for laps and waste.
 */
public record CostRates(
        double concretePerM3,
        double mainBarsPerKg,
        double stirrupsPerKg,
        double formworkPerM2,
        double depthPremiumPerM,
        double lapFactor) {

    /** Invented defaults, for trying the tool only: use your own rates. */
    public static final CostRates DEFAULTS = new CostRates(150, 1.5, 2.0, 40, 0, 1.05);
}
