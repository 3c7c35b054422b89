package barfit.detailing;

import barfit.analysis.Line;
import barfit.analysis.LineResult;
import barfit.analysis.Support;
import barfit.catalogs.BarSize;
import barfit.design.line.LineCapacity;
import barfit.design.line.LineSpans;
import barfit.design.span.Extension;
import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.input.Settings;
import barfit.section.BeamSection;
import barfit.section.CheckResult;
import barfit.section.Development;
import barfit.section.Face;
import barfit.section.anchorage.CutOffs;
import barfit.section.anchorage.Envelope;
import barfit.section.anchorage.HookDevelopment;
import barfit.section.anchorage.SupportBars;
import barfit.section.anchorage.TensionZoneCut;
import barfit.section.trail.Q;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * What the section model's detailing rules ask of a line's bars, shared by the detailer (which places the
 * bars to meet them) and the check of bars as built (which compares them): the extra top bars' run past a
 * face (9.7.3.2 to 9.7.3.5, 9.7.3.8.4), the bottom bars into the supports (9.7.3.8), structural integrity
 * (9.7.7) and a hook's fit in its support (25.4.3.1). x along the line from the first support's centre line.
 */
final class DetailRules {
    private final Settings settings;
    private final Trail trail;

    DetailRules(Settings settings, Trail trail) {
        this.settings = settings;
        this.trail = trail;
    }

    /** A segment's two faces (an overhang: its free end and its support's face). */
    static double[] faces(Line line, int seg) {
        int n = line.spanCount();
        if (seg == 0) {
            return new double[] {-line.overhangLeft(), -line.supports().get(0).width() / 2};
        }
        if (seg == n + 1) {
            double x = line.supportX(n);
            return new double[] {x + line.supports().get(n).width() / 2, x + line.overhangRight()};
        }
        return new double[] {
            line.supportX(seg - 1) + line.supports().get(seg - 1).width() / 2,
            line.supportX(seg) - line.supports().get(seg).width() / 2
        };
    }

    /**
     * Structural integrity (9.7.7): every span's bottom bars continuous through the interior supports by
     * their laps, and on a perimeter line the continuous top bars against a sixth of the largest negative
     * steel, two bars at least (9.7.7.1(b)); closed hoops along every span (9.7.7.1(c)).
     */
    List<CheckResult> integrity(boolean perimeter, Map<Integer, LineSpans.Part> bySegment, int hangers, BarSize top) {
        double asPos = 0;
        double asNeg = 0;
        int fewestBottom = Integer.MAX_VALUE;
        for (LineSpans.Part p : bySegment.values()) {
            SpanLayout l = p.outcome().best().layout();
            asPos = Math.max(asPos, l.bottomCount() * l.bottom().area());
            fewestBottom = Math.min(fewestBottom, l.bottomCount());
            for (List<Integer> c : java.util.Arrays.asList(l.topLeft(), l.topRight())) {
                if (c != null) {
                    asNeg = Math.max(asNeg, SpanLayout.sum(c) * l.top().area());
                }
            }
        }
        var need = barfit.section.anchorage.Integrity.of(perimeter, asPos, asNeg, trail);
        List<CheckResult> out = new ArrayList<>();
        String clause = perimeter ? "9.7.7.1" : "9.7.7.2";
        out.add(CheckResult.rule(
                "integrity_bottom",
                "Continuous bottom bars (structural integrity)",
                clause,
                fewestBottom >= 2,
                Q.count(fewestBottom),
                Q.count(2),
                "≥",
                "every bottom bar runs on through the interior supports, lapped class B there (9.7.7.5)"));
        if (perimeter) {
            int needed = need.topBars(top);
            out.add(CheckResult.rule(
                    "integrity_top",
                    "Continuous top bars of a perimeter beam",
                    "9.7.7.1",
                    hangers >= needed,
                    Q.count(hangers),
                    Q.count(needed),
                    "≥",
                    hangers >= needed
                            ? "the continuous top bars, lapped class B near mid-span (9.7.7.5); closed hoops along"
                                    + " every span (9.7.7.1(c))"
                            : "needs " + needed + " continuous " + top.label() + " top bars (a sixth of the largest"
                                    + " negative steel, two at least): design the line with more hangers"));
        }
        return out;
    }

    /** What 9.7.3 asks of the extra top bars' run past a face into a span, and the checks that say so. */
    record Reach(
            double length,
            String why,
            String clause,
            List<CheckResult> checks,
            double theoretical,
            double inflection,
            double ld) {}

