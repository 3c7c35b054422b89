package barfit.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.section.SectionSelection;
import com.google.ortools.sat.CpModel;
import com.google.ortools.sat.CpSolver;
import com.google.ortools.sat.CpSolverStatus;
import com.google.ortools.sat.IntVar;
import com.google.ortools.sat.LinearExpr;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * A model CP-SAT refuses (MODEL_INVALID) is a bug in barfit: the status mapping throws it as an
 * {@link InvalidModelError} asking for a report, never a time-out or an "unknown" answer. The model is
 * made invalid by hand: a linear term whose coefficient times its variable's range overflows 64 bits,
 * which CP-SAT's model validator rejects.
 */
class InvalidModelTest {
    private static final SolverOptions OPTIONS = new SolverOptions(10, 1, 1);

    /** A constraint no 64-bit arithmetic can evaluate: x in [0, 10] times Long.MAX_VALUE / 2. */
    private static void overflow(CpModel model) {
        IntVar x = model.newIntVar(0, 10, "x");
        model.addLessOrEqual(LinearExpr.term(x, Long.MAX_VALUE / 2), 1);
    }

    @Test
    void cpSatSaysModelInvalidAndTheMappingCallsItABug() {
        OrTools.load();
        CpModel model = new CpModel();
        overflow(model);
        CpSolver solver = OrTools.solver(OPTIONS);
        CpSolverStatus raw = solver.solve(model);
        assertEquals(
                CpSolverStatus.MODEL_INVALID, raw, "the hand-made model must be invalid for the test to mean anything");
        InvalidModelError e =
                assertThrows(InvalidModelError.class, () -> OrTools.status(raw, solver, "a hand-made model"));
        assertTrue(e.getMessage().startsWith("CP-SAT found a hand-made model invalid (MODEL_INVALID"), e.getMessage());
        assertTrue(
                e.getMessage().contains("this is a bug in barfit, not in the input: please report it"), e.getMessage());
        assertTrue(!e.getMessage().contains("\n"), "one line: " + e.getMessage());
    }

    @Test
    void theOtherStatusesKeepTheirMeaning() {
        CpSolver solver = OrTools.solver(OPTIONS);
        assertEquals(Proof.Status.OPTIMAL, OrTools.status(CpSolverStatus.OPTIMAL, solver, "m"));
        assertEquals(Proof.Status.FEASIBLE, OrTools.status(CpSolverStatus.FEASIBLE, solver, "m"));
        assertEquals(Proof.Status.INFEASIBLE, OrTools.status(CpSolverStatus.INFEASIBLE, solver, "m"));
        assertEquals(Proof.Status.OUT_OF_TIME, OrTools.status(CpSolverStatus.UNKNOWN, solver, "m"));
    }

    @Test
    void aSectionSelectionWithAnInvalidModelStopsAsABug() {
        // the same path a design takes: candidates, one chosen, solved; the broken constraint added by hand
        SectionSelection sel = new SectionSelection();
        int a = sel.add(12_000, "a");
        int b = sel.add(15_000, "b");
        sel.exactlyOne(List.of(a, b));
        SectionSelection.Result fine = sel.solve(OPTIONS);
        assertEquals(Proof.Status.OPTIMAL, fine.status());
        assertEquals(12_000, fine.objective());
        overflow(sel.model());
        InvalidModelError e = assertThrows(InvalidModelError.class, () -> sel.solve(OPTIONS));
        assertTrue(e.getMessage().contains("the section selection model"), e.getMessage());
    }
}
