package barfit.cli;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

/** Runs the command line in-process and keeps what it printed. */
public record Cli(int exit, String out, String err) {
    public static Cli run(String... args) {
        ByteArrayOutputStream o = new ByteArrayOutputStream();
        ByteArrayOutputStream e = new ByteArrayOutputStream();
        int code;
        try (PrintStream po = new PrintStream(o, true, StandardCharsets.UTF_8);
                PrintStream pe = new PrintStream(e, true, StandardCharsets.UTF_8)) {
            code = Main.run(args, po, pe);
        }
        return new Cli(code, o.toString(StandardCharsets.UTF_8), e.toString(StandardCharsets.UTF_8));
    }
}
