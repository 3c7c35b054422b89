package barfit.analysis;

import barfit.section.LoadCombinations;
import java.util.ArrayList;
import java.util.List;

/**
 * The factored torsion along each span of a line under distributed torques, each support taken as
 * restraining twist (a span's torsion is then statically determinate): in a span L long centre to centre
 * under a factored torque t per length, T(x) = t (L/2 − x) from the left support's centre line. Each span's
 * torque is factored by the larger of 5.3.1's combinations for it, max(1.4 D, 1.2 D + 1.6 L): the spans do
 * not share torsion, so the live-load arrangements of 6.4.2 change nothing and this is the envelope.
 * Magnitudes at the faces, at the critical sections d from them (9.4.4.2) and at mid clear span.
 */
public final class TorqueEnvelope {
    private TorqueEnvelope() {}

    /**
     * One span's torsion: {@code factored} the factored torque per length (N·mm/mm), {@code length} centre
     * to centre and the faces' distances from the left support's centre line (mm).
     */
    public record SpanTorsion(int index, double factored, double length, double faceLeft, double faceRight) {
        /** T at {@code x} from the left support's centre line (N·mm, signed: positive nearer the left). */
        public double at(double x) {
            return factored * (length / 2 - x);
        }

        /** The clear span between the faces (mm). */
        public double clear() {
            return faceRight - faceLeft;
        }

        /** |T| at the left face. */
        public double atLeftFace() {
            return Math.abs(at(faceLeft));
        }

        /** |T| at the right face. */
        public double atRightFace() {
            return Math.abs(at(faceRight));
        }

        /** |T| at mid clear span. */
        public double atMidClear() {
            return Math.abs(at((faceLeft + faceRight) / 2));
        }

        /** |T| at the critical section d from the left face (9.4.4.2). */
        public double atLeftCritical(double d) {
            return Math.abs(at(faceLeft + d));
        }

        /** |T| at the critical section d from the right face (9.4.4.2). */
        public double atRightCritical(double d) {
            return Math.abs(at(faceRight - d));
        }
    }

    /**
     * The torsion of every span given a torque ({@code spans} centre to centre, mm; {@code supports} left to
     * right), in span order; spans without a torque are left out.
     */
    public static List<SpanTorsion> of(List<Double> spans, List<Support> supports, List<Torque> torques) {
        List<SpanTorsion> out = new ArrayList<>();
        for (int s = 1; s <= spans.size(); s++) {
            double dead = 0;
            double live = 0;
            for (Torque t : torques) {
                if (t.span() == s) {
                    dead += t.dead();
                    live += t.live();
                }
            }
            if (dead == 0 && live == 0) {
                continue;
            }
            double length = spans.get(s - 1);
            double faceLeft = supports.get(s - 1).width() / 2;
            double faceRight = length - supports.get(s).width() / 2;
            out.add(new SpanTorsion(s, LoadCombinations.factored(dead, live), length, faceLeft, faceRight));
        }
        return out;
    }
}
