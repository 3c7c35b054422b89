package barfit.input;

import barfit.catalogs.Echo;
import barfit.catalogs.InputError;
import barfit.catalogs.yaml.YFields;
import barfit.catalogs.yaml.YamlReader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads a schedule's files and refuses bad input: the settings, search space and costs of a {@code design}
 * file, its optional {@code rationalise:} block, its {@code lines:}, and the beams either from the file's
 * {@code beams:} or from a CSV file. A schedule lists whole spans.
 */
public final class ScheduleFileReader {
    /** A schedule as read: the files' names (for the report), the design file, the beams, the lines, the limits. */
    public record ScheduleFile(
            List<String> sources,
            DesignInput design,
            List<DesignBeam> beams,
            List<LineInput> lines,
            Rationalise rationalise) {
        public ScheduleFile {
            sources = List.copyOf(sources);
            beams = List.copyOf(beams);
            lines = List.copyOf(lines);
        }
    }

    private ScheduleFileReader() {}

    public static ScheduleFile read(Path file, Path csv) {
        YFields document = SettingsReader.root(YamlReader.read(file));
        boolean hasLines = document.has("lines");
        DesignInput design = DesignInputReader.read(file, csv == null && !hasLines);
        if (csv != null && document.has("beams")) {
            throw document.error(
                    "beams",
                    "the beams come from --beams " + fileName(csv)
                            + "; expected no beams: in this file (or leave out --beams)");
        }
        List<DesignBeam> beams = csv == null
                ? design.beams()
                : CsvBeamsReader.read(
                        csv,
                        design.settings(),
                        design.space().widths().get(design.space().widths().size() - 1));
        for (DesignBeam b : beams) {
            if (!b.isWhole()) {
                throw new InputError(
                        b.location(),
                        "beam " + b.id() + ": a schedule lists whole spans; expected span, "
                                + "ends and moments: {left, mid, right} instead of Mu");
            }
        }
        List<LineInput> lines = hasLines ? LinesReader.read(document, design.settings()) : List.of();
        if (beams.isEmpty() && lines.isEmpty()) {
            throw new InputError(
                    document.location(), "expected at least one beam (beams: or --beams) or line (lines:)");
        }
        Rationalise limits = document.has("rationalise") ? rationalise(document) : null;
        List<String> sources = new ArrayList<>(List.of(fileName(file)));
        if (csv != null) {
            sources.add(fileName(csv));
        }
        return new ScheduleFile(sources, design, beams, lines, limits);
    }

    private static Rationalise rationalise(YFields document) {
        YFields block = document.map(
                        "rationalise",
                        "the rationalisation {max_section_sizes, max_bar_sizes, groups, " + "formwork_set_cost}")
                .allowOnly("max_section_sizes", "max_bar_sizes", "groups", "formwork_set_cost");
        Integer sizes = block.has("max_section_sizes")
                ? block.positiveInt("max_section_sizes", "the most distinct b x h in the schedule, e.g. 6")
                : null;
        Integer bars = block.has("max_bar_sizes")
                ? block.positiveInt("max_bar_sizes", "the most distinct longitudinal bar sizes in the schedule, e.g. 3")
                : null;
        boolean sameSection = false;
        if (block.has("groups")) {
            String groups = block.text("groups", "same_section or independent");
            switch (groups) {
                case "same_section" -> sameSection = true;
                case "independent" -> sameSection = false;
                default ->
                    throw block.error(
                            "groups",
                            "expected same_section (beams with the same group share b x h) or " + "independent, got \""
                                    + Echo.cut(groups) + "\"");
            }
        }
        double formwork = block.has("formwork_set_cost")
                ? InputLimits.require(
                        block,
                        "formwork_set_cost",
                        InputLimits.SET_COST,
                        block.nonNegative("formwork_set_cost", "the cost of the forms for one section size"))
                : 0;
        return new Rationalise(sizes, bars, sameSection, formwork);
    }

    /** The file's own name as the reports show it (the whole path for one that has none, such as a root). */
    private static String fileName(Path p) {
        Path name = p.getFileName();
        return (name == null ? p : name).toString();
    }
}
