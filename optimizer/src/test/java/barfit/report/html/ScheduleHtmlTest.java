package barfit.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.catalogs.BarSize;
import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.design.span.SpanReport;
import barfit.design.span.SpanVerifier;
import barfit.report.Caution;
import barfit.schedule.ScheduleBeam;
import barfit.schedule.ScheduleResult;
import barfit.section.Bending;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import org.xml.sax.InputSource;

/**
 * The schedule report built from real designs of the example spans: its structure, the geometry of its
 * section drawings, and its promises (caution, nothing fetched). That the same input gives the same
 * bytes is checked across runs by the examples' golden files (examples/src/test/resources/golden).
 */
class ScheduleHtmlTest {
    static final String EXAMPLE = "clinic-line-c-spans-si.yaml";

    static ScheduleResult result;
    static String html;

    @BeforeAll
    static void render() {
        result = ScheduleFixtures.withRenderingFixtures(ScheduleFixtures.designed(EXAMPLE));
        html = ScheduleHtml.render(result);
    }

    @Test
    void everyBeamHasItsBlockAndEverySectionItsDrawing() throws Exception {
        Map<String, BarSize> bars = new HashMap<>();
        for (BarSize b : result.input().settings().catalog().bars()) {
            bars.put(b.label(), b);
        }
        assertEquals(3, result.beams().size(), "the example has three whole spans");
        for (ScheduleResult.Beam b : result.beams()) {
            String id = "beam-" + b.beam().id();
            String block = element(html, "<section class=\"beam\" id=\"" + id + "\">", "</section>");
            assertTrue(b.feasible(), b.beam().id() + " has a passing design in the example");
            SpanProblem p = b.outcome().problem();
            SpanLayout l = b.outcome().best().layout();
            Set<String> scales = new HashSet<>();
            for (SpanProblem.Place place :
                    b.outcome().best().report().sections().keySet()) {
                String fig = element(
                        block,
                        "<figure class=\"section-pair\" id=\"" + id + "-"
                                + place.name().toLowerCase(java.util.Locale.ROOT) + "\"",
                        "</figure>");
                Element svg = svg(fig, "section-drawing");
                double scale = Double.parseDouble(svg.getAttribute("data-px-per-mm"));
                scales.add(svg.getAttribute("data-px-per-mm"));
                // every bar present at the section: the top bars there and the full-span bottom bars
                int expected = SpanLayout.sum(l.topAt(p, place)) + l.bottomCount();
                List<Element> circles = circles(svg, "bar");
                assertEquals(expected, circles.size(), id + " " + place + ": one circle per bar");
                for (Element c : circles) {
                    BarSize bar = bars.get(c.getAttribute("data-bar"));
                    assertNotNull(bar, "circle names a catalog bar: " + c.getAttribute("data-bar"));
                    assertEquals(
                            bar.diameter() / 2 * scale,
                            Double.parseDouble(c.getAttribute("r")),
                            0.001,
                            "radius is db/2 at the drawing scale");
                }
                assertNotNull(svg(fig, "strain-stress"), "the strain and stress diagram sits beside the drawing");
            }
            assertEquals(1, scales.size(), id + ": all sections of a beam share one scale");
            assertEquals(
                    SectionDrawing.scaleFor(l.shape()),
                    Double.parseDouble(scales.iterator().next()),
                    1e-9);
            int rows = count(element(block, "<table class=\"grid checks\">", "</table>"), "<tr><td>")
                    + count(element(block, "<table class=\"grid checks\">", "</table>"), "<tr class=\"fail\"><td>");
            assertEquals(b.outcome().best().report().all().size(), rows, "every check of the span is listed");
            assertTrue(block.contains("<details class=\"trail\">"), "the calculation trail is in a collapsible block");
        }
    }

