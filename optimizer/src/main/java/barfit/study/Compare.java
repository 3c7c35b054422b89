package barfit.study;

import barfit.design.CostModel;
import barfit.design.SearchSpace;
import barfit.section.Materials;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleFunction;

/**
 * "Deepen or add compression steel?" priced: the same beam designed at its headroom cap, with the cap
 * lifted, at the shallowest depth that needs no compression steel beyond the hangers, wider, and with
 * stronger concrete, each by the same optimizer and cost model.
 */
public final class Compare {
    public record Option(String kind, String label, Summary summary, Double fc, String note) {
    }

    /**
     * @param best      the recommended option (null when none passes); {@code recommended} is its kind
     * @param wholeSpan whether the beam is a whole span: its top bars are compression steel at mid-span
     *                  but tension steel over the supports
     */
    public record Result(String id, double cap, boolean capGiven, List<Option> options, String recommended,
            List<String> reasons, Option best, boolean wholeSpan) {
        /** The f'c (MPa) of the recommended option when it is stronger concrete, else null. */
        public Double recommendedFc() {
            return best != null && best.kind().equals("fc") ? best.fc() : null;
        }
    }

    /** Words for lengths and stresses in the user's units. */
    public interface Say {
        String length(double mm);

        String stress(double mpa);
    }

    private Compare() {
    }

    /**
     * @param cap       the headroom cap (mm); null means the beam's own, or the deepest searched
     * @param maxWidth  the widest web for the widen option (mm)
     * @param fcs       concrete strengths to try (MPa)
     * @param costForFc the cost model with the concrete rate of a given f'c
     */
    public static Result run(Target t, Double cap, double maxWidth, List<Double> fcs, CostModel cost,
            DoubleFunction<CostModel> costForFc, Say say) {
        return run(t, cap, maxWidth, widthStep(t.space().widths(), 50), fcs, cost, costForFc, say);
    }

    /** As above, widening in steps of {@code widthStep} (mm). */
    public static Result run(Target t, Double cap, double maxWidth, double widthStep, List<Double> fcs, CostModel cost,
            DoubleFunction<CostModel> costForFc, Say say) {
        SearchSpace space = t.space();
        List<Double> depths = space.depths();
        double deepest = depths.get(depths.size() - 1);
        boolean capGiven = cap != null || t.cap() != null;
        double h = cap != null ? cap : t.cap() != null ? t.cap() : deepest;
        Materials m = t.materials();
        List<Option> options = new ArrayList<>();
        options.add(new Option("at_cap", "at the cap, h ≤ " + say.length(h), t.design(h, space, m, cost, false), null,
                null));
        options.add(new Option("deepen", "cap lifted, h ≤ " + say.length(deepest), t.design(null, space, m, cost, false),
                null, null));
        Summary singly = null;
        double singlyDepth = Double.NaN;
        for (double d : depths) {
            Summary s = t.design(null, space.withDepths(List.of(d)).withHangersOnly(), m, cost, false);
            if (s.feasible()) {
                singly = s;
                singlyDepth = d;
                break;
            }
        }
        options.add(new Option("no_compression_steel", Double.isNaN(singlyDepth)
                ? "no compression steel: no depth searched works with the hangers alone"
                : "no compression steel: shallowest h = " + say.length(singlyDepth), singly == null
                ? Summary.none("no depth in the search works with the minimum hangers only") : singly, null, null));
        List<Double> widths = new ArrayList<>(space.widths());
        double step = widthStep;
        for (double w = widths.get(widths.size() - 1) + step; w <= maxWidth + 1e-9; w += step) {
            widths.add(w);
        }
        options.add(new Option("widen", "widths up to " + say.length(widths.get(widths.size() - 1)) + ", h ≤ "
                + say.length(h),
                t.design(h, space.withWidths(widths), m, cost, true), null, null));
        for (double fc : fcs) {
            Materials mf = new Materials(fc, m.fy(), m.fyt(), m.aggregate(), m.lambda());
            options.add(new Option("fc", "f'c = " + say.stress(fc) + ", h ≤ " + say.length(h),
                    t.design(h, space, mf, costForFc.apply(fc), false), fc, null));
        }
        return recommend(t.id(), h, capGiven, options, say, t instanceof SpanTarget);
    }

    /** The smallest step between the search's widths, or {@code fallback} (mm) with a single width. */
    public static double widthStep(List<Double> widths, double fallback) {
        double step = Double.MAX_VALUE;
        for (int i = 1; i < widths.size(); i++) {
            step = Math.min(step, widths.get(i) - widths.get(i - 1));
        }
        return step == Double.MAX_VALUE ? fallback : step;
    }

    private static boolean sameDesign(Summary a, Summary b) {
        return a.width() == b.width() && a.height() == b.height() && a.tension().equals(b.tension())
                && a.compression().equals(b.compression());
    }

    private static String pct(double v) {
        return String.format(Locale.ROOT, "%.1f %%", v);
    }

