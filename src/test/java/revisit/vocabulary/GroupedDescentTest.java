package revisit.vocabulary;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayDeque;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import revisit.SharedData;
import revisit.features.FeatureConfig;
import revisit.features.FeatureExtractor;
import revisit.features.FrameFeatures;
import revisit.features.Hamming;
import revisit.io.ImageFiles;

/**
 * The grouped frame lookup ({@link Vocabulary#lookup}) against a plain one-descriptor-at-a-time descent written
 * here from the vocabulary's public accessors, on the shipped vocabulary (trained on real photos, k = 10, L = 5:
 * full ten-child blocks, smaller blocks and blocks mixing leaves and inner nodes).
 */
class GroupedDescentTest {

    private static Vocabulary vocabulary;
    private static int[] firstChild;
    private static int[] wordOfNode;

    @BeforeAll
    static void readShippedVocabulary() {
        vocabulary = VocabularyFile.read(ShippedVocabularyTest.SHIPPED);
        int n = vocabulary.nodeCount();
        firstChild = new int[n];
        for (int i = 0, next = 1; i < n; i++) {
            firstChild[i] = next;
            next += vocabulary.childCount(i);
        }
        wordOfNode = new int[n];
        int words = 0;
        ArrayDeque<Integer> stack = new ArrayDeque<>(List.of(0));
        while (!stack.isEmpty()) {
            int node = stack.pop();
            if (vocabulary.childCount(node) == 0) {
                wordOfNode[node] = words++;
            }
            for (int c = vocabulary.childCount(node) - 1; c >= 0; c--) {
                stack.push(firstChild[node] + c);
            }
        }
    }

    /** Path from the root to the leaf of descriptor {@code q}: nearest child, the first one on a tie. */
    private static int[] plainPath(long[] d, int q) {
        int[] path = new int[vocabulary.depth() + 1];
        int node = 0;
        int depth = 0;
        while (vocabulary.childCount(node) > 0) {
            int best = firstChild[node];
            for (int c = best + 1; c < firstChild[node] + vocabulary.childCount(node); c++) {
                if (Hamming.distance(vocabulary.centre(c), 0, d, q) < Hamming.distance(vocabulary.centre(best), 0, d, q)) {
                    best = c;
                }
            }
            node = best;
            path[++depth] = node;
        }
        return Arrays.copyOf(path, depth + 1);
    }

    /** Checks words and nodes at every level; returns how many distinct leaf depths the descriptors reached. */
    private static long assertMatchesPlainDescent(FrameFeatures frame) {
        int n = frame.count();
        int[] words = new int[n];
        int[] nodes = new int[n];
        int[][] paths = new int[n][];
        for (int q = 0; q < n; q++) {
            paths[q] = plainPath(frame.descriptors(), q);
        }
        for (int level = 0; level <= vocabulary.depth(); level++) {
            vocabulary.lookup(frame, level, words, nodes);
            for (int q = 0; q < n; q++) {
                int[] path = paths[q];
                int leaf = path[path.length - 1];
                assertEquals(wordOfNode[leaf], words[q], "descriptor " + q + " level " + level);
                assertEquals(path[Math.min(level, path.length - 1)], nodes[q], "descriptor " + q + " level " + level);
            }
        }
        return Arrays.stream(paths).mapToInt(p -> p.length).distinct().count();
    }

    @Test
    void groupedLookupOfRealFeaturesMatchesThePlainDescentAtEveryLevel() {
        // graf1.png: Mikolajczyk et al., "A comparison of affine region detectors", IJCV 2005 (shared data README).
        FrameFeatures frame = new FeatureExtractor(FeatureConfig.defaults().withMaxFeatures(1000))
                .extract(ImageFiles.readGray(SharedData.require("homography/graf1.png")));
        assertTrue(frame.count() > 500 && frame.count() % GroupedDescent.LANES != 0,
                "want a frame with a partial last group, got " + frame.count() + " features");
        assertMatchesPlainDescent(frame);
    }

    @Test
    void groupedLookupOfLeafCentreCopiesMatchesThePlainDescent() {
        // Copies of leaf centres with a few bits flipped (seed 23), every other one of a leaf above the deepest
        // level (the shipped tree has 144 such leaves), so lanes of one group retire at different levels.
        int[] shallowWords = IntStream.range(0, vocabulary.wordCount())
                .filter(w -> vocabulary.nodeDepth(vocabulary.wordNode(w)) < vocabulary.depth()).toArray();
        SplittableRandom rnd = new SplittableRandom(23);
        int n = 333;
        long[] centres = new long[n * FrameFeatures.STRIDE];
        long[] d = new long[n * FrameFeatures.STRIDE];
        for (int q = 0; q < n; q++) {
            int word = q % 2 == 0 && shallowWords.length > 0
                    ? shallowWords[rnd.nextInt(shallowWords.length)] : rnd.nextInt(vocabulary.wordCount());
            System.arraycopy(vocabulary.centre(vocabulary.wordNode(word)), 0, centres, q * FrameFeatures.STRIDE,
                    FrameFeatures.STRIDE);
            SyntheticDescriptors.noisyCopy(centres, q, rnd.nextInt(8), d, q, rnd);
        }
        long leafDepths = assertMatchesPlainDescent(new FrameFeatures(n, new float[n], new float[n], new float[n],
                new int[n], new float[n], new float[n], d));
        assertTrue(leafDepths >= 2, "leaves at " + leafDepths + " depth(s)");
    }
}
