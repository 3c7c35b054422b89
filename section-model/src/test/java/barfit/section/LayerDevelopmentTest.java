package barfit.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.section.trail.Trail;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The development length of a layer as built (what `check` reports per layer), against hand calculations
 * of ACI 318M-19 25.4.2.4 written from the clause. Bar data of ASTM A615M: No. 25 db = 25.4 mm, 510 mm²;
 * No. 10 db = 9.5 mm, 71 mm².
 */
class LayerDevelopmentTest {
    private static final CodeEquations SI = CodeEquations.SI;

    @Test
    void bottomLayerWithStirrups() {
        // 300 x 600, cover 40 to No. 10 stirrups (2 legs @ 150), 3 No. 25 bottom; f'c 30, fy 420.
        // Hand calculation (25.4.2.4): side cover to centre 40 + 9.5 + 12.7 = 62.2; centre spacing
        // (300 - 2 x 49.5 - 25.4) / 2 = 87.8, half 43.9 -> cb = 43.9; Ktr = 40 x (2 x 71) / (150 x 3) = 12.62;
        // (cb + Ktr)/db = 56.52 / 25.4 = 2.225; psi all 1.0 (bottom, uncoated, No. 25, Grade 420);
        // ld = 420 / (1.1 x sqrt 30) / 2.225 x 25.4 = 795.7 mm
        BarLayer layer = new BarLayer(Face.BOTTOM, Sections.si("25"), 3, 62.2);
        BeamSection s = new BeamSection(
                new SectionShape(300, 600, null),
                Sections.materials(30, 420),
                Sections.detailing(40, Sections.si("10")),
                List.of(layer),
                new Stirrups(Sections.si("10"), 2, 150),
                null,
                SI);
        var r = Development.ofLayer(s, layer, Trail.off());
        assertEquals(43.9, r.cb(), 0.01);
        assertEquals(12.62, r.ktr(), 0.01);
        assertEquals(795.7, r.ld(), 0.5);
        assertEquals(1.0, r.psiT());
    }

    @Test
    void topLayerOfADeepBeamIsATopBar() {
        // 300 x 600, 2 No. 25 top at 62.2 from the top face, no stirrups: 600 - 62.2 - 12.7 = 525 mm of
        // concrete below (> 300 mm, 25.4.2.5) -> psi_t = 1.3; cb = min(62.2, (201 - 25.4) / 2 = 175.6) = 62.2,
        // (cb + 0)/db = 2.4488; ld = 420 / (1.1 x sqrt 30) x 1.3 / 2.4488 x 25.4 = 940.0 mm (hand calculation)
        BarLayer layer = new BarLayer(Face.TOP, Sections.si("25"), 2, 62.2);
        BeamSection s = new BeamSection(
                new SectionShape(300, 600, null),
                Sections.materials(30, 420),
                Sections.detailing(40, Sections.si("10")),
                List.of(layer),
                null,
                null,
                SI);
        var r = Development.ofLayer(s, layer, Trail.off());
        assertEquals(1.3, r.psiT());
        assertEquals(940.0, r.ld(), 0.5);
        assertTrue(r.confinement() < 2.5);
    }
}
