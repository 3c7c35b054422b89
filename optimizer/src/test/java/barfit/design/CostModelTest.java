package barfit.design;

import static org.junit.jupiter.api.Assertions.assertEquals;

import barfit.catalogs.BarCatalogs;
import barfit.catalogs.BarSize;
import barfit.input.DesignInput;
import barfit.input.DesignInputReader;
import barfit.section.CodeEquations;
import barfit.section.Flange;
import barfit.section.Stirrups;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The cost model against hand calculations: each term per metre of beam, the length of a stirrup set
 * (hooks per Table 25.3.2 in the edition of the input), and inch-pound rates converted to the SI rates
 * the model holds. The rates are invented (CostRates.DEFAULTS: 150 per m³, 1.5 per kg of main bars, 2.0
 * per kg of stirrups, 40 per m², lap factor 1.05); the bar masses are ASTM A615/A615M Table 1's.
 */
class CostModelTest {
    private static final double IN = 25.4;
    private static final BarSize NO10 =
            BarCatalogs.builtIn("astm-a615m").orElseThrow().find("10").orElseThrow();
    private static final BarSize NO25 =
            BarCatalogs.builtIn("astm-a615m").orElseThrow().find("25").orElseThrow();

    @Test
    void stirrupSetIsItsHoopPlusHooksAndCrossties() {
        CostModel cost = new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI);
        // centre line of a 300 x 600 hoop at 40 mm cover: (300 - 80 - 9.5) and (600 - 80 - 9.5) per side
        // (common practice, no source); two 135-degree hooks of max(6 x 9.5, 75) = 75 mm (Table 25.3.2)
        double hoop = 2 * 210.5 + 2 * 510.5 + 2 * 75;
        assertEquals(hoop, cost.stirrupSetLength(300, 600, NO10, 2), 1e-9);
        // each crosstie: one leg and two hooks
        assertEquals(hoop + 2 * (510.5 + 2 * 75), cost.stirrupSetLength(300, 600, NO10, 4), 1e-9);
        // the bar list gives the hoop and the crossties as separate bars: the same lengths, apart
        assertEquals(hoop, cost.hoopLength(300, 600, NO10), 1e-9);
        assertEquals(510.5 + 2 * 75, cost.crosstieLength(600, NO10), 1e-9);
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

    @Test
    void rectangularSectionPerMetre() {
        CostModel cost = new CostModel(new CostRates(150, 1.5, 2.0, 40, 50, 1.05), 40, CodeEquations.SI);
        CostBreakdown f = cost.frame(300, 600, null);
        // by hand: 150 x 0.30 m x 0.60 m = 27.00; formwork on the soffit and both sides 40 x (0.30 + 2 x 0.60)
        // = 60.00; depth premium 50 x 0.60 = 30.00
        assertEquals(27.00, f.concrete(), 1e-9);
        assertEquals(60.00, f.formwork(), 1e-9);
        assertEquals(30.00, f.depthPremium(), 1e-9);
        assertEquals(0, f.mainBars(), 0);
        assertEquals(117.00, f.total(), 1e-9);
    }

    @Test
    void aFlangeIsPaidForWithTheSlabSoOnlyTheWebBelowItCounts() {
        CostModel cost = new CostModel(new CostRates(150, 1.5, 2.0, 40, 50, 1.05), 40, CodeEquations.SI);
        CostBreakdown f = cost.frame(300, 600, new Flange(1500, 120, false));
        // web below a 120 mm slab: 480 mm. 150 x 0.30 x 0.48 = 21.60; 40 x (0.30 + 2 x 0.48) = 50.40; the
        // depth premium counts the whole depth (storey height): 50 x 0.60 = 30.00
        assertEquals(21.60, f.concrete(), 1e-9);
        assertEquals(50.40, f.formwork(), 1e-9);
        assertEquals(30.00, f.depthPremium(), 1e-9);
    }

    @Test
    void barsAndStirrupsPerMetre() {
        CostModel cost = new CostModel(CostRates.DEFAULTS, 40, CodeEquations.SI);
        // 4 No. 25 at 3.973 kg/m: 1.5 x 1.05 x 3.973 x 4 = 25.0299 per m
        assertEquals(25.0299, cost.bars(NO25, 4), 1e-9);
        // No. 10 two-leg stirrups at 200 mm in 300 x 600: a set is 1592 mm (above) x 0.560 kg/m = 0.89152 kg,
        // 5 sets per metre: 2.0 x 0.89152 x 5 = 8.9152 per m
        assertEquals(8.9152, cost.stirrups(300, 600, new Stirrups(NO10, 2, 200)), 1e-9);
        // four legs at 150 mm: (1592 + 2 x (510.5 + 150)) = 2913 mm x 0.560 = 1.63128 kg, 1000/150 sets
        assertEquals(2.0 * 1.63128 * 1000 / 150, cost.stirrups(300, 600, new Stirrups(NO10, 4, 150)), 1e-9);
    }

