package barfit.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.cli.Cli;
import barfit.golden.Golden;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** examples/lines runs through {@code analyse} and {@code design} as the README shows, the same bytes twice. */
class LineExamplesTest {
    static final String FILE = "lines/ashgrove-depot-lines-si.yaml";

    @TempDir
    Path dir;

    @Test
    void analyseAndDesignTheLines() throws IOException {
        Cli text = Cli.run("analyse", FILE);
        assertEquals(0, text.exit(), text.err());
        assertTrue(text.out().contains("CAUTION"));
        Golden.check("lines/ashgrove-depot-lines-si.analyse.txt", text.out());
        Cli jsonRun = Cli.run("analyse", FILE, "--format", "json");
        Golden.check("lines/ashgrove-depot-lines-si.analyse.json", jsonRun.out());
        JsonNode root = new ObjectMapper().readTree(jsonRun.out());
        assertEquals(2, root.get("lines").size());
        for (JsonNode l : root.get("lines")) {
            for (String k : new String[] {"id", "reactions", "stations", "spans"}) {
                assertTrue(l.has(k), k);
            }
            for (JsonNode s : l.get("spans")) {
                for (String k : new String[] {
                    "index", "M_left_face", "M_span_max", "M_right_face", "V_left_d", "V_right_d", "inflection"
                }) {
                    assertTrue(s.has(k), k);
                }
            }
        }
        // the committed plot is the one the command draws
        Cli plot = Cli.run("analyse", FILE, "--line", "L1-B", "--plot", dir.toString());
        assertEquals(0, plot.exit(), plot.err());
        assertEquals(
                Files.readString(Path.of("lines/L1-B-envelope.svg")),
                Files.readString(dir.resolve("L1-B-envelope.svg")),
                "regenerate with ./barfit analyse " + FILE + " --line L1-B --plot examples/lines --force");
        Path designPlots = dir.resolve("design");
        Cli design = Cli.run("design", FILE, "--plot", designPlots.toString());
        assertEquals(0, design.exit(), design.err());
        assertEquals(
                Files.readString(Path.of("lines/L1-B-capacity.svg")),
                Files.readString(designPlots.resolve("L1-B-capacity.svg")),
                "regenerate with ./barfit design " + FILE + " --plot DIR and copy L1-B-capacity.svg");
        assertEquals(
                Files.readString(Path.of("lines/L1-B-elevation.svg")),
                Files.readString(designPlots.resolve("L1-B-elevation.svg")),
                "regenerate with ./barfit design " + FILE + " --plot DIR and copy L1-B-elevation.svg");
        // L1-4 is analysed by the coefficients of 6.5: no stations to detail it on, so no elevation
        assertFalse(Files.exists(designPlots.resolve("L1-4-elevation.svg")));
        assertTrue(design.out().contains("Line L1-B: one section for the whole line"));
        assertTrue(design.out().contains("Line L1-4: designed span by span from its analysis"));
        Golden.check("lines/ashgrove-depot-lines-si.design.txt", design.out());
        Golden.check(
                "lines/ashgrove-depot-lines-si.design.json",
                Cli.run("design", FILE, "--format", "json").out());
        Cli compare = Cli.run("compare", FILE, "--beam", "L1-B/span 2");
        assertEquals(0, compare.exit(), compare.err());
        assertTrue(compare.out().contains("Beam L1-B/span 2"));
        Cli schedule = Cli.run("schedule", FILE, "--quiet");
        assertEquals(0, schedule.exit(), schedule.err());
        assertTrue(schedule.out().contains("L1-4/span 3"));
    }

    @Test
    void theLibraryAsLinesIsScheduled() throws IOException {
        // schedule/library-lines-si.yaml: 24 lines (7 per level, two stair trimmers, a skylight trimmer),
        // 56 parts with the two canopies, rationalised to at most 6 section sizes and 3 bar sizes
        Cli r = Cli.run("schedule", "schedule/library-lines-si.yaml", "--format", "json", "--quiet");
        assertEquals(0, r.exit(), r.err());
        JsonNode root = new ObjectMapper().readTree(r.out());
        assertEquals(56, root.get("beams").size());
        assertTrue(root.toString().contains("OPTIMAL"));
    }

    @Test
    void anEdgeLineUnderTorqueIsAnalysedAndDesigned() throws IOException {
        // lines/tollgate-edge-line-si.yaml: three spans carrying a distributed torque, twist restrained at
        // every column; analyse gives the torque envelope, design designs each span for it
        String file = "lines/tollgate-edge-line-si.yaml";
        Cli analyse = Cli.run("analyse", file);
        assertEquals(0, analyse.exit(), analyse.err());
        assertTrue(analyse.out().contains("T left face"));
        Golden.check("lines/tollgate-edge-line-si.analyse.txt", analyse.out());
        Cli analyseJson = Cli.run("analyse", file, "--format", "json");
        Golden.check("lines/tollgate-edge-line-si.analyse.json", analyseJson.out());
        JsonNode torsion = new ObjectMapper()
                .readTree(analyseJson.out())
                .get("lines")
                .get(0)
                .get("torsion");
        assertEquals(3, torsion.size());
        Cli design = Cli.run("design", file);
        assertEquals(0, design.exit(), design.err());
        Golden.check("lines/tollgate-edge-line-si.design.txt", design.out());
        Cli designJson = Cli.run("design", file, "--format", "json");
        assertEquals(0, designJson.exit(), designJson.err());
        Golden.check("lines/tollgate-edge-line-si.design.json", designJson.out());
        // every span's zones were re-verified with their torsion checks, and passed
        String json = designJson.out();
        for (String zone : new String[] {"left", "middle", "right"}) {
            assertTrue(json.contains("\"torsion_longitudinal." + zone + "\""), zone);
            assertTrue(json.contains("\"torsion_transverse." + zone + "\""), zone);
        }
        assertTrue(torsionChecksPass(new ObjectMapper().readTree(json)) > 0, "torsion checks, all passing");
    }

    /** How many torsion checks the tree holds; fails on one that does not pass. */
    private static int torsionChecksPass(JsonNode n) {
        int count = 0;
        if (n.has("id") && n.get("id").asText().startsWith("torsion_")) {
            assertTrue(n.get("ok").asBoolean(), n.get("id").asText());
            count++;
        }
        for (JsonNode child : n) {
            count += torsionChecksPass(child);
        }
        return count;
    }
}
