package revisit.index;

/**
 * One frame as the database sees it: who it is, when it was taken, and the vocabulary word and tree node of each of
 * its features.
 *
 * @param sequenceId  sequence (session, camera log) the frame belongs to, >= 0
 * @param frameId     frame number within its sequence, >= 0; unique within the sequence
 * @param timeSeconds capture time, seconds on the sequence's own clock (finite)
 * @param words       vocabulary word id of each feature, one per feature, may repeat; not modified
 * @param nodes       vocabulary tree node of each feature at the level chosen for matching (>= 0), one per feature,
 *                    same order as {@code words}; kept in the direct index; not modified
 */
public record FrameWords(int sequenceId, int frameId, double timeSeconds, int[] words, int[] nodes) {

    public FrameWords {
        if (sequenceId < 0 || frameId < 0) {
            throw new IllegalArgumentException("sequenceId and frameId must be >= 0, were " + sequenceId + ", "
                    + frameId);
        }
        if (!Double.isFinite(timeSeconds)) {
            throw new IllegalArgumentException("timeSeconds of frame " + frameId + " must be finite, was "
                    + timeSeconds);
        }
        if (words == null || nodes == null || words.length != nodes.length) {
            throw new IllegalArgumentException("frame " + frameId + ": words and nodes must both be given, one per "
                    + "feature");
        }
        for (int node : nodes) {
            if (node < 0) {
                throw new IllegalArgumentException("frame " + frameId + ": node ids must be >= 0, saw " + node);
            }
        }
    }

    /** Number of features. */
    public int featureCount() {
        return words.length;
    }
}
