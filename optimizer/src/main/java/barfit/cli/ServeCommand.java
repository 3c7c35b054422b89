package barfit.cli;

import barfit.design.SolverOptions;
import barfit.serve.PageServer;
import java.io.IOException;
import java.net.BindException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

@Command(
        name = "serve",
        mixinStandardHelpOptions = true,
        description = "Serve a page on this computer (127.0.0.1 only) to explore the beams and lines of FILE: move "
                + "the headroom cap, the widths, f'c, the bar sizes or a rate and see the cheapest layout, its "
                + "drawing, cost and proof, the cost against depth cap and the compare table change. \"Keep\" "
                + "writes the beam as changed to a new YAML file in --out (never over FILE).%n"
                + "Runs until Ctrl-C. Exit code 2 for bad input or a port in use.")
final class ServeCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "YAML input (see examples/design/)")
    Path file;

    @Option(
            names = "--port",
            paramLabel = "N",
            defaultValue = "8640",
            description = "the port on 127.0.0.1 (default: ${DEFAULT-VALUE}; 0 picks a free one)")
    int port;

    @Option(
            names = "--out",
            paramLabel = "DIR",
            description = "where \"Keep\" writes its files (default: FILE's folder/<FILE's name>-kept)")
    Path out;

    @CommandLine.Mixin
    SolverFlags solver;

    @Override
    public Integer call() throws IOException, InterruptedException {
        if (port < 0 || port > 65_535) {
            throw OptionError.of("--port", "expected 0 to 65535, got " + port);
        }
        SolverOptions options = solver.options();
        Path folder = out != null ? out : defaultOut(file);
        if (Files.exists(folder) && !Files.isDirectory(folder)) {
            throw OptionError.of("--out", "is a file; expected a folder for the files \"Keep\" writes");
        }
        PageExplorer explorer = new PageExplorer(file, options, folder);
        int cores = Math.max(1, Math.min(2, Runtime.getRuntime().availableProcessors()));
        PageServer server;
        try {
            server = PageServer.start(explorer, port, cores);
        } catch (BindException e) {
            throw OptionError.of("--port", "port " + port + " is in use; expected a free port (0 picks one)");
        }
        CountDownLatch stopped = new CountDownLatch(1);
        Runtime.getRuntime().addShutdownHook(new Thread(() -> {
            server.close();
            stopped.countDown();
        }));
        var w = spec.commandLine().getOut();
        w.println("barfit: serving " + file + " at " + server.address() + " (Ctrl-C stops)");
        w.println("barfit: \"Keep\" writes into " + folder);
        w.flush();
        stopped.await();
        return Main.OK;
    }

    static Path defaultOut(Path file) {
        Path name = file.getFileName();
        String stem = (name == null ? "barfit" : name.toString()).replaceFirst("\\.ya?ml$", "") + "-kept";
        Path parent = file.getParent();
        return parent == null ? Path.of(stem) : parent.resolve(stem);
    }
}
