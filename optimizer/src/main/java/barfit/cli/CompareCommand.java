package barfit.cli;

import barfit.catalogs.InputError;
import barfit.catalogs.yaml.Location;
import barfit.design.SolverOptions;
import barfit.input.DesignInput;
import barfit.report.StudyJson;
import barfit.report.StudySay;
import barfit.report.StudyText;
import barfit.section.trail.Dim;
import barfit.study.Compare;
import barfit.study.Say;
import barfit.study.Target;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

@Command(
        name = "compare",
        mixinStandardHelpOptions = true,
        description = "Price 'deepen or add compression steel' for each beam under its headroom cap: the cheapest "
                + "design at the cap, with the cap lifted, at the shallowest depth needing no compression steel, wider, "
                + "and with stronger concrete, side by side, with a recommendation.%n"
                + "Exit code 0 when the beams have a passing option, 1 when one has none, 2 for bad input.")
final class CompareCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "YAML input of barfit design (see examples/studies/)")
    Path file;

    @CommandLine.Mixin
    SolverFlags solver;

    @CommandLine.Mixin
    ObjectiveFlag objective;

    @Option(names = "--beam", paramLabel = "ID", description = "study only this beam")
    String beam;

    @Option(
            names = "--cap",
            paramLabel = "DEPTH",
            description = "headroom cap to study (mm or in; default: the beam's max_depth)")
    Double cap;

    @Option(
            names = "--max-width",
            paramLabel = "WIDTH",
            description = "widest web for the widen option, from one "
                    + "width step beyond the search's widest to 5 times it (default: two width steps beyond)")
    Double maxWidth;

    @Option(
            names = "--fc",
            paramLabel = "FC",
            split = ",",
            description = "concrete strengths to try (MPa or psi), e.g. 35,40")
    List<Double> fcs;

    @Option(names = "--format", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE})")
    OutputFormat format;

    @Override
    public Integer call() {
        DesignInput in = Studies.input(file);
        var u = in.settings().units();
        SolverOptions options = solver.options();
        Double capMm = cap == null ? null : Studies.depthWithinSearch(in, "--cap", cap);
        List<Double> widths = in.space().widths();
        double widest = widths.get(widths.size() - 1);
        double step = Compare.widthStep(widths, u == barfit.units.UnitSystem.US ? 50.8 : 50);
        double maxW = maxWidth == null ? widest + 2 * step : u.toSI(maxWidth, Dim.LENGTH);
        double widestAllowed = 5 * widest;
        if (maxWidth != null && !(maxW >= widest + step - 1e-6 && maxW <= widestAllowed + 1e-6)) {
            throw OptionError.of(
                    "--max-width",
                    "expected a width from "
                            + u.compact(widest + step, Dim.LENGTH) + " " + u.unit(Dim.LENGTH) + " (one width step of "
                            + u.compact(step, Dim.LENGTH)
                            + " beyond the search's widest, " + u.compact(widest, Dim.LENGTH) + ") to "
                            + u.compact(widestAllowed, Dim.LENGTH) + " " + u.unit(Dim.LENGTH)
                            + " (5 times the widest), got "
                            + Studies.fmt(maxWidth));
        }
        List<Double> fcMpa = new ArrayList<>();
        List<Double> asked = fcs;
        if (asked == null) {
            asked = new ArrayList<>();
            double[] grades =
                    u == barfit.units.UnitSystem.US ? new double[] {5000, 6000, 8000} : new double[] {35, 40, 50};
            for (double g : grades) {
                if (u.toSI(g, Dim.STRESS) > in.settings().materials().fc() + 1e-6) {
                    asked.add(g);
                }
            }
        }
        String byKey =
                "costs." + (u == barfit.units.UnitSystem.US ? "concrete_per_yd3_by_fc" : "concrete_per_m3_by_fc");
        for (double v : asked) {
            double mpa = u.toSI(v, Dim.STRESS);
            double lo = u.limit(barfit.section.MaterialLimits.fcMin(u.code()), Dim.STRESS);
            double hi = u.limit(barfit.section.MaterialLimits.fcMax(u.code()), Dim.STRESS);
            if (!(v >= lo && v <= hi)) {
                throw OptionError.of(
                        "--fc",
                        "expected f'c between " + Studies.fmt(lo) + " and " + Studies.fmt(hi) + " " + u.unit(Dim.STRESS)
                                + ", got " + Studies.fmt(v));
            }
            if (Double.isNaN(in.costs().concreteAt(mpa))) {
                String grade = Studies.fmt(v) + " " + u.unit(Dim.STRESS);
                if (fcs != null) {
                    throw OptionError.of(
                            "--fc",
                            "no concrete rate for f'c = " + grade + "; expected it within the grades of " + byKey);
                }
                // the grade is one compare tries by default: the rate table in the file does not reach it
                Location at = in.costs().concreteByFcAt() != null
                        ? in.costs().concreteByFcAt()
                        : Location.ofFile(file.toString());
                throw new InputError(
                        at,
                        byKey + ": no rate for f'c = " + grade + ", a grade compare tries by default "
                                + "(those of "
                                + String.join(
                                        ", ", asked.stream().map(Studies::fmt).toList()) + " "
                                + u.unit(Dim.STRESS)
                                + " above the file's f'c); expected a rate for it, or --fc with grades "
                                + "the table covers");
            }
            fcMpa.add(mpa);
        }
        Say say = new StudySay(u);
        List<Target> targets = Studies.targets(in, beam, file, options, say);
        List<Compare.Result> results = new ArrayList<>();
        List<Boolean> perBeam = new ArrayList<>();
        for (Target t : targets) {
            results.add(Compare.run(
                    t,
                    capMm,
                    maxW,
                    step,
                    fcMpa,
                    Studies.model(in, objective.objective()),
                    fc -> Studies.modelAtFc(in, fc, objective.objective()),
                    say));
            perBeam.add(t.costPerBeam());
        }
        String text = format == OutputFormat.json
                ? StudyJson.compare(in.settings(), results, perBeam)
                : StudyText.compare(in.settings(), results, perBeam, in.currency());
        spec.commandLine().getOut().print(text);
        spec.commandLine().getOut().flush();
        return results.stream().allMatch(r -> r.recommended() != null) ? Main.OK : Main.FAILED;
    }
}
