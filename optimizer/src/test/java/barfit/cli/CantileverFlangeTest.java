package barfit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A cantilever with a slab flange, inline in YAML or in a CSV schedule: its section is in hogging, so the
 * flange is in tension and adds nothing to the flexural strength (concrete's tensile strength is neglected,
 * ACI 318-19 22.2.2.2); the design is the one without the flange, and the report says what 24.3.4 asks of
 * the top bars. The beams are invented.
 */
class CantileverFlangeTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final String SETTINGS = """
            units: SI
            concrete: {fc: 28}
            steel: {fy: 420}
            search:
              widths: [300]
              depth: {min: 500, max: 500, step: 25}
            """;
    private static final String CANTILEVER = """
              - id: C1
                span: 3.0
                ends: cantilever
                moments: {left: -250}
                shear: {left: 160}
            """;

    @TempDir
    Path dir;

    private Path write(String name, String text) throws IOException {
        Path f = dir.resolve(name);
        Files.writeString(f, text);
        return f;
    }

    /** Each section's place, bars and φMn. */
    private static String strength(JsonNode root) {
        StringBuilder sb = new StringBuilder();
        for (JsonNode s : root.get("beams").get(0).get("sections")) {
            sb.append(s.get("at"))
                    .append(s.get("tension"))
                    .append(s.get("compression"))
                    .append(s.get("phi_Mn"))
                    .append('\n');
        }
        return sb.toString();
    }

    @Test
    void inlineTheFlangeIsLeftOutOfStrengthAndTheReportSays2434() throws IOException {
        Path plain = write("plain.yaml", SETTINGS + "beams:\n" + CANTILEVER);
        Path flanged = write(
                "flanged.yaml", SETTINGS + "beams:\n" + CANTILEVER + "    flange: {width: 1200, thickness: 150}\n");
        Cli a = Cli.run("design", plain.toString(), "--format", "json");
        Cli b = Cli.run("design", flanged.toString(), "--format", "json");
        assertEquals(0, a.exit(), a.err());
        assertEquals(0, b.exit(), b.err());
        String without = strength(JSON.readTree(a.out()));
        assertTrue(without.contains("left"), without);
        assertEquals(without, strength(JSON.readTree(b.out())), "the same bars and φMn with the flange in tension");

        Cli text = Cli.run("design", flanged.toString());
        assertEquals(0, text.exit(), text.err());
        assertTrue(text.out().contains("(flange in tension at the fixed end: not counted in strength)"), text.out());
        // ln/10 = 3000 / 10 = 300 mm < the effective width (24.3.4)
        assertTrue(
                text.out()
                        .contains("flange      in tension at the fixed end: 24.3.4 asks part of the top bars to be "
                                + "spread over min(bf, ln/10) = 300 mm, with more bars in the outer flange"),
                text.out());
        assertTrue(!text.out().contains("counted at mid-span"), "a cantilever has no mid-span: " + text.out());
    }

    @Test
    void aCsvScheduleTakesItAsTheYamlDoes(@TempDir Path out) throws IOException {
        Path settings = write("settings.yaml", SETTINGS);
        Path csv = write(
                "beams.csv",
                "id,span,ends,m_left,v_left,flange_width,flange_thickness\n" + "C1,3.0,cantilever,-250,160,1200,150\n");
        Path yaml = write(
                "inline.yaml", SETTINGS + "beams:\n" + CANTILEVER + "    flange: {width: 1200, thickness: 150}\n");
        // the CSV path refused this beam as bad input
        Cli fromCsv =
                Cli.run("schedule", settings.toString(), "--beams", csv.toString(), "--format", "json", "--quiet");
        Cli inline = Cli.run("schedule", yaml.toString(), "--format", "json", "--quiet");
        assertEquals(0, fromCsv.exit(), fromCsv.err());
        assertEquals(0, inline.exit(), inline.err());
        assertEquals(strength(JSON.readTree(inline.out())), strength(JSON.readTree(fromCsv.out())));
        assertTrue(
                fromCsv.out()
                        .contains("flange in tension: 24.3.4 asks part of the tension bars to be spread over "
                                + "min(bf, ln/10) = 300 mm"),
                fromCsv.out());
    }
}
