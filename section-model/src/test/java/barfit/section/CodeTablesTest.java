package barfit.section;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class CodeTablesTest {
    private static final CodeEquations SI = CodeEquations.SI;
    private static final CodeEquations US = CodeEquations.INCH_POUND;

    @Test
    void beta1FollowsTable22_2_2_4_3() {
        // ACI 318-19 Table 22.2.2.4.3 (SI): 0.85 for 17 <= f'c <= 28; 0.85 - 0.05(f'c - 28)/7; 0.65 for f'c >= 55
        assertEquals(0.85, CodeTables.beta1(17, SI), 1e-12);
        assertEquals(0.85, CodeTables.beta1(28, SI), 1e-12);
        assertEquals(0.80, CodeTables.beta1(35, SI), 1e-12);
        assertEquals(0.75, CodeTables.beta1(42, SI), 1e-12);
        assertEquals(0.65, CodeTables.beta1(55, SI), 1e-12);
        assertEquals(0.65, CodeTables.beta1(80, SI), 1e-12);
        // ACI 318-19 Table 22.2.2.4.3 (inch-pound): 0.85 to 4000 psi, less 0.05 per 1000 psi, 0.65 from 8000 psi
        assertEquals(0.85, CodeTables.beta1(4000 / CodeEquations.PSI_PER_MPA, US), 1e-12);
        assertEquals(0.80, CodeTables.beta1(5000 / CodeEquations.PSI_PER_MPA, US), 1e-12);
        assertEquals(0.65, CodeTables.beta1(8000 / CodeEquations.PSI_PER_MPA, US), 1e-12);
    }

    @Test
    void phiFollowsTable21_2_2() {
        double epsTy = 420.0 / 200_000; // 21.2.2.1: eps_ty = fy/Es
        // ACI 318-19 Table 21.2.2: compression-controlled 0.65 (other transverse reinforcement)
        assertEquals(0.65, CodeTables.phiFlexure(0.001, epsTy), 1e-12);
        assertEquals(0.65, CodeTables.phiFlexure(epsTy, epsTy), 1e-12);
        // tension-controlled 0.90 at eps_t >= eps_ty + 0.003
        assertEquals(0.90, CodeTables.phiFlexure(epsTy + 0.003, epsTy), 1e-12);
        assertEquals(0.90, CodeTables.phiFlexure(0.02, epsTy), 1e-12);
        // transition: 0.65 + 0.25 (eps_t - eps_ty)/0.003, linear; half way is 0.775
        assertEquals(0.775, CodeTables.phiFlexure(epsTy + 0.0015, epsTy), 1e-12);
        assertEquals("transition", CodeTables.strainClass(0.004, epsTy));
    }

    @Test
    void minimumDepthFollowsTable9_3_1_1() {
        // ACI 318-19 Table 9.3.1.1: l/16, l/18.5, l/21, l/8 for fy = 420 MPa
        assertEquals(16.0, EndCondition.SIMPLE.minDepthDivisor());
        assertEquals(18.5, EndCondition.ONE_END_CONTINUOUS.minDepthDivisor());
        assertEquals(21.0, EndCondition.BOTH_ENDS_CONTINUOUS.minDepthDivisor());
        assertEquals(8.0, EndCondition.CANTILEVER.minDepthDivisor());
    }

    @Test
    void inchPoundConstantsAreExactConversions() {
        // ACI 318-19 22.5.5.1 (inch-pound): Vc = 2 lambda sqrt(f'c) bw d with psi and in; in SI terms the
        // coefficient is 2 / sqrt(145.038) = 0.1661 (the SI edition rounds it to 0.17)
        assertEquals(0.16607, US.vcSimple().si(), 1e-5);
        // Es = 29,000,000 psi (20.2.2.2 inch-pound) = 199,948 MPa
        assertEquals(199_948, US.es(), 1.0);
        // 25.2.1: 1 in clear spacing
        assertEquals(25.4, US.minClearSpacing(), 1e-12);
    }
}
