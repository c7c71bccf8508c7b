package revisit.scenario;

import java.util.SplittableRandom;

/**
 * Painted motifs that give the invented yard its corners and its identity: bricks, planks, corrugation, signs
 * with made-up glyphs, hazard stripes, windows, doors, simple shapes and photo posters. Each motif draws with
 * strong local contrast so that corner detectors find plenty of stable points, while the random choices (tone,
 * glyphs, layout) make one place distinguishable from another.
 */
final class Motifs {

    private Motifs() {
    }

    /** Running-bond bricks of {@code brickW x brickH} texels with mortar joints and per-brick tone. */
    static void bricks(Canvas c, SplittableRandom rnd, double brickW, double brickH, float base, float mortar) {
        c.fill(mortar);
        double joint = Math.max(1.0, brickH * 0.14);
        int rows = (int) Math.ceil(c.height / brickH);
        for (int r = 0; r < rows; r++) {
            double offset = (r % 2) * brickW * 0.5;
            for (double x = -offset; x < c.width; x += brickW) {
                float tone = base + (float) (rnd.nextDouble() * 0.16 - 0.08);
                c.rect(x + joint / 2, r * brickH + joint / 2, x + brickW - joint / 2, (r + 1) * brickH - joint / 2,
                        tone);
            }
        }
    }

    /** Vertical planks of width {@code plankW} texels with dark gaps and grain noise. */
    static void planks(Canvas c, SplittableRandom rnd, double plankW, float base) {
        c.fill(base * 0.45f);
        for (double x = 0; x < c.width; x += plankW) {
            float tone = base + (float) (rnd.nextDouble() * 0.14 - 0.07);
            c.rect(x + 1, 0, x + plankW - 1, c.height, tone);
        }
    }

    /** Corrugated sheet: smooth vertical ribs of period {@code periodT} texels. */
    static void corrugated(Canvas c, double periodT, float base, float depth) {
        for (int y = 0; y < c.height; y++) {
            for (int x = 0; x < c.width; x++) {
                c.pixels[y * c.width + x] = base + depth * (float) Math.sin(2 * Math.PI * x / periodT);
            }
        }
    }

    /**
     * A line of invented glyphs: each glyph is a 5x7 block pattern drawn from the random source (no real
     * alphabet), with cell size {@code cellT} texels.
     */
    static void glyphs(Canvas c, SplittableRandom rnd, double x0, double y0, int count, double cellT, float ink) {
        for (int g = 0; g < count; g++) {
            long bits = 0;
            while (Long.bitCount(bits) < 12) {
                bits = rnd.nextLong() & ((1L << 35) - 1);
            }
            double gx = x0 + g * 6 * cellT;
            for (int k = 0; k < 35; k++) {
                if ((bits >>> k & 1) != 0) {
                    double x = gx + (k % 5) * cellT;
                    double y = y0 + (k / 5) * cellT;
                    c.rect(x, y, x + cellT, y + cellT, ink);
                }
            }
        }
    }

    /** A sign plate with a border and one or two lines of glyphs, fitted into the given box. */
    static void sign(Canvas c, SplittableRandom rnd, double x0, double y0, double w, double h) {
        boolean darkPlate = rnd.nextBoolean();
        float plate = darkPlate ? 0.12f + (float) rnd.nextDouble() * 0.15f : 0.78f + (float) rnd.nextDouble() * 0.18f;
        float ink = darkPlate ? 0.9f : 0.08f;
        c.rect(x0, y0, x0 + w, y0 + h, plate);
        double border = Math.max(1.5, h * 0.06);
        c.frame(x0 + border, y0 + border, x0 + w - border, y0 + h - border, border * 0.7, ink);
        int lines = h > w * 0.3 ? 2 : 1;
        double cell = Math.min((h - 4 * border) / (lines * 8.0), (w - 4 * border) / 30.0);
        cell = Math.max(cell, 1.0);
        int count = Math.max(1, (int) ((w - 4 * border) / (6 * cell)));
        for (int line = 0; line < lines; line++) {
            glyphs(c, rnd, x0 + 2 * border + cell * 0.5, y0 + 2 * border + line * 8 * cell + cell * 0.5,
                    count, cell, ink);
        }
    }

    /** Diagonal hazard stripes inside a box, stripe width {@code stripeT} texels. */
    static void stripes(Canvas c, double x0, double y0, double w, double h, double stripeT, float a, float b) {
        c.rect(x0, y0, x0 + w, y0 + h, a);
        c.shape(x0, y0, x0 + w, y0 + h, (x, y) -> Math.floorMod((long) Math.floor((x + y) / stripeT), 2) == 0, b);
    }

