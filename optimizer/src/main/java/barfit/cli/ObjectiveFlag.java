package barfit.cli;

import barfit.design.Objective;
import picocli.CommandLine.Option;

/** {@code --objective cost|carbon}: what the searches minimise (the other is reported beside it). */
final class ObjectiveFlag {
    /** The option's values as typed. */
    enum Value {
        cost,
        carbon
    }

    @Option(
            names = "--objective",
            paramLabel = "WHAT",
            defaultValue = "cost",
            description = "cost or carbon: what the search minimises, with its proof; the other is reported "
                    + "beside it (default: ${DEFAULT-VALUE})")
    Value value = Value.cost;

    Objective objective() {
        return value == Value.carbon ? Objective.CARBON : Objective.COST;
    }
}
