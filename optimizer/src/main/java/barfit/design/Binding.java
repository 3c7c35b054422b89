package barfit.design;

/** A limit that stops the design from being cheaper: the check that fails when the design is made leaner. */
public record Binding(String limit, String when) {
}
