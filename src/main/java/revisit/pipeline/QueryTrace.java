package revisit.pipeline;

import java.util.OptionalInt;

/**
 * What the scan did with one query frame; evaluation turns these into precision/recall and miss reasons.
 *
 * @param sequence        query sequence id
 * @param frame           query frame index
 * @param time            query timestamp, seconds
 * @param stage           furthest stage reached
 * @param matchSequence   sequence of the best candidate (the verified one when VERIFIED), -1 when none
 * @param matchFrame      frame of that candidate, -1 when none
 * @param score           its normalised score (0 when none)
 * @param inliers         inliers of the last verification tried, empty when nothing was verified
 * @param reason          verification outcome or consistency reason, for people
 */
public record QueryTrace(int sequence, int frame, double time, QueryStage stage, int matchSequence, int matchFrame,
                         double score, OptionalInt inliers, String reason) {

    /** True when a candidate frame is named. */
    public boolean hasCandidate() {
        return stage != QueryStage.NO_CANDIDATE;
    }
}
