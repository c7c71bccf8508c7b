package revisit.index;

import java.nio.ByteBuffer;
import java.util.zip.CRC32;

/**
 * The inverse-document-frequency weight of every word of a vocabulary, validated once. Index = word id.
 *
 * <p>A word's idf is typically {@code ln(N / N_i)} for {@code N} training images of which {@code N_i} contain the
 * word (Nistér and Stewénius, CVPR 2006); the vocabulary computes it, this class only holds it. Weights below
 * {@link #MIN_WEIGHT} carry no evidence and are treated as 0 (such words are left out of vectors), which keeps every
 * stored vector entry strictly positive.
 */
public final class WordWeights {

    /** Idf values below this count as 0. */
    public static final double MIN_WEIGHT = 1e-6;
    /** Largest accepted idf value ({@code ln} of any real image count is far below it). */
    public static final double MAX_WEIGHT = 1e6;

    private final float[] idf;
    private final int fingerprint;

    /**
     * @param wordCount number of words of the vocabulary, 1 to 2^28
     * @param idfByWord idf weight of each word, finite, in [0, {@link #MAX_WEIGHT}]; copied, not modified
     */
    public WordWeights(int wordCount, double[] idfByWord) {
        if (wordCount < 1 || wordCount > (1 << 28)) {
            throw new IllegalArgumentException("wordCount must be in [1, 2^28], was " + wordCount);
        }
        if (idfByWord == null || idfByWord.length != wordCount) {
            throw new IllegalArgumentException("idfByWord must hold one weight per word (" + wordCount + "), held "
                    + (idfByWord == null ? "nothing" : idfByWord.length));
        }
        idf = new float[wordCount];
        for (int w = 0; w < wordCount; w++) {
            double v = idfByWord[w];
            if (!(v >= 0 && v <= MAX_WEIGHT)) {
                throw new IllegalArgumentException("idf of word " + w + " is " + v + ", expected a finite value in [0, "
                        + MAX_WEIGHT + "]");
            }
            idf[w] = v < MIN_WEIGHT ? 0f : (float) v;
        }
        fingerprint = checksum(idf);
    }

    /** Number of words. */
    public int wordCount() {
        return idf.length;
    }

    /** Weight of word {@code w} as used in scoring (0 for words below {@link #MIN_WEIGHT}). */
    public float weight(int w) {
        return idf[w];
    }

    /** CRC32 of the weights as used, stored in database files to catch a database loaded with another vocabulary. */
    public int fingerprint() {
        return fingerprint;
    }

    /** Direct access for the scoring loop; never modified. */
    float[] table() {
        return idf;
    }

    private static int checksum(float[] values) {
        CRC32 crc = new CRC32();
        ByteBuffer buf = ByteBuffer.allocate(4096);
        for (float v : values) {
            if (!buf.hasRemaining()) {
                crc.update(buf.flip());
                buf.clear();
            }
            buf.putFloat(v);
        }
        crc.update(buf.flip());
        crc.update(ByteBuffer.allocate(4).putInt(values.length).flip());
        return (int) crc.getValue();
    }
}
