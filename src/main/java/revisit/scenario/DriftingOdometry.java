package revisit.scenario;

import georegression.struct.se.Se3_F64;
import georegression.struct.se.SpecialEuclideanOps_F64;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import revisit.io.StampedPose;

/**
 * Odometry as a visual-odometry front end would give it: the true frame-to-frame motions, each with a small
 * seeded error (scale error on the step length and a small rotation), chained from the first pose, so the error
 * grows with distance as real odometry drift does. Used by the demo for the consistency check.
 */
public final class DriftingOdometry {

    private DriftingOdometry() {
    }

    /**
     * @param truth           true camera-to-world poses
     * @param scaleErrorSigma standard deviation of the relative step-length error, e.g. 0.01 (1 %)
     * @param angleSigmaRad   standard deviation of the per-step rotation error about each axis, radians
     * @param seed            random seed
     */
    public static List<StampedPose> simulate(List<StampedPose> truth, double scaleErrorSigma, double angleSigmaRad,
                                             long seed) {
        Random random = new Random(seed);
        List<StampedPose> out = new ArrayList<>(truth.size());
        Se3_F64 current = truth.get(0).cameraToWorld();
        out.add(truth.get(0));
        for (int i = 1; i < truth.size(); i++) {
            Se3_F64 prev = truth.get(i - 1).cameraToWorld();
            Se3_F64 next = truth.get(i).cameraToWorld();
            // georegression's a.concat(b) applies a, then b: local = prev^-1 o next maps next-camera points into
            // the previous camera, and the chained pose is current o noisy(local).
            Se3_F64 local = next.concat(prev.invert(null), null);
            double s = 1 + scaleErrorSigma * random.nextGaussian();
            local.T.scale(s);
            Se3_F64 noise = SpecialEuclideanOps_F64.eulerXyz(0, 0, 0, angleSigmaRad * random.nextGaussian(),
                    angleSigmaRad * random.nextGaussian(), angleSigmaRad * random.nextGaussian(), null);
            Se3_F64 noisy = noise.concat(local, null);
            current = noisy.concat(current, null);
            out.add(StampedPose.of(truth.get(i).timeSeconds(), current));
        }
        return out;
    }
}
