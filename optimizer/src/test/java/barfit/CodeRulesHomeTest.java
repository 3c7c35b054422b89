package barfit;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Every clause-numbered rule lives in the section model: the optimizer's sources (search, input, reports,
 * commands, bench) must not compute one themselves. The scan reads optimizer/src/main/java with comments
 * and string literals removed and flags numeric literals that are ACI 318-19 constants, 4/3 factors and
 * multiples of a bar diameter. What it flags must move into barfit.section; the few literals that only
 * look like code constants (drawing geometry, input defaults, invented bench data, cost data) are allowed
 * below by name, each with its reason, and an allowance nothing uses any more fails the test too.
 */
class CodeRulesHomeTest {
    private static final Path SOURCES = Path.of("src/main/java");

    /** Values of ACI 318-19 constants (SI and inch-pound editions), with what they are. */
    private static final Map<Double, String> RULES = new LinkedHashMap<>();

    static {
        RULES.put(0.85, "0.85 f'c of the stress block, β1 (22.2.2.4)");
        RULES.put(0.003, "εcu (22.2.2.1), εty + 0.003 (Table 21.2.2)");
        RULES.put(0.004, "εt ≥ 0.004 (9.3.3.1)");
        RULES.put(0.005, "tension-controlled strain (21.2.2)");
        RULES.put(0.65, "φ compression-controlled (Table 21.2.2), least β1 (Table 22.2.2.4.3)");
        RULES.put(0.75, "φ for shear (Table 21.2.1), least λ (19.2.4)");
        RULES.put(0.9, "φ tension-controlled (Table 21.2.2)");
        RULES.put(0.17, "Vc = 0.17 λ √f'c bw d (Table 22.5.5.1)");
        RULES.put(0.083, "0.083 √f'c (9.6.3.1)");
        RULES.put(0.062, "Av,min 0.062 √f'c (Table 9.6.3.4)");
        RULES.put(0.35, "Av,min 0.35 bw s / fyt (Table 9.6.3.4)");
        RULES.put(0.66, "0.66 √f'c (22.5.1.2, Table 22.5.5.1)");
        RULES.put(0.33, "0.33 √f'c (9.7.6.2.2)");
        RULES.put(0.42, "Vc ≤ 0.42 λ √f'c (22.5.5.1.1)");
        RULES.put(1.2, "1.2 D (5.3.1)");
        RULES.put(1.4, "1.4 D (5.3.1), As,min 1.4 / fy (9.6.1.2)");
        RULES.put(1.6, "1.6 L (5.3.1)");
        RULES.put(17.0, "least f'c 17 MPa (Table 19.2.1.1)");
        RULES.put(2500.0, "least f'c 2500 psi (Table 19.2.1.1)");
        RULES.put(25.0, "25 mm clear spacing and layer gap (25.2.1, 25.2.2)");
        RULES.put(75.0, "75 mm least hook extension (Table 25.3.2), cover (Table 20.5.1.3.1)");
        RULES.put(76.2, "3 in least hook extension (Table 25.3.2)");
        RULES.put(280.0, "fs = 280 MPa (24.3.2)");
        RULES.put(380.0, "380 (280 / fs) (24.3.2)");
        RULES.put(420.0, "fyt ≤ 420 MPa (Table 20.2.2.4(a)), fy reference of Table 9.3.1.1");
        RULES.put(550.0, "fy ≤ 550 MPa (Table 20.2.2.4(a))");
        RULES.put(60000.0, "fyt ≤ 60000 psi (Table 20.2.2.4(a))");
        RULES.put(80000.0, "fy ≤ 80000 psi (Table 20.2.2.4(a))");
        RULES.put(700.0, "0.4 + fy / 700 (Table 9.3.1.1)");
        RULES.put(100000.0, "0.4 + fy / 100000 (Table 9.3.1.1)");
        RULES.put(200000.0, "Es = 200 000 MPa (20.2.2.2)");
        RULES.put(29000.0, "Es = 29 000 ksi (20.2.2.2)");
        RULES.put(29000000.0, "Es = 29 000 000 psi (20.2.2.2)");
        RULES.put(4700.0, "Ec = 4700 √f'c (19.2.2.1)");
        RULES.put(57000.0, "Ec = 57 000 √f'c (19.2.2.1)");
        RULES.put(0.62, "fr = 0.62 λ √f'c (19.2.3.1)");
        RULES.put(7.5, "fr = 7.5 λ √f'c (19.2.3.1)");
    }

    /** 4/3 (9.6.1.3, 25.2.1). */
    private static final Pattern FOUR_THIRDS = Pattern.compile("(?<![\\w.])4(?:\\.0)?\\s*/\\s*3(?:\\.0)?(?![\\w.])");
    /** n db: bend diameters and hook extensions (Tables 25.3.1, 25.3.2), development lengths. */
    private static final Pattern DIAMETERS =
            Pattern.compile("(?<![\\w.])(?:4|6|8|10|12)(?:\\.0)?\\s*\\*\\s*([A-Za-z_][\\w.]*(?:\\(\\))?)");

