package barfit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.CostModel;
import barfit.design.SolverOptions;
import barfit.design.line.LineSpans;
import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.detailing.BarRun;
import barfit.detailing.LineDetail;
import barfit.detailing.LineDetailer;
import barfit.input.DesignInput;
import barfit.input.DesignInputReader;
import barfit.input.LineInput;
import barfit.input.LinesReader;
import barfit.section.trail.Trail;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code check} on lines with their bars as built: a line detailed by {@code design} and given back with
 * its own cut-off points passes; the same with one group of bars cut 300 mm short of where 9.7.3 asks fails
 * on that check with its clause; a hook in a column too narrow for its ldh fails 25.4.3.1. The lines are
 * invented.
 */
class LineCheckCommandTest {
    @TempDir
    static Path dir;

    private static final String MATERIALS = """
            units: SI
            concrete: {fc: 28, aggregate: 20}
            steel: {fy: 420}
            bars: astm-a615m
            cover: 40
            stirrup: "10"
            """;

    private static final String LINE = """
            lines:
              - id: M-2
                spans: [6.0, 7.2, 6.0]
                supports:
                  - {width: 300, kind: wall}
                  - {width: 400, below: {b: 400, h: 400, height: 3.6}, above: {b: 400, h: 400, height: 3.4}}
                  - {width: 400, below: {b: 400, h: 400, height: 3.6}, above: {b: 400, h: 400, height: 3.4}}
                  - {width: 300, kind: wall}
                loads: {dead: 16, live: 10}
            """;

    private static LineSpans.Result designed;
    private static LineDetail detail;

    @BeforeAll
    static void design() throws IOException {
        Path f = dir.resolve("design.yaml");
        Files.writeString(f, MATERIALS + """
                search:
                  widths: [300]
                  depth: {min: 450, max: 650, step: 50}
                  bar_sizes: ["16", "19", "22", "25"]
                  max_layers: 2
                """ + LINE + "    section: {width: 300, height: 550}\n");
        DesignInput in = DesignInputReader.read(f, false);
        LineInput line =
                LinesReader.read(DesignInputReader.document(f), in.settings()).get(0);
        CostModel cost = new CostModel(
                in.rates(), in.settings().detailing().cover(), in.settings().code());
        designed = new LineSpans(
                        in.settings(),
                        in.space(),
                        new SpanDesigner(cost, new SolverOptions(30, 1, 1)),
                        in.maxBarSizesPerBeam(),
                        in.barsPerTwoLegs())
                .design(line, 0);
        detail = LineDetail.of(designed, in.settings(), cost, 12_000, Trail.off());
        assertTrue(detail.ok(), "the design's own detailing passes");
    }

    @Test
    void aDesignedLineGivenBackPasses() throws IOException {
        Cli run = Cli.run("check", write("roundtrip.yaml", 0).toString());
        assertEquals(0, run.exit(), run.out() + run.err());
        assertTrue(run.out().contains("1 line checked: 1 pass, 0 fail."), run.out());
    }

    @Test
    void aLineIsPickedByItsId() throws IOException {
        Path f = write("picked.yaml", 0);
        assertEquals(0, Cli.run("check", f.toString(), "--beam", "M-2").exit());
        Cli none = Cli.run("check", f.toString(), "--beam", "M-9");
        assertEquals(2, none.exit());
        assertTrue(none.err().contains("expected one of: M-2"), none.err());
    }

