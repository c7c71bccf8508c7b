package revisit.verification;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;

/**
 * Small dense Levenberg-Marquardt least squares (Levenberg 1944; Marquardt 1963; damping on the diagonal of
 * J^T J as in Hartley &amp; Zisserman 2004, appendix A6.2) on a manifold: the state moves by a problem-defined
 * retraction of a small parameter vector. The Jacobian is by forward differences of step {@code 1e-6}
 * (parameters are radians and unit-vector tangents, where this step is well above rounding and far below the
 * curvature scale).
 */
final class LevenbergMarquardt {

    /** A least-squares problem on a manifold state. */
    interface Problem {
        int parameterCount();

        int residualCount();

        /** Fills {@code out} with the residuals at {@code state}. */
        void residuals(double[] state, double[] out);

        /** The state moved by the parameter step {@code delta}. */
        double[] retract(double[] state, double[] delta);
    }

    /**
     * Minimiser found.
     *
     * @param state      final state
     * @param residuals  residuals at the state
     * @param jacobian   residual Jacobian at the state, row-major, residualCount x parameterCount
     * @param iterations accepted and rejected steps taken
     */
    record Solution(double[] state, double[] residuals, double[] jacobian, int iterations) {
    }

    private static final double STEP = 1e-6;
    /**
     * Stop when a step lowers the cost by less than this fraction: 1e-6 changes pose angles by far less than the
     * 0.01-degree noise level of a two-view fit (common practice).
     */
    private static final double RELATIVE_TOLERANCE = 1e-6;

    private LevenbergMarquardt() {
    }

    static Solution minimize(Problem problem, double[] start, int maxIterations) {
        int p = problem.parameterCount();
        int m = problem.residualCount();
        double[] state = start;
        double[] r = new double[m];
        problem.residuals(state, r);
        double cost = sumSquares(r);
        double[] jac = jacobian(problem, state, r);
        double lambda = 1e-3;
        int it = 0;
        double[] trial = new double[m];
        while (it < maxIterations) {
            it++;
            DMatrixRMaj a = new DMatrixRMaj(p, p);
            DMatrixRMaj g = new DMatrixRMaj(p, 1);
            normalEquations(jac, r, m, p, a, g);
            for (int k = 0; k < p; k++) {
                a.add(k, k, lambda * Math.max(a.get(k, k), 1e-12));
            }
            DMatrixRMaj step = new DMatrixRMaj(p, 1);
            if (!CommonOps_DDRM.solve(a, g, step)) {
                break;
            }
            double[] delta = new double[p];
            for (int k = 0; k < p; k++) {
                delta[k] = -step.get(k);
            }
            double[] next = problem.retract(state, delta);
            problem.residuals(next, trial);
            double nextCost = sumSquares(trial);
            if (nextCost < cost) {
                boolean converged = cost - nextCost < RELATIVE_TOLERANCE * cost;
                state = next;
                cost = nextCost;
                System.arraycopy(trial, 0, r, 0, m);
                jac = jacobian(problem, state, r);
                lambda = Math.max(lambda / 10, 1e-12);
                if (converged) {
                    break;
                }
            } else {
                lambda *= 10;
                if (lambda > 1e12) {
                    break;
                }
            }
        }
        return new Solution(state, r, jac, it);
    }

    private static void normalEquations(double[] jac, double[] r, int m, int p, DMatrixRMaj a, DMatrixRMaj g) {
        for (int i = 0; i < m; i++) {
            int row = i * p;
            for (int u = 0; u < p; u++) {
                double ju = jac[row + u];
                g.add(u, 0, ju * r[i]);
                for (int v = u; v < p; v++) {
                    a.add(u, v, ju * jac[row + v]);
                }
            }
        }
        for (int u = 0; u < p; u++) {
            for (int v = 0; v < u; v++) {
                a.set(u, v, a.get(v, u));
            }
        }
    }

    /** Forward-difference Jacobian, row-major m x p. */
    static double[] jacobian(Problem problem, double[] state, double[] r) {
        int p = problem.parameterCount();
        int m = problem.residualCount();
        double[] jac = new double[m * p];
        double[] shifted = new double[m];
        for (int k = 0; k < p; k++) {
            double[] delta = new double[p];
            delta[k] = STEP;
            problem.residuals(problem.retract(state, delta), shifted);
            for (int i = 0; i < m; i++) {
                jac[i * p + k] = (shifted[i] - r[i]) / STEP;
            }
        }
        return jac;
    }

    static double sumSquares(double[] r) {
        double s = 0;
        for (double v : r) {
            s += v * v;
        }
        return s;
    }
}
