package barfit.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import barfit.catalogs.BarCatalogs;
import barfit.catalogs.BarSize;
import barfit.design.section.SectionLayout;
import barfit.input.CarbonReader;
import barfit.input.DesignInputReader;
import barfit.section.Bending;
import barfit.section.CodeEquations;
import barfit.section.Stirrups;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Embodied carbon is the factors times the quantities the cost model already takes off (hand
 * calculations below); the bar masses are ASTM A615/A615M Table 1's. The factors in these tests are
 * invented round numbers, except where the defaults are checked against their table.
 */
class CarbonTest {
    private static final BarSize NO10 =
            BarCatalogs.builtIn("astm-a615m").orElseThrow().find("10").orElseThrow();
    private static final BarSize NO16 =
            BarCatalogs.builtIn("astm-a615m").orElseThrow().find("16").orElseThrow();
    private static final BarSize NO25 =
            BarCatalogs.builtIn("astm-a615m").orElseThrow().find("25").orElseThrow();

    @Test
    void aSectionsCarbonIsTheFactorsTimesItsQuantities() {
        CostModel model = new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI)
                .withCarbon(new CarbonFactors(330, 0.854, 0.9, 2.0));
        SectionLayout l = new SectionLayout(
                300, 600, null, Bending.SAGGING, NO25, List.of(4), NO16, 2, new Stirrups(NO10, 2, 200), null);
        CostBreakdown c = l.cost(model.carbon());
        // hand calculation per metre of beam: concrete 0.30 x 0.60 = 0.18 m³ x 330 = 59.4 kg
        assertEquals(59.4, c.concrete(), 1e-9);
        // formwork on the soffit and both sides (0.30 + 2 x 0.60) = 1.5 m² x 2.0 = 3.0 kg
        assertEquals(3.0, c.formwork(), 1e-9);
        // main bars with the lap factor 1.05 as for cost: (4 x 3.973 + 2 x 1.552) = 18.996 kg x 1.05 x 0.854
        assertEquals(18.996 * 1.05 * 0.854, c.mainBars(), 1e-9);
        // stirrups: a No. 10 set in 300 x 600 at 40 mm cover is 1592 mm (CostModelTest), 0.560 kg/m, 5 sets
        // a metre: 1.592 x 0.560 x 5 = 4.4576 kg x 0.9
        assertEquals(4.4576 * 0.9, c.stirrups(), 1e-9);
        assertEquals(0, c.depthPremium(), 0);
        assertEquals(59.4 + 3.0 + 18.996 * 1.05 * 0.854 + 4.4576 * 0.9, c.total(), 1e-9);
        // the cost is the same layout at the cost rates, untouched by the carbon beside it
        assertEquals(
                l.cost(new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI)).total(),
                l.cost(model).total(),
                0);
    }

    @Test
    void minimisingCarbonPricesWithTheFactorsAndKeepsTheMoneyBeside() {
        CostModel model = new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI)
                .withCarbon(new CarbonFactors(330, 0.854, 0.854, 0));
        CostModel carbon = model.minimising(Objective.CARBON);
        assertEquals(Objective.CARBON, carbon.objective());
        assertEquals(330, carbon.rates().concretePerM3(), 0);
        assertEquals(0, carbon.rates().depthPremiumPerM(), 0);
        assertEquals(CostRates.DEFAULTS.lapFactor(), carbon.rates().lapFactor(), 0);
        assertEquals(CostRates.DEFAULTS, carbon.money().rates());
        assertSame(carbon, carbon.carbon());
        assertEquals(CostRates.DEFAULTS, carbon.minimising(Objective.COST).rates());
        assertSame(model, model.minimising(Objective.COST));
    }

    @Test
    void defaultConcreteFactorsInterpolateTheirTable() {
        // the table's own grades (NRMCA benchmark, from memory; see CarbonFactors): 4000 psi = 27.58 MPa
        assertEquals(330, CarbonFactors.defaultConcreteAt(27.58), 1e-9);
        // hand calculation, halfway between 27.58 (330) and 34.47 MPa (380): 355
        assertEquals(355, CarbonFactors.defaultConcreteAt((27.58 + 34.47) / 2), 1e-9);
        // beyond 8000 psi along the last segment: 480 + (480 - 405) / (55.16 - 41.37) x (60 - 55.16)
        assertEquals(480 + 75 / 13.79 * 4.84, CarbonFactors.defaultConcreteAt(60), 1e-9);
    }

    @Test
    void inchPoundFactorsAreConvertedToSi(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("b.yaml");
        Files.writeString(f, """
                units: US
                concrete: {fc: 4000}
                steel: {fy: 60000}
                bars: astm-a615
                cover: 1.5
                carbon:
                  concrete_per_yd3: 500
                  main_bars_per_lb: 0.9
                  formwork_per_ft2: 0.2
                beams:
                  - {id: B1, Mu: 100}
                """);
        CarbonReader.Carbon c = DesignInputReader.read(f, true).carbon();
        // 500 lb/yd³ x 0.45359237 kg/lb / 0.764554857984 m³/yd³ (exact definitions of the pound and the yard)
        assertEquals(500 * 0.45359237 / 0.764554857984, c.factors().concretePerM3(), 1e-9);
        // lb per lb is kg per kg
        assertEquals(0.9, c.factors().mainBarsPerKg(), 0);
        // stirrups not given: the default bar factor
        assertEquals(CarbonFactors.BAR_PER_KG, c.factors().stirrupsPerKg(), 0);
        // 0.2 lb/ft² x 0.45359237 / 0.09290304 m²/ft²
        assertEquals(0.2 * 0.45359237 / 0.09290304, c.factors().formworkPerM2(), 1e-9);
    }
}
