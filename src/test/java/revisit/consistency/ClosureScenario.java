package revisit.consistency;

import georegression.struct.se.Se3_F64;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.SplittableRandom;
import revisit.io.StampedPose;

/**
 * Test fixture: true and planted false closures on a {@link TwoLapTrajectory}. True closures join a lap-1 frame to
 * the lap-2 frame at the same place, with their true relative pose plus noise drawn from their information. False
 * closures join wrong places but carry a clean-looking relative pose (a small motion, as a true revisit would).
 */
final class ClosureScenario {

    static final double ROTATION_SIGMA = 0.01;
    static final double TRANSLATION_SIGMA = 0.03;

    final TwoLapTrajectory trajectory;
    final List<ClosureConstraint> closures = new ArrayList<>();
    final Set<String> falseIds = new HashSet<>();
    private final SplittableRandom random;

    ClosureScenario(TwoLapTrajectory trajectory, long seed) {
        this.trajectory = trajectory;
        this.random = new SplittableRandom(seed);
    }

    Map<String, List<StampedPose>> odometry() {
        return Map.of(TwoLapTrajectory.SEQUENCE, trajectory.odometry);
    }

    /** True closures from lap-1 times start, start + step, ... to the same place on lap 2. */
    ClosureScenario trueCluster(String name, double startSeconds, double stepSeconds, int count, boolean metric) {
        for (int k = 0; k < count; k++) {
            double t = startSeconds + k * stepSeconds;
            int a = TwoLapTrajectory.frame(t);
            int b = TwoLapTrajectory.frame(t + TwoLapTrajectory.LAP_SECONDS);
            add(name + k, a, b, trajectory.relative(a, b), metric, false);
        }
        return this;
    }

    /**
     * Perceptual aliasing: lap-1 frames matched to lap-2 frames {@code shiftSeconds} further along, with poses that
     * claim the lap-2 frames stand where the true revisit is (a fixed wrong offset, so the burst agrees with itself).
     */
    ClosureScenario aliasingBurst(String name, double startSeconds, double stepSeconds, int count, double shiftSeconds) {
        int bRef = TwoLapTrajectory.frame(startSeconds + TwoLapTrajectory.LAP_SECONDS);
        int wrongRef = TwoLapTrajectory.frame(startSeconds + TwoLapTrajectory.LAP_SECONDS + shiftSeconds);
        Se3_F64 offset = trajectory.truth.get(wrongRef).invert(null).concat(trajectory.truth.get(bRef), null);
        for (int k = 0; k < count; k++) {
            double t = startSeconds + k * stepSeconds;
            int a = TwoLapTrajectory.frame(t);
            int wrong = TwoLapTrajectory.frame(t + TwoLapTrajectory.LAP_SECONDS + shiftSeconds);
            Se3_F64 claimed = trajectory.truth.get(wrong).concat(offset, null)
                    .concat(trajectory.truth.get(a).invert(null), null);
            add(name + k, a, wrong, claimed, true, true);
        }
        return this;
    }

    /** One false closure to a wrong lap-2 frame with a random small relative pose (up to 0.15 rad, 1 m). */
    ClosureScenario isolatedFalse(String name, double lap1Seconds, double shiftSeconds) {
        int a = TwoLapTrajectory.frame(lap1Seconds);
        int wrong = TwoLapTrajectory.frame(lap1Seconds + TwoLapTrajectory.LAP_SECONDS + shiftSeconds);
        double[] xi = new double[6];
        for (int k = 0; k < 6; k++) {
            xi[k] = (k < 3 ? 0.15 / Math.sqrt(3) : 1.0 / Math.sqrt(3)) * (2 * random.nextDouble() - 1);
        }
        add(name, a, wrong, TwoLapTrajectory.rightPerturbed(new Se3_F64(), xi), true, true);
        return this;
    }

    /** A closure at a true revisit whose pose is off by a rotation (rad) and translation (m) in random directions. */
    ClosureScenario wrongPose(String name, double lap1Seconds, double laterSeconds, double rotation, double translation,
                              boolean metric) {
        int a = TwoLapTrajectory.frame(lap1Seconds);
        int b = TwoLapTrajectory.frame(lap1Seconds + TwoLapTrajectory.LAP_SECONDS + laterSeconds);
        double[] r = unit();
        double[] t = unit();
        double[] xi = {rotation * r[0], rotation * r[1], rotation * r[2],
                translation * t[0], translation * t[1], translation * t[2]};
        add(name, a, b, TwoLapTrajectory.rightPerturbed(trajectory.relative(a, b), xi), metric, true);
        return this;
    }

    /** A monocular closure at a true revisit with the true rotation but its direction turned by an angle. */
    ClosureScenario wrongDirection(String name, double lap1Seconds, double angle) {
        int a = TwoLapTrajectory.frame(lap1Seconds);
        int b = TwoLapTrajectory.frame(lap1Seconds + TwoLapTrajectory.LAP_SECONDS);
        Se3_F64 pose = trajectory.relative(a, b);
        double[] u = {pose.T.x, pose.T.y, pose.T.z};
        double[] axis = unit();
        double[] perpendicular = normalise(cross(u, axis));
        double[] turned = new double[3];
        double[] un = normalise(u);
        for (int k = 0; k < 3; k++) {
            turned[k] = Math.cos(angle) * un[k] + Math.sin(angle) * perpendicular[k];
        }
        pose.T.setTo(turned[0], turned[1], turned[2]);
        add(name, a, b, pose, false, true);
        return this;
    }

    private void add(String id, int a, int b, Se3_F64 pose, boolean metric, boolean isFalse) {
        Se3_F64 noisy = TwoLapTrajectory.perturb(pose, ROTATION_SIGMA, metric ? TRANSLATION_SIGMA : 0, random);
        if (!metric) {
            double n = noisy.T.norm();
            double[] d = {noisy.T.x / n, noisy.T.y / n, noisy.T.z / n};
            double[] axis = normalise(cross(d, unit()));
            double angle = 0.01 * TwoLapTrajectory.gaussian(random);
            noisy.T.setTo(Math.cos(angle) * d[0] + Math.sin(angle) * axis[0],
                    Math.cos(angle) * d[1] + Math.sin(angle) * axis[1],
                    Math.cos(angle) * d[2] + Math.sin(angle) * axis[2]);
        }
        closures.add(new ClosureConstraint(id, trajectory.ref(a), trajectory.ref(b), noisy,
                TwoLapTrajectory.information(ROTATION_SIGMA, TRANSLATION_SIGMA), metric, 60, 0.7));
        if (isFalse) {
            falseIds.add(id);
        }
    }

    private double[] unit() {
        return normalise(new double[]{TwoLapTrajectory.gaussian(random), TwoLapTrajectory.gaussian(random),
                TwoLapTrajectory.gaussian(random)});
    }

    private static double[] cross(double[] a, double[] b) {
        return new double[]{a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]};
    }

    private static double[] normalise(double[] v) {
        double n = Math.sqrt(v[0] * v[0] + v[1] * v[1] + v[2] * v[2]);
        return new double[]{v[0] / n, v[1] / n, v[2] / n};
    }
}
