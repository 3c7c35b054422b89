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
 * Lines through design and sweep end to end: the capacity plot design draws (kept unless --force), and a line
 * of one section swept as one object.
 */
class LineCommandsTest {
    @TempDir
    Path dir;

    private Path write(String name, String text) throws IOException {
        Path p = dir.resolve(name);
        Files.writeString(p, text);
        return p;
    }

    @Test
    void designPlotsEachLinesStrengthOverItsEnvelope() throws IOException {
        // invented two-span line: design --plot writes the capacity plot, keeps it on a second run
        // (exit 2, no stack trace) and replaces it with --force
        Path f = write("two.yaml", """
                units: SI
                concrete: {fc: 30}
                steel: {fy: 420}
                search:
                  widths: [300]
                  depth: {min: 500, max: 600, step: 50}
                lines:
                  - id: D-2
                    spans: [6.0, 6.0]
                    supports: [{width: 300, kind: wall}]
                    loads: {dead: 15, live: 8}
                    section: {width: 300, height: 550}
                """);
        Path plots = dir.resolve("design-plots");
        Cli r = Cli.run("design", f.toString(), "--plot", plots.toString());
        assertEquals(0, r.exit(), r.err());
        Path svg = plots.resolve("D-2-capacity.svg");
        String text = Files.readString(svg);
        assertTrue(text.contains("φMn"), "the strength is drawn");
        Cli again = Cli.run("design", f.toString(), "--plot", plots.toString());
        assertEquals(2, again.exit());
        assertTrue(again.err().contains("D-2-capacity.svg") && again.err().contains("--force"), again.err());
        assertEquals(text, Files.readString(svg), "kept as it was");
        Cli forced = Cli.run("design", f.toString(), "--plot", plots.toString(), "--force");
        assertEquals(0, forced.exit(), forced.err());
        assertEquals(text, Files.readString(svg), "the same plot again, byte for byte");
    }

    @Test
    void aLineOfOneSectionIsSweptAsOneObject() throws IOException {
        // invented two-span line: sweep caps the whole line's depth; each point is the line designed as one
        // object, so the cost never rises as the cap is raised and at the deepest cap equals design's total
        Path f = write("sweep.yaml", """
                units: SI
                concrete: {fc: 30}
                steel: {fy: 420}
                search:
                  widths: [250, 300]
                  depth: {min: 400, max: 600, step: 50}
                lines:
                  - id: S-2
                    spans: [6.5, 6.5]
                    supports: [{width: 300, kind: wall}]
                    loads: {dead: 18, live: 10}
                    section: {width: 300, height: 550}
                """);
        Cli sweep = Cli.run("sweep", f.toString(), "--format", "json");
        assertEquals(0, sweep.exit(), sweep.err());
        JsonNode beams = new ObjectMapper().readTree(sweep.out()).get("beams");
        assertEquals(1, beams.size(), "one object for the line, not one per span");
        assertEquals("S-2", beams.get(0).get("id").asText());
        double last = Double.POSITIVE_INFINITY;
        for (JsonNode p : beams.get(0).get("points")) {
            if (p.get("feasible").asBoolean()) {
                assertTrue(p.get("cost").asDouble() <= last + 1e-9, "the cost never rises with the cap: " + p);
                last = p.get("cost").asDouble();
            }
        }
        JsonNode design = new ObjectMapper()
                .readTree(Cli.run("design", f.toString(), "--format", "json").out())
                .get("lines")
                .get(0);
        assertEquals(design.get("cost").get("total").asDouble(), last, 1e-6);
    }

    @Test
    void aCsvLineColumnKeepsTheLinesSpansAtOneSection() throws IOException {
        // invented schedule: two spans of line LA and the same two spans with no line, rationalised with room
        // for every size; the spans of the line keep one b x h (one set of forms), the others each their own
        Path settings = write("s.yaml", """
                units: SI
                concrete: {fc: 28}
                steel: {fy: 420}
                search:
                  widths: [250, 300, 350, 400]
                  depth: {min: 400, max: 700, step: 50}
                rationalise: {max_section_sizes: 6, max_bar_sizes: 4}
                """);
        Path beams = write("b.csv", """
                id,span,ends,m_left,m_mid,m_right,v_left,v_right,line
                A1,7.0,one-end-continuous,,120,-180,95,120,LA
                A2,7.0,one-end-continuous,-300,250,,190,160,LA
                C1,7.0,one-end-continuous,,120,-180,95,120,
                C2,7.0,one-end-continuous,-300,250,,190,160,
                """);
        Cli r = Cli.run("schedule", settings.toString(), "--beams", beams.toString(), "--format", "json", "--quiet");
        assertEquals(0, r.exit(), r.err());
        java.util.Map<String, String> size = new java.util.HashMap<>();
        for (JsonNode b : new ObjectMapper().readTree(r.out()).get("beams")) {
            size.put(
                    b.get("id").asText(),
                    b.get("width").asDouble() + " x " + b.get("height").asDouble());
        }
        assertEquals(size.get("A1"), size.get("A2"), "the line's spans share one section: " + size);
        assertTrue(!size.get("C1").equals(size.get("C2")), "alone they would not: " + size);
    }
}
