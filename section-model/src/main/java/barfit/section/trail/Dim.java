package barfit.section.trail;

/** The physical kind of a number, so the report can show it in the user's units. SI base values. */
public enum Dim {
    /** mm */
    LENGTH,
    /** mm² */
    AREA,
    /** N */
    FORCE,
    /** N·mm */
    MOMENT,
    /** MPa */
    STRESS,
    /** mm (a span or bar length, shown in m or ft) */
    SPAN,
    /** N/mm (a line load, shown in kN/m or kip/ft) */
    LINE_LOAD,
    /** mm⁴ */
    INERTIA,
    /** mm²/mm (shear reinforcement per unit length) */
    AREA_PER_LENGTH,
    /** kg/m */
    MASS_PER_LENGTH,
    /** kg (a bar mark's or a schedule's steel, shown in kg or lb) */
    MASS,
    /** √MPa, the square root of a stress */
    ROOT_STRESS,
    /** mm/mm */
    STRAIN,
    /** a pure number */
    NUMBER,
    /** a count of things */
    COUNT
}
