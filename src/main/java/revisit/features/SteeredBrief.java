package revisit.features;

import java.util.SplittableRandom;

/**
 * Steered BRIEF: 256 intensity comparisons between point pairs around a keypoint on a smoothed image, the pattern
 * turned by the keypoint's orientation (Calonder, Lepetit, Strecha and Fua, "BRIEF: Binary Robust Independent
 * Elementary Features", ECCV 2010; steering as in Rublee et al., ICCV 2011).
 *
 * <p>The pattern is our own: both points of each pair are drawn from an isotropic Gaussian with sigma = 31/5
 * pixels (Calonder et al.'s sampling "G II" for a 31-pixel patch), from a seeded generator, rejecting points
 * farther than {@value #PATTERN_RADIUS} pixels from the centre and pairs closer than 2 pixels (so that
 * rounding cannot merge them). For each of {@code angleBins} orientations the pattern is rotated once and rounded
 * to flat pixel offsets for a given row stride, so describing a keypoint is 512 table reads and 256 comparisons.
 * Bit {@code b} is 1 when the first point of pair {@code b} is darker than the second; it is stored as bit
 * {@code b % 64} of long {@code b / 64}. Not thread-safe once {@link #prepare(int)} may rebuild the table.
 */
final class SteeredBrief {

    /** Largest distance of a pattern point from the centre, pixels; rotated and rounded, at most 14. */
    static final int PATTERN_RADIUS = 13;
    /** Pairs, one bit each. */
    static final int PAIRS = FrameFeatures.DESCRIPTOR_BITS;
    private static final double SIGMA = 31.0 / 5.0;
    private static final double MIN_PAIR_DISTANCE = 2.0;

    private final int angleBins;
    /** Pattern points: x1, y1, x2, y2 per pair. */
    private final double[] pattern;
    private int stride = -1;
    private int[] offsets = new int[0];

    /**
     * @param seed      seed of the pattern
     * @param angleBins number of pre-rotated copies of the pattern
     */
    SteeredBrief(long seed, int angleBins) {
        this.angleBins = angleBins;
        this.pattern = samplePattern(seed);
    }

    static double[] samplePattern(long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        double[] p = new double[4 * PAIRS];
        int pair = 0;
        while (pair < PAIRS) {
            double x1 = gaussian(random);
            double y1 = gaussian(random);
            double x2 = gaussian(random);
            double y2 = gaussian(random);
            boolean inside = x1 * x1 + y1 * y1 <= PATTERN_RADIUS * PATTERN_RADIUS
                    && x2 * x2 + y2 * y2 <= PATTERN_RADIUS * PATTERN_RADIUS;
            if (inside && Math.hypot(x2 - x1, y2 - y1) >= MIN_PAIR_DISTANCE) {
                p[4 * pair] = x1;
                p[4 * pair + 1] = y1;
                p[4 * pair + 2] = x2;
                p[4 * pair + 3] = y2;
                pair++;
            }
        }
        return p;
    }

    private static double gaussian(SplittableRandom random) {
        double u1 = random.nextDouble();
        double u2 = random.nextDouble();
        return SIGMA * Math.sqrt(-2 * Math.log(1 - u1)) * Math.cos(2 * Math.PI * u2);
    }

    /** Rebuilds the rotated offset table when the row stride changes. */
    void prepare(int rowStride) {
        if (rowStride == stride) {
            return;
        }
        stride = rowStride;
        offsets = new int[angleBins * 2 * PAIRS];
        for (int bin = 0; bin < angleBins; bin++) {
            double angle = 2 * Math.PI * bin / angleBins;
            double c = Math.cos(angle);
            double s = Math.sin(angle);
            int base = bin * 2 * PAIRS;
            for (int k = 0; k < 2 * PAIRS; k++) {
                double px = pattern[2 * k];
                double py = pattern[2 * k + 1];
                long rx = Math.round(c * px - s * py);
                long ry = Math.round(s * px + c * py);
                offsets[base + k] = (int) (ry * rowStride + rx);
            }
        }
    }

    /** Bin of the pre-rotated pattern nearest to {@code angleRad}. */
    int bin(double angleRad) {
        int b = (int) Math.floor(angleRad * angleBins / (2 * Math.PI) + 0.5);
        b %= angleBins;
        return b < 0 ? b + angleBins : b;
    }

    /**
     * Writes the descriptor of the keypoint at {@code centre}.
     *
     * @param smooth smoothed image with the stride given to {@link #prepare(int)}; the keypoint must lie at least
     *               {@value #PATTERN_RADIUS} + 1 pixels from every edge
     * @param centre index of the keypoint pixel in {@code smooth}
     * @param bin    orientation bin from {@link #bin(double)}
     * @param out    receives 4 longs at {@code outOffset}; modified
     */
    void describe(byte[] smooth, int centre, int bin, long[] out, int outOffset) {
        int[] table = offsets;
        int base = bin * 2 * PAIRS;
        for (int word = 0; word < FrameFeatures.STRIDE; word++) {
            long bits = 0;
            int k = base + word * 128;
            for (int b = 0; b < 64; b++, k += 2) {
                int first = smooth[centre + table[k]] & 0xFF;
                int second = smooth[centre + table[k + 1]] & 0xFF;
                bits |= (long) ((first - second) >>> 31) << b;
            }
            out[outOffset + word] = bits;
        }
    }
}
