package barfit.cli;

import barfit.schedule.Progress;
import java.io.PrintWriter;
import java.util.Locale;

/**
 * A one-line progress bar on stderr, drawn only when stderr is a terminal and the run has lasted a
 * second; cleared when done. Updates come from several threads.
 */
final class ProgressBar implements Progress {
    private static final int WIDTH = 30;
    private final PrintWriter err;
    private final boolean enabled;
    private final long start = System.nanoTime();
    private long lastDraw;
    private boolean drawn;
    private int width;

    ProgressBar(PrintWriter err, boolean enabled) {
        this.err = err;
        this.enabled = enabled;
    }

    /** Whether stderr is a terminal: the launcher says so; without it, whether there is a console at all. */
    static boolean stderrIsTerminal() {
        String flag = System.getenv("BARFIT_STDERR_TTY");
        if (flag != null) {
            return flag.equals("1");
        }
        return System.console() != null;
    }

    @Override
    public synchronized void update(String phase, int done, int total) {
        if (!enabled) {
            return;
        }
        long now = System.nanoTime();
        if (now - start < 1_000_000_000L || (now - lastDraw < 100_000_000L && done < total)) {
            return;
        }
        lastDraw = now;
        int filled = total <= 0 ? WIDTH : (int) Math.round(WIDTH * (double) done / total);
        String bar = "#".repeat(filled) + ".".repeat(WIDTH - filled);
        String line = String.format(Locale.ROOT, "[%s] %3d%% %s %d/%d", bar, total <= 0 ? 100 : 100 * done / total,
                phase, done, total);
        err.print("\r" + line + " ".repeat(Math.max(0, width - line.length())));
        width = Math.max(width, line.length());
        err.flush();
        drawn = true;
    }

    synchronized void finish() {
        if (drawn) {
            err.print("\r" + " ".repeat(width) + "\r");
            err.flush();
        }
    }
}
