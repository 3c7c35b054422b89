package barfit.report;

import barfit.design.Proof;
import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.section.CheckReport;
import barfit.section.CheckResult;
import barfit.section.FlexureResult;
import barfit.section.LayerResult;
import barfit.section.SpanChecks;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/** The JSON of one whole span in {@code barfit design}. */
public final class SpanJson {
    private SpanJson() {}

    /** A size at which the span designs ({@code null} when none was found). */
    private static void fix(ObjectNode dn, String key, SpanDesigner.Fix f, UnitSystem u) {
        if (f == null) {
            dn.putNull(key);
            return;
        }
        ObjectNode o = dn.putObject(key);
        Json.put(o, "width", f.width(), Dim.LENGTH, u);
        Json.put(o, "height", f.height(), Dim.LENGTH, u);
    }

    public static ObjectNode beam(SpanDesigner.Outcome o, UnitSystem u, boolean trail) {
        SpanProblem p = o.problem();
        ObjectNode b = Json.object();
        b.put("id", p.id());
        b.put("kind", "span");
        b.put("status", o.status());
        Json.put(b, "span", p.span(), Dim.SPAN, u);
        b.put("ends", p.ends().key());
        if (p.hasTorsion()) {
            ObjectNode t = b.putObject("torsion");
            Json.put(t, "left", p.torsion().left(), Dim.MOMENT, u);
            Json.put(t, "mid", p.torsion().mid(), Dim.MOMENT, u);
            Json.put(t, "right", p.torsion().right(), Dim.MOMENT, u);
            t.put("kind", p.torsion().compatibility() ? "compatibility" : "equilibrium");
            t.put("along", SpanText.torsionAlong(p.torsion()));
        }
        if (p.maxDepth() != null) {
            Json.put(b, "max_depth", p.maxDepth(), Dim.LENGTH, u);
        }
        if (!o.feasible()) {
            ObjectNode dn = b.putObject("diagnosis");
            SpanDesigner.Diagnosis d = o.diagnosis();
            dn.put("limit", d.limit());
            dn.put("clause", d.clause());
            dn.put("summary", DiagnosisWords.summary(d, u));
            ArrayNode fixes = dn.putArray("fixes");
            DiagnosisWords.fixes(d, u).forEach(fixes::add);
            fix(dn, "deeper", d.deeper(), u);
            fix(dn, "wider", d.wider(), u);
            return b;
        }
        ArrayNode warnings = b.putArray("warnings");
        SpanText.warnings(p).forEach(warnings::add);
        design(b, o.best(), p, u, trail);
        ArrayNode bind = b.putArray("binding");
        o.binding().forEach(x -> {
            ObjectNode bo = bind.addObject();
            bo.put("check", x.limit());
            bo.put("when", Words.when(x, u));
        });
        ArrayNode alts = b.putArray("alternatives");
        for (SpanDesigner.Design d : o.alternatives()) {
            design(alts.addObject(), d, p, u, false);
        }
        var pr = o.proof();
        ObjectNode proof = b.putObject("proof");
        boolean withLine = pr.search().withLine();
        proof.put(
                "solver",
                withLine
                        ? "dynamic programming along the line"
                        : pr.search().enumerated() ? "enumeration (one combination cheapest)" : "CP-SAT");
        proof.put("status", Words.status(pr.status()));
        proof.put(
                "basis",
                (withLine ? "with its line (shared support bars)" : "per span")
                        + (pr.measure() == barfit.design.Objective.CARBON ? ", " + Carbon.unit(u) : ""));
        if (pr.bounded()) {
            proof.put("objective", Carbon.proofTotal(pr.objective(), pr.measure(), u));
            proof.put("bound", Carbon.proofTotal(pr.bound(), pr.measure(), u));
            proof.put("gap", pr.gap());
        } else if (pr.status() == Proof.Status.UNPROVEN) { // stopped by the time limit before a proof
            proof.put("objective", Carbon.proofTotal(pr.objective(), pr.measure(), u));
            proof.putNull("bound");
            proof.putNull("gap");
        } else { // no design: nothing to bound
            proof.putNull("objective");
            proof.putNull("bound");
            proof.putNull("gap");
        }
        var s = pr.search();
        proof.put("booleans", pr.solver().booleans());
        proof.put("frames", s.generator().frames());
        proof.put("frames_evaluated", s.generator().framesEvaluated());
        proof.put("frames_skipped_by_bound", s.generator().framesSkipped());
        proof.put("solves", s.solves());
        proof.put("deflection_cuts", s.deflectionCuts());
        proof.put("workers", pr.workers());
        proof.put("seed", pr.seed());
        b.putNull("diagnosis");
        return b;
    }

