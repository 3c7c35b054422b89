package barfit.section;

import barfit.catalogs.BarSize;
import barfit.section.trail.Q;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.List;

/**
 * How stirrups must hold the longitudinal bars, beyond shear strength: every leg's bend holds a bar of
 * each face (25.7.1.2, 25.7.1.3), and where compression steel is relied on, the ties of 9.7.6.4 (size of
 * 25.7.2.2, spacing of 9.7.6.4.3, arrangement of 25.7.2.3). An office may add its own stricter practice
 * (two legs for every so many bars in a layer); that rule is optional and named as practice, not code.
 *
 * <p>A stirrup of L legs is a closed hoop with crossties (or nested hoops): each leg ends in a bend or
 * hook round one bar at the top and one at the bottom, so it laterally supports L bars of each face.
 */
public final class StirrupRules {
    private StirrupRules() {}

    /** An office's stricter legs rule: two legs hold at most {@code barsPerTwoLegs} bars of a layer. */
    public record Practice(int barsPerTwoLegs) {
        public Practice {
            if (barsPerTwoLegs < 2) {
                throw new IllegalArgumentException("two legs hold at least two bars");
            }
        }

        public int legsFor(int barsInLayer) {
            return 2 * Math.max(1, (int) Math.ceil(barsInLayer / (double) barsPerTwoLegs));
        }
    }

    /** What the ties of 9.7.6.4 ask of the stirrups where compression steel is relied on. */
    public record TieDemand(boolean required, int minLegs, double maxSpacing, double minTieDiameter, String reason) {
        public static final TieDemand NONE = new TieDemand(false, 2, Double.POSITIVE_INFINITY, 0, null);

        /** Whether a stirrup bar of this diameter is large enough to be the tie (25.7.2.2). */
        public boolean sizeOk(double tieDiameter) {
            return !required || tieDiameter >= minTieDiameter * (1 - 1e-3);
        }
    }

    /** The bars whose bends hold the legs: the outer layer of each face (0 where a face has none). */
    public static int legsHeld(BeamSection s) {
        return Math.min(outerCount(s, Face.TOP), outerCount(s, Face.BOTTOM));
    }

    private static int outerCount(BeamSection s, Face face) {
        List<BarLayer> layers = s.layersOn(face);
        return layers.isEmpty() ? 0 : layers.get(0).count();
    }

    /**
     * Whether the compression-face bars are relied on as compression steel: some of them are in compression
     * and without them the section fails Mu ≤ φMn (when Mu is given) or εt ≥ 0.004 (9.3.3.1). Then 9.7.6.4
     * asks that they be enclosed by ties. Returns what they are relied on for, or null.
     */
    public static String compressionReliedOn(BeamSection s, Bending bending, Double mu) {
        BeamSection without = withoutCompressionBars(s, bending);
        if (without == null) {
            return null; // no compression bars, or no tension bars to judge by
        }
        // bars on the compression face that the neutral axis leaves in tension are not compression steel
        // (a shallow block in a flange): 9.7.6.4 has nothing to enclose
        boolean inCompression = false;
        for (LayerResult lr : Flexure.analyse(s, bending).layers()) {
            if (lr.layer().face() == bending.compressionFace() && lr.strain() < 0) {
                inCompression = true;
            }
        }
        if (!inCompression) {
            return null;
        }
        FlexureResult fr = Flexure.analyse(without, bending);
        if (standsWithout(fr, mu)) {
            return null;
        }
        boolean strength = mu != null && !CheckResult.within(Math.abs(mu), fr.phiMn());
        boolean ductile = CheckResult.reaches(fr.epsT(), CodeTables.EPS_T_MIN_BEAM);
        if (strength && !ductile) {
            return "strength and ductility";
        }
        if (strength) {
            return "strength";
        }
        return "ductility";
    }

