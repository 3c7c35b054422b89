package barfit.section;

import barfit.section.trail.Q;
import barfit.section.trail.Trail;

/**
 * Torsion of a solid, non-prestressed beam section (ACI 318-19 22.7): the threshold below which it may be
 * neglected (Table 22.7.4.1(a), 9.5.4.1), the cracking torsion (Table 22.7.5.1) to which compatibility
 * torsion may be reduced (22.7.3.2), the cross-section limit (22.7.7.1(a)) and the reinforcement of the
 * space truss at θ = 45° (22.7.6.1) with its minimums and spacing (9.6.4.2, 9.6.4.3, 9.7.6.3.3). The
 * flange overhangs count as 9.2.4.4 says. The checks built on these are {@link TorsionChecks}.
 */
public final class Torsion {
    /** φ for torsion, Table 21.2.1. */
    public static final double PHI = 0.75;

    private static final double ROOT_PSI = Math.sqrt(CodeEquations.PSI_PER_MPA);
    private static final double IN = CodeEquations.MM_PER_IN;

    /**
     * The torsion coefficients of one edition in the SI form (√f'c in √MPa, stresses MPa, lengths mm), each
     * {@code shown} as the edition prints it. The flat terms are stresses (MPa).
     */
    record Coefficients(
            Coef threshold,
            Coef cracking,
            Coef sectionLimit,
            Coef transverseMinRoot,
            double transverseMinFlat,
            Coef longitudinalMinRoot,
            double atFloor,
            double steelMax,
            double spacingCap,
            double barSpacingMax,
            double minBarDiameter) {}

    /** ACI 318M-19 (clause and table numbers from memory). */
    static final Coefficients SI = new Coefficients(
            new Coef(0.083, "0.083"), // Table 22.7.4.1(a), solid non-prestressed
            new Coef(0.33, "0.33"), // Table 22.7.5.1
            new Coef(0.66, "0.66"), // 22.7.7.1(a)
            new Coef(0.062, "0.062"),
            0.35, // Table 9.6.4.2
            new Coef(0.42, "0.42"),
            0.175, // 9.6.4.3
            420.0, // Table 20.2.2.4(a), torsion
            300.0, // 9.7.6.3.3
            300.0, // 9.7.5.1
            9.5); // 9.7.5.2: a No. 10 bar

    /** ACI 318-19 inch-pound, each constant converted exactly to N, mm, MPa. */
    static final Coefficients INCH_POUND = new Coefficients(
            new Coef(1.0 / ROOT_PSI, "1"),
            new Coef(4.0 / ROOT_PSI, "4"),
            new Coef(8.0 / ROOT_PSI, "8"),
            new Coef(0.75 / ROOT_PSI, "0.75"),
            50.0 / CodeEquations.PSI_PER_MPA,
            new Coef(5.0 / ROOT_PSI, "5"),
            25.0 / CodeEquations.PSI_PER_MPA,
            60_000.0 / CodeEquations.PSI_PER_MPA,
            12 * IN,
            12 * IN,
            0.375 * IN); // No. 3

    private Torsion() {}

    static Coefficients of(CodeEquations code) {
        return code.inchPound() ? INCH_POUND : SI;
    }

    /**
     * The centre-line of the outermost closed stirrup: {@code x0} × {@code y0}, at cover + ds/2 from every
     * face of the web (the stirrups' own bar, else the bar the detailing places the main bars by).
     */
    public record Hoop(double x0, double y0) {
        /** Aoh, the area the hoop's centre-line encloses. */
        public double aoh() {
            return x0 * y0;
        }

        /** ph, the perimeter of that centre-line. */
        public double ph() {
            return 2 * (x0 + y0);
        }

        /** Ao = 0.85 Aoh (22.7.6.1.1). */
        public double ao() {
            return 0.85 * aoh();
        }
    }

