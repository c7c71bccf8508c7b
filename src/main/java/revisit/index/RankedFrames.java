package revisit.index;

/**
 * Best frames of one query by raw score, best first (ties: earlier slot first).
 *
 * @param slots         frame slots
 * @param scores        exact raw score of each, in (0, 1]
 * @param skippedWeight total query weight on words whose posting lists were not walked (stop list); a frame not
 *                      listed may have been ranked this much too low at most. 0 when every list was walked
 */
record RankedFrames(int[] slots, double[] scores, double skippedWeight) {

    int size() {
        return slots.length;
    }
}
