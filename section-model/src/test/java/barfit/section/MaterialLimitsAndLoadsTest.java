package barfit.section;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class MaterialLimitsAndLoadsTest {
    @Test
    void leastConcreteStrengthFollowsTable19_2_1_1() {
        // Table 19.2.1.1: f'c at least 17 MPa (ACI 318M-19), 2500 psi (ACI 318-19)
        assertEquals(17, MaterialLimits.fcMin(CodeEquations.SI), 1e-12);
        assertEquals(2500, MaterialLimits.fcMin(CodeEquations.INCH_POUND) * CodeEquations.PSI_PER_MPA, 1e-9);
        // 19.2.4: lambda from 0.75 (all-lightweight) to 1.0
        assertEquals(0.75, MaterialLimits.LAMBDA_MIN, 0);
        assertEquals(1.0, MaterialLimits.LAMBDA_MAX, 0);
    }

    @Test
    void strengthCombinationsFollow5_3_1() {
        // 5.3.1 (b) 1.2 D + 1.6 L governs when live load is not small: D = 10, L = 5 gives 20 against 14
        assertEquals(20, LoadCombinations.factored(10, 5), 1e-12);
        // 5.3.1 (a) 1.4 D governs when L < D / 8: D = 10, L = 0.5 gives 14 against 12.8
        assertEquals(14, LoadCombinations.factored(10, 0.5), 1e-12);
    }
}
