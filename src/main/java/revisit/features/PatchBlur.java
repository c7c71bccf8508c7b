package revisit.features;

import java.util.Arrays;

/**
 * Separable 7-tap integer Gaussian with replicated borders, computed only on the tiles of a level that marked
 * patches touch. BRIEF reads the smoothed level only within {@link #PATCH_RADIUS} pixels of the chosen keypoints;
 * the tiles their patches touch are 42-69% of each level's area on chair image000 and car01 at 640x480, so the
 * rest is not blurred. Every blurred pixel equals the whole-level blur exactly (same integer sums, borders
 * replicated at the level's edges, not at the tiles'); pixels outside the marked tiles keep whatever the buffer held.
 *
 * <p>Tiles are {@link #BAND} rows by {@link #STRIP} columns (a multiple of that for inputs wider than 64 strips, so
 * one {@code long} per band holds its strips). Horizontally blurred rows live in a ring of eight; row {@code y} is
 * blurred on the strips of the bands of rows {@code y - 3} and {@code y + 3}, which cover every output row that
 * reads it since a band is taller than six rows. Both passes are loops over int rows with equal indices into at most
 * six arrays, the shape HotSpot's C2 vectorises: JDK 17's C2 vectorises neither a loop that reads one array at
 * several offsets nor one that reads seven arrays (measured), so each 7-tap sum is split into a five-array loop and
 * a three-array loop, and the horizontal pass reads six shifted copies of the row made with
 * {@code System.arraycopy}. Not thread-safe.
 */
final class PatchBlur {

    /** Half width of the kernel: 7 taps, as ORB's 7x7 Gaussian (OpenCV, from memory). */
    static final int RADIUS = 3;
    /** Pixels around a keypoint that BRIEF may read: the pattern radius plus one for rounding. */
    static final int PATCH_RADIUS = BriefPattern.RADIUS + 1;
    /** Rows per band (more than 2 * RADIUS). */
    static final int BAND = 8;
    /** Columns per strip for levels up to 64 strips wide; wider levels use a multiple. */
    static final int STRIP = 32;
    private static final int RING_MASK = 7;

    private final int[] kernel;
    private int stride;
    private int strip = STRIP;
    private long[] bands = new long[0];
    private int[][] ring = new int[0][];
    private int[][] shifted = new int[0][];
    private int[] accumulator = new int[0];

    /** @param kernel 2 * {@value #RADIUS} + 1 integer weights summing to 256 */
    PatchBlur(int[] kernel) {
        this.kernel = kernel.clone();
    }

    /** Sizes the buffers for levels up to {@code width x height}; smoothed rows have stride {@code width}. */
    void allocate(int width, int height) {
        stride = width;
        strip = STRIP * ((width + 64 * STRIP - 1) / (64 * STRIP));
        bands = new long[(height + BAND - 1) / BAND];
        ring = new int[RING_MASK + 1][width];
        shifted = new int[2 * RADIUS + 1][width];
        accumulator = new int[width];
    }

    /** Forgets the marked patches. */
    void clear() {
        Arrays.fill(bands, 0);
    }

    /** Marks the patch of radius {@link #PATCH_RADIUS} around (x, y) on a level of size w x h. */
    void mark(int x, int y, int w, int h) {
        int s0 = Math.max(x - PATCH_RADIUS, 0) / strip;
        int s1 = Math.min(x + PATCH_RADIUS, w - 1) / strip;
        long bits = (-1L >>> (63 - s1)) & (-1L << s0);
        int b1 = Math.min(y + PATCH_RADIUS, h - 1) / BAND;
        for (int b = Math.max(y - PATCH_RADIUS, 0) / BAND; b <= b1; b++) {
            bands[b] |= bits;
        }
    }

    /** Blurs the marked tiles of the level {@code src} (w x h int rows) into {@code out} (row stride: width). */
    void blur(int[][] src, int w, int h, byte[] out) {
        int done = -1;
        for (int y = 0; y < h; y++) {
            for (; done < Math.min(y + RADIUS, h - 1); done++) {
                int r = done + 1;
                long m = bridge(bands[Math.max(r - RADIUS, 0) / BAND] | bands[Math.min(r + RADIUS, h - 1) / BAND]);
                if (m != 0) {
                    blurRow(src[r], w, m, ring[r & RING_MASK]);
                }
            }
            long m = bridge(bands[y / BAND]);
            while (m != 0) {
                int a = Long.numberOfTrailingZeros(m);
                int e = Long.numberOfTrailingZeros(~(m >>> a)) + a;
                m &= e == 64 ? 0 : -1L << e;
                verticalRun(y, h, a * strip, Math.min(e * strip, w), out);
            }
        }
    }

