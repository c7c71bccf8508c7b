package revisit.index;

/**
 * Candidates of one sequence that lie next to each other in time, taken together: a revisit usually matches a run
 * of neighbouring frames, and a run is stronger evidence than its best frame alone. The literature calls such runs
 * islands (Gálvez-López and Tardós, IEEE T-RO 2012).
 *
 * @param sequenceId   sequence of the members
 * @param firstFrameId smallest member frame id
 * @param lastFrameId  largest member frame id
 * @param startSeconds earliest member time, seconds
 * @param endSeconds   latest member time, seconds
 * @param score        sum of the members' normalised scores
 * @param memberCount  number of members, >= 1
 * @param best         member with the highest normalised score, the group's representative
 */
public record MatchGroup(int sequenceId, int firstFrameId, int lastFrameId, double startSeconds, double endSeconds,
                         double score, int memberCount, Candidate best) {

    /**
     * Seconds between the time spans of two groups of the same sequence, 0 when they overlap; infinite for groups of
     * different sequences.
     */
    public double gapSeconds(MatchGroup other) {
        if (other.sequenceId != sequenceId) {
            return Double.POSITIVE_INFINITY;
        }
        return Math.max(0, Math.max(startSeconds, other.startSeconds) - Math.min(endSeconds, other.endSeconds));
    }
}
