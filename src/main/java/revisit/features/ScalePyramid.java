package revisit.features;

import boofcv.struct.image.GrayU8;
import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.nio.ByteOrder;

/**
 * Scale pyramid of one frame: the raw levels (FAST, Harris, orientation) and, one level at a time on request, a
 * Gaussian-smoothed copy around marked patches (BRIEF tests, {@link PatchBlur}). Level {@code l} is about {@code scaleFactor^-l} times the input size and is
 * resampled bilinearly from level {@code l - 1}, as ORB does (Rublee et al., ICCV 2011).
 *
 * <p>Pixel-centre convention: level pixel {@code x} maps to level-0 pixel {@code (x + 0.5) * W0 / w - 0.5}, which is
 * exact for the chain of resamplings below. All smoothed levels share one buffer and one row stride (the input
 * width), so a single table of pixel offsets serves every level. Buffers are kept and reused while the input size stays the same.
 * Not thread-safe: one instance per extractor.
 */
final class ScalePyramid {

    private static final VarHandle LONGS = MethodHandles.byteArrayViewVarHandle(long[].class,
            ByteOrder.LITTLE_ENDIAN);

    private final int levels;
    private final double scaleFactor;
    private final int minSide;
    private final PatchBlur blur;

    private int width0 = -1;
    private int height0 = -1;
    private int usable;
    private final int[] widths;
    private final int[] heights;
    private final GrayU8[] raw;
    /** Smoothed pixels of the level last given to {@link #smoothPatches(int)}: one buffer serves every level. */
    private byte[] smooth = new byte[0];
    /** Level pixels as ints, one array per row ({@code rows[l][y]}): the form C2 vectorises arithmetic on. */
    private final int[][][] rows;
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
        this.blur = new PatchBlur(gaussianKernel(blurSigma, PatchBlur.RADIUS));
        this.widths = new int[levels];
        this.heights = new int[levels];
        this.raw = new GrayU8[levels];
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
            rows[l] = new int[h][w];
            usable = l + 1;
        }
        smooth = new byte[width * height];
        blend = new int[width];
        blur.allocate(width, height);
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
        storeBytes(row, 0, row.length, out, o);
    }

    /**
     * {@code out[o + x] = (byte) values[x]} for x in [from, to), values in 0..255. C2 (JDK 17) does not vectorise the
     * int-to-byte store; packing eight bytes into one long store took 0.28 against 0.32 ms for the blur of a
     * 640x480 level (microbenchmark, thread CPU time).
     */
    static void storeBytes(int[] values, int from, int to, byte[] out, int o) {
        int x = from;
        for (; x <= to - 8; x += 8) {
            int low = values[x] | values[x + 1] << 8 | values[x + 2] << 16 | values[x + 3] << 24;
            int high = values[x + 4] | values[x + 5] << 8 | values[x + 6] << 16 | values[x + 7] << 24;
            LONGS.set(out, o + x, (low & 0xFFFFFFFFL) | (long) high << 32);
        }
        for (; x < to; x++) {
            out[o + x] = (byte) values[x];
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

    /** Forgets the patches marked for the next {@link #smoothPatches(int)}. */
    void clearPatches() {
        blur.clear();
    }

    /** Marks the BRIEF patch around pixel (x, y) of level {@code l} for {@link #smoothPatches(int)}. */
    void markPatch(int l, int x, int y) {
        blur.mark(x, y, widths[l], heights[l]);
    }

    /**
     * Smoothed level {@code l}, row stride {@link #smoothStride()}, first pixel at index 0: blurred only within
     * {@link PatchBlur#PATCH_RADIUS} pixels (at least) of the patches marked since {@link #clearPatches()}; other
     * pixels are stale.
     */
    byte[] smoothPatches(int l) {
        blur.blur(rows[l], widths[l], heights[l], smooth);
        return smooth;
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
