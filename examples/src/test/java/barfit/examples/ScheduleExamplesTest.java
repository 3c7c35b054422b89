package barfit.examples;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.cli.Cli;
import barfit.golden.Golden;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The schedule examples in examples/schedule run through {@code barfit schedule --out} as their README
 * shows, and what they write holds together:
 * <ul>
 * <li>what each prints and writes equals its golden files (see {@link #checkGolden});</li>
 * <li>exit 0, the four files, one schedule.csv row per input beam, schedule.json with the input's beams
 * in order, a rationalised proof that says OPTIMAL;</li>
 * <li>the total cost is the sum of the beams' costs plus one formwork set per section size used, and
 * the schedule keeps to the rationalise: limits (distinct b x h, distinct longitudinal bar sizes) and
 * gives every beam of a group the same b x h;</li>
 * <li>the library's beams read from the CSV give the same schedule as the same beams written under
 * {@code beams:} in YAML (all but the {@code sources} field);</li>
 * <li>two runs, one on two threads and one on one, write byte-identical files;</li>
 * <li>{@code --out} into a directory that already holds schedule.csv is bad input (exit 2, one line,
 * nothing written) unless {@code --force} is given.</li>
 * </ul>
 * The library is solved three times and the office twice, in one JVM: about 15 s on two cores.
 */
class ScheduleExamplesTest {
    static final Path LIBRARY = Path.of("schedule/library-si.yaml");
    static final Path LIBRARY_BEAMS = Path.of("schedule/library-beams.csv");
    static final Path OFFICE = Path.of("schedule/office-us.yaml");
    static final List<String> OUTPUTS =
            List.of("schedule.csv", "bending-schedule.csv", "schedule.json", "report.html", "standardisation.svg");
    static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    static Path tmp;

    /** The library on two threads, written once and looked at by several tests. */
    static Path library;

    static Cli libraryRun;

    @BeforeAll
    static void runLibrary() {
        library = tmp.resolve("library");
        libraryRun = Cli.run(
                "schedule",
                LIBRARY.toString(),
                "--beams",
                LIBRARY_BEAMS.toString(),
                "--out",
                library.toString(),
                "--quiet",
                "--threads",
                "2");
    }

    @Test
    void libraryDesignsEveryBeamWithinTheLimits() throws IOException {
        assertEquals(0, libraryRun.exit(), libraryRun.err());
        assertEquals("", libraryRun.err());
        List<Map<String, String>> rows = csvRows(LIBRARY_BEAMS);
        assertTrue(rows.size() >= 40 && rows.size() <= 60, "40 to 60 beams: " + rows.size());
        // library-si.yaml: rationalise: {max_section_sizes: 6, max_bar_sizes: 3, groups: same_section,
        // formwork_set_cost: 400}
        checkSchedule(libraryRun, library, ids(rows), groups(rows), 6, 3, 400);
        checkGolden("library-si", libraryRun, library);
    }

    @Test
    void officeDesignsEveryBeamWithinTheLimits() throws IOException {
        Path out = tmp.resolve("office");
        Cli r = Cli.run("schedule", OFFICE.toString(), "--out", out.toString(), "--quiet");
        assertEquals(0, r.exit(), r.err());
        assertEquals("", r.err());
        JsonNode beams =
                new ObjectMapper(new YAMLFactory()).readTree(OFFICE.toFile()).get("beams");
        List<String> ids = new ArrayList<>();
        Map<String, String> groups = new LinkedHashMap<>();
        for (JsonNode b : beams) {
            ids.add(b.get("id").asText());
            if (b.has("group")) {
                groups.put(b.get("id").asText(), b.get("group").asText());
            }
        }
        assertTrue(ids.size() >= 6 && ids.size() <= 10, "6 to 10 beams: " + ids.size());
        // office-us.yaml: rationalise: {max_section_sizes: 3, max_bar_sizes: 3, groups: same_section,
        // formwork_set_cost: 100}
        JsonNode root = checkSchedule(r, out, ids, groups, 3, 3, 100);
        assertEquals("US", root.get("units").asText());
        checkGolden("office-us", r, out);
    }

    /**
     * What a schedule printed and wrote against the golden files under schedule/NAME/ (see {@link Golden}):
     * the terminal text, with the output folder (the only absolute path printed) read as OUT, schedule.csv,
     * schedule.json (what --format json prints) and standardisation.svg byte for byte, and report.html by its
     * SHA-256 (2.6 MB for the library: too large to keep; a mismatch leaves it under target/golden-actual).
     */
    static void checkGolden(String name, Cli run, Path out) throws IOException {
        Golden.check("schedule/" + name + "/stdout.txt", run.out().replace(out.toString(), "OUT"));
        for (String f : List.of("schedule.csv", "schedule.json", "standardisation.svg")) {
            Golden.check(Golden.DIR.resolve("schedule/" + name + "/" + f), Files.readAllBytes(out.resolve(f)));
        }
        Golden.checkDigest("schedule/" + name + "/report.html", Files.readAllBytes(out.resolve("report.html")));
    }

    /** Checks a rationalised schedule written into {@code out}; returns its schedule.json. */
    static JsonNode checkSchedule(
            Cli run,
            Path out,
            List<String> ids,
            Map<String, String> groups,
            int maxSections,
            int maxBars,
            double formworkSet)
            throws IOException {
        for (String f : OUTPUTS) {
            assertTrue(Files.isRegularFile(out.resolve(f)), f + " written");
        }
        assertTrue(run.out().contains("CAUTION"));
        assertTrue(run.out().contains("proof: OPTIMAL"), "the text summary gives the proof's status");

        List<String> csv = Files.readAllLines(out.resolve("schedule.csv"), StandardCharsets.UTF_8).stream()
                .filter(l -> !l.isBlank())
                .toList();
        assertTrue(csv.get(0).startsWith("id,"), csv.get(0));
        assertEquals(ids.size(), csv.size() - 1, "one schedule.csv row per beam");
        for (int i = 0; i < ids.size(); i++) {
            assertTrue(csv.get(i + 1).startsWith(ids.get(i) + ","), "row " + (i + 1) + " is beam " + ids.get(i));
        }

        JsonNode root = JSON.readTree(out.resolve("schedule.json").toFile());
        JsonNode beams = root.get("beams");
        assertEquals(ids.size(), beams.size());
        assertEquals(ids.size(), root.get("summary").get("beams").asInt());
        assertEquals(0, root.get("summary").get("beams_without_design").asInt());
        JsonNode rat = root.get("rationalise");
        assertEquals(maxSections, rat.get("max_section_sizes").asInt());
        assertEquals(maxBars, rat.get("max_bar_sizes").asInt());
        assertEquals("same_section", rat.get("groups").asText());
        assertEquals(formworkSet, rat.get("formwork_set_cost").asDouble(), 1e-9);
        JsonNode proof = root.get("proof");
        assertEquals("OPTIMAL", proof.get("status").asText());
        assertEquals(proof.get("objective").asDouble(), proof.get("bound").asDouble(), 0.01);

        double beamsCost = 0;
        Set<String> sections = new TreeSet<>();
        Set<String> barSizes = new TreeSet<>();
        Map<String, String> sectionOf = new HashMap<>();
        for (int i = 0; i < beams.size(); i++) {
            JsonNode b = beams.get(i);
            assertEquals(ids.get(i), b.get("id").asText(), "beams in input order");
            assertEquals("optimal", b.get("status").asText(), b.get("id").asText());
            beamsCost += b.get("cost").get("total").asDouble();
            String section = b.get("width").asDouble() + " x " + b.get("height").asDouble();
            sections.add(section);
            sectionOf.put(b.get("id").asText(), section);
            for (JsonNode m : b.get("bars")) {
                String mark = m.get("mark").asText();
                if (!mark.startsWith("S")) { // S: stirrups; B, T (and K, skin bars) are longitudinal
                    barSizes.add(m.get("bar").asText());
                }
            }
            assertEquals(
                    groups.get(b.get("id").asText()),
                    b.get("group").isNull() ? null : b.get("group").asText());
        }
        JsonNode sum = root.get("summary");
        assertEquals(beamsCost, sum.get("beams_cost").asDouble(), 0.01, "beams_cost is the sum of the beams");
        assertEquals(
                beamsCost + formworkSet * sections.size(),
                sum.get("total_cost").asDouble(),
                0.01,
                "total = beams + one formwork set per section size");
        assertEquals(proof.get("objective").asDouble(), sum.get("total_cost").asDouble(), 0.01);
        assertTrue(sections.size() <= maxSections, "section sizes " + sections);
        assertTrue(barSizes.size() <= maxBars, "longitudinal bar sizes " + barSizes);
        assertEquals(sections.size(), sum.get("section_sizes").size());
        Set<String> summaryBars = new TreeSet<>();
        sum.get("bar_sizes").forEach(n -> summaryBars.add(n.asText()));
        assertEquals(barSizes, summaryBars);

        Map<String, Set<String>> byGroup = new HashMap<>();
        groups.forEach(
                (id, g) -> byGroup.computeIfAbsent(g, k -> new HashSet<>()).add(sectionOf.get(id)));
        assertFalse(byGroup.isEmpty());
        byGroup.forEach((g, s) -> assertEquals(1, s.size(), "group " + g + " shares one b x h: " + s));
        return root;
    }

    @Test
    void csvAndYamlGiveTheSameSchedule() throws IOException {
        assertEquals(0, libraryRun.exit(), libraryRun.err());
        Path dir = tmp.resolve("as-yaml");
        Files.createDirectories(dir);
        Path yaml = dir.resolve("library-si.yaml");
        StringBuilder text = new StringBuilder(Files.readString(LIBRARY)).append("beams:\n");
        List<Map<String, String>> rows = csvRows(LIBRARY_BEAMS);
        for (Map<String, String> r : rows) {
            text.append(yamlBeam(r));
        }
        Files.writeString(yaml, text.toString());
        Path out = dir.resolve("out");
        Cli r = Cli.run("schedule", yaml.toString(), "--out", out.toString(), "--quiet", "--threads", "2");
        assertEquals(0, r.exit(), r.err());
        ObjectNode fromCsv =
                (ObjectNode) JSON.readTree(library.resolve("schedule.json").toFile());
        ObjectNode fromYaml =
                (ObjectNode) JSON.readTree(out.resolve("schedule.json").toFile());
        assertEquals(
                "[\"library-si.yaml\",\"library-beams.csv\"]",
                fromCsv.remove("sources").toString());
        assertEquals("[\"library-si.yaml\"]", fromYaml.remove("sources").toString());
        assertEquals(rows.size(), fromYaml.get("beams").size());
        assertEquals(fromCsv, fromYaml, "the same beams from CSV and from YAML give the same schedule");
    }

    /** One CSV row as an entry of a YAML beams: list, with the keys the design files use. */
    static String yamlBeam(Map<String, String> r) {
        StringBuilder b = new StringBuilder();
        b.append("  - id: \"").append(r.get("id")).append("\"\n");
        b.append("    span: ").append(r.get("span")).append('\n');
        b.append("    ends: ").append(r.get("ends")).append('\n');
        b.append("    moments: {")
                .append(keys(r, "left", "m_left", "mid", "m_mid", "right", "m_right"))
                .append("}\n");
        String shear = keys(r, "left", "v_left", "right", "v_right");
        if (!shear.isEmpty()) {
            b.append("    shear: {").append(shear).append("}\n");
        }
        String service = keys(r, "dead", "dead", "live", "live", "sustained_live", "sustained_live");
        if (!service.isEmpty()) {
            b.append("    service: {").append(service).append("}\n");
        }
        if (!r.get("flange_width").isEmpty()) {
            b.append("    flange: {")
                    .append(keys(
                            r,
                            "width",
                            "flange_width",
                            "thickness",
                            "flange_thickness",
                            "type",
                            "flange_type",
                            "clear_to_next_web",
                            "flange_clear_to_next_web"))
                    .append("}\n");
        }
        for (String k : new String[] {"max_depth", "width"}) {
            if (!r.get(k).isEmpty()) {
                b.append("    ").append(k).append(": ").append(r.get(k)).append('\n');
            }
        }
        if (!r.get("group").isEmpty()) {
            b.append("    group: \"").append(r.get("group")).append("\"\n");
        }
        return b.toString();
    }

    /** "key: value" pairs for the non-empty columns, as YAML flow-map content: key1, column1, key2, column2... */
    static String keys(Map<String, String> r, String... keyAndColumn) {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < keyAndColumn.length; i += 2) {
            String v = r.get(keyAndColumn[i + 1]);
            if (v != null && !v.isEmpty()) {
                out.add(keyAndColumn[i] + ": " + v);
            }
        }
        return String.join(", ", out);
    }

    @Test
    void repeatableWhateverTheThreads() throws IOException {
        assertEquals(0, libraryRun.exit(), libraryRun.err());
        Path again = tmp.resolve("library-one-thread");
        Cli r = Cli.run(
                "schedule",
                LIBRARY.toString(),
                "--beams",
                LIBRARY_BEAMS.toString(),
                "--out",
                again.toString(),
                "--quiet",
                "--threads",
                "1");
        assertEquals(0, r.exit(), r.err());
        for (String f : OUTPUTS) {
            assertArrayEquals(
                    Files.readAllBytes(library.resolve(f)),
                    Files.readAllBytes(again.resolve(f)),
                    f + ": two threads and one give the same bytes");
        }
        assertEquals(
                libraryRun.out().replace(library.toString(), "DIR"), r.out().replace(again.toString(), "DIR"));
    }

    @Test
    void outRefusesToReplaceWithoutForce() throws IOException {
        Path out = tmp.resolve("occupied");
        Files.createDirectories(out);
        Path existing = out.resolve("schedule.csv");
        Files.writeString(existing, "an earlier schedule\n");
        Cli refused = Cli.run("schedule", OFFICE.toString(), "--out", out.toString(), "--quiet");
        assertEquals(2, refused.exit(), refused.err());
        assertEquals("", refused.out());
        String err = refused.err().strip();
        assertFalse(err.contains("\n"), "one line: " + err);
        assertTrue(err.startsWith("barfit: " + existing + ":"), err);
        assertTrue(err.contains("--force"), err);
        assertEquals("an earlier schedule\n", Files.readString(existing), "the file is untouched");
        try (var files = Files.list(out)) {
            assertEquals(List.of(existing), files.toList(), "nothing else written");
        }

        Cli forced = Cli.run("schedule", OFFICE.toString(), "--out", out.toString(), "--quiet", "--force");
        assertEquals(0, forced.exit(), forced.err());
        String csv = Files.readString(existing);
        assertTrue(
                csv.startsWith("id,group,status,"),
                "replaced by the schedule: " + csv.lines().findFirst());
        for (String f : OUTPUTS) {
            assertTrue(Files.isRegularFile(out.resolve(f)), f);
        }
        try (var files = Files.list(out)) {
            assertEquals(OUTPUTS.size(), files.count(), "no temporary files left behind");
        }
    }

    /** The data rows of a CSV without quoted cells, by column name; lines starting with # are comments. */
    static List<Map<String, String>> csvRows(Path file) throws IOException {
        List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8).stream()
                .filter(l -> !l.isBlank() && !l.startsWith("#"))
                .toList();
        assertFalse(String.join("\n", lines).contains("\""), "this reader takes no quoted cells");
        String[] header = lines.get(0).split(",", -1);
        List<Map<String, String>> rows = new ArrayList<>();
        for (String line : lines.subList(1, lines.size())) {
            String[] cells = line.split(",", -1);
            assertEquals(header.length, cells.length, line);
            Map<String, String> row = new LinkedHashMap<>();
            for (int i = 0; i < header.length; i++) {
                row.put(header[i], cells[i].strip());
            }
            rows.add(row);
        }
        return rows;
    }

    static List<String> ids(List<Map<String, String>> rows) {
        return rows.stream().map(r -> r.get("id")).toList();
    }

    static Map<String, String> groups(List<Map<String, String>> rows) {
        Map<String, String> out = new LinkedHashMap<>();
        for (Map<String, String> r : rows) {
            if (!r.get("group").isEmpty()) {
                out.put(r.get("id"), r.get("group"));
            }
        }
        return out;
    }
}