    static ObjectNode layers(String face, barfit.catalogs.BarSize bar, List<Integer> counts) {
        ObjectNode t = Json.object();
        t.put("face", face);
        ArrayNode arr = t.putArray("layers");
        for (int c : counts) {
            ObjectNode x = arr.addObject();
            x.put("bar", bar.designation());
            x.put("count", c);
        }
        return t;
    }

    private static double ratio(CheckReport r) {
        return Math.abs(r.demand().mu()) / r.flexure().phiMn();
    }

    /** A span's size and bars: width, height, bottom and top bars with the extensions past the supports. */
    static void outline(ObjectNode o, SpanLayout l, SpanProblem p, UnitSystem u) {
        Json.put(o, "width", l.width(), Dim.LENGTH, u);
        Json.put(o, "height", l.height(), Dim.LENGTH, u);
        o.set("bottom", layers("bottom", l.bottom(), l.bottomCounts()));
        ObjectNode top = o.putObject("top");
        top.put("bar", l.top().designation());
        top.put("continuous", l.topContinuous());
        if (l.topLeft() != null) {
            top.set("left", layers("top", l.top(), l.topLeft()).get("layers"));
            // past the support face, as for a span's extra bars; a cantilever's bars also run its full length
            Json.put(top, "left_extension", p.cantilever() ? l.extLeft() - p.span() : l.extLeft(), Dim.SPAN, u);
            if (p.cantilever()) {
                Json.put(top, "length", l.extLeft(), Dim.SPAN, u);
            }
        }
        if (l.topRight() != null) {
            top.set("right", layers("top", l.top(), l.topRight()).get("layers"));
            Json.put(top, "right_extension", l.extRight(), Dim.SPAN, u);
        }
    }

    /** A span's stirrups per zone: bar, legs, spacing and the zone's extent from the left face. */
    static ArrayNode stirrups(SpanLayout l, SpanProblem p, UnitSystem u) {
        ArrayNode stirrups = Json.array();
        List<SpanProblem.Zone> zones = p.zones();
        for (int i = 0; i < zones.size(); i++) {
            ObjectNode z = stirrups.addObject();
            var s = l.zoneStirrups().get(i);
            z.put("zone", zones.get(i).name());
            z.put("bar", s.bar().designation());
            z.put("legs", s.legs());
            Json.put(z, "spacing", s.spacing(), Dim.LENGTH, u);
            Json.put(z, "from", zones.get(i).from(), Dim.SPAN, u);
            Json.put(z, "to", zones.get(i).to(), Dim.SPAN, u);
        }
        return stirrups;
    }

