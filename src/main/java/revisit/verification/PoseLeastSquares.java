package revisit.verification;

import georegression.struct.se.Se3_F64;
import java.util.Optional;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;

/**
 * Levenberg-Marquardt refinement of a rigid pose on whitened residuals (Levenberg 1944; Marquardt, SIAM J. Appl.
 * Math. 11(2), 1963), with the damping {@code (J^T J + lambda diag(J^T J)) delta = -J^T r}.
 *
 * <p>The pose is updated on the right: {@code R <- R exp(omega), t <- t + R v} with {@code delta = (omega, v)}
 * (equal to {@code T Exp(delta)} to first order). At the solution the information matrix is {@code J^T J} of the
 * whitened residuals, in the same (rotation, translation) order.
 */
final class PoseLeastSquares {

    /** Whitened residuals of a pose and their Jacobian with respect to the right perturbation. */
    interface Residuals {
        /** Number of scalar residuals. */
        int size();

        /**
         * @param aFromB   pose; not modified
         * @param residual receives size() whitened residuals
         * @param jacobian receives size() x 6 row-major derivatives, or null when not needed
         */
        void evaluate(Se3_F64 aFromB, double[] residual, double[] jacobian);
    }

    /** Refined pose with information matrix and final cost (sum of squared whitened residuals). */
    record Solution(Se3_F64 aFromB, DMatrixRMaj information, double cost) {
    }

    private static final double STEP_TOLERANCE = 1e-12;

    private PoseLeastSquares() {
    }

    /** Refines from start; empty when J^T J is not positive definite (fewer than six constrained directions). */
    static Optional<Solution> refine(Residuals f, Se3_F64 start, int maxIterations) {
        int m = f.size();
        double[] r = new double[m];
        double[] jac = new double[6 * m];
        DMatrixRMaj h = new DMatrixRMaj(6, 6);
        DMatrixRMaj g = new DMatrixRMaj(6, 1);
        Se3_F64 pose = start.copy();
        f.evaluate(pose, r, jac);
        double cost = normal(r, jac, m, h, g);
        double lambda = 1e-4;
        LinearSolverDense<DMatrixRMaj> solver = LinearSolverFactory_DDRM.symmPosDef(6);
        for (int iter = 0; iter < maxIterations; iter++) {
            Optional<DMatrixRMaj> solved = dampedStep(h, g, lambda, solver);
            if (solved.isEmpty()) {
                return Optional.empty();
            }
            DMatrixRMaj step = solved.get();
            Se3_F64 candidate = retract(pose, step.data);
            f.evaluate(candidate, r, null);
            double candidateCost = dot(r, m);
            if (candidateCost <= cost) {
                pose = candidate;
                f.evaluate(pose, r, jac);
                cost = normal(r, jac, m, h, g);
                lambda = Math.max(lambda / 10, 1e-12);
                if (CommonOps_DDRM.elementMaxAbs(step) < STEP_TOLERANCE) {
                    break;
                }
            } else {
                lambda *= 10;
                if (lambda > 1e12) {
                    break;
                }
            }
        }
        if (!LinearSolverFactory_DDRM.chol(6).setA(h.copy())) {
            return Optional.empty();
        }
        return Optional.of(new Solution(pose, h, cost));
    }

    /** Solves (h + lambda diag(h)) step = -g; empty when the damped matrix is not positive definite. */
    private static Optional<DMatrixRMaj> dampedStep(DMatrixRMaj h, DMatrixRMaj g, double lambda,
                                          LinearSolverDense<DMatrixRMaj> solver) {
        DMatrixRMaj damped = h.copy();
        for (int k = 0; k < 6; k++) {
            damped.add(k, k, lambda * h.get(k, k));
        }
        if (!solver.setA(damped)) {
            return Optional.empty();
        }
        DMatrixRMaj step = new DMatrixRMaj(6, 1);
        solver.solve(g, step);
        CommonOps_DDRM.scale(-1, step);
        return Optional.of(step);
    }

    /** The right update {@code R exp(omega), t + R v}. */
    static Se3_F64 retract(Se3_F64 pose, double[] delta) {
        Se3_F64 out = new Se3_F64();
        DMatrixRMaj rotation = new DMatrixRMaj(3, 3);
        RotationVector.exp(delta[0], delta[1], delta[2], rotation);
        CommonOps_DDRM.mult(pose.R, rotation, out.R);
        var r = pose.R;
        out.T.setTo(
                pose.T.x + r.get(0, 0) * delta[3] + r.get(0, 1) * delta[4] + r.get(0, 2) * delta[5],
                pose.T.y + r.get(1, 0) * delta[3] + r.get(1, 1) * delta[4] + r.get(1, 2) * delta[5],
                pose.T.z + r.get(2, 0) * delta[3] + r.get(2, 1) * delta[4] + r.get(2, 2) * delta[5]);
        return out;
    }

    /** Fills h = J^T J and g = J^T r; returns r^T r. */
    private static double normal(double[] r, double[] jac, int m, DMatrixRMaj h, DMatrixRMaj g) {
        h.zero();
        g.zero();
        for (int i = 0; i < m; i++) {
            int row = 6 * i;
            for (int a = 0; a < 6; a++) {
                double ja = jac[row + a];
                g.data[a] += ja * r[i];
                for (int b = 0; b < 6; b++) {
                    h.data[6 * a + b] += ja * jac[row + b];
                }
            }
        }
        return dot(r, m);
    }

    private static double dot(double[] r, int m) {
        double sum = 0;
        for (int i = 0; i < m; i++) {
            sum += r[i] * r[i];
        }
        return sum;
    }
}
