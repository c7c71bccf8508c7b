package revisit.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class TextureTest {

    private static final float STEP = 1f / 255f;

    private static Texture random(int w, int h, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        float[] v = new float[w * h];
        for (int i = 0; i < v.length; i++) {
            v[i] = (float) rnd.nextDouble();
        }
        return new Texture(w, h, v);
    }

    @Test
    void pyramidHalvesDownToOneTexelAndKeepsTheMean() {
        Texture t = random(64, 16, 3);
        assertEquals(7, t.levelCount(), "64 -> 32 -> 16 -> 8 -> 4 -> 2 -> 1");
        double mean = 0;
        for (int y = 0; y < 16; y++) {
            for (int x = 0; x < 64; x++) {
                mean += t.texel(x, y);
            }
        }
        mean /= 64 * 16;
        // The last level is the mean of all texels (box filter), up to 8-bit rounding at each of 6 levels.
        assertEquals(mean, t.sample(0, 0, 6), 6 * STEP);
    }

    @Test
    void fullResolutionSampleAtATexelCentreIsThatTexel() {
        Texture t = random(8, 8, 4);
        for (int y = 0; y < 8; y++) {
            for (int x = 0; x < 8; x++) {
                assertEquals(t.texel(x, y), t.sample(x + 0.5, y + 0.5, 0), 1e-6);
            }
        }
    }

    @Test
    void bilinearAndTrilinearBlendAsWeighted() {
        Texture t = new Texture(2, 2, new float[]{0f, 1f, 0f, 1f});
        assertEquals(0.5, t.sample(1.0, 1.0, 0), 1e-6, "midway between a 0 and a 1 column");
        assertEquals(0.25, t.sample(0.75, 1.0, 0), 1e-6);
        assertEquals(0.0, t.sample(-5, 1.0, 0), 1e-6, "clamped at the edge");
        // level 1 is the 2x2 mean 0.5 (stored as 128/255); halfway between levels mixes 0 (level 0 at the left
        // texel) and that
        assertEquals(0.5 * 128 / 255.0, t.sample(0.5, 0.5, 0.5), 1e-6);
    }
}
