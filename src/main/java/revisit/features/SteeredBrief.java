package revisit.features;

/**
 * Steered BRIEF: 256 intensity comparisons between point pairs around a keypoint on a smoothed image, the pattern
 * turned by the keypoint's orientation (Calonder, Lepetit, Strecha and Fua, "BRIEF: Binary Robust Independent
 * Elementary Features", ECCV 2010; steering as in Rublee et al., ICCV 2011).
 *
 * <p>The pattern is our own ({@link BriefPattern}). For each of {@code angleBins} orientations it is rotated once
 * and rounded to flat pixel offsets for a given row stride, so describing a keypoint is 512 table reads and 256
 * comparisons.
 * Bit {@code b} is 1 when the first point of pair {@code b} is darker than the second; it is stored as bit
 * {@code b % 64} of long {@code b / 64}. Not thread-safe once {@link #prepare(int)} may rebuild the table.
 */
final class SteeredBrief {

    private static final int PAIRS = BriefPattern.PAIRS;

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
        this.pattern = BriefPattern.create(seed);
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
     *               {@value BriefPattern#RADIUS} + 1 pixels from every edge
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
