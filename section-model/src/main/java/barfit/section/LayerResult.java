package barfit.section;

/**
 * A bar layer in the solved section: {@code d} from the extreme compression fibre (mm); strain,
 * stress (MPa) and force (N) with tension positive; concrete it displaces inside the block (mm²).
 */
public record LayerResult(BarLayer layer, double d, double strain, double stress, double force, double displaced) {
    public boolean yielded(double fy) {
        return Math.abs(stress) >= fy * (1 - 1e-12);
    }
}
