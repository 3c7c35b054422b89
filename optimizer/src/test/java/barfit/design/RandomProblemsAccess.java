package barfit.design;

import java.util.Random;

/** Lets tests in other packages draw the same random problems. */
public final class RandomProblemsAccess {
    private RandomProblemsAccess() {
    }

    public static SectionProblem small(Random r) {
        return RandomProblems.small(r);
    }

    public static SectionProblem medium(Random r) {
        return RandomProblems.medium(r);
    }
}
