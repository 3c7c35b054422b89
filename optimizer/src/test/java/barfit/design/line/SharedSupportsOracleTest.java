package barfit.design.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.CostModel;
import barfit.design.SolverOptions;
import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanExhaustive;
import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.input.DesignInput;
import barfit.input.DesignInputReader;
import barfit.input.LineInput;
import barfit.input.LinesReader;
import barfit.section.SectionShape;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A line of one section, its parts sharing the top bars over each support, against plain enumeration:
 * every passing layout of every part at every section of a small space (the span oracle, every layout
 * through the section model), combined by brute force over every choice of top bars per support, one top
 * bar size and one count of continuous bars along the line, at most the line's bar sizes. The line's
 * design must cost exactly the cheapest such combination.
 *
 * <p>Invented lines (two or three spans, sometimes an overhang, walls, columns and knife edges) over a
 * reduced space; {@code -Dline.instances=N -Dline.seed=S} runs more.
 */
class SharedSupportsOracleTest {
    @TempDir
    Path dir;

    /** One part's cheapest passing layout for a choice of bars. */
    private record Key(String top, int continuous, String bottom, List<Integer> left, List<Integer> right) {}

    @Test
    void sharedLineIsTheCheapestByPlainEnumeration() throws IOException {
        int instances = Integer.getInteger("line.instances", 14);
        Random rnd = new Random(Long.getLong("line.seed", 1407));
        int compared = 0;
        int infeasible = 0;
        for (int i = 0; i < instances; i++) {
            int spans = 2 + rnd.nextInt(2);
            StringBuilder lengths = new StringBuilder();
            for (int s = 0; s < spans; s++) {
                lengths.append(s == 0 ? "" : ", ").append(4.5 + 0.5 * rnd.nextInt(5));
            }
            String[] kinds = {
                "{width: 300, kind: wall}",
                "{width: 350, below: {b: 350, h: 350, height: 3.5}}",
                "{width: 300, kind: knife-edge}"
            };
            StringBuilder supports = new StringBuilder();
            for (int s = 0; s <= spans; s++) {
                supports.append("      - ").append(kinds[rnd.nextInt(3)]).append('\n');
            }
            boolean overhang = rnd.nextInt(3) == 0;
            int maxSizes = 1 + rnd.nextInt(2);
            String yaml = """
                    units: SI
                    concrete: {fc: 28}
                    steel: {fy: 420}
                    search:
                      widths: [250, 300]
                      depth: {min: 400, max: 550, step: 50}
                      bar_sizes: ["16", "19", "22"]
                      max_layers: 1
                      max_bar_sizes_per_beam: %d
                      stirrups: {sizes: ["10"], legs: [2], spacing: {min: 100, max: 300, step: 50}}
                    lines:
                      - id: R
                        spans: [%s]
                        overhangs: {right: %s}
                        supports:
                    %s    loads: {dead: %d, live: %d}
                        section: {width: 300, height: 500}
                    """.formatted(
                    maxSizes, lengths, overhang ? "1.2" : "0", supports, 12 + rnd.nextInt(10), 6 + rnd.nextInt(10));
            LineSpans.Result line = design(yaml);
            long oracle = Long.MAX_VALUE;
            for (int b : new int[] {250, 300}) {
                for (int h = 400; h <= 550; h += 50) {
                    // the parts' problems with the line at this section (its own weight and stiffness)
                    var problems = lines.problemsAt(
                            input, new SectionShape(b, h, input.section().flange()));
                    oracle = Math.min(
                            oracle, cheapestCombination(problems, input.spans().size(), maxSizes));
                }
            }
            String where = "line " + i + ": " + yaml;
            if (oracle == Long.MAX_VALUE) {
                assertTrue(
                        line.oneSection() == null || line.oneSection().fellBack(),
                        "the oracle finds no one-section line — " + where);
                infeasible++;
                continue;
            }
            assertTrue(line.oneSection() != null && !line.oneSection().fellBack(), "one section — " + where);
            long total = 0;
            for (LineSpans.Part p : line.parts()) {
                total += CostModel.units(p.outcome().best().cost().total());
            }
            assertEquals(oracle, total, "line cost — " + where);
            for (var sb : line.supports()) {
                if (sb != null && sb.left() != null && sb.right() != null) {
                    assertTrue(sb.shared(), "one group over support " + sb.index() + " — " + where);
                }
            }
            compared++;
        }
        System.out.println("line oracle: " + compared + " lines compared, " + infeasible + " with no design, seed "
                + Long.getLong("line.seed", 1407));
        assertTrue(compared >= instances / 2, "enough lines with a design: " + compared + ", none " + infeasible);
    }

