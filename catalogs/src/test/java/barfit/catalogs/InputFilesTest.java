package barfit.catalogs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Reading the user's files: sizes, encodings and I/O failures in words. */
class InputFilesTest {
    @TempDir
    Path dir;

    @Test
    void ioFailuresNameNoExceptionClass() {
        Path f = dir.resolve("beams.yaml");
        InputError denied = InputFiles.cannotRead(f, new AccessDeniedException(f.toString()), "a YAML file");
        assertEquals(f + ": no permission to read it; expected a YAML file barfit may read", denied.oneLine());
        InputError other = InputFiles.cannotRead(
                f, new FileSystemException(f.toString(), null, "Input/output error"), "a YAML file");
        assertEquals(
                f + ": cannot be read (input/output error); expected a YAML file barfit may read", other.oneLine());
        InputError bare = InputFiles.cannotRead(f, new IOException(), "a CSV file");
        assertFalse(bare.oneLine().contains("Exception"), bare.oneLine());
    }

    @Test
    void linesEndAtLfCrLfOrCrAndBytesThatAreNotUtf8ArePlaced() throws IOException {
        Path f = dir.resolve("mixed.csv");
        Files.write(f, "a,b\r\nc\rd\n\ne".getBytes(java.nio.charset.StandardCharsets.UTF_8));
        List<String> lines = new ArrayList<>();
        List<Integer> numbers = new ArrayList<>();
        try (InputFiles.Lines in = InputFiles.lines(f, "a CSV file", 100, "")) {
            for (String l = in.next(); l != null; l = in.next()) {
                lines.add(l);
                numbers.add(in.lineNumber());
            }
            assertNull(in.next());
        }
        assertEquals(List.of("a,b", "c", "d", "", "e"), lines);
        assertEquals(List.of(1, 2, 3, 4, 5), numbers);

        Path bad = dir.resolve("latin1.csv");
        // "Café" in ISO-8859-1 on line 2: é is the byte 0xE9, the 9th byte of the file, column 4
        Files.write(bad, new byte[] {'i', 'd', '\n', 'C', 'a', 'f', (byte) 0xE9, '\n'});
        InputError e = assertThrows(InputError.class, () -> {
            try (InputFiles.Lines in = InputFiles.lines(bad, "a CSV file", 100, "")) {
                while (in.next() != null) {
                    // read on to the bad byte
                }
            }
        });
        assertEquals(
                bad + ":2:4: not valid UTF-8 text (byte 0xE9, byte 7 of the file); expected a CSV file saved "
                        + "as UTF-8",
                e.oneLine());
        InputError whole = assertThrows(InputError.class, () -> InputFiles.readText(bad, "a YAML file", 100, ""));
        assertEquals(
                bad + ":2:4: not valid UTF-8 text (byte 0xE9, byte 7 of the file); expected a YAML file saved "
                        + "as UTF-8",
                whole.oneLine());
    }

    @Test
    void theSizeLimitIsStatedWithWhatToDo() throws IOException {
        Path f = dir.resolve("big.csv");
        Files.write(f, new byte[101]);
        InputError e = assertThrows(InputError.class, () -> InputFiles.lines(f, "a CSV file", 100, "split it"));
        assertEquals(f + ": is 101 bytes, more than the 100 bytes barfit reads from a CSV file; split it", e.oneLine());
    }
}
