package barfit.report;

import barfit.input.CheckBeam;
import barfit.input.Settings;
import barfit.section.CheckReport;
import barfit.section.CheckResult;
import barfit.section.Face;
import barfit.section.FlexureResult;
import barfit.section.LayerResult;
import barfit.section.ShearResult;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.List;
import java.util.Set;

/** The terminal report of {@code barfit check}. */
public final class CheckText {
    /** What a beam without a factored shear is told: its shear is not checked at all. */
    public static final String SHEAR_NOT_CHECKED = "shear not checked (no Vu)";

    /** Checks whose note is printed even when they pass. */
    private static final Set<String> ALWAYS_NOTED =
            Set.of("flange_width", "torsion_compatibility", "torsion_longitudinal");

    private CheckText() {}

    public static String render(Settings settings, List<CheckBeam> beams, List<CheckReport> reports, boolean trail) {
        return render(settings, beams, reports, List.of(), trail);
    }

    /** As above, with the lines checked with their bars as built. */
    public static String render(
            Settings settings,
            List<CheckBeam> beams,
            List<CheckReport> reports,
            List<barfit.detailing.AsBuilt.Checked> lines,
            boolean trail) {
        UnitSystem u = settings.units();
        StringBuilder out = new StringBuilder();
        out.append("barfit check — ")
                .append(settings.file())
                .append(" — ")
                .append(settings.code().edition())
                .append('\n');
        out.append(Caution.text()).append("\n\n");
        out.append(materials(settings)).append("\n");
        int failed = 0;
        for (int i = 0; i < beams.size(); i++) {
            out.append('\n');
            beam(beams.get(i), reports.get(i), u, trail, out);
            if (!reports.get(i).ok()) {
                failed++;
            }
        }
        for (var l : lines) {
            out.append('\n');
            LineCheckText.line(l, u, trail, out);
        }
        if (!beams.isEmpty()) {
            out.append('\n')
                    .append(beams.size())
                    .append(beams.size() == 1 ? " beam checked: " : " beams checked: ")
                    .append(beams.size() - failed)
                    .append(" pass, ")
                    .append(failed)
                    .append(" fail.\n");
        }
        if (!lines.isEmpty()) {
            long bad = lines.stream().filter(l -> !l.ok()).count();
            out.append(beams.isEmpty() ? "\n" : "")
                    .append(lines.size())
                    .append(lines.size() == 1 ? " line checked: " : " lines checked: ")
                    .append(lines.size() - bad)
                    .append(" pass, ")
                    .append(bad)
                    .append(" fail.\n");
        }
        return out.toString();
    }

    static String materials(Settings s) {
        UnitSystem u = s.units();
        var m = s.materials();
        var d = s.detailing();
        return "Materials: f'c = " + u.withUnit(m.fc(), Dim.STRESS) + ", fy = " + u.withUnit(m.fy(), Dim.STRESS)
                + ", fyt = " + u.withUnit(m.fyt(), Dim.STRESS) + ", λ = " + u.compact(m.lambda(), Dim.NUMBER)
                + ", aggregate " + u.withUnit(m.aggregate(), Dim.LENGTH) + "\n"
                + "Detailing: cover " + u.withUnit(d.cover(), Dim.LENGTH) + " to stirrups ("
                + d.exposure().key()
                + "), stirrup " + d.stirrupBar().label() + ", layer gap " + u.withUnit(d.layerGap(), Dim.LENGTH)
                + ", bars " + s.catalog().id();
    }

