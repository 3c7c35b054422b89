package barfit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A line inside a rationalised schedule is detailed as {@code design} details a line: bending-schedule.csv
 * lists its bars once, under the line, hooked into its end columns, with extra top bars per support and
 * bottom bars per span, never its parts as straight spans; the totals per bar size add up every row, and
 * the report carries the line's bending schedule. The building is invented.
 */
class ScheduleLineDetailTest {
    @TempDir
    Path dir;

    @Test
    void aRationalisedLineIsDetailed() throws IOException {
        Path f = dir.resolve("schedule.yaml");
        Files.writeString(f, """
                units: SI
                concrete: {fc: 28, aggregate: 20}
                steel: {fy: 420}
                bars: astm-a615m
                search:
                  widths: [300, 350]
                  depth: {min: 450, max: 650, step: 50}
                  bar_sizes: ["16", "19", "22", "25"]
                  max_layers: 2
                rationalise: {max_section_sizes: 1, max_bar_sizes: 3}
                beams:
                  - {id: B-1, span: 6.0, ends: simple, moments: {mid: 150}, shear: {left: 100, right: 100}}
                lines:
                  - id: K-4
                    spans: [6.0, 6.5]
                    supports: [{width: 600, below: {b: 600, h: 600, height: 4.0}}]
                    loads: {dead: 16, live: 10}
                    section: {width: 300, height: 550}
                """);
        Path out = dir.resolve("out");
        Cli run = Cli.run("schedule", f.toString(), "--out", out.toString(), "--quiet");
        assertEquals(0, run.exit(), run.err());
        List<String> rows = Files.readAllLines(out.resolve("bending-schedule.csv"));
        List<String[]> line = rows.stream()
                .filter(r -> r.startsWith("line K-4,"))
                .map(ScheduleLineDetailTest::cells)
                .toList();
        assertFalse(line.isEmpty(), String.join("\n", rows));
        assertTrue(rows.stream().noneMatch(r -> r.startsWith("K-4/")), "no part listed as a span");
        assertTrue(line.stream().anyMatch(c -> c[2].equals("one end hooked")), "hooked into the end columns");
        assertTrue(line.stream().anyMatch(c -> c[7].startsWith("top extra, support 2")));
        assertTrue(line.stream().anyMatch(c -> c[7].equals("bottom, span 2")));
        // every row's mass in the totals per bar size, and those in the whole
        Map<String, Double> bySize = new TreeMap<>();
        double all = Double.NaN;
        Map<String, Double> totals = new TreeMap<>();
        for (String r : rows.subList(1, rows.size())) {
            String[] c = cells(r);
            if (c[0].equals("total")) {
                if (c[3].equals("all")) {
                    all = Double.parseDouble(c[6]);
                } else {
                    totals.put(c[3], Double.parseDouble(c[6]));
                }
            } else {
                bySize.merge(c[3], Double.parseDouble(c[6]), Double::sum);
            }
        }
        assertEquals(bySize.keySet(), totals.keySet());
        for (var e : bySize.entrySet()) {
            assertEquals(e.getValue(), totals.get(e.getKey()), 0.05 * rows.size(), e.getKey());
        }
        assertEquals(totals.values().stream().mapToDouble(Double::doubleValue).sum(), all, 0.2);
        String html = Files.readString(out.resolve("report.html"));
        assertTrue(html.contains("Bending schedule of line K-4"));
    }

    /** A CSV row's cells (quoted cells hold commas). */
    private static String[] cells(String row) {
        List<String> out = new java.util.ArrayList<>();
        StringBuilder cur = new StringBuilder();
        boolean quoted = false;
        for (char ch : row.toCharArray()) {
            if (ch == '"') {
                quoted = !quoted;
            } else if (ch == ',' && !quoted) {
                out.add(cur.toString());
                cur.setLength(0);
            } else {
                cur.append(ch);
            }
        }
        out.add(cur.toString());
        return out.toArray(new String[0]);
    }
}
