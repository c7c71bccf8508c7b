package revisit.index;

/**
 * A database frame proposed as a revisit of the query frame.
 *
 * @param sequenceId      sequence of the frame
 * @param frameId         frame id within its sequence
 * @param timeSeconds     capture time of the frame, seconds
 * @param rawScore        bag-of-words score {@code s(q, c)} in (0, 1] ({@link ScoreNorm}) over the query's words
 *                        other than its stop words (all of them unless the stop list is on)
 * @param normalisedScore {@code eta = s(q, c) / max(s(q, q_prev), floor)}: the raw score relative to the query's
 *                        score against its predecessor (Gálvez-López and Tardós, IEEE T-RO 2012); may exceed 1
 */
public record Candidate(int sequenceId, int frameId, double timeSeconds, double rawScore, double normalisedScore) {
}
