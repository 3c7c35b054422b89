package barfit.section;

import barfit.section.trail.Q;
import barfit.section.trail.Trail;

/**
 * The concrete outline torsion takes (9.2.4.4): Acp and pcp with {@code overhangs} flange overhangs of
 * {@code overhang} each (0 when the section has none or they are neglected), beside the web's own. mm, mm².
 */
public record TorsionOutline(double acp, double pcp, double overhang, int overhangs, double webAcp, double webPcp) {

    /**
     * 9.2.4.4: a flange overhang counts up to the beam's projection below the slab (h − hf; the slab is at
     * the top of the web) and 4 hf, and no farther than the slab given; the overhangs are neglected where
     * Acp²/pcp is smaller with them than for the web alone.
     */
    public static TorsionOutline of(SectionShape shape) {
        double bw = shape.width();
        double h = shape.height();
        double webAcp = bw * h;
        double webPcp = 2 * (bw + h);
        TorsionOutline web = new TorsionOutline(webAcp, webPcp, 0, 0, webAcp, webPcp);
        Flange f = shape.flange();
        if (f == null) {
            return web;
        }
        int n = f.oneSided() ? 1 : 2;
        double overhang = Math.min((f.given() - bw) / n, overhangLimit(shape));
        if (!(overhang > 0)) {
            return web;
        }
        TorsionOutline flanged = new TorsionOutline(
                webAcp + n * overhang * f.thickness(), 2 * (bw + n * overhang + h), overhang, n, webAcp, webPcp);
        return flanged.shapeFactor() < web.shapeFactor() ? web : flanged;
    }

    /** 9.2.4.4(a): the greater projection of the web above or below the slab (below: h − hf), at most 4 hf. */
    static double overhangLimit(SectionShape shape) {
        double hf = shape.flange().thickness();
        return Math.min(shape.height() - hf, 4 * hf);
    }

    public boolean flangesCounted() {
        return overhang > 0;
    }

    /** Acp² / pcp, mm³. */
    public double shapeFactor() {
        return acp * acp / pcp;
    }

    /** Writes how the outline was found: the web, the flange overhang allowed, and which counts. */
    void trail(SectionShape shape, Trail t) {
        t.heading("Torsion", "22.7, 9.2.4.4");
        t.step("Acp (web)", "bw h", "{} × {}", Q.area(webAcp), Q.length(shape.width()), Q.length(shape.height()));
        t.step(
                "pcp (web)",
                "2 (bw + h)",
                "2 × ({} + {})",
                Q.length(webPcp),
                Q.length(shape.width()),
                Q.length(shape.height()));
        Flange f = shape.flange();
        if (f == null) {
            return;
        }
        int n = f.oneSided() ? 1 : 2;
        double limit = overhangLimit(shape);
        t.step(
                "overhang,max",
                "min(h − hf, 4 hf)  (9.2.4.4(a))",
                "min({} − {}, 4 × {})",
                Q.length(limit),
                Q.length(shape.height()),
                Q.length(f.thickness()),
                Q.length(f.thickness()));
        double overhang = Math.min((f.given() - shape.width()) / n, limit);
        if (!(overhang > 0)) {
            t.note("The flange given adds no overhang: the web alone.");
            return;
        }
        t.step(
                "overhang",
                "min((bf − bw) / " + n + ", overhang,max), bf the slab as given",
                "min(({} − {}) / " + n + ", {})",
                Q.length(overhang),
                Q.length(f.given()),
                Q.length(shape.width()),
                Q.length(limit));
        double acp = webAcp + n * overhang * f.thickness();
        double pcp = 2 * (shape.width() + n * overhang + shape.height());
        t.step(
                "Acp (with flange)",
                "bw h + " + n + " overhang hf",
                "{} + " + n + " × {} × {}",
                Q.area(acp),
                Q.area(webAcp),
                Q.length(overhang),
                Q.length(f.thickness()));
        t.step(
                "pcp (with flange)",
                "2 (bw + " + n + " overhang + h)",
                "2 × ({} + " + n + " × {} + {})",
                Q.length(pcp),
                Q.length(shape.width()),
                Q.length(overhang),
                Q.length(shape.height()));
        double ratio = (acp * acp / pcp) / (webAcp * webAcp / webPcp);
        t.step(
                "Acp²/pcp ÷ web's",
                "(Acp² / pcp) with flange over the web's",
                "({}² / {}) / ({}² / {})",
                Q.number(ratio),
                Q.area(acp),
                Q.length(pcp),
                Q.area(webAcp),
                Q.length(webPcp));
        t.note(
                flangesCounted()
                        ? "Acp²/pcp is larger with the flange: its overhang counts (9.2.4.4). The closed stirrups are "
                                + "in the web, so Aoh and ph are the web's."
                        : "Acp²/pcp is smaller with the flange: the flange is neglected (9.2.4.4(b)).");
    }
}