    @Test
    void topBarsCutShortFailTheirReach() throws IOException {
        // support 2's extra top bars into span 1: where 9.7.3 asks them to end, less 300 mm
        LineDetailer.CutOff need = detail.cutOffs().stream()
                .filter(c -> c.support() == 2 && !c.intoRight())
                .findFirst()
                .orElseThrow();
        Cli run = Cli.run("check", write("short.yaml", need.required() - 300).toString(), "--format", "json");
        assertEquals(1, run.exit(), run.err());
        JsonNode line = new ObjectMapper().readTree(run.out()).get("lines").get(0);
        assertFalse(line.get("ok").asBoolean());
        JsonNode failed = failing(line.get("detailing").get("checks")).get(0);
        System.out.println(
                line.get("failing") + " " + failing(line.get("detailing").get("checks")));
        assertEquals("top_reach", failed.get("id").asText());
        assertTrue(failed.get("title").asText().contains("support 2 run into span 1"));
        // hand calculation from 9.7.3.3: past the point where the continuous bars alone suffice (the
        // theoretical cut-off, from the envelope) by max(d, 12 db), measured from the face of support 2
        double face = 6000 - 200;
        double d = designed.parts()
                .get(0)
                .outcome()
                .best()
                .report()
                .sections()
                .get(SpanProblem.Place.RIGHT)
                .flexure()
                .d();
        double twelveDb = 12 * 15.9; // No. 16: db 15.9 mm, ASTM A615M Table 1
        assertEquals("9.7.3.3", failed.get("clause").asText());
        assertEquals(
                face - need.theoretical() + Math.max(d, twelveDb),
                failed.get("limit").asDouble(),
                0.1);
        assertEquals(need.required() - 300, failed.get("demand").asDouble(), 0.1);
        assertTrue(failed.get("note").asText().startsWith("extend the top bars at support 2 to "));
    }

    @Test
    void aHookInATooNarrowColumnFails() throws IOException {
        Path f = dir.resolve("narrow.yaml");
        Files.writeString(f, MATERIALS + """
                lines:
                  - id: N-1
                    spans: [5.0, 5.0]
                    supports:
                      - {width: 250, below: {b: 250, h: 250, height: 3.5}}
                      - {width: 400, below: {b: 400, h: 400, height: 3.5}}
                      - {width: 250, below: {b: 250, h: 250, height: 3.5}}
                    loads: {dead: 12, live: 6}
                    section: {width: 300, height: 450}
                    bars:
                      hangers: {bar: "16", count: 2}
                      ends: {left: hook-90, right: hook-90}
                      spans:
                        - bottom: {bar: "16", count: 3, right: 0.35}
                          stirrups: {bar: "10", legs: 2, spacing: 175}
                        - bottom: {bar: "16", count: 3, left: 0.35}
                          stirrups: {bar: "10", legs: 2, spacing: 175}
                      supports:
                        - {bar: "16", count: 1, right: 1.5}
                        - {bar: "16", count: 2, left: 1.8, right: 1.8}
                        - {bar: "16", count: 1, left: 1.5}
                """);
        Cli run = Cli.run("check", f.toString(), "--format", "json");
        assertEquals(1, run.exit(), run.err());
        JsonNode checks = new ObjectMapper()
                .readTree(run.out())
                .get("lines")
                .get(0)
                .get("detailing")
                .get("checks");
        List<JsonNode> hooks = failing(checks).stream()
                .filter(c -> c.get("id").asText().equals("hook-fit"))
                .toList();
        assertFalse(hooks.isEmpty(), run.out());
        for (JsonNode h : hooks) {
            assertEquals("25.4.3.1", h.get("clause").asText());
            // hand calculation: room for the hook, the column's 250 mm less 40 mm cover at its far face
            assertEquals(210, h.get("limit").asDouble(), 0.05);
            // 25.4.3.1(a): ldh = fy ψe ψr ψo ψc / (23 λ √f'c) db^1.5, No. 16 (db 15.9 mm), f'c 28 MPa,
            // uncoated ψe 1.0, no confining ties ψr 1.6, in the column core but with side cover 40 + 10 mm
            // below 65 mm ψo 1.25, ψc = f'c/105 + 0.6 = 0.8667 (Table 25.4.3.2):
            // 420 × 1.6 × 1.25 × 0.8667 / (23 × 5.2915) × 63.40 = 379 mm
            double ldh = 420 * 1.6 * 1.25 * (28 / 105.0 + 0.6) / (23 * Math.sqrt(28)) * Math.pow(15.9, 1.5);
            assertEquals(ldh, h.get("demand").asDouble(), 1.0);
        }
    }

