package barfit.section.trail;

/** A number with its physical kind, in SI base units (mm, mm², N, N·mm, MPa). */
public record Q(double value, Dim dim) {
    public static Q length(double mm) {
        return new Q(mm, Dim.LENGTH);
    }

    public static Q area(double mm2) {
        return new Q(mm2, Dim.AREA);
    }

    public static Q force(double n) {
        return new Q(n, Dim.FORCE);
    }

    public static Q moment(double nmm) {
        return new Q(nmm, Dim.MOMENT);
    }

    public static Q stress(double mpa) {
        return new Q(mpa, Dim.STRESS);
    }

    public static Q strain(double v) {
        return new Q(v, Dim.STRAIN);
    }

    public static Q number(double v) {
        return new Q(v, Dim.NUMBER);
    }

    public static Q count(int n) {
        return new Q(n, Dim.COUNT);
    }

    public static Q span(double mm) {
        return new Q(mm, Dim.SPAN);
    }

    public static Q inertia(double mm4) {
        return new Q(mm4, Dim.INERTIA);
    }

    public static Q lineLoad(double nPerMm) {
        return new Q(nPerMm, Dim.LINE_LOAD);
    }

    public static Q rootStress(double rootMpa) {
        return new Q(rootMpa, Dim.ROOT_STRESS);
    }

    public static Q areaPerLength(double mm2PerMm) {
        return new Q(mm2PerMm, Dim.AREA_PER_LENGTH);
    }
}