    /**
     * A zone whose stirrups no section drawing shows gets its own: the four-leg end zones of a simple span
     * (invented), whose only section drawn, at mid-span, sits in the two-leg middle zone.
     */
    @Test
    void everyZoneArrangementIsDrawn() throws Exception {
        ScheduleResult r =
                ScheduleFixtures.designed(java.nio.file.Path.of("src/test/resources/drawings/end-zone-legs-si.yaml"));
        String page = ScheduleHtml.render(r);
        ScheduleResult.Beam b = r.beams().get(0);
        List<Integer> legs = b.outcome().best().layout().zoneStirrups().stream()
                .map(s -> s.legs())
                .toList();
        assertEquals(List.of(4, 2, 4), legs, "the example's zones: four legs at the ends, two in the middle");
        String mid = element(page, "<figure class=\"section-pair\" id=\"beam-SS-1-mid\"", "</figure>");
        assertEquals(0, ties(svg(mid, "section-drawing")), "mid-span shows the middle zone's two legs");
        String ends = element(page, "<figure class=\"zone-section\" id=\"beam-SS-1-zone-left-right\"", "</figure>");
        Element svg = svg(ends, "section-drawing");
        assertEquals(2, ties(svg), "the end zones' four legs: the hoop and two crossties");
        assertEquals(
                b.outcome().best().layout().bottomCount()
                        + b.outcome().best().layout().topContinuous(),
                circles(svg, "bar").size(),
                "drawn on the mid-span section's bars");
        assertTrue(ends.contains("left and right zones"), ends);
        assertEquals(1, count(page, "<figure class=\"zone-section\""), "the middle zone is not drawn twice");
    }

    private static int ties(Element svg) {
        int n = 0;
        NodeList paths = svg.getElementsByTagName("path");
        for (int i = 0; i < paths.getLength(); i++) {
            n += ((Element) paths.item(i)).getAttribute("class").equals("stirrup tie") ? 1 : 0;
        }
        return n;
    }

    @Test
    void carriesTheCaution() {
        for (String line : Caution.LINES) {
            assertTrue(html.contains(Svg.esc(line)), "caution line present: " + line);
        }
        assertTrue(
                html.indexOf(Svg.esc(Caution.LINES.get(0))) < html.indexOf("id=\"project\""),
                "the caution comes before the data");
    }

    @Test
    void fetchesNothing() {
        Set<String> allowed =
                Set.of("http://www.w3.org/2000/svg", "http://www.w3.org/1999/xlink", "http://www.w3.org/1999/xhtml");
        Matcher m = Pattern.compile("https?://[^\"'\\s<>)]*").matcher(html);
        while (m.find()) {
            assertTrue(allowed.contains(m.group()), "only namespace URIs, found " + m.group());
        }
        assertFalse(html.contains("<script"), "no scripts");
        assertFalse(html.contains("<img"), "no images");
        assertFalse(html.contains("<link"), "no linked files");
        assertFalse(html.contains("@import"), "no imported style sheets");
        Matcher url = Pattern.compile("url\\(([^)]*)\\)").matcher(html);
        while (url.find()) {
            assertTrue(url.group(1).startsWith("#"), "only references inside the page: " + url.group());
        }
    }

    @Test
    void proofCostsAndStandardisationAreShown() throws Exception {
        String proof = element(html, "<section id=\"rationalisation\">", "</section>");
        assertTrue(proof.contains("linear relaxation integral; sizes priced lazily"), "the proof's method is shown");
        String costs = element(html, "<section id=\"costs\">", "</section>");
        assertTrue(costs.contains(barfit.report.Money.amount(result.totalCost())));
        String std = element(html, "<section id=\"standardisation\">", "</section>");
        assertEquals(result.standardisation().size(), count(std, "<tr><td class=\"num\">"), "one row per K");
        assertNotNull(svg(std, null), "the plot is inline");
    }

