package barfit.section.anchorage;

import barfit.catalogs.BarSize;
import barfit.section.CheckResult;
import barfit.section.CodeEquations;
import barfit.section.trail.Q;
import barfit.section.trail.Trail;
import java.util.List;

/**
 * The bars at supports and points of inflection, 9.7.3.8: how much positive moment steel runs into a
 * support (9.7.3.8.1, 9.7.3.8.2), the bar size limit at simple supports and points of inflection
 * (9.7.3.8.3), and how far negative moment bars run past the point of inflection (9.7.3.8.4).
 */
public final class SupportBars {
    /** The kind of support a span's bottom bars run into. */
    public enum End {
        /** 9.7.3.8.1: one third of the positive moment steel */
        SIMPLE,
        /** 9.7.3.8.2: one quarter */
        CONTINUOUS
    }

    /**
     * What must run into a support: {@code area} (the {@code fraction} of the largest positive moment steel)
     * at least {@code embedment} past the support face along the bottom; {@code developAtFace} where the bars
     * must also develop fy at the face (a continuous support of a beam resisting lateral force).
     */
    public record IntoSupport(End end, double fraction, double area, double embedment, boolean developAtFace) {
        /** Of {@code n} equal bars, how many must run in. */
        public int bars(int n) {
            return (int) Math.ceil(n * fraction - 1e-9);
        }
    }

    /**
     * 9.7.3.8.3: ld of the positive moment bars against (1.3) Mn / Vu + la; {@code exempt} where the bars end
     * past the support's centre line in a standard hook (or an anchorage as good), which the clause excuses.
     */
    public record SizeLimit(double ld, double limit, double factor, double la, boolean exempt, CheckResult check) {}

    /**
     * 9.7.3.8.4: at least {@code area} (a third of the negative moment steel at the support) runs
     * {@code length} past the point of inflection, the greatest of d, 12 db and ln / 16.
     */
    public record PastInflection(double area, double length, double byD, double byDb, double byLn) {}

    private SupportBars() {}

    /** 9.7.3.8.1 (simple support) and 9.7.3.8.2 (continuous support). */
    public static IntoSupport positiveIntoSupport(
            End end, double asMaxPositive, boolean lateralForceResisting, CodeEquations code, Trail t) {
        double fraction = end == End.SIMPLE ? 1.0 / 3 : 0.25;
        double area = fraction * asMaxPositive;
        double embedment = code.anchorage().intoSupport();
        boolean develop = end == End.CONTINUOUS && lateralForceResisting;
        String clause = end == End.SIMPLE ? "9.7.3.8.1" : "9.7.3.8.2";
        if (t.isOn()) {
            t.heading(
                    "Positive moment bars into the " + (end == End.SIMPLE ? "simple" : "continuous") + " support",
                    clause);
            t.step(
                    "As,in",
                    (end == End.SIMPLE ? "1/3" : "1/4") + " As,max+",
                    "{} × {}",
                    Q.area(area),
                    Q.number(fraction),
                    Q.area(asMaxPositive));
            t.value("embedment", Q.length(embedment), "past the support face, along the bottom");
            if (develop) {
                t.note("Part of the lateral-force-resisting system: these bars develop fy at the support face.");
            }
        }
        return new IntoSupport(end, fraction, area, embedment, develop);
    }

    /** The checks of {@link #positiveIntoSupport}'s requirement on the bars provided. */
    public static List<CheckResult> checkIntoSupport(IntoSupport need, double areaIn, double embedmentIn) {
        String clause = need.end() == End.SIMPLE ? "9.7.3.8.1" : "9.7.3.8.2";
        return List.of(
                CheckResult.atLeast(
                        "into-support-area",
                        "Bottom bars into the support",
                        clause,
                        Q.area(areaIn),
                        Q.area(need.area()),
                        null),
                CheckResult.atLeast(
                        "into-support-length",
                        "Bottom bars' embedment past the face",
                        clause,
                        Q.length(embedmentIn),
                        Q.length(need.embedment()),
                        null));
    }

    /**
     * Mn with every bar at the section at fy (what 9.7.3.8.3 takes), by the rectangular stress block of a
     * compression face {@code b} wide: As fy (d − a/2), a = As fy / (0.85 f'c b). N·mm.
     */
    public static double mnAtYield(double as, double fy, double d, double b, double fc) {
        double a = as * fy / (0.85 * fc * b);
        return as * fy * (d - a / 2);
    }

    /**
     * 9.7.3.8.3 at a simple support: ld ≤ 1.3 Mn / Vu + la where the reaction confines the bars' ends
     * (compression), else Mn / Vu + la; la the embedment past the support's centre line.
     */
    public static SizeLimit atSimpleSupport(
            double ld, double mn, double vu, double la, boolean confinedByReaction, boolean hookedPastCentre, Trail t) {
        double factor = confinedByReaction ? 1.3 : 1.0;
        return limit(ld, mn, vu, la, factor, hookedPastCentre, "at the simple support", t);
    }

    /**
     * 9.7.3.8.3 at a point of inflection: ld ≤ Mn / Vu + la, la the embedment past the point, counted up to
     * the greater of d and 12 db.
     */
    public static SizeLimit atInflection(
            double ld, double mn, double vu, double laProvided, double d, BarSize bar, Trail t) {
        double la = Math.min(laProvided, Math.max(d, 12 * bar.diameter()));
        return limit(ld, mn, vu, la, 1.0, false, "at the point of inflection", t);
    }

    private static SizeLimit limit(
            double ld, double mn, double vu, double la, double factor, boolean exempt, String where, Trail t) {
        double limit = vu > 0 ? factor * mn / vu + la : Double.POSITIVE_INFINITY;
        CheckResult c = exempt
                ? CheckResult.rule(
                        "bar-size-limit",
                        "Positive bars' ld " + where,
                        "9.7.3.8.3",
                        true,
                        Q.length(ld),
                        Q.length(limit),
                        "<=",
                        null)
                : CheckResult.atMost(
                        "bar-size-limit",
                        "Positive bars' ld " + where,
                        "9.7.3.8.3",
                        Q.length(ld),
                        Q.length(limit),
                        null);
        if (t.isOn()) {
            t.heading("Bar size of the positive moment steel " + where, "9.7.3.8.3");
            t.step(
                    "limit",
                    (factor == 1.0 ? "" : "1.3 ") + "Mn / Vu + la",
                    "{} × {} / {} + {}",
                    Q.length(limit),
                    Q.number(factor),
                    Q.moment(mn),
                    Q.force(vu),
                    Q.length(la));
            t.value("ld", Q.length(ld), exempt ? "hooked past the centre line: the limit does not apply" : null);
        }
        return new SizeLimit(ld, limit, factor, la, exempt, c);
    }

    /** 9.7.3.8.4: negative moment bars past the point of inflection. */
    public static PastInflection negativePastInflection(double asNegative, double d, BarSize bar, double ln, Trail t) {
        double byDb = 12 * bar.diameter();
        double byLn = ln / 16;
        double length = Math.max(d, Math.max(byDb, byLn));
        double area = asNegative / 3;
        if (t.isOn()) {
            t.heading("Negative moment bars past the point of inflection", "9.7.3.8.4");
            t.step("As", "1/3 As−", "{} / 3", Q.area(area), Q.area(asNegative));
            t.step(
                    "length",
                    "max(d, 12 db, ln/16)",
                    "max({}, 12 × {}, {} / 16)",
                    Q.length(length),
                    Q.length(d),
                    Q.length(bar.diameter()),
                    Q.span(ln));
        }
        return new PastInflection(area, length, d, byDb, byLn);
    }
}
