package barfit.section;

import static barfit.section.Sections.IN;
import static barfit.section.Sections.IN2;
import static barfit.section.Sections.KIP_FT;
import static barfit.section.Sections.KSI;
import static org.junit.jupiter.api.Assertions.assertEquals;

import barfit.catalogs.BarSize;
import barfit.section.trail.Trail;
import org.junit.jupiter.api.Test;

/**
 * Development length (25.4.2) and deflection (24.2) against McCormac and Brown, "Design of Reinforced
 * Concrete", 9th ed. (ACI 318-11 edition). Its development-length expressions are those of ACI 318-19
 * 25.4.2.3 / 25.4.2.4 for Grade 60 bars; its deflection examples use Branson's Ie, so for Ie the
 * expected values below are hand evaluations of ACI 318-19 Table 24.2.3.5 on the book's data.
 */
class DevelopmentAndDeflectionTest {
    private static final CodeEquations US = CodeEquations.INCH_POUND;

    private static Materials usMaterials(double fcPsi, double lambda) {
        double fc = fcPsi / CodeEquations.PSI_PER_MPA;
        return new Materials(fc, 60 * KSI, 60 * KSI, 19.05, lambda);
    }

    @Test
    void generalEquationTopBars() {
        // McCormac & Brown 9th ed., Example 14.4: #8 uncoated top bars, f'c = 3000 psi, fy = 60 ksi,
        // cb = 2.0 in, Ktr = 0 -> ld/db = 53.4
        var r = Development.general(Sections.us("8"), usMaterials(3000, 1.0), US, true, 2.0 * IN, 0, 0, 0, Trail.off());
        assertEquals(53.4, r.ld() / (1.0 * IN), 0.1);
    }

    @Test
    void generalEquationWithAndWithoutKtr() {
        // McCormac & Brown 9th ed., Example 7.2: #8 bottom bars, f'c = 3000 psi, cb = 1.5 in; (a) Ktr = 0 ->
        // 55 diameters; (b) #3 stirrups (2 legs) at 8 in, n = 3 -> Ktr = 0.367 in, 44 diameters (printed rounded)
        Materials m = usMaterials(3000, 1.0);
        var a = Development.general(Sections.us("8"), m, US, false, 1.5 * IN, 0, 0, 0, Trail.off());
        assertEquals(55, a.ld() / IN, 0.5);
        var b = Development.general(Sections.us("8"), m, US, false, 1.5 * IN, 2 * 0.11 * IN2, 8 * IN, 3, Trail.off());
        assertEquals(0.367, b.ktr() / IN, 0.001);
        assertEquals(44, b.ld() / IN, 0.5);
    }

    @Test
    void simplifiedExpressionLightweightTopBars() {
        // McCormac & Brown 9th ed., Example 7.4(a): #8 top bars, lightweight concrete (lambda = 0.75),
        // f'c = 3500 psi, fy = 60 ksi, simplified expression -> 88 diameters
        double ld = Development.simplified(Sections.us("8"), usMaterials(3500, 0.75), US, true, true);
        assertEquals(88, ld / IN, 0.5);
    }

    @Test
    void minimumLength() {
        // ACI 318-19 25.4.2.1(b): ld >= 300 mm
        Materials m = new Materials(40, 420, 420, 20, 1.0);
        var r = Development.general(Sections.si("10"), m, CodeEquations.SI, false, 60, 0, 0, 0, Trail.off());
        assertEquals(300, r.ld(), 1e-9);
    }

