package barfit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Torsion through {@code design}, {@code compare} and {@code sweep}: Tu read in the file's units (kN·m, kip·ft)
 * and designed for, its checks in the reports, the same beam costing more with it than without. The beams are
 * invented.
 */
class TorsionDesignCommandTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    private Path write(String name, String text) throws IOException {
        Path f = dir.resolve(name);
        Files.writeString(f, text);
        return f;
    }

    private static final String SI = """
            units: SI
            concrete: {fc: 28, aggregate: 20}
            steel: {fy: 420}
            cover: 40
            stirrup: "10"
            search:
              widths: [300, 350, 400]
              depth: {min: 450, max: 700, step: 50}
              bar_sizes: ["16", "19", "22", "25"]
            beams:
              - id: E1
                Mu: 220
                Vu: 150
            %s
            """;

    @Test
    void designReadsTuAndDesignsForIt() throws IOException {
        Cli plain = Cli.run("design", write("plain.yaml", SI.formatted("")).toString(), "--format", "json");
        Cli torsion =
                Cli.run("design", write("t.yaml", SI.formatted("    Tu: 35")).toString(), "--format", "json");
        assertEquals(0, torsion.exit(), torsion.err());
        JsonNode p = JSON.readTree(plain.out()).get("beams").get(0);
        JsonNode t = JSON.readTree(torsion.out()).get("beams").get(0);
        assertEquals(35.0, t.get("Tu").asDouble(), 1e-9);
        assertEquals("equilibrium", t.get("torsion").asText());
        assertFalse(p.has("Tu"));
        assertEquals("optimal", t.get("status").asText());
        boolean transverse = false;
        for (JsonNode c : t.get("checks")) {
            assertTrue(c.get("ok").asBoolean(), c.toString());
            transverse |= c.get("id").asText().equals("torsion_transverse");
        }
        assertTrue(transverse, "the torsion checks are reported");
        assertTrue(t.get("cost").get("total").asDouble()
                > p.get("cost").get("total").asDouble());

        Cli text = Cli.run(
                "design",
                write("t2.yaml", SI.formatted("    Tu: 35\n    torsion: compatibility"))
                        .toString());
        assertEquals(0, text.exit(), text.err());
        assertTrue(text.out().contains("Tu = 35.0 kN·m   OPTIMAL"), text.out());
        assertTrue(text.out().matches("(?s).*\\n  torsion +Tu = 35.0 kN·m \\(compatibility\\) ≥ φTth.*"), text.out());
    }

    @Test
    void compareAndSweepPriceTheTorsion() throws IOException {
        Path f = write("study.yaml", SI.formatted("    Tu: 35\n    max_depth: 500"));
        Cli compare = Cli.run("compare", f.toString(), "--format", "json");
        assertEquals(0, compare.exit(), compare.err());
        Cli sweep = Cli.run("sweep", f.toString());
        assertEquals(0, sweep.exit(), sweep.err());
        assertTrue(sweep.out().contains("shallowest cap with a passing design"), sweep.out());
    }

    @Test
    void inchPoundTorsionIsReadInKipFeet() throws IOException {
        String us = """
                units: US
                concrete: {fc: 4000}
                steel: {fy: 60000}
                cover: 1.5
                stirrup: "3"
                search:
                  widths: [12, 14, 16]
                  depth: {min: 18, max: 28, step: 2}
                  bar_sizes: ["6", "7", "8", "9"]
                beams:
                  - id: U1
                    Mu: 160
                    Vu: 35
                    Tu: 25
                """;
        Cli r = Cli.run("design", write("us.yaml", us).toString(), "--format", "json");
        assertEquals(0, r.exit(), r.err());
        JsonNode b = JSON.readTree(r.out()).get("beams").get(0);
        assertEquals(25.0, b.get("Tu").asDouble(), 1e-9);
        assertEquals("optimal", b.get("status").asText());
    }
}
