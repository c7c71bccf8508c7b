package revisit.features;

import boofcv.struct.image.GrayU8;
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
    private int[][] blurRows = new int[0][];
    private int[][] shifted = new int[0][];
    private int[] accumulator = new int[0];
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
        for (int l = 1; l < usable; l++) {
            resample(raw[l - 1], raw[l]);
        }
        for (int l = 0; l < usable; l++) {
            blur(raw[l], smooth[l]);
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
            usable = l + 1;
        }
        blurRows = new int[RING_MASK + 1][width];
        shifted = new int[2 * BLUR_RADIUS + 1][width];
        accumulator = new int[width];
        columnIndex = new int[width];
        columnWeight = new int[width];
    }

    /**
     * Bilinear resampling with 7-bit fixed-point weights; dst is smaller than src in both directions. Separable:
     * each output row first blends its two source rows over the full width, then interpolates along the row.
     */
    private void resample(GrayU8 src, GrayU8 dst) {
        double rx = (double) src.width / dst.width;
        double ry = (double) src.height / dst.height;
        for (int x = 0; x < dst.width; x++) {
            double sx = (x + 0.5) * rx - 0.5;
            int x0 = Math.min(Math.max((int) sx, 0), src.width - 2);
            columnIndex[x] = x0;
            columnWeight[x] = Math.min(Math.max((int) Math.round((sx - x0) * 128), 0), 128);
        }
        byte[] in = src.data;
        byte[] out = dst.data;
        int[] blend = accumulator;
        for (int y = 0; y < dst.height; y++) {
            double sy = (y + 0.5) * ry - 0.5;
            int y0 = Math.min(Math.max((int) sy, 0), src.height - 2);
            int wy = Math.min(Math.max((int) Math.round((sy - y0) * 128), 0), 128);
            int top = src.startIndex + y0 * src.stride;
            int bottom = top + src.stride;
            for (int x = 0; x < src.width; x++) {
                int a = in[top + x] & 0xFF;
                blend[x] = (a << 7) + ((in[bottom + x] & 0xFF) - a) * wy;
            }
            int o = dst.startIndex + y * dst.stride;
            for (int x = 0; x < dst.width; x++) {
                int j = columnIndex[x];
                int left = blend[j];
                out[o + x] = (byte) (((left << 7) + (blend[j + 1] - left) * columnWeight[x] + 8192) >> 14);
            }
        }
    }

    /**
     * Separable 7-tap Gaussian with replicated borders into {@code out} (row stride {@link #width0}). Both passes are
     * written as loops over whole rows with equal indices, the shape HotSpot's C2 vectorises (JDK 17's C2 does not
     * vectorise a loop that reads one array at several offsets): the horizontal pass reads seven shifted copies of
     * the row made with {@code System.arraycopy}. This halved the blur time against a per-pixel 7-tap loop (about 1.6
     * against 3.5 ms over all levels of a 640x480 frame, thread CPU time; docs/FEATURES.md).
     */
    private void blur(GrayU8 src, byte[] out) {
        int w = src.width;
        int h = src.height;
        int[][] ring = blurRows;
        int done = -1;
        int k0 = kernel[BLUR_RADIUS];
        int k1 = kernel[BLUR_RADIUS - 1];
        int k2 = kernel[BLUR_RADIUS - 2];
        int k3 = kernel[BLUR_RADIUS - 3];
        int[] acc = accumulator;
        for (int y = 0; y < h; y++) {
            for (; done < Math.min(y + BLUR_RADIUS, h - 1); done++) {
                blurRow(src.data, src.startIndex + (done + 1) * src.stride, w, ring[(done + 1) & RING_MASK]);
            }
            int[] c = ring[y & RING_MASK];
            int[] u1 = ring[Math.max(y - 1, 0) & RING_MASK];
            int[] d1 = ring[Math.min(y + 1, h - 1) & RING_MASK];
            int[] u2 = ring[Math.max(y - 2, 0) & RING_MASK];
            int[] d2 = ring[Math.min(y + 2, h - 1) & RING_MASK];
            int[] u3 = ring[Math.max(y - 3, 0) & RING_MASK];
            int[] d3 = ring[Math.min(y + 3, h - 1) & RING_MASK];
            for (int x = 0; x < w; x++) {
                acc[x] = k0 * c[x] + k1 * (u1[x] + d1[x]) + k2 * (u2[x] + d2[x]) + k3 * (u3[x] + d3[x]) + 32768;
            }
            int o = y * width0;
            for (int x = 0; x < w; x++) {
                out[o + x] = (byte) (acc[x] >>> 16);
            }
        }
    }

    /** Horizontal 7-tap pass of one row, borders replicated; sums scaled by 256. */
    private void blurRow(byte[] d, int start, int w, int[] row) {
        int[][] s = shifted;
        int[] centre = s[BLUR_RADIUS];
        for (int x = 0; x < w; x++) {
            centre[x] = d[start + x] & 0xFF;
        }
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
            row[x] = k0 * centre[x] + k1 * (l1[x] + r1[x]) + k2 * (l2[x] + r2[x]) + k3 * (l3[x] + r3[x]);
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
