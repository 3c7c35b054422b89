package barfit.section;

import barfit.catalogs.BarSize;
import barfit.section.trail.Q;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.List;

/**
 * Every check of one section under one demand: strength, ductility, minimum steel, bar spacing,
 * crack control, skin reinforcement, cover, flange width, shear, torsion (when the demand has Tu) and
 * minimum depth. Each result names its ACI 318-19 clause; with a recording trail, each also writes its
 * working.
 */
public final class SectionChecks {
    private SectionChecks() {}

    /**
     * Runs all checks that apply. {@code span} may be null (then the depth limit is skipped). A flange
     * carries its own clear span (its effective width depends on it), which a given span must equal.
     */
    public static CheckReport run(BeamSection s, Demand demand, Span span, Trail trail) {
        return run(s, demand, span, trail, true);
    }

    /**
     * As {@link #run(BeamSection, Demand, Span, Trail)}; {@code withMinimumDepth} false leaves Table 9.3.1.1
     * to the span checks (a whole beam is checked for depth and deflection once, not per section).
     */
    public static CheckReport run(BeamSection s, Demand demand, Span span, Trail trail, boolean withMinimumDepth) {
        return run(s, demand, span, trail, withMinimumDepth, null);
    }

    /**
     * As above, with an office's stricter stirrup-legs rule checked too ({@code practice} null: the code's
     * rules only).
     */
    public static CheckReport run(
            BeamSection s,
            Demand demand,
            Span span,
            Trail trail,
            boolean withMinimumDepth,
            StirrupRules.Practice practice) {
        requireSameSpan(s, span);
        List<CheckResult> out = new ArrayList<>();
        Bending bending = demand.bending();
        FlexureResult fr = Flexure.analyse(s, bending, trail);
        flexure(s, demand, fr, out, trail);
        minimumSteel(s, demand, span, fr, out, trail);
        spacing(s, bending, out, trail);
        cover(s, out, trail);
        skin(s, out, trail);
        if (s.shape().flanged()) {
            flangeWidth(s, span, bending, out, trail);
        }
        ShearResult shear = null;
        if (demand.vu() != null) {
            double d = fr.tensionSteelArea() > 0 ? fr.d() : fr.dt();
            shear = Shear.analyse(s, Math.abs(demand.vu()), d, fr.tensionSteelArea(), trail);
            shearChecks(s, shear, out);
        }
        if (demand.hasTorsion()) {
            out.addAll(TorsionChecks.run(s, demand, span, fr, shear, trail));
        }
        out.addAll(StirrupRules.checks(s, s, bending, demand.mu(), practice, "", trail));
        if (withMinimumDepth && span != null && span.ends() != null) {
            minimumDepth(s, span, out, trail);
        } else if (withMinimumDepth && span != null && trail.isOn()) {
            trail.heading("Minimum depth", "Table 9.3.1.1");
            trail.note("Not checked: the span is given without its ends (simple, one-end-continuous, "
                    + "both-ends-continuous or cantilever), which Table 9.3.1.1 needs.");
        }
        return new CheckReport(s, demand, fr, shear, out, trail);
    }

    // ---- strength and ductility ----

    private static void flexure(BeamSection s, Demand demand, FlexureResult fr, List<CheckResult> out, Trail t) {
        if (demand.mu() != null) {
            double mu = Math.abs(demand.mu());
            out.add(CheckResult.atMost(
                    "flexure",
                    "Flexural strength φMn ≥ Mu",
                    "9.5.1.1, 22.2",
                    Q.moment(mu),
                    Q.moment(fr.phiMn()),
                    fr.bending().word() + ", φ = " + round3(fr.phi()) + " (" + fr.strainClass() + ")"));
        }
        out.add(CheckResult.atLeast(
                "ductility",
                "Net tensile strain εt ≥ 0.004",
                "9.3.3.1",
                Q.strain(fr.epsT()),
                Q.strain(CodeTables.EPS_T_MIN_BEAM),
                null));
    }

