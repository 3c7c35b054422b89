package barfit.report;

import barfit.design.DesignOutcome;
import barfit.design.beam.BeamDesigner;

/** One beam's answer: a single section's or a whole span's (exactly one is set). */
public record DesignItem(DesignOutcome section, BeamDesigner.Outcome whole) {
    public boolean feasible() {
        return section != null ? section.feasible() : whole.feasible();
    }

    public static DesignItem of(DesignOutcome o) {
        return new DesignItem(o, null);
    }

    public static DesignItem of(BeamDesigner.Outcome o) {
        return new DesignItem(null, o);
    }
}
