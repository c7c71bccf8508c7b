package revisit.index;

import static org.junit.jupiter.api.Assertions.assertEquals;

import boofcv.abst.scene.FeatureSceneRecognition;
import boofcv.abst.scene.SceneRecognition;
import boofcv.abst.scene.nister2006.ConfigRecognitionNister2006;
import boofcv.abst.scene.nister2006.FeatureSceneRecognitionNister2006;
import boofcv.struct.feature.TupleDesc_B;
import georegression.struct.point.Point2D_F64;
import java.time.Instant;
import java.util.Iterator;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import org.ddogleg.struct.DogArray;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import revisit.features.FrameFeatures;
import revisit.vocabulary.TrainingOrigin;
import revisit.vocabulary.TrainingProgress;
import revisit.vocabulary.TrainingSet;
import revisit.vocabulary.Vocabulary;
import revisit.vocabulary.VocabularyConfig;
import revisit.vocabulary.VocabularyTrainer;

/**
 * Our vocabulary and revisit database against a reference library run in the test: BoofCV 1.1.7's vocabulary-tree
 * scene recognition ({@code FeatureSceneRecognitionNister2006}), both trained on the same seeded descriptors
 * (k = 8, L = 3) and filled with the same 60 frames of 150 descriptors. Both must rank an exact duplicate of every
 * stored frame first, and a noisy revisit (70% of descriptors kept, 6 bits flipped in each) of its original first.
 * Speed is compared in src/bench (RetrievalComparison), not here.
 */
class BoofCvRetrievalAgreementTest {

    private static final int FRAMES = 60;
    private static final int PER_FRAME = 150;
    private static long[][] frames;
    private static RevisitDatabase ours;
    private static Vocabulary vocabulary;
    private static FeatureSceneRecognitionNister2006<TupleDesc_B> boof;

    @BeforeAll
    static void fillBoth() {
        SplittableRandom random = new SplittableRandom(20_240_607L);
        frames = new long[FRAMES][];
        TrainingSet.Builder set = new TrainingSet.Builder();
        for (int f = 0; f < FRAMES; f++) {
            frames[f] = random.longs((long) PER_FRAME * FrameFeatures.STRIDE).toArray();
            set.add(frames[f], PER_FRAME);
        }
        TrainingSet training = set.build();
        vocabulary = new VocabularyTrainer(VocabularyConfig.defaults().withBranching(8).withDepth(3).withThreads(1))
                .train(training, new TrainingOrigin("test", List.of("seeded"), "test", Instant.EPOCH),
                        TrainingProgress.NONE);
        ours = new RevisitDatabase(new WordWeights(vocabulary.wordCount(), vocabulary.weights()),
                IndexConfig.defaults());
        ConfigRecognitionNister2006 config = new ConfigRecognitionNister2006();
        config.tree.branchFactor = 8;
        config.tree.maximumLevel = 3;
        boof = new FeatureSceneRecognitionNister2006<>(config, () -> new TupleDesc_B(FrameFeatures.DESCRIPTOR_BITS));
        Iterator<FeatureSceneRecognition.Features<TupleDesc_B>> images = IntStream.range(0, FRAMES)
                .mapToObj(f -> (FeatureSceneRecognition.Features<TupleDesc_B>) features(frames[f])).iterator();
        boof.learnModel(images);
        for (int f = 0; f < FRAMES; f++) {
            ours.add(words(0, f, frames[f]));
            boof.addImage(Integer.toString(f), features(frames[f]));
        }
    }

    @Test
    void bothRankAnExactDuplicateOfEveryStoredFrameFirst() {
        RevisitSearch search = new RevisitSearch(ours);
        for (int f = 0; f < FRAMES; f++) {
            assertEquals(f, search.query(words(1, f, frames[f])).candidates().get(0).frameId(), "ours, frame " + f);
            assertEquals(f, boofFirst(frames[f]), "BoofCV, frame " + f);
        }
    }

    @Test
    void bothRankTheOriginalOfANoisyRevisitFirst() {
        SplittableRandom random = new SplittableRandom(7L);
        RevisitSearch search = new RevisitSearch(ours);
        for (int original : new int[]{3, 17, 42, 59}) {
            long[] revisit = frames[original].clone();
            for (int i = 0; i < PER_FRAME; i++) {
                if (random.nextDouble() < 0.7) {
                    for (int k = 0; k < 6; k++) {
                        int bit = random.nextInt(FrameFeatures.DESCRIPTOR_BITS);
                        revisit[i * FrameFeatures.STRIDE + bit / 64] ^= 1L << (bit % 64);
                    }
                } else {
                    for (int w = 0; w < FrameFeatures.STRIDE; w++) {
                        revisit[i * FrameFeatures.STRIDE + w] = random.nextLong();
                    }
                }
            }
            assertEquals(original, search.query(words(1, original, revisit)).candidates().get(0).frameId(), "ours");
            assertEquals(original, boofFirst(revisit), "BoofCV");
        }
    }

    private static int boofFirst(long[] descriptors) {
        DogArray<SceneRecognition.Match> matches = new DogArray<>(SceneRecognition.Match::new);
        boof.query(features(descriptors), null, 5, matches);
        return Integer.parseInt(matches.get(0).id);
    }

    private static FrameWords words(int sequence, int frame, long[] descriptors) {
        float[] zeros = new float[PER_FRAME];
        FrameFeatures features = new FrameFeatures(PER_FRAME, zeros, zeros, zeros, new int[PER_FRAME], zeros, zeros,
                descriptors);
        int[] words = new int[PER_FRAME];
        int[] nodes = new int[PER_FRAME];
        vocabulary.lookup(features, 2, words, nodes);
        return new FrameWords(sequence, frame, frame * 0.1, words, nodes);
    }

    /** Our bit b (bit b % 64 of long b / 64) as bit b % 32 of int b / 32 of a TupleDesc_B: distances unchanged. */
    private static FeatureSceneRecognition.Features<TupleDesc_B> features(long[] descriptors) {
        TupleDesc_B[] d = new TupleDesc_B[descriptors.length / FrameFeatures.STRIDE];
        for (int i = 0; i < d.length; i++) {
            d[i] = new TupleDesc_B(FrameFeatures.DESCRIPTOR_BITS);
            for (int w = 0; w < FrameFeatures.STRIDE; w++) {
                d[i].data[2 * w] = (int) descriptors[i * FrameFeatures.STRIDE + w];
                d[i].data[2 * w + 1] = (int) (descriptors[i * FrameFeatures.STRIDE + w] >>> 32);
            }
        }
        Point2D_F64 origin = new Point2D_F64();
        return new FeatureSceneRecognition.Features<>() {
            @Override
            public Point2D_F64 getPixel(int index) {
                return origin;
            }

            @Override
            public TupleDesc_B getDescription(int index) {
                return d[index];
            }

            @Override
            public int size() {
                return d.length;
            }
        };
    }
}
