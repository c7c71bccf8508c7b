package revisit.verification;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import boofcv.struct.image.GrayU16;
import org.junit.jupiter.api.Test;

class DepthImageTest {

    /** 3x2 image in millimetres: row 0 = 1000 1100 0, row 1 = 1200 1300 4000. */
    private static DepthImage small() {
        GrayU16 image = new GrayU16(3, 2);
        image.set(0, 0, 1000);
        image.set(1, 0, 1100);
        image.set(2, 0, 0);
        image.set(0, 1, 1200);
        image.set(1, 1, 1300);
        image.set(2, 1, 4000);
        return DepthImage.millimetres(image);
    }

    @Test
    void nearestReadsThePixelWhoseCentreIsClosest() {
        assertEquals(1.1, small().depthAt(0.6, 0.4, DepthSampling.NEAREST, 0.05).getAsDouble(), 1e-12);
        assertEquals(1.3, small().depthAt(1.2, 0.8, DepthSampling.NEAREST, 0.05).getAsDouble(), 1e-12);
    }

    @Test
    void bilinearBlendsFourValidNeighboursOnOneSurface() {
        // Hand-computed: at (0.25, 0.5) -> 0.5*(0.75*1000 + 0.25*1100) + 0.5*(0.75*1200 + 0.25*1300) = 1125 mm.
        assertEquals(1.125, small().depthAt(0.25, 0.5, DepthSampling.BILINEAR, 0.5).getAsDouble(), 1e-12);
    }

    @Test
    void bilinearFallsBackToNearestAcrossADepthEdge() {
        // Neighbours 1000..1300 differ by 30 %, above a 5 % jump: nearest pixel (0, 0) = 1000 mm is used.
        assertEquals(1.0, small().depthAt(0.25, 0.4, DepthSampling.BILINEAR, 0.05).getAsDouble(), 1e-12);
    }

    @Test
    void missingMeasurementsAndOutsidePositionsGiveNoDepth() {
        assertTrue(small().depthAt(2.0, 0.0, DepthSampling.NEAREST, 0.05).isEmpty());
        assertTrue(small().depthAt(1.8, 0.2, DepthSampling.BILINEAR, 0.05).isEmpty());
        assertTrue(small().depthAt(-0.6, 0.0, DepthSampling.NEAREST, 0.05).isEmpty());
        assertTrue(small().depthAt(0.0, 1.6, DepthSampling.BILINEAR, 0.05).isEmpty());
        assertTrue(small().depthAt(Double.NaN, 0.0, DepthSampling.NEAREST, 0.05).isEmpty());
    }

    @Test
    void bilinearNextToAMissingPixelUsesTheNearestValidOne() {
        // (1.4, 0.6): neighbour (2, 0) is 0, so nearest (1, 1) = 1300 mm is used.
        assertEquals(1.3, small().depthAt(1.4, 0.6, DepthSampling.BILINEAR, 0.05).getAsDouble(), 1e-12);
    }

    @Test
    void refusesANonPositiveUnit() {
        assertThrows(IllegalArgumentException.class, () -> new DepthImage(new GrayU16(2, 2), 0));
    }
}
