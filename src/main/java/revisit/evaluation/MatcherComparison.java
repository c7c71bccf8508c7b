package revisit.evaluation;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.List;
import java.util.Optional;
import revisit.camera.CameraModel;
import revisit.verification.PairVerifier;
import revisit.verification.Verification;
import revisit.verification.VerificationConfig;

/**
 * Node-restricted matching (features meet only within a shared vocabulary node) against brute-force matching,
 * each followed by the same verification, on the same pairs: time, inliers and accepted count of each.
 */
public final class MatcherComparison {

    /**
     * Totals of one matcher over all pairs.
     *
     * @param pairs    pairs verified
     * @param accepted pairs accepted
     * @param inliers  sum of inliers of the best model over all pairs, accepted or not
     * @param matches  sum of putative matches over all pairs
     * @param nanos    wall time of matching plus verification, one thread, nanoseconds
     * @param cpuNanos CPU time of the same, nanoseconds
     */
    public record Totals(int pairs, int accepted, long inliers, long matches, long nanos, long cpuNanos) {

        /** Mean milliseconds per pair. */
        public double msPerPair() {
            return pairs == 0 ? 0 : nanos / 1e6 / pairs;
        }
    }

    /** Both matchers on the same pairs. */
    public record Result(Totals nodes, Totals bruteForce) {
    }

    private MatcherComparison() {
    }

    /** Runs node-restricted matching, then brute force, over the pairs (query first in each pair). */
    public static Result run(List<BenchFrame[]> pairs, VerificationConfig config, Optional<CameraModel> camera) {
        PairVerifier verifier = new PairVerifier(config);
        return new Result(totals(pairs, verifier, camera, true), totals(pairs, verifier, camera, false));
    }

    private static Totals totals(List<BenchFrame[]> pairs, PairVerifier verifier, Optional<CameraModel> camera,
                                 boolean byNode) {
        int accepted = 0;
        long inliers = 0;
        long matches = 0;
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        long c0 = mx.getCurrentThreadCpuTime();
        long t0 = System.nanoTime();
        for (BenchFrame[] p : pairs) {
            Verification v = byNode
                    ? verifier.verify(p[0].features(), p[0].nodes(), p[1].features(), p[1].nodes(), camera)
                    : verifier.verify(p[0].features(), p[1].features(), camera);
            accepted += v.accepted() ? 1 : 0;
            inliers += v.inlierCount();
            matches += v.matchCount();
        }
        return new Totals(pairs.size(), accepted, inliers, matches, System.nanoTime() - t0,
                mx.getCurrentThreadCpuTime() - c0);
    }
}
