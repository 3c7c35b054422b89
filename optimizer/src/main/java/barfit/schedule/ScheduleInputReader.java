package barfit.schedule;

import barfit.catalogs.Echo;
import barfit.catalogs.InputError;
import barfit.catalogs.yaml.YFields;
import barfit.catalogs.yaml.YamlReader;
import barfit.input.CsvBeamsReader;
import barfit.input.DesignBeam;
import barfit.input.DesignInput;
import barfit.input.DesignInputReader;
import barfit.input.InputLimits;
import barfit.input.SettingsReader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads a schedule: the settings, search space and costs of a {@code design} file, its optional
 * {@code rationalise:} block, and the beams either from the file's {@code beams:} or from a CSV file.
 * A schedule lists whole spans.
 */
public final class ScheduleInputReader {
    private ScheduleInputReader() {
    }

    public static ScheduleInput read(Path file, Path csv) {
        return read(file, csv, new barfit.design.SolverOptions(30, 1, 1));
    }

    /**
     * As above; the spans and overhangs of the file's {@code lines:} join the beams, each with the envelope of
     * its line designed span by span until the sections settle ({@code options} for those designs). The
     * rationalisation may then choose other sections; the lines are not analysed again for them.
     */
    public static ScheduleInput read(Path file, Path csv, barfit.design.SolverOptions options) {
        return read(file, csv, options, 1);
    }

    /** As above, the lines designed {@code threads} at a time (the answer does not depend on it). */
    public static ScheduleInput read(Path file, Path csv, barfit.design.SolverOptions options, int threads) {
        YFields document = SettingsReader.root(YamlReader.read(file));
        boolean hasLines = document.has("lines");
        DesignInput design = DesignInputReader.read(file, csv == null && !hasLines);
        if (csv != null && document.has("beams")) {
            throw document.error("beams", "the beams come from --beams " + csv.getFileName()
                    + "; expected no beams: in this file (or leave out --beams)");
        }
        List<DesignBeam> beams = csv == null ? design.beams()
                : CsvBeamsReader.read(csv, design.settings(), design.space().widths().get(design.space().widths().size() - 1));
        List<ScheduleBeam> out = new ArrayList<>();
        for (DesignBeam b : beams) {
            if (!b.isWhole()) {
                throw new InputError(b.location(), "beam " + b.id() + ": a schedule lists whole spans; expected span, "
                        + "ends and moments: {left, mid, right} instead of Mu");
            }
            out.add(new ScheduleBeam(b.id(), b.group(), b.location(), Spans.problem(design, b)));
        }
        if (hasLines) {
            var lines = barfit.input.LinesReader.read(document, design.settings());
            var cost = new barfit.design.CostModel(design.rates(), design.settings().detailing().cover(),
                    design.settings().code());
            var byLine = new barfit.design.line.LineSpans(design.settings(), design.space(),
                    new barfit.design.beam.BeamDesigner(cost, options), design.maxBarSizesPerBeam(),
                    design.barsPerTwoLegs());
            List<barfit.design.line.LineSpans.Result> results = new Parallel(Math.min(threads, lines.size()),
                    Progress.NONE).map(lines.size(), Progress.Phase.of(Progress.Step.DESIGNING_BEAMS),
                    i -> byLine.design(lines.get(i), 0));
            for (int i = 0; i < lines.size(); i++) {
                var one = results.get(i).oneSection();
                boolean standardised = document.has("rationalise");
                for (var part : results.get(i).parts()) {
                    if (one != null && !one.fellBack() && standardised) {
                        // one set of forms: the line's parts are a group sharing b x h, free to take another
                        // section where the schedule standardises (with the envelope of the line's own)
                        out.add(new ScheduleBeam(part.problem().id(), "line " + lines.get(i).id(),
                                lines.get(i).location(), part.problem().withSpace(design.space()).withFixedWidth(null),
                                null, true));
                    } else {
                        // designed with its line for this very problem: its own optimum (a line of one set
                        // of forms holds each part at the line's section)
                        out.add(new ScheduleBeam(part.problem().id(), null, lines.get(i).location(),
                                part.problem(), part.outcome()));
                    }
                }
            }
        }
        if (out.isEmpty()) {
            throw new InputError(document.location(), "expected at least one beam (beams: or --beams) or line (lines:)");
        }
        Rationalise limits = document.has("rationalise") ? rationalise(document) : null;
        List<String> sources = new ArrayList<>(List.of(file.getFileName().toString()));
        if (csv != null) {
            sources.add(csv.getFileName().toString());
        }
        return new ScheduleInput(sources, design.settings(), design.space(), design.rates(), design.currency(), design.costs(),
                design.maxBarSizesPerBeam(), design.barsPerTwoLegs(), out, limits);
    }

    private static Rationalise rationalise(YFields document) {
        YFields block = document.map("rationalise", "the rationalisation {max_section_sizes, max_bar_sizes, groups, "
                + "formwork_set_cost}").allowOnly("max_section_sizes", "max_bar_sizes", "groups", "formwork_set_cost");
        Integer sizes = block.has("max_section_sizes")
                ? block.positiveInt("max_section_sizes", "the most distinct b x h in the schedule, e.g. 6") : null;
        Integer bars = block.has("max_bar_sizes")
                ? block.positiveInt("max_bar_sizes", "the most distinct longitudinal bar sizes in the schedule, e.g. 3") : null;
        boolean sameSection = false;
        if (block.has("groups")) {
            String groups = block.text("groups", "same_section or independent");
            switch (groups) {
                case "same_section" -> sameSection = true;
                case "independent" -> sameSection = false;
                default -> throw block.error("groups", "expected same_section (beams with the same group share b x h) or "
                        + "independent, got \"" + Echo.cut(groups) + "\"");
            }
        }
        double formwork = block.has("formwork_set_cost")
                ? InputLimits.require(block, "formwork_set_cost", InputLimits.SET_COST,
                        block.nonNegative("formwork_set_cost", "the cost of the forms for one section size")) : 0;
        return new Rationalise(sizes, bars, sameSection, formwork);
    }
}
