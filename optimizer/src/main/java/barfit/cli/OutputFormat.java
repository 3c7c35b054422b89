package barfit.cli;

/** How a command prints its answer. */
public enum OutputFormat {
    text,
    json
}
