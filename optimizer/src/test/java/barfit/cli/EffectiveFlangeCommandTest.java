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
 * A flange wider than Table 6.3.2.1 allows is taken at its effective width by every command: the beam is
 * checked and designed exactly as if that width had been given. Limits by hand from ACI 318-19 Table
 * 6.3.2.1 (T-beam overhang ≤ min(8 hf, sw/2, ln/8)); the beams are invented.
 */
class EffectiveFlangeCommandTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    private Path write(String name, String text) throws IOException {
        Path f = dir.resolve(name);
        Files.writeString(f, text);
        return f;
    }

    private static JsonNode beam(JsonNode root, String id) {
        for (JsonNode b : root.get("beams")) {
            if (b.get("id").asText().equals(id)) {
                return b;
            }
        }
        throw new AssertionError("no beam " + id);
    }

    /** Each section's place, bars and φMn: what the flange width could change in a span's design. */
    private static String strength(JsonNode beam) {
        StringBuilder sb = new StringBuilder();
        for (JsonNode s : beam.get("sections")) {
            sb.append(s.get("at"))
                    .append(s.get("tension"))
                    .append(s.get("compression"))
                    .append(s.get("phi_Mn"))
                    .append('\n');
        }
        return sb.toString();
    }

    private static JsonNode check(JsonNode beam, String id) {
        for (JsonNode c : beam.get("checks")) {
            if (c.get("id").asText().equals(id)) {
                return c;
            }
        }
        throw new AssertionError("no check " + id);
    }

    @Test
    void checkTakesTheFlangeAtItsEffectiveWidth() throws IOException {
        // bw = 300, hf = 120, span 6 m: bf,max = 300 + 2 min(960, 750) = 1800 mm; with sw = 1000 mm,
        // 300 + 2 min(960, 500, 750) = 1300 mm (Table 6.3.2.1, by hand)
        String beam = """
                  - id: %s
                    section: {width: 300, height: 500, flange: {width: %s, thickness: 120%s}}
                    bottom: [{bar: "29", count: 4}]
                    Mu: 300
                    span: 6
                    ends: simple
                """;
        Path f = write(
                "tees.yaml",
                "units: SI\nconcrete: {fc: 28}\nsteel: {fy: 420}\nbeams:\n"
                        + beam.formatted("WIDE", 2400, "") + beam.formatted("EXACT", 1800, "")
                        + beam.formatted("NEAR", 2400, ", clear_to_next_web: 1000")
                        + beam.formatted("NEAR-EXACT", 1300, ""));
        Cli json = Cli.run("check", f.toString(), "--format", "json");
        assertEquals(0, json.exit(), json.out() + json.err());
        JsonNode root = JSON.readTree(json.out());
        JsonNode wide = beam(root, "WIDE");
        JsonNode exact = beam(root, "EXACT");
        assertTrue(wide.get("ok").asBoolean());
        assertEquals(exact.get("phi_Mn").asDouble(), wide.get("phi_Mn").asDouble(), 1e-9);
        assertEquals(exact.get("c").asDouble(), wide.get("c").asDouble(), 1e-9);
        JsonNode fw = check(wide, "flange_width");
        assertTrue(fw.get("ok").asBoolean());
        assertTrue(
                fw.get("note").asText().contains("flange given 2400 mm, taken at its effective width 1800 mm"),
                fw.toString());
        assertEquals(
                beam(root, "NEAR-EXACT").get("phi_Mn").asDouble(),
                beam(root, "NEAR").get("phi_Mn").asDouble(),
                1e-9);
        assertTrue(
                !check(beam(root, "NEAR"), "flange_width").get("note").asText().contains("sw/2 limit not checked"));
        Cli text = Cli.run("check", f.toString());
        assertTrue(
                text.out().contains("flange 1800 × 120 (given 2400, taken at its effective width, Table 6.3.2.1)"),
                text.out());
        assertTrue(
                text.out().contains("note, flange_width: flange given 2400 mm, taken at its effective width 1800 mm"),
                text.out());
    }

    @Test
    void inchPoundNoteIsInInches() throws IOException {
        // bw = 12 in, hf = 5 in, span 20 ft (240 in): overhang min(8 × 5, 240 / 8) = 30 in: bf,max = 72 in
        Path f = write("us.yaml", """
                units: US
                concrete: {fc: 4000}
                steel: {fy: 60000}
                beams:
                  - id: U
                    section: {width: 12, height: 24, flange: {width: 96, thickness: 5}}
                    bottom: [{bar: "8", count: 3}]
                    Mu: 150
                    span: 20
                    ends: simple
                """);
        Cli json = Cli.run("check", f.toString(), "--format", "json");
        assertEquals(0, json.exit(), json.out() + json.err());
        JsonNode fw = check(beam(JSON.readTree(json.out()), "U"), "flange_width");
        assertEquals(72, fw.get("demand").asDouble(), 1e-9);
        assertTrue(
                fw.get("note").asText().contains("flange given 96 in, taken at its effective width 72 in"),
                fw.toString());
    }

    private static final String DESIGN_SETTINGS = """
            units: SI
            concrete: {fc: 28, aggregate: 20}
            steel: {fy: 420}
            search:
              widths: [250, 300, 350, 400]
              depth: {min: 400, max: 750, step: 25}
              bar_sizes: ["16", "19", "22", "25", "29"]
              max_layers: 2
              stirrups: {sizes: ["10"], legs: [2, 4], spacing: {min: 75, max: 300, step: 25}}
            beams:
            """;

    @Test
    void designOfOneSectionUsesTheEffectiveWidth() throws IOException {
        // Table 6.3.2.1: 300 + 2 min(8 × 120, 6000 / 8) = 1800 mm on the fixed 300 mm web
        String beam = """
                  - id: %s
                    Mu: 420
                    width: 300
                    flange: {width: %d, thickness: 120}
                    span: 6
                    ends: simple
                """;
        Path f = write("one.yaml", DESIGN_SETTINGS + beam.formatted("WIDE", 2400) + beam.formatted("EXACT", 1800));
        Cli run = Cli.run("design", f.toString(), "--format", "json");
        assertEquals(0, run.exit(), run.out() + run.err());
        JsonNode root = JSON.readTree(run.out());
        JsonNode wide = beam(root, "WIDE");
        JsonNode exact = beam(root, "EXACT");
        assertEquals("optimal", wide.get("status").asText(), "a wide flange no longer makes the beam fail");
        assertEquals(
                exact.get("cost").get("total").asDouble(),
                wide.get("cost").get("total").asDouble(),
                1e-9);
        assertEquals(exact.get("phi_Mn").asDouble(), wide.get("phi_Mn").asDouble(), 1e-9);
        assertEquals(exact.get("tension").toString(), wide.get("tension").toString());
    }

    @Test
    void wholeSpanDesignUsesTheEffectiveWidthForStrengthAndDeflection() throws IOException {
        // a span capped below Table 9.3.1.1 (deflection computed): 400 + 2 min(8 × 150, 9600 / 8) = 2800 mm;
        // with sw = 2000: 400 + 2 min(1200, 1000, 1200) = 2400 mm (Table 6.3.2.1, by hand)
        String beam = """
                  - id: %s
                    span: 9.6
                    ends: both-ends-continuous
                    moments: {left: -240, mid: 160, right: -240}
                    shear: {left: 170, right: 170}
                    service: {dead: 16, live: 8, sustained_live: 0.5}
                    max_depth: 400
                    width: 400
                    flange: {width: %d, thickness: 150%s}
                """;
        Path f = write(
                "span.yaml",
                DESIGN_SETTINGS
                        + beam.formatted("WIDE", 3600, "")
                        + beam.formatted("EXACT", 2800, "")
                        + beam.formatted("NEAR", 3600, ", clear_to_next_web: 2000")
                        + beam.formatted("NEAR-EXACT", 2400, ""));
        Cli run = Cli.run("design", f.toString(), "--format", "json");
        assertEquals(0, run.exit(), run.out() + run.err());
        JsonNode root = JSON.readTree(run.out());
        for (String[] pair : new String[][] {{"WIDE", "EXACT"}, {"NEAR", "NEAR-EXACT"}}) {
            JsonNode given = beam(root, pair[0]);
            JsonNode exact = beam(root, pair[1]);
            assertEquals("optimal", given.get("status").asText());
            assertEquals(
                    exact.get("cost").get("total").asDouble(),
                    given.get("cost").get("total").asDouble(),
                    1e-9);
            assertTrue(given.get("deflection").get("computed").asBoolean());
            assertEquals(
                    exact.get("deflection").get("long_term").asDouble(),
                    given.get("deflection").get("long_term").asDouble(),
                    1e-9);
            assertEquals(strength(exact), strength(given));
        }
        Cli text = Cli.run("design", f.toString(), "--beam", "WIDE");
        assertTrue(
                text.out().contains("flange 2800 × 150 (given 3600, taken at its effective width, Table 6.3.2.1)"),
                text.out());
        assertTrue(text.out().contains("24.3.4"), "the flange over the supports is in tension: " + text.out());
    }

    @Test
    void scheduleFromCsvUsesTheEffectiveWidth() throws IOException {
        // CSV beams: the same flange rule, and the clear distance to the next web as a column
        Path settings = write("settings.yaml", DESIGN_SETTINGS.replace("beams:\n", ""));
        Path csv = write("beams.csv", """
                id,span,ends,m_left,m_mid,m_right,vu,width,flange_width,flange_thickness,flange_clear_to_next_web
                WIDE,6.0,both-ends-continuous,-200,140,-200,150,300,2400,120,
                EXACT,6.0,both-ends-continuous,-200,140,-200,150,300,1800,120,
                NEAR,6.0,both-ends-continuous,-200,140,-200,150,300,2400,120,1000
                NEAR-EXACT,6.0,both-ends-continuous,-200,140,-200,150,300,1300,120,
                """);
        Cli run = Cli.run("schedule", settings.toString(), "--beams", csv.toString(), "--format", "json", "--quiet");
        assertEquals(0, run.exit(), run.out() + run.err());
        JsonNode root = JSON.readTree(run.out());
        for (String[] pair : new String[][] {{"WIDE", "EXACT"}, {"NEAR", "NEAR-EXACT"}}) {
            JsonNode given = beam(root, pair[0]);
            JsonNode exact = beam(root, pair[1]);
            assertEquals(
                    exact.get("cost").get("total").asDouble(),
                    given.get("cost").get("total").asDouble(),
                    1e-9);
            assertEquals(strength(exact), strength(given));
        }
    }
}
