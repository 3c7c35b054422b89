package barfit.input;

import barfit.catalogs.BarCatalog;
import barfit.catalogs.BarSize;
import barfit.catalogs.Echo;
import barfit.catalogs.InputError;
import barfit.catalogs.yaml.YFields;
import barfit.catalogs.yaml.YList;
import barfit.catalogs.yaml.YNode;
import barfit.catalogs.yaml.YScalar;
import barfit.design.CostRates;
import barfit.design.SearchSpace;
import barfit.section.MaterialLimits;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.TreeSet;

/** Reads {@code search:} and {@code costs:}, with defaults for each unit system and catalog. */
public final class SearchReader {
    private SearchReader() {}

    /** Default search space (stated in the README). */
    static SearchSpace defaults(Settings s) {
        UnitSystem u = s.units();
        boolean us = u == UnitSystem.US;
        List<Double> widths = us ? inches(10, 12, 14, 16) : List.of(250.0, 300.0, 350.0, 400.0);
        List<Double> depths = us ? range(16 * 25.4, 32 * 25.4, 25.4) : range(400, 800, 25);
        List<BarSize> bars = defaultBars(s.catalog());
        List<Integer> legs = List.of(2, 4);
        List<Double> spacings = us ? range(3 * 25.4, 24 * 25.4, 25.4) : range(75, 600, 25);
        return new SearchSpace(widths, depths, bars, bars, 2, List.of(s.stirrupBar()), legs, spacings);
    }

    private static List<Double> inches(double... v) {
        List<Double> out = new ArrayList<>();
        for (double x : v) {
            out.add(x * 25.4);
        }
        return out;
    }

    static List<Double> range(double min, double max, double step) {
        List<Double> out = new ArrayList<>();
        int n = (int) Math.floor((max - min) / step + 1e-9);
        for (int i = 0; i <= n; i++) {
            out.add(Math.round((min + i * step) * 1e6) / 1e6);
        }
        return out;
    }

    private static List<BarSize> defaultBars(BarCatalog c) {
        List<String> names = switch (c.id()) {
            case "astm-a615m" -> List.of("16", "19", "22", "25", "29", "32", "36");
            case "astm-a615" -> List.of("5", "6", "7", "8", "9", "10", "11");
            case "metric-mm" -> List.of("12", "16", "20", "25", "28", "32");
            default -> List.of();
        };
        if (!names.isEmpty()) {
            return names.stream().map(n -> c.find(n).orElseThrow()).toList();
        }
        return c.bars().stream()
                .filter(b -> b.diameter() >= 12 && b.diameter() <= 40)
                .toList();
    }

    public static SearchSpace read(YFields doc, Settings s) {
        SearchSpace d = defaults(s);
        if (!doc.has("search")) {
            return d;
        }
        UnitSystem u = s.units();
        String len = u.unit(Dim.LENGTH);
        YFields f = doc.map("search", "the search space")
                .allowOnly(
                        "widths",
                        "depth",
                        "bar_sizes",
                        "compression_sizes",
                        "max_layers",
                        "stirrups",
                        "max_bar_sizes_per_beam",
                        "layer_gap"); // layer_gap: SettingsReader
        List<Double> widths = d.widths();
        if (f.has("widths")) {
            widths = sortedLengths(f, "widths", "web widths, " + len, u, InputLimits.WEB_WIDTH);
        }
        List<Double> depths = d.depths();
        if (f.has("depth")) {
            YFields r = f.map("depth", "the depth range {min, max, step}").allowOnly("min", "max", "step");
            depths = lengthRange(r, u, "total heights, " + len, 2000, InputLimits.HEIGHT);
        }
        List<BarSize> bars = f.has("bar_sizes") ? barList(f, "bar_sizes", s.catalog()) : d.barSizes();
        List<BarSize> comp = f.has("compression_sizes")
                ? barList(f, "compression_sizes", s.catalog())
                : (f.has("bar_sizes") ? bars : d.compressionSizes());
        int layers = d.maxLayers();
        if (f.has("max_layers")) {
            layers = f.positiveInt("max_layers", "layers of tension bars, 1 to 4");
            if (layers > 4) {
                throw f.error("max_layers", "expected 1 to 4 layers of tension bars, got " + layers);
            }
        }
        List<BarSize> stirrupSizes = d.stirrupSizes();
        List<Integer> legs = d.stirrupLegs();
        List<Double> spacings = d.stirrupSpacings();
        if (f.has("stirrups")) {
            YFields st = f.map("stirrups", "stirrup options {sizes, legs, spacing}")
                    .allowOnly("sizes", "legs", "spacing", "bars_per_two_legs");
            if (st.has("sizes")) {
                stirrupSizes = barList(st, "sizes", s.catalog());
            }
            if (st.has("legs")) {
                YList l = st.list("legs", "numbers of legs");
                TreeSet<Integer> set = new TreeSet<>();
                for (int i = 0; i < l.size(); i++) {
                    double v = YFields.numberOf(
                            l.get(i), st.child("legs") + "[" + (i + 1) + "]", "a whole number of legs >= 2");
                    if (v != Math.rint(v) || v < 2 || v > InputLimits.MAX_LEGS) {
                        throw new InputError(
                                l.get(i).location(),
                                st.child("legs") + "[" + (i + 1)
                                        + "]: expected a whole number of legs from 2 to " + InputLimits.MAX_LEGS
                                        + ", got "
                                        + Echo.cut(((YScalar) l.get(i)).text()));
                    }
                    set.add((int) v);
                }
                if (set.isEmpty()) {
                    throw st.error("legs", "expected at least one number of legs");
                }
                legs = List.copyOf(set);
            }
            if (st.has("spacing")) {
                YFields r =
                        st.map("spacing", "the spacing range {min, max, step}").allowOnly("min", "max", "step");
                spacings = lengthRange(r, u, "stirrup spacings, " + len, 200, InputLimits.STIRRUP_SPACING);
            }
        }
        return new SearchSpace(widths, depths, bars, comp, layers, stirrupSizes, legs, spacings)
                .withBarsPerTwoLegs(barsPerTwoLegs(doc));
    }

