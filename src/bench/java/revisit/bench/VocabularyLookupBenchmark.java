package revisit.bench;

import java.util.Arrays;
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
import revisit.features.FrameFeatures;
import revisit.vocabulary.TrainingProgress;
import revisit.vocabulary.Vocabulary;
import revisit.vocabulary.VocabularyConfig;
import revisit.vocabulary.VocabularyTrainer;

/**
 * Word lookup cost per descriptor through the flat tree, k = 10, L = 6, trained on 1M synthetic descriptors
 * (100k random centres, each bit flipped with probability 0.1); queries are fresh noisy copies of the centres,
 * uniformly random descriptors, or (the compute floor) exact copies of only 8 of the centres, repeated, so that every
 * block on their paths stays in the cache and the same descent costs no memory stalls. 1000 lookups per
 * invocation, as for one frame.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Fork(value = 1, jvmArgs = {"-Xmx4g"})
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class VocabularyLookupBenchmark {

    private static final int FRAME = 1000;

    @Param({"clustered", "random", "repeated"})
    public String queries;

    private Vocabulary vocabulary;
    private long[] query;
    private int offset;
    private FrameFeatures[] frames;
    private int nextFrame;
    private final int[] words = new int[FRAME];
    private final int[] nodes = new int[FRAME];

    @Setup
    public void train() {
        long[] data = BenchDescriptors.clustered(100_000, 1_000_000, 0.1, 1, 2);
        vocabulary = new VocabularyTrainer(VocabularyConfig.defaults().withDepth(6))
                .train(BenchDescriptors.set(data, 1_000_000, 1000), BenchDescriptors.origin(), TrainingProgress.NONE);
        query = switch (queries) {
            case "random" -> BenchDescriptors.clustered(100_000, 100_000, 0.5, 1, 7);
            case "repeated" -> BenchDescriptors.clustered(8, 100_000, 0.0, 1, 8);
            default -> BenchDescriptors.clustered(100_000, 100_000, 0.1, 1, 8);
        };
        frames = new FrameFeatures[100];
        for (int f = 0; f < frames.length; f++) {
            frames[f] = frame(Arrays.copyOfRange(query, f * FRAME * 4, (f + 1) * FRAME * 4));
        }
    }

    @Benchmark
    @OperationsPerInvocation(FRAME)
    public long wordPerDescriptor(CpuTimeCounters cpu) {
        long cpuStart = CpuTimeCounters.now();
        long sum = 0;
        int start = offset;
        for (int i = 0; i < FRAME; i++) {
            sum += vocabulary.word(query, start + i);
        }
        offset = (start + FRAME) % (100_000 - FRAME);
        cpu.add(cpuStart, FRAME);
        return sum;
    }

    /** Frame lookup with the ancestor at level 3 (the words and nodes a database query needs). */
    @Benchmark
    @OperationsPerInvocation(FRAME)
    public int[] frameLookupPerDescriptor(CpuTimeCounters cpu) {
        long start = CpuTimeCounters.now();
        FrameFeatures frame = frames[nextFrame];
        nextFrame = (nextFrame + 1) % frames.length;
        vocabulary.lookup(frame, 3, words, nodes);
        cpu.add(start, FRAME);
        return words;
    }

    private static FrameFeatures frame(long[] descriptors) {
        return new FrameFeatures(FRAME, new float[FRAME], new float[FRAME], new float[FRAME], new int[FRAME],
                new float[FRAME], new float[FRAME], descriptors);
    }
}
