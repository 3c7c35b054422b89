package barfit.report;

import barfit.input.Settings;
import barfit.section.trail.Dim;
import barfit.study.Compare;
import barfit.study.Summary;
import barfit.study.Sweep;
import barfit.units.UnitSystem;
import java.util.List;
import java.util.Locale;

/** Terminal reports of {@code compare} and {@code sweep}. */
public final class StudyText {
    private StudyText() {}

    static String head(String command, Settings s) {
        return "barfit " + command + " — " + s.file() + " — " + s.code().edition() + "\n" + Caution.text() + "\n"
                + "Every option is designed by the same optimizer and cost model as barfit design (rates from the "
                + "file, or invented defaults).\n";
    }

    static String cost(Summary s, UnitSystem u, boolean perBeam) {
        return Money.amount(
                perBeam ? s.cost().total() : Money.perLength(s.cost().total(), u));
    }

    /** A design's carbon, over the beam or per length, where the study minimised carbon. */
    static String carbon(Summary s, UnitSystem u, boolean perBeam) {
        return Carbon.amount(
                perBeam
                        ? Carbon.mass(s.carbon().total(), u)
                        : Carbon.perLength(s.carbon().total(), u));
    }

    /** Whether a study minimised carbon: its designs say so. */
    static boolean byCarbon(List<Summary> designs) {
        return designs.stream().anyMatch(Summary::byCarbon);
    }

    static String carbonLabel(UnitSystem u, boolean perBeam) {
        return "carbon " + (perBeam ? Carbon.unit(u) + " of the beam" : Carbon.perLengthUnit(u));
    }

    static String size(Summary s, UnitSystem u) {
        return u.compact(s.width(), Dim.LENGTH) + " × " + u.compact(s.height(), Dim.LENGTH);
    }

    /**
     * What this layout's compression layer is: the minimum hangers, or more: needed (the layout relies on it
     * and no layout without it passes within the same limits), for cost (relied on, but a layout with the
     * hangers alone passes within the limits too) or by choice (not relied on).
     */
    static String compression(Summary s) {
        return s.compressionRequired()
                ? "more, needed"
                : s.compressionNeeded()
                        ? (s.byCarbon() ? "more, for carbon" : "more, for cost")
                        : s.compressionUsed() ? "more, by choice" : "minimum hangers";
    }

