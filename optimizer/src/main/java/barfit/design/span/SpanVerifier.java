package barfit.design.span;

import barfit.section.BeamSection;
import barfit.section.Bending;
import barfit.section.CheckReport;
import barfit.section.CheckResult;
import barfit.section.Demand;
import barfit.section.SectionChecks;
import barfit.section.Span;
import barfit.section.SpanChecks;
import barfit.section.StirrupRules;
import barfit.section.Stirrups;
import barfit.section.TorsionZone;
import barfit.section.trail.Q;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/** Checks a designed span with the section model: sections, stirrup zones, span (depth, deflection). */
public final class SpanVerifier {
    private SpanVerifier() {}

    public static SpanReport verify(SpanProblem p, SpanLayout l, boolean withTrail) {
        Span span = new Span(p.span(), p.ends()); // depth and deflection: SpanChecks, once for the span
        Map<SpanProblem.Place, CheckReport> sections = new EnumMap<>(SpanProblem.Place.class);
        if (p.leftSupport()) {
            sections.put(SpanProblem.Place.LEFT, check(p, l, SpanProblem.Place.LEFT, p.mLeft(), span, withTrail));
        }
        if (p.midSection()) {
            sections.put(SpanProblem.Place.MID, check(p, l, SpanProblem.Place.MID, p.mMid(), span, withTrail));
        }
        if (p.rightSupport()) {
            sections.put(SpanProblem.Place.RIGHT, check(p, l, SpanProblem.Place.RIGHT, p.mRight(), span, withTrail));
        }
        List<CheckResult> zoneChecks = new ArrayList<>();
        List<Double> zoneShears = new ArrayList<>();
        List<Double> zoneTorsions = new ArrayList<>();
        List<SpanProblem.Zone> zones = p.zones();
        Trail zt = withTrail ? Trail.recording() : Trail.off();
        for (int i = 0; i < zones.size(); i++) {
            SpanProblem.Zone z = zones.get(i);
            Stirrups st = l.zoneStirrups().get(i);
            BeamSection s = l.section(p, z.section(), st);
            Bending bending = SpanLayout.bending(p, z.section());
            // the zone's design shear from the span's shear line at this section's own d
            Double vu = z.vu(SectionChecks.shearDepth(s, bending));
            zoneShears.add(vu);
            zoneChecks.addAll(SectionChecks.shearZone(s, bending, vu == null ? 0 : vu, z.name(), zt));
            Demand torsion = torsionDemand(p, z, vu, l.width(), SectionChecks.shearDepth(s, bending));
            zoneTorsions.add(z.torsionGiven() ? z.tu(l.width(), SectionChecks.shearDepth(s, bending)) : null);
            if (torsion != null) {
                zoneChecks.addAll(
                        TorsionZone.checks(l.physicalSection(p, z.section(), st), torsion, span, z.name(), zt));
            }
            zoneChecks.addAll(StirrupRules.checks(
                    s,
                    l.physicalSection(p, z.section(), st),
                    bending,
                    SpanLayout.momentAt(p, z.section()),
                    p.practice(),
                    z.name(),
                    zt));
        }
        // extra top bars are developed past the support face (25.4.2.1): never cut short of ld
        if (!p.cantilever()) {
            double ld = Extension.developmentLength(p, l.width(), l.height(), l.detailing(p.detailing()), l.top());
            if (p.leftSupport() && SpanLayout.sum(l.topLeft()) > l.topContinuous()) {
                zoneChecks.add(CheckResult.atLeast(
                        "top_extension.left",
                        "Extra top bars at the left support run ld " + "past the face",
                        "25.4.2.1, 25.4.2.4",
                        Q.length(l.extLeft()),
                        Q.length(ld),
                        null));
            }
            if (p.rightSupport() && SpanLayout.sum(l.topRight()) > l.topContinuous()) {
                zoneChecks.add(CheckResult.atLeast(
                        "top_extension.right",
                        "Extra top bars at the right support run ld " + "past the face",
                        "25.4.2.1, 25.4.2.4",
                        Q.length(l.extRight()),
                        Q.length(ld),
                        null));
            }
        }
        SpanChecks.Sections ss = new SpanChecks.Sections(
                p.leftSupport() ? l.section(p, SpanProblem.Place.LEFT, null) : null,
                p.midSection() ? l.section(p, SpanProblem.Place.MID, null) : null,
                p.rightSupport() ? l.section(p, SpanProblem.Place.RIGHT, null) : null);
        Trail st = withTrail ? Trail.recording() : Trail.off();
        SpanChecks.Result spanResult = SpanChecks.run(
                p.span(),
                p.ends(),
                ss,
                p.mLeft(),
                p.mMid(),
                p.mRight(),
                p.service(),
                p.serviceMoments(),
                p.limits(),
                st);
        return new SpanReport(sections, zoneChecks, zoneShears, spanResult, zt, st, zoneTorsions);
    }

    /** The span's depth and deflection checks alone (what the deflection cuts need). */
    public static boolean deflectionOk(SpanProblem p, SpanLayout l) {
        SpanChecks.Sections ss = new SpanChecks.Sections(
                p.leftSupport() ? l.section(p, SpanProblem.Place.LEFT, null) : null,
                p.midSection() ? l.section(p, SpanProblem.Place.MID, null) : null,
                p.rightSupport() ? l.section(p, SpanProblem.Place.RIGHT, null) : null);
        return SpanChecks.run(
                        p.span(),
                        p.ends(),
                        ss,
                        p.mLeft(),
                        p.mMid(),
                        p.mRight(),
                        p.service(),
                        p.serviceMoments(),
                        p.limits(),
                        Trail.off())
                .ok();
    }

    /**
     * The demand a zone's torsion checks take: the moment of its section, its design shear and its design
     * torsion in a web {@code bt} wide at effective depth d; null where the zone has no torsion.
     */
    public static Demand torsionDemand(SpanProblem p, SpanProblem.Zone z, Double vu, double bt, double d) {
        if (!z.torsionGiven()) {
            return null;
        }
        double tu = z.tu(bt, d);
        if (tu <= 0) {
            return null;
        }
        return new Demand(
                SpanLayout.momentAt(p, z.section()), vu, tu, p.torsion().compatibility());
    }

    private static CheckReport check(
            SpanProblem p, SpanLayout l, SpanProblem.Place place, Double mu, Span span, boolean withTrail) {
        BeamSection s = l.section(p, place, null);
        return SectionChecks.run(s, new Demand(mu, null), span, withTrail ? Trail.recording() : Trail.off(), false);
    }
}
