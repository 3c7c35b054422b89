package barfit.cli;

import barfit.design.CostModel;
import barfit.design.Objective;
import barfit.design.SolverOptions;
import barfit.design.line.LineSpans;
import barfit.design.section.SectionDesigner;
import barfit.design.span.SpanDesigner;
import barfit.detailing.LineDetail;
import barfit.input.DesignBeam;
import barfit.input.DesignInput;
import barfit.input.LineInput;
import barfit.report.DesignItem;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.List;

/**
 * What {@code design} does to a file's beams and lines, apart from reading it and writing the answer:
 * shared by the command and the page server, so both give the same answer for the same input.
 */
final class DesignRun {
    /** A designed line: its analysis and parts, and its detail (null where a part has no design). */
    record Line(LineInput input, LineSpans.Result result, LineDetail detail) {}

    /** Every beam's and every line part's answer, in input order, and the lines designed. */
    record Result(List<DesignItem> items, List<Line> lines) {
        Result {
            items = List.copyOf(items);
            lines = List.copyOf(lines);
        }

        boolean feasible() {
            return items.stream().allMatch(DesignItem::feasible);
        }
    }

    private DesignRun() {}

    static Result run(
            DesignInput input,
            List<DesignBeam> beams,
            List<LineInput> lines,
            SolverOptions options,
            int alternatives,
            boolean trail,
            Objective objective) {
        return run(input, beams, lines, options, alternatives, trail, objective, null);
    }

    /** As above, each single section and whole span within {@code carbonCap} kg CO2e per m (null: no cap). */
    static Result run(
            DesignInput input,
            List<DesignBeam> beams,
            List<LineInput> lines,
            SolverOptions options,
            int alternatives,
            boolean trail,
            Objective objective,
            Double carbonCap) {
        var settings = input.settings();
        CostModel cost = input.costModel().minimising(objective);
        SectionDesigner designer = new SectionDesigner(cost, options);
        SpanDesigner spans = new SpanDesigner(cost, options);
        List<DesignItem> outcomes = new ArrayList<>();
        for (DesignBeam b : beams) {
            outcomes.add(
                    b.isWhole()
                            ? DesignItem.of(spans.design(DesignCommand.span(input, b), alternatives, carbonCap))
                            : DesignItem.of(designer.design(DesignCommand.problem(input, b), alternatives, carbonCap)));
        }
        LineSpans byLine =
                new LineSpans(settings, input.space(), spans, input.maxBarSizesPerBeam(), input.barsPerTwoLegs());
        List<Line> designed = new ArrayList<>();
        for (LineInput l : lines) {
            LineSpans.Result r = byLine.design(l, alternatives);
            List<String> undesigned = r.parts().stream()
                    .filter(pt -> !pt.outcome().feasible())
                    .map(LineSpans.Part::name)
                    .toList();
            double lineCost = 0;
            for (LineSpans.Part pt : r.parts()) {
                lineCost += pt.outcome().feasible() ? pt.outcome().best().cost().total() : Double.NaN;
            }
            // detailed bar by bar: runs, laps, hooks, the bending schedule and the checks that place them
            LineDetail detail = undesigned.isEmpty()
                    ? LineDetail.of(
                            r,
                            settings,
                            cost,
                            l.stockLength() != null ? l.stockLength() : LineDetail.defaultStock(settings),
                            trail ? Trail.recording() : Trail.off())
                    : null;
            designed.add(new Line(l, r, detail));
            for (int i = 0; i < r.parts().size(); i++) {
                LineSpans.Part part = r.parts().get(i);
                outcomes.add(DesignItem.of(
                        part.outcome(),
                        new DesignItem.LinePart(
                                l.id(),
                                part.name(),
                                i == 0,
                                l.spans().size(),
                                r.rounds(),
                                r.settled(),
                                l.redistribution(),
                                r.redistribution(),
                                r.epsT(),
                                undesigned,
                                !r.held().isEmpty(),
                                r.oneSection(),
                                r.supports(),
                                r.withoutRedistribution(),
                                lineCost,
                                i == r.parts().size() - 1 ? detail : null)));
            }
        }
        return new Result(outcomes, designed);
    }
}
