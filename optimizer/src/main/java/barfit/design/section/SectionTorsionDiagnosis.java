package barfit.design.section;

import barfit.catalogs.BarSize;
import barfit.design.Diagnosis;
import barfit.section.BeamSection;
import barfit.section.CheckResult;
import barfit.section.Detailing;
import barfit.section.SectionChecks;
import barfit.section.SectionShape;
import barfit.section.SkinBars;
import barfit.section.Stirrups;
import barfit.section.trail.Trail;
import java.util.Collections;
import java.util.List;

/**
 * Why a section under torsion has no layout when flexure can be met: the torsion check that blocks the
 * frames ({@link FrameTorsion#blocking}), else the first torsion check the strongest layout fails with the
 * closest stirrups and the most side bars the space has. Null where no torsion check is to blame.
 */
final class SectionTorsionDiagnosis {
    private SectionTorsionDiagnosis() {}

    static Diagnosis.TorsionFails cause(SectionProblem p, SectionLayout strongest) {
        List<Double> widths = p.widths();
        List<Double> depths = p.depths();
        BarSize stirrupBar =
                Collections.max(p.space().stirrupSizes(), java.util.Comparator.comparingDouble(BarSize::diameter));
        Detailing det = new Detailing(
                p.detailing().cover(),
                stirrupBar,
                p.detailing().layerGap(),
                p.detailing().exposure());
        double dbMin = p.space().barSizes().stream()
                .mapToDouble(BarSize::diameter)
                .min()
                .orElseThrow();
        // the section size at the largest frame it blocks, else the bar spacing at the shallowest
        CheckResult section = null;
        CheckResult spacing = null;
        double[] sectionAt = null;
        double[] spacingAt = null;
        boolean everyFrame = true;
        for (double b : widths) {
            for (double h : depths) {
                FrameTorsion ft =
                        FrameTorsion.of(p, new SectionShape(b, h, p.flange()), det, h - det.firstLayerCentroid(dbMin));
                CheckResult c = ft.blocking();
                if (c == null) {
                    everyFrame = false;
                } else if (c.id().equals("torsion_section")) {
                    section = c;
                    sectionAt = new double[] {b, h};
                } else if (spacingAt == null || h < spacingAt[1] || (h == spacingAt[1] && b > spacingAt[0])) {
                    spacing = c;
                    spacingAt = new double[] {b, h};
                }
            }
        }
        if (everyFrame && section != null) {
            return new Diagnosis.TorsionFails(section, sectionAt[0], sectionAt[1], true);
        }
        if (everyFrame && spacing != null) {
            return new Diagnosis.TorsionFails(spacing, spacingAt[0], spacingAt[1], true);
        }
        return strongestFails(p, strongest, det);
    }

    /** The first torsion check the strongest layout fails with the closest stirrups and the most side bars. */
    private static Diagnosis.TorsionFails strongestFails(SectionProblem p, SectionLayout strongest, Detailing det) {
        if (strongest == null) {
            return null;
        }
        List<SkinBars> skins =
                SectionLayout.skinOptions(strongest.height(), p.space().skinBar(), det, p.materials(), p.code(), true);
        SkinBars most = skins.get(skins.size() - 1);
        Stirrups closest = new Stirrups(
                strongest.stirrups().bar(),
                Collections.max(p.space().stirrupLegs()),
                Collections.min(p.space().stirrupSpacings()));
        SectionLayout lay = new SectionLayout(
                strongest.width(),
                strongest.height(),
                strongest.flange(),
                strongest.bending(),
                strongest.tensionBar(),
                strongest.tensionCounts(),
                strongest.compressionBar(),
                strongest.compressionCount(),
                closest,
                most);
        BeamSection s = lay.section(p.materials(), p.detailing(), p.code());
        for (CheckResult c :
                SectionChecks.run(s, p.demand(), p.span(), Trail.off()).checks()) {
            if (!c.pass() && c.id().startsWith("torsion_")) {
                return new Diagnosis.TorsionFails(c, strongest.width(), strongest.height(), false);
            }
        }
        return null;
    }
}
