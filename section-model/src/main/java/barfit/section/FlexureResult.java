package barfit.section;

import java.util.List;

/**
 * The nominal flexural strength of a section for one direction of bending (22.2), and phi from the
 * net tensile strain (Table 21.2.2). Lengths mm, forces N, moments N·mm; strains tension positive.
 */
public record FlexureResult(
        Bending bending,
        double c,
        double a,
        double beta1,
        double concreteForce,
        double concreteCentroid,
        List<LayerResult> layers,
        double dt,
        double d,
        double tensionSteelArea,
        double epsT,
        double epsTy,
        double phi,
        double mn,
        double residual) {

    public FlexureResult {
        layers = List.copyOf(layers);
    }

    public double phiMn() {
        return phi * mn;
    }

    public String strainClass() {
        return CodeTables.strainClass(epsT, epsTy);
    }
}