    private static void minimumSteel(
            BeamSection s, Demand demand, Span span, FlexureResult fr, List<CheckResult> out, Trail t) {
        Materials m = s.materials();
        CodeEquations code = s.code();
        double bw = minSteelWidth(s.shape(), fr.bending(), span);
        String bwNote = bw != s.shape().width()
                ? "statically determinate with the flange in tension: bw taken as min(bf, 2 bw)"
                : null;
        double d = fr.tensionSteelArea() > 0 ? fr.d() : fr.dt();
        double asMin = asMin(s.shape(), fr.bending(), span, m, code, d);
        double as = fr.tensionSteelArea();
        if (t.isOn()) {
            t.heading("Minimum flexural steel", "9.6.1.2, 9.6.1.3");
            if (bwNote != null) {
                t.note(bwNote + " (9.6.1.2).");
            }
            t.step(
                    "As,min",
                    "max(" + code.asMinRoot().shown() + " √f'c / fy, " + (code.inchPound() ? "200" : "1.4")
                            + " / fy) bw d",
                    "max(" + code.asMinRoot().shown() + " × √{} / {}, {} / {}) × {} × {}",
                    Q.area(asMin),
                    Q.stress(m.fc()),
                    Q.stress(m.fy()),
                    Q.stress(code.asMinFlat()),
                    Q.stress(m.fy()),
                    Q.length(bw),
                    Q.length(d));
            t.value("As", Q.area(as), "tension-face bars provided");
        }
        if (as >= asMin || demand.mu() == null) {
            out.add(CheckResult.atLeast(
                    "min_steel", "Minimum flexural steel As ≥ As,min", "9.6.1.2", Q.area(as), Q.area(asMin), bwNote));
            return;
        }
        // 9.6.1.3: As,min need not apply where As provided is at least 4/3 of the As required by analysis
        double asReq = requiredTensionArea(s, fr.bending(), Math.abs(demand.mu()));
        double alt = 4.0 / 3.0 * asReq;
        if (t.isOn()) {
            t.step("As,req", "tension steel for φMn = Mu (same bars scaled)", null, Q.area(asReq));
            t.step("4/3 As,req", "9.6.1.3 alternative", "4/3 × {}", Q.area(alt), Q.area(asReq));
        }
        if (as >= alt) {
            out.add(CheckResult.atLeast(
                    "min_steel",
                    "Minimum flexural steel As ≥ 4/3 As,req",
                    "9.6.1.3",
                    Q.area(as),
                    Q.area(alt),
                    "As < As,min = " + Math.round(asMin) + " mm², but 9.6.1.3 is met"));
        } else {
            out.add(CheckResult.atLeast(
                    "min_steel",
                    "Minimum flexural steel As ≥ As,min",
                    "9.6.1.2, 9.6.1.3",
                    Q.area(as),
                    Q.area(asMin),
                    "neither As,min nor 4/3 As,req (" + Math.round(alt) + " mm²) is met"));
        }
    }

    /** The web width 9.6.1.2 uses: min(bf, 2 bw) for a statically determinate beam with its flange in tension. */
    static double minSteelWidth(SectionShape shape, Bending bending, Span span) {
        Flange f = shape.flange();
        boolean flangeInTension = f != null && bending == Bending.HOGGING;
        if (flangeInTension
                && span != null
                && span.ends() != null
                && span.ends().determinate()) {
            return Math.min(f.width(), 2 * shape.width());
        }
        return shape.width();
    }

    /** As,min of 9.6.1.2: max(0.25 √f'c / fy, 1.4 / fy) bw d. */
    public static double asMin(
            SectionShape shape, Bending bending, Span span, Materials m, CodeEquations code, double d) {
        double bw = minSteelWidth(shape, bending, span);
        return Math.max(code.asMinRoot().si() * Math.sqrt(m.fc()) / m.fy(), code.asMinFlat() / m.fy()) * bw * d;
    }

