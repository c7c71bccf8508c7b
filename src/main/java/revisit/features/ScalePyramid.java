package revisit.features;

import boofcv.struct.image.GrayU8;
import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.nio.ByteOrder;
import java.util.Arrays;

/**
 * Scale pyramid of one frame, two images per level: the raw level (FAST, Harris, orientation) and a
 * Gaussian-smoothed copy (BRIEF tests). Level {@code l} is about {@code scaleFactor^-l} times the input size and is
 * resampled bilinearly from level {@code l - 1}, as ORB does (Rublee et al., ICCV 2011).
 *
 * <p>Pixel-centre convention: level pixel {@code x} maps to level-0 pixel {@code (x + 0.5) * W0 / w - 0.5}, which is
 * exact for the chain of resamplings below. All smoothed levels share one row stride (the input width), so a single
 * table of pixel offsets serves every level. Buffers are kept and reused while the input size stays the same.
 * Not thread-safe: one instance per extractor.
 */
final class ScalePyramid {

    private static final VarHandle LONGS = MethodHandles.byteArrayViewVarHandle(long[].class,
            ByteOrder.LITTLE_ENDIAN);

    private final int levels;
    private final double scaleFactor;
    private final int minSide;
    /** Half width of the smoothing kernel: 7 taps, as ORB's 7x7 Gaussian (OpenCV, from memory). */
    static final int BLUR_RADIUS = 3;
    /** Rows of horizontally blurred values kept (a power of two above 2 * BLUR_RADIUS + 1), minus one. */
    private static final int RING_MASK = 7;

    private final int[] kernel;

    private int width0 = -1;
    private int height0 = -1;
    private int usable;
    private final int[] widths;
    private final int[] heights;
    private final GrayU8[] raw;
    private final byte[][] smooth;
    /** Level pixels as ints, one array per row ({@code rows[l][y]}): the form C2 vectorises arithmetic on. */
    private final int[][][] rows;
    private int[][] blurRows = new int[0][];
    private int[][] shifted = new int[0][];
    private int[] accumulator = new int[0];
    private int[] blend = new int[0];
    private int[] columnIndex = new int[0];
    private int[] columnWeight = new int[0];

    /**
     * @param levels      maximum number of levels
     * @param scaleFactor size ratio between neighbouring levels
     * @param minSide     smallest width or height, pixels, of a level worth building
     * @param blurSigma   Gaussian sigma for the smoothed copies, level pixels
     */
    ScalePyramid(int levels, double scaleFactor, int minSide, double blurSigma) {
        this.levels = levels;
        this.scaleFactor = scaleFactor;
        this.minSide = minSide;
        this.kernel = gaussianKernel(blurSigma, BLUR_RADIUS);
        this.widths = new int[levels];
        this.heights = new int[levels];
        this.raw = new GrayU8[levels];
        this.smooth = new byte[levels][];
        this.rows = new int[levels][][];
    }

    /** Integer Gaussian weights of length 2r+1 summing to exactly 256. */
    static int[] gaussianKernel(double sigma, int radius) {
        double[] w = new double[2 * radius + 1];
        double sum = 0;
        for (int i = -radius; i <= radius; i++) {
            w[i + radius] = Math.exp(-0.5 * i * i / (sigma * sigma));
            sum += w[i + radius];
        }
        int[] k = new int[w.length];
        int total = 0;
        for (int i = 0; i < w.length; i++) {
            k[i] = (int) Math.round(256 * w[i] / sum);
            total += k[i];
        }
        k[radius] += 256 - total;
        return k;
    }

    /** Builds all levels for {@code image}; the image is referenced as level 0 and not modified. */
    void process(GrayU8 image) {
        if (image.width != width0 || image.height != height0) {
            allocate(image.width, image.height);
        }
        if (usable == 0) {
            return;
        }
        raw[0] = image;
        for (int y = 0; y < height0; y++) {
            int[] row = rows[0][y];
            int start = image.startIndex + y * image.stride;
            for (int x = 0; x < width0; x++) {
                row[x] = image.data[start + x] & 0xFF;
            }
        }
        for (int l = 1; l < usable; l++) {
            resample(l);
        }
        for (int l = 0; l < usable; l++) {
            blur(l);
        }
    }

