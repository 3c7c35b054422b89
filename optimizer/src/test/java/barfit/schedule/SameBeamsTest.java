package barfit.schedule;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import barfit.design.SolverOptions;
import barfit.design.span.SpanDesigner;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * A schedule designs beams the same but for their marks once and gives each the outcome (check values from the
 * same beams designed one by one, each on its own, with no schedule).
 */
class SameBeamsTest {
    @Test
    void repeatedBeamsGetTheirOwnDesignUnderTheirOwnMark() {
        Random r = new Random(41);
        SolverOptions options = new SolverOptions(30, 1, 1);
        SpanDesigner alone = new SpanDesigner(RationaliseOracleTest.COST, options);
        for (int i = 0; i < 6; i++) {
            ScheduleInput base = RationaliseOracleTest.schedule(r, i);
            List<ScheduleBeam> beams = new ArrayList<>(base.beams());
            // every beam again on two more floors, under new marks and in another order
            for (int floor = 2; floor <= 3; floor++) {
                for (int j = base.beams().size() - 1; j >= 0; j--) {
                    ScheduleBeam b = base.beams().get(j);
                    String mark = "F" + floor + "-" + b.id();
                    beams.add(new ScheduleBeam(
                            mark, b.group(), b.location(), b.problem().withId(mark)));
                }
            }
            ScheduleInput in = new ScheduleInput(
                    base.sources(),
                    base.settings(),
                    base.space(),
                    base.rates(),
                    base.currency(),
                    base.costs(),
                    base.maxBarSizesPerBeam(),
                    base.barsPerTwoLegs(),
                    beams,
                    null);
            ScheduleResult got = new ScheduleSolver(RationaliseOracleTest.COST, options, 2, Progress.NONE).solve(in);
            assertEquals(beams.size(), got.beams().size());
            for (int k = 0; k < beams.size(); k++) {
                ScheduleBeam b = beams.get(k);
                ScheduleResult.Beam out = got.beams().get(k);
                String where = "schedule " + i + ", beam " + b.id();
                assertSame(b, out.beam(), where);
                assertEquals(b.id(), out.outcome().problem().id(), where + ": the outcome is under its own mark");
                SpanDesigner.Outcome own = alone.design(b.problem(), 0);
                assertEquals(own.status(), out.outcome().status(), where);
                if (own.feasible()) {
                    assertEquals(own.best().layout(), out.outcome().best().layout(), where);
                    assertEquals(
                            own.best().cost().total(),
                            out.outcome().best().cost().total(),
                            0.0,
                            where);
                    assertEquals(own.proof().objective(), out.outcome().proof().objective(), where);
                } else {
                    assertEquals(own.diagnosis(), out.outcome().diagnosis(), where);
                }
            }
        }
    }
}
