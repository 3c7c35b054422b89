package barfit.input;

/**
 * The {@code rationalise:} settings of a schedule. {@code maxSectionSizes} limits the distinct b x h over
 * the schedule and {@code maxBarSizes} the distinct longitudinal main-bar sizes (null: no limit);
 * {@code groupsSameSection} makes beams of one group share b x h; {@code formworkSetCost} is paid once per
 * distinct section size (the forms bought or made for it).
 */
public record Rationalise(
        Integer maxSectionSizes, Integer maxBarSizes, boolean groupsSameSection, double formworkSetCost) {}
