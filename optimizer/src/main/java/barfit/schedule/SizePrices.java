package barfit.schedule;

import barfit.design.CostModel;
import barfit.design.span.PairTable;
import barfit.design.span.PairTables;
import barfit.design.span.SpanDesigner;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * What each beam costs in each section size the schedule may use, for each pair of bar sizes (top,
 * bottom). At the start only a cheap lower bound per pair (the beam generator's bar-free bound, never
 * below the beam's own optimum); the exact price (the generator's pair table, which equals designing the
 * beam restricted to that size and those bar sizes) only once the search asks for it. The search is
 * exact only if no bound exceeds its price, so each exact price is checked against its bounds: a breach
 * stops the run as a bug, never as a result.
 */
final class SizePrices {
    /** A section size b x h (mm). */
    record Size(double width, double height) {}

    /** The model the schedule is priced with (cost, or carbon under that objective). */
    private final CostModel cost;

    private final List<ScheduleBeam> beams;
    private final Parallel pool;
    /** Every section size any beam may take, ordered by width then height. */
    private final List<Size> sizes;
    /**
     * {@code twin[i]}: the first beam the same as beam i but for its mark (i itself when none comes before it).
     * Beams the same price the same in every size, so each is bounded and priced once, for all of its twins.
     */
    private final int[] twin;
    /** Each beam's pricing, kept by the first of its twins; null where the beam has no design on its own. */
    private final List<PairTables> generators = new ArrayList<>();
    /** {@code lower.get(i)[s][top][bottom]}: a lower bound on beam i in size s; {@code [s]} null where it has no frame. */
    private final List<double[][][]> lower;
    /** {@code exact.get(i)[s]}: beam i priced exactly in size s, once asked for (held by the first of its twins). */
    private final List<PairTable[]> exact = new ArrayList<>();

    private int pricedPairs;

    /** Bounds every beam with a design of its own ({@code own}) in every size, beam by beam in parallel. */
    SizePrices(ScheduleInput in, List<SpanDesigner.Outcome> own, CostModel cost, Parallel pool) {
        this.cost = cost;
        this.beams = in.beams();
        this.pool = pool;
        this.sizes = sizesOf(in);
        this.twin = Repeats.firstOf(beams.stream().map(ScheduleBeam::problem).toList());
        List<Integer> firsts = new ArrayList<>();
        for (int i = 0; i < beams.size(); i++) {
            if (twin[i] == i) {
                firsts.add(i);
            }
            generators.add(
                    twin[i] == i && own.get(i).feasible()
                            ? new PairTables(beams.get(i).problem(), cost)
                            : null);
            exact.add(twin[i] == i ? new PairTable[sizes.size()] : null);
        }
        List<double[][][]> bounds = pool.map(
                firsts.size(),
                Progress.Phase.of(Progress.Step.BOUNDING_SIZES),
                j -> lowerBoundsOf(firsts.get(j), own.get(firsts.get(j))));
        double[][][][] byBeam = new double[beams.size()][][][];
        for (int j = 0; j < firsts.size(); j++) {
            byBeam[firsts.get(j)] = bounds.get(j);
        }
        List<double[][][]> all = new ArrayList<>();
        for (int i = 0; i < beams.size(); i++) {
            all.add(byBeam[twin[i]]);
        }
        this.lower = all;
    }

    /** The exact prices of a beam, held by the first of its twins. */
    private PairTable[] exactOf(int beam) {
        return exact.get(twin[beam]);
    }

    /** The search's widths by its depths, and each width a beam fixes outside them by the depths too. */
    private static List<Size> sizesOf(ScheduleInput in) {
        List<Size> out = new ArrayList<>();
        for (double width : in.space().widths()) {
            for (double height : in.space().depths()) {
                out.add(new Size(width, height));
            }
        }
        for (ScheduleBeam beam : in.beams()) {
            Double fixed = beam.problem().fixedWidth();
            if (fixed != null && out.stream().noneMatch(size -> size.width() == fixed)) {
                for (double height : in.space().depths()) {
                    out.add(new Size(fixed, height));
                }
            }
        }
        out.sort(Comparator.comparingDouble(Size::width).thenComparingDouble(Size::height));
        return out;
    }

