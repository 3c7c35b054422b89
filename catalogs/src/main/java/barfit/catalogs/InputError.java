package barfit.catalogs;

import barfit.catalogs.yaml.Location;

/**
 * A problem with something a user (or a catalog file) wrote: always reported as one line naming the
 * file, the line and column where known, and what was expected. Never carries a stack trace to the user.
 */
public final class InputError extends RuntimeException {
    private final transient Location location;

    public InputError(Location location, String message) {
        super(message, null, false, false);
        this.location = location;
    }

    public Location location() {
        return location;
    }

    /** "file:line:column: message", the form every bad-input report takes. */
    public String oneLine() {
        String where = location == null ? "" : location + ": ";
        return (where + getMessage()).replace('\n', ' ').replace('\r', ' ');
    }
}
