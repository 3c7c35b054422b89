package barfit.report;

import barfit.detailing.BarRun;
import barfit.detailing.LineDetail;
import barfit.detailing.ScheduleRow;
import barfit.section.CheckResult;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.Locale;
import java.util.Map;

/** A detailed line in words: what the detailing changed, its checks, the bending schedule and its masses. */
public final class BendingScheduleText {
    private BendingScheduleText() {}

    public static void render(LineDetail d, UnitSystem u, String currency, StringBuilder out) {
        out.append("\nLine ")
                .append(d.id())
                .append(" detailed: every bar cut from stock bars ")
                .append(u.compact(d.stockLength(), Dim.SPAN))
                .append(' ')
                .append(u.unit(Dim.SPAN))
                .append(" long, lapped where longer; x from the centre line of support 1\n");
        runs(d, u, out);
        long failing = d.checks().stream().filter(c -> !c.pass()).count();
        out.append("  detailing checks: ")
                .append(d.checks().size())
                .append(failing == 0 ? ", all pass" : ", " + failing + " failing")
                .append('\n');
        for (CheckResult c : d.checks()) {
            if (!c.pass()) {
                out.append("    FAILS ")
                        .append(c.title())
                        .append(" (")
                        .append(c.clause())
                        .append(")")
                        .append(c.note() == null ? "" : ": " + c.note())
                        .append('\n');
            }
        }
        var cov = d.coverage();
        out.append("  the bars as detailed, each built up over ld (ldh from a hook) from its ends, ")
                .append(
                        cov.covered()
                                ? "cover the factored envelope at every station"
                                : "do NOT cover the factored envelope everywhere")
                .append(
                        Double.isNaN(cov.worstX())
                                ? ""
                                : String.format(Locale.ROOT, " (largest Mu/φMn %.2f at x = ", cov.worstRatio())
                                        + u.number(cov.worstX(), Dim.SPAN) + " " + u.unit(Dim.SPAN) + ")")
                .append('\n');
        schedule(d, u, out);
        out.append("  steel priced from the cut lengths: ")
                .append(Money.amount(d.steelCost()))
                .append(currency == null || currency.isEmpty() ? "" : " " + currency)
                .append(" (the design priced its steel at ")
                .append(Money.amount(d.designSteelCost()))
                .append(" with the lap factor in place of the laps)\n");
    }

    /** Each run: count, bar, what, from and to, hooks, laps and what the detailing lengthened. */
    static void runs(LineDetail d, UnitSystem u, StringBuilder out) {
        for (BarRun r : d.runs()) {
            out.append("  ")
                    .append(r.count())
                    .append(' ')
                    .append(r.bar().label())
                    .append(' ')
                    .append(r.what())
                    .append(": x ")
                    .append(u.number(r.start(), Dim.SPAN))
                    .append(" to ")
                    .append(u.number(r.end(), Dim.SPAN))
                    .append(' ')
                    .append(u.unit(Dim.SPAN));
            if (r.hookStart() || r.hookEnd()) {
                out.append(
                        r.hookStart() && r.hookEnd()
                                ? ", hooked at both ends"
                                : r.hookStart() ? ", hooked at its start" : ", hooked at its end");
                if (r.bend() == barfit.section.anchorage.StandardHooks.Bend.DEG_180) {
                    out.append(" (180-degree hooks)");
                }
            }
            for (BarRun.Lap lap : r.laps()) {
                out.append(", ")
                        .append(lap.kind())
                        .append(" x ")
                        .append(u.number(lap.from(), Dim.SPAN))
                        .append("–")
                        .append(u.number(lap.to(), Dim.SPAN));
            }
            if (r.lengthened() > 0) {
                out.append("; run ")
                        .append(u.number(r.lengthened(), Dim.SPAN))
                        .append(' ')
                        .append(u.unit(Dim.SPAN))
                        .append(" further than designed: ")
                        .append(r.why());
            }
            out.append('\n');
        }
    }

    /** The bending schedule's table and the masses by bar size. */
    static void schedule(LineDetail d, UnitSystem u, StringBuilder out) {
        out.append("  bending schedule:\n");
        TextTable t = new TextTable(false, false, false, true, true, true, true, true, false);
        t.row(
                "mark",
                "shape",
                "bar",
                "count",
                "length (" + u.unit(Dim.SPAN) + ")",
                "A (" + u.unit(Dim.LENGTH) + ")",
                "B (" + u.unit(Dim.LENGTH) + ")",
                "mass (" + u.unit(Dim.MASS) + ")",
                "what");
        for (ScheduleRow r : d.schedule()) {
            t.row(
                    r.mark(),
                    r.shape().words(),
                    r.bar().label(),
                    String.valueOf(r.count()),
                    u.number(r.length(), Dim.SPAN),
                    u.number(r.a(), Dim.LENGTH),
                    r.b() > 0 ? u.number(r.b(), Dim.LENGTH) : "",
                    u.number(r.mass(), Dim.MASS),
                    r.where());
        }
        t.write("    ", out);
        out.append(
                "    (length: one bar as cut, centre line with its bends; A: straight length out to out; B: a hook's "
                        + "leg, a hoop's height out to out)\n");
        out.append("  mass by bar size:");
        for (Map.Entry<String, Double> e : d.massBySize().entrySet()) {
            out.append(' ')
                    .append(e.getKey())
                    .append(' ')
                    .append(u.number(e.getValue(), Dim.MASS))
                    .append(' ')
                    .append(u.unit(Dim.MASS))
                    .append(';');
        }
        out.append(" total ")
                .append(u.number(d.totalMass(), Dim.MASS))
                .append(' ')
                .append(u.unit(Dim.MASS))
                .append('\n');
    }
}