    /**
     * Lower bounds for one beam in every size: the generator's bar-free bound per bar pair, and never
     * below the beam's own optimum (no size or bar set can do better than the best of all).
     */
    private double[][][] lowerBoundsOf(int beam, SpanDesigner.Outcome own) {
        double[][][] out = new double[sizes.size()][][];
        PairTables generator = generators.get(beam);
        if (generator == null) {
            return out;
        }
        double floor = own.best().searched(cost).total();
        for (int s = 0; s < sizes.size(); s++) {
            double[][] bound =
                    generator.lowerBounds(sizes.get(s).width(), sizes.get(s).height());
            if (bound != null) {
                for (double[] row : bound) {
                    for (int j = 0; j < row.length; j++) {
                        row[j] = Math.max(row[j], floor);
                    }
                }
            }
            out[s] = bound;
        }
        return out;
    }

    List<Size> sizes() {
        return sizes;
    }

    int sizeCount() {
        return sizes.size();
    }

    /** The (beam, size) pairs priced exactly so far, a beam with twins once. */
    int pricedPairs() {
        return pricedPairs;
    }

    boolean isPriced(int beam, int size) {
        return exactOf(beam)[size] != null;
    }

    /** Beam {@code beam} in size {@code size} with bar sizes {@code bars}, priced exactly (it must be). */
    double exactPrice(int beam, int size, boolean[] bars) {
        return exactOf(beam)[size].best(bars);
    }

    /** Beam {@code beam} in size {@code size} with bar sizes {@code bars}: exact where priced, else the lower bound. */
    double price(int beam, int size, boolean[] bars) {
        PairTable table = exactOf(beam)[size];
        if (table != null) {
            return table.best(bars);
        }
        double[][] bound = lower.get(beam)[size];
        if (bound == null) {
            return Double.POSITIVE_INFINITY;
        }
        double best = Double.POSITIVE_INFINITY;
        for (int top = 0; top < bound.length; top++) {
            for (int bottom = 0; bottom < bound.length; bottom++) {
                if (bars[top] && bars[bottom]) {
                    best = Math.min(best, bound[top][bottom]);
                }
            }
        }
        return best;
    }

    /**
     * Prices exactly the (beam, size) pairs asked for that are not priced yet, beam by beam in parallel; a beam
     * with twins is priced once for them all (and counted once in {@link #pricedPairs}).
     */
    void priceExactly(List<BeamSize> pairs) {
        Map<Integer, TreeSet<Integer>> sizesByBeam = new TreeMap<>();
        for (BeamSize pair : pairs) {
            int first = twin[pair.beam()];
            if (exact.get(first)[pair.size()] == null && lower.get(first)[pair.size()] != null) {
                sizesByBeam.computeIfAbsent(first, x -> new TreeSet<>()).add(pair.size());
            }
        }
        List<Integer> beamsToPrice = new ArrayList<>(sizesByBeam.keySet());
        List<PairTable[]> tables = pool.map(
                beamsToPrice.size(),
                Progress.Phase.of(Progress.Step.PRICING_SIZES),
                j -> {
                    int beam = beamsToPrice.get(j);
                    PairTable[] row = new PairTable[sizes.size()];
                    for (int s : sizesByBeam.get(beam)) {
                        row[s] = generators
                                .get(beam)
                                .exact(sizes.get(s).width(), sizes.get(s).height());
                    }
                    return row;
                },
                Progress.NONE);
        for (int j = 0; j < beamsToPrice.size(); j++) {
            int beam = beamsToPrice.get(j);
            PairTable[] row = tables.get(j);
            for (int s = 0; s < row.length; s++) {
                if (row[s] != null) {
                    checkBound(beam, s, row[s]);
                    exact.get(beam)[s] = row[s];
                    pricedPairs++;
                }
            }
        }
    }

    /** The search is exact only if no bound exceeds its price: a breach is a bug, never a result. */
    private void checkBound(int beam, int size, PairTable table) {
        double[][] bound = lower.get(beam)[size];
        for (int top = 0; top < bound.length; top++) {
            for (int bottom = 0; bottom < bound.length; bottom++) {
                if (table.cost()[top][bottom] < bound[top][bottom] - 1e-6) {
                    throw new IllegalStateException("beam " + beams.get(beam).id() + " in "
                            + sizes.get(size).width()
                            + " x " + sizes.get(size).height() + ": bar pair " + top + "/" + bottom + " priced at "
                            + table.cost()[top][bottom] + " below its bound " + bound[top][bottom]
                            + "; this is a bug in the bounds");
                }
            }
        }
    }

    /** A beam (its index in the schedule) in a section size (its index in {@link #sizes()}). */
    record BeamSize(int beam, int size) {}
}
