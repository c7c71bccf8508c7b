package revisit.scenario;

/**
 * A grey texture in [0, 1] (stored with 8 bits) with a prefiltered mip pyramid, sampled trilinearly so that
 * distant or slanted surfaces do not alias (Williams, "Pyramidal parametrics", SIGGRAPH 1983).
 *
 * <p>Level 0 is the painted image; each further level halves both sizes with a 2x2 box filter, down to 1x1.
 * Texel centres sit at half-integer coordinates; lookups outside the image clamp to the edge. Immutable once
 * built, so one texture may be shared by many surfaces (repetitive or twin places) and read from many threads.
 */
public final class Texture {

    /**
     * Texel values as unsigned bytes (value = byte / 255): a quarter of the memory of floats (the yard's textures
     * take 16 MB with their pyramids: 248 textures, 12.3 million texels); 8 bits suffice for 8-bit frames.
     */
    private final byte[][] levels;
    private final int[] widths;
    private final int[] heights;

    /**
     * Builds the pyramid from a painted image.
     *
     * @param width  texels
     * @param height texels
     * @param grey   row-major values in [0, 1]; copied
     */
    public Texture(int width, int height, float[] grey) {
        if (width <= 0 || height <= 0 || grey.length != width * height) {
            throw new IllegalArgumentException("texture " + width + "x" + height + " does not match "
                    + grey.length + " values");
        }
        int count = 1 + 32 - Integer.numberOfLeadingZeros(Math.max(width, height) - 1);
        levels = new byte[count][];
        widths = new int[count];
        heights = new int[count];
        float[] level = grey.clone();
        widths[0] = width;
        heights[0] = height;
        levels[0] = quantize(level);
        for (int l = 1; l < count; l++) {
            widths[l] = Math.max(1, (widths[l - 1] + 1) / 2);
            heights[l] = Math.max(1, (heights[l - 1] + 1) / 2);
            level = halve(level, widths[l - 1], heights[l - 1], widths[l], heights[l]);
            levels[l] = quantize(level);
        }
    }

    private static byte[] quantize(float[] v) {
        byte[] out = new byte[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = (byte) Math.round(Math.max(0f, Math.min(1f, v[i])) * 255f);
        }
        return out;
    }

    private static float[] halve(float[] src, int sw, int sh, int dw, int dh) {
        float[] dst = new float[dw * dh];
        for (int y = 0; y < dh; y++) {
            int y0 = Math.min(2 * y, sh - 1);
            int y1 = Math.min(2 * y + 1, sh - 1);
            for (int x = 0; x < dw; x++) {
                int x0 = Math.min(2 * x, sw - 1);
                int x1 = Math.min(2 * x + 1, sw - 1);
                dst[y * dw + x] = 0.25f * (src[y0 * sw + x0] + src[y0 * sw + x1] + src[y1 * sw + x0]
                        + src[y1 * sw + x1]);
            }
        }
        return dst;
    }

    /** Width of level 0, texels. */
    public int width() {
        return widths[0];
    }

    /** Height of level 0, texels. */
    public int height() {
        return heights[0];
    }

    /** Number of pyramid levels. */
    public int levelCount() {
        return levels.length;
    }

    /** Value of one texel of level 0. */
    public float texel(int x, int y) {
        return (levels[0][y * widths[0] + x] & 0xff) / 255f;
    }

    /**
     * Trilinear lookup.
     *
     * @param s   horizontal position in level-0 texels (0 = left edge of the image)
     * @param t   vertical position in level-0 texels (0 = top edge)
     * @param lod pyramid level, fractional; 0 or less means full resolution
     * @return filtered value in [0, 1]
     */
    public float sample(double s, double t, double lod) {
        if (lod <= 0) {
            return bilinear(0, s, t);
        }
        int last = levels.length - 1;
        if (lod >= last) {
            return bilinear(last, s, t);
        }
        int l = (int) lod;
        float f = (float) (lod - l);
        float a = bilinear(l, s, t);
        float b = bilinear(l + 1, s, t);
        return a + f * (b - a);
    }

    private float bilinear(int level, double s, double t) {
        double scale = 1.0 / (1 << level);
        int w = widths[level];
        int h = heights[level];
        double x = Math.max(-1, Math.min(w, s * scale - 0.5));
        double y = Math.max(-1, Math.min(h, t * scale - 0.5));
        int x0 = (int) (x + 65536) - 65536;
        int y0 = (int) (y + 65536) - 65536;
        float fx = (float) (x - x0);
        float fy = (float) (y - y0);
        int xa = clamp(x0, w);
        int xb = clamp(x0 + 1, w);
        int ya = clamp(y0, h) * w;
        int yb = clamp(y0 + 1, h) * w;
        byte[] p = levels[level];
        float a = p[ya + xa] & 0xff;
        float b = p[ya + xb] & 0xff;
        float c = p[yb + xa] & 0xff;
        float d = p[yb + xb] & 0xff;
        float top = a + fx * (b - a);
        float bottom = c + fx * (d - c);
        return (top + fy * (bottom - top)) * (1f / 255f);
    }

    private static int clamp(int i, int n) {
        return i < 0 ? 0 : (i >= n ? n - 1 : i);
    }
}
