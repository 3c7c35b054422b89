package barfit.bench;

import barfit.section.LoadCombinations;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;

/**
 * Invented beam schedules of any size, from a seed: floors of continuous beam lines on a grid, each
 * line's end spans continuous at one end and interior spans at both, a few simple spans and
 * cantilevers; factored moments and shears from the ACI 318-19 approximate coefficients (6.5) of
 * invented gravity loads, service loads for deflection, a slab flange on interior lines, some depths
 * capped under services, and groups naming the same beam on typical floors. SI units (m, kN, kN·m,
 * kN/m). The data are invented for benchmarks and demonstrations only.
 */
public final class ScheduleGenerator {
    private ScheduleGenerator() {}

    public static final String HEADER = "id,span,ends,m_left,m_mid,m_right,v_left,v_right,max_depth,group,"
            + "flange_width,flange_thickness,dead,live";

    /** The settings file that goes with the generated beams (the rationalise block optional). */
    public static String settings(String title, String rationalise) {
        return "# " + title + "\n"
                + "# Invented data, generated for demonstration; not a real building.\n"
                + "units: SI\n"
                + "concrete: {fc: 28, aggregate: 20}\n"
                + "steel: {fy: 420}\n"
                + "bars: astm-a615m\n"
                + "cover: 40\n"
                + "stirrup: \"10\"\n"
                + "search:\n"
                + "  widths: [250, 300, 350, 400]\n"
                + "  depth: {min: 400, max: 800, step: 25}\n"
                + "  bar_sizes: [\"16\", \"19\", \"22\", \"25\", \"29\", \"32\", \"36\"]\n"
                + "  max_layers: 2\n"
                + "  max_bar_sizes_per_beam: 2\n"
                + "  stirrups: {sizes: [\"10\"], legs: [2, 4], spacing: {min: 75, max: 600, step: 25}}\n"
                + "costs:                 # invented rates\n"
                + "  concrete_per_m3: 150\n"
                + "  main_bars_per_kg: 1.5\n"
                + "  stirrups_per_kg: 2.0\n"
                + "  formwork_per_m2: 40\n"
                + "  lap_factor: 1.05\n"
                + (rationalise == null ? "" : rationalise);
    }

    /** One beam line of the typical floor: its spans, whether interior (flanged), its cap and cantilever. */
    private record Line(double[] spans, boolean interior, double tributary, Double cap, Double cantilever) {}

