package barfit.examples;

import barfit.cli.Main;
import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

/** Runs the command line in-process and keeps what it printed. */
record Run(int exit, String out, String err) {
    static Run of(String... args) {
        ByteArrayOutputStream o = new ByteArrayOutputStream();
        ByteArrayOutputStream e = new ByteArrayOutputStream();
        int code;
        try (PrintStream po = new PrintStream(o, true, StandardCharsets.UTF_8);
                PrintStream pe = new PrintStream(e, true, StandardCharsets.UTF_8)) {
            code = Main.run(args, po, pe);
        }
        return new Run(code, o.toString(StandardCharsets.UTF_8), e.toString(StandardCharsets.UTF_8));
    }
}
