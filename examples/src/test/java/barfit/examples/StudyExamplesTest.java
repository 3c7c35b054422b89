package barfit.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.cli.Cli;
import barfit.golden.Golden;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The studies example: compare and sweep run as the README shows; their text, JSON and CSV equal their
 * golden files, and the sweep plot drawn into a temporary folder equals the one committed beside the
 * example, byte for byte (see {@link Golden}: {@code -Dgolden.update=true} rewrites both).
 */
class StudyExamplesTest {
    static final String FILE = "studies/transfer-girder-si.yaml";
    static final Path PLOT = Path.of("studies/transfer-girder-sweep.svg");

    @Test
    void compareGivesEveryOptionAndARecommendation() throws Exception {
        Cli text = Cli.run("compare", FILE);
        assertEquals(0, text.exit(), text.err());
        assertTrue(text.out().contains("recommended:"));
        Cli json = Cli.run("compare", FILE, "--format", "json");
        JsonNode beam = new ObjectMapper().readTree(json.out()).get("beams").get(0);
        java.util.Set<String> kinds = new java.util.HashSet<>();
        for (JsonNode o : beam.get("options")) {
            kinds.add(o.get("kind").asText());
            for (String key : new String[] {
                "kind",
                "feasible",
                "height",
                "width",
                "cost",
                "compression_steel_needed",
                "tension",
                "compression",
                "phi_Mn",
                "eps_t",
                "phi"
            }) {
                assertTrue(o.has(key), o.get("kind") + " has " + key);
            }
        }
        assertEquals(java.util.Set.of("at_cap", "deepen", "no_compression_steel", "widen", "fc"), kinds);
        assertTrue(beam.has("recommended"));
        Golden.check("studies/transfer-girder-si.compare.txt", text.out());
        Golden.check("studies/transfer-girder-si.compare.json", json.out());
    }

    @TempDir
    Path tmp;

    @Test
    void sweepDrawsTheCommittedPlot() throws Exception {
        Cli text = Cli.run("sweep", FILE);
        assertEquals(0, text.exit(), text.err());
        Golden.check("studies/transfer-girder-si.sweep.txt", text.out());
        Cli json = Cli.run("sweep", FILE, "--format", "json");
        assertEquals(0, json.exit(), json.err());
        JsonNode beam = new ObjectMapper().readTree(json.out()).get("beams").get(0);
        for (String key : new String[] {"id", "points", "shallowest_feasible", "compression_needed_below"}) {
            assertTrue(beam.has(key), "sweep JSON has " + key);
        }
        double previous = Double.POSITIVE_INFINITY;
        for (JsonNode p : beam.get("points")) {
            for (String key : new String[] {"cap", "feasible", "cost"}) {
                assertTrue(p.has(key));
            }
            if (p.get("feasible").asBoolean()) {
                assertTrue(p.get("cost").asDouble() <= previous + 1e-9, "cost never rises with the cap");
                previous = p.get("cost").asDouble();
            }
        }
        Golden.check("studies/transfer-girder-si.sweep.json", json.out());
        Path drawn = tmp.resolve("sweep.svg");
        Cli plot = Cli.run("sweep", FILE, "--plot", drawn.toString());
        assertEquals(0, plot.exit(), plot.err());
        String svg = Files.readString(drawn);
        var factory = DocumentBuilderFactory.newInstance();
        factory.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        var doc = factory.newDocumentBuilder().parse(drawn.toFile());
        assertEquals("svg", doc.getDocumentElement().getNodeName());
        assertTrue(svg.contains("Beam TG-1"));
        assertTrue(svg.contains("shallowest feasible"));
        Golden.check(PLOT, Files.readAllBytes(drawn));
        Cli csv = Cli.run("sweep", FILE, "--csv");
        assertTrue(csv.out().startsWith("beam,cap_mm,feasible,cost"));
        Golden.check("studies/transfer-girder-si.sweep.csv", csv.out());
    }
}
