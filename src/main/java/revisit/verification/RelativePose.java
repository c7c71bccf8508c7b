package revisit.verification;

import java.util.Optional;

/**
 * Relative pose of frame b with respect to frame a: a point with coordinates {@code X_a} in camera a has
 * coordinates {@code X_b = R X_a + t} in camera b (cameras look along +z, x right, y down). The epipolar
 * constraint on normalised coordinates is then {@code x_b^T [t]x R x_a = 0}.
 *
 * <p><b>Information matrix.</b> {@code information} is a 6x6 row-major matrix over the perturbation
 * {@code (dt_x, dt_y, dt_z, dtheta_x, dtheta_y, dtheta_z)} — translation first, then rotation — defined by
 * {@code R = exp([dtheta]x) R_hat} and {@code t = t_hat + dt}, both expressed in camera b; dtheta in radians,
 * dt in units of the (unit-length) translation direction. It is {@code J^T J / sigma^2} at the refined solution,
 * with J the Jacobian of the inlier residuals (pixels) and sigma^2 the a-posteriori residual variance
 * (H&amp;Z 2004, sec. 5.2.3). Two view geometry does not observe the translation length: the block is exactly zero
 * along {@code t_hat} (a zero eigenvalue with eigenvector {@code (t_hat, 0)}); when the translation is not
 * observable at all (pure rotation) the whole translation block and its cross terms are zero.
 *
 * @param rotation             R, row-major 3x3
 * @param translationDirection unit t, or empty when translation is not observable (pure rotation)
 * @param metricTranslation    t in metres, or empty: two views give only a direction. Extension point: a later
 *                             stage that knows depth (stereo, RGB-D, a map) supplies it through
 *                             {@link #withMetricTranslation(double[])}
 * @param information          6x6 row-major information matrix, order and units as above
 * @param ambiguous            true when a second, different pose explains the inliers as well (the two-fold
 *                             ambiguity of a plane seen from two views, Longuet-Higgins 1986); the pose kept is
 *                             the one with more points in front of both cameras
 */
public record RelativePose(double[] rotation, Optional<double[]> translationDirection,
                           Optional<double[]> metricTranslation, double[] information, boolean ambiguous) {

    public RelativePose {
        if (rotation.length != 9 || information.length != 36) {
            throw new IllegalArgumentException("rotation needs 9 and information 36 entries");
        }
        translationDirection.ifPresent(t -> {
            if (t.length != 3) {
                throw new IllegalArgumentException("translation direction needs 3 entries");
            }
        });
    }

    /** Rotation angle, degrees in [0, 180]. */
    public double rotationAngleDeg() {
        return Math.toDegrees(Mat3.angle(rotation));
    }

    /** True when the translation direction is known. */
    public boolean translationObservable() {
        return translationDirection.isPresent();
    }

    /**
     * Unit quaternion (w, x, y, z), w &gt;= 0, of {@link #rotation()} (Shepperd's method, J. Guidance and Control
     * 1978).
     */
    public double[] quaternion() {
        double[] r = rotation;
        double trace = r[0] + r[4] + r[8];
        double w;
        double x;
        double y;
        double z;
        if (trace > 0) {
            double s = Math.sqrt(trace + 1) * 2;
            w = s / 4;
            x = (r[7] - r[5]) / s;
            y = (r[2] - r[6]) / s;
            z = (r[3] - r[1]) / s;
        } else if (r[0] > r[4] && r[0] > r[8]) {
            double s = Math.sqrt(1 + r[0] - r[4] - r[8]) * 2;
            w = (r[7] - r[5]) / s;
            x = s / 4;
            y = (r[1] + r[3]) / s;
            z = (r[2] + r[6]) / s;
        } else if (r[4] > r[8]) {
            double s = Math.sqrt(1 + r[4] - r[0] - r[8]) * 2;
            w = (r[2] - r[6]) / s;
            x = (r[1] + r[3]) / s;
            y = s / 4;
            z = (r[5] + r[7]) / s;
        } else {
            double s = Math.sqrt(1 + r[8] - r[0] - r[4]) * 2;
            w = (r[3] - r[1]) / s;
            x = (r[2] + r[6]) / s;
            y = (r[5] + r[7]) / s;
            z = s / 4;
        }
        double sign = w < 0 ? -1 : 1;
        double n = Math.sqrt(w * w + x * x + y * y + z * z) * sign;
        return new double[]{w / n, x / n, y / n, z / n};
    }

    /**
     * Copy with a metric translation. The information matrix is left as estimated from two views (zero along
     * the translation); the stage that supplies the scale must add its own information about the length.
     *
     * @param translationMetres t in metres, 3 entries
     */
    public RelativePose withMetricTranslation(double[] translationMetres) {
        if (translationMetres.length != 3) {
            throw new IllegalArgumentException("metric translation needs 3 entries, had " + translationMetres.length);
        }
        return new RelativePose(rotation, translationDirection, Optional.of(translationMetres.clone()), information,
                ambiguous);
    }

    /** Entry (row, col) of the information matrix. */
    public double information(int row, int col) {
        return information[row * 6 + col];
    }
}
