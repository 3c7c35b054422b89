package barfit.cli;

import barfit.catalogs.Echo;
import barfit.catalogs.InputError;
import barfit.catalogs.yaml.Location;
import barfit.design.CostModel;
import barfit.design.CostRates;
import barfit.design.SolverOptions;
import barfit.design.line.LineSpans;
import barfit.design.span.SpanDesigner;
import barfit.input.DesignBeam;
import barfit.input.DesignInput;
import barfit.input.DesignInputReader;
import barfit.input.LineInput;
import barfit.input.LinesReader;
import barfit.section.trail.Dim;
import barfit.study.LineTarget;
import barfit.study.Say;
import barfit.study.SectionTarget;
import barfit.study.SpanTarget;
import barfit.study.Target;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/** What compare and sweep share: the beams of a design file as study targets, and option checks. */
final class Studies {
    private Studies() {}

    /** A design file whose beams: may be left out when it gives lines: instead. */
    static DesignInput input(Path file) {
        DesignInput in = DesignInputReader.read(file, false);
        if (in.beams().isEmpty()
                && LinesReader.read(DesignInputReader.document(file), in.settings())
                        .isEmpty()) {
            throw new InputError(
                    Location.ofFile(file.toString()), "has no beams: and no lines:; expected at least one");
        }
        return in;
    }

    /**
     * The file's beams, and the spans and overhangs of its lines (each designed from the line's analysis until
     * the sections settle, then studied as a whole span with that envelope: "LINE/span 2"); {@code beam} picks
     * a beam, a line (all its parts) or one part.
     */
    static List<Target> targets(DesignInput in, String beam, Path file, SolverOptions options, Say say) {
        return targets(in, beam, file, options, say, LinesReader.read(DesignInputReader.document(file), in.settings()));
    }

    /** As above, with the file's lines already read. */
    static List<Target> targets(
            DesignInput in, String beam, Path file, SolverOptions options, Say say, List<LineInput> lines) {
        List<Target> out = new ArrayList<>();
        List<String> ids = new ArrayList<>();
        for (DesignBeam b : in.beams()) {
            ids.add(b.id());
            if (beam != null && !b.id().equals(beam)) {
                continue;
            }
            out.add(
                    b.isWhole()
                            ? new SpanTarget(DesignCommand.span(in, b), options, say)
                            : new SectionTarget(DesignCommand.problem(in, b), options, say));
        }
        if (!lines.isEmpty()) {
            SpanDesigner spans = new SpanDesigner(cost(in), options);
            LineSpans byLine =
                    new LineSpans(in.settings(), in.space(), spans, in.maxBarSizesPerBeam(), in.barsPerTwoLegs());
            for (LineInput l : lines) {
                ids.add(l.id());
                boolean whole = beam == null || beam.equals(l.id());
                if (!whole && !beam.startsWith(l.id() + "/")) {
                    continue;
                }
                if (whole && l.oneSection()) {
                    // one set of forms: the line is studied as one object, the cap on its whole depth
                    out.add(new LineTarget(
                            l, in.settings(), in.space(), in.maxBarSizesPerBeam(), in.barsPerTwoLegs(), options));
                    continue;
                }
                for (LineSpans.Part part : byLine.design(l, 0).parts()) {
                    if (whole || part.problem().id().equals(beam)) {
                        // studied free of the section the line was designed at, with that section's envelope
                        out.add(new SpanTarget(
                                part.problem().withSpace(in.space()).withFixedWidth(null), options, say));
                    }
                }
            }
        }
        if (out.isEmpty()) {
            throw OptionError.of(
                    "--beam",
                    "no beam, line or line part (LINE/span N) " + Echo.cut(beam) + " in " + file + "; expected one of: "
                            + String.join(", ", ids));
        }
        return out;
    }

    static CostModel cost(DesignInput in) {
        return new CostModel(
                in.rates(),
                in.settings().detailing().cover(),
                in.settings().units().code());
    }

    /**
     * The model a study minimises with: the file's rates for cost; for carbon its carbon factors (the file's,
     * or the defaults), its cost beside them.
     */
    static CostModel model(DesignInput in, barfit.design.Objective objective) {
        CostModel cost = cost(in);
        return objective == barfit.design.Objective.CARBON
                ? cost.withCarbon(in.carbon().factors()).minimising(objective)
                : cost;
    }

    /** As {@link #model}, with the concrete rate and carbon factor of another f'c (MPa). */
    static CostModel modelAtFc(DesignInput in, double fc, barfit.design.Objective objective) {
        CostModel cost = costAtFc(in, fc);
        return objective == barfit.design.Objective.CARBON
                ? cost.withCarbon(in.carbon().at(fc)).minimising(objective)
                : cost;
    }

    /** The cost model with the concrete rate for another f'c (MPa). */
    static CostModel costAtFc(DesignInput in, double fc) {
        double rate = in.costs().concreteAt(fc);
        CostRates r = in.rates();
        return new CostModel(
                new CostRates(
                        rate,
                        r.mainBarsPerKg(),
                        r.stirrupsPerKg(),
                        r.formworkPerM2(),
                        r.depthPremiumPerM(),
                        r.lapFactor()),
                in.settings().detailing().cover(),
                in.settings().units().code());
    }

    /** A length option in the user's units, checked to lie within the search's depths. */
    static double depthWithinSearch(DesignInput in, String option, double userValue) {
        var u = in.settings().units();
        double mm = u.toSI(userValue, Dim.LENGTH);
        List<Double> depths = in.space().depths();
        double lo = depths.get(0);
        double hi = depths.get(depths.size() - 1);
        if (!(mm >= lo - 1e-6 && mm <= hi + 1e-6)) {
            throw OptionError.of(
                    option,
                    "expected a depth within the search range "
                            + u.compact(lo, Dim.LENGTH) + " to " + u.compact(hi, Dim.LENGTH) + " " + u.unit(Dim.LENGTH)
                            + ", got "
                            + fmt(userValue));
        }
        return mm;
    }

    static String fmt(double v) {
        return Double.isFinite(v) && v == Math.rint(v) && Math.abs(v) < 1e15
                ? String.valueOf((long) v)
                : String.valueOf(v);
    }
}
