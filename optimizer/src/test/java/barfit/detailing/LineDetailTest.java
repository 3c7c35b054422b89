package barfit.detailing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.CostModel;
import barfit.design.SolverOptions;
import barfit.design.line.LineSpans;
import barfit.design.span.SpanDesigner;
import barfit.input.DesignInput;
import barfit.input.DesignInputReader;
import barfit.input.LineInput;
import barfit.input.LinesReader;
import barfit.section.Face;
import barfit.section.trail.Trail;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A designed line detailed bar by bar: the schedule's mass against every bar as placed, recomputed here
 * from the runs with hook allowances from Table 25.3.1 by hand; the cut-off requirements of 9.7.3 against
 * the envelope and a hand calculation of the continuous bars' strength (22.2); and, over seeded random
 * lines, the capacity of the bars as detailed (each built up over ld or ldh from its ends) against the
 * factored envelope at every station. Lines are invented.
 */
class LineDetailTest {
    @TempDir
    Path dir;

    private record Designed(LineSpans.Result result, DesignInput in, CostModel cost) {}

    private Designed design(String yaml) throws IOException {
        Path f = dir.resolve("line.yaml");
        Files.writeString(f, yaml);
        DesignInput in = DesignInputReader.read(f, false);
        LineInput line =
                LinesReader.read(DesignInputReader.document(f), in.settings()).get(0);
        CostModel cost = new CostModel(
                in.rates(), in.settings().detailing().cover(), in.settings().code());
        var r = new LineSpans(
                        in.settings(),
                        in.space(),
                        new SpanDesigner(cost, new SolverOptions(30, 1, 1)),
                        in.maxBarSizesPerBeam(),
                        in.barsPerTwoLegs())
                .design(line, 0);
        return new Designed(r, in, cost);
    }

    private static final String HEAD = """
            units: SI
            concrete: {fc: 30}
            steel: {fy: 420}
            search:
              widths: [300]
              depth: {min: 450, max: 650, step: 50}
              bar_sizes: ["16", "19", "22", "25"]
            """;

    @Test
    void scheduleMassIsEveryBarAsPlaced() throws IOException {
        // invented line: three spans on 500 mm columns, the first built in (hooks), 30 m long (laps)
        Designed d = design(HEAD + """
                lines:
                  - id: M
                    spans: [10.0, 10.0, 10.0]
                    supports:
                      - {width: 500, below: {b: 500, h: 500, height: 4.0}}
                    loads: {dead: 22, live: 10}
                    section: {width: 300, height: 600}
                """);
        LineDetail det = LineDetail.of(d.result(), d.in().settings(), d.cost(), 12_000, Trail.off());
        double main = 0;
        for (BarRun run : det.runs()) {
            double db = run.bar().diameter();
            // Table 25.3.1, 90-degree hook, No. 25 and smaller: D = 6 db, extension 12 db; the bend's centre
            // line pi/2 (D + db)/2, reaching D/2 + db past its tangent point (hand calculation)
            double bendD = 6 * db;
            double developed = Math.PI / 2 * (bendD + db) / 2 + 12 * db;
            double reach = bendD / 2 + db;
            double from = run.start();
            boolean hook = run.hookStart();
            java.util.List<double[]> pieces = new java.util.ArrayList<>();
            for (BarRun.Lap lap : run.laps()) {
                pieces.add(new double[] {from, lap.to(), hook ? 1 : 0, 0});
                from = lap.from();
                hook = false;
            }
            pieces.add(new double[] {from, run.end(), hook ? 1 : 0, run.hookEnd() ? 1 : 0});
            for (double[] p : pieces) {
                double length = p[1] - p[0] + (p[2] + p[3]) * (developed - reach);
                double cut = Math.ceil(length / 10 - 1e-9) * 10; // to 10 mm (common practice, no source)
                main += run.count() * cut / 1000 * run.bar().massPerMetre();
                assertTrue(cut <= 12_000 + 10 * (p[2] + p[3]) * db + 1, "no piece longer than stock: " + cut);
            }
        }
        double stirrups = 0;
        for (LineDetail.Zone z : det.zones()) {
            var l = d.result().parts().stream()
                    .filter(p -> p.name().equals(z.part()))
                    .findFirst()
                    .orElseThrow()
                    .outcome()
                    .best()
                    .layout();
            double hoop = Math.ceil(d.cost()
                                            .hoopLength(
                                                    l.width(),
                                                    l.height(),
                                                    z.stirrups().bar())
                                    / 10
                            - 1e-9)
                    * 10;
            stirrups += z.sets() * hoop / 1000 * z.stirrups().bar().massPerMetre();
        }
        double scheduled =
                det.schedule().stream().mapToDouble(ScheduleRow::mass).sum();
        assertEquals(main, det.mainMass(), 1e-6, "the schedule's main bars: every run, piece by piece");
        assertEquals(stirrups, det.stirrupMass(), 1e-6, "the hoops of every zone");
        assertEquals(scheduled, det.totalMass(), 1e-6, "the schedule's rows sum to the total");
        assertEquals(
                d.cost().rates().mainBarsPerKg() * main + d.cost().rates().stirrupsPerKg() * stirrups,
                det.steelCost(),
                1e-6,
                "priced from the masses cut");
        assertTrue(det.runs().stream().anyMatch(r -> !r.laps().isEmpty()), "a 30 m line laps its hangers");
        assertTrue(det.runs().stream().anyMatch(BarRun::hookStart), "hooked into the first column");
    }

