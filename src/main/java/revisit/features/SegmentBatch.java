package revisit.features;

import java.util.Arrays;

/**
 * The full FAST segment test ({@link FastSegmentTest}) of a whole level's pre-tested pixels at once. The 16 circle
 * pixels of every queued pixel are first copied into 16 int arrays (one per circle position); the bright / dark
 * flags, the arc search and the score are then loops over those arrays with equal indices, the shape HotSpot's C2
 * vectorises, and the corners are written out without a branch per pixel. Testing each pixel on its own (a loop over
 * the circle, a table of arcs, a branch per side and per corner) cost 23-30 ns per pixel on the levels of 640x480
 * photos; this costs about 12 (FAST on the pre-tested rows of all levels of pixabay car01, 49,000 tested pixels:
 * 2.6 against 1.75 ms, thread CPU time; docs/FEATURES.md). Corners, scores and their order equal those of the
 * per-pixel test. Not thread-safe: one instance per segment test.
 */
final class SegmentBatch {

    private final int threshold;
    private final int arc;
    private int queued;
    private int[] pixel = new int[1024];
    private int[] column = new int[1024];
    private int[] row = new int[1024];
    /** circle[k][j]: circle pixel k of queued pixel j. */
    private final int[][] circle = new int[16][0];
    private int[] centre = new int[0];
    /** Bright flags in bits 0..15, dark flags in bits 16..31; after {@link #sides} the corner side's flags. */
    private int[] mask = new int[0];
    /** 1 for a bright corner, 2 for a dark one, 0 for none. */
    private int[] side = new int[0];
    private int[] sum = new int[0];
    private int corners;
    private int[] cornerX = new int[0];
    private int[] cornerY = new int[0];
    private int[] cornerScore = new int[0];

    /**
     * @param threshold intensity difference, grey levels, 1..254
     * @param arc       contiguous circle pixels required, 9..12
     */
    SegmentBatch(int threshold, int arc) {
        this.threshold = threshold;
        this.arc = arc;
    }

    /** Empties the queue. */
    void clear() {
        queued = 0;
    }

    /** Queues the pixel at index {@code p} of the image, column {@code x} of row {@code y}. */
    void add(int p, int x, int y) {
        if (queued == pixel.length) {
            int n = 2 * queued;
            pixel = Arrays.copyOf(pixel, n);
            column = Arrays.copyOf(column, n);
            row = Arrays.copyOf(row, n);
        }
        pixel[queued] = p;
        column[queued] = x;
        row[queued++] = y;
    }

    /**
     * Tests every queued pixel; the corners, in queue order, are then readable through {@link #x(int)},
     * {@link #y(int)} and {@link #score(int)}.
     *
     * @param d      the image the queued indices point into
     * @param offset index offsets of the 16 circle pixels
     * @return number of corners
     */
    int run(byte[] d, int[] offset) {
        int n = queued;
        prepare(n);
        for (int k = 0; k < 16; k++) {
            int[] values = circle[k];
            int o = offset[k];
            for (int j = 0; j < n; j++) {
                values[j] = d[pixel[j] + o] & 0xFF;
            }
        }
        for (int j = 0; j < n; j++) {
            centre[j] = d[pixel[j]] & 0xFF;
        }
        for (int k = 0; k < 16; k += 2) {
            flagPair(circle[k], circle[k + 1], k, n);
        }
        sides(n);
        scores(n);
        collect(n);
        return corners;
    }

    private void prepare(int n) {
        if (centre.length < n) {
            int size = Math.max(n, 2 * centre.length);
            for (int k = 0; k < 16; k++) {
                circle[k] = new int[size];
            }
            centre = new int[size];
            mask = new int[size];
            side = new int[size];
            sum = new int[size];
            cornerX = new int[size + 1];
            cornerY = new int[size + 1];
            cornerScore = new int[size + 1];
        }
    }

    /** Sets (k = 0: starts) the mask bits of circle pixels {@code k} and {@code k + 1}. */
    private void flagPair(int[] a, int[] b, int k, int n) {
        int[] m = mask;
        int[] c = centre;
        int t = threshold;
        int brightA = 1 << k;
        int brightB = 2 << k;
        int darkA = 0x10000 << k;
        int darkB = 0x20000 << k;
        int keep = k == 0 ? 0 : -1;
        for (int j = 0; j < n; j++) {
            int hi = c[j] + t;
            int lo = c[j] - t;
            int va = a[j];
            int vb = b[j];
            m[j] = (m[j] & keep) | (((hi - va) >> 31) & brightA) | (((hi - vb) >> 31) & brightB)
                    | (((va - lo) >> 31) & darkA) | (((vb - lo) >> 31) & darkB);
        }
    }

    /**
     * side[j] from runs of {@link #arc} in the doubled 16-bit masks (runs of 2, 4 and 8 by doubling, then the
     * rest); mask[j] keeps only the flags of the corner's side (zero for no corner).
     */
    private void sides(int n) {
        int[] m = mask;
        int[] out = side;
        int rest = arc - 8;
        for (int j = 0; j < n; j++) {
            int bright = m[j] & 0xFFFF;
            int dark = m[j] >>> 16;
            int b = bright | (bright << 16);
            int e = dark | (dark << 16);
            b &= b >>> 1;
            e &= e >>> 1;
            b &= b >>> 2;
            e &= e >>> 2;
            b &= b >>> 4;
            e &= e >>> 4;
            b &= b >>> rest;
            e &= e >>> rest;
            int isBright = ((b & 0xFFFF) + 0xFFFF) >>> 16;
            int isDark = ((e & 0xFFFF) + 0xFFFF) >>> 16;
            out[j] = isBright | (isDark << 1);
            m[j] = (bright & -isBright) | (dark & -isDark);
        }
    }

    /**
     * sum[j] = summed |v - centre| over the flagged circle pixels: all of them lie on one side of the centre, so it
     * is the absolute value of the summed signed differences.
     */
    private void scores(int n) {
        int[] s = sum;
        int[] m = mask;
        int[] c = centre;
        Arrays.fill(s, 0, n, 0);
        for (int k = 0; k < 16; k++) {
            int[] v = circle[k];
            int up = 31 - k;
            for (int j = 0; j < n; j++) {
                s[j] += ((m[j] << up) >> 31) & (v[j] - c[j]);
            }
        }
    }

    /** Copies the corners to the output arrays, in queue order, without a branch per pixel. */
    private void collect(int n) {
        int count = 0;
        int[] x = cornerX;
        int[] y = cornerY;
        int[] score = cornerScore;
        for (int j = 0; j < n; j++) {
            x[count] = column[j];
            y[count] = row[j];
            score[count] = Math.abs(sum[j]);
            count += (side[j] + 3) >>> 2;
        }
        corners = count;
    }

    /** Column of corner {@code k} of the last {@link #run}. */
    int x(int k) {
        return cornerX[k];
    }

    /** Row of corner {@code k} of the last {@link #run}. */
    int y(int k) {
        return cornerY[k];
    }

    /** FAST score of corner {@code k} of the last {@link #run}. */
    int score(int k) {
        return cornerScore[k];
    }
}
