package barfit.report;

import barfit.input.Settings;
import barfit.section.trail.Dim;
import barfit.study.Compare;
import barfit.study.Summary;
import barfit.study.Sweep;
import barfit.units.UnitSystem;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;

/** JSON of {@code compare} and {@code sweep}. */
public final class StudyJson {
    private StudyJson() {}

    static ObjectNode root(Settings s) {
        ObjectNode root = Json.object();
        root.put("units", s.units().name());
        root.set("unit_labels", Json.units(s.units()));
        root.put("code", s.code().edition());
        root.put("caution", Caution.SHORT);
        return root;
    }

    static double cost(double v, UnitSystem u, boolean perBeam) {
        return DesignJson.money(perBeam ? v : Money.perLength(v, u));
    }

    static void summary(ObjectNode o, Summary s, UnitSystem u, boolean perBeam) {
        o.put("feasible", s.feasible());
        if (!s.feasible()) {
            o.put("reason", s.proof());
            if (s.limit() != null && !s.limit().isEmpty()) {
                o.put("limit", s.limit());
            }
            return;
        }
        Json.put(o, "width", s.width(), Dim.LENGTH, u);
        Json.put(o, "height", s.height(), Dim.LENGTH, u);
        ObjectNode c = o.putObject("cost");
        var b = perBeam ? s.cost() : Money.scaled(s.cost(), u);
        c.put("total", DesignJson.money(b.total()));
        c.put("concrete", DesignJson.money(b.concrete()));
        c.put("main_bars", DesignJson.money(b.mainBars()));
        c.put("stirrups", DesignJson.money(b.stirrups()));
        c.put("formwork", DesignJson.money(b.formwork()));
        c.put("depth_premium", DesignJson.money(b.depthPremium()));
        if (s.carbon() != null) {
            o.set("carbon", Carbon.json(perBeam ? Carbon.mass(s.carbon(), u) : Carbon.perLength(s.carbon(), u)));
        }
        o.put("compression_steel_needed", s.compressionRequired());
        o.put("compression_steel_relied_on", s.compressionNeeded());
        o.put("compression_steel_used", s.compressionUsed());
        if (s.compressionNeeded()) {
            o.put("hangers_alone_fail", s.hangersFail());
        }
        o.put("stirrups", s.stirrups());
        ObjectNode t = o.putObject("tension");
        t.put("face", s.tensionFace());
        ArrayNode tl = t.putArray("layers");
        for (int n : s.tensionCounts()) {
            ObjectNode x = tl.addObject();
            x.put("bar", s.tensionBar());
            x.put("count", n);
        }
        ObjectNode cm = o.putObject("compression");
        cm.put("face", s.compressionFace());
        ObjectNode cl = cm.putArray("layers").addObject();
        cl.put("bar", s.compressionBar());
        cl.put("count", s.compressionCount());
        o.put("description", s.tension() + "; " + s.compression() + "; stirrups " + s.stirrups());
        Json.put(o, "phi_Mn", s.phiMn(), Dim.MOMENT, u);
        Json.put(o, "Mu", s.mu(), Dim.MOMENT, u);
        o.put("eps_t", CheckJson.round(s.epsT()));
        Json.putRatio(o, "phi", s.phi());
        o.put("strain_class", s.strainClass());
        o.put("longitudinal_bars", s.longitudinalBars());
        o.put("layers", s.layers());
    }

