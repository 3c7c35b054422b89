package barfit.design;

import com.google.ortools.Loader;
import com.google.ortools.sat.CpSolver;
import com.google.ortools.sat.CpSolverStatus;
import java.io.IOException;
import java.io.InputStream;
import java.net.JarURLConnection;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Comparator;
import java.util.Enumeration;
import java.util.jar.JarEntry;
import java.util.jar.JarFile;
import java.util.stream.Stream;

/**
 * Loads OR-Tools' native library once per process, failing clearly when it cannot.
 *
 * <p>OR-Tools' own loader unpacks about 70 MB of native libraries into a new temporary folder on every
 * run (about half a second). When the system property {@value #CACHE_PROPERTY} names a folder (the
 * launcher gives one beside the jar), they are unpacked there once, into a subfolder named after the
 * jar they come from, and loaded from there on later runs. Whatever goes wrong with that folder, the
 * library is loaded the usual way.
 */
public final class OrTools {
    /** The folder the native libraries are unpacked into once, for every later run. */
    public static final String CACHE_PROPERTY = "barfit.native";
    /** Written last into a complete unpacked folder. */
    static final String COMPLETE = "complete";

    private static volatile boolean loaded;

    private OrTools() {}

    /**
     * When the library is already unpacked in the folder of {@value #CACHE_PROPERTY}, starts loading it
     * on a background thread, so that it overlaps with reading the input; {@link #load()} then waits for
     * it. Unpacking is never started here (a run that ends early would leave it half done), and a
     * failure is left for {@link #load()} to report.
     */
    public static void loadInBackground() {
        String cache = System.getProperty(CACHE_PROPERTY);
        if (loaded || cache == null || cache.isBlank()) {
            return;
        }
        Thread t = new Thread(
                () -> {
                    try {
                        // finding the folder scans the class path: here, not on the thread that reads the input
                        if (Files.isRegularFile(cacheFolder(Path.of(cache)).resolve(COMPLETE))) {
                            load();
                        }
                    } catch (IOException | RuntimeException | LinkageError e) {
                        // load() on the solving thread tries again and reports it
                    }
                },
                "barfit-native-load");
        t.setDaemon(true);
        t.start();
    }

