package barfit.section;

import barfit.section.trail.Q;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.List;

/**
 * Checks of a whole span rather than one section: the minimum depth of Table 9.3.1.1, and where the
 * beam is shallower, its computed deflections (9.3.2, 24.2) against the limits of Table 24.2.2.
 *
 * <p>Service moments come from an analysis of the line where one was made ({@link ServiceMoments#analysed});
 * otherwise they are the factored ones scaled by the load ratio: Ma = Mu x w / (1.2 D + 1.6 L) (load
 * combination 5.3.1b), for w = D, D + a sustained part of L, and D + L. The effective moment of
 * inertia is that of Table 24.2.3.5 at each critical section, averaged over the positive and negative
 * moment sections of a continuous span (24.2.3.6); the long-term multiplier is that of 24.2.4.1 with
 * the compression steel at mid-span (at the support of a cantilever).
 */
public final class SpanChecks {
    /** Service line loads, N/mm, and the part of the live load that is sustained (0 to 1). */
    public record ServiceLoads(double dead, double live, double sustainedLive) {}

    /**
     * The service moment Ma (N·mm, magnitude) at each critical section at each of the {@link #LEVELS}: the
     * left and right support sections hogging, mid-span sagging; null where the span has no such section.
     * {@code analysed} when they come from an analysis of the line rather than from scaled factored moments.
     */
    public record ServiceMoments(double[] left, double[] mid, double[] right, boolean analysed) {
        /** Factored moments scaled by the load ratio of 5.3.1b at each level. */
        public static ServiceMoments scaled(Double mLeft, Double mMid, Double mRight, ServiceLoads loads) {
            double[] r = ratios(loads);
            return new ServiceMoments(times(mLeft, r), times(mMid, r), times(mRight, r), false);
        }

        /**
         * From an analysis: the moments of dead load alone and of dead plus live load in one arrangement
         * (signed, sagging positive; null where the span has no such section), with D + sustained L taken
         * as D + s (D+L − D) at each section, s the sustained share of the live load.
         */
        public static ServiceMoments analysed(
                Double deadLeft,
                Double deadMid,
                Double deadRight,
                Double totalLeft,
                Double totalMid,
                Double totalRight,
                double sustainedLive) {
            return new ServiceMoments(
                    levels(deadLeft, totalLeft, sustainedLive, -1),
                    levels(deadMid, totalMid, sustainedLive, 1),
                    levels(deadRight, totalRight, sustainedLive, -1),
                    true);
        }

        /** Every moment times k (a study's scaled demand). */
        public ServiceMoments times(double k) {
            return new ServiceMoments(mul(left, k), mul(mid, k), mul(right, k), analysed);
        }

        private static double[] times(Double m, double[] ratios) {
            if (m == null) {
                return null;
            }
            double[] out = new double[ratios.length];
            for (int i = 0; i < ratios.length; i++) {
                out[i] = Math.abs(m) * ratios[i];
            }
            return out;
        }

        private static double[] levels(Double dead, Double total, double sustained, int sign) {
            if (dead == null || total == null) {
                return null;
            }
            double d = Math.max(0, sign * dead);
            double t = Math.max(0, sign * total);
            return new double[] {d, Math.max(0, d + sustained * (t - d)), t};
        }

        private static double[] mul(double[] a, double k) {
            if (a == null) {
                return null;
            }
            double[] out = a.clone();
            for (int i = 0; i < out.length; i++) {
                out[i] *= Math.abs(k);
            }
            return out;
        }

        /** Ma at one section, 0 where it has none. */
        static double at(double[] levels, int i) {
            return levels == null ? 0 : levels[i];
        }
    }

    /** Deflection limits as span divisors: immediate live and long-term total (Table 24.2.2). */
    public record Limits(double live, double total) {
        public static final Limits DEFAULT = new Limits(360, 240);
    }

    /** The sections of the span: left and right support sections may be null (simple end, cantilever tip). */
    public record Sections(BeamSection left, BeamSection mid, BeamSection right) {}

    /** The service levels deflection is computed at: dead, dead plus the sustained live part, dead plus live. */
    public static final List<String> LEVELS = List.of("D", "D + sustained L", "D + L");

    /**
     * The stiffness of one critical section as deflection takes it: where it is ("left support",
     * "mid-span", "right support"), its factored moment (N·mm, magnitude), Ig, Icr, Mcr and the rest of
     * {@link Deflection.Stiffness}, and at each of the {@link #LEVELS} the service moment Ma (N·mm,
     * magnitude) and Ie of Table 24.2.3.5 (mm⁴).
     */
    public record SectionStiffness(String at, double mu, Deflection.Stiffness stiffness, double[] ma, double[] ie) {}

