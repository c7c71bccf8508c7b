package revisit.evaluation;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import revisit.pipeline.QueryTrace;

/**
 * Turns the scan's per-query traces into the evaluation's outcomes and frame timeline. Sequence ids of the
 * evaluation are the scan's sequence names.
 */
public final class ScanOutcomes {

    private ScanOutcomes() {
    }

    /** One outcome per trace; the score is the candidate's normalised retrieval score. */
    public static List<QueryOutcome> outcomes(List<QueryTrace> traces, List<String> names) {
        List<QueryOutcome> out = new ArrayList<>(traces.size());
        for (QueryTrace t : traces) {
            FrameKey q = new FrameKey(names.get(t.sequence()), t.frame());
            if (!t.hasCandidate()) {
                out.add(QueryOutcome.noCandidate(q));
                continue;
            }
            StageReached stage = switch (t.stage()) {
                case PROPOSED -> StageReached.PROPOSED;
                case CONSISTENT, CONFLICTING, UNCHECKED -> StageReached.CONSISTENT;
                case VERIFIED -> StageReached.VERIFIED;
                case NO_CANDIDATE -> StageReached.LOOKED_UP;
            };
            out.add(QueryOutcome.of(q, new FrameKey(names.get(t.matchSequence()), t.matchFrame()), t.score(), stage));
        }
        return out;
    }

    /**
     * The frames of each sequence with their times. Frames the scan never saw (stride, skipped frames) get times
     * interpolated between their neighbours so frame numbers stay those of the source.
     */
    public static FrameTimeline timeline(List<QueryTrace> traces, List<String> names) {
        List<SequenceFrames> seqs = new ArrayList<>();
        for (int s = 0; s < names.size(); s++) {
            int seq = s;
            List<QueryTrace> mine = traces.stream().filter(t -> t.sequence() == seq).toList();
            int maxFrame = mine.stream().mapToInt(QueryTrace::frame).max().orElse(-1);
            double[] times = new double[maxFrame + 1];
            Arrays.fill(times, Double.NaN);
            for (QueryTrace t : mine) {
                times[t.frame()] = t.time();
            }
            fillGaps(times);
            seqs.add(new SequenceFrames(names.get(s), times));
        }
        return new FrameTimeline(seqs);
    }

    private static void fillGaps(double[] times) {
        int prev = -1;
        for (int i = 0; i < times.length; i++) {
            if (Double.isNaN(times[i])) {
                continue;
            }
            if (prev < 0) {
                double step = i > 0 ? times[i] / i : 0;
                for (int k = 0; k < i; k++) {
                    times[k] = step * k;
                }
            } else {
                for (int k = prev + 1; k < i; k++) {
                    times[k] = times[prev] + (times[i] - times[prev]) * (k - prev) / (i - prev);
                }
            }
            prev = i;
        }
    }
}
