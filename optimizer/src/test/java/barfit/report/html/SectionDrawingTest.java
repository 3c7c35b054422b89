package barfit.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.catalogs.BarSize;
import barfit.section.BeamSection;
import barfit.section.Bending;
import barfit.section.CodeEquations;
import barfit.section.Detailing;
import barfit.section.Exposure;
import barfit.section.Face;
import barfit.section.SectionShape;
import barfit.section.Stirrups;
import barfit.units.UnitSystem;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import org.xml.sax.InputSource;

/**
 * The geometry a section drawing emits, read back from its SVG: bar layers evenly spaced and symmetric,
 * crosstie legs beside bars (never through one), hook tails clear of the bars they do not wrap.
 */
class SectionDrawingTest {
    // nominal diameters, ASTM A615M Table 1 (from memory); areas and masses do not matter here
    private static final BarSize NO10 = new BarSize("10", "No. 10", 9.5, 71, 0.560);
    private static final BarSize NO16 = new BarSize("16", "No. 16", 15.9, 199, 1.552);
    private static final BarSize NO19 = new BarSize("19", "No. 19", 19.1, 284, 2.235);
    private static final BarSize NO25 = new BarSize("25", "No. 25", 25.4, 510, 3.973);
    private static final BarSize NO3 = new BarSize("3", "#3", 9.525, 71, 0.560);
    private static final BarSize NO6 = new BarSize("6", "#6", 19.05, 284, 2.235);
    private static final BarSize NO8 = new BarSize("8", "#8", 25.4, 510, 3.973);

    /** px: coordinates are written to 0.001 px. */
    private static final double TOL = 0.01;

    private record Bar(String face, double x, double y, double r) {}

    private record Seg(double x1, double y1, double x2, double y2) {
        /** A leg, not a tail cut to nothing. */
        boolean vertical() {
            return Math.abs(x1 - x2) < 1e-9 && Math.abs(y1 - y2) > 1;
        }

        double distance(double px, double py) {
            double dx = x2 - x1;
            double dy = y2 - y1;
            double len2 = dx * dx + dy * dy;
            double t = len2 == 0 ? 0 : Math.max(0, Math.min(1, ((px - x1) * dx + (py - y1) * dy) / len2));
            return Math.hypot(x1 + t * dx - px, y1 + t * dy - py);
        }
    }

    private record Drawn(double originX, double scale, List<Bar> bars, List<Seg> legs, List<Seg> tails, double rt) {}

    /**
     * Layouts with 4-leg stirrups: 4 + 3 bottom bars at mid-span, 6 + 5 top bars at a support (with the
     * uncounted bottom bars), and 5 + 5 #6 over 4 #8 where the legs once ran through the #8 bars. Cover
     * 40 mm and 1.5 in (Table 20.5.1.3.1), layer gap 25 mm and 1 in (25.2.2).
     */
    private static List<SectionDrawing.View> views() {
        List<SectionDrawing.View> out = new ArrayList<>();
        Detailing si = new Detailing(40, NO10, 25, Exposure.INTERIOR);
        out.add(view(
                SectionShape.rectangular(300, 500),
                si,
                Bending.SAGGING,
                layers(Face.BOTTOM, si, NO16, 4, 3),
                layers(Face.TOP, si, NO19, 2),
                false,
                NO10));
        out.add(view(
                SectionShape.rectangular(350, 525),
                si,
                Bending.HOGGING,
                layers(Face.TOP, si, NO19, 6, 5),
                layers(Face.BOTTOM, si, NO25, 4),
                true,
                NO10));
        Detailing us = new Detailing(38.1, NO3, 25.4, Exposure.INTERIOR);
        out.add(view(
                SectionShape.rectangular(304.8, 609.6),
                us,
                Bending.HOGGING,
                layers(Face.TOP, us, NO6, 5, 5),
                layers(Face.BOTTOM, us, NO8, 4),
                true,
                NO3));
        out.add(view(
                SectionShape.rectangular(304.8, 609.6),
                us,
                Bending.SAGGING,
                layers(Face.BOTTOM, us, NO8, 4),
                layers(Face.TOP, us, NO6, 5, 4),
                false,
                NO3));
        return out;
    }