    public static Hoop hoop(BeamSection s) {
        double inset = 2 * s.detailing().cover() + stirrupDiameter(s);
        return new Hoop(s.shape().width() - inset, s.shape().height() - inset);
    }

    static double stirrupDiameter(BeamSection s) {
        return s.stirrups() != null
                ? s.stirrups().bar().diameter()
                : s.detailing().stirrupBar().diameter();
    }

    /** √f'c for Tth, Tcr and the section limit, at most 8.3 MPa (100 psi) (22.7.2.1, from memory). */
    static double rootFc(BeamSection s) {
        return s.code().rootFcForShear(s.materials().fc());
    }

    /** Tth, N·mm: 0.083 λ √f'c Acp²/pcp (Table 22.7.4.1(a); 1 λ √f'c ... in inch-pound). */
    public static double threshold(BeamSection s) {
        return of(s.code()).threshold().si()
                * s.materials().lambda()
                * rootFc(s)
                * TorsionOutline.of(s.shape()).shapeFactor();
    }

    /** Tcr, N·mm: 0.33 λ √f'c Acp²/pcp (Table 22.7.5.1; 4 λ √f'c ... in inch-pound). */
    public static double cracking(BeamSection s) {
        return of(s.code()).cracking().si()
                * s.materials().lambda()
                * rootFc(s)
                * TorsionOutline.of(s.shape()).shapeFactor();
    }

