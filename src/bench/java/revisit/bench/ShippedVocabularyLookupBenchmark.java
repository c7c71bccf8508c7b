package revisit.bench;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import revisit.features.FeatureConfig;
import revisit.features.FeatureExtractor;
import revisit.features.FrameFeatures;
import revisit.io.ImageFiles;
import revisit.vocabulary.Vocabulary;
import revisit.vocabulary.VocabularyFile;

/**
 * Frame lookup with the shipped vocabulary (vocab/default.rvoc, k = 10, L = 5) on real descriptors: the 1000
 * features of each of two photos not used in training (homography/graf1.png and graf3.png: Mikolajczyk et al.,
 * IJCV 2005). Run from the project root.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Fork(value = 1, jvmArgs = {"-Xmx2g"})
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class ShippedVocabularyLookupBenchmark {

    private static final int FRAME = 1000;

    private Vocabulary vocabulary;
    private FrameFeatures[] frames;
    private int next;
    private final int[] words = new int[FRAME];
    private final int[] nodes = new int[FRAME];

    @Setup
    public void load() {
        vocabulary = VocabularyFile.read(Path.of(System.getProperty("user.dir")).resolve("vocab/default.rvoc"));
        FeatureExtractor extractor = new FeatureExtractor(FeatureConfig.defaults().withMaxFeatures(FRAME));
        List<FrameFeatures> list = new ArrayList<>();
        for (String image : List.of("homography/graf1.png", "homography/graf3.png")) {
            FrameFeatures f = extractor.extract(ImageFiles.readGray(FrameInputData.file(image)));
            if (f.count() != FRAME) {
                throw new IllegalStateException(image + " gave " + f.count() + " features, expected " + FRAME);
            }
            list.add(f);
        }
        frames = list.toArray(new FrameFeatures[0]);
    }

    @Benchmark
    @OperationsPerInvocation(FRAME)
    public int[] frameLookupPerDescriptor(CpuTimeCounters cpu) {
        long start = CpuTimeCounters.now();
        FrameFeatures frame = frames[next];
        next = (next + 1) % frames.length;
        vocabulary.lookup(frame, 3, words, nodes);
        cpu.add(start, FRAME);
        return words;
    }
}