    private static List<barfit.section.BarLayer> layers(Face face, Detailing d, BarSize bar, int... counts) {
        List<BeamSection.BarGroup> groups = new ArrayList<>();
        for (int c : counts) {
            groups.add(new BeamSection.BarGroup(bar, c));
        }
        return BeamSection.stack(face, groups, d);
    }

    private static SectionDrawing.View view(
            SectionShape shape,
            Detailing d,
            Bending bending,
            List<barfit.section.BarLayer> tension,
            List<barfit.section.BarLayer> compression,
            boolean otherUncounted,
            BarSize stirrup) {
        List<SectionDrawing.DrawnLayer> drawn = new ArrayList<>();
        tension.forEach(l -> drawn.add(new SectionDrawing.DrawnLayer(l, true)));
        compression.forEach(l -> drawn.add(new SectionDrawing.DrawnLayer(l, !otherUncounted)));
        return new SectionDrawing.View(
                "test", null, shape, d, bending, drawn, new Stirrups(stirrup, 4, 200), null, null, CodeEquations.SI);
    }

    private static Drawn draw(SectionDrawing.View v) throws Exception {
        double scale = SectionDrawing.scaleFor(v.shape());
        String svg = SectionDrawing.svg(v, scale, UnitSystem.SI);
        Document doc =
                DocumentBuilderFactory.newInstance().newDocumentBuilder().parse(new InputSource(new StringReader(svg)));
        Element root = doc.getDocumentElement();
        List<Bar> bars = new ArrayList<>();
        NodeList circles = doc.getElementsByTagName("circle");
        for (int i = 0; i < circles.getLength(); i++) {
            Element c = (Element) circles.item(i);
            if (c.getAttribute("class").startsWith("bar")) {
                bars.add(new Bar(c.getAttribute("data-face"), num(c, "cx"), num(c, "cy"), num(c, "r")));
            }
        }
        List<Seg> legs = new ArrayList<>();
        List<Seg> tails = new ArrayList<>();
        double rt = 0;
        NodeList paths = doc.getElementsByTagName("path");
        for (int i = 0; i < paths.getLength(); i++) {
            Element p = (Element) paths.item(i);
            String cls = p.getAttribute("class");
            if (!cls.equals("stirrup tie") && !cls.equals("stirrup hook")) {
                continue;
            }
            rt = num(p, "stroke-width") / 2;
            for (Seg s : lines(p.getAttribute("d"))) {
                (cls.equals("stirrup tie") && s.vertical() ? legs : tails).add(s);
            }
        }
        return new Drawn(num(root, "data-origin-x"), scale, bars, legs, tails, rt);
    }

    private static double num(Element e, String attr) {
        return Double.parseDouble(e.getAttribute(attr));
    }

    /** The straight pieces (L commands) of a path written as M/L/A with absolute coordinates. */
    private static List<Seg> lines(String d) {
        List<Seg> out = new ArrayList<>();
        String[] tok = d.trim().replace(',', ' ').split("\\s+|(?=[MLA])|(?<=[MLA])");
        List<String> t = new ArrayList<>();
        for (String s : tok) {
            if (!s.isBlank()) {
                t.add(s);
            }
        }
        double x = 0;
        double y = 0;
        for (int i = 0; i < t.size(); ) {
            String c = t.get(i);
            if (c.equals("M")) {
                x = Double.parseDouble(t.get(i + 1));
                y = Double.parseDouble(t.get(i + 2));
                i += 3;
            } else if (c.equals("L")) {
                double nx = Double.parseDouble(t.get(i + 1));
                double ny = Double.parseDouble(t.get(i + 2));
                out.add(new Seg(x, y, nx, ny));
                x = nx;
                y = ny;
                i += 3;
            } else if (c.equals("A")) {
                x = Double.parseDouble(t.get(i + 6));
                y = Double.parseDouble(t.get(i + 7));
                i += 8;
            } else {
                throw new AssertionError("unexpected path token " + c + " in " + d);
            }
        }
        return out;
    }

