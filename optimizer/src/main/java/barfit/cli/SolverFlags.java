package barfit.cli;

import barfit.design.SolverOptions;
import picocli.CommandLine.Option;

/** The CP-SAT options every solving command takes, checked in one place. */
final class SolverFlags {
    @Option(
            names = "--time-limit",
            paramLabel = "SECONDS",
            defaultValue = "60",
            description = "CP-SAT time limit per solve (default: ${DEFAULT-VALUE})")
    double timeLimit;

    @Option(
            names = "--workers",
            paramLabel = "N",
            defaultValue = "1",
            description = "CP-SAT workers per solve (default: ${DEFAULT-VALUE}; 1 gives repeatable answers)")
    int workers;

    @Option(
            names = "--seed",
            paramLabel = "N",
            defaultValue = "1",
            description = "CP-SAT random seed (default: ${DEFAULT-VALUE})")
    int seed;

    SolverOptions options() {
        if (workers < 1 || workers > 64) {
            throw OptionError.of("--workers", "expected 1 to 64, got " + workers);
        }
        if (!(timeLimit > 0) || Double.isInfinite(timeLimit)) {
            throw OptionError.of("--time-limit", "expected a positive number of seconds");
        }
        return new SolverOptions(timeLimit, workers, seed);
    }
}
