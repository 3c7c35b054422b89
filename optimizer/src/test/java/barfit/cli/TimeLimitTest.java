package barfit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;

/**
 * A time limit too short for CP-SAT's first solution (a nanosecond) gives the generator's cheapest
 * passing design, said to be not proven: "feasible" with an objective and no bound or gap, in text and
 * JSON, for sections and for spans alike. A span whose options hold one combination cheaper than all the
 * others, or a section whose cheapest candidate is below all the others, needs no solve and stays proven
 * optimal, time limit or not ({@code DecidedSectionTest} covers a section's unproven answer).
 */
class TimeLimitTest {
    private static final String NANOSECOND = "0.000000001";

    @Test
    void sectionsFoundButNotProvenSaySo() throws Exception {
        check("../examples/design/clinic-beams-si.yaml", "the cheapest of ", false);
    }

    @Test
    void spansFoundButNotProvenSaySo() throws Exception {
        check("../examples/design/clinic-line-c-spans-si.yaml", "the generator's cheapest design is given", true);
    }

    /** @param someUnproven whether the file has a beam the enumeration or comparison cannot decide */
    private static void check(String file, String words, boolean someUnproven) throws Exception {
        Cli text = Cli.run("design", file, "--time-limit", NANOSECOND);
        assertEquals(0, text.exit(), text.err());
        long proofs =
                text.out().lines().filter(l -> l.strip().startsWith("proof")).count();
        long unproven = text.out()
                .lines()
                .filter(l ->
                        l.contains("not proven: the time limit ended CP-SAT before it " + "had a solution; " + words))
                .count();
        long enumerated = text.out()
                .lines()
                .filter(l -> l.strip().startsWith("proof")
                        && (l.contains("optimal by enumeration") || l.contains("optimal by comparison")))
                .count();
        assertTrue(proofs > 0 && proofs == unproven + enumerated && (unproven > 0 || !someUnproven), text.out());
        Cli json = Cli.run("design", file, "--time-limit", NANOSECOND, "--format", "json");
        assertEquals(0, json.exit(), json.err());
        JsonNode beams = new ObjectMapper().readTree(json.out()).get("beams");
        assertTrue(beams.size() > 0);
        for (JsonNode b : beams) {
            String solver = b.get("proof").get("solver").asText();
            if (solver.startsWith("enumeration") || solver.startsWith("comparison")) {
                assertEquals("optimal", b.get("status").asText(), b.toString());
                continue;
            }
            assertEquals("feasible", b.get("status").asText(), b.toString());
            JsonNode p = b.get("proof");
            assertEquals("feasible", p.get("status").asText(), p.toString());
            assertTrue(p.get("objective").isNumber() && p.get("objective").asDouble() > 0, p.toString());
            assertTrue(p.get("bound").isNull() && p.get("gap").isNull(), p.toString());
            if (p.get("basis").asText().equals("per span")) { // the span's proof is in the currency of its cost
                assertEquals(
                        b.get("cost").get("total").asDouble(),
                        p.get("objective").asDouble(),
                        1e-4,
                        p.toString());
            }
        }
    }
}