    /**
     * The tension-face steel area needed for phi Mn = Mu with every other bar kept: all tension-face
     * layers are scaled by one factor, found by bisection. Infinity if no scale reaches Mu.
     */
    public static double requiredTensionArea(BeamSection s, Bending bending, double mu) {
        Face tf = bending.tensionFace();
        FlexureSolver solver = new FlexureSolver();
        double lo = 0;
        double hi = 1;
        while (phiMnScaled(s, bending, tf, hi, solver) < mu) {
            hi *= 2;
            if (hi > 64) {
                return Double.POSITIVE_INFINITY;
            }
        }
        for (int i = 0; i < 60; i++) {
            double mid = 0.5 * (lo + hi);
            if (phiMnScaled(s, bending, tf, mid, solver) >= mu) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        double base = 0;
        for (BarLayer l : s.layersOn(tf)) {
            base += l.area();
        }
        return hi * base;
    }

    private static double phiMnScaled(BeamSection s, Bending bending, Face tf, double k, FlexureSolver solver) {
        Materials m = s.materials();
        double beta1 = CodeTables.beta1(m.fc(), s.code());
        Flexure.setProfile(solver, s.shape(), bending);
        solver.materials(m.fc(), m.fy(), s.code().es(), beta1).clearBars();
        double dt = 0;
        for (BarLayer l : s.layers()) {
            double d = s.depthFromCompression(l, bending);
            double scale = l.face() == tf ? k : 1;
            if (scale > 0) {
                solver.bar(d, l.area() * scale, l.bar().diameter());
            }
            dt = Math.max(dt, d);
        }
        if (solver.barCount() == 0) {
            return 0;
        }
        solver.solve();
        double epsT = CodeTables.EPS_CU * (dt - solver.c()) / solver.c();
        return CodeTables.phiFlexure(epsT, m.fy() / s.code().es()) * solver.mn();
    }

    // ---- spacing ----

    private static void spacing(BeamSection s, Bending bending, List<CheckResult> out, Trail t) {
        Detailing det = s.detailing();
        Materials m = s.materials();
        CodeEquations code = s.code();
        double bw = s.shape().width();
        if (t.isOn()) {
            t.heading("Bar spacing", "25.2.1, 25.2.2, 24.3.2");
            t.step(
                    "b,inner",
                    "bw − 2 (cover + ds)",
                    "{} − 2 × ({} + {})",
                    Q.length(BarSpacing.innerWidth(bw, det)),
                    Q.length(bw),
                    Q.length(det.cover()),
                    Q.length(det.stirrupBar().diameter()));
        }
        for (Face face : Face.values()) {
            List<BarLayer> layers = s.layersOn(face);
            for (int i = 0; i < layers.size(); i++) {
                BarLayer l = layers.get(i);
                double db = l.bar().diameter();
                double smin = BarSpacing.minClear(l.bar(), m, code);
                double clear = BarSpacing.clear(bw, det, db, l.count());
                String id = "spacing." + face.word() + "." + (i + 1);
                String where = face.word() + " layer " + (i + 1) + " (" + l.count() + " "
                        + l.bar().label() + ")";
                if (t.isOn()) {
                    if (l.count() > 1) {
                        t.step(
                                "s,clear " + where,
                                "(b,inner − n db) / (n − 1)",
                                "({} − {} × {}) / ({} − 1)",
                                Q.length(clear),
                                Q.length(BarSpacing.innerWidth(bw, det)),
                                Q.count(l.count()),
                                Q.length(db),
                                Q.count(l.count()));
                    }
                    t.step(
                            "s,min",
                            "max(" + (code.inchPound() ? "1 in" : "25 mm") + ", db, 4/3 dagg)",
                            "max({}, {}, 4/3 × {})",
                            Q.length(smin),
                            Q.length(code.minClearSpacing()),
                            Q.length(db),
                            Q.length(m.aggregate()));
                }
                if (l.count() == 1) {
                    out.add(CheckResult.atLeast(
                            id,
                            "Bar fits between stirrup legs, " + where,
                            "25.2.1",
                            Q.length(BarSpacing.innerWidth(bw, det)),
                            Q.length(db),
                            null));
                } else {
                    out.add(CheckResult.atLeast(
                            id, "Clear spacing in layer, " + where, "25.2.1", Q.length(clear), Q.length(smin), null));
                }
                if (i > 0) {
                    out.add(layerGap(layers.get(i - 1), l, face, i, code, t));
                }
            }
        }
        // crack control of the layer nearest the tension face
        List<BarLayer> tension = s.layersOn(bending.tensionFace());
        if (!tension.isEmpty()) {
            BarLayer l = tension.get(0);
            double cc = det.coverToMainBars();
            double fs = BarSpacing.serviceStress(m.fy());
            double limit = BarSpacing.crackSpacingLimit(m.fy(), cc, code);
            double sc = BarSpacing.centreSpacing(bw, det, l.bar().diameter(), l.count());
            if (t.isOn()) {
                t.step("fs", "2/3 fy  (24.3.2.1)", "2/3 × {}", Q.stress(fs), Q.stress(m.fy()));
                t.step(
                        "cc",
                        "cover + ds",
                        "{} + {}",
                        Q.length(cc),
                        Q.length(det.cover()),
                        Q.length(det.stirrupBar().diameter()));
                String a = code.inchPound() ? "15" : "380";
                String b = code.inchPound() ? "12" : "300";
                String ref = code.inchPound() ? "40000" : "280";
                t.step(
                        "s,max",
                        "min(" + a + " (" + ref + "/fs) − 2.5 cc, " + b + " (" + ref + "/fs))",
                        "min(" + a + " × (" + ref + " / {}) − 2.5 × {}, " + b + " × (" + ref + " / {}))",
                        Q.length(limit),
                        Q.stress(fs),
                        Q.length(cc),
                        Q.stress(fs));
                t.step("s", l.count() > 1 ? "(b,inner − db) / (n − 1)" : "bw (a single bar)", null, Q.length(sc));
            }
            out.add(CheckResult.atMost(
                    "crack_control",
                    "Crack control spacing, " + bending.tensionFace().word() + " layer 1",
                    "24.3.2",
                    Q.length(sc),
                    Q.length(limit),
                    null));
        }
    }

    /** 25.2.2: the clear distance between consecutive layers on one face. */
    private static CheckResult layerGap(BarLayer prev, BarLayer l, Face face, int i, CodeEquations code, Trail t) {
        double db = l.bar().diameter();
        double gap = l.fromFace() - prev.fromFace() - (db + prev.bar().diameter()) / 2;
        if (t.isOn()) {
            t.step(
                    "clear between " + face.word() + " layers " + i + "–" + (i + 1),
                    "Δy − (db1 + db2)/2",
                    "{} − {} − ({} + {}) / 2",
                    Q.length(gap),
                    Q.length(l.fromFace()),
                    Q.length(prev.fromFace()),
                    Q.length(db),
                    Q.length(prev.bar().diameter()));
        }
        return CheckResult.atLeast(
                "layer_gap." + face.word() + "." + i + "-" + (i + 1),
                "Clear distance between " + face.word() + " layers " + i + " and " + (i + 1),
                "25.2.2",
                Q.length(gap),
                Q.length(code.minLayerGap()),
                l.count() > prev.count()
                        ? "upper layer has more bars than the one below; they cannot all sit directly above"
                        : null);
    }

    /** The 25.2.2 checks alone, for every face with more than one layer. */
    public static List<CheckResult> layerGaps(BeamSection s) {
        List<CheckResult> out = new ArrayList<>();
        for (Face face : Face.values()) {
            List<BarLayer> layers = s.layersOn(face);
            for (int i = 1; i < layers.size(); i++) {
                out.add(layerGap(layers.get(i - 1), layers.get(i), face, i, s.code(), Trail.off()));
            }
        }
        return out;
    }

    private static void cover(BeamSection s, List<CheckResult> out, Trail t) {
        Detailing det = s.detailing();
        CodeEquations code = s.code();
        double required;
        double provided = det.cover();
        String note;
        switch (det.exposure()) {
            case GROUND -> {
                required = code.coverGround();
                note = "cast against and permanently in contact with ground";
            }
            case WEATHER -> {
                double largest = 0;
                for (BarLayer l : s.layers()) {
                    largest = Math.max(largest, l.bar().diameter());
                }
                // No. 19 (#6) and larger need the larger cover, measured to those bars
                boolean large = largest >= 19.0;
                if (large
                        && det.cover() + det.stirrupBar().diameter() - code.coverWeatherLarge()
                                < det.cover() - code.coverInterior()) {
                    required = code.coverWeatherLarge();
                    provided = det.cover() + det.stirrupBar().diameter();
                    note = "exposed to weather: cover to the No. 19 and larger main bars";
                } else {
                    required = code.coverInterior();
                    note = "exposed to weather: cover to the stirrups";
                }
            }
            default -> {
                required = code.coverInterior();
                note = "not exposed to weather or in contact with ground";
            }
        }
        if (t.isOn()) {
            t.heading("Cover", "20.5.1.3");
            t.value("cover", Q.length(provided), note);
            t.value("cover,min", Q.length(required), "Table 20.5.1.3.1");
        }
        out.add(CheckResult.atLeast(
                "cover", "Specified concrete cover", "Table 20.5.1.3.1", Q.length(provided), Q.length(required), note));
    }

    // the skin check's descriptions, made once: a search asks this check of thousands of frames
    private static final String SKIN_NOT_REQUIRED_SI = "Skin reinforcement not required (h ≤ 900 mm)";
    private static final String SKIN_NOT_REQUIRED_IP = "Skin reinforcement not required (h ≤ 36 in)";
    private static final String SKIN_REQUIRED_SI = "Skin reinforcement required (h > 900 mm)";
    private static final String SKIN_REQUIRED_IP = "Skin reinforcement required (h > 36 in)";

    private static void skin(BeamSection s, List<CheckResult> out, Trail t) {
        CodeEquations code = s.code();
        double h = s.shape().height();
        if (h <= code.skinDepthLimit()) {
            out.add(CheckResult.atMost(
                    "skin",
                    code.inchPound() ? SKIN_NOT_REQUIRED_IP : SKIN_NOT_REQUIRED_SI,
                    "9.7.2.3",
                    Q.length(h),
                    Q.length(code.skinDepthLimit()),
                    null));
            return;
        }
        SkinBars skin = s.skin();
        if (skin == null) {
            out.add(CheckResult.rule(
                    "skin",
                    code.inchPound() ? SKIN_REQUIRED_IP : SKIN_REQUIRED_SI,
                    "9.7.2.3",
                    false,
                    Q.length(h),
                    Q.length(code.skinDepthLimit()),
                    "<=",
                    "give skin: {bar, spacing} along both side faces over h/2 from the tension face"));
            return;
        }
        double cc = s.detailing().cover() + s.detailing().stirrupBar().diameter();
        double limit = BarSpacing.crackSpacingLimit(s.materials().fy(), cc, code);
        if (t.isOn()) {
            t.heading("Skin reinforcement", "9.7.2.3, 24.3.2");
            t.value("s,skin", Q.length(skin.spacing()), skin.bar().label() + " each side face");
            t.value("s,max", Q.length(limit), "24.3.2 with cc to the skin bars");
        }
        out.add(CheckResult.atMost(
                "skin",
                "Skin reinforcement spacing",
                "9.7.2.3, 24.3.2",
                Q.length(skin.spacing()),
                Q.length(limit),
                skin.bar().label() + " on both side faces over h/2 from the tension face"));
    }

    /**
     * Table 6.3.2.1: the flange is analysed at its effective width (the section holds it so, see
     * {@link Flange#on}); this says which width was taken and what the limit left unchecked. Where the
     * flange is in tension ({@code bending} hogging), it also says what 24.3.4 asks of the tension bars.
     * {@code bending} may be null (a frame check, before the bending is known).
     */
    private static void flangeWidth(BeamSection s, Span span, Bending bending, List<CheckResult> out, Trail t) {
        Flange f = s.shape().flange();
        CodeEquations code = s.code();
        double bw = s.shape().width();
        double limit = f.limit(bw);
        List<String> notes = new ArrayList<>();
        if (f.reduced()) {
            notes.add("flange given " + length(f.given(), code) + ", taken at its effective width "
                    + length(f.width(), code) + " (Table 6.3.2.1)");
        }
        if (!f.webGapKnown()) {
            notes.add("sw/2 limit not checked (give the flange's clear_to_next_web)");
        }
        if (!f.spanKnown()) {
            notes.add("ln limit not applied (no span given)");
        }
        boolean inTension = bending == Bending.HOGGING;
        if (inTension) {
            notes.add("flange in tension: " + tensionFlangeNote(f, code));
        }
        if (t.isOn()) {
            List<String> terms = new ArrayList<>();
            List<Q> args = new ArrayList<>();
            args.add(Q.length(bw));
            terms.add((f.oneSided() ? "6" : "8") + " × {}");
            args.add(Q.length(f.thickness()));
            if (f.webGapKnown()) {
                terms.add("{} / 2");
                args.add(Q.length(f.clearToNextWeb()));
            }
            if (f.spanKnown()) {
                terms.add("{} / " + (f.oneSided() ? "12" : "8"));
                args.add(Q.length(f.clearSpan()));
            }
            String overhang = (f.oneSided() ? "6 hf" : "8 hf")
                    + (f.webGapKnown() ? ", sw/2" : "")
                    + (f.spanKnown() ? (f.oneSided() ? ", ln/12" : ", ln/8") : "");
            String formula = "bw + " + (f.oneSided() ? "" : "2 ") + "min(" + overhang + ")";
            String sub = "{} + " + (f.oneSided() ? "" : "2 × ") + "min(" + String.join(", ", terms) + ")";
            t.heading("Effective flange width", "6.3.2.1");
            t.step("bf,max", formula, sub, Q.length(limit), args.toArray(new Q[0]));
            if (f.reduced()) {
                t.step(
                        "bf",
                        "min(bf,given, bf,max)",
                        "min({}, {})",
                        Q.length(f.width()),
                        Q.length(f.given()),
                        Q.length(limit));
                t.note("The flange given is wider than Table 6.3.2.1 allows: it is taken at its effective width in "
                        + "every calculation of this section (strength, minimum steel, stiffness).");
            } else {
                t.value("bf", Q.length(f.width()), "as given, within the limit");
            }
            if (!f.webGapKnown()) {
                t.note("The clear distance to the next web (sw) was not given, so the sw/2 limit was not checked; "
                        + "give flange: {clear_to_next_web} or check it by hand.");
            }
            if (!f.spanKnown()) {
                t.note("No span given: the ln limit of Table 6.3.2.1 was not applied.");
            }
            if (inTension) {
                t.heading("Flange in tension", "24.3.4");
                t.note("The flange is on the tension side. 24.3.4 asks that part of the flexural tension "
                        + "reinforcement be distributed over the effective flange width or a width of ln/10, whichever "
                        + "is smaller, and, where the effective flange width exceeds ln/10, that some longitudinal "
                        + "bars be provided in the outer portions of the flange. barfit places the tension bars in "
                        + "the web only: distribute them and add the slab bars by hand.");
                if (f.spanKnown()) {
                    t.step(
                            "b,distribute",
                            "min(bf, ln/10)",
                            "min({}, {} / 10)",
                            Q.length(f.tensionBarsWidth()),
                            Q.length(f.width()),
                            Q.length(f.clearSpan()));
                }
            }
        }
        out.add(CheckResult.atMost(
                "flange_width",
                f.reduced() ? "Flange taken at its effective width" : "Effective flange width",
                "Table 6.3.2.1",
                Q.length(f.width()),
                Q.length(limit),
                String.join("; ", notes)));
    }

    /**
     * What 24.3.4 asks of the tension bars where the flange is in tension (hogging), in words: the note of
     * the {@code flange_width} check, and what a span's report says of its supports.
     */
    public static String tensionFlangeNote(Flange f, CodeEquations code) {
        return "24.3.4 asks part of the tension bars to be spread over "
                + (f.spanKnown()
                        ? "min(bf, ln/10) = " + length(f.tensionBarsWidth(), code)
                        : "the effective width, at most ln/10")
                + (f.outerFlangeBars() ? ", with more bars in the outer flange" : "") + " (not placed by barfit)";
    }

    /** A length in the edition's unit, for notes (mm, or in for inch-pound input). */
    static String length(double mm, CodeEquations code) {
        long tenths = Math.round((code.inchPound() ? mm / 25.4 : mm) * 10);
        return (tenths % 10 == 0 ? String.valueOf(tenths / 10) : String.valueOf(tenths / 10.0))
                + (code.inchPound() ? " in" : " mm");
    }

    /**
     * A span given to the checks must be the flange's own clear span (which sets its effective width): the
     * readers build both from the beam's span. Without a span the flange's own is used as it is.
     */
    private static void requireSameSpan(BeamSection s, Span span) {
        Flange f = s.shape().flange();
        if (f == null || span == null) {
            return;
        }
        if (!f.spanKnown() || Math.abs(f.clearSpan() - span.length()) > 1e-6) {
            throw new IllegalArgumentException("the flange's clear span (" + f.clearSpan()
                    + " mm) is not the span checked (" + span.length() + " mm); build the flange with the beam's span");
        }
    }

    /**
     * The shear checks of one stirrup zone of a beam: the section (with the zone's stirrups) bent in
     * {@code bending} gives d and As of the tension face; Vu is the zone's design shear. Ids carry the
     * zone's name ("shear_strength.left"...).
     */
    public static List<CheckResult> shearZone(BeamSection s, Bending bending, double vu, String zone, Trail trail) {
        FlexureResult fr = Flexure.analyse(s, bending);
        double d = shearDepth(fr);
        if (trail.isOn()) {
            trail.note("Stirrup zone '" + zone + "': d and As from the " + bending.word() + " section.");
        }
        ShearResult sh = Shear.analyse(s, vu, d, fr.tensionSteelArea(), trail);
        List<CheckResult> out = new ArrayList<>();
        shearChecks(s, sh, out);
        List<CheckResult> named = new ArrayList<>();
        for (CheckResult c : out) {
            named.add(c.inZone(zone));
        }
        return named;
    }

    /** The effective depth shear uses for a section bent in {@code bending}: d of the tension steel, else dt. */
    public static double shearDepth(BeamSection s, Bending bending) {
        return shearDepth(Flexure.analyse(s, bending));
    }

    private static double shearDepth(FlexureResult fr) {
        return fr.tensionSteelArea() > 0 ? fr.d() : fr.dt();
    }

    /**
     * The shear checks alone (22.5.1.2, 22.5, 9.6.3, 9.7.6.2.2) for a section whose stirrups are set,
     * with d and As of the tension face given: what the search asks when it prices stirrups.
     */
    public static boolean shearPasses(BeamSection s, double vu, double d, double tensionArea) {
        return shearVerdict(s, vu, d, tensionArea).all();
    }

    /** Each shear check's verdict for a section whose stirrups are set (see {@link #shearPasses}). */
    public static ShearVerdict shearVerdict(BeamSection s, double vu, double d, double tensionArea) {
        return verdict(s, Shear.analyse(s, vu, d, tensionArea, Trail.off()));
    }

    private static ShearVerdict verdict(BeamSection s, ShearResult sh) {
        Stirrups st = s.stirrups();
        boolean needMin = sh.vu() > sh.minShearTrigger();
        boolean section = CheckResult.within(sh.vu(), sh.vnLimit());
        boolean strength = CheckResult.within(sh.vu(), sh.phiVn());
        if (st == null) {
            return new ShearVerdict(section, strength, !needMin, true, true);
        }
        boolean minimum = !needMin || CheckResult.reaches(sh.av(), sh.avMin());
        boolean spacing = CheckResult.within(st.spacing(), sh.sMaxAlong());
        boolean legs = CheckResult.within(Shear.legSpacing(s), sh.sMaxAcross());
        return new ShearVerdict(section, strength, minimum, spacing, legs);
    }

    /** The minimum-stirrup rule for a beam given no Vu (see {@link #minimumStirrupsPass}), part by part. */
    public static ShearVerdict minimumStirrupsVerdict(BeamSection s, double d, double tensionArea) {
        Stirrups st = s.stirrups();
        if (st == null) {
            return new ShearVerdict(true, true, false, false, false);
        }
        ShearResult sh = Shear.analyse(s, 0, d, tensionArea, Trail.off());
        return new ShearVerdict(
                true,
                true,
                CheckResult.reaches(sh.av(), sh.avMin()),
                CheckResult.within(st.spacing(), sh.sMaxAlong()),
                CheckResult.within(Shear.legSpacing(s), sh.sMaxAcross()));
    }

    /**
     * Minimum stirrups for a beam without a factored shear: Av >= Av,min (Table 9.6.3.4) and the
     * spacing limits of 9.7.6.2.2 along and across.
     */
    public static boolean minimumStirrupsPass(BeamSection s, double d, double tensionArea) {
        return minimumStirrupsVerdict(s, d, tensionArea).all();
    }

    /**
     * The checks that depend only on the concrete frame, cover and bar sizes, not on bar counts:
     * cover, skin, flange width and minimum depth. The search runs these once per frame.
     */
    public static List<CheckResult> frameChecks(BeamSection s, Span span) {
        requireSameSpan(s, span);
        List<CheckResult> out = new ArrayList<>();
        Trail off = Trail.off();
        cover(s, out, off);
        skin(s, out, off);
        if (s.shape().flanged()) {
            flangeWidth(s, span, null, out, off);
        }
        if (span != null && span.ends() != null) {
            minimumDepth(s, span, out, off);
        }
        return out;
    }

    private static void shearChecks(BeamSection s, ShearResult sh, List<CheckResult> out) {
        Stirrups st = s.stirrups();
        out.add(CheckResult.atMost(
                "shear_section",
                "Section size for shear Vu ≤ φ(Vc + Vs,max)",
                "22.5.1.2",
                Q.force(sh.vu()),
                Q.force(sh.vnLimit()),
                null));
        out.add(CheckResult.atMost(
                "shear_strength",
                "Shear strength φVn ≥ Vu",
                "9.5.1.1, 22.5",
                Q.force(sh.vu()),
                Q.force(sh.phiVn()),
                "Vc from Table 22.5.5.1 row " + sh.vcRow()));
        boolean needMin = sh.vu() > sh.minShearTrigger();
        if (st == null) {
            out.add(CheckResult.rule(
                    "shear_min",
                    needMin ? "Stirrups required (Vu > φ 0.083 λ √f'c bw d)" : "Stirrups not required by 9.6.3.1",
                    "9.6.3.1",
                    !needMin,
                    Q.force(sh.vu()),
                    Q.force(sh.minShearTrigger()),
                    "<=",
                    needMin ? "give stirrups: {bar, legs, spacing}" : null));
            return;
        }
        out.add(
                needMin
                        ? CheckResult.atLeast(
                                "shear_min",
                                "Minimum shear reinforcement Av ≥ Av,min",
                                "9.6.3.1, 9.6.3.4",
                                Q.area(sh.av()),
                                Q.area(sh.avMin()),
                                null)
                        : CheckResult.atLeast(
                                "shear_min",
                                "Minimum shear reinforcement (not required, Vu ≤ φ 0.083 λ √f'c bw d)",
                                "9.6.3.1",
                                Q.force(sh.minShearTrigger()),
                                Q.force(sh.vu()),
                                "provided stirrups exceed the need"));
        out.add(CheckResult.atMost(
                "stirrup_spacing",
                "Stirrup spacing along the beam",
                "9.7.6.2.2",
                Q.length(st.spacing()),
                Q.length(sh.sMaxAlong()),
                sh.highShear() ? "required Vs > " + s.code().vsSplit().shown() + " √f'c bw d: halved limits" : null));
        double across = Shear.legSpacing(s);
        out.add(CheckResult.atMost(
                "stirrup_legs",
                "Stirrup leg spacing across the width",
                "9.7.6.2.2",
                Q.length(across),
                Q.length(sh.sMaxAcross()),
                st.legs() + " legs"));
    }

    private static void minimumDepth(BeamSection s, Span span, List<CheckResult> out, Trail t) {
        CodeEquations code = s.code();
        double fy = s.materials().fy();
        double hmin = SpanChecks.minimumDepth(span.length(), span.ends(), s.materials(), code);
        if (t.isOn()) {
            t.heading("Minimum depth", "Table 9.3.1.1");
            String div = fmtDivisor(span.ends().minDepthDivisor());
            String lw = s.materials().lambda() < 1 ? " × 1.218" : "";
            t.step(
                    "h,min",
                    "ℓ / " + div + " × (0.4 + fy / " + (code.inchPound() ? "100000" : "700") + ")" + lw,
                    "{} / " + div + " × (0.4 + {} / " + (code.inchPound() ? "100000" : "700") + ")" + lw,
                    Q.length(hmin),
                    Q.length(span.length()),
                    Q.stress(fy));
            if (s.materials().lambda() < 1) {
                t.note("Lightweight concrete (λ < 1): 9.3.1.1.2's factor at wc = 1440 kg/m³, the largest.");
            }
        }
        double h = s.shape().height();
        out.add(CheckResult.atLeast(
                "min_depth",
                "Minimum depth (" + span.ends().words() + ")",
                "Table 9.3.1.1",
                Q.length(h),
                Q.length(hmin),
                h < hmin ? "below Table 9.3.1.1: deflections must be calculated (9.3.2, 24.2)" : null));
    }

    private static String fmtDivisor(double d) {
        return d == Math.rint(d) ? String.valueOf((int) d) : String.valueOf(d);
    }

    private static String round3(double v) {
        return String.format(java.util.Locale.ROOT, "%.3f", v);
    }

    /** Convenience for callers that only need the bar size list of a section. */
    public static List<BarSize> barSizes(BeamSection s) {
        List<BarSize> out = new ArrayList<>();
        for (BarLayer l : s.layers()) {
            if (!out.contains(l.bar())) {
                out.add(l.bar());
            }
        }
        return out;
    }
}
