package barfit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every file in the bad-input corpus must give exit code 2 and exactly one line on stderr that names
 * the file and the line, says what was expected, and carries no stack trace. The first line of each
 * file says what to expect: {@code # expect LINE: text}, or {@code # expect LINE:COLUMN: text} where the
 * column matters too (syntax errors). Files named design-* go to {@code design},
 * compare-* to {@code compare}, analyse-* to {@code analyse}, the others to {@code check}. Bad command-line options get the same
 * treatment: one line naming the option or file and what is expected, exit 2, nothing written.
 */
class BadInputTest {
    static final Path CORPUS = Path.of("src/test/resources/bad-input");
    private static final Pattern EXPECT = Pattern.compile("# expect (\\d+(?::\\d+)?): (.*)");

    static Stream<Path> corpus() throws IOException {
        List<Path> files;
        try (Stream<Path> s = Files.list(CORPUS)) {
            files = s.filter(p -> p.toString().endsWith(".yaml")).sorted().toList();
        }
        assertTrue(files.size() >= 15, "the corpus needs at least 15 files");
        return files.stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("corpus")
    void rejectedWithOneLine(Path file) throws IOException {
        String first = Files.readAllLines(file).get(0);
        Matcher m = EXPECT.matcher(first);
        assertTrue(m.matches(), "first line must be '# expect LINE: text' or '# expect LINE:COLUMN: text': " + first);
        String line = m.group(1);
        String text = m.group(2);
        String before = Files.readString(file);
        String name = file.getFileName().toString();
        String command = name.startsWith("design-")
                ? "design"
                : name.startsWith("compare-") ? "compare" : name.startsWith("analyse-") ? "analyse" : "check";
        {
            Cli r = Cli.run(command, file.toString());
            assertEquals(2, r.exit(), "exit code; stderr: " + r.err());
            assertEquals("", r.out(), "nothing on stdout");
            String err = r.err().strip();
            assertFalse(err.contains("\n"), "one line only: " + err);
            assertTrue(err.startsWith("barfit: " + file + ":" + line + ":"), "file and line: " + err);
            assertTrue(err.contains(text), "says what is expected (" + text + "): " + err);
            assertFalse(err.contains("Exception") || err.contains("\tat "), "no stack trace: " + err);
        }
        assertEquals(before, Files.readString(file), "the input is untouched");
    }

    static final String STUDY = "src/test/resources/studies/doubly-textbook-us.yaml";

    /** Each case: the arguments, then what the one line must start with after "barfit: ", then what it expects. */
    static Stream<Arguments> badOptions() {
        return Stream.of(
                Arguments.of(
                        List.of("compare", STUDY, "--max-width", "Infinity"), "--max-width:", "expected a width from"),
                Arguments.of(List.of("compare", STUDY, "--max-width", "NaN"), "--max-width:", "got NaN"),
                Arguments.of(List.of("compare", STUDY, "--max-width", "1e12"), "--max-width:", "5 times the widest"),
                Arguments.of(List.of("compare", STUDY, "--fc", "NaN"), "--fc:", "expected f'c between"),
                Arguments.of(
                        List.of("sweep", STUDY, "--plot", "no-such-dir/x.svg"),
                        "no-such-dir/x.svg:",
                        "expected --plot in an existing directory"),
                Arguments.of(List.of("sweep", STUDY, "--csv", "--format", "json"), "--csv:", "expected one of them"),
                Arguments.of(List.of("bench", "--instances", "0"), "--instances:", "expected at least 1"),
                Arguments.of(
                        List.of("bench", "--schedule", "--rationalised-beams", "0"),
                        "--rationalised-beams:",
                        "expected at least 1 beam"),
                Arguments.of(
                        List.of("design", "../examples/lines/ashgrove-depot-lines-si.yaml", "--carbon-cap", "100"),
                        "--carbon-cap:",
                        "applies to single sections and whole spans; L1-B"),
                Arguments.of(List.of("frontier", STUDY, "--beams", "x.csv"), "--beams:", "expected --schedule with it"),
                Arguments.of(
                        List.of("frontier", STUDY, "--schedule", "--points", "21"), "--points:", "expected 0 to 20"),
                Arguments.of(
                        List.of("design", STUDY, "--carbon-cap", "-5"), "--carbon-cap:", "expected a positive carbon"),
                Arguments.of(List.of("design", STUDY, "--objective", "money"), "", "--objective"),
                // a number the parser cannot read, in words (not "'abc' is not a double")
                Arguments.of(
                        List.of("compare", STUDY, "--fc", "abc"),
                        "--fc:",
                        "expected numbers separated by commas, got 'abc'"),
                Arguments.of(
                        List.of("design", STUDY, "--workers", "two"),
                        "--workers:",
                        "expected a whole number, got 'two'"),
                // --force says what to replace: alone it is a usage error, not silently ignored
                Arguments.of(List.of("sweep", STUDY, "--force"), "--force:", "expected --plot FILE.svg with it"),
                Arguments.of(
                        List.of(
                                "schedule",
                                BadCsvTest.SETTINGS.toString(),
                                "--beams",
                                BadCsvTest.BEAMS.toString(),
                                "--force"),
                        "--force:",
                        "expected --out DIR with it"),
                // an option's error names the option, not the input file as if the option were in it
                Arguments.of(
                        List.of(
                                "schedule",
                                BadCsvTest.SETTINGS.toString(),
                                "--beams",
                                BadCsvTest.BEAMS.toString(),
                                "--threads",
                                "0"),
                        "--threads:",
                        "expected 1 to 256, got 0"),
                Arguments.of(
                        List.of("design", STUDY, "--beam", "NO-SUCH"),
                        "--beam:",
                        "no beam or line NO-SUCH in " + STUDY + "; expected one of:"),
                Arguments.of(
                        List.of("compare", STUDY, "--beam", "NO-SUCH"),
                        "--beam:",
                        "no beam, line or line part (LINE/span N) NO-SUCH in " + STUDY + "; expected one of:"),
                Arguments.of(
                        List.of(
                                "schedule",
                                BadCsvTest.SETTINGS.toString(),
                                "--beams",
                                BadCsvTest.BEAMS.toString(),
                                "--out",
                                BadCsvTest.BEAMS.toString()),
                        "--out:",
                        BadCsvTest.BEAMS + " is a file; expected a directory"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("badOptions")
    void badOptionsRejectedWithOneLine(List<String> args, String where, String expected) {
        Cli r = Cli.run(args.toArray(String[]::new));
        assertEquals(2, r.exit(), "exit code; stderr: " + r.err());
        assertEquals("", r.out(), "nothing on stdout");
        String err = r.err().strip();
        assertFalse(err.contains("\n"), "one line only: " + err);
        assertTrue(err.startsWith("barfit: " + where), "names the option or file: " + err);
        assertTrue(err.contains(expected), "says what is expected (" + expected + "): " + err);
        assertFalse(err.contains("Exception") || err.contains("\tat "), "no stack trace: " + err);
    }
}