    /** A window of {@code cols x rows} panes with a frame; panes get random reflections. */
    static void window(Canvas c, SplittableRandom rnd, double x0, double y0, double w, double h, int cols, int rows) {
        float frame = 0.85f + (float) rnd.nextDouble() * 0.1f;
        c.rect(x0, y0, x0 + w, y0 + h, frame);
        double bar = Math.max(1.5, w * 0.05);
        double pw = (w - bar * (cols + 1)) / cols;
        double ph = (h - bar * (rows + 1)) / rows;
        for (int j = 0; j < rows; j++) {
            for (int i = 0; i < cols; i++) {
                double px = x0 + bar + i * (pw + bar);
                double py = y0 + bar + j * (ph + bar);
                c.rect(px, py, px + pw, py + ph, 0.05f + (float) rnd.nextDouble() * 0.3f);
                double cut = rnd.nextDouble();
                c.shape(px, py, px + pw, py + ph, (x, y) -> (x - px) / pw + (y - py) / ph < cut + 0.2
                        && (x - px) / pw + (y - py) / ph > cut, 0.55f);
            }
        }
    }

    /** A door: frame, darker leaf, a handle and a kick plate. */
    static void door(Canvas c, SplittableRandom rnd, double x0, double y0, double w, double h) {
        float leaf = 0.15f + (float) rnd.nextDouble() * 0.5f;
        double f = Math.max(2, w * 0.06);
        c.rect(x0 - f, y0 - f, x0 + w + f, y0 + h, 0.9f - leaf * 0.5f);
        c.rect(x0, y0, x0 + w, y0 + h, leaf);
        c.rect(x0 + w * 0.1, y0 + h * 0.82, x0 + w * 0.9, y0 + h * 0.97, leaf > 0.4f ? 0.1f : 0.8f);
        c.disc(x0 + w * 0.85, y0 + h * 0.5, Math.max(1.5, w * 0.04), leaf > 0.4f ? 0.05f : 0.95f);
        for (int k = 1; k < 3; k++) {
            c.rect(x0 + w * 0.12, y0 + h * k / 3.0 - h * 0.25, x0 + w * 0.88, y0 + h * k / 3.0 - h * 0.24,
                    leaf * 0.6f);
        }
    }

    /** A handful of contrasting shapes (discs, triangles, squares, rings) scattered in a box. */
    static void shapes(Canvas c, SplittableRandom rnd, double x0, double y0, double w, double h, int count) {
        for (int k = 0; k < count; k++) {
            double r = Math.min(w, h) * (0.06 + rnd.nextDouble() * 0.1);
            double cx = x0 + r + rnd.nextDouble() * (w - 2 * r);
            double cy = y0 + r + rnd.nextDouble() * (h - 2 * r);
            float v = rnd.nextBoolean() ? 0.05f + (float) rnd.nextDouble() * 0.2f
                    : 0.8f + (float) rnd.nextDouble() * 0.2f;
            switch (rnd.nextInt(4)) {
                case 0 -> c.disc(cx, cy, r, v);
                case 1 -> c.shape(cx - r, cy - r, cx + r, cy + r,
                        (x, y) -> y - (cy - r) >= 2 * Math.abs(x - cx) && y <= cy + r, v);
                case 2 -> c.rect(cx - r, cy - r, cx + r, cy + r, v);
                default -> {
                    c.disc(cx, cy, r, v);
                    c.disc(cx, cy, r * 0.55, 1 - v);
                }
            }
        }
    }

    /** Pastes a grey photo into a box, prefiltered through the photo's own pyramid, with a dark frame. */
    static void poster(Canvas c, Texture photo, double x0, double y0, double w, double h) {
        double f = Math.max(2, w * 0.03);
        c.rect(x0 - f, y0 - f, x0 + w + f, y0 + h + f, 0.08f);
        double sx = photo.width() / w;
        double sy = photo.height() / h;
        double lod = Math.max(0, Math.log(Math.max(sx, sy)) / Math.log(2));
        for (int y = (int) Math.max(0, y0); y < Math.min(c.height, y0 + h); y++) {
            for (int x = (int) Math.max(0, x0); x < Math.min(c.width, x0 + w); x++) {
                c.pixels[y * c.width + x] = photo.sample((x + 0.5 - x0) * sx, (y + 0.5 - y0) * sy, lod);
            }
        }
    }
}
