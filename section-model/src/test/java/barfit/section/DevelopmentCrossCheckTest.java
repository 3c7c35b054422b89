package barfit.section;

import static org.junit.jupiter.api.Assertions.assertEquals;

import barfit.section.trail.Trail;
import org.junit.jupiter.api.Test;

/**
 * The general equation of 25.4.2.4 against the simplified expressions of Table 25.4.2.3, where the table
 * applies: its first row is the general equation with (cb + Ktr)/db = 1.5 (ACI 318-19 commentary R25.4.2.3,
 * from memory). In inch-pound the two agree exactly; ACI 318M-19 rounds the table's coefficients (1.7 and
 * 2.1 against the general equation's 1.1 × 1.5 = 1.65 and 1.65 / 0.8 = 2.0625).
 */
class DevelopmentCrossCheckTest {
    private static final double IN = Sections.IN;

    private static Materials us(double fcPsi) {
        return new Materials(fcPsi / CodeEquations.PSI_PER_MPA, 60 * Sections.KSI, 60 * Sections.KSI, 19.05, 1.0);
    }

    @Test
    void inchPoundFirstRowIsTheGeneralEquationAtOnePointFive() {
        // #8, f'c = 4000 psi: simplified fy ψt ψe ψg / (20 λ √f'c) db = 60 000 / (20 × 63.246) = 47.43 in;
        // general (3/40)(60 000 / 63.246)(1.0 / 1.5) = 47.43 in
        CodeEquations us = CodeEquations.INCH_POUND;
        double simple = Development.simplified(Sections.us("8"), us(4000), us, false, true);
        double general = Development.general(Sections.us("8"), us(4000), us, false, 1.5 * IN, 0, 0, 0, Trail.off())
                .ld();
        assertEquals(47.434, simple / IN, 0.001);
        assertEquals(simple, general, 1e-9);
        // top bars: both × 1.3 = 61.66 in
        double top = Development.simplified(Sections.us("8"), us(4000), us, true, true);
        assertEquals(
                top,
                Development.general(Sections.us("8"), us(4000), us, true, 1.5 * IN, 0, 0, 0, Trail.off())
                        .ld(),
                1e-9);
        // #6 and smaller (ψs = 0.8): 60 000 / (25 × 63.246) × 0.75 = 28.46 in both ways
        var six = Sections.bar("#6", 0.75 * IN, 0.44 * IN * IN);
        double s6 = Development.simplified(six, us(4000), us, false, true);
        assertEquals(28.460, s6 / IN, 0.001);
        assertEquals(
                s6,
                Development.general(six, us(4000), us, false, 1.5 * 0.75 * IN, 0, 0, 0, Trail.off())
                        .ld(),
                1e-9);
    }

    @Test
    void siEditionRoundsTheTableCoefficients() {
        // ACI 318M-19: No. 25, f'c = 28 MPa, fy = 420 MPa: general with (cb + Ktr)/db = 1.5 divides by
        // 1.1 × 1.5 = 1.65, the table by 1.7: general / simplified = 1.7 / 1.65
        CodeEquations si = CodeEquations.SI;
        Materials m = Sections.materials(28, 420);
        double general = Development.general(Sections.si("25"), m, si, false, 1.5 * 25.4, 0, 0, 0, Trail.off())
                .ld();
        double simple = Development.simplified(Sections.si("25"), m, si, false, true);
        assertEquals(1.7 / 1.65, general / simple, 1e-12);
        // No. 19 and smaller (ψs = 0.8): 1.65 / 0.8 = 2.0625 against the table's 2.1
        double g19 = Development.general(Sections.si("19"), m, si, false, 1.5 * 19.1, 0, 0, 0, Trail.off())
                .ld();
        double s19 = Development.simplified(Sections.si("19"), m, si, false, true);
        assertEquals(2.1 / 2.0625, g19 / s19, 1e-12);
    }
}