    /**
     * The torsion of a section carrying {@code tu} (N·mm, either sign) with the shear {@code shear} (its Vu,
     * d and Vc; Vu 0 where none is given). {@code compatibility}: Tu is compatibility torsion (22.7.3.2).
     */
    public static TorsionResult analyse(BeamSection s, double tu, boolean compatibility, ShearResult shear, Trail t) {
        Materials m = s.materials();
        CodeEquations code = s.code();
        Coefficients k = of(code);
        double lambda = m.lambda();
        double root = rootFc(s);
        TorsionOutline o = TorsionOutline.of(s.shape());
        double t0 = Math.abs(tu);
        double tth = threshold(s);
        double tcr = cracking(s);
        double tDesign = compatibility ? Math.min(t0, PHI * tcr) : t0;
        Hoop hp = hoop(s);
        double bw = s.shape().width();
        double d = shear.d();
        double vu = shear.vu();
        double vc = shear.vc();
        double fyt = Math.min(m.fyt(), k.steelMax());
        double fy = Math.min(m.fy(), k.steelMax());
        double vShear = vu / (bw * d);
        double vTorsion = tDesign * hp.ph() / (1.7 * hp.aoh() * hp.aoh());
        double stress = Math.hypot(vShear, vTorsion);
        double limit = PHI * (vc / (bw * d) + k.sectionLimit().si() * root);
        // θ = 45° (22.7.6.1.2): cot θ = 1
        double at = tDesign / (PHI * 2 * hp.ao() * fyt);
        double av = Math.max(0, vu / PHI - vc) / (fyt * d);
        double transverseMin =
                Math.max(k.transverseMinRoot().si() * Math.sqrt(m.fc()), k.transverseMinFlat()) * bw / fyt;
        double sMax = Math.min(hp.ph() / 8, k.spacingCap());
        double al = at * hp.ph() * fyt / fy;
        double atForMin = Math.max(at, k.atFloor() * bw / fyt);
        double alMinRaw =
                k.longitudinalMinRoot().si() * Math.sqrt(m.fc()) * o.acp() / fy - atForMin * hp.ph() * fyt / fy;
        TorsionResult r = new TorsionResult(
                o,
                hp,
                t0,
                tDesign,
                compatibility,
                tth,
                tcr,
                vu,
                bw,
                d,
                vc,
                fyt,
                fy,
                stress,
                limit,
                at,
                av,
                transverseMin,
                sMax,
                al,
                Math.max(0, alMinRaw));
        if (!t.isOn()) {
            return r;
        }
        String mpa = code.inchPound() ? "60000 psi" : "420 MPa";
        o.trail(s.shape(), t);
        if (Math.sqrt(m.fc()) > root) {
            t.note("√f'c limited to " + (code.inchPound() ? "100 psi" : "8.3 MPa") + " (22.7.2.1).");
        }
        t.step(
                "Tth",
                k.threshold().shown() + " λ √f'c Acp² / pcp  (Table 22.7.4.1(a))",
                k.threshold().shown() + " × {} × √{} × {}² / {}",
                Q.moment(tth),
                Q.number(lambda),
                Q.stress(root * root),
                Q.area(o.acp()),
                Q.length(o.pcp()));
        t.step("φTth", "0.75 Tth  (Table 21.2.1)", "0.75 × {}", Q.moment(r.phiTth()), Q.moment(tth));
        t.value("Tu", Q.moment(t0), "factored torsion given");
        if (r.neglected()) {
            t.note("Tu < φTth: torsion may be neglected (9.5.4.1, 22.7.1.1).");
            return r;
        }
        t.note("Tu ≥ φTth: the section is designed for torsion (22.7.1.1); the reinforcement for torsion is added to "
                + "that for shear and flexure (9.5.4.3).");
        t.step(
                "Tcr",
                k.cracking().shown() + " λ √f'c Acp² / pcp  (Table 22.7.5.1)",
                k.cracking().shown() + " × {} × √{} × {}² / {}",
                Q.moment(tcr),
                Q.number(lambda),
                Q.stress(root * root),
                Q.area(o.acp()),
                Q.length(o.pcp()));
        t.step("φTcr", "0.75 Tcr", "0.75 × {}", Q.moment(r.phiTcr()), Q.moment(tcr));
        if (compatibility && r.reduced()) {
            t.step(
                    "Tu,design",
                    "min(Tu, φTcr)  (22.7.3.2)",
                    "min({}, {})",
                    Q.moment(tDesign),
                    Q.moment(t0),
                    Q.moment(r.phiTcr()));
            t.note(
                    "Compatibility torsion: Tu is reduced to φTcr. The adjoining members must be designed for the moments "
                            + "and shears redistributed to them, in equilibrium with the reduced torsion (22.7.3.3).");
        } else if (compatibility) {
            t.note("Compatibility torsion, but Tu ≤ φTcr: no reduction (22.7.3.2).");
        } else {
            t.note("Equilibrium torsion: designed for Tu as given (22.7.3.1).");
        }
        double ds = stirrupDiameter(s);
        double cover = s.detailing().cover();
        t.step(
                "x0",
                "bw − 2 cover − ds  (hoop centre-line)",
                "{} − 2 × {} − {}",
                Q.length(hp.x0()),
                Q.length(bw),
                Q.length(cover),
                Q.length(ds));
        t.step(
                "y0",
                "h − 2 cover − ds",
                "{} − 2 × {} − {}",
                Q.length(hp.y0()),
                Q.length(s.shape().height()),
                Q.length(cover),
                Q.length(ds));
        t.step("Aoh", "x0 y0", "{} × {}", Q.area(hp.aoh()), Q.length(hp.x0()), Q.length(hp.y0()));
        t.step("ph", "2 (x0 + y0)", "2 × ({} + {})", Q.length(hp.ph()), Q.length(hp.x0()), Q.length(hp.y0()));
        t.step("Ao", "0.85 Aoh  (22.7.6.1.1)", "0.85 × {}", Q.area(hp.ao()), Q.area(hp.aoh()));
        t.step("v", "Vu / (bw d)", "{} / ({} × {})", Q.stress(vShear), Q.force(vu), Q.length(bw), Q.length(d));
        t.step(
                "vt",
                "Tu ph / (1.7 Aoh²)",
                "{} × {} / (1.7 × {}²)",
                Q.stress(vTorsion),
                Q.moment(tDesign),
                Q.length(hp.ph()),
                Q.area(hp.aoh()));
        t.step(
                "√(v² + vt²)",
                "shear and torsion combined  (22.7.7.1(a))",
                "√({}² + {}²)",
                Q.stress(stress),
                Q.stress(vShear),
                Q.stress(vTorsion));
        t.step(
                "φ (Vc / (bw d) + " + k.sectionLimit().shown() + " √f'c)",
                "the limit  (22.7.7.1(a))",
                "0.75 × ({} / ({} × {}) + " + k.sectionLimit().shown() + " × √{})",
                Q.stress(limit),
                Q.force(vc),
                Q.length(bw),
                Q.length(d),
                Q.stress(root * root));
        t.step("fyt", "min(fyt, " + mpa + ")  (22.7.2.2, Table 20.2.2.4(a))", null, Q.stress(fyt));
        t.step("fy", "min(fy, " + mpa + ")  (22.7.2.2, Table 20.2.2.4(a))", null, Q.stress(fy));
        t.step(
                "At/s",
                "Tu / (φ 2 Ao fyt cot θ), θ = 45°  (22.7.6.1)",
                "{} / (0.75 × 2 × {} × {} × 1)",
                Q.areaPerLength(at),
                Q.moment(tDesign),
                Q.area(hp.ao()),
                Q.stress(fyt));
        t.step(
                "Av/s",
                "max(0, Vu / φ − Vc) / (fyt d)  (22.5.8.5.3)",
                "max(0, {} / 0.75 − {}) / ({} × {})",
                Q.areaPerLength(av),
                Q.force(vu),
                Q.force(vc),
                Q.stress(fyt),
                Q.length(d));
        t.step(
                "(Av + 2At)/s",
                "Av/s + 2 At/s  (9.5.4.3)",
                "{} + 2 × {}",
                Q.areaPerLength(r.transverseRequired()),
                Q.areaPerLength(av),
                Q.areaPerLength(at));
        t.step(
                "(Av + 2At)/s,min",
                "max(" + k.transverseMinRoot().shown() + " √f'c, " + (code.inchPound() ? "50" : "0.35")
                        + ") bw / fyt  (Table 9.6.4.2)",
                "max(" + k.transverseMinRoot().shown() + " × √{}, {}) × {} / {}",
                Q.areaPerLength(transverseMin),
                Q.stress(m.fc()),
                Q.stress(k.transverseMinFlat()),
                Q.length(bw),
                Q.stress(fyt));
        t.step(
                "s,max",
                "min(ph / 8, " + (code.inchPound() ? "12 in" : "300 mm") + ")  (9.7.6.3.3)",
                "min({} / 8, {})",
                Q.length(sMax),
                Q.length(hp.ph()),
                Q.length(k.spacingCap()));
        t.step(
                "Al",
                "(At/s) ph (fyt / fy) cot² θ  (22.7.6.1)",
                "{} × {} × ({} / {}) × 1",
                Q.area(al),
                Q.areaPerLength(at),
                Q.length(hp.ph()),
                Q.stress(fyt),
                Q.stress(fy));
        String floor = code.inchPound() ? "25" : "0.175";
        t.step(
                "Al,min",
                k.longitudinalMinRoot().shown() + " √f'c Acp / fy − max(At/s, " + floor
                        + " bw / fyt) ph fyt / fy  (9.6.4.3)",
                k.longitudinalMinRoot().shown() + " × √{} × {} / {} − max({}, {} × {} / {}) × {} × {} / {}",
                Q.area(alMinRaw),
                Q.stress(m.fc()),
                Q.area(o.acp()),
                Q.stress(fy),
                Q.areaPerLength(at),
                Q.stress(k.atFloor()),
                Q.length(bw),
                Q.stress(fyt),
                Q.length(hp.ph()),
                Q.stress(fyt),
                Q.stress(fy));
        if (alMinRaw < 0) {
            t.note("Al,min is negative: no minimum applies.");
        }
        return r;
    }
}
