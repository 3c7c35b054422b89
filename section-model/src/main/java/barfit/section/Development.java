package barfit.section;

import barfit.catalogs.BarSize;
import barfit.section.trail.Q;
import barfit.section.trail.Trail;

/**
 * Development length of straight deformed bars in tension (25.4.2), by the general equation of
 * 25.4.2.4 with the confinement term (cb + Ktr)/db limited to 2.5, and never less than 300 mm
 * (12 in). Uncoated bars (psi_e = 1.0); psi_t = 1.3 for top bars with more than 300 mm of fresh
 * concrete below them.
 */
public final class Development {
    /**
     * The result with its factors, mm: {@code ld} never below 25.4.2.1(b)'s minimum; {@code ldEquation} the
     * value of 25.4.2.4 alone, which 25.5.2.1 takes for lap splices (they have their own minimum).
     */
    public record Result(
            double ld,
            double psiT,
            double psiS,
            double psiG,
            double confinement,
            double ktr,
            double cb,
            double ldEquation) {}

    private Development() {}

    /** psi_g of Table 25.4.2.5 from fy. */
    public static double psiG(double fy, CodeEquations code) {
        if (fy <= code.fyGrade420() * (1 + 1e-9)) {
            return 1.0;
        }
        return fy <= code.fyGrade550() * (1 + 1e-9) ? 1.15 : 1.3;
    }

    /**
     * @param topBar more than 300 mm (12 in) of fresh concrete is cast below the bar
     * @param cb     the smaller of the distance from the bar centre to the nearest concrete surface and
     *               half the centre-to-centre spacing of the bars being developed, mm
     * @param atr    area of the stirrup legs crossing the splitting plane, mm² (0 to ignore them)
     * @param s      stirrup spacing, mm
     * @param n      number of bars being developed along the splitting plane
     */
    public static Result general(
            BarSize bar,
            Materials m,
            CodeEquations code,
            boolean topBar,
            double cb,
            double atr,
            double s,
            int n,
            Trail t) {
        double db = bar.diameter();
        double psiT = topBar ? 1.3 : 1.0;
        double psiE = 1.0;
        double psiS = db < code.smallBarLimit() ? 0.8 : 1.0;
        double psiG = psiG(m.fy(), code);
        double ktr = atr > 0 && s > 0 && n > 0 ? 40 * atr / (s * n) : 0;
        double conf = Math.min((cb + ktr) / db, 2.5);
        double rootFc = Math.min(Math.sqrt(m.fc()), code.rootFcMax());
        double psi = Math.min(psiT * psiE, 1.7) * psiS * psiG;
        double ld = m.fy() / (code.ldGeneral().si() * m.lambda() * rootFc) * psi / conf * db;
        double out = Math.max(ld, code.ldMin());
        if (t.isOn()) {
            t.heading("Development length of " + bar.label() + (topBar ? " top bars" : " bars"), "25.4.2.4");
            t.step("Ktr", "40 Atr / (s n)", "40 × {} / ({} × {})", Q.length(ktr), Q.area(atr), Q.length(s), Q.count(n));
            t.step(
                    "(cb + Ktr)/db",
                    "min((cb + Ktr) / db, 2.5)",
                    "min(({} + {}) / {}, 2.5)",
                    Q.number(conf),
                    Q.length(cb),
                    Q.length(ktr),
                    Q.length(db));
            t.step(
                    "ld",
                    "fy / (" + code.ldGeneral().shown() + " λ √f'c) × ψt ψe ψs ψg / ((cb + Ktr)/db) × db",
                    "{} / (" + code.ldGeneral().shown() + " × {} × √{}) × {} × 1.0 × {} × {} / {} × {}",
                    Q.length(ld),
                    Q.stress(m.fy()),
                    Q.number(m.lambda()),
                    Q.stress(rootFc * rootFc),
                    Q.number(psiT),
                    Q.number(psiS),
                    Q.number(psiG),
                    Q.number(conf),
                    Q.length(db));
            if (out > ld) {
                t.note("ld raised to the minimum of 25.4.2.1(b).");
            }
        }
        return new Result(out, psiT, psiS, psiG, conf, ktr, cb, ld);
    }

    /**
     * ld of one layer of a section by 25.4.2.4 as it is built: cb the least of the cover to the bar centre
     * at the side face, the layer's distance from its face and half the centre spacing of its bars; Ktr
     * from the section's stirrups (every leg crossing the splitting plane, spacing s, n the layer's bars);
     * a top bar where more than 300 mm (12 in) of concrete is cast below it.
     */
    public static Result ofLayer(BeamSection s, BarLayer layer, Trail t) {
        BarSize bar = layer.bar();
        double db = bar.diameter();
        Detailing det = s.detailing();
        double side = det.cover() + det.stirrupBar().diameter() + db / 2;
        double spacing = BarSpacing.centreSpacing(s.shape().width(), det, db, layer.count());
        double cb = Math.min(Math.min(side, layer.fromFace()), layer.count() > 1 ? spacing / 2 : side);
        double below = layer.face() == Face.TOP ? s.shape().height() - layer.fromFace() - db / 2 : 0;
        boolean topBar = below > s.code().topBarConcreteBelow();
        Stirrups st = s.stirrups();
        double atr = st == null ? 0 : st.legs() * st.bar().area();
        double sp = st == null ? 0 : st.spacing();
        return general(bar, s.materials(), s.code(), topBar, cb, atr, sp, layer.count(), t);
    }

    /**
     * The simplified expressions of Table 25.4.2.3: {@code spacingMet} is the first row's condition
     * (clear spacing and cover at least db with minimum stirrups, or clear spacing at least 2 db and
     * cover at least db).
     */
    public static double simplified(BarSize bar, Materials m, CodeEquations code, boolean topBar, boolean spacingMet) {
        double db = bar.diameter();
        boolean small = db < code.smallBarLimit();
        Coef k = spacingMet
                ? (small ? code.ldSimpleSmall() : code.ldSimpleLarge())
                : (small ? code.ldOtherSmall() : code.ldOtherLarge());
        double psi = Math.min((topBar ? 1.3 : 1.0) * 1.0, 1.7) * psiG(m.fy(), code);
        double rootFc = Math.min(Math.sqrt(m.fc()), code.rootFcMax());
        return Math.max(m.fy() * psi / (k.si() * m.lambda() * rootFc) * db, code.ldMin());
    }
}
