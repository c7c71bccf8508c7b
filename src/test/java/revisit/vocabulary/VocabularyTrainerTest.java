package revisit.vocabulary;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import revisit.features.FrameFeatures;
import revisit.features.Hamming;

class VocabularyTrainerTest {

    private static final VocabularyConfig ONE_LEVEL = VocabularyConfig.defaults().withDepth(1).withThreads(1);

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3})
    void recoversKnownCentresOfWellSeparatedClusters(long seed) {
        // 8 random centres (pairwise about 128 bits apart); 300 members each, 12 bits flipped per member.
        long[] centres = SyntheticDescriptors.random(8, 100 + seed);
        long[] data = SyntheticDescriptors.clustered(centres, 2400, 12, 200 + seed);
        Vocabulary v = new VocabularyTrainer(ONE_LEVEL.withBranching(8).withSeed(seed))
                .train(SyntheticDescriptors.set(data, 2400, 100), SyntheticDescriptors.origin(), TrainingProgress.NONE);
        assertEquals(8, v.wordCount());
        Set<Integer> words = new HashSet<>();
        for (int c = 0; c < 8; c++) {
            int word = v.word(centres, c);
            words.add(word);
            assertArrayEquals(v.centre(v.wordNode(word)),
                    Arrays.copyOfRange(centres, c * 4, c * 4 + 4), "centre " + c + " seed " + seed);
            assertEquals(300, v.occupancy(word));
        }
        assertEquals(8, words.size());
        for (int i = 0; i < 2400; i++) {
            assertEquals(v.word(centres, i % 8), v.word(data, i), "descriptor " + i);
        }
    }

    @Test
    void weighsWordsOfAHandWorkedThreeImageExample() {
        // Three prototypes A, B, C far apart; members differ from their prototype in 2 bits.
        //   image 0: A, B     image 1: A, B     image 2: A, C, C        N = 3 images
        //   N_A = 3 -> w_A = ln(3/3) = 0
        //   N_B = 2 -> w_B = ln(3/2) = 0.405465...
        //   N_C = 1 -> w_C = ln(3/1) = 1.098612...   (idf of Sivic and Zisserman, ICCV 2003)
        // Occupancy (training descriptors per word): A 3, B 2, C 2.
        long[] protos = SyntheticDescriptors.random(3, 7);
        int[] members = {0, 1, 0, 1, 0, 2, 2};
        long[] data = new long[members.length * FrameFeatures.STRIDE];
        SplittableRandom rnd = new SplittableRandom(8);
        for (int i = 0; i < members.length; i++) {
            SyntheticDescriptors.noisyCopy(protos, members[i], 2, data, i, rnd);
        }
        TrainingSet set = new TrainingSet(data, members.length, new int[]{0, 2, 4});
        Vocabulary v = new VocabularyTrainer(ONE_LEVEL.withBranching(3)).train(set, SyntheticDescriptors.origin(),
                TrainingProgress.NONE);
        assertEquals(3, v.wordCount());
        assertEquals(0.0, v.weight(v.word(protos, 0)), 1e-12);
        assertEquals(Math.log(1.5), v.weight(v.word(protos, 1)), 1e-12);
        assertEquals(Math.log(3.0), v.weight(v.word(protos, 2)), 1e-12);
        assertEquals(3, v.occupancy(v.word(protos, 0)));
        assertEquals(2, v.occupancy(v.word(protos, 1)));
        assertEquals(2, v.occupancy(v.word(protos, 2)));
        assertEquals(3, v.provenance().imageCount());
    }

    @Test
    void trainingDescriptorsLandInTheirOwnLeafNearItsCentre() {
        // 200 random centres, 100 members each with 16 flipped bits; k = 10, L = 3 (up to 1000 words).
        long[] centres = SyntheticDescriptors.random(200, 31);
        long[] data = SyntheticDescriptors.clustered(centres, 20_000, 16, 32);
        TrainingSet set = SyntheticDescriptors.set(data, 20_000, 500);
        VocabularyConfig config = VocabularyConfig.defaults().withDepth(3).withThreads(2);
        VocabularyTrainer.TrainedTree tree = new VocabularyTrainer(config).buildTree(set, TrainingProgress.NONE);
        Vocabulary v = TreeFlattener.flatten(tree, set, config, "k", provenance());
        List<TreeNode> leaves = TreeFlattener.leavesDepthFirst(tree.root());
        long total = 0;
        int far = 0;
        for (int w = 0; w < leaves.size(); w++) {
            long[] leafCentre = v.centre(v.wordNode(w));
            for (int i = leaves.get(w).from; i < leaves.get(w).to; i++) {
                int d = tree.order()[i];
                assertEquals(w, v.word(data, d), "training descriptor " + d);
                int distance = Hamming.distance(leafCentre, 0, data, d);
                total += distance;
                far += distance > 32 ? 1 : 0;
            }
        }
        // A member lies 16 bits from its true centre and a leaf centre is the bit-majority of members of (part
        // of) one cluster, so it lies close to the true centre: members should sit about 16 bits from their leaf
        // centre, far below the 128 bits expected between unrelated descriptors. A few strays may share a leaf
        // with another cluster's members (seen: 2 of 20000 with seed 32), so at most 0.1% may lie beyond 32 bits.
        double mean = total / 20_000.0;
        assertTrue(mean <= 18, "mean distance to leaf centre " + mean);
        assertTrue(far <= 20, far + " training descriptors lie more than 32 bits from their leaf centre");
    }

    @Test
    void trainsTheSameVocabularyOnOneOrTwoThreads() {
        long[] centres = SyntheticDescriptors.random(300, 41);
        long[] data = SyntheticDescriptors.clustered(centres, 40_000, 40, 42);
        TrainingSet set = SyntheticDescriptors.set(data, 40_000, 400);
        VocabularyConfig config = VocabularyConfig.defaults().withDepth(3);
        Vocabulary one = new VocabularyTrainer(config.withThreads(1)).train(set, SyntheticDescriptors.origin(),
                TrainingProgress.NONE);
        Vocabulary two = new VocabularyTrainer(config.withThreads(2)).train(set, SyntheticDescriptors.origin(),
                TrainingProgress.NONE);
        assertArrayEquals(one.childCounts(), two.childCounts());
        assertArrayEquals(one.centres(), two.centres());
        assertArrayEquals(one.weights(), two.weights());
        assertArrayEquals(one.occupancies(), two.occupancies());
    }

    @Test
    void sameSeedGivesTheSameTreeAndAnotherSeedAnother() {
        long[] data = SyntheticDescriptors.clustered(SyntheticDescriptors.random(50, 51), 5000, 40, 52);
        TrainingSet set = SyntheticDescriptors.set(data, 5000, 100);
        VocabularyConfig config = VocabularyConfig.defaults().withDepth(2).withThreads(2);
        Vocabulary a = new VocabularyTrainer(config).train(set, SyntheticDescriptors.origin(), TrainingProgress.NONE);
        Vocabulary b = new VocabularyTrainer(config).train(set, SyntheticDescriptors.origin(), TrainingProgress.NONE);
        Vocabulary c = new VocabularyTrainer(config.withSeed(99)).train(set, SyntheticDescriptors.origin(),
                TrainingProgress.NONE);
        assertArrayEquals(a.centres(), b.centres());
        assertFalse(Arrays.equals(a.centres(), c.centres()));
        assertEquals(99, c.provenance().seed());
    }

    @Test
    void reportsProgressUpToDescriptorsTimesDepthWithoutGoingBack() {
        long[] data = SyntheticDescriptors.random(3000, 61);
        List<long[]> calls = new ArrayList<>();
        new VocabularyTrainer(VocabularyConfig.defaults().withDepth(4).withThreads(2)).train(
                SyntheticDescriptors.set(data, 3000, 100), SyntheticDescriptors.origin(),
                (done, total) -> calls.add(new long[]{done, total}));
        assertFalse(calls.isEmpty());
        for (int i = 1; i < calls.size(); i++) {
            assertTrue(calls.get(i)[0] >= calls.get(i - 1)[0]);
        }
        long[] last = calls.get(calls.size() - 1);
        assertEquals(3000L * 4, last[1]);
        assertEquals(last[1], last[0]);
    }

    @Test
    void makesALeafOfIdenticalDescriptorsAboveTheLastLevel() {
        // 50 copies each of 3 distinct descriptors: k = 10 finds 3 clusters of identical members, which stop.
        long[] protos = SyntheticDescriptors.random(3, 71);
        long[] data = SyntheticDescriptors.clustered(protos, 150, 0, 72);
        Vocabulary v = new VocabularyTrainer(VocabularyConfig.defaults().withThreads(1)).train(
                SyntheticDescriptors.set(data, 150, 10), SyntheticDescriptors.origin(), TrainingProgress.NONE);
        assertEquals(3, v.wordCount());
        assertEquals(4, v.nodeCount());
        for (int w = 0; w < 3; w++) {
            assertEquals(1, v.nodeDepth(v.wordNode(w)));
        }
    }

    @Test
    void rejectsTrainingSetsWithoutTwoDistinctDescriptors() {
        long[] same = SyntheticDescriptors.clustered(SyntheticDescriptors.random(1, 81), 20, 0, 82);
        VocabularyTrainer trainer = new VocabularyTrainer(VocabularyConfig.defaults());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> trainer.train(
                SyntheticDescriptors.set(same, 20, 5), SyntheticDescriptors.origin(), TrainingProgress.NONE));
        assertTrue(e.getMessage().contains("identical"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> trainer.train(SyntheticDescriptors.set(same, 1, 5),
                SyntheticDescriptors.origin(), TrainingProgress.NONE));
    }

    static Provenance provenance() {
        return new Provenance(List.of("synthetic"), "test", "2025-01-01T00:00:00Z", 1, 10, 1, 0);
    }
}
