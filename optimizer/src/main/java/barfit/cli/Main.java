package barfit.cli;

import barfit.catalogs.InputError;
import java.io.FileDescriptor;
import java.io.FileOutputStream;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Supplier;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code barfit} command line. Exit codes: 0 all pass, 1 a check fails, 2 bad input or usage, 3 an
 * internal error (a bug in barfit, or a machine that cannot run the solver or is out of memory).
 */
@Command(
        name = "barfit",
        mixinStandardHelpOptions = true,
        versionProvider = Main.Version.class,
        description = "Cheapest passing reinforced-concrete beam layouts to ACI 318-19, searched and proven.%n"
                + "Results must be checked by a licensed professional engineer against the governing local code.")
public final class Main implements Runnable {
    public static final int OK = 0;
    public static final int FAILED = 1;
    public static final int BAD_INPUT = 2;
    public static final int INTERNAL = 3;
    /**
     * The commands, in the order help lists them. Only the one named first on the command line is given
     * to picocli, which reflects over every command it is given (all six cost a short run about 40 ms);
     * any other first word (none, --help, --version, a typo) gets them all, so that help and picocli's
     * suggestions list them. {@code CommandsTest} checks each name against its class's @Command.
     */
    static final Map<String, Supplier<Object>> COMMANDS = commands();

    private static Map<String, Supplier<Object>> commands() {
        Map<String, Supplier<Object>> c = new LinkedHashMap<>();
        c.put("check", CheckCommand::new);
        c.put("analyse", AnalyseCommand::new);
        c.put("design", DesignCommand::new);
        c.put("schedule", ScheduleCommand::new);
        c.put("compare", CompareCommand::new);
        c.put("sweep", SweepCommand::new);
        c.put("frontier", FrontierCommand::new);
        c.put("serve", ServeCommand::new);
        c.put("bench", BenchCommand::new);
        c.put("help", CommandLine.HelpCommand::new);
        return Collections.unmodifiableMap(c);
    }

    /** The commands that run the solver: only these load its native library. */
    static final java.util.Set<String> SOLVING =
            java.util.Set.of("design", "schedule", "compare", "sweep", "frontier", "serve", "bench");

    static final String OUT_OF_MEMORY = "barfit: out of memory; give the JVM more heap through the launcher, e.g. "
            + "BARFIT_JAVA_OPTS=-Xmx4g ./barfit ...";

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        throw new CommandLine.ParameterException(
                spec.commandLine(),
                "a command is needed: check, analyse, design, schedule, compare, sweep, serve or bench");
    }

    public static void main(String[] args) {
        PrintStream out = new PrintStream(new FileOutputStream(FileDescriptor.out), true, StandardCharsets.UTF_8);
        PrintStream err = new PrintStream(new FileOutputStream(FileDescriptor.err), true, StandardCharsets.UTF_8);
        int code;
        try {
            code = run(args, out, err);
        } catch (OutOfMemoryError e) {
            err.println(OUT_OF_MEMORY);
            code = INTERNAL;
        }
        out.flush();
        err.flush();
        System.exit(code);
    }

    /** Runs barfit in this process (the tests use this); returns the exit code. */
    public static int run(String[] args, PrintStream out, PrintStream err) {
        if (args.length > 0 && SOLVING.contains(args[0])) {
            barfit.design.OrTools.loadInBackground(); // the solver's native library, while the input is read
        }
        CommandLine cl = new CommandLine(new Main());
        // help names the other commands, so it needs them all
        Supplier<Object> named = args.length > 0 && !args[0].equals("help") ? COMMANDS.get(args[0]) : null;
        if (named != null) {
            cl.addSubcommand(named.get());
        } else {
            COMMANDS.values().forEach(c -> cl.addSubcommand(c.get()));
        }
        // picocli's own messages (usage, option errors) in the platform's charset, as they always were
        cl.setOut(new PrintWriter(out, true, Charset.defaultCharset()));
        cl.setErr(new PrintWriter(err, true, Charset.defaultCharset()));
        cl.setParameterExceptionHandler((ex, a) -> {
            CommandLine c = ex.getCommandLine();
            String name = c.getCommandSpec().qualifiedName();
            c.getErr().println("barfit: " + usageMessage(ex) + " (see: " + name + " --help)");
            return BAD_INPUT;
        });
        cl.setExecutionExceptionHandler((ex, c, parseResult) -> failure(ex, c.getErr()));
        int code = cl.execute(args);
        cl.getOut().flush();
        cl.getErr().flush();
        return code;
    }

    /** What a command's exception becomes: one line on stderr, and exit 2 for bad input, 3 for anything else. */
    static int failure(Exception ex, PrintWriter err) {
        if (ex instanceof InputError ie) {
            err.println("barfit: " + ie.oneLine());
            return BAD_INPUT;
        }
        for (Throwable t = ex; t != null; t = t.getCause()) {
            if (t instanceof OutOfMemoryError) {
                err.println(OUT_OF_MEMORY);
                return INTERNAL;
            }
            if (t instanceof barfit.design.SetupError se) {
                err.println("barfit: " + se.getMessage());
                return INTERNAL;
            }
            if (t instanceof barfit.design.InvalidModelError bug) {
                err.println("barfit: internal error: " + bug.getMessage());
                return INTERNAL;
            }
        }
        err.println("barfit: internal error, please report it with the input file: " + ex);
        if (System.getenv("BARFIT_DEBUG") != null) {
            ex.printStackTrace(err);
        }
        return INTERNAL;
    }

    /**
     * A usage error in plain words: an option's value that is not a number reads "--fc: expected a number,
     * got 'abc'", not the parser's "'abc' is not a double".
     */
    static String usageMessage(CommandLine.ParameterException ex) {
        String message = ex.getMessage() == null ? "" : ex.getMessage().replace('\n', ' ');
        boolean notConverted = ex.getCause() instanceof CommandLine.TypeConversionException
                || message.matches(".*' is not an? (double|float|int|long|short|byte)\\b.*");
        if (notConverted && ex.getArgSpec() != null) {
            CommandLine.Model.ArgSpec arg = ex.getArgSpec();
            String name = arg instanceof CommandLine.Model.OptionSpec o ? o.longestName() : arg.paramLabel();
            Class<?> type = arg.auxiliaryTypes().length > 0 ? arg.auxiliaryTypes()[0] : arg.type();
            boolean decimal =
                    type == Double.class || type == double.class || type == Float.class || type == float.class;
            String expected = arg.isMultiValue()
                    ? (decimal ? "numbers" : "whole numbers") + " separated by commas"
                    : decimal ? "a number" : "a whole number";
            String value = ex.getValue() == null ? "" : ex.getValue();
            return name + ": expected " + expected + ", got '" + barfit.catalogs.Echo.cut(value) + "'";
        }
        return message.length() > 300 ? message.substring(0, 300) + "…" : message; // an argument pasted whole
    }

    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            String v = Main.class.getPackage().getImplementationVersion();
            return new String[] {"barfit " + (v == null ? "(development build)" : v)};
        }
    }
}
