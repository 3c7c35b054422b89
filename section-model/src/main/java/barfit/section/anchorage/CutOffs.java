package barfit.section.anchorage;

import barfit.catalogs.BarSize;
import barfit.section.CheckResult;
import barfit.section.trail.Q;
import barfit.section.trail.Trail;
import java.util.Optional;

/**
 * Where bars may stop, 9.7.3, over an {@link Envelope}: the stretch where a group of bars is needed (the
 * demand above the design strength of the bars that continue), the extension past it (9.7.3.3), the reach
 * of the continuing bars (9.7.3.4) and each bar's development on both sides of its critical section
 * (9.7.3.2). Between stations the envelope is read by straight lines, or by parabolas through three
 * stations (exact for the moment under uniform load).
 */
public final class CutOffs {
    /** How the envelope is read between stations. */
    public enum Interpolation {
        LINEAR,
        /** by parabolas through three stations, where two of them agree (see crossing) */
        QUADRATIC
    }

    /**
     * Where the demand exceeds a capacity: from {@code from} to {@code to} (the outermost crossings when
     * several stretches exceed it); {@code fromEnd} / {@code toEnd} say it runs to the envelope's end.
     */
    public record Needed(double from, double to, boolean fromEnd, boolean toEnd) {}

    /**
     * Where the cut bars may stop: {@code left} and {@code right}, the theoretical points moved outward by
     * {@code extension} (9.7.3.3), or the envelope's end where the bars are needed up to it.
     */
    public record CutPoints(Needed needed, double extension, double left, double right) {}

    /**
     * How far the continuing bars must run (9.7.3.4): ld beyond each theoretical point of the cut bars;
     * {@code leftApplies} / {@code rightApplies} false where the cut bars run to the envelope's end.
     */
    public record ContinuingReach(double ld, double left, double right, boolean leftApplies, boolean rightApplies) {}

    /** An embedment against its requirement, mm; {@code shortfall} 0 when it is met. */
    public record Embedment(double available, double required, double shortfall, CheckResult check) {}

    /** A bar's development on each side of its critical section (9.7.3.2). */
    public record BothSides(Embedment left, Embedment right) {
        public boolean pass() {
            return left.check().pass() && right.check().pass();
        }
    }

    private CutOffs() {}

    /**
     * The stretch where {@code e} exceeds {@code capacity} (the design strength of the bars that continue,
     * N·mm): where the bars beyond them are needed. Empty when they are needed nowhere.
     */
    public static Optional<Needed> needed(Envelope e, double capacity, Interpolation how) {
        double[] x = e.x();
        double[] m = e.m();
        int first = -1;
        int last = -1;
        for (int i = 0; i < x.length; i++) {
            if (m[i] > capacity) {
                first = first < 0 ? i : first;
                last = i;
            }
        }
        if (first < 0) {
            return Optional.empty();
        }
        int n = x.length;
        double from = first == 0 ? x[0] : crossing(e, first - 1, capacity, how);
        double to = last == n - 1 ? x[n - 1] : crossing(e, last, capacity, how);
        return Optional.of(new Needed(from, to, first == 0, last == n - 1));
    }

    /** Where the envelope is largest: the station, or the parabola's vertex around it. */
    public static double peak(Envelope e, Interpolation how) {
        double[] x = e.x();
        double[] m = e.m();
        int k = 0;
        for (int i = 1; i < x.length; i++) {
            if (m[i] > m[k]) {
                k = i;
            }
        }
        if (how == Interpolation.LINEAR || k == 0 || k == x.length - 1) {
            return x[k];
        }
        double[] p = parabola(x[k - 1], m[k - 1], x[k], m[k], x[k + 1], m[k + 1], x[k]);
        if (p == null || !(p[0] < 0)) {
            return x[k];
        }
        double u = -p[1] / (2 * p[0]);
        return Math.max(x[k - 1], Math.min(x[k + 1], x[k] + u));
    }

    /** 9.7.3.3: bars extend past the point where they are no longer needed by the greater of d and 12 db. */
    public static double extension(double d, BarSize bar) {
        return Math.max(d, 12 * bar.diameter());
    }

