package barfit.detailing;

import barfit.analysis.Line;
import barfit.analysis.LineResult;
import barfit.design.CostModel;
import barfit.design.line.LineSpans;
import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.input.Settings;
import barfit.section.CheckResult;
import barfit.section.Stirrups;
import barfit.section.anchorage.LapSplices;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * A line detailed for the fabricator: its bar runs (laps placed), the bending schedule, the stirrup zones
 * along it, the checks that placed the bars (each from the section model, with its clause), the capacity
 * of the bars as detailed against the envelope, and the masses per bar size.
 */
public record LineDetail(
        String id,
        Line line,
        LineResult analysis,
        List<BarRun> runs,
        List<Zone> zones,
        List<ScheduleRow> schedule,
        List<CheckResult> checks,
        List<LineDetailer.CutOff> cutOffs,
        DetailedCapacity.Coverage coverage,
        Map<String, Double> massBySize,
        double mainMass,
        double stirrupMass,
        double steelCost,
        double designSteelCost,
        double stockLength) {

    /** A stirrup zone along the line: from, to (x, mm), its stirrups and sets, and the part it belongs to. */
    public record Zone(String part, double from, double to, Stirrups stirrups, int sets) {}

    public boolean ok() {
        return checks.stream().allMatch(CheckResult::pass) && coverage.covered();
    }

    /** The same detail with other checks. */
    LineDetail withChecks(List<CheckResult> c) {
        return new LineDetail(
                id,
                line,
                analysis,
                runs,
                zones,
                schedule,
                c,
                cutOffs,
                coverage,
                massBySize,
                mainMass,
                stirrupMass,
                steelCost,
                designSteelCost,
                stockLength);
    }

    public double totalMass() {
        return mainMass + stirrupMass;
    }

    /**
     * The line detailed, or null where it has no analysis of its own or a part has no design.
     * {@code stock}: the stock bar length (mm); a bar longer is lapped.
     */
    public static LineDetail of(LineSpans.Result r, Settings settings, CostModel cost, double stock, Trail t) {
        LineDetailer.Placed placed = new LineDetailer(settings, t).place(r);
        if (placed == null) {
            return null;
        }
        return assemble(r, placed.line(), placed.runs(), placed.checks(), placed.cutOffs(), settings, cost, stock);
    }

    /**
     * The runs lapped from stock, cut and marked, with the stirrups per zone, the checks given, the
     * coverage of the envelope and the masses: a line detailed, or its bars as built.
     */
    static LineDetail assemble(
            LineSpans.Result r,
            Line line,
            List<BarRun> placedRuns,
            List<CheckResult> placedChecks,
            List<LineDetailer.CutOff> cutOffs,
            Settings settings,
            CostModel cost,
            double stock) {
        int n = line.spanCount();
        List<Double> midSpans = new ArrayList<>();
        List<Double> supports = new ArrayList<>();
        for (int j = 0; j <= n; j++) {
            supports.add(line.supportX(j));
            if (j < n) {
                midSpans.add((line.supportX(j) + line.supportX(j + 1)) / 2);
            }
        }
        List<BarRun> runs = new ArrayList<>();
        List<CheckResult> stockChecks = new ArrayList<>();
        for (BarRun run : placedRuns) {
            double ld = Anchorage.ldBeforeMinimum(run.bar(), run.face() == barfit.section.Face.TOP, settings);
            boolean top = run.face() == barfit.section.Face.TOP;
            try {
                runs.add(CutLengths.lapped(run, stock, top ? midSpans : supports, ld, settings.code()));
            } catch (IllegalArgumentException e) {
                // a stock bar too short for two laps: the run is left whole and the check says why
                runs.add(run);
                stockChecks.add(CheckResult.rule(
                        "stock_length",
                        "Stock bars long enough for their laps",
                        "25.5.2",
                        false,
                        barfit.section.trail.Q.span(stock),
                        barfit.section.trail.Q.span(run.length()),
                        "<",
                        e.getMessage() + ": give a longer stock_length"));
            }
        }
        List<ScheduleRow> rows = new ArrayList<>(CutLengths.rows(runs, settings.code(), settings.materials()));
        List<Zone> zones = new ArrayList<>();
        rows.addAll(stirrups(r, line, cost, zones, settings));
        Map<String, Double> bySize = new TreeMap<>();
        double main = 0;
        double stirrup = 0;
        for (ScheduleRow row : rows) {
            bySize.merge(row.bar().label(), row.mass(), Double::sum);
            if (row.shape() == BarShape.HOOP || row.shape() == BarShape.CROSSTIE) {
                stirrup += row.mass();
            } else {
                main += row.mass();
            }
        }
        double designSteel = 0;
        for (LineSpans.Part p : r.parts()) {
            var c = p.outcome().best().cost();
            designSteel += c.mainBars() + c.stirrups();
        }
        var coverage = DetailedCapacity.check(r, runs, settings);
        List<CheckResult> checks = new ArrayList<>(placedChecks);
        checks.addAll(stockChecks);
        return new LineDetail(
                r.line().id(),
                line,
                r.analysis(),
                runs,
                zones,
                rows,
                checks,
                cutOffs,
                coverage,
                new LinkedHashMap<>(bySize),
                main,
                stirrup,
                cost.rates().mainBarsPerKg() * main + cost.rates().stirrupsPerKg() * stirrup,
                designSteel,
                stock);
    }

    /** Hoops and crossties per zone of every part; the same bar and length share a mark. */
    private static List<ScheduleRow> stirrups(
            LineSpans.Result r, Line line, CostModel cost, List<Zone> zones, Settings settings) {
        Map<String, ScheduleRow> byKey = new LinkedHashMap<>();
        int k = 0;
        for (LineSpans.Part p : r.parts()) {
            SpanLayout l = p.outcome().best().layout();
            SpanProblem q = p.problem();
            double origin = partOrigin(line, p.segment());
            List<SpanProblem.Zone> zs = q.zones();
            for (int i = 0; i < zs.size(); i++) {
                Stirrups st = l.zoneStirrups().get(i);
                int sets = SpanLayout.stirrupSets(zs.get(i).length(), st.spacing());
                // a left overhang's zones run from its support outward, to the left
                double a = p.segment() == 0
                        ? -line.supports().get(0).width() / 2 - zs.get(i).to()
                        : origin + zs.get(i).from();
                double b = p.segment() == 0
                        ? -line.supports().get(0).width() / 2 - zs.get(i).from()
                        : origin + zs.get(i).to();
                zones.add(new Zone(p.name(), a, b, st, sets));
                double hoop = CutLengths.roundUp(cost.hoopLength(l.width(), l.height(), st.bar()), settings.code());
                double cover = cost.cover();
                String key = "H|" + st.bar().designation() + "|" + hoop;
                ScheduleRow had = byKey.get(key);
                if (had != null) {
                    byKey.put(key, CutLengths.withCount(had, had.count() + sets, st.bar()));
                } else {
                    byKey.put(
                            key,
                            new ScheduleRow(
                                    "S" + ++k,
                                    BarShape.HOOP,
                                    st.bar(),
                                    sets,
                                    hoop,
                                    CutLengths.mass(st.bar(), sets, hoop),
                                    CutLengths.roundUp(l.width() - 2 * cover, settings.code()),
                                    CutLengths.roundUp(l.height() - 2 * cover, settings.code()),
                                    "stirrups"));
                }
                if (st.legs() > 2) {
                    int ties = sets * (st.legs() - 2);
                    double tie = CutLengths.roundUp(cost.crosstieLength(l.height(), st.bar()), settings.code());
                    String tk = "C|" + st.bar().designation() + "|" + tie;
                    ScheduleRow t = byKey.get(tk);
                    if (t != null) {
                        byKey.put(tk, CutLengths.withCount(t, t.count() + ties, st.bar()));
                    } else {
                        byKey.put(
                                tk,
                                new ScheduleRow(
                                        "S" + ++k,
                                        BarShape.CROSSTIE,
                                        st.bar(),
                                        ties,
                                        tie,
                                        CutLengths.mass(st.bar(), ties, tie),
                                        CutLengths.roundUp(l.height() - 2 * cover, settings.code()),
                                        0,
                                        "crossties"));
                    }
                }
            }
        }
        return new ArrayList<>(byKey.values());
    }

    /** x of a part's local origin (its left face; an overhang's free end or its support's face). */
    static double partOrigin(Line line, int seg) {
        int n = line.spanCount();
        if (seg == 0) {
            return -line.overhangLeft();
        }
        if (seg == n + 1) {
            return line.supportX(n) + line.supports().get(n).width() / 2;
        }
        return line.supportX(seg - 1) + line.supports().get(seg - 1).width() / 2;
    }

    /** The default stock length of the code's units (12 m, 40 ft: common practice, no source). */
    public static double defaultStock(Settings settings) {
        return LapSplices.defaultStockLength(settings.code());
    }
}
