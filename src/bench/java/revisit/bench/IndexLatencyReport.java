package revisit.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Arrays;
import java.util.Locale;
import revisit.index.FrameWords;
import revisit.index.IndexConfig;
import revisit.index.RevisitDatabase;
import revisit.index.RevisitSearch;
import revisit.index.WordVector;

/**
 * Query latency as on-CPU time of the querying thread (p50 / p99), next to wall time, at 1k, 10k and 100k frames
 * (500 Zipf features over 10^6 words, as {@link IndexQueryBenchmark}). On a shared, oversubscribed machine the wall
 * time of one query includes the time the thread waited for a core; the thread's CPU time does not, so it is the
 * better estimate of the latency on one dedicated core. It complements, not replaces, the JMH benchmarks. Also the
 * CPU time of each add while the database grows to that size (the first row: from 0 to 1k frames, warm-up included).
 * Prints a Markdown table.
 *
 * <p>Run: {@code mvn -B -Pbench -DskipTests package && java -Xmx3g -XX:+UseParallelGC -cp target/benchmarks.jar
 * revisit.bench.IndexLatencyReport [fraction] [stopListMinFrames]}
 */
public final class IndexLatencyReport {

    private static final int QUERIES = 512;
    private static final int WARMUP_ROUNDS = 4;
    private static final int ROUNDS = 6;

    private IndexLatencyReport() {
    }

    public static void main(String[] args) {
        double fraction = args.length > 0 ? Double.parseDouble(args[0]) : IndexConfig.defaults().maxWordFrameFraction();
        int minFrames = args.length > 1 ? Integer.parseInt(args[1]) : IndexConfig.defaults().stopListMinFrames();
        ThreadMXBean cpu = ManagementFactory.getThreadMXBean();
        SyntheticScan scan = new SyntheticScan(1_000_000, 1.0, 500, 1000, 42L);
        IndexConfig config = IndexConfig.defaults().withMaxWordFrameFraction(fraction).withStopListMinFrames(minFrames);
        RevisitDatabase database = new RevisitDatabase(scan.weights(), config);
        System.out.println("| frames | maxWordFrameFraction | stopListMinFrames | query CPU p50 us | query CPU p99 us"
                + " | query wall p50 us | query wall p99 us | mean stop-word weight | add CPU mean us | add CPU p99 us |");
        System.out.println("|---|---|---|---|---|---|---|---|---|---|");
        int added = 0;
        int[][] kept = new int[QUERIES / 2][];
        for (int size : new int[]{1000, 10_000, 100_000}) {
            long[] addNanos = new long[size - added];
            while (added < size) {
                int[] words = scan.words();
                kept[added % kept.length] = words;
                FrameWords frame = scan.frame(0, added, added * 0.1, words);
                long c0 = cpu.getCurrentThreadCpuTime();
                database.add(frame);
                addNanos[addNanos.length - (size - added)] = cpu.getCurrentThreadCpuTime() - c0;
                added++;
            }
            FrameWords[] queries = new FrameWords[QUERIES];
            WordVector[] vectors = new WordVector[QUERIES];
            for (int q = 0; q < QUERIES; q++) {
                int[] words = q % 2 == 0 ? scan.revisit(kept[q / 2], 0.7) : scan.words();
                queries[q] = scan.frame(0, size + 1000 + q, size * 0.1 + 1000 + q * 0.1, words);
                vectors[q] = database.vectorOf(words);
            }
            RevisitSearch search = new RevisitSearch(database);
            long[] cpuNanos = new long[QUERIES * ROUNDS];
            long[] wallNanos = new long[QUERIES * ROUNDS];
            double stopWeight = 0;
            for (int round = 0; round < WARMUP_ROUNDS + ROUNDS; round++) {
                for (int q = 0; q < QUERIES; q++) {
                    long c0 = cpu.getCurrentThreadCpuTime();
                    long w0 = System.nanoTime();
                    stopWeight += search.query(queries[q], vectors[q]).stopWordWeight();
                    long w1 = System.nanoTime();
                    long c1 = cpu.getCurrentThreadCpuTime();
                    if (round >= WARMUP_ROUNDS) {
                        cpuNanos[(round - WARMUP_ROUNDS) * QUERIES + q] = c1 - c0;
                        wallNanos[(round - WARMUP_ROUNDS) * QUERIES + q] = w1 - w0;
                    }
                }
            }
            System.out.printf(Locale.ROOT, "| %d | %s | %d | %.0f | %.0f | %.0f | %.0f | %.3f | %.0f | %.0f |%n", size,
                    fraction, minFrames, percentile(cpuNanos, 0.5), percentile(cpuNanos, 0.99),
                    percentile(wallNanos, 0.5), percentile(wallNanos, 0.99),
                    stopWeight / (QUERIES * (WARMUP_ROUNDS + ROUNDS)), mean(addNanos), percentile(addNanos, 0.99));
        }
    }

    private static double mean(long[] nanos) {
        double sum = 0;
        for (long n : nanos) {
            sum += n;
        }
        return sum / nanos.length / 1000.0;
    }

    private static double percentile(long[] nanos, double p) {
        long[] sorted = nanos.clone();
        Arrays.sort(sorted);
        return sorted[(int) Math.min(sorted.length - 1, Math.floor(p * sorted.length))] / 1000.0;
    }
}
