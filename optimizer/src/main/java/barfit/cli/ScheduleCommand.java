package barfit.cli;

import barfit.catalogs.InputError;
import barfit.catalogs.yaml.Location;
import barfit.design.CostModel;
import barfit.design.SolverOptions;
import barfit.report.ScheduleJson;
import barfit.report.ScheduleText;
import barfit.schedule.ScheduleInput;
import barfit.schedule.ScheduleInputReader;
import barfit.schedule.ScheduleResult;
import barfit.schedule.ScheduleSolver;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

@Command(
        name = "schedule",
        mixinStandardHelpOptions = true,
        description = "Design every beam of a floor or building: each at its proven optimum, or rationalised to a few "
                + "section and bar sizes (rationalise: in FILE) with the proof of the whole schedule's optimum.%n"
                + "With --out DIR writes schedule.csv, bending-schedule.csv, schedule.json, report.html and (with rationalise:) standardisation.svg there.%n"
                + "Exit code 0 when every beam has a passing design, 1 when one has none, 2 for bad input.")
final class ScheduleCommand implements Callable<Integer> {
    static final List<String> OUTPUTS =
            List.of("schedule.csv", "bending-schedule.csv", "schedule.json", "report.html", "standardisation.svg");

    @Spec
    CommandSpec spec;

    @Parameters(
            index = "0",
            paramLabel = "FILE",
            description = "YAML: settings, search, costs, rationalise and "
                    + "(unless --beams) beams (see examples/schedule/)")
    Path file;

    @CommandLine.Mixin
    SolverFlags solver;

    @CommandLine.Mixin
    ObjectiveFlag objective;

    @Option(names = "--beams", paramLabel = "CSV", description = "read the beams from this CSV file instead of FILE")
    Path beams;

    @Option(names = "--out", paramLabel = "DIR", description = "write the schedule files into DIR (created if missing)")
    Path out;

    @Option(names = "--force", description = "with --out: replace schedule files already in DIR")
    boolean force;

    @Option(names = "--quiet", description = "no progress bar")
    boolean quiet;

    @Option(
            names = "--format",
            defaultValue = "text",
            description = "what to print: text or json (default: ${DEFAULT-VALUE})")
    OutputFormat format;

    @Option(
            names = "--threads",
            paramLabel = "N",
            description = "beams designed in parallel (default: the number of cores)")
    Integer threads;

    @Override
    public Integer call() {
        if (force && out == null) {
            throw new CommandLine.ParameterException(
                    spec.commandLine(),
                    "--force: replaces the schedule files in --out " + "DIR; expected --out DIR with it");
        }
        int cores = Runtime.getRuntime().availableProcessors();
        int nThreads = threads == null ? cores : threads;
        if (nThreads < 1 || nThreads > 256) {
            throw OptionError.of("--threads", "expected 1 to 256, got " + nThreads);
        }
        SolverOptions options = solver.options();
        if (out != null) {
            checkOutputs();
        }
        ScheduleInput input = ScheduleInputReader.read(file, beams, options, nThreads, objective.objective());
        ProgressBar bar = new ProgressBar(spec.commandLine().getErr(), !quiet && ProgressBar.stderrIsTerminal());
        CostModel cost = input.costModel().minimising(objective.objective());
        ScheduleResult result;
        try {
            result = new ScheduleSolver(cost, options, nThreads, bar).solve(input);
        } finally {
            bar.finish();
        }
        String text = format == OutputFormat.json ? ScheduleJson.render(result) : ScheduleText.render(result);
        if (out != null) {
            List<String> written = write(result);
            if (format == OutputFormat.text) {
                text += "\nwrote "
                        + String.join(
                                ", ",
                                written.stream()
                                        .map(f -> out.resolve(f).toString())
                                        .toList())
                        + (written.contains("standardisation.svg")
                                ? ""
                                : " (no standardisation.svg: its curve is "
                                        + "computed only for a schedule with a rationalise: block)")
                        + "\n";
            }
        }
        spec.commandLine().getOut().print(text);
        spec.commandLine().getOut().flush();
        return result.allFeasible() ? Main.OK : Main.FAILED;
    }

    /** Before any work: refuse to replace a user's file without --force, and never replace an input. */
    private void checkOutputs() {
        if (Files.exists(out) && !Files.isDirectory(out)) {
            throw OptionError.of("--out", out + " is a file; expected a directory");
        }
        for (String name : OUTPUTS) {
            Path target = out.resolve(name);
            if (sameFile(target, file) || (beams != null && sameFile(target, beams))) {
                throw OptionError.of("--out", target + " would replace an input file; expected another directory");
            }
            if (Files.exists(target) && !force) {
                throw new InputError(
                        Location.ofFile(target.toString()),
                        "already exists; expected a new directory, " + "or --force to replace the schedule files");
            }
        }
    }

    private static boolean sameFile(Path a, Path b) {
        try {
            return Files.exists(a) && Files.exists(b) && Files.isSameFile(a, b);
        } catch (IOException e) {
            return false;
        }
    }

    /**
     * Writes every file to a temporary name first, then moves them in, so a failure leaves no half schedule.
     * Returns the names of the files written.
     */
    private List<String> write(ScheduleResult r) {
        Map<String, String> files = barfit.report.ScheduleFiles.render(r);
        List<Path> temps = new ArrayList<>();
        try {
            Files.createDirectories(out);
            for (Map.Entry<String, String> e : files.entrySet()) {
                Path tmp = out.resolve("." + e.getKey() + ".tmp");
                Files.writeString(tmp, e.getValue(), StandardCharsets.UTF_8);
                temps.add(tmp);
            }
            int i = 0;
            for (String name : files.keySet()) {
                Path tmp = temps.get(i++);
                try {
                    Files.move(
                            tmp,
                            out.resolve(name),
                            StandardCopyOption.REPLACE_EXISTING,
                            StandardCopyOption.ATOMIC_MOVE);
                } catch (AtomicMoveNotSupportedException e) {
                    Files.move(tmp, out.resolve(name), StandardCopyOption.REPLACE_EXISTING);
                }
            }
            if (!files.containsKey("standardisation.svg")) {
                Files.deleteIfExists(
                        out.resolve("standardisation.svg")); // an earlier run's curve (--force) would mislead
            }
            return new ArrayList<>(files.keySet());
        } catch (IOException e) {
            for (Path t : temps) {
                try {
                    Files.deleteIfExists(t);
                } catch (IOException ignored) {
                    // best effort: the error below is what matters
                }
            }
            throw new InputError(
                    Location.ofFile(out.toString()),
                    "cannot write the schedule ("
                            + (e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage()) + ")");
        }
    }
}
