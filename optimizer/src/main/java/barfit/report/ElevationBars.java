package barfit.report;

import barfit.detailing.BarRun;
import barfit.detailing.BarShape;
import barfit.detailing.LineDetail;
import barfit.detailing.ScheduleRow;
import barfit.section.Face;
import barfit.section.trail.Dim;
import barfit.units.UnitSystem;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * The bars of an elevation: each run on a track of its face (runs that would touch go on further tracks
 * inwards), its stock pieces drawn a little apart where they lap, its hooks as legs into the section, its
 * label on the track's row; the cut-off points on a row above (top bars) and below (bottom bars) the beam;
 * the stirrups of each zone with their zone's boundaries and label.
 */
final class ElevationBars {
    /** px from a face to its first track, and between tracks. */
    static final double FIRST = 9;

    static final double STEP = 19;
    /** px a track's label row takes past its line. */
    static final double LABEL = 15;
    /** px between runs on one track, and a hook's offset per track. */
    private static final double CLEAR = 14;

    private static final double HOOK_OFFSET = 4;
    /** px the stock pieces of a lapped run are drawn apart. */
    private static final double LAP_APART = 2.2;

    private ElevationBars() {}

    enum Band {
        TOP,
        BOTTOM,
        SKIN
    }

    /** A run and where it is drawn: its band and its track (0 nearest the face). */
    record Placed(BarRun run, Band band, int track) {}

    /** Each run on the first track of its band it does not touch, in the order given. */
    static List<Placed> place(List<BarRun> runs, double sx) {
        List<Placed> out = new ArrayList<>();
        double clear = CLEAR / sx;
        for (BarRun r : runs) {
            Band band = r.what().startsWith("skin") ? Band.SKIN : r.face() == Face.TOP ? Band.TOP : Band.BOTTOM;
            int track = 0;
            while (true) {
                final int t = track;
                boolean free = out.stream()
                        .filter(p -> p.band() == band && p.track() == t)
                        .allMatch(p -> r.start() > p.run().end() + clear
                                || r.end() < p.run().start() - clear);
                if (free) {
                    break;
                }
                track++;
            }
            out.add(new Placed(r, band, track));
        }
        return out;
    }

    static int tracks(List<Placed> placed, Band band) {
        return placed.stream()
                .filter(p -> p.band() == band)
                .mapToInt(p -> p.track() + 1)
                .max()
                .orElse(0);
    }

    /** px the tracks and their labels take at the two faces and at mid-depth. */
    static double bandsPx(List<Placed> placed) {
        double px = 0;
        for (Band b : Band.values()) {
            int t = tracks(placed, b);
            px += t == 0 ? 0 : FIRST + (t - 1) * STEP + LABEL;
        }
        return px;
    }

    /** The px y of a run's track (at the depth under its middle). */
    static double y(ElevationSvg.Frame f, Placed p) {
        double mid = (p.run().start() + p.run().end()) / 2;
        return switch (p.band()) {
            case TOP -> f.top() + FIRST + p.track() * STEP;
            case BOTTOM -> f.bottom(mid) - FIRST - p.track() * STEP;
            case SKIN -> (f.top() + f.bottom(mid)) / 2 + (p.track() - 0.5) * STEP;
        };
    }

    private static String cls(Band b) {
        return switch (b) {
            case TOP -> "top-bar";
            case BOTTOM -> "bottom-bar";
            case SKIN -> "skin-bar";
        };
    }

    private static String colour(Band b) {
        return switch (b) {
            case TOP -> "#8e2424";
            case BOTTOM -> "#1a4d80";
            case SKIN -> "#6d4c41";
        };
    }

