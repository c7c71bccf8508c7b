package revisit.evaluation;

/**
 * A verified query with its verdict against the labels, for plots and the report.
 *
 * @param query    the query frame
 * @param match    the matched frame
 * @param score    acceptance score
 * @param correct  whether the match is a labelled revisit of the query (within the frame tolerance)
 * @param positive whether the query has any labelled revisit
 */
public record JudgedDetection(FrameKey query, FrameKey match, double score, boolean correct, boolean positive) {
}
