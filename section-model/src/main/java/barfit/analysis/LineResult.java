package barfit.analysis;

import java.util.ArrayList;
import java.util.List;

/**
 * What the analysis of a line gives: the envelope at every station (factored moments and shears, with
 * the arrangement that governs each), the factored reactions, and per span what design needs (moments at
 * the support faces, the largest sagging moment, shears at d from the faces, where the negative moment
 * ends) with the service moments for deflection; per overhang its moment at the face and shear at d.
 * N, mm; moments sagging positive; x along the line from the first support's centre line.
 */
public record LineResult(
        Line line,
        List<StationValues> stations,
        List<SpanValues> spans,
        List<OverhangValues> overhangs,
        List<Reaction> reactions,
        List<String> arrangements) {

    /** The envelope at one station. */
    public record StationValues(
            int segment,
            double local,
            double x,
            double mMax,
            double mMin,
            double vMax,
            double vMin,
            String mMaxBy,
            String mMinBy,
            String vMaxBy,
            String vMinBy) {}

    /**
     * One span: moments at the faces of integral supports (9.4.2.1; at the centre line of knife edges and
     * walls), most negative over the arrangements; the largest sagging moment; the largest shear at d from
     * each face where 9.4.3.2 lets the section at d be used, else at the face ({@code vLeftAtFace} says
     * which); the points where the negative moment ends (x along the line); and service moments: dead load
     * alone and the envelope of dead plus live, at the faces (most negative) and in the span (largest); for
     * deflection, dead plus live in the one arrangement that gives the largest sagging moment in the span
     * ({@code deflectionBy}), at the faces and in the span.
     */
    public record SpanValues(
            int index,
            double length,
            double clear,
            double mLeftFace,
            double mSpanMax,
            double mRightFace,
            double vLeftD,
            double vRightD,
            boolean vLeftAtFace,
            boolean vRightAtFace,
            List<Double> inflection,
            double deadLeft,
            double deadMid,
            double deadRight,
            double totalLeft,
            double totalMid,
            double totalRight,
            double xMax,
            double deflectionLeft,
            double deflectionMid,
            double deflectionRight,
            String deflectionBy) {}

    /** An overhang: its length past the support's centre line, moment at the face and shear at d from it. */
    public record OverhangValues(
            String side, double length, double clear, double mFace, double vD, double deadFace, double totalFace) {}

    /** Factored reaction of a support: the largest and the least over the arrangements (N, upward). */
    public record Reaction(int support, double max, double min) {}

    static LineResult build(
            Line line,
            List<LineAnalysis.Case> cases,
            LineAnalysis.EndMoments[] caseEnds,
            List<LineAnalysis.Station> stations,
            double[][] m,
            double[][] vl,
            double[][] vr,
            List<LineAnalysis.Combo> combos,
            List<LineAnalysis.Combo> service,
            double[][] serviceMoments) {
        Evaluator ev = new Evaluator(line, cases, caseEnds);
        ev.stations(stations, m);
        int ns = stations.size();
        // each arrangement's end moments per segment, once
        double[][][] ends = new double[combos.size()][line.segments()][];
        for (int ci = 0; ci < combos.size(); ci++) {
            for (int sg = 0; sg < line.segments(); sg++) {
                ends[ci][sg] = ev.ends(combos.get(ci), sg);
            }
        }
        // the service arrangements' moments at every station (what deflection and the service table read);
        // elastic whatever the redistribution, so one line's several envelopes share them
        double[][] serviceM = serviceMoments != null ? serviceMoments : serviceMoments(ev, service, stations);
        List<StationValues> sv = new ArrayList<>();
        for (int k = 0; k < ns; k++) {
            LineAnalysis.Station st = stations.get(k);
            double mMax = Double.NEGATIVE_INFINITY;
            double mMin = Double.POSITIVE_INFINITY;
            double vMax = Double.NEGATIVE_INFINITY;
            double vMin = Double.POSITIVE_INFINITY;
            String a = null;
            String b = null;
            String c = null;
            String d = null;
            for (int ci = 0; ci < combos.size(); ci++) {
                LineAnalysis.Combo co = combos.get(ci);
                double[] e = ends[ci][st.segment()];
                double mo = 0;
                double left = 0;
                double right = 0;
                for (int i : co.nz()) {
                    double k2 = co.coef()[i];
                    mo += k2 * m[i][k];
                    left += k2 * vl[i][k];
                    right += k2 * vr[i][k];
                }
                double len = line.length(st.segment());
                if (isSpan(line, st.segment())) {
                    mo += e[0] * (1 - st.local() / len) + e[1] * st.local() / len;
                    left += (e[1] - e[0]) / len;
                    right += (e[1] - e[0]) / len;
                }
                if (mo > mMax + 1e-9) {
                    mMax = mo;
                    a = co.name();
                }
                if (mo < mMin - 1e-9) {
                    mMin = mo;
                    b = co.name();
                }
                double hi = Math.max(left, right);
                double lo = Math.min(left, right);
                if (hi > vMax + 1e-9) {
                    vMax = hi;
                    c = co.name();
                }
                if (lo < vMin - 1e-9) {
                    vMin = lo;
                    d = co.name();
                }
            }
            sv.add(new StationValues(st.segment(), st.local(), st.x(), mMax, mMin, vMax, vMin, a, b, c, d));
        }
        List<Reaction> reactions = new ArrayList<>();
        for (int j = 0; j <= line.spanCount(); j++) {
            double hi = Double.NEGATIVE_INFINITY;
            double lo = Double.POSITIVE_INFINITY;
            for (LineAnalysis.Combo co : combos) {
                double r = ev.reaction(co, j);
                hi = Math.max(hi, r);
                lo = Math.min(lo, r);
            }
            reactions.add(new Reaction(j + 1, hi, lo));
        }
        List<SpanValues> spans = new ArrayList<>();
        for (int s = 1; s <= line.spanCount(); s++) {
            spans.add(span(line, ev, sv, combos, service, serviceM, reactions, s));
        }
        List<OverhangValues> over = new ArrayList<>();
        if (line.overhangLeft() > 0) {
            over.add(overhang(line, ev, combos, service, 0));
        }
        if (line.overhangRight() > 0) {
            over.add(overhang(line, ev, combos, service, line.spanCount() + 1));
        }
        List<String> names = new ArrayList<>();
        combos.forEach(co -> names.add(co.name()));
        return new LineResult(line, sv, spans, over, reactions, names);
    }

    /** The service arrangements' moments at every station. */
    static double[][] serviceMoments(
            Line line,
            List<LineAnalysis.Case> cases,
            LineAnalysis.EndMoments[] caseEnds,
            List<LineAnalysis.Station> stations,
            double[][] m,
            List<LineAnalysis.Combo> service) {
        Evaluator ev = new Evaluator(line, cases, caseEnds);
        ev.stations(stations, m);
        return serviceMoments(ev, service, stations);
    }

    private static double[][] serviceMoments(
            Evaluator ev, List<LineAnalysis.Combo> service, List<LineAnalysis.Station> stations) {
        int ns = stations.size();
        double[][] out = new double[service.size()][ns];
        for (int ci = 0; ci < service.size(); ci++) {
            for (int k = 0; k < ns; k++) {
                LineAnalysis.Station st = stations.get(k);
                out[ci][k] = ev.moment(service.get(ci), st.segment(), st.local(), k);
            }
        }
        return out;
    }

    private static boolean isSpan(Line line, int segment) {
        return segment >= 1 && segment <= line.spanCount();
    }

    private static SpanValues span(
            Line line,
            Evaluator ev,
            List<StationValues> sv,
            List<LineAnalysis.Combo> combos,
            List<LineAnalysis.Combo> service,
            double[][] serviceM,
            List<Reaction> reactions,
            int s) {
        double len = line.length(s);
        Support ls = line.supports().get(s - 1);
        Support rs = line.supports().get(s);
        double xl = ls.kind().integral() ? ls.width() / 2 : 0;
        double xr = len - (rs.kind().integral() ? rs.width() / 2 : 0);
        double mLeft = Double.POSITIVE_INFINITY;
        double mRight = Double.POSITIVE_INFINITY;
        for (LineAnalysis.Combo co : combos) {
            mLeft = Math.min(mLeft, ev.moment(co, s, xl));
            mRight = Math.min(mRight, ev.moment(co, s, xr));
        }
        double mMax = Double.NEGATIVE_INFINITY;
        double xMax = 0;
        for (StationValues st : sv) {
            if (st.segment() == s && st.mMax() > mMax) {
                mMax = st.mMax();
                xMax = st.x();
            }
        }
        // shears: at d from the faces where 9.4.3.2 allows (no point load between the face and d, the
        // support always in compression; loads taken as applied at the top), else at the face
        double fl = ls.width() / 2;
        double fr = len - rs.width() / 2;
        boolean leftAtFace = pointLoadWithin(line, s, fl, fl + line.d())
                || reactions.get(s - 1).min() <= 0;
        boolean rightAtFace =
                pointLoadWithin(line, s, fr - line.d(), fr) || reactions.get(s).min() <= 0;
        double xvl = leftAtFace ? fl : Math.min(fl + line.d(), len / 2);
        double xvr = rightAtFace ? fr : Math.max(fr - line.d(), len / 2);
        double vLeft = 0;
        double vRight = 0;
        for (LineAnalysis.Combo co : combos) {
            vLeft = Math.max(vLeft, Math.abs(ev.shear(co, s, xvl, true)));
            vRight = Math.max(vRight, Math.abs(ev.shear(co, s, xvr, false)));
        }
        // where the most negative moment returns to zero, from each end that has negative moment
        List<Double> inflection = new ArrayList<>();
        List<StationValues> in = sv.stream().filter(st -> st.segment() == s).toList();
        // a pinned end's moment is zero but for rounding: only a real negative moment counts
        double scale = 0;
        for (StationValues st : in) {
            scale = Math.max(scale, Math.max(Math.abs(st.mMax()), Math.abs(st.mMin())));
        }
        double tiny = -1e-9 * scale;
        if (!in.isEmpty() && in.get(0).mMin() < tiny) {
            for (int i = 1; i < in.size(); i++) {
                if (in.get(i).mMin() >= 0) {
                    inflection.add(cross(in.get(i - 1), in.get(i)));
                    break;
                }
            }
        }
        if (!in.isEmpty() && in.get(in.size() - 1).mMin() < tiny) {
            for (int i = in.size() - 2; i >= 0; i--) {
                if (in.get(i).mMin() >= 0) {
                    double x = cross(in.get(i), in.get(i + 1));
                    if (inflection.isEmpty() || Math.abs(inflection.get(0) - x) > 1e-6) {
                        inflection.add(x);
                    }
                    break;
                }
            }
        }
        LineAnalysis.Combo dead = service.get(0);
        double dl = ev.moment(dead, s, xl);
        double dr = ev.moment(dead, s, xr);
        double dm = Double.NEGATIVE_INFINITY;
        double tl = Double.POSITIVE_INFINITY;
        double tr = Double.POSITIVE_INFINITY;
        double tm = Double.NEGATIVE_INFINITY;
        int first = 0;
        while (sv.get(first).segment() != s) {
            first++;
        }
        int last = first + in.size();
        for (int k = first; k < last; k++) {
            dm = Math.max(dm, serviceM[0][k]);
        }
        LineAnalysis.Combo deflectionBy = dead;
        double deflectionMid = Double.NEGATIVE_INFINITY;
        for (int ci = 0; ci < service.size(); ci++) {
            LineAnalysis.Combo co = service.get(ci);
            tl = Math.min(tl, ev.moment(co, s, xl));
            tr = Math.min(tr, ev.moment(co, s, xr));
            double own = Double.NEGATIVE_INFINITY;
            for (int k = first; k < last; k++) {
                own = Math.max(own, serviceM[ci][k]);
            }
            tm = Math.max(tm, own);
            if (own > deflectionMid + 1e-9) {
                deflectionMid = own;
                deflectionBy = co;
            }
        }
        double clear = len - ls.width() / 2 - rs.width() / 2;
        return new SpanValues(
                s,
                len,
                clear,
                mLeft,
                mMax,
                mRight,
                vLeft,
                vRight,
                leftAtFace,
                rightAtFace,
                inflection,
                dl,
                dm,
                dr,
                tl,
                tm,
                tr,
                xMax,
                ev.moment(deflectionBy, s, xl),
                deflectionMid,
                ev.moment(deflectionBy, s, xr),
                deflectionBy.name());
    }

    private static OverhangValues overhang(
            Line line, Evaluator ev, List<LineAnalysis.Combo> combos, List<LineAnalysis.Combo> service, int segment) {
        boolean left = segment == 0;
        double len = line.length(segment);
        Support sup = line.supports().get(left ? 0 : line.spanCount());
        double half = sup.width() / 2;
        double face = left ? len - half : half;
        double atD = left ? Math.max(0, face - line.d()) : Math.min(len, face + line.d());
        double m = Double.POSITIVE_INFINITY;
        double v = 0;
        double total = Double.POSITIVE_INFINITY;
        for (LineAnalysis.Combo co : combos) {
            m = Math.min(m, ev.moment(co, segment, face));
            v = Math.max(v, Math.abs(ev.shear(co, segment, atD, !left)));
        }
        for (LineAnalysis.Combo co : service) {
            total = Math.min(total, ev.moment(co, segment, face));
        }
        return new OverhangValues(
                left ? "left" : "right", len, len - half, m, v, ev.moment(service.get(0), segment, face), total);
    }

    private static boolean pointLoadWithin(Line line, int segment, double a, double b) {
        for (Load l : line.loads()) {
            if (l.segment() == segment && l.point() && l.from() > a + 1e-9 && l.from() <= b + 1e-9) {
                return true;
            }
        }
        return false;
    }

    private static double cross(StationValues a, StationValues b) {
        double t = a.mMin() / (a.mMin() - b.mMin());
        return a.x() + t * (b.x() - a.x());
    }

    /** Moments and shears of one arrangement anywhere, from the basic cases, with redistribution. */
    static final class Evaluator {
        private final Line line;
        private final List<LineAnalysis.Case> cases;
        private final LineAnalysis.EndMoments[] ends;

        /** Each case's loads on each segment, split once. */
        private final List<List<List<Load>>> bySegment = new ArrayList<>();

        Evaluator(Line line, List<LineAnalysis.Case> cases, LineAnalysis.EndMoments[] ends) {
            this.line = line;
            this.cases = cases;
            this.ends = ends;
            for (LineAnalysis.Case c : cases) {
                List<List<Load>> per = new ArrayList<>();
                for (int s = 0; s < line.segments(); s++) {
                    per.add(LineAnalysis.onSegment(c.loads(), s));
                }
                bySegment.add(per);
            }
        }

        /**
         * A span's end moments in an arrangement, after redistribution (6.6.5) in a factored one: a negative
         * moment at a support is reduced by that support's percentage; the span follows by equilibrium. The
         * service arrangements keep their elastic moments (deflection, 24.2).
         */
        private final java.util.Map<LineAnalysis.Combo, double[][]> endsMemo = new java.util.IdentityHashMap<>();

        double[] ends(LineAnalysis.Combo co, int segment) {
            double[][] known = endsMemo.computeIfAbsent(co, k -> new double[line.segments()][]);
            if (known[segment] == null) {
                known[segment] = endsOf(co, segment);
            }
            return known[segment];
        }

        private double[] endsOf(LineAnalysis.Combo co, int segment) {
            double left = 0;
            double right = 0;
            for (int i : co.nz()) { // a case with no factor adds exactly nothing
                left += co.coef()[i] * ends[i].left()[segment];
                right += co.coef()[i] * ends[i].right()[segment];
            }
            if (co.factored() && isSpan(line, segment)) {
                double pl = line.redistributionAt(segment - 1) / 100;
                double pr = line.redistributionAt(segment) / 100;
                if (left < 0) {
                    left *= 1 - pl;
                }
                if (right < 0) {
                    right *= 1 - pr;
                }
            }
            return new double[] {left, right};
        }

        private List<LineAnalysis.Station> stations;
        private double[][] stationMoments;

        /** The basic cases' static moments at the stations, so that moments there need no statics again. */
        void stations(List<LineAnalysis.Station> st, double[][] m) {
            this.stations = st;
            this.stationMoments = m;
        }

        private int stationIndex(int segment, double x) {
            if (stations == null) {
                return -1;
            }
            int lo = 0;
            int hi = stations.size() - 1;
            while (lo <= hi) {
                int mid = (lo + hi) >>> 1;
                LineAnalysis.Station s = stations.get(mid);
                int c = s.segment() != segment ? Integer.compare(s.segment(), segment) : Double.compare(s.local(), x);
                if (c == 0 || s.segment() == segment && Math.abs(s.local() - x) < 1e-6) {
                    return mid;
                }
                if (c < 0) {
                    lo = mid + 1;
                } else {
                    hi = mid - 1;
                }
            }
            return -1;
        }

        double moment(LineAnalysis.Combo co, int segment, double x) {
            return moment(co, segment, x, stationIndex(segment, x));
        }

        /** The moment at x, which is station k (or at no station when k < 0). */
        double moment(LineAnalysis.Combo co, int segment, double x, int k) {
            if (k >= 0) {
                double mo = 0;
                for (int i : co.nz()) {
                    mo += co.coef()[i] * stationMoments[i][k];
                }
                if (isSpan(line, segment)) {
                    double[] e = ends(co, segment);
                    double len = line.length(segment);
                    mo += e[0] * (1 - x / len) + e[1] * x / len;
                }
                return mo;
            }
            return momentByStatics(co, segment, x);
        }

        double momentByStatics(LineAnalysis.Combo co, int segment, double x) {
            double mo = 0;
            for (int i = 0; i < co.coef().length; i++) {
                if (co.coef()[i] != 0) {
                    mo += co.coef()[i]
                            * LineAnalysis.staticMoment(
                                    line, segment, bySegment.get(i).get(segment), x);
                }
            }
            if (isSpan(line, segment)) {
                double[] e = ends(co, segment);
                double len = line.length(segment);
                mo += e[0] * (1 - x / len) + e[1] * x / len;
            }
            return mo;
        }

        double shear(LineAnalysis.Combo co, int segment, double x, boolean rightLimit) {
            double v = 0;
            for (int i = 0; i < co.coef().length; i++) {
                if (co.coef()[i] != 0) {
                    v += co.coef()[i]
                            * LineAnalysis.staticShear(
                                    line, segment, bySegment.get(i).get(segment), x, rightLimit);
                }
            }
            if (isSpan(line, segment)) {
                double[] e = ends(co, segment);
                v += (e[1] - e[0]) / line.length(segment);
            }
            return v;
        }

        /** The upward reaction of support j (0-based): the jump in shear across it. */
        double reaction(LineAnalysis.Combo co, int j) {
            int leftSeg = j;
            int rightSeg = j + 1;
            double before = line.length(leftSeg) == 0 ? 0 : shear(co, leftSeg, line.length(leftSeg), false);
            double after = line.length(rightSeg) == 0 ? 0 : shear(co, rightSeg, 0, true);
            return after - before;
        }
    }
}
