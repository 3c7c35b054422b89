package barfit.report;

import barfit.design.Binding;
import barfit.design.CostBreakdown;
import barfit.design.CostModel;
import barfit.design.Objective;
import barfit.design.Proof;
import barfit.design.section.Design;
import barfit.design.section.DesignOutcome;
import barfit.design.section.SectionGenerator;
import barfit.design.section.SectionLayout;
import barfit.input.Settings;
import barfit.section.CheckResult;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;

/** The JSON report of {@code barfit design}. */
public final class DesignJson {
    private DesignJson() {}

    public static String render(Settings settings, List<DesignItem> outcomes, String currency, boolean trail) {
        return render(settings, outcomes, currency, trail, Objective.COST);
    }

    /** As above, for designs that minimised {@code objective} (named in the JSON when it is carbon). */
    public static String render(
            Settings settings, List<DesignItem> outcomes, String currency, boolean trail, Objective objective) {
        return render(settings, outcomes, currency, trail, objective, null);
    }

    /** As above, each design within {@code carbonCap} (the user's carbon per length; named when given). */
    public static String render(
            Settings settings,
            List<DesignItem> outcomes,
            String currency,
            boolean trail,
            Objective objective,
            Double carbonCap) {
        UnitSystem u = settings.units();
        ObjectNode root = Json.object();
        root.put("units", u.name());
        root.set("unit_labels", Json.units(u));
        root.put("code", settings.code().edition());
        root.put("caution", Caution.SHORT);
        root.put("currency", currency);
        root.put("cost_basis", "per beam when a span is given, otherwise " + Money.perLengthLabel(u));
        root.put(
                "carbon_basis",
                Carbon.unit(u) + ", " + Carbon.STAGES + ", per beam when a span is given, otherwise "
                        + Money.perLengthLabel(u));
        if (objective == Objective.CARBON) {
            root.put("objective", "carbon");
        }
        if (carbonCap != null) {
            root.put("carbon_cap", carbonCap);
        }
        ArrayNode arr = root.putArray("beams");
        for (DesignItem o : outcomes) {
            ObjectNode b = o.section() != null ? beam(o.section(), u, trail) : SpanJson.beam(o.whole(), u, trail);
            if (o.line() != null) {
                ObjectNode l = b.putObject("line");
                l.put("id", o.line().line());
                l.put("part", o.line().part());
                l.put("rounds", o.line().rounds());
                l.put("settled", o.line().settled());
                if (o.line().held()) {
                    l.put("held", true);
                }
                var one = o.line().oneSection();
                l.put("forms", one == null ? "per-span" : one.fellBack() ? "per-span (no one section fits)" : "line");
                if (one != null && !one.fellBack()) {
                    l.put("sections_analysed", one.sections());
                    l.put("sections_designed", one.designed());
                }
                if (!o.line().undesigned().isEmpty()) {
                    var none = l.putArray("undesigned");
                    o.line().undesigned().forEach(none::add);
                }
                var red = l.putArray("redistribution");
                for (int j = 0; j < o.line().asked().size(); j++) {
                    var rj = red.addObject();
                    rj.put("support", j + 1);
                    rj.put("asked", o.line().asked().get(j));
                    rj.put("used", o.line().used().get(j));
                    if (Double.isNaN(o.line().epsT().get(j))) {
                        rj.putNull("eps_t");
                    } else {
                        rj.put("eps_t", o.line().epsT().get(j));
                    }
                }
            }
            arr.add(b);
        }
        ArrayNode lines = LineJson.lines(outcomes, u);
        if (!lines.isEmpty()) {
            root.set("lines", lines);
        }
        return Json.write(root);
    }

    public static ObjectNode beam(DesignOutcome o, UnitSystem u, boolean trail) {
        var p = o.problem();
        ObjectNode b = Json.object();
        b.put("id", p.id());
        b.put("kind", "section");
        b.put("status", o.status());
        Json.put(b, "Mu", p.mu(), Dim.MOMENT, u);
        if (p.vu() != null) {
            Json.put(b, "Vu", p.vu(), Dim.FORCE, u);
        }
        if (p.hasTorsion()) {
            Json.put(b, "Tu", Math.abs(p.tu()), Dim.MOMENT, u);
            b.put("torsion", p.compatibilityTorsion() ? "compatibility" : "equilibrium");
        }
        if (p.maxDepth() != null) {
            Json.put(b, "max_depth", p.maxDepth(), Dim.LENGTH, u);
        }
        if (o.feasible()) {
            design(b, o.best(), p.span() != null, u, trail);
            ArrayNode bind = b.putArray("binding");
            for (Binding x : o.binding()) {
                ObjectNode bo = bind.addObject();
                bo.put("check", x.limit());
                bo.put("when", Words.when(x, u));
            }
            ArrayNode alts = b.putArray("alternatives");
            for (Design d : o.alternatives()) {
                ObjectNode a = alts.addObject();
                design(a, d, p.span() != null, u, false);
            }
            b.set("proof", proof(o.proof(), u));
            b.putNull("diagnosis");
        } else {
            var d = o.diagnosis();
            ObjectNode dn = b.putObject("diagnosis");
            dn.put("limit", d.limit());
            dn.put("summary", DiagnosisWords.summary(d, u));
            if (d.strongest() != null) {
                ObjectNode s = dn.putObject("strongest");
                layout(s, d.strongest(), u);
                Json.put(s, "phi_Mn", d.strongestPhiMn(), Dim.MOMENT, u);
            }
            ArrayNode fixes = dn.putArray("fixes");
            DiagnosisWords.fixes(d, u).forEach(fixes::add);
            b.set("proof", proof(o.proof(), u));
        }
        return b;
    }