    /**
     * Every run as one path: its stock pieces (apart by a few px where they lap) and its hooks, a leg of
     * the hook's height at the depth's scale turned into the section; each lap shaded under the bars and
     * marked with its length: a run's own laps, and the overlap of two runs of bottom bars (the spans'
     * bottom bars lapped over a support); the labels of a track spread along its row.
     */
    static void runs(
            ElevationPen pen, ElevationSvg.Frame f, List<Placed> placed, List<ScheduleRow> schedule, UnitSystem u) {
        // labels per row: band and track, in the order along the line
        TreeMap<String, List<Label>> rows = new TreeMap<>();
        for (Placed p : placed) {
            double y = y(f, p);
            for (BarRun.Lap lap : p.run().laps()) {
                lap(pen, f, rows, p, y, y, lap.from(), lap.to(), u);
            }
        }
        for (int i = 0; i < placed.size(); i++) {
            for (int j = i + 1; j < placed.size(); j++) {
                Placed a = placed.get(i);
                Placed b = placed.get(j);
                double from = Math.max(a.run().start(), b.run().start());
                double to = Math.min(a.run().end(), b.run().end());
                if (a.band() == Band.BOTTOM && b.band() == Band.BOTTOM && to - from > 1) {
                    lap(pen, f, rows, a.track() >= b.track() ? a : b, y(f, a), y(f, b), from, to, u);
                }
            }
        }
        for (Placed p : placed) {
            BarRun r = p.run();
            pen.path(
                    path(f, p, schedule),
                    "bar-run",
                    colour(p.band()),
                    2,
                    null,
                    " stroke-linejoin=\"round\" data-what=\"" + ElevationPen.esc(r.what()) + "\"");
            String words = r.count() + " " + r.bar().label() + " " + r.what();
            row(rows, p).add(new Label(f.x((r.start() + r.end()) / 2), words, p, y(f, p)));
        }
        for (List<Label> row : rows.values()) {
            row.sort(Comparator.comparingDouble(Label::x));
            double[] want = new double[row.size()];
            double[] widths = new double[row.size()];
            for (int i = 0; i < row.size(); i++) {
                want[i] = row.get(i).x();
                widths[i] = ElevationPen.width(row.get(i).text(), 10);
            }
            double[] at = ElevationPen.spread(want, widths, 12, f.x(f.xMin()) + 12, f.x(f.xMax()) - 12);
            for (int i = 0; i < row.size(); i++) {
                Label l = row.get(i);
                double ty = l.placed().band() == Band.BOTTOM ? l.y() - 6 : l.y() + 13;
                pen.text(at[i], ty, "middle", cls(l.placed().band()) + " halo", l.text());
            }
        }
    }

    /** The labels' row of a placed run's track. */
    private static List<Label> row(TreeMap<String, List<Label>> rows, Placed p) {
        String key = p.band().ordinal() + "|" + String.format(java.util.Locale.ROOT, "%03d", p.track());
        return rows.computeIfAbsent(key, k -> new ArrayList<>());
    }

    /** A lap from, to (mm) between bars at y1 and y2 (px), shaded, its length on the row of {@code on}. */
    private static void lap(
            ElevationPen pen,
            ElevationSvg.Frame f,
            TreeMap<String, List<Label>> rows,
            Placed on,
            double y1,
            double y2,
            double from,
            double to,
            UnitSystem u) {
        double a = f.x(from);
        double b = f.x(to);
        pen.rect(a, Math.min(y1, y2) - 6, b - a, Math.abs(y1 - y2) + 12, "lap", "#f2c14e", "#b8860b");
        row(rows, on).add(new Label((a + b) / 2, "lap " + u.withUnit(to - from, Dim.SPAN), on, y(f, on)));
    }

    /** A run's path: each stock piece, a little apart from the next where they lap, with its hooks' legs. */
    private static String path(ElevationSvg.Frame f, Placed p, List<ScheduleRow> schedule) {
        BarRun r = p.run();
        double y = y(f, p);
        int down = p.band() == Band.BOTTOM ? -1 : 1; // a hook's leg turns into the section
        double leg = Math.min(hookLeg(r, schedule) * f.vy(), f.depthPx() - 2 * FIRST);
        double offset = p.track() * HOOK_OFFSET + (p.band() == Band.BOTTOM ? HOOK_OFFSET / 2 : 0);
        StringBuilder d = new StringBuilder();
        double from = r.start();
        boolean hook = r.hookStart();
        List<BarRun.Lap> laps = r.laps();
        for (int k = 0; k <= laps.size(); k++) {
            double to = k < laps.size() ? laps.get(k).to() : r.end();
            boolean hookEnd = k == laps.size() && r.hookEnd();
            double py = laps.isEmpty() ? y : y + (k % 2 == 0 ? -LAP_APART : LAP_APART);
            double xa = f.x(from) + (hook ? offset : 0);
            double xb = f.x(to) - (hookEnd ? offset : 0);
            d.append(k == 0 ? "M" : " M").append(ElevationPen.px(xa)).append(' ');
            if (hook) {
                d.append(ElevationPen.px(py + down * leg))
                        .append(" L")
                        .append(ElevationPen.px(xa))
                        .append(' ');
            }
            d.append(ElevationPen.px(py));
            d.append(" L").append(ElevationPen.px(xb)).append(' ').append(ElevationPen.px(py));
            if (hookEnd) {
                d.append(" L").append(ElevationPen.px(xb)).append(' ').append(ElevationPen.px(py + down * leg));
            }
            if (k < laps.size()) {
                from = laps.get(k).from();
            }
            hook = false;
        }
        return d.toString();
    }

