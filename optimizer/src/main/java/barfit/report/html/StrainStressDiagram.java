package barfit.report.html;

import barfit.report.Words;
import barfit.section.Bending;
import barfit.section.CodeTables;
import barfit.section.FlexureResult;
import barfit.section.LayerResult;
import barfit.section.Materials;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.List;

/**
 * The strain and stress picture of one solved section, as SVG, drawn beside its section drawing at the
 * same vertical scale so each bar layer lines up with its strain and stress. Left: the strain profile
 * with eps_cu = 0.003 at the compression face, the neutral axis at c, every layer's strain, eps_t at the
 * extreme tension layer and eps_ty for reference. Right: the Whitney block 0.85 f'c over a = beta1 c with
 * its net force, and each layer's steel stress and force with its sign (+ tension), yielded or not.
 */
public final class StrainStressDiagram {
    private static final double STRAIN_LEFT = 14;
    private static final double STRAIN_WIDTH = 130;
    private static final double STRAIN_LABELS = 165;
    private static final double STRESS_GAP = 16;
    private static final double BLOCK_WIDTH = 50;
    private static final double ARROW_MAX = 56;
    private static final double STRESS_LABELS = 225;

    private static final String COMPRESSION = "#c98a3a";
    private static final String TENSION = "#3d6d99";
    private static final String LINE = "#333";
    private static final String REF = "#8a8a8a";

    private StrainStressDiagram() {}

