package barfit.design.span;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.catalogs.BarCatalog;
import barfit.catalogs.BarCatalogs;
import barfit.catalogs.BarSize;
import barfit.design.CostModel;
import barfit.design.CostRates;
import barfit.design.SearchSpace;
import barfit.design.SolverOptions;
import barfit.report.DiagnosisWords;
import barfit.section.CodeEquations;
import barfit.section.Detailing;
import barfit.section.EndCondition;
import barfit.section.Exposure;
import barfit.section.Materials;
import barfit.section.SpanChecks;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The diagnosis of a span with no design names what really fails at the cap, and the depth it quotes
 * is one the span designs at, while the step below it gives no design. Invented inch-pound roof beam:
 * a 28 ft simple span, 4000 psi concrete, Grade 60 bars.
 */
class SpanDiagnosisTest {
    private static final UnitSystem US = UnitSystem.US;
    private static final BarCatalog BARS = BarCatalogs.builtIn("astm-a615").orElseThrow();
    private static final CostModel COST =
            new CostModel(CostRates.DEFAULTS, US.toSI(1.5, Dim.LENGTH), CodeEquations.INCH_POUND);
    private final SpanDesigner designer = new SpanDesigner(COST, new SolverOptions(30, 1, 1));

    private static BarSize bar(String s) {
        return BARS.find(s).orElseThrow();
    }

    private static double in(double v) {
        return US.toSI(v, Dim.LENGTH);
    }

    /** The search's depths, 14 in to 30 in by 1 in, as the input reader makes them (in mm). */
    private static final double STEP = in(1);

    private static List<Double> inches(double from, double to, double step) {
        List<Double> out = new ArrayList<>();
        for (double v = from; v <= to + 1e-9; v += step) {
            out.add(Math.round(in(v) * 1e6) / 1e6);
        }
        return out;
    }

    /**
     * The span under a headroom cap of {@code capIn} inches and a factored mid-span moment {@code muKipFt}.
     * Table 9.3.1.1 asks for ℓ/16 = 21 in here, so below it deflection is computed from the service loads.
     */
    private static SpanProblem roofBeam(double capIn, double muKipFt) {
        Materials m = new Materials(
                US.toSI(4000, Dim.STRESS), US.toSI(60000, Dim.STRESS), US.toSI(60000, Dim.STRESS), in(0.75), 1.0);
        Detailing det = new Detailing(in(1.5), bar("3"), CodeEquations.INCH_POUND.minLayerGap(), Exposure.INTERIOR);
        List<BarSize> sizes = List.of(bar("5"), bar("6"), bar("7"), bar("8"), bar("9"));
        SearchSpace space = new SearchSpace(
                inches(12, 16, 2),
                inches(14, 30, 1),
                sizes,
                sizes,
                2,
                List.of(bar("3")),
                List.of(2, 4),
                inches(4, 12, 1));
        SpanChecks.ServiceLoads service =
                new SpanChecks.ServiceLoads(US.toSI(0.9, Dim.LINE_LOAD), US.toSI(0.9, Dim.LINE_LOAD), 0.5);
        double v = US.toSI(22, Dim.FORCE);
        return new SpanProblem(
                "R-1",
                m,
                det,
                CodeEquations.INCH_POUND,
                space,
                US.toSI(28, Dim.SPAN),
                EndCondition.SIMPLE,
                null,
                US.toSI(muKipFt, Dim.MOMENT),
                null,
                v,
                v,
                service,
                SpanChecks.Limits.DEFAULT,
                in(capIn),
                null,
                null,
                false,
                2,
                SearchSpace.DEFAULT_BARS_PER_TWO_LEGS);
    }

    /** Whether the span designs with the cap at h, the design passing the section model's every check. */
    private boolean designsAt(SpanProblem p, double h) {
        SpanDesigner.Outcome o = designer.design(p.withMaxDepth(h), 0);
        if (o.feasible()) {
            assertTrue(SpanVerifier.verify(p.withMaxDepth(h), o.best().layout(), false)
                    .ok());
        }
        return o.feasible();
    }

    @Test
    void deflectionThatFailsUnderTheCapIsNamedAndTheQuotedDepthDesigns() {
        SpanProblem p = roofBeam(14, 160);
        // strength alone is not what stops it: with deflection set aside the span designs within the cap
        assertTrue(designer.design(p.withLimits(new SpanChecks.Limits(0, 0)), 0).feasible());

        SpanDesigner.Outcome o = designer.design(p, 0);
        assertFalse(o.feasible());
        SpanDesigner.Diagnosis d = o.diagnosis();
        assertTrue(d.limit().startsWith("deflection_"), "names the deflection check that fails: " + d.limit());
        assertTrue(d.clause().contains("24.2"), d.clause());
        assertTrue(d.cause() instanceof SpanDesigner.Diagnosis.DeflectionFails, String.valueOf(d.cause()));
        assertTrue(DiagnosisWords.summary(d, US).contains("deflection"), DiagnosisWords.summary(d, US));
        assertFalse(d.atCap().isEmpty(), "the failing deflection of the cheapest otherwise-passing layout is given");
        d.atCap().forEach(c -> assertTrue(c.id().startsWith("deflection") && !c.pass(), c.id()));

        SpanDesigner.Fix deeper = d.deeper();
        assertNotNull(deeper, "a depth that works is quoted");
        String fix = DiagnosisWords.fixes(d, US).get(0);
        assertTrue(fix.contains(US.compact(deeper.height(), Dim.LENGTH) + " in"), fix);
        assertTrue(deeper.height() > p.maxDepth());
        assertTrue(SpanVerifier.verify(p.withMaxDepth(deeper.height()), deeper.layout(), false)
                .ok());
        assertTrue(designsAt(p, deeper.height()), "the quoted depth designs");
        assertFalse(designsAt(p, deeper.height() - STEP), "one step below the quoted depth does not");
    }

    @Test
    void strengthThatFailsIsNotCalledDeflection() {
        // a moment no section within the cap carries, with deflection set aside or not
        SpanProblem p = roofBeam(22, 800);
        assertFalse(
                designer.design(p.withLimits(new SpanChecks.Limits(0, 0)), 0).feasible());
        SpanDesigner.Outcome o = designer.design(p, 0);
        assertFalse(o.feasible());
        SpanDesigner.Diagnosis d = o.diagnosis();
        assertEquals("strength", d.limit(), String.valueOf(d.cause()));
        assertTrue(d.atCap().isEmpty());
        SpanDesigner.Fix deeper = d.deeper();
        assertNotNull(deeper);
        assertTrue(designsAt(p, deeper.height()), "the quoted depth designs");
        assertFalse(designsAt(p, deeper.height() - STEP), "one step below the quoted depth does not");
        SpanDesigner.Fix wider = d.wider();
        assertNotNull(wider, "a wider web that works is quoted");
        assertEquals(p.maxDepth(), wider.height(), 1e-9);
        SpanProblem at = p.withSpace(p.space().withDepths(List.of(wider.height())));
        assertTrue(designer.design(at.withFixedWidth(wider.width()), 0).feasible(), "the quoted width designs");
        assertFalse(
                designer.design(at.withFixedWidth(wider.width() - in(2)), 0).feasible(),
                "one width step narrower does not");
    }
}
