package barfit.report;

import barfit.design.CostBreakdown;
import barfit.units.UnitSystem;

/** Costs for reports: per metre (SI) or per foot (US) of beam, or per beam when a span is given. */
public final class Money {
    private Money() {}

    /** Per-metre cost to the user's per-length basis. */
    public static double perLength(double perMetre, UnitSystem u) {
        return u == UnitSystem.US ? perMetre * 0.3048 : perMetre;
    }

    public static String perLengthLabel(UnitSystem u) {
        return u == UnitSystem.US ? "per ft" : "per m";
    }

    public static String amount(double v) {
        return barfit.units.FixedDecimals.of(v, 2);
    }

    /** "concrete 24.75 + main bars 39.10 + ... = 129.65" */
    public static String breakdown(CostBreakdown c) {
        StringBuilder sb = new StringBuilder();
        sb.append("concrete ").append(amount(c.concrete()));
        sb.append(" + main bars ").append(amount(c.mainBars()));
        sb.append(" + stirrups ").append(amount(c.stirrups()));
        sb.append(" + formwork ").append(amount(c.formwork()));
        if (c.depthPremium() != 0) {
            sb.append(" + depth premium ").append(amount(c.depthPremium()));
        }
        sb.append(" = ").append(amount(c.total()));
        return sb.toString();
    }

    public static CostBreakdown scaled(CostBreakdown perMetre, UnitSystem u) {
        return perMetre.times(u == UnitSystem.US ? 0.3048 : 1.0);
    }
}
