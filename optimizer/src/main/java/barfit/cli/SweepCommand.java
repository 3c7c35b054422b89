package barfit.cli;

import barfit.catalogs.InputError;
import barfit.catalogs.yaml.Location;
import barfit.design.SolverOptions;
import barfit.input.DesignInput;
import barfit.report.StudyJson;
import barfit.report.StudySay;
import barfit.report.StudyText;
import barfit.report.SweepPlot;
import barfit.section.trail.Dim;
import barfit.study.Sweep;
import barfit.study.Target;
import java.io.IOException;
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
        name = "sweep",
        mixinStandardHelpOptions = true,
        description = "The cheapest design at every depth cap in a range: the cost–depth frontier, the shallowest cap "
                + "that works, and the cap below which compression steel is needed. A table, CSV, JSON or an SVG plot.%n"
                + "Exit code 0 when some cap in the range works, 1 when none does, 2 for bad input.")
final class SweepCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "YAML input of barfit design")
    Path file;

    @CommandLine.Mixin
    SolverFlags solver;

    @CommandLine.Mixin
    ObjectiveFlag objective;

    @Option(names = "--beam", paramLabel = "ID", description = "sweep only this beam")
    String beam;

    @Option(
            names = "--from",
            paramLabel = "DEPTH",
            description = "shallowest cap (default: the search's shallowest depth)")
    Double from;

    @Option(names = "--to", paramLabel = "DEPTH", description = "deepest cap (default: the search's deepest depth)")
    Double to;

    @Option(names = "--step", paramLabel = "DEPTH", description = "cap step (default: the search's depth step)")
    Double step;

    @Option(names = "--csv", description = "print CSV instead of the table")
    boolean csv;

    @Option(names = "--format", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE})")
    OutputFormat format;

    @Option(
            names = "--plot",
            paramLabel = "FILE.svg",
            description = "also draw cost against depth cap into an SVG file")
    Path plot;

    @Option(names = "--force", description = "with --plot: overwrite the plot file if it exists")
    boolean force;

    /** The plot must go to a new (or, with --force, an existing) file in an existing, writable directory. */
    private void checkPlotFile() {
        checkPlotFile(plot, force);
    }

    /** As above, for any command's {@code --plot FILE.svg}. */
    static void checkPlotFile(Path plot, boolean force) {
        Location at = Location.ofFile(plot.toString());
        Path name = plot.getFileName();
        // the plot is SVG text: a file named .png (or anything else) would hold what its name does not say
        if (name == null || !name.toString().toLowerCase(java.util.Locale.ROOT).endsWith(".svg")) {
            throw new InputError(at, "--plot writes an SVG drawing; expected a file name ending in .svg");
        }
        if (Files.isDirectory(plot)) {
            throw new InputError(at, "is a directory; expected an SVG file name for --plot");
        }
        if (Files.exists(plot) && !force) {
            throw new InputError(at, "the file exists; expected a new file name, or --force to overwrite it");
        }
        Path dir = plot.toAbsolutePath().getParent();
        if (dir == null || !Files.isDirectory(dir)) {
            throw new InputError(at, "its directory does not exist; expected --plot in an existing directory");
        }
        if (!Files.isWritable(dir) || Files.exists(plot) && !Files.isWritable(plot)) {
            throw new InputError(at, "not writable; expected --plot to name a file barfit may write");
        }
    }

    @Override
    public Integer call() {
        if (force && plot == null) {
            throw new CommandLine.ParameterException(
                    spec.commandLine(), "--force: overwrites the --plot file; expected " + "--plot FILE.svg with it");
        }
        DesignInput in = Studies.input(file);
        var u = in.settings().units();
        List<Double> depths = in.space().depths();
        double lo = from == null ? depths.get(0) : Studies.depthWithinSearch(in, "--from", from);
        double hi = to == null ? depths.get(depths.size() - 1) : Studies.depthWithinSearch(in, "--to", to);
        double st = step == null ? (depths.size() > 1 ? depths.get(1) - depths.get(0) : 25) : u.toSI(step, Dim.LENGTH);
        if (step != null && !(step > 0)) {
            throw OptionError.of("--step", "expected a positive step, got " + Studies.fmt(step));
        }
        if (!(hi > lo)) {
            throw OptionError.of("--from/--to", "the range is empty: expected --from below --to");
        }
        if ((hi - lo) / st > 400) {
            throw OptionError.of("--step", "the range gives more than 400 caps; expected a larger step");
        }
        if (csv && format == OutputFormat.json) {
            throw OptionError.of("--csv", "--csv and --format json ask for two outputs; expected one of " + "them");
        }
        if (plot != null) {
            checkPlotFile();
        }
        List<Double> caps = new ArrayList<>();
        for (int i = 0; lo + i * st <= hi + 1e-6; i++) {
            caps.add(Math.round((lo + i * st) * 1e6) / 1e6);
        }
        if (caps.get(caps.size() - 1) < hi - 1e-6) {
            caps.add(hi); // --to off the step grid: the range ends where it was asked to
        }
        SolverOptions options = solver.options();
        List<Target> targets = Studies.targets(in, beam, file, options, new StudySay(u));
        if (plot != null && targets.size() != 1) {
            throw OptionError.of(
                    "--plot",
                    "a plot shows one beam; expected --beam ID with --plot (the " + "file has " + targets.size()
                            + " beams)");
        }
        List<Sweep.Result> results = new ArrayList<>();
        List<Boolean> perBeam = new ArrayList<>();
        for (Target t : targets) {
            results.add(Sweep.run(t, caps, Studies.model(in, objective.objective())));
            perBeam.add(t.costPerBeam());
        }
        String text = format == OutputFormat.json
                ? StudyJson.sweep(in.settings(), results, perBeam)
                : csv
                        ? StudyText.sweepCsv(results, u, perBeam)
                        : StudyText.sweep(in.settings(), results, perBeam, in.currency());
        if (plot != null) {
            try {
                Files.writeString(
                        plot, SweepPlot.svg(results.get(0), u, in.currency(), perBeam.get(0)), StandardCharsets.UTF_8);
            } catch (IOException ex) {
                throw new InputError(
                        Location.ofFile(plot.toString()),
                        "cannot write the plot (" + ex.getClass().getSimpleName()
                                + "); expected a writable file in an existing directory");
            }
        }
        spec.commandLine().getOut().print(text);
        spec.commandLine().getOut().flush();
        return results.stream().allMatch(r -> r.shallowestFeasible() != null) ? Main.OK : Main.FAILED;
    }
}
