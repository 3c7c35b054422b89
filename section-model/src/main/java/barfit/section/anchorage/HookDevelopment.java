package barfit.section.anchorage;

import barfit.catalogs.BarSize;
import barfit.section.CheckResult;
import barfit.section.CodeEquations;
import barfit.section.Materials;
import barfit.section.trail.Q;
import barfit.section.trail.Trail;

/**
 * Development length of a deformed bar in tension ending in a standard hook, 25.4.3.1: the greatest of
 * (a) fy ψe ψr ψo ψc / (55 λ √f'c) × db^1.5 (inch-pound; 23 in ACI 318M-19), (b) 8 db and (c) 150 mm
 * (6 in), measured from the critical section to the outside of the hook. √f'c is capped at 8.3 MPa
 * (100 psi) by 25.4.1.4; λ is 0.75 for lightweight concrete (25.4.3.1).
 */
public final class HookDevelopment {
    /**
     * How a hooked bar is anchored, for the factors of Table 25.4.3.2 and for 25.4.3.4. mm, mm².
     *
     * @param coated           epoxy-coated or zinc and epoxy dual-coated bars (ψe = 1.2)
     * @param ath              area of the ties or stirrups that confine the hooked bars (25.4.3.3); 0 for none
     * @param ahs              area of the hooked bars developed at the critical section
     * @param spacing          least centre-to-centre spacing of the hooked bars (0 when not known)
     * @param sideCover        cover normal to the plane of the hook
     * @param inColumnCore     the hook ends inside a column core
     * @param coverOverHook    cover over the hook in its plane (top or bottom cover), for 25.4.3.4
     * @param discontinuousEnd the hook anchors the bar at a discontinuous end of the member (25.4.3.4)
     */
    public record Conditions(
            boolean coated,
            double ath,
            double ahs,
            double spacing,
            double sideCover,
            boolean inColumnCore,
            double coverOverHook,
            boolean discontinuousEnd) {

        /** Uncoated bars with no ties counted and no spacing known: ψr and ψo from the covers alone. */
        public static Conditions uncoated(double sideCover, boolean inColumnCore) {
            return new Conditions(false, 0, 0, 0, sideCover, inColumnCore, Double.POSITIVE_INFINITY, false);
        }
    }

    /**
     * ldh with its factors, mm: {@code equation} is 25.4.3.1(a) alone; {@code enclosingTies} says 25.4.3.4
     * asks for ties along ldh at no more than 3 db, the first within 2 db of the outside of the bend.
     */
    public record Result(
            double ldh,
            double equation,
            double psiE,
            double psiR,
            double psiO,
            double psiC,
            double lambda,
            boolean enclosingTies) {}

    /** Whether a hook fits in its support: ldh against the support width less the far cover, mm. */
    public record Fit(double ldh, double available, double shortfall, CheckResult check) {
        public boolean fits() {
            return check.pass();
        }
    }

    private HookDevelopment() {}

    /** λ of 25.4.3.1 and Table 25.4.2.5: 0.75 for lightweight concrete (any λ below 1), else 1.0. */
    public static double lambda(Materials m) {
        return m.lambda() < 1 ? 0.75 : 1.0;
    }

    /**
     * ψc of Table 25.4.3.2: f'c / 15 000 + 0.6 below 6000 psi (f'c / 105 + 0.6 below 40 MPa in ACI 318M-19,
     * from memory), else 1.0.
     */
    public static double psiC(double fc, CodeEquations code) {
        CodeEquations.Anchorage a = code.anchorage();
        return fc < a.psiCLimit() ? Math.min(1.0, fc / a.psiCDivisor() + 0.6) : 1.0;
    }

    /**
     * ψr of Table 25.4.3.2: 1.0 for No. 36 (#11) and smaller bars with Ath at least 0.4 Ahs or a spacing of
     * at least 6 db; 1.6 otherwise, and always where 25.4.3.4 applies (from memory: it takes away the
     * credit for confinement, as ACI 318-14 took away its 0.8 factor).
     */
    public static double psiR(BarSize bar, Conditions c, CodeEquations code) {
        if (enclosingTies(c, code) || !BarClasses.upToNo36(bar)) {
            return 1.6;
        }
        boolean ties = c.ahs() > 0 && c.ath() >= 0.4 * c.ahs() * (1 - 1e-12);
        boolean spaced = c.spacing() >= 6 * bar.diameter() * (1 - 1e-12);
        return ties || spaced ? 1.0 : 1.6;
    }

