package barfit.section;

import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.catalogs.BarSize;
import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

/** phi Mn grows as tension bars are added, as long as the section stays ductile (eps_t >= 0.004). */
class MonotonicityTest {
    private static final BarSize[] BARS = {Sections.si("16"), Sections.si("19"), Sections.si("25"), Sections.si("29")};

    @Property(tries = 400, seed = "42")
    void phiMnNonDecreasingWithTensionSteelWhileDuctile(
            @ForAll @IntRange(min = 200, max = 500) int width,
            @ForAll @IntRange(min = 350, max = 1000) int height,
            @ForAll @DoubleRange(min = 20, max = 70) double fc,
            @ForAll @DoubleRange(min = 280, max = 550) double fy,
            @ForAll @IntRange(min = 0, max = 3) int barIndex,
            @ForAll @IntRange(min = 0, max = 4) int hangers,
            @ForAll boolean flanged) {
        BarSize bar = BARS[barIndex];
        Materials m = new Materials(fc, fy, fy, 20, 1.0);
        Detailing det = new Detailing(40, Sections.si("10"), 25, Exposure.INTERIOR);
        SectionShape shape = new SectionShape(width, height, flanged ? new Flange(width + 800, 120, false) : null);
        int max = BarSpacing.maxBars(width, det, bar, m, CodeEquations.SI);
        double previous = 0;
        for (int n = 1; n <= 2 * max; n++) {
            int n1 = Math.min(n, max);
            int n2 = n - n1;
            List<BeamSection.BarGroup> groups = n2 == 0
                    ? List.of(new BeamSection.BarGroup(bar, n1))
                    : List.of(new BeamSection.BarGroup(bar, n1), new BeamSection.BarGroup(bar, n2));
            var layers = new java.util.ArrayList<>(BeamSection.stack(Face.BOTTOM, groups, det));
            if (hangers > 0) {
                layers.addAll(BeamSection.stack(
                        Face.TOP, List.of(new BeamSection.BarGroup(Sections.si("16"), Math.min(hangers + 1, 4))), det));
            }
            BeamSection s = new BeamSection(shape, m, det, layers, null, null, CodeEquations.SI);
            FlexureResult r = Flexure.analyse(s, Bending.SAGGING);
            if (r.epsT() < CodeTables.EPS_T_MIN_BEAM) {
                break;
            }
            assertTrue(
                    r.phiMn() >= previous * (1 - 1e-12),
                    "phi Mn fell from " + previous + " to " + r.phiMn() + " at " + n + " bars");
            previous = r.phiMn();
        }
    }
}
