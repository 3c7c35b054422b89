package barfit.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.cli.Cli;
import barfit.design.CostModel;
import barfit.design.SolverOptions;
import barfit.design.line.LineSpans;
import barfit.design.span.SpanDesigner;
import barfit.detailing.BarRun;
import barfit.detailing.LineDetail;
import barfit.detailing.ScheduleRow;
import barfit.input.DesignInput;
import barfit.input.DesignInputReader;
import barfit.input.LineInput;
import barfit.input.LinesReader;
import barfit.section.Face;
import barfit.section.trail.Trail;
import barfit.units.UnitSystem;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/**
 * The elevation of a detailed line read back from its SVG: well-formed, one path per bar run drawn to the
 * scale the drawing states from the run's start to its end (a hooked end set in by the few px that keep
 * hooks apart), a subpath per stock piece meeting at the laps' ends, a leg per hook of the height the
 * bending schedule gives, top bars in the upper half and bottom bars in the lower, every stirrup set drawn,
 * the same bytes from a second design of the same line. The line is examples/lines' L1-B (an invented
 * building).
 */
class ElevationSvgTest {
    private static final Path FILE = Path.of("..", "examples", "lines", "ashgrove-depot-lines-si.yaml");

    private static LineDetail detail;
    private static String svg;

    @TempDir
    Path dir;

    @BeforeAll
    static void drawTheLine() throws IOException {
        Drawn d = draw();
        detail = d.detail();
        svg = d.svg();
    }

    private record Drawn(LineDetail detail, String svg) {}

    /** L1-B designed and detailed afresh, and its elevation. */
    private static Drawn draw() throws IOException {
        DesignInput in = DesignInputReader.read(FILE, false);
        LineInput line = LinesReader.read(DesignInputReader.document(FILE), in.settings()).stream()
                .filter(l -> l.id().equals("L1-B"))
                .findFirst()
                .orElseThrow();
        CostModel cost = new CostModel(
                in.rates(), in.settings().detailing().cover(), in.settings().code());
        LineSpans.Result r = new LineSpans(
                        in.settings(),
                        in.space(),
                        new SpanDesigner(cost, new SolverOptions(30, 1, 1)),
                        in.maxBarSizesPerBeam(),
                        in.barsPerTwoLegs())
                .design(line, 0);
        LineDetail d = LineDetail.of(r, in.settings(), cost, LineDetail.defaultStock(in.settings()), Trail.off());
        assertNotNull(d, "L1-B is analysed by stiffness and designed: it is detailed");
        return new Drawn(d, ElevationSvg.svg(d, r, UnitSystem.SI));
    }

