package barfit.design;

/** The machine cannot run the solver (no temporary folder, no native library): not a bug, not bad input. */
public final class SetupError extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public SetupError(String message) {
        super(message);
    }
}
