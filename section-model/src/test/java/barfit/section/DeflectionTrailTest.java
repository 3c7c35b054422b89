package barfit.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.section.trail.Trail;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/**
 * What a checker needs to follow a computed deflection: Ig, Icr, Mcr, Ma and Ie per section and service
 * level, the Ie the span takes, and each deflection, in the result and in the trail. Expected values are
 * hand evaluations of the clauses named beside them (an invented beam).
 */
class DeflectionTrailTest {
    private static final double KNM = 1e6;

    /** A 300 × 500 mm simple span of 8 m, 3 No. 25 at d = 440 mm, below Table 9.3.1.1's l/16 = 500 mm. */
    private static SpanChecks.Result simple(Trail t) {
        double h = 450;
        BeamSection s = Sections.section(
                SectionShape.rectangular(300, h),
                Sections.materials(28, 420),
                Sections.detailing(40, Sections.si("10")),
                CodeEquations.SI,
                Sections.bottomAtDepth(Sections.si("25"), 3, h, 390));
        return SpanChecks.run(
                8000,
                EndCondition.SIMPLE,
                new SpanChecks.Sections(null, s, null),
                null,
                250 * KNM,
                null,
                new SpanChecks.ServiceLoads(15, 10, 0),
                SpanChecks.Limits.DEFAULT,
                t);
    }

    @Test
    void everySectionGivesItsStiffnessMomentsAndIe() {
        Trail t = Trail.recording();
        SpanChecks.Result r = simple(t);
        assertNotNull(r.liveDeflection(), "h = 450 mm < 500 mm: deflection is computed (Table 9.3.1.1)");
        assertEquals(1, r.sections().size());
        SpanChecks.SectionStiffness mid = r.sections().get(0);
        assertEquals("mid-span", mid.at());
        Deflection.Stiffness st = mid.stiffness();
        // Ig = b h³ / 12 = 300 × 450³ / 12 = 2.278e9 mm⁴; yt = 225 mm; fr = 0.62 √28 = 3.281 MPa (19.2.3.1);
        // Mcr = fr Ig / yt = 33.22 kN·m (24.2.3.5), by hand
        assertEquals(2.278125e9, st.ig(), 1e3);
        assertEquals(33.22, st.mcr() / KNM, 0.01);
        // Ma = Mu × w / (1.2 D + 1.6 L), wu = 1.2 × 15 + 1.6 × 10 = 34 kN/m (5.3.1b): 110.3, 110.3, 183.8 kN·m
        assertEquals(250 * 15 / 34.0, mid.ma()[0] / KNM, 1e-6);
        assertEquals(250 * 25 / 34.0, mid.ma()[2] / KNM, 1e-6);
        for (int i = 0; i < 3; i++) {
            // Table 24.2.3.5 (Ma > 2/3 Mcr at every level): Ie = Icr / (1 − (2/3 Mcr / Ma)² (1 − Icr / Ig))
            double k = 2.0 / 3.0 * st.mcr() / mid.ma()[i];
            assertEquals(st.icr() / (1 - k * k * (1 - st.icr() / st.ig())), mid.ie()[i], 1);
            assertEquals(mid.ie()[i], r.ieSpan()[i], 1e-6, "a simple span takes its mid-span Ie");
            // Δ = 5 Ma ℓ² / (48 Ec Ie), Ec = 4700 √28 = 24,870 MPa (19.2.2.1(b))
            double ec = 4700 * Math.sqrt(28);
            assertEquals(5 * mid.ma()[i] * 8000.0 * 8000.0 / (48 * ec * r.ieSpan()[i]), r.immediate()[i], 1e-6);
        }
        assertEquals(r.immediate()[2] - r.immediate()[0], r.liveDeflection(), 1e-9, "Δ(L) = Δ(D + L) − Δ(D)");
        assertEquals(2.0, r.lambdaDelta(), 1e-12, "no compression steel: λΔ = 2.0 / (1 + 0) (24.2.4.1)");

        Map<String, Trail.Step> steps = t.entries().stream()
                .filter(e -> e instanceof Trail.Step)
                .map(e -> (Trail.Step) e)
                .collect(Collectors.toMap(Trail.Step::symbol, x -> x, (a, b) -> a));
        for (String sym : List.of(
                "Ig (mid-span)",
                "Icr (mid-span)",
                "Mcr (mid-span)",
                "Ma (mid-span, D)",
                "Ma (mid-span, D + sustained L)",
                "Ma (mid-span, D + L)",
                "Ie (mid-span, D)",
                "Ie (mid-span, D + L)",
                "Ie (span, D + L)",
                "Δ(D)",
                "Δ(D + sustained L)",
                "Δ(D + L)")) {
            assertTrue(steps.containsKey(sym), "the trail gives " + sym + ": " + steps.keySet());
        }
        assertEquals(mid.ie()[2], steps.get("Ie (mid-span, D + L)").result().value(), 1e-6);
        assertEquals(mid.ma()[0], steps.get("Ma (mid-span, D)").result().value(), 1e-6);
        assertEquals(r.immediate()[1], steps.get("Δ(D + sustained L)").result().value(), 1e-9);
    }

