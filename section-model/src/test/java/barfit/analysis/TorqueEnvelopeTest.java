package barfit.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The torque envelope of a line whose supports restrain twist: hand calculations from 5.3.1 and statics. */
class TorqueEnvelopeTest {
    private static Support wall(double width) {
        return new Support(width, SupportKind.WALL, null, null);
    }

    @Test
    void eachSpanTakesHalfItsTorqueAtEachSupport() {
        // spans 6.6 and 7.2 m centre to centre, 400 mm supports; torque D = 4, L = 2 kN·m/m on every span
        // (N·mm/mm = kN·m/m × 1000). tu = max(1.2 × 4 + 1.6 × 2, 1.4 × 4) = max(8.0, 5.6) = 8.0 kN·m/m (5.3.1b)
        List<Support> supports = List.of(wall(400), wall(400), wall(400));
        List<TorqueEnvelope.SpanTorsion> t = TorqueEnvelope.of(
                List.of(6600.0, 7200.0), supports, List.of(new Torque(1, 4000, 2000), new Torque(2, 4000, 2000)));
        assertEquals(2, t.size());
        TorqueEnvelope.SpanTorsion second = t.get(1);
        assertEquals(8000, second.factored(), 1e-9);
        // statics, each support restraining twist: T(x) = tu (L/2 − x); at the left face x = 200 mm:
        // 8.0 × (3.6 − 0.2) = 27.2 kN·m, the same at the right face, none at mid clear span
        assertEquals(27.2e6, second.atLeftFace(), 1e-3);
        assertEquals(27.2e6, second.atRightFace(), 1e-3);
        assertEquals(0, second.atMidClear(), 1e-3);
        // at the critical section d = 487.8 mm from the face (9.4.4.2): 8.0 × (3.6 − 0.2 − 0.4878) = 23.30 kN·m
        assertEquals(8.0 * (3.6 - 0.2 - 0.4878) * 1e6, second.atLeftCritical(487.8), 1e-3);
        assertEquals(23.30, second.atRightCritical(487.8) / 1e6, 0.01);
        // the first span: 8.0 × (3.3 − 0.2) = 24.8 kN·m at its faces
        assertEquals(24.8e6, t.get(0).atLeftFace(), 1e-3);
    }

    @Test
    void deadAloneGovernsWhereTheLiveTorqueIsSmall() {
        // D = 5, L = 0.5 kN·m/m: max(1.2 × 5 + 1.6 × 0.5, 1.4 × 5) = max(6.8, 7.0) = 7.0 kN·m/m (5.3.1a)
        List<TorqueEnvelope.SpanTorsion> t =
                TorqueEnvelope.of(List.of(6000.0), List.of(wall(300), wall(500)), List.of(new Torque(1, 5000, 500)));
        assertEquals(7000, t.get(0).factored(), 1e-9);
        // unequal supports: the torsion is nil at L/2 = 3.0 m from the left centre line, not at mid clear
        // span (150 + 5.6/2 = 2.95 m): there |T| = 7.0 × (3.0 − 2.95) = 0.35 kN·m; at the faces
        // 7.0 × (3.0 − 0.15) = 19.95 and 7.0 × (6.0 − 0.25 − 3.0) = 19.25 kN·m
        assertEquals(0.35e6, t.get(0).atMidClear(), 1e-3);
        assertEquals(19.95e6, t.get(0).atLeftFace(), 1e-3);
        assertEquals(19.25e6, t.get(0).atRightFace(), 1e-3);
    }

    @Test
    void spansWithoutTorqueAreLeftOut() {
        List<TorqueEnvelope.SpanTorsion> t = TorqueEnvelope.of(
                List.of(6000.0, 6000.0), List.of(wall(300), wall(300), wall(300)), List.of(new Torque(2, 1000, 0)));
        assertEquals(1, t.size());
        assertEquals(2, t.get(0).index());
        assertTrue(t.get(0).atLeftFace() > 0);
    }
}
