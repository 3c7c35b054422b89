package barfit.golden;

import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;

/**
 * Golden files: what a run prints and writes, kept under the module's {@code src/test/resources/golden/}
 * and compared byte for byte (the examples' outputs, the searches' answers on seeded random problems).
 * Run with {@code -Dgolden.update=true} to rewrite them from the current output instead (then review the
 * difference with git). On a mismatch the output is also written under {@code target/golden-actual/} with
 * the same name, for a diff. Shared with the examples module through the optimizer's test jar.
 */
public final class Golden {
    /** Paths are relative to the module the tests run in (Maven runs each module's tests in its folder). */
    public static final Path DIR = Path.of("src/test/resources/golden");

    static final Path ACTUAL = Path.of("target/golden-actual");
    static final String UPDATE_PROPERTY = "golden.update";

    private Golden() {}

    /** What to do when the output changed, naming the module the tests run in. */
    static String howToUpdate() {
        String m = module();
        return "if the change is intended, rewrite the golden files with `mvn -B verify -Dgolden.update=true` (or "
                + "`mvn -B test -pl " + m + " -am -Dgolden.update=true`) and review `git diff " + m + "`";
    }

    public static boolean updating() {
        return Boolean.parseBoolean(System.getProperty(UPDATE_PROPERTY, "false"));
    }

    /** The output {@code actual} must equal the golden file {@code name} (a path under the golden folder). */
    public static void check(String name, String actual) {
        check(DIR.resolve(name), actual.getBytes(StandardCharsets.UTF_8));
    }

    /** Compares {@code actual} with the file {@code golden}, or rewrites the file when updating. */
    public static void check(Path golden, byte[] actual) {
        if (updating()) {
            write(golden, actual);
            return;
        }
        if (!Files.isRegularFile(golden)) {
            keepActual(golden, actual);
            fail("no golden file " + shown(golden) + "; the output is in " + shown(kept(golden)) + "; "
                    + howToUpdate());
        }
        byte[] expected = read(golden);
        if (!java.util.Arrays.equals(expected, actual)) {
            Path kept = keepActual(golden, actual);
            fail(shown(golden) + " differs from the output (" + firstDifference(expected, actual)
                    + "); the output is in " + shown(kept) + "; " + howToUpdate());
        }
    }

    /**
     * For an output too large to keep in the repository: its SHA-256 must equal the one in the golden file
     * {@code name + ".sha256"}.
     */
    public static void checkDigest(String name, byte[] actual) {
        Path golden = DIR.resolve(name + ".sha256");
        String line = sha256(actual) + "  " + Path.of(name).getFileName() + "\n";
        if (!updating()
                && Files.isRegularFile(golden)
                && !new String(read(golden), StandardCharsets.UTF_8).equals(line)) {
            Path kept = keepActual(DIR.resolve(name), actual);
            fail(name + " differs from the output whose SHA-256 is in " + shown(golden) + "; the output is in "
                    + shown(kept) + "; " + howToUpdate());
        }
        check(golden, line.getBytes(StandardCharsets.UTF_8));
    }

    public static String sha256(byte[] data) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(data));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    /** Line and column of the first difference, with both lines (cut to 200 characters). */
    static String firstDifference(byte[] expected, byte[] actual) {
        List<String> e = new String(expected, StandardCharsets.UTF_8).lines().toList();
        List<String> a = new String(actual, StandardCharsets.UTF_8).lines().toList();
        for (int i = 0; i < Math.max(e.size(), a.size()); i++) {
            String le = i < e.size() ? e.get(i) : null;
            String la = i < a.size() ? a.get(i) : null;
            if (le == null || la == null || !le.equals(la)) {
                return "first difference at line " + (i + 1) + ": expected " + quote(le) + ", got " + quote(la);
            }
        }
        return "the lines are equal; the line ends or the final newline differ";
    }

    private static String quote(String line) {
        if (line == null) {
            return "the end of the file";
        }
        return "«" + (line.length() > 200 ? line.substring(0, 200) + "…" : line) + "»";
    }

    private static Path keepActual(Path golden, byte[] actual) {
        Path kept = kept(golden);
        write(kept, actual);
        return kept;
    }

    /** Where the output compared with {@code golden} is kept when they differ. */
    private static Path kept(Path golden) {
        return ACTUAL.resolve((golden.startsWith(DIR) ? DIR.relativize(golden) : golden.getFileName()).toString());
    }

    /** A path in the module as seen from the repository's root, where the update command runs. */
    private static String shown(Path p) {
        return module() + "/" + p.toString().replace('\\', '/');
    }

    /** The module the tests run in: Maven runs them in the module's folder. */
    private static String module() {
        Path here = Path.of("").toAbsolutePath().getFileName();
        return here == null ? "." : here.toString();
    }

    private static byte[] read(Path p) {
        try {
            return Files.readAllBytes(p);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void write(Path p, byte[] data) {
        try {
            if (p.getParent() != null) {
                Files.createDirectories(p.getParent());
            }
            Files.write(p, data);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
