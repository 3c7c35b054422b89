package barfit.section;

import barfit.section.trail.Q;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.List;

/** Nominal moment strength of a {@link BeamSection} (22.2) with phi (21.2.2), and its trail. */
public final class Flexure {
    private Flexure() {}

    public static FlexureResult analyse(BeamSection s, Bending bending) {
        return analyse(s, bending, Trail.off());
    }

    public static FlexureResult analyse(BeamSection s, Bending bending, Trail trail) {
        return analyse(s, bending, trail, new FlexureSolver());
    }

    /** As {@link #analyse(BeamSection, Bending, Trail)}, reusing a solver's scratch space. */
    public static FlexureResult analyse(BeamSection s, Bending bending, Trail trail, FlexureSolver solver) {
        Materials m = s.materials();
        CodeEquations code = s.code();
        double beta1 = CodeTables.beta1(m.fc(), code);
        double es = code.es();
        double epsTy = m.fy() / es;
        setProfile(solver, s.shape(), bending);
        solver.materials(m.fc(), m.fy(), es, beta1).clearBars();
        List<BarLayer> layers = s.layers();
        for (BarLayer l : layers) {
            solver.bar(s.depthFromCompression(l, bending), l.area(), l.bar().diameter());
        }
        solver.solve();

        Face tension = bending.tensionFace();
        double dt = 0;
        double tensionArea = 0;
        double tensionMoment = 0;
        List<LayerResult> out = new ArrayList<>();
        for (int i = 0; i < layers.size(); i++) {
            BarLayer l = layers.get(i);
            double di = solver.depth(i);
            double strain = -solver.strain(i);
            double stress = -solver.stress(i);
            out.add(new LayerResult(l, di, strain, stress, stress * l.area(), solver.displacedArea(i)));
            dt = Math.max(dt, di);
            if (l.face() == tension) {
                tensionArea += l.area();
                tensionMoment += l.area() * di;
            }
        }
        double d = tensionArea > 0 ? tensionMoment / tensionArea : 0;
        double c = solver.c();
        double epsT = CodeTables.EPS_CU * (dt - c) / c;
        double phi = CodeTables.phiFlexure(epsT, epsTy);
        FlexureResult r = new FlexureResult(
                bending,
                c,
                solver.a(),
                beta1,
                solver.concreteForce(),
                solver.concreteCentroid(),
                out,
                dt,
                d,
                tensionArea,
                epsT,
                epsTy,
                phi,
                solver.mn(),
                solver.residual());
        if (trail.isOn()) {
            explain(s, r, trail);
        }
        return r;
    }

    static void setProfile(FlexureSolver solver, SectionShape shape, Bending bending) {
        Flange f = shape.flange();
        if (f == null) {
            solver.rectangle(shape.width(), shape.height());
        } else if (bending == Bending.SAGGING) {
            solver.twoPart(f.width(), f.thickness(), shape.width(), shape.height());
        } else {
            solver.twoPart(shape.width(), shape.height() - f.thickness(), f.width(), shape.height());
        }
    }