    /**
     * Each layer's bars are evenly spaced between its corner bars and symmetric about the web's centre
     * line, as the clear-spacing check of 25.2.1 assumes.
     */
    @Test
    void everyLayerIsEvenlySpacedAndSymmetric() throws Exception {
        for (SectionDrawing.View v : views()) {
            Drawn dr = draw(v);
            double centre = dr.originX() + v.shape().width() * dr.scale() / 2;
            Map<String, List<Double>> rows = new TreeMap<>();
            for (Bar b : dr.bars()) {
                rows.computeIfAbsent(b.face() + "@" + b.y(), k -> new ArrayList<>())
                        .add(b.x());
            }
            assertEquals(v.layers().size(), rows.size(), "one row of circles per layer");
            for (Map.Entry<String, List<Double>> row : rows.entrySet()) {
                List<Double> xs = row.getValue();
                xs.sort(Double::compare);
                int n = xs.size();
                double step = (xs.get(n - 1) - xs.get(0)) / (n - 1);
                for (int i = 0; i < n; i++) {
                    assertEquals(xs.get(0) + i * step, xs.get(i), TOL, row.getKey() + ": bar " + i + " evenly spaced");
                    assertEquals(
                            centre - xs.get(i),
                            xs.get(n - 1 - i) - centre,
                            TOL,
                            row.getKey() + ": bar " + i + " mirrored about the centre line");
                }
            }
        }
    }

    /**
     * A crosstie leg runs beside bars, never through one: every bar centre is at least rb + rt from each
     * leg, and the leg touches (distance rb + rt) a bar of an outer layer, the bar its hook wraps (25.3.2:
     * stirrup and tie hooks engage a longitudinal bar); a bar of the tension face where the layers allow.
     */
    @Test
    void tieLegsRunBesideBarsAndTouchTheBarTheyWrap() throws Exception {
        for (SectionDrawing.View v : views()) {
            Drawn dr = draw(v);
            assertEquals(2, dr.legs().size(), "a 4-leg stirrup has two crosstie legs");
            String top = Face.TOP.word();
            double topOuter = dr.bars().stream()
                    .filter(b -> b.face().equals(top))
                    .mapToDouble(Bar::y)
                    .min()
                    .orElseThrow();
            double bottomOuter = dr.bars().stream()
                    .filter(b -> !b.face().equals(top))
                    .mapToDouble(Bar::y)
                    .max()
                    .orElseThrow();
            for (Seg leg : dr.legs()) {
                boolean wraps = false;
                for (Bar b : dr.bars()) {
                    double dist = leg.distance(b.x(), b.y());
                    assertTrue(
                            dist >= b.r() + dr.rt() - TOL,
                            "leg at x = " + leg.x1() + " overlaps the bar at " + b.x() + "," + b.y() + " (distance "
                                    + dist + ")");
                    boolean outer = Math.abs(b.y() - (b.face().equals(top) ? topOuter : bottomOuter)) < TOL;
                    wraps |= outer && Math.abs(dist - (b.r() + dr.rt())) < TOL;
                }
                assertTrue(wraps, "leg at x = " + leg.x1() + " touches a bar of an outer layer");
            }
            double centre = dr.originX() + v.shape().width() * dr.scale() / 2;
            assertEquals(
                    centre - dr.legs().get(0).x1(),
                    dr.legs().get(1).x1() - centre,
                    TOL,
                    "the two legs mirror each other");
        }
    }

