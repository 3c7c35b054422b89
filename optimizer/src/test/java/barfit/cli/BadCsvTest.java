package barfit.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Bad schedule input, CSV and YAML: every case in {@code src/test/resources/bad-input-csv/} goes through
 * {@code barfit schedule ... --out DIR} and must give exit code 2, nothing on stdout, exactly one line
 * on stderr starting {@code barfit: FILE:LINE:COL:} and containing the expected text, no stack trace,
 * nothing in DIR, and every input file as it was.
 * <p>
 * The corpus, by file name:
 * <ul>
 * <li>{@code _settings.yaml}, {@code _beams.csv}: valid fixtures, not cases (checked to design with
 * exit 0, so that a case's error is the case's own);</li>
 * <li>{@code *.csv}: {@code schedule _settings.yaml --beams FILE --out DIR};</li>
 * <li>{@code yaml-*.yaml}: {@code schedule FILE --out DIR}, with {@code --beams _beams.csv} added when the
 * name contains {@code -and-csv-}.</li>
 * </ul>
 * Each case's first line is {@code # expect LINE:COL: text} (the reader skips lines starting with #).
 * A second line {@code # open: why} marks a case where the command does not yet do what the first line
 * expects: such a case is skipped with its reason while it still misbehaves, and fails as soon as it
 * passes, so that the mark is removed.
 */
class BadCsvTest {
    static final Path CORPUS = Path.of("src/test/resources/bad-input-csv");
    static final Path SETTINGS = CORPUS.resolve("_settings.yaml");
    static final Path BEAMS = CORPUS.resolve("_beams.csv");
    private static final Pattern EXPECT = Pattern.compile("# expect (\\d+):(\\d+): (.*)");
    private static final Pattern OPEN = Pattern.compile("# open: (.*)");

    static Stream<Path> corpus() throws IOException {
        List<Path> files;
        try (Stream<Path> s = Files.list(CORPUS)) {
            files = s.filter(p -> !p.getFileName().toString().startsWith("_"))
                    .sorted()
                    .toList();
        }
        long csv = files.stream().filter(p -> p.toString().endsWith(".csv")).count();
        long yaml = files.stream()
                .filter(p -> p.getFileName().toString().startsWith("yaml-")
                        && p.toString().endsWith(".yaml"))
                .count();
        assertTrue(csv >= 15, "at least 15 CSV cases, found " + csv);
        assertTrue(yaml >= 5, "at least 5 YAML cases, found " + yaml);
        assertEquals(files.size(), csv + yaml, "every corpus file is a .csv or a yaml-*.yaml case: " + files);
        return files.stream();
    }

    @Test
    void fixturesAreValid(@TempDir Path tmp) {
        Cli r = Cli.run(
                "schedule",
                SETTINGS.toString(),
                "--beams",
                BEAMS.toString(),
                "--out",
                tmp.resolve("out").toString(),
                "--quiet");
        assertEquals(0, r.exit(), r.err());
        assertEquals("", r.err());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("corpus")
    void rejectedWithOneLine(Path file, @TempDir Path tmp) throws IOException {
        // ISO-8859-1 reads any bytes, so a case that is not UTF-8 still gives its comment lines
        List<String> head = Files.readAllLines(file, StandardCharsets.ISO_8859_1);
        Matcher m = EXPECT.matcher(head.isEmpty() ? "" : head.get(0));
        assertTrue(m.matches(), "first line must be '# expect LINE:COL: text': " + (head.isEmpty() ? "" : head.get(0)));
        String where = m.group(1) + ":" + m.group(2);
        String text = m.group(3);
        Matcher open = OPEN.matcher(head.size() > 1 ? head.get(1) : "");

        List<String> args = new ArrayList<>(List.of("schedule"));
        List<Path> inputs = new ArrayList<>();
        String name = file.getFileName().toString();
        if (name.endsWith(".csv")) {
            args.addAll(List.of(SETTINGS.toString(), "--beams", file.toString()));
            inputs.addAll(List.of(SETTINGS, file));
        } else {
            args.add(file.toString());
            inputs.add(file);
            if (name.contains("-and-csv-")) {
                args.addAll(List.of("--beams", BEAMS.toString()));
                inputs.add(BEAMS);
            }
        }
        Path out = tmp.resolve("out");
        args.addAll(List.of("--out", out.toString(), "--quiet"));
        List<byte[]> before = new ArrayList<>();
        for (Path p : inputs) {
            before.add(Files.readAllBytes(p));
        }

        Cli r = Cli.run(args.toArray(String[]::new));
        String err = r.err().strip();
        List<String> problems = new ArrayList<>();
        if (r.exit() != 2) {
            problems.add("exit code " + r.exit() + ", expected 2");
        }
        if (!r.out().isEmpty()) {
            problems.add("stdout not empty");
        }
        if (err.contains("\n")) {
            problems.add("more than one line on stderr");
        }
        if (!err.startsWith("barfit: " + file + ":" + where + ":")) {
            problems.add("does not start with 'barfit: " + file + ":" + where + ":'");
        }
        if (!err.contains(text)) {
            problems.add("does not say '" + text + "'");
        }
        if (open.matches()) {
            if (problems.isEmpty()) {
                fail("this open case now gives the expected line: remove its '# open:' line");
            }
            Assumptions.abort("open: " + open.group(1) + " (printed: "
                    + err.lines().findFirst().orElse("") + ")");
        }
        if (!problems.isEmpty()) {
            fail(String.join("; ", problems) + "; stderr: " + r.err());
        }
        assertFalse(err.contains("Exception") || err.contains("\tat "), "no stack trace: " + err);
        assertTrue(!Files.exists(out) || isEmpty(out), "nothing written into --out");
        for (int i = 0; i < inputs.size(); i++) {
            assertArrayEquals(before.get(i), Files.readAllBytes(inputs.get(i)), inputs.get(i) + " is untouched");
        }
    }

    private static boolean isEmpty(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.findAny().isEmpty();
        }
    }
}