    /** The cheapest feasible option, with its reasons in plain words. */
    static Result recommend(String id, double cap, boolean capGiven, List<Option> options, Say say, boolean span) {
        List<String> reasons = new ArrayList<>();
        Option best = null;
        for (Option o : options) {
            if (o.summary().feasible() && (best == null || o.summary().total() < best.summary().total() - 1e-9)) {
                best = o;
            }
        }
        Option atCap = options.get(0);
        if (best == null) {
            reasons.add("No option studied gives a passing layout: see the design command's diagnosis.");
            reasons.add(nothingAtCap(atCap.summary(), cap, say));
            return new Result(id, cap, capGiven, options, null, reasons, null, span);
        }
        if (atCap.summary().feasible()) {
            reasons.add(atCapReason(atCap.summary(), options, cap, say));
        } else {
            reasons.add(nothingAtCap(atCap.summary(), cap, say));
        }
        double ref = best.summary().total();
        for (Option o : options) {
            if (o == best || !o.summary().feasible()) {
                continue;
            }
            double diff = 100 * (o.summary().total() - ref) / ref;
            if (sameDesign(o.summary(), best.summary())) {
                reasons.add("'" + o.label() + "' gives the same design.");
            } else if (diff <= 2.0) {
                reasons.add("'" + o.label() + "' is within 2 % of the cheapest (" + pct(diff) + "): let constructability "
                        + "decide (" + congestion(o.summary()) + ", against " + congestion(best.summary()) + ").");
            }
        }
        String why = switch (best.kind()) {
            case "at_cap" -> "Keeping the cap is cheapest";
            case "deepen" -> "Lifting the cap to h = " + say.length(best.summary().height()) + " is cheapest (any depth premium "
                    + "of the rates included); it needs the architect to accept the deeper beam";
            case "no_compression_steel" -> "The shallowest depth without compression steel, h = "
                    + say.length(best.summary().height()) + ", is cheapest" + (best.summary().height() > cap + 1e-9
                    ? "; it is deeper than the cap" : "");
            case "widen" -> "Widening to b = " + say.length(best.summary().width()) + " within the cap is cheapest";
            default -> "Stronger concrete, f'c = " + say.stress(best.fc()) + " within the cap, is cheapest";
        };
        if (atCap.summary().feasible() && best != atCap) {
            why += String.format(Locale.ROOT, ": %.1f %% less than keeping the cap", 100 * (atCap.summary().total() - ref)
                    / atCap.summary().total());
        }
        reasons.add(0, why + ".");
        return new Result(id, cap, capGiven, options, best.kind(), reasons, best, span);
    }

    /** What the design at the cap is, and why its compression steel is there. */
    private static String atCapReason(Summary s, List<Option> options, double cap, Say say) {
        String what;
        if (s.compressionNeeded()) {
            Summary singly = options.stream().filter(o -> o.kind().equals("no_compression_steel")).findFirst()
                    .map(Option::summary).orElse(null);
            String governs = s.hangersFail().isEmpty() ? "" : " (" + s.hangersFail() + ")";
            if (singly != null && singly.feasible() && singly.height() <= cap + 1e-9) {
                double diff = 100 * (singly.total() - s.total()) / s.total();
                what = "carries compression steel beyond the hangers: with the hangers alone its other bars would fail"
                        + governs + ", but another layout without it passes within the cap (h = "
                        + say.length(singly.height()) + ", " + (diff > 0 ? pct(diff) + " dearer" : pct(-diff) + " cheaper")
                        + "), so the compression steel is a matter of cost, not of need";
            } else {
                what = "needs compression steel beyond the hangers: with the hangers alone it fails" + governs
                        + ", and no layout without it passes within the cap";
            }
        } else {
            what = s.compressionUsed() ? "uses more compression steel than the hangers by choice, not need"
                    : "needs no compression steel beyond the hangers";
        }
        return "At the cap the beam is " + say.length(s.width()) + " × " + say.length(s.height()) + " and " + what
                + (s.strainClass().equals("transition") ? "; it works in the transition zone (φ = "
                        + String.format(Locale.ROOT, "%.3f", s.phi()) + ")" : "") + ".";
    }

    /** Why nothing passes at the cap, with the change that can help. */
    private static String nothingAtCap(Summary s, double cap, Say say) {
        String at = "Nothing passes at the cap of " + say.length(cap) + ": ";
        return switch (s.limit() == null ? "" : s.limit()) {
            case "deflection" -> at + s.proof() + " (widening or stronger concrete cannot help until then), or lift the cap "
                    + "to Table 9.3.1.1's minimum.";
            case "min_depth" -> at + s.proof() + ". Only a deeper beam meets Table 9.3.1.1; to keep the cap, design "
                    + "the beam as a whole span with service loads so that its deflection is computed (24.2).";
            case "headroom" -> at + s.proof() + ".";
            default -> at + "the cap must be lifted or the section widened or made stronger.";
        };
    }

    static String congestion(Summary s) {
        return s.longitudinalBars() + " bars in " + s.layers() + (s.layers() == 1 ? " layer" : " layers")
                + (s.compressionNeeded() ? " with compression steel" : "");
    }
}
