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
import revisit.verification.PairVerifier;
import revisit.verification.Verification;

/**
 * The ordered, stateful part of the scan for one frame: add to the database and query it, apply the temporal
 * consistency verdict, verify the confirmed candidate(s) geometrically, and emit a closure.
 */
final class QueryStep {

    private final ScanConfig config;
    private final RevisitSearch search;
    private final Optional<CameraModel> camera;
    private final boolean keepRejected;
    private final StageTimes times;
    private final PairVerifier verifier;
    private final ClosureFactory factory;
    private final Map<Long, FrameRecord> frames = new HashMap<>();
    private final List<Closure> closures = new ArrayList<>();
    private final List<QueryTrace> traces = new ArrayList<>();

    QueryStep(ScanConfig config, RevisitSearch search, Optional<CameraModel> camera, boolean keepRejected,
              StageTimes times) {
        this.config = config;
        this.search = search;
        this.camera = camera;
        this.keepRejected = keepRejected;
        this.times = times;
        this.verifier = new PairVerifier(config.verification());
        this.factory = new ClosureFactory(config.verification());
    }

    List<Closure> closures() {
        return List.copyOf(closures);
    }

    List<QueryTrace> traces() {
        return List.copyOf(traces);
    }

    QueryTrace handle(FrameRecord r) {
        long t0 = System.nanoTime();
        QueryResult qr = search.addAndQuery(new FrameWords(r.sequence(), r.frame(), r.time(), r.words(), r.nodes()));
        times.add(StageTimes.Stage.QUERY, System.nanoTime() - t0);
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
            long t1 = System.nanoTime();
            trace = verify(r, qr);
            times.add(StageTimes.Stage.VERIFY, System.nanoTime() - t1);
        }
        times.add(StageTimes.Stage.TOTAL, System.nanoTime() - t0);
        traces.add(trace);
        return trace;
    }

    private QueryTrace verify(FrameRecord r, QueryResult qr) {
        List<Candidate> tries = candidatesToTry(qr);
        Candidate last = tries.get(0);
        Verification lastV = null;
        for (Candidate c : tries) {
            FrameRecord m = frames.get(key(c.sequenceId(), c.frameId()));
            Verification v = verifier.verify(r.features(), r.nodes(), m.features(), m.nodes(), camera);
            last = c;
            lastV = v;
            Closure closure = factory.build(r, m, c.rawScore(), c.normalisedScore(), v);
            if (v.accepted()) {
                closures.add(closure);
                return new QueryTrace(r.sequence(), r.frame(), r.time(), QueryStage.VERIFIED, c.sequenceId(),
                        c.frameId(), c.normalisedScore(), OptionalInt.of(v.inlierCount()), "accepted");
            }
            if (keepRejected) {
                closures.add(closure);
            }
        }
        return new QueryTrace(r.sequence(), r.frame(), r.time(), QueryStage.CONSISTENT, last.sequenceId(),
                last.frameId(), last.normalisedScore(), OptionalInt.of(lastV.inlierCount()),
                lastV.outcome().name().toLowerCase(java.util.Locale.ROOT));
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
