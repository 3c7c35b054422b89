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

/** {@code barfit analyse} end to end: the input's units in and out, the JSON's keys, the plot. */
class AnalyseCommandTest {
    @TempDir
    Path dir;

    private Path write(String name, String text) throws IOException {
        Path p = dir.resolve(name);
        Files.writeString(p, text);
        return p;
    }

    @Test
    void aSimpleSpanByHand() throws IOException {
        // Statics by hand: a 6 m simple span on knife edges, 300 x 500 mm, 24 kN/m3: own weight
        // 0.3 x 0.5 x 24 = 3.6 kN/m, with 10 kN/m superimposed 13.6 kN/m dead; 1.4 D (5.3.1a) governs with no
        // live load: M = 1.4 x 13.6 x 6² / 8 = 85.68 kN·m; the shear at d = 500 - 40 - 9.5 - 12.7 = 437.8 mm
        // from the support: 1.4 x 13.6 x (3 - 0.4378) = 48.79 kN; reactions 1.4 x 13.6 x 3 = 57.12 kN.
        Path f = write("simple.yaml", """
                units: SI
                concrete: {fc: 28}
                steel: {fy: 420}
                lines:
                  - id: S1
                    spans: [6]
                    supports: [{kind: knife-edge}]
                    loads: {dead: 10}
                    section: {width: 300, height: 500}
                """);
        Cli r = Cli.run("analyse", f.toString(), "--format", "json");
        assertEquals(0, r.exit(), r.err());
        JsonNode line = new ObjectMapper().readTree(r.out()).get("lines").get(0);
        assertEquals(3.6, line.get("self_weight").asDouble(), 1e-9);
        JsonNode span = line.get("spans").get(0);
        assertEquals(85.68, span.get("M_span_max").asDouble(), 0.01);
        assertEquals(0, span.get("M_left_face").asDouble(), 1e-6);
        assertEquals(48.79, span.get("V_left_d").asDouble(), 0.01);
        assertEquals(57.12, line.get("reactions").get(0).get("max").asDouble(), 0.01);
        assertTrue(line.get("stations").size() >= 21);
        for (String k : new String[] {"x", "span", "M_max", "M_min", "V_max", "V_min"}) {
            assertTrue(line.get("stations").get(0).has(k), k);
        }
    }

    @Test
    void inchPoundLinesAndThePlot() throws IOException {
        // Statics by hand, inch-pound: a 20 ft simple span, 12 x 24 in, 150 lb/ft³: own weight 12 x 24 / 144 x
        // 0.150 = 0.300 kip/ft; with 1.0 kip/ft dead and 1.0 kip/ft live, 1.2 D + 1.6 L = 3.16 kip/ft governs
        // over 1.4 D = 1.82: M = 3.16 x 20² / 8 = 158.0 kip·ft.
        Path f = write("us.yaml", """
                units: US
                concrete: {fc: 4000}
                steel: {fy: 60000}
                lines:
                  - id: R-1
                    spans: [20]
                    supports: [{kind: wall}]
                    loads: {dead: 1.0, live: 1.0}
                    section: {width: 12, height: 24}
                """);
        Path plots = dir.resolve("plots");
        Cli r = Cli.run("analyse", f.toString(), "--format", "json", "--plot", plots.toString());
        assertEquals(0, r.exit(), r.err());
        JsonNode span = new ObjectMapper()
                .readTree(r.out())
                .get("lines")
                .get(0)
                .get("spans")
                .get(0);
        assertEquals(158.0, span.get("M_span_max").asDouble(), 0.05);
        String svg = Files.readString(plots.resolve("R-1-envelope.svg"));
        assertTrue(svg.startsWith("<?xml") || svg.startsWith("<svg"), svg.substring(0, 40));
        // a second run refuses to replace the plot without --force
        Cli again = Cli.run("analyse", f.toString(), "--plot", plots.toString());
        assertEquals(2, again.exit());
        assertTrue(again.err().contains("--force"), again.err());
    }
}
