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
 *
 * <p>Errors are measured in pixels of the coarser of the two detection levels: a keypoint found on a pyramid
 * level whose pixel is s level-0 pixels wide is located about s times less precisely, so each squared error is
 * divided by {@code s^2} with {@code s = max(scale_a, scale_b, 1)} (the per-level noise model of common practice;
 * covariance-weighted errors as in Hartley &amp; Zisserman 2004, sec. 4.2.6). All thresholds and the model
 * selection then use one noise level.
 */
final class PointPairs {

    final int count;
    final double[] xa;
    final double[] ya;
    final double[] xb;
    final double[] yb;
    /** 1 / s^2 per match, s the coarser detection scale (at least 1). */
    final double[] weight;
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
        weight = new double[count];
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
            double s = Math.max(1, Math.max(a.scale()[i], b.scale()[j]));
            p.weight[m] = 1 / (s * s);
        }
        return p;
    }

    /** Squared Sampson distance of match i to {@code xb^T F xa = 0}, detection-level pixels squared. */
    double epipolarSq(double[] f, int i) {
        return SampsonDistance.squaredFundamental(f, xa[i], ya[i], xb[i], yb[i]) * weight[i];
    }

    /** Signed Sampson distance of match i to the epipolar constraint, detection-level pixels. */
    double epipolarSigned(double[] f, int i) {
        return SampsonDistance.signedFundamental(f, xa[i], ya[i], xb[i], yb[i]) * Math.sqrt(weight[i]);
    }

    /** Squared Sampson distance of match i to the homography, detection-level pixels squared. */
    double homographySq(double[] h, int i) {
        return SampsonDistance.squaredHomography(h, xa[i], ya[i], xb[i], yb[i]) * weight[i];
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
