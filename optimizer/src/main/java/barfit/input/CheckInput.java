package barfit.input;

import java.util.List;

/** A whole {@code check} file. */
public record CheckInput(Settings settings, List<CheckBeam> beams) {
    public CheckInput {
        beams = List.copyOf(beams);
    }
}