    /**
     * What was found: the checks, and the deflections when they were computed (mm, else null); then, per
     * critical section, its stiffness ({@code sections}, empty when nothing was computed), the Ie the span
     * takes at each level ({@code ieSpan}), the immediate deflections at each level ({@code immediate}) and
     * the long-term multiplier λΔ (NaN when not computed).
     */
    public record Result(
            List<CheckResult> checks,
            double hMin,
            Double liveDeflection,
            Double longTermDeflection,
            List<SectionStiffness> sections,
            double[] ieSpan,
            double[] immediate,
            double lambdaDelta) {
        public Result(List<CheckResult> checks, double hMin, Double liveDeflection, Double longTermDeflection) {
            this(checks, hMin, liveDeflection, longTermDeflection, List.of(), new double[0], new double[0], Double.NaN);
        }

        public Result {
            checks = List.copyOf(checks);
            sections = List.copyOf(sections);
        }

        public boolean ok() {
            return checks.stream().allMatch(CheckResult::pass);
        }
    }

    private SpanChecks() {}

    /** h,min of Table 9.3.1.1 with the fy factor (9.3.1.1.1) and, for lightweight concrete, 9.3.1.1.2's. */
    public static double minimumDepth(double length, EndCondition ends, Materials m, CodeEquations code) {
        return length / ends.minDepthDivisor() * (0.4 + m.fy() / code.minDepthFyDivisor()) * lightweightDepthFactor(m);
    }

    /**
     * 9.3.1.1.2 for lightweight concrete (λ < 1): the greater of 1.65 − 0.0003 wc and 1.09; wc is not known,
     * so the lightest density of the clause, 1440 kg/m³, gives the largest factor, 1.218. 1 for normal weight.
     */
    public static double lightweightDepthFactor(Materials m) {
        return m.lambda() < 1 ? Math.max(1.65 - 0.0003 * 1440, 1.09) : 1;
    }

    /**
     * @param mLeft  factored moments (N·mm, signed; null where not given)
     * @param loads  null when the user gave none
     */
    public static Result run(
            double length,
            EndCondition ends,
            Sections s,
            Double mLeft,
            Double mMid,
            Double mRight,
            ServiceLoads loads,
            Limits limits,
            Trail t) {
        return run(
                length,
                ends,
                s,
                mLeft,
                mMid,
                mRight,
                loads,
                loads == null ? null : ServiceMoments.scaled(mLeft, mMid, mRight, loads),
                limits,
                t);
    }

