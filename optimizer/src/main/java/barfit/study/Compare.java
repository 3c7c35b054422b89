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
    public record Option(String kind, String label, Summary summary, Double fc, String note) {}

    /**
     * @param best      the recommended option (null when none passes); {@code recommended} is its kind
     * @param wholeSpan whether the beam is a whole span: its top bars are compression steel at mid-span
     *                  but tension steel over the supports
     */
    public record Result(
            String id,
            double cap,
            boolean capGiven,
            List<Option> options,
            String recommended,
            List<String> reasons,
            Option best,
            boolean wholeSpan) {
        /** The f'c (MPa) of the recommended option when it is stronger concrete, else null. */
        public Double recommendedFc() {
            return best != null && best.kind().equals("fc") ? best.fc() : null;
        }
    }

    private Compare() {}

    /**
     * @param cap       the headroom cap (mm); null means the beam's own, or the deepest searched
     * @param maxWidth  the widest web for the widen option (mm)
     * @param fcs       concrete strengths to try (MPa)
     * @param costForFc the cost model with the concrete rate of a given f'c
     */
    public static Result run(
            Target t,
            Double cap,
            double maxWidth,
            List<Double> fcs,
            CostModel cost,
            DoubleFunction<CostModel> costForFc,
            Say say) {
        return run(t, cap, maxWidth, widthStep(t.space().widths(), 50), fcs, cost, costForFc, say);
    }

    /** As above, widening in steps of {@code widthStep} (mm). */
    public static Result run(
            Target t,
            Double cap,
            double maxWidth,
            double widthStep,
            List<Double> fcs,
            CostModel cost,
            DoubleFunction<CostModel> costForFc,
            Say say) {
        SearchSpace space = t.space();
        List<Double> depths = space.depths();
        double deepest = depths.get(depths.size() - 1);
        boolean capGiven = cap != null || t.cap() != null;
        double h = cap != null ? cap : t.cap() != null ? t.cap() : deepest;
        Materials m = t.materials();
        List<Option> options = new ArrayList<>();
        options.add(new Option(
                "at_cap",
                (capGiven ? "at the cap, h ≤ " : "as given (no cap), h ≤ ") + say.length(h),
                t.design(h, space, m, cost, false),
                null,
                null));
        // with the cap at the deepest depth searched there is nothing to lift: the option would repeat the first
        if (h < deepest - 1e-9) {
            options.add(new Option(
                    "deepen",
                    "cap lifted, h ≤ " + say.length(deepest),
                    t.design(null, space, m, cost, false),
                    null,
                    null));
        }
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
        options.add(new Option(
                "no_compression_steel",
                Double.isNaN(singlyDepth)
                        ? "no compression steel: no depth searched works with the hangers alone"
                        : "no compression steel: shallowest h = " + say.length(singlyDepth),
                singly == null ? Summary.none("no depth in the search works with the minimum hangers only") : singly,
                null,
                null));
        List<Double> widths = new ArrayList<>(space.widths());
        double step = widthStep;
        for (double w = widths.get(widths.size() - 1) + step; w <= maxWidth + 1e-9; w += step) {
            widths.add(w);
        }
        String within = capGiven ? ", h ≤ " + say.length(h) : "";
        // a beam that fixes its width is studied with the width free, narrower as well as wider
        options.add(new Option(
                "widen",
                (t.fixedWidth() != null ? "any width up to " : "widths up to ")
                        + say.length(widths.get(widths.size() - 1))
                        + within,
                t.design(h, space.withWidths(widths), m, cost, true),
                null,
                null));
        for (double fc : fcs) {
            Materials mf = new Materials(fc, m.fy(), m.fyt(), m.aggregate(), m.lambda());
            options.add(new Option(
                    "fc",
                    "f'c = " + say.stress(fc) + within,
                    t.design(h, space, mf, costForFc.apply(fc), false),
                    fc,
                    null));
        }
        // a layout that relies on compression steel beyond the hangers "needs" it only when no layout with the
        // hangers alone passes within the same limits; else the compression steel is a matter of cost
        boolean singlyWithinCap = singly != null && singlyDepth <= h + 1e-9;
        List<Option> judged = new ArrayList<>();
        for (Option o : options) {
            Summary s = o.summary();
            if (s.feasible() && s.compressionNeeded()) {
                boolean avoidable = switch (o.kind()) {
                    case "deepen" -> singly != null;
                    case "at_cap" -> singlyWithinCap;
                    case "widen" ->
                        singlyWithinCap
                                || t.design(h, space.withWidths(widths).withHangersOnly(), m, cost, true)
                                        .feasible();
                    case "fc" ->
                        t.design(
                                        h,
                                        space.withHangersOnly(),
                                        new Materials(o.fc(), m.fy(), m.fyt(), m.aggregate(), m.lambda()),
                                        costForFc.apply(o.fc()),
                                        false)
                                .feasible();
                    default -> false;
                };
                o = new Option(o.kind(), o.label(), s.withAvoidable(avoidable), o.fc(), o.note());
            }
            judged.add(o);
        }
        return recommend(
                t.id(),
                h,
                capGiven,
                judged,
                say,
                t instanceof SpanTarget,
                t.fixedWidth() != null,
                new Measure(cost.objective() == barfit.design.Objective.CARBON));
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
        return a.width() == b.width()
                && a.height() == b.height()
                && a.tension().equals(b.tension())
                && a.compression().equals(b.compression())
                && a.stirrups().equals(b.stirrups());
    }

    /** Costs that print the same, to the cent. */
    private static boolean sameCost(Summary a, Summary b) {
        return String.format(Locale.ROOT, "%.2f", a.total()).equals(String.format(Locale.ROOT, "%.2f", b.total()));
    }

    private static String pct(double v) {
        return String.format(Locale.ROOT, "%.1f %%", v);
    }

    /**
     * Options within this percentage of the cheapest are named for constructability to decide between; a
     * change of concrete grade is recommended only when it saves more than this.
     */
    public static final double MARGIN_PERCENT = 2.0;

    /** The words for what the study minimises: cost, or embodied carbon ({@code --objective carbon}). */
    record Measure(boolean carbon) {
        String least() {
            return carbon ? "lowest in carbon" : "cheapest";
        }

        String more(double pct) {
            return pct(pct) + (carbon ? " more carbon" : " dearer");
        }

        String less(double pct) {
            return pct(pct) + (carbon ? " less carbon" : " cheaper");
        }

        String noun() {
            return carbon ? "carbon" : "cost";
        }
    }

    /** The cheapest feasible option (the lowest in carbon where carbon is minimised), with its reasons in words. */
    static Result recommend(
            String id,
            double cap,
            boolean capGiven,
            List<Option> options,
            Say say,
            boolean span,
            boolean fixedWidth,
            Measure by) {
        List<String> reasons = new ArrayList<>();
        Option best = null;
        Option bestSameGrade = null;
        for (Option o : options) {
            if (!o.summary().feasible()) {
                continue;
            }
            if (best == null || o.summary().total() < best.summary().total() - 1e-9) {
                best = o;
            }
            if (!o.kind().equals("fc")
                    && (bestSameGrade == null
                            || o.summary().total() < bestSameGrade.summary().total() - 1e-9)) {
                bestSameGrade = o;
            }
        }
        Option atCap = options.get(0);
        if (best == null) {
            reasons.add("No option studied gives a passing layout: see the design command's diagnosis.");
            reasons.add(nothingAtCap(atCap.summary(), cap, say));
            return new Result(id, cap, capGiven, options, null, reasons, null, span);
        }
        String gradeNote = null;
        if (best.kind().equals("fc") && bestSameGrade != null) {
            double saving = 100
                    * (bestSameGrade.summary().total() - best.summary().total())
                    / bestSameGrade.summary().total();
            if (saving <= MARGIN_PERCENT) {
                gradeNote = "Stronger concrete, '" + best.label() + "', would save only " + pct(saving) + " against '"
                        + bestSameGrade.label() + "': a change of concrete grade is recommended only when it saves "
                        + "more than " + margin() + " (the margin within which constructability decides).";
                best = bestSameGrade;
            }
        }
        if (atCap.summary().feasible()) {
            reasons.add(atCapReason(atCap.summary(), options, cap, capGiven, say, by));
        } else {
            reasons.add(nothingAtCap(atCap.summary(), cap, say));
        }
        if (gradeNote != null) {
            reasons.add(gradeNote);
        }
        double ref = best.summary().total();
        List<Option> named = new ArrayList<>();
        for (Option o : options) {
            if (o == best || !o.summary().feasible() || named.contains(o)) {
                continue;
            }
            // options that give one design at one cost are named together
            List<Option> same = new ArrayList<>();
            for (Option x : options) {
                if (x != best
                        && x.summary().feasible()
                        && !named.contains(x)
                        && sameDesign(x.summary(), o.summary())
                        && sameCost(x.summary(), o.summary())) {
                    same.add(x);
                }
            }
            named.addAll(same);
            String who = quoted(same);
            boolean one = same.size() == 1;
            double diff = 100 * (o.summary().total() - ref) / ref;
            if (diff < -1e-9 && gradeNote != null) {
                continue; // a stronger grade saving too little to recommend: said above
            }
            if (sameDesign(o.summary(), best.summary())) {
                reasons.add(who
                        + (sameCost(o.summary(), best.summary())
                                ? (one ? " gives" : " give") + " the same design at the same " + by.noun() + "."
                                : (one ? " gives" : " give") + " the same layout, "
                                        + (diff > 0 ? by.more(diff) : by.less(-diff))
                                        + (o.kind().equals("fc")
                                                ? " (the stronger concrete buys nothing here)."
                                                : ".")));
            } else if (diff <= MARGIN_PERCENT) {
                reasons.add(who + (one ? " is" : " (the same design) are") + " within " + margin()
                        + " of the recommended option (" + by.more(diff) + "): let constructability decide ("
                        + congestion(o.summary()) + ", against " + congestion(best.summary()) + ").");
            }
        }
        String scope = capGiven ? " within the cap" : "";
        String least = " is " + by.least();
        String why = switch (best.kind()) {
            case "at_cap" -> (capGiven ? "Keeping the cap" : "The design as given") + least;
            case "deepen" ->
                "Lifting the cap to h = " + say.length(best.summary().height()) + least
                        + (by.carbon() ? "" : " (any depth premium of the rates included)")
                        + "; it needs the architect to accept the deeper beam";
            case "no_compression_steel" ->
                "The shallowest depth without compression steel, h = "
                        + say.length(best.summary().height()) + "," + least
                        + (best.summary().height() > cap + 1e-9 ? "; it is deeper than the cap" : "");
            case "widen" ->
                (atCap.summary().feasible()
                                        && best.summary().width()
                                                < atCap.summary().width() - 1e-9
                                ? "Narrowing to b = "
                                : "Widening to b = ")
                        + say.length(best.summary().width())
                        + (fixedWidth && atCap.summary().feasible()
                                ? " from the fixed "
                                        + say.length(atCap.summary().width())
                                : "")
                        + scope
                        + least;
            default -> "Stronger concrete, f'c = " + say.stress(best.fc()) + scope + "," + least;
        };
        if (atCap.summary().feasible() && best != atCap) {
            double saving =
                    100 * (atCap.summary().total() - ref) / atCap.summary().total();
            why += sameCost(atCap.summary(), best.summary())
                    ? ": the same " + by.noun() + " as " + (capGiven ? "keeping the cap" : "the design as given")
                    : String.format(
                            Locale.ROOT,
                            ": %.1f %% less than %s",
                            saving,
                            capGiven ? "keeping the cap" : "the design as given");
        }
        reasons.add(0, why + ".");
        return new Result(id, cap, capGiven, options, best.kind(), reasons, best, span);
    }

    private static String margin() {
        return (MARGIN_PERCENT == Math.rint(MARGIN_PERCENT)
                        ? String.valueOf((long) MARGIN_PERCENT)
                        : String.valueOf(MARGIN_PERCENT))
                + " %";
    }

    /** "'a'", "'a' and 'b'", "'a', 'b' and 'c'". */
    private static String quoted(List<Option> os) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < os.size(); i++) {
            sb.append(i == 0 ? "" : i == os.size() - 1 ? " and " : ", ")
                    .append('\'')
                    .append(os.get(i).label())
                    .append('\'');
        }
        return sb.toString();
    }

    /** What the design at the cap is, and why its compression steel is there. */
    private static String atCapReason(
            Summary s, List<Option> options, double cap, boolean capGiven, Say say, Measure by) {
        String what;
        if (s.compressionNeeded()) {
            Summary singly = options.stream()
                    .filter(o -> o.kind().equals("no_compression_steel"))
                    .findFirst()
                    .map(Option::summary)
                    .orElse(null);
            String governs = s.hangersFail().isEmpty() ? "" : " (" + s.hangersFail() + ")";
            if (s.compressionAvoidable() && singly != null && singly.feasible() && singly.height() <= cap + 1e-9) {
                double diff = 100 * (singly.total() - s.total()) / s.total();
                what = "carries compression steel beyond the hangers: with the hangers alone its other bars would fail"
                        + governs + ", but another layout without it passes "
                        + (capGiven ? "within the cap" : "in the search") + " (h = " + say.length(singly.height())
                        + ", " + (diff > 0 ? by.more(diff) : by.less(-diff))
                        + "), so the compression steel is a matter of " + by.noun() + ", not of need";
            } else {
                what = "needs compression steel beyond the hangers: with the hangers alone it fails" + governs
                        + ", and no layout without it passes " + (capGiven ? "within the cap" : "in the search");
            }
        } else {
            what = s.compressionUsed()
                    ? "uses more compression steel than the hangers by choice, not need"
                    : "needs no compression steel beyond the hangers";
        }
        return (capGiven ? "At the cap the beam is " : "As given the beam is ") + say.length(s.width()) + " × "
                + say.length(s.height()) + " and " + what
                + (s.strainClass().equals("transition")
                        ? "; it works in the transition zone (φ = " + String.format(Locale.ROOT, "%.3f", s.phi()) + ")"
                        : "")
                + ".";
    }

    /** Why nothing passes at the cap, with the change that can help. */
    private static String nothingAtCap(Summary s, double cap, Say say) {
        String at = "Nothing passes at the cap of " + say.length(cap) + ": ";
        return switch (s.limit() == null ? "" : s.limit()) {
            case "deflection" ->
                at + s.proof() + " (widening or stronger concrete cannot help until then), or lift the cap "
                        + "to Table 9.3.1.1's minimum.";
            case "min_depth" ->
                at + s.proof() + ". Only a deeper beam meets Table 9.3.1.1; to keep the cap, design "
                        + "the beam as a whole span with service loads so that its deflection is computed (24.2).";
            case "headroom" -> at + s.proof() + ".";
            default -> at + "the cap must be lifted or the section widened or made stronger.";
        };
    }

    static String congestion(Summary s) {
        return s.longitudinalBars() + " bars in " + s.layers() + (s.layers() == 1 ? " layer" : " layers")
                + (s.compressionUsed() ? " with compression steel" : "");
    }
}
