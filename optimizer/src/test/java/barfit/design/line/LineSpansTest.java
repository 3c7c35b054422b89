package barfit.design.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.analysis.Line;
import barfit.analysis.LineAnalysis;
import barfit.analysis.LineResult;
import barfit.catalogs.yaml.YFields;
import barfit.design.CostModel;
import barfit.design.SolverOptions;
import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.design.span.SpanVerifier;
import barfit.input.DesignInput;
import barfit.input.DesignInputReader;
import barfit.input.LineInput;
import barfit.input.LinesReader;
import barfit.section.Deflection;
import barfit.section.SectionShape;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A line designed span by span: when it settles, the sections designed are the sections analysed, and
 * every span's layout passes the section model against the envelope recomputed here from those sections,
 * independently of the designer's bookkeeping.
 */
class LineSpansTest {
    @TempDir
    Path dir;

    @Test
    void settledDesignsPassTheEnvelopeOfTheirOwnSections() throws IOException {
        // invented line: three spans on columns with an overhang and a point load
        Path f = dir.resolve("line.yaml");
        Files.writeString(f, """
                units: SI
                concrete: {fc: 30}
                steel: {fy: 420}
                lines:
                  - id: T
                    spans: [6.5, 7.5, 6.0]
                    overhangs: {right: 1.8}
                    supports:
                      - {width: 400, below: {b: 400, h: 400, height: 4.0}}
                      - {width: 400, below: {b: 400, h: 400, height: 4.0}, above: {b: 400, h: 400, height: 3.6}}
                      - {width: 400, kind: knife-edge}
                      - {width: 400, below: {b: 400, h: 400, height: 4.0}}
                    loads:
                      dead: 20
                      live: 12
                      points: [{span: 2, at: 2.5, dead: 40, live: 25}]
                    sustained_live: 0.3
                    section: {width: 300, height: 600}
                    forms: per-span
                """);
        DesignInput in = DesignInputReader.read(f, false);
        YFields doc = DesignInputReader.document(f);
        LineInput line = LinesReader.read(doc, in.settings()).get(0);
        CostModel cost = new CostModel(
                in.rates(), in.settings().detailing().cover(), in.settings().code());
        SpanDesigner designer = new SpanDesigner(cost, new SolverOptions(30, 1, 1));
        LineSpans.Result r = new LineSpans(
                        in.settings(), in.space(), designer, in.maxBarSizesPerBeam(), in.barsPerTwoLegs())
                .design(line, 0);
        assertTrue(r.settled(), "settled in " + r.rounds() + " rounds");
        int n = line.spans().size();
        List<SectionShape> shapes = new ArrayList<>();
        for (int s = 0; s < n + 2; s++) {
            shapes.add(line.section());
        }
        for (LineSpans.Part p : r.parts()) {
            assertTrue(p.outcome().feasible(), p.name());
            var l = p.outcome().best().layout();
            shapes.set(p.segment(), new SectionShape(l.width(), l.height(), null));
        }
        // the envelope of the designed sections, computed afresh
        double ec = Deflection.ec(in.settings().materials(), in.settings().code());
        double minH = shapes.stream().mapToDouble(SectionShape::height).min().orElseThrow();
        double d = minH
                - in.settings().detailing().cover()
                - in.settings().stirrupBar().diameter()
                - 12.7;
        Line fresh = line.toLine(shapes, ec, d);
        LineResult a = LineAnalysis.analyse(fresh);
        for (LineSpans.Part p : r.parts()) {
            var prob = p.problem();
            if (p.segment() >= 1 && p.segment() <= n) {
                LineResult.SpanValues s = a.spans().get(p.segment() - 1);
                assertEquals(s.mSpanMax(), prob.mMid(), 1e-6 * Math.abs(s.mSpanMax()), p.name() + " mid");
                assertEquals(s.vLeftD(), prob.vLeft(), 1e-6 * s.vLeftD(), p.name() + " V left");
                if (prob.mLeft() != null) {
                    assertEquals(s.mLeftFace(), prob.mLeft(), 1e-6 * Math.abs(s.mLeftFace()), p.name() + " left");
                }
                if (prob.mRight() != null) {
                    assertEquals(s.mRightFace(), prob.mRight(), 1e-6 * Math.abs(s.mRightFace()), p.name() + " right");
                }
            } else {
                LineResult.OverhangValues o = a.overhangs().get(0);
                assertEquals(o.mFace(), prob.mLeft(), 1e-6 * Math.abs(o.mFace()), p.name());
            }
            assertTrue(
                    SpanVerifier.verify(prob, p.outcome().best().layout(), false)
                            .ok(),
                    p.name());
            if (p.segment() >= 1 && p.segment() <= n) {
                zonesCarryTheFreshEnvelope(fresh, a, p);
            }
        }
        // the knife edge at support 3 takes no moment at its centre line only if continuous: it is interior, so
        // span 2's right end is hogging; the end column at support 1 gives span 1 a hogging left end
        assertTrue(r.parts().get(0).problem().mLeft() != null, "the end column takes moment");
    }

