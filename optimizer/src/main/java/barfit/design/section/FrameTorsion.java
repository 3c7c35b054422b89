package barfit.design.section;

import barfit.catalogs.BarSize;
import barfit.design.StirrupChooser;
import barfit.section.BarLayer;
import barfit.section.BeamSection;
import barfit.section.Bending;
import barfit.section.CheckResult;
import barfit.section.Detailing;
import barfit.section.SectionChecks;
import barfit.section.SectionShape;
import barfit.section.Shear;
import barfit.section.ShearResult;
import barfit.section.SkinBars;
import barfit.section.Stirrups;
import barfit.section.Torsion;
import barfit.section.TorsionChecks;
import barfit.section.TorsionResult;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.List;

/**
 * What torsion asks of one frame (width, height, stirrup bar), as the section model answers it: whether Tu
 * reaches φTth there ({@code designed}; below it the torsion checks pass as neglected, 9.5.4.1, and the frame
 * is searched as one without torsion), the longitudinal steel Al it needs (22.7.6.1, 9.6.4.3, which hang on
 * the frame and the stirrup bar alone; 0 where not designed), the skin options a search tries in it, and
 * {@code blocking}: a torsion check that fails on the frame's most favourable stand-in, so on every layout of
 * the frame (null where none does).
 *
 * <p>The stand-ins are bounding devices, not layouts: for the section size (22.7.7.1(a)) the largest d, a
 * tension area that takes Vc to its cap and the closest stirrups of the space (Vc only grows with As, d and
 * Av, the stress only falls with d); for the bar spacing round the hoop (9.7.5.1) a hundred bars a face, of
 * the largest sizes (the gaps across vanish, and larger corner bars only shorten the gaps up the side faces),
 * with each skin option in turn.
 */
record FrameTorsion(boolean designed, double alRequired, List<SkinBars> skins, CheckResult blocking) {
    /** Bars a face of the spacing stand-in: enough for the spacing across any web to vanish. */
    private static final int STAND_IN_BARS = 100;
    /** ρw of the section-size stand-in: enough for Vc of Table 22.5.5.1 to reach its cap at any d. */
    private static final double STAND_IN_RHO = 1000;

    FrameTorsion {
        skins = Collections.unmodifiableList(new ArrayList<>(skins)); // null: no skin bars
    }

    FrameTorsion withSkins(List<SkinBars> s) {
        return new FrameTorsion(designed, alRequired, s, blocking);
    }

    /** {@code dMax}: the largest d of the frame (the smallest tension bar in one layer). */
    static FrameTorsion of(SectionProblem p, SectionShape shape, Detailing det, double dMax) {
        double h = shape.height();
        if (!p.hasTorsion()) {
            return new FrameTorsion(
                    false,
                    0,
                    SectionLayout.skinOptions(h, p.space().skinBar(), det, p.materials(), p.code(), false),
                    null);
        }
        BeamSection closest =
                new BeamSection(shape, p.materials(), det, List.of(), closestStirrups(p, det), null, p.code());
        double asCap = STAND_IN_RHO * shape.width() * dMax;
        ShearResult sh = Shear.analyse(closest, p.vu() == null ? 0 : Math.abs(p.vu()), dMax, asCap, Trail.off());
        TorsionResult r = Torsion.analyse(closest, p.tu(), p.compatibilityTorsion(), sh, Trail.off());
        boolean designed = !r.neglected();
        List<SkinBars> skins =
                SectionLayout.skinOptions(h, p.space().skinBar(), det, p.materials(), p.code(), designed);
        if (!designed) {
            return new FrameTorsion(false, 0, skins, null);
        }
        CheckResult blocking = null;
        for (CheckResult c : TorsionChecks.stirrupChecks(closest, p.demand(), dMax, asCap)) {
            if (c.id().equals("torsion_section") && !c.pass()) {
                blocking = c;
            }
        }
        if (blocking == null) {
            blocking = spacingBlocks(p, shape, det, skins);
        }
        return new FrameTorsion(true, r.alRequired(), skins, blocking);
    }

    /**
     * What the stirrup bound over a frame asks of torsion: the checks on stirrups but the section size (which
     * the frame's largest d and As need not ease), on two bars of the largest size on each face (larger corner
     * bars only ease 9.7.5.2).
     */
    static StirrupChooser.Torsion stirrupBound(SectionProblem p, Detailing det) {
        BarSize t = largest(p.space().barSizes());
        BarSize c = largest(p.space().compressionSizes());
        Bending bending = p.bending();
        List<BarLayer> bars =
                new ArrayList<>(BeamSection.stack(bending.tensionFace(), List.of(new BeamSection.BarGroup(t, 2)), det));
        bars.addAll(BeamSection.stack(bending.compressionFace(), List.of(new BeamSection.BarGroup(c, 2)), det));
        return new StirrupChooser.Torsion(p.demand(), bars, null, false);
    }

    /** The most legs at the closest spacing of the space, in the frame's stirrup bar. */
    private static Stirrups closestStirrups(SectionProblem p, Detailing det) {
        int legs = Collections.max(p.space().stirrupLegs());
        double spacing = Collections.min(p.space().stirrupSpacings());
        return new Stirrups(det.stirrupBar(), legs, spacing);
    }

    /** The bar spacing round the hoop on the stand-in, failing with every skin option; null if one passes. */
    private static CheckResult spacingBlocks(
            SectionProblem p, SectionShape shape, Detailing det, List<SkinBars> skins) {
        Bending bending = p.bending();
        BarSize t = largest(p.space().barSizes());
        BarSize c = largest(p.space().compressionSizes());
        List<BarLayer> layers = List.of(
                new BarLayer(bending.tensionFace(), t, STAND_IN_BARS, det.firstLayerCentroid(t.diameter())),
                new BarLayer(bending.compressionFace(), c, STAND_IN_BARS, det.firstLayerCentroid(c.diameter())));
        CheckResult failing = null;
        for (SkinBars skin : skins) {
            BeamSection s = new BeamSection(shape, p.materials(), det, layers, closestStirrups(p, det), skin, p.code());
            CheckResult spacing = SectionChecks.run(s, p.demand(), null, Trail.off(), false)
                    .check("torsion_bar_spacing")
                    .orElse(null);
            if (spacing == null || spacing.pass()) {
                return null;
            }
            failing = spacing;
        }
        return failing;
    }

    private static BarSize largest(List<BarSize> sizes) {
        return sizes.stream().max(Comparator.comparingDouble(BarSize::diameter)).orElseThrow();
    }
}