    /**
     * As {@link #run(double, EndCondition, Sections, Double, Double, Double, ServiceLoads, Limits, Trail)}, with
     * the service moments given ({@code service}, null when {@code loads} is).
     */
    public static Result run(
            double length,
            EndCondition ends,
            Sections s,
            Double mLeft,
            Double mMid,
            Double mRight,
            ServiceLoads loads,
            ServiceMoments service,
            Limits limits,
            Trail t) {
        BeamSection any = s.mid() != null ? s.mid() : s.left();
        Materials m = any.materials();
        CodeEquations code = any.code();
        double h = any.shape().height();
        double hMin = minimumDepth(length, ends, m, code);
        List<CheckResult> out = new ArrayList<>();
        if (t.isOn()) {
            t.heading("Span: minimum depth and deflection", "Table 9.3.1.1, 9.3.2, 24.2");
            String lw = m.lambda() < 1 ? " × 1.218" : "";
            t.step(
                    "h,min",
                    "ℓ / " + fmt(ends.minDepthDivisor()) + " × (0.4 + fy / " + (code.inchPound() ? "100000" : "700")
                            + ")" + lw,
                    "{} / " + fmt(ends.minDepthDivisor()) + " × (0.4 + {} / " + (code.inchPound() ? "100000" : "700")
                            + ")" + lw,
                    Q.length(hMin),
                    Q.length(length),
                    Q.stress(m.fy()));
            if (m.lambda() < 1) {
                t.note("Lightweight concrete (λ < 1): 9.3.1.1.2's factor at wc = 1440 kg/m³, the largest; Ec of "
                        + "19.2.2.1(a) at the same density, the smallest.");
            }
        }
        if (h >= hMin - 1e-9) {
            out.add(CheckResult.atLeast(
                    "min_depth",
                    "Minimum depth (" + ends.words() + "); deflection need not be computed",
                    "Table 9.3.1.1",
                    Q.length(h),
                    Q.length(hMin),
                    null));
            return new Result(out, hMin, null, null);
        }
        if (loads == null) {
            out.add(CheckResult.rule(
                    "deflection",
                    "Deflection not checked: give service loads",
                    "9.3.2, 24.2",
                    false,
                    Q.length(h),
                    Q.length(hMin),
                    ">=",
                    "h is below Table 9.3.1.1; give service: {dead, live}"));
            return new Result(out, hMin, null, null);
        }
        double wu = 1.2 * loads.dead() + 1.6 * loads.live();
        double ec = Deflection.ec(m, code);
        ServiceMoments sm = service;
        double[] ieL = s.left() != null && sm.left() != null ? ieLevels(s.left(), Bending.HOGGING, sm.left()) : null;
        double[] ieM = s.mid() != null && sm.mid() != null ? ieLevels(s.mid(), Bending.SAGGING, sm.mid()) : null;
        double[] ieR =
                s.right() != null && sm.right() != null ? ieLevels(s.right(), Bending.HOGGING, sm.right()) : null;
        double rhoPrime = rhoPrime(
                ends == EndCondition.CANTILEVER ? s.left() : s.mid(),
                ends == EndCondition.CANTILEVER ? Bending.HOGGING : Bending.SAGGING);
        double[] dl = deflections(length, ends, ec, sm, ieL, ieM, ieR, rhoPrime);
        double dD = dl[0];
        double dSus = dl[1];
        double dDL = dl[2];
        double live = dl[3];
        double lambda = Deflection.lambdaDelta(rhoPrime);
        double longTerm = dl[4];
        List<SectionStiffness> stiff = new ArrayList<>();
        if (ieL != null) {
            stiff.add(sectionStiffness("left support", s.left(), Bending.HOGGING, mLeft, sm.left()));
        }
        if (ieM != null) {
            stiff.add(sectionStiffness("mid-span", s.mid(), Bending.SAGGING, mMid, sm.mid()));
        }
        if (ieR != null) {
            stiff.add(sectionStiffness("right support", s.right(), Bending.HOGGING, mRight, sm.right()));
        }
        double[] ieSpan = new double[3];
        for (int i = 0; i < 3; i++) {
            ieSpan[i] = spanIe(ends, i, ieL, ieM, ieR);
        }
        if (t.isOn()) {
            t.value("h", Q.length(h), "below h,min: deflections are computed (9.3.2)");
            t.step("Ec", code.ec().shown() + " √f'c", code.ec().shown() + " × √{}", Q.stress(ec), Q.stress(m.fc()));
            t.step(
                    "fr",
                    code.fr().shown() + " λ √f'c  (19.2.3.1)",
                    code.fr().shown() + " × {} × √{}",
                    Q.stress(Deflection.fr(m, code)),
                    Q.number(m.lambda()),
                    Q.stress(m.fc()));
            if (sm.analysed()) {
                t.note("Service moments Ma from the analysis of the line: dead load alone, and dead plus live load in "
                        + "the arrangement giving the largest sagging moment in the span, with D + sustained L = "
                        + "D + " + fmtShare(loads.sustainedLive()) + " × L at each critical section; Ie of Table "
                        + "24.2.3.5 at each critical section, averaged for a continuous span (24.2.3.6).");
            } else {
                t.step(
                        "wu",
                        "1.2 D + 1.6 L  (5.3.1b)",
                        "1.2 × {} + 1.6 × {}",
                        Q.lineLoad(wu),
                        Q.lineLoad(loads.dead()),
                        Q.lineLoad(loads.live()));
                t.note("Service moments: Ma = |Mu| × w / wu at each critical section, for w = D, D + sustained L and "
                        + "D + L; Ie of Table 24.2.3.5 at each critical section, averaged for a continuous span "
                        + "(24.2.3.6).");
            }
            t.note("Icr: cracked transformed section with every bar layer at its own depth, n As below the "
                    + "neutral axis and (n − 1) As above it; Ig and Mcr of the gross concrete section.");
            for (SectionStiffness ss : stiff) {
                stiffnessTrail(ss, loads, wu, sm.analysed(), t);
            }
            for (int i = 0; i < 3; i++) {
                ieSpanTrail(ends, i, stiff, ieSpan[i], t);
            }
            deflectionTrail(ends, length, ec, sm, ieSpan, dl, t);
            t.step("Δ(L)", "Δ(D + L) − Δ(D)", "{} − {}", Q.length(live), Q.length(dDL), Q.length(dD));
            t.note("ρ' = As' / (b d) at " + (ends == EndCondition.CANTILEVER ? "the support" : "mid-span")
                    + ", b the width of the compression face (the flange's under sagging)");
            t.step("λΔ", "2.0 / (1 + 50 ρ')  (24.2.4.1)", "2.0 / (1 + 50 × {})", Q.number(lambda), Q.number(rhoPrime));
            t.step(
                    "Δ(long term)",
                    "λΔ Δ(D + sustained L) + Δ(L)",
                    "{} × {} + {}",
                    Q.length(longTerm),
                    Q.number(lambda),
                    Q.length(dSus),
                    Q.length(live));
        }
        out.add(CheckResult.atMost(
                "deflection_live",
                "Immediate live-load deflection ≤ ℓ/" + fmt(limits.live()),
                "9.3.2, Table 24.2.2",
                Q.length(live),
                Q.length(length / limits.live()),
                "h below Table 9.3.1.1, so deflection is computed"));
        out.add(CheckResult.atMost(
                "deflection_total",
                "Long-term plus live deflection ≤ ℓ/" + fmt(limits.total()),
                "9.3.2, 24.2.4, Table 24.2.2",
                Q.length(longTerm),
                Q.length(length / limits.total()),
                "λΔ = " + String.format(java.util.Locale.ROOT, "%.2f", lambda)));
        return new Result(out, hMin, live, longTerm, stiff, ieSpan, new double[] {dD, dSus, dDL}, lambda);
    }

