package barfit.study;

import barfit.design.CostBreakdown;

/**
 * One design as a study reports it: size, bars, strength, whether its compression steel beyond the
 * hangers is relied on ({@code compressionNeeded}: tested by replacing it with the minimum hangers and
 * re-checking), congestion, and cost. {@code feasible} false means no layout in the studied space
 * passes; {@code limit} then names what stops it (the diagnosis's limit, e.g. "deflection" or
 * "min_depth"). {@code hangersFail} names the checks that fail when this layout's compression steel is
 * replaced by the minimum hangers (empty when they do not fail). {@code compressionAvoidable}: another
 * layout with the minimum hangers alone passes within the same limits, so relying on compression steel
 * is a matter of cost, not of need (set by the study that knows it). {@code carbon} is its embodied carbon
 * (null where unknown), and {@code byCarbon} says the study minimised carbon, so designs compare by it.
 */
public record Summary(
        boolean feasible,
        double width,
        double height,
        String tension,
        String compression,
        String stirrups,
        String tensionFace,
        java.util.List<Integer> tensionCounts,
        String tensionBar,
        String compressionFace,
        int compressionCount,
        String compressionBar,
        double phiMn,
        double mu,
        double epsT,
        double phi,
        String strainClass,
        boolean compressionUsed,
        boolean compressionNeeded,
        int longitudinalBars,
        int layers,
        CostBreakdown cost,
        String proof,
        String hangersFail,
        String limit,
        boolean compressionAvoidable,
        CostBreakdown carbon,
        boolean byCarbon) {

    public static Summary none(String proof) {
        return none(proof, "");
    }

    public static Summary none(String proof, String limit) {
        return new Summary(
                false,
                0,
                0,
                "",
                "",
                "",
                "",
                java.util.List.of(),
                "",
                "",
                0,
                "",
                0,
                0,
                0,
                0,
                "",
                false,
                false,
                0,
                0,
                null,
                proof,
                "",
                limit,
                false,
                null,
                false);
    }

    /** The same design, knowing whether a layout with the minimum hangers alone passes within its limits. */
    public Summary withAvoidable(boolean avoidable) {
        return new Summary(
                feasible,
                width,
                height,
                tension,
                compression,
                stirrups,
                tensionFace,
                tensionCounts,
                tensionBar,
                compressionFace,
                compressionCount,
                compressionBar,
                phiMn,
                mu,
                epsT,
                phi,
                strainClass,
                compressionUsed,
                compressionNeeded,
                longitudinalBars,
                layers,
                cost,
                proof,
                hangersFail,
                limit,
                avoidable,
                carbon,
                byCarbon);
    }

    /** Compression steel beyond the hangers that nothing within the limits can do without. */
    public boolean compressionRequired() {
        return compressionNeeded && !compressionAvoidable;
    }

    /** What the study compares designs by: the cost, or the carbon where it minimised carbon. */
    public double total() {
        CostBreakdown by = byCarbon ? carbon : cost;
        return by == null ? Double.POSITIVE_INFINITY : by.total();
    }

    /** Bars by layer from the face: "3 No. 25 + 2 No. 25". */
    static String bars(java.util.List<Integer> counts, String label) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < counts.size(); i++) {
            sb.append(i == 0 ? "" : " + ").append(counts.get(i)).append(' ').append(label);
        }
        return sb.toString();
    }

    /** The failing checks in words, each once: "deflection (24.2), flexure (22.3)". */
    static String checks(java.util.List<barfit.section.CheckResult> failures) {
        java.util.LinkedHashSet<String> seen = new java.util.LinkedHashSet<>();
        for (var f : failures) {
            String t = f.title();
            seen.add((t.isEmpty() ? t : Character.toLowerCase(t.charAt(0)) + t.substring(1)) + " (" + f.clause() + ")");
        }
        return String.join(", ", seen);
    }
}
