package revisit.index;

import java.util.Random;

/** Seeded synthetic frames for the index tests. */
final class TestFrames {

    private TestFrames() {
    }

    /**
     * Idf table: word {@code w} gets 0 with probability {@code zeroShare}, else a value in [0.05, 3).
     */
    static double[] idf(int words, double zeroShare, long seed) {
        Random random = new Random(seed);
        double[] idf = new double[words];
        for (int w = 0; w < words; w++) {
            idf[w] = random.nextDouble() < zeroShare ? 0 : 0.05 + 2.95 * random.nextDouble();
        }
        return idf;
    }

    /** Word ids drawn with a Zipf-like bias towards small ids (squared uniform). */
    static int[] skewedWords(Random random, int features, int vocabulary) {
        int[] words = new int[features];
        for (int i = 0; i < features; i++) {
            double u = random.nextDouble();
            words[i] = (int) (u * u * vocabulary);
        }
        return words;
    }

    /** Words drawn uniformly from {@code [from, from + span)}. */
    static int[] windowWords(Random random, int features, int from, int span) {
        int[] words = new int[features];
        for (int i = 0; i < features; i++) {
            words[i] = from + random.nextInt(span);
        }
        return words;
    }

    /** Node of each feature: the word divided by {@code wordsPerNode}, as a coarser tree level would give. */
    static int[] nodes(int[] words, int wordsPerNode) {
        int[] nodes = new int[words.length];
        for (int i = 0; i < words.length; i++) {
            nodes[i] = words[i] / wordsPerNode;
        }
        return nodes;
    }

    static FrameWords frame(int sequenceId, int frameId, double time, int[] words) {
        return new FrameWords(sequenceId, frameId, time, words, nodes(words, 10));
    }
}
