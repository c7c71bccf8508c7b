package revisit.cli;

import java.util.Optional;
import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;
import revisit.vocabulary.TrainingProgress;

/**
 * A progress bar on stderr, shown only when enabled and stderr belongs to a terminal (so logs, pipes and tests stay
 * clean). Adapts the vocabulary trainer's progress callback.
 */
final class ProgressDisplay implements TrainingProgress, AutoCloseable {

    private final Optional<ProgressBar> bar;
    private long max = -1;

    private ProgressDisplay(Optional<ProgressBar> bar) {
        this.bar = bar;
    }

    /**
     * @param task    label in front of the bar
     * @param enabled false for --quiet
     */
    static ProgressDisplay open(String task, boolean enabled) {
        if (!enabled || System.console() == null) {
            return new ProgressDisplay(Optional.empty());
        }
        return new ProgressDisplay(Optional.of(new ProgressBarBuilder().setTaskName(task).setInitialMax(-1)
                .setStyle(ProgressBarStyle.ASCII).setConsumer(new ConsoleProgressBarConsumer(System.err))
                .setUpdateIntervalMillis(500).build()));
    }

    /** Sets the expected total; negative when unknown. */
    void maxHint(long total) {
        if (total != max) {
            max = total;
            bar.ifPresent(b -> b.maxHint(total));
        }
    }

    /** Moves the bar to {@code done}. */
    void stepTo(long done) {
        bar.ifPresent(b -> b.stepTo(done));
    }

    @Override
    public void advanced(long done, long total) {
        maxHint(total);
        stepTo(done);
    }

    @Override
    public void close() {
        bar.ifPresent(ProgressBar::close);
    }
}