    private static List<JsonNode> failing(JsonNode checks) {
        List<JsonNode> out = new java.util.ArrayList<>();
        checks.forEach(c -> {
            if (!c.get("ok").asBoolean()) {
                out.add(c);
            }
        });
        return out;
    }

    /**
     * The designed line as a check file: its section, its bars as the detailer placed them (reaches rounded
     * up to 0.1 mm), each span's stirrups zone by zone. {@code shortLeft2}, when
     * positive, is how far past its face support 2's extra bars reach into span 1 instead.
     */
    private static Path write(String name, double shortLeft2) throws IOException {
        var first = designed.parts().get(0).outcome().best().layout();
        StringBuilder y = new StringBuilder(MATERIALS).append(LINE);
        y.append(String.format(
                Locale.ROOT, "    section: {width: %.0f, height: %.0f}%n", first.width(), first.height()));
        y.append("    bars:\n");
        y.append(String.format(
                Locale.ROOT,
                "      hangers: {bar: \"%s\", count: %d}%n",
                first.top().designation(),
                first.topContinuous()));
        y.append("      spans:\n");
        double[] x = {0, 6000, 13200, 19200};
        for (LineSpans.Part p : designed.parts()) {
            int i = p.segment();
            SpanLayout l = p.outcome().best().layout();
            BarRun run = run("bottom, span " + i);
            y.append(String.format(
                    Locale.ROOT,
                    "        - bottom: {bar: \"%s\", count: %s",
                    l.bottom().designation(),
                    l.bottomCounts()));
            if (i > 1) {
                y.append(String.format(Locale.ROOT, ", left: %.4f", up(x[i - 1] - run.start())));
            }
            if (i < 3) {
                y.append(String.format(Locale.ROOT, ", right: %.4f", up(run.end() - x[i])));
            }
            y.append("}\n          stirrups:\n");
            List<SpanProblem.Zone> zones = p.problem().zones();
            for (int z = 0; z < zones.size(); z++) {
                var st = l.zoneStirrups().get(z);
                y.append(String.format(
                        Locale.ROOT,
                        "            - {bar: \"%s\", legs: %d, spacing: %.1f%s}%n",
                        st.bar().designation(),
                        st.legs(),
                        st.spacing(),
                        z < zones.size() - 1
                                ? String.format(
                                        Locale.ROOT,
                                        ", length: %.6f",
                                        zones.get(z).length() / 1000)
                                : ""));
            }
        }
        y.append("      supports:\n");
        for (int j = 0; j < 4; j++) {
            BarRun run = run("top extra, support " + (j + 1));
            if (run == null) {
                y.append("        - {}\n");
                continue;
            }
            // the extra bars per layer: the support's top bars less the hangers in the first layer
            var part = designed.parts().get(j == 0 ? 0 : j - 1).outcome().best().layout();
            List<Integer> layers = new java.util.ArrayList<>(j == 0 ? part.topLeft() : part.topRight());
            layers.set(0, layers.get(0) - part.topContinuous());
            double left = x[j] - run.start();
            if (j == 1 && shortLeft2 > 0) {
                left = shortLeft2 + 200;
            }
            y.append(String.format(
                    Locale.ROOT,
                    "        - {bar: \"%s\", count: %s, left: %.4f, right: %.4f}%n",
                    run.bar().designation(),
                    layers,
                    up(left),
                    up(run.end() - x[j])));
        }
        Path f = dir.resolve(name);
        Files.writeString(f, y.toString());
        return f;
    }

    /** A reach in mm as m, rounded up to 0.1 mm as a drawing would give it (a bar only gets longer). */
    private static double up(double mm) {
        return Math.ceil(mm * 10 - 1e-6) / 10000;
    }

    private static BarRun run(String what) {
        return detail.runs().stream()
                .filter(r -> r.what().equals(what))
                .findFirst()
                .orElse(null);
    }
}
