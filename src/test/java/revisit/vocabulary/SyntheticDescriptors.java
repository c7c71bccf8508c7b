package revisit.vocabulary;

import java.time.Instant;
import java.util.List;
import java.util.SplittableRandom;
import revisit.features.FrameFeatures;

/** Seeded synthetic binary descriptors for vocabulary tests. */
final class SyntheticDescriptors {

    private SyntheticDescriptors() {
    }

    /** Uniformly random packed descriptors. */
    static long[] random(int count, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        long[] d = new long[count * FrameFeatures.STRIDE];
        for (int i = 0; i < d.length; i++) {
            d[i] = rnd.nextLong();
        }
        return d;
    }

    /** Copy of descriptor {@code centre} of {@code centres} with {@code flips} distinct random bits flipped. */
    static void noisyCopy(long[] centres, int centre, int flips, long[] out, int outIndex, SplittableRandom rnd) {
        System.arraycopy(centres, centre * FrameFeatures.STRIDE, out, outIndex * FrameFeatures.STRIDE,
                FrameFeatures.STRIDE);
        boolean[] flipped = new boolean[FrameFeatures.DESCRIPTOR_BITS];
        for (int f = 0; f < flips; ) {
            int bit = rnd.nextInt(FrameFeatures.DESCRIPTOR_BITS);
            if (!flipped[bit]) {
                flipped[bit] = true;
                out[outIndex * FrameFeatures.STRIDE + bit / 64] ^= 1L << (bit % 64);
                f++;
            }
        }
    }

    /**
     * Descriptors scattered around random centres: descriptor {@code i} belongs to centre {@code i % centres}
     * and differs from it in exactly {@code flips} bits.
     */
    static long[] clustered(long[] centres, int count, int flips, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        int k = centres.length / FrameFeatures.STRIDE;
        long[] d = new long[count * FrameFeatures.STRIDE];
        for (int i = 0; i < count; i++) {
            noisyCopy(centres, i % k, flips, d, i, rnd);
        }
        return d;
    }

    /** A training set of {@code count} descriptors in images of {@code perImage} descriptors each. */
    static TrainingSet set(long[] descriptors, int count, int perImage) {
        int images = (count + perImage - 1) / perImage;
        int[] starts = new int[Math.max(1, images)];
        for (int i = 0; i < starts.length; i++) {
            starts[i] = i * perImage;
        }
        return new TrainingSet(descriptors, count, starts);
    }

    /** A fixed origin so that trained files are comparable byte for byte. */
    static TrainingOrigin origin() {
        return new TrainingOrigin("test-descriptor", List.of("synthetic"), "test",
                Instant.parse("2025-01-01T00:00:00Z"));
    }
}
