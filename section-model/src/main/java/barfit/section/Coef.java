package barfit.section;

/**
 * A coefficient of a code equation. {@code si} multiplies the SI form (stresses in MPa, √f'c in √MPa);
 * {@code shown} is the coefficient as printed in the edition the user works in, for the trail.
 */
public record Coef(double si, String shown) {}
