package revisit.features;

import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.nio.ByteOrder;
import java.util.Arrays;

/**
 * The FAST segment test, row by row over one level (Rosten, Porter and Drummond, "Faster and better: a machine learning
 * approach to corner detection", IEEE TPAMI 32(1), 2010): a pixel is a corner when at least {@code arc} contiguous
 * pixels of the 16-pixel circle of radius 3 are all brighter than centre + threshold or all darker than
 * centre - threshold. Its score is BoofCV's: the summed absolute difference from the centre of the circle pixels
 * beyond the threshold on the corner's side.
 *
 * <p>Two necessary conditions reject most pixels before the full test: an arc of 9 or more always contains two
 * neighbouring compass points (Rosten and Drummond, ECCV 2006), so the top or bottom pixel and the left or right
 * pixel must both be beyond the threshold on the same side; the same holds for the four diagonal circle pixels.
 * Both are evaluated eight pixels at a time: one 64-bit load takes eight neighbouring bytes, split into two words
 * of four 16-bit lanes, and per lane {@code v + 511 - c - t} has bit 9 set exactly when {@code v > c + t} (no lane
 * borrows, since the value stays in 2..766); likewise {@code c - t + 511 - v} for {@code v < c - t}. The per-pixel
 * version of the pre-tests took 4.6 ms (FAST on all levels of a 640x480 photo) against about 1 ms for this one
 * (docs/FEATURES.md). Before them, one loop over the int rows (which C2 vectorises) flags the pixels whose top or
 * bottom circle pixel is beyond the threshold, which both pre-tests require, and groups of 8 without a flag are
 * skipped: on chair image000 only 20% of the groups of level 0 have one, and FAST took 0.82 ms against 0.96-1.01
 * without it (thread CPU time, docs/FEATURES.md). Pixels that pass both pre-tests are queued, and the full test runs on the whole level's queue
 * at once ({@link SegmentBatch}). Not thread-safe: one instance per extractor.
 */
final class FastSegmentTest {

    private static final VarHandle LONGS = MethodHandles.byteArrayViewVarHandle(long[].class,
            ByteOrder.LITTLE_ENDIAN);
    /** Low byte of every 16-bit lane. */
    private static final long LOW = 0x00FF00FF00FF00FFL;
    /** 511 in every lane. */
    private static final long K511 = 0x01FF01FF01FF01FFL;
    /** Bit 9 of every lane: the "beyond the threshold" flag. */
    private static final long BIT9 = 0x0200020002000200L;
    /** The 16-pixel Bresenham circle of radius 3, clockwise on screen from the right: dx, dy pairs. */
    private static final int[] CIRCLE = {3, 0, 3, 1, 2, 2, 1, 3, 0, 3, -1, 3, -2, 2, -3, 1, -3, 0, -3, -1, -2, -2,
        -1, -3, 0, -3, 1, -3, 2, -2, 3, -1};

    private final int threshold;
    /** 511 - threshold in every lane. */
    private final long lanesK;
    private final SegmentBatch batch;
    private final int[] circle = new int[16];
    private int stride = -1;
    /** Row being scanned and the number of its pixels queued so far. */
    private int row;
    private int queued;
    private int[] vertical = new int[0];

    /**
     * @param threshold intensity difference, grey levels, 1..254
     * @param arc       contiguous circle pixels required, 9..12
     */
    FastSegmentTest(int threshold, int arc) {
        this.threshold = threshold;
        long k = 511 - threshold;
        this.lanesK = k | (k << 16) | (k << 32) | (k << 48);
        this.batch = new SegmentBatch(threshold, arc);
    }

    /** Forgets the pixels queued for the full test; call before the first row of every level. */
    void startLevel() {
        batch.clear();
    }

    /**
     * Pre-tests pixels {@code xFrom..xTo-1} of row {@code y} and queues those that pass for the full test in
     * {@link #flush}. The caller guarantees 3 pixels of image on every side of them and 8 readable bytes
     * from {@code rowStart + xTo + 3 - 1} on.
     *
     * @param d         pixels
     * @param rowStart  index of column 0 of the row in {@code d}
     * @param rowStride row stride of {@code d}
     * @param rows      the same pixels as int rows, {@code rows[y][x]}
     * @return number of pixels of the row queued
     */
    int scanRow(byte[] d, int rowStart, int rowStride, int[][] rows, int y, int xFrom, int xTo) {
        if (rowStride != stride) {
            stride = rowStride;
            for (int k = 0; k < 16; k++) {
                circle[k] = CIRCLE[2 * k + 1] * stride + CIRCLE[2 * k];
            }
        }
        verticalFlags(rows[y], rows[y - 3], rows[y + 3], xFrom, xTo);
        int[] f = vertical;
        row = y;
        queued = 0;
        int s3 = 3 * rowStride;
        for (int x = xFrom; x < xTo; x += 8) {
            if ((f[x] | f[x + 1] | f[x + 2] | f[x + 3] | f[x + 4] | f[x + 5] | f[x + 6] | f[x + 7]) >= 0) {
                continue;
            }
            int i = rowStart + x;
            long c = (long) LONGS.get(d, i);
            long u = (long) LONGS.get(d, i - s3);
            long b = (long) LONGS.get(d, i + s3);
            long l = (long) LONGS.get(d, i - 3);
            long r = (long) LONGS.get(d, i + 3);
            long even = pairs(c & LOW, u & LOW, b & LOW, l & LOW, r & LOW);
            long odd = pairs((c >>> 8) & LOW, (u >>> 8) & LOW, (b >>> 8) & LOW, (l >>> 8) & LOW, (r >>> 8) & LOW);
            if ((even | odd) != 0) {
                int valid = Math.min(8, xTo - x);
                diagonals(d, i, c, even & VALID_EVEN[valid], odd & VALID_ODD[valid], x);
            }
        }
        return queued;
    }

