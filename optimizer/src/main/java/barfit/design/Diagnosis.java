package barfit.design;

import java.util.List;

/**
 * Why no layout passes: the limit that binds, the strongest ductile layout within the limits and
 * its phi Mn, and the least changes (one limit relaxed at a time) that would give a passing design.
 */
public record Diagnosis(String limit, String summary, Layout strongest, double strongestPhiMn, List<String> fixes) {
    public Diagnosis {
        fixes = List.copyOf(fixes);
    }
}