    /**
     * By brute force over the parts' cheapest layouts per choice of bars: the same top size and (along the
     * spans) continuous count, the same bars over each support from both sides, at most {@code maxSizes}
     * bar sizes along the line. Each part's table comes from plain enumeration of its space.
     */
    private long cheapestCombination(List<SpanProblem> problems, int n, int maxSizes) {
        return cheapestCombination(problems, n, maxSizes, (p, l) -> true);
    }

    private long cheapestCombination(
            List<SpanProblem> problems,
            int n,
            int maxSizes,
            java.util.function.BiPredicate<SpanProblem, SpanLayout> allowed) {
        SpanExhaustive oracle = new SpanExhaustive(costModel);
        List<SpanProblem> parts = new ArrayList<>(problems);
        parts.sort(java.util.Comparator.comparingInt(p -> LineSpans.segmentOf(p, n)));
        List<Integer> segments = new ArrayList<>();
        List<Map<Key, Long>> tables = new ArrayList<>();
        for (SpanProblem p : parts) {
            Map<Key, Long> t = new HashMap<>();
            oracle.cheapestBy(p, SharedSupportsOracleTest::key).forEach((k, r) -> {
                if (allowed.test(p, r.best())) {
                    t.put(k, r.units());
                }
            });
            if (t.isEmpty()) {
                return Long.MAX_VALUE; // this part has no passing layout at this section
            }
            tables.add(t);
            segments.add(LineSpans.segmentOf(p, n));
        }
        long[] best = {Long.MAX_VALUE};
        choose(segments, tables, 0, new ArrayList<>(), n, maxSizes, best);
        return best[0];
    }

    @Test
    void redistributionChosenWithTheBarsIsTheCheapestByPlainEnumeration() throws IOException {
        // two-span invented lines asking up to 10 %: the oracle analyses the line at each section for each
        // percentage at the middle support (0, 5, 10), keeps the layouts whose support sections allow it
        // (6.6.5: εt >= 0.0075 and at most 1000 εt percent, from the section model's flexure of the section
        // as built) and combines them as above; the line's design must cost the cheapest of all
        int instances = Integer.getInteger("line.redistribution.instances", 8);
        Random rnd = new Random(Long.getLong("line.seed", 1407) + 1);
        int compared = 0;
        int redistributed = 0;
        for (int i = 0; i < instances; i++) {
            double a = 5.0 + 0.5 * rnd.nextInt(5);
            double b = 5.0 + 0.5 * rnd.nextInt(5);
            String yaml = """
                    units: SI
                    concrete: {fc: 28}
                    steel: {fy: 420}
                    search:
                      widths: [300]
                      depth: {min: 400, max: 550, step: 50}
                      bar_sizes: ["16", "19", "22"]
                      max_layers: 1
                      stirrups: {sizes: ["10"], legs: [2], spacing: {min: 100, max: 300, step: 50}}
                    lines:
                      - id: Q
                        spans: [%s, %s]
                        supports: [{width: 300, kind: wall}]
                        loads: {dead: %d, live: %d}
                        section: {width: 300, height: 450}
                        redistribution: [0, 10, 0]
                    """.formatted(a, b, 8 + rnd.nextInt(16), 4 + rnd.nextInt(10));
            LineSpans.Result line = design(yaml);
            long oracle = Long.MAX_VALUE;
            for (int h = 400; h <= 550; h += 50) {
                SectionShape shape = new SectionShape(300, h, null);
                for (double r : new double[] {0, 5, 10}) {
                    var problems = lines.problemsAt(input, shape, List.of(0.0, r, 0.0));
                    oracle = Math.min(oracle, cheapestCombination(problems, 2, 2, (p, l) -> supportAllows(p, l, r)));
                }
            }
            String where = "line " + i + ": " + yaml;
            if (oracle == Long.MAX_VALUE) {
                assertTrue(line.oneSection() == null || line.oneSection().fellBack(), "no line — " + where);
                continue;
            }
            long total = 0;
            for (LineSpans.Part p : line.parts()) {
                total += CostModel.units(p.outcome().best().cost().total());
            }
            assertEquals(oracle, total, "line cost — " + where);
            if (line.redistribution().get(1) > 0) {
                redistributed++;
                assertTrue(line.withoutRedistribution() > sum(line), "it pays — " + where);
            }
            compared++;
        }
        System.out.println("redistribution oracle: " + compared + " lines compared, " + redistributed
                + " with some redistribution chosen");
        assertTrue(compared >= instances / 2, "enough lines with a design: " + compared);
    }

