package revisit.consistency;

import georegression.struct.se.Se3_F64;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import revisit.io.StampedPose;
import revisit.verification.RotationVector;

/**
 * Test fixture: a camera driven twice around a circle of radius 6 m at 1 m/s (a lap takes 2 pi 6 = 37.7 s), sampled
 * at 10 Hz, with a gentle height wave. The second lap runs {@link #LATERAL_OFFSET} metres outside the first and
 * looks {@link #YAW_OFFSET} radians off the path, so revisits are near but not identical poses. Odometry integrates
 * the true frame-to-frame motion with Gaussian noise on every step (a random-walk drift).
 */
final class TwoLapTrajectory {

    static final double RADIUS = 6;
    static final double SPEED = 1;
    static final double RATE_HZ = 10;
    static final double LAP_SECONDS = 2 * Math.PI * RADIUS / SPEED;
    static final double LATERAL_OFFSET = 1.0;
    static final double YAW_OFFSET = 0.08;
    static final String SEQUENCE = "drive";

    final List<Se3_F64> truth = new ArrayList<>();
    final List<StampedPose> odometry = new ArrayList<>();

    /**
     * @param stepRotationSigma    odometry noise per 0.1 m step, radians per axis
     * @param stepTranslationSigma odometry noise per step, metres per axis
     * @param seed                 random seed of the odometry noise
     */
    TwoLapTrajectory(double stepRotationSigma, double stepTranslationSigma, long seed) {
        int frames = (int) Math.ceil(2 * LAP_SECONDS * RATE_HZ) + 20;
        for (int k = 0; k < frames; k++) {
            truth.add(truePose(k / RATE_HZ));
        }
        SplittableRandom random = new SplittableRandom(seed);
        Se3_F64 estimate = truth.get(0).copy();
        odometry.add(StampedPose.of(0, estimate));
        for (int k = 1; k < frames; k++) {
            Se3_F64 step = truth.get(k).concat(truth.get(k - 1).invert(null), null);
            Se3_F64 noisy = perturb(step, stepRotationSigma, stepTranslationSigma, random);
            estimate = noisy.concat(estimate, null);
            odometry.add(StampedPose.of(k / RATE_HZ, estimate));
        }
    }

    /** Frame index of a time. */
    static int frame(double timeSeconds) {
        return (int) Math.round(timeSeconds * RATE_HZ);
    }

    FrameRef ref(int frame) {
        return new FrameRef(SEQUENCE, frame, frame / RATE_HZ);
    }

    /** True pose of frame b in frame a's camera coordinates. */
    Se3_F64 relative(int a, int b) {
        return truth.get(b).concat(truth.get(a).invert(null), null);
    }

    /** Camera-to-world pose at a time: looking along the path, y down (world z up). */
    static Se3_F64 truePose(double t) {
        double lap = Math.floor(t / LAP_SECONDS);
        double theta = SPEED * t / RADIUS;
        double r = RADIUS + LATERAL_OFFSET * lap;
        double yaw = YAW_OFFSET * lap;
        double[] position = {r * Math.cos(theta), r * Math.sin(theta), 0.3 * Math.sin(3 * theta)};
        double[] forward = {-Math.sin(theta + yaw), Math.cos(theta + yaw), 0};
        double[] down = {0, 0, -1};
        double[] right = {down[1] * forward[2] - down[2] * forward[1], down[2] * forward[0] - down[0] * forward[2],
                down[0] * forward[1] - down[1] * forward[0]};
        Se3_F64 pose = new Se3_F64();
        for (int row = 0; row < 3; row++) {
            pose.R.set(row, 0, right[row]);
            pose.R.set(row, 1, down[row]);
            pose.R.set(row, 2, forward[row]);
        }
        pose.T.setTo(position[0], position[1], position[2]);
        return pose;
    }

    /** pose * Exp(xi) with xi drawn per axis with the given sigmas (right perturbation). */
    static Se3_F64 perturb(Se3_F64 pose, double rotationSigma, double translationSigma, SplittableRandom random) {
        double[] xi = new double[6];
        for (int k = 0; k < 6; k++) {
            xi[k] = (k < 3 ? rotationSigma : translationSigma) * gaussian(random);
        }
        return rightPerturbed(pose, xi);
    }

    /** R exp(omega), t + R v. */
    static Se3_F64 rightPerturbed(Se3_F64 pose, double[] xi) {
        Se3_F64 out = new Se3_F64();
        DMatrixRMaj dr = new DMatrixRMaj(3, 3);
        RotationVector.exp(xi[0], xi[1], xi[2], dr);
        CommonOps_DDRM.mult(pose.R, dr, out.R);
        var r = pose.R;
        out.T.setTo(pose.T.x + r.get(0, 0) * xi[3] + r.get(0, 1) * xi[4] + r.get(0, 2) * xi[5],
                pose.T.y + r.get(1, 0) * xi[3] + r.get(1, 1) * xi[4] + r.get(1, 2) * xi[5],
                pose.T.z + r.get(2, 0) * xi[3] + r.get(2, 1) * xi[4] + r.get(2, 2) * xi[5]);
        return out;
    }

    static double gaussian(SplittableRandom random) {
        double u1 = random.nextDouble();
        double u2 = random.nextDouble();
        return Math.sqrt(-2 * Math.log(1 - u1)) * Math.cos(2 * Math.PI * u2);
    }

    /** Diagonal information for rotation and translation sigmas, row-major 6x6. */
    static double[] information(double rotationSigma, double translationSigma) {
        double[] info = new double[36];
        for (int k = 0; k < 6; k++) {
            double s = k < 3 ? rotationSigma : translationSigma;
            info[7 * k] = 1 / (s * s);
        }
        return info;
    }
}
