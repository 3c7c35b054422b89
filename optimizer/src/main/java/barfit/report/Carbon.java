package barfit.report;

import barfit.design.CostBreakdown;
import barfit.design.Objective;
import barfit.units.UnitSystem;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.Locale;

/**
 * Embodied carbon for reports: kg CO2e per metre of beam (SI), lb CO2e per foot (US), or over the beam when
 * a span is given; stages A1-A3 (cradle to gate). The designs carry it in kg and per metre.
 */
public final class Carbon {
    private Carbon() {}

    private static final double LB_PER_KG = 1.0 / 0.45359237;
    private static final double M_PER_FT = 0.3048;

    /** What the figures cover, said once in each report. */
    public static final String STAGES = "stages A1-A3 (cradle to gate)";

    public static String unit(UnitSystem u) {
        return u == UnitSystem.US ? "lb CO2e" : "kg CO2e";
    }

    /** "kg CO2e per m" or "lb CO2e per ft". */
    public static String perLengthUnit(UnitSystem u) {
        return unit(u) + " " + Money.perLengthLabel(u);
    }

    /** kg per metre to the user's unit per length. */
    public static double perLength(double kgPerMetre, UnitSystem u) {
        return u == UnitSystem.US ? kgPerMetre * LB_PER_KG * M_PER_FT : kgPerMetre;
    }

    /** A carbon per length in the user's unit (lb CO2e per ft in US input) to kg per metre. */
    public static double perMetreFromUser(double v, UnitSystem u) {
        return v / perLength(1.0, u);
    }

    /** kg to the user's mass unit. */
    public static double mass(double kg, UnitSystem u) {
        return u == UnitSystem.US ? kg * LB_PER_KG : kg;
    }

    /** kg per m³ to lb per yd³ in US units. */
    public static double perVolume(double kgPerM3, UnitSystem u) {
        return u == UnitSystem.US ? kgPerM3 * LB_PER_KG * Math.pow(M_PER_FT * 3, 3) : kgPerM3;
    }

    /** kg per m² to lb per ft² in US units. */
    public static double perArea(double kgPerM2, UnitSystem u) {
        return u == UnitSystem.US ? kgPerM2 * LB_PER_KG * M_PER_FT * M_PER_FT : kgPerM2;
    }

    /** A proof's objective or bound per metre in the user's terms: currency, or carbon per length. */
    public static double proofPerLength(double perMetre, Objective measure, UnitSystem u) {
        return measure == Objective.CARBON ? perLength(perMetre, u) : Money.perLength(perMetre, u);
    }

    /** A proof's objective or bound over a span: currency, or carbon in the user's mass unit. */
    public static double proofTotal(double v, Objective measure, UnitSystem u) {
        return measure == Objective.CARBON ? mass(v, u) : v;
    }

    /** The basis of a per-length proof: "per m", or "kg CO2e per m". */
    public static String proofBasis(Objective measure, UnitSystem u) {
        return measure == Objective.CARBON ? perLengthUnit(u) : Money.perLengthLabel(u);
    }

    /** Said under the notes when the search minimised carbon. */
    public static final String OBJECTIVE_NOTE = "Objective: the least embodied carbon (--objective carbon): each "
            + "design is the lowest-carbon passing layout in the search space, proven as cost is; its cost is given "
            + "beside it.";

    /** A per-metre breakdown in the user's unit per length. */
    public static CostBreakdown perLength(CostBreakdown kgPerMetre, UnitSystem u) {
        return kgPerMetre.times(perLength(1.0, u));
    }

    /** A breakdown in kg to the user's mass unit. */
    public static CostBreakdown mass(CostBreakdown kg, UnitSystem u) {
        return kg.times(mass(1.0, u));
    }

    public static String amount(double v) {
        return String.format(Locale.ROOT, "%.1f", v);
    }

    /** "concrete 88.1 + main bars 12.0 + stirrups 3.1 + formwork 0.0 = 103.2" */
    public static String breakdown(CostBreakdown c) {
        return "concrete " + amount(c.concrete()) + " + main bars " + amount(c.mainBars()) + " + stirrups "
                + amount(c.stirrups()) + " + formwork " + amount(c.formwork()) + " = " + amount(c.total());
    }

    /** {total, concrete, main_bars, stirrups, formwork}, each to 0.001 of the unit. */
    public static ObjectNode json(CostBreakdown c) {
        ObjectNode o = Json.object();
        o.put("total", round(c.total()));
        o.put("concrete", round(c.concrete()));
        o.put("main_bars", round(c.mainBars()));
        o.put("stirrups", round(c.stirrups()));
        o.put("formwork", round(c.formwork()));
        return o;
    }

    public static double round(double v) {
        return Math.round(v * 1000.0) / 1000.0;
    }
}
