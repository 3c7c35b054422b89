package barfit.section;

import barfit.section.trail.Q;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The torsion checks of one section (see {@link Torsion} for the numbers): the threshold (9.5.4.1), the
 * reduction of compatibility torsion (22.7.3.2, 22.7.3.3), the section size (22.7.7.1(a)), the closed
 * stirrups (22.7.6.1, 9.6.4.2, 9.7.6.3.3, 9.7.6.3.1, 25.7.1.6) and the longitudinal steel (22.7.6.1,
 * 9.6.4.3, 9.7.5.1, 9.7.5.2). Below the threshold only {@code torsion_threshold}, {@code torsion_section},
 * {@code torsion_transverse} and {@code torsion_longitudinal} are reported, passing, and said neglected.
 */
public final class TorsionChecks {
    private TorsionChecks() {}

    /**
     * The longitudinal steel counted for torsion (mm²), beyond what flexure takes (9.5.4.3): the tension-face
     * bars in excess of what flexure needs (0 without Mu, the need unknown), the compression-face bars where
     * flexure does not rely on them (9.7.6.4's sense), and the skin bars of both side faces.
     */
    public record LongitudinalSteel(
            double tensionExcess,
            double compressionFace,
            double skin,
            boolean flexureKnown,
            boolean compressionRelied) {
        public double total() {
            return tensionExcess + compressionFace + skin;
        }
    }

    /**
     * Every torsion check of {@code s} under {@code demand} (which must carry Tu). {@code fr} is the section's
     * flexure; {@code shear} its shear analysis, or null where no Vu is given (then Vu is taken as 0).
     */
    public static List<CheckResult> run(
            BeamSection s, Demand demand, Span span, FlexureResult fr, ShearResult shear, Trail t) {
        if (!demand.hasTorsion()) {
            throw new IllegalArgumentException("no torsion in the demand");
        }
        double d = fr.tensionSteelArea() > 0 ? fr.d() : fr.dt();
        ShearResult sh = shear != null ? shear : Shear.analyse(s, 0, d, fr.tensionSteelArea(), Trail.off());
        TorsionResult r = Torsion.analyse(s, demand.tu(), demand.compatibilityTorsion(), sh, t);
        List<CheckResult> out = new ArrayList<>();
        Q tu = Q.moment(r.tu());
        Q phiTth = Q.moment(r.phiTth());
        if (r.neglected()) {
            String why = "torsion neglected: Tu < φTth (9.5.4.1)";
            out.add(CheckResult.atMost(
                    "torsion_threshold",
                    "Torsion below the threshold (Tu < φTth), neglected",
                    "9.5.4.1, 22.7.4.1",
                    tu,
                    phiTth,
                    why));
            out.add(neglected("torsion_section", "Section size for shear and torsion", "22.7.7.1", tu, phiTth, why));
            out.add(neglected("torsion_transverse", "Closed stirrups for torsion", "22.7.6.1", tu, phiTth, why));
            out.add(neglected("torsion_longitudinal", "Longitudinal steel for torsion", "22.7.6.1", tu, phiTth, why));
            return out;
        }
        if (shear == null && t.isOn()) {
            t.note("No Vu given: the combined checks take Vu = 0, with Vc of Table 22.5.5.1 row " + sh.vcRow() + ".");
        }
        out.add(CheckResult.rule(
                "torsion_threshold",
                "Torsion at or above the threshold (Tu ≥ φTth), designed for",
                "22.7.1.1, 22.7.4.1",
                true,
                tu,
                phiTth,
                ">=",
                r.outline().flangesCounted()
                        ? "Acp and pcp with the flange overhang of 9.2.4.4"
                        : "Acp and pcp of the web" + (s.shape().flanged() ? " alone (9.2.4.4(b))" : "")));
        if (r.compatibility()) {
            out.add(CheckResult.rule(
                    "torsion_compatibility",
                    r.reduced() ? "Compatibility torsion reduced to φTcr" : "Compatibility torsion within φTcr",
                    "22.7.3.2, 22.7.3.3",
                    true,
                    tu,
                    Q.moment(r.phiTcr()),
                    r.reduced() ? ">=" : "<=",
                    r.reduced()
                            ? "Tu reduced to φTcr for this beam (22.7.3.2): design the adjoining members for the "
                                    + "moments and shears redistributed to them, in equilibrium with the reduced "
                                    + "torsion (22.7.3.3)"
                            : "Tu ≤ φTcr: designed for Tu as given"));
        }
        out.add(sectionSize(s, r, shear == null));
        transverse(s, r, sh, out);
        longitudinal(s, demand, span, d, r, out, t);
        return out;
    }