    /**
     * Every stirrup zone of a span is designed for at least the envelope's |V| (from the fresh analysis'
     * stations) at every station it covers, sections nearer a face than d taking the shear at d only
     * where the analysis allows it (9.4.3.2).
     */
    private static void zonesCarryTheFreshEnvelope(Line fresh, LineResult a, LineSpans.Part p) {
        var prob = p.problem();
        var layout = p.outcome().best().layout();
        LineResult.SpanValues s = a.spans().get(p.segment() - 1);
        double faceLeft = fresh.supports().get(p.segment() - 1).width() / 2;
        List<SpanProblem.Zone> zones = prob.zones();
        for (int z = 0; z < zones.size(); z++) {
            SpanProblem.Zone zone = zones.get(z);
            var section = layout.section(prob, zone.section(), null);
            double d = barfit.section.SectionChecks.shearDepth(section, SpanLayout.bending(prob, zone.section()));
            double designed = zone.vu(d);
            for (LineResult.StationValues st : a.stations()) {
                if (st.segment() != p.segment()) {
                    continue;
                }
                double x = st.local() - faceLeft;
                boolean nearLeft = x < d && !s.vLeftAtFace();
                boolean nearRight = x > s.clear() - d && !s.vRightAtFace();
                if (x < zone.from() - 1e-6 || x > zone.to() + 1e-6 || nearLeft || nearRight) {
                    continue;
                }
                double v = Math.max(st.vMax(), -st.vMin());
                assertTrue(
                        designed >= v - 1e-6 * v,
                        p.name() + " zone " + zone.name() + " at " + x + " mm: designed " + designed + " N, envelope "
                                + v + " N");
            }
        }
    }

