package barfit.cli;

import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The launcher's training run for its class-data archive: runs the command lines given (separated by
 * {@code --}) in this process, output discarded, so that the archive written at exit holds the classes
 * those commands load. Exit code 0 when every command line ran (whatever it answered), 3 otherwise.
 */
public final class Warmup {
    private Warmup() {}

    public static void main(String[] args) {
        PrintStream none = new PrintStream(OutputStream.nullOutputStream(), true, StandardCharsets.UTF_8);
        int code = Main.OK;
        for (List<String> line : commandLines(args)) {
            int c = Main.run(line.toArray(String[]::new), none, none);
            if (c == Main.INTERNAL) {
                code = Main.INTERNAL;
            }
        }
        System.exit(code);
    }

    static List<List<String>> commandLines(String[] args) {
        List<List<String>> lines = new ArrayList<>();
        List<String> line = new ArrayList<>();
        for (String a : Arrays.asList(args)) {
            if (a.equals("--")) {
                if (!line.isEmpty()) {
                    lines.add(line);
                }
                line = new ArrayList<>();
            } else {
                line.add(a);
            }
        }
        if (!line.isEmpty()) {
            lines.add(line);
        }
        return lines;
    }
}
