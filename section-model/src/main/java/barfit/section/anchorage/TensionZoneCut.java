package barfit.section.anchorage;

import barfit.catalogs.BarSize;
import barfit.section.CodeEquations;
import barfit.section.trail.Q;
import barfit.section.trail.Trail;

/**
 * 9.7.3.5: flexural tension bars are not cut off in a tension zone unless (a) Vu ≤ (2/3) φVn at the cut-off
 * point; or (b) for No. 36 (#11) and smaller bars, the continuing bars give twice the area flexure needs at
 * the cut-off point and Vu ≤ (3/4) φVn; or (c) stirrups or hoops beyond those shear and torsion need run
 * along each cut bar over (3/4) d from its end, at least 0.41 bw s / fyt (60 bw s / fyt in inch-pound),
 * spaced at no more than d / (8 βb), βb being the cut bars' share of the tension steel at the section.
 */
public final class TensionZoneCut {
    /** What allows a cut, or that nothing does. */
    public enum Basis {
        /** the cut-off point is not in a tension zone: 9.7.3.5 does not apply */
        NOT_IN_TENSION_ZONE("9.7.3.5"),
        SHEAR("9.7.3.5(a)"),
        DOUBLE_AREA("9.7.3.5(b)"),
        EXTRA_STIRRUPS("9.7.3.5(c)"),
        NOT_ALLOWED("9.7.3.5");

        private final String clause;

        Basis(String clause) {
            this.clause = clause;
        }

        public String clause() {
            return clause;
        }
    }

    /** Stirrup area beyond what shear and torsion need, per set, its spacing and fyt (mm², mm, MPa). */
    public record ExtraStirrups(double area, double spacing, double fyt) {}

    /**
     * The section at the cut-off point.
     *
     * @param inTensionZone the cut bars' face is in tension there under the governing envelope
     * @param vu            factored shear at the cut-off point, N
     * @param phiVn         design shear strength there, N
     * @param asContinuing  area of the bars that continue, mm²
     * @param asRequired    area flexure needs there, mm²
     * @param asCut         area of the bars cut off there, mm²
     * @param bw            web width, mm
     * @param d             effective depth, mm
     * @param extra         stirrups beyond shear and torsion along the cut bars, or null
     */
    public record AtCut(
            BarSize bar,
            boolean inTensionZone,
            double vu,
            double phiVn,
            double asContinuing,
            double asRequired,
            double asCut,
            double bw,
            double d,
            ExtraStirrups extra) {}

    /**
     * The verdict: {@code basis} the first condition that holds (in the order of the clause), with the
     * numbers each condition compares.
     *
     * @param extraArea  the least extra stirrup area (c) asks for at the given spacing, mm² (NaN without)
     * @param maxSpacing d / (8 βb), mm
     */
    public record Verdict(
            Basis basis,
            double vuOverPhiVn,
            double areaRatio,
            double betaB,
            double extraArea,
            double maxSpacing,
            double stretch) {
        public boolean allowed() {
            return basis != Basis.NOT_ALLOWED;
        }
    }

    private TensionZoneCut() {}

    public static Verdict check(AtCut c, CodeEquations code, Trail t) {
        double ratioV = c.phiVn() > 0 ? c.vu() / c.phiVn() : Double.POSITIVE_INFINITY;
        double ratioA = c.asRequired() > 0 ? c.asContinuing() / c.asRequired() : Double.POSITIVE_INFINITY;
        double betaB = c.asCut() / (c.asCut() + c.asContinuing());
        double maxSpacing = c.d() / (8 * betaB);
        double stretch = 0.75 * c.d();
        ExtraStirrups ex = c.extra();
        double extraArea =
                ex == null ? Double.NaN : code.anchorage().extraStirrup().si() * c.bw() * ex.spacing() / ex.fyt();
        Basis basis;
        if (!c.inTensionZone()) {
            basis = Basis.NOT_IN_TENSION_ZONE;
        } else if (ratioV <= 2.0 / 3.0 + 1e-12) {
            basis = Basis.SHEAR;
        } else if (BarClasses.upToNo36(c.bar()) && ratioA >= 2.0 * (1 - 1e-12) && ratioV <= 0.75 + 1e-12) {
            basis = Basis.DOUBLE_AREA;
        } else if (ex != null && ex.area() >= extraArea * (1 - 1e-12) && ex.spacing() <= maxSpacing * (1 + 1e-12)) {
            basis = Basis.EXTRA_STIRRUPS;
        } else {
            basis = Basis.NOT_ALLOWED;
        }
        if (t.isOn()) {
            t.heading("Cut-off of " + c.bar().label() + " in a tension zone", "9.7.3.5");
            if (!c.inTensionZone()) {
                t.note("The cut-off point is not in a tension zone.");
            } else {
                t.step(
                        "Vu / φVn",
                        "≤ 2/3 (a), ≤ 3/4 (b)",
                        "{} / {}",
                        Q.number(ratioV),
                        Q.force(c.vu()),
                        Q.force(c.phiVn()));
                t.step(
                        "As,cont / As,req",
                        "≥ 2 (b)",
                        "{} / {}",
                        Q.number(ratioA),
                        Q.area(c.asContinuing()),
                        Q.area(c.asRequired()));
                t.step(
                        "βb",
                        "As,cut / (As,cut + As,cont)",
                        "{} / ({} + {})",
                        Q.number(betaB),
                        Q.area(c.asCut()),
                        Q.area(c.asCut()),
                        Q.area(c.asContinuing()));
                if (ex != null) {
                    String k = code.anchorage().extraStirrup().shown();
                    t.step(
                            "Av,extra ≥",
                            k + " bw s / fyt",
                            k + " × {} × {} / {}",
                            Q.area(extraArea),
                            Q.length(c.bw()),
                            Q.length(ex.spacing()),
                            Q.stress(ex.fyt()));
                    t.step(
                            "s ≤",
                            "d / (8 βb)",
                            "{} / (8 × {})",
                            Q.length(maxSpacing),
                            Q.length(c.d()),
                            Q.number(betaB));
                }
                t.note(
                        basis == Basis.NOT_ALLOWED
                                ? "None of 9.7.3.5 (a), (b), (c) holds: the bars may not stop here."
                                : "The cut relies on " + basis.clause() + ".");
            }
        }
        return new Verdict(basis, ratioV, ratioA, betaB, extraArea, maxSpacing, stretch);
    }
}
