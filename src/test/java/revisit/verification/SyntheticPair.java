package revisit.verification;

import java.util.Random;
import revisit.camera.CameraModel;
import revisit.features.FrameFeatures;

/**
 * Two synthetic views of random 3D points with a known relative pose {@code X_b = R X_a + t}: pinhole camera,
 * Gaussian pixel noise and a fraction of outliers whose position in b is uniform over the image. Feature k of a
 * is matched to feature k of b.
 */
final class SyntheticPair {

    /** 640x480 pinhole camera with a 60-degree horizontal field of view (f = 554 px). */
    static final CameraModel CAMERA = CameraModel.pinhole(640, 480, 554.3, 554.3, 320, 240);

    enum Scene { GENERAL, PLANE }

    final FrameFeatures a;
    final FrameFeatures b;
    final Correspondences matches;
    final double[] rotation;
    final double[] translation;
    final boolean[] outlier;

    private SyntheticPair(FrameFeatures a, FrameFeatures b, double[] rotation, double[] translation,
                          boolean[] outlier) {
        this.a = a;
        this.b = b;
        this.rotation = rotation;
        this.translation = translation;
        this.outlier = outlier;
        int n = a.count();
        int[] idx = new int[n];
        for (int i = 0; i < n; i++) {
            idx[i] = i;
        }
        this.matches = new Correspondences(n, idx, idx.clone(), new int[n]);
    }

    /**
     * @param rotationVector axis-angle of R, radians
     * @param translation    t (scene units; points lie 4-12 units in front of camera a)
     */
    static SyntheticPair of(long seed, int count, double[] rotationVector, double[] translation, double noisePx,
                            double outlierFraction, Scene scene, CameraModel camera) {
        Random rnd = new Random(seed);
        double[] r = Mat3.exp(rotationVector);
        float[] xa = new float[count];
        float[] ya = new float[count];
        float[] xb = new float[count];
        float[] yb = new float[count];
        boolean[] outlier = new boolean[count];
        double[] pix = new double[2];
        int k = 0;
        while (k < count) {
            double u = rnd.nextDouble() * camera.width();
            double v = rnd.nextDouble() * camera.height();
            double depth = scene == Scene.PLANE ? planeDepth(u, v, camera) : 4 + 8 * rnd.nextDouble();
            double[] xn = new double[2];
            camera.pixelToNormalized(u, v, xn);
            double[] pa = {xn[0] * depth, xn[1] * depth, depth};
            double[] pb = Mat3.mulVec(r, pa);
            for (int c = 0; c < 3; c++) {
                pb[c] += translation[c];
            }
            if (pb[2] <= 0.1) {
                continue;
            }
            camera.normalizedToPixel(pb[0] / pb[2], pb[1] / pb[2], pix);
            if (pix[0] < 0 || pix[1] < 0 || pix[0] >= camera.width() || pix[1] >= camera.height()) {
                continue;
            }
            outlier[k] = rnd.nextDouble() < outlierFraction;
            xa[k] = (float) (u + noisePx * rnd.nextGaussian());
            ya[k] = (float) (v + noisePx * rnd.nextGaussian());
            xb[k] = (float) (outlier[k] ? rnd.nextDouble() * camera.width() : pix[0] + noisePx * rnd.nextGaussian());
            yb[k] = (float) (outlier[k] ? rnd.nextDouble() * camera.height() : pix[1] + noisePx * rnd.nextGaussian());
            k++;
        }
        return new SyntheticPair(features(xa, ya), features(xb, yb), r, translation.clone(), outlier);
    }

    /** Depth along the ray of pixel (u, v) to the plane 0.3 x + 0.2 y + z = 8 of camera a (a tilted wall). */
    private static double planeDepth(double u, double v, CameraModel camera) {
        double[] xn = new double[2];
        camera.pixelToNormalized(u, v, xn);
        return 8 / (0.3 * xn[0] + 0.2 * xn[1] + 1);
    }

    static FrameFeatures features(float[] x, float[] y) {
        int n = x.length;
        return new FrameFeatures(n, x, y, new float[n], new int[n], new float[n], new float[n], new long[n * 4]);
    }

    /** Angle of R_est R^T, degrees. */
    double rotationErrorDeg(double[] estimated) {
        return Math.toDegrees(Mat3.angle(Mat3.mul(estimated, Mat3.transpose(rotation))));
    }

    /** Angle between the estimated and true translation directions, degrees. */
    double translationErrorDeg(double[] estimated) {
        double c = Mat3.dot(Mat3.unit(estimated), Mat3.unit(translation));
        return Math.toDegrees(Math.acos(Math.max(-1, Math.min(1, c))));
    }
}