    private static List<Double> sortedLengths(
            YFields f, String key, String what, UnitSystem u, InputLimits.Range range) {
        YList l = f.list(key, what);
        TreeSet<Double> set = new TreeSet<>();
        for (int i = 0; i < l.size(); i++) {
            YNode n = l.get(i);
            String path = f.child(key) + "[" + (i + 1) + "]";
            double v = YFields.numberOf(n, path, "a positive number (" + what + ")");
            YFields.requirePositive(n, path, v, what);
            String problem = range.problem(u, v);
            if (problem != null) {
                throw new InputError(n.location(), path + ": " + problem);
            }
            set.add(u.toSI(v, Dim.LENGTH));
        }
        if (set.isEmpty()) {
            throw f.error(key, "expected at least one value (" + what + ")");
        }
        return List.copyOf(set);
    }

    private static List<Double> lengthRange(
            YFields r, UnitSystem u, String what, int maxCount, InputLimits.Range range) {
        double min = InputLimits.require(r, "min", range, u, r.positive("min", "smallest of the " + what));
        double max = InputLimits.require(r, "max", range, u, r.positive("max", "largest of the " + what));
        double step = r.positive("step", "step between " + what);
        if (max < min) {
            throw r.error(
                    "max", "expected max >= min (" + SettingsReader.fmt(min) + "), got " + SettingsReader.fmt(max));
        }
        if ((max - min) / step + 1 > maxCount) {
            throw r.error("step", "the range gives more than " + maxCount + " values; expected a larger step");
        }
        return range(u.toSI(min, Dim.LENGTH), u.toSI(max, Dim.LENGTH), u.toSI(step, Dim.LENGTH));
    }

    private static List<BarSize> barList(YFields f, String key, BarCatalog catalog) {
        YList l = f.list(key, "bar sizes from catalog " + catalog.id());
        List<BarSize> out = new ArrayList<>();
        for (int i = 0; i < l.size(); i++) {
            String path = f.child(key) + "[" + (i + 1) + "]";
            String name = YFields.textOf(l.get(i), path, "a bar size from catalog " + catalog.id());
            BarSize b = SettingsReader.bar(catalog, name, l.get(i).location(), path);
            if (!out.contains(b)) {
                out.add(b);
            }
        }
        if (out.isEmpty()) {
            throw f.error(key, "expected at least one bar size");
        }
        out.sort(java.util.Comparator.comparingDouble(BarSize::diameter));
        return out;
    }

    /** {@code search.max_bar_sizes_per_beam} (default 2): longitudinal bar sizes in one beam. */
    public static int maxBarSizesPerBeam(YFields doc) {
        if (!doc.has("search")) {
            return 2;
        }
        YFields f = doc.map("search", "the search space");
        if (!f.has("max_bar_sizes_per_beam")) {
            return 2;
        }
        int v = f.positiveInt("max_bar_sizes_per_beam", "longitudinal bar sizes in one beam, 1 or 2");
        if (v > 2) {
            throw f.error(
                    "max_bar_sizes_per_beam",
                    "expected 1 or 2 (a beam's top bars share one size, its bottom " + "bars another), got " + v);
        }
        return v;
    }

