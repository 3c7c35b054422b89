package barfit.study;

import barfit.design.CostModel;
import barfit.design.SearchSpace;
import barfit.section.Materials;

/**
 * A beam a study can redesign under changed limits: a single section or a whole span. Each call runs
 * the same optimizer as {@code design}, so every option is proven cheapest within its own limits.
 */
public interface Target {
    String id();

    /** The beam's own headroom cap (null for none). */
    Double cap();

    SearchSpace space();

    /** Whether costs are for the whole beam (a span is known) rather than per metre. */
    boolean costPerBeam();

    Materials materials();

    /** The web width the beam fixes (mm), or null where the search chooses it. */
    Double fixedWidth();

    /**
     * The cheapest design with h at most {@code cap} (null: up to the search's deepest), in the given
     * space and materials; {@code freeWidth} lets the width range over the space even where the beam
     * fixes it.
     */
    Summary design(Double cap, SearchSpace space, Materials materials, CostModel cost, boolean freeWidth);
}