    @Test
    void eachPartIsTheCheapestByPlainEnumeration() throws IOException {
        // invented lines over a small search space, so that enumeration can visit every layout: each part's
        // design (with the line's shear diagram and service moments) costs what the exhaustive search finds.
        // Span by span only: a line of one section shares its support bars (SharedSupportsOracleTest)
        java.util.Random rnd = new java.util.Random(1319);
        int feasible = 0;
        for (int i = 0; i < 4; i++) {
            double a = 5.0 + 0.5 * rnd.nextInt(5);
            double b = 5.0 + 0.5 * rnd.nextInt(5);
            int dead = 14 + rnd.nextInt(10);
            int live = 6 + rnd.nextInt(10);
            String yaml =
                    """
                    units: SI
                    concrete: {fc: 28}
                    steel: {fy: 420}
                    search:
                      widths: [250, 300]
                      depth: {min: 400, max: 600, step: 50}
                      bar_sizes: ["16", "19", "22"]
                      max_layers: 1
                      stirrups: {sizes: ["10"], legs: [2], spacing: {min: 100, max: 300, step: 50}}
                    lines:
                      - id: R
                        spans: [%s, %s]
                        overhangs: {right: %s}
                        supports:
                          - {width: 300, kind: wall}
                          - {width: 350, below: {b: 350, h: 350, height: 3.5}}
                          - {width: 300, kind: knife-edge}
                        loads:
                          dead: %d
                          live: %d
                          points: [{span: 1, at: %s, dead: 25, live: 10}]
                        section: {width: 300, height: 500}
                        forms: %s
                    """.formatted(a, b, i % 2 == 0 ? "0" : "1.2", dead, live, 0.4 + 0.2 * rnd.nextInt(5), "per-span");
            Path f = dir.resolve("o" + i + ".yaml");
            Files.writeString(f, yaml);
            DesignInput in = DesignInputReader.read(f, false);
            LineInput line = LinesReader.read(DesignInputReader.document(f), in.settings())
                    .get(0);
            CostModel cost = new CostModel(
                    in.rates(), in.settings().detailing().cover(), in.settings().code());
            SpanDesigner designer = new SpanDesigner(cost, new SolverOptions(30, 1, 1));
            LineSpans.Result r = new LineSpans(
                            in.settings(), in.space(), designer, in.maxBarSizesPerBeam(), in.barsPerTwoLegs())
                    .design(line, 0);
            barfit.design.span.SpanExhaustive oracle = new barfit.design.span.SpanExhaustive(cost);
            for (LineSpans.Part p : r.parts()) {
                var ref = oracle.solve(p.problem());
                String where = "line " + i + " " + p.name();
                if (ref.best() == null) {
                    assertTrue(!p.outcome().feasible(), "the oracle finds nothing — " + where);
                    continue;
                }
                assertTrue(
                        p.outcome().feasible(),
                        "the optimizer finds nothing, the oracle " + ref.best() + " — " + where);
                assertEquals(
                        ref.units(), CostModel.units(p.outcome().best().cost().total()), "cost — " + where);
                feasible++;
            }
        }
        assertTrue(feasible >= 6, "enough parts with a design to mean something: " + feasible);
    }

    @Test
    void oneSectionIsTheCheapestOfEverySectionDesignedAlone() throws IOException {
        // invented line; the search space is 2 widths x 4 depths. The line designed with the whole space
        // must cost what the cheapest of the eight lines designed with one section each costs: the bound
        // that stops the search early must never stop it before the cheapest
        String line = """
                lines:
                  - id: F
                    spans: [6.0, 7.2]
                    overhangs: {left: 1.5}
                    supports:
                      - {width: 350, below: {b: 350, h: 350, height: 3.6}}
                      - {width: 350, below: {b: 350, h: 350, height: 3.6}, above: {b: 350, h: 350, height: 3.4}}
                      - {width: 300, kind: wall}
                    loads: {dead: 18, live: 11}
                    sustained_live: 0.25
                    section: {width: 300, height: 500}
                """;
        String head = """
                units: SI
                concrete: {fc: 30}
                steel: {fy: 420}
                search:
                  widths: %s
                  depth: {min: %s, max: %s, step: 50}
                  bar_sizes: ["16", "19", "22", "25"]
                  max_layers: 2
                """;
        LineSpans.Result all = designLine(head.formatted("[250, 300]", 450, 600) + line, 3);
        assertTrue(all.oneSection() != null && !all.oneSection().fellBack(), "one section carries the line");
        var first = all.parts().get(0).outcome().best().layout();
        double total = 0;
        for (LineSpans.Part p : all.parts()) {
            var l = p.outcome().best().layout();
            assertEquals(first.width(), l.width(), p.name() + ": one width");
            assertEquals(first.height(), l.height(), p.name() + ": one height");
            total += p.outcome().best().cost().total();
        }
        double cheapest = Double.POSITIVE_INFINITY;
        List<double[]> bySection = new ArrayList<>();
        for (int b : new int[] {250, 300}) {
            for (int h = 450; h <= 600; h += 50) {
                LineSpans.Result one = designLine(head.formatted("[" + b + "]", h, h) + line);
                if (one.oneSection() == null || one.oneSection().fellBack()) {
                    continue;
                }
                double sum = 0;
                for (LineSpans.Part p : one.parts()) {
                    sum += p.outcome().best().cost().total();
                }
                cheapest = Math.min(cheapest, sum);
                bySection.add(new double[] {sum, b, h});
            }
        }
        assertEquals(cheapest, total, 1e-6, "the cheapest section for the whole line");
        // the alternatives: the next three sections in order of their own cheapest lines
        bySection.sort(java.util.Comparator.comparingDouble(x -> x[0]));
        var alternatives = all.oneSection().alternatives();
        assertEquals(Math.min(3, bySection.size() - 1), alternatives.size());
        for (int k = 0; k < alternatives.size(); k++) {
            assertEquals(bySection.get(k + 1)[0], alternatives.get(k).cost(), 1e-6, "alternative " + (k + 1));
            assertEquals(
                    bySection.get(k + 1)[1] * 1e6 + bySection.get(k + 1)[2],
                    alternatives.get(k).width() * 1e6 + alternatives.get(k).height(),
                    1e-6,
                    "alternative " + (k + 1) + "'s section");
        }
        assertTrue(all.oneSection().designed() <= all.oneSection().sections());
    }

