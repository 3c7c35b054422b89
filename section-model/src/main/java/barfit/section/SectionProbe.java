package barfit.section;

/**
 * The fast path for a search: answers "does this trial pass flexure, ductility and minimum steel?"
 * for one section frame and one set of bar groups, reusing its scratch space (no allocation per
 * call). It applies exactly the rules of {@link SectionChecks}; the search re-verifies its final
 * choices with {@link SectionChecks#run} anyway.
 */
public final class SectionProbe {
    private final FlexureSolver solver = new FlexureSolver();
    private final FlexureSolver scaled = new FlexureSolver();
    private final Materials materials;
    private final CodeEquations code;
    private final double beta1;
    private final double epsTy;

    private SectionShape shape;
    private Bending bending;
    private Span span;

    private double[] d = new double[8];
    private double[] area = new double[8];
    private double[] db = new double[8];
    private boolean[] tension = new boolean[8];
    private int n;

    private double phiMn;
    private double mn;
    private double epsT;
    private double tensionArea;
    private double tensionD;
    private int solves;

    public SectionProbe(Materials materials, CodeEquations code) {
        this.materials = materials;
        this.code = code;
        this.beta1 = CodeTables.beta1(materials.fc(), code);
        this.epsTy = materials.fy() / code.es();
    }

    /** Sets the concrete section and bending direction for the following trials. */
    public SectionProbe frame(SectionShape s, Bending b, Span sp) {
        this.shape = s;
        this.bending = b;
        this.span = sp;
        Flexure.setProfile(solver, s, b);
        solver.materials(materials.fc(), materials.fy(), code.es(), beta1);
        Flexure.setProfile(scaled, s, b);
        scaled.materials(materials.fc(), materials.fy(), code.es(), beta1);
        return this;
    }

    public SectionProbe clear() {
        n = 0;
        return this;
    }

    /** Adds a bar group at {@code fromFace} of its face; {@code onTensionFace} marks tension-face bars. */
    public SectionProbe add(double fromFace, boolean onTensionFace, double groupArea, double barDiameter) {
        if (n == d.length) {
            d = java.util.Arrays.copyOf(d, 2 * n);
            area = java.util.Arrays.copyOf(area, 2 * n);
            db = java.util.Arrays.copyOf(db, 2 * n);
            tension = java.util.Arrays.copyOf(tension, 2 * n);
        }
        d[n] = onTensionFace ? shape.height() - fromFace : fromFace;
        area[n] = groupArea;
        db[n] = barDiameter;
        tension[n] = onTensionFace;
        n++;
        return this;
    }

    public SectionProbe solve() {
        solver.clearBars();
        double dt = 0;
        tensionArea = 0;
        double moment = 0;
        for (int i = 0; i < n; i++) {
            solver.bar(d[i], area[i], db[i]);
            dt = Math.max(dt, d[i]);
            if (tension[i]) {
                tensionArea += area[i];
                moment += area[i] * d[i];
            }
        }
        solver.solve();
        solves++;
        double c = solver.c();
        epsT = CodeTables.EPS_CU * (dt - c) / c;
        mn = solver.mn();
        phiMn = CodeTables.phiFlexure(epsT, epsTy) * mn;
        tensionD = tensionArea > 0 ? moment / tensionArea : dt;
        return this;
    }

    public double phiMn() {
        return phiMn;
    }

    public double epsT() {
        return epsT;
    }

    public double tensionArea() {
        return tensionArea;
    }

    /** Effective depth to the centroid of the tension-face bars. */
    public double d() {
        return tensionD;
    }

    /** How many flexure solutions this probe has computed (for the search statistics). */
    public int solves() {
        return solves;
    }

    /** 9.5.1.1: phi Mn >= |Mu|. */
    public boolean strengthOk(double mu) {
        return phiMn >= Math.abs(mu) * (1 - 1e-9);
    }

    /**
     * A necessary condition for 9.5.1.1 that, unlike phi Mn, grows steadily with tension steel: phi
     * never exceeds 0.90 (Table 21.2.2), so phi Mn >= Mu needs 0.90 Mn >= Mu.
     */
    public boolean strengthPossible(double mu) {
        return 0.90 * mn >= Math.abs(mu) * (1 - 1e-9);
    }

    /** 9.3.3.1: eps_t >= 0.004. */
    public boolean ductilityOk() {
        return epsT >= CodeTables.EPS_T_MIN_BEAM * (1 - 1e-9);
    }

    /** 9.6.1.2 with the 9.6.1.3 alternative, as {@link SectionChecks} applies them. */
    public boolean minSteelOk(double mu) {
        double asMin = SectionChecks.asMin(shape, bending, span, materials, code, tensionD);
        if (tensionArea >= asMin) {
            return true;
        }
        // As >= 4/3 As,req  <=>  three quarters of the tension steel still reach Mu. Below As,min the
        // section is far into the tension-controlled range, where phi Mn grows steadily with the steel,
        // so one solve answers what SectionChecks finds by bisection.
        return scaledPhiMn(0.75) >= Math.abs(mu) * (1 - 1e-9);
    }

    private double scaledPhiMn(double k) {
        scaled.clearBars();
        double dt = 0;
        for (int i = 0; i < n; i++) {
            double a = tension[i] ? area[i] * k : area[i];
            if (a > 0) {
                scaled.bar(d[i], a, db[i]);
            }
            dt = Math.max(dt, d[i]);
        }
        if (scaled.barCount() == 0) {
            return 0;
        }
        scaled.solve();
        double et = CodeTables.EPS_CU * (dt - scaled.c()) / scaled.c();
        return CodeTables.phiFlexure(et, epsTy) * scaled.mn();
    }
}
