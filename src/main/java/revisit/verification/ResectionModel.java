package revisit.verification;

import boofcv.abst.geo.Estimate1ofPnP;
import boofcv.abst.geo.EstimateNofPnP;
import boofcv.factory.geo.EnumPNP;
import boofcv.factory.geo.FactoryMultiView;
import boofcv.struct.geo.Point2D3D;
import georegression.struct.se.Se3_F64;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.stream.IntStream;
import org.ddogleg.struct.DogArray;
import org.ejml.data.DMatrixRMaj;

/**
 * Correspondences between 3D points of frame A (from depth) and normalised image points of frame B, for RANSAC and
 * refinement of {@code aFromB} by perspective-n-point.
 *
 * <p>Minimal samples are solved by BoofCV's P3P (Grunert's solution, up to four poses), the consensus refit by
 * BoofCV's EPnP (Lepetit, Moreno-Noguer and Fua, IJCV 81(2), 2009). With {@code Y = R^T (X_A - t)} the point in B's
 * frame, the residual is the reprojection error in pixels {@code e = (fx (Y_x/Y_z - x_B), fy (Y_y/Y_z - y_B))},
 * whitened by its covariance {@code sigma_px^2 I + J_e R^T Sigma_A R J_e^T} (pixel noise in B plus depth and pixel
 * noise of X_A carried through the projection Jacobian J_e). With respect to the right perturbation (omega, v):
 * {@code dY/domega = [Y]x}, {@code dY/dv = -I}.
 */
final class ResectionModel implements PoseRansac.Model {

    /** Residual given to points behind camera B so that a pose placing inliers there is never preferred. */
    private static final double BEHIND_CAMERA = 1e6;

    private final DepthPoints a;
    private final DepthPoints b;
    private final int[] matches;
    private final double fx;
    private final double fy;
    private final double pixelSigma;
    private final double gate;
    private final EstimateNofPnP minimal = FactoryMultiView.pnp_N(EnumPNP.P3P_GRUNERT, -1);
    private final Estimate1ofPnP refit = FactoryMultiView.computePnPwithEPnP(10, 0.1);
    private final DogArray<Se3_F64> solutions = new DogArray<>(4, Se3_F64::new);

    ResectionModel(DepthPoints a, DepthPoints b, double fx, double fy, double pixelSigma, double gate) {
        this.a = a;
        this.b = b;
        this.fx = fx;
        this.fy = fy;
        this.pixelSigma = pixelSigma;
        this.gate = gate;
        this.matches = IntStream.range(0, a.valid.length).filter(i -> a.valid[i]).toArray();
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
        List<Point2D3D> points = new ArrayList<>(3);
        for (int k : sample) {
            points.add(observation(matches[k]));
        }
        if (minimal.process(points, solutions)) {
            for (int s = 0; s < solutions.size; s++) {
                out.add(solutions.get(s).invert(null));
            }
        }
    }

    /** EPnP fit to all marked correspondences, empty when it fails. */
    Optional<Se3_F64> refit(boolean[] mask) {
        List<Point2D3D> points = new ArrayList<>();
        for (int k = 0; k < matches.length; k++) {
            if (mask[k]) {
                points.add(observation(matches[k]));
            }
        }
        Se3_F64 bFromA = new Se3_F64();
        if (points.size() < refit.getMinimumPoints() || !refit.process(points, bFromA)) {
            return Optional.empty();
        }
        return Optional.of(bFromA.invert(null));
    }

    @Override
    public int score(Se3_F64 aFromB, boolean[] mask) {
        double[] e = new double[2];
        int inliers = 0;
        for (int k = 0; k < matches.length; k++) {
            mask[k] = residual(aFromB, matches[k], e, null, 0) <= gate;
            inliers += mask[k] ? 1 : 0;
        }
        return inliers;
    }

    /** Whitened reprojection residuals over the marked correspondences. */
    PoseLeastSquares.Residuals residuals(boolean[] mask) {
        int[] chosen = IntStream.range(0, matches.length).filter(k -> mask[k]).map(k -> matches[k]).toArray();
        return new PoseLeastSquares.Residuals() {
            @Override
            public int size() {
                return 2 * chosen.length;
            }

            @Override
            public void evaluate(Se3_F64 aFromB, double[] residual, double[] jacobian) {
                double[] e = new double[2];
                for (int k = 0; k < chosen.length; k++) {
                    residual(aFromB, chosen[k], e, jacobian, 12 * k);
                    residual[2 * k] = e[0];
                    residual[2 * k + 1] = e[1];
                }
            }
        };
    }