    @Test
    void extraTopBarsMeetNineSevenThree() throws IOException {
        // invented two-span line on knife-edge supports: the extra top bars over the middle support
        Designed d = design(HEAD + """
                lines:
                  - id: C
                    spans: [8.0, 8.0]
                    supports:
                      - {width: 300, kind: knife-edge}
                      - {width: 300, kind: knife-edge}
                      - {width: 300, kind: knife-edge}
                    loads: {dead: 25, live: 15}
                    section: {width: 300, height: 600}
                """);
        LineDetail det = LineDetail.of(d.result(), d.in().settings(), d.cost(), 12_000, Trail.off());
        var sb = d.result().supports().get(1);
        var side = sb.either();
        double fc = 30;
        double fy = 420;
        double b = 300;
        double dd = side.section().flexure().d();
        // the continuous bars alone (22.2, hand calculation): a = As fy / (0.85 f'c b), phi Mn = 0.9 As fy (d - a/2),
        // tension-controlled with so little steel (eps_t well above 0.005, Table 21.2.2)
        // the continuous bars sit in the first layer: d1 = h - cover (40) - stirrup (No. 10, 9.5) - db/2
        double h = side.section().section().shape().height();
        double d1 = h - 40 - 9.5 - side.bar().diameter() / 2;
        double as = side.continuous() * side.bar().area();
        double a = as * fy / (0.85 * fc * b);
        double phiMn = 0.9 * as * fy * (d1 - a / 2);
        for (LineDetailer.CutOff c : det.cutOffs()) {
            if (c.support() != 2 || Double.isNaN(c.theoretical())) {
                continue;
            }
            // the envelope at the theoretical point equals the continuous bars' strength (within the
            // interpolation between stations: 0.5 %)
            double m = hogging(d.result(), c.theoretical());
            assertEquals(phiMn, m, 0.005 * phiMn, "envelope at the theoretical cut-off, side " + c.intoRight());
            double face = c.intoRight() ? 8000 + 150 : 8000 - 150;
            double ext = Math.max(dd, 12 * side.bar().diameter()); // 9.7.3.3
            assertTrue(c.required() >= Math.abs(c.theoretical() - face) + ext - 1e-6, "9.7.3.3");
            assertTrue(c.required() >= c.ld() - 1e-6, "9.7.3.2: ld past the face");
            // the run as detailed reaches it
            BarRun extra = det.runs().stream()
                    .filter(r -> r.what().equals("top extra, support 2"))
                    .findFirst()
                    .orElseThrow();
            double reach = c.intoRight() ? extra.end() - face : face - extra.start();
            assertTrue(reach >= Math.max(c.required(), c.designed()) - 1e-6, "the run covers what is asked");
        }
        assertTrue(det.coverage().covered(), "covered: worst " + det.coverage().worstRatio());
    }

    /** −Mmin of the envelope at x, interpolated between the analysis' stations. */
    private static double hogging(LineSpans.Result r, double x) {
        var st = r.analysis().stations();
        for (int i = 1; i < st.size(); i++) {
            var p = st.get(i - 1);
            var q = st.get(i);
            if (p.x() <= x && x <= q.x() && q.x() > p.x()) {
                double t = (x - p.x()) / (q.x() - p.x());
                return -(p.mMin() + t * (q.mMin() - p.mMin()));
            }
        }
        throw new IllegalArgumentException("x outside the line");
    }

