package barfit.study;

import barfit.design.Diagnosis;
import barfit.design.span.SpanDesigner;
import barfit.section.Stirrups;

/**
 * The words a study needs, in the user's units. The study composes its options and reasons; the reports
 * word the parts: lengths, stresses, stirrups, and why a design is impossible.
 */
public interface Say {
    String length(double mm);

    String stress(double mpa);

    /** "No. 10 × 2 legs @ 150 mm". */
    String stirrups(Stirrups s);

    /** Why a single section has no design. */
    String why(Diagnosis d);

    /** Why a whole span has no design. */
    String why(SpanDesigner.Diagnosis d);
}
