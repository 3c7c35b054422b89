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

    @Test
    void a615mNominalDimensions() {
        // ASTM A615/A615M, Table 1 (nominal dimensions; values from memory): No. 29 = 28.7 mm, 645 mm²,
        // 5.060 kg/m; No. 10 = 9.5 mm, 71 mm², 0.560 kg/m; No. 57 = 57.3 mm, 2581 mm², 20.24 kg/m
        BarCatalog c = BarCatalogs.builtIn("astm-a615m").orElseThrow();
        BarSize b29 = c.find("29").orElseThrow();
        assertEquals(28.7, b29.diameter(), 1e-9);
        assertEquals(645, b29.area(), 1e-9);
        assertEquals(5.060, b29.massPerMetre(), 1e-9);
        assertEquals(71, c.find("No. 10").orElseThrow().area(), 1e-9);
        assertEquals(20.24, c.find("57").orElseThrow().massPerMetre(), 1e-9);
        assertEquals(11, c.bars().size());
        assertEquals("No. 29", b29.label());
    }

    @Test
    void a615InchPoundNominalDimensions() {
        // ASTM A615/A615M, Table 1, inch-pound (values from memory): #9 = 1.128 in, 1.00 in², 3.400 lb/ft;
        // #3 = 0.375 in, 0.11 in², 0.376 lb/ft; #18 = 2.257 in, 4.00 in², 13.60 lb/ft
        BarCatalog c = BarCatalogs.builtIn("astm-a615").orElseThrow();
        BarSize b9 = c.find("#9").orElseThrow();
        assertEquals(1.128 * 25.4, b9.diameter(), 1e-9);
        assertEquals(1.00 * 645.16, b9.area(), 1e-9);
        assertEquals(3.400 * 0.45359237 / 0.3048, b9.massPerMetre(), 1e-9);
        assertEquals(0.11 * 645.16, c.find("3").orElseThrow().area(), 1e-9);
        assertEquals(13.6 * 0.45359237 / 0.3048, c.find("18").orElseThrow().massPerMetre(), 1e-9);
        assertEquals("#9", b9.label());
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
