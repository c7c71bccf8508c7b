package revisit.cli;

import java.io.PrintWriter;
import java.util.Optional;
import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;
import revisit.pipeline.QueryTrace;
import revisit.pipeline.ScanListener;

/**
 * Progress of a scan: a bar with frames/s and closures found on a terminal; skipped frames are reported as
 * one line each on the error stream whatever the terminal.
 */
final class ScanProgress implements ScanListener, AutoCloseable {

    private final boolean enabled;
    private final PrintWriter err;
    private Optional<ProgressBar> bar = Optional.empty();
    private long done;

    ScanProgress(boolean enabled, PrintWriter err) {
        this.enabled = enabled && System.console() != null;
        this.err = err;
    }

    @Override
    public void sequenceStarted(int sequence, String description, int frames) {
        close();
        done = 0;
        if (enabled) {
            bar = Optional.of(new ProgressBarBuilder().setTaskName("seq " + sequence).setInitialMax(frames)
                    .setStyle(ProgressBarStyle.ASCII).setConsumer(new ConsoleProgressBarConsumer(System.err))
                    .setUnit(" frames", 1).showSpeed().setUpdateIntervalMillis(300).build());
        }
    }

    @Override
    public void frameDone(QueryTrace trace, int closuresSoFar) {
        done++;
        bar.ifPresent(b -> {
            b.stepTo(done);
            b.setExtraMessage(closuresSoFar + " closures");
        });
    }

    @Override
    public void frameSkipped(String message) {
        err.println("revisit: skipped: " + message);
        err.flush();
    }

    @Override
    public void close() {
        bar.ifPresent(ProgressBar::close);
        bar = Optional.empty();
    }
}
