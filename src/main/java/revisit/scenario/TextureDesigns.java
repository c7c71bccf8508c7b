package revisit.scenario;

import java.util.Optional;
import java.util.SplittableRandom;

/**
 * Procedural texture designs for the objects of the invented yard. Every design is a pure function of its seed
 * and size, so the same seed paints the same texels on any machine and thread (twin places reuse one seed).
 */
final class TextureDesigns {

    /** Facade texel density, texels per metre (8 mm texels: sharp at 2 m with f = 512 px, chosen here). */
    static final double FACADE_DENSITY = 128;

    private TextureDesigns() {
    }

    /**
     * One bay of a building front, {@code widthM x heightM}, with a base material, a door or shutter, windows,
     * a sign and sometimes a poster.
     *
     * @param photo poster image, when real photos are used for this bay
     */
    static Texture facadeBay(long seed, double widthM, double heightM, Optional<Texture> photo) {
        double d = FACADE_DENSITY;
        Canvas c = new Canvas((int) Math.round(widthM * d), (int) Math.round(heightM * d));
        SplittableRandom rnd = new SplittableRandom(seed);
        float base = 0.35f + (float) rnd.nextDouble() * 0.35f;
        switch (rnd.nextInt(4)) {
            case 0, 1 -> Motifs.bricks(c, rnd, 0.25 * d, 0.08 * d, base, base + 0.25f);
            case 2 -> Motifs.corrugated(c, 0.12 * d, base, 0.12f);
            default -> Motifs.planks(c, rnd, 0.2 * d, base);
        }
        c.addNoise(SeedMixer.derive(seed, 1), 0.5 * d, 0.07, 4);
        double groundY = c.height;
        double doorW = (0.9 + rnd.nextDouble() * 0.8) * d;
        double doorX = (0.2 + rnd.nextDouble() * 0.3) * c.width;
        if (rnd.nextInt(3) == 0) {
            Motifs.stripes(c, doorX, groundY - 2.4 * d, Math.min(2.0 * d, c.width - doorX - 4), 2.4 * d,
                    0.12 * d, 0.25f, 0.75f);
        } else {
            Motifs.door(c, rnd, doorX, groundY - 2.1 * d, doorW, 2.1 * d);
        }
        Motifs.sign(c, rnd, doorX - 0.1 * d, groundY - (2.75 + rnd.nextDouble() * 0.3) * d,
                Math.min(doorW + 0.8 * d, c.width - doorX), 0.45 * d);
        int windows = 1 + rnd.nextInt(2);
        for (int k = 0; k < windows; k++) {
            double ww = 0.8 * d;
            double wx = (k + 0.5) * c.width / windows - ww / 2;
            Motifs.window(c, rnd, wx, groundY - 4.4 * d, ww, 1.1 * d, 2, 2);
        }
        paintLowerWall(c, rnd, doorX, doorW, photo);
        if (rnd.nextInt(3) == 0) {
            Motifs.stripes(c, 0, groundY - 0.3 * d, c.width, 0.3 * d, 0.1 * d, 0.1f, 0.85f);
        }
        return c.toTexture();
    }

    private static void paintLowerWall(Canvas c, SplittableRandom rnd, double doorX, double doorW,
                                       Optional<Texture> photo) {
        double d = FACADE_DENSITY;
        double freeX = doorX + doorW + 0.3 * d;
        double freeW = c.width - freeX - 0.15 * d;
        if (freeW < 0.5 * d) {
            freeX = 0.1 * d;
            freeW = doorX - 0.4 * d;
        }
        if (freeW < 0.4 * d) {
            return;
        }
        double top = c.height - 2.1 * d;
        if (photo.isPresent()) {
            double h = Math.min(1.0 * d, freeW / photo.get().width() * photo.get().height());
            double w = h * photo.get().width() / photo.get().height();
            Motifs.poster(c, photo.get(), freeX, top, Math.min(w, freeW), h);
        } else if (rnd.nextBoolean()) {
            c.rect(freeX, top, freeX + freeW, top + 1.0 * d, 0.5f + (float) rnd.nextDouble() * 0.4f);
            Motifs.shapes(c, rnd, freeX, top, freeW, 1.0 * d, 3 + rnd.nextInt(4));
        } else {
            Motifs.sign(c, rnd, freeX, top + 0.2 * d, freeW, 0.5 * d);
        }
    }

    /** Paving slabs with joints, per-slab tone, stains and a few painted glyph marks. */
    static Texture floor(long seed, double widthM, double heightM, double density) {
        Canvas c = new Canvas((int) Math.round(widthM * density), (int) Math.round(heightM * density));
        SplittableRandom rnd = new SplittableRandom(seed);
        double slab = 0.6 * density;
        c.fill(0.25f);
        for (double y = 0; y < c.height; y += slab) {
            for (double x = 0; x < c.width; x += slab) {
                c.rect(x + 1, y + 1, x + slab - 1, y + slab - 1, 0.45f + (float) rnd.nextDouble() * 0.2f);
            }
        }
        c.addNoise(SeedMixer.derive(seed, 1), 2.0 * density, 0.1, 5);
        for (int k = 0; k < (int) (widthM * heightM / 8); k++) {
            double x = rnd.nextDouble() * c.width;
            double y = rnd.nextDouble() * c.height;
            if (rnd.nextBoolean()) {
                Motifs.glyphs(c, rnd, x, y, 2 + rnd.nextInt(3), 0.05 * density, 0.85f);
            } else {
                c.disc(x, y, (0.1 + rnd.nextDouble() * 0.3) * density, 0.15f);
            }
        }
        return c.toTexture();
    }