    /** The legend of the compression-layer words, for those that appear, one to a line. */
    static String compressionLegend(List<Summary> shown) {
        List<String> parts = new java.util.ArrayList<>();
        if (shown.stream().anyMatch(Summary::compressionRequired)) {
            parts.add("more, needed: relied on, and no layout without it passes within the same limits");
        }
        if (shown.stream().anyMatch(s -> s.compressionNeeded() && !s.compressionRequired())) {
            parts.add(
                    byCarbon(shown)
                            ? "more, for carbon: relied on, but a layout higher in carbon with the hangers alone "
                                    + "passes within the same limits too"
                            : "more, for cost: relied on, but a dearer layout with the hangers alone passes within "
                                    + "the same limits too");
        }
        if (shown.stream().anyMatch(s -> s.compressionUsed() && !s.compressionNeeded())) {
            parts.add("more, by choice: more than the hangers, not relied on");
        }
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < parts.size(); i++) {
            sb.append(i == 0 ? "  compression layer — " : "                      ")
                    .append(parts.get(i))
                    .append('\n');
        }
        return sb.toString();
    }

    public static String compare(
            Settings settings, List<Compare.Result> results, List<Boolean> perBeam, String currency) {
        UnitSystem u = settings.units();
        StringBuilder out = new StringBuilder(head("compare", settings));
        if (results.stream()
                .anyMatch(r -> byCarbon(
                        r.options().stream().map(Compare.Option::summary).toList()))) {
            out.append(Carbon.OBJECTIVE_NOTE).append('\n');
        }
        for (int i = 0; i < results.size(); i++) {
            Compare.Result r = results.get(i);
            boolean pb = perBeam.get(i);
            out.append("\nBeam ")
                    .append(r.id())
                    .append("   cap ")
                    .append(u.compact(r.cap(), Dim.LENGTH))
                    .append(' ')
                    .append(u.unit(Dim.LENGTH))
                    .append(r.capGiven() ? "" : " (no cap given: the deepest searched)")
                    .append('\n');
            boolean carbon =
                    byCarbon(r.options().stream().map(Compare.Option::summary).toList());
            TextTable t = carbon
                    ? new TextTable(false, false, false, false, true, true, false, false, true, true, true, true)
                    : new TextTable(false, false, false, false, true, true, false, false, true, true, true);
            String money = (pb ? "of the beam" : Money.perLengthLabel(u)) + (currency.isEmpty() ? "" : " " + currency);
            // over a whole span the top bars are compression steel at mid-span but tension steel at the supports
            List<String> head = new java.util.ArrayList<>(List.of(
                    "option",
                    "b × h",
                    r.wholeSpan() ? "bottom" : "tension",
                    r.wholeSpan() ? "top" : "compression",
                    "Mu/φMn",
                    "εt",
                    "φ",
                    "compression layer",
                    "bars/layers",
                    "cost " + money));
            if (carbon) {
                head.add(carbonLabel(u, pb));
            }
            head.add("vs recommended");
            t.row(head.toArray(new String[0]));
            TextTable terms = new TextTable(false, false, true, true, true, true, true, true);
            terms.row("option", "stirrups", "concrete", "main bars", "stirrups", "formwork", "depth premium", "total");
            // against the recommended option (◀): a cheaper stronger grade not worth its change shows below it
            double best = r.best() != null ? r.best().summary().total() : Double.NaN;
            java.util.Map<String, List<String>> none = new java.util.LinkedHashMap<>();
            for (Compare.Option o : r.options()) {
                Summary s = o.summary();
                if (!s.feasible()) {
                    String[] blank = new String[carbon ? 12 : 11];
                    java.util.Arrays.fill(blank, "");
                    blank[0] = o.label();
                    blank[1] = "none";
                    t.row(blank);
                    none.computeIfAbsent(s.proof(), k -> new java.util.ArrayList<>())
                            .add("'" + o.label() + "'");
                    continue;
                }
                List<String> row = new java.util.ArrayList<>(List.of(
                        o.label() + (o == r.best() ? "  ◀" : ""),
                        size(s, u),
                        s.tension(),
                        s.compression(),
                        Words.ratio(s.mu() / s.phiMn()),
                        Words.fixed(s.epsT(), 5),
                        Words.phi(s.phi()) + (s.strainClass().equals("transition") ? " transition" : ""),
                        compression(s),
                        s.longitudinalBars() + " / " + s.layers(),
                        cost(s, u, pb)));
                if (carbon) {
                    row.add(carbon(s, u, pb));
                }
                row.add(String.format(Locale.ROOT, "%+.1f %%", 100 * (s.total() - best) / best));
                t.row(row.toArray(new String[0]));
                var c = pb ? s.cost() : Money.scaled(s.cost(), u);
                terms.row(
                        o.label(),
                        s.stirrups(),
                        Money.amount(c.concrete()),
                        Money.amount(c.mainBars()),
                        Money.amount(c.stirrups()),
                        Money.amount(c.formwork()),
                        Money.amount(c.depthPremium()),
                        Money.amount(c.total()));
            }
            t.write("  ", out);
            out.append(compressionLegend(r.options().stream()
                    .map(Compare.Option::summary)
                    .filter(Summary::feasible)
                    .toList()));
            if (r.wholeSpan()) {
                out.append(
                        "  top: the continuous bars run the full span, the compression layer at mid-span (compression "
                                + "steel there only where they lie above the neutral axis); the bars added at the supports are "
                                + "tension steel there\n");
            }
            out.append("\n  stirrups, and the cost term by term (")
                    .append(money)
                    .append("; depth premium: the storey " + "height a deeper beam costs)\n");
            terms.write("  ", out);
            none.forEach((why, labels) -> out.append("  none for ")
                    .append(String.join(", ", labels))
                    .append(": ")
                    .append(why)
                    .append('\n'));
            out.append("  recommended: ")
                    .append(
                            r.best() == null
                                    ? "none"
                                    : r.best().label() + " (b × h = "
                                            + size(r.best().summary(), u) + " " + u.unit(Dim.LENGTH) + ")")
                    .append('\n');
            for (String reason : r.reasons()) {
                out.append("  · ").append(reason).append('\n');
            }
        }
        return out.toString();
    }

    public static String sweep(Settings settings, List<Sweep.Result> results, List<Boolean> perBeam, String currency) {
        UnitSystem u = settings.units();
        StringBuilder out = new StringBuilder(head("sweep", settings));
        if (results.stream()
                .anyMatch(r ->
                        byCarbon(r.points().stream().map(Sweep.Point::summary).toList()))) {
            out.append(Carbon.OBJECTIVE_NOTE).append('\n');
        }
        for (int i = 0; i < results.size(); i++) {
            Sweep.Result r = results.get(i);
            boolean pb = perBeam.get(i);
            out.append("\nBeam ").append(r.id()).append('\n');
            boolean carbon =
                    byCarbon(r.points().stream().map(Sweep.Point::summary).toList());
            TextTable t = carbon
                    ? new TextTable(true, false, true, true, false, false, false, true)
                    : new TextTable(true, false, true, false, false, false, true);
            List<String> head = new java.util.ArrayList<>(List.of(
                    "cap (" + u.unit(Dim.LENGTH) + ")",
                    "feasible",
                    "cost " + (pb ? "of the beam" : Money.perLengthLabel(u))
                            + (currency.isEmpty() ? "" : " " + currency)));
            if (carbon) {
                head.add(carbonLabel(u, pb));
            }
            head.addAll(List.of("b × h", "tension", "compression layer", "εt"));
            t.row(head.toArray(new String[0]));
            for (Sweep.Point p : r.points()) {
                Summary s = p.summary();
                List<String> row = new java.util.ArrayList<>(List.of(
                        u.compact(p.cap(), Dim.LENGTH),
                        s.feasible() ? "yes" : "no",
                        s.feasible() ? cost(s, u, pb) : ""));
                if (carbon) {
                    row.add(s.feasible() ? carbon(s, u, pb) : "");
                }
                row.addAll(List.of(
                        s.feasible() ? size(s, u) : "",
                        s.feasible() ? s.tension() : "",
                        s.feasible() ? compression(s) : "",
                        s.feasible() ? Words.fixed(s.epsT(), 5) : ""));
                t.row(row.toArray(new String[0]));
            }
            t.write("  ", out);
            out.append(compressionLegend(r.points().stream()
                    .map(Sweep.Point::summary)
                    .filter(Summary::feasible)
                    .toList()));
            String range = u.compact(r.firstCap(), Dim.LENGTH) + " to " + u.compact(r.lastCap(), Dim.LENGTH) + " "
                    + u.unit(Dim.LENGTH);
            out.append("  shallowest cap with a passing design: ")
                    .append(
                            r.shallowestFeasible() == null
                                    ? "not within the range (no cap from " + range + " passes)"
                                    : u.compact(r.shallowestFeasible(), Dim.LENGTH) + " " + u.unit(Dim.LENGTH))
                    .append('\n');
            if (r.shallowestFeasible() == null) {
                out.append("  compression steel: nothing passes in the range, with or without it\n");
            } else {
                out.append("  compression steel is necessary below: ")
                        .append(
                                switch (r.compression()) {
                                    case "below" ->
                                        u.compact(r.compressionNeededBelow(), Dim.LENGTH) + " " + u.unit(Dim.LENGTH)
                                                + " (under it, every passing layout needs compression steel beyond the minimum hangers)";
                                    case "everywhere" ->
                                        "every cap in the range (the minimum hangers alone work at no depth up to "
                                                + u.compact(r.lastCap(), Dim.LENGTH) + " " + u.unit(Dim.LENGTH) + ")";
                                    default ->
                                        "no cap in the range (at every cap from " + range
                                                + " with a passing design, the minimum " + "hangers alone can work)";
                                })
                        .append('\n');
            }
            if (r.chosen().feasible()) {
                out.append("  design (cap ")
                        .append(u.compact(r.chosenCap(), Dim.LENGTH))
                        .append(' ')
                        .append(u.unit(Dim.LENGTH))
                        .append(") chooses ")
                        .append(size(r.chosen(), u))
                        .append(" at ")
                        .append(cost(r.chosen(), u, pb))
                        .append(
                                r.chosen().byCarbon()
                                        ? ", " + carbon(r.chosen(), u, pb) + " "
                                                + carbonLabel(u, pb).substring(7)
                                        : "")
                        .append('\n');
            }
        }
        return out.toString();
    }

    public static String sweepCsv(List<Sweep.Result> results, UnitSystem u, List<Boolean> perBeam) {
        StringBuilder sb = new StringBuilder("beam,cap_" + u.unit(Dim.LENGTH) + ",feasible,cost,width,height,tension,"
                + "compression_steel_needed,eps_t\n");
        for (int i = 0; i < results.size(); i++) {
            for (Sweep.Point p : results.get(i).points()) {
                Summary s = p.summary();
                sb.append(csv(results.get(i).id()))
                        .append(',')
                        .append(u.compact(p.cap(), Dim.LENGTH))
                        .append(',')
                        .append(s.feasible())
                        .append(',')
                        .append(s.feasible() ? cost(s, u, perBeam.get(i)) : "")
                        .append(',')
                        .append(s.feasible() ? u.compact(s.width(), Dim.LENGTH) : "")
                        .append(',')
                        .append(s.feasible() ? u.compact(s.height(), Dim.LENGTH) : "")
                        .append(',')
                        .append(s.feasible() ? csv(s.tension()) : "")
                        .append(',')
                        .append(s.feasible() ? s.compressionRequired() : "")
                        .append(',')
                        .append(s.feasible() ? Words.fixed(s.epsT(), 5) : "")
                        .append('\n');
            }
        }
        return sb.toString();
    }

    static String csv(String v) {
        return v.contains(",") || v.contains("\"") ? "\"" + v.replace("\"", "\"\"") + "\"" : v;
    }
}
