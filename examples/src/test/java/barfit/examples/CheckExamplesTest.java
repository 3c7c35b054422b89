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
 * Every file in examples/check runs through {@code barfit check} (beams, or lines with their bars as built);
 * files named "*fails*" must exit 1. The text and JSON reports equal their golden files byte for byte (see
 * {@link Golden}).
 */
class CheckExamplesTest {
    static Stream<Path> examples() throws IOException {
        try (Stream<Path> s = Files.list(Path.of("check"))) {
            var files = s.filter(p -> p.toString().endsWith(".yaml")).sorted().toList();
            assertTrue(files.size() >= 3, "examples/check needs at least three files");
            return files.stream();
        }
    }

    /** The golden file of an example's output: check/NAME.txt or .json. */
    static String golden(Path file, String extension) {
        return "check/" + file.getFileName().toString().replaceFirst("\\.yaml$", "") + extension;
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("examples")
    void runsAsDocumented(Path file) throws IOException {
        int expected = file.getFileName().toString().contains("fails") ? 1 : 0;
        Cli text = Cli.run("check", file.toString());
        assertEquals(expected, text.exit(), text.err());
        assertEquals("", text.err());
        assertTrue(text.out().contains("CAUTION"), "every report carries the caution");
        assertTrue(text.out().contains("Calculation trail"));
        Golden.check(golden(file, ".txt"), text.out());

        Cli json = Cli.run("check", file.toString(), "--format", "json");
        assertEquals(expected, json.exit());
        assertEquals("", json.err());
        Golden.check(golden(file, ".json"), json.out());
        JsonNode root = new ObjectMapper().readTree(json.out());
        JsonNode lines = root.path("lines");
        assertTrue(root.get("beams").size() > 0 || lines.size() > 0);
        for (JsonNode b : root.get("beams")) {
            for (String key :
                    new String[] {"id", "ok", "phi_Mn", "Mn", "phi", "eps_t", "c", "a", "d", "layers", "checks"}) {
                assertTrue(b.has(key), "beam JSON has " + key);
            }
            for (JsonNode l : b.get("layers")) {
                for (String key : new String[] {"face", "bar", "count", "depth", "strain", "stress"}) {
                    assertTrue(l.has(key), "layer JSON has " + key);
                }
            }
            for (JsonNode c : b.get("checks")) {
                for (String key : new String[] {"id", "clause", "ok", "demand", "limit", "ratio"}) {
                    assertTrue(c.has(key), "check JSON has " + key);
                }
            }
        }
        boolean allOk = true;
        for (JsonNode b : root.get("beams")) {
            allOk &= b.get("ok").asBoolean();
        }
        for (JsonNode l : lines) {
            for (String key : new String[] {"id", "ok", "failing", "spans", "detailing"}) {
                assertTrue(l.has(key), "line JSON has " + key);
            }
            for (String key : new String[] {"runs", "checks", "capacity", "bending_schedule"}) {
                assertTrue(l.get("detailing").has(key), "line detailing JSON has " + key);
            }
            allOk &= l.get("ok").asBoolean();
        }
        assertEquals(expected == 0, allOk);
    }
}
