package barfit.catalogs;

import barfit.catalogs.yaml.Location;

/**
 * A problem with something a user (or a catalog file) wrote: always reported as one line naming the
 * file, the line and column where known, and what was expected. Never carries a stack trace to the user.
 */
public final class InputError extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final transient Location location;

    public InputError(Location location, String message) {
        super(message, null, false, false);
        this.location = location;
    }

    public Location location() {
        return location;
    }

    /**
     * "file:line:column: message", the form every bad-input report takes. The readers quote the user's
     * values cut ({@link Echo}); as a last guard, any run of more than {@link #LONGEST_RUN} characters
     * without a space is cut here too, so no message carries a pasted 200 kB value whole.
     */
    public String oneLine() {
        String where = location == null ? "" : location + ": ";
        return (where + cutLongRuns(getMessage())).replace('\n', ' ').replace('\r', ' ');
    }

    static final int LONGEST_RUN = 200;

    private static String cutLongRuns(String message) {
        if (message == null || message.length() <= LONGEST_RUN) {
            return message;
        }
        StringBuilder out = new StringBuilder();
        int i = 0;
        int n = message.length();
        while (i < n) {
            int j = i;
            while (j < n && !Character.isWhitespace(message.charAt(j))) {
                j++;
            }
            String run = message.substring(i, j);
            out.append(run.length() > LONGEST_RUN ? Echo.cut(run) : run);
            while (j < n && Character.isWhitespace(message.charAt(j))) {
                out.append(message.charAt(j++));
            }
            i = j;
        }
        return out.toString();
    }
}
