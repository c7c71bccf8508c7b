package revisit.bench;

import boofcv.alg.scene.vocabtree.HierarchicalVocabularyTree;
import boofcv.alg.scene.vocabtree.LearnHierarchicalTree;
import boofcv.concurrency.BoofConcurrency;
import boofcv.factory.struct.FactoryTupleDesc;
import boofcv.struct.PackedArray;
import boofcv.struct.feature.TupleDesc_B;
import boofcv.struct.kmeans.FactoryTupleCluster;
import java.util.concurrent.TimeUnit;
import org.ddogleg.clustering.ConfigKMeans;
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
import revisit.features.FrameFeatures;
import revisit.vocabulary.TrainingProgress;
import revisit.vocabulary.TrainingSet;
import revisit.vocabulary.VocabularyConfig;
import revisit.vocabulary.VocabularyTrainer;

/**
 * Our trainer against BoofCV 1.1.7's {@code LearnHierarchicalTree} (k-means++ seeding, binary median centres,
 * multi-threaded through BoofConcurrency) on the same synthetic descriptors and the same k, L and iteration
 * limit (BoofCV: 10 iterations, no re-seeding runs). Both use all available threads.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(value = 1, jvmArgs = {"-Xmx4g"})
@Warmup(iterations = 1)
@Measurement(iterations = 3)
public class BoofTreeComparisonBenchmark {

    private static final int BRANCHING = 10;
    private static final int DEPTH = 6;
    private static final int ITERATIONS = 10;

    @Param({"200000"})
    public int descriptors;

    private TrainingSet set;
    private PackedArray<TupleDesc_B> packed;

    @Setup
    public void makeData() {
        BoofConcurrency.USE_CONCURRENT = true;
        long[] data = BenchDescriptors.clustered(20_000, descriptors, 0.1, 1, 2);
        set = BenchDescriptors.set(data, descriptors, 1000);
        packed = FactoryTupleDesc.createPackedBig(FrameFeatures.DESCRIPTOR_BITS, TupleDesc_B.class);
        TupleDesc_B d = new TupleDesc_B(FrameFeatures.DESCRIPTOR_BITS);
        for (int i = 0; i < descriptors; i++) {
            for (int w = 0; w < FrameFeatures.STRIDE; w++) {
                long v = data[i * FrameFeatures.STRIDE + w];
                d.data[2 * w] = (int) v;
                d.data[2 * w + 1] = (int) (v >>> 32);
            }
            packed.append(d);
        }
    }

    @Benchmark
    public Object revisitTrainer() {
        return new VocabularyTrainer(VocabularyConfig.defaults().withBranching(BRANCHING).withDepth(DEPTH)
                .withMaxIterations(ITERATIONS)).train(set, BenchDescriptors.origin(), TrainingProgress.NONE);
    }

    @Benchmark
    public Object boofcvLearnHierarchicalTree() {
        ConfigKMeans config = new ConfigKMeans();
        config.maxIterations = ITERATIONS;
        config.reseedAfterIterations = ITERATIONS;
        config.maxReSeed = 1;
        HierarchicalVocabularyTree<TupleDesc_B> tree = new HierarchicalVocabularyTree<>(
                FactoryTupleCluster.createDistance(TupleDesc_B.class),
                FactoryTupleDesc.createPackedBig(FrameFeatures.DESCRIPTOR_BITS, TupleDesc_B.class));
        tree.branchFactor = BRANCHING;
        tree.maximumLevel = DEPTH;
        LearnHierarchicalTree<TupleDesc_B> learn = new LearnHierarchicalTree<>(
                () -> FactoryTupleDesc.createPackedBig(FrameFeatures.DESCRIPTOR_BITS, TupleDesc_B.class),
                () -> FactoryTupleCluster.kmeans(config, 1000, FrameFeatures.DESCRIPTOR_BITS, TupleDesc_B.class),
                1);
        learn.process(packed, tree);
        return tree;
    }
}