    private void allocate(int width, int height) {
        width0 = width;
        height0 = height;
        usable = 0;
        for (int l = 0; l < levels; l++) {
            double s = Math.pow(scaleFactor, l);
            int w = (int) Math.round(width / s);
            int h = (int) Math.round(height / s);
            if (w < minSide || h < minSide) {
                break;
            }
            widths[l] = w;
            heights[l] = h;
            raw[l] = l == 0 ? null : new GrayU8(w, h);
            smooth[l] = new byte[width * h];
            rows[l] = new int[h][w];
            usable = l + 1;
        }
        blurRows = new int[RING_MASK + 1][width];
        blend = new int[width];
        shifted = new int[2 * BLUR_RADIUS + 1][width];
        accumulator = new int[width];
        columnIndex = new int[width];
        columnWeight = new int[width];
    }

    /**
     * Bilinear resampling of level {@code l - 1} into level {@code l} with 7-bit fixed-point weights. Separable:
     * each output row first blends its two source rows over the full width (a vectorised loop over int rows), then
     * interpolates along the row (a gather, scalar), writing both the byte image and the int row.
     */
    private void resample(int l) {
        int srcW = widths[l - 1];
        int srcH = heights[l - 1];
        GrayU8 dst = raw[l];
        double rx = (double) srcW / dst.width;
        double ry = (double) srcH / dst.height;
        for (int x = 0; x < dst.width; x++) {
            double sx = (x + 0.5) * rx - 0.5;
            int x0 = Math.min(Math.max((int) sx, 0), srcW - 2);
            columnIndex[x] = x0;
            columnWeight[x] = Math.min(Math.max((int) Math.round((sx - x0) * 128), 0), 128);
        }
        int[][] in = rows[l - 1];
        int[] b = blend;
        for (int y = 0; y < dst.height; y++) {
            double sy = (y + 0.5) * ry - 0.5;
            int y0 = Math.min(Math.max((int) sy, 0), srcH - 2);
            int wy = Math.min(Math.max((int) Math.round((sy - y0) * 128), 0), 128);
            int[] top = in[y0];
            int[] bottom = in[y0 + 1];
            for (int x = 0; x < srcW; x++) {
                b[x] = (top[x] << 7) + (bottom[x] - top[x]) * wy;
            }
            interpolateRow(b, dst.data, dst.startIndex + y * dst.stride, rows[l][y]);
        }
    }

    /** Horizontal step of {@link #resample}: one output row from the blended source row. */
    private void interpolateRow(int[] b, byte[] out, int o, int[] row) {
        int[] index = columnIndex;
        int[] weight = columnWeight;
        for (int x = 0; x < row.length; x++) {
            int j = index[x];
            int left = b[j];
            row[x] = ((left << 7) + (b[j + 1] - left) * weight[x] + 8192) >> 14;
        }
        storeBytes(row, row.length, out, o);
    }

    /**
     * Separable 7-tap Gaussian with replicated borders into {@code out} (row stride {@link #width0}). Both passes are
     * loops over whole rows of ints with equal indices into at most six arrays, the shape HotSpot's C2 vectorises:
     * JDK 17's C2 vectorises neither a loop that reads one array at several offsets nor one that reads seven arrays
     * (measured), so each 7-tap sum is split into a five-array loop and a three-array loop, and the horizontal pass
     * reads six shifted copies of the row made with {@code System.arraycopy}.
     */
    private void blur(int l) {
        int w = widths[l];
        int h = heights[l];
        int[][] src = rows[l];
        byte[] out = smooth[l];
        int[][] ring = blurRows;
        int done = -1;
        int k0 = kernel[BLUR_RADIUS];
        int k1 = kernel[BLUR_RADIUS - 1];
        int k2 = kernel[BLUR_RADIUS - 2];
        int k3 = kernel[BLUR_RADIUS - 3];
        int[] acc = accumulator;
        for (int y = 0; y < h; y++) {
            for (; done < Math.min(y + BLUR_RADIUS, h - 1); done++) {
                blurRow(src[done + 1], w, ring[(done + 1) & RING_MASK]);
            }
            int[] c = ring[y & RING_MASK];
            int[] u1 = ring[Math.max(y - 1, 0) & RING_MASK];
            int[] d1 = ring[Math.min(y + 1, h - 1) & RING_MASK];
            int[] u2 = ring[Math.max(y - 2, 0) & RING_MASK];
            int[] d2 = ring[Math.min(y + 2, h - 1) & RING_MASK];
            int[] u3 = ring[Math.max(y - 3, 0) & RING_MASK];
            int[] d3 = ring[Math.min(y + 3, h - 1) & RING_MASK];
            for (int x = 0; x < w; x++) {
                acc[x] = k0 * c[x] + k1 * (u1[x] + d1[x]) + k2 * (u2[x] + d2[x]);
            }
            for (int x = 0; x < w; x++) {
                acc[x] = (acc[x] + k3 * (u3[x] + d3[x]) + 32768) >>> 16;
            }
            storeBytes(acc, w, out, y * width0);
        }
    }