    private static final Pattern NUMBER =
            Pattern.compile("(?<![\\w.])(\\d[\\d_]*(?:\\.\\d+)?(?:[eE][+-]?\\d+)?)[dDfFlL]?(?![\\w.])");

    /**
     * A literal that only looks like a code constant: in {@code file} (relative to src/main/java), the value
     * {@code literal} on a line containing {@code snippet} (any line when null).
     */
    private record Allowed(String file, String literal, String snippet, String why) {}

    private static final List<Allowed> ALLOWED = List.of(
            // drawing geometry and styling
            new Allowed(
                    "barfit/report/html/SectionGeometry.java",
                    "75",
                    "Math.max(75, 0.25 * s.width())",
                    "the length of slab drawn beside the web, mm: a drawing choice"),
            new Allowed("barfit/report/html/SectionBody.java", "0.35", "dy * 0.35", "the break line's zigzag"),
            new Allowed("barfit/report/html/SectionBody.java", "0.65", "dy * 0.65", "the break line's zigzag"),
            new Allowed(
                    "barfit/report/html/CrosstieLegs.java",
                    "0.75",
                    "0.75 * Math.PI",
                    "a 135-degree bend is 0.75 π radians: geometry"),
            new Allowed("barfit/report/html/StrainStressDiagram.java", "1.4", null, "stroke width, px"),
            new Allowed(
                    "barfit/report/html/StrainStressDiagram.java", "0.9", null, "stroke widths and arrow length, px"),
            // input defaults and range checks of the input
            new Allowed(
                    "barfit/input/SearchReader.java",
                    "25",
                    "range(400, 800, 25)",
                    "the default depth grid (a search range, not a code limit)"),
            new Allowed(
                    "barfit/input/SearchReader.java",
                    "75",
                    "range(75, 600, 25)",
                    "the default stirrup-spacing grid (a search range; 9.7.6.2.2 is checked by the section model)"),
            new Allowed("barfit/input/SearchReader.java", "25", "range(75, 600, 25)", "the same grid's step"),
            new Allowed(
                    "barfit/input/SettingsReader.java",
                    "0.75",
                    "0.75 * 25.4",
                    "the default aggregate size, 3/4 in: an input default, no clause"),
            new Allowed(
                    "barfit/input/SettingsReader.java",
                    "280",
                    "fyMin",
                    "the lowest bar grade accepted (Grade 280 / 40): a range check of the input, no clause"),
            new Allowed(
                    "barfit/cli/BenchCommand.java",
                    "100000",
                    "make > 100_000",
                    "the most beams the bench writes: a limit of the tool"),
            new Allowed(
                    "barfit/design/span/SpanDiagnoser.java",
                    "25",
                    "SI_DEPTH_STEP = 25.0",
                    "the depth step of a one-depth search (1 in in inch-pound input): a grid, not a code rule"),
            new Allowed(
                    "barfit/design/section/SectionDiagnoser.java",
                    "25",
                    "SI_DEPTH_STEP = 25.0",
                    "the depth step of a one-depth search (1 in in inch-pound input): a grid, not a code rule"),
            new Allowed(
                    "barfit/cli/SweepCommand.java",
                    "25",
                    null,
                    "the sweep's step when the search has one depth (the range then holds one cap)"),
            // cost data and invented bench data
            new Allowed(
                    "barfit/input/SearchReader.java",
                    null,
                    "GRADE_MPA = {",
                    "the grades (MPa) of the invented concrete price factors: cost data"),
            new Allowed(
                    "barfit/design/CarbonFactors.java",
                    null,
                    "{17.24, 260}",
                    "published concrete carbon factors by grade (MPa, kg CO2e per m³): carbon data"),
            new Allowed("barfit/bench/SpanBench.java", null, null, "invented spans for the timing bench: data"),
            new Allowed("barfit/bench/SectionBench.java", null, null, "invented sections for the timing bench: data"),
            new Allowed("barfit/bench/LineBench.java", null, null, "an invented line for the timing bench: data"),
            new Allowed(
                    "barfit/bench/ScheduleGenerator.java",
                    "0.9",
                    "0.9 + 0.05 * r.nextInt(5)",
                    "invented span lengths: data"));

