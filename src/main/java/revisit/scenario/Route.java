package revisit.scenario;

import georegression.struct.se.Se3_F64;
import java.util.List;
import java.util.SplittableRandom;
import revisit.io.StampedPose;

/**
 * The camera's motion along a {@link RoutePath} at constant speed: eye height with a small walking bob, a slight
 * downward pitch, slow seeded sway in yaw, pitch and roll, and planned head turns ("glances") that point the
 * camera at a place's facade while passing it. Poses are a smooth function of time, so frames at 10 Hz and
 * motion-blur sub-instants come from the same formula.
 */
public final class Route {

    /** Camera height above the floor, metres (hand-held or cart-mounted camera; chosen here). */
    static final double EYE_HEIGHT = 1.5;
    /** Downward pitch, radians (6 degrees: keeps some floor in view; chosen here). */
    static final double PITCH = Math.toRadians(6);
    /** Half-length of a glance at full turn, metres of path. */
    static final double GLANCE_PLATEAU = 1.0;
    /** Length of the smooth turn into and out of a glance, metres of path. */
    static final double GLANCE_RAMP = 2.5;

    /** A planned head turn centred at arc position {@code s}, turning by {@code yawRad} (positive = left). */
    record Glance(double s, double yawRad) {
    }

    private final RoutePath path;
    private final double speed;
    private final List<Glance> glances;
    private final double[] phases = new double[4];

    /**
     * @param path     the ground path
     * @param duration seconds from the first to the last frame
     * @param glances  planned head turns
     * @param seed     seeds the sway phases
     */
    Route(RoutePath path, double duration, List<Glance> glances, long seed) {
        this.path = path;
        this.speed = path.length() / duration;
        this.glances = List.copyOf(glances);
        SplittableRandom rnd = new SplittableRandom(seed);
        for (int i = 0; i < phases.length; i++) {
            phases[i] = rnd.nextDouble() * 2 * Math.PI;
        }
    }

    RoutePath path() {
        return path;
    }

    /** Length of the route, metres. */
    public double lengthMetres() {
        return path.length();
    }

    /** Walking speed, metres per second. */
    public double speed() {
        return speed;
    }

    /** Head turn at arc position s, radians (positive = left). */
    public double glanceAt(double s) {
        double yaw = 0;
        for (Glance g : glances) {
            double d = Math.abs(s - g.s()) - GLANCE_PLATEAU;
            if (d <= 0) {
                yaw += g.yawRad();
            } else if (d < GLANCE_RAMP) {
                yaw += g.yawRad() * 0.5 * (1 + Math.cos(Math.PI * d / GLANCE_RAMP));
            }
        }
        return yaw;
    }

    /** Camera to world at time t seconds (world x east, y north, z up; camera x right, y down, z forward). */
    public Se3_F64 poseAt(double t) {
        double s = speed * t;
        double[] p = path.at(s);
        double yaw = p[2] + glanceAt(s) + Math.toRadians(1.5) * Math.sin(2 * Math.PI * 0.23 * t + phases[0]);
        double pitch = PITCH + Math.toRadians(1.0) * Math.sin(2 * Math.PI * 0.31 * t + phases[1]);
        double roll = Math.toRadians(0.8) * Math.sin(2 * Math.PI * 0.17 * t + phases[2]);
        double height = EYE_HEIGHT + 0.02 * Math.sin(2 * Math.PI * 1.7 * t + phases[3]);
        return pose(p[0], p[1], height, yaw, pitch, roll);
    }

    /**
     * A camera pose from position and angles.
     *
     * @param yaw   heading of the optical axis, radians from east towards north
     * @param pitch downward tilt, radians
     * @param roll  rotation about the optical axis, radians (positive turns the image clockwise)
     */
    static Se3_F64 pose(double x, double y, double z, double yaw, double pitch, double roll) {
        double[] f = {Math.cos(yaw) * Math.cos(pitch), Math.sin(yaw) * Math.cos(pitch), -Math.sin(pitch)};
        double[] r0 = {Math.sin(yaw), -Math.cos(yaw), 0};
        double[] d0 = {f[1] * r0[2] - f[2] * r0[1], f[2] * r0[0] - f[0] * r0[2], f[0] * r0[1] - f[1] * r0[0]};
        Se3_F64 se = new Se3_F64();
        double c = Math.cos(roll);
        double sn = Math.sin(roll);
        for (int i = 0; i < 3; i++) {
            se.R.set(i, 0, c * r0[i] + sn * d0[i]);
            se.R.set(i, 1, -sn * r0[i] + c * d0[i]);
            se.R.set(i, 2, f[i]);
        }
        se.T.setTo(x, y, z);
        return se;
    }

    /** The stamped pose of frame i at the given rate. */
    public StampedPose frame(int i, double rateHz) {
        double t = i / rateHz;
        return StampedPose.of(t, poseAt(t));
    }
}
