package barfit.design;

import java.util.Map;
import java.util.NavigableMap;
import java.util.TreeMap;

/**
 * Embodied carbon factors, stages A1-A3 (cradle to gate), held in SI: kg CO2e per m³ of concrete, per kg
 * of main bars and of stirrups, and per m² of formwork contact. Carbon is linear in the quantities the
 * cost model prices, so these factors price a design through {@link CostModel} as rates do ({@link #rates}):
 * the lap and waste factor scales main-bar mass for carbon as it does for cost, and there is no depth
 * premium.
 */
public record CarbonFactors(double concretePerM3, double mainBarsPerKg, double stirrupsPerKg, double formworkPerM2) {

    /**
     * Reinforcing bar, kg CO2e per kg, A1-A3: 0.854 (854 per tonne), the industry-wide environmental product
     * declaration of fabricated steel reinforcement of the Concrete Reinforcing Steel Institute (CRSI, 2022),
     * from memory. US bar is made
     * mostly from scrap in electric arc furnaces; bar from a blast furnace route is two to three times this.
     */
    public static final double BAR_PER_KG = 0.854;

    /** Formwork: none by default (forms are reused; their share is small and varies too widely to average). */
    public static final double FORMWORK_PER_M2 = 0;

    /**
     * Ready-mixed concrete by specified strength, f'c in MPa to kg CO2e per m³, A1-A3: rounded US national
     * averages of the benchmark report of the National Ready Mixed Concrete Association (NRMCA, "A
     * Cradle-to-Gate Life Cycle Assessment of Ready-Mixed Concrete Manufactured by NRMCA Members",
     * version 3, 2019) for mixes of 0-19 % fly ash or slag, at 2500, 3000, 4000, 5000, 6000 and 8000 psi;
     * from memory. Averages only: a mix with more supplementary material is well below them.
     */
    private static final double[][] CONCRETE_BY_FC = {
        {17.24, 260}, {20.68, 280}, {27.58, 330}, {34.47, 380}, {41.37, 405}, {55.16, 480}
    };

    /** The default concrete factors by f'c (MPa), as {@link #CONCRETE_BY_FC} gives them. */
    public static NavigableMap<Double, Double> defaultConcreteByFc() {
        TreeMap<Double, Double> m = new TreeMap<>();
        for (double[] row : CONCRETE_BY_FC) {
            m.put(row[0], row[1]);
        }
        return m;
    }

    /**
     * The default concrete factor at f'c (MPa): interpolated linearly between the grades of
     * {@link #CONCRETE_BY_FC}, and beyond its ends along its first or last segment.
     */
    public static double defaultConcreteAt(double fc) {
        NavigableMap<Double, Double> m = defaultConcreteByFc();
        Map.Entry<Double, Double> lo = m.floorEntry(fc);
        Map.Entry<Double, Double> hi = m.higherEntry(fc);
        if (lo == null) {
            lo = m.firstEntry();
            hi = m.higherEntry(lo.getKey());
        } else if (hi == null) {
            hi = m.lastEntry();
            lo = m.lowerEntry(hi.getKey());
        }
        return lo.getValue() + (hi.getValue() - lo.getValue()) * (fc - lo.getKey()) / (hi.getKey() - lo.getKey());
    }

    /** The defaults for concrete of f'c (MPa). */
    public static CarbonFactors defaults(double fc) {
        return new CarbonFactors(defaultConcreteAt(fc), BAR_PER_KG, BAR_PER_KG, FORMWORK_PER_M2);
    }

    /** These factors as the rates of a cost model, with the lap and waste factor of the cost rates. */
    public CostRates rates(double lapFactor) {
        return new CostRates(concretePerM3, mainBarsPerKg, stirrupsPerKg, formworkPerM2, 0, lapFactor);
    }

    /** The same factors with another concrete factor (another grade). */
    public CarbonFactors withConcrete(double perM3) {
        return new CarbonFactors(perM3, mainBarsPerKg, stirrupsPerKg, formworkPerM2);
    }
}