    /**
     * The section {@link #compressionReliedOn} judges the compression bars by: {@code s} with its tension-face
     * bars alone. Null when {@code s} has no compression bars or no tension bars (nothing is relied on).
     */
    public static BeamSection withoutCompressionBars(BeamSection s, Bending bending) {
        List<BarLayer> without = new ArrayList<>();
        for (BarLayer l : s.layers()) {
            if (l.face() == bending.tensionFace()) {
                without.add(l);
            }
        }
        if (without.size() == s.layers().size() || without.isEmpty()) {
            return null;
        }
        return s.withLayers(without);
    }

    /**
     * Whether a section analysed without its compression bars ({@code withoutCompression}, the flexure of
     * {@link #withoutCompressionBars}) still carries Mu (when given) and reaches εt ≥ 0.004: then none of
     * them is relied on, and 9.7.6.4 asks for no ties.
     */
    public static boolean standsWithout(FlexureResult withoutCompression, Double mu) {
        boolean strength = mu != null && !CheckResult.within(Math.abs(mu), withoutCompression.phiMn());
        return !strength && CheckResult.reaches(withoutCompression.epsT(), CodeTables.EPS_T_MIN_BEAM);
    }

    /**
     * The ties 9.7.6.4 asks for the outer compression layer of {@code s}, or {@link TieDemand#NONE} when the
     * compression bars are not relied on. Legs: 25.7.2.3 (every corner and alternate bar held by a tie's
     * corner or a crosstie, and no bar farther than 150 mm clear from a held one; with evenly spaced bars,
     * every bar is held once the clear spacing exceeds 150 mm). Spacing: 9.7.6.4.3, the least of 16 db of
     * the longitudinal bars, 48 db of the tie and the least dimension of the member. Size: 25.7.2.2, No. 10
     * round bars up to No. 32 and No. 13 round No. 36 and larger.
     */
    public static TieDemand ties(BeamSection s, Bending bending, Double mu) {
        String reason = compressionReliedOn(s, bending, mu);
        if (reason == null) {
            return TieDemand.NONE;
        }
        BarLayer outer = s.layersOn(bending.compressionFace()).get(0);
        CodeEquations code = s.code();
        double bw = s.shape().width();
        double clear = BarSpacing.clear(bw, s.detailing(), outer.bar().diameter(), outer.count());
        int n = outer.count();
        int legs = n <= 2 || clear > unsupportedClearMax(code) * (1 + 1e-9) ? n : n / 2 + 1;
        double tie = s.detailing().stirrupBar().diameter();
        double least = Math.min(bw, s.shape().height());
        double maxSpacing = Math.min(16 * outer.bar().diameter(), Math.min(48 * tie, least));
        return new TieDemand(true, legs, maxSpacing, minTieDiameter(outer.bar(), code), reason);
    }

    /** 25.7.2.3(b): 150 mm (6 in) clear on each side along the tie from a laterally supported bar. */
    static double unsupportedClearMax(CodeEquations code) {
        return code.inchPound() ? 6 * 25.4 : 150;
    }

    /** 25.7.2.2: No. 10 (#3) ties for bars up to No. 32 (#10), No. 13 (#4) for No. 36 (#11) and larger. */
    static double minTieDiameter(BarSize longitudinal, CodeEquations code) {
        double largeFrom = code.inchPound() ? 1.41 * 25.4 : 35.8; // No. 36 / #11 nominal diameter
        boolean large = longitudinal.diameter() >= largeFrom * (1 - 1e-3);
        if (code.inchPound()) {
            return (large ? 0.5 : 0.375) * 25.4;
        }
        return large ? 12.7 : 9.5;
    }

