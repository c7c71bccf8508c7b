package revisit.index;

import java.util.Arrays;

/**
 * A sparse tf-idf bag-of-words vector: the distinct words of a frame in increasing id order with their normalised
 * weights.
 *
 * <p>Word {@code i} of a frame with {@code n} features, {@code n_i} of them on word {@code i}, has term frequency
 * {@code tf_i = n_i / n} and weight {@code tf_i * idf_i} (Sivic and Zisserman, ICCV 2003; Nistér and Stewénius,
 * CVPR 2006). Normalising the vector removes the common factor {@code 1 / n}, so the stored weight is
 * {@code n_i * idf_i / Z} with {@code Z = sum_j n_j idf_j} ({@link ScoreNorm#L1}) or {@code Z = sqrt(sum_j (n_j
 * idf_j)^2)} ({@link ScoreNorm#L2}). Words whose idf is 0 are left out: they add nothing to any score. Weights are
 * computed in float exactly as the database recomputes them from counts, so a stored frame and its query vector
 * agree bit for bit.
 *
 * @param words       distinct word ids, strictly increasing; do not modify
 * @param counts      features on each word, >= 1; do not modify
 * @param weights     normalised weight of each word, > 0; do not modify
 * @param inverseNorm {@code 1 / Z} as a float, > 0 (0 for an empty vector)
 * @param norm        the normalisation used
 */
public record WordVector(int[] words, int[] counts, float[] weights, float inverseNorm, ScoreNorm norm) {

    /**
     * Builds the vector of one frame.
     *
     * @param featureWords word id of each feature, may repeat, each in [0, wordCount); not modified
     * @param weights      idf table of the vocabulary
     * @param norm         normalisation
     */
    public static WordVector of(int[] featureWords, WordWeights weights, ScoreNorm norm) {
        int[] sorted = featureWords.clone();
        Arrays.sort(sorted);
        if (sorted.length > 0 && (sorted[0] < 0 || sorted[sorted.length - 1] >= weights.wordCount())) {
            int bad = sorted[0] < 0 ? sorted[0] : sorted[sorted.length - 1];
            throw new IllegalArgumentException("word id " + bad + " outside the vocabulary's " + weights.wordCount()
                    + " words; use the vocabulary the database was built with");
        }
        float[] idf = weights.table();
        int distinct = 0;
        for (int i = 0; i < sorted.length; i++) {
            if (idf[sorted[i]] > 0f && (i == 0 || sorted[i] != sorted[i - 1])) {
                distinct++;
            }
        }
        int[] words = new int[distinct];
        int[] counts = new int[distinct];
        int k = -1;
        for (int i = 0; i < sorted.length; i++) {
            if (idf[sorted[i]] == 0f) {
                continue;
            }
            if (k < 0 || words[k] != sorted[i]) {
                words[++k] = sorted[i];
            }
            counts[k]++;
        }
        return withWeights(words, counts, idf, norm);
    }

    private static WordVector withWeights(int[] words, int[] counts, float[] idf, ScoreNorm norm) {
        double z = 0;
        for (int i = 0; i < words.length; i++) {
            double raw = (double) counts[i] * idf[words[i]];
            z += norm == ScoreNorm.L1 ? raw : raw * raw;
        }
        z = norm == ScoreNorm.L1 ? z : Math.sqrt(z);
        float inverse = words.length == 0 ? 0f : (float) (1.0 / z);
        float[] weights = new float[words.length];
        for (int i = 0; i < words.length; i++) {
            weights[i] = weight(counts[i], idf[words[i]], inverse);
        }
        return new WordVector(words, counts, weights, inverse, norm);
    }

    /** The one formula for a stored weight, shared with the database's scoring loop. */
    static float weight(int count, float idf, float inverseNorm) {
        return (float) count * idf * inverseNorm;
    }

    /** Number of distinct words. */
    public int size() {
        return words.length;
    }

    /**
     * Score against another vector of the same normalisation by merging the two sorted word lists, in [0, 1].
     *
     * @param other vector normalised the same way
     */
    public double similarity(WordVector other) {
        return similarity(other, new int[0]);
    }

    /**
     * Score over the shared words other than {@code excludedWords} (stop words).
     *
     * @param other         vector normalised the same way
     * @param excludedWords word ids left out, increasing
     */
    double similarity(WordVector other, int[] excludedWords) {
        if (other.norm != norm) {
            throw new IllegalArgumentException("cannot compare an " + norm + " vector with an " + other.norm
                    + " vector");
        }
        double s = 0;
        int i = 0;
        int j = 0;
        int x = 0;
        while (i < words.length && j < other.words.length) {
            int a = words[i];
            int b = other.words[j];
            if (a == b) {
                while (x < excludedWords.length && excludedWords[x] < a) {
                    x++;
                }
                if (x >= excludedWords.length || excludedWords[x] != a) {
                    s += norm.term(weights[i], other.weights[j]);
                }
                i++;
                j++;
            } else if (a < b) {
                i++;
            } else {
                j++;
            }
        }
        return s;
    }
}