    static void beam(CheckBeam b, CheckReport r, UnitSystem u, boolean trail, StringBuilder out) {
        FlexureResult f = r.flexure();
        String verdict;
        if (r.ok()) {
            verdict = "PASS";
            var fx = r.check("flexure");
            var vs = r.check("shear_strength");
            if (fx.isPresent() || vs.isPresent()) {
                verdict += " ("
                        + fx.map(c -> "Mu/φMn = " + Words.ratio(c.ratio())).orElse("")
                        + (fx.isPresent() && vs.isPresent() ? ", " : "")
                        + vs.map(c -> "Vu/φVn = " + Words.ratio(c.ratio())).orElse("") + ")";
            }
            if (r.shear() == null) {
                verdict += "; " + SHEAR_NOT_CHECKED;
            }
        } else {
            StringBuilder sb = new StringBuilder("FAIL: ");
            List<CheckResult> fails = r.failures();
            for (int i = 0; i < fails.size(); i++) {
                sb.append(i == 0 ? "" : ", ").append(fails.get(i).id());
            }
            if (r.shear() == null) {
                sb.append("; ").append(SHEAR_NOT_CHECKED);
            }
            verdict = sb.toString();
        }
        out.append("Beam ")
                .append(b.id())
                .append("  ")
                .append(Words.shape(b.section().shape(), u))
                .append("  ")
                .append(verdict)
                .append('\n');
        out.append("  bottom: ")
                .append(Words.layers(b.section().layersOn(Face.BOTTOM)))
                .append("   top: ")
                .append(Words.layers(b.section().layersOn(Face.TOP)))
                .append("   stirrups: ")
                .append(Words.stirrups(b.section().stirrups(), u))
                .append('\n');
        StringBuilder line = new StringBuilder("  ");
        if (r.demand().mu() != null) {
            line.append("Mu = ")
                    .append(u.withUnit(Math.abs(r.demand().mu()), Dim.MOMENT))
                    .append(' ')
                    .append(f.bending().word())
                    .append("   ");
        } else {
            line.append("no Mu given: capacity in ").append(f.bending().word()).append("   ");
        }
        line.append("φMn = ")
                .append(u.withUnit(f.phiMn(), Dim.MOMENT))
                .append("   φ = ")
                .append(Words.phi(f.phi()))
                .append(" (")
                .append(f.strainClass())
                .append(")   εt = ")
                .append(Words.fixed(f.epsT(), 5));
        out.append(line).append('\n');
        out.append("  c = ")
                .append(u.withUnit(f.c(), Dim.LENGTH))
                .append("   a = ")
                .append(u.withUnit(f.a(), Dim.LENGTH))
                .append("   d = ")
                .append(u.withUnit(f.d(), Dim.LENGTH))
                .append("   dt = ")
                .append(u.withUnit(f.dt(), Dim.LENGTH))
                .append('\n');
        if (b.span() != null && b.span().ends() == null) {
            out.append("  minimum depth (Table 9.3.1.1) not checked: the span is given without its ends\n");
        }
        ShearResult sh = r.shear();
        if (sh != null) {
            out.append("  Vu = ")
                    .append(u.withUnit(sh.vu(), Dim.FORCE))
                    .append("   φVn = φ (Vc + Vs) = ")
                    .append(u.withUnit(sh.phiVn(), Dim.FORCE))
                    .append("   Vc = ")
                    .append(u.withUnit(sh.vc(), Dim.FORCE))
                    .append(" (row ")
                    .append(sh.vcRow())
                    .append(")   Vs = ")
                    .append(u.withUnit(sh.vs(), Dim.FORCE));
            if (sh.vsStirrups() > sh.vs()) {
                out.append(" (the stirrups give ")
                        .append(u.withUnit(sh.vsStirrups(), Dim.FORCE))
                        .append("; Vs is limited to Vs,max = ")
                        .append(r.section().code().vsMax().shown())
                        .append(" √f'c bw d, 22.5.1.2)");
            }
            out.append('\n');
        } else {
            out.append("  ")
                    .append(SHEAR_NOT_CHECKED)
                    .append(": give Vu to check shear strength, minimum stirrups " + "and their spacing\n");
        }
        if (r.demand().hasTorsion()) {
            out.append("  Tu = ")
                    .append(u.withUnit(Math.abs(r.demand().tu()), Dim.MOMENT))
                    .append(r.demand().compatibilityTorsion() ? " (compatibility torsion)" : " (equilibrium torsion)")
                    .append('\n');
        }
        out.append('\n');
        TextTable layers = new TextTable(false, false, true, true, true, true, true);
        layers.row(
                "layer",
                "bars",
                "d (" + u.unit(Dim.LENGTH) + ")",
                "strain",
                "stress (" + u.unit(Dim.STRESS) + ")",
                "force (" + u.unit(Dim.FORCE) + ")",
                "ld (" + u.unit(Dim.LENGTH) + ")");
        for (LayerResult l : f.layers()) {
            String name = l.layer().face().word() + " @ " + u.number(l.layer().fromFace(), Dim.LENGTH);
            layers.row(
                    name,
                    l.layer().count() + " " + l.layer().bar().label(),
                    u.number(l.d(), Dim.LENGTH),
                    Words.fixed(l.strain(), 5),
                    u.number(l.stress(), Dim.STRESS),
                    u.number(l.force(), Dim.FORCE),
                    u.number(
                            barfit.section.Development.ofLayer(r.section(), l.layer(), barfit.section.trail.Trail.off())
                                    .ld(),
                            Dim.LENGTH));
        }
        layers.write("  ", out);
        out.append("  (strain and stress: + tension, − compression; ld: straight development length in tension "
                + "of the layer as built, 25.4.2.4)\n\n");
        TextTable t = new TextTable(false, false, true, false, true, true, false);
        t.row("check", "clause", "value", "", "limit", "ratio", "result");
        for (CheckResult c : r.checks()) {
            t.row(
                    c.title(),
                    c.clause(),
                    Words.value(c.demand(), u),
                    c.sense().equals("<=") ? "≤" : "≥",
                    Words.value(c.limit(), u),
                    Words.ratio(c.ratio()),
                    c.pass() ? "ok" : "FAIL");
        }
        t.write("  ", out);
        for (CheckResult c : r.checks()) {
            // the flange's note says which width the analysis took and what is left to the engineer; a
            // reduced compatibility torsion asks for the adjoining members, and Al says what it counted
            if (c.note() != null && (!c.pass() || ALWAYS_NOTED.contains(c.id()))) {
                out.append("  note, ")
                        .append(c.id())
                        .append(": ")
                        .append(c.note())
                        .append('\n');
            }
        }
        if (trail && r.trail().isOn()) {
            out.append("\n  Calculation trail\n");
            TrailText.write(r.trail(), u, "    ", out);
        }
    }
}
