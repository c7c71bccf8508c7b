package revisit.features;

import java.util.Arrays;

/**
 * The FAST-9 segment test of {@link FastSegmentTest} for rows where many pixels pass its pre-tests: every pixel of
 * the row is tested, in int arithmetic over whole rows that HotSpot's C2 compiles to vector instructions. Per
 * pixel, bit {@code k} (bit {@code 16 + k}) of a mask is set when circle pixel {@code k} is brighter (darker) than
 * the centre beyond the threshold; the mask is then searched for 9 contiguous bits by doubling. Corners, scores
 * and their order (within each group of 8 pixels from {@code xFrom}, the even offsets before the odd ones) are those
 * of {@link FastSegmentTest}, which {@code CornerDetectorTest} checks against BoofCV.
 *
 * <p>C2 (JDK 17) vectorises a loop only when every array is read at the loop index itself and at most about six
 * arrays are involved (measured), so the level's rows are read as int rows ({@link ScalePyramid}) and each row is
 * copied once per horizontal shift -3..3 into a ring of shifted copies. Not thread-safe: one instance per detector.
 */
final class DenseSegmentTest {

    /** Circle offsets, the order of {@link FastSegmentTest}: dx, dy pairs. */
    private static final int[] CIRCLE = {3, 0, 3, 1, 2, 2, 1, 3, 0, 3, -1, 3, -2, 2, -3, 1, -3, 0, -3, -1, -2, -2,
        -1, -3, 0, -3, 1, -3, 2, -2, 3, -1};
    private static final int RADIUS = 3;
    /** Source rows kept in the ring of shifted copies (a power of two of at least 2 * RADIUS + 1). */
    private static final int RING = 8;

    private final int threshold;
    private final int[] circle = new int[16];
    private int stride = -1;
    /** shifted[slot][dx + RADIUS][x] = row[x + dx] for the source row held in the slot. */
    private int[][][] shifted = new int[RING][2 * RADIUS + 1][0];
    private final int[] rowInSlot = new int[RING];
    private final int[][] circleRows = new int[16][];
    private int[] mask = new int[0];
    private int[] corner = new int[0];
    private int[] cornerX = new int[0];
    private int[] cornerScore = new int[0];

    /** @param threshold intensity difference, grey levels, 1..254 */
    DenseSegmentTest(int threshold) {
        this.threshold = threshold;
        startLevel();
    }

    /** Forgets the shifted rows; call before the first row of every level. */
    void startLevel() {
        Arrays.fill(rowInSlot, -1);
    }

    /**
     * Tests pixels {@code xFrom..xTo-1} of row {@code y}, with 3 pixels of image on every side of them.
     *
     * @param d         pixels as bytes (for the scores)
     * @param rowStart  index of column 0 of the row in {@code d}
     * @param rowStride row stride of {@code d}
     * @param rows      the same pixels as int rows, {@code rows[y][x]}
     * @return number of corners found, readable through {@link #x(int)} and {@link #score(int)}
     */
    int scanRow(byte[] d, int rowStart, int rowStride, int[][] rows, int y, int xFrom, int xTo) {
        prepare(rowStride, rows[0].length, xTo);
        for (int k = 0; k < 16; k++) {
            int dx = CIRCLE[2 * k];
            int source = y + CIRCLE[2 * k + 1];
            circleRows[k] = dx == 0 ? rows[source] : shiftedRow(rows, source, dx, xFrom, xTo);
        }
        int[] c = rows[y];
        for (int k = 0; k < 16; k += 2) {
            flagPair(circleRows[k], circleRows[k + 1], c, k, k == 0, xFrom, xTo);
        }
        arcs(xFrom, xTo);
        return collect(d, rowStart, xFrom, xTo);
    }

    private void prepare(int rowStride, int width, int xTo) {
        if (rowStride != stride) {
            stride = rowStride;
            for (int k = 0; k < 16; k++) {
                circle[k] = CIRCLE[2 * k + 1] * stride + CIRCLE[2 * k];
            }
        }
        if (mask.length < width + 8) {
            mask = new int[width + 8];
            corner = new int[width + 8];
            cornerX = new int[width];
            cornerScore = new int[width];
            shifted = new int[RING][2 * RADIUS + 1][width];
            startLevel();
        }
        Arrays.fill(corner, xTo, xTo + 8, 0);
    }

