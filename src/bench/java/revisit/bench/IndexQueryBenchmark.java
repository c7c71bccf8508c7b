package revisit.bench;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import revisit.index.FrameWords;
import revisit.index.IndexConfig;
import revisit.index.QueryResult;
import revisit.index.RevisitDatabase;
import revisit.index.RevisitSearch;
import revisit.index.WordVector;

/**
 * Query latency of the revisit database (p50 / p99 from JMH sample mode) at 1k, 10k and 100k frames of 500 features
 * with Zipf word frequencies over a 10^6-word vocabulary. Half the queries revisit a stored frame (70% of features
 * keep their word), half are new places. The query vector is built beforehand, as a scan builds it once for query
 * and add.
 *
 * <p>Run: {@code mvn -B -Pbench -DskipTests package && java -jar target/benchmarks.jar IndexQueryBenchmark}; a
 * fixed cap of 2000 postings per walked list instead of a fraction: add {@code -p maxWordFrameFraction=0.000001}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 3, time = 3)
@Fork(value = 1, jvmArgs = {"-Xmx3g", "-XX:+UseParallelGC"})
public class IndexQueryBenchmark {

    @Param({"1000", "10000", "100000"})
    public int frames;

    @Param({"1000000"})
    public int vocabulary;

    @Param({"1.0", "0.05"})
    public double maxWordFrameFraction;

    @Param({"2000"})
    public int stopListMinFrames;

    private static final int QUERIES = 512;
    private RevisitSearch search;
    private FrameWords[] queries;
    private WordVector[] vectors;
    private int next;

    @Setup
    public void build() {
        SyntheticScan scan = new SyntheticScan(vocabulary, 1.0, 500, 1000, 42L);
        IndexConfig config = IndexConfig.defaults().withMaxWordFrameFraction(maxWordFrameFraction)
                .withStopListMinFrames(stopListMinFrames);
        RevisitDatabase database = new RevisitDatabase(scan.weights(), config);
        int[][] kept = new int[QUERIES / 2][];
        for (int i = 0; i < frames; i++) {
            int[] words = scan.words();
            if (i % (frames / kept.length) == 0 && i / (frames / kept.length) < kept.length) {
                kept[i / (frames / kept.length)] = words;
            }
            database.add(scan.frame(0, i, i * 0.1, words));
        }
        queries = new FrameWords[QUERIES];
        vectors = new WordVector[QUERIES];
        for (int q = 0; q < QUERIES; q++) {
            int[] words = q % 2 == 0 ? scan.revisit(kept[q / 2], 0.7) : scan.words();
            queries[q] = scan.frame(0, frames + 1000 + q, frames * 0.1 + 1000 + q * 0.1, words);
            vectors[q] = database.vectorOf(words);
        }
        search = new RevisitSearch(database);
    }

    @Benchmark
    public QueryResult query() {
        int q = next;
        next = (next + 1) % QUERIES;
        return search.query(queries[q], vectors[q]);
    }
}
