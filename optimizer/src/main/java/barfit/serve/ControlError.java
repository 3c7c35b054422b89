package barfit.serve;

/** A request value the page cannot use: which control it belongs to and what is expected, in words. */
public final class ControlError extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final String control;

    public ControlError(String control, String message) {
        super(message);
        this.control = control;
    }

    /** The control's request key ({@code max_depth}, {@code widths}, ...), or {@code request} for the whole body. */
    public String control() {
        return control;
    }
}