    /**
     * The top-left corner bar at the right support of C1-C2 (hogging: top bars in tension), placed by hand:
     * its centre sits cover + stirrup diameter + db/2 from the top face and from the left face (inside the
     * stirrup, where the checks put it: common practice, no source). The stirrup and bar diameters are
     * the catalog's nominal values; No. 10 = 9.5 mm is ASTM A615M, Table 1 (from memory).
     */
    @Test
    void cornerBarSitsInsideTheStirrupWhereTheChecksPutIt() throws Exception {
        ScheduleResult.Beam b = result.beams().get(0);
        assertEquals("C1-C2", b.beam().id());
        SpanLayout l = b.outcome().best().layout();
        SpanProblem p = b.outcome().problem();
        assertEquals(Bending.HOGGING, SpanLayout.bending(p, SpanProblem.Place.RIGHT));
        String fig = element(html, "<figure class=\"section-pair\" id=\"beam-C1-C2-right\"", "</figure>");
        Element svg = svg(fig, "section-drawing");
        double s = Double.parseDouble(svg.getAttribute("data-px-per-mm"));
        Element web = (Element) svg.getElementsByTagName("rect").item(0);
        assertEquals("concrete", web.getAttribute("class"), "at a hogging support the web is drawn on its own");
        double ox = Double.parseDouble(web.getAttribute("x"));
        double oy = Double.parseDouble(web.getAttribute("y"));
        assertEquals(l.width() * s, Double.parseDouble(web.getAttribute("width")), 0.01);
        assertEquals(l.height() * s, Double.parseDouble(web.getAttribute("height")), 0.01);

        double cover = p.detailing().cover();
        double ds = l.stirrupBar().diameter();
        assertEquals(9.5, ds, 0.05, "No. 10 stirrup, ASTM A615M Table 1 (from memory)");
        double db = l.top().diameter();
        double inside = cover + ds + db / 2;
        Element corner = null;
        for (Element c : circles(svg, "bar")) {
            if (!c.getAttribute("data-face").equals("top")) {
                continue;
            }
            if (corner == null
                    || cx(c) < cx(corner) - 1e-9
                    || Math.abs(cx(c) - cx(corner)) < 1e-9 && cy(c) < cy(corner)) {
                corner = c;
            }
        }
        assertNotNull(corner);
        assertEquals(ox + inside * s, cx(corner), 0.01, "corner bar x");
        assertEquals(oy + inside * s, cy(corner), 0.01, "corner bar y");
        double right = l.width() - inside;
        assertTrue(
                circles(svg, "bar").stream()
                        .anyMatch(c -> Math.abs(cx(c) - (ox + right * s)) < 0.01
                                && Math.abs(cy(c) - (oy + inside * s)) < 0.01),
                "the other corner bar, mirrored");

        // the stirrup: a bar of its own diameter along a centreline cover + ds/2 inside the faces
        Element hoop = null;
        NodeList paths = svg.getElementsByTagName("path");
        for (int i = 0; i < paths.getLength(); i++) {
            Element e = (Element) paths.item(i);
            if (e.getAttribute("class").equals("stirrup")) {
                hoop = e;
            }
        }
        assertNotNull(hoop);
        assertEquals(ds * s, Double.parseDouble(hoop.getAttribute("stroke-width")), 0.001);
        // inside bend radius: diameter 4 db for No. 10 to No. 16 stirrups, ACI 318-19 Table 25.3.2 (from memory)
        double inner = 2 * ds;
        double r = inner + ds / 2;
        assertTrue(
                hoop.getAttribute("d")
                        .startsWith(
                                "M" + Svg.px(ox + (cover + ds / 2 + r) * s) + "," + Svg.px(oy + (cover + ds / 2) * s)),
                "hoop starts where its top-left bend ends: " + hoop.getAttribute("d"));

        // the second layer sits directly under bars of the first
        List<Double> firstLayerX = new ArrayList<>();
        List<Double> innerLayerX = new ArrayList<>();
        for (Element c : circles(svg, "bar")) {
            if (c.getAttribute("data-face").equals("top")) {
                (Math.abs(cy(c) - cy(corner)) < 0.01 ? firstLayerX : innerLayerX).add(cx(c));
            }
        }
        assertEquals(l.topRight().get(0), firstLayerX.size());
        for (double x : innerLayerX) {
            assertTrue(
                    firstLayerX.stream().anyMatch(f -> Math.abs(f - x) < 0.01), "inner-layer bar under an outer one");
        }
    }

