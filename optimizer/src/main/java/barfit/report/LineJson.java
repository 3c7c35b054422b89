package barfit.report;

import barfit.design.Proof;
import barfit.design.line.LineSpans;
import barfit.design.span.SpanProblem;
import barfit.section.CheckReport;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;

/**
 * A beam line as one object in {@code design --format json}: its section, per span the bottom bars and the
 * sagging section, per support the top bars once (one entry per support, 1-based, left to right), the
 * stirrup zones and deflection of every part, the line's cost and how it was proved. The parts' full
 * detail stays in {@code beams}.
 */
final class LineJson {
    private LineJson() {}

    /** The lines among the items, in order: consecutive items of one line make one entry. */
    static ArrayNode lines(List<DesignItem> items, UnitSystem u) {
        ArrayNode out = Json.array();
        List<DesignItem> current = new ArrayList<>();
        for (DesignItem it : items) {
            if (it.line() == null) {
                continue;
            }
            if (it.line().first() && !current.isEmpty()) {
                out.add(line(current, u));
                current = new ArrayList<>();
            }
            current.add(it);
        }
        if (!current.isEmpty()) {
            out.add(line(current, u));
        }
        return out;
    }

    private static ObjectNode line(List<DesignItem> parts, UnitSystem u) {
        DesignItem.LinePart lp = parts.get(0).line();
        ObjectNode o = Json.object();
        o.put("id", lp.line());
        boolean all = parts.stream().allMatch(DesignItem::feasible);
        boolean optimal = all && parts.stream().allMatch(p -> p.whole().proof().status() == Proof.Status.OPTIMAL);
        o.put("status", !all ? "infeasible" : optimal ? "optimal" : "feasible");
        var one = lp.oneSection();
        boolean oneSection = one != null && !one.fellBack();
        o.put("forms", oneSection ? "line" : "per-span");
        var first = parts.get(0).whole().best();
        if (oneSection && first != null) {
            Json.put(o, "width", first.layout().width(), Dim.LENGTH, u);
            Json.put(o, "height", first.layout().height(), Dim.LENGTH, u);
        } else {
            o.putNull("width");
            o.putNull("height");
        }
        ArrayNode spans = o.putArray("spans");
        ArrayNode stirrups = o.putArray("stirrups");
        ArrayNode deflection = o.putArray("deflection");
        barfit.design.CostBreakdown cost = barfit.design.CostBreakdown.ZERO;
        barfit.design.CostBreakdown carbon = barfit.design.CostBreakdown.ZERO;
        for (DesignItem it : parts) {
            var d = it.whole().best();
            SpanProblem p = it.whole().problem();
            if (d == null) {
                continue;
            }
            cost = cost.plus(d.cost());
            carbon = d.carbon() == null ? null : carbon == null ? null : carbon.plus(d.carbon());
            String part = it.line().part();
            if (part.startsWith("span ")) {
                ObjectNode s = spans.addObject();
                s.put("index", Integer.parseInt(part.substring(5)));
                s.set(
                        "bottom",
                        SpanJson.layers(
                                "bottom", d.layout().bottom(), d.layout().bottomCounts()));
                CheckReport mid = d.report().sections().get(SpanProblem.Place.MID);
                if (mid != null) {
                    Json.put(s, "Mu", mid.demand().mu(), Dim.MOMENT, u);
                    Json.put(s, "phi_Mn", mid.flexure().phiMn(), Dim.MOMENT, u);
                } else {
                    s.putNull("Mu");
                    s.putNull("phi_Mn");
                }
            }
            var zones = p.zones();
            for (int i = 0; i < zones.size(); i++) {
                var st = d.layout().zoneStirrups().get(i);
                ObjectNode z = stirrups.addObject();
                z.put("part", part);
                z.put("zone", zones.get(i).name());
                z.put("bar", st.bar().designation());
                z.put("legs", st.legs());
                Json.put(z, "spacing", st.spacing(), Dim.LENGTH, u);
                Json.put(z, "from", zones.get(i).from(), Dim.SPAN, u);
                Json.put(z, "to", zones.get(i).to(), Dim.SPAN, u);
            }
            var sr = d.report().span();
            ObjectNode df = deflection.addObject();
            df.put("part", part);
            df.put("computed", sr.liveDeflection() != null);
            if (sr.liveDeflection() != null) {
                Json.put(df, "live", sr.liveDeflection(), Dim.LENGTH, u);
                Json.put(df, "live_limit", p.span() / p.limits().live(), Dim.LENGTH, u);
                Json.put(df, "long_term", sr.longTermDeflection(), Dim.LENGTH, u);
                Json.put(df, "long_term_limit", p.span() / p.limits().total(), Dim.LENGTH, u);
            } else {
                Json.put(df, "h_min", sr.hMin(), Dim.LENGTH, u);
            }
        }
        ArrayNode supports = o.putArray("supports");
        for (int j = 0; j < lp.supports().size(); j++) {
            var sb = lp.supports().get(j);
            ObjectNode s = supports.addObject();
            s.put("index", j + 1);
            s.put("redistribution", lp.used().get(j));
            if (sb == null) {
                s.putNull("top");
                s.putNull("eps_t");
                s.putNull("Mu");
                s.putNull("phi_Mn");
                continue;
            }
            var side = sb.either();
            ObjectNode top = SpanJson.layers("top", side.bar(), side.counts());
            top.put("continuous", side.continuous());
            top.put("shared", sb.shared());
            if (sb.shared() || sb.left() == null || sb.right() == null) {
                Json.put(top, "extra_bar_length", sb.extraBarLength(), Dim.SPAN, u);
            } else {
                top.set(
                        "right_side",
                        SpanJson.layers("top", sb.right().bar(), sb.right().counts()));
            }
            s.set("top", top);
            // eps_t the least of the two sides; Mu and phi_Mn those of the side working hardest
            double epsT = Double.NaN;
            double mu = 0;
            double phiMn = Double.NaN;
            double worst = -1;
            for (var x : new LineSpans.Side[] {sb.left(), sb.right()}) {
                if (x == null || x.section() == null) {
                    continue;
                }
                var f = x.section().flexure();
                epsT = Double.isNaN(epsT) ? f.epsT() : Math.min(epsT, f.epsT());
                double m = Math.abs(x.section().demand().mu());
                if (m / f.phiMn() > worst) {
                    worst = m / f.phiMn();
                    mu = m;
                    phiMn = f.phiMn();
                }
            }
            if (Double.isNaN(epsT)) {
                s.putNull("eps_t");
                s.putNull("Mu");
                s.putNull("phi_Mn");
            } else {
                s.put("eps_t", CheckJson.round(epsT));
                // hogging: the more negative of the two face moments
                Json.put(s, "Mu", -mu, Dim.MOMENT, u);
                Json.put(s, "phi_Mn", phiMn, Dim.MOMENT, u);
            }
        }
        o.set("cost", DesignJson.cost(cost));
        if (carbon != null && carbon != barfit.design.CostBreakdown.ZERO) {
            o.set("carbon", Carbon.json(Carbon.mass(carbon, u)));
        }
        if (lp.chosen()) {
            // what the search compared the chosen redistribution against
            if (Double.isFinite(lp.withoutRedistribution())) {
                o.put("cost_without_redistribution", lp.withoutRedistribution());
            } else {
                o.putNull("cost_without_redistribution");
            }
        }
        if (oneSection && !one.alternatives().isEmpty()) {
            // the cheapest line at each of the next cheapest sections
            var alts = o.putArray("alternatives");
            for (var alt : one.alternatives()) {
                ObjectNode a = alts.addObject();
                Json.put(a, "width", alt.width(), Dim.LENGTH, u);
                Json.put(a, "height", alt.height(), Dim.LENGTH, u);
                a.put("cost", alt.cost());
                var red = a.putArray("redistribution");
                alt.redistribution().forEach(red::add);
            }
        }
        DesignItem last = parts.get(parts.size() - 1);
        if (last.line().detail() != null) {
            // the line detailed bar by bar: its bending schedule and how its bars were placed
            o.set(
                    "bending_schedule",
                    BendingScheduleJson.rows(last.line().detail().schedule(), u));
            o.set("detailing", BendingScheduleJson.detailing(last.line().detail(), u));
        } else {
            o.putArray("bending_schedule");
        }
        ObjectNode proof = o.putObject("proof");
        boolean shared =
                all && parts.stream().allMatch(p -> p.whole().proof().search().withLine());
        proof.put(
                "method",
                shared
                        ? "dynamic programming along the line over every part's options, the support bars shared"
                        : "each span by CP-SAT, alone");
        proof.put("status", !all ? "infeasible" : optimal ? "optimal" : "feasible");
        boolean leastCarbon = parts.stream()
                .anyMatch(p ->
                        p.whole().proof() != null && p.whole().proof().measure() == barfit.design.Objective.CARBON);
        if (all && leastCarbon && carbon != null) {
            proof.put("objective", Carbon.mass(carbon.total(), u));
            proof.put("basis", Carbon.unit(u));
        } else if (all) {
            proof.put("objective", cost.total());
        } else {
            proof.putNull("objective");
        }
        return o;
    }
}
