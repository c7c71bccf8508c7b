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
import revisit.vocabulary.TrainingProgress;
import revisit.vocabulary.TrainingSet;
import revisit.vocabulary.Vocabulary;
import revisit.vocabulary.VocabularyConfig;
import revisit.vocabulary.VocabularyTrainer;

/**
 * Wall time of training a k = 10, L = 6 vocabulary on 1M synthetic descriptors (100k random centres, each bit
 * flipped with probability 0.1, 1000 descriptors per image), on 1 or 2 threads.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(value = 1, jvmArgs = {"-Xmx4g"})
@Warmup(iterations = 1)
@Measurement(iterations = 3)
public class VocabularyTrainingBenchmark {

    @Param({"2", "1"})
    public int threads;

    @Param({"1000000"})
    public int descriptors;

    private TrainingSet set;

    @Setup
    public void makeData() {
        long[] data = BenchDescriptors.clustered(100_000, descriptors, 0.1, 1, 2);
        set = BenchDescriptors.set(data, descriptors, 1000);
    }

    @Benchmark
    public Vocabulary train() {
        return new VocabularyTrainer(VocabularyConfig.defaults().withDepth(6).withThreads(threads))
                .train(set, BenchDescriptors.origin(), TrainingProgress.NONE);
    }
}
