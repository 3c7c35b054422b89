package barfit.report;

import barfit.design.Proof;
import barfit.design.span.SpanDesigner;
import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.design.span.SpanTorsion;
import barfit.section.CheckReport;
import barfit.section.CheckResult;
import barfit.section.FlexureResult;
import barfit.section.SectionChecks;
import barfit.section.SpanChecks;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/** The terminal block of one whole span in {@code barfit design}. */
public final class SpanText {
    /** The warning a span without shears gets: its stirrups are the minimum, its shear strength unchecked. */
    public static final String NO_SHEARS =
            "no shears given: minimum stirrups (Av,min at the widest spacing allowed) in "
                    + "every zone; shear strength not checked (give shear: {left, right})";

    /** How a span's torsion is taken along it (its assumption, said wherever a span carries torsion). */
    public static String torsionAlong(SpanTorsion t) {
        return (t.atFaces()
                        ? "Tu from the line's torque envelope (supports restraining twist), given at the faces and "
                                + "mid-span, straight between them and taken at d nearer a face (9.4.4.2)"
                        : "Tu taken as varying linearly from its value at d from each face to its mid-span value "
                                + "(0 unless given: a distributed torque)")
                + "; each stirrup zone designed for the largest Tu within bt + d of it (9.7.6.3.2, 9.7.5.3), with "
                + "the torsion checks of 22.7 on every bar at its section";
    }

    private SpanText() {}

    /** Warnings about what a designed span leaves unchecked: none, or the missing shears. */
    public static List<String> warnings(SpanProblem p) {
        return p.vLeft() == null && p.vRight() == null ? List.of(NO_SHEARS) : List.of();
    }

    static String len(double mm, UnitSystem u) {
        return u.compact(mm, Dim.LENGTH) + " " + u.unit(Dim.LENGTH);
    }

    static String span(double mm, UnitSystem u) {
        return u.number(mm, Dim.SPAN) + " " + u.unit(Dim.SPAN);
    }