    /** Row {@code source} shifted left by {@code dx} over [xFrom, xTo), copied once per source row. */
    private int[] shiftedRow(int[][] rows, int source, int dx, int xFrom, int xTo) {
        int slot = source & (RING - 1);
        int[][] copies = shifted[slot];
        if (rowInSlot[slot] != source) {
            rowInSlot[slot] = source;
            for (int s = -RADIUS; s <= RADIUS; s++) {
                if (s != 0) {
                    System.arraycopy(rows[source], xFrom + s, copies[s + RADIUS], xFrom, xTo - xFrom);
                }
            }
        }
        return copies[dx + RADIUS];
    }

    /** Sets (or with {@code first}, starts) the mask bits of circle pixels {@code k} and {@code k + 1}. */
    private void flagPair(int[] a, int[] b, int[] c, int k, boolean first, int xFrom, int xTo) {
        int[] m = mask;
        int t = threshold;
        int brightA = 1 << k;
        int brightB = 2 << k;
        int darkA = 0x10000 << k;
        int darkB = 0x20000 << k;
        int keep = first ? 0 : -1;
        for (int x = xFrom; x < xTo; x++) {
            int hi = c[x] + t;
            int lo = c[x] - t;
            int va = a[x];
            int vb = b[x];
            m[x] = (m[x] & keep) | (((hi - va) >> 31) & brightA) | (((hi - vb) >> 31) & brightB)
                    | (((va - lo) >> 31) & darkA) | (((vb - lo) >> 31) & darkB);
        }
    }

    /** corner[x] = 1 for a bright corner, 2 for a dark one, 0 otherwise: runs of 9 in the doubled 16-bit masks. */
    private void arcs(int xFrom, int xTo) {
        int[] m = mask;
        int[] out = corner;
        for (int x = xFrom; x < xTo; x++) {
            int bright = m[x] & 0xFFFF;
            int dark = m[x] >>> 16;
            int b = bright | (bright << 16);
            int e = dark | (dark << 16);
            int b2 = b & (b >>> 1);
            int e2 = e & (e >>> 1);
            int b4 = b2 & (b2 >>> 2);
            int e4 = e2 & (e2 >>> 2);
            int b9 = b4 & (b4 >>> 4) & (b >>> 8) & 0xFFFF;
            int e9 = e4 & (e4 >>> 4) & (e >>> 8) & 0xFFFF;
            out[x] = ((b9 + 0xFFFF) >>> 16) | (((e9 + 0xFFFF) >>> 16) << 1);
        }
    }

    /** Records the corners of the row in the order of {@link FastSegmentTest} and scores them. */
    private int collect(byte[] d, int rowStart, int xFrom, int xTo) {
        int[] flags = corner;
        int count = 0;
        for (int g = xFrom; g < xTo; g += 8) {
            int even = flags[g] | (flags[g + 2] << 2) | (flags[g + 4] << 4) | (flags[g + 6] << 6);
            int odd = flags[g + 1] | (flags[g + 3] << 2) | (flags[g + 5] << 4) | (flags[g + 7] << 6);
            int found = even | (odd << 8);
            while (found != 0) {
                int bit = Integer.numberOfTrailingZeros(found);
                int x = g + ((bit & 7) & ~1) + (bit >>> 3);
                int m = mask[x];
                cornerX[count] = x;
                cornerScore[count++] = score(d, rowStart + x, (bit & 1) == 0 ? m & 0xFFFF : m >>> 16);
                found &= found - 1;
            }
        }
        return count;
    }

    /** Summed |v - centre| over the circle pixels whose bits are set in {@code bits}. */
    private int score(byte[] d, int p, int bits) {
        int centre = d[p] & 0xFF;
        int sum = 0;
        while (bits != 0) {
            sum += Math.abs((d[p + circle[Integer.numberOfTrailingZeros(bits)]] & 0xFF) - centre);
            bits &= bits - 1;
        }
        return sum;
    }

    /** Column of corner {@code k} of the last scanned row. */
    int x(int k) {
        return cornerX[k];
    }

    /** FAST score of corner {@code k} of the last scanned row. */
    int score(int k) {
        return cornerScore[k];
    }
}
