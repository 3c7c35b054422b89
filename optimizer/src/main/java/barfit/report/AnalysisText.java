package barfit.report;

import barfit.analysis.Coefficients;
import barfit.analysis.LineResult;
import barfit.analysis.Stiffness;
import barfit.analysis.Support;
import barfit.analysis.TorqueEnvelope;
import barfit.input.LineInput;
import barfit.input.Settings;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** The terminal report of {@code barfit analyse}: per line the reactions, what design takes, and the envelope. */
public final class AnalysisText {
    private AnalysisText() {}

    /** One line's answer: the analysis, or the 6.5 coefficients. */
    public record Analysed(
            LineInput input, double selfWeight, LineResult result, List<Coefficients.SpanValues> coefficients) {}

    public static String render(Settings settings, List<Analysed> lines) {
        UnitSystem u = settings.units();
        StringBuilder out = new StringBuilder();
        out.append("barfit analyse — ")
                .append(settings.file())
                .append(" — ")
                .append(settings.code().edition())
                .append('\n');
        out.append(Caution.text()).append('\n');
        out.append("The analysis covers gravity loads only (dead and live, ACI 318-19 5.3.1a and b): no lateral loads, "
                + "no settlement; torsion only from the torques given (loads.torque); columns are taken fixed at their far "
                + "ends.\n");
        for (Analysed a : lines) {
            out.append('\n');
            line(a, u, out);
        }
        return out.toString();
    }

