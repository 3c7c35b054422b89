package barfit.report;

import barfit.design.Diagnosis;
import barfit.design.span.SpanDesigner;
import barfit.section.Stirrups;
import barfit.section.trail.Dim;
import barfit.study.Say;
import barfit.units.UnitSystem;

/** The words a study needs, in the user's units. */
public final class StudySay implements Say {
    private final UnitSystem units;

    public StudySay(UnitSystem units) {
        this.units = units;
    }

    @Override
    public String length(double mm) {
        return units.compact(mm, Dim.LENGTH) + " " + units.unit(Dim.LENGTH);
    }

    @Override
    public String stress(double mpa) {
        return units.compact(mpa, Dim.STRESS) + " " + units.unit(Dim.STRESS);
    }

    @Override
    public String stirrups(Stirrups s) {
        return Words.stirrups(s, units);
    }

    @Override
    public String why(Diagnosis d) {
        return DiagnosisWords.summary(d, units);
    }

    @Override
    public String why(SpanDesigner.Diagnosis d) {
        return DiagnosisWords.summary(d, units);
    }
}
