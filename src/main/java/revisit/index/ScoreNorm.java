package revisit.index;

/**
 * How tf-idf bag-of-words vectors are normalised and compared. Both scores lie in [0, 1], 1 for identical vectors.
 */
public enum ScoreNorm {

    /**
     * L1-normalised vectors compared by {@code s(v, w) = 1 - |v - w|_1 / 2}, the scoring that worked best in
     * Nistér and Stewénius, "Scalable Recognition with a Vocabulary Tree", CVPR 2006. For non-negative vectors with
     * unit L1 norm, {@code |v_i - w_i| = v_i + w_i - 2 min(v_i, w_i)}, so {@code s(v, w) = sum_i min(v_i, w_i)}:
     * only words present in both vectors contribute, which is what lets an inverted index compute it.
     */
    L1,

    /**
     * L2-normalised vectors compared by their dot product (cosine similarity), {@code s(v, w) = v . w
     * = 1 - |v - w|_2^2 / 2}; the common alternative to {@link #L1}.
     */
    L2;

    /**
     * Contribution of one word present in both vectors.
     *
     * @param a weight of the word in the first vector (normalised, > 0)
     * @param b weight of the word in the second vector (normalised, > 0)
     */
    double term(double a, double b) {
        return this == L1 ? Math.min(a, b) : a * b;
    }

    /** Code stored in database files. */
    int code() {
        return ordinal();
    }
}
