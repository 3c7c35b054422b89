package barfit.input;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The plausible ranges of the input: the same in both unit systems, and hints where a unit slipped. */
class InputLimitsTest {

    static List<InputLimits.Range> ranges() throws IllegalAccessException {
        List<InputLimits.Range> out = new ArrayList<>();
        for (Field f : InputLimits.class.getFields()) {
            if (Modifier.isStatic(f.getModifiers()) && f.getType() == InputLimits.Range.class) {
                out.add((InputLimits.Range) f.get(null));
            }
        }
        return out;
    }

    @Test
    void siAndInchPoundBoundsAreAboutTheSame() throws IllegalAccessException {
        List<InputLimits.Range> all = ranges();
        assertTrue(all.size() >= 15, "every range is a public constant: " + all.size());
        for (InputLimits.Range r : all) {
            assertTrue(
                    r.min(UnitSystem.SI) < r.max(UnitSystem.SI) && r.min(UnitSystem.US) < r.max(UnitSystem.US),
                    r.what());
            // rounded in each system, so within a factor of 1.6 of each other (converted to SI)
            double maxRatio = UnitSystem.US.toSI(r.usMax(), r.dim()) / UnitSystem.SI.toSI(r.siMax(), r.dim());
            assertTrue(maxRatio > 1 / 1.6 && maxRatio < 1.6, r.what() + " max: " + maxRatio);
            if (r.siMin() > 0) {
                double minRatio = UnitSystem.US.toSI(r.usMin(), r.dim()) / UnitSystem.SI.toSI(r.siMin(), r.dim());
                assertTrue(minRatio > 1 / 2.0 && minRatio < 2.0, r.what() + " min: " + minRatio);
            } else {
                assertEquals(0.0, r.usMin(), r.what());
            }
        }
    }

    @Test
    void aValueOutOfRangeSaysTheRangeAndAUnitThatWouldFit() {
        assertNull(InputLimits.SPAN.problem(UnitSystem.SI, 7.2));
        assertEquals(
                "expected a span from 0.3 to 60 m, got 7200 (7200 m: did you give mm? spans are in m)",
                InputLimits.SPAN.problem(UnitSystem.SI, 7200));
        assertEquals(
                "expected a span from 1 to 200 ft, got 7200 (7200 ft: did you give mm? spans are in ft)",
                InputLimits.SPAN.problem(UnitSystem.US, 7200));
        assertEquals(
                "expected a span from 1 to 200 ft, got 300 (300 ft: did you give in? spans are in ft)",
                InputLimits.SPAN.problem(UnitSystem.US, 300));
        assertEquals(
                "expected a clear cover from 0.375 to 6 in, got 40 (40 in: did you give mm? inch-pound lengths "
                        + "are in in, or write units: SI)",
                InputLimits.COVER.problem(UnitSystem.US, 40));
        assertEquals(
                "expected a web width from 100 to 3000 mm, got 0.3 (0.3 mm: did you give m? SI lengths are in mm)",
                InputLimits.WEB_WIDTH.problem(UnitSystem.SI, 0.3));
        assertEquals(
                "expected a clear cover from 10 to 150 mm, got 1.5 (1.5 mm: did you give in? SI lengths are in "
                        + "mm, or write units: US)",
                InputLimits.COVER.problem(UnitSystem.SI, 1.5));
        assertEquals(
                "expected a web width from 100 to 3000 mm, got 1.00e+300",
                InputLimits.WEB_WIDTH.problem(UnitSystem.SI, 1e300));
        // moments either way: hogging is negative
        assertNull(InputLimits.MOMENT.problem(UnitSystem.SI, -1200));
        assertEquals(
                "expected a factored moment of at most 150000 kN·m either way, got -1.00e+300",
                InputLimits.MOMENT.problem(UnitSystem.SI, -1e300));
        assertEquals(Dim.NUMBER, InputLimits.RATE.dim());
        assertEquals(
                "expected a rate of at most 10000000, got 1.00e+300", InputLimits.RATE.problem(UnitSystem.SI, 1e300));
    }
}
