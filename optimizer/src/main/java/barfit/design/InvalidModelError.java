package barfit.design;

/**
 * CP-SAT refused a model barfit built (MODEL_INVALID): a bug in barfit, never an answer and never the
 * input's fault. The command line reports it as an internal error and asks for it to be reported.
 */
public final class InvalidModelError extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public InvalidModelError(String message) {
        super(message);
    }
}
