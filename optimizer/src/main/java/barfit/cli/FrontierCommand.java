package barfit.cli;

import barfit.catalogs.Echo;
import barfit.catalogs.InputError;
import barfit.catalogs.yaml.Location;
import barfit.design.SolverOptions;
import barfit.design.section.SectionFrontier;
import barfit.input.DesignBeam;
import barfit.input.DesignInput;
import barfit.input.DesignInputReader;
import barfit.report.FrontierPlot;
import barfit.report.FrontierReport;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
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
        name = "frontier",
        mixinStandardHelpOptions = true,
        description = "For each single-section beam in FILE (or the one --beam names), the designs no other is both "
                + "cheaper than and lower in embodied carbon than, from the cheapest to the lowest-carbon; each "
                + "is the proven-cheapest design within its own carbon. A table, JSON or an SVG plot.%n"
                + "Exit code 0 when every beam has a design, 1 when one has none, 2 for bad input.")
final class FrontierCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "YAML input (see examples/design/)")
    Path file;

    @CommandLine.Mixin
    SolverFlags solver;

    @Option(names = "--format", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE})")
    OutputFormat format;

    @Option(names = "--beam", paramLabel = "ID", description = "only this beam")
    String beam;

    @Option(
            names = "--plot",
            paramLabel = "FILE.svg",
            description = "write the frontier of the one beam (--beam) as an SVG chart: cost against carbon")
    Path plot;

    @Option(names = "--force", description = "with --plot: overwrite the plot file if it exists")
    boolean force;

    @Override
    public Integer call() throws java.io.IOException {
        if (force && plot == null) {
            throw OptionError.of("--force", "overwrites the --plot file; expected --plot FILE.svg with it");
        }
        SolverOptions options = solver.options();
        DesignInput input = DesignInputReader.read(file, false);
        List<DesignBeam> beams = input.beams();
        if (beams.isEmpty()) {
            throw new InputError(Location.ofFile(file.toString()), "has no beams:; expected at least one");
        }
        if (beam != null) {
            beams = beams.stream().filter(b -> b.id().equals(beam)).toList();
            if (beams.isEmpty()) {
                throw OptionError.of(
                        "--beam",
                        "no beam " + Echo.cut(beam) + " in " + file + "; expected one of: "
                                + String.join(
                                        ", ",
                                        input.beams().stream()
                                                .map(DesignBeam::id)
                                                .toList()));
            }
        }
        List<String> whole =
                beams.stream().filter(DesignBeam::isWhole).map(DesignBeam::id).toList();
        if (!whole.isEmpty()) {
            throw OptionError.of(
                    beam == null ? "FILE" : "--beam",
                    "the frontier is of single sections so far; " + String.join(", ", whole)
                            + (whole.size() == 1 ? " is a whole span" : " are whole spans")
                            + ": choose a single section with --beam");
        }
        if (plot != null) {
            if (beams.size() != 1) {
                throw OptionError.of(
                        "--plot",
                        "a plot shows one beam; expected --beam ID with --plot (the file has " + beams.size()
                                + " beams)");
            }
            SweepCommand.checkPlotFile(plot, force);
        }
        List<SectionFrontier.Result> results = new ArrayList<>();
        for (DesignBeam b : beams) {
            results.add(SectionFrontier.of(DesignCommand.problem(input, b), input.costModel(), options));
        }
        var settings = input.settings();
        if (plot != null) {
            Files.writeString(
                    plot, FrontierPlot.svg(results.get(0), settings.units(), input.currency()), StandardCharsets.UTF_8);
        }
        String text = format == OutputFormat.json
                ? FrontierReport.json(settings, results, input.currency())
                : FrontierReport.text(settings, results, input.currency());
        spec.commandLine().getOut().print(text);
        spec.commandLine().getOut().flush();
        return results.stream().allMatch(r -> !r.points().isEmpty()) ? Main.OK : Main.FAILED;
    }
}
