package revisit.bench;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import revisit.index.FrameWords;
import revisit.index.IndexConfig;
import revisit.index.RevisitDatabase;

/**
 * Cost of adding one frame (vector building, postings, direct index) to a database of 1k, 10k or 100k frames of 500
 * Zipf-distributed features over 10^6 words. Each measured operation adds {@value #BATCH} frames; the teardown
 * removes them again (unmeasured), so every iteration starts from the same size. Divide the reported time by
 * {@value #BATCH} for the time per frame.
 *
 * <p>Run: {@code mvn -B -Pbench -DskipTests package && java -jar target/benchmarks.jar IndexAddBenchmark}
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, batchSize = IndexAddBenchmark.BATCH)
@Measurement(iterations = 10, batchSize = IndexAddBenchmark.BATCH)
@Fork(value = 1, jvmArgs = {"-Xmx3g", "-XX:+UseParallelGC"})
public class IndexAddBenchmark {

    static final int BATCH = 2000;

    @Param({"1000", "10000", "100000"})
    public int frames;

    private RevisitDatabase database;
    private FrameWords[] pending;
    private int next;

    @Setup(Level.Trial)
    public void build() {
        SyntheticScan scan = new SyntheticScan(1_000_000, 1.0, 500, 1000, 42L);
        database = new RevisitDatabase(scan.weights(), IndexConfig.defaults());
        for (int i = 0; i < frames; i++) {
            database.add(scan.frame(0, i, i * 0.1, scan.words()));
        }
        pending = new FrameWords[BATCH];
        for (int i = 0; i < BATCH; i++) {
            pending[i] = scan.frame(1, i, i * 0.1, scan.words());
        }
    }

    @TearDown(Level.Iteration)
    public void removeAdded() {
        for (int i = 0; i < BATCH; i++) {
            database.remove(1, i);
        }
        database.compact();
        next = 0;
    }

    @Benchmark
    public int add() {
        database.add(pending[next++]);
        return database.size();
    }
}
