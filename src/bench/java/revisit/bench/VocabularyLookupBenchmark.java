package revisit.bench;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import revisit.vocabulary.TrainingProgress;
import revisit.vocabulary.Vocabulary;
import revisit.vocabulary.VocabularyConfig;
import revisit.vocabulary.VocabularyTrainer;

/**
 * Word lookup cost per descriptor through the flat tree, k = 10, L = 6, trained on 1M synthetic descriptors
 * (100k random centres, each bit flipped with probability 0.1); queries are fresh noisy copies of the centres,
 * or uniformly random descriptors. 1000 lookups per invocation, as for one frame.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Fork(value = 1, jvmArgs = {"-Xmx4g"})
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class VocabularyLookupBenchmark {

    private static final int FRAME = 1000;

    @Param({"clustered", "random"})
    public String queries;

    private Vocabulary vocabulary;
    private long[] query;
    private int offset;

    @Setup
    public void train() {
        long[] data = BenchDescriptors.clustered(100_000, 1_000_000, 0.1, 1, 2);
        vocabulary = new VocabularyTrainer(VocabularyConfig.defaults().withDepth(6))
                .train(BenchDescriptors.set(data, 1_000_000, 1000), BenchDescriptors.origin(), TrainingProgress.NONE);
        query = "random".equals(queries)
                ? BenchDescriptors.clustered(100_000, 100_000, 0.5, 1, 7)
                : BenchDescriptors.clustered(100_000, 100_000, 0.1, 1, 8);
    }

    @Benchmark
    @OperationsPerInvocation(FRAME)
    public long wordPerDescriptor() {
        long sum = 0;
        int start = offset;
        for (int i = 0; i < FRAME; i++) {
            sum += vocabulary.word(query, start + i);
        }
        offset = (start + FRAME) % (100_000 - FRAME);
        return sum;
    }
}
