package revisit.index;

/**
 * Best frames of one query by raw score, best first (ties: earlier slot first).
 *
 * @param slots         frame slots
 * @param scores        raw score of each over the query's words other than its stop words, in (0, 1]
 * @param stopWords     the query's stop words (lists not walked), increasing ids; empty when every list was walked
 * @param skippedWeight total query weight on the stop words
 */
record RankedFrames(int[] slots, double[] scores, int[] stopWords, double skippedWeight) {

    int size() {
        return slots.length;
    }
}
