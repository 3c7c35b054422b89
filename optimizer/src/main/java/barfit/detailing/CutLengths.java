package barfit.detailing;

import barfit.catalogs.BarSize;
import barfit.section.CodeEquations;
import barfit.section.Face;
import barfit.section.Materials;
import barfit.section.anchorage.LapSplices;
import barfit.section.anchorage.StandardHooks;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Runs of bars cut from stock: laps where a run is longer than a stock bar (class B, 25.5.2, the top
 * bars' near mid-span and the bottom bars' near the supports where a preferred point allows it, else as
 * far along as the stock reaches; a mechanical splice for bars larger than No. 36 / #11, 25.5.1.1), then
 * each piece's cut length: its straight length plus its hooks' developed length (Table 25.3.1), rounded
 * up to 10 mm or 1 in (common practice, no source), and the pieces of the same size, shape and length under one
 * mark.
 */
public final class CutLengths {
    private CutLengths() {}

    /**
     * The run with its laps. {@code preferred}: x where a lap's centre is best put (mid-spans for top bars,
     * supports for bottom bars); {@code ld}: the bars' ld for the lap length.
     */
    public static BarRun lapped(BarRun run, double stock, List<Double> preferred, double ld, CodeEquations code) {
        if (run.length() <= stock + 1e-6) {
            return run;
        }
        LapSplices.Lap lap = LapSplices.classB(run.bar(), ld, code, Trail.off());
        double len = lap.length();
        if (!(stock > 2 * len)) {
            throw new IllegalArgumentException("a stock length of " + Math.round(stock) + " mm is too short for a "
                    + Math.round(len) + " mm lap of " + run.bar().label() + " bars");
        }
        String kind = lap.lapped() ? "class B lap" : "mechanical splice";
        List<BarRun.Lap> laps = new ArrayList<>();
        double from = run.start();
        while (run.end() - from > stock + 1e-6) {
            // the farthest preferred centre this piece reaches, else the piece's full stock length
            double best = Double.NaN;
            for (double c : preferred) {
                double lapEnd = c + len / 2;
                if (c - len / 2 > from + len && lapEnd <= from + stock && lapEnd < run.end() - len) {
                    best = Double.isNaN(best) ? c : Math.max(best, c);
                }
            }
            double c = Double.isNaN(best) ? from + stock - len / 2 : best;
            laps.add(new BarRun.Lap(c - len / 2, c + len / 2, kind));
            from = c - len / 2;
        }
        return run.withLaps(laps);
    }

    /** A piece of a run as cut: from, to (x), hooked at either end. */
    record Piece(double from, double to, boolean hookStart, boolean hookEnd) {}

    static List<Piece> pieces(BarRun run) {
        List<Piece> out = new ArrayList<>();
        double from = run.start();
        boolean hook = run.hookStart();
        for (BarRun.Lap lap : run.laps()) {
            out.add(new Piece(from, lap.to(), hook, false));
            from = lap.from();
            hook = false;
        }
        out.add(new Piece(from, run.end(), hook, run.hookEnd()));
        return out;
    }

    /** One bar's cut length (mm): the piece's length, each hooked end its developed hook less its reach. */
    static double cutLength(Piece p, BarSize bar, StandardHooks.Bend bend, CodeEquations code) {
        double length = p.to() - p.from();
        StandardHooks.Hook hook = StandardHooks.of(bar, bend, code, Trail.off());
        int hooks = (p.hookStart() ? 1 : 0) + (p.hookEnd() ? 1 : 0);
        return roundUp(length + hooks * (hook.developed() - hook.reach()), code);
    }

    /** Up to the next 10 mm, or the next inch in inch-pound work (common practice, no source). */
    static double roundUp(double mm, CodeEquations code) {
        double step = code.inchPound() ? CodeEquations.MM_PER_IN : 10;
        return Math.ceil(mm / step - 1e-9) * step;
    }

    /** The schedule's rows for the longitudinal runs, marks B (bottom), T (top) and K (skin) in order. */
    static List<ScheduleRow> rows(List<BarRun> runs, CodeEquations code, Materials m) {
        Map<String, ScheduleRow> byKey = new LinkedHashMap<>();
        Map<Character, Integer> next = new LinkedHashMap<>();
        for (BarRun run : runs) {
            char prefix = run.what().startsWith("skin") ? 'K' : run.face() == Face.TOP ? 'T' : 'B';
            StandardHooks.Hook hook = StandardHooks.of(run.bar(), run.bend(), code, Trail.off());
            for (Piece p : pieces(run)) {
                double cut = cutLength(p, run.bar(), run.bend(), code);
                BarShape shape = BarShape.of(p.hookStart(), p.hookEnd());
                String key = prefix + "|" + run.bar().designation() + "|" + shape + "|"
                        + String.format(Locale.ROOT, "%.0f", cut) + "|" + run.what();
                ScheduleRow had = byKey.get(key);
                if (had != null) {
                    byKey.put(key, withCount(had, had.count() + run.count(), run.bar()));
                    continue;
                }
                int k = next.merge(prefix, 1, Integer::sum);
                double straight = roundUp(p.to() - p.from(), code); // out to out, a hook's outside included
                double leg = shape == BarShape.STRAIGHT ? 0 : roundUp(hook.height(), code);
                byKey.put(
                        key,
                        new ScheduleRow(
                                String.valueOf(prefix) + k,
                                shape,
                                run.bar(),
                                run.count(),
                                cut,
                                mass(run.bar(), run.count(), cut),
                                straight,
                                leg,
                                run.what()));
            }
        }
        return new ArrayList<>(byKey.values());
    }

    static ScheduleRow withCount(ScheduleRow r, int count, BarSize bar) {
        return new ScheduleRow(
                r.mark(), r.shape(), r.bar(), count, r.length(), mass(bar, count, r.length()), r.a(), r.b(), r.where());
    }

    /** Mass of {@code count} bars {@code length} mm long, kg. */
    static double mass(BarSize bar, int count, double length) {
        return count * length / 1000.0 * bar.massPerMetre();
    }
}