    /**
     * The cut-off points of bars needed over {@code n}: each theoretical point moved outward by max(d, 12 db)
     * (9.7.3.3). Where the stretch runs to the envelope's end (a simple support, a cantilever's free end, or
     * the end of the stretch looked at) the bars run to that end, and the support rules (9.7.3.8) take over.
     */
    public static CutPoints cutPoints(Needed n, double d, BarSize bar, Trail t) {
        double ext = extension(d, bar);
        double left = n.fromEnd() ? n.from() : n.from() - ext;
        double right = n.toEnd() ? n.to() : n.to() + ext;
        if (t.isOn()) {
            t.heading("Cut-off points of " + bar.label(), "9.7.3.3");
            t.step("ext", "max(d, 12 db)", "max({}, 12 × {})", Q.length(ext), Q.length(d), Q.length(bar.diameter()));
            t.value("x needed from", Q.span(n.from()), n.fromEnd() ? "the end: no cut" : "theoretical point");
            t.value("x needed to", Q.span(n.to()), n.toEnd() ? "the end: no cut" : "theoretical point");
            t.step(
                    "x cut, left",
                    "x from − ext",
                    "{} − {}",
                    Q.span(left),
                    Q.span(n.from()),
                    Q.length(n.fromEnd() ? 0 : ext));
            t.step(
                    "x cut, right",
                    "x to + ext",
                    "{} + {}",
                    Q.span(right),
                    Q.span(n.to()),
                    Q.length(n.toEnd() ? 0 : ext));
        }
        return new CutPoints(n, ext, left, right);
    }

    /**
     * 9.7.3.4: the continuing bars must run at least ld past each point where the cut bars are no longer
     * needed (their theoretical points {@code cut}).
     */
    public static ContinuingReach continuingReach(Needed cut, double ld, Trail t) {
        double left = cut.from() - ld;
        double right = cut.to() + ld;
        if (t.isOn()) {
            t.heading("Continuing bars past the cut bars' theoretical points", "9.7.3.4");
            if (!cut.fromEnd()) {
                t.step("x reach, left", "x from − ld", "{} − {}", Q.span(left), Q.span(cut.from()), Q.length(ld));
            }
            if (!cut.toEnd()) {
                t.step("x reach, right", "x to + ld", "{} + {}", Q.span(right), Q.span(cut.to()), Q.length(ld));
            }
        }
        return new ContinuingReach(ld, left, right, !cut.fromEnd(), !cut.toEnd());
    }

    /** Whether continuing bars running from {@code start} to {@code end} reach as 9.7.3.4 asks. */
    public static BothSides checkContinuing(ContinuingReach r, double start, double end) {
        // the embedment past each theoretical point: from it to the bar's end on that side
        Embedment left = r.leftApplies()
                ? embedment("continuing-left", r.left() + r.ld() - start, r.ld(), "9.7.3.4")
                : met("continuing-left", "9.7.3.4");
        Embedment right = r.rightApplies()
                ? embedment("continuing-right", end - (r.right() - r.ld()), r.ld(), "9.7.3.4")
                : met("continuing-right", "9.7.3.4");
        return new BothSides(left, right);
    }

    /**
     * 9.7.3.2: a bar running from {@code start} to {@code end} must be developed on each side of its critical
     * section {@code critical} (a point of peak stress, or where adjacent bars stop): {@code ldLeft} toward
     * its start and {@code ldRight} toward its end (ld for a straight end; ldh measured to the outside of the
     * hook, with the bar's end at that outside, for a hooked one).
     */
    public static BothSides developedEachSide(
            double critical, double start, double end, double ldLeft, double ldRight, Trail t) {
        Embedment left = embedment("developed-left", critical - start, ldLeft, "9.7.3.2");
        Embedment right = embedment("developed-right", end - critical, ldRight, "9.7.3.2");
        if (t.isOn()) {
            t.heading("Development each side of the critical section", "9.7.3.2");
            t.step(
                    "left",
                    "x crit − x start ≥ ld",
                    "{} − {}",
                    Q.length(left.available()),
                    Q.span(critical),
                    Q.span(start));
            t.step(
                    "right",
                    "x end − x crit ≥ ld",
                    "{} − {}",
                    Q.length(right.available()),
                    Q.span(end),
                    Q.span(critical));
            t.value("ld left", Q.length(ldLeft), null);
            t.value("ld right", Q.length(ldRight), null);
        }
        return new BothSides(left, right);
    }

