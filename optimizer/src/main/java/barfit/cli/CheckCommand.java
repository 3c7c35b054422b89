package barfit.cli;

import barfit.catalogs.Echo;
import barfit.detailing.AsBuilt;
import barfit.input.CheckBeam;
import barfit.input.CheckInput;
import barfit.input.CheckInputReader;
import barfit.input.CheckLine;
import barfit.report.CheckJson;
import barfit.report.CheckText;
import barfit.section.CheckReport;
import barfit.section.SectionChecks;
import barfit.section.trail.Dim;
import barfit.section.trail.Trail;
import barfit.units.UnitSystem;
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
                + "ductility, detailing and shear, each with its clause, and a calculation trail; and every line "
                + "with its bars as built: analysed, each span's sections, and the bars' cut-offs, hooks, laps and "
                + "integrity steel.%n"
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

    @Option(names = "--beam", paramLabel = "ID", description = "check only this beam (or line)")
    String beam;

    @Override
    public Integer call() {
        CheckInput input = CheckInputReader.read(file);
        List<CheckBeam> beams = input.beams();
        List<CheckLine> lines = input.lines();
        if (beam != null) {
            beams = beams.stream().filter(b -> b.id().equals(beam)).toList();
            lines = lines.stream().filter(l -> l.line().id().equals(beam)).toList();
            if (beams.isEmpty() && lines.isEmpty()) {
                List<String> ids = new ArrayList<>();
                input.beams().forEach(b -> ids.add(b.id()));
                input.lines().forEach(l -> ids.add(l.line().id()));
                throw OptionError.of(
                        "--beam",
                        "no beam " + Echo.cut(beam) + " in " + file + "; expected one of: " + String.join(", ", ids));
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
        // lines with their bars as built: analysed, verified span by span, and their bars through the
        // detailing checks, each rule from the section model
        UnitSystem u = input.settings().units();
        List<AsBuilt.Checked> checkedLines = new ArrayList<>();
        for (CheckLine l : lines) {
            checkedLines.add(AsBuilt.check(
                    l,
                    input.settings(),
                    trail ? Trail.recording() : Trail.off(),
                    x -> u.number(x, Dim.SPAN) + " " + u.unit(Dim.SPAN)));
        }
        String text = format == OutputFormat.json
                ? CheckJson.render(input.settings(), beams, reports, checkedLines, trail)
                : CheckText.render(input.settings(), beams, reports, checkedLines, trail);
        spec.commandLine().getOut().print(text);
        spec.commandLine().getOut().flush();
        boolean ok = reports.stream().allMatch(CheckReport::ok)
                && checkedLines.stream().allMatch(AsBuilt.Checked::ok);
        return ok ? Main.OK : Main.FAILED;
    }
}