    public static String compare(Settings settings, List<Compare.Result> results, List<Boolean> perBeam) {
        UnitSystem u = settings.units();
        ObjectNode root = root(settings);
        ArrayNode beams = root.putArray("beams");
        for (int i = 0; i < results.size(); i++) {
            Compare.Result r = results.get(i);
            ObjectNode b = beams.addObject();
            b.put("id", r.id());
            Json.put(b, "cap", r.cap(), Dim.LENGTH, u);
            b.put("cost_basis", perBeam.get(i) ? "per beam" : Money.perLengthLabel(u));
            ArrayNode opts = b.putArray("options");
            for (Compare.Option o : r.options()) {
                ObjectNode x = opts.addObject();
                x.put("kind", o.kind());
                x.put("label", o.label());
                if (o.fc() != null) {
                    Json.put(x, "fc", o.fc(), Dim.STRESS, u);
                }
                summary(x, o.summary(), u, perBeam.get(i));
            }
            if (r.recommended() == null) {
                b.putNull("recommended");
                b.putNull("recommended_label");
            } else {
                b.put("recommended", r.recommended());
                b.put("recommended_label", r.best().label());
            }
            if (r.recommendedFc() == null) {
                b.putNull("recommended_fc");
            } else {
                Json.put(b, "recommended_fc", r.recommendedFc(), Dim.STRESS, u);
            }
            ArrayNode reasons = b.putArray("reasons");
            r.reasons().forEach(reasons::add);
        }
        return Json.write(root);
    }

    public static String sweep(Settings settings, List<Sweep.Result> results, List<Boolean> perBeam) {
        UnitSystem u = settings.units();
        ObjectNode root = root(settings);
        ArrayNode beams = root.putArray("beams");
        for (int i = 0; i < results.size(); i++) {
            Sweep.Result r = results.get(i);
            ObjectNode b = beams.addObject();
            b.put("id", r.id());
            b.put("cost_basis", perBeam.get(i) ? "per beam" : Money.perLengthLabel(u));
            ArrayNode pts = b.putArray("points");
            for (Sweep.Point p : r.points()) {
                ObjectNode x = pts.addObject();
                Json.put(x, "cap", p.cap(), Dim.LENGTH, u);
                Summary s = p.summary();
                x.put("feasible", s.feasible());
                if (s.feasible()) {
                    x.put("cost", cost(s.cost().total(), u, perBeam.get(i)));
                    if (s.byCarbon()) {
                        x.put(
                                "carbon",
                                Carbon.round(
                                        perBeam.get(i)
                                                ? Carbon.mass(s.carbon().total(), u)
                                                : Carbon.perLength(s.carbon().total(), u)));
                    }
                    Json.put(x, "width", s.width(), Dim.LENGTH, u);
                    Json.put(x, "height", s.height(), Dim.LENGTH, u);
                    x.put("compression_steel_needed", s.compressionRequired());
                    x.put("compression_steel_relied_on", s.compressionNeeded());
                    x.put("hangers_only_possible", r.hangersFrom() != null && p.cap() >= r.hangersFrom() - 1e-9);
                    x.put("tension", s.tension());
                    x.put("eps_t", CheckJson.round(s.epsT()));
                } else {
                    x.putNull("cost");
                }
            }
            if (r.shallowestFeasible() == null) {
                b.putNull("shallowest_feasible");
            } else {
                Json.put(b, "shallowest_feasible", r.shallowestFeasible(), Dim.LENGTH, u);
            }
            if (r.compressionNeededBelow() == null) {
                b.putNull("compression_needed_below");
            } else {
                Json.put(b, "compression_needed_below", r.compressionNeededBelow(), Dim.LENGTH, u);
            }
            // which a null compression_needed_below means: needed at every cap of the range, or at none
            b.put("compression_needed_everywhere", r.compression().equals("everywhere"));
            b.put(
                    "compression_note",
                    switch (r.compression()) {
                        case "below" -> "needed below compression_needed_below";
                        case "everywhere" ->
                            "needed at every cap in the range: the minimum hangers alone work at no depth up to "
                                    + "the last cap";
                        default ->
                            r.shallowestFeasible() == null
                                    ? "nothing passes in the range"
                                    : "not needed within the range: at every cap with a passing design the minimum hangers alone "
                                            + "can work";
                    });
            Json.put(b, "first_cap", r.firstCap(), Dim.LENGTH, u);
            Json.put(b, "last_cap", r.lastCap(), Dim.LENGTH, u);
            ObjectNode chosen = b.putObject("design");
            Json.put(chosen, "cap", r.chosenCap(), Dim.LENGTH, u);
            summary(chosen, r.chosen(), u, perBeam.get(i));
        }
        return Json.write(root);
    }
}
