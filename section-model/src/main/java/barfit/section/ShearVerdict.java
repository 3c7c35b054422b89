package barfit.section;

/**
 * The pass/fail of each shear check of one section (22.5.1.2 section size, 22.5 strength, 9.6.3
 * minimum reinforcement, 9.7.6.2.2 spacing along and across), decided once and shared by the check
 * report and by the search.
 */
public record ShearVerdict(
        boolean sectionOk, boolean strengthOk, boolean minimumOk, boolean spacingOk, boolean legsOk) {

    public boolean all() {
        return sectionOk && strengthOk && minimumOk && spacingOk && legsOk;
    }

    /**
     * The parts that only get easier as the stirrups get closer: section size, strength and minimum
     * area. (The spacing limits along and across are not among them: both tighten when Vs becomes
     * large, 9.7.6.2.2.)
     */
    public boolean strengthAndMinimum() {
        return sectionOk && strengthOk && minimumOk;
    }
}
