package barfit.design;

import static org.junit.jupiter.api.Assertions.assertEquals;

import barfit.catalogs.BarCatalogs;
import barfit.catalogs.BarSize;
import barfit.section.CodeEquations;
import org.junit.jupiter.api.Test;

/** The length of a stirrup set, hooks per Table 25.3.2 in the edition of the input. */
class CostModelTest {
    private static final double IN = 25.4;

    @Test
    void stirrupSetIsItsHoopPlusHooksAndCrossties() {
        BarSize no10 = BarCatalogs.builtIn("astm-a615m").orElseThrow().find("10").orElseThrow();
        CostModel cost = new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI);
        // centre line of a 300 x 600 hoop at 40 mm cover: (300 - 80 - 9.5) and (600 - 80 - 9.5) per side
        // (common practice, no source); two 135-degree hooks of max(6 x 9.5, 75) = 75 mm (Table 25.3.2)
        double hoop = 2 * 210.5 + 2 * 510.5 + 2 * 75;
        assertEquals(hoop, cost.stirrupSetLength(300, 600, no10, 2), 1e-9);
        // each crosstie: one leg and two hooks
        assertEquals(hoop + 2 * (510.5 + 2 * 75), cost.stirrupSetLength(300, 600, no10, 4), 1e-9);
        // the bar list gives the hoop and the crossties as separate bars: the same lengths, apart
        assertEquals(hoop, cost.hoopLength(300, 600, no10), 1e-9);
        assertEquals(510.5 + 2 * 75, cost.crosstieLength(600, no10), 1e-9);
    }

    @Test
    void inchPoundHooksAreThreeInches() {
        BarSize n3 = BarCatalogs.builtIn("astm-a615").orElseThrow().find("3").orElseThrow();
        CostModel cost = new CostModel(CostRates.DEFAULTS, 1.5 * IN, CodeEquations.INCH_POUND);
        // 12 x 20 in at 1.5 in cover: sides of (12 - 3 - 0.375) and (20 - 3 - 0.375) in (common practice, no
        // source); two 135-degree hooks of max(6 x 0.375 in, 3 in) = 3 in (Table 25.3.2, inch-pound)
        double hoopIn = 2 * 8.625 + 2 * 16.625 + 2 * 3;
        assertEquals(hoopIn, cost.stirrupSetLength(12 * IN, 20 * IN, n3, 2) / IN, 1e-9);
    }
}
