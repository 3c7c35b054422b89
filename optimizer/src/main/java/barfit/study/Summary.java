package barfit.study;

import barfit.design.CostBreakdown;

/**
 * One design as a study reports it: size, bars, strength, whether compression steel beyond the
 * hangers is needed (tested by replacing it with the minimum hangers and re-checking), congestion,
 * and cost. {@code feasible} false means no layout in the studied space passes.
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
        String proof) {

    public static Summary none(String proof) {
        return new Summary(false, 0, 0, "", "", "", "", java.util.List.of(), "", "", 0, "", 0, 0, 0, 0, "", false, false,
                0, 0, null, proof);
    }

    public double total() {
        return cost == null ? Double.POSITIVE_INFINITY : cost.total();
    }
}
