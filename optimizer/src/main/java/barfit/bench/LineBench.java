package barfit.bench;

import barfit.analysis.Column;
import barfit.analysis.Line;
import barfit.analysis.LineAnalysis;
import barfit.analysis.Load;
import barfit.analysis.Stiffness;
import barfit.analysis.Support;
import barfit.analysis.SupportKind;
import barfit.section.SectionShape;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Times the analysis of an invented six-span line on columns above and below every support, with a
 * point load and a partial load, every arrangement, 50 stations per span: the median of many runs after
 * a warm-up, in this process.
 */
public final class LineBench {
    /** Wall-clock and thread CPU time per analysis (CPU time is what a loaded machine does not inflate). */
    public record Figures(
            int runs, double msMedian, double msMax, double cpuMsMedian, int arrangements, int stations) {}

    private LineBench() {}

    public static Line sixSpans() {
        List<Double> spans = List.of(7200.0, 8400.0, 7200.0, 8400.0, 7200.0, 6000.0);
        Column c = new Column(450, 450, 4000);
        List<Support> sup = new ArrayList<>();
        for (int j = 0; j <= spans.size(); j++) {
            sup.add(new Support(450, SupportKind.COLUMN, c, j == spans.size() ? null : c));
        }
        List<Load> loads = new ArrayList<>();
        for (int s = 1; s <= spans.size(); s++) {
            loads.add(Load.uniform(s, 0, spans.get(s - 1), 26, 14));
        }
        double kN = 1000; // invented loads in kN and lengths in m, converted to N and mm
        double m = 1000;
        loads.add(Load.point(2, 3 * m, 60 * kN, 30 * kN));
        loads.add(Load.uniform(5, 0, 2.5 * m, 10, 0));
        double ec = barfit.section.Deflection.ec(
                new barfit.section.Materials(30, 420, 420, 20, 1.0), barfit.section.CodeEquations.SI);
        return new Line(
                "bench",
                spans,
                0,
                2200,
                sup,
                loads,
                Stiffness.beamEI(ec, SectionShape.rectangular(300, 600)),
                ec,
                540,
                null);
    }

    public static Figures run(int runs) {
        Line line = sixSpans();
        for (int i = 0; i < 50; i++) {
            LineAnalysis.analyse(line, 50);
        }
        double[] ms = new double[runs];
        double[] cpu = new double[runs];
        var bean = java.lang.management.ManagementFactory.getThreadMXBean();
        int arrangements = 0;
        int stations = 0;
        for (int i = 0; i < runs; i++) {
            long c0 = bean.getCurrentThreadCpuTime();
            long t0 = System.nanoTime();
            var r = LineAnalysis.analyse(line, 50);
            ms[i] = (System.nanoTime() - t0) / 1e6;
            cpu[i] = (bean.getCurrentThreadCpuTime() - c0) / 1e6;
            arrangements = r.arrangements().size();
            stations = r.stations().size();
        }
        Arrays.sort(ms);
        Arrays.sort(cpu);
        return new Figures(runs, ms[runs / 2], ms[runs - 1], cpu[runs / 2], arrangements, stations);
    }
}
