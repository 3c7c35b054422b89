package barfit.section.anchorage;

import barfit.catalogs.BarSize;
import barfit.section.CodeEquations;
import barfit.section.Materials;
import barfit.section.trail.Q;
import barfit.section.trail.Trail;

/**
 * Development length of a deformed bar in compression, 25.4.9: the greater of (a) fy ψr / (50 λ √f'c) × db
 * and (b) 0.0003 fy ψr × db (inch-pound; 0.24 fy ψr / (λ √f'c) × db and 0.043 fy ψr × db in ACI 318M-19),
 * never less than 200 mm (8 in) (25.4.9.1). ψr = 0.75 for bars enclosed by a spiral, or by No. 13 (#4)
 * ties or hoops at no more than 100 mm (4 in) (Table 25.4.9.3); λ 0.75 for lightweight concrete. Hooks do
 * not develop bars in compression (25.4.1.2).
 */
public final class CompressionDevelopment {
    /** ldc with the values of its two expressions and ψr, mm. */
    public record Result(double ldc, double byRoot, double byFlat, double psiR) {}

    private CompressionDevelopment() {}

    /**
     * @param confined the bars are enclosed as Table 25.4.9.3 asks for ψr = 0.75 (the caller checks the
     *     spiral, ties or hoops)
     */
    public static Result ldc(BarSize bar, Materials m, CodeEquations code, boolean confined, Trail t) {
        CodeEquations.Anchorage a = code.anchorage();
        double db = bar.diameter();
        double psiR = confined ? 0.75 : 1.0;
        double lambda = HookDevelopment.lambda(m);
        double rootFc = Math.min(Math.sqrt(m.fc()), code.rootFcMax());
        double byRoot = a.ldcRoot().si() * m.fy() * psiR / (lambda * rootFc) * db;
        double byFlat = a.ldcFlat().si() * m.fy() * psiR * db;
        double ldc = Math.max(Math.max(byRoot, byFlat), a.ldcMin());
        if (t.isOn()) {
            t.heading("Development length in compression, " + bar.label(), "25.4.9");
            t.value("ψr", Q.number(psiR), confined ? "enclosed (Table 25.4.9.3)" : "not enclosed (Table 25.4.9.3)");
            t.step(
                    "ldc (a)",
                    a.ldcRoot().shown() + " fy ψr / (λ √f'c) × db",
                    a.ldcRoot().shown() + " × {} × {} / ({} × √{}) × {}",
                    Q.length(byRoot),
                    Q.stress(m.fy()),
                    Q.number(psiR),
                    Q.number(lambda),
                    Q.stress(rootFc * rootFc),
                    Q.length(db));
            t.step(
                    "ldc (b)",
                    a.ldcFlat().shown() + " fy ψr × db",
                    a.ldcFlat().shown() + " × {} × {} × {}",
                    Q.length(byFlat),
                    Q.stress(m.fy()),
                    Q.number(psiR),
                    Q.length(db));
            t.step(
                    "ldc",
                    "max((a), (b), " + (code.inchPound() ? "8 in" : "200 mm") + ")",
                    "max({}, {}, {})",
                    Q.length(ldc),
                    Q.length(byRoot),
                    Q.length(byFlat),
                    Q.length(a.ldcMin()));
        }
        return new Result(ldc, byRoot, byFlat, psiR);
    }
}
