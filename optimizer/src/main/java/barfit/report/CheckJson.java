package barfit.report;

import barfit.input.CheckBeam;
import barfit.input.Settings;
import barfit.section.CheckReport;
import barfit.section.CheckResult;
import barfit.section.FlexureResult;
import barfit.section.LayerResult;
import barfit.section.ShearResult;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;

/** The JSON report of {@code barfit check}. */
public final class CheckJson {
    private CheckJson() {}

    public static String render(Settings settings, List<CheckBeam> beams, List<CheckReport> reports, boolean trail) {
        return render(settings, beams, reports, List.of(), trail);
    }

    /** As above, with the lines checked with their bars as built ({@code lines}, when there are any). */
    public static String render(
            Settings settings,
            List<CheckBeam> beams,
            List<CheckReport> reports,
            List<barfit.detailing.AsBuilt.Checked> lines,
            boolean trail) {
        UnitSystem u = settings.units();
        ObjectNode root = Json.object();
        root.put("units", u.name());
        root.set("unit_labels", Json.units(u));
        root.put("code", settings.code().edition());
        root.put("caution", Caution.SHORT);
        ArrayNode arr = root.putArray("beams");
        for (int i = 0; i < beams.size(); i++) {
            arr.add(beam(beams.get(i), reports.get(i), u, trail));
        }
        if (!lines.isEmpty()) {
            ArrayNode ls = root.putArray("lines");
            for (var l : lines) {
                ls.add(line(l, u, trail));
            }
        }
        return Json.write(root);
    }

    public static ObjectNode beam(CheckBeam b, CheckReport r, UnitSystem u, boolean trail) {
        FlexureResult f = r.flexure();
        ObjectNode o = Json.object();
        o.put("id", b.id());
        o.put("ok", r.ok());
        o.put("bending", f.bending().word());
        Json.put(o, "width", b.section().shape().width(), Dim.LENGTH, u);
        Json.put(o, "height", b.section().shape().height(), Dim.LENGTH, u);
        if (r.demand().mu() != null) {
            Json.put(o, "Mu", r.demand().mu(), Dim.MOMENT, u);
        }
        if (r.demand().hasTorsion()) {
            Json.put(o, "Tu", Math.abs(r.demand().tu()), Dim.MOMENT, u);
            o.put("torsion", r.demand().compatibilityTorsion() ? "compatibility" : "equilibrium");
        }
        Json.put(o, "phi_Mn", f.phiMn(), Dim.MOMENT, u);
        Json.put(o, "Mn", f.mn(), Dim.MOMENT, u);
        Json.putRatio(o, "phi", f.phi());
        o.put("eps_t", round(f.epsT()));
        o.put("strain_class", f.strainClass());
        Json.put(o, "c", f.c(), Dim.LENGTH, u);
        Json.put(o, "a", f.a(), Dim.LENGTH, u);
        Json.put(o, "d", f.d(), Dim.LENGTH, u);
        Json.put(o, "dt", f.dt(), Dim.LENGTH, u);
        ArrayNode layers = o.putArray("layers");
        for (LayerResult l : f.layers()) {
            ObjectNode lo = layers.addObject();
            lo.put("face", l.layer().face().word());
            lo.put("bar", l.layer().bar().designation());
            lo.put("count", l.layer().count());
            Json.put(lo, "depth", l.layer().fromFace(), Dim.LENGTH, u);
            Json.put(lo, "d", l.d(), Dim.LENGTH, u);
            lo.put("strain", round(l.strain()));
            Json.put(lo, "stress", l.stress(), Dim.STRESS, u);
            Json.put(lo, "force", l.force(), Dim.FORCE, u);
            // straight development length in tension of this layer as built (25.4.2.4)
            Json.put(
                    lo,
                    "ld",
                    barfit.section.Development.ofLayer(b.section(), l.layer(), barfit.section.trail.Trail.off())
                            .ld(),
                    Dim.LENGTH,
                    u);
        }
        ShearResult sh = r.shear();
        if (sh != null) {
            ObjectNode so = o.putObject("shear");
            Json.put(so, "Vu", sh.vu(), Dim.FORCE, u);
            Json.put(so, "Vc", sh.vc(), Dim.FORCE, u);
            so.put("Vc_row", sh.vcRow());
            so.put("checked", true);
            Json.put(so, "Vs", sh.vs(), Dim.FORCE, u);
            Json.put(so, "Vs_stirrups", sh.vsStirrups(), Dim.FORCE, u);
            so.put("Vs_limited", sh.vsStirrups() > sh.vs());
            Json.put(so, "phi_Vn", sh.phiVn(), Dim.FORCE, u);
        } else {
            ObjectNode so = o.putObject("shear");
            so.put("checked", false);
            so.put("note", CheckText.SHEAR_NOT_CHECKED);
        }
        ArrayNode checks = o.putArray("checks");
        for (CheckResult c : r.checks()) {
            checks.add(check(c, u));
        }
        if (trail && r.trail().isOn()) {
            o.set("trail", Json.trail(r.trail(), u));
        }
        return o;
    }

    public static ObjectNode check(CheckResult c, UnitSystem u) {
        ObjectNode co = Json.object();
        co.put("id", c.id());
        co.put("title", c.title());
        co.put("clause", c.clause());
        co.put("ok", c.pass());
        Json.put(co, "demand", c.demand(), u);
        co.put("sense", c.sense());
        Json.put(co, "limit", c.limit(), u);
        co.put("unit", u.unit(c.demand().dim()));
        Json.putRatio(co, "ratio", c.ratio());
        if (c.note() != null) {
            co.put("note", c.note());
        }
        return co;
    }

    static double round(double v) {
        return new java.math.BigDecimal(v).round(new java.math.MathContext(6)).doubleValue();
    }

    /** A checked line: its spans' section checks and its detailing (runs, checks, schedule). */
    static ObjectNode line(barfit.detailing.AsBuilt.Checked c, UnitSystem u, boolean trail) {
        ObjectNode o = Json.object();
        o.put("id", c.given().line().id());
        o.put("ok", c.ok());
        o.put("failing", LineCheckText.failures(c));
        ArrayNode parts = o.putArray("spans");
        for (var p : c.result().parts()) {
            var report = p.outcome().best().report();
            ObjectNode po = parts.addObject();
            po.put("name", p.name());
            po.put("ok", report.ok());
            ArrayNode checks = po.putArray("checks");
            for (var e : report.sections().entrySet()) {
                for (CheckResult x : e.getValue().checks()) {
                    ObjectNode xo = check(x, u);
                    xo.put("at", e.getKey().name().toLowerCase(java.util.Locale.ROOT));
                    checks.add(xo);
                }
            }
            report.zoneChecks().forEach(x -> checks.add(check(x, u)));
            report.span().checks().forEach(x -> checks.add(check(x, u)));
            if (trail) {
                ObjectNode tr = po.putObject("trail");
                for (var e : report.sections().entrySet()) {
                    tr.set(
                            e.getKey().name().toLowerCase(java.util.Locale.ROOT),
                            Json.trail(e.getValue().trail(), u));
                }
            }
        }
        ObjectNode det = BendingScheduleJson.detailing(c.detail(), u);
        det.remove("steel_cost");
        det.remove("design_steel_cost");
        det.set("bending_schedule", BendingScheduleJson.rows(c.detail().schedule(), u));
        if (trail && c.trail().isOn()) {
            det.set("trail", Json.trail(c.trail(), u));
        }
        o.set("detailing", det);
        return o;
    }
}