    /**
     * {@code out[o + x] = (byte) values[x]} for x in [0, n), values in 0..255. C2 (JDK 17) does not vectorise the
     * int-to-byte store; packing eight bytes into one long store took 0.28 against 0.32 ms for the blur of a
     * 640x480 level (microbenchmark, thread CPU time).
     */
    private static void storeBytes(int[] values, int n, byte[] out, int o) {
        int x = 0;
        for (; x <= n - 8; x += 8) {
            int low = values[x] | values[x + 1] << 8 | values[x + 2] << 16 | values[x + 3] << 24;
            int high = values[x + 4] | values[x + 5] << 8 | values[x + 6] << 16 | values[x + 7] << 24;
            LONGS.set(out, o + x, (low & 0xFFFFFFFFL) | (long) high << 32);
        }
        for (; x < n; x++) {
            out[o + x] = (byte) values[x];
        }
    }

    /** Horizontal 7-tap pass of one row, borders replicated; sums scaled by 256. */
    private void blurRow(int[] centre, int w, int[] row) {
        int[][] s = shifted;
        for (int t = 1; t <= BLUR_RADIUS; t++) {
            int[] left = s[BLUR_RADIUS - t];
            int[] right = s[BLUR_RADIUS + t];
            System.arraycopy(centre, 0, left, t, w - t);
            System.arraycopy(centre, t, right, 0, w - t);
            Arrays.fill(left, 0, t, centre[0]);
            Arrays.fill(right, w - t, w, centre[w - 1]);
        }
        int k0 = kernel[BLUR_RADIUS];
        int k1 = kernel[BLUR_RADIUS - 1];
        int k2 = kernel[BLUR_RADIUS - 2];
        int k3 = kernel[BLUR_RADIUS - 3];
        int[] l1 = s[2];
        int[] r1 = s[4];
        int[] l2 = s[1];
        int[] r2 = s[5];
        int[] l3 = s[0];
        int[] r3 = s[6];
        for (int x = 0; x < w; x++) {
            row[x] = k0 * centre[x] + k1 * (l1[x] + r1[x]) + k2 * (l2[x] + r2[x]);
        }
        for (int x = 0; x < w; x++) {
            row[x] += k3 * (l3[x] + r3[x]);
        }
    }

    /** Levels built for the current input size (levels smaller than the minimum side are dropped). */
    int usableLevels() {
        return usable;
    }

    /** Raw image of level {@code l}; level 0 is the input itself. */
    GrayU8 raw(int l) {
        return raw[l];
    }

    /** Level {@code l} as int rows, {@code rows(l)[y][x]}; the same pixels as {@link #raw(int)}. */
    int[][] rows(int l) {
        return rows[l];
    }

    /** Smoothed level {@code l}, row stride {@link #smoothStride()}, first pixel at index 0. */
    byte[] smooth(int l) {
        return smooth[l];
    }

    /** Row stride of every smoothed level: the input width. */
    int smoothStride() {
        return width0;
    }

    /** Level-0 pixels per level-{@code l} pixel along x. */
    double toLevel0X(int l) {
        return (double) width0 / widths[l];
    }

    /** Level-0 pixels per level-{@code l} pixel along y. */
    double toLevel0Y(int l) {
        return (double) height0 / heights[l];
    }
}
