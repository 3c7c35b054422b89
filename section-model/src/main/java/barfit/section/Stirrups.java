package barfit.section;

import barfit.catalogs.BarSize;

/** Closed stirrups: bar size, number of vertical legs, spacing along the beam (mm). */
public record Stirrups(BarSize bar, int legs, double spacing) {
    public Stirrups {
        if (legs < 2 || !(spacing > 0)) {
            throw new IllegalArgumentException("stirrups need at least two legs and a positive spacing");
        }
    }

    /** Av, mm²: the area of all legs. */
    public double area() {
        return legs * bar.area();
    }
}
