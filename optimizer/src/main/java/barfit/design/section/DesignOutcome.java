package barfit.design.section;

import barfit.design.Binding;
import barfit.design.Diagnosis;
import barfit.design.Proof;
import java.util.List;

/**
 * The answer for one beam: optimal, feasible (time limit) or infeasible with a diagnosis; the proof's
 * search counts are the candidate generator's.
 */
public record DesignOutcome(
        SectionProblem problem,
        String status,
        Design best,
        List<Design> alternatives,
        Proof<SectionGenerator.Stats> proof,
        List<Binding> binding,
        Diagnosis diagnosis) {

    public DesignOutcome {
        alternatives = List.copyOf(alternatives);
        binding = List.copyOf(binding);
    }

    public boolean feasible() {
        return best != null;
    }
}