    private static SectionStiffness sectionStiffness(
            String at, BeamSection s, Bending bending, Double mu, double[] ma) {
        Deflection.Stiffness st = stiffnessOf(s, bending);
        double[] ie = new double[ma.length];
        for (int i = 0; i < ma.length; i++) {
            ie[i] = Deflection.ie(ma[i], st);
        }
        return new SectionStiffness(at, mu == null ? 0 : Math.abs(mu), st, ma.clone(), ie);
    }

    /** The Ie a span takes at one level: as {@link #deflections} does. */
    private static double spanIe(EndCondition ends, int i, double[] ieLeft, double[] ieMid, double[] ieRight) {
        switch (ends) {
            case SIMPLE:
                return ieMid[i];
            case CANTILEVER:
                return ieLeft[i];
            default:
                double sum = 0;
                int k = 0;
                if (ieLeft != null) {
                    sum += ieLeft[i];
                    k++;
                }
                if (ieRight != null) {
                    sum += ieRight[i];
                    k++;
                }
                return k == 0 ? ieMid[i] : 0.5 * (ieMid[i] + sum / k);
        }
    }

    /** Area and centroid depth (from the extreme compression fibre of the given bending) of one face's bars. */
    private static double[] faceSteel(BeamSection s, Face face) {
        double area = 0;
        double moment = 0;
        Bending b = face == Face.BOTTOM ? Bending.SAGGING : Bending.HOGGING;
        for (BarLayer l : s.layersOn(face)) {
            area += l.area();
            moment += l.area() * s.depthFromCompression(l, b);
        }
        return new double[] {area, area > 0 ? moment / area : 0};
    }

    /** Service-to-factored moment ratios for dead, sustained (dead plus the sustained live part) and total load. */
    public static double[] ratios(ServiceLoads loads) {
        double wu = 1.2 * loads.dead() + 1.6 * loads.live();
        return new double[] {
            loads.dead() / wu,
            (loads.dead() + loads.sustainedLive() * loads.live()) / wu,
            (loads.dead() + loads.live()) / wu
        };
    }

    /** Ie of Table 24.2.3.5 of one section at each of the three service levels, for its Ma at each. */
    public static double[] ieLevels(BeamSection s, Bending bending, double[] ma) {
        Deflection.Stiffness st = stiffnessOf(s, bending); // the same section at every load level
        double[] out = new double[ma.length];
        for (int i = 0; i < ma.length; i++) {
            out[i] = Deflection.ie(ma[i], st);
        }
        return out;
    }