    Reach reach(
            LineResult a,
            LineSpans.Part part,
            LineSpans.Side side,
            int support,
            boolean intoRight,
            double face,
            Line line) {
        int span = part.segment();
        SpanProblem p = part.problem();
        SpanLayout l = part.outcome().best().layout();
        double[] f = faces(line, span);
        // this support's half of the span: from its face to the peak of the sagging envelope (mid-span
        // where there is none), so the other support's negative moment is not read as this one's
        double split = sagPeak(a, span, f);
        Envelope hog = intoRight
                ? Envelope.hogging(a, span).between(f[0], split)
                : Envelope.hogging(a, span).between(split, f[1]);
        BeamSection at = side.section().section();
        double d = side.section().flexure().d();
        BarSize bar = side.bar();
        double ld = Development.ofLayer(at, at.layersOn(Face.TOP).get(0), trail).ld();
        // the part's end at this support: its left end where the bars run into the part to the right
        double hangers = LineCapacity.hangersPhiMn(p, l, intoRight);
        List<CheckResult> checks = new ArrayList<>();
        double need = ld; // 9.7.3.2: developed past the face, the critical section
        String why = "ld past the face (9.7.3.2)";
        String clause = "9.7.3.2";
        var needed = CutOffs.needed(hog, hangers, CutOffs.Interpolation.QUADRATIC);
        double ext = CutOffs.extension(d, bar);
        double cut;
        if (needed.isPresent()) {
            // the theoretical point nearest mid-span on this support's side, then 9.7.3.3
            double theory = intoRight ? needed.get().to() : needed.get().from();
            if (intoRight ? needed.get().toEnd() : needed.get().fromEnd()) {
                theory = split; // needed all through this half: to the sagging peak
            }
            cut = intoRight ? theory + ext : theory - ext;
            double byCut = Math.abs(cut - face);
            if (byCut > need) {
                need = byCut;
                why = "past where the continuous bars suffice by max(d, 12 db) (9.7.3.3)";
                clause = "9.7.3.3";
            }
        }
        // 9.7.3.8.4: a third of the negative steel past the point of inflection
        double asNeg = SpanLayout.sum(side.counts()) * bar.area();
        double asCont = side.continuous() * bar.area();
        var zero = CutOffs.needed(hog, 0, CutOffs.Interpolation.QUADRATIC);
        double inflection = Double.NaN;
        if (zero.isPresent()) {
            inflection = intoRight ? zero.get().to() : zero.get().from();
            boolean runsToEnd = intoRight ? zero.get().toEnd() : zero.get().fromEnd(); // to the half's end
            if (runsToEnd) {
                inflection = Double.NaN; // hogging over the whole span: no point of inflection
            }
        }
        if (!Double.isNaN(inflection) && asCont < asNeg / 3 - 1e-9) {
            var past = SupportBars.negativePastInflection(asNeg, d, bar, f[1] - f[0], trail);
            double byInflection = Math.abs(inflection - face) + past.length();
            if (byInflection > need) {
                need = byInflection;
                why = "past the point of inflection by max(d, 12 db, ln/16) (9.7.3.8.4)";
                clause = "9.7.3.8.4";
            }
        }
        // 9.7.3.5: a cut short of the point of inflection is in a tension zone
        if (!Double.isNaN(inflection) && need < Math.abs(inflection - face) - 1e-6) {
            double xCut = intoRight ? face + need : face - need;
            SpanProblem.Zone zone = zoneAt(p, xCut - f[0]);
            var st = l.zoneStirrups().get(p.zones().indexOf(zone));
            double vu = zone.vu() == null ? 0 : Math.abs(zone.vu());
            var stirrupSection = at.withStirrups(st);
            var shear =
                    barfit.section.Shear.analyse(stirrupSection, vu, d, side.continuous() * bar.area(), Trail.off());
            var verdict = TensionZoneCut.check(
                    new TensionZoneCut.AtCut(
                            bar,
                            true,
                            vu,
                            shear.phiVn(),
                            asCont,
                            Math.max(asCont, 1e-9),
                            asNeg - asCont,
                            at.shape().width(),
                            d,
                            null),
                    settings.code(),
                    trail);
            checks.add(CheckResult.rule(
                    "tension-zone-cut",
                    "Top bars cut in a tension zone, support " + (support + 1),
                    "9.7.3.5",
                    true,
                    Q.length(need),
                    Q.length(Math.abs(inflection - face)),
                    verdict.allowed() ? "<" : "→",
                    verdict.allowed()
                            ? "allowed by " + verdict.basis().name().toLowerCase(java.util.Locale.ROOT)
                            : "not allowed: the bars run past the point of inflection instead"));
            if (!verdict.allowed()) {
                need = Math.abs(inflection - face) + ext;
                why = "no cut in the tension zone (9.7.3.5): past the point of inflection by max(d, 12 db)";
                clause = "9.7.3.5";
            }
        }
        // under torsion the support zones count these bars in Al over their length (9.7.5.3)
        double torsionReach = Extension.torsionReach(p);
        if (torsionReach > need + 1e-6) {
            need = torsionReach;
            why = "under torsion, over the support's stirrup zones, where they are counted in Al (9.7.5.3)";
            clause = "9.7.5.3";
        }
        return new Reach(
                need,
                why,
                clause,
                checks,
                needed.isPresent() ? theoryOf(needed.get(), intoRight, split) : Double.NaN,
                inflection,
                ld);
    }

