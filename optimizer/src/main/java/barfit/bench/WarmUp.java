package barfit.bench;

import java.lang.management.CompilationMXBean;
import java.lang.management.ManagementFactory;
import java.util.Locale;

/**
 * A benchmark's warm-up: rounds of work on instances outside the measured set, each round running the
 * search and its yardstick alike, until the just-in-time compiler has gone quiet. A design of a millisecond
 * or less, timed while the compiler is still at work on a second core, is timed by the compiler's progress
 * more than by the search; the steady state reached here is the one a long schedule runs in. The compiler's
 * total time, as the JVM reports it, tells when it has gone quiet; where the JVM does not report it the
 * warm-up runs for its longest.
 */
final class WarmUp {
    /** How long the compiler must have done nothing, at the end of a round, for the warm-up to end. */
    static final double QUIET_SECONDS = 0.5;

    /** What a warm-up took: its wall time, its rounds, and whether the compiler went quiet before its longest. */
    record Figures(double seconds, int rounds, boolean quiet) {
        String describe() {
            return String.format(
                    Locale.ROOT,
                    "warm-up %.1f s over %d rounds (%s)",
                    seconds,
                    rounds,
                    quiet ? "until the compiler was quiet for " + QUIET_SECONDS + " s" : "stopped at its longest");
        }
    }

    private WarmUp() {}

    /** Runs {@code round} again and again for at least {@code least} seconds, until the compiler is quiet or {@code most} seconds have passed. */
    static Figures untilQuiet(Runnable round, double least, double most) {
        CompilationMXBean jit = ManagementFactory.getCompilationMXBean();
        boolean measured = jit != null && jit.isCompilationTimeMonitoringSupported();
        long start = System.nanoTime();
        long lastTime = measured ? jit.getTotalCompilationTime() : 0;
        long lastChange = start;
        int rounds = 0;
        while (true) {
            round.run();
            rounds++;
            long now = System.nanoTime();
            if (measured) {
                long t = jit.getTotalCompilationTime();
                if (t != lastTime) {
                    lastTime = t;
                    lastChange = now;
                }
            }
            double elapsed = (now - start) / 1e9;
            boolean quiet = measured && (now - lastChange) / 1e9 >= QUIET_SECONDS;
            if (elapsed >= least && quiet) {
                return new Figures(elapsed, rounds, true);
            }
            if (elapsed >= most) {
                return new Figures(elapsed, rounds, false);
            }
        }
    }
}