    /**
     * ρ' of 24.2.4.1: compression steel over b d of a section, b the width of the compression face (Chapter 2
     * notation): the flange's width under sagging, where the top flange is in compression; the web's otherwise.
     */
    public static double rhoPrime(BeamSection s, Bending bending) {
        double[] comp = faceSteel(s, bending.compressionFace());
        double[] tens = faceSteel(s, bending.tensionFace());
        double b = bending == Bending.SAGGING && s.shape().flanged()
                ? s.shape().flange().width()
                : s.shape().width();
        return comp[0] / (b * Math.max(tens[1], 1e-9));
    }

    /**
     * The deflections {dead, sustained, dead + live, live, long-term + live} of a span from the Ie of its
     * sections at each level (null for an absent section). Stiffer sections (larger Ie) or more
     * compression steel (larger ρ') never give larger deflections, so optimistic Ie values give a lower
     * bound: what a search may use to discard layouts that cannot pass.
     */
    public static double[] deflections(
            double length,
            EndCondition ends,
            double ec,
            ServiceMoments sm,
            double[] ieLeft,
            double[] ieMid,
            double[] ieRight,
            double rhoPrime) {
        double[] d = new double[3];
        for (int i = 0; i < 3; i++) {
            double ml = ServiceMoments.at(sm.left(), i);
            double mm = ServiceMoments.at(sm.mid(), i);
            double mr = ServiceMoments.at(sm.right(), i);
            d[i] = Deflection.spanDeflection(ends, length, ec, spanIe(ends, i, ieLeft, ieMid, ieRight), ml, mm, mr);
        }
        double live = d[2] - d[0];
        double longTerm = Deflection.lambdaDelta(rhoPrime) * d[1] + live;
        return new double[] {d[0], d[1], d[2], live, longTerm};
    }

    /** Whether deflections pass the limits. */
    public static boolean within(double length, Limits limits, double[] deflections) {
        return CheckResult.within(deflections[3], length / limits.live())
                && CheckResult.within(deflections[4], length / limits.total());
    }

    /** One critical section: n, Ig, yt, Mcr, kd, Icr, then Ma and Ie at each service level. */
    private static void stiffnessTrail(SectionStiffness ss, ServiceLoads loads, double wu, boolean analysed, Trail t) {
        String where = " (" + ss.at() + ")";
        Deflection.Stiffness st = ss.stiffness();
        t.value("n" + where, Q.number(st.n()), "Es / Ec");
        t.value("Ig" + where, Q.inertia(st.ig()), "gross concrete section");
        t.value("yt" + where, Q.length(st.yt()), "centroid of the gross section to the tension face");
        t.step(
                "Mcr" + where,
                "fr Ig / yt  (24.2.3.5)",
                "{} × {} / {}",
                Q.moment(st.mcr()),
                Q.stress(st.mcr() * st.yt() / st.ig()),
                Q.inertia(st.ig()),
                Q.length(st.yt()));
        t.value("kd" + where, Q.length(st.kd()), "first moment of the cracked transformed section = 0");
        t.value("Icr" + where, Q.inertia(st.icr()), "concrete above kd + Σ n or (n − 1) As (d − kd)²");
        double[] w = {loads.dead(), loads.dead() + loads.sustainedLive() * loads.live(), loads.dead() + loads.live()};
        for (int i = 0; i < ss.ma().length; i++) {
            String level = ", " + LEVELS.get(i);
            if (analysed) {
                t.value(
                        "Ma" + where.substring(0, where.length() - 1) + level + ")",
                        Q.moment(ss.ma()[i]),
                        "from the analysis of the line");
            } else {
                t.step(
                        "Ma" + where.substring(0, where.length() - 1) + level + ")",
                        "|Mu| × w / wu",
                        "{} × {} / {}",
                        Q.moment(ss.ma()[i]),
                        Q.moment(ss.mu()),
                        Q.lineLoad(w[i]),
                        Q.lineLoad(wu));
            }
            String ie = "Ie" + where.substring(0, where.length() - 1) + level + ")";
            if (ss.ma()[i] <= 2.0 / 3.0 * st.mcr()) {
                t.step(ie, "Ig, as Ma ≤ (2/3) Mcr  (Table 24.2.3.5)", "{}", Q.inertia(ss.ie()[i]), Q.inertia(st.ig()));
            } else {
                t.step(
                        ie,
                        "Icr / (1 − ((2/3) Mcr / Ma)² (1 − Icr / Ig)) ≤ Ig  (Table 24.2.3.5)",
                        "{} / (1 − ((2/3) × {} / {})² × (1 − {} / {}))",
                        Q.inertia(ss.ie()[i]),
                        Q.inertia(st.icr()),
                        Q.moment(st.mcr()),
                        Q.moment(ss.ma()[i]),
                        Q.inertia(st.icr()),
                        Q.inertia(st.ig()));
            }
        }
    }

