package barfit.schedule;

import barfit.input.DesignBeam;
import barfit.input.DesignInput;
import barfit.input.LineInput;
import barfit.input.ScheduleFileReader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * A schedule's files ({@link ScheduleFileReader}, which refuses bad input) turned into the problems to
 * solve: each beam a whole span, and each line's spans and overhangs with their envelopes.
 */
public final class ScheduleInputReader {
    private ScheduleInputReader() {}

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
        return read(file, csv, options, threads, barfit.design.Objective.COST);
    }

    /** As above, the lines designed for {@code objective}. */
    public static ScheduleInput read(
            Path file, Path csv, barfit.design.SolverOptions options, int threads, barfit.design.Objective objective) {
        return read(file, csv, options, threads, m -> m.minimising(objective));
    }

    /** As above, the lines designed with the model {@code pricing} makes of the file's (a frontier's blend). */
    public static ScheduleInput read(
            Path file,
            Path csv,
            barfit.design.SolverOptions options,
            int threads,
            java.util.function.UnaryOperator<barfit.design.CostModel> pricing) {
        ScheduleFileReader.ScheduleFile read = ScheduleFileReader.read(file, csv);
        DesignInput design = read.design();
        List<ScheduleBeam> out = new ArrayList<>();
        for (DesignBeam b : read.beams()) {
            out.add(new ScheduleBeam(b.id(), b.group(), b.location(), Spans.problem(design, b), null, b.sameSection()));
        }
        List<LineInput> lines = read.lines();
        List<barfit.design.line.LineSpans.Result> designed = List.of();
        if (!lines.isEmpty()) {
            var cost = pricing.apply(design.costModel());
            var byLine = new barfit.design.line.LineSpans(
                    design.settings(),
                    design.space(),
                    new barfit.design.span.SpanDesigner(cost, options),
                    design.maxBarSizesPerBeam(),
                    design.barsPerTwoLegs());
            List<barfit.design.line.LineSpans.Result> results = new Parallel(
                            Math.min(threads, lines.size()), Progress.NONE)
                    .map(
                            lines.size(),
                            Progress.Phase.of(Progress.Step.DESIGNING_BEAMS),
                            i -> byLine.design(lines.get(i), 0));
            designed = results;
            for (int i = 0; i < lines.size(); i++) {
                var one = results.get(i).oneSection();
                boolean standardised = read.rationalise() != null;
                for (var part : results.get(i).parts()) {
                    if (one != null && !one.fellBack() && standardised) {
                        // one set of forms: the line's parts are a group sharing b x h, free to take another
                        // section where the schedule standardises (with the envelope of the line's own)
                        out.add(new ScheduleBeam(
                                part.problem().id(),
                                "line " + lines.get(i).id(),
                                lines.get(i).location(),
                                part.problem().withSpace(design.space()).withFixedWidth(null),
                                null,
                                true));
                    } else {
                        // designed with its line for this very problem: its own optimum (a line of one set
                        // of forms holds each part at the line's section)
                        out.add(new ScheduleBeam(
                                part.problem().id(), null, lines.get(i).location(), part.problem(), part.outcome()));
                    }
                }
            }
        }
        return new ScheduleInput(
                read.sources(),
                design.settings(),
                design.space(),
                design.rates(),
                design.currency(),
                design.costs(),
                design.maxBarSizesPerBeam(),
                design.barsPerTwoLegs(),
                out,
                read.rationalise(),
                designed,
                design.carbon());
    }
}
