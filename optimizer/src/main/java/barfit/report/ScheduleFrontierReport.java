package barfit.report;

import barfit.design.CostModel;
import barfit.design.SupportedFrontier;
import barfit.schedule.ScheduleFrontier;
import barfit.schedule.ScheduleResult;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** A schedule's cost-carbon frontier ({@code barfit frontier --schedule}): a table, JSON, and a chart's entry. */
public final class ScheduleFrontierReport {
    private ScheduleFrontierReport() {}

    static final String METHOD = "the two ends are the schedules of schedule --objective cost and --objective "
            + "carbon; each schedule between them minimises cost + p × carbon for a price of carbon p (the "
            + "weighted-sum method, p from the line through two neighbouring schedules, Aneja and Nair's "
            + "dichotomic search), proven for that sum (every beam at its own optimum; with a rationalise: "
            + "block, the rationalised schedule, a set of forms counted as money), so each is the cheapest "
            + "schedule within its own total carbon; schedules in a concave stretch between two points, optimal "
            + "at no price, are not listed";

    /** The schedule's title: its file and its CSV. */
    private static String sources(ScheduleResult r) {
        return String.join(" + ", r.input().sources());
    }

    public static String text(ScheduleFrontier.Result f, int most) {
        ScheduleResult first = f.first();
        UnitSystem u = first.input().settings().units();
        StringBuilder out = new StringBuilder();
        out.append("barfit frontier — ")
                .append(sources(first))
                .append(" — ")
                .append(first.input().settings().code().edition())
                .append('\n');
        out.append(Caution.text()).append('\n');
        out.append(DesignText.CARBON_NOTE).append("\n\n");
        out.append("Schedule: ").append(first.beams().size()).append(" beams\n");
        if (f.points().isEmpty()) {
            List<String> none = new ArrayList<>();
            first.beams().stream()
                    .filter(b -> !b.feasible())
                    .forEach(b -> none.add(b.beam().id()));
            out.append("  no frontier: ")
                    .append(none.size())
                    .append(none.size() == 1 ? " beam has" : " beams have")
                    .append(" no passing design (")
                    .append(String.join(", ", none))
                    .append("); run barfit schedule on the file for each one's diagnosis\n");
            return out.toString();
        }
        String cur =
                first.input().currency().isEmpty() ? "" : " (" + first.input().currency() + ")";
        out.append("  ")
                .append(f.points().size())
                .append(
                        f.points().size() == 1
                                ? " schedule: the cheapest is also the lowest in carbon ("
                                : " schedules, from the cheapest to the lowest-carbon (")
                .append(f.solves())
                .append(" schedules designed):\n");
        TextTable t = new TextTable(true, true, true, true, true);
        t.row(
                "#",
                "price of carbon" + cur + " per t CO2e",
                "total cost" + cur,
                "total carbon " + Carbon.unit(u),
                "beams unlike the cheapest");
        var points = f.points();
        int k = 1;
        for (var pt : points) {
            t.row(
                    String.valueOf(k++),
                    price(pt),
                    Money.amount(CostModel.currency(pt.cost())),
                    Carbon.amount(Carbon.mass(CostModel.currency(pt.carbon()), u)),
                    String.valueOf(changed(points.get(0).answer(), pt.answer())));
        }
        t.write("    ", out);
        if (points.size() > 1) {
            var a = points.get(0);
            var b = points.get(points.size() - 1);
            double dc = CostModel.currency(b.cost() - a.cost());
            double dk = CostModel.currency(a.carbon() - b.carbon());
            out.append("  from end to end: ")
                    .append(Carbon.amount(Carbon.mass(dk, u)))
                    .append(' ')
                    .append(Carbon.unit(u))
                    .append(" less carbon (")
                    .append(String.format(Locale.ROOT, "%.1f %%", 100 * dk / CostModel.currency(a.carbon())))
                    .append(") for ")
                    .append(Money.amount(dc))
                    .append(" more (")
                    .append(String.format(Locale.ROOT, "%.1f %%", 100 * dc / CostModel.currency(a.cost())))
                    .append(")\n");
        }
        if (!f.complete()) {
            out.append("  (at most ")
                    .append(most)
                    .append(" schedules between the ends, as --points asks; more lie between them)\n");
        }
        out.append('\n')
                .append(Character.toUpperCase(METHOD.charAt(0)))
                .append(METHOD.substring(1))
                .append(".\n");
        return out.toString();
    }

