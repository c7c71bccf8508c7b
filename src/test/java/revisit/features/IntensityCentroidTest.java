package revisit.features;

import static org.junit.jupiter.api.Assertions.assertEquals;

import boofcv.struct.image.GrayU8;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Known answers for the intensity-centroid orientation (Rosin, CVIU 1999): on a linear ramp
 * I = 128 + g (u cos a + v sin a) the disc's centroid lies along direction a, by symmetry of the disc, so the
 * orientation must be a (up to the rounding of the ramp to grey levels).
 */
class IntensityCentroidTest {

    @ParameterizedTest
    @ValueSource(doubles = {0, 30, 45, 90, 135, 179, -60, -120})
    void pointsUpTheIntensityRamp(double degrees) {
        double a = Math.toRadians(degrees);
        GrayU8 image = new GrayU8(41, 41);
        for (int y = 0; y < 41; y++) {
            for (int x = 0; x < 41; x++) {
                double ramp = 128 + 4.0 * ((x - 20) * Math.cos(a) + (y - 20) * Math.sin(a));
                image.set(x, y, (int) Math.round(ramp));
            }
        }
        double angle = IntensityCentroid.orientation(image, 20, 20);
        assertEquals(0, Math.abs(Math.IEEEremainder(angle - a, 2 * Math.PI)), Math.toRadians(0.5),
                "orientation " + Math.toDegrees(angle) + " for a ramp at " + degrees);
    }

    @Test
    void brightPixelRightBelowGivesItsDirection() {
        // one bright pixel at (+3, +3) from the centre on black: centroid direction atan2(3, 3) = 45 degrees
        GrayU8 image = new GrayU8(41, 41);
        image.set(23, 23, 200);
        assertEquals(Math.PI / 4, IntensityCentroid.orientation(image, 20, 20), 1e-12);
    }

    @Test
    void pixelsOutsideTheDiscDoNotCount() {
        // (15, 1) lies outside the radius-15 disc (225 + 1 > 225); (0, -15) lies on it
        GrayU8 image = new GrayU8(41, 41);
        image.set(35, 21, 255);
        image.set(20, 5, 10);
        assertEquals(-Math.PI / 2, IntensityCentroid.orientation(image, 20, 20), 1e-12);
    }

    @Test
    void flatPatchGivesZero() {
        GrayU8 image = new GrayU8(41, 41);
        java.util.Arrays.fill(image.data, (byte) 90);
        assertEquals(0.0, IntensityCentroid.orientation(image, 20, 20));
    }
}