    /**
     * The torsion checks that the stirrups decide, for the searches: the section size (22.7.7.1(a), through
     * Vc), the closed stirrups (22.7.6.1, 9.6.4.2, 9.7.6.3.3, 9.7.6.3.1) and the size their spacing asks of
     * the corner and skin bars (9.7.5.2), each as {@link #run} reports it. Every one only gets easier as the
     * stirrups close up or gain legs. Empty when the torsion is neglected. {@code d} and {@code tensionArea}
     * are the section's as its flexure finds them; a demand without Vu takes Vu as 0.
     */
    public static List<CheckResult> stirrupChecks(BeamSection s, Demand demand, double d, double tensionArea) {
        if (!demand.hasTorsion()) {
            throw new IllegalArgumentException("no torsion in the demand");
        }
        double vu = demand.vu() == null ? 0 : Math.abs(demand.vu());
        ShearResult sh = Shear.analyse(s, vu, d, tensionArea, Trail.off());
        TorsionResult r = Torsion.analyse(s, demand.tu(), demand.compatibilityTorsion(), sh, Trail.off());
        List<CheckResult> out = new ArrayList<>();
        if (r.neglected()) {
            return out;
        }
        out.add(sectionSize(s, r, demand.vu() == null));
        transverse(s, r, sh, out);
        out.add(barSize(s));
        return out;
    }

    /** Whether every check of {@link #stirrupChecks} passes. */
    public static boolean stirrupsPass(BeamSection s, Demand demand, double d, double tensionArea) {
        return stirrupsPass(s, demand, d, tensionArea, true);
    }

    /**
     * Whether the checks of {@link #stirrupChecks} pass, decided on the same numbers and comparisons without
     * wording them (the searches ask this many times); {@code withSectionSize} false leaves out
     * {@code torsion_section}, for a bound over sections whose d and As are not known yet.
     */
    public static boolean stirrupsPass(
            BeamSection s, Demand demand, double d, double tensionArea, boolean withSectionSize) {
        if (!demand.hasTorsion()) {
            throw new IllegalArgumentException("no torsion in the demand");
        }
        double vu = demand.vu() == null ? 0 : Math.abs(demand.vu());
        ShearResult sh = Shear.analyse(s, vu, d, tensionArea, Trail.off());
        TorsionResult r = Torsion.analyse(s, demand.tu(), demand.compatibilityTorsion(), sh, Trail.off());
        if (r.neglected()) {
            return true;
        }
        if (withSectionSize && !CheckResult.within(r.sectionStress(), r.sectionLimit())) {
            return false;
        }
        Stirrups st = s.stirrups();
        if (st == null) {
            return false;
        }
        double provided = st.area() / st.spacing();
        double perLeg = st.bar().area() / st.spacing();
        boolean transverse = outerLegGoverns(st, r)
                ? CheckResult.within(r.atPerS(), perLeg)
                : CheckResult.within(r.transverseRequired(), provided);
        return transverse
                && CheckResult.reaches(provided, r.transverseMin())
                && CheckResult.within(st.spacing(), r.sMax())
                && CheckResult.reaches(smallestTorsionBar(s), leastBarDiameter(s));
    }

    /**
     * With more than two legs the outer hoop's leg, not all the legs together, decides the transverse check
     * when At/s takes a larger share of one leg than (Av + 2At)/s takes of all of them.
     */
    private static boolean outerLegGoverns(Stirrups st, TorsionResult r) {
        double allLegs = r.transverseRequired() / (st.area() / st.spacing());
        double outerLeg = r.atPerS() / (st.bar().area() / st.spacing());
        return st.legs() > 2 && outerLeg > allLegs;
    }

    private static CheckResult sectionSize(BeamSection s, TorsionResult r, boolean noVu) {
        return CheckResult.atMost(
                "torsion_section",
                "Section size for shear and torsion",
                "22.7.7.1(a)",
                Q.stress(r.sectionStress()),
                Q.stress(r.sectionLimit()),
                "√((Vu/(bw d))² + (Tu ph/(1.7 Aoh²))²) ≤ φ (Vc/(bw d) + "
                        + Torsion.of(s.code()).sectionLimit().shown() + " √f'c)"
                        + (noVu ? "; no Vu given, taken as 0" : ""));
    }

