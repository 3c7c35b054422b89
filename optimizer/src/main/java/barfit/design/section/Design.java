package barfit.design.section;

import barfit.design.CostBreakdown;
import barfit.section.CheckReport;

/**
 * A chosen layout with its cost per metre, its cost over the beam's length, and the section model's
 * full check report (every printed design has passed it).
 */
public record Design(SectionLayout layout, CostBreakdown costPerMetre, CostBreakdown cost, CheckReport report) {}
