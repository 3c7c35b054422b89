package barfit.cli;

import barfit.catalogs.Echo;
import barfit.catalogs.InputError;
import barfit.catalogs.yaml.Location;
import barfit.design.SolverOptions;
import barfit.design.section.SectionFrontier;
import barfit.design.span.SpanFrontier;
import barfit.input.DesignBeam;
import barfit.input.DesignInput;
import barfit.input.DesignInputReader;
import barfit.report.FrontierPlot;
import barfit.report.FrontierReport;
import barfit.report.ScheduleFrontierReport;
import barfit.schedule.ScheduleFrontier;
import barfit.schedule.ScheduleInputReader;
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
        description = "For each beam in FILE (or the one --beam names), the designs no other is both cheaper than "
                + "and lower in embodied carbon than, from the cheapest to the lowest-carbon; each is the "
                + "proven-cheapest design within its own carbon (for whole spans, the points a weighted sum of "
                + "cost and carbon reaches). A table, JSON or an SVG plot.%n"
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

    @Option(
            names = "--schedule",
            description = "FILE is a schedule (as barfit schedule reads it): the total cost "
                    + "and carbon of its cost-optimal and carbon-optimal schedules and of schedules between them")
    boolean schedule;

    @Option(names = "--beams", paramLabel = "CSV", description = "with --schedule: read the beams from this CSV file")
    Path beamsCsv;

    @Option(
            names = "--points",
            paramLabel = "N",
            defaultValue = "5",
            description = "with --schedule: at most N schedules between the two ends (default: ${DEFAULT-VALUE})")
    int points;

    @Option(
            names = "--threads",
            paramLabel = "N",
            description = "with --schedule: beams designed in parallel (default: the number of cores)")
    Integer threads;

    @Override
    public Integer call() throws java.io.IOException {
        if (force && plot == null) {
            throw OptionError.of("--force", "overwrites the --plot file; expected --plot FILE.svg with it");
        }
        SolverOptions options = solver.options();
        if (schedule) {
            return schedule(options);
        }
        if (beamsCsv != null) {
            throw OptionError.of("--beams", "belongs to a schedule's frontier; expected --schedule with it");
        }
        if (threads != null) {
            throw OptionError.of("--threads", "belongs to a schedule's frontier; expected --schedule with it");
        }
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
        if (plot != null) {
            if (beams.size() != 1) {
                throw OptionError.of(
                        "--plot",
                        "a plot shows one beam; expected --beam ID with --plot (the file has " + beams.size()
                                + " beams)");
            }
            SweepCommand.checkPlotFile(plot, force);
        }
        var settings = input.settings();
        List<FrontierReport.Entry> results = new ArrayList<>();
        for (DesignBeam b : beams) {
            results.add(
                    b.isWhole()
                            ? FrontierReport.entry(
                                    SpanFrontier.of(DesignCommand.span(input, b), input.costModel(), options),
                                    settings.units())
                            : FrontierReport.entry(
                                    SectionFrontier.of(DesignCommand.problem(input, b), input.costModel(), options),
                                    settings.units()));
        }
        if (plot != null) {
            Files.writeString(
                    plot, FrontierPlot.svg(results.get(0), settings.units(), input.currency()), StandardCharsets.UTF_8);
        }
        String text = format == OutputFormat.json
                ? FrontierReport.json(settings, results, input.currency())
                : FrontierReport.text(settings, results, input.currency());
        spec.commandLine().getOut().print(text);
        spec.commandLine().getOut().flush();
        return results.stream().allMatch(r -> !r.rows().isEmpty()) ? Main.OK : Main.FAILED;
    }

    /** {@code --schedule}: the schedule's frontier. */
    private int schedule(SolverOptions options) throws java.io.IOException {
        if (beam != null) {
            throw OptionError.of(
                    "--beam", "picks a beam of a design file; a schedule's frontier is of the whole schedule");
        }
        if (points < 0 || points > 20) {
            throw OptionError.of("--points", "expected 0 to 20, got " + points);
        }
        int nThreads = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
        if (nThreads < 1 || nThreads > 256) {
            throw OptionError.of("--threads", "expected 1 to 256, got " + nThreads);
        }
        if (plot != null) {
            SweepCommand.checkPlotFile(plot, force);
        }
        ScheduleFrontier.Result r = ScheduleFrontier.of(
                pricing -> ScheduleInputReader.read(file, beamsCsv, options, nThreads, pricing),
                options,
                nThreads,
                barfit.schedule.Progress.NONE,
                points);
        if (plot != null && !r.points().isEmpty()) {
            Files.writeString(
                    plot,
                    FrontierPlot.svg(
                            ScheduleFrontierReport.entry(r),
                            r.first().input().settings().units(),
                            r.first().input().currency()),
                    StandardCharsets.UTF_8);
        }
        String text =
                format == OutputFormat.json ? ScheduleFrontierReport.json(r) : ScheduleFrontierReport.text(r, points);
        spec.commandLine().getOut().print(text);
        spec.commandLine().getOut().flush();
        return r.points().isEmpty() ? Main.FAILED : Main.OK;
    }
}