    /** A label wanted at x on the row of a placed run whose line is at y. */
    private record Label(double x, String text, Placed placed, double y) {}

    /** A hooked run's leg (mm, out to out) from its bending schedule row; 0 without a hook. */
    private static double hookLeg(BarRun r, List<ScheduleRow> schedule) {
        if (!r.hookStart() && !r.hookEnd()) {
            return 0;
        }
        for (ScheduleRow row : schedule) {
            if (row.where().equals(r.what()) && row.bar().equals(r.bar()) && row.shape() != BarShape.STRAIGHT) {
                return row.b();
            }
        }
        return 0;
    }

    /**
     * The ends of the runs other than the line's first and last bar ends (end cover), as ticks on a row
     * above the beam (top bars) or under the supports (bottom bars), each with its x, the labels spread so
     * that none overlaps and a dotted line down (up) to the bar's end.
     */
    static void cutOffs(ElevationPen pen, ElevationSvg.Frame f, List<Placed> placed, UnitSystem u, double below) {
        double first = placed.stream().mapToDouble(p -> p.run().start()).min().orElse(0);
        double last = placed.stream().mapToDouble(p -> p.run().end()).max().orElse(0);
        for (Band band : new Band[] {Band.TOP, Band.BOTTOM}) {
            TreeMap<Long, Double> ends = new TreeMap<>(); // x in mm (rounded) -> y of the bar's end
            for (Placed p : placed) {
                if (p.band() != band) {
                    continue;
                }
                double y = y(f, p);
                for (double x : new double[] {p.run().start(), p.run().end()}) {
                    if (Math.abs(x - first) > 1 && Math.abs(x - last) > 1) {
                        ends.merge(Math.round(x), y, band == Band.TOP ? Math::max : Math::min);
                    }
                }
            }
            if (ends.isEmpty()) {
                continue;
            }
            boolean top = band == Band.TOP;
            double row = top ? f.top() - ElevationSvg.STUB - 14 : below + 22;
            double[] want = new double[ends.size()];
            double[] widths = new double[ends.size()];
            int i = 0;
            for (long x : ends.keySet()) {
                want[i] = f.x(x);
                widths[i++] = 10;
            }
            double[] at = ElevationPen.spread(want, widths, 1.5, 4, ElevationSvg.WIDTH - 4);
            i = 0;
            for (var e : ends.entrySet()) {
                double x = f.x(e.getKey());
                pen.line(x, row, x, e.getValue(), "cut-leader", "#8a8a8a", 0.6, "1.5 2");
                pen.line(x, row - 4, x, row + 4, "cut-tick", ElevationSvg.INK, 1, null);
                double tx = at[i++];
                double ty = top ? row - 6 : row + 6;
                if (Math.abs(tx - x) > 0.5) {
                    pen.line(x, top ? row - 4 : row + 4, tx, ty, "cut-leader", "#8a8a8a", 0.6, null);
                }
                pen.upright(tx + 3.2, ty, top ? "start" : "end", "cut", u.number(e.getKey(), Dim.SPAN));
            }
            pen.line(f.x(f.xMin()), row, f.x(f.xMax()), row, "cut-row", "#b0b0b0", 0.6, null);
        }
    }

