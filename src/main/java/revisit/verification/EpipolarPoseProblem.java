package revisit.verification;

/**
 * Pose refinement on the epipolar constraint: residual i is the signed Sampson distance (detection-level
 * pixels, see {@link PointPairs}) of
 * inlier i to {@code F = K^-T [t]x R K^-1}. State is {@code (R row-major, t)} with |t| = 1; the step is
 * {@code (dtheta_x, dtheta_y, dtheta_z, u1, u2)}: {@code R <- exp([dtheta]x) R} and
 * {@code t <- unit(t + u1 b1 + u2 b2)} with {@code (b1, b2)} the tangent basis of t (5 degrees of freedom,
 * H&amp;Z 2004 sec. 11.4.2 counts the same).
 */
final class EpipolarPoseProblem implements LevenbergMarquardt.Problem {

    private final PointPairs points;
    private final int[] inliers;

    EpipolarPoseProblem(PointPairs points, int[] inliers) {
        this.points = points;
        this.inliers = inliers;
    }

    /** State vector of a pose. */
    static double[] state(double[] rotation, double[] translation) {
        double[] t = Mat3.unit(translation);
        double[] s = new double[12];
        System.arraycopy(rotation, 0, s, 0, 9);
        System.arraycopy(t, 0, s, 9, 3);
        return s;
    }

    static double[] rotation(double[] state) {
        return java.util.Arrays.copyOfRange(state, 0, 9);
    }

    static double[] translation(double[] state) {
        return java.util.Arrays.copyOfRange(state, 9, 12);
    }

    /** {@code F = K^-T [t]x R K^-1} for the pose in {@code state}. */
    double[] fundamental(double[] state) {
        double[] e = Mat3.mul(Mat3.skew(translation(state)), rotation(state));
        return points.fundamentalFromEssential(e);
    }

    @Override
    public int parameterCount() {
        return 5;
    }

    @Override
    public int residualCount() {
        return inliers.length;
    }

    @Override
    public void residuals(double[] state, double[] out) {
        double[] f = fundamental(state);
        for (int n = 0; n < inliers.length; n++) {
            int i = inliers[n];
            out[n] = points.epipolarSigned(f, i);
        }
    }

    @Override
    public double[] retract(double[] state, double[] delta) {
        double[] r = Mat3.mul(Mat3.exp(new double[]{delta[0], delta[1], delta[2]}), rotation(state));
        double[] t = translation(state);
        double[][] basis = Mat3.tangentBasis(t);
        double[] moved = new double[3];
        for (int k = 0; k < 3; k++) {
            moved[k] = t[k] + delta[3] * basis[0][k] + delta[4] * basis[1][k];
        }
        return state(r, moved);
    }
}
