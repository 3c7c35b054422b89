package barfit.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import barfit.section.trail.Dim;
import org.junit.jupiter.api.Test;

/**
 * Unit conversions against hand calculations. The inch-pound factors follow from the exact definitions
 * (1 in = 25.4 mm; 1 lb = 0.45359237 kg; standard gravity 9.80665 m/s², so 1 lbf = 4.4482216152605 N;
 * NIST SP 811, Appendix B); every expected value below is worked from those by hand, not from the code.
 */
class UnitSystemTest {
    private static final UnitSystem SI = UnitSystem.SI;
    private static final UnitSystem US = UnitSystem.US;

    @Test
    void siInputIsMillimetresNewtonsAndMegapascalsInside() {
        assertEquals(363e6, SI.toSI(363, Dim.MOMENT), 1e-6); // 363 kN·m = 363 x 10^6 N·mm
        assertEquals(210e3, SI.toSI(210, Dim.FORCE), 1e-9); // 210 kN = 210 000 N
        assertEquals(7200, SI.toSI(7.2, Dim.SPAN), 1e-9); // 7.2 m = 7200 mm
        assertEquals(28, SI.toSI(28, Dim.STRESS), 0); // MPa = N/mm²
        assertEquals(28, SI.toSI(28, Dim.LINE_LOAD), 0); // 28 kN/m = 28 N/mm
        assertEquals(300, SI.toSI(300, Dim.LENGTH), 0);
        assertEquals(7.2, SI.fromSI(7200, Dim.SPAN), 1e-12);
    }

    @Test
    void inchPoundLengthsAreasAndSecondMoments() {
        assertEquals(609.6, US.toSI(24, Dim.LENGTH), 1e-9); // 24 in x 25.4
        assertEquals(645.16, US.toSI(1, Dim.AREA), 1e-9); // 1 in² = 25.4²
        assertEquals(416_231.4256, US.toSI(1, Dim.INERTIA), 1e-6); // 1 in⁴ = 25.4⁴
        assertEquals(12_801.6, US.toSI(42, Dim.SPAN), 1e-9); // 42 ft x 304.8 mm
        assertEquals(25.4, US.toSI(1, Dim.AREA_PER_LENGTH), 1e-12); // in²/in -> mm²/mm
        assertEquals(1.4881639, US.toSI(1, Dim.MASS_PER_LENGTH), 1e-7); // 0.45359237 kg / 0.3048 m
        assertEquals(3.400, US.fromSI(5.0598, Dim.MASS_PER_LENGTH), 1e-4); // #9: 5.060 kg/m is 3.400 lb/ft
    }

    @Test
    void inchPoundForcesMomentsAndStresses() {
        assertEquals(422_581.05, US.toSI(95, Dim.FORCE), 0.01); // 95 kip x 4448.2216 N
        assertEquals(827.0489e6, US.toSI(610, Dim.MOMENT), 1e3); // 610 kip·ft x 1.3558179 x 10^6 N·mm
        assertEquals(14.5939029, US.toSI(1, Dim.LINE_LOAD), 1e-7); // 4448.2216 N / 304.8 mm
        // 1 psi = 4.4482216152605 N / 645.16 mm² = 6.894757 x 10^-3 MPa
        assertEquals(34.473786, US.toSI(5000, Dim.STRESS), 1e-6);
        assertEquals(413.685438, US.toSI(60_000, Dim.STRESS), 1e-6);
        assertEquals(60_000, US.fromSI(413.685438, Dim.STRESS), 1e-3);
        // the square root of a stress: sqrt(4000 psi) = 63.2456 √psi is sqrt(27.5790 MPa) = 5.251574 √MPa
        assertEquals(5.251574, US.toSI(Math.sqrt(4000), Dim.ROOT_STRESS), 1e-6);
    }

    @Test
    void codeLimitsReadAsRoundNumbersInTheUsersUnits() {
        // 80 000 psi (Grade 80 bars) held as 80 000 x 6.894757293168e-3 = 551.58058 MPa reads 80000, not 79999.99999
        assertEquals(80_000, US.limit(551.5805834534689, Dim.STRESS), 0);
        assertEquals(1.5, US.limit(38.1, Dim.LENGTH), 0);
    }

    @Test
    void tablesShowTheUnitsDecimals() {
        assertEquals("363.0 kN·m", SI.withUnit(363e6, Dim.MOMENT));
        assertEquals("610.0 kip·ft", US.withUnit(US.toSI(610, Dim.MOMENT), Dim.MOMENT));
        assertEquals("5000 psi", US.withUnit(US.toSI(5000, Dim.STRESS), Dim.STRESS));
        assertEquals("7.200 m", SI.withUnit(7200, Dim.SPAN));
        assertEquals("42.00 ft", US.withUnit(12_801.6, Dim.SPAN));
        assertEquals("645", SI.number(645.16, Dim.AREA));
        assertEquals("1.000", US.number(645.16, Dim.AREA));
        assertEquals("0.0", SI.number(-0.01, Dim.LENGTH), "no negative zero");
        assertEquals("5.400×10^9", SI.number(5.4e9, Dim.INERTIA));
        assertEquals("12.974×10^3", US.number(US.toSI(12_974, Dim.INERTIA), Dim.INERTIA));
    }

    @Test
    void equationsShowAtLeastFourSignificantDigitsWithoutTrailingZeros() {
        assertEquals("0.0021", SI.compact(0.0021, Dim.STRAIN));
        assertEquals("28", SI.compact(28, Dim.STRESS));
        assertEquals("0.1234", SI.compact(0.12341, Dim.NUMBER));
        assertEquals("1.128", US.compact(28.6512, Dim.LENGTH)); // #9: 1.128 in x 25.4 = 28.6512 mm
    }

    @Test
    void jsonNumbersHaveSixSignificantDigitsInTheUsersUnits() {
        assertEquals(123.457, SI.json(123_456.789, Dim.FORCE), 0);
        assertEquals(5000.0, US.json(US.toSI(5000, Dim.STRESS), Dim.STRESS), 0);
        assertEquals(0.0, SI.json(0, Dim.LENGTH), 0);
        assertEquals(1.00000, US.json(645.16, Dim.AREA), 0);
    }
}
