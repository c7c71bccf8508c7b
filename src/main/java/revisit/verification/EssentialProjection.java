package revisit.verification;

import java.util.Optional;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.SingularOps_DDRM;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.SingularValueDecomposition_F64;

/** Closest essential matrix in Frobenius norm: {@code U diag(1, 1, 0) V^T} (H&amp;Z 2004, result 9.18). */
final class EssentialProjection {

    private EssentialProjection() {
    }

    /** The projection of {@code m} (row-major 3x3), or empty when its SVD fails. */
    static Optional<double[]> nearest(double[] m) {
        SingularValueDecomposition_F64<DMatrixRMaj> svd = DecompositionFactory_DDRM.svd(3, 3, true, true, false);
        if (!svd.decompose(new DMatrixRMaj(3, 3, true, m))) {
            return Optional.empty();
        }
        DMatrixRMaj u = svd.getU(null, false);
        DMatrixRMaj v = svd.getV(null, false);
        DMatrixRMaj w = svd.getW(null);
        SingularOps_DDRM.descendingOrder(u, false, w, v, false);
        DMatrixRMaj s = new DMatrixRMaj(3, 3);
        s.set(0, 0, 1);
        s.set(1, 1, 1);
        DMatrixRMaj us = new DMatrixRMaj(3, 3);
        CommonOps_DDRM.mult(u, s, us);
        DMatrixRMaj e = new DMatrixRMaj(3, 3);
        CommonOps_DDRM.multTransB(us, v, e);
        return Optional.of(e.data);
    }
}
