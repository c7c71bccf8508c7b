package revisit.features;

/** Hamming distance between packed 256-bit descriptors stored with {@link FrameFeatures#STRIDE}. */
public final class Hamming {

    private Hamming() {
    }

    /**
     * Number of differing bits between descriptor {@code i} of {@code a} and descriptor {@code j} of {@code b}.
     *
     * @param a packed descriptors, 4 longs each
     * @param i feature index into {@code a}
     * @param b packed descriptors, 4 longs each
     * @param j feature index into {@code b}
     * @return distance in bits, 0..256
     */
    public static int distance(long[] a, int i, long[] b, int j) {
        int ia = i * FrameFeatures.STRIDE;
        int jb = j * FrameFeatures.STRIDE;
        return Long.bitCount(a[ia] ^ b[jb]) + Long.bitCount(a[ia + 1] ^ b[jb + 1])
                + Long.bitCount(a[ia + 2] ^ b[jb + 2]) + Long.bitCount(a[ia + 3] ^ b[jb + 3]);
    }
}