    /**
     * Hook tails (hoop and crossties) never cut into a bar, nor end touching one: every bar centre is at
     * least rb + rt away from a tail and, but for the bar the hook wraps (the one its tail starts against),
     * rb + rt + the drawing's clearance from a tail that runs at all, so that a tail stopped by a bar reads
     * as stopped short of it. (A hook with no room for any tail is only kept off the bars.)
     */
    @Test
    void hookTailsKeepClearOfBars() throws Exception {
        List<SectionDrawing.View> all = new ArrayList<>(views());
        all.add(hoggingTwoLayers(2));
        for (SectionDrawing.View v : all) {
            Drawn dr = draw(v);
            assertFalse(dr.tails().isEmpty());
            double gap = SectionDrawing.clearance(v.stirrups().bar()) * dr.scale();
            for (Seg s : dr.tails()) {
                for (Bar b : dr.bars()) {
                    double d = s.distance(b.x(), b.y());
                    assertTrue(d >= b.r() + dr.rt() - TOL, "tail " + s + " cuts the bar at " + b.x() + "," + b.y());
                    // the tail's own bar: one end of the straight piece leaves it (a path may draw either way)
                    boolean wrapped = Math.min(
                                    Math.hypot(s.x1() - b.x(), s.y1() - b.y()),
                                    Math.hypot(s.x2() - b.x(), s.y2() - b.y()))
                            <= b.r() + dr.rt() + TOL;
                    boolean runs = Math.hypot(s.x2() - s.x1(), s.y2() - s.y1()) > TOL;
                    assertTrue(
                            wrapped || !runs || d >= b.r() + dr.rt() + gap - TOL,
                            "tail " + s + " touches the bar at " + b.x() + "," + b.y() + " (distance " + d + ")");
                }
            }
        }
    }

    /**
     * A support section with two top layers close under the corner bars (6 + 6 No. 16, 25 mm apart, 25.2.2)
     * and one bottom layer of 3 No. 25, 350 × 525 mm: the second layer is in the way of hooks closing the
     * hoop at a top corner, so it closes at a bottom one, where both 135° hooks run their full 75 mm
     * (Table 25.3.2: 6 db = 57 mm, at least 75 mm).
     */
    @Test
    void theHoopClosesWhereItsHooksRunTheirFullLength() throws Exception {
        SectionDrawing.View v = hoggingTwoLayers(2);
        String svg = SectionDrawing.svg(v, SectionDrawing.scaleFor(v.shape()), UnitSystem.SI);
        Matcher m = Pattern.compile("<path class=\"stirrup hook\" data-corner=\"([a-z-]+)\"")
                .matcher(svg);
        assertTrue(m.find(), "the hoop's hooks are drawn");
        assertTrue(m.group(1).startsWith("bottom"), "closed at " + m.group(1));
        Drawn dr = draw(v);
        assertEquals(2, dr.tails().size());
        for (Seg s : dr.tails()) {
            assertEquals(75 * dr.scale(), Math.hypot(s.x2() - s.x1(), s.y2() - s.y1()), TOL, "a full 75 mm tail");
        }
        assertFalse(svg.contains("drawn short"), "nothing is drawn short, so the legend does not say so");
    }

    private static SectionDrawing.View hoggingTwoLayers(int legs) {
        Detailing si = new Detailing(40, NO10, 25, Exposure.INTERIOR);
        List<SectionDrawing.DrawnLayer> drawn = new ArrayList<>();
        layers(Face.TOP, si, NO16, 6, 6).forEach(l -> drawn.add(new SectionDrawing.DrawnLayer(l, true)));
        layers(Face.BOTTOM, si, NO25, 3).forEach(l -> drawn.add(new SectionDrawing.DrawnLayer(l, false)));
        return new SectionDrawing.View(
                "test",
                null,
                SectionShape.rectangular(350, 525),
                si,
                Bending.HOGGING,
                drawn,
                new Stirrups(NO10, legs, 150),
                null,
                null,
                CodeEquations.SI);
    }
}
