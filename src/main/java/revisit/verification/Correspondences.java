package revisit.verification;

/**
 * Putative feature matches between frame a and frame b, in the order they were found.
 *
 * @param count        number of matches
 * @param indexA       feature index in frame a, per match
 * @param indexB       feature index in frame b, per match
 * @param distanceBits Hamming distance of the pair, bits of 256
 */
public record Correspondences(int count, int[] indexA, int[] indexB, int[] distanceBits) {

    public Correspondences {
        if (count < 0 || indexA.length < count || indexB.length < count || distanceBits.length < count) {
            throw new IllegalArgumentException("match arrays shorter than count " + count);
        }
    }

    /** No matches. */
    public static Correspondences none() {
        return new Correspondences(0, new int[0], new int[0], new int[0]);
    }
}
