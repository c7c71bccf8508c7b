package revisit.verification;

import java.util.OptionalDouble;
import revisit.camera.CameraModel;

/**
 * Back-projection of pixels with depth into 3D camera coordinates, with a first-order covariance per point.
 *
 * <p>A pixel (u, v) with normalised undistorted coordinates m = (xn, yn, 1) and depth Z(u, v) gives
 * {@code X = Z m}. The feature position carries noise sigma_px, and moving the pixel also moves the depth reading
 * along the surface: {@code dX/du = (dZ/du) m + Z (1/fx, 0, 0)}, {@code dX/dv = (dZ/dv) m + Z (0, 1/fy, 0)} (lens
 * distortion's small change of scale ignored). The depth reading has its own noise
 * {@code sigma_Z = depthSigmaAtOneMetre * Z^2}; nearest-pixel sampling reads the depth up to half a pixel away from
 * the feature, which adds {@code ((dZ/du)^2 + (dZ/dv)^2) / 12} (variance of a uniform rounding offset). First
 * order: {@code Sigma_X = sigma_px^2 (dX/du dX/du^T + dX/dv dX/dv^T) + sigma_Z^2 m m^T}. The depth slopes come from
 * central differences of the depth image three pixels either side (wide enough that per-pixel depth noise does not
 * dominate the slope); they are taken as 0 where a neighbour is missing or across a depth edge.
 */
final class DepthPoints {

    /** Half-width of the central difference for depth slopes, pixels. */
    private static final int SLOPE_STEP = 3;

    /** Packed x, y, z per match, metres (valid entries only). */
    final double[] xyz;
    /** Packed 3x3 row-major covariance per match, square metres (valid entries only). */
    final double[] covariance;
    /** Packed normalised undistorted coordinates (xn, yn) per match, valid or not. */
    final double[] normalized;
    /** Whether match i has a usable depth. */
    final boolean[] valid;

    private DepthPoints(int count) {
        xyz = new double[3 * count];
        covariance = new double[9 * count];
        normalized = new double[2 * count];
        valid = new boolean[count];
    }

    /**
     * Back-projects one side of the matches.
     *
     * @param camera camera model of the frame
     * @param depth  depth image of the frame
     * @param u      columns, pixels
     * @param v      rows, pixels
     * @param config noise model and depth range
     */
    static DepthPoints backProject(CameraModel camera, DepthImage depth, float[] u, float[] v, MetricPoseConfig config) {
        DepthPoints points = new DepthPoints(u.length);
        double[] m = new double[2];
        for (int i = 0; i < u.length; i++) {
            camera.pixelToNormalized(u[i], v[i], m);
            points.normalized[2 * i] = m[0];
            points.normalized[2 * i + 1] = m[1];
            OptionalDouble z = depth.depthAt(u[i], v[i], config.sampling(), config.maxRelativeDepthJump());
            if (z.isEmpty() || z.getAsDouble() < config.minDepthMetres() || z.getAsDouble() > config.maxDepthMetres()) {
                continue;
            }
            double slopeU = slope(depth, u[i] - SLOPE_STEP, v[i], u[i] + SLOPE_STEP, v[i], z.getAsDouble(), config);
            double slopeV = slope(depth, u[i], v[i] - SLOPE_STEP, u[i], v[i] + SLOPE_STEP, z.getAsDouble(), config);
            points.set(i, m, z.getAsDouble(), slopeU, slopeV, camera, config);
        }
        return points;
    }

    /** Normalised coordinates only, for a frame without depth (no point is valid). */
    static DepthPoints withoutDepth(CameraModel camera, float[] u, float[] v) {
        DepthPoints points = new DepthPoints(u.length);
        double[] m = new double[2];
        for (int i = 0; i < u.length; i++) {
            camera.pixelToNormalized(u[i], v[i], m);
            points.normalized[2 * i] = m[0];
            points.normalized[2 * i + 1] = m[1];
        }
        return points;
    }

    /** dZ/dpixel from readings one pixel either side, 0 where missing or across a depth edge. */
    private static double slope(DepthImage depth, double u0, double v0, double u1, double v1, double z,
                                MetricPoseConfig config) {
        OptionalDouble before = depth.depthAt(u0, v0, config.sampling(), config.maxRelativeDepthJump());
        OptionalDouble after = depth.depthAt(u1, v1, config.sampling(), config.maxRelativeDepthJump());
        if (before.isEmpty() || after.isEmpty()) {
            return 0;
        }
        double d = (after.getAsDouble() - before.getAsDouble()) / (2 * SLOPE_STEP);
        return Math.abs(d) * SLOPE_STEP > config.maxRelativeDepthJump() * z ? 0 : d;
    }

    private void set(int i, double[] m, double z, double slopeU, double slopeV, CameraModel camera,
                     MetricPoseConfig config) {
        valid[i] = true;
        double[] mm = {m[0], m[1], 1};
        xyz[3 * i] = z * mm[0];
        xyz[3 * i + 1] = z * mm[1];
        xyz[3 * i + 2] = z;
        double sigmaZ = config.depthSigmaAtOneMetre() * z * z;
        double depthVariance = sigmaZ * sigmaZ;
        if (config.sampling() == DepthSampling.NEAREST) {
            depthVariance += (slopeU * slopeU + slopeV * slopeV) / 12;
        }
        double s2 = config.pixelSigmaPx() * config.pixelSigmaPx();
        double[] du = {slopeU * mm[0] + z / camera.fx(), slopeU * mm[1], slopeU};
        double[] dv = {slopeV * mm[0], slopeV * mm[1] + z / camera.fy(), slopeV};
        for (int a = 0; a < 3; a++) {
            for (int b = 0; b < 3; b++) {
                covariance[9 * i + 3 * a + b] = depthVariance * mm[a] * mm[b] + s2 * (du[a] * du[b] + dv[a] * dv[b]);
            }
        }
    }
}