    private static double sum(LineSpans.Result r) {
        double t = 0;
        for (LineSpans.Part p : r.parts()) {
            t += p.outcome().best().cost().total();
        }
        return t;
    }

    /** Whether the part's support sections beside the middle support allow {@code percent} there (6.6.5). */
    private static boolean supportAllows(SpanProblem p, SpanLayout l, double percent) {
        if (percent == 0) {
            return true;
        }
        // the middle support is span 1's right end and span 2's left end
        SpanProblem.Place side = p.id().endsWith("/span 1") ? SpanProblem.Place.RIGHT : SpanProblem.Place.LEFT;
        if (side == SpanProblem.Place.RIGHT ? !p.rightSupport() : !p.leftSupport()) {
            return true;
        }
        double epsT = barfit.section.Flexure.analyse(
                        l.section(p, side, l.zoneStirrups().get(0)), SpanLayout.bending(p, side))
                .epsT();
        // 6.6.5.1 and 6.6.5.3, ACI 318-19: at least 0.0075, and at most 1000 εt percent
        return epsT >= 0.0075 && percent <= 1000 * epsT + 1e-9;
    }

    private static Key key(SpanLayout l) {
        return new Key(l.top().designation(), l.topContinuous(), l.bottom().designation(), l.topLeft(), l.topRight());
    }

    private static void choose(
            List<Integer> parts,
            List<Map<Key, Long>> tables,
            int i,
            List<Key> chosen,
            int n,
            int maxSizes,
            long[] best) {
        if (i == parts.size()) {
            long sum = 0;
            for (int k = 0; k < chosen.size(); k++) {
                sum += tables.get(k).get(chosen.get(k));
            }
            best[0] = Math.min(best[0], sum);
            return;
        }
        for (Key k : tables.get(i).keySet()) {
            if (compatible(parts, chosen, i, k, n, maxSizes)) {
                chosen.add(k);
                choose(parts, tables, i + 1, chosen, n, maxSizes, best);
                chosen.remove(chosen.size() - 1);
            }
        }
    }

    /** Whether part {@code i} with bars {@code k} fits the parts chosen before it. */
    private static boolean compatible(List<Integer> parts, List<Key> chosen, int i, Key k, int n, int maxSizes) {
        java.util.Set<String> sizes = new java.util.HashSet<>();
        sizes.add(k.top());
        sizes.add(k.bottom());
        int seg = parts.get(i);
        for (int j = 0; j < chosen.size(); j++) {
            Key o = chosen.get(j);
            int oseg = parts.get(j);
            sizes.add(o.top());
            sizes.add(o.bottom());
            if (!o.top().equals(k.top())) {
                return false; // one top bar size along the line
            }
            boolean bothSpans = seg >= 1 && seg <= n && oseg >= 1 && oseg <= n;
            if (bothSpans && o.continuous() != k.continuous()) {
                return false; // the hangers run the whole line
            }
            // the support between two neighbours: the same bars from both sides, where both have bars there
            if (oseg == seg - 1 && seg <= n && oseg >= 1) {
                if (o.right() != null && k.left() != null && !o.right().equals(k.left())) {
                    return false;
                }
            }
            if (seg == n + 1 && oseg == n) {
                // a right overhang's root (its left) is the last support, the last span's right end
                if (o.right() != null && k.left() != null && !o.right().equals(k.left())) {
                    return false;
                }
            }
        }
        return sizes.size() <= maxSizes;
    }

    private CostModel costModel;
    private LineInput input;
    private LineSpans lines;

    private LineSpans.Result design(String yaml) throws IOException {
        Path f = dir.resolve("l.yaml");
        Files.writeString(f, yaml);
        DesignInput in = DesignInputReader.read(f, false);
        input = LinesReader.read(DesignInputReader.document(f), in.settings()).get(0);
        costModel = new CostModel(
                in.rates(), in.settings().detailing().cover(), in.settings().code());
        SpanDesigner designer = new SpanDesigner(costModel, new SolverOptions(30, 1, 1));
        lines = new LineSpans(in.settings(), in.space(), designer, in.maxBarSizesPerBeam(), in.barsPerTwoLegs());
        return lines.design(input, 0);
    }
}
