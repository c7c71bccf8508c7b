package revisit.consistency;

import georegression.struct.se.Se3_F64;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;

/**
 * A rigid transform with a first-order covariance on the right perturbation {@code T_true = T Exp(xi)},
 * {@code xi = (omega, v)}: rotation vector (radians) first, then translation (metres, in the transform's own frame).
 *
 * <p>Propagation uses the adjoint {@code Ad_T = [[R, 0], [[t]x R, R]]}, for which {@code T Exp(xi) = Exp(Ad_T xi) T}:
 * <ul>
 * <li>product: {@code A Exp(a) B Exp(b) = AB Exp(Ad_{B^-1} a + b)} to first order, so
 * {@code Sigma_AB = Ad_{B^-1} Sigma_A Ad_{B^-1}^T + Sigma_B} (A and B independent);</li>
 * <li>inverse: {@code (T Exp(xi))^-1 = T^-1 Exp(-Ad_T xi)}, so {@code Sigma_{T^-1} = Ad_T Sigma_T Ad_T^T}.</li>
 * </ul>
 * (Barfoot and Furgale, "Associating uncertainty with three-dimensional poses for use in estimation problems",
 * IEEE T-RO 30(3), 2014, give the same first-order rules in their own ordering.) Immutable.
 */
final class UncertainPose {

    private final Se3_F64 pose;
    private final DMatrixRMaj covariance;

    UncertainPose(Se3_F64 pose, DMatrixRMaj covariance) {
        this.pose = pose.copy();
        this.covariance = covariance.copy();
    }

    /** A diagonal covariance with rotation and translation standard deviations. */
    static UncertainPose isotropic(Se3_F64 pose, double rotationSigmaRad, double translationSigmaMetres) {
        DMatrixRMaj cov = new DMatrixRMaj(6, 6);
        for (int k = 0; k < 3; k++) {
            cov.set(k, k, rotationSigmaRad * rotationSigmaRad);
            cov.set(k + 3, k + 3, translationSigmaMetres * translationSigmaMetres);
        }
        return new UncertainPose(pose, cov);
    }

    Se3_F64 pose() {
        return pose.copy();
    }

    DMatrixRMaj covariance() {
        return covariance.copy();
    }

    /** this * next, with next's covariance independent of this one's. */
    UncertainPose then(UncertainPose next) {
        Se3_F64 product = next.pose.concat(pose, null);
        DMatrixRMaj ad = adjoint(next.pose.invert(null));
        DMatrixRMaj cov = sandwich(ad, covariance);
        CommonOps_DDRM.addEquals(cov, next.covariance);
        return new UncertainPose(product, cov);
    }

    /** The inverse transform and its covariance. */
    UncertainPose inverse() {
        return new UncertainPose(pose.invert(null), sandwich(adjoint(pose), covariance));
    }

    /** Ad_T for the (rotation, translation) ordering. */
    static DMatrixRMaj adjoint(Se3_F64 t) {
        DMatrixRMaj ad = new DMatrixRMaj(6, 6);
        DMatrixRMaj skewR = new DMatrixRMaj(3, 3);
        DMatrixRMaj skew = skew(t.T.x, t.T.y, t.T.z);
        CommonOps_DDRM.mult(skew, t.R, skewR);
        CommonOps_DDRM.insert(t.R, ad, 0, 0);
        CommonOps_DDRM.insert(t.R, ad, 3, 3);
        CommonOps_DDRM.insert(skewR, ad, 3, 0);
        return ad;
    }

    static DMatrixRMaj skew(double x, double y, double z) {
        return new DMatrixRMaj(3, 3, true, 0, -z, y, z, 0, -x, -y, x, 0);
    }

    /** a s a^T. */
    static DMatrixRMaj sandwich(DMatrixRMaj a, DMatrixRMaj s) {
        DMatrixRMaj as = new DMatrixRMaj(a.numRows, s.numCols);
        CommonOps_DDRM.mult(a, s, as);
        DMatrixRMaj out = new DMatrixRMaj(a.numRows, a.numRows);
        CommonOps_DDRM.multTransB(as, a, out);
        return out;
    }
}
