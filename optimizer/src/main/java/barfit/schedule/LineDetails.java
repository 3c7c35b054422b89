package barfit.schedule;

import barfit.design.CostModel;
import barfit.design.line.LineSpans;
import barfit.detailing.LineDetail;
import barfit.section.trail.Trail;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The lines of a schedule detailed bar by bar, as {@code design} details a line: each part with the design
 * the schedule gave it (its own optimum, or the rationalised one at the section and bar sizes the schedule
 * standardised on), against the envelope of its line's own analysis (a line is not analysed again for a
 * section the rationalisation chose). A line with a part without a design, or without an analysis of its
 * own (6.5 coefficients), is left out: its parts stay listed as spans.
 */
public final class LineDetails {
    /** A line detailed: its id, the schedule's beam ids of its parts (in order along it) and its detail. */
    public record Detailed(String line, List<String> beams, LineDetail detail) {
        public Detailed {
            beams = List.copyOf(beams);
        }
    }

    private LineDetails() {}

    public static List<Detailed> of(ScheduleResult r) {
        ScheduleInput in = r.input();
        Map<String, ScheduleResult.Beam> byId = new HashMap<>();
        for (ScheduleResult.Beam b : r.beams()) {
            byId.put(b.beam().id(), b);
        }
        CostModel cost = new CostModel(
                in.rates(), in.settings().detailing().cover(), in.settings().code());
        List<Detailed> out = new ArrayList<>();
        for (LineSpans.Result line : in.lines()) {
            List<LineSpans.Part> parts = new ArrayList<>();
            List<String> ids = new ArrayList<>();
            boolean all = line.analysis() != null;
            for (LineSpans.Part p : line.parts()) {
                ScheduleResult.Beam b = byId.get(p.problem().id());
                if (b == null || !b.feasible()) {
                    all = false;
                    break;
                }
                parts.add(new LineSpans.Part(p.segment(), p.name(), b.outcome().problem(), b.outcome()));
                ids.add(b.beam().id());
            }
            if (!all) {
                continue;
            }
            LineSpans.Result scheduled = new LineSpans.Result(
                    line.line(),
                    parts,
                    line.rounds(),
                    line.settled(),
                    line.analysis(),
                    line.coefficients(),
                    line.redistribution(),
                    line.epsT(),
                    line.held(),
                    line.oneSection(),
                    line.withoutRedistribution());
            double stock = line.line().stockLength() != null
                    ? line.line().stockLength()
                    : LineDetail.defaultStock(in.settings());
            LineDetail d = LineDetail.of(scheduled, in.settings(), cost, stock, Trail.off());
            if (d != null) {
                out.add(new Detailed(line.line().id(), ids, d));
            }
        }
        return out;
    }

    /** The detailed line a beam of the schedule belongs to, or null. */
    public static Detailed lineOf(List<Detailed> lines, String beam) {
        for (Detailed d : lines) {
            if (d.beams().contains(beam)) {
                return d;
            }
        }
        return null;
    }
}