    private static CheckResult neglected(String id, String title, String clause, Q tu, Q phiTth, String why) {
        return CheckResult.rule(id, title + " (neglected)", clause, true, tu, phiTth, "<=", why);
    }

    private static void transverse(BeamSection s, TorsionResult r, ShearResult sh, List<CheckResult> out) {
        Stirrups st = s.stirrups();
        CodeEquations code = s.code();
        double ext =
                StirrupHooks.extension135(st != null ? st.bar() : s.detailing().stirrupBar(), code);
        String vcFrom = "Vc of Table 22.5.5.1 row " + sh.vcRow();
        if (st == null) {
            out.add(CheckResult.rule(
                    "torsion_transverse",
                    "Closed stirrups for shear and torsion (Av + 2At)/s",
                    "22.7.6.1, 9.5.4.3",
                    false,
                    Q.areaPerLength(r.transverseRequired()),
                    Q.areaPerLength(0),
                    "<=",
                    "give closed stirrups: {bar, legs, spacing}"));
            out.add(CheckResult.rule(
                    "torsion_closed_stirrups",
                    "Closed hoops with 135° hooks for torsion",
                    "9.7.6.3.1, 25.7.1.6",
                    false,
                    Q.length(0),
                    Q.length(ext),
                    ">=",
                    "no stirrups given"));
            return;
        }
        double provided = st.area() / st.spacing();
        double perLeg = st.bar().area() / st.spacing();
        double allLegs = r.transverseRequired() / provided;
        double outerLeg = r.atPerS() / perLeg;
        String shares = "(Av + 2At)/s takes " + fraction(allLegs) + " of the stirrups, At/s "
                + fraction(outerLeg) + " of one leg of the outer hoop; " + vcFrom
                + (st.legs() > 2 ? "; crossties and inner legs count for shear only" : "");
        if (outerLegGoverns(st, r)) {
            out.add(CheckResult.atMost(
                    "torsion_transverse",
                    "Outer hoop leg for torsion At/s",
                    "22.7.6.1",
                    Q.areaPerLength(r.atPerS()),
                    Q.areaPerLength(perLeg),
                    shares));
        } else {
            out.add(CheckResult.atMost(
                    "torsion_transverse",
                    "Closed stirrups for shear and torsion (Av + 2At)/s",
                    "22.7.6.1, 9.5.4.3",
                    Q.areaPerLength(r.transverseRequired()),
                    Q.areaPerLength(provided),
                    shares));
        }
        out.add(CheckResult.atLeast(
                "torsion_transverse_min",
                "Minimum stirrups for torsion (Av + 2At)/s",
                "9.6.4.2",
                Q.areaPerLength(provided),
                Q.areaPerLength(r.transverseMin()),
                null));
        out.add(CheckResult.atMost(
                "torsion_spacing",
                "Stirrup spacing for torsion",
                "9.7.6.3.3",
                Q.length(st.spacing()),
                Q.length(r.sMax()),
                null));
        out.add(CheckResult.rule(
                "torsion_closed_stirrups",
                "Closed hoops with 135° hooks for torsion",
                "9.7.6.3.1, 25.7.1.6",
                true,
                Q.length(ext),
                Q.length(ext),
                ">=",
                "torsion is not neglected: the stirrups must be closed hoops, each end a 135° hook round a "
                        + "longitudinal bar with " + SectionChecks.length(ext, code)
                        + " extension (Table 25.3.2), as barfit details them"));
    }

