package barfit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The carbon options through the command line, each against another command's answer: a frontier's points
 * are what {@code design --carbon-cap} gives at their carbon, and a cap below its lowest-carbon end is
 * refused with that end's carbon; a schedule designed for the least carbon has no more carbon, beam by beam,
 * and no less cost than the one designed for the least cost.
 */
class CarbonCommandsTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final String CLINIC = "../examples/design/clinic-beams-si.yaml";

    @Test
    void eachFrontierPointIsTheCheapestDesignWithinItsCarbon() throws IOException {
        Cli frontier = Cli.run("frontier", CLINIC, "--beam", "F1-03", "--format", "json");
        assertEquals(0, frontier.exit(), frontier.err());
        JsonNode points = JSON.readTree(frontier.out()).get("beams").get(0).get("points");
        assertTrue(points.size() >= 2, "the clinic's T-beam has a frontier of more than one design");
        for (JsonNode pt : points) {
            // the point's carbon as printed (to 0.001 kg) plus half a unit of print: within the cap
            double cap = pt.get("carbon").asDouble() + 0.0005;
            Cli design = Cli.run(
                    "design", CLINIC, "--beam", "F1-03", "--carbon-cap", String.valueOf(cap), "--format", "json");
            assertEquals(0, design.exit(), design.err());
            JsonNode b = JSON.readTree(design.out()).get("beams").get(0);
            assertEquals(
                    pt.get("cost").asDouble(),
                    b.get("cost_per_length").get("total").asDouble(),
                    1e-3);
            assertEquals(
                    pt.get("carbon").asDouble(),
                    b.get("carbon_per_length").get("total").asDouble(),
                    1e-3);
            assertTrue(b.get("carbon_per_length").get("total").asDouble() <= cap);
        }
        double least = points.get(points.size() - 1).get("carbon").asDouble();
        Cli lowest = Cli.run("design", CLINIC, "--beam", "F1-03", "--objective", "carbon", "--format", "json");
        assertEquals(
                least,
                JSON.readTree(lowest.out())
                        .get("beams")
                        .get(0)
                        .get("carbon_per_length")
                        .get("total")
                        .asDouble(),
                1e-3,
                "the lowest-carbon end is design --objective carbon");
        Cli below = Cli.run("design", CLINIC, "--beam", "F1-03", "--carbon-cap", String.valueOf(least - 0.5));
        assertEquals(1, below.exit(), below.err());
        assertTrue(below.out().contains("carbon_cap"), below.out());
        assertTrue(below.out().contains("the least carbon of any passing layout is "), below.out());
    }

    /**
     * A whole span's frontier points are what {@code design --carbon-cap} gives at their carbon (per metre of
     * span, rounded up by half a printed unit), and a cap below the lowest-carbon end is refused with the cap
     * that would do.
     */
    @Test
    void aSpansFrontierPointsAreTheCheapestWithinTheirCarbon() throws IOException {
        String gallery = "../examples/design/hollins-hall-gallery-carbon-si.yaml";
        Cli frontier = Cli.run("frontier", gallery, "--beam", "G4-B", "--format", "json");
        assertEquals(0, frontier.exit(), frontier.err());
        JsonNode points = JSON.readTree(frontier.out()).get("beams").get(0).get("points");
        assertTrue(points.size() >= 3, "a frontier of several designs");
        double span = 7.2; // m, G4-B in the file
        for (int k : new int[] {1, points.size() - 1}) {
            JsonNode pt = points.get(k);
            double cap = (pt.get("carbon").asDouble() + 0.05) / span;
            Cli design = Cli.run(
                    "design", gallery, "--beam", "G4-B", "--carbon-cap", String.valueOf(cap), "--format", "json");
            assertEquals(0, design.exit(), design.err());
            JsonNode b = JSON.readTree(design.out()).get("beams").get(0);
            assertEquals(pt.get("cost").asDouble(), b.get("cost").get("total").asDouble(), 1e-3, "point " + k);
            assertEquals(
                    pt.get("carbon").asDouble(), b.get("carbon").get("total").asDouble(), 0.05, "point " + k);
        }
        double least = points.get(points.size() - 1).get("carbon").asDouble() / span;
        Cli below = Cli.run("design", gallery, "--beam", "G4-B", "--carbon-cap", String.valueOf(least - 1));
        assertEquals(1, below.exit(), below.err());
        assertTrue(below.out().contains("carbon_cap"), below.out());
        assertTrue(below.out().contains("--carbon-cap 93.6 or more"), below.out());
    }

    /**
     * {@code compare} and {@code sweep} with {@code --objective carbon} design as {@code design --objective
     * carbon} does: the option at the cap and the sweep's design are its design, each sweep point is the least
     * carbon within its cap (so it never rises as the cap is lifted), and the same command for cost is never
     * lower in cost.
     */
    @Test
    void compareAndSweepMinimiseCarbonAsDesignDoes() throws IOException {
        String hall = "../examples/design/hollins-hall-carbon-si.yaml";
        Cli design = Cli.run("design", hall, "--beam", "R-02", "--objective", "carbon", "--format", "json");
        assertEquals(0, design.exit(), design.err());
        double least = JSON.readTree(design.out())
                .get("beams")
                .get(0)
                .get("carbon_per_length")
                .get("total")
                .asDouble();
        Cli compare = Cli.run("compare", hall, "--beam", "R-02", "--objective", "carbon", "--format", "json");
        assertEquals(0, compare.exit(), compare.err());
        JsonNode atCap =
                JSON.readTree(compare.out()).get("beams").get(0).get("options").get(0);
        assertEquals("at_cap", atCap.get("kind").asText());
        assertEquals(least, atCap.get("carbon").get("total").asDouble(), 1e-3);
        Cli compareText = Cli.run("compare", hall, "--beam", "R-02", "--objective", "carbon");
        assertTrue(compareText.out().contains("Objective: the least embodied carbon"), compareText.out());
        assertTrue(compareText.out().contains("lowest in carbon"), compareText.out());
        Cli sweep = Cli.run("sweep", hall, "--beam", "R-02", "--objective", "carbon", "--format", "json");
        assertEquals(0, sweep.exit(), sweep.err());
        JsonNode b = JSON.readTree(sweep.out()).get("beams").get(0);
        assertEquals(least, b.get("design").get("carbon").get("total").asDouble(), 1e-3);
        Cli sweepCost = Cli.run("sweep", hall, "--beam", "R-02", "--format", "json");
        JsonNode byCost = JSON.readTree(sweepCost.out()).get("beams").get(0).get("points");
        double previous = Double.POSITIVE_INFINITY;
        int k = 0;
        for (JsonNode pt : b.get("points")) {
            if (pt.get("feasible").asBoolean()) {
                double carbon = pt.get("carbon").asDouble();
                assertTrue(carbon <= previous + 1e-9, "carbon never rises as the cap is lifted");
                previous = carbon;
                assertTrue(
                        byCost.get(k).get("cost").asDouble() <= pt.get("cost").asDouble() + 1e-6,
                        "the cost search is never dearer at the same cap");
            }
            k++;
        }
    }

    @Test
    void aScheduleForTheLeastCarbonHasNoMoreCarbonBeamByBeam(@TempDir Path dir) throws IOException {
        // the office example without its rationalise: block (carbon is not offered with one yet)
        String text = Files.readAllLines(Path.of("../examples/schedule/office-us.yaml")).stream()
                .filter(l -> !l.startsWith("rationalise"))
                .collect(Collectors.joining("\n", "", "\n"));
        Path file = dir.resolve("office.yaml");
        Files.writeString(file, text);
        JsonNode cost = JSON.readTree(run(file, "cost"));
        JsonNode carbon = JSON.readTree(run(file, "carbon"));
        assertEquals("carbon", carbon.get("objective").asText());
        assertTrue(!cost.has("objective"));
        Map<String, JsonNode> byId = new HashMap<>();
        cost.get("beams").forEach(b -> byId.put(b.get("id").asText(), b));
        for (JsonNode b : carbon.get("beams")) {
            JsonNode c = byId.get(b.get("id").asText());
            assertTrue(
                    b.get("carbon").get("total").asDouble()
                            <= c.get("carbon").get("total").asDouble() + 1e-6,
                    b.get("id").asText());
            assertTrue(b.get("cost").get("total").asDouble()
                    >= c.get("cost").get("total").asDouble() - 1e-6);
        }
        assertTrue(carbon.get("summary").get("total_carbon").asDouble()
                <= cost.get("summary").get("total_carbon").asDouble() + 1e-6);
        // with its rationalise: block, the schedule minimised for carbon is no higher in carbon than the one for
        // cost (both within the same limits), and its price of standardisation is in carbon
        JsonNode ratCarbon = JSON.readTree(run(Path.of("../examples/schedule/office-us.yaml"), "carbon"));
        JsonNode ratCost = JSON.readTree(run(Path.of("../examples/schedule/office-us.yaml"), "cost"));
        assertTrue(ratCarbon.get("summary").get("total_carbon").asDouble()
                <= ratCost.get("summary").get("total_carbon").asDouble() + 1e-6);
        assertEquals("OPTIMAL", ratCarbon.get("proof").get("status").asText());
        assertEquals(
                ratCarbon.get("summary").get("total_carbon").asDouble(),
                ratCarbon.get("proof").get("objective").asDouble(),
                0.05);
        assertTrue(ratCarbon.get("standardisation").get(0).has("total_carbon"));
        // its HTML report gives the proof in carbon too, not as money
        Path out = dir.resolve("carbon-report");
        Cli files = Cli.run(
                "schedule",
                "../examples/schedule/office-us.yaml",
                "--objective",
                "carbon",
                "--quiet",
                "--out",
                out.toString());
        assertEquals(0, files.exit(), files.err());
        String html = Files.readString(out.resolve("report.html"));
        assertTrue(
                java.util.regex.Pattern.compile("<tr><th>objective</th><td>[0-9.]+ lb CO2e</td></tr>")
                        .matcher(html)
                        .find(),
                "the proof's objective in carbon");
        assertTrue(html.contains("pruned by the carbon bound"));
        // the frontier of the rationalised schedule: its ends are those two schedules, sets of forms and all
        Cli frontier = Cli.run(
                "frontier", "../examples/schedule/office-us.yaml", "--schedule", "--format", "json", "--points", "2");
        assertEquals(0, frontier.exit(), frontier.err());
        JsonNode points = JSON.readTree(frontier.out()).get("points");
        JsonNode cheapest = points.get(0);
        JsonNode leanest = points.get(points.size() - 1);
        assertEquals(
                ratCost.get("summary").get("total_cost").asDouble(),
                cheapest.get("cost").asDouble(),
                0.01);
        assertEquals(
                ratCarbon.get("summary").get("total_cost").asDouble(),
                leanest.get("cost").asDouble(),
                0.01);
        assertEquals(
                ratCarbon.get("summary").get("total_carbon").asDouble(),
                leanest.get("carbon").asDouble(),
                0.05);
    }

    private static String run(Path file, String objective) {
        Cli r = Cli.run("schedule", file.toString(), "--objective", objective, "--format", "json", "--quiet");
        assertEquals(0, r.exit(), r.err());
        return r.out();
    }
}