    private static void line(Analysed a, UnitSystem u, StringBuilder out) {
        LineInput in = a.input();
        out.append("Line ")
                .append(in.id())
                .append("   ")
                .append(spans(in, u))
                .append("   section ")
                .append(Words.shape(in.section(), u))
                .append('\n');
        out.append("  own weight ")
                .append(u.withUnit(a.selfWeight(), Dim.LINE_LOAD))
                .append(" added to the dead load; sustained live ")
                .append(u.compact(in.sustainedLive(), Dim.NUMBER))
                .append(" of L\n");
        torsion(in, u, out);
        if (a.coefficients() != null) {
            out.append("  method: the approximate moments and shears of ACI 318-19 6.5 (6.5.1's conditions met); "
                    + "moments at the support faces, shears at the faces\n");
            TextTable t = new TextTable(false, true, true, true, true, true, true);
            t.row(
                    "span",
                    "ln " + u.unit(Dim.SPAN),
                    "wu " + u.unit(Dim.LINE_LOAD),
                    "M left face",
                    "M+ span",
                    "M right face",
                    "V left / right " + u.unit(Dim.FORCE));
            for (Coefficients.SpanValues s : a.coefficients()) {
                t.row(
                        String.valueOf(s.index()),
                        u.number(s.clear(), Dim.SPAN),
                        u.number(s.wu(), Dim.LINE_LOAD),
                        u.number(s.mLeftFace(), Dim.MOMENT),
                        u.number(s.mSpan(), Dim.MOMENT),
                        u.number(s.mRightFace(), Dim.MOMENT),
                        u.number(s.vLeftFace(), Dim.FORCE) + " / " + u.number(s.vRightFace(), Dim.FORCE));
            }
            out.append("  moments in ").append(u.unit(Dim.MOMENT)).append(" (− hogging)\n");
            t.write("  ", out);
            return;
        }
        LineResult r = a.result();
        out.append("  stiffness method: beam EI = Ec × ")
                .append(Stiffness.BEAM_FACTOR)
                .append(" Ig, columns Ec × ")
                .append(Stiffness.COLUMN_FACTOR)
                .append(" Ig (Table 6.6.3.1.1); ")
                .append(r.arrangements().size())
                .append(" load arrangements (5.3.1 with the live load arranged as 6.4.2 permits, and on either half of"
                        + " each span)\n");
        boolean anyRedistribution = false;
        StringBuilder red = new StringBuilder();
        for (int j = 0; j < in.redistribution().size(); j++) {
            if (in.redistribution().get(j) > 0) {
                anyRedistribution = true;
                red.append(red.length() == 0 ? "" : ", ")
                        .append("support ")
                        .append(j + 1)
                        .append(' ')
                        .append(u.compact(in.redistribution().get(j), Dim.NUMBER))
                        .append(" %");
            }
        }
        if (anyRedistribution) {
            out.append("  redistribution (6.6.5) applied: ")
                    .append(red)
                    .append(" — provisional: it is allowed only "
                            + "where the designed section there has εt ≥ 0.0075 and at most 1000 εt percent, which a design must"
                            + " confirm\n");
        }
        StringBuilder re = new StringBuilder();
        for (LineResult.Reaction x : r.reactions()) {
            re.append(re.length() == 0 ? "" : ";  ")
                    .append(x.support())
                    .append(": ")
                    .append(u.number(x.max(), Dim.FORCE));
            if (x.min() < x.max() - 1) {
                re.append(" (least ").append(u.number(x.min(), Dim.FORCE)).append(')');
            }
        }
        out.append("  reactions, factored (")
                .append(u.unit(Dim.FORCE))
                .append(", support: largest): ")
                .append(re)
                .append('\n');
        out.append("  for design (moments ")
                .append(u.unit(Dim.MOMENT))
                .append(", − hogging; shears ")
                .append(u.unit(Dim.FORCE))
                .append("; faces of columns and fixed supports, centre lines of knife edges"
                        + " and walls (9.4.2.1); shear at d = ")
                .append(u.withUnit(r.line().d(), Dim.LENGTH))
                .append(" from the faces where 9.4.3.2 allows)\n");
        TextTable t = new TextTable(false, true, true, true, true, true, true, false);
        t.row(
                "span",
                "ln " + u.unit(Dim.SPAN),
                "M left",
                "M+ max",
                "M right",
                "V left",
                "V right",
                "negative moment ends at x (" + u.unit(Dim.SPAN) + ")");
        for (LineResult.SpanValues s : r.spans()) {
            List<String> xs = new ArrayList<>();
            s.inflection().forEach(x -> xs.add(u.number(x, Dim.SPAN)));
            t.row(
                    String.valueOf(s.index()),
                    u.number(s.clear(), Dim.SPAN),
                    u.number(s.mLeftFace(), Dim.MOMENT),
                    u.number(s.mSpanMax(), Dim.MOMENT) + " at " + u.number(s.xMax(), Dim.SPAN),
                    u.number(s.mRightFace(), Dim.MOMENT),
                    u.number(s.vLeftD(), Dim.FORCE) + (s.vLeftAtFace() ? " (face)" : ""),
                    u.number(s.vRightD(), Dim.FORCE) + (s.vRightAtFace() ? " (face)" : ""),
                    xs.isEmpty() ? "—" : String.join(", ", xs));
        }
        t.write("  ", out);
        for (LineResult.OverhangValues o : r.overhangs()) {
            out.append("  ")
                    .append(o.side())
                    .append(" overhang ")
                    .append(u.withUnit(o.clear(), Dim.SPAN))
                    .append(" past the face: M at the face ")
                    .append(u.withUnit(o.mFace(), Dim.MOMENT))
                    .append(", V at d ")
                    .append(u.withUnit(o.vD(), Dim.FORCE))
                    .append('\n');
        }
        out.append("  service moments for deflection (")
                .append(u.unit(Dim.MOMENT))
                .append("): dead load alone, and the envelope of dead plus live\n");
        TextTable sv = new TextTable(false, true, true, true, true, true, true);
        sv.row("span", "D left", "D span", "D right", "D+L left", "D+L span", "D+L right");
        for (LineResult.SpanValues s : r.spans()) {
            sv.row(
                    String.valueOf(s.index()),
                    u.number(s.deadLeft(), Dim.MOMENT),
                    u.number(s.deadMid(), Dim.MOMENT),
                    u.number(s.deadRight(), Dim.MOMENT),
                    u.number(s.totalLeft(), Dim.MOMENT),
                    u.number(s.totalMid(), Dim.MOMENT),
                    u.number(s.totalRight(), Dim.MOMENT));
        }
        sv.write("  ", out);
        out.append("  envelope, factored (every tenth of each span, the faces and point loads; all stations in the "
                + "JSON)\n");
        TextTable e = new TextTable(true, false, true, true, true, true, false, false);
        e.row("x " + u.unit(Dim.SPAN), "where", "M max", "M min", "V max", "V min", "M max from", "M min from");
        for (LineResult.StationValues st : shown(r)) {
            e.row(
                    u.number(st.x(), Dim.SPAN),
                    where(r, st),
                    u.number(st.mMax(), Dim.MOMENT),
                    u.number(st.mMin(), Dim.MOMENT),
                    u.number(st.vMax(), Dim.FORCE),
                    u.number(st.vMin(), Dim.FORCE),
                    st.mMaxBy(),
                    st.mMinBy());
        }
        e.write("  ", out);
    }