    /** The Ie the span takes at one level: one section's, or the average of 24.2.3.6. */
    private static void ieSpanTrail(EndCondition ends, int i, List<SectionStiffness> stiff, double ie, Trail t) {
        String sym = "Ie (span, " + LEVELS.get(i) + ")";
        SectionStiffness mid = null;
        List<SectionStiffness> supports = new ArrayList<>();
        for (SectionStiffness ss : stiff) {
            if (ss.at().equals("mid-span")) {
                mid = ss;
            } else {
                supports.add(ss);
            }
        }
        if (ends == EndCondition.SIMPLE || ends == EndCondition.CANTILEVER || supports.isEmpty() || mid == null) {
            t.value(
                    sym,
                    Q.inertia(ie),
                    "the " + (ends == EndCondition.CANTILEVER ? "support" : "mid-span") + " section's");
        } else if (supports.size() == 1) {
            t.step(
                    sym,
                    "(Ie,mid + Ie,support) / 2  (24.2.3.6)",
                    "({} + {}) / 2",
                    Q.inertia(ie),
                    Q.inertia(mid.ie()[i]),
                    Q.inertia(supports.get(0).ie()[i]));
        } else {
            t.step(
                    sym,
                    "(Ie,mid + (Ie,left + Ie,right) / 2) / 2  (24.2.3.6)",
                    "({} + ({} + {}) / 2) / 2",
                    Q.inertia(ie),
                    Q.inertia(mid.ie()[i]),
                    Q.inertia(supports.get(0).ie()[i]),
                    Q.inertia(supports.get(1).ie()[i]));
        }
    }

    /** The immediate deflection at each level, with the span's formula and its numbers. */
    private static void deflectionTrail(
            EndCondition ends, double length, double ec, ServiceMoments sm, double[] ie, double[] dl, Trail t) {
        for (int i = 0; i < 3; i++) {
            String sym = "Δ(" + LEVELS.get(i) + ")";
            double ml = ServiceMoments.at(sm.left(), i);
            double mm = ServiceMoments.at(sm.mid(), i);
            double mr = ServiceMoments.at(sm.right(), i);
            switch (ends) {
                case SIMPLE ->
                    t.step(
                            sym,
                            "5 Ma,mid ℓ² / (48 Ec Ie)",
                            "5 × {} × {}² / (48 × {} × {})",
                            Q.length(dl[i]),
                            Q.moment(mm),
                            Q.length(length),
                            Q.stress(ec),
                            Q.inertia(ie[i]));
                case CANTILEVER ->
                    t.step(
                            sym,
                            "Ma,support ℓ² / (4 Ec Ie)",
                            "{} × {}² / (4 × {} × {})",
                            Q.length(dl[i]),
                            Q.moment(Math.max(ml, mr)),
                            Q.length(length),
                            Q.stress(ec),
                            Q.inertia(ie[i]));
                default ->
                    t.step(
                            sym,
                            "5 ℓ² (Ma,mid − 0.1 (Ma,left + Ma,right)) / (48 Ec Ie)",
                            "5 × {}² × ({} − 0.1 × ({} + {})) / (48 × {} × {})",
                            Q.length(dl[i]),
                            Q.length(length),
                            Q.moment(mm),
                            Q.moment(ml),
                            Q.moment(mr),
                            Q.stress(ec),
                            Q.inertia(ie[i]));
            }
        }
    }

    /** The section's gross and cracked stiffness in one bending, with every bar layer at its own depth. */
    public static Deflection.Stiffness stiffnessOf(BeamSection s, Bending bending) {
        List<BarLayer> layers = s.layers();
        double[] depth = new double[layers.size()];
        double[] area = new double[layers.size()];
        for (int i = 0; i < layers.size(); i++) {
            depth[i] = s.depthFromCompression(layers.get(i), bending);
            area[i] = layers.get(i).area();
        }
        return Deflection.stiffness(s.shape(), bending, s.materials(), s.code(), depth, area);
    }

    private static String fmtShare(double share) {
        return String.format(java.util.Locale.ROOT, "%.2f", share);
    }

    private static String fmt(double d) {
        return d == Math.rint(d) ? String.valueOf((long) d) : String.valueOf(d);
    }
}
