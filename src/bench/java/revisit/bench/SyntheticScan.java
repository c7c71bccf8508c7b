package revisit.bench;

import java.util.Arrays;
import java.util.SplittableRandom;
import revisit.index.FrameWords;
import revisit.index.WordWeights;

/**
 * Seeded synthetic frames for the index benchmarks: each feature's word is drawn independently from a Zipf law over
 * the vocabulary, {@code P(rank r) ~ 1 / r^s} (word id = rank - 1), a common model of visual word frequencies
 * (common practice). Idf is {@code ln(1 / df)} with the document frequency {@code df = 1 - (1 - p)^F} a word with
 * probability {@code p} has in frames of {@code F} features, so the most common words weigh almost nothing, as in a
 * vocabulary trained on similar images. Each feature's tree node is its word hashed onto {@code nodeCount} nodes.
 */
final class SyntheticScan {

    private final double[] cumulative;
    private final int featuresPerFrame;
    private final int nodeCount;
    private final SplittableRandom random;

    /**
     * @param wordCount        vocabulary size
     * @param zipfExponent     {@code s}, about 1 for natural word counts
     * @param featuresPerFrame {@code F}
     * @param nodeCount        nodes of the direct-index level
     * @param seed             random seed
     */
    SyntheticScan(int wordCount, double zipfExponent, int featuresPerFrame, int nodeCount, long seed) {
        cumulative = new double[wordCount];
        double sum = 0;
        for (int r = 0; r < wordCount; r++) {
            sum += Math.pow(r + 1, -zipfExponent);
            cumulative[r] = sum;
        }
        for (int r = 0; r < wordCount; r++) {
            cumulative[r] /= sum;
        }
        this.featuresPerFrame = featuresPerFrame;
        this.nodeCount = nodeCount;
        this.random = new SplittableRandom(seed);
    }

    WordWeights weights() {
        double[] idf = new double[cumulative.length];
        for (int w = 0; w < idf.length; w++) {
            double p = cumulative[w] - (w == 0 ? 0 : cumulative[w - 1]);
            double df = -Math.expm1(featuresPerFrame * Math.log1p(-p));
            idf[w] = Math.min(WordWeights.MAX_WEIGHT, -Math.log(df));
        }
        return new WordWeights(idf.length, idf);
    }

    int word() {
        int i = Arrays.binarySearch(cumulative, random.nextDouble());
        return Math.min(cumulative.length - 1, i < 0 ? -i - 1 : i);
    }

    int[] words() {
        int[] words = new int[featuresPerFrame];
        for (int i = 0; i < words.length; i++) {
            words[i] = word();
        }
        return words;
    }

    /** A revisit of {@code original}: each feature keeps its word with probability {@code keep}, else redrawn. */
    int[] revisit(int[] original, double keep) {
        int[] words = original.clone();
        for (int i = 0; i < words.length; i++) {
            if (random.nextDouble() >= keep) {
                words[i] = word();
            }
        }
        return words;
    }

    FrameWords frame(int sequenceId, int frameId, double timeSeconds, int[] words) {
        int[] nodes = new int[words.length];
        for (int i = 0; i < words.length; i++) {
            nodes[i] = (int) (((words[i] * 0x9E3779B97F4A7C15L) >>> 40) % nodeCount);
        }
        return new FrameWords(sequenceId, frameId, timeSeconds, words, nodes);
    }
}
