package revisit.verification;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import boofcv.struct.image.GrayU8;
import java.util.Arrays;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class StereoDepthTest {

    private static final double FOCAL = 300;
    private static final double BASELINE = 0.12;

    /**
     * Left image of random texture; right image shifted so that the left half shows disparity 12 px and the right
     * half 24 px (two fronto-parallel planes at f B / d = 3.0 m and 1.5 m).
     */
    private static GrayU8[] pair() {
        int w = 200;
        int h = 80;
        SplittableRandom random = new SplittableRandom(91);
        int[] texture = new int[(w + 40) * h];
        for (int i = 0; i < texture.length; i++) {
            texture[i] = random.nextInt(256);
        }
        GrayU8 left = new GrayU8(w, h);
        GrayU8 right = new GrayU8(w, h);
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                left.set(x, y, texture[y * (w + 40) + x + 30]);
            }
        }
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                int d = x + 12 < w / 2 ? 12 : 24;
                int source = x + d;
                right.set(x, y, source < w ? left.get(source, y) : 0);
            }
        }
        return new GrayU8[]{left, right};
    }

    @Test
    void recoversTheDepthOfTwoPlanes() {
        GrayU8[] images = pair();
        DepthImage depth = new StereoDepth(FOCAL, BASELINE, StereoDepthConfig.defaults().withDisparities(1, 48))
                .depthOf(images[0], images[1]);
        assertEquals(3.0, median(depth, 30, 80), 0.01);
        assertEquals(1.5, median(depth, 130, 170), 0.005);
    }

    @Test
    void marksPixelsWithoutAMatchAsMissing() {
        GrayU8 flat = new GrayU8(64, 32);
        DepthImage depth = new StereoDepth(FOCAL, BASELINE, StereoDepthConfig.defaults().withDisparities(1, 16))
                .depthOf(flat, flat.clone());
        int valid = 0;
        for (int i = 0; i < depth.image().data.length; i++) {
            valid += depth.image().data[i] != 0 ? 1 : 0;
        }
        // A textureless pair has no unique match; most pixels must come out as "no measurement".
        assertTrue(valid < depth.image().data.length / 2, "valid pixels " + valid);
    }

    @Test
    void refusesImagesOfDifferentSizes() {
        StereoDepth stereo = new StereoDepth(FOCAL, BASELINE, StereoDepthConfig.defaults());
        assertThrows(IllegalArgumentException.class, () -> stereo.depthOf(new GrayU8(10, 10), new GrayU8(12, 10)));
    }

    /** Median depth over valid pixels of the columns [x0, x1), rows 10..69, in metres. */
    private static double median(DepthImage depth, int x0, int x1) {
        double[] values = new double[(x1 - x0) * 60];
        int n = 0;
        for (int y = 10; y < 70; y++) {
            for (int x = x0; x < x1; x++) {
                int stored = depth.image().get(x, y);
                if (stored != 0) {
                    values[n++] = stored * depth.metresPerUnit();
                }
            }
        }
        assertTrue(n > values.length * 0.8, "valid pixels " + n + " of " + values.length);
        double[] sorted = Arrays.copyOf(values, n);
        Arrays.sort(sorted);
        return sorted[n / 2];
    }
}