    /**
     * Runs the full test on every pixel queued since the last flush or {@link #startLevel()}, and empties the
     * queue.
     *
     * @param d the pixels given to {@link #scanRow}
     * @return number of corners, in the order the rows were scanned, readable through {@link #x(int)},
     *         {@link #y(int)} and {@link #score(int)}
     */
    int flush(byte[] d) {
        int n = batch.run(d, circle);
        batch.clear();
        return n;
    }

    /**
     * vertical[x] is negative when the top or the bottom compass pixel of x is beyond the threshold on either side,
     * a condition the pre-tests imply; zero past xTo. One loop over int rows that C2 vectorises.
     */
    private void verticalFlags(int[] c, int[] up, int[] down, int xFrom, int xTo) {
        if (vertical.length < xTo + 8) {
            vertical = new int[xTo + 8];
        }
        int[] f = vertical;
        int t = threshold;
        for (int x = xFrom; x < xTo; x++) {
            int hi = c[x] + t;
            int lo = c[x] - t;
            f[x] = (hi - up[x]) | (hi - down[x]) | (up[x] - lo) | (down[x] - lo);
        }
        Arrays.fill(f, xTo, xTo + 8, 0);
    }

    /** Lanes of the even / odd word that lie within the first {@code n} pixels of a group of 8. */
    private static final long[] VALID_EVEN = new long[9];
    private static final long[] VALID_ODD = new long[9];

    static {
        for (int n = 0; n <= 8; n++) {
            for (int lane = 0; lane < 4; lane++) {
                VALID_EVEN[n] |= 2 * lane < n ? 0xFFFFL << (16 * lane) : 0;
                VALID_ODD[n] |= 2 * lane + 1 < n ? 0xFFFFL << (16 * lane) : 0;
            }
        }
    }

    /**
     * Bright flag at bit 9 and dark flag at bit 10 of each lane: set when (first or second) and (third or fourth)
     * of the four given pixels are beyond the threshold on that side.
     */
    private long pairs(long c, long p1, long p2, long p3, long p4) {
        long a = lanesK - c;
        long bright = ((p1 + a) | (p2 + a)) & ((p3 + a) | (p4 + a)) & BIT9;
        long e = c + lanesK;
        long dark = ((e - p1) | (e - p2)) & ((e - p3) | (e - p4)) & BIT9;
        return bright | (dark << 1);
    }

    /** Applies the diagonal condition to the flagged lanes of a group and runs the full test on survivors. */
    private void diagonals(byte[] d, int i, long c, long even, long odd, int x) {
        int s2 = 2 * stride;
        long nw = (long) LONGS.get(d, i - s2 - 2);
        long ne = (long) LONGS.get(d, i - s2 + 2);
        long se = (long) LONGS.get(d, i + s2 + 2);
        long sw = (long) LONGS.get(d, i + s2 - 2);
        even &= pairs(c & LOW, nw & LOW, se & LOW, ne & LOW, sw & LOW);
        odd &= pairs((c >>> 8) & LOW, (nw >>> 8) & LOW, (se >>> 8) & LOW, (ne >>> 8) & LOW, (sw >>> 8) & LOW);
        enqueue(i, even, x);
        enqueue(i + 1, odd, x + 1);
    }

    /** Queues the pixels of the flagged lanes (lane k: index i + 2k, column x + 2k). */
    private void enqueue(int i, long flags, int x) {
        while (flags != 0) {
            int lane = Long.numberOfTrailingZeros(flags) >>> 4;
            batch.add(i + 2 * lane, x + 2 * lane, row);
            queued++;
            flags &= ~(0xFFFFL << (16 * lane));
        }
    }

    /** Column of corner {@code k} of the last flush. */
    int x(int k) {
        return batch.x(k);
    }

    /** Row of corner {@code k} of the last flush. */
    int y(int k) {
        return batch.y(k);
    }

    /** FAST score of corner {@code k} of the last flush. */
    int score(int k) {
        return batch.score(k);
    }
}
