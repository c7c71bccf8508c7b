package revisit.features;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import boofcv.alg.feature.detect.intensity.FastCornerDetector;
import boofcv.alg.feature.detect.intensity.impl.FastCornerInterface;
import boofcv.alg.feature.detect.intensity.impl.ImplFastCorner10_U8;
import boofcv.alg.feature.detect.intensity.impl.ImplFastCorner11_U8;
import boofcv.alg.feature.detect.intensity.impl.ImplFastCorner12_U8;
import boofcv.alg.feature.detect.intensity.impl.ImplFastCorner9_U8;
import boofcv.struct.image.GrayF32;
import boofcv.struct.image.GrayU8;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Our FAST (eight pixels per step, pre-tests, mask table) against BoofCV 1.1.7's {@code FastCornerDetector}, the
 * reference: same corners, same scores, after the same 3x3 non-maximum suppression written plainly here.
 */
class CornerDetectorTest {

    private static final int BORDER = 16;

    @ParameterizedTest
    @ValueSource(ints = {9, 10, 11, 12})
    void findsTheSameCornersAsBoofCvOnRandomBlocks(int arc) {
        GrayU8 image = randomBlocks(203, 157, 42);
        assertSameAsBoofCv(image, 20, arc);
    }

    @Test
    void findsTheSameCornersAsBoofCvOnRealPhotos() {
        // graf1: Mikolajczyk et al., IJCV 2005; car01: pixabay, CC0 (../shared/data)
        assertSameAsBoofCv(SharedData.gray("homography/graf1.png"), 20, 9);
        assertSameAsBoofCv(SharedData.gray("photos/pixabay/car01.jpg"), 7, 9);
    }

    @Test
    void worksOnSubImagesWithLargerStride() {
        GrayU8 big = randomBlocks(300, 200, 7);
        GrayU8 sub = big.subimage(13, 9, 13 + 171, 9 + 133);
        assertSameAsBoofCv(sub, 15, 9);
    }

    @Test
    void findsNothingOnAConstantImage() {
        GrayU8 flat = new GrayU8(120, 90);
        flat.data[0] = 0;
        java.util.Arrays.fill(flat.data, (byte) 77);
        LevelCorners out = new LevelCorners();
        new CornerDetector(FeatureConfig.defaults()).detect(flat, BORDER, out);
        assertEquals(0, out.count());
    }

    private static void assertSameAsBoofCv(GrayU8 image, int threshold, int arc) {
        LevelCorners ours = new LevelCorners();
        new CornerDetector(FeatureConfig.defaults().withFastThreshold(threshold).withFastArc(arc))
                .detect(image, BORDER, ours);
        List<int[]> expected = reference(image, threshold, arc);
        assertTrue(expected.size() > 20, "test image has too few corners to be a useful check");
        assertEquals(expected.size(), ours.count(), "corner count");
        List<int[]> actual = new ArrayList<>();
        for (int k = 0; k < ours.count(); k++) {
            actual.add(new int[]{ours.x(k), ours.y(k), (int) ours.score(k)});
        }
        actual.sort(Comparator.<int[]>comparingInt(c -> c[1]).thenComparingInt(c -> c[0]));
        for (int k = 0; k < expected.size(); k++) {
            assertArrayEquals(expected.get(k), actual.get(k), "corner " + k + " (x, y, score)");
        }
    }

    /** BoofCV's corners and |score|, then strict 3x3 suppression (ties to the first in raster order). */
    private static List<int[]> reference(GrayU8 image, int threshold, int arc) {
        FastCornerInterface<GrayU8> helper = switch (arc) {
            case 9 -> new ImplFastCorner9_U8(threshold);
            case 10 -> new ImplFastCorner10_U8(threshold);
            case 11 -> new ImplFastCorner11_U8(threshold);
            default -> new ImplFastCorner12_U8(threshold);
        };
        GrayF32 intensity = new GrayF32(image.width, image.height);
        new FastCornerDetector<>(helper).process(image, intensity);
        List<int[]> out = new ArrayList<>();
        for (int y = BORDER; y < image.height - BORDER; y++) {
            for (int x = BORDER; x < image.width - BORDER; x++) {
                float s = Math.abs(intensity.get(x, y));
                if (s > 0 && isPeak(intensity, x, y, s)) {
                    out.add(new int[]{x, y, (int) s});
                }
            }
        }
        return out;
    }

    private static boolean isPeak(GrayF32 intensity, int x, int y, float s) {
        for (int dy = -1; dy <= 1; dy++) {
            for (int dx = -1; dx <= 1; dx++) {
                int nx = x + dx;
                int ny = y + dy;
                boolean inside = nx >= BORDER && ny >= BORDER && nx < intensity.width - BORDER
                        && ny < intensity.height - BORDER;
                if ((dx == 0 && dy == 0) || !inside) {
                    continue;
                }
                float t = Math.abs(intensity.get(nx, ny));
                boolean earlier = dy < 0 || (dy == 0 && dx < 0);
                if (t > s || (earlier && t == s)) {
                    return false;
                }
            }
        }
        return true;
    }

    /** Random grey rectangles on a random background: many corners of both polarities. Seed given. */
    static GrayU8 randomBlocks(int width, int height, long seed) {
        Random random = new Random(seed);
        GrayU8 image = new GrayU8(width, height);
        java.util.Arrays.fill(image.data, (byte) 128);
        for (int k = 0; k < width * height / 300; k++) {
            int w = 3 + random.nextInt(20);
            int h = 3 + random.nextInt(20);
            int x0 = random.nextInt(width - w);
            int y0 = random.nextInt(height - h);
            int v = random.nextInt(256);
            for (int y = y0; y < y0 + h; y++) {
                for (int x = x0; x < x0 + w; x++) {
                    image.set(x, y, v);
                }
            }
        }
        return image;
    }
}
