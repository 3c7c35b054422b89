package barfit.catalogs;

/**
 * One reinforcing bar size, always in SI: nominal diameter in mm, nominal area in mm², unit mass in
 * kg/m. {@code label} is how drawings and schedules name it ("#8", "No. 29", "16 mm").
 */
public record BarSize(String designation, String label, double diameter, double area, double massPerMetre) {
    public BarSize {
        if (!(diameter > 0) || !(area > 0) || !(massPerMetre > 0)) {
            throw new IllegalArgumentException("bar " + designation + " needs positive diameter, area and mass");
        }
    }

    @Override
    public String toString() {
        return label;
    }
}
