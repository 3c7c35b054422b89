package barfit.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.cli.Cli;
import barfit.golden.Golden;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code barfit frontier} on the clinic's beams: the table and the JSON equal their golden files, and the plot
 * of one beam is an SVG drawn the same twice (see {@link Golden}; {@code -Dgolden.update=true} rewrites them).
 */
class FrontierExamplesTest {
    static final String FILE = "design/clinic-beams-si.yaml";

    @Test
    void frontierOfTheClinicBeams(@TempDir Path dir) throws IOException {
        Cli text = Cli.run("frontier", FILE);
        assertEquals("", text.err());
        assertEquals(0, text.exit());
        assertTrue(text.out().contains("CAUTION"));
        Golden.check("design/clinic-beams-si.frontier.txt", text.out());
        Cli json = Cli.run("frontier", FILE, "--format", "json");
        assertEquals("", json.err());
        Golden.check("design/clinic-beams-si.frontier.json", json.out());
        Path a = dir.resolve("a.svg");
        Path b = dir.resolve("b.svg");
        assertEquals(
                0,
                Cli.run("frontier", FILE, "--beam", "F1-03", "--plot", a.toString())
                        .exit());
        assertEquals(
                0,
                Cli.run("frontier", FILE, "--beam", "F1-03", "--plot", b.toString())
                        .exit());
        String svg = Files.readString(a);
        assertTrue(svg.startsWith("<?xml") && svg.contains("<svg"), "an SVG drawing");
        assertEquals(svg, Files.readString(b), "the same drawing run to run");
        Golden.check("design/clinic-beams-si.frontier-F1-03.svg", svg);
    }
}