    private static void longitudinal(
            BeamSection s, Demand demand, Span span, double d, TorsionResult r, List<CheckResult> out, Trail t) {
        Bending bending = demand.bending();
        CodeEquations code = s.code();
        Torsion.Coefficients k = Torsion.of(code);
        LongitudinalSteel ls = longitudinalSteel(s, bending, demand.mu(), span, d, t);
        out.add(CheckResult.atMost(
                "torsion_longitudinal",
                "Longitudinal steel for torsion Al",
                "22.7.6.1, 9.6.4.3, 9.5.4.3",
                Q.area(r.alRequired()),
                Q.area(ls.total()),
                counted(ls, s.skin() != null, r.alMin() > r.al())));
        List<BarLayer> top = s.layersOn(Face.TOP);
        List<BarLayer> bottom = s.layersOn(Face.BOTTOM);
        int corners = Math.min(
                top.isEmpty() ? 0 : top.get(0).count(),
                bottom.isEmpty() ? 0 : bottom.get(0).count());
        out.add(CheckResult.atLeast(
                "torsion_corner_bars",
                "A longitudinal bar in each corner of the hoop",
                "9.7.5.1",
                Q.count(corners),
                Q.count(2),
                "the outer layer of the face with fewer bars"));
        double largest = largestBarSpacing(s, bending);
        out.add(CheckResult.atMost(
                "torsion_bar_spacing",
                "Longitudinal bar spacing round the hoop",
                "9.7.5.1",
                Q.length(largest),
                Q.length(k.barSpacingMax()),
                "across the outer layers and up the side faces (corner and skin bars)"));
        double spacing = s.stirrups() != null ? s.stirrups().spacing() : 0;
        double least = leastBarDiameter(s);
        if (t.isOn()) {
            t.heading("Longitudinal bars for torsion", "9.7.5.1, 9.7.5.2");
            t.value("s,max bars", Q.length(largest), "largest centre spacing round the hoop");
            t.step(
                    "db,min",
                    "max(0.042 s, " + (code.inchPound() ? "3/8 in" : "No. 10") + ")  (9.7.5.2)",
                    "max(0.042 × {}, {})",
                    Q.length(least),
                    Q.length(spacing),
                    Q.length(k.minBarDiameter()));
        }
        out.add(barSize(s));
    }

    /** 9.7.5.2: db ≥ max(0.042 s, No. 10 or 3/8 in), s the stirrup spacing. */
    private static double leastBarDiameter(BeamSection s) {
        double spacing = s.stirrups() != null ? s.stirrups().spacing() : 0;
        return Math.max(0.042 * spacing, Torsion.of(s.code()).minBarDiameter());
    }

    private static CheckResult barSize(BeamSection s) {
        return CheckResult.atLeast(
                "torsion_bar_size",
                "Longitudinal bar size for torsion",
                "9.7.5.2",
                Q.length(smallestTorsionBar(s)),
                Q.length(leastBarDiameter(s)),
                "the smallest corner or skin bar");
    }

    private static String counted(LongitudinalSteel ls, boolean skin, boolean minimumGoverns) {
        List<String> parts = new ArrayList<>();
        parts.add(
                ls.flexureKnown()
                        ? "the tension-face bars beyond flexure's need (φMn = Mu, 9.6.1)"
                        : "no tension-face bars (no Mu given, flexure's need unknown)");
        parts.add(
                ls.compressionRelied()
                        ? "no compression-face bars (relied on in flexure)"
                        : "the compression-face bars");
        if (skin) {
            parts.add("the skin bars");
        }
        return (minimumGoverns ? "Al,min (9.6.4.3) governs; " : "")
                + "Al is provided in addition to the flexural steel; counted: " + String.join(", ", parts)
                + "; the compression-zone reduction of 22.7.6.2.2 not taken";
    }

