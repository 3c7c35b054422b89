package barfit.catalogs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.catalogs.yaml.YamlReader;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class BarCatalogsTest {

    /**
     * ASTM A615/A615M, Table 1 "Deformed Bar Designation Numbers, Nominal Weights [Masses], Nominal
     * Dimensions" (values from memory): designation, nominal diameter mm, area mm², mass kg/m.
     */
    private static final Object[][] A615M_TABLE_1 = {
        {"10", 9.5, 71, 0.560},
        {"13", 12.7, 129, 0.994},
        {"16", 15.9, 199, 1.552},
        {"19", 19.1, 284, 2.235},
        {"22", 22.2, 387, 3.042},
        {"25", 25.4, 510, 3.973},
        {"29", 28.7, 645, 5.060},
        {"32", 32.3, 819, 6.404},
        {"36", 35.8, 1006, 7.907},
        {"43", 43.0, 1452, 11.38},
        {"57", 57.3, 2581, 20.24},
    };

    /**
     * The same table, inch-pound (values from memory): bar number, nominal diameter in, area in², weight
     * lb/ft. Row i is the soft conversion of row i of the metric table (#3 is No. 10, ..., #18 is No. 57).
     */
    private static final Object[][] A615_TABLE_1 = {
        {"3", 0.375, 0.11, 0.376},
        {"4", 0.500, 0.20, 0.668},
        {"5", 0.625, 0.31, 1.043},
        {"6", 0.750, 0.44, 1.502},
        {"7", 0.875, 0.60, 2.044},
        {"8", 1.000, 0.79, 2.670},
        {"9", 1.128, 1.00, 3.400},
        {"10", 1.270, 1.27, 4.303},
        {"11", 1.410, 1.56, 5.313},
        {"14", 1.693, 2.25, 7.650},
        {"18", 2.257, 4.00, 13.600},
    };

    private static double num(Object o) {
        return ((Number) o).doubleValue();
    }

    @Test
    void a615mEveryBarHasTheNominalDimensionsOfTable1() {
        BarCatalog c = BarCatalogs.builtIn("astm-a615m").orElseThrow();
        assertEquals(A615M_TABLE_1.length, c.bars().size(), "No. 10 to No. 57, nothing else");
        for (int i = 0; i < A615M_TABLE_1.length; i++) {
            Object[] row = A615M_TABLE_1[i];
            BarSize b = c.bars().get(i);
            String size = (String) row[0];
            assertEquals(size, b.designation(), "smallest to largest");
            assertEquals("No. " + size, b.label());
            assertEquals(num(row[1]), b.diameter(), 1e-9, "No. " + size + " diameter");
            assertEquals(num(row[2]), b.area(), 1e-9, "No. " + size + " area");
            assertEquals(num(row[3]), b.massPerMetre(), 1e-9, "No. " + size + " mass");
        }
        assertEquals(71, c.find("No. 10").orElseThrow().area(), 1e-9, "found by its label too");
    }

    @Test
    void a615EveryBarHasTheNominalDimensionsOfTable1() {
        // held in mm, mm² and kg/m: 1 in = 25.4 mm, 1 in² = 645.16 mm², 1 lb/ft = 0.45359237 / 0.3048 kg/m
        BarCatalog c = BarCatalogs.builtIn("astm-a615").orElseThrow();
        assertEquals(A615_TABLE_1.length, c.bars().size(), "#3 to #18, nothing else");
        for (int i = 0; i < A615_TABLE_1.length; i++) {
            Object[] row = A615_TABLE_1[i];
            BarSize b = c.bars().get(i);
            String size = (String) row[0];
            assertEquals(size, b.designation(), "smallest to largest");
            assertEquals("#" + size, b.label());
            assertEquals(num(row[1]) * 25.4, b.diameter(), 1e-9, "#" + size + " diameter");
            assertEquals(num(row[2]) * 645.16, b.area(), 1e-9, "#" + size + " area");
            assertEquals(num(row[3]) * 0.45359237 / 0.3048, b.massPerMetre(), 1e-9, "#" + size + " weight");
        }
    }

    @Test
    void theTwoTablesAreSoftConversionsOfEachOther() {
        // Each inch-pound row converted must round to the metric row: diameters to 0.1 mm, masses to the
        // metric table's last digit; areas within half the last digit of the in² value (0.005 in² = 3.2 mm²),
        // since 0.31 in² (#5) is itself rounded from pi x 0.625² / 4 = 0.3068 in². A wrong figure in either
        // table (or either catalog) breaks this.
        BarCatalog si = BarCatalogs.builtIn("astm-a615m").orElseThrow();
        BarCatalog us = BarCatalogs.builtIn("astm-a615").orElseThrow();
        for (int i = 0; i < A615M_TABLE_1.length; i++) {
            BarSize m = si.bars().get(i);
            BarSize p = us.bars().get(i);
            assertEquals(
                    m.diameter(),
                    p.diameter(),
                    0.05 + 1e-9,
                    m + " and " + p + ": diameter"); // 0.750 in = 19.05 mm: 19.1
            assertEquals(m.area(), p.area(), 0.005 * 645.16, m + " and " + p + ": area");
            double lastDigit = m.massPerMetre() >= 10 ? 0.01 : 0.001;
            assertEquals(m.massPerMetre(), p.massPerMetre(), lastDigit / 2 + 1e-9, m + " and " + p + ": mass");
        }
    }

    @Test
    void metricSeriesDerivesAreaAndMassFromDiameter() {
        // area pi d²/4 and mass area x 7850 kg/m³ (common practice, no source): 16 mm -> 201.06 mm², 1.578 kg/m
        BarCatalog c = BarCatalogs.builtIn("metric-mm").orElseThrow();
        BarSize b16 = c.find("16").orElseThrow();
        assertEquals(Math.PI * 16 * 16 / 4, b16.area(), 1e-9);
        assertEquals(201.06e-6 * 7850, b16.massPerMetre(), 1e-3);
        assertEquals(8, c.bars().get(0).diameter(), 1e-12);
        assertEquals(40, c.bars().get(c.bars().size() - 1).diameter(), 1e-12);
    }

    @Test
    void everyBuiltInEntryIsWithinTwoPercentOfItsGeometry() {
        for (String id : BarCatalogs.BUILT_IN) {
            for (BarSize b : BarCatalogs.builtIn(id).orElseThrow().bars()) {
                double ideal = Math.PI * b.diameter() * b.diameter() / 4;
                assertTrue(Math.abs(b.area() - ideal) / ideal <= 0.02, id + " " + b);
                double mass = b.area() * 1e-6 * 7850;
                assertTrue(Math.abs(b.massPerMetre() - mass) / mass <= 0.02, id + " " + b);
            }
        }
    }

    private static InputError parseError(String yaml) {
        return assertThrows(InputError.class, () -> BarCatalogs.parse(YamlReader.read(yaml, "my-bars.yaml")));
    }

    @Test
    void rejectsAnAreaThatDoesNotMatchTheDiameter() {
        InputError e = parseError("""
                id: mine
                units: SI
                bars:
                  - {size: "20", diameter: 20, area: 314}
                  - {size: "25", diameter: 25, area: 540}
                """);
        assertTrue(e.oneLine().startsWith("my-bars.yaml:5:"), e.oneLine());
        assertTrue(e.oneLine().contains("bar \"25\""), e.oneLine());
        assertTrue(e.oneLine().contains("area 540 differs from pi d^2/4 = 490.9"), e.oneLine());
    }

    @Test
    void rejectsAMassThatDoesNotMatchTheArea() {
        InputError e = parseError("""
                id: mine
                units: US
                bars:
                  - {size: "4", diameter: 0.5, area: 0.2, mass: 0.868}
                """);
        assertTrue(e.oneLine().contains("mass 0.868 differs"), e.oneLine());
        assertTrue(e.oneLine().contains(":4:"), e.oneLine());
    }

    @Test
    void rejectsDuplicatesUnorderedSizesAndUnknownUnits() {
        assertTrue(parseError("""
                id: mine
                units: SI
                bars:
                  - {size: "20", diameter: 20}
                  - {size: "20", diameter: 22}
                """).oneLine().contains("appears twice"));
        assertTrue(parseError("""
                id: mine
                units: SI
                bars:
                  - {size: "25", diameter: 25}
                  - {size: "20", diameter: 20}
                """).oneLine().contains("smallest to largest"));
        assertTrue(parseError("""
                id: mine
                units: metric
                bars: [{size: "20", diameter: 20}]
                """).oneLine().contains("expected SI"));
    }

    @Test
    void loadsAUserCatalogFile(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("site-bars.yaml");
        Files.writeString(f, """
                id: site
                units: SI
                label: "T{size}"
                bars:
                  - {size: "12", diameter: 12}
                  - {size: "20", diameter: 20, area: 314, mass: 2.47}
                """);
        BarCatalog c = BarCatalogs.load(f);
        assertEquals("T20", c.find("20").orElseThrow().label());
        assertEquals(2, c.bars().size());
        InputError missing = assertThrows(InputError.class, () -> BarCatalogs.load(dir.resolve("nope.yaml")));
        assertTrue(missing.oneLine().contains("no such file"));
    }
}
