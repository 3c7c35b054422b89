package barfit.schedule;

/** Where a long schedule run has got to, for a progress bar; the solver knows nothing of terminals. */
@FunctionalInterface
public interface Progress {
    Progress NONE = (phase, done, total) -> { };

    void update(String phase, int done, int total);
}
