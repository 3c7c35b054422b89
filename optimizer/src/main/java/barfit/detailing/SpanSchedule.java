package barfit.detailing;

import barfit.design.span.SpanLayout;
import java.util.ArrayList;
import java.util.List;

/**
 * The bending schedule of a whole span designed alone: its bar list as cut. A span given alone has no
 * supports in the model (no widths, no column to hook into), so its longitudinal bars are listed straight
 * at the lengths the design gives them, face to face; a line's parts are detailed with their supports
 * ({@link LineDetail}). Hoops and crossties as the design sizes them.
 */
public final class SpanSchedule {
    private SpanSchedule() {}

    public static List<ScheduleRow> of(List<SpanLayout.BarMark> bars, barfit.section.CodeEquations code) {
        List<ScheduleRow> out = new ArrayList<>();
        for (SpanLayout.BarMark m : bars) {
            BarShape shape = m.role() == SpanLayout.Role.HOOPS
                    ? BarShape.HOOP
                    : m.role() == SpanLayout.Role.CROSSTIES ? BarShape.CROSSTIE : BarShape.STRAIGHT;
            double cut = CutLengths.roundUp(m.length(), code);
            out.add(new ScheduleRow(
                    m.mark(),
                    shape,
                    m.bar(),
                    m.count(),
                    cut,
                    CutLengths.mass(m.bar(), m.count(), cut),
                    shape == BarShape.STRAIGHT ? cut : 0,
                    0,
                    m.role().name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ')));
        }
        return out;
    }
}
