package barfit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.SolverOptions;
import barfit.serve.ControlError;
import barfit.serve.Controls;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The page's answers for a line and for an inch-pound file, against {@code design} on the file changed as
 * text: the same JSON, byte for byte.
 */
class PageExplorerTest {
    static final SolverOptions ONE_WORKER = new SolverOptions(60, 1, 1);

    static Controls parse(String json) throws Exception {
        return Controls.parse(new ObjectMapper().readTree(json));
    }

    static String designOf(Path copy, String id) {
        Cli r = Cli.run("design", copy.toString(), "--format", "json", "--beam", id);
        assertTrue(r.exit() == 0 || r.exit() == 1, r.err());
        return r.out();
    }

    @Test
    void aLineWithACapIsDesignedAsTheFileSoChanged(@TempDir Path dir) throws Exception {
        Path file = Path.of("../examples/lines/ashgrove-depot-lines-si.yaml");
        PageExplorer page = new PageExplorer(file, ONE_WORKER, dir.resolve("kept"));
        String anchor = "    forms: per-span                        # each span its own section";
        String text = Files.readString(file, StandardCharsets.UTF_8);
        assertTrue(text.contains(anchor));
        Path copy = dir.resolve("capped.yaml");
        Files.writeString(copy, text.replace(anchor, "    max_depth: 500\n" + anchor), StandardCharsets.UTF_8);
        String capped = page.design(parse("{\"line\": \"L1-4\", \"max_depth\": 500}"));
        assertEquals(designOf(copy, "L1-4"), capped);
        assertNotEquals(designOf(file, "L1-4"), capped, "the cap binds on this line");
    }

    @Test
    void anInchPoundFileTakesItsOwnUnitsAndRateNames(@TempDir Path dir) throws Exception {
        Path file = Path.of("../examples/design/school-beams-us.yaml");
        PageExplorer page = new PageExplorer(file, ONE_WORKER, dir.resolve("kept"));
        assertEquals("in", page.items().get("length").asText());
        assertEquals("main_bars_per_lb", page.items().get("cost_keys").get(1).asText());
        String text = Files.readString(file, StandardCharsets.UTF_8);
        Path copy = dir.resolve("deeper.yaml");
        Files.writeString(copy, text.replace("max_depth: 24", "max_depth: 30"), StandardCharsets.UTF_8);
        assertEquals(designOf(copy, "G-22"), page.design(parse("{\"beam\": \"G-22\", \"max_depth\": 30}")));
        // an SI rate name in an inch-pound file is the reader's error, beside the rates
        ControlError e = org.junit.jupiter.api.Assertions.assertThrows(
                ControlError.class,
                () -> page.design(parse("{\"beam\": \"G-22\", \"costs\": {\"main_bars_per_kg\": 1}}")));
        assertEquals("costs", e.control());
        assertTrue(e.getMessage().contains("main_bars_per_kg"), e.getMessage());
        // kept: read back by design, the same answer
        Path kept = Path.of(page.keep(parse("{\"beam\": \"G-22\", \"max_depth\": 30}")));
        assertEquals(designOf(copy, "G-22"), designOf(kept, "G-22"));
    }

    @Test
    void theDefaultFolderForKeptFilesIsBesideTheInput() {
        assertEquals(
                Path.of("examples/design/clinic-beams-si-kept"),
                ServeCommand.defaultOut(Path.of("examples/design/clinic-beams-si.yaml")));
        assertEquals(Path.of("beams-kept"), ServeCommand.defaultOut(Path.of("beams.yml")));
    }
}
