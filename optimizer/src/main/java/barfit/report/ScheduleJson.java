package barfit.report;

import barfit.schedule.ScheduleResult;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

/** {@code schedule.json}: the schedule, its proof and price of standardisation, and every beam in full. */
public final class ScheduleJson {
    private ScheduleJson() {}

    public static String render(ScheduleResult r) {
        UnitSystem u = r.input().settings().units();
        ObjectNode root = Json.object();
        root.put("caution", Caution.SHORT);
        if (r.leastCarbon()) {
            root.put("objective", "carbon");
        }
        root.put("code", r.input().settings().code().edition());
        root.put("units", u.name());
        root.set("unit_labels", Json.units(u));
        root.put("currency", r.input().currency());
        ArrayNode sources = root.putArray("sources");
        r.input().sources().forEach(sources::add);
        var rationalise = r.input().rationalise();
        if (rationalise == null) {
            root.putNull("rationalise");
        } else {
            ObjectNode limits = root.putObject("rationalise");
            if (rationalise.maxSectionSizes() == null) {
                limits.putNull("max_section_sizes");
            } else {
                limits.put("max_section_sizes", rationalise.maxSectionSizes());
            }
            if (rationalise.maxBarSizes() == null) {
                limits.putNull("max_bar_sizes");
            } else {
                limits.put("max_bar_sizes", rationalise.maxBarSizes());
            }
            limits.put("groups", rationalise.groupsSameSection() ? "same_section" : "independent");
            limits.put("formwork_set_cost", rationalise.formworkSetCost());
        }
        ObjectNode sum = root.putObject("summary");
        sum.put("beams", r.beams().size());
        sum.put(
                "beams_without_design",
                r.beams().stream().filter(b -> !b.feasible()).count());
        sum.put("beams_cost", round(r.beamsCost()));
        sum.put("formwork_sets_cost", round(r.formworkSetsCost()));
        sum.put("total_cost", round(r.totalCost()));
        sum.put("own_optimum_cost", round(r.unconstrainedCost()));
        if (!Double.isNaN(r.totalCarbon())) {
            sum.put("total_carbon", round(Carbon.mass(r.totalCarbon(), u)));
            sum.put("carbon_basis", Carbon.unit(u) + ", " + Carbon.STAGES);
            if (r.leastCarbon() && !Double.isNaN(r.unconstrainedCarbon())) {
                sum.put("own_optimum_carbon", round(Carbon.mass(r.unconstrainedCarbon(), u)));
            }
        }
        ArrayNode sizes = sum.putArray("section_sizes");
        for (ScheduleResult.SectionSize s : r.sizes()) {
            ObjectNode so = sizes.addObject();
            Json.put(so, "width", s.width(), Dim.LENGTH, u);
            Json.put(so, "height", s.height(), Dim.LENGTH, u);
            ArrayNode ids = so.putArray("beams");
            s.beams().forEach(ids::add);
        }
        ArrayNode bars = sum.putArray("bar_sizes");
        r.barSizes().forEach(bars::add);
        if (r.proof() == null) {
            root.putNull("proof");
        } else {
            var p = r.proof();
            ObjectNode po = root.putObject("proof");
            var s = p.search();
            po.put("status", p.status().name());
            po.put("method", ScheduleWords.method(r));
            if (!p.bounded()) { // no schedule meets the limits: nothing to bound
                po.putNull("objective");
                po.putNull("bound");
                po.putNull("gap");
            } else {
                boolean carbon = p.measure() == barfit.design.Objective.CARBON;
                if (carbon) {
                    po.put("measure", "carbon, " + Carbon.unit(u));
                }
                po.put("objective", round(carbon ? Carbon.mass(p.objective(), u) : p.objective()));
                po.put("bound", round(carbon ? Carbon.mass(p.bound(), u) : p.bound()));
                po.put("gap", p.gap());
            }
            po.put("bar_size_sets", s.barSetsTotal());
            po.put("bar_size_sets_solved", s.barSetsSolved());
            po.put("bar_size_sets_pruned", s.barSetsPruned());
            po.put("pairs_priced", s.pairsEvaluated());
            po.put("workers", p.workers());
            po.put("seed", p.seed());
        }
        ArrayNode curve = root.putArray("standardisation");
        for (ScheduleResult.StandardisationPoint p : r.standardisation()) {
            ObjectNode c = curve.addObject();
            c.put("max_section_sizes", p.sizes());
            String key = r.leastCarbon() ? "total_carbon" : "total_cost";
            if (Double.isNaN(p.cost())) {
                c.putNull(key);
            } else {
                c.put(key, round(r.leastCarbon() ? Carbon.mass(p.cost(), u) : p.cost()));
            }
            c.put("status", p.status().name());
            ArrayNode bs = c.putArray("bar_sizes");
            p.barSizes().forEach(bs::add);
        }
        ArrayNode beams = root.putArray("beams");
        for (ScheduleResult.Beam b : r.beams()) {
            ObjectNode bo = SpanJson.beam(b.outcome(), u, false);
            if (b.beam().group() == null) {
                bo.putNull("group");
            } else {
                bo.put("group", b.beam().group());
            }
            if (Double.isNaN(b.ownOptimum())) {
                bo.putNull("own_optimum_cost");
            } else {
                bo.put("own_optimum_cost", round(b.ownOptimum()));
            }
            if (b.feasible()) {
                for (var m : bo.withArray("bars")) {
                    ((ObjectNode) m)
                            .put(
                                    "schedule_mark",
                                    b.beam().id() + "/" + m.get("mark").asText());
                }
            }
            beams.add(bo);
        }
        return Json.write(root);
    }

    private static double round(double v) {
        return Math.round(v * 100) / 100.0;
    }
}
