package barfit.schedule;

import barfit.design.span.SpanProblem;
import barfit.input.DesignBeam;
import barfit.input.DesignInput;

/** Turns a whole span read from a {@code design} file into the problem the beam designer solves. */
public final class Spans {
    private Spans() {}

    public static SpanProblem problem(DesignInput in, DesignBeam b) {
        var s = in.settings();
        var w = b.whole();
        return new SpanProblem(
                        b.id(),
                        s.materials(),
                        s.detailing(),
                        s.code(),
                        in.space(),
                        b.span().length(),
                        b.span().ends(),
                        w.mLeft(),
                        w.mMid(),
                        w.mRight(),
                        w.vLeft(),
                        w.vRight(),
                        w.service(),
                        w.limits(),
                        b.maxDepth(),
                        b.width(),
                        b.flange(),
                        w.bottomAnchored(),
                        in.maxBarSizesPerBeam(),
                        in.barsPerTwoLegs())
                .withTorsion(w.torsion());
    }
}