    static Embedment embedment(String id, double available, double required, String clause) {
        double shortfall = Math.max(0, required - available);
        CheckResult c = CheckResult.atLeast(id, "Embedment", clause, Q.length(available), Q.length(required), null);
        return new Embedment(available, required, c.pass() ? 0 : shortfall, c);
    }

    private static Embedment met(String id, String clause) {
        CheckResult c = CheckResult.rule(id, "Embedment", clause, true, Q.length(0), Q.length(0), ">=", null);
        return new Embedment(0, 0, 0, c);
    }

    /**
     * Where the envelope crosses {@code level} between stations i and i + 1. Read by parabolas, the crossing
     * is taken from two that agree: first the parabolas of the stations on each side, carried into the gap
     * (exact where the envelope changes arrangement at the crossing, as it does at a point of inflection when
     * the factored arrangements part there); then the two parabolas across the gap; else the straight line.
     * At the envelope's ends, where only one parabola across the gap can be drawn, it is taken alone.
     */
    static double crossing(Envelope e, int i, double level, Interpolation how) {
        double[] x = e.x();
        double[] m = e.m();
        double xa = x[i];
        double xb = x[i + 1];
        if (xb <= xa) {
            return xa;
        }
        double linear = xa + (level - m[i]) / (m[i + 1] - m[i]) * (xb - xa);
        if (how == Interpolation.LINEAR || x.length < 3) {
            return linear;
        }
        int n = x.length;
        double tol = 1e-6 * (xb - xa);
        double left = i >= 2 ? rootThrough(e, i - 2, i, level) : Double.NaN;
        double right = i + 3 < n ? rootThrough(e, i + 1, i, level) : Double.NaN;
        if (Math.abs(left - right) <= tol) {
            return (left + right) / 2;
        }
        double before = i >= 1 ? rootThrough(e, i - 1, i, level) : Double.NaN;
        double after = i + 2 < n ? rootThrough(e, i, i, level) : Double.NaN;
        if (i >= 1 && i + 2 < n) {
            return Math.abs(before - after) <= tol ? (before + after) / 2 : linear;
        }
        double only = i >= 1 ? before : after;
        return Double.isNaN(only) ? linear : only;
    }

    /**
     * The crossing of {@code level} within the gap after station {@code gap}, on the parabola through
     * stations {@code first}, {@code first + 1}, {@code first + 2}; NaN when it has none there.
     */
    private static double rootThrough(Envelope e, int first, int gap, double level) {
        double[] x = e.x();
        double[] m = e.m();
        double xa = x[gap];
        double[] p = parabola(x[first], m[first], x[first + 1], m[first + 1], x[first + 2], m[first + 2], xa);
        if (p == null) {
            return Double.NaN;
        }
        return xa + rootWithin(p[0], p[1], p[2] - level, x[gap + 1] - xa);
    }

    /**
     * The parabola A u² + B u + C through three points in order along the member, with u measured from
     * {@code origin}; null when two stations coincide.
     */
    private static double[] parabola(double x0, double m0, double x1, double m1, double x2, double m2, double origin) {
        double u0 = x0 - origin;
        double u1 = x1 - origin;
        double u2 = x2 - origin;
        if (!(u1 > u0) || !(u2 > u1)) {
            return null;
        }
        double f01 = (m1 - m0) / (u1 - u0);
        double f12 = (m2 - m1) / (u2 - u1);
        double a = (f12 - f01) / (u2 - u0);
        double b = f01 - a * (u0 + u1);
        double c = m0 - f01 * u0 + a * u0 * u1;
        return new double[] {a, b, c};
    }

    /** The root of a u² + b u + c in [0, span] (a small tolerance either side), or NaN. */
    private static double rootWithin(double a, double b, double c, double span) {
        double tol = 1e-9 * span;
        double scale = Math.abs(b) * span + Math.abs(c);
        if (Math.abs(a) * span * span <= 1e-14 * scale) {
            double u = -c / b;
            return u >= -tol && u <= span + tol ? Math.max(0, Math.min(span, u)) : Double.NaN;
        }
        double disc = b * b - 4 * a * c;
        if (disc < 0) {
            return Double.NaN;
        }
        double q = -0.5 * (b + Math.copySign(Math.sqrt(disc), b));
        double[] roots = {q / a, q == 0 ? Double.NaN : c / q};
        for (double u : roots) {
            if (u >= -tol && u <= span + tol) {
                return Math.max(0, Math.min(span, u));
            }
        }
        return Double.NaN;
    }
}