    public static String svg(FlexureResult f, double height, Materials m, double scale, UnitSystem u) {
        double h = height;
        boolean sagging = f.bending() == Bending.SAGGING;
        double top = SectionDrawing.TOP;
        double bottom = top + h * scale;
        double faceC = sagging ? top : bottom; // the compression face, px
        double dir = sagging ? 1 : -1; // px per mm away from the compression face, signed
        double epsCu = CodeTables.EPS_CU;
        double epsFace = epsCu * (h - f.c()) / f.c(); // strain at the tension face
        double emax = Math.max(Math.max(epsFace, f.epsTy() * 1.1), 0.0005);
        double sx = STRAIN_WIDTH / (epsCu + emax);
        double zx = STRAIN_LEFT + epsCu * sx; // the zero-strain line
        double labelsX = STRAIN_LEFT + STRAIN_WIDTH + 12;
        double stressLeft = labelsX + STRAIN_LABELS + STRESS_GAP;
        double sz = stressLeft + BLOCK_WIDTH + 8; // the zero-stress line
        double stressLabels = sz + ARROW_MAX + 16;
        double width = stressLabels + STRESS_LABELS;
        double svgHeight = bottom + SectionDrawing.BELOW;

        StringBuilder out = new StringBuilder();
        out.append("<svg xmlns=\"")
                .append(Svg.NS)
                .append("\" class=\"strain-stress\" width=\"")
                .append(Svg.px(width))
                .append("\" height=\"")
                .append(Svg.px(svgHeight))
                .append("\" viewBox=\"0 0 ")
                .append(Svg.px(width))
                .append(' ')
                .append(Svg.px(svgHeight))
                .append("\" role=\"img\" aria-label=\"strain and stress\">\n");
        out.append("<g font-family=\"sans-serif\" font-size=\"11\" fill=\"#222\">\n");
        out.append("<text x=\"")
                .append(Svg.px(STRAIN_LEFT))
                .append("\" y=\"16\" font-size=\"13\" font-weight=\"bold\">")
                .append("Strain (+ tension)</text>\n");
        out.append("<text x=\"")
                .append(Svg.px(stressLeft))
                .append("\" y=\"16\" font-size=\"13\" font-weight=\"bold\">")
                .append("Stress and force (+ tension)</text>\n");
        Svg.text(
                out,
                STRAIN_LEFT,
                32,
                "start",
                null,
                "ε_cu = 0.003 at the " + f.bending().compressionFace().word() + " face (22.2.2.1)");
        Svg.text(
                out,
                stressLeft,
                32,
                "start",
                null,
                "f'c = " + u.withUnit(m.fc(), Dim.STRESS) + ", fy = " + u.withUnit(m.fy(), Dim.STRESS) + ", β1 = "
                        + Words.fixed(f.beta1(), 3));

        // reference lines: zero strain, the faces
        Svg.line(out, zx, top - 6, zx, bottom + 6, "axis", LINE, 1, null);
        Svg.line(out, sz, top - 6, sz, bottom + 6, "axis", LINE, 1, null);
        Svg.line(out, STRAIN_LEFT, top, labelsX - 6, top, "face", REF, 0.6, null);
        Svg.line(out, STRAIN_LEFT, bottom, labelsX - 6, bottom, "face", REF, 0.6, null);

        // the strain profile: a straight line from -eps_cu at the compression face to the tension face
        double yNa = faceC + dir * f.c() * scale;
        double xC = zx - epsCu * sx;
        double xT = zx + epsFace * sx;
        double faceT = sagging ? bottom : top;
        polygon(out, COMPRESSION, zx + "," + yNa, xC + "," + faceC, zx + "," + faceC);
        polygon(out, TENSION, zx + "," + yNa, xT + "," + faceT, zx + "," + faceT);
        Svg.line(out, xC, faceC, xT, faceT, "profile", LINE, 1.4, null);

        // eps_ty for reference (Table 21.2.2)
        double xTy = zx + f.epsTy() * sx;
        Svg.line(out, xTy, top, xTy, bottom, "eps-ty", REF, 1, "4 3");
        Svg.text(out, xTy + 3, sagging ? bottom + 14 : top - 4, "start", "ref", "ε_ty = " + Words.fixed(f.epsTy(), 5));

        // the neutral axis across both panels
        // stopped short of the label columns, so it never runs through a label
        Svg.line(out, STRAIN_LEFT, yNa, labelsX - 14, yNa, "neutral-axis", "#b03a2e", 0.9, "6 3");
        Svg.line(out, stressLeft, yNa, stressLabels - 14, yNa, "neutral-axis", "#b03a2e", 0.9, "6 3");

        // the Whitney block and its net force
        double aPx = f.a() * scale;
        double blockTop = sagging ? top : bottom - aPx;
        out.append("<rect class=\"block\" x=\"")
                .append(Svg.px(sz - BLOCK_WIDTH))
                .append("\" y=\"")
                .append(Svg.px(blockTop))
                .append("\" width=\"")
                .append(Svg.px(BLOCK_WIDTH))
                .append("\" height=\"")
                .append(Svg.px(aPx))
                .append("\" fill=\"")
                .append(COMPRESSION)
                .append("\" fill-opacity=\"0.35\" stroke=\"")
                .append(COMPRESSION)
                .append("\"/>\n");
        List<Label> stressRows = new ArrayList<>();
        double yCc = faceC + dir * f.concreteCentroid() * scale;
        arrow(out, sz, yCc, sz - BLOCK_WIDTH * 0.9, COMPRESSION);
        stressRows.add(new Label(
                yCc,
                sz,
                "0.85 f'c = " + u.withUnit(CodeTables.BLOCK_STRESS * m.fc(), Dim.STRESS) + " over a = " + len(f.a(), u),
                "block-label"));
        stressRows.add(
                new Label(yCc + 0.01, sz, "C_c = " + force(f.concreteForce(), u) + " (block, net)", "block-label"));

        // each layer: its strain (left) and its stress and force (right)
        List<Label> strainRows = new ArrayList<>();
        strainRows.add(new Label(yNa, zx, "neutral axis, c = " + len(f.c(), u), "na"));
        strainRows.add(new Label(faceC, xC, "ε_cu = " + Svg.strain(-epsCu) + " (compression face)", "eps-cu"));
        LayerResult extreme = null;
        for (LayerResult l : f.layers()) {
            if (l.strain() > 0 && (extreme == null || l.d() > extreme.d())) {
                extreme = l;
            }
        }
        for (LayerResult l : f.layers()) {
            double y = faceC + dir * l.d() * scale;
            double x = zx + l.strain() * sx;
            String colour = l.strain() < 0 ? COMPRESSION : TENSION;
            out.append("<circle class=\"strain-point\" cx=\"")
                    .append(Svg.px(x))
                    .append("\" cy=\"")
                    .append(Svg.px(y))
                    .append("\" r=\"3\" fill=\"")
                    .append(colour)
                    .append("\"/>\n");
            Svg.line(out, zx, y, x, y, "strain-level", colour, 1, "2 2");
            String name = l.layer().count() + " " + l.layer().bar().label();
            boolean isExtreme = l == extreme && Math.abs(l.d() - f.dt()) < 1e-6;
            String strain = (isExtreme ? "ε_t = " : "ε_s = ") + Svg.strain(l.strain()) + "  (" + name + ")";
            strainRows.add(new Label(y, x, strain, isExtreme ? "eps-t" : "eps-s"));
            double len = Math.max(6, ARROW_MAX * Math.min(1, Math.abs(l.stress()) / m.fy()));
            double tip = l.stress() >= 0 ? sz + len : sz - len;
            arrow(out, sz, y, tip, colour);
            String stress = signed(l.stress(), u) + (l.yielded(m.fy()) ? ", yielded" : ", elastic") + "; "
                    + (l.force() >= 0 ? "T = " : "C = ") + force(Math.abs(l.force()), u);
            stressRows.add(new Label(y, Math.max(tip, sz), stress, "stress-label"));
        }
        writeLabels(out, strainRows, labelsX, top, bottom);
        writeLabels(out, stressRows, stressLabels, top, bottom);

        // what eps_t means for phi (Table 21.2.2) and ductility (9.3.3.1)
        double y = bottom + 34;
        Svg.text(
                out,
                STRAIN_LEFT,
                y,
                "start",
                "class",
                "ε_t = " + Svg.strain(f.epsT()) + ": " + f.strainClass()
                        + " (ε_ty = " + Words.fixed(f.epsTy(), 5) + ", ε_ty + 0.003 = "
                        + Words.fixed(CodeTables.tensionControlledStrain(f.epsTy()), 5)
                        + "), φ = " + Words.phi(f.phi()) + " (Table 21.2.2)");
        Svg.text(
                out,
                STRAIN_LEFT,
                y + 16,
                "start",
                "class",
                "c = " + len(f.c(), u) + ", a = β1 c = " + len(f.a(), u)
                        + ", d = " + len(f.d(), u) + ", d_t = " + len(f.dt(), u) + ";  Mn = "
                        + u.withUnit(f.mn(), Dim.MOMENT)
                        + ", φMn = " + u.withUnit(f.phiMn(), Dim.MOMENT));
        Svg.text(
                out,
                STRAIN_LEFT,
                y + 32,
                "start",
                "class",
                "heights to the same scale as the section; strain and " + "stress widths are not to scale");
        out.append("</g>\n</svg>\n");
        return out.toString();
    }

