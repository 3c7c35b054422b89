package barfit.section;

import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.List;

/**
 * The torsion checks of one stirrup zone of a beam, as {@link TorsionChecks#run} makes them for the section
 * the zone is designed with: every bar that is there (the longitudinal steel round the hoop, whether or not
 * flexure counts it at that section), the zone's stirrups, and the zone's demand (the moment of its section,
 * its design shear and its design torsion). Ids carry the zone's name ("torsion_transverse.left"...).
 */
public final class TorsionZone {
    private TorsionZone() {}

    /** {@code physical}: the zone's section with every bar present; {@code demand} carries the zone's Tu. */
    public static List<CheckResult> checks(BeamSection physical, Demand demand, Span span, String zone, Trail trail) {
        FlexureResult fr = Flexure.analyse(physical, demand.bending());
        ShearResult shear = null;
        if (demand.vu() != null) {
            double d = fr.tensionSteelArea() > 0 ? fr.d() : fr.dt();
            shear = Shear.analyse(physical, Math.abs(demand.vu()), d, fr.tensionSteelArea(), Trail.off());
        }
        if (trail.isOn()) {
            trail.note("Stirrup zone '" + zone + "' under torsion: every bar at its section, its stirrups, "
                    + "its design shear and torsion.");
        }
        List<CheckResult> named = new ArrayList<>();
        for (CheckResult c : TorsionChecks.run(physical, demand, span, fr, shear, trail)) {
            named.add(c.inZone(zone));
        }
        return named;
    }
}
