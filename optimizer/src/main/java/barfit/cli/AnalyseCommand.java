package barfit.cli;

import barfit.analysis.Coefficients;
import barfit.analysis.LineAnalysis;
import barfit.analysis.LineResult;
import barfit.catalogs.Echo;
import barfit.catalogs.InputError;
import barfit.catalogs.yaml.Location;
import barfit.catalogs.yaml.YFields;
import barfit.catalogs.yaml.YamlReader;
import barfit.input.LineInput;
import barfit.input.LinesReader;
import barfit.input.Settings;
import barfit.input.SettingsReader;
import barfit.report.AnalysisJson;
import barfit.report.AnalysisText;
import barfit.report.EnvelopePlot;
import barfit.section.Deflection;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

@Command(
        name = "analyse",
        mixinStandardHelpOptions = true,
        description = "Gravity analysis of the beam lines in FILE (lines: spans, supports, service loads): reactions, "
                + "the factored moment and shear envelopes with the pattern that governs, moments at the support faces "
                + "and shears at d for design, inflection points, service moments; optionally SVG plots.%n"
                + "Exit code 0, or 2 for bad input.")
final class AnalyseCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "YAML input with lines: (see examples/lines/)")
    Path file;

    @Option(names = "--line", paramLabel = "ID", description = "analyse only this line")
    String line;

    @Option(names = "--format", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE})")
    OutputFormat format;

    @Option(
            names = "--plot",
            paramLabel = "DIR",
            description = "also write one SVG per line (<id>-envelope.svg) into "
                    + "DIR (created if missing; existing plots are kept unless --force)")
    Path plot;

    @Option(names = "--force", description = "replace plot files that exist")
    boolean force;

    @Override
    public Integer call() throws IOException {
        if (force && plot == null) {
            throw OptionError.of("--force", "has nothing to replace without --plot DIR");
        }
        YFields doc = SettingsReader.root(YamlReader.read(file));
        Settings settings = SettingsReader.read(doc, file);
        List<LineInput> lines = LinesReader.read(doc, settings);
        if (lines.isEmpty()) {
            throw new InputError(
                    Location.ofFile(file.toString()),
                    "has no lines:; expected beam lines given by spans, " + "supports and loads (see examples/lines/)");
        }
        if (line != null) {
            List<LineInput> only =
                    lines.stream().filter(l -> l.id().equals(line)).toList();
            if (only.isEmpty()) {
                throw OptionError.of(
                        "--line",
                        "no line " + Echo.cut(line) + " in " + file + "; " + "expected one of: "
                                + String.join(
                                        ", ", lines.stream().map(LineInput::id).toList()));
            }
            lines = only;
        }
        double ec = Deflection.ec(settings.materials(), settings.code());
        List<AnalysisText.Analysed> out = new ArrayList<>();
        for (LineInput in : lines) {
            double d = effectiveDepth(settings, in);
            var analysable = in.toLine(in.section(), ec, d);
            double sw = in.selfWeight(in.section());
            if (in.coefficients()) {
                try {
                    out.add(new AnalysisText.Analysed(in, sw, null, Coefficients.analyse(analysable)));
                } catch (Coefficients.NotApplicable e) {
                    throw new InputError(
                            in.location(),
                            "line " + in.id() + ": method: coefficients cannot be used: " + e.getMessage());
                }
            } else {
                LineResult r;
                try {
                    r = LineAnalysis.analyse(analysable);
                } catch (IllegalArgumentException e) {
                    throw new InputError(in.location(), "line " + in.id() + ": " + e.getMessage());
                }
                out.add(new AnalysisText.Analysed(in, sw, r, null));
            }
        }
        if (plot != null) {
            writePlots(out, settings);
        }
        String text =
                format == OutputFormat.json ? AnalysisJson.render(settings, out) : AnalysisText.render(settings, out);
        spec.commandLine().getOut().print(text);
        spec.commandLine().getOut().flush();
        return Main.OK;
    }

    /** d for the shears at d: the height less cover, stirrup and half a 25 mm (1 in) bar, common practice. */
    static double effectiveDepth(Settings s, LineInput in) {
        return in.section().height() - s.detailing().cover() - s.stirrupBar().diameter() - 12.7;
    }

    private void writePlots(List<AnalysisText.Analysed> out, Settings settings) throws IOException {
        List<String> ids = new ArrayList<>();
        for (AnalysisText.Analysed a : out) {
            if (a.result() != null) {
                ids.add(a.input().id());
            }
        }
        List<Path> targets = PlotFolder.targets(plot, ids, "-envelope.svg", force);
        Files.createDirectories(plot);
        int k = 0;
        for (AnalysisText.Analysed a : out) {
            if (a.result() == null) {
                continue;
            }
            Files.writeString(
                    targets.get(k++),
                    EnvelopePlot.svg(a.result(), a.input().id(), settings.units()),
                    StandardCharsets.UTF_8);
        }
    }
}
