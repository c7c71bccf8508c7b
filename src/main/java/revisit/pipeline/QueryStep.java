package revisit.pipeline;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import revisit.camera.CameraModel;
import revisit.index.Candidate;
import revisit.index.FrameWords;
import revisit.index.MatchGroup;
import revisit.index.QueryResult;
import revisit.index.RevisitSearch;
import revisit.io.BadInputException;
import revisit.verification.Correspondences;
import revisit.verification.DescriptorMatcher;
import revisit.verification.MetricPoseConfig;
import revisit.verification.PairVerifier;
import revisit.verification.Verification;

/**
 * The ordered, stateful part of the scan for one frame: add to the database and query it, apply the temporal
 * consistency verdict, verify the confirmed candidate(s) geometrically, and emit a closure.
 */
final class QueryStep {

    private final ScanConfig config;
    private final RevisitSearch search;
    private final boolean keepRejected;
    private final StageTimes times;
    private final PairCheck check;
    private final ClosureFactory factory;
    private final Map<Long, FrameRecord> frames = new HashMap<>();
    private final List<Closure> closures = new ArrayList<>();
    private final List<QueryTrace> traces = new ArrayList<>();

    /** Verifies one (query, match) pair; the scan uses the verifier directly, tuning puts a cache in front. */
    @FunctionalInterface
    interface PairCheck {
        CheckedPair verify(FrameRecord query, FrameRecord match);
    }

    QueryStep(ScanConfig config, RevisitSearch search, Optional<CameraModel> camera, Optional<DepthFrames> depth,
              boolean keepRejected, StageTimes times) {
        this(config, search, keepRejected, times, direct(config, camera, depth));
    }

    QueryStep(ScanConfig config, RevisitSearch search, boolean keepRejected, StageTimes times, PairCheck check) {
        this.config = config;
        this.search = search;
        this.keepRejected = keepRejected;
        this.times = times;
        this.check = check;
        this.factory = new ClosureFactory(config.verification());
    }

    /**
     * Node-restricted matching and verification, then a metric pose when depth and a camera are given.
     *
     * @throws BadInputException when depth is given without a camera
     */
    static PairCheck direct(ScanConfig config, Optional<CameraModel> camera, Optional<DepthFrames> depth) {
        PairVerifier verifier = new PairVerifier(config.verification());
        DescriptorMatcher matcher = new DescriptorMatcher(config.verification());
        if (depth.isPresent() && camera.isEmpty()) {
            throw new BadInputException("depth images were given without a camera file; add --camera, metric "
                    + "poses need the calibration");
        }
        Optional<MetricUpgrade> upgrade = depth.map(d -> new MetricUpgrade(d, camera.orElseThrow(),
                MetricPoseConfig.defaults()));
        return (q, m) -> {
            Correspondences matches = matcher.matchWithinNodes(q.features(), q.nodes(), m.features(), m.nodes());
            Verification v = verifier.verify(q.features(), m.features(), matches, camera);
            return upgrade.map(u -> u.upgrade(q, m, matches, v)).orElseGet(() -> CheckedPair.of(v));
        };
    }

    List<Closure> closures() {
        return List.copyOf(closures);
    }

    List<QueryTrace> traces() {
        return List.copyOf(traces);
    }

    QueryTrace handle(FrameRecord r) {
        StageTimes.Mark t0 = StageTimes.mark();
        QueryResult qr = search.addAndQuery(new FrameWords(r.sequence(), r.frame(), r.time(), r.words(), r.nodes()));
        StageTimes.Mark t1 = times.stop(StageTimes.Stage.QUERY, t0);
        frames.put(key(r.sequence(), r.frame()), r);
        QueryTrace trace;
        if (qr.candidates().isEmpty()) {
            trace = new QueryTrace(r.sequence(), r.frame(), r.time(), QueryStage.NO_CANDIDATE, -1, -1, 0,
                    OptionalInt.empty(), "no candidate outside the exclusion window");
        } else if (qr.confirmedMatch().isEmpty()) {
            Candidate best = qr.chosenGroup().map(MatchGroup::best).orElse(qr.candidates().get(0));
            trace = new QueryTrace(r.sequence(), r.frame(), r.time(), QueryStage.PROPOSED, best.sequenceId(),
                    best.frameId(), best.normalisedScore(), OptionalInt.empty(), qr.consistency().reason());
        } else {
            trace = verify(r, qr);
            times.stop(StageTimes.Stage.VERIFY, t1);
        }
        times.stop(StageTimes.Stage.TOTAL, t0);
        traces.add(trace);
        return trace;
    }

    private QueryTrace verify(FrameRecord r, QueryResult qr) {
        List<Candidate> tries = candidatesToTry(qr);
        Candidate last = tries.get(0);
        Verification lastV = null;
        for (Candidate c : tries) {
            FrameRecord m = frames.get(key(c.sequenceId(), c.frameId()));
            CheckedPair checked = check.verify(r, m);
            Verification v = checked.verification();
            last = c;
            lastV = v;
            String refusal = refusal(v, c);
            Closure closure = factory.build(r, m, c.rawScore(), c.normalisedScore(), v, refusal, checked.note());
            if (refusal.isEmpty()) {
                closures.add(closure);
                return new QueryTrace(r.sequence(), r.frame(), r.time(), QueryStage.VERIFIED, c.sequenceId(),
                        c.frameId(), c.normalisedScore(), OptionalInt.of(v.inlierCount()), "accepted");
            }
            if (keepRejected) {
                closures.add(closure);
            }
        }
        return new QueryTrace(r.sequence(), r.frame(), r.time(), QueryStage.CONSISTENT, last.sequenceId(),
                last.frameId(), last.normalisedScore(), OptionalInt.of(lastV.inlierCount()), refusal(lastV, last));
    }

    /**
     * Why a verification does not make a closure, or "" when it does: the verifier's own verdict, then the
     * inlier minimum and inlier ratio of the verification settings (applied here too so a verifier run with a
     * lower bar can be reused, see {@link Replay}) and the score threshold of the scan settings.
     */
    private String refusal(Verification v, Candidate c) {
        if (!v.accepted()) {
            return v.outcome().name().toLowerCase(java.util.Locale.ROOT);
        }
        if (v.inlierCount() < config.verification().minInliers()) {
            return "too_few_inliers";
        }
        if (v.inlierRatio() < config.verification().minInlierRatio()) {
            return "low_inlier_ratio";
        }
        if (c.normalisedScore() < config.scan().minScore()) {
            return "below_score_threshold";
        }
        return "";
    }

    /** The chosen group's best frame, then its next best members, up to the configured count. */
    private List<Candidate> candidatesToTry(QueryResult qr) {
        MatchGroup g = qr.chosenGroup().orElseThrow();
        List<Candidate> tries = new ArrayList<>();
        tries.add(g.best());
        for (Candidate c : qr.candidates()) {
            if (tries.size() >= config.scan().verifyTopCandidates()) {
                break;
            }
            boolean inGroup = c.sequenceId() == g.sequenceId() && c.frameId() >= g.firstFrameId()
                    && c.frameId() <= g.lastFrameId();
            if (inGroup && !(c.frameId() == g.best().frameId())) {
                tries.add(c);
            }
        }
        return tries;
    }

    private static long key(int sequence, int frame) {
        return ((long) sequence << 32) | (frame & 0xffffffffL);
    }
}