    public static synchronized void load() {
        if (loaded) {
            return;
        }
        String cache = System.getProperty(CACHE_PROPERTY);
        if (cache != null && !cache.isBlank() && loadFromCache(Path.of(cache))) {
            loaded = true;
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

    /** The folder the native libraries of this machine are (or would be) unpacked into under {@code base}. */
    static Path cacheFolder(Path base) throws IOException {
        URL url = platformResource();
        if (url == null || !"jar".equals(url.getProtocol())) {
            throw new IOException("the native libraries are not in a jar: " + url);
        }
        Path jar = jarOf(url).getFileName();
        if (jar == null) {
            throw new IOException("the native libraries' jar has no file name: " + url);
        }
        return base.resolve(jar.toString().replaceFirst("\\.jar$", ""));
    }

    /** Loads the library from {@code base}, unpacking it there first if needed; false if that cannot be done. */
    static boolean loadFromCache(Path base) {
        try {
            Path dir = cacheFolder(base);
            if (!Files.isRegularFile(dir.resolve(COMPLETE))) {
                unpack(jarOf(platformResource()), prefix(), base, dir);
            }
            System.load(dir.resolve(System.mapLibraryName("jniortools"))
                    .toAbsolutePath()
                    .toString());
            return true;
        } catch (IOException | UnsatisfiedLinkError | RuntimeException e) {
            return false;
        }
    }

    /** The resource folder OR-Tools keeps this platform's libraries in, as its own loader names it. */
    static String prefix() {
        return "ortools-" + com.sun.jna.Platform.RESOURCE_PREFIX + "/";
    }

    private static URL platformResource() {
        return OrTools.class.getClassLoader().getResource(prefix());
    }

    private static Path jarOf(URL url) throws IOException {
        try {
            return Path.of(
                    ((JarURLConnection) url.openConnection()).getJarFileURL().toURI());
        } catch (URISyntaxException | IllegalArgumentException e) {
            throw new IOException(e);
        }
    }

    /**
     * Unpacks the entries under {@code prefix} of {@code jar} into a fresh folder under {@code base}, then
     * renames it to {@code dir} in one step, so that a run never sees a half-written folder; when another
     * run got there first, its folder is kept.
     */
    static void unpack(Path jar, String prefix, Path base, Path dir) throws IOException {
        Files.createDirectories(base);
        Path tmp = Files.createTempDirectory(base, ".unpacking-");
        try {
            try {
                Files.setPosixFilePermissions(
                        tmp, PosixFilePermissions.fromString("rwxr-xr-x")); // as the jar beside it
            } catch (UnsupportedOperationException e) {
                // not a POSIX file system: its defaults will do
            }
            try (JarFile jf = new JarFile(jar.toFile())) {
                for (Enumeration<JarEntry> e = jf.entries(); e.hasMoreElements(); ) {
                    JarEntry entry = e.nextElement();
                    String name = entry.getName();
                    if (entry.isDirectory() || !name.startsWith(prefix)) {
                        continue;
                    }
                    String file = name.substring(prefix.length());
                    if (file.isEmpty() || file.contains("/") || file.contains("\\") || file.equals("..")) {
                        continue; // the libraries sit flat in their folder
                    }
                    try (InputStream in = jf.getInputStream(entry)) {
                        Files.copy(in, tmp.resolve(file));
                    }
                }
            }
            Files.writeString(tmp.resolve(COMPLETE), jar.getFileName() + "\n");
            try {
                Files.move(tmp, dir, StandardCopyOption.ATOMIC_MOVE);
            } catch (IOException e) {
                if (!Files.isRegularFile(dir.resolve(COMPLETE))) {
                    throw e;
                }
            }
        } finally {
            deleteTree(tmp);
        }
    }

    private static void deleteTree(Path root) {
        if (!Files.exists(root)) {
            return;
        }
        try (Stream<Path> s = Files.walk(root)) {
            s.sorted(Comparator.reverseOrder()).forEach(p -> deleteQuietly(p));
        } catch (IOException | RuntimeException e) {
            // a leftover temporary folder costs disk space only
        }
    }

    private static void deleteQuietly(Path p) {
        try {
            Files.deleteIfExists(p);
        } catch (IOException e) {
            // as above: what cannot be deleted is left behind
        }
    }

    /** A CP-SAT solver set up as the options say: workers, fixed seed, time limit, no log. */
    public static CpSolver solver(SolverOptions o) {
        load();
        CpSolver solver = new CpSolver();
        solver.getParameters()
                .setNumWorkers(Math.max(1, o.workers()))
                .setRandomSeed(o.seed())
                .setMaxTimeInSeconds(o.timeLimitSeconds())
                .setLogSearchProgress(false);
        return solver;
    }

    /** Characters of CP-SAT's reason for an invalid model quoted in the message. */
    private static final int WHY_MAX = 200;

    /**
     * CP-SAT's status in the proof's words. UNKNOWN means a limit ended the solve before it had a solution
     * or a proof ({@link Proof.Status#OUT_OF_TIME}); MODEL_INVALID means barfit built a model CP-SAT cannot
     * take ({@code model} names it), a bug: it is thrown as {@link InvalidModelError}, never reported as an
     * answer.
     */
    public static Proof.Status status(CpSolverStatus status, CpSolver solver, String model) {
        return switch (status) {
            case OPTIMAL -> Proof.Status.OPTIMAL;
            case FEASIBLE -> Proof.Status.FEASIBLE;
            case INFEASIBLE -> Proof.Status.INFEASIBLE;
            case UNKNOWN -> Proof.Status.OUT_OF_TIME;
            case MODEL_INVALID, UNRECOGNIZED -> {
                // CP-SAT's own reason, on one line and cut: it can quote a whole constraint
                String info = solver.getSolutionInfo();
                String why = info == null ? "" : info.strip().replaceAll("\\s+", " ");
                if (why.length() > WHY_MAX) {
                    why = why.substring(0, WHY_MAX) + "…";
                }
                throw new InvalidModelError("CP-SAT found " + model + " invalid (" + status
                        + (why.isEmpty() ? "" : ": " + why) + "); this is a bug in barfit, not in the input: please "
                        + "report it with the input file");
            }
        };
    }
}