    @Test
    void barsAsDetailedCoverTheEnvelopeOnRandomLines() throws IOException {
        // seeded invented lines: 2 or 3 spans, columns wide enough for the hooks or knife-edge ends
        Random rnd = new Random(2026);
        for (int k = 0; k < 6; k++) {
            int n = 2 + rnd.nextInt(2);
            StringBuilder spans = new StringBuilder();
            for (int i = 0; i < n; i++) {
                spans.append(i == 0 ? "" : ", ").append(5.5 + rnd.nextInt(6) * 0.5);
            }
            boolean columns = rnd.nextBoolean();
            String support =
                    columns ? "{width: 700, below: {b: 700, h: 500, height: 4.0}}" : "{width: 300, kind: knife-edge}";
            Designed d = design(HEAD + """
                    lines:
                      - id: R%d
                        spans: [%s]
                        supports:
                          - %s
                        loads: {dead: %d, live: %d}
                        section: {width: 300, height: 600}
                    """.formatted(k, spans, support, 15 + rnd.nextInt(15), 8 + rnd.nextInt(10)));
            LineDetail det = LineDetail.of(d.result(), d.in().settings(), d.cost(), 12_000, Trail.off());
            assertTrue(
                    det.coverage().covered(),
                    "line " + k + " [" + spans + "] columns " + columns + ": worst Mu/φMn "
                            + det.coverage().worstRatio() + " at x = "
                            + det.coverage().worstX());
            assertTrue(det.checks().stream().allMatch(c -> c.pass()), "line " + k + ": every detailing check");
            assertTrue(det.runs().stream().anyMatch(r -> r.face() == Face.TOP));
        }
    }

    @Test
    void tooShortStockAndTooNarrowColumnAreDiagnosedNotPassed() throws IOException {
        // invented line ending in a 300 mm column: a No. 22 hook needs more (ldh of 25.4.3.1 with psi_r = 1.6,
        // no ties counted), and 1 m stock bars cannot hold two class B laps of No. 16 bars (25.5.2)
        Designed d = design(HEAD + """
                lines:
                  - id: N
                    spans: [7.0, 7.0]
                    supports:
                      - {width: 300, below: {b: 300, h: 300, height: 3.5}}
                    loads: {dead: 25, live: 12}
                    section: {width: 300, height: 600}
                """);
        LineDetail det = LineDetail.of(d.result(), d.in().settings(), d.cost(), 1000, Trail.off());
        assertTrue(det.checks().stream().anyMatch(c -> c.id().equals("stock_length") && !c.pass()), "stock too short");
        var hooks = det.checks().stream().filter(c -> c.id().equals("hook-fit")).toList();
        assertTrue(!hooks.isEmpty(), "hooks checked at the columns at both ends");
        for (var c : hooks) {
            if (!c.pass()) {
                assertTrue(c.note().contains("needs a support"), "says what would fit: " + c.note());
            }
        }
        assertTrue(!det.ok(), "a detail that fails is never reported as passing");
    }

    @Test
    void perSpanFormsWithAnOverhangAreCovered() throws IOException {
        // invented line, each span its own section: the two sides of a support choose their own top bars,
        // each group developed past its own face across the support; the parts' continuous bars lap over
        // the supports; an overhang, a wall and a knife edge
        Designed d = design(HEAD + """
                lines:
                  - id: PS
                    spans: [6.0, 9.0, 5.0]
                    overhangs: {left: 1.5}
                    supports:
                      - {width: 400, below: {b: 400, h: 400, height: 4.0}}
                      - {width: 400, below: {b: 400, h: 400, height: 4.0}}
                      - {width: 300, kind: knife-edge}
                      - {width: 300, kind: wall}
                    loads: {dead: 20, live: 12}
                    section: {width: 300, height: 600}
                    forms: per-span
                """);
        LineDetail det = LineDetail.of(d.result(), d.in().settings(), d.cost(), 12_000, Trail.off());
        assertTrue(
                det.coverage().covered(),
                "worst Mu/φMn " + det.coverage().worstRatio() + " at x = "
                        + det.coverage().worstX());
        assertTrue(det.checks().stream().allMatch(c -> c.pass()), "every detailing check");
    }
}
