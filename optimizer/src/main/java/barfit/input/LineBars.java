package barfit.input;

import barfit.catalogs.BarSize;
import barfit.catalogs.yaml.Location;
import barfit.section.Stirrups;
import java.util.List;

/**
 * The reinforcement of a line as built, for {@code check}: the continuous top bars (hangers) end to end;
 * per span its bottom bars and stirrups; per support its extra top bars (null where none); the anchorage at
 * each end of the line. Lengths in mm along the line.
 */
public record LineBars(
        Location location, Group hangers, List<SpanBars> spans, List<SupportTop> supports, End left, End right) {

    public LineBars {
        spans = List.copyOf(spans);
        supports = java.util.Collections.unmodifiableList(new java.util.ArrayList<>(supports));
    }

    /** Bars of one size, per layer from their face. */
    public record Group(BarSize bar, List<Integer> layers) {
        public Group {
            layers = List.copyOf(layers);
        }

        public int count() {
            int n = 0;
            for (int c : layers) {
                n += c;
            }
            return n;
        }
    }

    /**
     * A span's bottom bars and how far they run past the centre line of its left and right supports (null: to
     * the end of the line, at an end support), and its stirrups: sets from the left face, each {@code length}
     * long, the last to the right face.
     */
    public record SpanBars(Group bottom, Double pastLeft, Double pastRight, List<StirrupSet> stirrups) {
        public SpanBars {
            stirrups = List.copyOf(stirrups);
        }
    }

    /** A set of stirrups and the length it runs (NaN for the rest of the span). */
    public record StirrupSet(Stirrups stirrups, double length) {}

    /**
     * The extra top bars over a support (beyond the hangers, which the first layer holds too), and how far
     * they reach from its centre line each way (null: to the end of the line, at an end support).
     */
    public record SupportTop(Group bars, Double left, Double right) {}

    /** How the bars end at an end support. */
    public enum End {
        STRAIGHT("straight"),
        HOOK_90("hook-90"),
        HOOK_180("hook-180");

        private final String key;

        End(String key) {
            this.key = key;
        }

        public String key() {
            return key;
        }

        public boolean hooked() {
            return this != STRAIGHT;
        }
    }
}
