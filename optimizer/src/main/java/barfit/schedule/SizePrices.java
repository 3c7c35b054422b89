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
    /** Each beam's pricing; null where the beam has no design on its own (it is left out). */
    private final List<PairTables> generators = new ArrayList<>();
    /** {@code lower.get(i)[s][top][bottom]}: a lower bound on beam i in size s; {@code [s]} null where it has no frame. */
    private final List<double[][][]> lower;
    /** {@code exact.get(i)[s]}: beam i priced exactly in size s, once asked for. */
    private final List<PairTable[]> exact = new ArrayList<>();

    private int pricedPairs;

    /** Bounds every beam with a design of its own ({@code own}) in every size, beam by beam in parallel. */
    SizePrices(ScheduleInput in, List<SpanDesigner.Outcome> own, CostModel cost, Parallel pool) {
        this.cost = cost;
        this.beams = in.beams();
        this.pool = pool;
        this.sizes = sizesOf(in);
        for (int i = 0; i < beams.size(); i++) {
            generators.add(own.get(i).feasible() ? new PairTables(beams.get(i).problem(), cost) : null);
            exact.add(new PairTable[sizes.size()]);
        }
        this.lower = pool.map(
                beams.size(),
                Progress.Phase.of(Progress.Step.BOUNDING_SIZES),
                beam -> lowerBoundsOf(beam, own.get(beam)));
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

    /** The (beam, size) pairs priced exactly so far. */
    int pricedPairs() {
        return pricedPairs;
    }

    boolean isPriced(int beam, int size) {
        return exact.get(beam)[size] != null;
    }

    /** Beam {@code beam} in size {@code size} with bar sizes {@code bars}, priced exactly (it must be). */
    double exactPrice(int beam, int size, boolean[] bars) {
        return exact.get(beam)[size].best(bars);
    }

    /** Beam {@code beam} in size {@code size} with bar sizes {@code bars}: exact where priced, else the lower bound. */
    double price(int beam, int size, boolean[] bars) {
        PairTable table = exact.get(beam)[size];
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

    /** Prices exactly the (beam, size) pairs asked for that are not priced yet, beam by beam in parallel. */
    void priceExactly(List<BeamSize> pairs) {
        Map<Integer, TreeSet<Integer>> sizesByBeam = new TreeMap<>();
        for (BeamSize pair : pairs) {
            if (exact.get(pair.beam())[pair.size()] == null && lower.get(pair.beam())[pair.size()] != null) {
                sizesByBeam.computeIfAbsent(pair.beam(), x -> new TreeSet<>()).add(pair.size());
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