    private LineSpans.Result designLine(String yaml) throws IOException {
        return designLine(yaml, 0);
    }

    private LineSpans.Result designLine(String yaml, int alternatives) throws IOException {
        Path f = dir.resolve("r.yaml");
        Files.writeString(f, yaml);
        DesignInput in = DesignInputReader.read(f, false);
        LineInput line =
                LinesReader.read(DesignInputReader.document(f), in.settings()).get(0);
        CostModel cost = new CostModel(
                in.rates(), in.settings().detailing().cover(), in.settings().code());
        SpanDesigner designer = new SpanDesigner(cost, new SolverOptions(30, 1, 1));
        return new LineSpans(in.settings(), in.space(), designer, in.maxBarSizesPerBeam(), in.barsPerTwoLegs())
                .design(line, alternatives);
    }

    @Test
    void redistributionOnlyWhereTheSupportSectionsAllowIt() throws IOException {
        // ACI 318-19 6.6.5.1 and 6.6.5.3: redistribution only where εt >= 0.0075 at the section, at most
        // 1000 εt percent and 20 %. A heavily loaded line: its support sections end near εt = 0.0054, so none
        // of the 20 % allowed is used; a lightly loaded one chooses at most min(asked, 1000 εt).
        String heavy = """
                units: SI
                concrete: {fc: 30}
                steel: {fy: 420}
                lines:
                  - id: H
                    spans: [7.0, 7.0, 7.0]
                    supports: [{width: 400, kind: wall}]
                    loads: {dead: 30, live: 18}
                    section: {width: 300, height: 600}
                    redistribution: 20
                """;
        LineSpans.Result h = designLine(heavy);
        for (int j = 1; j <= 2; j++) {
            double e = h.epsT().get(j);
            assertTrue(e < 0.0075, "εt " + e);
            assertEquals(0.0, h.redistribution().get(j), 0.0);
        }
        LineSpans.Result l = designLine(heavy.replace("dead: 30, live: 18", "dead: 8, live: 4")
                .replace("redistribution: 20", "redistribution: 10"));
        assertTrue(l.settled());
        for (int j = 1; j <= 2; j++) {
            double e = l.epsT().get(j);
            // chosen by the search, within what the sections as built allow
            double allowed = e < 0.0075 ? 0 : Math.min(10, 1000 * e);
            assertTrue(l.redistribution().get(j) <= allowed + 1e-9, "εt " + e + ": " + l.redistribution());
        }
        assertTrue(l.epsT().get(1) >= 0.0075, "a light line is ductile enough to redistribute: " + l.epsT());
    }

