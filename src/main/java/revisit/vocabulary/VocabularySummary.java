package revisit.vocabulary;

import java.util.Arrays;

/**
 * What a vocabulary holds, for people deciding whether it suits their imagery.
 *
 * @param branching      k
 * @param depth          L
 * @param descriptorKind descriptor the vocabulary is for
 * @param nodeCount      nodes, root and leaves included
 * @param wordCount      words (leaves)
 * @param fullTreeWords  words a full tree would have, k^L
 * @param minLeafDepth   shallowest leaf (leaves above L come from clusters of identical descriptors)
 * @param maxLeafDepth   deepest leaf
 * @param occupancy      training descriptors per word
 * @param weights        idf weight per word
 * @param zeroWeightWords words found in every training image (weight 0, they carry no information)
 * @param provenance     how it was trained
 */
public record VocabularySummary(int branching, int depth, String descriptorKind, int nodeCount, int wordCount,
                                long fullTreeWords, int minLeafDepth, int maxLeafDepth, Spread occupancy,
                                Spread weights, int zeroWeightWords, Provenance provenance) {

    /**
     * Distribution of one quantity over the words.
     *
     * @param min    smallest value
     * @param median median (mean of the two middle values for an even count)
     * @param mean   arithmetic mean
     * @param max    largest value
     */
    public record Spread(double min, double median, double mean, double max) {

        static Spread of(double[] values) {
            double[] sorted = values.clone();
            Arrays.sort(sorted);
            int n = sorted.length;
            double median = n % 2 == 1 ? sorted[n / 2] : 0.5 * (sorted[n / 2 - 1] + sorted[n / 2]);
            double sum = 0;
            for (double v : sorted) {
                sum += v;
            }
            return new Spread(sorted[0], median, sum / n, sorted[n - 1]);
        }
    }

    /** Summarises {@code vocabulary}. */
    public static VocabularySummary of(Vocabulary vocabulary) {
        int words = vocabulary.wordCount();
        double[] occupancy = new double[words];
        int minDepth = Integer.MAX_VALUE;
        int maxDepth = 0;
        int zero = 0;
        for (int w = 0; w < words; w++) {
            occupancy[w] = vocabulary.occupancy(w);
            int d = vocabulary.nodeDepth(vocabulary.wordNode(w));
            minDepth = Math.min(minDepth, d);
            maxDepth = Math.max(maxDepth, d);
            if (vocabulary.weight(w) == 0) {
                zero++;
            }
        }
        long full = Math.round(Math.pow(vocabulary.branching(), vocabulary.depth()));
        return new VocabularySummary(vocabulary.branching(), vocabulary.depth(), vocabulary.descriptorKind(),
                vocabulary.nodeCount(), words, full, minDepth, maxDepth, Spread.of(occupancy),
                Spread.of(vocabulary.weights()), zero, vocabulary.provenance());
    }
}
