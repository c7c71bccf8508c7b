package revisit.evaluation;

/**
 * One labelled revisit: {@code query} shows the same place as the earlier frame {@code match}.
 *
 * @param query the later frame in scan order
 * @param match the earlier frame
 */
public record RevisitPair(FrameKey query, FrameKey match) {
}