    private Point2D3D observation(int i) {
        Point2D3D p = new Point2D3D();
        p.setTo(b.normalized[2 * i], b.normalized[2 * i + 1], a.xyz[3 * i], a.xyz[3 * i + 1], a.xyz[3 * i + 2]);
        return p;
    }

    /** Whitened residual of match i into e; Jacobian rows at offset when jacobian is not null; returns |e|^2. */
    private double residual(Se3_F64 aFromB, int i, double[] e, double[] jacobian, int offset) {
        var r = aFromB.R;
        double dx = a.xyz[3 * i] - aFromB.T.x;
        double dy = a.xyz[3 * i + 1] - aFromB.T.y;
        double dz = a.xyz[3 * i + 2] - aFromB.T.z;
        double yx = r.get(0, 0) * dx + r.get(1, 0) * dy + r.get(2, 0) * dz;
        double yy = r.get(0, 1) * dx + r.get(1, 1) * dy + r.get(2, 1) * dz;
        double yz = r.get(0, 2) * dx + r.get(1, 2) * dy + r.get(2, 2) * dz;
        if (yz < 1e-6) {
            e[0] = BEHIND_CAMERA;
            e[1] = BEHIND_CAMERA;
            if (jacobian != null) {
                Arrays.fill(jacobian, offset, offset + 12, 0);
            }
            return 2 * BEHIND_CAMERA * BEHIND_CAMERA;
        }
        double[] je = {fx / yz, 0, -fx * yx / (yz * yz), 0, fy / yz, -fy * yy / (yz * yz)};
        double[] l = whitening(r, i, je);
        double ex = fx * (yx / yz - b.normalized[2 * i]);
        double ey = fy * (yy / yz - b.normalized[2 * i + 1]);
        e[0] = ex / l[0];
        e[1] = (ey - l[1] * e[0]) / l[2];
        if (jacobian != null) {
            double[][] dY = {{0, -yz, yy, -1, 0, 0}, {yz, 0, -yx, 0, -1, 0}, {-yy, yx, 0, 0, 0, -1}};
            for (int c = 0; c < 6; c++) {
                double jx = je[0] * dY[0][c] + je[1] * dY[1][c] + je[2] * dY[2][c];
                double jy = je[3] * dY[0][c] + je[4] * dY[1][c] + je[5] * dY[2][c];
                double wx = jx / l[0];
                jacobian[offset + c] = wx;
                jacobian[offset + 6 + c] = (jy - l[1] * wx) / l[2];
            }
        }
        return e[0] * e[0] + e[1] * e[1];
    }

    /** Cholesky factor (l00, l10, l11) of sigma_px^2 I + J_e R^T Sigma_A R J_e^T. */
    private double[] whitening(DMatrixRMaj r, int i, double[] je) {
        double[] rt = new double[9];
        for (int row = 0; row < 3; row++) {
            for (int col = 0; col < 3; col++) {
                rt[3 * row + col] = r.get(col, row);
            }
        }
        double[] sy = new double[9];
        Cholesky3.rotate(new DMatrixRMaj(3, 3, true, rt), a.covariance, 9 * i, sy);
        double[] c = new double[4];
        for (int p = 0; p < 2; p++) {
            for (int q = 0; q < 2; q++) {
                double sum = 0;
                for (int m = 0; m < 3; m++) {
                    for (int n = 0; n < 3; n++) {
                        sum += je[3 * p + m] * sy[3 * m + n] * je[3 * q + n];
                    }
                }
                c[2 * p + q] = sum;
            }
        }
        double s2 = pixelSigma * pixelSigma;
        double l00 = Math.sqrt(c[0] + s2);
        double l10 = c[2] / l00;
        double l11 = Math.sqrt(c[3] + s2 - l10 * l10);
        return new double[]{l00, l10, l11};
    }
}
