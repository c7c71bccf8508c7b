package revisit.verification;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import boofcv.alg.geo.f.EpipolarMinimizeGeometricError;
import georegression.struct.point.Point2D_F64;
import java.util.Random;
import org.ejml.data.DMatrixRMaj;
import org.junit.jupiter.api.Test;

class SampsonDistanceTest {

    /**
     * Hand-checkable: F = [e]x for e = (1, 0, 0) (cameras translated along x) makes epipolar lines horizontal, the
     * constraint reads ya - yb = 0 and is linear, so the first-order distance is exact: the optimal correction
     * moves each point half the row gap, total squared displacement (ya - yb)^2 / 2 (H&Z 2004, sec. 4.2.6).
     */
    @Test
    void horizontalEpipolarLinesGiveHalfTheSquaredRowGap() {
        double[] f = {0, 0, 0, 0, 0, -1, 0, 1, 0};
        assertEquals(2.0, SampsonDistance.squaredFundamental(f, 10, 0, 40, 2), 1e-12);
        assertEquals(4.5, SampsonDistance.squaredFundamental(f, 3, 7, -5, 4), 1e-12);
        assertEquals(Math.sqrt(4.5), SampsonDistance.signedFundamental(f, 3, 7, -5, 4), 1e-12);
        assertEquals(0.0, SampsonDistance.squaredFundamental(f, 3, 7, 100, 7), 1e-12);
    }

    /**
     * Hand-checkable: with H = I, a pair 2 px apart needs each point moved 1 px towards the other; squared total
     * displacement 2 (the Sampson error of H&Z eq. 4.12 is exact for this linear case).
     */
    @Test
    void identityHomographyGivesHalfTheSquaredGap() {
        double[] h = {1, 0, 0, 0, 1, 0, 0, 0, 1};
        assertEquals(2.0, SampsonDistance.squaredHomography(h, 0, 0, 2, 0), 1e-12);
        assertEquals(12.5, SampsonDistance.squaredHomography(h, 1, 1, 4, 5), 1e-12);
    }

    /**
     * For small noise the Sampson distance approaches the exact geometric (gold standard) distance; the reference
     * is BoofCV's optimal two-view correction (H&Z algorithm 12.1, {@code EpipolarMinimizeGeometricError}).
     */
    @Test
    void agreesWithExactGeometricDistanceForSmallNoise() {
        SyntheticPair s = SyntheticPair.of(7, 50, new double[]{0.02, 0.1, -0.05}, new double[]{1, 0.2, 0.1}, 0,
                0, SyntheticPair.Scene.GENERAL, SyntheticPair.CAMERA);
        double[] k = {554.3, 0, 320, 0, 554.3, 240, 0, 0, 1};
        double[] kInv = Mat3.inverse(k);
        double[] e = Mat3.mul(Mat3.skew(s.translation), s.rotation);
        double[] f = Mat3.mul(Mat3.transpose(kInv), Mat3.mul(e, kInv));
        var exact = new EpipolarMinimizeGeometricError();
        Random rnd = new Random(11);
        for (int i = 0; i < 50; i++) {
            double xa = s.a.x()[i] + 0.7 * rnd.nextGaussian();
            double ya = s.a.y()[i] + 0.7 * rnd.nextGaussian();
            double xb = s.b.x()[i] + 0.7 * rnd.nextGaussian();
            double yb = s.b.y()[i] + 0.7 * rnd.nextGaussian();
            Point2D_F64 ca = new Point2D_F64();
            Point2D_F64 cb = new Point2D_F64();
            assertTrue(exact.process(DMatrixRMaj.wrap(3, 3, f.clone()), xa, ya, xb, yb, ca, cb));
            double geometric = ca.distance2(xa, ya) + cb.distance2(xb, yb);
            double sampson = SampsonDistance.squaredFundamental(f, xa, ya, xb, yb);
            assertEquals(geometric, sampson, 0.01 * geometric + 1e-9, "point " + i);
        }
    }
}
