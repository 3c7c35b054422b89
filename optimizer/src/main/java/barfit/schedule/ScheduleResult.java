package barfit.schedule;

import barfit.design.Proof;
import barfit.design.span.SpanDesigner;
import java.util.List;

/**
 * A designed schedule: every beam's outcome in input order, the section sizes and bar sizes it uses, its
 * total cost, the cost with every beam at its own optimum, the rationalisation's proof (null when not
 * rationalised), the price of standardisation (empty when not rationalised), and the carbon (kg CO2e) with
 * every beam at its own optimum when rationalised (NaN otherwise).
 */
public record ScheduleResult(
        ScheduleInput input,
        List<Beam> beams,
        List<SectionSize> sizes,
        List<String> barSizes,
        double beamsCost,
        double formworkSetsCost,
        double unconstrainedCost,
        Proof<Search> proof,
        List<StandardisationPoint> standardisation,
        int threads,
        long millis,
        double unconstrainedCarbon) {

    public ScheduleResult {
        beams = List.copyOf(beams);
        sizes = List.copyOf(sizes);
        barSizes = List.copyOf(barSizes);
        standardisation = List.copyOf(standardisation);
    }

    /**
     * One scheduled beam: its outcome (for a rationalised schedule, the proven cheapest design in its
     * assigned size with the schedule's bar sizes) and its own optimum cost without rationalisation
     * (NaN when it has no passing design).
     */
    public record Beam(ScheduleBeam beam, SpanDesigner.Outcome outcome, double ownOptimum) {
        public boolean feasible() {
            return outcome.feasible();
        }
    }

    /** A section size b x h (mm) and the beams that use it. */
    public record SectionSize(double width, double height, List<String> beams) {
        public SectionSize {
            beams = List.copyOf(beams);
        }
    }

    /**
     * The rationalisation's search, for its proof (whose status is OPTIMAL, FEASIBLE with a gap, or
     * INFEASIBLE): the method (or, INFEASIBLE, why no schedule meets the limits) and CP-SAT's status where
     * it stopped short (else null), the bar-size sets considered, solved and pruned by bound, the
     * (beam, size) pairs evaluated exactly, and the time to the proof (ms).
     */
    public record Search(
            ProofMethod method,
            String cpSatStatus,
            int barSetsTotal,
            int barSetsSolved,
            int barSetsPruned,
            int pairsEvaluated,
            long millis) {}

    /**
     * The least total cost with at most {@code sizes} section sizes (NaN when none is feasible): the total
     * carbon (kg CO2e) of the beams where the schedule minimised carbon.
     */
    public record StandardisationPoint(int sizes, double cost, Proof.Status status, List<String> barSizes) {
        public StandardisationPoint {
            barSizes = List.copyOf(barSizes);
        }
    }

    public double totalCost() {
        return beamsCost + formworkSetsCost;
    }

    /** The embodied carbon of the beams with a design, kg CO2e (A1-A3); NaN where a design carries none. */
    public double totalCarbon() {
        double kg = 0;
        for (Beam b : beams) {
            if (b.feasible()) {
                var c = b.outcome().best().carbon();
                kg += c == null ? Double.NaN : c.total();
            }
        }
        return kg;
    }

    /** Whether the beams were designed for the least carbon ({@code --objective carbon}). */
    public boolean leastCarbon() {
        return beams.stream().anyMatch(b -> b.outcome().proof().measure() == barfit.design.Objective.CARBON);
    }

    /** Every beam has a passing design and, when rationalised, the limits could be met. */
    public boolean allFeasible() {
        return beams.stream().allMatch(Beam::feasible) && (proof == null || proof.status() != Proof.Status.INFEASIBLE);
    }
}