    public static String json(ScheduleFrontier.Result f) {
        ScheduleResult first = f.first();
        UnitSystem u = first.input().settings().units();
        ObjectNode root = Json.object();
        root.put("units", u.name());
        root.put("code", first.input().settings().code().edition());
        root.put("caution", Caution.SHORT);
        root.put("currency", first.input().currency());
        root.put("carbon_basis", Carbon.unit(u) + ", " + Carbon.STAGES);
        root.put("method", METHOD);
        root.put("beams", first.beams().size());
        root.put("solves", f.solves());
        root.put("complete", f.complete());
        ArrayNode points = root.putArray("points");
        for (var pt : f.points()) {
            ObjectNode o = points.addObject();
            o.put("cost", CostModel.currency(pt.cost()));
            o.put("carbon", Carbon.round(Carbon.mass(CostModel.currency(pt.carbon()), u)));
            if (pt.costWeight() > 0) {
                o.put("carbon_price_per_t", CostModel.UNITS.rounded(carbonPricePerTonne(pt)));
            } else {
                o.putNull("carbon_price_per_t");
            }
            o.put("beams_unlike_cheapest", changed(f.points().get(0).answer(), pt.answer()));
            ArrayNode beams = o.putArray("designs");
            for (ScheduleResult.Beam b : pt.answer().beams()) {
                ObjectNode x = beams.addObject();
                x.put("id", b.beam().id());
                var d = b.outcome().best();
                Json.put(x, "width", d.layout().width(), Dim.LENGTH, u);
                Json.put(x, "height", d.layout().height(), Dim.LENGTH, u);
                x.put("cost", CostModel.UNITS.rounded(d.cost().total()));
                x.put("carbon", Carbon.round(Carbon.mass(d.carbon().total(), u)));
            }
        }
        if (f.points().isEmpty()) {
            ArrayNode none = root.putArray("without_design");
            first.beams().stream()
                    .filter(b -> !b.feasible())
                    .forEach(b -> none.add(b.beam().id()));
        }
        return Json.write(root);
    }

    /** The frontier as a chart's entry: one row per schedule, its totals. */
    public static FrontierReport.Entry entry(ScheduleFrontier.Result f) {
        UnitSystem u = f.first().input().settings().units();
        List<FrontierReport.Row> rows = new ArrayList<>();
        for (var pt : f.points()) {
            rows.add(new FrontierReport.Row(
                    "",
                    o -> {},
                    CostModel.currency(pt.cost()),
                    Carbon.mass(CostModel.currency(pt.carbon()), u),
                    null,
                    null,
                    "optimal"));
        }
        return new FrontierReport.Entry(
                "schedule", "Schedule " + sources(f.first()), "the schedule", rows, f.solves(), f.complete(), null);
    }

    /** The price of carbon (currency per tonne CO2e) at which a point was found: its weights' ratio. */
    private static double carbonPricePerTonne(SupportedFrontier.Point<ScheduleResult> pt) {
        return 1000.0 * pt.carbonWeight() / pt.costWeight();
    }

    private static String price(SupportedFrontier.Point<ScheduleResult> pt) {
        if (pt.carbonWeight() == 0) {
            return "0 (cost only)";
        }
        if (pt.costWeight() == 0) {
            return "no limit (carbon only)";
        }
        return Money.amount(carbonPricePerTonne(pt));
    }

    /** How many beams a schedule designs otherwise than the cheapest does. */
    private static int changed(ScheduleResult cheapest, ScheduleResult other) {
        int n = 0;
        for (int i = 0; i < other.beams().size(); i++) {
            if (!other.beams()
                    .get(i)
                    .outcome()
                    .best()
                    .layout()
                    .equals(cheapest.beams().get(i).outcome().best().layout())) {
                n++;
            }
        }
        return n;
    }
}
