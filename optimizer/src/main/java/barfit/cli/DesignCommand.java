package barfit.cli;

import barfit.catalogs.Echo;
import barfit.catalogs.InputError;
import barfit.catalogs.yaml.Location;
import barfit.design.SolverOptions;
import barfit.design.line.LineCapacity;
import barfit.design.section.SectionProblem;
import barfit.design.span.SpanProblem;
import barfit.input.DesignBeam;
import barfit.input.DesignInput;
import barfit.input.DesignInputReader;
import barfit.input.LineInput;
import barfit.input.LinesReader;
import barfit.report.Carbon;
import barfit.report.DesignItem;
import barfit.report.DesignJson;
import barfit.report.DesignText;
import barfit.report.ElevationSvg;
import barfit.report.EnvelopePlot;
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
        name = "design",
        mixinStandardHelpOptions = true,
        description = "Find, for every beam in FILE, the cheapest layout in the search space that passes every "
                + "check of the section model, with CP-SAT's proof, what binds and the cost broken down.%n"
                + "Exit code 0 when every beam has a passing layout, 1 when one has none, 2 for bad input.")
final class DesignCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "YAML input (see examples/design/)")
    Path file;

    @CommandLine.Mixin
    SolverFlags solver;

    @CommandLine.Mixin
    ObjectiveFlag objective;

    @Option(names = "--format", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE})")
    OutputFormat format;

    @Option(names = "--beam", paramLabel = "ID", description = "design only this beam")
    String beam;

    @Option(
            names = "--alternatives",
            paramLabel = "N",
            defaultValue = "0",
            description = "also show the N next-cheapest distinct designs (default: ${DEFAULT-VALUE})")
    int alternatives;

    @Option(
            names = "--trail",
            negatable = true,
            defaultValue = "false",
            description = "add the checks table and calculation trail of each chosen layout")
    boolean trail;

    @Option(
            names = "--plot",
            paramLabel = "DIR",
            description = "write each line's moment envelope with the φMn of its bars as designed "
                    + "(<id>-capacity.svg) and the elevation of its bars as detailed (<id>-elevation.svg) into DIR "
                    + "(created if missing; existing plots are kept unless --force)")
    Path plot;

    @Option(
            names = "--carbon-cap",
            paramLabel = "X",
            description = "the cheapest design whose embodied carbon is at most X kg CO2e per m of beam (lb CO2e per "
                    + "ft in inch-pound files), proven; single sections and whole spans (not lines)")
    Double carbonCap;

    @Option(names = "--force", description = "replace plot files that exist")
    boolean force;

    @Override
    public Integer call() throws java.io.IOException {
        if (alternatives < 0 || alternatives > 20) {
            throw OptionError.of("--alternatives", "expected 0 to 20, got " + alternatives);
        }
        if (force && plot == null) {
            throw OptionError.of("--force", "has nothing to replace without --plot DIR");
        }
        SolverOptions options = solver.options();
        DesignInput input = DesignInputReader.read(file, false);
        List<LineInput> lines = LinesReader.read(DesignInputReader.document(file), input.settings());
        if (input.beams().isEmpty() && lines.isEmpty()) {
            throw new InputError(
                    Location.ofFile(file.toString()), "has no beams: and no lines:; expected at least one");
        }
        List<DesignBeam> beams = input.beams();
        if (beam != null) {
            beams = beams.stream().filter(b -> b.id().equals(beam)).toList();
            lines = lines.stream().filter(l -> l.id().equals(beam)).toList();
            if (beams.isEmpty() && lines.isEmpty()) {
                List<String> ids = new ArrayList<>(
                        input.beams().stream().map(DesignBeam::id).toList());
                LinesReader.read(DesignInputReader.document(file), input.settings())
                        .forEach(l -> ids.add(l.id()));
                throw OptionError.of(
                        "--beam",
                        "no beam or line " + Echo.cut(beam) + " in " + file + "; expected one of: "
                                + String.join(", ", ids));
            }
        }
        var settings = input.settings();
        Double capPerMetre = null;
        if (carbonCap != null) {
            if (!(carbonCap > 0) || Double.isInfinite(carbonCap)) {
                throw OptionError.of("--carbon-cap", "expected a positive carbon per length, got " + carbonCap);
            }
            List<String> lineIds = lines.stream().map(LineInput::id).toList();
            if (!lineIds.isEmpty()) {
                throw OptionError.of(
                        "--carbon-cap",
                        "applies to single sections and whole spans; " + String.join(", ", lineIds)
                                + (lineIds.size() == 1 ? " is a line" : " are lines")
                                + ": choose a beam with --beam, or see barfit frontier for a line's spans in a "
                                + "schedule");
            }
            capPerMetre = Carbon.perMetreFromUser(carbonCap, settings.units());
        }
        List<String> lineIds = lines.stream().map(LineInput::id).toList();
        List<Path> plots = plot == null ? List.of() : PlotFolder.targets(plot, lineIds, "-capacity.svg", force);
        List<Path> elevations = plot == null ? List.of() : PlotFolder.targets(plot, lineIds, "-elevation.svg", force);
        DesignRun.Result run =
                DesignRun.run(input, beams, lines, options, alternatives, trail, objective.objective(), capPerMetre);
        List<DesignItem> outcomes = run.items();
        if (plot != null) {
            for (int k = 0; k < run.lines().size(); k++) {
                DesignRun.Line l = run.lines().get(k);
                var capacity = LineCapacity.of(l.result());
                if (capacity != null) {
                    Files.createDirectories(plot);
                    Files.writeString(
                            plots.get(k),
                            EnvelopePlot.capacitySvg(
                                    l.result().analysis(), capacity, l.input().id(), settings.units()),
                            StandardCharsets.UTF_8);
                }
                if (l.detail() != null) {
                    Files.createDirectories(plot);
                    Files.writeString(
                            elevations.get(k),
                            ElevationSvg.svg(l.detail(), l.result(), settings.units()),
                            StandardCharsets.UTF_8);
                }
            }
        }
        String text = format == OutputFormat.json
                ? DesignJson.render(settings, outcomes, input.currency(), trail, objective.objective(), carbonCap)
                : DesignText.render(settings, outcomes, input.currency(), trail, objective.objective(), carbonCap);
        spec.commandLine().getOut().print(text);
        spec.commandLine().getOut().flush();
        return run.feasible() ? Main.OK : Main.FAILED;
    }

    static SpanProblem span(DesignInput in, DesignBeam b) {
        return barfit.schedule.Spans.problem(in, b);
    }

    static SectionProblem problem(DesignInput in, DesignBeam b) {
        var s = in.settings();
        double length = b.span() == null ? 1.0 : b.span().length() / 1000.0;
        return new SectionProblem(
                b.id(),
                s.materials(),
                s.detailing(),
                s.code(),
                in.space(),
                b.mu(),
                b.vu(),
                b.span(),
                b.maxDepth(),
                b.width(),
                b.flange(),
                length,
                b.tu(),
                b.compatibilityTorsion());
    }
}