    private static double theoryOf(CutOffs.Needed n, boolean intoRight, double split) {
        if (intoRight ? n.toEnd() : n.fromEnd()) {
            return split;
        }
        return intoRight ? n.to() : n.from();
    }

    /** x of the largest sagging moment between the faces, or mid-span where the span never sags. */
    private static double sagPeak(LineResult a, int span, double[] f) {
        double best = 0;
        double x = (f[0] + f[1]) / 2;
        for (LineResult.StationValues s : a.stations()) {
            if (s.segment() == span && s.x() >= f[0] && s.x() <= f[1] && s.mMax() > best) {
                best = s.mMax();
                x = s.x();
            }
        }
        return x;
    }

    private static SpanProblem.Zone zoneAt(SpanProblem p, double local) {
        List<SpanProblem.Zone> zones = p.zones();
        for (SpanProblem.Zone z : zones) {
            if (local >= z.from() - 1e-6 && local <= z.to() + 1e-6) {
                return z;
            }
        }
        return local < zones.get(0).from() ? zones.get(0) : zones.get(zones.size() - 1);
    }

    /** 9.7.3.8.1 to 9.7.3.8.3 for one span's bottom bars at its two supports. */
    List<CheckResult> bottomChecks(
            LineSpans.Part part, Line line, int seg, double[] ends, boolean hookStart, boolean hookEnd) {
        SpanLayout l = part.outcome().best().layout();
        SpanProblem p = part.problem();
        List<CheckResult> out = new ArrayList<>();
        double as = l.bottomCount() * l.bottom().area();
        double[] f = faces(line, seg);
        var mid = part.outcome().best().report().sections().get(SpanProblem.Place.MID);
        for (int side = 0; side < 2; side++) {
            int j = side == 0 ? seg - 1 : seg;
            Support s = line.supports().get(j);
            boolean end = j == 0 && line.overhangLeft() <= 0 || j == line.spanCount() && line.overhangRight() <= 0;
            var kind = end ? SupportBars.End.SIMPLE : SupportBars.End.CONTINUOUS;
            var need = SupportBars.positiveIntoSupport(kind, as, false, settings.code(), trail);
            double embedment = side == 0 ? f[0] - ends[0] : ends[1] - f[1];
            out.addAll(SupportBars.checkIntoSupport(need, as, embedment));
            if (end && !s.kind().integral() && mid != null) {
                // a simple support: ld against 1.3 Mn / Vu + la (9.7.3.8.3), la past the support's centre line
                BeamSection sec = mid.section();
                double ld = Development.ofLayer(sec, sec.layersOn(Face.BOTTOM).get(0), trail)
                        .ld();
                double vu = side == 0 ? p.vLeft() == null ? 0 : p.vLeft() : p.vRight() == null ? 0 : p.vRight();
                double la = Math.max(0, embedment - s.width() / 2);
                double mn = mid.flexure().mn();
                out.add(SupportBars.atSimpleSupport(ld, mn, Math.abs(vu), la, true, false, trail)
                        .check());
            }
        }
        return out;
    }

    /** ldh of a hooked run's bars against the column it ends in (25.4.3.1, far cover deducted). */
    CheckResult hookFit(BarRun run, Support s, String where) {
        double side = Anchorage.hookSideCover(settings);
        var ldh = Anchorage.ldh(run.bar(), settings, trail);
        var fit = HookDevelopment.fit(ldh.ldh(), s.width(), settings.detailing().cover(), trail);
        String note = run.count() + " " + run.bar().label() + " " + run.what() + " hooked into " + where;
        if (!fit.fits()) {
            // what would make it fit: a wider column, or the column's ties confining the hooks (ψr = 1.0)
            var confined = HookDevelopment.ldh(
                    run.bar(),
                    settings.materials(),
                    settings.code(),
                    new HookDevelopment.Conditions(
                            false,
                            Double.POSITIVE_INFINITY,
                            run.count() * run.bar().area(),
                            0,
                            side,
                            true,
                            Double.POSITIVE_INFINITY,
                            false),
                    Trail.off());
            note += String.format(
                    java.util.Locale.ROOT,
                    ": ldh %.0f mm needs a support %.0f mm wide (cover included)%s",
                    ldh.ldh(),
                    ldh.ldh() + settings.detailing().cover(),
                    confined.ldh() <= fit.available()
                            ? String.format(
                                    java.util.Locale.ROOT,
                                    ", or ties confining the hooks (ψr = 1.0, Table 25.4.3.2) giving ldh %.0f mm, which fits",
                                    confined.ldh())
                            : "");
        }
        return fit.check().withNote(note);
    }
}
