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
 * Torsion through {@code check}: Tu read in the file's units, compatibility torsion marked, the torsion
 * checks in the JSON and text reports. Values by hand from ACI 318-19 22.7 and 9.6.4 (the arithmetic is
 * in the section model's TorsionTest, for the same beams); the beams are invented.
 */
class TorsionCommandTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    private Path write(String name, String text) throws IOException {
        Path f = dir.resolve(name);
        Files.writeString(f, text);
        return f;
    }

    private static JsonNode check(JsonNode beam, String id) {
        for (JsonNode c : beam.get("checks")) {
            if (c.get("id").asText().equals(id)) {
                return c;
            }
        }
        throw new AssertionError("no check " + id);
    }

    private static final String SI_SPANDREL = """
            units: SI
            concrete: {fc: 28, aggregate: 20}
            steel: {fy: 420}
            cover: 40
            stirrup: "13"
            beams:
              - id: S1
                section: {width: 350, height: 600, flange: {width: 1850, thickness: 150, type: L}}
                bottom: [{bar: "25", count: 4}]
                top: [{bar: "19", count: 3}]
                Mu: 250
                Vu: 150
                Tu: 60
            %s
                stirrups: {bar: "13", legs: 2, spacing: 120}
                skin: {bar: "13", spacing: 100}
            """;

    @Test
    void compatibilityTorsionIsReducedThroughTheCommand() throws IOException {
        // Hand calculation (ACI 318M-19 Table 22.7.5.1, 22.7.3.2, 22.7.6.1): Acp = 277 500 mm², pcp = 2800 mm
        // with the 450 mm overhang of 9.2.4.4: φTcr = 0.75 × 0.33 × √28 × 277 500² / 2800 = 36.018 kN·m; At/s =
        // 36.018e6 / (0.75 × 2 × 0.85 × 257.3 × 507.3 × 420) = 0.51530 mm²/mm; Av/s = (150 / 0.75 − 168.316) kN
        // / (420 × 534.6) = 0.14111 mm²/mm; (Av + 2At)/s = 0.14111 + 1.03060 = 1.17171 mm²/mm
        Path f = write("compat.yaml", SI_SPANDREL.formatted("    torsion: compatibility"));
        Cli json = Cli.run("check", f.toString(), "--format", "json");
        assertEquals(0, json.exit(), json.err() + json.out());
        JsonNode beam = JSON.readTree(json.out()).get("beams").get(0);
        assertEquals(60.0, beam.get("Tu").asDouble(), 1e-9);
        assertEquals("compatibility", beam.get("torsion").asText());
        JsonNode compat = check(beam, "torsion_compatibility");
        assertTrue(compat.get("ok").asBoolean());
        assertEquals(36.018, compat.get("limit").asDouble(), 0.001);
        assertEquals("kN·m", compat.get("unit").asText());
        assertEquals(1.17171, check(beam, "torsion_transverse").get("demand").asDouble(), 1e-5);
        assertEquals("mm²/mm", check(beam, "torsion_transverse").get("unit").asText());

        Cli text = Cli.run("check", f.toString(), "--no-trail");
        assertEquals(0, text.exit());
        assertTrue(text.out().contains("Tu = 60.0 kN·m (compatibility torsion)"), text.out());
        assertTrue(text.out().contains("note, torsion_compatibility:"), text.out());
        assertTrue(text.out().contains("22.7.3.3"), text.out());

        // the same beam as equilibrium torsion: At/s = 60e6 / 69.898e6 = 0.85840, (Av + 2At)/s = 1.85791
        Cli equilibrium =
                Cli.run("check", write("eq.yaml", SI_SPANDREL.formatted("")).toString(), "--format", "json");
        JsonNode eq = JSON.readTree(equilibrium.out()).get("beams").get(0);
        assertEquals("equilibrium", eq.get("torsion").asText());
        assertFalse(eq.get("checks").toString().contains("torsion_compatibility"));
        assertEquals(1.85791, check(eq, "torsion_transverse").get("demand").asDouble(), 1e-5);
    }

    @Test
    void inchPoundTorsionReadsKipFeet() throws IOException {
        // Hand calculation from ACI 318-19 (inch-pound), the beam of TorsionTest: web 14 × 24 in with a 6 in
        // slab on one side 44 in wide, f'c = 4000 psi, fy = 60 000 psi, #4 stirrups at 5 in, 4 #8 bottom, Vu =
        // 40 kip, Tu = 20 kip·ft: Tth = √4000 × 444² / 112 = 111 321 lb·in, φTth = 6.9576 kip·ft;
        // (Av + 2At)/s = 0.011829 + 2 × 0.014575 = 0.040979 in²/in; Al,min = 2.34009 − 0.90365 = 1.43644 in².
        // Skin bars at 4 in (two a face over h/2, at 6.5 and 10.5 in) keep the side bars 11 in apart, within
        // 12 in (9.7.5.1); without them the corner bars are 24 − 2 × 2.5 = 19 in apart.
        Path f = write("us.yaml", """
                units: US
                concrete: {fc: 4000, aggregate: 0.75}
                steel: {fy: 60000}
                cover: 1.5
                stirrup: "4"
                beams:
                  - id: S1
                    section: {width: 14, height: 24, flange: {width: 44, thickness: 6, type: L}}
                    bottom: [{bar: "8", count: 4}]
                    top: [{bar: "8", count: 2}]
                    Mu: 100
                    Vu: 40
                    Tu: 20
                    stirrups: {bar: "4", legs: 2, spacing: 5}
                    skin: {bar: "4", spacing: 4}
                """);
        Cli json = Cli.run("check", f.toString(), "--format", "json");
        assertEquals(0, json.exit(), json.err() + json.out());
        JsonNode beam = JSON.readTree(json.out()).get("beams").get(0);
        assertEquals(6.9576, check(beam, "torsion_threshold").get("limit").asDouble(), 1e-4);
        assertEquals(0.040979, check(beam, "torsion_transverse").get("demand").asDouble(), 1e-6);
        assertEquals("in²/in", check(beam, "torsion_transverse").get("unit").asText());
        assertEquals(1.43644, check(beam, "torsion_longitudinal").get("demand").asDouble(), 1e-5);
        assertEquals("in²", check(beam, "torsion_longitudinal").get("unit").asText());
        assertEquals(11.0, check(beam, "torsion_bar_spacing").get("demand").asDouble(), 1e-9);

        Cli bare = Cli.run(
                "check",
                write("bare.yaml", Files.readString(f).replace("    skin: {bar: \"4\", spacing: 4}\n", ""))
                        .toString(),
                "--format",
                "json");
        assertEquals(1, bare.exit());
        JsonNode open = check(JSON.readTree(bare.out()).get("beams").get(0), "torsion_bar_spacing");
        assertFalse(open.get("ok").asBoolean());
        assertEquals(19.0, open.get("demand").asDouble(), 1e-9);
    }

    @Test
    void aBeamWithoutTuHasNoTorsionChecks() throws IOException {
        Path f = write("none.yaml", SI_SPANDREL.formatted("").replace("    Tu: 60\n", ""));
        Cli json = Cli.run("check", f.toString(), "--format", "json");
        JsonNode beam = JSON.readTree(json.out()).get("beams").get(0);
        assertFalse(beam.has("Tu"));
        assertFalse(beam.get("checks").toString().contains("torsion"));
    }
}
