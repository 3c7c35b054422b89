package barfit.section;

import barfit.section.trail.Trail;
import java.util.List;
import java.util.Optional;

/** Everything the section model says about one section under one demand. */
public record CheckReport(
        BeamSection section,
        Demand demand,
        FlexureResult flexure,
        ShearResult shear,
        List<CheckResult> checks,
        Trail trail) {

    public CheckReport {
        checks = List.copyOf(checks);
    }

    public boolean ok() {
        for (CheckResult c : checks) {
            if (!c.pass()) {
                return false;
            }
        }
        return true;
    }

    public List<CheckResult> failures() {
        return checks.stream().filter(c -> !c.pass()).toList();
    }

    public Optional<CheckResult> check(String id) {
        return checks.stream().filter(c -> c.id().equals(id)).findFirst();
    }

    /** The check with the highest utilisation: what governs this section. */
    public CheckResult governing() {
        CheckResult worst = null;
        for (CheckResult c : checks) {
            if (worst == null || c.ratio() > worst.ratio()) {
                worst = c;
            }
        }
        return worst;
    }
}
