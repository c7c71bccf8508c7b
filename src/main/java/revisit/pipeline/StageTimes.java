package revisit.pipeline;

import java.util.Arrays;
import java.util.EnumMap;
import java.util.Map;

/** Per-stage wall-clock durations of a scan, with mean and 99th percentile per stage. */
public final class StageTimes {

    /** Stages that are timed. */
    public enum Stage { READ, FEATURES, WORDS, QUERY, VERIFY, TOTAL }

    /** Summary of one stage. */
    public record Summary(Stage stage, int count, double meanMs, double p99Ms) {
    }

    private final Map<Stage, long[]> samples = new EnumMap<>(Stage.class);
    private final Map<Stage, Integer> counts = new EnumMap<>(Stage.class);

    /** Records one duration in nanoseconds. */
    public synchronized void add(Stage stage, long nanos) {
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
            return new Summary(stage, 0, 0, 0);
        }
        long[] sorted = Arrays.copyOf(samples.get(stage), n);
        Arrays.sort(sorted);
        double sum = 0;
        for (long v : sorted) {
            sum += v;
        }
        int idx = (int) Math.ceil(0.99 * n) - 1;
        return new Summary(stage, n, sum / n / 1e6, sorted[Math.max(0, idx)] / 1e6);
    }
}