    private record Label(double y, double fromX, String text, String cls) {}

    /** Labels in a column at x, in order of height, pushed apart so none overlaps, each with a leader. */
    private static void writeLabels(StringBuilder out, List<Label> rows, double x, double top, double bottom) {
        List<Label> sorted = new ArrayList<>(rows);
        sorted.sort(java.util.Comparator.comparingDouble(Label::y));
        double gap = 14;
        double[] ys = new double[sorted.size()];
        for (int i = 0; i < ys.length; i++) {
            ys[i] = sorted.get(i).y() + 4;
            if (i > 0) {
                ys[i] = Math.max(ys[i], ys[i - 1] + gap);
            }
        }
        for (int i = ys.length - 1; i >= 0; i--) {
            double max = i == ys.length - 1 ? bottom + 18 : ys[i + 1] - gap;
            ys[i] = Math.min(ys[i], max);
        }
        for (int i = 0; i < ys.length; i++) {
            Label l = sorted.get(i);
            out.append("<polyline fill=\"none\" stroke=\"")
                    .append(REF)
                    .append("\" stroke-width=\"0.6\" points=\"")
                    .append(Svg.px(l.fromX() + 4))
                    .append(',')
                    .append(Svg.px(l.y()))
                    .append(' ')
                    .append(Svg.px(x - 8))
                    .append(',')
                    .append(Svg.px(ys[i] - 4))
                    .append(' ')
                    .append(Svg.px(x - 3))
                    .append(',')
                    .append(Svg.px(ys[i] - 4))
                    .append("\"/>\n");
            Svg.text(out, x, ys[i], "start", l.cls(), l.text());
        }
    }

    private static void arrow(StringBuilder out, double x0, double y, double x1, String colour) {
        double s = Math.signum(x1 - x0);
        out.append("<path class=\"arrow\" d=\"M")
                .append(Svg.px(x0))
                .append(',')
                .append(Svg.px(y))
                .append(" L")
                .append(Svg.px(x1))
                .append(',')
                .append(Svg.px(y))
                .append("\" stroke=\"")
                .append(colour)
                .append("\" stroke-width=\"2\" fill=\"none\"/>\n");
        out.append("<path d=\"M")
                .append(Svg.px(x1))
                .append(',')
                .append(Svg.px(y))
                .append(" L")
                .append(Svg.px(x1 - s * 7))
                .append(',')
                .append(Svg.px(y - 3.5))
                .append(" L")
                .append(Svg.px(x1 - s * 7))
                .append(',')
                .append(Svg.px(y + 3.5))
                .append(" Z\" fill=\"")
                .append(colour)
                .append("\"/>\n");
    }

    private static void polygon(StringBuilder out, String colour, String... points) {
        out.append("<polygon points=\"");
        for (int i = 0; i < points.length; i++) {
            String[] xy = points[i].split(",");
            out.append(i == 0 ? "" : " ")
                    .append(Svg.px(Double.parseDouble(xy[0])))
                    .append(',')
                    .append(Svg.px(Double.parseDouble(xy[1])));
        }
        out.append("\" fill=\"").append(colour).append("\" fill-opacity=\"0.3\"/>\n");
    }

    private static String len(double mm, UnitSystem u) {
        return SectionDrawing.len(mm, u);
    }

    private static String force(double n, UnitSystem u) {
        return u.withUnit(n, Dim.FORCE);
    }

    private static String signed(double mpa, UnitSystem u) {
        String v = u.withUnit(Math.abs(mpa), Dim.STRESS);
        return (mpa < 0 ? "\u2212" : "+") + v;
    }
}
