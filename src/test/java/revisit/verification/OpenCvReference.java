package revisit.verification;

import nu.pattern.OpenCV;
import org.opencv.calib3d.Calib3d;
import org.opencv.core.CvType;
import org.opencv.core.Mat;
import org.opencv.core.MatOfPoint2f;
import org.opencv.core.Point;
import revisit.camera.CameraModel;
import revisit.features.FrameFeatures;

/** Relative rotation from OpenCV's findEssentialMat (RANSAC) and recoverPose, the reference library in tests. */
final class OpenCvReference {

    private OpenCvReference() {
    }

    /** R of {@code X_b = R X_a + t}, row-major, from the given matches (pixel coordinates, no distortion). */
    static double[] rotation(FrameFeatures a, FrameFeatures b, Correspondences m, CameraModel camera) {
        OpenCV.loadLocally();
        Point[] pa = new Point[m.count()];
        Point[] pb = new Point[m.count()];
        for (int k = 0; k < m.count(); k++) {
            pa[k] = new Point(a.x()[m.indexA()[k]], a.y()[m.indexA()[k]]);
            pb[k] = new Point(b.x()[m.indexB()[k]], b.y()[m.indexB()[k]]);
        }
        MatOfPoint2f ma = new MatOfPoint2f(pa);
        MatOfPoint2f mb = new MatOfPoint2f(pb);
        Mat k = new Mat(3, 3, CvType.CV_64F);
        k.put(0, 0, camera.fx(), camera.skew(), camera.cx(), 0, camera.fy(), camera.cy(), 0, 0, 1);
        Mat mask = new Mat();
        Mat e = Calib3d.findEssentialMat(ma, mb, k, Calib3d.RANSAC, 0.999, 1.0, 1000, mask);
        Mat r = new Mat();
        Mat t = new Mat();
        Calib3d.recoverPose(e.rowRange(0, 3), ma, mb, k, r, t, mask);
        double[] out = new double[9];
        r.get(0, 0, out);
        return out;
    }
}
