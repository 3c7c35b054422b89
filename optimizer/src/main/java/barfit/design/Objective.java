package barfit.design;

/** What a search minimises: the cost in currency, or the embodied carbon (A1-A3) of the same quantities. */
public enum Objective {
    COST,
    CARBON
}