    @Test
    void codeRulesLiveInTheSectionModel() throws IOException {
        List<String> found = new ArrayList<>();
        boolean[] used = new boolean[ALLOWED.size()];
        List<Path> files;
        try (Stream<Path> s = Files.walk(SOURCES)) {
            files = s.filter(p -> p.toString().endsWith(".java")).sorted().toList();
        }
        assertTrue(files.size() > 50, "the optimizer's sources are where the test expects them: " + files.size());
        for (Path f : files) {
            String rel = SOURCES.relativize(f).toString().replace('\\', '/');
            String[] lines = strip(Files.readString(f)).split("\n", -1);
            for (int i = 0; i < lines.length; i++) {
                String line = lines[i];
                List<String[]> hits = new ArrayList<>(); // {literal as written, what}
                Matcher m = NUMBER.matcher(line);
                while (m.find()) {
                    double v = Double.parseDouble(m.group(1).replace("_", ""));
                    for (var e : RULES.entrySet()) {
                        if (Math.abs(v - e.getKey()) <= 1e-12 * Math.max(1, e.getKey())) {
                            hits.add(new String[] {key(v), e.getValue()});
                        }
                    }
                }
                Matcher t = FOUR_THIRDS.matcher(line);
                while (t.find()) {
                    hits.add(new String[] {"4/3", "4/3 As,req (9.6.1.3), 4/3 aggregate (25.2.1)"});
                }
                Matcher d = DIAMETERS.matcher(line);
                while (d.find()) {
                    String id = d.group(1).toLowerCase(Locale.ROOT);
                    if (id.endsWith("db") || id.endsWith("ds") || id.endsWith("diameter()")) {
                        hits.add(new String[] {
                            d.group().replaceAll("\\s+", " "), "a multiple of a bar diameter (Tables 25.3.1, 25.3.2)"
                        });
                    }
                }
                for (String[] h : hits) {
                    int a = allowance(rel, h[0], line);
                    if (a >= 0) {
                        used[a] = true;
                    } else {
                        found.add(rel + ":" + (i + 1) + ": " + h[0] + " — " + h[1] + "  |  " + line.strip());
                    }
                }
            }
        }
        for (int i = 0; i < used.length; i++) {
            if (!used[i]) {
                found.add("allowance no longer used: " + ALLOWED.get(i));
            }
        }
        assertTrue(
                found.isEmpty(),
                "code rules outside the section model (move them to barfit.section):\n" + String.join("\n", found));
    }

    @Test
    void theScanFindsWhatItLooksFor() {
        // the scan itself: a rule in code is found, the same text in a comment or a string is not
        String code = "double a = 0.85 * fc * b; // 0.003\nString s = \"0.75\"; double h = Math.max(6 * ds, 75.0);"
                + " /* 4.0 / 3.0 */ double k = 4.0 / 3.0 * x;";
        String stripped = strip(code);
        List<String> values = new ArrayList<>();
        Matcher m = NUMBER.matcher(stripped);
        while (m.find()) {
            values.add(key(Double.parseDouble(m.group(1))));
        }
        assertTrue(
                values.contains("0.85")
                        && values.contains("75")
                        && !values.contains("0.003")
                        && !values.contains("0.75"),
                values.toString());
        Matcher t = FOUR_THIRDS.matcher(stripped);
        assertTrue(t.find() && !t.find(), "the 4/3 in code is found once, not the one in the comment");
        Matcher d = DIAMETERS.matcher(stripped);
        assertTrue(d.find() && d.group(1).equals("ds"));
    }

    private static int allowance(String file, String literal, String line) {
        for (int i = 0; i < ALLOWED.size(); i++) {
            Allowed a = ALLOWED.get(i);
            if (a.file().equals(file)
                    && (a.literal() == null || a.literal().equals(literal))
                    && (a.snippet() == null || line.contains(a.snippet()))) {
                return i;
            }
        }
        return -1;
    }

    private static String key(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? String.valueOf((long) v) : String.valueOf(v);
    }

    /** The source with comments, string, text-block and character literals blanked (line breaks kept). */
    static String strip(String src) {
        StringBuilder out = new StringBuilder(src.length());
        int i = 0;
        int n = src.length();
        while (i < n) {
            int j;
            if (src.startsWith("//", i)) {
                j = src.indexOf('\n', i);
                j = j < 0 ? n : j;
            } else if (src.startsWith("/*", i)) {
                j = src.indexOf("*/", i + 2);
                j = j < 0 ? n : j + 2;
            } else if (src.startsWith("\"\"\"", i)) {
                j = src.indexOf("\"\"\"", i + 3);
                j = j < 0 ? n : j + 3;
            } else if (src.charAt(i) == '"' || src.charAt(i) == '\'') {
                char q = src.charAt(i);
                j = i + 1;
                while (j < n && src.charAt(j) != q) {
                    j += src.charAt(j) == '\\' ? 2 : 1;
                }
                j = Math.min(n, j + 1);
            } else {
                out.append(src.charAt(i++));
                continue;
            }
            for (int k = i; k < j; k++) {
                out.append(src.charAt(k) == '\n' ? '\n' : ' ');
            }
            i = j;
        }
        return out.toString();
    }
}
