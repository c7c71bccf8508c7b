package revisit.bench;

import java.util.SplittableRandom;
import revisit.features.FrameFeatures;

/**
 * Seeded synthetic frames for the scale part of the retrieval comparison, built from a pool of real descriptors:
 * frame {@code i} takes {@code perFrame} descriptors drawn uniformly from the pool and flips {@code flipBits}
 * random bits of each (so no two frames share an exact descriptor). A frame depends only on the seed and its
 * index, so both systems see identical frames without storing 100k of them. A revisit of frame {@code i} keeps
 * each of its descriptors with probability {@code keep}, flipping {@code flipBits} further bits, and replaces the
 * others by fresh pool draws.
 */
final class DescriptorFrames {

    private static final long GOLDEN = 0x9E3779B97F4A7C15L;

    private final long[] pool;
    private final int poolCount;
    private final int perFrame;
    private final int flipBits;
    private final long seed;

    /**
     * @param pool      packed pool descriptors; not modified
     * @param poolCount descriptors in the pool
     * @param perFrame  descriptors per frame
     * @param flipBits  bits flipped per drawn descriptor (0-256)
     * @param seed      seed of all draws
     */
    DescriptorFrames(long[] pool, int poolCount, int perFrame, int flipBits, long seed) {
        this.pool = pool;
        this.poolCount = poolCount;
        this.perFrame = perFrame;
        this.flipBits = flipBits;
        this.seed = seed;
    }

    /** Stored frame {@code index} of sequence 0, at 10 frames per second. */
    DescriptorFrame frame(int index) {
        SplittableRandom random = new SplittableRandom(seed ^ (index * GOLDEN));
        long[] d = new long[perFrame * FrameFeatures.STRIDE];
        for (int i = 0; i < perFrame; i++) {
            draw(random, d, i);
        }
        return new DescriptorFrame(0, index, index * 0.1, d, perFrame);
    }

    /**
     * A query frame of sequence 1 (never excluded): a revisit of stored frame {@code original} when it is >= 0,
     * else a new place.
     *
     * @param query    query number, seeds the query's draws
     * @param original stored frame revisited, or -1
     * @param keep     share of the original's descriptors kept (noisier) in a revisit
     */
    DescriptorFrame query(int query, int original, double keep) {
        SplittableRandom random = new SplittableRandom(~seed ^ (query * GOLDEN));
        if (original < 0) {
            long[] d = new long[perFrame * FrameFeatures.STRIDE];
            for (int i = 0; i < perFrame; i++) {
                draw(random, d, i);
            }
            return new DescriptorFrame(1, query, query * 0.1, d, perFrame);
        }
        long[] d = frame(original).descriptors().clone();
        for (int i = 0; i < perFrame; i++) {
            if (random.nextDouble() < keep) {
                flip(random, d, i);
            } else {
                draw(random, d, i);
            }
        }
        return new DescriptorFrame(1, query, query * 0.1, d, perFrame);
    }

    private void draw(SplittableRandom random, long[] d, int i) {
        System.arraycopy(pool, random.nextInt(poolCount) * FrameFeatures.STRIDE, d, i * FrameFeatures.STRIDE,
                FrameFeatures.STRIDE);
        flip(random, d, i);
    }

    private void flip(SplittableRandom random, long[] d, int i) {
        for (int k = 0; k < flipBits; k++) {
            int bit = random.nextInt(FrameFeatures.DESCRIPTOR_BITS);
            d[i * FrameFeatures.STRIDE + bit / 64] ^= 1L << (bit % 64);
        }
    }
}