    @Test
    void aContinuousSpanAveragesItsSections() {
        double h = 400;
        BeamSection mid = Sections.section(
                SectionShape.rectangular(300, h),
                Sections.materials(28, 420),
                Sections.detailing(40, Sections.si("10")),
                CodeEquations.SI,
                Sections.bottomAtDepth(Sections.si("25"), 3, h, 340));
        BeamSection support = Sections.section(
                SectionShape.rectangular(300, h),
                Sections.materials(28, 420),
                Sections.detailing(40, Sections.si("10")),
                CodeEquations.SI,
                Sections.topAt(Sections.si("25"), 4, 60));
        SpanChecks.Result r = SpanChecks.run(
                9000,
                EndCondition.BOTH_ENDS_CONTINUOUS,
                new SpanChecks.Sections(support, mid, support),
                -200 * KNM,
                150 * KNM,
                -200 * KNM,
                new SpanChecks.ServiceLoads(15, 8, 0.5),
                SpanChecks.Limits.DEFAULT,
                Trail.off());
        assertNotNull(r.liveDeflection(), "h = 400 mm < l/21 = 429 mm (Table 9.3.1.1)");
        assertEquals(
                List.of("left support", "mid-span", "right support"),
                r.sections().stream().map(SpanChecks.SectionStiffness::at).toList());
        for (int i = 0; i < 3; i++) {
            // 24.2.3.6: the average of the mid-span Ie and the mean of the two support Ie
            double expect = 0.5
                    * (r.sections().get(1).ie()[i]
                            + 0.5
                                    * (r.sections().get(0).ie()[i]
                                            + r.sections().get(2).ie()[i]));
            assertEquals(expect, r.ieSpan()[i], 1e-3);
        }
    }

    @Test
    void analysedServiceMomentsTakeThePlaceOfScaledOnes() {
        double h = 400;
        BeamSection mid = Sections.section(
                SectionShape.rectangular(300, h),
                Sections.materials(28, 420),
                Sections.detailing(40, Sections.si("10")),
                CodeEquations.SI,
                Sections.bottomAtDepth(Sections.si("25"), 3, h, 340));
        BeamSection support = Sections.section(
                SectionShape.rectangular(300, h),
                Sections.materials(28, 420),
                Sections.detailing(40, Sections.si("10")),
                CodeEquations.SI,
                Sections.topAt(Sections.si("25"), 4, 60));
        SpanChecks.Sections ss = new SpanChecks.Sections(support, mid, support);
        SpanChecks.ServiceLoads loads = new SpanChecks.ServiceLoads(15, 8, 0.5);
        SpanChecks.Result scaled = SpanChecks.run(
                9000,
                EndCondition.BOTH_ENDS_CONTINUOUS,
                ss,
                -200 * KNM,
                150 * KNM,
                -200 * KNM,
                loads,
                SpanChecks.Limits.DEFAULT,
                Trail.off());
        // the same moments given as an analysis would: D alone and D + L, in the same proportion as the loads
        // (wu = 1.2 x 15 + 1.6 x 8 = 30.8 N/mm, load combination 5.3.1b)
        double dead = 15 / 30.8;
        double total = 23 / 30.8;
        SpanChecks.ServiceMoments given = SpanChecks.ServiceMoments.analysed(
                -200 * KNM * dead,
                150 * KNM * dead,
                -200 * KNM * dead,
                -200 * KNM * total,
                150 * KNM * total,
                -200 * KNM * total,
                0.5);
        SpanChecks.Result analysed = SpanChecks.run(
                9000,
                EndCondition.BOTH_ENDS_CONTINUOUS,
                ss,
                -200 * KNM,
                150 * KNM,
                -200 * KNM,
                loads,
                given,
                SpanChecks.Limits.DEFAULT,
                Trail.off());
        assertEquals(scaled.liveDeflection(), analysed.liveDeflection(), 1e-9);
        assertEquals(scaled.longTermDeflection(), analysed.longTermDeflection(), 1e-9);
        // smaller support moments at the same mid-span moment (an arrangement with the next span unloaded)
        // leave more of the span's sagging unrelieved: Δ = 5 l² (Mm − 0.1 (Ma + Mb)) / (48 Ec Ie), 24.2
        SpanChecks.ServiceMoments lighter = SpanChecks.ServiceMoments.analysed(
                -200 * KNM * dead,
                150 * KNM * dead,
                -200 * KNM * dead,
                -150 * KNM * total,
                150 * KNM * total,
                -150 * KNM * total,
                0.5);
        SpanChecks.Result more = SpanChecks.run(
                9000,
                EndCondition.BOTH_ENDS_CONTINUOUS,
                ss,
                -200 * KNM,
                150 * KNM,
                -200 * KNM,
                loads,
                lighter,
                SpanChecks.Limits.DEFAULT,
                Trail.recording());
        assertTrue(more.liveDeflection() > scaled.liveDeflection());
    }
}