    @Test
    void redistributionThatTheSectionsAllowLowersTheCost() throws IOException {
        // ACI 318-19 6.6.5: a lightly loaded line whose support sections reach εt >= 0.0075 keeps 10 % of
        // its support moments redistributed, and costs less than with none (invented line)
        String light = """
                units: SI
                concrete: {fc: 30}
                steel: {fy: 420}
                lines:
                  - id: L
                    spans: [7.0, 7.0, 7.0]
                    supports: [{width: 400, kind: wall}]
                    loads: {dead: 8, live: 4}
                    section: {width: 300, height: 600}
                    redistribution: 10
                """;
        LineSpans.Result with = designLine(light);
        LineSpans.Result without = designLine(light.replace("redistribution: 10\n", ""));
        assertTrue(with.redistribution().get(1) > 0, "redistributed: " + with.redistribution());
        assertTrue(
                total(with) < total(without) - 0.01,
                "redistribution pays: " + total(with) + " against " + total(without) + " with none");
    }

    @Test
    void ownWeightMovesTheSectionAGuessWouldChoose() throws IOException {
        // invented long-span line with little load besides its own weight: analysed with the guessed
        // 200 x 300 section's weight for every trial, the cheapest section is shallower than the one found
        // when each trial carries its own weight, and that shallower section fails under its own weight
        String yaml = """
                units: SI
                concrete: {fc: 30}
                steel: {fy: 420}
                search:
                  widths: [250, 300]
                  depth: {min: 500, max: 1000, step: 50}
                lines:
                  - id: W
                    spans: [12.0, 12.0]
                    supports: [{width: 300, kind: wall}]
                    loads: {dead: 2, live: 3}
                    section: {width: 200, height: 300}
                """;
        Path f = dir.resolve("w.yaml");
        Files.writeString(f, yaml);
        DesignInput in = DesignInputReader.read(f, false);
        LineInput line =
                LinesReader.read(DesignInputReader.document(f), in.settings()).get(0);
        CostModel cost = new CostModel(
                in.rates(), in.settings().detailing().cover(), in.settings().code());
        SpanDesigner designer = new SpanDesigner(cost, new SolverOptions(30, 1, 1));
        LineSpans lines =
                new LineSpans(in.settings(), in.space(), designer, in.maxBarSizesPerBeam(), in.barsPerTwoLegs());
        LineSpans.Result real = lines.design(line, 0);
        var chosen = real.parts().get(0).outcome().best().layout();
        // the guess: every trial section designed against the envelope of the 250 x 400 section
        List<barfit.design.span.SpanProblem> guessed = lines.problemsAt(line, new SectionShape(200, 300, null));
        double best = Double.POSITIVE_INFINITY;
        SectionShape bestShape = null;
        for (double b : in.space().widths()) {
            for (double h : in.space().depths()) {
                SectionShape shape = new SectionShape(b, h, null);
                double sum = 0;
                for (var p : guessed) {
                    var o = designer.design(LineSpans.heldAt(p, shape), 0);
                    sum += o.feasible() ? o.best().cost().total() : Double.POSITIVE_INFINITY;
                }
                if (sum < best - 1e-9) {
                    best = sum;
                    bestShape = shape;
                }
            }
        }
        assertTrue(bestShape != null, "the guess finds a section");
        assertTrue(
                bestShape.height() < chosen.height(),
                "the guess chooses " + bestShape.height() + " mm, its own weight " + chosen.height() + " mm");
        // at the guessed section, under its own weight, the guess's bars no longer carry the line
        boolean guessCarries = true;
        List<barfit.design.span.SpanProblem> own = lines.problemsAt(line, bestShape);
        for (var p : guessed) {
            var o = designer.design(LineSpans.heldAt(p, bestShape), 0);
            var ownProblem =
                    own.stream().filter(q -> q.id().equals(p.id())).findFirst().orElseThrow();
            guessCarries &= SpanVerifier.verify(
                            LineSpans.heldAt(ownProblem, bestShape), o.best().layout(), false)
                    .ok();
        }
        assertTrue(!guessCarries, "the guess's design fails under its own section's weight");
    }

    private static double total(LineSpans.Result r) {
        double t = 0;
        for (LineSpans.Part p : r.parts()) {
            t += p.outcome().best().cost().total();
        }
        return t;
    }
}