    /**
     * ψo of Table 25.4.3.2: 1.0 for No. 36 (#11) and smaller hooks ending inside a column core with a side
     * cover of at least 65 mm (2.5 in), or with a side cover of at least 6 db; 1.25 otherwise.
     */
    public static double psiO(BarSize bar, Conditions c, CodeEquations code) {
        if (!BarClasses.upToNo36(bar)) {
            return 1.25;
        }
        double cover = code.anchorage().hookCover();
        boolean core = c.inColumnCore() && c.sideCover() >= cover * (1 - 1e-12);
        boolean side = c.sideCover() >= 6 * bar.diameter() * (1 - 1e-12);
        return core || side ? 1.0 : 1.25;
    }

    /** 25.4.3.4: a hook at a discontinuous end with both side cover and cover over it below 65 mm (2.5 in). */
    public static boolean enclosingTies(Conditions c, CodeEquations code) {
        double cover = code.anchorage().hookCover();
        return c.discontinuousEnd() && c.sideCover() < cover && c.coverOverHook() < cover;
    }

    /** ldh of 25.4.3.1 for {@code bar} in tension ending in a standard hook. */
    public static Result ldh(BarSize bar, Materials m, CodeEquations code, Conditions c, Trail t) {
        CodeEquations.Anchorage a = code.anchorage();
        double db = bar.diameter();
        double psiE = c.coated() ? 1.2 : 1.0;
        double psiR = psiR(bar, c, code);
        double psiO = psiO(bar, c, code);
        double psiC = psiC(m.fc(), code);
        double lambda = lambda(m);
        double rootFc = Math.min(Math.sqrt(m.fc()), code.rootFcMax());
        double eq = m.fy() * psiE * psiR * psiO * psiC / (a.ldh().si() * lambda * rootFc) * Math.pow(db, 1.5);
        double ldh = Math.max(eq, Math.max(8 * db, a.ldhMin()));
        boolean ties = enclosingTies(c, code);
        if (t.isOn()) {
            t.heading("Development length of a standard hook, " + bar.label(), "25.4.3.1");
            t.value("ψe", Q.number(psiE), c.coated() ? "coated bars" : "uncoated bars (Table 25.4.3.2)");
            t.value("ψr", Q.number(psiR), psiR == 1.0 ? "confined or spaced at 6 db" : "no confinement counted");
            t.value("ψo", Q.number(psiO), psiO == 1.0 ? "side cover met" : "side cover below the table's");
            t.step(
                    "ψc",
                    "f'c / " + (code.inchPound() ? "15 000" : "105") + " + 0.6 ≤ 1.0",
                    "{} / {} + 0.6",
                    Q.number(psiC),
                    Q.stress(m.fc()),
                    Q.stress(a.psiCDivisor()));
            t.step(
                    "ldh (a)",
                    "fy ψe ψr ψo ψc / (" + a.ldh().shown() + " λ √f'c) × db^1.5",
                    "{} × {} × {} × {} × {} / (" + a.ldh().shown() + " × {} × √{}) × {}^1.5",
                    Q.length(eq),
                    Q.stress(m.fy()),
                    Q.number(psiE),
                    Q.number(psiR),
                    Q.number(psiO),
                    Q.number(psiC),
                    Q.number(lambda),
                    Q.stress(rootFc * rootFc),
                    Q.length(db));
            t.step(
                    "ldh",
                    "max((a), 8 db, " + (code.inchPound() ? "6 in" : "150 mm") + ")",
                    "max({}, 8 × {}, {})",
                    Q.length(ldh),
                    Q.length(eq),
                    Q.length(db),
                    Q.length(a.ldhMin()));
            if (ties) {
                t.note("25.4.3.4: side cover and cover over the hook both below "
                        + (code.inchPound() ? "2.5 in" : "65 mm")
                        + " at a discontinuous end: ties along ldh at no more than 3 db, the first within 2 db"
                        + " of the outside of the bend; ψr = 1.6.");
            }
        }
        return new Result(ldh, eq, psiE, psiR, psiO, psiC, lambda, ties);
    }

    /**
     * Whether a hook anchored from the support face fits: ldh must not exceed the support width less the
     * cover at its far face. {@code shortfall} is how much longer the support would have to be (0 when it
     * fits), for a diagnosis.
     */
    public static Fit fit(double ldh, double supportWidth, double farCover, Trail t) {
        double available = supportWidth - farCover;
        double shortfall = Math.max(0, ldh - available);
        CheckResult check = CheckResult.atMost(
                "hook-fit", "Hook within the support", "25.4.3.1", Q.length(ldh), Q.length(available), null);
        if (t.isOn()) {
            t.heading("Hook within the support", "25.4.3.1");
            t.step(
                    "available",
                    "support width − far cover",
                    "{} − {}",
                    Q.length(available),
                    Q.length(supportWidth),
                    Q.length(farCover));
            t.step(
                    "shortfall",
                    "max(0, ldh − available)",
                    "max(0, {} − {})",
                    Q.length(shortfall),
                    Q.length(ldh),
                    Q.length(available));
        }
        return new Fit(ldh, available, shortfall, check);
    }
}
