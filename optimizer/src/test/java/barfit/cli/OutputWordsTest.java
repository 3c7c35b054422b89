package barfit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * What the reports say agrees with what was computed: real runs of the commands on invented beams, their
 * words read back from the text and the JSON.
 */
class OutputWordsTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final String HEAD = "units: SI\nconcrete: {fc: 28}\nsteel: {fy: 420}\n";

    @TempDir
    Path dir;

    private Path write(String name, String text) throws IOException {
        Path f = dir.resolve(name);
        Files.writeString(f, text);
        return f;
    }

    private static JsonNode json(Cli r) throws IOException {
        return JSON.readTree(r.out());
    }

    // ---------------------------------------------------------------- check

    @Test
    void checkWithoutVuSaysShearIsNotChecked() throws IOException {
        Path f = write("novu.yaml", HEAD + """
                beams:
                  - id: A1
                    section: {width: 300, height: 600}
                    bottom: [{bar: "25", count: 3}]
                    top: [{bar: "16", count: 2}]
                    Mu: 250
                    stirrups: {bar: "10", legs: 2, spacing: 250}
                  - id: A2
                    section: {width: 300, height: 600}
                    bottom: [{bar: "25", count: 3}]
                    top: [{bar: "16", count: 2}]
                    Mu: 250
                    Vu: 150
                    stirrups: {bar: "10", legs: 2, spacing: 250}
                """);
        Cli text = Cli.run("check", f.toString(), "--no-trail");
        assertEquals(0, text.exit(), text.err());
        String a1 =
                text.out().substring(text.out().indexOf("Beam A1"), text.out().indexOf("Beam A2"));
        String a2 = text.out().substring(text.out().indexOf("Beam A2"));
        String verdict = a1.lines().findFirst().orElseThrow();
        assertTrue(verdict.contains("PASS") && verdict.contains("shear not checked (no Vu)"), verdict);
        assertFalse(a2.contains("shear not checked"), a2);
        JsonNode beams =
                json(Cli.run("check", f.toString(), "--format", "json")).get("beams");
        assertFalse(beams.get(0).get("shear").get("checked").asBoolean());
        assertEquals(
                "shear not checked (no Vu)",
                beams.get(0).get("shear").get("note").asText());
        assertTrue(beams.get(1).get("shear").get("checked").asBoolean());
    }

    @Test
    void checkPrintsPhiVnWithVsAtMostTheSectionLimit() throws IOException {
        // d = 600 − 70 = 530 mm (the layer's centroid given); Vs,max = 0.66 √28 × 300 × 530 = 555.3 kN
        // (ACI 318M-19 22.5.1.2); four No. 13 legs (Av = 4 × 129 = 516 mm², ASTM A615M, from memory) at 75 mm
        // give Av fyt d / s = 516 × 420 × 530 / 75 = 1531.5 kN, by hand: far beyond it
        Path f = write("dense.yaml", HEAD + """
                beams:
                  - id: D1
                    section: {width: 300, height: 600}
                    bottom: [{bar: "25", count: 4, depth: 70}]
                    top: [{bar: "16", count: 4}]
                    Mu: 300
                    Vu: 500
                    stirrups: {bar: "13", legs: 4, spacing: 75}
                """);
        Cli json = Cli.run("check", f.toString(), "--format", "json");
        JsonNode sh = json(json).get("beams").get(0).get("shear");
        double vsMax = 0.66 * Math.sqrt(28) * 300 * 530 / 1000;
        assertEquals(555.3, vsMax, 0.05);
        assertEquals(vsMax, sh.get("Vs").asDouble(), 0.01);
        assertEquals(516 * 420 * 530 / 75.0 / 1000, sh.get("Vs_stirrups").asDouble(), 0.5);
        assertTrue(sh.get("Vs_limited").asBoolean());
        assertEquals(
                0.75 * (sh.get("Vc").asDouble() + vsMax),
                sh.get("phi_Vn").asDouble(),
                0.01,
                "φVn = 0.75 (Vc + Vs,max): what the section can carry (22.5.1.1, 22.5.1.2)");
        Cli text = Cli.run("check", f.toString(), "--no-trail");
        String line = text.out()
                .lines()
                .filter(l -> l.strip().startsWith("Vu = "))
                .findFirst()
                .orElseThrow();
        assertTrue(
                line.contains("Vs = 555.3 kN") && line.contains("the stirrups give 1531.") && line.contains("22.5.1.2"),
                line);
    }

    // ---------------------------------------------------------------- whole spans

    private static final String SPAN_SEARCH = """
            search:
              widths: [250, 300, 350]
              depth: {min: 400, max: 700, step: 25}
              bar_sizes: ["16", "19", "22", "25"]
            """;

    @Test
    void spanWithoutShearsIsWarned() throws IOException {
        Path f = write("spans.yaml", HEAD + SPAN_SEARCH + """
                beams:
                  - id: NS
                    span: 6.0
                    ends: simple
                    moments: {mid: 180}
                  - id: WS
                    span: 6.0
                    ends: simple
                    moments: {mid: 180}
                    shear: {left: 120, right: 120}
                """);
        Cli text = Cli.run("design", f.toString());
        assertEquals(0, text.exit(), text.err());
        String ns =
                text.out().substring(text.out().indexOf("Beam NS"), text.out().indexOf("Beam WS"));
        String ws = text.out().substring(text.out().indexOf("Beam WS"));
        assertTrue(ns.contains("WARNING: no shears given: minimum stirrups"), ns);
        assertTrue(ns.contains("shear strength not checked"), ns);
        assertFalse(ws.contains("WARNING"), ws);
        JsonNode beams =
                json(Cli.run("design", f.toString(), "--format", "json")).get("beams");
        assertEquals(1, beams.get(0).get("warnings").size());
        assertEquals(0, beams.get(1).get("warnings").size());
        Path out = dir.resolve("out");
        Cli schedule = Cli.run("schedule", f.toString(), "--quiet", "--out", out.toString());
        assertEquals(0, schedule.exit(), schedule.err());
        String warning = schedule.out()
                .lines()
                .filter(l -> l.startsWith("WARNING"))
                .findFirst()
                .orElseThrow();
        assertTrue(warning.contains("no shears given for NS:") && !warning.contains("WS"), warning);
        String html = Files.readString(out.resolve("report.html"));
        String block = html.substring(html.indexOf("id=\"beam-NS\""), html.indexOf("id=\"beam-WS\""));
        assertTrue(
                block.contains("<p class=\"warn\">Warning: no shears given"), "the report warns in the beam's block");
        assertFalse(html.substring(html.indexOf("id=\"beam-WS\"")).contains("no shears given"));
    }

    /**
     * A T-beam whose slab holds the whole compression zone at mid-span: with As ≤ 2000 mm² the block is at
     * most a = 2000 × 420 / (0.85 × 28 × 1400) = 25 mm deep, c = a / 0.85 ≤ 30 mm (Table 22.2.2.4.3), while
     * the top bars' centroid is at least 40 + 9.5 + 15.9 / 2 = 57 mm down (cover, No. 10 stirrup, the
     * smallest bar): by hand, the continuous top bars are below the neutral axis, in tension. A narrow
     * rectangular beam under a low cap needs its top bars in compression.
     */
    @Test
    void topBarsAreCalledCompressionSteelOnlyWhenInCompression() throws IOException {
        Path f = write("tees.yaml", HEAD + SPAN_SEARCH + """
                beams:
                  - id: TEE
                    span: 7.2
                    ends: simple
                    moments: {mid: 215}
                    shear: {left: 150, right: 150}
                    flange: {width: 1400, thickness: 150}
                  - id: ONE-CONT
                    span: 7.2
                    ends: one-end-continuous
                    moments: {mid: 215, right: -290}
                    shear: {left: 150, right: 190}
                    flange: {width: 1400, thickness: 150}
                  - id: RECT
                    span: 6.0
                    ends: simple
                    moments: {mid: 330}
                    shear: {left: 150, right: 150}
                    max_depth: 400
                """);
        JsonNode beams =
                json(Cli.run("design", f.toString(), "--format", "json")).get("beams");
        for (int i = 0; i < 2; i++) {
            JsonNode b = beams.get(i);
            double as = 0;
            for (JsonNode layer : b.get("bottom").get("layers")) {
                as += layer.get("count").asInt() * area(layer.get("bar").asText());
            }
            assertTrue(as <= 2000, b.get("id") + ": the hand bound above holds for As = " + as);
        }
        Cli text = Cli.run("design", f.toString());
        assertEquals(0, text.exit(), text.err());
        for (String id : List.of("TEE", "ONE-CONT")) {
            String row = topRow(text.out(), id);
            assertTrue(row.contains("in tension at mid-span") && !row.contains("compression steel at mid-span"), row);
        }
        String rect = topRow(text.out(), "RECT");
        assertTrue(rect.contains("compression steel at mid-span"), rect);
    }

    /** ASTM A615M nominal areas, mm² (from memory). */
    private static double area(String bar) {
        return switch (bar) {
            case "16" -> 199;
            case "19" -> 284;
            case "22" -> 387;
            case "25" -> 510;
            default -> throw new AssertionError(bar);
        };
    }

    private static String topRow(String out, String id) {
        String block = out.substring(out.indexOf("Beam " + id + " "));
        return block.lines()
                .filter(l -> l.strip().startsWith("top continuous"))
                .findFirst()
                .orElseThrow();
    }

    @Test
    void aHoopAndItsCrosstiesAreSeparateBars() throws IOException {
        // four legs at the ends, where the shear is high, two in the middle (invented beam)
        Path f = write("legs.yaml", HEAD + """
                search:
                  widths: [350]
                  depth: {min: 600, max: 600, step: 25}
                  bar_sizes: ["19", "22", "25"]
                  stirrups: {sizes: ["10"], legs: [2, 4], spacing: {min: 150, max: 300, step: 25}}
                beams:
                  - id: SS-1
                    span: 6.0
                    ends: simple
                    moments: {mid: 420}
                    shear: {left: 330, right: 330}
                """);
        JsonNode b = json(Cli.run("design", f.toString(), "--format", "json"))
                .get("beams")
                .get(0);
        // cover 40 mm, No. 10 (9.5 mm): the hoop's centre line is 350 − 89.5 = 260.5 wide, 600 − 89.5 = 510.5
        // high; each 135° hook runs max(6 × 9.5, 75) = 75 mm (Table 25.3.2); by hand, hoop 2 × 260.5 + 2 × 510.5
        // + 2 × 75 = 1692 mm, crosstie 510.5 + 2 × 75 = 660.5 mm
        List<JsonNode> hoops = new ArrayList<>();
        List<JsonNode> ties = new ArrayList<>();
        double stirrupMass = 0;
        for (JsonNode m : b.get("bars")) {
            String role = m.get("role").asText();
            if (role.startsWith("stirrup hoops")) {
                hoops.add(m);
            } else if (role.startsWith("crossties")) {
                ties.add(m);
            } else {
                continue;
            }
            assertTrue(m.get("mark").asText().startsWith("S"), m.toString());
            stirrupMass += m.get("count").asInt() * m.get("length").asDouble() * 0.560; // No. 10: 0.560 kg/m
        }
        assertEquals(3, hoops.size(), b.get("bars").toString());
        assertEquals(2, ties.size(), "crossties in the two four-leg end zones: " + b.get("bars"));
        for (JsonNode h : hoops) {
            assertEquals(1.692, h.get("length").asDouble(), 1e-3);
        }
        JsonNode zones = b.get("stirrups");
        for (JsonNode t : ties) {
            assertEquals(0.6605, t.get("length").asDouble(), 1e-3);
            String zone = t.get("role").asText().replaceAll("crossties, (\\w+) zone.*", "$1");
            for (JsonNode z : zones) {
                if (z.get("zone").asText().equals(zone)) {
                    assertEquals(4, z.get("legs").asInt());
                    JsonNode hoop = hoops.stream()
                            .filter(h -> h.get("role").asText().contains(zone + " zone"))
                            .findFirst()
                            .orElseThrow();
                    assertEquals(2 * hoop.get("count").asInt(), t.get("count").asInt(), "two crossties per hoop");
                }
            }
        }
        // the cost prices exactly the mass the bar list gives: 2.0 per kg of stirrups (the invented default rate)
        assertEquals(2.0 * stirrupMass, b.get("cost").get("stirrups").asDouble(), 0.01);
    }

    // ---------------------------------------------------------------- compare

    private static final String CORRIDOR = HEAD + """
            search:
              widths: [250, 300, 350, 400]
              depth: {min: 400, max: 800, step: 25}
              bar_sizes: ["16", "19", "22", "25", "29", "32", "36"]
              max_layers: 2
            costs: {concrete_per_m3: 150, main_bars_per_kg: 1.5, stirrups_per_kg: 2.0, formwork_per_m2: 40,
                    lap_factor: 1.05}
            beams:
              - id: F1-01
                Mu: 185
                Vu: 140
                span: 6.0
            """;

    @Test
    void compareRecommendsAStrongerGradeOnlyForMoreThanTheMargin() throws IOException {
        // f'c = 35 MPa saves 0.1 % on this corridor beam (invented rates): less than the 2 % margin
        Path f = write("corridor.yaml", CORRIDOR);
        JsonNode b = json(Cli.run("compare", f.toString(), "--fc", "29,35,40", "--format", "json"))
                .get("beams")
                .get(0);
        double cheapest = Double.POSITIVE_INFINITY;
        double cheapestSameGrade = Double.POSITIVE_INFINITY;
        for (JsonNode o : b.get("options")) {
            double c = o.get("cost").get("total").asDouble();
            cheapest = Math.min(cheapest, c);
            if (!o.get("kind").asText().equals("fc")) {
                cheapestSameGrade = Math.min(cheapestSameGrade, c);
            }
        }
        assertTrue(cheapest < cheapestSameGrade, "a stronger grade is the cheapest here");
        assertTrue(cheapestSameGrade - cheapest <= 0.02 * cheapestSameGrade, "and saves no more than 2 %");
        assertFalse(
                b.get("recommended").asText().equals("fc"), b.get("recommended").toString());
        assertTrue(b.get("recommended_fc").isNull());
        Cli text = Cli.run("compare", f.toString(), "--fc", "29,35,40");
        String out = text.out();
        assertTrue(out.contains("would save only 0.1 %") && out.contains("more than 2 %"), out);
        assertFalse(Pattern.compile("\\bfc\\b").matcher(out).find(), "no internal word in the text: " + out);
        assertFalse(
                out.contains("keeping the cap") || out.contains("within the cap") || out.contains("At the cap"),
                "no cap was given: " + out);
        // "the same design" only for the same cost; the same layout at another cost is said to be dearer
        JsonNode options = b.get("options");
        double recommended = 0;
        for (JsonNode o : options) {
            if (o.get("kind").asText().equals(b.get("recommended").asText())) {
                recommended = o.get("cost").get("total").asDouble();
            }
        }
        for (JsonNode reason : b.get("reasons")) {
            String r = reason.asText();
            if (r.contains("same design")) {
                assertTrue(r.contains("at the same cost"), r);
                for (JsonNode o : options) {
                    if (r.contains("'" + o.get("label").asText() + "'")) {
                        assertEquals(recommended, o.get("cost").get("total").asDouble(), 0.005, r);
                    }
                }
            }
        }
        assertTrue(out.contains("'f'c = 29 MPa' gives the same layout, 0.2 % dearer"), out);
    }

    @Test
    void compareSaysNarrowingWhenAFixedWidthIsLetGo() throws IOException {
        // the corridor beam with its web fixed at 400 mm: with the width free the cheapest web is narrower
        Path f = write("fixed.yaml", CORRIDOR.replace("    span: 6.0\n", "    span: 6.0\n    width: 400\n"));
        JsonNode b = json(Cli.run("compare", f.toString(), "--format", "json"))
                .get("beams")
                .get(0);
        JsonNode widen = null;
        for (JsonNode o : b.get("options")) {
            if (o.get("kind").asText().equals("widen")) {
                widen = o;
            }
        }
        assertTrue(widen != null && widen.get("width").asDouble() < 400, String.valueOf(widen));
        String out = Cli.run("compare", f.toString()).out();
        assertFalse(out.contains("Widening to b = " + (int) widen.get("width").asDouble()), out);
        assertFalse(out.contains("widths up to"), "the option lets the fixed width go, narrower too: " + out);
        if (b.get("recommended").asText().equals("widen")) {
            assertTrue(
                    out.contains(
                            "Narrowing to b = " + (int) widen.get("width").asDouble() + " mm from the fixed 400 mm"),
                    out);
        }
    }

    @Test
    void compareTableAndTextAgreeOnWhetherCompressionSteelIsNeeded() throws IOException {
        // the capped middle span of the clinic example (invented): at the cap its layout relies on compression
        // steel for deflection, but a dearer layout without it passes within the cap too
        Cli json = Cli.run("compare", "src/test/resources/studies/span-capped-si.yaml", "--format", "json");
        assertEquals(0, json.exit(), json.err());
        JsonNode atCap = json(json).get("beams").get(0).get("options").get(0);
        assertEquals("at_cap", atCap.get("kind").asText());
        assertTrue(atCap.get("compression_steel_relied_on").asBoolean(), atCap.toString());
        assertFalse(atCap.get("compression_steel_needed").asBoolean(), atCap.toString());
        String out = Cli.run("compare", "src/test/resources/studies/span-capped-si.yaml")
                .out();
        String row = out.lines()
                .filter(l -> l.strip().startsWith("at the cap, h ≤ 400 mm") && l.contains(" × "))
                .findFirst()
                .orElseThrow();
        assertTrue(row.contains("more, for cost") && !row.contains("needed"), row);
        assertTrue(out.contains("matter of cost"), out);
    }

    // ---------------------------------------------------------------- sweep

    @Test
    void sweepDoesNotBlameCompressionSteelWhereNothingPasses() throws IOException {
        // a small moment with a large shear (invented): two No. 10 legs at 75 mm at most carry
        // φ (0.17 √28 × 300 d + 142 × 420 d / 75) = 799 d N (22.5.5.1, 22.5.8.5.3, by hand), so Vu = 400 kN
        // needs d ≥ 500 mm whatever the bars; compression steel cannot change it, and from there the hangers
        // alone do
        Path f = write("shear.yaml", HEAD + """
                search:
                  widths: [300]
                  depth: {min: 300, max: 700, step: 25}
                  bar_sizes: ["16", "19", "22", "25"]
                  stirrups: {sizes: ["10"], legs: [2], spacing: {min: 75, max: 300, step: 25}}
                beams:
                  - id: SH
                    Mu: 60
                    Vu: 400
                """);
        Cli r = Cli.run("sweep", f.toString(), "--format", "json");
        assertEquals(0, r.exit(), r.err());
        JsonNode b = json(r).get("beams").get(0);
        double shallowest = b.get("shallowest_feasible").asDouble();
        assertTrue(shallowest > 300, "nothing passes at the shallowest caps: " + b);
        for (JsonNode p : b.get("points")) {
            if (p.get("feasible").asBoolean()) {
                assertFalse(p.get("compression_steel_needed").asBoolean(), p.toString());
            }
        }
        assertTrue(b.get("compression_needed_below").isNull(), b.toString());
        assertFalse(b.get("compression_needed_everywhere").asBoolean(), b.toString());
        String text = Cli.run("sweep", f.toString()).out();
        String line = text.lines()
                .filter(l -> l.contains("compression steel is necessary below"))
                .findFirst()
                .orElseThrow();
        assertTrue(line.contains("no cap in the range"), line);
    }

    @Test
    void sweepPlotMustBeAnSvgFile() throws IOException {
        Path png = dir.resolve("x.png");
        Cli r = Cli.run("sweep", "src/test/resources/studies/doubly-textbook-us.yaml", "--plot", png.toString());
        assertEquals(2, r.exit(), r.out() + r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertTrue(r.err().contains(".svg"), r.err());
        assertFalse(Files.exists(png), "nothing written");
    }

    // ---------------------------------------------------------------- schedule

    @Test
    void scheduleTableFitsAndSaysWhatItWrote() throws IOException {
        Path out = dir.resolve("out");
        Cli r = Cli.run("schedule", "../examples/schedule/office-us.yaml", "--quiet", "--out", out.toString());
        assertEquals(0, r.exit(), r.err());
        List<String> lines = r.out().lines().toList();
        int start = lines.indexOf(lines.stream()
                .filter(l -> l.strip().startsWith("beam "))
                .findFirst()
                .orElseThrow());
        for (int i = start; i < lines.size() && !lines.get(i).isBlank(); i++) {
            assertTrue(
                    lines.get(i).length() <= 160,
                    "table line " + i + " is " + lines.get(i).length() + " wide: " + lines.get(i));
        }
        // stirrups with their units, zone ends to the span's fixed decimals (ft, two decimals)
        String stirrups = lines.stream()
                .filter(l -> l.strip().startsWith("stirrups "))
                .findFirst()
                .orElseThrow();
        assertTrue(
                Pattern.compile("#3 × \\d legs @ \\d+(\\.\\d+)? in")
                        .matcher(stirrups)
                        .find(),
                stirrups);
        String csv = Files.readString(out.resolve("schedule.csv"));
        Matcher zone = Pattern.compile(
                        "(left|middle|right|support|outer) (\\d+\\.\\d+)–(\\d+\\.\\d+) ft: #3 × \\d legs @ "
                                + "\\d+(\\.\\d+)? in")
                .matcher(csv);
        int zones = 0;
        while (zone.find()) {
            assertEquals(2, zone.group(2).length() - zone.group(2).indexOf('.') - 1, zone.group());
            assertEquals(2, zone.group(3).length() - zone.group(3).indexOf('.') - 1, zone.group());
            zones++;
        }
        assertTrue(zones >= 8 * 2, "every zone of every beam: " + zones);
        assertTrue(r.out().contains("standardisation.svg"), "rationalised: the curve is written");
        assertTrue(Files.exists(out.resolve("standardisation.svg")));

        // without rationalise: no curve, and the command does not claim one
        Path plain = write("plain.yaml", HEAD + SPAN_SEARCH + """
                beams:
                  - id: P1
                    span: 6.0
                    ends: simple
                    moments: {mid: 180}
                    shear: {left: 120, right: 120}
                """);
        Path out2 = dir.resolve("out2");
        Cli p = Cli.run("schedule", plain.toString(), "--quiet", "--out", out2.toString());
        assertEquals(0, p.exit(), p.err());
        String wrote =
                p.out().lines().filter(l -> l.startsWith("wrote ")).findFirst().orElseThrow();
        assertFalse(wrote.contains(out2.resolve("standardisation.svg").toString()), wrote);
        assertFalse(Files.exists(out2.resolve("standardisation.svg")));
        for (String name : List.of("schedule.csv", "schedule.json", "report.html")) {
            assertTrue(wrote.contains(out2.resolve(name).toString()) && Files.exists(out2.resolve(name)), name);
        }
    }

    @Test
    void aFailureWithOnlyAWiderFixReadsAsASentence() throws IOException {
        // a web fixed at 150 mm takes no two bars side by side (150 − 2 × (40 + 9.5) = 51 mm inside the
        // stirrup, 25.2.1): no depth helps, a wider web does (invented beam)
        Path f = write("narrow.yaml", HEAD + """
                beams:
                  - id: N-1
                    span: 5.0
                    ends: simple
                    width: 150
                    moments: {mid: 120}
                    shear: {left: 90, right: 90}
                """);
        Cli s = Cli.run("schedule", f.toString(), "--quiet");
        assertEquals(1, s.exit(), s.err());
        String line = s.out()
                .lines()
                .filter(l -> l.strip().startsWith("N-1:"))
                .findFirst()
                .orElseThrow();
        assertFalse(line.contains("; or "), line);
        assertTrue(line.contains("what would work (one limit at a time): b ≥ "), line);
        JsonNode d = json(Cli.run("design", f.toString(), "--format", "json"))
                .get("beams")
                .get(0)
                .get("diagnosis");
        for (JsonNode fix : d.get("fixes")) {
            assertFalse(fix.asText().startsWith("or "), fix.asText());
        }
        String design = Cli.run("design", f.toString()).out();
        String what = design.lines()
                .filter(l -> l.contains("what would work"))
                .findFirst()
                .orElseThrow();
        assertTrue(what.contains("time): b ≥ "), what);
    }
}