    /** The stations worth a line of text: span tenths, faces and point loads, overhang ends. */
    /** The torque envelope of a line given torques: per span tu and |T| at the faces and mid clear span. */
    private static void torsion(LineInput in, UnitSystem u, StringBuilder out) {
        List<TorqueEnvelope.SpanTorsion> spans = in.torsion();
        if (spans.isEmpty()) {
            return;
        }
        String perLength = u.unit(Dim.MOMENT) + "/" + u.unit(Dim.SPAN);
        out.append("  torsion: each support restrains twist, so T(x) = tu (L/2 − x) from the left support's centre"
                        + " line, tu = max(1.4 D, 1.2 D + 1.6 L) (5.3.1) of the span's torque; |T| in ")
                .append(u.unit(Dim.MOMENT))
                .append(" (design takes it at d from the faces, 9.4.4.2)\n");
        TextTable t = new TextTable(false, true, true, true, true);
        t.row("span", "tu " + perLength, "T left face", "T mid-span", "T right face");
        for (TorqueEnvelope.SpanTorsion s : spans) {
            t.row(
                    String.valueOf(s.index()),
                    u.number(s.factored(), Dim.FORCE),
                    u.number(s.atLeftFace(), Dim.MOMENT),
                    u.number(s.atMidClear(), Dim.MOMENT),
                    u.number(s.atRightFace(), Dim.MOMENT));
        }
        t.write("  ", out);
    }

    static List<LineResult.StationValues> shown(LineResult r) {
        List<LineResult.StationValues> out = new ArrayList<>();
        int n = r.line().spanCount();
        for (LineResult.StationValues st : r.stations()) {
            double len = r.line().length(st.segment());
            boolean tenth = Math.abs(st.local() * 10 / len - Math.rint(st.local() * 10 / len)) < 1e-6;
            boolean face = false;
            if (st.segment() >= 1 && st.segment() <= n) {
                Support a = r.line().supports().get(st.segment() - 1);
                Support b = r.line().supports().get(st.segment());
                face = Math.abs(st.local() - a.width() / 2) < 1e-6 || Math.abs(len - st.local() - b.width() / 2) < 1e-6;
            }
            boolean point = r.line().loads().stream()
                    .anyMatch(l -> l.point() && l.segment() == st.segment() && Math.abs(l.from() - st.local()) < 1e-6);
            if (tenth || face || point) {
                out.add(st);
            }
        }
        return out;
    }

    private static String where(LineResult r, LineResult.StationValues st) {
        int n = r.line().spanCount();
        if (st.segment() == 0) {
            return "left overhang";
        }
        if (st.segment() == n + 1) {
            return "right overhang";
        }
        return "span " + st.segment();
    }

    private static String spans(LineInput in, UnitSystem u) {
        StringBuilder sb = new StringBuilder();
        sb.append(in.spans().size()).append(in.spans().size() == 1 ? " span (" : " spans (");
        for (int i = 0; i < in.spans().size(); i++) {
            sb.append(i == 0 ? "" : ", ").append(u.number(in.spans().get(i), Dim.SPAN));
        }
        sb.append(' ').append(u.unit(Dim.SPAN)).append(" centre to centre)");
        if (in.overhangLeft() > 0) {
            sb.append(", left overhang ").append(u.withUnit(in.overhangLeft(), Dim.SPAN));
        }
        if (in.overhangRight() > 0) {
            sb.append(", right overhang ").append(u.withUnit(in.overhangRight(), Dim.SPAN));
        }
        return sb.toString();
    }

    static String pct(double v) {
        return String.format(Locale.ROOT, "%.0f %%", v);
    }
}
