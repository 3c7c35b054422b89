package barfit.design.line;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.analysis.Line;
import barfit.analysis.LineResult;
import barfit.design.CostModel;
import barfit.design.SolverOptions;
import barfit.design.span.SpanDesigner;
import barfit.input.DesignInput;
import barfit.input.DesignInputReader;
import barfit.input.LineInput;
import barfit.input.LinesReader;
import java.io.IOException;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/**
 * The strength a designed line's bars provide covers its factored moment envelope everywhere between the
 * support faces (ACI 318-19 9.5.1.1: φMn ≥ Mu at every section, the faces of columns being the critical
 * sections of 9.4.2.1): the bottom bars the sagging envelope, the top bars over the supports, then the
 * continuous top bars, the hogging envelope. Read at every station of the line's own analysis.
 */
class LineCapacityTest {
    @Test
    void theBarsAsDesignedCoverTheEnvelopeBetweenTheFaces() throws IOException {
        Path f = Path.of("..", "examples", "lines", "ashgrove-depot-lines-si.yaml");
        DesignInput in = DesignInputReader.read(f, false);
        LineInput line = LinesReader.read(DesignInputReader.document(f), in.settings()).stream()
                .filter(l -> l.id().equals("L1-B"))
                .findFirst()
                .orElseThrow();
        CostModel cost = new CostModel(
                in.rates(), in.settings().detailing().cover(), in.settings().code());
        LineSpans.Result r = new LineSpans(
                        in.settings(),
                        in.space(),
                        new SpanDesigner(cost, new SolverOptions(30, 1, 1)),
                        in.maxBarSizesPerBeam(),
                        in.barsPerTwoLegs())
                .design(line, 0);
        LineCapacity.Diagram cap = LineCapacity.of(r);
        assertNotNull(cap);
        Line geometry = r.analysis().line();
        int checked = 0;
        for (LineResult.StationValues st : r.analysis().stations()) {
            double x = st.x();
            boolean overSupport = false;
            for (int j = 0; j <= geometry.spanCount(); j++) {
                double half = geometry.supports().get(j).width() / 2;
                overSupport |= Math.abs(x - geometry.supportX(j)) < half - 1e-6;
            }
            if (overSupport) {
                continue;
            }
            double tol = 1e-6 * Math.max(1, Math.abs(st.mMin()) + Math.abs(st.mMax()));
            if (st.mMax() > tol) {
                double s = at(cap.sagging(), x);
                assertTrue(s >= st.mMax() - tol, "sagging at x = " + x + ": φMn " + s + " < Mu " + st.mMax());
            }
            if (st.mMin() < -tol) {
                double h = at(cap.hogging(), x);
                assertTrue(h >= -st.mMin() - tol, "hogging at x = " + x + ": φMn " + h + " < Mu " + -st.mMin());
            }
            checked++;
        }
        assertTrue(checked > 100, "stations checked: " + checked);
    }

    /** The greatest strength of the stretches holding x (0 where none does). */
    private static double at(java.util.List<LineCapacity.Stretch> stretches, double x) {
        double best = 0;
        for (LineCapacity.Stretch s : stretches) {
            if (x >= s.from() - 1e-6 && x <= s.to() + 1e-6) {
                best = Math.max(best, s.phiMn());
            }
        }
        return best;
    }
}
