package barfit.report;

import barfit.input.Rationalise;
import barfit.schedule.ScheduleResult;

/** Words the schedule's reports share about the whole schedule: how it was proven, or why it could not be. */
public final class ScheduleWords {
    private static final String LAZY = "; sizes priced lazily against bar-free bounds";

    private ScheduleWords() {}

    /** The proof's method, or for an INFEASIBLE proof why no schedule meets the limits. */
    public static String method(ScheduleResult r) {
        ScheduleResult.Search search = r.proof().search();
        return switch (search.method()) {
            case LAGRANGIAN_BOUND -> "Lagrangian bound meets the local-search solution" + LAZY;
            case LINEAR_RELAXATION_INTEGRAL -> "linear relaxation integral" + LAZY;
            case RELAXATION_BOUND -> "relaxation bound meets the local-search solution" + LAZY;
            case CP_SAT -> "relaxation, reduced-cost fixing and CP-SAT" + LAZY;
            case CP_SAT_STOPPED -> "local search; CP-SAT " + search.cpSatStatus() + LAZY;
            case NO_BEAM_LEFT -> "no beam is left to rationalise: each failed on its own or in its group";
            case LIMITS_TOO_TIGHT -> limitsTooTight(r);
        };
    }

    /** "at most 2 section sizes with 1 bar size cannot hold every beam; at least 3 section sizes are needed". */
    private static String limitsTooTight(ScheduleResult r) {
        Rationalise limits = r.input().rationalise();
        int fewest = r.standardisation().stream()
                .filter(pt -> !Double.isNaN(pt.cost()))
                .mapToInt(ScheduleResult.StandardisationPoint::sizes)
                .min()
                .orElse(-1);
        return (limits.maxSectionSizes() == null
                        ? "the bar sizes allowed"
                        : "at most " + limits.maxSectionSizes()
                                + (limits.maxSectionSizes() == 1 ? " section size" : " section sizes")
                                + (limits.maxBarSizes() == null
                                        ? ""
                                        : " with " + limits.maxBarSizes()
                                                + (limits.maxBarSizes() == 1 ? " bar size" : " bar sizes")))
                + " cannot hold every beam"
                + (fewest > 0 ? "; at least " + fewest + " section sizes are needed" : "");
    }
}
