package revisit.pipeline;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.Map;

/**
 * Per-stage durations of a scan: wall-clock time (mean and 99th percentile) and the thread CPU time spent in the
 * stage (mean). On a machine with fewer free cores than busy threads the wall times include waits for a core; the
 * CPU times do not, so they are the ones to compare across runs.
 */
public final class StageTimes {

    /** Stages that are timed. */
    public enum Stage { READ, FEATURES, WORDS, QUERY, VERIFY, TOTAL }

    /**
     * Summary of one stage.
     *
     * @param meanMs    mean wall-clock time, ms
     * @param p99Ms     99th percentile of the wall-clock time, ms
     * @param meanCpuMs mean CPU time of the thread that ran the stage, ms
     */
    public record Summary(Stage stage, int count, double meanMs, double p99Ms, double meanCpuMs) {
    }

    /** A running measurement: wall clock and the calling thread's CPU clock at its start. */
    public record Mark(long wallNanos, long cpuNanos) {
    }

    private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();

    private final Map<Stage, long[]> samples = new EnumMap<>(Stage.class);
    private final Map<Stage, Integer> counts = new EnumMap<>(Stage.class);
    private final Map<Stage, Long> cpuTotals = new EnumMap<>(Stage.class);

    /** Starts a measurement on the calling thread. */
    public static Mark mark() {
        return new Mark(System.nanoTime(), cpuNow());
    }

    /** Records the stage from {@code start} to now, on the thread that made the mark; returns a new mark. */
    public Mark stop(Stage stage, Mark start) {
        Mark now = mark();
        add(stage, now.wallNanos() - start.wallNanos(), now.cpuNanos() - start.cpuNanos());
        return now;
    }

    /** Records one duration in nanoseconds: wall-clock and thread CPU time. */
    public synchronized void add(Stage stage, long nanos, long cpuNanos) {
        cpuTotals.merge(stage, cpuNanos, Long::sum);
        long[] a = samples.computeIfAbsent(stage, s -> new long[256]);
        int n = counts.getOrDefault(stage, 0);
        if (n == a.length) {
            a = Arrays.copyOf(a, n * 2);
            samples.put(stage, a);
        }
        a[n] = nanos;
        counts.put(stage, n + 1);
    }

    /** Summary of a stage; count 0 when it never ran. */
    public synchronized Summary summary(Stage stage) {
        int n = counts.getOrDefault(stage, 0);
        if (n == 0) {
            return new Summary(stage, 0, 0, 0, 0);
        }
        long[] sorted = Arrays.copyOf(samples.get(stage), n);
        Arrays.sort(sorted);
        double sum = 0;
        for (long v : sorted) {
            sum += v;
        }
        int idx = (int) Math.ceil(0.99 * n) - 1;
        return new Summary(stage, n, sum / n / 1e6, sorted[Math.max(0, idx)] / 1e6,
                cpuTotals.get(stage) / (double) n / 1e6);
    }

    /** The calling thread's CPU time in ns, or 0 where the JVM cannot measure it (then CPU columns read 0). */
    private static long cpuNow() {
        return THREADS.isCurrentThreadCpuTimeSupported() ? THREADS.getCurrentThreadCpuTime() : 0;
    }
}