    /** The longitudinal steel counted for torsion (see {@link LongitudinalSteel}), with its trail. */
    public static LongitudinalSteel longitudinalSteel(
            BeamSection s, Bending bending, Double mu, Span span, double d, Trail t) {
        Face tf = bending.tensionFace();
        double tension = 0;
        double compression = 0;
        List<BarLayer> tensionLayers = new ArrayList<>();
        for (BarLayer l : s.layers()) {
            if (l.face() == tf) {
                tension += l.area();
                tensionLayers.add(l);
            } else {
                compression += l.area();
            }
        }
        boolean relied = compression > 0 && StirrupRules.compressionReliedOn(s, bending, mu) != null;
        double excess = 0;
        double need = Double.NaN;
        if (mu != null && tension > 0) {
            // where the compression bars go to torsion, flexure's need is found without them
            BeamSection forFlexure = relied ? s : s.withLayers(tensionLayers);
            double req = SectionChecks.requiredTensionArea(forFlexure, bending, Math.abs(mu));
            double asMin = SectionChecks.asMin(s.shape(), bending, span, s.materials(), s.code(), d);
            need = Math.max(req, Math.min(asMin, 4.0 / 3.0 * req));
            excess = Math.max(0, tension - need);
        }
        double skin = 0;
        int perFace = 0;
        if (s.skin() != null) {
            perFace = SkinBars.perFace(s.shape().height(), s.skin().spacing());
            skin = 2 * perFace * s.skin().bar().area();
        }
        LongitudinalSteel ls = new LongitudinalSteel(excess, relied ? 0 : compression, skin, mu != null, relied);
        if (t.isOn()) {
            t.heading("Longitudinal steel for torsion", "9.5.4.3, 22.7.6.1");
            t.note("Al is provided in addition to the flexural steel (9.5.4.3). Counted for it: the tension-face bars "
                    + "beyond what flexure needs, the compression-face bars unless flexure relies on them, the skin "
                    + "bars. The reduction of 22.7.6.2.2 in the flexural compression zone is not taken.");
            t.value("As", Q.area(tension), bending.tensionFace().word() + " face, in tension");
            if (!Double.isNaN(need)) {
                t.value("As,need", Q.area(need), "max(As for φMn = Mu, min(As,min, 4/3 As,req))  (9.6.1)");
                t.step(
                        "As beyond flexure",
                        "max(0, As − As,need)",
                        "max(0, {} − {})",
                        Q.area(excess),
                        Q.area(tension),
                        Q.area(need));
            } else {
                t.note("No Mu given: flexure's need for the tension bars is not known, so none of them is counted.");
            }
            t.value(
                    "A's",
                    Q.area(compression),
                    relied
                            ? "compression face, relied on in flexure: not counted"
                            : "compression face, not relied on in flexure: counted");
            if (s.skin() != null) {
                t.step(
                        "A,skin",
                        "2 faces × n × Ab",
                        "2 × {} × {}",
                        Q.area(skin),
                        Q.count(perFace),
                        Q.area(s.skin().bar().area()));
            }
            t.value("Al,provided", Q.area(ls.total()), "counted for torsion");
        }
        return ls;
    }

    /**
     * 9.7.5.1: the largest centre-to-centre spacing of the longitudinal bars round the hoop: across the outer
     * layer of each face, and up each side face from the tension corner bar through the skin bars to the
     * compression corner bar. A face without bars leaves its whole width (or its side) open.
     */
    static double largestBarSpacing(BeamSection s, Bending bending) {
        double bw = s.shape().width();
        double h = s.shape().height();
        Detailing det = s.detailing();
        double largest = 0;
        for (Face face : Face.values()) {
            List<BarLayer> layers = s.layersOn(face);
            largest = Math.max(
                    largest,
                    layers.isEmpty()
                            ? bw
                            : BarSpacing.centreSpacing(
                                    bw,
                                    det,
                                    layers.get(0).bar().diameter(),
                                    layers.get(0).count()));
        }
        List<BarLayer> tension = s.layersOn(bending.tensionFace());
        List<BarLayer> compression = s.layersOn(bending.compressionFace());
        double from = tension.isEmpty() ? 0 : tension.get(0).fromFace();
        double to = compression.isEmpty() ? h : h - compression.get(0).fromFace();
        double y = from;
        if (s.skin() != null) {
            int n = SkinBars.perFace(h, s.skin().spacing());
            for (int k = 1; k <= n; k++) {
                double next = from + k * s.skin().spacing();
                if (next >= to) {
                    break;
                }
                largest = Math.max(largest, next - y);
                y = next;
            }
        }
        return Math.max(largest, to - y);
    }

    /** The smallest bar among the corner bars (the outer layer of each face) and the skin bars. */
    static double smallestTorsionBar(BeamSection s) {
        double smallest = Double.POSITIVE_INFINITY;
        for (Face face : Face.values()) {
            List<BarLayer> layers = s.layersOn(face);
            if (!layers.isEmpty()) {
                smallest = Math.min(smallest, layers.get(0).bar().diameter());
            }
        }
        if (s.skin() != null) {
            smallest = Math.min(smallest, s.skin().bar().diameter());
        }
        return Double.isInfinite(smallest) ? 0 : smallest;
    }

    /** A share, unit-free, for the notes. */
    private static String fraction(double v) {
        return String.format(Locale.ROOT, "%.2f", v);
    }
}
