package barfit.input;

import java.util.List;

/** A whole {@code check} file: its beams and its lines with their bars as built. */
public record CheckInput(Settings settings, List<CheckBeam> beams, List<CheckLine> lines) {
    public CheckInput {
        beams = List.copyOf(beams);
        lines = List.copyOf(lines);
    }
}
