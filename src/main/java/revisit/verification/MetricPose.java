package revisit.verification;

import georegression.struct.se.Se3_F64;

/**
 * A metric relative pose between frames A and B with its uncertainty.
 *
 * <p>Convention: {@code aFromB} maps a point from B's camera coordinates into A's, {@code X_A = R X_B + t}; t is the
 * position of B's camera centre in A's camera frame, metres. The information matrix (inverse covariance) refers to
 * a right perturbation {@code aFromB_true = aFromB * Exp(xi)} with {@code xi = (omega, v)}: rotation vector omega
 * (radians) first, then translation v (metres, in B's frame); to first order {@code R_true = R exp(omega)},
 * {@code t_true = t + R v}. It is {@code J^T J} of the whitened residuals at the solution, i.e.
 * {@code sum_i J_i^T Sigma_i^-1 J_i} with Sigma_i the per-correspondence noise of {@link MetricPoseConfig}.
 *
 * @param aFromB         the transform B to A (copied in and out)
 * @param information    6x6 information matrix, row-major, order (rotation, translation) (copied)
 * @param method         measurements used
 * @param inlierCount    correspondences consistent with the pose
 * @param usableCount    matches with valid depth that entered the estimate
 * @param inlierMask     per input match: true for inliers (copied)
 * @param varianceFactor sum of squared whitened residuals of the inliers over (residual count - 6); near 1 when the
 *                       noise model fits, above 1 when the information is optimistic
 */
public record MetricPose(Se3_F64 aFromB, double[] information, MetricMethod method, int inlierCount, int usableCount,
                         boolean[] inlierMask, double varianceFactor) {

    public MetricPose {
        if (information.length != 36) {
            throw new IllegalArgumentException("information must hold 36 values, held " + information.length);
        }
        aFromB = aFromB.copy();
        information = information.clone();
        inlierMask = inlierMask.clone();
    }

    @Override
    public Se3_F64 aFromB() {
        return aFromB.copy();
    }

    @Override
    public double[] information() {
        return information.clone();
    }

    @Override
    public boolean[] inlierMask() {
        return inlierMask.clone();
    }

    /** Fraction of usable matches that are inliers, in [0, 1]. */
    public double inlierRatio() {
        return usableCount == 0 ? 0 : (double) inlierCount / usableCount;
    }
}
