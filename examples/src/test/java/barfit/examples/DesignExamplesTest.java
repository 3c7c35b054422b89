package barfit.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.cli.Cli;
import barfit.golden.Golden;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every file in examples/design runs through {@code barfit design --alternatives 2}: text and JSON agree
 * and equal their golden files byte for byte (see {@link Golden}; the solver runs on its defaults, one
 * worker and seed 1), and every printed beam either has a proven-optimal passing layout or a diagnosis
 * (the clinic file has one beam that cannot pass, on purpose).
 */
class DesignExamplesTest {
    static Stream<Path> examples() throws IOException {
        try (Stream<Path> s = Files.list(Path.of("design"))) {
            var files = s.filter(p -> p.toString().endsWith(".yaml")).sorted().toList();
            assertTrue(files.size() >= 2);
            return files.stream();
        }
    }

    /** The golden file of an example's output: design/NAME.txt or .json. */
    static String golden(Path file, String extension) {
        return "design/" + file.getFileName().toString().replaceFirst("\\.yaml$", "") + extension;
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("examples")
    void runsAsDocumented(Path file) throws IOException {
        Cli text = Cli.run("design", file.toString(), "--alternatives", "2");
        assertEquals("", text.err());
        assertTrue(text.out().contains("CAUTION"));
        Golden.check(golden(file, ".txt"), text.out());
        Cli json = Cli.run("design", file.toString(), "--format", "json", "--alternatives", "2");
        assertEquals(text.exit(), json.exit());
        assertEquals("", json.err());
        Golden.check(golden(file, ".json"), json.out());
        JsonNode root = new ObjectMapper().readTree(json.out());
        boolean anyInfeasible = false;
        for (JsonNode b : root.get("beams")) {
            String status = b.get("status").asText();
            if (status.equals("infeasible")) {
                anyInfeasible = true;
                assertTrue(b.get("diagnosis").get("fixes").size() > 0, "a diagnosis says what would work");
                continue;
            }
            assertEquals("optimal", status);
            for (String key : new String[] {
                "width",
                "height",
                "tension",
                "compression",
                "phi_Mn",
                "Mu",
                "eps_t",
                "phi",
                "stirrups",
                "cost",
                "binding",
                "alternatives",
                "proof"
            }) {
                assertTrue(b.has(key), "beam JSON has " + key);
            }
            if (b.get("kind").asText().equals("span")) {
                for (String key : new String[] {"sections", "deflection", "bars", "zone_checks"}) {
                    assertTrue(b.has(key), "span JSON has " + key);
                }
                for (JsonNode s : b.get("sections")) {
                    for (String key :
                            new String[] {"at", "tension", "compression", "phi_Mn", "Mu", "eps_t", "phi", "checks"}) {
                        assertTrue(s.has(key), "section JSON has " + key);
                    }
                }
                for (JsonNode z : b.get("stirrups")) {
                    for (String key : new String[] {"zone", "bar", "legs", "spacing", "from", "to"}) {
                        assertTrue(z.has(key), "stirrup zone JSON has " + key);
                    }
                }
                for (JsonNode m : b.get("bars")) {
                    for (String key : new String[] {"mark", "bar", "count", "length"}) {
                        assertTrue(m.has(key), "bar mark JSON has " + key);
                    }
                }
            }
            for (String key :
                    new String[] {"total", "concrete", "main_bars", "stirrups", "formwork", "depth_premium"}) {
                assertTrue(b.get("cost").has(key), "cost has " + key);
            }
            assertEquals(
                    b.get("proof").get("objective").asDouble(),
                    b.get("proof").get("bound").asDouble(),
                    1e-9);
        }
        assertEquals(anyInfeasible ? 1 : 0, text.exit());
    }

    /** The example with carbon factors, designed for the least carbon: text and JSON against their golden files. */
    @org.junit.jupiter.api.Test
    void leastCarbon() {
        Path file = Path.of("design/hollins-hall-carbon-si.yaml");
        Cli text = Cli.run("design", file.toString(), "--objective", "carbon", "--alternatives", "1");
        assertEquals("", text.err());
        assertEquals(0, text.exit());
        Golden.check(golden(file, ".least-carbon.txt"), text.out());
        Cli json = Cli.run("design", file.toString(), "--objective", "carbon", "--format", "json");
        assertEquals("", json.err());
        Golden.check(golden(file, ".least-carbon.json"), json.out());
    }
}
