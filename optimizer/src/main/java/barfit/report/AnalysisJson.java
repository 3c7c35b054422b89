package barfit.report;

import barfit.analysis.Coefficients;
import barfit.analysis.LineResult;
import barfit.analysis.TorqueEnvelope;
import barfit.input.Settings;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;

/**
 * {@code barfit analyse --format json}: per line {@code id, method, self_weight, reactions[], stations[{x, span,
 * M_max, M_min, V_max, V_min}], spans[{index, M_left_face, M_span_max, M_right_face, V_left_d, V_right_d,
 * inflection[]}], overhangs[]}, in the input's units, x along the line from the first support's centre
 * line (negative over a left overhang), moments sagging positive. Overhang stations have {@code span} null
 * and {@code overhang} "left" or "right".
 */
public final class AnalysisJson {
    private AnalysisJson() {}

    public static String render(Settings settings, List<AnalysisText.Analysed> lines) {
        UnitSystem u = settings.units();
        ObjectNode root = Json.object();
        root.set("units", Json.units(u));
        root.put("caution", Caution.SHORT);
        ArrayNode arr = root.putArray("lines");
        for (AnalysisText.Analysed a : lines) {
            ObjectNode o = arr.addObject();
            o.put("id", a.input().id());
            o.put("method", a.coefficients() != null ? "coefficients" : "stiffness");
            Json.put(o, "self_weight", a.selfWeight(), Dim.LINE_LOAD, u);
            ArrayNode red = o.putArray("redistribution");
            a.input().redistribution().forEach(red::add);
            if (!a.input().torsion().isEmpty()) {
                ArrayNode tor = o.putArray("torsion");
                for (TorqueEnvelope.SpanTorsion s : a.input().torsion()) {
                    ObjectNode to = tor.addObject();
                    to.put("span", s.index());
                    Json.put(to, "tu", s.factored(), Dim.FORCE, u);
                    Json.put(to, "T_left_face", s.atLeftFace(), Dim.MOMENT, u);
                    Json.put(to, "T_mid_span", s.atMidClear(), Dim.MOMENT, u);
                    Json.put(to, "T_right_face", s.atRightFace(), Dim.MOMENT, u);
                }
            }
            if (a.coefficients() != null) {
                o.putArray("reactions");
                o.putArray("stations");
                ArrayNode spans = o.putArray("spans");
                for (Coefficients.SpanValues s : a.coefficients()) {
                    ObjectNode sp = spans.addObject();
                    sp.put("index", s.index());
                    Json.put(sp, "M_left_face", s.mLeftFace(), Dim.MOMENT, u);
                    Json.put(sp, "M_span_max", s.mSpan(), Dim.MOMENT, u);
                    Json.put(sp, "M_right_face", s.mRightFace(), Dim.MOMENT, u);
                    Json.put(sp, "V_left_d", s.vLeftFace(), Dim.FORCE, u);
                    Json.put(sp, "V_right_d", s.vRightFace(), Dim.FORCE, u);
                    sp.put("V_left_at_face", true);
                    sp.put("V_right_at_face", true);
                    sp.putArray("inflection");
                }
                o.putArray("overhangs");
                continue;
            }
            LineResult r = a.result();
            ArrayNode re = o.putArray("reactions");
            for (LineResult.Reaction x : r.reactions()) {
                ObjectNode ro = re.addObject();
                ro.put("support", x.support());
                Json.put(ro, "max", x.max(), Dim.FORCE, u);
                Json.put(ro, "min", x.min(), Dim.FORCE, u);
            }
            ArrayNode st = o.putArray("stations");
            int n = r.line().spanCount();
            for (LineResult.StationValues s : r.stations()) {
                ObjectNode so = st.addObject();
                Json.put(so, "x", s.x(), Dim.SPAN, u);
                if (s.segment() >= 1 && s.segment() <= n) {
                    so.put("span", s.segment());
                } else {
                    so.putNull("span");
                    so.put("overhang", s.segment() == 0 ? "left" : "right");
                }
                Json.put(so, "M_max", s.mMax(), Dim.MOMENT, u);
                Json.put(so, "M_min", s.mMin(), Dim.MOMENT, u);
                Json.put(so, "V_max", s.vMax(), Dim.FORCE, u);
                Json.put(so, "V_min", s.vMin(), Dim.FORCE, u);
                so.put("M_max_from", s.mMaxBy());
                so.put("M_min_from", s.mMinBy());
            }
            ArrayNode spans = o.putArray("spans");
            for (LineResult.SpanValues s : r.spans()) {
                ObjectNode sp = spans.addObject();
                sp.put("index", s.index());
                Json.put(sp, "clear", s.clear(), Dim.SPAN, u);
                Json.put(sp, "M_left_face", s.mLeftFace(), Dim.MOMENT, u);
                Json.put(sp, "M_span_max", s.mSpanMax(), Dim.MOMENT, u);
                Json.put(sp, "M_right_face", s.mRightFace(), Dim.MOMENT, u);
                Json.put(sp, "V_left_d", s.vLeftD(), Dim.FORCE, u);
                Json.put(sp, "V_right_d", s.vRightD(), Dim.FORCE, u);
                sp.put("V_left_at_face", s.vLeftAtFace());
                sp.put("V_right_at_face", s.vRightAtFace());
                ArrayNode inf = sp.putArray("inflection");
                s.inflection().forEach(x -> inf.add(u.json(x, Dim.SPAN)));
                ObjectNode service = sp.putObject("service");
                Json.put(service, "dead_left", s.deadLeft(), Dim.MOMENT, u);
                Json.put(service, "dead_span", s.deadMid(), Dim.MOMENT, u);
                Json.put(service, "dead_right", s.deadRight(), Dim.MOMENT, u);
                Json.put(service, "total_left", s.totalLeft(), Dim.MOMENT, u);
                Json.put(service, "total_span", s.totalMid(), Dim.MOMENT, u);
                Json.put(service, "total_right", s.totalRight(), Dim.MOMENT, u);
            }
            ArrayNode oh = o.putArray("overhangs");
            for (LineResult.OverhangValues v : r.overhangs()) {
                ObjectNode ov = oh.addObject();
                ov.put("side", v.side());
                Json.put(ov, "clear", v.clear(), Dim.SPAN, u);
                Json.put(ov, "M_face", v.mFace(), Dim.MOMENT, u);
                Json.put(ov, "V_d", v.vD(), Dim.FORCE, u);
            }
        }
        return Json.write(root);
    }
}
