package barfit.input;

import barfit.analysis.Line;
import barfit.analysis.Load;
import barfit.analysis.Stiffness;
import barfit.analysis.Support;
import barfit.analysis.Torque;
import barfit.analysis.TorqueEnvelope;
import barfit.catalogs.yaml.Location;
import barfit.section.SectionShape;
import java.util.ArrayList;
import java.util.List;

/**
 * A beam line as given: spans centre-to-centre (mm), overhangs, supports, the superimposed service loads
 * per segment (N/mm, N), the section analysed (and whose own weight is added), the sustained part of
 * the live load, the method (stiffness analysis or the 6.5 coefficients), the redistribution asked at
 * each support (percent), the concrete's unit weight (N/mm³), the headroom cap, and whether the line is
 * one set of forms ({@code oneSection}: one b x h throughout, the default) or each span its own section;
 * for its detailing, whether it is a perimeter beam (9.7.7.1) and the stock bar length (mm, null for the
 * default of 12 m / 40 ft), and the distributed service torques on its spans (N·mm/mm).
 * Segment 0 is the left overhang, 1..n the spans, n + 1 the right overhang.
 */
public record LineInput(
        String id,
        Location location,
        List<Double> spans,
        double overhangLeft,
        double overhangRight,
        List<Support> supports,
        List<Load> loads,
        SectionShape section,
        double sustainedLive,
        boolean coefficients,
        List<Double> redistribution,
        double unitWeight,
        Double maxDepth,
        boolean oneSection,
        boolean perimeter,
        Double stockLength,
        List<Torque> torques) {

    /** A line without torques. */
    public LineInput(
            String id,
            Location location,
            List<Double> spans,
            double overhangLeft,
            double overhangRight,
            List<Support> supports,
            List<Load> loads,
            SectionShape section,
            double sustainedLive,
            boolean coefficients,
            List<Double> redistribution,
            double unitWeight,
            Double maxDepth,
            boolean oneSection,
            boolean perimeter,
            Double stockLength) {
        this(
                id,
                location,
                spans,
                overhangLeft,
                overhangRight,
                supports,
                loads,
                section,
                sustainedLive,
                coefficients,
                redistribution,
                unitWeight,
                maxDepth,
                oneSection,
                perimeter,
                stockLength,
                List.of());
    }

    /** As given before the forms were a choice: each span its own section. */
    public LineInput(
            String id,
            Location location,
            List<Double> spans,
            double overhangLeft,
            double overhangRight,
            List<Support> supports,
            List<Load> loads,
            SectionShape section,
            double sustainedLive,
            boolean coefficients,
            List<Double> redistribution,
            double unitWeight,
            Double maxDepth) {
        this(
                id,
                location,
                spans,
                overhangLeft,
                overhangRight,
                supports,
                loads,
                section,
                sustainedLive,
                coefficients,
                redistribution,
                unitWeight,
                maxDepth,
                false,
                false,
                null);
    }

    public LineInput {
        spans = List.copyOf(spans);
        supports = List.copyOf(supports);
        loads = List.copyOf(loads);
        redistribution = List.copyOf(redistribution);
        torques = List.copyOf(torques);
    }

    /** The factored torsion of each span given a torque (supports restraining twist, 5.3.1's envelope). */
    public List<TorqueEnvelope.SpanTorsion> torsion() {
        return TorqueEnvelope.of(spans, supports, torques);
    }

    /** The line under another headroom cap for its whole depth (null for none). */
    public LineInput withMaxDepth(Double cap) {
        return new LineInput(
                id,
                location,
                spans,
                overhangLeft,
                overhangRight,
                supports,
                loads,
                section,
                sustainedLive,
                coefficients,
                redistribution,
                unitWeight,
                cap,
                oneSection,
                perimeter,
                stockLength,
                torques);
    }

    /** The web's own weight per length, N/mm (gross concrete section, flange counted as given in the section). */
    public double selfWeight(SectionShape shape) {
        return unitWeight * shape.grossArea();
    }

    /**
     * The line ready for analysis with a section: its own weight added as dead load on every segment,
     * the beam's stiffness of Table 6.6.3.1.1, and d taken for the shears at d from the faces.
     */
    public Line toLine(SectionShape shape, double ec, double d) {
        List<SectionShape> all = new ArrayList<>();
        for (int s = 0; s < spans.size() + 2; s++) {
            all.add(shape);
        }
        return toLine(all, ec, d);
    }

    /** As above with a section per segment (left overhang, spans, right overhang). */
    public Line toLine(List<SectionShape> shapes, double ec, double d) {
        return toLine(shapes, ec, d, redistribution);
    }

    /** As above with the redistribution per support given (percent). */
    public Line toLine(List<SectionShape> shapes, double ec, double d, List<Double> redistributionUsed) {
        List<Load> all = new ArrayList<>(loads);
        int segments = spans.size() + 2;
        List<Double> ei = new ArrayList<>();
        for (int s = 0; s < segments; s++) {
            double len = s == 0 ? overhangLeft : s == segments - 1 ? overhangRight : spans.get(s - 1);
            if (len > 0) {
                all.add(Load.uniform(s, 0, len, selfWeight(shapes.get(s)), 0));
            }
            if (s >= 1 && s < segments - 1) {
                ei.add(Stiffness.beamEI(ec, shapes.get(s)));
            }
        }
        return new Line(
                id,
                spans,
                overhangLeft,
                overhangRight,
                supports,
                all,
                ei,
                ec,
                d,
                coefficients ? null : redistributionUsed);
    }
}
