package barfit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import picocli.CommandLine.Command;

/**
 * Main gives picocli only the command named on the command line (see {@link Main#COMMANDS}): each name
 * must be its class's own, and whatever else comes first still sees every command.
 */
class CommandsTest {
    @Test
    void everyNameIsItsCommandsOwn() {
        Main.COMMANDS.forEach((name, make) -> {
            Object command = make.get();
            assertEquals(
                    name,
                    command.getClass().getAnnotation(Command.class).name(),
                    command.getClass().getName());
        });
        assertEquals(
                List.of(
                        "check",
                        "analyse",
                        "design",
                        "schedule",
                        "compare",
                        "sweep",
                        "frontier",
                        "serve",
                        "bench",
                        "help"),
                List.copyOf(Main.COMMANDS.keySet()));
    }

    @Test
    void helpAndTyposSeeEveryCommand() {
        Cli help = Cli.run("--help");
        assertEquals(0, help.exit(), help.err());
        for (String name : Main.COMMANDS.keySet()) {
            assertTrue(help.out().contains("  " + name + " "), "help lists " + name + ":\n" + help.out());
        }
        Cli typo = Cli.run("desgin", "x.yaml");
        assertEquals(2, typo.exit());
        assertTrue(typo.err().contains("'desgin'") && typo.err().contains("barfit --help"), typo.err());
        assertEquals(1, typo.err().strip().lines().count(), "one line: " + typo.err());
    }

    @Test
    void aCommandNamedFirstRunsAloneWithItsOwnHelp() {
        Cli help = Cli.run("design", "--help");
        assertEquals(0, help.exit(), help.err());
        assertTrue(help.out().startsWith("Usage: barfit design "), help.out());
        Cli missing = Cli.run("check");
        assertEquals(2, missing.exit());
        assertTrue(missing.err().contains("FILE") && missing.err().contains("barfit check --help"), missing.err());
    }
}