    /**
     * {@code m} with holes of one or two strips between marked strips filled: fewer, longer runs. A scattered mask
     * costs more per pixel than a contiguous one (short loops, six copies per run), so the area saved is only partly
     * time saved: 16, 32 or 64 columns by 8 or 16 rows, with or without filling, all took 0.15-0.31 ms less thread
     * CPU time per extraction of chair image000 than the whole-level blur (median of 800 alternating runs each,
     * load 1.2, noise about 0.07 ms); 32 x 8 with filling was measured most often.
     */
    private static long bridge(long m) {
        return m | (m << 1 & m >>> 1) | (m << 1 & m >>> 2) | (m << 2 & m >>> 1);
    }

    /** Vertical pass of output row y over columns [a, b). */
    private void verticalRun(int y, int h, int a, int b, byte[] out) {
        int[] c = ring[y & RING_MASK];
        int[] u1 = ring[Math.max(y - 1, 0) & RING_MASK];
        int[] d1 = ring[Math.min(y + 1, h - 1) & RING_MASK];
        int[] u2 = ring[Math.max(y - 2, 0) & RING_MASK];
        int[] d2 = ring[Math.min(y + 2, h - 1) & RING_MASK];
        int[] u3 = ring[Math.max(y - 3, 0) & RING_MASK];
        int[] d3 = ring[Math.min(y + 3, h - 1) & RING_MASK];
        int k0 = kernel[RADIUS];
        int k1 = kernel[RADIUS - 1];
        int k2 = kernel[RADIUS - 2];
        int k3 = kernel[RADIUS - 3];
        int[] acc = accumulator;
        for (int x = a; x < b; x++) {
            acc[x] = k0 * c[x] + k1 * (u1[x] + d1[x]) + k2 * (u2[x] + d2[x]);
        }
        for (int x = a; x < b; x++) {
            acc[x] = (acc[x] + k3 * (u3[x] + d3[x]) + 32768) >>> 16;
        }
        ScalePyramid.storeBytes(acc, a, b, out, y * stride);
    }

    /** Horizontal pass of one row on the strips in {@code mask}; sums scaled by 256. */
    private void blurRow(int[] centre, int w, long mask, int[] row) {
        long m = mask;
        while (m != 0) {
            int a = Long.numberOfTrailingZeros(m);
            int e = Long.numberOfTrailingZeros(~(m >>> a)) + a;
            m &= e == 64 ? 0 : -1L << e;
            horizontalRun(centre, w, a * strip, Math.min(e * strip, w), row);
        }
    }

    /** Horizontal pass over columns [a, b), borders replicated at the level's edges. */
    private void horizontalRun(int[] centre, int w, int a, int b, int[] row) {
        int[][] s = shifted;
        for (int t = 1; t <= RADIUS; t++) {
            int[] left = s[RADIUS - t];
            int[] right = s[RADIUS + t];
            int from = Math.min(Math.max(a, t), b);
            if (from < b) {
                System.arraycopy(centre, from - t, left, from, b - from);
            }
            Arrays.fill(left, a, from, centre[0]);
            int to = Math.max(Math.min(b, w - t), a);
            if (to > a) {
                System.arraycopy(centre, a + t, right, a, to - a);
            }
            Arrays.fill(right, to, b, centre[w - 1]);
        }
        int k0 = kernel[RADIUS];
        int k1 = kernel[RADIUS - 1];
        int k2 = kernel[RADIUS - 2];
        int k3 = kernel[RADIUS - 3];
        int[] l1 = s[2];
        int[] r1 = s[4];
        int[] l2 = s[1];
        int[] r2 = s[5];
        int[] l3 = s[0];
        int[] r3 = s[6];
        for (int x = a; x < b; x++) {
            row[x] = k0 * centre[x] + k1 * (l1[x] + r1[x]) + k2 * (l2[x] + r2[x]);
        }
        for (int x = a; x < b; x++) {
            row[x] += k3 * (l3[x] + r3[x]);
        }
    }
}
