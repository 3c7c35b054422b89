package barfit.section;

import barfit.section.trail.Q;

/**
 * One code check. {@code sense} says how demand and limit compare: {@code "<="} (demand must not exceed
 * the limit, e.g. Mu <= phi Mn) or {@code ">="} (demand must reach the limit, e.g. eps_t >= 0.004).
 * {@code ratio} is the utilisation, always "<= 1 passes": demand/limit for "<=", limit/demand for ">=".
 */
public record CheckResult(
        String id,
        String title,
        String clause,
        Q demand,
        String sense,
        Q limit,
        double ratio,
        boolean pass,
        String note) {

    /** "value <= limit", with a relative tolerance of 1e-9 for rounding. */
    public static boolean within(double value, double limit) {
        return value <= limit * (1 + 1e-9);
    }

    /** "value >= limit", with a relative tolerance of 1e-9 for rounding. */
    public static boolean reaches(double value, double limit) {
        return value >= limit * (1 - 1e-9);
    }

    public static CheckResult atMost(String id, String title, String clause, Q demand, Q limit, String note) {
        double ratio = limit.value() == 0
                ? (demand.value() <= 0 ? 0 : Double.POSITIVE_INFINITY)
                : demand.value() / limit.value();
        return new CheckResult(
                id, title, clause, demand, "<=", limit, ratio, within(demand.value(), limit.value()), note);
    }

    public static CheckResult atLeast(String id, String title, String clause, Q demand, Q limit, String note) {
        double ratio = demand.value() <= 0
                ? (limit.value() <= 0 ? 0 : Double.POSITIVE_INFINITY)
                : limit.value() / demand.value();
        return new CheckResult(
                id, title, clause, demand, ">=", limit, ratio, reaches(demand.value(), limit.value()), note);
    }

    /** A check decided by a rule rather than a number (ratio 0 when passed, infinity when not). */
    public static CheckResult rule(
            String id, String title, String clause, boolean pass, Q demand, Q limit, String sense, String note) {
        return new CheckResult(
                id, title, clause, demand, sense, limit, pass ? 0 : Double.POSITIVE_INFINITY, pass, note);
    }

    /** The same check at a stirrup zone of a span: its id and title name the zone ("shear_strength.left"). */
    public CheckResult inZone(String zone) {
        return new CheckResult(
                id + "." + zone, title + " (" + zone + " zone)", clause, demand, sense, limit, ratio, pass, note);
    }

    public CheckResult withNote(String n) {
        return new CheckResult(id, title, clause, demand, sense, limit, ratio, pass, n);
    }
}
