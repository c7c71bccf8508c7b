package revisit.evaluation;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import revisit.camera.CameraModel;
import revisit.verification.PairVerifier;
import revisit.verification.VerificationConfig;

/**
 * The ceiling of geometric verification on a frame set: every pair the scan would be allowed to report (the later
 * frame as query, the earlier outside the exclusion window) is matched brute force and verified, and the accepted
 * pairs are judged against ground-truth labels. A retrieval front end cannot find a verified true revisit that
 * exhaustive verification misses, so this bounds the scan's recall at the same verifier.
 */
public final class VerificationCeiling {

    /**
     * Outcome of the exhaustive run.
     *
     * @param pairs    pairs verified
     * @param accepted accepted pairs as (query, match) keys
     * @param nanos    wall time of matching plus verification, all pairs, nanoseconds
     * @param cpuNanos CPU time of the verifying threads, summed, nanoseconds
     */
    public record Result(int pairs, List<FrameKey[]> accepted, long nanos, long cpuNanos) {

        public Result {
            accepted = List.copyOf(accepted);
        }

        /** Accepted pairs that are true revisits by the labels. */
        public int acceptedTrue(RevisitLabels labels) {
            return (int) accepted.stream().filter(p -> labels.isTrueMatch(p[0], p[1], 0)).count();
        }

        /** Query frames with at least one accepted true pair. */
        public Set<FrameKey> queriesFound(RevisitLabels labels) {
            Set<FrameKey> out = new HashSet<>();
            accepted.stream().filter(p -> labels.isTrueMatch(p[0], p[1], 0)).forEach(p -> out.add(p[0]));
            return out;
        }
    }

    private VerificationCeiling() {
    }

    /** The pairs the scan may report: later frame first, cross-sequence always, same sequence outside the window. */
    public static List<BenchFrame[]> allowedPairs(List<BenchFrame> framesInScanOrder, ExclusionWindow window) {
        List<BenchFrame[]> out = new ArrayList<>();
        for (int q = 0; q < framesInScanOrder.size(); q++) {
            BenchFrame query = framesInScanOrder.get(q);
            for (int m = 0; m < q; m++) {
                BenchFrame match = framesInScanOrder.get(m);
                boolean same = match.key().sequenceId().equals(query.key().sequenceId());
                if (!same || !window.excludes(query.key().frame() - match.key().frame(),
                        query.time() - match.time())) {
                    out.add(new BenchFrame[] {query, match});
                }
            }
        }
        return out;
    }

    /** Verifies every pair with brute-force matching on {@code threads} threads (one verifier each). */
    public static Result run(List<BenchFrame[]> pairs, VerificationConfig config, Optional<CameraModel> camera,
                             int threads) {
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        long t0 = System.nanoTime();
        try {
            List<Future<Part>> parts = new ArrayList<>();
            for (int t = 0; t < threads; t++) {
                int first = t;
                parts.add(pool.submit(() -> verifyShare(pairs, first, threads, config, camera)));
            }
            List<FrameKey[]> accepted = new ArrayList<>();
            long cpu = 0;
            for (Future<Part> f : parts) {
                Part p = f.get();
                accepted.addAll(p.accepted());
                cpu += p.cpuNanos();
            }
            return new Result(pairs.size(), accepted, System.nanoTime() - t0, cpu);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("exhaustive verification interrupted", e);
        } catch (ExecutionException e) {
            throw new IllegalStateException("exhaustive verification failed: " + e.getCause(), e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }

    private record Part(List<FrameKey[]> accepted, long cpuNanos) {
    }

    private static Part verifyShare(List<BenchFrame[]> pairs, int first, int step, VerificationConfig config,
                                    Optional<CameraModel> camera) {
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        long c0 = mx.getCurrentThreadCpuTime();
        PairVerifier verifier = new PairVerifier(config);
        List<FrameKey[]> accepted = new ArrayList<>();
        for (int i = first; i < pairs.size(); i += step) {
            BenchFrame[] p = pairs.get(i);
            if (verifier.verify(p[0].features(), p[1].features(), camera).accepted()) {
                accepted.add(new FrameKey[] {p[0].key(), p[1].key()});
            }
        }
        return new Part(accepted, mx.getCurrentThreadCpuTime() - c0);
    }
}
