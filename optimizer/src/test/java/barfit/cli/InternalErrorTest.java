package barfit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.InvalidModelError;
import barfit.design.OrTools;
import barfit.design.SolverOptions;
import com.google.ortools.sat.CpModel;
import com.google.ortools.sat.CpSolver;
import com.google.ortools.sat.IntVar;
import com.google.ortools.sat.LinearExpr;
import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

/**
 * A model CP-SAT refuses reaches the user as an internal error: one line saying it is a bug in barfit
 * and asking for a report, exit 3, never the exit 2 of bad input. The error comes from a hand-made invalid
 * model (a coefficient whose product with its variable's range overflows 64 bits) through the same
 * status mapping every search uses.
 */
class InternalErrorTest {
    @Test
    void anInvalidModelIsAnInternalErrorNotBadInput() {
        CpModel model = new CpModel();
        IntVar x = model.newIntVar(0, 10, "x");
        model.addLessOrEqual(LinearExpr.term(x, Long.MAX_VALUE / 2), 1);
        CpSolver solver = OrTools.solver(new SolverOptions(10, 1, 1));
        InvalidModelError bug = assertThrows(
                InvalidModelError.class, () -> OrTools.status(solver.solve(model), solver, "a hand-made model"));
        // as thrown, and wrapped as a thread pool's failure is
        for (Exception thrown : new Exception[] {bug, new IllegalStateException(bug)}) {
            StringWriter err = new StringWriter();
            int code = Main.failure(thrown, new PrintWriter(err, true));
            assertEquals(Main.INTERNAL, code);
            assertEquals(3, code);
            assertNotEquals(Main.BAD_INPUT, code);
            String said = err.toString();
            assertTrue(
                    said.startsWith("barfit: internal error: CP-SAT found a hand-made model invalid (MODEL_INVALID"),
                    said);
            assertTrue(
                    said.contains("this is a bug in barfit, not in the input: please report it with the input file"),
                    said);
            assertEquals(1, said.lines().count(), "one line: " + said);
        }
    }
}
