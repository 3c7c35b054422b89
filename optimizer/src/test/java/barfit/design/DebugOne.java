package barfit.design;

import java.util.Random;
import org.junit.jupiter.api.Test;

class DebugOne {
    @Test
    void run() {
        int target = Integer.getInteger("inst", -1);
        if (target < 0) return;
        Random rnd = new Random(Long.getLong("oracle.seed", 318_19L));
        SectionProblem p = null;
        for (int i = 0; i <= target; i++) p = Boolean.getBoolean("oracle.medium") ? RandomProblems.medium(rnd) : RandomProblems.small(rnd);
        var cost = OracleTest.COST;
        System.out.println(p.space() + " mu=" + p.mu() + " vu=" + p.vu() + " span=" + p.span() + " cap=" + p.maxDepth());
        var out = new CandidateGenerator(p, cost).generate(1);
        out.candidates().forEach(c -> System.out.println(c.units() + " " + c.layout()));
        System.out.println(out.stats());
        var ref = new ExhaustiveSearch(cost).solve(p);
        System.out.println("oracle " + ref.units() + " " + ref.best());
    }
}