    /**
     * {@code search.stirrups.bars_per_two_legs}: an office's rule that two stirrup legs hold at most this
     * many bars of a layer (at least 2); 0 when not given (the code's rules only).
     */
    public static int barsPerTwoLegs(YFields doc) {
        if (!doc.has("search")) {
            return SearchSpace.DEFAULT_BARS_PER_TWO_LEGS;
        }
        YFields f = doc.map("search", "the search space");
        if (!f.has("stirrups")) {
            return SearchSpace.DEFAULT_BARS_PER_TWO_LEGS;
        }
        YFields st = f.map("stirrups", "stirrup options");
        if (!st.has("bars_per_two_legs")) {
            return SearchSpace.DEFAULT_BARS_PER_TWO_LEGS;
        }
        int n = st.positiveInt("bars_per_two_legs", "bars a pair of legs holds in a layer");
        if (n < 2) {
            throw st.error("bars_per_two_legs", "expected at least 2 bars for a pair of legs to hold, got " + n);
        }
        return n;
    }

    /** Rate conversions from US units to the SI rates the cost model holds. */
    private static final double YD3_PER_M3 = 1.0 / 0.764554857984;

    private static final double LB_PER_KG = 1.0 / 0.45359237;
    private static final double FT2_PER_M2 = 1.0 / (0.3048 * 0.3048);

    /**
     * The rates, the currency label, and the concrete rate per f'c (MPa -> per m³) for studies of
     * stronger concrete: the user's {@code concrete_per_m3_by_fc} (per yd³ by psi in US input), or an
     * invented default table scaled to the file's rate at the file's f'c.
     */
    public record Costs(
            CostRates rates,
            String currency,
            java.util.NavigableMap<Double, Double> concreteByFc,
            boolean concreteByFcGiven,
            barfit.catalogs.yaml.Location concreteByFcAt) {
        public Costs(
                CostRates rates,
                String currency,
                java.util.NavigableMap<Double, Double> concreteByFc,
                boolean concreteByFcGiven) {
            this(rates, currency, concreteByFc, concreteByFcGiven, null);
        }

        /** The concrete rate at f'c (MPa), interpolated linearly between given grades; NaN outside them. */
        public double concreteAt(double fc) {
            var lo = concreteByFc.floorEntry(fc + 1e-9);
            var hi = concreteByFc.ceilingEntry(fc - 1e-9);
            if (lo == null || hi == null) {
                return Double.NaN;
            }
            if (hi.getKey() - lo.getKey() < 1e-9) {
                return lo.getValue();
            }
            return lo.getValue() + (hi.getValue() - lo.getValue()) * (fc - lo.getKey()) / (hi.getKey() - lo.getKey());
        }
    }

    /** Invented relative prices of concrete by grade (MPa -> percent of 28 MPa's), for trying the tool only. */
    private static final double[] GRADE_MPA = {17, 21, 25, 28, 32, 35, 40, 45, 50, 55, 60, 70, 80};

    private static final int[] GRADE_FACTORS = {90, 94, 97, 100, 104, 108, 115, 122, 130, 138, 146, 162, 180};

    private static java.util.NavigableMap<Double, Double> defaultByFc(double fc, double rate) {
        java.util.TreeMap<Double, Double> rel = new java.util.TreeMap<>();
        for (int i = 0; i < GRADE_MPA.length; i++) {
            rel.put(GRADE_MPA[i], GRADE_FACTORS[i] / 100.0);
        }
        var lo = rel.floorEntry(fc);
        var hi = rel.ceilingEntry(fc);
        double at = lo == null
                ? hi.getValue()
                : hi == null
                        ? lo.getValue()
                        : hi.getKey().equals(lo.getKey())
                                ? lo.getValue()
                                : lo.getValue()
                                        + (hi.getValue() - lo.getValue())
                                                * (fc - lo.getKey())
                                                / (hi.getKey() - lo.getKey());
        java.util.TreeMap<Double, Double> out = new java.util.TreeMap<>();
        for (var e : rel.entrySet()) {
            out.put(e.getKey(), rate * e.getValue() / at);
        }
        return out;
    }

    /** The rate keys of {@code costs:} that take one number, in the file's units (concrete first). */
    public static List<String> rateKeys(UnitSystem u) {
        return u == UnitSystem.US
                ? List.of(
                        "concrete_per_yd3",
                        "main_bars_per_lb",
                        "stirrups_per_lb",
                        "formwork_per_ft2",
                        "depth_premium_per_ft",
                        "lap_factor")
                : List.of(
                        "concrete_per_m3",
                        "main_bars_per_kg",
                        "stirrups_per_kg",
                        "formwork_per_m2",
                        "depth_premium_per_m",
                        "lap_factor");
    }

