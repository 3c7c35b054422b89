package barfit.cli;

import barfit.catalogs.InputError;

/**
 * A bad command-line option, named as the option ("--threads: expected 1 to 256, got 0"), never as if it
 * were a place in a file.
 */
final class OptionError {
    private OptionError() {}

    static InputError of(String option, String message) {
        return new InputError(null, option + ": " + message);
    }
}
