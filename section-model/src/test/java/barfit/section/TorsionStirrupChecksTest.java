package barfit.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.catalogs.BarSize;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * {@link TorsionChecks#stirrupChecks}, the searches' question about stirrups under torsion, gives exactly
 * what {@link SectionChecks#run} reports for the same checks, and only gets easier as the stirrups close up
 * or gain legs (the property the stirrup search's bisection relies on).
 */
class TorsionStirrupChecksTest {
    private static final double KNM = 1e6;
    private static final BarSize NO10 = Sections.si("10");
    private static final BarSize NO13 = Sections.si("13x");
    private static final List<String> IDS = List.of(
            "torsion_section",
            "torsion_transverse",
            "torsion_transverse_min",
            "torsion_spacing",
            "torsion_closed_stirrups",
            "torsion_bar_size");

    /** A 350 × 600 mm web (invented): 4 No. 25 bottom, 2 top bars of {@code top}, No. 13 skin bars at 100 mm. */
    private static BeamSection section(BarSize stirrupBar, Stirrups st, BarSize top) {
        Detailing det = Sections.detailing(40, stirrupBar);
        List<BarLayer> layers = new ArrayList<>(
                BeamSection.stack(Face.BOTTOM, List.of(new BeamSection.BarGroup(Sections.si("25"), 4)), det));
        layers.addAll(BeamSection.stack(Face.TOP, List.of(new BeamSection.BarGroup(top, 2)), det));
        return new BeamSection(
                new SectionShape(350, 600, null),
                Sections.materials(28, 420),
                det,
                layers,
                st,
                new SkinBars(NO13, 100),
                CodeEquations.SI);
    }

    @Test
    void givesWhatTheFullChecksGive() {
        java.util.Set<String> outcomes = new java.util.HashSet<>();
        for (double tu : new double[] {5, 30, 60, 120}) {
            for (Double vu : new Double[] {null, 80e3, 300e3}) {
                for (int legs : new int[] {2, 3, 4}) {
                    for (double s : new double[] {75, 100, 150, 200, 300, 500}) {
                        for (BarSize top : new BarSize[] {NO10, Sections.si("16")}) {
                            BarSize bar = top == NO10 ? NO13 : NO10;
                            BeamSection sec = section(bar, new Stirrups(bar, legs, s), top);
                            Demand demand = new Demand(200 * KNM, vu, tu * KNM);
                            CheckReport full = SectionChecks.run(sec, demand, null, Trail.off());
                            double d = full.flexure().tensionSteelArea() > 0
                                    ? full.flexure().d()
                                    : full.flexure().dt();
                            List<CheckResult> mine = TorsionChecks.stirrupChecks(
                                    sec, demand, d, full.flexure().tensionSteelArea());
                            boolean neglected = full.check("torsion_threshold")
                                    .orElseThrow()
                                    .title()
                                    .contains("neglected");
                            double as = full.flexure().tensionSteelArea();
                            if (neglected) {
                                assertTrue(mine.isEmpty());
                                assertTrue(TorsionChecks.stirrupsPass(sec, demand, d, as));
                                continue;
                            }
                            assertEquals(IDS, mine.stream().map(CheckResult::id).toList());
                            for (CheckResult c : mine) {
                                assertEquals(full.check(c.id()).orElseThrow(), c, c.id());
                            }
                            assertEquals(
                                    mine.stream().allMatch(CheckResult::pass),
                                    TorsionChecks.stirrupsPass(sec, demand, d, as));
                            assertEquals(
                                    mine.stream()
                                            .filter(c -> !c.id().equals("torsion_section"))
                                            .allMatch(CheckResult::pass),
                                    TorsionChecks.stirrupsPass(sec, demand, d, as, false));
                            outcomes.add(mine.stream()
                                    .map(c -> c.id() + "=" + c.pass() + "/" + c.title())
                                    .toList()
                                    .toString());
                        }
                    }
                }
            }
        }
        // the cases reach both forms of the transverse check and each check passing and failing
        for (String id : IDS) {
            assertTrue(outcomes.stream().anyMatch(o -> o.contains(id + "=true")), id + " passes somewhere");
            if (!id.equals("torsion_closed_stirrups")) {
                assertTrue(outcomes.stream().anyMatch(o -> o.contains(id + "=false")), id + " fails somewhere");
            }
        }
        assertTrue(outcomes.stream().anyMatch(o -> o.contains("Outer hoop leg")));
    }

    @Test
    void onlyGetsEasierAsTheStirrupsCloseUpOrGainLegs() {
        double[] spacings = {50, 75, 100, 125, 150, 175, 200, 250, 300};
        for (double tu : new double[] {20, 50, 80, 110}) {
            for (Double vu : new Double[] {null, 100e3, 250e3, 400e3}) {
                for (BarSize bar : new BarSize[] {NO10, NO13}) {
                    boolean[] previousLegs = null;
                    for (int legs = 2; legs <= 4; legs++) {
                        boolean[] pass = new boolean[spacings.length];
                        for (int i = 0; i < spacings.length; i++) {
                            BeamSection sec = section(bar, new Stirrups(bar, legs, spacings[i]), NO10);
                            Demand demand = new Demand(150 * KNM, vu, tu * KNM);
                            FlexureResult fr = Flexure.analyse(sec, Bending.SAGGING);
                            pass[i] = TorsionChecks.stirrupsPass(sec, demand, fr.d(), fr.tensionSteelArea());
                            if (i > 0 && !pass[i - 1]) {
                                assertFalse(pass[i], "passes at " + spacings[i] + " but not closer");
                            }
                            if (previousLegs != null && previousLegs[i]) {
                                assertTrue(pass[i], "fails with " + legs + " legs at " + spacings[i]);
                            }
                        }
                        previousLegs = pass;
                    }
                }
            }
        }
    }
}
