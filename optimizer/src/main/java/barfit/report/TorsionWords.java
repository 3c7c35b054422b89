package barfit.report;

import barfit.section.CheckReport;
import barfit.section.CheckResult;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;

/** A designed section's torsion in one line of the design report, read from the section model's checks. */
final class TorsionWords {
    private TorsionWords() {}

    /** Null where the demand has no torsion. */
    static String summary(CheckReport r, UnitSystem u) {
        if (!r.demand().hasTorsion()) {
            return null;
        }
        CheckResult threshold = r.check("torsion_threshold").orElseThrow();
        String tu = "Tu = " + u.withUnit(Math.abs(r.demand().tu()), Dim.MOMENT)
                + (r.demand().compatibilityTorsion() ? " (compatibility)" : "");
        String phiTth = "φTth = " + u.withUnit(threshold.limit().value(), Dim.MOMENT);
        if (r.check("torsion_transverse").orElseThrow().title().endsWith("(neglected)")) {
            return tu + " < " + phiTth + ": neglected (9.5.4.1)";
        }
        StringBuilder sb = new StringBuilder(tu).append(" ≥ ").append(phiTth);
        r.check("torsion_compatibility")
                .filter(c -> c.sense().equals(">="))
                .ifPresent(c -> sb.append(", reduced to φTcr = ")
                        .append(u.withUnit(c.limit().value(), Dim.MOMENT))
                        .append(" (22.7.3.2)"));
        sb.append("   section ").append(ratio(r, "torsion_section"));
        sb.append("   closed stirrups ").append(ratio(r, "torsion_transverse"));
        sb.append("   Al ").append(ratio(r, "torsion_longitudinal"));
        return sb.toString();
    }

    private static String ratio(CheckReport r, String id) {
        return Words.ratio(r.check(id).orElseThrow().ratio());
    }
}