    /**
     * {@code count} beams as CSV rows after the header. The building has typical floors of eight beam lines
     * each (spans, caps and tributary widths repeat floor to floor, loads vary with the floor's use) and a
     * lighter roof every third floor; a beam's group is its line and span, so the same beam on every
     * typical floor can be made to share one section size.
     */
    public static String csv(int count, long seed) {
        Random r = new Random(seed);
        List<Line> typical = new ArrayList<>();
        for (int i = 0; i < 8; i++) {
            int spans = r.nextInt(7) == 0 ? 1 : 2 + r.nextInt(4);
            // 6.5.1: adjacent spans within 20 % of each other, so the approximate coefficients apply
            double[] ln = new double[spans];
            double base = 5.4 + 0.6 * r.nextInt(6);
            for (int s = 0; s < spans; s++) {
                ln[s] = base * (0.9 + 0.05 * r.nextInt(5));
            }
            boolean interior = r.nextInt(3) != 0;
            double tributary = interior ? 3.0 + r.nextInt(7) * 0.5 : 1.5 + r.nextInt(4) * 0.5;
            Double cap = r.nextInt(5) == 0 ? 500.0 + 50 * r.nextInt(4) : null;
            Double cantilever = r.nextInt(8) == 0 ? 1.5 + 0.3 * r.nextInt(5) : null;
            typical.add(new Line(ln, interior, tributary, cap, cantilever));
        }
        StringBuilder out = new StringBuilder(HEADER).append('\n');
        int made = 0;
        for (int floor = 1; made < count; floor++) {
            boolean roof = floor % 3 == 0;
            double liveArea = roof ? 1.0 : new double[] {2.4, 3.0, 4.8, 7.2}[r.nextInt(4)]; // kPa, the floor's use
            double deadArea = roof ? 4.0 : 4.8 + r.nextInt(3) * 0.4; // kPa: slab, finishes, services
            for (int li = 0; li < typical.size() && made < count; li++) {
                Line line = typical.get(li);
                double dead = deadArea * line.tributary() + 6.0; // kN/m, with a first guess of the web's weight
                double live = liveArea * line.tributary();
                double wu = LoadCombinations.factored(dead, live);
                int spans = line.spans().length;
                String groupBase = "L" + (li + 1) + (roof ? "R" : "");
                for (int s = 1; s <= spans && made < count; s++) {
                    double ln = line.spans()[s - 1];
                    String ends;
                    Double ml = null;
                    Double mm;
                    Double mr = null;
                    double vl = wu * ln / 2;
                    double vr = wu * ln / 2;
                    if (spans == 1) {
                        ends = "simple";
                        mm = wu * ln * ln / 8;
                    } else if (s == 1) {
                        ends = "one-end-continuous";
                        mm = wu * ln * ln / 14; // 6.5.2: end span, discontinuous end integral with support
                        mr = -wu * ln * ln / (spans == 2 ? 9 : 10);
                        vr *= 1.15; // 6.5.4: face of the first interior support
                    } else if (s == spans) {
                        ends = "one-end-continuous";
                        mm = wu * ln * ln / 14;
                        ml = -wu * ln * ln / (spans == 2 ? 9 : 10);
                        vl *= 1.15;
                    } else {
                        ends = "both-ends-continuous";
                        mm = wu * ln * ln / 16;
                        ml = -wu * ln * ln / (s == 2 ? 10 : 11);
                        mr = -wu * ln * ln / (s == spans - 1 ? 10 : 11);
                    }
                    double d = 0.45; // shears at d from the face
                    vl = Math.max(0, vl - wu * d);
                    vr = Math.max(0, vr - wu * d);
                    String id = "F" + floor + "-L" + (li + 1) + "-S" + s;
                    row(
                            out,
                            id,
                            ln,
                            ends,
                            ml,
                            mm,
                            mr,
                            vl,
                            vr,
                            line.cap(),
                            groupBase + "-S" + s,
                            line.interior(),
                            dead,
                            live,
                            ln);
                    made++;
                }
                if (line.cantilever() != null && made < count) {
                    double ln = line.cantilever();
                    String id = "F" + floor + "-L" + (li + 1) + "-C";
                    row(
                            out,
                            id,
                            ln,
                            "cantilever",
                            -wu * ln * ln / 2,
                            null,
                            null,
                            Math.max(0, wu * (ln - 0.45)),
                            null,
                            null,
                            groupBase + "-C",
                            false,
                            dead,
                            live,
                            ln);
                    made++;
                }
            }
        }
        return out.toString();
    }

    private static void row(
            StringBuilder out,
            String id,
            double span,
            String ends,
            Double ml,
            Double mm,
            Double mr,
            Double vl,
            Double vr,
            Double cap,
            String group,
            boolean flange,
            double dead,
            double live,
            double ln) {
        out.append(id)
                .append(',')
                .append(f(span, 2))
                .append(',')
                .append(ends)
                .append(',')
                .append(f(ml, 1))
                .append(',')
                .append(f(mm, 1))
                .append(',')
                .append(f(mr, 1))
                .append(',')
                .append(f(vl, 1))
                .append(',')
                .append(f(vr, 1))
                .append(',')
                .append(f(cap, 0))
                .append(',')
                .append(group == null ? "" : group)
                .append(',');
        if (flange) {
            double bf = Math.min(ln * 1000 / 4, 300 + 16 * 150); // 6.3.2.1, with a 300 mm web assumed
            out.append(f(Math.floor(bf / 50) * 50, 0)).append(",150,");
        } else {
            out.append(",,");
        }
        out.append(f(dead, 1)).append(',').append(f(live, 1)).append('\n');
    }

    private static String f(Double v, int places) {
        return v == null ? "" : String.format(Locale.ROOT, "%." + places + "f", v);
    }
}
