package barfit.report;

import java.util.List;

/** The caution every report carries. */
public final class Caution {
    public static final String SHORT = "Results must be checked by a licensed professional engineer against the "
            + "governing local code before use.";

    public static final List<String> LINES = List.of(
            "CAUTION: " + SHORT,
            "barfit covers only what this report lists: ACI 318-19 flexure, shear and detailing checks of",
            "nonprestressed beam sections under the moments and shears given, or for lines those of its own",
            "gravity analysis; torsion of solid sections, whole spans and lines where a factored torsion or a",
            "torque is given (a line's supports taken as restraining twist); and for lines analysed by stiffness",
            "the development, hooks, laps and cut-off points of their bars. It does not check an analysis made",
            "elsewhere, lateral loads, torsion of cantilevers and hollow sections, the anchorage of torsion's",
            "longitudinal bars at their ends, axial load, seismic provisions, development and splices of beams",
            "given alone, deflection (unless reported), fire resistance, durability beyond cover, or",
            "constructability beyond bar spacing.");

    private Caution() {}

    public static String text() {
        return String.join("\n", LINES);
    }
}
