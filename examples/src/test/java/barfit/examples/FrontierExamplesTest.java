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

    /**
     * The gallery's whole spans: their frontiers (weighted sums), and the two spans as a schedule: the table
     * and JSON equal their golden files, and the schedule's ends are its cost and carbon optima.
     */
    @Test
    void frontierOfTheGallerySpansAndTheirSchedule() throws IOException {
        String gallery = "design/hollins-hall-gallery-carbon-si.yaml";
        Cli text = Cli.run("frontier", gallery);
        assertEquals("", text.err());
        assertEquals(0, text.exit());
        Golden.check("design/hollins-hall-gallery-carbon-si.frontier.txt", text.out());
        Cli json = Cli.run("frontier", gallery, "--format", "json");
        Golden.check("design/hollins-hall-gallery-carbon-si.frontier.json", json.out());
        Cli schedule = Cli.run("frontier", gallery, "--schedule");
        assertEquals("", schedule.err());
        assertEquals(0, schedule.exit());
        Golden.check("design/hollins-hall-gallery-carbon-si.schedule-frontier.txt", schedule.out());
        Cli scheduleJson = Cli.run("frontier", gallery, "--schedule", "--format", "json");
        Golden.check("design/hollins-hall-gallery-carbon-si.schedule-frontier.json", scheduleJson.out());
        // the ends are what schedule --objective cost and --objective carbon design
        var points = new com.fasterxml.jackson.databind.ObjectMapper()
                .readTree(scheduleJson.out())
                .get("points");
        for (String objective : new String[] {"cost", "carbon"}) {
            Cli s = Cli.run("schedule", gallery, "--objective", objective, "--format", "json");
            assertEquals(0, s.exit(), s.err());
            var totals = new com.fasterxml.jackson.databind.ObjectMapper()
                    .readTree(s.out())
                    .get("summary");
            var end = points.get(objective.equals("cost") ? 0 : points.size() - 1);
            assertEquals(totals.get("total_cost").asDouble(), end.get("cost").asDouble(), 0.005, objective);
            assertEquals(
                    totals.get("total_carbon").asDouble(), end.get("carbon").asDouble(), 0.05, objective);
        }
    }
}
