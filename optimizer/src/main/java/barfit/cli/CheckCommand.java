package barfit.cli;

import barfit.catalogs.Echo;
import barfit.input.CheckBeam;
import barfit.input.CheckInput;
import barfit.input.CheckInputReader;
import barfit.report.CheckJson;
import barfit.report.CheckText;
import barfit.section.CheckReport;
import barfit.section.SectionChecks;
import barfit.section.trail.Trail;
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
        name = "check",
        mixinStandardHelpOptions = true,
        description = "Verify the given sections and bars of every beam in FILE against ACI 318-19: strength, "
                + "ductility, detailing and shear, each with its clause, and a calculation trail.%n"
                + "Exit code 0 when every beam passes, 1 when a check fails, 2 for bad input.")
final class CheckCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "YAML input (see examples/check/)")
    Path file;

    @Option(names = "--format", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE})")
    OutputFormat format;

    @Option(
            names = "--trail",
            negatable = true,
            defaultValue = "true",
            fallbackValue = "true",
            description = "include the calculation trail (default: on; --no-trail to leave it out)")
    boolean trail;

    @Option(names = "--beam", paramLabel = "ID", description = "check only this beam")
    String beam;

    @Override
    public Integer call() {
        CheckInput input = CheckInputReader.read(file);
        List<CheckBeam> beams = input.beams();
        if (beam != null) {
            beams = beams.stream().filter(b -> b.id().equals(beam)).toList();
            if (beams.isEmpty()) {
                throw OptionError.of(
                        "--beam",
                        "no beam " + Echo.cut(beam) + " in " + file + "; expected one of: "
                                + String.join(
                                        ", ",
                                        input.beams().stream()
                                                .map(CheckBeam::id)
                                                .toList()));
            }
        }
        List<CheckReport> reports = new ArrayList<>();
        for (CheckBeam b : beams) {
            Trail t = trail ? Trail.recording() : Trail.off();
            CheckReport r = SectionChecks.run(b.section(), b.demand(), b.span(), t);
            if (t.isOn()) {
                // the development length of every layer as built, equation and numbers (25.4.2.4)
                for (var l : r.flexure().layers()) {
                    barfit.section.Development.ofLayer(b.section(), l.layer(), t);
                }
            }
            reports.add(r);
        }
        String text = format == OutputFormat.json
                ? CheckJson.render(input.settings(), beams, reports, trail)
                : CheckText.render(input.settings(), beams, reports, trail);
        spec.commandLine().getOut().print(text);
        spec.commandLine().getOut().flush();
        return reports.stream().allMatch(CheckReport::ok) ? Main.OK : Main.FAILED;
    }
}