    @Test
    void moneyIsCountedInTenThousandthsForTheSolver() {
        assertEquals(1_234_568, CostModel.units(123.45678));
        assertEquals(250_000, CostModel.units(25));
        assertEquals(0, CostModel.units(0.00004));
    }

    @TempDir
    Path dir;

    @Test
    void inchPoundRatesAreConvertedToTheModelsSiRates() throws IOException {
        Path f = dir.resolve("rates-us.yaml");
        Files.writeString(f, """
                units: US
                concrete: {fc: 4000}
                steel: {fy: 60000}
                costs: {concrete_per_yd3: 100, main_bars_per_lb: 1, stirrups_per_lb: 2, formwork_per_ft2: 3,
                        depth_premium_per_ft: 4, lap_factor: 1.1}
                beams:
                  - {id: B1, Mu: 100}
                """);
        DesignInput in = DesignInputReader.read(f);
        CostRates r = in.rates();
        // 1 yd = 0.9144 m exactly, so 1 yd³ = 0.764554857984 m³: 100 per yd³ = 130.7950619 per m³;
        // 1 lb = 0.45359237 kg exactly: 1 per lb = 2.2046226 per kg; 1 ft² = 0.09290304 m²: 3 per ft² =
        // 32.2917313 per m²; a premium per ft of depth per ft of beam is, like formwork, per ft² (common practice)
        assertEquals(130.7950619, r.concretePerM3(), 1e-6);
        assertEquals(2.2046226, r.mainBarsPerKg(), 1e-6);
        assertEquals(4.4092452, r.stirrupsPerKg(), 1e-6);
        assertEquals(32.2917313, r.formworkPerM2(), 1e-6);
        assertEquals(43.0556417, r.depthPremiumPerM(), 1e-6);
        assertEquals(1.1, r.lapFactor(), 0);

        // a 12 x 20 in beam priced per foot, by hand in inch-pound units: concrete 100 x (12 x 20 / 144) / 27
        // = 6.17284 per ft; formwork 3 x (12 + 2 x 20) / 12 = 13.00 per ft; premium 4 x 20 / 12 = 6.66667 per ft
        CostModel cost = new CostModel(r, 1.5 * IN, CodeEquations.INCH_POUND);
        CostBreakdown perMetre = cost.frame(12 * IN, 20 * IN, null);
        double ftPerM = 0.3048;
        assertEquals(6.172840, perMetre.concrete() * ftPerM, 1e-6);
        assertEquals(13.00, perMetre.formwork() * ftPerM, 1e-9);
        assertEquals(6.666667, perMetre.depthPremium() * ftPerM, 1e-6);
        // 3 #8 at 2.670 lb/ft (ASTM A615/A615M Table 1): 1 x 1.1 x 2.670 x 3 = 8.811 per ft
        BarSize n8 = BarCatalogs.builtIn("astm-a615").orElseThrow().find("8").orElseThrow();
        assertEquals(8.811, cost.bars(n8, 3) * ftPerM, 1e-9);
    }

    @Test
    void moneyScalesConvertBothWays() {
        // by hand from the scales' definitions (1/10 000 and 1/1 000 000 of the currency)
        assertEquals(123_457L, CostModel.units(12.34567)); // 123 456.7 rounds up
        assertEquals(12.3457, CostModel.currency(123_457L), 0);
        assertEquals(12.3457, CostModel.UNITS.rounded(12.34567), 0);
        assertEquals(12_345_679L, CostModel.SPAN_UNITS.units(12.3456789));
        assertEquals(12.345679, CostModel.SPAN_UNITS.currency(12_345_679L), 0);
        // a whole number of units survives the round trip exactly
        for (long u : new long[] {0, 1, 9_999, 1_586_666, 123_456_789_012L}) {
            assertEquals(u, CostModel.units(CostModel.currency(u)));
            assertEquals(u, CostModel.SPAN_UNITS.units(CostModel.SPAN_UNITS.currency(u)));
        }
    }
}
