package revisit.verification;

import boofcv.struct.image.GrayU16;
import georegression.struct.se.Se3_F64;
import java.util.Arrays;
import java.util.SplittableRandom;
import revisit.camera.CameraModel;

/**
 * Test fixture: a camera inside a box-shaped room, rendered to depth images by casting one ray per pixel, and
 * feature matches between two views obtained by projecting wall points seen in view A into view B (with an
 * occlusion check against B's depth). View A is the world frame; view B sits at {@code aFromB}.
 */
final class RenderedBoxRoom {

    /** Room bounds (x, y, z) min and max, metres; the cameras stand inside. */
    static final double[] MIN = {-3, -1.5, -1};
    static final double[] MAX = {3, 1.5, 6};
    static final double METRES_PER_UNIT = 1e-4;

    final CameraModel camera;
    final Se3_F64 aFromB;
    final DepthImage depthA;
    final DepthImage depthB;

    RenderedBoxRoom(CameraModel camera, Se3_F64 aFromB) {
        this.camera = camera;
        this.aFromB = aFromB.copy();
        this.depthA = render(camera, new Se3_F64());
        this.depthB = render(camera, aFromB);
    }

    /** Depth image of a camera at pose (camera to room), 0.1 mm units. */
    static DepthImage render(CameraModel camera, Se3_F64 roomFromCamera) {
        GrayU16 image = new GrayU16(camera.width(), camera.height());
        double[] m = new double[2];
        for (int v = 0; v < camera.height(); v++) {
            for (int u = 0; u < camera.width(); u++) {
                camera.pixelToNormalized(u, v, m);
                double z = depthAlongAxis(roomFromCamera, m[0], m[1]);
                image.set(u, v, (int) Math.round(z / METRES_PER_UNIT));
            }
        }
        return new DepthImage(image, METRES_PER_UNIT);
    }

    /** Z (camera frame) of the first wall hit along the ray through normalised (xn, yn). */
    static double depthAlongAxis(Se3_F64 roomFromCamera, double xn, double yn) {
        var r = roomFromCamera.R;
        double[] d = new double[3];
        double[] o = {roomFromCamera.T.x, roomFromCamera.T.y, roomFromCamera.T.z};
        for (int k = 0; k < 3; k++) {
            d[k] = r.get(k, 0) * xn + r.get(k, 1) * yn + r.get(k, 2);
        }
        double s = Double.POSITIVE_INFINITY;
        for (int k = 0; k < 3; k++) {
            if (d[k] > 0) {
                s = Math.min(s, (MAX[k] - o[k]) / d[k]);
            } else if (d[k] < 0) {
                s = Math.min(s, (MIN[k] - o[k]) / d[k]);
            }
        }
        return s;
    }

    /**
     * Matches of n wall points seen from A (random pixels) that are visible in B, optionally with pixel noise.
     *
     * @param n            wanted number of matches
     * @param pixelNoisePx standard deviation of Gaussian noise added to every coordinate
     * @param seed         random seed
     */
    MatchedPixels matches(int n, double pixelNoisePx, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        float[][] out = new float[4][n];
        int found = 0;
        double[] m = new double[2];
        double[] px = new double[2];
        Se3_F64 bFromA = aFromB.invert(null);
        for (int attempt = 0; attempt < 100 * n && found < n; attempt++) {
            double u = 10 + random.nextDouble() * (camera.width() - 20);
            double v = 10 + random.nextDouble() * (camera.height() - 20);
            camera.pixelToNormalized(u, v, m);
            double z = depthAlongAxis(new Se3_F64(), m[0], m[1]);
            double[] xb = transform(bFromA, z * m[0], z * m[1], z);
            if (xb[2] < 0.3) {
                continue;
            }
            camera.normalizedToPixel(xb[0] / xb[2], xb[1] / xb[2], px);
            if (px[0] < 10 || px[1] < 10 || px[0] > camera.width() - 10 || px[1] > camera.height() - 10) {
                continue;
            }
            double[] mb = new double[2];
            camera.pixelToNormalized(px[0], px[1], mb);
            if (Math.abs(depthAlongAxis(aFromB, mb[0], mb[1]) - xb[2]) > 1e-6 * xb[2]) {
                continue;
            }
            out[0][found] = (float) (u + pixelNoisePx * gaussian(random));
            out[1][found] = (float) (v + pixelNoisePx * gaussian(random));
            out[2][found] = (float) (px[0] + pixelNoisePx * gaussian(random));
            out[3][found] = (float) (px[1] + pixelNoisePx * gaussian(random));
            found++;
        }
        if (found < n) {
            throw new IllegalStateException("only " + found + " of " + n + " points visible in both views");
        }
        return new MatchedPixels(out[0], out[1], out[2], out[3]);
    }

    /** The same matches with the B side of the first {@code count} matches replaced by random pixels. */
    MatchedPixels withWrongMatches(MatchedPixels clean, int count, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        float[] xB = Arrays.copyOf(clean.xB(), clean.count());
        float[] yB = Arrays.copyOf(clean.yB(), clean.count());
        for (int i = 0; i < count; i++) {
            xB[i] = (float) (10 + random.nextDouble() * (camera.width() - 20));
            yB[i] = (float) (10 + random.nextDouble() * (camera.height() - 20));
        }
        return new MatchedPixels(clean.xA(), clean.yA(), xB, yB);
    }

    static double[] transform(Se3_F64 t, double x, double y, double z) {
        var r = t.R;
        return new double[]{
                r.get(0, 0) * x + r.get(0, 1) * y + r.get(0, 2) * z + t.T.x,
                r.get(1, 0) * x + r.get(1, 1) * y + r.get(1, 2) * z + t.T.y,
                r.get(2, 0) * x + r.get(2, 1) * y + r.get(2, 2) * z + t.T.z};
    }

    static double gaussian(SplittableRandom random) {
        double u1 = random.nextDouble();
        double u2 = random.nextDouble();
        return Math.sqrt(-2 * Math.log(1 - u1)) * Math.cos(2 * Math.PI * u2);
    }

    /** Pose B in A: rotation vector (radians) and translation (metres). */
    static Se3_F64 pose(double wx, double wy, double wz, double tx, double ty, double tz) {
        Se3_F64 se = new Se3_F64();
        RotationVector.exp(wx, wy, wz, se.R);
        se.T.setTo(tx, ty, tz);
        return se;
    }

    /** Rotation angle (radians) and translation distance (metres) between two poses. */
    static double[] difference(Se3_F64 estimate, Se3_F64 truth) {
        Se3_F64 delta = truth.invert(null).concat(estimate, null);
        return new double[]{RotationVector.angle(delta.R), delta.T.norm()};
    }
}