    public static Costs costs(YFields doc, Settings s) {
        boolean us = s.units() == UnitSystem.US;
        CostRates d = CostRates.DEFAULTS;
        if (!doc.has("costs")) {
            return new Costs(d, "", defaultByFc(s.materials().fc(), d.concretePerM3()), false);
        }
        List<String> rateKeys = rateKeys(s.units());
        String[] keys = new String[rateKeys.size() + 2];
        for (int i = 0; i < rateKeys.size(); i++) {
            keys[i] = rateKeys.get(i);
        }
        keys[rateKeys.size()] = "currency";
        keys[rateKeys.size() + 1] = us ? "concrete_per_yd3_by_fc" : "concrete_per_m3_by_fc";
        YFields f = doc.map("costs", "the cost rates").allowOnly(keys);
        double concrete = rate(f, keys[0], "concrete, per " + (us ? "yd³" : "m³"))
                .map(v -> v * (us ? YD3_PER_M3 : 1.0))
                .orElse(d.concretePerM3());
        double bars = rate(f, keys[1], "main bars, per " + (us ? "lb" : "kg"))
                .map(v -> v * (us ? LB_PER_KG : 1.0))
                .orElse(d.mainBarsPerKg());
        double stirrups = rate(f, keys[2], "stirrups, per " + (us ? "lb" : "kg"))
                .map(v -> v * (us ? LB_PER_KG : 1.0))
                .orElse(d.stirrupsPerKg());
        double formwork = rate(f, keys[3], "formwork, per " + (us ? "ft²" : "m²"))
                .map(v -> v * (us ? FT2_PER_M2 : 1.0))
                .orElse(d.formworkPerM2());
        double premium = rate(
                        f,
                        keys[4],
                        "depth premium, per " + (us ? "ft of depth per ft of beam" : "m of depth per m of beam"))
                .map(v -> v * (us ? FT2_PER_M2 : 1.0))
                .orElse(d.depthPremiumPerM());
        double lap = f.optNumber("lap_factor", "the lap and waste factor, 1.0 or more")
                .orElse(d.lapFactor());
        if (lap < 1.0 || lap > 2.0) {
            throw f.error(
                    "lap_factor", "expected a lap and waste factor from 1.0 to 2.0, got " + SettingsReader.fmt(lap));
        }
        String currency = f.optText("currency", "a currency label such as EUR").orElse("");
        String byKey = keys[7];
        java.util.NavigableMap<Double, Double> byFc;
        boolean given = f.has(byKey);
        if (given) {
            YFields g =
                    f.map(byKey, "concrete rates by f'c: {" + (us ? "4000: 120, 5000: 128" : "28: 150, 35: 162") + "}");
            java.util.TreeMap<Double, Double> m = new java.util.TreeMap<>();
            for (var e : g.map().entries()) {
                double grade;
                try {
                    grade = Double.parseDouble(e.key());
                } catch (NumberFormatException ex) {
                    throw new InputError(
                            e.keyLocation(),
                            g.path() + ": expected f'c values as keys, in "
                                    + s.units().unit(Dim.STRESS) + ", got '" + Echo.cut(e.key()) + "'");
                }
                double price = YFields.numberOf(e.value(), g.child(e.key()), "a rate >= 0");
                if (price < 0 || grade <= 0) {
                    throw new InputError(
                            e.value().location(), g.child(e.key()) + ": expected a positive f'c and a rate >= 0");
                }
                double fcLo = s.units().limit(MaterialLimits.fcMin(s.units().code()), Dim.STRESS);
                double fcHi = s.units().limit(MaterialLimits.fcMax(s.units().code()), Dim.STRESS);
                if (!(grade >= fcLo * (1 - 1e-9) && grade <= fcHi * (1 + 1e-9))) {
                    throw new InputError(
                            e.keyLocation(),
                            g.child(Echo.cut(e.key())) + ": expected f'c between "
                                    + SettingsReader.fmt(fcLo) + " and " + SettingsReader.fmt(fcHi) + " "
                                    + s.units().unit(Dim.STRESS) + ", got " + SettingsReader.fmt(grade));
                }
                String problem = InputLimits.RATE.problem(s.units(), price);
                if (problem != null) {
                    throw new InputError(e.value().location(), g.child(Echo.cut(e.key())) + ": " + problem);
                }
                m.put(s.units().toSI(grade, Dim.STRESS), us ? price * YD3_PER_M3 : price);
            }
            if (m.isEmpty()) {
                throw f.error(byKey, "expected at least one f'c with its rate");
            }
            byFc = m;
        } else {
            byFc = defaultByFc(s.materials().fc(), concrete);
        }
        return new Costs(
                new CostRates(concrete, bars, stirrups, formwork, premium, lap),
                currency,
                byFc,
                given,
                given ? f.map().entry(byKey).keyLocation() : null);
    }

    private static Optional<Double> rate(YFields f, String key, String what) {
        if (!f.has(key)) {
            return Optional.empty();
        }
        return Optional.of(InputLimits.require(
                f, key, InputLimits.RATE, UnitSystem.SI, f.nonNegative(key, "a rate >= 0 (" + what + ")")));
    }
}