    private static void explain(BeamSection s, FlexureResult r, Trail t) {
        Materials m = s.materials();
        CodeEquations code = s.code();
        t.heading(
                "Flexural strength, " + r.bending().word() + " ("
                        + r.bending().tensionFace().word() + " face in tension)",
                "22.2, 21.2.2");
        if (m.fc() <= code.beta1FcLow()) {
            t.value(
                    "β1",
                    Q.number(r.beta1()),
                    "f'c ≤ " + (code.inchPound() ? "4000 psi" : "28 MPa") + ", Table 22.2.2.4.3");
        } else if (m.fc() >= code.beta1FcHigh()) {
            t.value(
                    "β1",
                    Q.number(r.beta1()),
                    "f'c ≥ " + (code.inchPound() ? "8000 psi" : "55 MPa") + ", Table 22.2.2.4.3");
        } else {
            t.step(
                    "β1",
                    code.inchPound() ? "0.85 − 0.05 (f'c − 4000)/1000" : "0.85 − 0.05 (f'c − 28)/7",
                    code.inchPound() ? "0.85 − 0.05 ({} − 4000)/1000" : "0.85 − 0.05 ({} − 28)/7",
                    Q.number(r.beta1()),
                    Q.stress(m.fc()));
        }
        t.step("εty", "fy / Es", "{} / {}", Q.strain(r.epsTy()), Q.stress(m.fy()), Q.stress(code.es()));
        Flange f = s.shape().flange();
        if (f != null && r.bending() == Bending.SAGGING) {
            t.note("Compression zone: flange " + "b = bf over hf, then the web bw.");
        } else if (f != null) {
            t.note("Compression zone: web bw (the flange is on the tension side).");
        }
        t.note("Strain compatibility with εcu = 0.003 at the compression face; Whitney block 0.85 f'c over "
                + "a = β1 c (22.2.2.4.1); bars elastic–perfectly-plastic, each at its own strain; bars inside "
                + "the block displace block concrete. c solves Σ F = 0 exactly.");
        t.step("c", "root of 0.85 f'c Ac(β1 c) + Σ As,i fs,i(c) = 0", null, Q.length(r.c()));
        t.step("a", "β1 c", "{} × {}", Q.length(r.a()), Q.number(r.beta1()), Q.length(r.c()));
        for (LayerResult l : r.layers()) {
            BarLayer bl = l.layer();
            String name = bl.face().word() + " " + bl.count() + " " + bl.bar().label();
            t.step("d (" + name + ")", null, null, Q.length(l.d()));
            t.step(
                    "εs",
                    "0.003 (d − c)/c  (+ tension)",
                    "0.003 × ({} − {}) / {}",
                    Q.strain(l.strain()),
                    Q.length(l.d()),
                    Q.length(r.c()),
                    Q.length(r.c()));
            if (l.yielded(m.fy())) {
                t.step(
                        "fs",
                        l.stress() > 0 ? "fy (yielded in tension)" : "−fy (yielded in compression)",
                        null,
                        Q.stress(l.stress()));
            } else {
                t.step(
                        "fs",
                        "Es εs (elastic)",
                        "{} × {}",
                        Q.stress(l.stress()),
                        Q.stress(code.es()),
                        Q.strain(l.strain()));
            }
            t.step("T", "As fs", "{} × {}", Q.force(l.force()), Q.area(bl.area()), Q.stress(l.stress()));
            if (l.displaced() > 0) {
                t.value("A,displaced", Q.area(l.displaced()), "block concrete taken by these bars, deducted in Cc");
            }
        }
        t.step("Cc", "0.85 f'c (Ac − displaced)", null, Q.force(r.concreteForce()));
        t.step("ȳc", "depth of Cc below the compression face", null, Q.length(r.concreteCentroid()));
        t.step("Σ F", "Cc − Σ T (equilibrium)", null, Q.force(r.residual()));
        StringBuilder sub = new StringBuilder();
        Q[] args = new Q[r.layers().size() * 3];
        int k = 0;
        for (LayerResult l : r.layers()) {
            if (k > 0) {
                sub.append(" + ");
            }
            sub.append("{} × ({} − {})");
            args[k++] = Q.force(l.force());
            args[k++] = Q.length(l.d());
            args[k++] = Q.length(r.concreteCentroid());
        }
        t.step("Mn", "Σ T (d − ȳc)", sub.toString(), Q.moment(r.mn()), args);
        t.step(
                "εt",
                "0.003 (dt − c)/c",
                "0.003 × ({} − {}) / {}",
                Q.strain(r.epsT()),
                Q.length(r.dt()),
                Q.length(r.c()),
                Q.length(r.c()));
        String cls = r.strainClass();
        if (cls.equals("transition")) {
            t.step(
                    "φ",
                    "0.65 + 0.25 (εt − εty)/0.003 (transition)",
                    "0.65 + 0.25 × ({} − {}) / 0.003",
                    Q.number(r.phi()),
                    Q.strain(r.epsT()),
                    Q.strain(r.epsTy()));
        } else {
            t.step(
                    "φ",
                    cls.equals("tension-controlled")
                            ? "0.90 (εt ≥ εty + 0.003, tension-controlled)"
                            : "0.65 (εt ≤ εty, compression-controlled)",
                    null,
                    Q.number(r.phi()));
        }
        t.step("φMn", "φ × Mn", "{} × {}", Q.moment(r.phiMn()), Q.number(r.phi()), Q.moment(r.mn()));
    }
}
