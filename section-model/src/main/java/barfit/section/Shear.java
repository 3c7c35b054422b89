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
            explain(
                    t,
                    new Terms(
                            m,
                            code,
                            bw,
                            lambda,
                            rootFc,
                            fyt,
                            rhoW,
                            lambdaS,
                            st,
                            av,
                            avMin,
                            vcA,
                            vcB,
                            vcC,
                            vcMax,
                            withMin,
                            vc,
                            row,
                            capped,
                            vsProvided,
                            vsCap,
                            vs,
                            vsCapped,
                            phiVn,
                            vnLimit,
                            trigger,
                            vsRequired,
                            vsSplit,
                            high,
                            sAlong,
                            vu,
                            d,
                            tensionArea));
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

    /** What {@link #analyse} computed, for its trail: written apart so the search's path stays small. */
    private record Terms(
            Materials m,
            CodeEquations code,
            double bw,
            double lambda,
            double rootFc,
            double fyt,
            double rhoW,
            double lambdaS,
            Stirrups st,
            double av,
            double avMin,
            double vcA,
            double vcB,
            double vcC,
            double vcMax,
            boolean withMin,
            double vc,
            String row,
            boolean capped,
            double vsProvided,
            double vsCap,
            double vs,
            boolean vsCapped,
            double phiVn,
            double vnLimit,
            double trigger,
            double vsRequired,
            double vsSplit,
            boolean high,
            double sAlong,
            double vu,
            double d,
            double tensionArea) {}

    /** The trail of one shear analysis. */
    private static void explain(Trail t, Terms k) {
        t.heading("Shear", "22.5, 9.6.3, 9.7.6.2.2");
        t.step(
                "ρw",
                "As / (bw d)",
                "{} / ({} × {})",
                Q.number(k.rhoW()),
                Q.area(k.tensionArea()),
                Q.length(k.bw()),
                Q.length(k.d()));
        if (Math.sqrt(k.m().fc()) > k.rootFc()) {
            t.note("√f'c limited to " + (k.code().inchPound() ? "100 psi" : "8.3 MPa") + " (22.5.3.1).");
        }
        if (k.st() != null) {
            t.step(
                    "fyt",
                    "min(fyt, " + (k.code().inchPound() ? "60000 psi" : "420 MPa") + ")  (20.2.2.4)",
                    null,
                    Q.stress(k.fyt()));
            t.step(
                    "Av",
                    "legs × Ab",
                    "{} × {}",
                    Q.area(k.av()),
                    Q.count(k.st().legs()),
                    Q.area(k.st().bar().area()));
            t.step(
                    "Av,min",
                    "max(" + k.code().avMinRoot().shown() + " √f'c, "
                            + (k.code().inchPound() ? "50" : "0.35") + ") bw s / fyt  (Table 9.6.3.4)",
                    "max(" + k.code().avMinRoot().shown() + " × √{}, {}) × {} × {} / {}",
                    Q.area(k.avMin()),
                    Q.stress(k.m().fc()),
                    Q.stress(k.code().avMinFlat()),
                    Q.length(k.bw()),
                    Q.length(k.st().spacing()),
                    Q.stress(k.fyt()));
        }
        if (k.withMin()) {
            t.step(
                    "Vc (a)",
                    k.code().vcSimple().shown() + " λ √f'c bw d",
                    k.code().vcSimple().shown() + " × {} × √{} × {} × {}",
                    Q.force(k.vcA()),
                    Q.number(k.lambda()),
                    Q.stress(k.rootFc() * k.rootFc()),
                    Q.length(k.bw()),
                    Q.length(k.d()));
            t.step(
                    "Vc (b)",
                    k.code().vcRho().shown() + " λ ρw^(1/3) √f'c bw d",
                    k.code().vcRho().shown() + " × {} × {}^(1/3) × √{} × {} × {}",
                    Q.force(k.vcB()),
                    Q.number(k.lambda()),
                    Q.number(k.rhoW()),
                    Q.stress(k.rootFc() * k.rootFc()),
                    Q.length(k.bw()),
                    Q.length(k.d()));
            t.note("Av ≥ Av,min: Table 22.5.5.1 permits either (a) or (b); the larger is used.");
        } else {
            t.step(
                    "λs",
                    k.code().inchPound() ? "√(2 / (1 + d/10)) ≤ 1" : "√(2 / (1 + 0.004 d)) ≤ 1",
                    k.code().inchPound() ? "√(2 / (1 + {}/10))" : "√(2 / (1 + 0.004 × {}))",
                    Q.number(k.lambdaS()),
                    Q.length(k.d()));
            t.step(
                    "Vc (c)",
                    k.code().vcRho().shown() + " λs λ ρw^(1/3) √f'c bw d",
                    k.code().vcRho().shown() + " × {} × {} × {}^(1/3) × √{} × {} × {}",
                    Q.force(k.vcC()),
                    Q.number(k.lambdaS()),
                    Q.number(k.lambda()),
                    Q.number(k.rhoW()),
                    Q.stress(k.rootFc() * k.rootFc()),
                    Q.length(k.bw()),
                    Q.length(k.d()));
            t.note(
                    k.st() == null
                            ? "No stirrups: Table 22.5.5.1 row (c) applies."
                            : "Av < Av,min: Table 22.5.5.1 row (c) applies.");
        }
        t.step(
                "Vc,max",
                k.code().vcMax().shown() + " λ √f'c bw d  (22.5.5.1.1)",
                k.code().vcMax().shown() + " × {} × √{} × {} × {}",
                Q.force(k.vcMax()),
                Q.number(k.lambda()),
                Q.stress(k.rootFc() * k.rootFc()),
                Q.length(k.bw()),
                Q.length(k.d()));
        if (k.capped()) {
            t.note("Vc limited to Vc,max.");
        }
        t.value("Vc", Q.force(k.vc()), "Table 22.5.5.1 row " + k.row());
        if (k.st() != null) {
            t.step(
                    k.vsCapped() ? "Vs,stirrups" : "Vs",
                    "Av fyt d / s  (22.5.8.5.3)",
                    "{} × {} × {} / {}",
                    Q.force(k.vsProvided()),
                    Q.area(k.av()),
                    Q.stress(k.fyt()),
                    Q.length(k.d()),
                    Q.length(k.st().spacing()));
            if (k.vsCapped()) {
                t.step(
                        "Vs,max",
                        k.code().vsMax().shown() + " √f'c bw d  (22.5.1.2)",
                        k.code().vsMax().shown() + " × √{} × {} × {}",
                        Q.force(k.vsCap()),
                        Q.stress(k.rootFc() * k.rootFc()),
                        Q.length(k.bw()),
                        Q.length(k.d()));
                t.step(
                        "Vs",
                        "min(Vs,stirrups, Vs,max)",
                        "min({}, {})",
                        Q.force(k.vs()),
                        Q.force(k.vsProvided()),
                        Q.force(k.vsCap()));
                t.note("The stirrups give more than Vs,max: the section carries no more than φ(Vc + Vs,max) "
                        + "whatever the stirrups (22.5.1.2).");
            }
        }
        t.step("φVn", "0.75 (Vc + Vs)", "0.75 × ({} + {})", Q.force(k.phiVn()), Q.force(k.vc()), Q.force(k.vs()));
        t.step(
                "φ(Vc + Vs,max)",
                "0.75 (Vc + " + k.code().vsMax().shown() + " √f'c bw d)  (22.5.1.2)",
                "0.75 × ({} + " + k.code().vsMax().shown() + " × √{} × {} × {})",
                Q.force(k.vnLimit()),
                Q.force(k.vc()),
                Q.stress(k.rootFc() * k.rootFc()),
                Q.length(k.bw()),
                Q.length(k.d()));
        t.step(
                "φ " + k.code().shearMinTrigger().shown() + " λ √f'c bw d",
                "threshold for Av,min (9.6.3.1)",
                "0.75 × " + k.code().shearMinTrigger().shown() + " × {} × √{} × {} × {}",
                Q.force(k.trigger()),
                Q.number(k.lambda()),
                Q.stress(k.rootFc() * k.rootFc()),
                Q.length(k.bw()),
                Q.length(k.d()));
        if (k.st() != null) {
            t.step(
                    "Vs,req",
                    "max(0, Vu / φ − Vc)",
                    "max(0, {} / 0.75 − {})",
                    Q.force(k.vsRequired()),
                    Q.force(k.vu()),
                    Q.force(k.vc()));
            t.step(
                    k.code().vsSplit().shown() + " √f'c bw d",
                    "Table 9.7.6.2.2",
                    k.code().vsSplit().shown() + " × √{} × {} × {}",
                    Q.force(k.vsSplit()),
                    Q.stress(k.rootFc() * k.rootFc()),
                    Q.length(k.bw()),
                    Q.length(k.d()));
            t.step(
                    "s,max",
                    k.high()
                            ? "min(d/4, " + (k.code().inchPound() ? "12 in" : "300 mm") + "), Vs,req > "
                                    + k.code().vsSplit().shown() + " √f'c bw d"
                            : "min(d/2, " + (k.code().inchPound() ? "24 in" : "600 mm") + "), Vs,req ≤ "
                                    + k.code().vsSplit().shown() + " √f'c bw d",
                    null,
                    Q.length(k.sAlong()));
        }
    }
}