    /**
     * Each stirrup zone: its sets as thin lines across the section, evenly over the zone, its boundaries
     * dashed, and its label (bar × legs @ spacing) between the top and bottom tracks found where it stands,
     * on the first row there where it overlaps no other zone's label.
     */
    static void stirrups(
            ElevationPen pen, ElevationSvg.Frame f, List<LineDetail.Zone> zones, List<Placed> placed, UnitSystem u) {
        TreeSet<Long> bounds = new TreeSet<>();
        for (LineDetail.Zone z : zones) {
            double a = Math.min(z.from(), z.to());
            double b = Math.max(z.from(), z.to());
            int sets = Math.max(1, z.sets());
            for (int k = 0; k < sets; k++) {
                double x = a + (k + 0.5) * (b - a) / sets;
                pen.line(f.x(x), f.top() + 3, f.x(x), f.bottom(x) - 3, "stirrup", "#aab4bd", 0.7, null);
            }
            bounds.add(Math.round(a));
            bounds.add(Math.round(b));
        }
        for (long x : bounds) {
            pen.line(f.x(x), f.top(), f.x(x), f.bottom(x), "zone-bound", "#5c6b7a", 0.8, "4 3");
        }
        List<double[]> taken = new ArrayList<>(); // labels placed: left, right, baseline (px)
        for (LineDetail.Zone z : labelled(zones)) {
            var st = z.stirrups();
            String text = st.bar().label() + " × " + st.legs() + " @ " + u.compact(st.spacing(), Dim.LENGTH);
            double w = ElevationPen.width(text, ZONE_TEXT);
            double mid = (z.from() + z.to()) / 2;
            // centred on its zone, kept within the beam's ends
            double c = Math.max(f.x(f.xMin()) + w / 2 + 3, Math.min(f.x(mid), f.x(f.xMax()) - w / 2 - 3));
            // one row along the line under all the top tracks where the depth allows it, else under those here
            double last = f.bottom(mid) - band(f, placed, Band.BOTTOM, c - w / 2, c + w / 2) - 4;
            double first = f.top() + band(f, placed, Band.TOP, f.x(f.xMin()), f.x(f.xMax())) + 1 + ZONE_ROW;
            if (first > last) {
                first = f.top() + band(f, placed, Band.TOP, c - w / 2, c + w / 2) + 1 + ZONE_ROW;
            }
            // the first free row between the tracks, else the first free one below them
            double y = first;
            for (double at = first; at <= Math.max(last, first) + 3 * ZONE_ROW; at += ZONE_ROW) {
                final double row = at;
                if (taken.stream()
                        .noneMatch(t ->
                                Math.abs(t[2] - row) < ZONE_ROW - 1 && t[0] < c + w / 2 + 6 && t[1] > c - w / 2 - 6)) {
                    y = at;
                    break;
                }
            }
            taken.add(new double[] {c - w / 2, c + w / 2, y});
            pen.text(c, y, "middle", "zone halo", text);
        }
    }

    /**
     * The zones to label, along the line: neighbours of one part with the same stirrups under one label
     * (the boundary between them is still drawn).
     */
    private static List<LineDetail.Zone> labelled(List<LineDetail.Zone> zones) {
        List<LineDetail.Zone> sorted = new ArrayList<>();
        for (LineDetail.Zone z : zones) {
            sorted.add(new LineDetail.Zone(
                    z.part(), Math.min(z.from(), z.to()), Math.max(z.from(), z.to()), z.stirrups(), z.sets()));
        }
        sorted.sort(Comparator.comparingDouble(LineDetail.Zone::from));
        List<LineDetail.Zone> out = new ArrayList<>();
        for (LineDetail.Zone z : sorted) {
            LineDetail.Zone prev = out.isEmpty() ? null : out.get(out.size() - 1);
            if (prev != null
                    && prev.part().equals(z.part())
                    && prev.stirrups().equals(z.stirrups())
                    && Math.abs(prev.to() - z.from()) < 1) {
                out.set(
                        out.size() - 1,
                        new LineDetail.Zone(z.part(), prev.from(), z.to(), z.stirrups(), prev.sets() + z.sets()));
            } else {
                out.add(z);
            }
        }
        return out;
    }

    /** A zone label's font size and row height, px. */
    private static final double ZONE_TEXT = 9.5;

    private static final double ZONE_ROW = 13;

    /**
     * px a face's tracks and their labels take between {@code left} and {@code right} (px along): the
     * tracks of the runs there, each run counted over its label's width where the label is the wider.
     */
    private static double band(ElevationSvg.Frame f, List<Placed> placed, Band band, double left, double right) {
        int tracks = 0;
        for (Placed p : placed) {
            if (p.band() != band) {
                continue;
            }
            double a = f.x(p.run().start());
            double b = f.x(p.run().end());
            double label = ElevationPen.width(
                    p.run().count() + " " + p.run().bar().label() + " "
                            + p.run().what(),
                    10);
            double half = Math.max(b - a, label) / 2 + 6;
            double mid = (a + b) / 2;
            if (mid - half < right && mid + half > left) {
                tracks = Math.max(tracks, p.track() + 1);
            }
        }
        return tracks == 0 ? 0 : FIRST + (tracks - 1) * STEP + LABEL;
    }
}