    /**
     * The rules as checks, for a section whose stirrups are set: legs held by bars (25.7.1.2, 25.7.1.3), the
     * ties of 9.7.6.4 where compression steel is relied on, and the office practice when one is given.
     * {@code s} is the section as its strength is counted (which bars are relied on), {@code physical} the
     * same place with every bar that is there (the bars the legs can hold); {@code suffix} names a stirrup
     * zone ("" for a single section).
     */
    public static List<CheckResult> checks(
            BeamSection s,
            BeamSection physical,
            Bending bending,
            Double mu,
            Practice practice,
            String suffix,
            Trail t) {
        List<CheckResult> out = new ArrayList<>();
        Stirrups st = s.stirrups();
        if (st == null) {
            return out;
        }
        String zone = suffix.isEmpty() ? "" : " (" + suffix + " zone)";
        String id = suffix.isEmpty() ? "" : "." + suffix;
        int held = legsHeld(physical);
        out.add(CheckResult.atMost(
                "stirrup_legs_held" + id,
                "Stirrup legs held by bars at both faces" + zone,
                "25.7.1.2, 25.7.1.3",
                Q.count(st.legs()),
                Q.count(held),
                "each leg's bend holds a bar of the outer layer of each face"));
        if (practice != null) {
            int busiest = 0;
            for (BarLayer l : physical.layers()) {
                busiest = Math.max(busiest, l.count());
            }
            out.add(CheckResult.atLeast(
                    "stirrup_legs_bars" + id,
                    "Stirrup legs for the bars per layer" + zone,
                    "office practice",
                    Q.count(st.legs()),
                    Q.count(practice.legsFor(busiest)),
                    "two legs hold up to " + practice.barsPerTwoLegs() + " bars a layer"));
        }
        TieDemand td = ties(s, bending, mu);
        if (t.isOn()) {
            t.heading("Stirrups holding the bars" + zone, "25.7.1.2, 25.7.1.3, 9.7.6.4");
            t.value("legs held", Q.count(held), "bars in the outer layer of the face with fewer");
            if (td.required()) {
                t.note("Compression steel relied on for " + td.reason() + " (without it the section fails): 9.7.6.4 "
                        + "asks for ties round it.");
                BarLayer outer = s.layersOn(bending.compressionFace()).get(0);
                t.step(
                        "s,max ties",
                        "min(16 db, 48 dtie, least dimension)  (9.7.6.4.3)",
                        "min(16 × {}, 48 × {}, {})",
                        Q.length(td.maxSpacing()),
                        Q.length(outer.bar().diameter()),
                        Q.length(s.detailing().stirrupBar().diameter()),
                        Q.length(Math.min(s.shape().width(), s.shape().height())));
                t.value(
                        "bars held",
                        Q.count(td.minLegs()),
                        "every corner and alternate bar, none farther than "
                                + (s.code().inchPound() ? "6 in" : "150 mm") + " clear from a held bar (25.7.2.3)");
            } else {
                t.note("Compression steel not relied on: 9.7.6.4's ties are not required.");
            }
        }
        if (td.required()) {
            String why = "compression steel relied on for " + td.reason();
            out.add(CheckResult.atMost(
                    "compression_ties" + id,
                    "Tie spacing round compression steel" + zone,
                    "9.7.6.4.3",
                    Q.length(st.spacing()),
                    Q.length(td.maxSpacing()),
                    why));
            out.add(CheckResult.atLeast(
                    "compression_ties_legs" + id,
                    "Compression bars held by ties" + zone,
                    "25.7.2.3",
                    Q.count(Math.min(st.legs(), held)),
                    Q.count(td.minLegs()),
                    "every corner and alternate bar, none farther than "
                            + (s.code().inchPound() ? "6 in" : "150 mm") + " clear from a held bar"));
            out.add(CheckResult.atLeast(
                    "compression_ties_size" + id,
                    "Tie bar size round compression steel" + zone,
                    "25.7.2.2",
                    Q.length(s.detailing().stirrupBar().diameter()),
                    Q.length(td.minTieDiameter()),
                    s.code().inchPound()
                            ? "#3 up to #10 bars, #4 for #11 and larger"
                            : "No. 10 up to No. 32 bars, No. 13 for No. 36 and larger"));
        }
        return out;
    }
}
