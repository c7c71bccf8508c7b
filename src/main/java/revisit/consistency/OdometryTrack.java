package revisit.consistency;

import georegression.geometry.ConvertRotation3D_F64;
import georegression.struct.se.Se3_F64;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import revisit.io.StampedPose;

/**
 * One sequence's odometry, interpolated at frame times: position linearly, orientation by spherical linear
 * interpolation of the unit quaternions (Shoemake, "Animating rotation with quaternion curves", SIGGRAPH 1985), along
 * the shorter arc. Also the distance travelled and the angle turned between two times, from cumulative sums over the
 * samples (interpolated the same way), for the drift model. Times outside the first and last sample are not served.
 */
public final class OdometryTrack {

    private final double[] times;
    private final double[][] poses;
    private final double[] travelled;
    private final double[] turned;

    /**
     * @param poses camera poses with strictly increasing times, as {@link revisit.io.TrajectoryFile#read} returns them
     */
    public OdometryTrack(List<StampedPose> poses) {
        if (poses.isEmpty()) {
            throw new IllegalArgumentException("odometry needs at least one pose");
        }
        int n = poses.size();
        times = new double[n];
        this.poses = new double[n][];
        travelled = new double[n];
        turned = new double[n];
        for (int i = 0; i < n; i++) {
            StampedPose p = poses.get(i);
            times[i] = p.timeSeconds();
            this.poses[i] = new double[]{p.x(), p.y(), p.z(), p.qw(), p.qx(), p.qy(), p.qz()};
            if (i > 0) {
                if (!(times[i] > times[i - 1])) {
                    throw new IllegalArgumentException("odometry times must increase strictly, at index " + i);
                }
                travelled[i] = travelled[i - 1] + p.distanceTo(poses.get(i - 1));
                turned[i] = turned[i - 1] + p.angleTo(poses.get(i - 1));
            }
        }
    }

    /** Whether a pose can be served at this time. */
    public boolean covers(double timeSeconds) {
        return timeSeconds >= times[0] && timeSeconds <= times[times.length - 1];
    }

    /** Camera-to-world pose at a time, or empty outside the sampled span. */
    public Optional<Se3_F64> poseAt(double timeSeconds) {
        if (!covers(timeSeconds)) {
            return Optional.empty();
        }
        int i = segment(timeSeconds);
        double f = fraction(i, timeSeconds);
        double[] p0 = poses[i];
        double[] p1 = poses[Math.min(i + 1, poses.length - 1)];
        double[] q = slerp(p0, p1, f);
        Se3_F64 out = new Se3_F64();
        ConvertRotation3D_F64.quaternionToMatrix(q[0], q[1], q[2], q[3], out.R);
        out.T.setTo(p0[0] + f * (p1[0] - p0[0]), p0[1] + f * (p1[1] - p0[1]), p0[2] + f * (p1[2] - p0[2]));
        return Optional.of(out);
    }

    /** Distance travelled between two covered times, in the trajectory's unit. */
    public double distanceBetween(double t0, double t1) {
        return Math.abs(cumulative(travelled, t1) - cumulative(travelled, t0));
    }

    /** Sum of the rotation angles between samples over two covered times, radians. */
    public double turnBetween(double t0, double t1) {
        return Math.abs(cumulative(turned, t1) - cumulative(turned, t0));
    }

    private double cumulative(double[] sums, double t) {
        int i = segment(t);
        double f = fraction(i, t);
        return sums[i] + f * (sums[Math.min(i + 1, sums.length - 1)] - sums[i]);
    }

    /** Index of the last sample at or before t (t covered). */
    private int segment(double t) {
        int found = Arrays.binarySearch(times, t);
        int i = found >= 0 ? found : -found - 2;
        return Math.max(0, Math.min(i, times.length - 1));
    }

    private double fraction(int i, double t) {
        return i + 1 < times.length ? (t - times[i]) / (times[i + 1] - times[i]) : 0;
    }

    /** Quaternion (w, x, y, z) between the quaternions stored at index 3..6 of two samples. */
    static double[] slerp(double[] p0, double[] p1, double f) {
        double[] a = {p0[3], p0[4], p0[5], p0[6]};
        double[] b = {p1[3], p1[4], p1[5], p1[6]};
        double dot = a[0] * b[0] + a[1] * b[1] + a[2] * b[2] + a[3] * b[3];
        if (dot < 0) {
            dot = -dot;
            for (int k = 0; k < 4; k++) {
                b[k] = -b[k];
            }
        }
        double wa;
        double wb;
        if (dot > 1 - 1e-12) {
            wa = 1 - f;
            wb = f;
        } else {
            double theta = Math.acos(dot);
            wa = Math.sin((1 - f) * theta) / Math.sin(theta);
            wb = Math.sin(f * theta) / Math.sin(theta);
        }
        double[] q = new double[4];
        double norm = 0;
        for (int k = 0; k < 4; k++) {
            q[k] = wa * a[k] + wb * b[k];
            norm += q[k] * q[k];
        }
        norm = Math.sqrt(norm);
        for (int k = 0; k < 4; k++) {
            q[k] /= norm;
        }
        return q;
    }
}
