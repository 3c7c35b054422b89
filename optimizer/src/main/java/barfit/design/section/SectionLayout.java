package barfit.design.section;

import barfit.catalogs.BarSize;
import barfit.design.CostBreakdown;
import barfit.design.CostModel;
import barfit.section.BarLayer;
import barfit.section.BarSpacing;
import barfit.section.BeamSection;
import barfit.section.Bending;
import barfit.section.CodeEquations;
import barfit.section.Detailing;
import barfit.section.Flange;
import barfit.section.Materials;
import barfit.section.SectionShape;
import barfit.section.SkinBars;
import barfit.section.Stirrups;
import java.util.ArrayList;
import java.util.List;

/**
 * A designed section: size, the tension bars (one size, counts per layer from the tension face
 * inward), one compression layer (the stirrup hangers, counted in strength), stirrups, and skin bars
 * when h exceeds the 9.7.2.3 limit.
 */
public record SectionLayout(
        double width,
        double height,
        Flange flange,
        Bending bending,
        BarSize tensionBar,
        List<Integer> tensionCounts,
        BarSize compressionBar,
        int compressionCount,
        Stirrups stirrups,
        SkinBars skin) {

    public SectionLayout {
        tensionCounts = List.copyOf(tensionCounts);
    }

    /** The same bars with these stirrups and skin bars. */
    public SectionLayout withStirrups(Stirrups st, SkinBars skinBars) {
        return new SectionLayout(
                width,
                height,
                flange,
                bending,
                tensionBar,
                tensionCounts,
                compressionBar,
                compressionCount,
                st,
                skinBars);
    }

    public int tensionBarCount() {
        int n = 0;
        for (int c : tensionCounts) {
            n += c;
        }
        return n;
    }

    public double tensionArea() {
        return tensionBarCount() * tensionBar.area();
    }

    public Detailing detailing(Detailing base) {
        return new Detailing(base.cover(), stirrups.bar(), base.layerGap(), base.exposure());
    }

    public SectionShape shape() {
        return new SectionShape(width, height, flange);
    }

    /** The section the section model checks. */
    public BeamSection section(Materials m, Detailing base, CodeEquations code) {
        Detailing det = detailing(base);
        List<BeamSection.BarGroup> t = new ArrayList<>();
        for (int c : tensionCounts) {
            t.add(new BeamSection.BarGroup(tensionBar, c));
        }
        List<BarLayer> layers = new ArrayList<>(BeamSection.stack(bending.tensionFace(), t, det));
        layers.addAll(BeamSection.stack(
                bending.compressionFace(), List.of(new BeamSection.BarGroup(compressionBar, compressionCount)), det));
        return new BeamSection(shape(), m, det, layers, stirrups, skin, code);
    }

    /**
     * Whether the bars physically fit in the height: the innermost tension layer and the compression
     * layer keep at least the layer gap clear between them (a geometric rule, not a code check).
     */
    public static boolean fitsHeight(double h, Detailing det, BarSize tension, int layers, BarSize compression) {
        double tb = tension.diameter();
        double innermost = det.firstLayerCentroid(tb) + (layers - 1) * (tb + det.layerGap());
        double comp = det.firstLayerCentroid(compression.diameter());
        double clear = h - innermost - comp - (tb + compression.diameter()) / 2;
        return clear >= det.layerGap() - 1e-9;
    }

    /** Skin bars per side face over h/2 from the tension face at spacing s. */
    public static int skinBarsPerFace(double h, double spacing) {
        return SkinBars.perFace(h, spacing);
    }

    /** The design rule for skin bars: the smallest bar size at the 24.3.2 spacing, rounded down to 5 mm. */
    public static SkinBars skinFor(double h, BarSize smallest, Detailing det, Materials m, CodeEquations code) {
        if (h <= code.skinDepthLimit()) {
            return null;
        }
        double limit = BarSpacing.crackSpacingLimit(m.fy(), det.coverToMainBars(), code);
        return new SkinBars(smallest, Math.floor(limit / 5.0) * 5.0);
    }

    /** Most side bars a face that a search under torsion tries (a bound on the space, not a code rule). */
    public static final int MOST_SIDE_BARS = 4;

    /**
     * The skin bars a search may give a section {@code h} deep: those the design rule gives ({@link #skinFor},
     * null where h needs none), and under torsion ({@code torsion}) also side bars of the same size, 1 to
     * {@link #MOST_SIDE_BARS} a face, each count at the widest 5 mm spacing that gives it (so they spread up
     * the face as far as they can: the longitudinal steel and its spacing round the hoop of 9.7.5.1) and keeps
     * the clear spacing of 25.2.1 between them, at most the 24.3.2 spacing where skin bars are required. Null
     * (none) comes first where allowed; no two options are the same.
     */
    public static List<SkinBars> skinOptions(
            double h, BarSize bar, Detailing det, Materials m, CodeEquations code, boolean torsion) {
        List<SkinBars> out = new ArrayList<>();
        SkinBars rule = skinFor(h, bar, det, m, code);
        out.add(rule);
        if (!torsion) {
            return out;
        }
        double most = rule == null ? Double.POSITIVE_INFINITY : rule.spacing();
        double leastClear = BarSpacing.minClear(bar, m, code);
        for (int n = 1; n <= MOST_SIDE_BARS; n++) {
            double s = Math.floor((h / (2.0 * n) - 1e-6) / 5.0) * 5.0;
            s = Math.min(s, most);
            while (s > 0 && skinBarsPerFace(h, s) < n) {
                s -= 5.0;
            }
            if (s <= 0 || skinBarsPerFace(h, s) != n || s - bar.diameter() < leastClear) {
                continue;
            }
            SkinBars option = new SkinBars(bar, s);
            if (!out.contains(option)) {
                out.add(option);
            }
        }
        return out;
    }

    /** Per-metre cost of this layout. */
    public CostBreakdown cost(CostModel model) {
        CostBreakdown frame = model.frame(width, height, flange);
        double bars = model.bars(tensionBar, tensionBarCount()) + model.bars(compressionBar, compressionCount);
        if (skin != null) {
            bars += model.bars(skin.bar(), 2 * skinBarsPerFace(height, skin.spacing()));
        }
        double stir = model.stirrups(width, height, stirrups);
        return frame.plus(new CostBreakdown(0, bars, stir, 0, 0));
    }

    /** Designs that differ only in counts or stirrups are not "distinct" alternatives. */
    public String distinctKey() {
        return width + "x" + height + "/" + tensionBar.designation();
    }
}
