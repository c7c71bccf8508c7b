package revisit.pipeline;

import georegression.geometry.ConvertRotation3D_F64;
import georegression.struct.se.Se3_F64;
import georegression.struct.so.Quaternion_F64;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import revisit.consistency.ClosureConstraint;
import revisit.consistency.ClosureVerdict;
import revisit.consistency.ConsistencyCheck;
import revisit.consistency.ConsistencyConfig;
import revisit.consistency.ConsistencyReport;
import revisit.consistency.FrameRef;
import revisit.io.StampedPose;

/**
 * The second, independent test before export: closures are checked against each other (and against odometry when
 * given) by {@link ConsistencyCheck} (pairwise consistency maximisation, Mangelson et al., ICRA 2018), and each
 * closure's status and confidence are set from the verdict.
 */
public final class ClosureChecks {

    private ClosureChecks() {
    }

    /**
     * @param closures  closures of a scan (rejected candidates pass through untouched)
     * @param names     sequence names by id (odometry is keyed by name)
     * @param odometry  odometry per sequence name; empty map for none
     * @param config    consistency settings
     * @return the closures with status TRUSTED, CONFLICTING or UNCHECKED and the check's confidence
     */
    public static List<Closure> apply(List<Closure> closures, List<String> names,
                                      Map<String, List<StampedPose>> odometry, ConsistencyConfig config) {
        List<ClosureConstraint> constraints = new ArrayList<>();
        Map<String, String> notCheckable = new HashMap<>();
        Map<Integer, String> againstOdometry = new HashMap<>();
        OdometryGate gate = new OdometryGate(odometry, config);
        for (int i = 0; i < closures.size(); i++) {
            Closure c = closures.get(i);
            if (c.status() == ClosureStatus.REJECTED) {
                continue;
            }
            if (hasPose(c)) {
                var contradiction = gate.contradiction(c, names);
                if (contradiction.isPresent()) {
                    againstOdometry.put(i, contradiction.get());
                    continue;
                }
            }
            if (!hasPose(c)) {
                notCheckable.put(String.valueOf(i), "no relative pose to check (give a camera file)");
                continue;
            }
            try {
                constraints.add(toConstraint(String.valueOf(i), c, names));
            } catch (IllegalArgumentException e) {
                notCheckable.put(String.valueOf(i), "not checkable: " + e.getMessage());
            }
        }
        ConsistencyCheck check = new ConsistencyCheck(config);
        ConsistencyReport report = odometry.isEmpty() ? check.check(constraints) : check.check(constraints, odometry);
        Map<String, ClosureVerdict> verdicts = new HashMap<>();
        for (ClosureVerdict v : report.verdicts()) {
            verdicts.put(v.closureId(), v);
        }
        List<Closure> out = new ArrayList<>(closures.size());
        for (int i = 0; i < closures.size(); i++) {
            Closure c = closures.get(i);
            ClosureVerdict v = verdicts.get(String.valueOf(i));
            if (c.status() == ClosureStatus.REJECTED) {
                out.add(c);
            } else if (againstOdometry.containsKey(i)) {
                String reason = c.reason().isEmpty() ? againstOdometry.get(i) : c.reason() + "; " + againstOdometry.get(i);
                out.add(c.withStatus(ClosureStatus.CONFLICTING, reason, 0));
            } else if (v == null) {
                out.add(c.withStatus(ClosureStatus.UNCHECKED, notCheckable.getOrDefault(String.valueOf(i),
                        "not checkable"), c.confidence() * 0.5));
            } else {
                out.add(withVerdict(c, v));
            }
        }
        return out;
    }

    private static boolean hasPose(Closure c) {
        return !java.util.Arrays.stream(c.information()).allMatch(v -> v == 0);
    }

    private static Closure withVerdict(Closure c, ClosureVerdict v) {
        String note = switch (v.verdict()) {
            case CONSISTENT -> v.consistentPartners() + " agreeing closure(s)";
            case CONFLICTING -> "contradicts " + v.conflictingPartners() + " closure(s) of the consistent set";
            case UNCHECKED -> "unchecked: " + v.uncheckedReason().orElseThrow().name().toLowerCase(Locale.ROOT);
        };
        String reason = c.reason().isEmpty() ? note : c.reason() + "; " + note;
        ClosureStatus status = switch (v.verdict()) {
            case CONSISTENT -> ClosureStatus.TRUSTED;
            case CONFLICTING -> ClosureStatus.CONFLICTING;
            case UNCHECKED -> ClosureStatus.UNCHECKED;
        };
        return c.withStatus(status, reason, v.confidence());
    }

    /** Closure (X_match = R X_query + t, information (t, r)) to constraint (A = match, B = query, (r, t)). */
    static ClosureConstraint toConstraint(String id, Closure c, List<String> names) {
        double[] q = c.quaternion();
        Se3_F64 aFromB = new Se3_F64();
        ConvertRotation3D_F64.quaternionToMatrix(new Quaternion_F64(q[3], q[0], q[1], q[2]), aFromB.R);
        aFromB.T.setTo(c.translation()[0], c.translation()[1], c.translation()[2]);
        FrameRef a = new FrameRef(names.get(c.matchSequence()), c.matchFrame(), c.matchTime());
        FrameRef b = new FrameRef(names.get(c.querySequence()), c.queryFrame(), c.queryTime());
        return new ClosureConstraint(id, a, b, aFromB, ClosureConstraint.swapRotationAndTranslation(c.information()),
                c.metric(), c.inliers(), c.inlierRatio());
    }
}