    static void layout(ObjectNode o, SectionLayout l, UnitSystem u) {
        Json.put(o, "width", l.width(), Dim.LENGTH, u);
        Json.put(o, "height", l.height(), Dim.LENGTH, u);
        ObjectNode t = o.putObject("tension");
        t.put("face", l.bending().tensionFace().word());
        ArrayNode tl = t.putArray("layers");
        for (int c : l.tensionCounts()) {
            ObjectNode x = tl.addObject();
            x.put("bar", l.tensionBar().designation());
            x.put("count", c);
        }
        ObjectNode c = o.putObject("compression");
        c.put("face", l.bending().compressionFace().word());
        ObjectNode cl = c.putArray("layers").addObject();
        cl.put("bar", l.compressionBar().designation());
        cl.put("count", l.compressionCount());
        ObjectNode s = o.putObject("stirrups");
        s.put("bar", l.stirrups().bar().designation());
        s.put("legs", l.stirrups().legs());
        Json.put(s, "spacing", l.stirrups().spacing(), Dim.LENGTH, u);
        if (l.skin() != null) {
            ObjectNode k = o.putObject("skin");
            k.put("bar", l.skin().bar().designation());
            Json.put(k, "spacing", l.skin().spacing(), Dim.LENGTH, u);
        }
    }

    static void design(ObjectNode o, Design d, boolean perBeam, UnitSystem u, boolean trail) {
        layout(o, d.layout(), u);
        var r = d.report();
        var f = r.flexure();
        Json.put(o, "phi_Mn", f.phiMn(), Dim.MOMENT, u);
        Json.putRatio(o, "phi", f.phi());
        o.put("eps_t", CheckJson.round(f.epsT()));
        o.put("strain_class", f.strainClass());
        if (r.shear() != null) {
            Json.put(o, "phi_Vn", r.shear().phiVn(), Dim.FORCE, u);
        }
        o.set("cost", cost(perBeam ? d.cost() : Money.scaled(d.costPerMetre(), u)));
        o.set("cost_per_length", cost(Money.scaled(d.costPerMetre(), u)));
        if (d.carbonPerMetre() != null) {
            o.set(
                    "carbon",
                    Carbon.json(perBeam ? Carbon.mass(d.carbon(), u) : Carbon.perLength(d.carbonPerMetre(), u)));
            o.set("carbon_per_length", Carbon.json(Carbon.perLength(d.carbonPerMetre(), u)));
        }
        ArrayNode checks = o.putArray("checks");
        for (CheckResult c : r.checks()) {
            checks.add(CheckJson.check(c, u));
        }
        if (trail) {
            o.set("trail", Json.trail(r.trail(), u));
        }
    }

    static ObjectNode cost(CostBreakdown c) {
        ObjectNode o = Json.object();
        o.put("total", money(c.total()));
        o.put("concrete", money(c.concrete()));
        o.put("main_bars", money(c.mainBars()));
        o.put("stirrups", money(c.stirrups()));
        o.put("formwork", money(c.formwork()));
        o.put("depth_premium", money(c.depthPremium()));
        return o;
    }

    /** A cost rounded to the searches' unit, 1/10 000 of the currency. */
    static double money(double v) {
        return CostModel.UNITS.rounded(v);
    }

    static ObjectNode proof(Proof<SectionGenerator.Stats> p, UnitSystem u) {
        ObjectNode o = Json.object();
        o.put("solver", p.withoutSolve() ? "comparison (one candidate cheapest)" : "CP-SAT");
        o.put("status", Words.status(p.status()));
        o.put("basis", Carbon.proofBasis(p.measure(), u));
        if (p.bounded()) {
            o.put("objective", money(Carbon.proofPerLength(p.objective(), p.measure(), u)));
            o.put("bound", money(Carbon.proofPerLength(p.bound(), p.measure(), u)));
            o.put("gap", p.gap());
        } else if (p.status() == Proof.Status.UNPROVEN) { // stopped before a proof
            o.put("objective", money(Carbon.proofPerLength(p.objective(), p.measure(), u)));
            o.putNull("bound");
            o.putNull("gap");
        } else { // nothing passes: no objective to bound
            o.putNull("objective");
            o.putNull("bound");
            o.putNull("gap");
        }
        var s = p.search();
        o.put("candidates", s.candidates());
        o.put("frames", s.frames());
        o.put("frames_evaluated", s.framesEvaluated());
        o.put("frames_skipped_by_bound", s.framesPrunedByBound());
        o.put("flexure_solves", s.flexureSolves());
        o.put("workers", p.workers());
        o.put("seed", p.seed());
        return o;
    }
}
