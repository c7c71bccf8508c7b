package revisit.verification;

import boofcv.struct.geo.AssociatedPair;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import revisit.camera.CameraModel;
import revisit.features.FrameFeatures;

/**
 * Coordinates of the matched points, once per pair: pixels (undistorted through the camera when one is given,
 * so that the pinhole relations hold exactly) and, with a camera, normalised coordinates.
 */
final class PointPairs {

    final int count;
    final double[] xa;
    final double[] ya;
    final double[] xb;
    final double[] yb;
    /** Pairs in pixels (undistorted when calibrated), for BoofCV's solvers. */
    final List<AssociatedPair> pixels;
    /** Pairs in normalised coordinates; empty without a camera. */
    final List<AssociatedPair> normalized;
    /** Intrinsic matrix of undistorted pixels, row-major; empty without a camera. */
    final double[] k;
    final double[] kInverse;

    private PointPairs(int count, Optional<CameraModel> camera) {
        this.count = count;
        xa = new double[count];
        ya = new double[count];
        xb = new double[count];
        yb = new double[count];
        pixels = new ArrayList<>(count);
        normalized = new ArrayList<>(camera.isPresent() ? count : 0);
        k = camera.map(c -> new double[]{c.fx(), c.skew(), c.cx(), 0, c.fy(), c.cy(), 0, 0, 1})
                .orElse(new double[0]);
        kInverse = k.length == 0 ? k : Mat3.inverse(k);
    }

    /** Gathers the matched coordinates. */
    static PointPairs of(FrameFeatures a, FrameFeatures b, Correspondences matches, Optional<CameraModel> camera) {
        PointPairs p = new PointPairs(matches.count(), camera);
        double[] na = new double[2];
        double[] nb = new double[2];
        for (int m = 0; m < matches.count(); m++) {
            int i = matches.indexA()[m];
            int j = matches.indexB()[m];
            if (camera.isPresent()) {
                CameraModel c = camera.get();
                c.pixelToNormalized(a.x()[i], a.y()[i], na);
                c.pixelToNormalized(b.x()[j], b.y()[j], nb);
                p.normalized.add(new AssociatedPair(na[0], na[1], nb[0], nb[1]));
                p.xa[m] = c.fx() * na[0] + c.skew() * na[1] + c.cx();
                p.ya[m] = c.fy() * na[1] + c.cy();
                p.xb[m] = c.fx() * nb[0] + c.skew() * nb[1] + c.cx();
                p.yb[m] = c.fy() * nb[1] + c.cy();
            } else {
                p.xa[m] = a.x()[i];
                p.ya[m] = a.y()[i];
                p.xb[m] = b.x()[j];
                p.yb[m] = b.y()[j];
            }
            p.pixels.add(new AssociatedPair(p.xa[m], p.ya[m], p.xb[m], p.yb[m]));
        }
        return p;
    }

    boolean calibrated() {
        return k.length == 9;
    }

    /** Unit-less ray (xn, yn, 1) of point i in frame a. */
    double[] rayA(int i) {
        AssociatedPair q = normalized.get(i);
        return new double[]{q.p1.x, q.p1.y, 1};
    }

    /** Unit-less ray (xn, yn, 1) of point i in frame b. */
    double[] rayB(int i) {
        AssociatedPair q = normalized.get(i);
        return new double[]{q.p2.x, q.p2.y, 1};
    }

    /** Fundamental matrix of undistorted pixels from an essential matrix: {@code K^-T E K^-1}. */
    double[] fundamentalFromEssential(double[] e) {
        return Mat3.mul(Mat3.transpose(kInverse), Mat3.mul(e, kInverse));
    }

    /** Essential matrix from a fundamental matrix of undistorted pixels: {@code K^T F K}. */
    double[] essentialFromFundamental(double[] f) {
        return Mat3.mul(Mat3.transpose(k), Mat3.mul(f, k));
    }

    /** Mean focal length, pixels; 1 without a camera. */
    double focalPx() {
        return calibrated() ? 0.5 * (k[0] + k[4]) : 1;
    }
}