    static String counts(List<Integer> counts, String label) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < counts.size(); i++) {
            sb.append(i == 0 ? "" : " + ").append(counts.get(i)).append(' ').append(label);
        }
        return sb.toString();
    }

    static String where(SpanProblem.Place place) {
        return switch (place) {
            case LEFT -> "left support";
            case MID -> "mid-span";
            case RIGHT -> "right support";
        };
    }

    public static void render(SpanDesigner.Outcome o, UnitSystem u, String currency, boolean trail, StringBuilder out) {
        SpanProblem p = o.problem();
        out.append("Beam ")
                .append(p.id())
                .append("   span ")
                .append(span(p.span(), u))
                .append(", ")
                .append(p.ends().words());
        if (p.maxDepth() != null) {
            out.append("   max depth ").append(len(p.maxDepth(), u));
        }
        out.append("   ").append(o.status().toUpperCase(Locale.ROOT)).append('\n');
        if (!o.feasible()) {
            var d = o.diagnosis();
            if (o.status().equals("unknown")) {
                out.append("  ")
                        .append(DiagnosisWords.summary(d, u))
                        .append("; ")
                        .append(Words.alternatives(DiagnosisWords.fixes(d, u)))
                        .append('\n');
                return;
            }
            out.append(
                    d.cause() instanceof SpanDesigner.Diagnosis.CarbonCapFails
                            ? "  no layout within the carbon cap passes.\n"
                            : "  no layout in the search space passes.\n");
            out.append("  binding limit: ")
                    .append(d.limit())
                    .append(" — ")
                    .append(DiagnosisWords.summary(d, u))
                    .append('\n');
            List<String> fixes = DiagnosisWords.fixes(d, u);
            out.append(
                    fixes.isEmpty()
                            ? "  no single relaxed limit (depth, width) gives a passing layout\n"
                            : "  what would work (one limit at a time): " + Words.alternatives(fixes) + "\n");
            return;
        }
        SpanDesigner.Design d = o.best();
        SpanLayout l = d.layout();
        for (String w : warnings(p)) {
            out.append("  WARNING: ").append(w).append('\n');
        }
        TextTable t = new TextTable(false, false);
        t.row("demand", demand(p, u));
        if (p.hasTorsion()) {
            t.row("torsion", torsionAlong(p.torsion()));
        }
        t.row(
                "section",
                Words.shape(l.shape(), u)
                        + (l.flange() == null
                                ? ""
                                : p.cantilever()
                                        ? " (flange in tension at the fixed end: not counted in strength)"
                                        : " (flange counted at mid-span)"));
        if (l.flange() != null && (p.leftSupport() || p.rightSupport())) {
            t.row(
                    "flange",
                    (p.cantilever() ? "in tension at the fixed end: " : "in tension over the supports: ")
                            + SectionChecks.tensionFlangeNote(l.shape().flange(), u.code())
                                    .replace("tension bars", "top bars"));
        }
        t.row(
                "bottom",
                counts(l.bottomCounts(), l.bottom().label()) + ", full span"
                        + (p.bottomAnchored() ? ", anchored at the supports" + bottomAtSupports(p, d) : ""));
        if (p.cantilever()) {
            t.row(
                    "top",
                    counts(l.topLeft(), l.top().label()) + ", full length and " + span(l.extLeft() - p.span(), u)
                            + " past the support face (ld of 25.4.2.4, anchorage into the back span)");
        } else {
            t.row("top continuous", l.topContinuous() + " " + l.top().label() + ", full span" + topAtMid(d, u));
            if (p.leftSupport()) {
                t.row("top at left", supportTop(p, l, l.topLeft(), l.extLeft(), u));
            }
            if (p.rightSupport()) {
                t.row("top at right", supportTop(p, l, l.topRight(), l.extRight(), u));
            }
        }
        List<SpanProblem.Zone> zones = p.zones();
        for (int i = 0; i < zones.size(); i++) {
            SpanProblem.Zone z = zones.get(i);
            var s = l.zoneStirrups().get(i);
            t.row(
                    i == 0 ? "stirrups" : "",
                    z.name() + " zone " + span(z.from(), u) + "–" + span(z.to(), u) + ": "
                            + Words.stirrups(s, u) + " (" + sets(SpanLayout.stirrupSets(z.length(), s.spacing()))
                            + (d.report().zoneShears().get(i) == null
                                    ? ", minimum"
                                    : ", Vu = "
                                            + u.withUnit(d.report().zoneShears().get(i), Dim.FORCE))
                            + (d.report().zoneTorsions().get(i) == null
                                    ? ""
                                    : ", Tu = "
                                            + u.withUnit(
                                                    d.report().zoneTorsions().get(i), Dim.MOMENT))
                            + ")");
        }
        boolean firstSection = true;
        for (Map.Entry<SpanProblem.Place, CheckReport> e : d.report().sections().entrySet()) {
            FlexureResult f = e.getValue().flexure();
            double mu = e.getValue().demand().mu();
            t.row(
                    firstSection ? "sections" : "",
                    where(e.getKey()) + ": Mu = " + u.withUnit(Math.abs(mu), Dim.MOMENT)
                            + ", φMn = " + u.withUnit(f.phiMn(), Dim.MOMENT) + " (ratio "
                            + Words.ratio(Math.abs(mu) / f.phiMn())
                            + "), εt = " + Words.fixed(f.epsT(), 5) + ", φ = " + Words.phi(f.phi()));
            firstSection = false;
        }
        t.row("deflection", deflection(d.report().span(), p, u));
        t.row("binding", binding(o.binding(), u));
        String cur = currency.isEmpty() ? "" : " (" + currency + ")";
        t.row("cost" + cur, Money.breakdown(d.cost()) + "  for the span");
        if (d.carbon() != null) {
            t.row("carbon", Carbon.breakdown(Carbon.mass(d.carbon(), u)) + " " + Carbon.unit(u) + "  for the span");
        }
        t.row("proof", proof(o.proof(), u));
        t.write("  ", out);
        out.append("  bar list:\n");
        TextTable bars = new TextTable(false, false, true, false, true);
        bars.row("mark", "role", "count", "bar", "length (" + u.unit(Dim.SPAN) + ")");
        for (SpanLayout.BarMark b : d.bars()) {
            bars.row(
                    b.mark(),
                    Words.role(b),
                    String.valueOf(b.count()),
                    b.bar().label(),
                    u.number(b.length(), Dim.SPAN));
        }
        bars.write("    ", out);
        if (!o.alternatives().isEmpty()) {
            out.append("  alternatives (next cheapest distinct section or bar sizes):\n");
            TextTable a = new TextTable(false, false, true, true);
            int k = 1;
            for (SpanDesigner.Design alt : o.alternatives()) {
                SpanLayout al = alt.layout();
                a.row(
                        "#" + k++,
                        u.compact(al.width(), Dim.LENGTH) + " × " + u.compact(al.height(), Dim.LENGTH) + "  bottom "
                                + counts(al.bottomCounts(), al.bottom().label()) + "  top "
                                + al.top().label(),
                        Money.amount(alt.cost().total()),
                        String.format(
                                Locale.ROOT,
                                "+%.1f %%",
                                100
                                        * (alt.cost().total() - d.cost().total())
                                        / d.cost().total()));
            }
            a.write("    ", out);
        }
        if (trail) {
            out.append("\n  Checks of the chosen span (section model)\n");
            TextTable ct = new TextTable(false, false, false, true, false, true, true, false);
            for (Map.Entry<SpanProblem.Place, CheckReport> e :
                    d.report().sections().entrySet()) {
                for (CheckResult c : e.getValue().checks()) {
                    ct.row(
                            where(e.getKey()),
                            c.title(),
                            c.clause(),
                            Words.value(c.demand(), u),
                            c.sense().equals("<=") ? "≤" : "≥",
                            Words.value(c.limit(), u),
                            Words.ratio(c.ratio()),
                            c.pass() ? "ok" : "FAIL");
                }
            }
            for (CheckResult c : d.report().zoneChecks()) {
                ct.row(
                        "zones",
                        c.title(),
                        c.clause(),
                        Words.value(c.demand(), u),
                        c.sense().equals("<=") ? "≤" : "≥",
                        Words.value(c.limit(), u),
                        Words.ratio(c.ratio()),
                        c.pass() ? "ok" : "FAIL");
            }
            for (CheckResult c : d.report().span().checks()) {
                ct.row(
                        "span",
                        c.title(),
                        c.clause(),
                        Words.value(c.demand(), u),
                        c.sense().equals("<=") ? "≤" : "≥",
                        Words.value(c.limit(), u),
                        Words.ratio(c.ratio()),
                        c.pass() ? "ok" : "FAIL");
            }
            ct.write("    ", out);
            for (Map.Entry<SpanProblem.Place, CheckReport> e :
                    d.report().sections().entrySet()) {
                out.append("\n  Calculation trail, ").append(where(e.getKey())).append('\n');
                TrailText.write(e.getValue().trail(), u, "    ", out);
            }
            out.append("\n  Calculation trail, stirrup zones\n");
            TrailText.write(d.report().zoneTrail(), u, "    ", out);
            out.append("\n  Calculation trail, span\n");
            TrailText.write(d.report().spanTrail(), u, "    ", out);
        }
    }

    /**
     * What the continuous top bars are at mid-span, read from the strain the section model found there: a
     * bar above the neutral axis is in compression (compression steel), one below it in tension.
     */
    public static String topAtMid(SpanDesigner.Design d, UnitSystem u) {
        double strain = strainAt(d, SpanProblem.Place.MID, barfit.section.Face.TOP);
        if (Double.isNaN(strain)) {
            return "";
        }
        String c = "c = "
                + u.withUnit(
                        d.report()
                                .sections()
                                .get(SpanProblem.Place.MID)
                                .flexure()
                                .c(),
                        Dim.LENGTH);
        return strain < 0
                ? " (compression steel at mid-span: above the neutral axis, " + c + ")"
                : " (in tension at mid-span: below the neutral axis, " + c + ", so not compression steel there)";
    }

    /** The largest strain (+ tension) of a face's bars in the section at a place, NaN where none is counted. */
    static double strainAt(SpanDesigner.Design d, SpanProblem.Place place, barfit.section.Face face) {
        CheckReport r = d.report().sections().get(place);
        double strain = Double.NaN;
        if (r != null) {
            for (barfit.section.LayerResult lr : r.flexure().layers()) {
                if (lr.layer().face() == face && !(lr.strain() <= strain)) {
                    strain = lr.strain();
                }
            }
        }
        return strain;
    }

    /** What the anchored bottom bars are at the continuous supports, read from their strain there. */
    static String bottomAtSupports(SpanProblem p, SpanDesigner.Design d) {
        List<String> tension = new java.util.ArrayList<>();
        for (SpanProblem.Place place : List.of(SpanProblem.Place.LEFT, SpanProblem.Place.RIGHT)) {
            if ((place == SpanProblem.Place.LEFT ? p.leftSupport() : p.rightSupport())
                    && strainAt(d, place, barfit.section.Face.BOTTOM) >= 0) {
                tension.add(where(place));
            }
        }
        return tension.isEmpty()
                ? " (compression steel there)"
                : " (counted, but in tension at the " + String.join(" and ", tension)
                        + ": below the neutral axis, so not compression steel there)";
    }

    static String binding(List<barfit.design.Binding> bs, UnitSystem u) {
        if (bs.isEmpty()) {
            return "no check above 0.95 of its limit";
        }
        StringBuilder sb = new StringBuilder();
        for (var b : bs) {
            sb.append(sb.length() == 0 ? "" : ", ")
                    .append(b.limit())
                    .append(" (")
                    .append(Words.when(b, u))
                    .append(')');
        }
        return sb.toString();
    }

    static String extensionRule(SpanProblem p, SpanLayout l) {
        var det = l.detailing(p.detailing());
        return Words.extension(barfit.design.span.Extension.of(p, l.width(), l.height(), det, l.top())
                .governs());
    }

    static String demand(SpanProblem p, UnitSystem u) {
        StringBuilder sb = new StringBuilder("Mu");
        if (p.mLeft() != null) {
            sb.append(" left ").append(u.withUnit(p.mLeft(), Dim.MOMENT));
        }
        if (p.mMid() != null) {
            sb.append(" mid ").append(u.withUnit(p.mMid(), Dim.MOMENT));
        }
        if (p.mRight() != null) {
            sb.append(" right ").append(u.withUnit(p.mRight(), Dim.MOMENT));
        }
        if (p.vLeft() != null || p.vRight() != null) {
            sb.append(";  Vu");
            if (p.vLeft() != null) {
                sb.append(" left ").append(u.withUnit(p.vLeft(), Dim.FORCE));
            }
            if (p.vRight() != null) {
                sb.append(" right ").append(u.withUnit(p.vRight(), Dim.FORCE));
            }
        }
        if (p.hasTorsion()) {
            sb.append(";  Tu left ")
                    .append(u.withUnit(p.torsion().left(), Dim.MOMENT))
                    .append(" mid ")
                    .append(u.withUnit(p.torsion().mid(), Dim.MOMENT))
                    .append(" right ")
                    .append(u.withUnit(p.torsion().right(), Dim.MOMENT))
                    .append(p.torsion().atFaces() ? " at the faces" : "")
                    .append(p.torsion().compatibility() ? " (compatibility)" : "");
        }
        if (p.service() != null) {
            sb.append(";  service D ")
                    .append(u.withUnit(p.service().dead(), Dim.LINE_LOAD))
                    .append(", L ")
                    .append(u.withUnit(p.service().live(), Dim.LINE_LOAD));
        }
        return sb.toString();
    }

    static String deflection(SpanChecks.Result r, SpanProblem p, UnitSystem u) {
        if (r.liveDeflection() == null) {
            return "not computed: h ≥ h,min = " + len(r.hMin(), u) + " of Table 9.3.1.1";
        }
        return "computed (h < h,min = " + len(r.hMin(), u) + "): live " + u.withUnit(r.liveDeflection(), Dim.LENGTH)
                + " ≤ ℓ/" + fmt(p.limits().live()) + " = "
                + u.withUnit(p.span() / p.limits().live(), Dim.LENGTH)
                + "; long-term + live " + u.withUnit(r.longTermDeflection(), Dim.LENGTH) + " ≤ ℓ/"
                + fmt(p.limits().total())
                + " = " + u.withUnit(p.span() / p.limits().total(), Dim.LENGTH);
    }

    private static String fmt(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
    }

    /** The top bars at one support: the continuous ones alone, or with the extra bars and how far they run. */
    private static String supportTop(SpanProblem p, SpanLayout l, List<Integer> counts, double ext, UnitSystem u) {
        int extra = SpanLayout.sum(counts) - l.topContinuous();
        String all = counts(counts, l.top().label());
        if (extra == 0) {
            return all + "; the continuous bars alone, no extra bars";
        }
        return all + "; the " + (extra == 1 ? "extra bar runs " : extra + " extra bars run ") + span(ext, u)
                + " past the face (" + extensionRule(p, l) + ")";
    }

    /** "1 set", "12 sets". */
    public static String sets(int n) {
        return n + (n == 1 ? " set" : " sets");
    }

    public static String proof(Proof<SpanDesigner.Search> p, UnitSystem u) {
        if (p.status() == Proof.Status.UNPROVEN) {
            return "not proven: the time limit ended CP-SAT before it had a solution; the generator's cheapest design"
                    + " is given, with no bound (raise --time-limit for the proof); " + p.workers()
                    + (p.workers() == 1 ? " worker" : " workers") + ", seed " + p.seed();
        }
        var s = p.search();
        if (s.withLine()) {
            return "chosen with the line's other parts (they share the top bars over each support): "
                    + Words.status(p.status()) + " for the line by dynamic programming along it over every part's "
                    + "options; " + s.generator().framesEvaluated() + " of "
                    + s.generator().frames()
                    + " frames of this part searched, " + s.generator().framesSkipped() + " skipped by the cost "
                    + "bound";
        }
        boolean carbon = p.measure() == barfit.design.Objective.CARBON;
        if (s.enumerated()) {
            return "optimal by enumeration (objective "
                    + String.format(Locale.ROOT, "%.4f", Carbon.proofTotal(p.objective(), p.measure(), u))
                    + (carbon ? " " + Carbon.unit(u) : "")
                    + "): among every combination of the options the " + (carbon ? "carbon" : "cost")
                    + " bound left, one is the least, ahead of all others by more than rounding, so no CP-SAT solve "
                    + "was needed; "
                    + s.generator().framesEvaluated() + " of " + s.generator().frames() + " frames evaluated, "
                    + s.generator().framesSkipped() + " skipped by the " + (carbon ? "carbon" : "cost") + " bound";
        }
        return "CP-SAT " + Words.status(p.status()) + " (objective "
                + String.format(Locale.ROOT, "%.4f", Carbon.proofTotal(p.objective(), p.measure(), u))
                + ", bound " + String.format(Locale.ROOT, "%.4f", Carbon.proofTotal(p.bound(), p.measure(), u))
                + (carbon ? " " + Carbon.unit(u) : "") + ", gap "
                + String.format(Locale.ROOT, "%.2f", 100 * p.gap()) + " %) over "
                + p.solver().booleans() + " booleans; "
                + s.generator().framesEvaluated() + " of " + s.generator().frames() + " frames evaluated, "
                + s.generator().framesSkipped() + " skipped by the " + (carbon ? "carbon" : "cost") + " bound; "
                + s.solves()
                + (s.solves() == 1 ? " solve" : " solves")
                + (s.deflectionCuts() > 0 ? ", " + s.deflectionCuts() + " deflection cuts" : "") + "; " + p.workers()
                + (p.workers() == 1 ? " worker" : " workers") + ", seed " + p.seed();
    }
}
