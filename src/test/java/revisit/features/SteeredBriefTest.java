package revisit.features;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class SteeredBriefTest {

    private static final int SIDE = 64;

    @Test
    void bitsFollowThePatternAndTheDocumentedLayout() {
        byte[] image = randomImage(7);
        long seed = 99;
        SteeredBrief brief = new SteeredBrief(seed, 30);
        brief.prepare(SIDE);
        long[] out = new long[4];
        int centre = 32 * SIDE + 30;
        brief.describe(image, centre, 0, out, 0);
        double[] p = BriefPattern.create(seed);
        for (int b = 0; b < 256; b++) {
            int first = image[centre + (int) (Math.round(p[4 * b + 1]) * SIDE + Math.round(p[4 * b]))] & 0xFF;
            int second = image[centre + (int) (Math.round(p[4 * b + 3]) * SIDE + Math.round(p[4 * b + 2]))] & 0xFF;
            long expected = first < second ? 1 : 0;
            assertEquals(expected, (out[b / 64] >>> (b % 64)) & 1, "bit " + b);
        }
    }

    @Test
    void quarterTurnOfTheImageGivesTheSameDescriptorWithAQuarterTurnOfTheBin() {
        byte[] image = randomImage(8);
        byte[] turned = new byte[image.length];
        // turned(x, y) = image(y, SIDE - 1 - x): the picture turned a quarter clockwise on screen
        for (int y = 0; y < SIDE; y++) {
            for (int x = 0; x < SIDE; x++) {
                turned[y * SIDE + x] = image[(SIDE - 1 - x) * SIDE + y];
            }
        }
        SteeredBrief brief = new SteeredBrief(FeatureConfig.DEFAULT_PATTERN_SEED, 36);
        brief.prepare(SIDE);
        long[] a = new long[4];
        long[] b = new long[4];
        int x = 30;
        int y = 33;
        for (int bin = 0; bin < 36; bin += 5) {
            brief.describe(image, y * SIDE + x, bin, a, 0);
            brief.describe(turned, x * SIDE + (SIDE - 1 - y), (bin + 9) % 36, b, 0);
            assertArrayEquals(a, b, "bin " + bin);
        }
    }

    @Test
    void patternStaysInsideItsDiscAndDependsOnTheSeed() {
        double[] p = BriefPattern.create(1);
        for (int k = 0; k < p.length; k += 2) {
            assertTrue(Math.hypot(p[k], p[k + 1]) <= BriefPattern.RADIUS);
        }
        for (int k = 0; k < p.length; k += 4) {
            assertTrue(Math.hypot(p[k + 2] - p[k], p[k + 3] - p[k + 1]) >= 2.0);
        }
        assertArrayEquals(p, BriefPattern.create(1));
        assertNotEquals(p[0], BriefPattern.create(2)[0]);
    }

    @Test
    void binWrapsAroundTheCircle() {
        SteeredBrief brief = new SteeredBrief(1, 90);
        assertEquals(0, brief.bin(0));
        assertEquals(0, brief.bin(2 * Math.PI - 0.001));
        assertEquals(45, brief.bin(Math.PI));
        assertEquals(45, brief.bin(-Math.PI));
        assertEquals(89, brief.bin(-Math.toRadians(4)));
    }

    private static byte[] randomImage(long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        byte[] image = new byte[SIDE * SIDE];
        for (int k = 0; k < image.length; k++) {
            image[k] = (byte) random.nextInt(256);
        }
        return image;
    }
}
