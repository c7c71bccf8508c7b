package revisit.bench;

import georegression.struct.se.Se3_F64;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import revisit.consistency.ClosureConstraint;
import revisit.consistency.ConsistencyCheck;
import revisit.consistency.ConsistencyConfig;
import revisit.consistency.ConsistencyReport;
import revisit.consistency.FrameRef;
import revisit.io.StampedPose;

/**
 * Cost of {@link ConsistencyCheck} with odometry for n true metric closures packed into one 35-second stretch of a
 * two-lap circular drive (every pair within the stretch limit, so n (n - 1) / 2 loop tests), plus four planted
 * false closures (a self-consistent aliasing burst) that make one conflict component of n + 4 closures for the
 * clique search. Synthetic: circle of radius 6 m at 1 m/s, 10 Hz, exact odometry.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 3)
@Measurement(iterations = 3, time = 3)
@Fork(1)
public class ConsistencyCheckBench {

    private static final double RADIUS = 6;
    private static final double LAP = 2 * Math.PI * RADIUS;
    private static final String SEQUENCE = "drive";

    @Param({"100", "300", "1000"})
    public int closures;

    private List<ClosureConstraint> input;
    private Map<String, List<StampedPose>> odometry;
    private final ConsistencyCheck check = new ConsistencyCheck(ConsistencyConfig.defaults());

    @Setup
    public void build() {
        List<StampedPose> poses = new ArrayList<>();
        for (int k = 0; k < (int) (2 * LAP * 10) + 20; k++) {
            poses.add(StampedPose.of(k / 10.0, pose(k / 10.0)));
        }
        odometry = Map.of(SEQUENCE, poses);
        double[] info = new double[36];
        for (int k = 0; k < 6; k++) {
            info[7 * k] = k < 3 ? 1e4 : 1e3;
        }
        input = new ArrayList<>();
        for (int k = 0; k < closures; k++) {
            int a = (int) Math.round(10 * (1 + k * 35.0 / closures));
            int b = (int) Math.round(a + 10 * LAP);
            input.add(closure("t" + k, a, b, relative(a, b), info));
        }
        int bRef = (int) Math.round(62 + 10 * LAP);
        Se3_F64 offset = pose(bRef / 10.0).concat(pose((bRef + 80) / 10.0).invert(null), null);
        for (int k = 0; k < 4; k++) {
            int a = 62 + 5 * k;
            int wrong = (int) Math.round(a + 10 * LAP) + 80;
            Se3_F64 claimed = pose(wrong / 10.0).concat(offset, null).concat(pose(a / 10.0).invert(null), null);
            input.add(closure("f" + k, a, wrong, claimed, info));
        }
    }

    @Benchmark
    public ConsistencyReport checkWithOdometry() {
        return check.check(input, odometry);
    }

    private static ClosureConstraint closure(String id, int a, int b, Se3_F64 pose, double[] info) {
        return new ClosureConstraint(id, new FrameRef(SEQUENCE, a, a / 10.0), new FrameRef(SEQUENCE, b, b / 10.0), pose,
                info, true, 60, 0.7);
    }

    private static Se3_F64 relative(int a, int b) {
        return pose(b / 10.0).concat(pose(a / 10.0).invert(null), null);
    }

    /** Camera-to-world pose on the circle; lap 2 runs 1 m further out. */
    private static Se3_F64 pose(double t) {
        double theta = t / RADIUS;
        double r = RADIUS + Math.floor(t / LAP);
        Se3_F64 p = new Se3_F64();
        double[] forward = {-Math.sin(theta), Math.cos(theta), 0};
        double[] right = {forward[1], -forward[0], 0};
        for (int row = 0; row < 3; row++) {
            p.R.set(row, 0, right[row]);
            p.R.set(row, 1, row == 2 ? -1 : 0);
            p.R.set(row, 2, forward[row]);
        }
        p.T.setTo(r * Math.cos(theta), r * Math.sin(theta), 0);
        return p;
    }
}
