package barfit.design.span;

import barfit.catalogs.BarSize;

/**
 * The top bars' size and how many run continuously over the span ({@code continuous}, at least two);
 * {@code cost} prices them over the span less the stretches the support options price them over.
 */
public record TopOption(BarSize bar, int continuous, double cost) {}