    private static Document parse(String text) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        f.setNamespaceAware(true);
        return f.newDocumentBuilder().parse(new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)));
    }

    private static List<Element> byClass(Document doc, String tag, String cls) {
        List<Element> out = new ArrayList<>();
        NodeList all = doc.getElementsByTagName(tag);
        for (int i = 0; i < all.getLength(); i++) {
            Element e = (Element) all.item(i);
            if (List.of(e.getAttribute("class").split(" ")).contains(cls)) {
                out.add(e);
            }
        }
        return out;
    }

    /** A path's subpaths, each a list of (x, y) points. */
    private static List<List<double[]>> subpaths(String d) {
        List<List<double[]>> out = new ArrayList<>();
        String[] t = d.replace("Z", "").trim().split("\\s+");
        for (int i = 0; i < t.length; i += 2) {
            String cmd = t[i].substring(0, 1);
            double x = Double.parseDouble(t[i].substring(1));
            double y = Double.parseDouble(t[i + 1]);
            if (cmd.equals("M")) {
                out.add(new ArrayList<>());
            }
            out.get(out.size() - 1).add(new double[] {x, y});
        }
        return out;
    }

    @Test
    void everyRunIsOnePathToScaleWithItsPiecesAndHooks() throws Exception {
        Document doc = parse(svg);
        Element root = doc.getDocumentElement();
        assertEquals("svg", root.getLocalName());
        double left = Double.parseDouble(root.getAttribute("data-left-px"));
        double leftMm = Double.parseDouble(root.getAttribute("data-left-mm"));
        double perMm = Double.parseDouble(root.getAttribute("data-px-per-mm"));
        double depthPerMm = Double.parseDouble(root.getAttribute("data-depth-px-per-mm"));
        // the line's length, end of the beam to end of the beam, takes 1400 px (the drawing's choice)
        double length = detail.line().supportX(3) + detail.line().overhangRight() + 225;
        assertEquals(1400, length * perMm, 1e-6);

        List<Element> paths = byClass(doc, "path", "bar-run");
        List<BarRun> runs = detail.runs();
        assertEquals(runs.size(), paths.size(), "one path per bar run");
        double beamTop = Double.POSITIVE_INFINITY;
        double beamBottom = Double.NEGATIVE_INFINITY;
        for (List<double[]> sub : subpaths(byClass(doc, "path", "beam").get(0).getAttribute("d"))) {
            for (double[] p : sub) {
                beamTop = Math.min(beamTop, p[1]);
                beamBottom = Math.max(beamBottom, p[1]);
            }
        }
        int hooks = 0;
        int laps = 0;
        for (int i = 0; i < runs.size(); i++) {
            BarRun run = runs.get(i);
            Element path = paths.get(i);
            assertEquals(run.what(), path.getAttribute("data-what"));
            List<List<double[]>> pieces = subpaths(path.getAttribute("d"));
            assertEquals(run.laps().size() + 1, pieces.size(), run.what() + ": a subpath per stock piece");
            laps += run.laps().size();
            double start = left + (run.start() - leftMm) * perMm;
            double end = left + (run.end() - leftMm) * perMm;
            double minX = pieces.stream()
                    .flatMap(List::stream)
                    .mapToDouble(p -> p[0])
                    .min()
                    .orElseThrow();
            double maxX = pieces.stream()
                    .flatMap(List::stream)
                    .mapToDouble(p -> p[0])
                    .max()
                    .orElseThrow();
            // a hooked end is set in by at most 12 px so that hooks at one end stay apart
            assertTrue(
                    run.hookStart() ? minX >= start - 1e-3 && minX <= start + 12 : Math.abs(minX - start) < 1e-3,
                    run.what() + " starts at " + minX + " px, its start is at " + start);
            assertTrue(
                    run.hookEnd() ? maxX <= end + 1e-3 && maxX >= end - 12 : Math.abs(maxX - end) < 1e-3,
                    run.what() + " ends at " + maxX + " px, its end is at " + end);
            for (int k = 0; k < run.laps().size(); k++) {
                List<double[]> before = pieces.get(k);
                List<double[]> after = pieces.get(k + 1);
                double lapTo = left + (run.laps().get(k).to() - leftMm) * perMm;
                double lapFrom = left + (run.laps().get(k).from() - leftMm) * perMm;
                assertEquals(lapTo, before.get(before.size() - 1)[0], 1e-3, "a piece runs to the lap's end");
                assertEquals(lapFrom, after.get(0)[0], 1e-3, "the next starts at the lap's start");
                assertTrue(Math.abs(before.get(0)[1] - after.get(0)[1]) > 2, "the two pieces are drawn apart");
            }
            // legs: vertical segments, into the section, the hook's height on the depth's scale
            double leg = legOf(run);
            int legs = 0;
            double barY = Double.NaN;
            for (List<double[]> piece : pieces) {
                for (int k = 1; k < piece.size(); k++) {
                    double[] a = piece.get(k - 1);
                    double[] b = piece.get(k);
                    if (Math.abs(a[0] - b[0]) < 1e-9) {
                        legs++;
                        double dy = a[1] - b[1]; // from the leg's tip to the bar, or from the bar to the tip
                        double down = k == 1 ? dy : -dy; // + where the tip is below the bar
                        assertEquals(run.face() == Face.TOP ? leg * depthPerMm : -leg * depthPerMm, down, 1e-3);
                    } else {
                        barY = a[1];
                    }
                }
            }
            assertEquals((run.hookStart() ? 1 : 0) + (run.hookEnd() ? 1 : 0), legs, run.what() + ": a leg per hook");
            hooks += legs;
            double middle = (beamTop + beamBottom) / 2;
            assertTrue(
                    run.face() == Face.TOP ? barY > beamTop && barY < middle : barY < beamBottom && barY > middle,
                    run.what() + " at y " + barY + " on its face");
            String label = run.count() + " " + run.bar().label() + " " + run.what();
            assertTrue(svg.contains(">" + label + "</text>"), "labelled: " + label);
        }
        // the spans' bottom bars are lapped over the interior supports: two runs that overlap
        int overlaps = 0;
        for (int i = 0; i < runs.size(); i++) {
            for (int j = i + 1; j < runs.size(); j++) {
                BarRun a = runs.get(i);
                BarRun b = runs.get(j);
                boolean bottom = a.face() == Face.BOTTOM && b.face() == Face.BOTTOM;
                overlaps += bottom && Math.min(a.end(), b.end()) - Math.max(a.start(), b.start()) > 1 ? 1 : 0;
            }
        }
        assertTrue(hooks >= 2 && laps >= 1 && overlaps >= 1, "hooks and laps to draw: " + hooks + ", " + laps);
        assertEquals(laps + overlaps, byClass(doc, "rect", "lap").size(), "every lap marked");

        int sets = detail.zones().stream().mapToInt(LineDetail.Zone::sets).sum();
        assertEquals(sets, byClass(doc, "line", "stirrup").size(), "every stirrup set drawn");
        for (LineDetail.Zone z : detail.zones()) {
            String words = z.stirrups().bar().label() + " × " + z.stirrups().legs() + " @ "
                    + Math.round(z.stirrups().spacing());
            assertTrue(svg.contains(">" + words + "</text>"), words);
        }
        // a block under each of the 4 supports, a column stub above the first 3
        assertEquals(4 + 3, byClass(doc, "rect", "support").size());
        assertTrue(svg.contains(">Line L1-B: elevation of the bars as detailed</text>"));
        assertTrue(svg.contains(">CAUTION: " + Caution.SHORT + "</text>"));
        String ratio = String.format(Locale.ROOT, "%.2f", detail.coverage().worstRatio());
        assertTrue(svg.contains("largest Mu/φMn " + ratio), "the worst ratio written: " + ratio);
        assertEquals(
                detail.coverage().covered(),
                svg.contains("cover the factored envelope at every station"),
                "the verdict is the coverage's");
        assertEquals(2, byClass(doc, "path", "envelope").size());
        assertEquals(2, byClass(doc, "path", "strength").size());
    }

    /** A hooked run's leg, mm, from its row of the bending schedule. */
    private static double legOf(BarRun run) {
        for (ScheduleRow row : detail.schedule()) {
            if (row.where().equals(run.what()) && row.b() > 0) {
                return row.b();
            }
        }
        return 0;
    }

    @Test
    void theSameBytesFromASecondDesign() throws IOException {
        assertEquals(svg, draw().svg());
    }

    @Test
    void designWritesTheElevationAndKeepsItUnlessForced() throws IOException {
        // invented two-span line in inch-pound units, built into columns at its ends (hooked bars)
        Path f = dir.resolve("us.yaml");
        Files.writeString(f, """
                units: US
                concrete: {fc: 4000, density: 150}
                steel: {fy: 60000}
                search:
                  widths: [14]
                  depth: {min: 22, max: 26, step: 2}
                lines:
                  - id: U-2
                    spans: [22, 22]
                    supports:
                      - {width: 16, below: {b: 16, h: 16, height: 12}}
                      - {width: 16, below: {b: 16, h: 16, height: 12}}
                      - {width: 16, below: {b: 16, h: 16, height: 12}}
                    loads: {dead: 1.0, live: 0.6}
                    section: {width: 14, height: 24}
                """);
        Path plots = dir.resolve("plots");
        Cli r = Cli.run("design", f.toString(), "--plot", plots.toString());
        assertEquals(0, r.exit(), r.err());
        Path elevation = plots.resolve("U-2-elevation.svg");
        String text = Files.readString(elevation);
        assertTrue(text.contains("(ft)") && text.contains("kip·ft"), "feet along, kip·ft in the diagram");
        assertTrue(text.contains("span 1: 22.00 ft"), "the span's length in feet");
        assertFalse(text.contains(" m)") || text.contains("kN"), "no SI units");
        // the capacity plot gone, the elevation kept: still refused without --force, and left as it was
        Files.delete(plots.resolve("U-2-capacity.svg"));
        Cli again = Cli.run("design", f.toString(), "--plot", plots.toString());
        assertEquals(2, again.exit());
        assertTrue(again.err().contains("U-2-elevation.svg") && again.err().contains("--force"), again.err());
        assertEquals(text, Files.readString(elevation));
        Cli forced = Cli.run("design", f.toString(), "--plot", plots.toString(), "--force");
        assertEquals(0, forced.exit(), forced.err());
        assertEquals(text, Files.readString(elevation), "the same drawing again, byte for byte");
    }
}
