package revisit.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Optional;
import java.util.function.Supplier;
import revisit.verification.Correspondences;
import revisit.verification.Verification;

/**
 * Thread CPU time per call of the operations of {@link VerificationBenchmark}, for a shared machine where wall
 * time measures the queue for a core more than the work (thread CPU time excludes time spent waiting to run).
 * Also prints match, inlier and sample counts. Run: {@code java -cp target/benchmarks.jar
 * revisit.bench.VerificationCpuTime}.
 */
public final class VerificationCpuTime {

    private VerificationCpuTime() {
    }

    public static void main(String[] args) throws Exception {
        VerificationBenchmark b = new VerificationBenchmark();
        b.setup();
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        CpuTimeCounters c = new CpuTimeCounters();
        for (int round = 0; round < 3; round++) {
            report("matchBruteForce", mx, 200, () -> b.matchBruteForce(c));
            report("matchWithinNodes", mx, 200, () -> b.matchWithinNodes(c));
            report("verifyOnly", mx, 200, () -> b.verifyOnly(c));
            report("matchAndVerify", mx, 200, () -> b.matchAndVerify(c));
            report("matchWithinNodesAndVerify", mx, 200, () -> b.matchWithinNodesAndVerify(c));
            report("matchAndRejectFarPair", mx, 20, () -> b.matchAndRejectFarPair(c));
            report("matchWithinNodesAndRejectFar", mx, 20, () -> b.matchWithinNodesAndRejectFarPair(c));
            report("verifyMatchesWithoutGeometry", mx, 20, () -> b.verifyMatchesWithoutGeometry(c));
        }
        Correspondences all = b.matchBruteForce(c);
        Correspondences nodes = b.matchWithinNodes(c);
        Verification va = b.matchAndVerify(c);
        Verification vn = b.matchWithinNodesAndVerify(c);
        System.out.printf("brute force: %d matches, %s %s, %d inliers, %d samples%n", all.count(), va.outcome(),
                va.model(), va.inlierCount(), va.iterations());
        System.out.printf("within nodes: %d matches, %s %s, %d inliers, %d samples%n", nodes.count(), vn.outcome(),
                vn.model(), vn.inlierCount(), vn.iterations());
        Verification far = b.matchAndRejectFarPair(c);
        System.out.printf("far pair: %d matches, %s %s, %d inliers, %d samples%n", far.matchCount(), far.outcome(),
                far.model(), far.inlierCount(), far.iterations());
        Verification farNodes = b.matchWithinNodesAndRejectFarPair(c);
        System.out.printf("far pair within nodes: %d matches, %s %s, %d inliers, %d samples%n",
                farNodes.matchCount(), farNodes.outcome(), farNodes.model(), farNodes.inlierCount(),
                farNodes.iterations());
        Verification none = b.verifyMatchesWithoutGeometry(c);
        System.out.printf("no geometry: %d matches, %s %s, %d inliers, %d samples%n", none.matchCount(),
                none.outcome(), none.model(), none.inlierCount(), none.iterations());
        Optional.of(mx).ifPresent(m -> System.out.println("load " + ManagementFactory.getOperatingSystemMXBean()
                .getSystemLoadAverage()));
    }

    private static void report(String name, ThreadMXBean mx, int calls, Supplier<?> op) {
        long sink = 0;
        long cpu0 = mx.getCurrentThreadCpuTime();
        long wall0 = System.nanoTime();
        for (int i = 0; i < calls; i++) {
            sink += op.get().hashCode() & 1;
        }
        long cpu = mx.getCurrentThreadCpuTime() - cpu0;
        long wall = System.nanoTime() - wall0;
        System.out.printf("%-28s cpu %8.3f ms/call  wall %8.3f ms/call  (%d)%n", name, cpu / 1e6 / calls,
                wall / 1e6 / calls, sink);
    }
}