    /**
     * A design checked against moments it was not designed for fails, and the report marks each failing
     * check; a beam with no passing layout shows its diagnosis instead of drawings.
     */
    @Test
    void failuresAndInfeasibleBeamsAreShown() {
        ScheduleResult.Beam first = result.beams().get(0);
        SpanDesigner.Outcome o = first.outcome();
        SpanProblem harder = o.problem().scaled(1.5, 1.0);
        SpanLayout l = o.best().layout();
        SpanReport report = SpanVerifier.verify(harder, l, true);
        assertFalse(report.ok(), "the layout cannot carry 1.5 times its moments");
        SpanDesigner.Design d =
                new SpanDesigner.Design(l, o.best().cost(), report, o.best().bars());
        SpanDesigner.Outcome failing =
                new SpanDesigner.Outcome(harder, "checked", d, List.of(), o.proof(), List.of(), null);

        ScheduleResult.Beam second = result.beams().get(1);
        SpanProblem capped = second.outcome().problem().withMaxDepth(300.0);
        var designer = new SpanDesigner(
                new barfit.design.CostModel(
                        result.input().rates(),
                        result.input().settings().detailing().cover(),
                        result.input().settings().units().code()),
                new barfit.design.SolverOptions(60, 1, 1));
        SpanDesigner.Outcome none = designer.design(capped, 0);
        assertFalse(none.feasible(), "nothing fits under a 300 mm cap when the search starts at 400 mm");

        List<ScheduleResult.Beam> beams = List.of(
                new ScheduleResult.Beam(
                        new ScheduleBeam("F-1", null, first.beam().location(), harder), failing, Double.NaN),
                new ScheduleResult.Beam(
                        new ScheduleBeam("N-1", "line C", second.beam().location(), capped), none, Double.NaN));
        ScheduleResult r = new ScheduleResult(
                result.input(), beams, List.of(), List.of(), 0, 0, 0, null, List.of(), 1, 0, Double.NaN);
        String page = ScheduleHtml.render(r);

        String fails = element(page, "<section class=\"beam\" id=\"beam-F-1\">", "</section>");
        assertEquals(report.failures().size(), count(fails, "<tr class=\"fail\">"), "every failing check is marked");
        String noLayout = element(page, "<section class=\"beam\" id=\"beam-N-1\">", "</section>");
        assertTrue(
                noLayout.contains(Svg.esc(barfit.report.DiagnosisWords.summary(
                        none.diagnosis(), result.input().settings().units()))),
                "the diagnosis is shown");
        assertFalse(noLayout.contains("section-drawing"), "no drawing without a design");
        String row = element(page, "<tr class=\"infeasible\">", "</tr>");
        assertTrue(row.contains("No layout in the search space passes"), row);
        assertTrue(page.contains("1 beam has no passing layout"));
    }

    // ---------------------------------------------------------------- helpers

    /** The text from {@code start} to the first {@code end} after it (inclusive); fails when absent. */
    static String element(String text, String start, String end) {
        int i = text.indexOf(start);
        assertTrue(i >= 0, "missing " + start);
        int j = text.indexOf(end, i);
        assertTrue(j >= 0, "unterminated " + start);
        return text.substring(i, j + end.length());
    }

    /** The first {@code <svg>} of the given class (any when null) in a fragment, parsed as XML. */
    static Element svg(String fragment, String cls) throws Exception {
        Matcher m = Pattern.compile("<svg[^>]*>.*?</svg>", Pattern.DOTALL).matcher(fragment);
        while (m.find()) {
            if (cls == null
                    || m.group().startsWith("<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"" + cls + "\"")) {
                DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
                Document doc = f.newDocumentBuilder().parse(new InputSource(new StringReader(m.group())));
                return doc.getDocumentElement();
            }
        }
        return null;
    }

    static List<Element> circles(Element svg, String firstClass) {
        List<Element> out = new ArrayList<>();
        NodeList nl = svg.getElementsByTagName("circle");
        for (int i = 0; i < nl.getLength(); i++) {
            Element e = (Element) nl.item(i);
            if (e.getAttribute("class").split(" ")[0].equals(firstClass)) {
                out.add(e);
            }
        }
        return out;
    }

    static double cx(Element c) {
        return Double.parseDouble(c.getAttribute("cx"));
    }

    static double cy(Element c) {
        return Double.parseDouble(c.getAttribute("cy"));
    }

    static int count(String text, String what) {
        int n = 0;
        for (int i = text.indexOf(what); i >= 0; i = text.indexOf(what, i + what.length())) {
            n++;
        }
        return n;
    }
}
