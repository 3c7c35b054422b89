package barfit.detailing;

import barfit.analysis.Line;
import barfit.analysis.LineResult;
import barfit.design.line.LineSpans;
import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.input.Settings;
import barfit.section.Face;
import barfit.section.Flexure;
import barfit.section.anchorage.BarForce;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The design strength of the bars as detailed along the line, against the envelope at every station of the
 * analysis: at each station the bars present on the tension face, each delivering only the force it has
 * built up from its ends (BarForce: in proportion over ld from a straight end, over ldh from the outside of
 * a hook), and φMn that of the force they can deliver
 * at fy taken as an area of the part's own bars, the section model's φMn of that area (between whole bar
 * counts by straight interpolation, which errs low). Stations inside a support's width are
 * not looked at: sections there are designed at the faces (9.4.2.1).
 */
public final class DetailedCapacity {
    /** A station: x, the envelope (N·mm, sagging +) and the detailed φMn each way (positive). */
    public record Point(double x, double mMax, double mMin, double phiMnSagging, double phiMnHogging) {}

    /** Every station looked at, whether the bars cover the envelope at all, and the worst ratio and where. */
    public record Coverage(List<Point> points, boolean covered, double worstRatio, double worstX) {}

    private DetailedCapacity() {}

    static Coverage check(LineSpans.Result r, List<BarRun> runs, Settings settings) {
        LineResult a = r.analysis();
        Line line = a.line();
        Map<Integer, LineSpans.Part> bySegment = new HashMap<>();
        r.parts().forEach(p -> bySegment.put(p.segment(), p));
        List<BarForce.Bar> top = new ArrayList<>();
        List<BarForce.Bar> bottom = new ArrayList<>();
        for (BarRun run : runs) {
            if (run.what().startsWith("skin")) {
                continue;
            }
            BarForce.Bar b = bar(run, settings);
            (run.face() == Face.TOP ? top : bottom).add(b);
        }
        Map<String, Double> sections = new HashMap<>();
        List<Point> points = new ArrayList<>();
        double worst = 0;
        double worstX = Double.NaN;
        for (LineResult.StationValues s : a.stations()) {
            if (insideSupport(line, s.x())) {
                continue;
            }
            LineSpans.Part part = bySegment.get(s.segment());
            if (part == null) {
                continue;
            }
            double sag = capacity(bottom, s.x(), part, false, sections);
            double hog = capacity(top, s.x(), part, true, sections);
            points.add(new Point(s.x(), s.mMax(), s.mMin(), sag, hog));
            double ratio = Math.max(ratio(Math.max(0, s.mMax()), sag), ratio(Math.max(0, -s.mMin()), hog));
            if (ratio > worst) {
                worst = ratio;
                worstX = s.x();
            }
        }
        return new Coverage(points, worst <= 1 + 1e-6, worst, worstX);
    }

    private static double ratio(double demand, double capacity) {
        if (demand <= 1e-6) {
            return 0;
        }
        return capacity <= 0 ? Double.POSITIVE_INFINITY : demand / capacity;
    }

    private static boolean insideSupport(Line line, double x) {
        for (int j = 0; j <= line.spanCount(); j++) {
            double half = line.supports().get(j).width() / 2;
            if (Math.abs(x - line.supportX(j)) < half - 1e-6) {
                return true;
            }
        }
        return false;
    }

    /** A run as a bar that builds up its force from each end: over ld, or ldh from a hook's outside. */
    static BarForce.Bar bar(BarRun run, Settings settings) {
        double ld = Anchorage.ld(run.bar(), run.face() == Face.TOP, settings);
        double ldh = Anchorage.ldh(run.bar(), settings, Trail.off()).ldh();
        return new BarForce.Bar(
                run.start(),
                run.end(),
                run.count() * run.bar().area(),
                settings.materials().fy(),
                run.hookStart() ? ldh : ld,
                run.hookEnd() ? ldh : ld);
    }

    /** φMn at x of the bars on one face, as built up (N·mm). */
    private static double capacity(
            List<BarForce.Bar> bars, double x, LineSpans.Part part, boolean hogging, Map<String, Double> cache) {
        double full = 0;
        double area = 0;
        for (BarForce.Bar b : bars) {
            if (x >= b.start() - 1e-6 && x <= b.end() + 1e-6) {
                full += b.area() * b.fy();
                area += b.area();
            }
        }
        if (full <= 0 || area <= 0) {
            return 0;
        }
        // the bars' developed force as an area at fy, in the part's own bars (their layers), between whole
        // counts by straight interpolation (φMn is concave in As, so this errs low)
        double developed = BarForce.total(bars, x);
        double fy = bars.get(0).fy();
        SpanLayout l = part.outcome().best().layout();
        double one = (hogging ? l.top() : l.bottom()).area();
        double bars0 = developed / fy / one;
        int n0 = (int) Math.floor(bars0 + 1e-9);
        double frac = bars0 - n0;
        double phi0 = n0 == 0 ? 0 : sectionPhiMn(part, n0 * one, hogging, cache);
        double phi1 = frac <= 1e-9 ? phi0 : sectionPhiMn(part, (n0 + 1) * one, hogging, cache);
        return phi0 + (phi1 - phi0) * frac;
    }

    /**
     * φMn of the part's section with {@code area} of bars on the tension face (as many of the part's bars
     * as make it up, in the layers the design has), by the section model.
     */
    private static double sectionPhiMn(LineSpans.Part part, double area, boolean hogging, Map<String, Double> cache) {
        SpanLayout l = part.outcome().best().layout();
        SpanProblem p = part.problem();
        String key = part.segment() + "|" + hogging + "|" + Math.round(area);
        Double known = cache.get(key);
        if (known != null) {
            return known;
        }
        var stirrups = l.zoneStirrups().get(0);
        double out;
        if (hogging) {
            SpanProblem.Place place =
                    p.leftSupport() ? SpanProblem.Place.LEFT : p.rightSupport() ? SpanProblem.Place.RIGHT : null;
            int count = (int) Math.round(area / l.top().area());
            if (place == null || count < 1) {
                out = 0;
            } else {
                List<Integer> layers = layers(count, l.topAt(p, place));
                SpanLayout with = l.withTop(Math.min(l.topContinuous(), count), layers, layers);
                out = Flexure.analyse(with.section(p, place, stirrups), SpanLayout.bending(p, place))
                        .phiMn();
            }
        } else {
            // the bottom bars run the span whole: the mid-span section, scaled where fewer are present
            var mid = part.outcome().best().report().sections().get(SpanProblem.Place.MID);
            double all = l.bottomCount() * l.bottom().area();
            out = mid == null ? 0 : mid.flexure().phiMn() * Math.min(1, area / all);
        }
        cache.put(key, out);
        return out;
    }

    /** {@code count} bars in layers no fuller than the design's first layer there. */
    private static List<Integer> layers(int count, List<Integer> design) {
        int first = design.isEmpty() ? count : Math.max(design.get(0), 2);
        List<Integer> out = new ArrayList<>();
        int left = count;
        while (left > 0) {
            int k = Math.min(first, left);
            out.add(k);
            left -= k;
        }
        return out;
    }
}