    static void design(ObjectNode o, SpanDesigner.Design d, SpanProblem p, UnitSystem u, boolean trail) {
        SpanLayout l = d.layout();
        outline(o, l, p, u);
        // the single-section fields at span level: those of the section with the highest Mu / phi Mn
        Map.Entry<SpanProblem.Place, CheckReport> governing = null;
        for (Map.Entry<SpanProblem.Place, CheckReport> e : d.report().sections().entrySet()) {
            if (governing == null || ratio(e.getValue()) > ratio(governing.getValue())) {
                governing = e;
            }
        }
        ArrayNode sections = o.putArray("sections");
        for (Map.Entry<SpanProblem.Place, CheckReport> e : d.report().sections().entrySet()) {
            ObjectNode s = sections.addObject();
            s.put("at", e.getKey().name().toLowerCase(Locale.ROOT));
            FlexureResult f = e.getValue().flexure();
            var bending = f.bending();
            ArrayNode tl = Json.array();
            ArrayNode cl = Json.array();
            for (LayerResult lr : f.layers()) {
                ObjectNode x = (lr.layer().face() == bending.tensionFace() ? tl : cl).addObject();
                x.put("bar", lr.layer().bar().designation());
                x.put("count", lr.layer().count());
            }
            ObjectNode tension = s.putObject("tension");
            tension.put("face", bending.tensionFace().word());
            tension.set("layers", tl);
            ObjectNode compression = s.putObject("compression");
            compression.put("face", bending.compressionFace().word());
            compression.set("layers", cl);
            Json.put(s, "phi_Mn", f.phiMn(), Dim.MOMENT, u);
            Json.put(s, "Mu", e.getValue().demand().mu(), Dim.MOMENT, u);
            s.put("eps_t", CheckJson.round(f.epsT()));
            Json.putRatio(s, "phi", f.phi());
            ArrayNode checks = s.putArray("checks");
            for (CheckResult c : e.getValue().checks()) {
                checks.add(CheckJson.check(c, u));
            }
            if (trail) {
                s.set("trail", Json.trail(e.getValue().trail(), u));
            }
        }
        if (governing != null) {
            for (var node : sections) {
                if (node.get("at").asText().equals(governing.getKey().name().toLowerCase(Locale.ROOT))) {
                    o.put("governing_section", node.get("at").asText());
                    for (String k : new String[] {"tension", "compression", "phi_Mn", "Mu", "eps_t", "phi"}) {
                        o.set(k, node.get(k));
                    }
                }
            }
        }
        ArrayNode stirrups = stirrups(l, p, u);
        o.set("stirrups", stirrups);
        List<SpanProblem.Zone> zones = p.zones();
        for (int i = 0; i < zones.size(); i++) {
            ObjectNode z = (ObjectNode) stirrups.get(i);
            Double zoneVu = d.report().zoneShears().get(i);
            if (zoneVu != null) {
                Json.put(z, "Vu", zoneVu, Dim.FORCE, u);
            }
            Double zoneTu = d.report().zoneTorsions().get(i);
            if (zoneTu != null) {
                Json.put(z, "Tu", zoneTu, Dim.MOMENT, u);
            }
        }
        ArrayNode zoneChecks = o.putArray("zone_checks");
        d.report().zoneChecks().forEach(c -> zoneChecks.add(CheckJson.check(c, u)));
        var sr = d.report().span();
        ObjectNode defl = o.putObject("deflection");
        Json.put(defl, "h_min", sr.hMin(), Dim.LENGTH, u);
        defl.put("computed", sr.liveDeflection() != null);
        if (sr.liveDeflection() != null) {
            Json.put(defl, "live", sr.liveDeflection(), Dim.LENGTH, u);
            Json.put(defl, "live_limit", p.span() / p.limits().live(), Dim.LENGTH, u);
            Json.put(defl, "long_term", sr.longTermDeflection(), Dim.LENGTH, u);
            Json.put(defl, "long_term_limit", p.span() / p.limits().total(), Dim.LENGTH, u);
            // what a checker needs to follow it: each critical section's stiffness and, per service level,
            // its moment and Ie, the Ie the span takes, and the immediate deflection
            ArrayNode levels = defl.putArray("levels");
            SpanChecks.LEVELS.forEach(levels::add);
            ArrayNode secs = defl.putArray("sections");
            for (SpanChecks.SectionStiffness ss : sr.sections()) {
                ObjectNode x = secs.addObject();
                x.put("at", ss.at());
                Json.put(x, "Ig", ss.stiffness().ig(), Dim.INERTIA, u);
                Json.put(x, "Icr", ss.stiffness().icr(), Dim.INERTIA, u);
                Json.put(x, "kd", ss.stiffness().kd(), Dim.LENGTH, u);
                Json.put(x, "yt", ss.stiffness().yt(), Dim.LENGTH, u);
                Json.put(x, "Mcr", ss.stiffness().mcr(), Dim.MOMENT, u);
                ArrayNode ma = x.putArray("Ma");
                ArrayNode ie = x.putArray("Ie");
                for (int i = 0; i < ss.ma().length; i++) {
                    ma.add(u.json(ss.ma()[i], Dim.MOMENT));
                    ie.add(u.json(ss.ie()[i], Dim.INERTIA));
                }
            }
            ArrayNode ieSpan = defl.putArray("Ie_span");
            for (double v : sr.ieSpan()) {
                ieSpan.add(u.json(v, Dim.INERTIA));
            }
            ArrayNode imm = defl.putArray("immediate");
            for (double v : sr.immediate()) {
                imm.add(u.json(v, Dim.LENGTH));
            }
            Json.putRatio(defl, "lambda_delta", sr.lambdaDelta());
        }
        ArrayNode spanChecks = defl.putArray("checks");
        sr.checks().forEach(c -> spanChecks.add(CheckJson.check(c, u)));
        ArrayNode bars = o.putArray("bars");
        for (SpanLayout.BarMark m : d.bars()) {
            ObjectNode x = bars.addObject();
            x.put("mark", m.mark());
            x.put("role", Words.role(m));
            x.put("bar", m.bar().designation());
            x.put("count", m.count());
            Json.put(x, "length", m.length(), Dim.SPAN, u);
        }
        o.set("bending_schedule", BendingScheduleJson.rows(barfit.detailing.SpanSchedule.of(d.bars(), p.code()), u));
        o.set("cost", DesignJson.cost(d.cost()));
        if (d.carbon() != null) {
            o.set("carbon", Carbon.json(Carbon.mass(d.carbon(), u)));
            o.set("carbon_per_length", Carbon.json(Carbon.perLength(d.carbon().times(1000.0 / p.span()), u)));
        }
    }
}
