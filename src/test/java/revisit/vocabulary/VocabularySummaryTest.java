package revisit.vocabulary;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import revisit.features.FrameFeatures;

class VocabularySummaryTest {

    @Test
    void summarisesOccupancyWeightsAndDepthOfTheThreeImageExample() {
        // Same hand-worked example as VocabularyTrainerTest: images {A,B}, {A,B}, {A,C,C}; N = 3.
        // Occupancy A 3, B 2, C 2 -> min 2, median 2, mean 7/3, max 3.
        // Weights 0, ln(3/2), ln 3 -> min 0, median ln 1.5, mean (ln 1.5 + ln 3)/3, max ln 3; one zero weight.
        long[] protos = SyntheticDescriptors.random(3, 7);
        int[] members = {0, 1, 0, 1, 0, 2, 2};
        long[] data = new long[members.length * FrameFeatures.STRIDE];
        SplittableRandom rnd = new SplittableRandom(8);
        for (int i = 0; i < members.length; i++) {
            SyntheticDescriptors.noisyCopy(protos, members[i], 2, data, i, rnd);
        }
        Vocabulary v = new VocabularyTrainer(VocabularyConfig.defaults().withBranching(3).withDepth(1).withThreads(1))
                .train(new TrainingSet(data, 7, new int[]{0, 2, 4}), SyntheticDescriptors.origin(),
                        TrainingProgress.NONE);
        VocabularySummary s = VocabularySummary.of(v);
        assertEquals(3, s.wordCount());
        assertEquals(4, s.nodeCount());
        assertEquals(3, s.fullTreeWords());
        assertEquals(1, s.minLeafDepth());
        assertEquals(1, s.maxLeafDepth());
        assertEquals(new VocabularySummary.Spread(2, 2, 7.0 / 3, 3), s.occupancy());
        assertEquals(0.0, s.weights().min(), 1e-12);
        assertEquals(Math.log(1.5), s.weights().median(), 1e-12);
        assertEquals((Math.log(1.5) + Math.log(3)) / 3, s.weights().mean(), 1e-12);
        assertEquals(Math.log(3), s.weights().max(), 1e-12);
        assertEquals(1, s.zeroWeightWords());
        assertEquals("test-descriptor", s.descriptorKind());
    }
}
