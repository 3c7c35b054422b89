package barfit.report;

import barfit.design.CostModel;
import barfit.design.section.SectionFrontier;
import barfit.input.Settings;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;

/** The cost-carbon frontier of {@code barfit frontier}, as a table and as JSON. */
public final class FrontierReport {
    private FrontierReport() {}

    /** What every point is, said once. */
    static final String METHOD = "each point is the proven-cheapest design within its own carbon (CP-SAT with the "
            + "carbon cap as a constraint), and the lowest in carbon at that cost; the next cap is just below its "
            + "carbon, until nothing passes under it";

    public static String text(Settings settings, List<SectionFrontier.Result> results, String currency) {
        UnitSystem u = settings.units();
        StringBuilder out = new StringBuilder();
        out.append("barfit frontier — ")
                .append(settings.file())
                .append(" — ")
                .append(settings.code().edition())
                .append('\n');
        out.append(Caution.text()).append('\n');
        out.append(DesignText.CARBON_NOTE).append("\n\n");
        out.append(CheckText.materials(settings)).append('\n');
        String cur = currency.isEmpty() ? "" : " (" + currency + ")";
        for (SectionFrontier.Result r : results) {
            var p = r.problem();
            out.append('\n')
                    .append("Beam ")
                    .append(p.id())
                    .append("   Mu = ")
                    .append(u.withUnit(Math.abs(p.mu()), Dim.MOMENT))
                    .append(' ')
                    .append(p.bending().word())
                    .append(p.vu() != null ? "   Vu = " + u.withUnit(p.vu(), Dim.FORCE) : "")
                    .append(p.maxDepth() != null ? "   max depth " + u.withUnit(p.maxDepth(), Dim.LENGTH) : "")
                    .append('\n');
            if (r.points().isEmpty()) {
                var d = r.first().diagnosis();
                out.append("  no layout in the search space passes: ")
                        .append(d.limit())
                        .append(" — ")
                        .append(DiagnosisWords.summary(d, u))
                        .append('\n');
                continue;
            }
            out.append("  ")
                    .append(r.points().size())
                    .append(
                            r.points().size() == 1
                                    ? " design: the cheapest is also the lowest in carbon ("
                                    : " designs, from the cheapest to the lowest-carbon (")
                    .append(r.solves())
                    .append(" proven designs):\n");
            TextTable t = new TextTable(true, false, true, true);
            t.row("#", "design", "cost " + Money.perLengthLabel(u) + cur, "carbon " + Carbon.perLengthUnit(u));
            int k = 1;
            for (SectionFrontier.Point pt : r.points()) {
                t.row(
                        String.valueOf(k++),
                        DesignText.describe(pt.design().layout(), u),
                        Money.amount(Money.perLength(pt.design().costPerMetre().total(), u)),
                        Carbon.amount(
                                Carbon.perLength(pt.design().carbonPerMetre().total(), u)));
            }
            t.write("    ", out);
            if (r.points().size() > 1) {
                var a = r.points().get(0).design();
                var b = r.points().get(r.points().size() - 1).design();
                double dc = b.costPerMetre().total() - a.costPerMetre().total();
                double dk = a.carbonPerMetre().total() - b.carbonPerMetre().total();
                out.append("  from end to end: ")
                        .append(Carbon.amount(Carbon.perLength(dk, u)))
                        .append(' ')
                        .append(Carbon.perLengthUnit(u))
                        .append(" less carbon (")
                        .append(String.format(
                                java.util.Locale.ROOT,
                                "%.1f %%",
                                100 * dk / a.carbonPerMetre().total()))
                        .append(") for ")
                        .append(Money.amount(Money.perLength(dc, u)))
                        .append(' ')
                        .append(Money.perLengthLabel(u))
                        .append(" more (")
                        .append(String.format(
                                java.util.Locale.ROOT,
                                "%.1f %%",
                                100 * dc / a.costPerMetre().total()))
                        .append(")\n");
            }
        }
        out.append('\n')
                .append(Character.toUpperCase(METHOD.charAt(0)))
                .append(METHOD.substring(1))
                .append(".\n");
        return out.toString();
    }

    public static String json(Settings settings, List<SectionFrontier.Result> results, String currency) {
        UnitSystem u = settings.units();
        ObjectNode root = Json.object();
        root.put("units", u.name());
        root.set("unit_labels", Json.units(u));
        root.put("code", settings.code().edition());
        root.put("caution", Caution.SHORT);
        root.put("currency", currency);
        root.put("cost_basis", Money.perLengthLabel(u));
        root.put("carbon_basis", Carbon.perLengthUnit(u) + ", " + Carbon.STAGES);
        root.put("method", METHOD);
        ArrayNode beams = root.putArray("beams");
        for (SectionFrontier.Result r : results) {
            ObjectNode b = beams.addObject();
            b.put("id", r.problem().id());
            b.put("solves", r.solves());
            ArrayNode points = b.putArray("points");
            for (SectionFrontier.Point pt : r.points()) {
                ObjectNode o = points.addObject();
                DesignJson.layout(o, pt.design().layout(), u);
                o.put(
                        "cost",
                        CostModel.UNITS.rounded(
                                Money.perLength(pt.design().costPerMetre().total(), u)));
                o.put(
                        "carbon",
                        Carbon.round(
                                Carbon.perLength(pt.design().carbonPerMetre().total(), u)));
                o.set(
                        "cost_per_length",
                        DesignJson.cost(Money.scaled(pt.design().costPerMetre(), u)));
                o.set(
                        "carbon_per_length",
                        Carbon.json(Carbon.perLength(pt.design().carbonPerMetre(), u)));
                o.put("status", pt.cheapest().status());
            }
            if (r.points().isEmpty()) {
                var d = r.first().diagnosis();
                ObjectNode dn = b.putObject("diagnosis");
                dn.put("limit", d.limit());
                dn.put("summary", DiagnosisWords.summary(d, u));
            } else {
                b.putNull("diagnosis");
            }
        }
        return Json.write(root);
    }
}
