package revisit.scenario;

/**
 * A grey painting surface in texels (values in [0, 1]) with the few anti-aliased primitives the procedural
 * textures need. Edges are anti-aliased by area coverage (rectangles, discs) or 4x4 supersampling (other shapes),
 * so painted corners are crisp but not jagged. Not thread-safe; one canvas per texture being painted.
 */
final class Canvas {

    final int width;
    final int height;
    final float[] pixels;

    Canvas(int width, int height) {
        if (width <= 0 || height <= 0) {
            throw new IllegalArgumentException("canvas size must be positive, was " + width + "x" + height);
        }
        this.width = width;
        this.height = height;
        this.pixels = new float[width * height];
    }

    void fill(float value) {
        java.util.Arrays.fill(pixels, value);
    }

    /** Blends {@code value} into one texel with weight {@code coverage} in [0, 1]. */
    void blend(int x, int y, float value, double coverage) {
        if (x < 0 || y < 0 || x >= width || y >= height || coverage <= 0) {
            return;
        }
        int i = y * width + x;
        float c = (float) Math.min(1.0, coverage);
        pixels[i] += c * (value - pixels[i]);
    }

    /** Axis-aligned rectangle [x0, x1) x [y0, y1) in texel units (fractional), area-weighted at the edges. */
    void rect(double x0, double y0, double x1, double y1, float value) {
        int ix0 = (int) Math.floor(Math.max(0, x0));
        int iy0 = (int) Math.floor(Math.max(0, y0));
        int ix1 = (int) Math.ceil(Math.min(width, x1));
        int iy1 = (int) Math.ceil(Math.min(height, y1));
        for (int y = iy0; y < iy1; y++) {
            double cy = Math.min(y + 1, y1) - Math.max(y, y0);
            for (int x = ix0; x < ix1; x++) {
                double cx = Math.min(x + 1, x1) - Math.max(x, x0);
                blend(x, y, value, cx * cy);
            }
        }
    }

    /** Rectangle outline of the given line thickness, texels. */
    void frame(double x0, double y0, double x1, double y1, double thickness, float value) {
        rect(x0, y0, x1, y0 + thickness, value);
        rect(x0, y1 - thickness, x1, y1, value);
        rect(x0, y0 + thickness, x0 + thickness, y1 - thickness, value);
        rect(x1 - thickness, y0 + thickness, x1, y1 - thickness, value);
    }

    /** Filled disc; coverage from the distance to the rim (one-texel ramp). */
    void disc(double cx, double cy, double r, float value) {
        int x0 = (int) Math.floor(cx - r - 1);
        int x1 = (int) Math.ceil(cx + r + 1);
        int y0 = (int) Math.floor(cy - r - 1);
        int y1 = (int) Math.ceil(cy + r + 1);
        for (int y = y0; y <= y1; y++) {
            for (int x = x0; x <= x1; x++) {
                double d = Math.hypot(x + 0.5 - cx, y + 0.5 - cy);
                blend(x, y, value, Math.max(0, Math.min(1, r - d + 0.5)));
            }
        }
    }

    /** Inside-test for {@link #shape}, in texel coordinates. */
    @FunctionalInterface
    interface Region {
        boolean contains(double x, double y);
    }

    /** Any shape inside the bounding box, anti-aliased by 4x4 supersampling. */
    void shape(double x0, double y0, double x1, double y1, Region region, float value) {
        int ix0 = (int) Math.floor(Math.max(0, x0));
        int iy0 = (int) Math.floor(Math.max(0, y0));
        int ix1 = (int) Math.ceil(Math.min(width, x1));
        int iy1 = (int) Math.ceil(Math.min(height, y1));
        for (int y = iy0; y < iy1; y++) {
            for (int x = ix0; x < ix1; x++) {
                int hits = 0;
                for (int k = 0; k < 16; k++) {
                    if (region.contains(x + 0.125 + 0.25 * (k & 3), y + 0.125 + 0.25 * (k >> 2))) {
                        hits++;
                    }
                }
                blend(x, y, value, hits / 16.0);
            }
        }
    }

    /**
     * Adds smooth multi-octave value noise (Perlin, "An image synthesizer", SIGGRAPH 1985, in its lattice-value
     * form): octave k has cell size {@code cellTexels / 2^k} and amplitude {@code amplitude / 2^k}.
     */
    void addNoise(long seed, double cellTexels, double amplitude, int octaves) {
        for (int k = 0; k < octaves; k++) {
            double cell = cellTexels / (1 << k);
            double amp = amplitude / (1 << k);
            long octaveSeed = SeedMixer.derive(seed, k);
            int lattice = (int) Math.floor((width - 1) / cell) + 2;
            double[] upper = new double[lattice];
            double[] lower = new double[lattice];
            for (int y = 0; y < height; y++) {
                double gy = y / cell;
                int jy = (int) Math.floor(gy);
                double fy = smooth(gy - jy);
                for (int j = 0; j < lattice; j++) {
                    upper[j] = SeedMixer.unit(octaveSeed, j, jy);
                    lower[j] = SeedMixer.unit(octaveSeed, j, jy + 1);
                }
                for (int x = 0; x < width; x++) {
                    double gx = x / cell;
                    int jx = (int) gx;
                    double fx = smooth(gx - jx);
                    double top = upper[jx] + fx * (upper[jx + 1] - upper[jx]);
                    double bottom = lower[jx] + fx * (lower[jx + 1] - lower[jx]);
                    pixels[y * width + x] += (float) (amp * (2 * (top + fy * (bottom - top)) - 1));
                }
            }
        }
    }

    private static double smooth(double t) {
        return t * t * (3 - 2 * t);
    }

    /** Clamps all values into [0, 1]. */
    void clamp() {
        for (int i = 0; i < pixels.length; i++) {
            pixels[i] = Math.max(0f, Math.min(1f, pixels[i]));
        }
    }

    /** The finished texture (with its pyramid). */
    Texture toTexture() {
        clamp();
        return new Texture(width, height, pixels);
    }
}
