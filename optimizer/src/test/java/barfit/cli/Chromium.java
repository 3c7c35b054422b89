package barfit.cli;

import static org.junit.jupiter.api.Assertions.fail;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/** What the browser tests share: finding headless Chromium, and starting it quiet and self-contained. */
public final class Chromium {
    private Chromium() {}

    /**
     * Chromium on the PATH. Without it the calling test is skipped, except on CI (environment variable CI set),
     * where it fails: CI installs it.
     */
    public static Path required(String what) {
        String path = System.getenv("PATH");
        if (path != null) {
            for (String d : path.split(File.pathSeparator)) {
                Path p = Path.of(d, "chromium");
                if (Files.isRegularFile(p) && Files.isExecutable(p)) {
                    return p;
                }
            }
        }
        if (System.getenv("CI") != null) {
            fail("chromium is not on the PATH; CI installs it");
        }
        assumeTrue(false, "chromium is not on the PATH: " + what + " not checked in a browser");
        return null;
    }

    /** The command line up to the test's own options: headless, no network of its own, a fresh profile. */
    public static List<String> command(Path chromium, Path profile) {
        return new ArrayList<>(List.of(
                chromium.toString(),
                "--headless",
                "--no-sandbox",
                "--disable-gpu",
                "--disable-quic",
                "--no-first-run",
                "--disable-background-networking",
                "--disable-component-update",
                "--disable-sync",
                "--user-data-dir=" + profile));
    }
}
