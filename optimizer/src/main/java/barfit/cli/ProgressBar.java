package barfit.cli;

import barfit.schedule.Progress;
import barfit.schedule.Progress.Phase;
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

    /** The phase in words, as the bar shows it. */
    static String words(Phase phase) {
        return switch (phase.step()) {
            case DESIGNING_BEAMS -> "designing beams";
            case BOUNDING_SIZES -> "bounding sizes";
            case PRICING_SIZES -> "pricing sizes";
            case BAR_SIZE_SETS ->
                phase.maxSizes() == Phase.ANY_NUMBER
                        ? "rationalising: bar-size sets, any number of sizes"
                        : "rationalising: bar-size sets for " + phase.maxSizes()
                                + (phase.maxSizes() == 1 ? " size" : " sizes");
            case STANDARDISATION -> "price of standardisation";
            case DESIGNING_IN_CHOSEN_SIZES -> "designing in the chosen sizes";
        };
    }

    @Override
    public synchronized void update(Phase phase, int done, int total) {
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
        String line = String.format(
                Locale.ROOT,
                "[%s] %3d%% %s %d/%d",
                bar,
                total <= 0 ? 100 : 100 * done / total,
                words(phase),
                done,
                total);
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