    /** One face of a wooden crate: horizontal boards, a diagonal brace, a stencilled code. */
    static Texture crate(long styleSeed, long markSeed, double sizeM) {
        double d = 100;
        int n = (int) Math.round(sizeM * d);
        Canvas c = new Canvas(n, n);
        SplittableRandom style = new SplittableRandom(styleSeed);
        float wood = 0.45f + (float) style.nextDouble() * 0.3f;
        c.fill(wood * 0.5f);
        for (double y = 0; y < n; y += 0.15 * d) {
            c.rect(0, y + 1, n, y + 0.15 * d - 1, wood + (float) style.nextDouble() * 0.1f);
        }
        double b = 0.1 * d;
        c.frame(0, 0, n, n, b, wood * 0.75f);
        c.shape(b, b, n - b, n - b, (x, y) -> Math.abs((x - b) - (y - b)) < 0.06 * d, wood * 0.8f);
        c.addNoise(SeedMixer.derive(styleSeed, 1), 0.3 * d, 0.05, 3);
        SplittableRandom mark = new SplittableRandom(markSeed);
        Motifs.glyphs(c, mark, 0.2 * d, 0.2 * d, 3, 0.04 * d, 0.05f);
        if (mark.nextBoolean()) {
            Motifs.shapes(c, mark, 0.5 * d, 0.5 * d, n - 0.65 * d, n - 0.65 * d, 1);
        }
        return c.toTexture();
    }

    /** A concrete pillar face with painted bands and a number plate. */
    static Texture pillar(long seed, double widthM, double heightM) {
        double d = 100;
        Canvas c = new Canvas((int) Math.round(widthM * d), (int) Math.round(heightM * d));
        SplittableRandom rnd = new SplittableRandom(seed);
        c.fill(0.6f);
        c.addNoise(seed, 0.3 * d, 0.08, 4);
        Motifs.stripes(c, 0, c.height - 0.6 * d, c.width, 0.6 * d, 0.08 * d, 0.1f, 0.85f);
        Motifs.sign(c, rnd, 0.03 * d, c.height - 1.9 * d, c.width - 0.06 * d, 0.35 * d);
        return c.toTexture();
    }

    /** Kiosk front: roller shutter, a big sign and a menu board. */
    static Texture kioskFront(long seed, double widthM, double heightM) {
        double d = FACADE_DENSITY;
        Canvas c = new Canvas((int) Math.round(widthM * d), (int) Math.round(heightM * d));
        SplittableRandom rnd = new SplittableRandom(seed);
        c.fill(0.7f);
        for (double y = 0.6 * d; y < c.height - 0.2 * d; y += 0.05 * d) {
            c.rect(0.1 * d, y, c.width - 0.1 * d, y + 0.03 * d, 0.45f);
        }
        Motifs.sign(c, rnd, 0.05 * d, 0.05 * d, c.width - 0.1 * d, 0.5 * d);
        Motifs.sign(c, rnd, 0.25 * d, 0.9 * d, 0.9 * d, 0.6 * d);
        Motifs.shapes(c, rnd, 1.3 * d, 0.8 * d, c.width - 1.5 * d, 0.9 * d, 4);
        c.addNoise(SeedMixer.derive(seed, 1), 0.4 * d, 0.04, 3);
        return c.toTexture();
    }

    /** Side of a person-like walker: head, shirt with a logo, trousers. */
    static Texture walker(long seed, double widthM, double heightM) {
        double d = 100;
        Canvas c = new Canvas((int) Math.round(widthM * d), (int) Math.round(heightM * d));
        SplittableRandom rnd = new SplittableRandom(seed);
        c.fill(0.15f + (float) rnd.nextDouble() * 0.2f);
        c.rect(0, 0.6 * d, c.width, 1.5 * d, 0.3f + (float) rnd.nextDouble() * 0.6f);
        c.disc(c.width / 2.0, 0.12 * d, 0.11 * d, 0.7f);
        Motifs.shapes(c, rnd, 0.1 * d, 0.25 * d, c.width - 0.2 * d, 0.3 * d, 2);
        c.addNoise(seed, 0.1 * d, 0.05, 2);
        return c.toTexture();
    }

    /** Plain material with noise and stripes for small props (carts, roofs). */
    static Texture plain(long seed, double widthM, double heightM, float tone) {
        double d = 60;
        Canvas c = new Canvas(Math.max(2, (int) Math.round(widthM * d)), Math.max(2, (int) Math.round(heightM * d)));
        c.fill(tone);
        c.addNoise(seed, 0.4 * d, 0.08, 3);
        Motifs.stripes(c, 0, 0, c.width, 0.12 * d, 0.1 * d, tone * 0.3f, Math.min(1f, tone + 0.4f));
        return c.toTexture();
    }
}
