package barfit.design.section;

import barfit.design.CostBreakdown;
import barfit.section.CheckReport;

/**
 * A chosen layout with its cost per metre, its cost over the beam's length, the section model's full
 * check report (every printed design has passed it), and its carbon (kg CO2e, A1-A3) per metre and over
 * the beam's length, priced through the same model (both null where no carbon factors were given).
 */
public record Design(
        SectionLayout layout,
        CostBreakdown costPerMetre,
        CostBreakdown cost,
        CheckReport report,
        CostBreakdown carbonPerMetre,
        CostBreakdown carbon) {}
