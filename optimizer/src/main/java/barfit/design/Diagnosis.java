package barfit.design;

import barfit.design.section.SectionLayout;
import barfit.section.CheckResult;

/**
 * Why no layout passes, as data the reports put in words: the limit that binds ({@code limit}, a check id
 * or {@code headroom}, {@code spacing}, {@code flexure}, {@code shear}, {@code detailing}) and the facts
 * behind it ({@code cause}), the strongest ductile layout within the limits and its phi Mn (null and 0
 * where none was looked for), and the least changes, one limit relaxed at a time, that give a passing
 * design: {@code deeper}, {@code wider} (null where none was found) and {@code moreLayers}, the layers of
 * tension bars that would do (null where one more does not). {@code maxDepth} and {@code fixedWidth} are the
 * beam's own (null where it has none).
 */
public record Diagnosis(
        String limit,
        Cause cause,
        SectionLayout strongest,
        double strongestPhiMn,
        Fix deeper,
        Fix wider,
        Integer moreLayers,
        Double maxDepth,
        Double fixedWidth) {

    /** What stops the section, as facts. */
    public sealed interface Cause
            permits BelowShallowest,
                    FrameCheckFails,
                    NoLayoutFits,
                    FlexureFails,
                    ShearFails,
                    TorsionFails,
                    DetailingFails,
                    CarbonCapFails {}

    /** {@code max_depth} is below the shallowest depth searched, {@code shallowest}. */
    public record BelowShallowest(double shallowest) implements Cause {}

    /** A check of the frame alone (minimum depth, cover...) fails on the largest frame, {@code deepest} deep. */
    public record FrameCheckFails(CheckResult check, double deepest) implements Cause {}

    /** No bar layout fits the web at the widest width allowed. */
    public record NoLayoutFits(double width) implements Cause {}

    /** The strongest ductile layout on the largest frame ({@code strongestPhiMn}) is below Mu. */
    public record FlexureFails(double width, double height, double mu) implements Cause {}

    /** Flexure can be met, but no stirrup option carries {@code vu}. */
    public record ShearFails(double vu) implements Cause {}

    /**
     * Flexure can be met, but a torsion check ({@code check}: the section size of 22.7.7.1(a), the bar spacing
     * round the hoop of 9.7.5.1, or another) fails at {@code width} × {@code height}, as it does on every frame
     * searched where {@code everyFrame}.
     */
    public record TorsionFails(CheckResult check, double width, double height, boolean everyFrame) implements Cause {}

    /** Strength can be met but no layout passes every detailing check. */
    public record DetailingFails() implements Cause {}

    /**
     * Layouts pass, but none within the carbon cap ({@code cap}, kg CO2e per metre): the least carbon of any
     * passing layout is {@code least}, that of {@code leastLayout}.
     */
    public record CarbonCapFails(double cap, double least, SectionLayout leastLayout) implements Cause {}

    /** A size at which the section designs. */
    public record Fix(double width, double height) {}
}
