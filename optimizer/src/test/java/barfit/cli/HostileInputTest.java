package barfit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeout;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.catalogs.InputFiles;
import java.io.IOException;
import java.io.RandomAccessFile;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.Duration;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Input that used to hang, eat memory or be accepted silently, made in the test's own folder (nothing big
 * is committed): every case gives exit 2 and one line naming the file, and does so quickly.
 */
class HostileInputTest {
    static final Path CSV_SETTINGS = BadCsvTest.SETTINGS;
    static final String HEADER = "id,span,ends,m_left,m_mid,m_right,v_left,v_right,dead,live\n";
    static final String ROW = "B%d,6.0,one-end-continuous,,120,-160,90,110,18,9\n";
    static final String CHECK = """
            units: SI
            concrete: {fc: 28}
            steel: {fy: 420}
            beams:
              - id: K2
                section: {width: 300, height: 600}
                bottom: [{bar: "29", count: 3}]
                top: [{bar: "16", count: 2}]
                Mu: %s
                ends: simple
                span: %s
            """;

    @TempDir
    Path dir;

    /** One line on stderr starting "barfit: FILE[:where]:" and containing {@code expected}; exit 2, no stdout. */
    private static String rejected(Cli r, Path file, String where, String expected) {
        assertEquals(2, r.exit(), "exit code; stderr: " + shorten(r.err()));
        assertEquals("", r.out(), "nothing on stdout");
        String err = r.err().strip();
        assertFalse(err.contains("\n"), "one line only: " + shorten(err));
        assertTrue(err.startsWith("barfit: " + file + where + ":"), "names the file and place: " + shorten(err));
        assertTrue(err.contains(expected), "says '" + expected + "': " + shorten(err));
        assertFalse(err.contains("Exception") || err.contains("\tat "), "no stack trace: " + shorten(err));
        return err;
    }

    private static String shorten(String s) {
        return s.length() > 1000 ? s.substring(0, 1000) + "..." : s;
    }

    private Path write(String name, String text) throws IOException {
        Path f = dir.resolve(name);
        Files.writeString(f, text, StandardCharsets.UTF_8);
        return f;
    }

    private static Cli schedule(Path csv, Path out) {
        return Cli.run(
                "schedule", CSV_SETTINGS.toString(), "--beams", csv.toString(), "--out", out.toString(), "--quiet");
    }

    @Test
    void longDigitRunsAreReadInLinearTime() throws IOException {
        // 100 kB of digits took over 20 s when a regular expression backtracked over them; now one pass
        String digits = "1".repeat(100_000);
        Path notANumber = write("digits-x.yaml", CHECK.formatted(digits + "x", "6"));
        Path tooLarge = write("digits.yaml", CHECK.formatted(digits, "6"));
        Path quoted = write("digits-quoted.yaml", CHECK.formatted("\"" + digits + "\"", "6"));
        Path csv = write("digits.csv", "id,span,ends,m_mid\nB1,6.0,simple," + digits + "x\n");
        assertTimeout(Duration.ofSeconds(10), () -> {
            String err = rejected(
                    Cli.run("check", notANumber.toString()),
                    notANumber,
                    ":9:9",
                    "beams[1].Mu: expected the factored moment");
            assertTrue(err.length() < 400, "the value is quoted cut, not whole: " + err.length() + " characters");
            rejected(Cli.run("check", tooLarge.toString()), tooLarge, ":9:9", "too large a number");
            // a quoted number used to be taken as infinite and checked: "Mu = Infinity"
            rejected(Cli.run("check", quoted.toString()), quoted, ":9:9", "too large a number");
            rejected(schedule(csv, dir.resolve("out")), csv, ":2:15", "m_mid: expected a number");
        });
    }

    @Test
    void aCsvOverTheLimitIsRefusedBeforeItIsRead() throws IOException {
        Path csv = write("huge.csv", HEADER);
        try (RandomAccessFile f = new RandomAccessFile(csv.toFile(), "rw")) {
            f.setLength(50L * 1024 * 1024); // 50 MB, sparse: its last row would be bad
        }
        assertTimeout(
                Duration.ofSeconds(10),
                () -> rejected(
                        schedule(csv, dir.resolve("out")),
                        csv,
                        "",
                        "is 50.0 MB, more than the 8 MB (8,388,608 bytes) barfit reads from a CSV file; expected a smaller "
                                + "file: split the beams into several schedules"));
        assertFalse(Files.exists(dir.resolve("out")), "nothing written");
    }

    @Test
    void aBadLastRowIsFoundWhileStreaming() throws IOException {
        Path csv = dir.resolve("long.csv");
        int rows = 20_000;
        try (Writer w = Files.newBufferedWriter(csv, StandardCharsets.UTF_8)) {
            w.write(HEADER);
            for (int i = 0; i < rows; i++) {
                w.write(ROW.formatted(i));
            }
            w.write("LAST,6.0,one-end-continuous,,120,-160,90,110,18,x\n");
        }
        assertTrue(Files.size(csv) < InputFiles.CSV_MAX_BYTES, "within the limit, so every row is read");
        assertTimeout(
                Duration.ofSeconds(20),
                () -> rejected(
                        schedule(csv, dir.resolve("out")),
                        csv,
                        ":" + (rows + 2) + ":49",
                        "live: expected a number (the service live load"));
    }

