package barfit.section.trail;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * The calculation trail: headings, equations with their numbers substituted, and notes, in the order
 * they were worked. A step's {@code substitution} holds one {@code {}} per argument; the report fills
 * them with the argument values in the user's units, so a checker can redo each line by hand.
 * {@link #off()} gives a trail that records nothing, for the search's many trial sections.
 */
public final class Trail {
    /** One entry of the trail. */
    public sealed interface Entry permits Heading, Step, Note {}

    public record Heading(String title, String clause) implements Entry {}

    /**
     * {@code symbol = formula = substitution = result}; {@code args} fill the {@code {}} of the
     * substitution in order.
     */
    public record Step(String symbol, String formula, String substitution, List<Q> args, Q result, String note)
            implements Entry {
        public Step {
            args = List.copyOf(args);
        }
    }

    public record Note(String text) implements Entry {}

    private static final Trail OFF = new Trail(false);

    private final boolean on;
    private final List<Entry> entries;

    private Trail(boolean on) {
        this.on = on;
        this.entries = on ? new ArrayList<>() : Collections.emptyList();
    }

    public static Trail recording() {
        return new Trail(true);
    }

    public static Trail off() {
        return OFF;
    }

    public boolean isOn() {
        return on;
    }

    public Trail heading(String title, String clause) {
        if (on) {
            entries.add(new Heading(title, clause));
        }
        return this;
    }

    public Trail step(String symbol, String formula, String substitution, Q result, Q... args) {
        if (on) {
            entries.add(new Step(symbol, formula, substitution, List.of(args), result, null));
        }
        return this;
    }

    /** A step that only states a value (no formula). */
    public Trail value(String symbol, Q result, String note) {
        if (on) {
            entries.add(new Step(symbol, null, null, List.of(), result, note));
        }
        return this;
    }

    public Trail note(String text) {
        if (on) {
            entries.add(new Note(text));
        }
        return this;
    }

    public List<Entry> entries() {
        return Collections.unmodifiableList(entries);
    }
}
