package barfit.design;

import com.google.ortools.Loader;
import com.google.ortools.sat.CpSolver;
import java.nio.file.Files;
import java.nio.file.Path;

/** Loads OR-Tools' native library once per process, failing clearly when it cannot. */
public final class OrTools {
    private static volatile boolean loaded;

    private OrTools() {
    }

    public static synchronized void load() {
        if (loaded) {
            return;
        }
        // The loader unpacks the native library into the temporary folder; without one it fails later
        // and silently, at the first variable.
        String tmp = System.getProperty("java.io.tmpdir");
        Path dir = tmp == null ? null : Path.of(tmp);
        if (dir == null || !Files.isDirectory(dir) || !Files.isWritable(dir)) {
            throw new SetupError("the temporary folder '" + tmp + "' is missing or not writable; "
                    + "the solver unpacks its native library there (set TMPDIR or -Djava.io.tmpdir)");
        }
        try {
            Loader.loadNativeLibraries();
        } catch (UnsatisfiedLinkError | RuntimeException e) {
            throw new SetupError("cannot load the OR-Tools native library for this machine ("
                    + System.getProperty("os.name") + " " + System.getProperty("os.arch") + "): " + e.getMessage());
        }
        loaded = true;
    }

    /** A CP-SAT solver set up as the options say: workers, fixed seed, time limit, no log. */
    public static CpSolver solver(SolverOptions o) {
        load();
        CpSolver solver = new CpSolver();
        solver.getParameters().setNumWorkers(Math.max(1, o.workers())).setRandomSeed(o.seed())
                .setMaxTimeInSeconds(o.timeLimitSeconds()).setLogSearchProgress(false);
        return solver;
    }
}