    @Test
    void aYamlFileOverTheLimitSaysTheLimitAndWhatToDo() throws IOException {
        StringBuilder sb = new StringBuilder(CHECK.formatted("200", "6"));
        String pad = "# " + "x".repeat(97) + "\n";
        while (sb.length() <= InputFiles.YAML_MAX_BYTES) {
            sb.append(pad);
        }
        Path f = write("huge.yaml", sb.toString());
        // it was reported as a syntax error ("check indentation") at the 3 MB the parser stops at
        rejected(
                Cli.run("check", f.toString()),
                f,
                "",
                "more than the 4 MB (4,194,304 bytes) barfit reads from a "
                        + "YAML file; expected a smaller file: split the beams over several files, or give a schedule's "
                        + "beams in a CSV file (--beams)");
    }

    @Test
    void fileErrorsAreSaidInWords() throws IOException {
        Path folder = Files.createDirectory(dir.resolve("beams.yaml"));
        rejected(Cli.run("check", folder.toString()), folder, "", "is a folder, not a file; expected a YAML file");
        Path csvFolder = Files.createDirectory(dir.resolve("beams.csv"));
        rejected(
                schedule(csvFolder, dir.resolve("out")), csvFolder, "", "is a folder, not a file; expected a CSV file");
        rejected(
                Cli.run("check", dir.resolve("none.yaml").toString()),
                dir.resolve("none.yaml"),
                "",
                "no such file; expected a YAML file");

        Path a = dir.resolve("a.yaml");
        Path b = dir.resolve("b.yaml");
        try {
            Files.createSymbolicLink(a, b.getFileName());
            Files.createSymbolicLink(b, a.getFileName());
        } catch (UnsupportedOperationException | IOException e) {
            Assumptions.abort("symbolic links cannot be made here: " + e.getMessage());
        }
        rejected(Cli.run("check", a.toString()), a, "", "is a symbolic link that leads back to itself (a link loop)");
        Path dangling = dir.resolve("gone.yaml");
        Files.createSymbolicLink(dangling, dir.resolve("never-written.yaml"));
        rejected(
                Cli.run("check", dangling.toString()),
                dangling,
                "",
                "is a symbolic link to a file that does not exist");
    }

    @Test
    void aFileWithoutReadPermissionIsSaidInWords() throws IOException {
        Path f = write("locked.yaml", CHECK.formatted("200", "6"));
        try {
            Files.setPosixFilePermissions(f, PosixFilePermissions.fromString("-w-------"));
        } catch (UnsupportedOperationException e) {
            Assumptions.abort("no POSIX permissions here");
        }
        Assumptions.assumeFalse(Files.isReadable(f), "this user reads any file (root): nothing to refuse");
        rejected(
                Cli.run("check", f.toString()),
                f,
                "",
                "no permission to read it; expected a YAML file barfit may read");
    }

    @Test
    void longValuesAreQuotedCut() throws IOException {
        String junk = "x".repeat(200_000);
        Path yaml = write("ends.yaml", CHECK.formatted("200", "6").replace("ends: simple", "ends: " + junk));
        String err = rejected(Cli.run("check", yaml.toString()), yaml, ":10:11", "beams[1].ends: expected simple,");
        assertTrue(err.contains("x".repeat(60) + "… (200000 characters)"), "the first 60 characters, then …: " + err);
        assertTrue(err.length() < 400, err.length() + " characters");

        Path bar = write("bar.yaml", CHECK.formatted("200", "6").replace("bar: \"29\"", "bar: \"" + junk + "\""));
        err = rejected(Cli.run("check", bar.toString()), bar, ":7:20", "bar size \"" + "x".repeat(60) + "…");
        assertTrue(err.length() < 600, err.length() + " characters");

        Path csv = write("ends.csv", "id,span,ends,m_mid\nB1,6.0," + junk + ",120\n");
        err = rejected(schedule(csv, dir.resolve("out")), csv, ":2:8", "ends: expected simple");
        assertTrue(err.length() < 400, err.length() + " characters");
        Path column = write("column.csv", "id,span,ends," + junk + "\nB1,6.0,simple,120\n");
        err = rejected(schedule(column, dir.resolve("out")), column, ":1:14", "unknown column");
        assertTrue(err.length() < 600, err.length() + " characters");
    }

    @Test
    void helpPrintsTheUsageAsHelpDoes() {
        Cli help = Cli.run("help");
        Cli dashes = Cli.run("--help");
        assertEquals(0, help.exit(), help.err());
        assertEquals(dashes.out(), help.out());
        assertTrue(help.out().contains("Usage: barfit"), help.out());
        Cli design = Cli.run("help", "design");
        assertEquals(Cli.run("design", "--help").out(), design.out());
    }
}
