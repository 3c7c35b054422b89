package barfit.input;

import barfit.catalogs.Echo;
import barfit.catalogs.InputError;
import barfit.catalogs.yaml.YFields;
import barfit.design.CarbonFactors;
import barfit.section.MaterialLimits;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.List;
import java.util.Map;
import java.util.NavigableMap;
import java.util.Optional;
import java.util.TreeMap;

/**
 * Reads {@code carbon:}, the embodied carbon factors (stages A1-A3) beside {@code costs:}: kg CO2e per m³
 * of concrete (or per grade), per kg of main bars and of stirrups, per m² of formwork; lb CO2e per yd³,
 * lb and ft² in US files. What is not given takes the published averages of {@link CarbonFactors}.
 */
public final class CarbonReader {
    private CarbonReader() {}

    /**
     * The factors at the file's f'c, whether the file gave a {@code carbon:} block, and the concrete factor
     * by f'c (MPa to kg CO2e per m³) for studies of other grades.
     */
    public record Carbon(CarbonFactors factors, boolean given, NavigableMap<Double, Double> concreteByFc) {
        /** The concrete factor at f'c (MPa): interpolated between the grades given; NaN outside them. */
        public double concreteAt(double fc) {
            Map.Entry<Double, Double> lo = concreteByFc.floorEntry(fc + 1e-9);
            Map.Entry<Double, Double> hi = concreteByFc.ceilingEntry(fc - 1e-9);
            if (lo == null || hi == null) {
                return Double.NaN;
            }
            if (hi.getKey() - lo.getKey() < 1e-9) {
                return lo.getValue();
            }
            return lo.getValue() + (hi.getValue() - lo.getValue()) * (fc - lo.getKey()) / (hi.getKey() - lo.getKey());
        }

        /** The factors for concrete of f'c (MPa): the file's, with the concrete factor of that grade. */
        public CarbonFactors at(double fc) {
            double c = concreteAt(fc);
            return factors.withConcrete(Double.isNaN(c) ? CarbonFactors.defaultConcreteAt(fc) : c);
        }
    }

    /** kg CO2e per m³ from lb CO2e per yd³; per m² from per ft² (per kg and per lb are the same ratio). */
    private static final double KG_PER_LB = 0.45359237;

    private static final double M3_PER_YD3 = 0.764554857984;
    private static final double M2_PER_FT2 = 0.3048 * 0.3048;

    /** The keys of {@code carbon:} in the file's units. */
    public static List<String> keys(UnitSystem u) {
        return u == UnitSystem.US
                ? List.of(
                        "concrete_per_yd3",
                        "concrete_per_yd3_by_fc",
                        "main_bars_per_lb",
                        "stirrups_per_lb",
                        "formwork_per_ft2")
                : List.of(
                        "concrete_per_m3",
                        "concrete_per_m3_by_fc",
                        "main_bars_per_kg",
                        "stirrups_per_kg",
                        "formwork_per_m2");
    }

    public static Carbon read(YFields doc, Settings s) {
        UnitSystem u = s.units();
        boolean us = u == UnitSystem.US;
        double fc = s.materials().fc();
        if (!doc.has("carbon")) {
            return new Carbon(CarbonFactors.defaults(fc), false, CarbonFactors.defaultConcreteByFc());
        }
        List<String> keys = keys(u);
        YFields f = doc.map("carbon", "the embodied carbon factors").allowOnly(keys.toArray(String[]::new));
        double volume = us ? KG_PER_LB / M3_PER_YD3 : 1.0;
        double area = us ? KG_PER_LB / M2_PER_FT2 : 1.0;
        NavigableMap<Double, Double> byFc = CarbonFactors.defaultConcreteByFc();
        boolean byFcGiven = f.has(keys.get(1));
        if (byFcGiven) {
            byFc = byFc(f, keys.get(1), s, volume);
        }
        Optional<Double> concreteGiven = factor(f, keys.get(0), "concrete, per " + (us ? "yd³" : "m³"));
        double concrete;
        if (concreteGiven.isPresent()) {
            concrete = concreteGiven.get() * volume;
        } else if (byFcGiven) {
            concrete = new Carbon(CarbonFactors.defaults(fc), true, byFc).concreteAt(fc);
            if (Double.isNaN(concrete)) {
                throw f.error(
                        keys.get(1),
                        "expected grades on both sides of the file's f'c ("
                                + SettingsReader.fmt(u.fromSI(fc, Dim.STRESS)) + " " + u.unit(Dim.STRESS) + "), or "
                                + keys.get(0) + " for it");
            }
        } else {
            concrete = CarbonFactors.defaultConcreteAt(fc);
        }
        double bars =
                factor(f, keys.get(2), "main bars, per " + (us ? "lb" : "kg")).orElse(CarbonFactors.BAR_PER_KG);
        double stirrups =
                factor(f, keys.get(3), "stirrups, per " + (us ? "lb" : "kg")).orElse(CarbonFactors.BAR_PER_KG);
        double formwork = factor(f, keys.get(4), "formwork, per " + (us ? "ft²" : "m²"))
                .map(v -> v * area)
                .orElse(CarbonFactors.FORMWORK_PER_M2);
        return new Carbon(new CarbonFactors(concrete, bars, stirrups, formwork), true, byFc);
    }

    private static NavigableMap<Double, Double> byFc(YFields f, String key, Settings s, double volume) {
        UnitSystem u = s.units();
        YFields g = f.map(
                key,
                "concrete carbon factors by f'c: {" + (u == UnitSystem.US ? "4000: 550, 5000: 630" : "28: 330, 35: 380")
                        + "}");
        TreeMap<Double, Double> m = new TreeMap<>();
        double fcLo = u.limit(MaterialLimits.fcMin(u.code()), Dim.STRESS);
        double fcHi = u.limit(MaterialLimits.fcMax(u.code()), Dim.STRESS);
        for (var e : g.map().entries()) {
            double grade;
            try {
                grade = Double.parseDouble(e.key());
            } catch (NumberFormatException ex) {
                throw new InputError(
                        e.keyLocation(),
                        g.path() + ": expected f'c values as keys, in " + u.unit(Dim.STRESS) + ", got '"
                                + Echo.cut(e.key()) + "'");
            }
            double v = YFields.numberOf(e.value(), g.child(e.key()), "a carbon factor >= 0");
            if (!(grade >= fcLo * (1 - 1e-9) && grade <= fcHi * (1 + 1e-9))) {
                throw new InputError(
                        e.keyLocation(),
                        g.child(Echo.cut(e.key())) + ": expected f'c between " + SettingsReader.fmt(fcLo) + " and "
                                + SettingsReader.fmt(fcHi) + " " + u.unit(Dim.STRESS) + ", got "
                                + SettingsReader.fmt(grade));
            }
            String problem = InputLimits.CARBON_FACTOR.problem(u, v);
            if (problem != null) {
                throw new InputError(e.value().location(), g.child(Echo.cut(e.key())) + ": " + problem);
            }
            m.put(u.toSI(grade, Dim.STRESS), v * volume);
        }
        if (m.isEmpty()) {
            throw f.error(key, "expected at least one f'c with its carbon factor");
        }
        return m;
    }

    private static Optional<Double> factor(YFields f, String key, String what) {
        if (!f.has(key)) {
            return Optional.empty();
        }
        return Optional.of(InputLimits.require(
                f,
                key,
                InputLimits.CARBON_FACTOR,
                f.nonNegative(key, "a carbon factor >= 0 (kg CO2e or lb CO2e, " + what + ")")));
    }
}
