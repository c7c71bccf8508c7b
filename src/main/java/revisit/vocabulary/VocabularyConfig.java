package revisit.vocabulary;

/**
 * Parameters of vocabulary training: a tree of {@code branching}-way k-means clusterings, {@code depth} levels
 * deep, after Nistér and Stewénius, "Scalable Recognition with a Vocabulary Tree", CVPR 2006.
 *
 * @param branching     children per node (k); typical 8..16; default 10, the value used for binary descriptors by
 *                      Gálvez-López and Tardós, IEEE T-RO 2012
 * @param depth         levels below the root (L); at most {@code branching^depth} words; typical 4..6; default 5
 *                      (10^5 words, a file of about 5 MB; see docs/VOCABULARY.md for the trade-off)
 * @param maxIterations Lloyd iterations per node after seeding; typical 5..20; default 10 (common practice:
 *                      binary k-means assignments mostly settle within a few iterations, and training stops
 *                      early at a node as soon as no assignment changes)
 * @param seed          seed of the k-means++ seeding; any value; default 2024 (arbitrary, fixed so that training
 *                      is reproducible)
 * @param threads       worker threads for training, 1..256; default: the available processors. The trained
 *                      vocabulary does not depend on it.
 */
public record VocabularyConfig(int branching, int depth, int maxIterations, long seed, int threads) {

    /** Largest supported branching factor. */
    public static final int MAX_BRANCHING = 64;
    /** Largest supported depth. */
    public static final int MAX_DEPTH = 10;
    /** Largest number of words a tree may have ({@code branching^depth} is checked against it). */
    public static final long MAX_WORDS = 1L << 24;

    public VocabularyConfig {
        if (branching < 2 || branching > MAX_BRANCHING) {
            throw new IllegalArgumentException("branching must be 2.." + MAX_BRANCHING + ", was " + branching);
        }
        if (depth < 1 || depth > MAX_DEPTH) {
            throw new IllegalArgumentException("depth must be 1.." + MAX_DEPTH + ", was " + depth);
        }
        if (Math.pow(branching, depth) > MAX_WORDS) {
            throw new IllegalArgumentException("branching^depth = " + branching + "^" + depth + " exceeds "
                    + MAX_WORDS + " words; lower the branching or the depth");
        }
        if (maxIterations < 1 || maxIterations > 1000) {
            throw new IllegalArgumentException("maxIterations must be 1..1000, was " + maxIterations);
        }
        if (threads < 1 || threads > 256) {
            throw new IllegalArgumentException("threads must be 1..256, was " + threads);
        }
    }

    /** The defaults documented on each field. */
    public static VocabularyConfig defaults() {
        return new VocabularyConfig(10, 5, 10, 2024L, Math.min(256, Runtime.getRuntime().availableProcessors()));
    }

    public VocabularyConfig withBranching(int value) {
        return new VocabularyConfig(value, depth, maxIterations, seed, threads);
    }

    public VocabularyConfig withDepth(int value) {
        return new VocabularyConfig(branching, value, maxIterations, seed, threads);
    }

    public VocabularyConfig withMaxIterations(int value) {
        return new VocabularyConfig(branching, depth, value, seed, threads);
    }

    public VocabularyConfig withSeed(long value) {
        return new VocabularyConfig(branching, depth, maxIterations, value, threads);
    }

    public VocabularyConfig withThreads(int value) {
        return new VocabularyConfig(branching, depth, maxIterations, seed, value);
    }
}
