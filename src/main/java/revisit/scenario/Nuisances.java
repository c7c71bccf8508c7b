package revisit.scenario;

import java.util.SplittableRandom;

/**
 * Image-space nuisances applied to a rendered radiance image: defocus blur, motion blur along the image motion of
 * the frame's centre, exposure gain with clipping, and additive sensor noise, then 8-bit quantisation.
 */
final class Nuisances {

    /** Longest motion-blur streak, pixels (longer streaks are clipped; chosen here). */
    static final int MAX_STREAK = 24;

    private Nuisances() {
    }

    /**
     * Defocus as three passes of a separable box filter of the given radius (approximates a Gaussian of sigma
     * about radius, Wells, IEEE PAMI 1986).
     *
     * @param img     row-major image; modified
     * @param scratch same size as img; overwritten
     */
    static void defocus(float[] img, float[] scratch, int w, int h, int radius) {
        for (int pass = 0; pass < 3; pass++) {
            boxRows(img, scratch, w, h, radius);
            boxColumns(scratch, img, w, h, radius);
        }
    }

    private static void boxRows(float[] src, float[] dst, int w, int h, int r) {
        float norm = 1f / (2 * r + 1);
        for (int y = 0; y < h; y++) {
            int row = y * w;
            float sum = 0;
            for (int k = -r; k <= r; k++) {
                sum += src[row + Math.max(0, Math.min(w - 1, k))];
            }
            for (int x = 0; x < w; x++) {
                dst[row + x] = sum * norm;
                sum += src[row + Math.min(w - 1, x + r + 1)] - src[row + Math.max(0, x - r)];
            }
        }
    }

    private static void boxColumns(float[] src, float[] dst, int w, int h, int r) {
        float norm = 1f / (2 * r + 1);
        for (int x = 0; x < w; x++) {
            float sum = 0;
            for (int k = -r; k <= r; k++) {
                sum += src[Math.max(0, Math.min(h - 1, k)) * w + x];
            }
            for (int y = 0; y < h; y++) {
                dst[y * w + x] = sum * norm;
                sum += src[Math.min(h - 1, y + r + 1) * w + x] - src[Math.max(0, y - r) * w + x];
            }
        }
    }

    /**
     * Motion blur: the mean of the image shifted along the streak {@code (dx, dy)} centred on each pixel, sampled
     * bilinearly at about one tap per pixel of streak length.
     *
     * @param img     modified
     * @param scratch overwritten
     */
    static void motionBlur(float[] img, float[] scratch, int w, int h, double dx, double dy) {
        double len = Math.hypot(dx, dy);
        if (len > MAX_STREAK) {
            dx *= MAX_STREAK / len;
            dy *= MAX_STREAK / len;
            len = MAX_STREAK;
        }
        int taps = (int) Math.ceil(len) + 1;
        java.util.Arrays.fill(scratch, 0f);
        for (int k = 0; k < taps; k++) {
            double f = (double) k / (taps - 1) - 0.5;
            addShifted(img, scratch, w, h, f * dx, f * dy, 1f / taps);
        }
        System.arraycopy(scratch, 0, img, 0, img.length);
    }

    private static void addShifted(float[] src, float[] acc, int w, int h, double sx, double sy, float weight) {
        int ix = (int) Math.floor(sx);
        int iy = (int) Math.floor(sy);
        float fx = (float) (sx - ix);
        float fy = (float) (sy - iy);
        int[] left = new int[w];
        int[] right = new int[w];
        for (int x = 0; x < w; x++) {
            left[x] = Math.max(0, Math.min(w - 1, x + ix));
            right[x] = Math.max(0, Math.min(w - 1, x + ix + 1));
        }
        for (int y = 0; y < h; y++) {
            int y0 = Math.max(0, Math.min(h - 1, y + iy)) * w;
            int y1 = Math.max(0, Math.min(h - 1, y + iy + 1)) * w;
            int row = y * w;
            for (int x = 0; x < w; x++) {
                float a = src[y0 + left[x]];
                float b = src[y0 + right[x]];
                float c = src[y1 + left[x]];
                float d = src[y1 + right[x]];
                float top = a + fx * (b - a);
                acc[row + x] += weight * (top + fy * (c + fx * (d - c) - top));
            }
        }
    }

    /**
     * Exposure, noise and quantisation: {@code round(255 gain value + sigma n)} clipped to [0, 255], where n is
     * approximately standard normal (sum of four uniforms, Irwin-Hall, scaled to unit variance).
     *
     * @param rnd noise source for this frame; advanced
     */
    static byte[] quantize(float[] img, double gain, double sigma, SplittableRandom rnd) {
        byte[] out = new byte[img.length];
        double scale = 255 * gain;
        double noiseScale = sigma * Math.sqrt(3.0) / 65536.0;
        for (int i = 0; i < img.length; i++) {
            double v = img[i] * scale;
            if (sigma > 0) {
                long bits = rnd.nextLong();
                long sum = (bits & 0xffff) + (bits >>> 16 & 0xffff) + (bits >>> 32 & 0xffff) + (bits >>> 48);
                v += (sum - 131070) * noiseScale;
            }
            out[i] = (byte) Math.max(0, Math.min(255, Math.round(v)));
        }
        return out;
    }
}
