package revisit.verification;

import georegression.struct.se.Se3_F64;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.stream.IntStream;

/**
 * Correspondences between 3D points seen with depth in both frames, for RANSAC and refinement of {@code aFromB}.
 *
 * <p>Residual {@code r_i = X_A,i - (R X_B,i + t)} with covariance {@code Sigma_i = Sigma_A,i + R Sigma_B,i R^T}; it is
 * whitened by the Cholesky factor L_i of Sigma_i, so that {@code |L_i^-1 r_i|^2} is chi-square with 3 degrees of
 * freedom for a true correspondence. Jacobian with respect to the right perturbation (omega, v):
 * {@code dr/domega = R [X_B]x}, {@code dr/dv = -R}.
 */
final class AlignmentModel implements PoseRansac.Model {

    private final DepthPoints a;
    private final DepthPoints b;
    private final int[] matches;
    private final double gate;
    private final RigidAlignment alignment = new RigidAlignment();
    private final double[] work = new double[3];
    private final double[] chol = new double[9];
    private final double[] cov = new double[9];

    /**
     * @param a    points of frame A
     * @param b    points of frame B
     * @param gate chi-square value (3 dof) below which a correspondence is an inlier
     */
    AlignmentModel(DepthPoints a, DepthPoints b, double gate) {
        this.a = a;
        this.b = b;
        this.gate = gate;
        int n = 0;
        int[] chosen = new int[a.valid.length];
        for (int i = 0; i < a.valid.length; i++) {
            if (a.valid[i] && b.valid[i]) {
                chosen[n++] = i;
            }
        }
        this.matches = Arrays.copyOf(chosen, n);
    }

    /** Input match index of correspondence k. */
    int matchIndex(int k) {
        return matches[k];
    }

    @Override
    public int size() {
        return matches.length;
    }

    @Override
    public int sampleSize() {
        return 3;
    }

    @Override
    public void hypotheses(int[] sample, List<Se3_F64> out) {
        int[] chosen = {matches[sample[0]], matches[sample[1]], matches[sample[2]]};
        alignment.umeyama(b.xyz, a.xyz, chosen, 3).ifPresent(out::add);
    }

    /** Least-squares fit to all marked correspondences (Umeyama), empty when degenerate. */
    Optional<Se3_F64> refit(boolean[] mask) {
        int[] chosen = new int[matches.length];
        int n = 0;
        for (int k = 0; k < matches.length; k++) {
            if (mask[k]) {
                chosen[n++] = matches[k];
            }
        }
        return alignment.umeyama(b.xyz, a.xyz, chosen, n);
    }

    @Override
    public int score(Se3_F64 aFromB, boolean[] mask) {
        int inliers = 0;
        for (int k = 0; k < matches.length; k++) {
            mask[k] = whitened(aFromB, matches[k], null) <= gate;
            inliers += mask[k] ? 1 : 0;
        }
        return inliers;
    }

    /** Whitened residuals over the marked correspondences. */
    PoseLeastSquares.Residuals residuals(boolean[] mask) {
        int[] chosen = IntStream.range(0, matches.length).filter(k -> mask[k])
                .map(k -> matches[k]).toArray();
        return new PoseLeastSquares.Residuals() {
            @Override
            public int size() {
                return 3 * chosen.length;
            }

            @Override
            public void evaluate(Se3_F64 aFromB, double[] residual, double[] jacobian) {
                double[] out = new double[3];
                for (int k = 0; k < chosen.length; k++) {
                    whitened(aFromB, chosen[k], out);
                    System.arraycopy(out, 0, residual, 3 * k, 3);
                    if (jacobian != null) {
                        whitenedJacobian(aFromB, chosen[k], jacobian, 18 * k);
                    }
                }
            }
        };
    }

    /** Squared whitened residual of match i; writes the whitened residual to out when not null. */
    private double whitened(Se3_F64 aFromB, int i, double[] out) {
        var r = aFromB.R;
        double[] pb = b.xyz;
        int p = 3 * i;
        for (int row = 0; row < 3; row++) {
            work[row] = a.xyz[p + row] - (r.get(row, 0) * pb[p] + r.get(row, 1) * pb[p + 1] + r.get(row, 2) * pb[p + 2])
                    - (row == 0 ? aFromB.T.x : row == 1 ? aFromB.T.y : aFromB.T.z);
        }
        factor(aFromB, i);
        Cholesky3.forwardSolve(chol, work);
        if (out != null) {
            System.arraycopy(work, 0, out, 0, 3);
        }
        return work[0] * work[0] + work[1] * work[1] + work[2] * work[2];
    }

    /** Rows L^-1 [R [X_B]x, -R] of the Jacobian for match i, written at jacobian[offset..offset+18). */
    private void whitenedJacobian(Se3_F64 aFromB, int i, double[] jacobian, int offset) {
        factor(aFromB, i);
        var r = aFromB.R;
        double x = b.xyz[3 * i];
        double y = b.xyz[3 * i + 1];
        double z = b.xyz[3 * i + 2];
        double[] column = new double[3];
        for (int c = 0; c < 6; c++) {
            for (int row = 0; row < 3; row++) {
                double r0 = r.get(row, 0);
                double r1 = r.get(row, 1);
                double r2 = r.get(row, 2);
                column[row] = switch (c) {
                    case 0 -> r1 * z - r2 * y;
                    case 1 -> r2 * x - r0 * z;
                    case 2 -> r0 * y - r1 * x;
                    default -> -r.get(row, c - 3);
                };
            }
            Cholesky3.forwardSolve(chol, column);
            for (int row = 0; row < 3; row++) {
                jacobian[offset + 6 * row + c] = column[row];
            }
        }
    }

    /** chol = Cholesky factor of Sigma_A,i + R Sigma_B,i R^T. */
    private void factor(Se3_F64 aFromB, int i) {
        Cholesky3.rotate(aFromB.R, b.covariance, 9 * i, cov);
        for (int k = 0; k < 9; k++) {
            cov[k] += a.covariance[9 * i + k];
        }
        Cholesky3.factor(cov, chol);
    }
}
