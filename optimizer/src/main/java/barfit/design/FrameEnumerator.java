package barfit.design;

import barfit.catalogs.BarSize;
import barfit.section.BarSpacing;
import barfit.section.Detailing;
import barfit.section.Flange;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * The frames a search tries: every width, height and stirrup size of its space, width outermost and
 * stirrup size innermost. Left out: a height no deeper than the flange, and a web with no room for the
 * smallest main bar of the space between its stirrup legs ({@link BarSpacing#roomFor}). The section and
 * span generators and their exhaustive oracles all take their frames from here, so they agree on what a
 * frame is.
 */
public final class FrameEnumerator {
    private FrameEnumerator() {}

    /** One cell of the width × height × stirrup size grid, with the detailing its stirrup bar sets. */
    public record Cell(double width, double height, BarSize stirrupBar, Detailing detailing) {}

    /**
     * @param detailing the input's cover, layer gap and exposure; each cell takes its own stirrup bar
     */
    public static List<Cell> cells(
            List<Double> widths, List<Double> depths, Flange flange, SearchSpace space, Detailing detailing) {
        BarSize smallest = space.barSizes().stream()
                .min(Comparator.comparingDouble(BarSize::diameter))
                .orElseThrow();
        List<Cell> out = new ArrayList<>();
        for (double width : widths) {
            for (double height : depths) {
                if (flange != null && height <= flange.thickness()) {
                    continue;
                }
                for (BarSize stirrupBar : space.stirrupSizes()) {
                    Detailing det =
                            new Detailing(detailing.cover(), stirrupBar, detailing.layerGap(), detailing.exposure());
                    if (BarSpacing.roomFor(width, det, smallest)) {
                        out.add(new Cell(width, height, stirrupBar, det));
                    }
                }
            }
        }
        return out;
    }
}