    @Test
    void crackedAndGrossSectionOfTextbookBeam() {
        // McCormac & Brown 9th ed., Example 6.1 (section of Example 2.3): b = 12 in, h = 20 in, d = 17 in,
        // As = 3.00 in², f'c = 3000 psi -> Ig = 8000 in⁴, yt = 10 in, Ec = 3.122 x 10^6 psi, Mcr = 27.4 ft-k.
        // The book rounds n to 9 (Icr = 4067 in⁴); ACI 318-19 n = Es/Ec = 29,000/3122 = 9.29, and the hand
        // evaluation gives kd = 6.861 in and Icr = 12(6.861)³/3 + 9.29(3)(17 - 6.861)² = 4157 in⁴.
        Materials m = usMaterials(3000, 1.0);
        var s = Deflection.stiffness(
                SectionShape.rectangular(12 * IN, 20 * IN),
                Bending.SAGGING,
                m,
                US,
                new double[] {17 * IN},
                new double[] {3.00 * IN2});
        double in4 = Math.pow(IN, 4);
        assertEquals(8000, s.ig() / in4, 1e-6);
        assertEquals(10, s.yt() / IN, 1e-9);
        assertEquals(3.122e6, s.ec() * CodeEquations.PSI_PER_MPA, 1e3);
        assertEquals(27.4, s.mcr() / KIP_FT, 0.05);
        assertEquals(6.861, s.kd() / IN, 0.005);
        assertEquals(4157, s.icr() / in4, 3);
        // ACI 318-19 Table 24.2.3.5 at Ma = 50 ft-k (the example's dead load): hand evaluation
        // Ie = 4157 / (1 - (18.27/50)² (1 - 4157/8000)) = 4442 in⁴
        assertEquals(4442, Deflection.ie(50 * KIP_FT, s) / in4, 4);
        // 24.2.4.1.1 with no compression steel: lambda = 2.0 (the example's lambda for five years)
        assertEquals(2.0, Deflection.lambdaDelta(0), 1e-12);
        // Ie = Ig below (2/3) Mcr
        assertEquals(s.ig(), Deflection.ie(10 * KIP_FT, s), 1e-6);
    }

    @Test
    void simpleSpanDeflectionFromMoment() {
        // 5 w L⁴ / (384 E I) written with M = w L² / 8 (common practice, no source): w = 10 N/mm, L = 6000 mm,
        // E = 25 000 MPa, I = 2e9 mm⁴ -> 5 x 10 x 6000⁴ / (384 x 25000 x 2e9) = 3.375 mm
        double m = 10 * 6000.0 * 6000.0 / 8;
        assertEquals(3.375, Deflection.spanDeflection(EndCondition.SIMPLE, 6000, 25_000, 2e9, 0, m, 0), 1e-9);
        // cantilever w L⁴ / (8 E I) with M = w L² / 2: w = 10, L = 2000 -> 10 x 2000⁴ / (8 x 25000 x 2e9) = 0.4 mm
        double mc = 10 * 2000.0 * 2000.0 / 2;
        assertEquals(0.4, Deflection.spanDeflection(EndCondition.CANTILEVER, 2000, 25_000, 2e9, mc, 0, 0), 1e-9);
    }

    @Test
    void rhoPrimeTakesTheCompressionFaceWidth() {
        // ACI 318-19 24.2.4.1.1 with Chapter 2's notation (b = width of the compression face): under sagging
        // a top flange is the compression face, so rho' = As' / (bf d); under hogging the web's width.
        BarSize bar = Sections.si("25");
        SectionShape tee = new SectionShape(300, 500, new Flange(1200, 120, false));
        BeamSection s = Sections.section(
                tee,
                Sections.materials(28, 420),
                Sections.detailing(40, Sections.si("10")),
                CodeEquations.SI,
                Sections.bottomAtDepth(bar, 4, 500, 440),
                Sections.topAt(bar, 2, 60));
        double as = bar.area();
        assertEquals(2 * as / (1200 * 440), SpanChecks.rhoPrime(s, Bending.SAGGING), 1e-12);
        assertEquals(4 * as / (300 * (500 - 60)), SpanChecks.rhoPrime(s, Bending.HOGGING), 1e-12);
    }

    @Test
    void lightweightConcreteRaisesMinimumDepthAndLowersEc() {
        // ACI 318-19 9.3.1.1.2: factor max(1.65 - 0.0003 wc, 1.09); at wc = 1440 kg/m3 it is 1.218.
        // Table 9.3.1.1 simply supported l/16 with fy = 420 MPa: 6000 / 16 x (0.4 + 420/700) = 375 mm.
        Materials normal = new Materials(28, 420, 420, 20, 1.0);
        Materials light = new Materials(28, 420, 420, 20, 0.75);
        assertEquals(375.0, SpanChecks.minimumDepth(6000, EndCondition.SIMPLE, normal, CodeEquations.SI), 1e-9);
        assertEquals(375.0 * 1.218, SpanChecks.minimumDepth(6000, EndCondition.SIMPLE, light, CodeEquations.SI), 1e-9);
        // 19.2.2.1(a): Ec = wc^1.5 x 0.043 sqrt(f'c) = 1440^1.5 x 0.043 x sqrt(28) = 12 433 MPa at wc = 1440;
        // 19.2.2.1(b): 4700 sqrt(28) = 24 870 MPa for normal-weight concrete
        assertEquals(24870, Deflection.ec(normal, CodeEquations.SI), 1);
        assertEquals(12433, Deflection.ec(light, CodeEquations.SI), 1);
    }
}
