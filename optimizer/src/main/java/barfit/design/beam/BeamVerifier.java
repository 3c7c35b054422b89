package barfit.design.beam;

import barfit.section.BeamSection;
import barfit.section.CheckReport;
import barfit.section.CheckResult;
import barfit.section.Demand;
import barfit.section.SectionChecks;
import barfit.section.Span;
import barfit.section.SpanChecks;
import barfit.section.Stirrups;
import barfit.section.trail.Q;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/** Checks a designed span with the section model: sections, stirrup zones, span (depth, deflection). */
public final class BeamVerifier {
    private BeamVerifier() {
    }

    public static BeamReport verify(BeamProblem p, BeamLayout l, boolean withTrail) {
        Span span = new Span(p.span(), p.ends()); // depth and deflection: SpanChecks, once for the span
        Map<BeamProblem.Place, CheckReport> sections = new EnumMap<>(BeamProblem.Place.class);
        if (p.leftSupport()) {
            sections.put(BeamProblem.Place.LEFT, check(p, l, BeamProblem.Place.LEFT, p.mLeft(), span, withTrail));
        }
        if (p.midSection()) {
            sections.put(BeamProblem.Place.MID, check(p, l, BeamProblem.Place.MID, p.mMid(), span, withTrail));
        }
        if (p.rightSupport()) {
            sections.put(BeamProblem.Place.RIGHT, check(p, l, BeamProblem.Place.RIGHT, p.mRight(), span, withTrail));
        }
        List<CheckResult> zoneChecks = new ArrayList<>();
        List<BeamProblem.Zone> zones = p.zones();
        Trail zt = withTrail ? Trail.recording() : Trail.off();
        for (int i = 0; i < zones.size(); i++) {
            BeamProblem.Zone z = zones.get(i);
            Stirrups st = l.zoneStirrups().get(i);
            BeamSection s = l.section(p, z.section(), st);
            zoneChecks.addAll(SectionChecks.shearZone(s, BeamLayout.bending(p, z.section()), z.vu() == null ? 0 : z.vu(),
                    z.name(), zt));
            int need = p.legsFor(l.barsPerLayer(p, z.section()));
            zoneChecks.add(CheckResult.atLeast("stirrup_legs_bars." + z.name(), "Stirrup legs for the bars per layer ("
                    + z.name() + " zone)", "common practice", Q.count(st.legs()), Q.count(need),
                    "two legs hold up to " + p.barsPerTwoLegs() + " bars a layer"));
        }
        SpanChecks.Sections ss = new SpanChecks.Sections(
                p.leftSupport() ? l.section(p, BeamProblem.Place.LEFT, null) : null,
                p.midSection() ? l.section(p, BeamProblem.Place.MID, null) : null,
                p.rightSupport() ? l.section(p, BeamProblem.Place.RIGHT, null) : null);
        Trail st = withTrail ? Trail.recording() : Trail.off();
        SpanChecks.Result spanResult = SpanChecks.run(p.span(), p.ends(), ss, p.mLeft(), p.mMid(), p.mRight(),
                p.service(), p.limits(), st);
        return new BeamReport(sections, zoneChecks, spanResult, zt, st);
    }

    /** The span's depth and deflection checks alone (what the deflection cuts need). */
    public static boolean deflectionOk(BeamProblem p, BeamLayout l) {
        SpanChecks.Sections ss = new SpanChecks.Sections(
                p.leftSupport() ? l.section(p, BeamProblem.Place.LEFT, null) : null,
                p.midSection() ? l.section(p, BeamProblem.Place.MID, null) : null,
                p.rightSupport() ? l.section(p, BeamProblem.Place.RIGHT, null) : null);
        return SpanChecks.run(p.span(), p.ends(), ss, p.mLeft(), p.mMid(), p.mRight(), p.service(), p.limits(),
                Trail.off()).ok();
    }

    private static CheckReport check(BeamProblem p, BeamLayout l, BeamProblem.Place place, Double mu, Span span,
            boolean withTrail) {
        BeamSection s = l.section(p, place, null);
        return SectionChecks.run(s, new Demand(mu, null), span, withTrail ? Trail.recording() : Trail.off(), false);
    }
}
