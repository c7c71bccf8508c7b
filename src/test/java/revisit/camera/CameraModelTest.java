package revisit.camera;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.opencv.calib3d.Calib3d;
import org.opencv.core.CvType;
import org.opencv.core.Mat;
import org.opencv.core.MatOfDouble;
import org.opencv.core.MatOfPoint2f;
import org.opencv.core.MatOfPoint3f;
import org.opencv.core.Point3;

class CameraModelTest {

    private static final CameraModel DISTORTED =
            new CameraModel(640, 480, 520, 515, 0, 321.5, 242.25, -0.21, 0.05, -0.004, 0.0012, -0.0008);

    @Test
    void projectionMatchesOpenCvProjectPointsWithDistortion() {
        // Reference library run in the test: OpenCV Calib3d.projectPoints uses the same five-coefficient
        // Brown-Conrady model (k1, k2, p1, p2, k3).
        nu.pattern.OpenCV.loadLocally();
        Random rand = new Random(7);
        Point3[] pts = new Point3[50];
        for (int i = 0; i < pts.length; i++) {
            pts[i] = new Point3(rand.nextDouble() * 2 - 1, rand.nextDouble() * 1.5 - 0.75, 2 + rand.nextDouble() * 3);
        }
        Mat k = Mat.zeros(3, 3, CvType.CV_64F);
        k.put(0, 0, DISTORTED.fx(), 0, DISTORTED.cx(), 0, DISTORTED.fy(), DISTORTED.cy(), 0, 0, 1);
        MatOfDouble dist = new MatOfDouble(DISTORTED.k1(), DISTORTED.k2(), DISTORTED.p1(), DISTORTED.p2(),
                DISTORTED.k3());
        MatOfPoint2f projected = new MatOfPoint2f();
        Mat zero = Mat.zeros(3, 1, CvType.CV_64F);
        Calib3d.projectPoints(new MatOfPoint3f(pts), zero, zero, k, dist, projected);
        var cv = projected.toArray();
        double[] px = new double[2];
        for (int i = 0; i < pts.length; i++) {
            DISTORTED.normalizedToPixel(pts[i].x / pts[i].z, pts[i].y / pts[i].z, px);
            assertEquals(cv[i].x, px[0], 1e-3, "u of point " + i);
            assertEquals(cv[i].y, px[1], 1e-3, "v of point " + i);
        }
    }

    @Test
    void undistortionInvertsDistortionAcrossTheImage() {
        double[] n = new double[2];
        double[] p = new double[2];
        for (int v = 0; v < 480; v += 40) {
            for (int u = 0; u < 640; u += 40) {
                DISTORTED.pixelToNormalized(u, v, n);
                DISTORTED.normalizedToPixel(n[0], n[1], p);
                assertEquals(u, p[0], 1e-6);
                assertEquals(v, p[1], 1e-6);
            }
        }
    }

    @Test
    void rejectsNonPositiveFocalLength() {
        assertThrows(IllegalArgumentException.class, () -> CameraModel.pinhole(640, 480, 0, 500, 320, 240));
        assertThrows(IllegalArgumentException.class, () -> CameraModel.pinhole(640, 480, Double.NaN, 500, 320, 240));
    }
}
