package barfit.section;

import barfit.section.trail.Q;
import barfit.section.trail.Trail;

/** One-way shear strength of a beam section (22.5) and the stirrup limits of 9.6.3 and 9.7.6.2.2. */
public final class Shear {
    private Shear() {}

    /** Centre-to-centre spacing of the stirrup legs across the web (for 9.7.6.2.2). */
    public static double legSpacing(BeamSection s) {
        Stirrups st = s.stirrups();
        return (s.shape().width() - 2 * s.detailing().cover() - st.bar().diameter()) / (st.legs() - 1);
    }

    /**
     * @param d effective depth to the tension steel for the bending that goes with this shear
     * @param tensionArea As of the tension face, for rho_w
     */
    public static ShearResult analyse(BeamSection s, double vu, double d, double tensionArea, Trail t) {
        Materials m = s.materials();
        CodeEquations code = s.code();
        double bw = s.shape().width();
        double lambda = m.lambda();
        double rootFc = code.rootFcForShear(m.fc());
        double fyt = Math.min(m.fyt(), code.fytMax());
        double rhoW = tensionArea / (bw * d);
        double lambdaS = Math.min(1.0, Math.sqrt(2.0 / (1.0 + d / code.sizeEffectLength())));
        Stirrups st = s.stirrups();
        double av = st == null ? 0 : st.area();
        double avMin = st == null
                ? 0
                : Math.max(code.avMinRoot().si() * Math.sqrt(m.fc()), code.avMinFlat()) * bw * st.spacing() / fyt;
        double cube = Math.cbrt(rhoW);
        double vcA = code.vcSimple().si() * lambda * rootFc * bw * d;
        double vcB = code.vcRho().si() * lambda * cube * rootFc * bw * d;
        double vcC = code.vcRho().si() * lambdaS * lambda * cube * rootFc * bw * d;
        double vcMax = code.vcMax().si() * lambda * rootFc * bw * d;
        boolean withMin = st != null && av >= avMin * (1 - 1e-12);
        double vc;
        String row;
        if (withMin) {
            vc = Math.max(vcA, vcB);
            row = vcA >= vcB ? "(a)" : "(b)";
        } else {
            vc = vcC;
            row = "(c)";
        }
        boolean capped = vc > vcMax;
        vc = Math.min(vc, vcMax);
        // the stirrups' Vs counts up to the 22.5.1.2 limit only: beyond it the web crushes first
        double vsProvided = st == null ? 0 : av * fyt * d / st.spacing();
        double vsCap = code.vsMax().si() * rootFc * bw * d;
        double vs = Math.min(vsProvided, vsCap);
        boolean vsCapped = vsProvided > vsCap;
        double phi = CodeTables.PHI_SHEAR;
        double phiVn = phi * (vc + vs);
        double vnLimit = phi * (vc + vsCap);
        double trigger = phi * code.shearMinTrigger().si() * lambda * rootFc * bw * d;
        // Table 9.7.6.2.2 keys its halved limits on the Vs the section needs, not on what the stirrups give
        double vsRequired = Math.max(0, vu / phi - vc);
        double vsSplit = code.vsSplit().si() * rootFc * bw * d;
        boolean high = vsRequired > vsSplit;
        double sAlong =
                high ? Math.min(d / 4, code.stirrupSpacingCapHigh()) : Math.min(d / 2, code.stirrupSpacingCap());
        double sAcross = high ? Math.min(d / 2, code.stirrupSpacingCapHigh()) : Math.min(d, code.stirrupSpacingCap());

        if (t.isOn()) {
            t.heading("Shear", "22.5, 9.6.3, 9.7.6.2.2");
            t.step(
                    "ρw",
                    "As / (bw d)",
                    "{} / ({} × {})",
                    Q.number(rhoW),
                    Q.area(tensionArea),
                    Q.length(bw),
                    Q.length(d));
            if (Math.sqrt(m.fc()) > rootFc) {
                t.note("√f'c limited to " + (code.inchPound() ? "100 psi" : "8.3 MPa") + " (22.5.3.1).");
            }
            if (st != null) {
                t.step(
                        "fyt",
                        "min(fyt, " + (code.inchPound() ? "60000 psi" : "420 MPa") + ")  (20.2.2.4)",
                        null,
                        Q.stress(fyt));
                t.step(
                        "Av",
                        "legs × Ab",
                        "{} × {}",
                        Q.area(av),
                        Q.count(st.legs()),
                        Q.area(st.bar().area()));
                t.step(
                        "Av,min",
                        "max(" + code.avMinRoot().shown() + " √f'c, " + (code.inchPound() ? "50" : "0.35")
                                + ") bw s / fyt  (Table 9.6.3.4)",
                        "max(" + code.avMinRoot().shown() + " × √{}, {}) × {} × {} / {}",
                        Q.area(avMin),
                        Q.stress(m.fc()),
                        Q.stress(code.avMinFlat()),
                        Q.length(bw),
                        Q.length(st.spacing()),
                        Q.stress(fyt));
            }
            if (withMin) {
                t.step(
                        "Vc (a)",
                        code.vcSimple().shown() + " λ √f'c bw d",
                        code.vcSimple().shown() + " × {} × √{} × {} × {}",
                        Q.force(vcA),
                        Q.number(lambda),
                        Q.stress(rootFc * rootFc),
                        Q.length(bw),
                        Q.length(d));
                t.step(
                        "Vc (b)",
                        code.vcRho().shown() + " λ ρw^(1/3) √f'c bw d",
                        code.vcRho().shown() + " × {} × {}^(1/3) × √{} × {} × {}",
                        Q.force(vcB),
                        Q.number(lambda),
                        Q.number(rhoW),
                        Q.stress(rootFc * rootFc),
                        Q.length(bw),
                        Q.length(d));
                t.note("Av ≥ Av,min: Table 22.5.5.1 permits either (a) or (b); the larger is used.");
            } else {
                t.step(
                        "λs",
                        code.inchPound() ? "√(2 / (1 + d/10)) ≤ 1" : "√(2 / (1 + 0.004 d)) ≤ 1",
                        code.inchPound() ? "√(2 / (1 + {}/10))" : "√(2 / (1 + 0.004 × {}))",
                        Q.number(lambdaS),
                        Q.length(d));
                t.step(
                        "Vc (c)",
                        code.vcRho().shown() + " λs λ ρw^(1/3) √f'c bw d",
                        code.vcRho().shown() + " × {} × {} × {}^(1/3) × √{} × {} × {}",
                        Q.force(vcC),
                        Q.number(lambdaS),
                        Q.number(lambda),
                        Q.number(rhoW),
                        Q.stress(rootFc * rootFc),
                        Q.length(bw),
                        Q.length(d));
                t.note(
                        st == null
                                ? "No stirrups: Table 22.5.5.1 row (c) applies."
                                : "Av < Av,min: Table 22.5.5.1 row (c) applies.");
            }
            t.step(
                    "Vc,max",
                    code.vcMax().shown() + " λ √f'c bw d  (22.5.5.1.1)",
                    code.vcMax().shown() + " × {} × √{} × {} × {}",
                    Q.force(vcMax),
                    Q.number(lambda),
                    Q.stress(rootFc * rootFc),
                    Q.length(bw),
                    Q.length(d));
            if (capped) {
                t.note("Vc limited to Vc,max.");
            }
            t.value("Vc", Q.force(vc), "Table 22.5.5.1 row " + row);
            if (st != null) {
                t.step(
                        vsCapped ? "Vs,stirrups" : "Vs",
                        "Av fyt d / s  (22.5.8.5.3)",
                        "{} × {} × {} / {}",
                        Q.force(vsProvided),
                        Q.area(av),
                        Q.stress(fyt),
                        Q.length(d),
                        Q.length(st.spacing()));
                if (vsCapped) {
                    t.step(
                            "Vs,max",
                            code.vsMax().shown() + " √f'c bw d  (22.5.1.2)",
                            code.vsMax().shown() + " × √{} × {} × {}",
                            Q.force(vsCap),
                            Q.stress(rootFc * rootFc),
                            Q.length(bw),
                            Q.length(d));
                    t.step(
                            "Vs",
                            "min(Vs,stirrups, Vs,max)",
                            "min({}, {})",
                            Q.force(vs),
                            Q.force(vsProvided),
                            Q.force(vsCap));
                    t.note("The stirrups give more than Vs,max: the section carries no more than φ(Vc + Vs,max) "
                            + "whatever the stirrups (22.5.1.2).");
                }
            }
            t.step("φVn", "0.75 (Vc + Vs)", "0.75 × ({} + {})", Q.force(phiVn), Q.force(vc), Q.force(vs));
            t.step(
                    "φ(Vc + Vs,max)",
                    "0.75 (Vc + " + code.vsMax().shown() + " √f'c bw d)  (22.5.1.2)",
                    "0.75 × ({} + " + code.vsMax().shown() + " × √{} × {} × {})",
                    Q.force(vnLimit),
                    Q.force(vc),
                    Q.stress(rootFc * rootFc),
                    Q.length(bw),
                    Q.length(d));
            t.step(
                    "φ " + code.shearMinTrigger().shown() + " λ √f'c bw d",
                    "threshold for Av,min (9.6.3.1)",
                    "0.75 × " + code.shearMinTrigger().shown() + " × {} × √{} × {} × {}",
                    Q.force(trigger),
                    Q.number(lambda),
                    Q.stress(rootFc * rootFc),
                    Q.length(bw),
                    Q.length(d));
            if (st != null) {
                t.step(
                        "Vs,req",
                        "max(0, Vu / φ − Vc)",
                        "max(0, {} / 0.75 − {})",
                        Q.force(vsRequired),
                        Q.force(vu),
                        Q.force(vc));
                t.step(
                        code.vsSplit().shown() + " √f'c bw d",
                        "Table 9.7.6.2.2",
                        code.vsSplit().shown() + " × √{} × {} × {}",
                        Q.force(vsSplit),
                        Q.stress(rootFc * rootFc),
                        Q.length(bw),
                        Q.length(d));
                t.step(
                        "s,max",
                        high
                                ? "min(d/4, " + (code.inchPound() ? "12 in" : "300 mm") + "), Vs,req > "
                                        + code.vsSplit().shown() + " √f'c bw d"
                                : "min(d/2, " + (code.inchPound() ? "24 in" : "600 mm") + "), Vs,req ≤ "
                                        + code.vsSplit().shown() + " √f'c bw d",
                        null,
                        Q.length(sAlong));
            }
        }
        return new ShearResult(
                vu,
                bw,
                d,
                rhoW,
                lambdaS,
                vc,
                row,
                vs,
                vsProvided,
                phiVn,
                vnLimit,
                avMin,
                av,
                trigger,
                sAlong,
                sAcross,
                high);
    }
}
