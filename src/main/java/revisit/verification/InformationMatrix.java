package revisit.verification;

/**
 * Builds the 6x6 information matrix of {@link RelativePose} (order dt, dtheta) as {@code J^T J / sigma^2} from
 * the residual Jacobian of a refinement, with {@code sigma^2 = sum r^2 / (m - p)}, the a-posteriori variance of
 * m residuals after fitting p parameters (H&amp;Z 2004, sec. 5.2.3 and A5.2), floored at (0.05 px)^2.
 */
final class InformationMatrix {

    /** Floor on sigma, pixels: keypoint positions are not better than ~0.05 px (common practice). */
    private static final double MIN_SIGMA_PX = 0.05;

    private InformationMatrix() {
    }

    /**
     * From an {@link EpipolarPoseProblem} solution: Jacobian columns (dtheta 3, tangent 2). The tangent columns
     * are mapped to the three translation axes through the basis {@code (b1, b2)} of t, so the translation block
     * is exactly zero along t (the unobservable scale).
     */
    static double[] ofEpipolarPose(double[] jacobian, double[] residuals, double[] t) {
        int m = residuals.length;
        double[][] basis = Mat3.tangentBasis(t);
        double[] j6 = new double[m * 6];
        for (int i = 0; i < m; i++) {
            for (int k = 0; k < 3; k++) {
                j6[i * 6 + k] = jacobian[i * 5 + 3] * basis[0][k] + jacobian[i * 5 + 4] * basis[1][k];
                j6[i * 6 + 3 + k] = jacobian[i * 5 + k];
            }
        }
        return normal(j6, m, residuals, 5);
    }

    /** From a {@link RotationProblem} solution: rotation block only; translation rows and columns zero. */
    static double[] ofRotation(double[] jacobian, double[] residuals) {
        int m = residuals.length;
        double[] j6 = new double[m * 6];
        for (int i = 0; i < m; i++) {
            System.arraycopy(jacobian, i * 3, j6, i * 6 + 3, 3);
        }
        return normal(j6, m, residuals, 3);
    }

    private static double[] normal(double[] j6, int m, double[] residuals, int fitted) {
        double sigma2 = Math.max(MIN_SIGMA_PX * MIN_SIGMA_PX,
                LevenbergMarquardt.sumSquares(residuals) / Math.max(1, m - fitted));
        double[] info = new double[36];
        for (int i = 0; i < m; i++) {
            for (int u = 0; u < 6; u++) {
                double ju = j6[i * 6 + u];
                for (int v = 0; v < 6; v++) {
                    info[u * 6 + v] += ju * j6[i * 6 + v];
                }
            }
        }
        for (int k = 0; k < 36; k++) {
            info[k] /= sigma2;
        }
        return info;
    }
}
